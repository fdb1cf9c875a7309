import { ALLIANCES } from '../../../../shared/domain/season/season-profile';
import {
  MAX_PAGE_SIZE,
  RECORDING_KINDS,
  RECORDING_SORTS,
  type RecordingSort,
} from '../../../../shared/schemas/recording';

/** What the recordings table is showing: filters, sort and page, all kept in the URL. */
export type RecordingView = {
  q: string;
  event: string;
  kind: (typeof RECORDING_KINDS)[number] | '';
  alliance: (typeof ALLIANCES)[number] | '';
  tag: string;
  from: string;
  to: string;
  sort: RecordingSort;
  page: number;
  pageSize: number;
};

export const DEFAULT_VIEW: RecordingView = {
  q: '',
  event: '',
  kind: '',
  alliance: '',
  tag: '',
  from: '',
  to: '',
  sort: '-startedAt',
  page: 1,
  pageSize: 25,
};

/** The columns the server can sort by, with the field each one sorts. */
export type SortField = 'startedAt' | 'durationS' | 'event' | 'matchNumber';

const TEXT_KEYS = ['q', 'event', 'tag'] as const;
const ISO_DAY = /^\d{4}-\d{2}-\d{2}$/;

const oneOf = <T extends string>(values: readonly T[], v: string | null): T | undefined =>
  values.find((x) => x === v);

function positiveInt(v: string | null, fallback: number, max: number): number {
  if (v === null || !/^\d+$/.test(v)) return fallback;
  const n = Number(v);
  return n >= 1 && n <= max ? n : fallback;
}

/** Reads the view from a query string; anything unknown or malformed falls back to the default. */
export function viewFromSearch(params: URLSearchParams): RecordingView {
  const view: RecordingView = { ...DEFAULT_VIEW };
  for (const key of TEXT_KEYS) view[key] = (params.get(key) ?? '').slice(0, key === 'tag' ? 32 : 120);
  view.kind = oneOf(RECORDING_KINDS, params.get('kind')) ?? '';
  view.alliance = oneOf(ALLIANCES, params.get('alliance')) ?? '';
  const from = params.get('from') ?? '';
  const to = params.get('to') ?? '';
  view.from = ISO_DAY.test(from) ? from : '';
  view.to = ISO_DAY.test(to) ? to : '';
  if (view.from && view.to && view.from > view.to) view.to = '';
  view.sort = oneOf(RECORDING_SORTS, params.get('sort')) ?? DEFAULT_VIEW.sort;
  view.page = positiveInt(params.get('page'), 1, 100_000);
  view.pageSize = positiveInt(params.get('pageSize'), DEFAULT_VIEW.pageSize, MAX_PAGE_SIZE);
  return view;
}

/** The query string of a view, leaving out what equals the default so links stay short. */
export function searchFromView(view: RecordingView): URLSearchParams {
  const params = new URLSearchParams();
  for (const key of ['q', 'event', 'kind', 'alliance', 'tag', 'from', 'to'] as const) {
    const value = view[key].trim();
    if (value) params.set(key, value);
  }
  if (view.sort !== DEFAULT_VIEW.sort) params.set('sort', view.sort);
  if (view.page !== 1) params.set('page', String(view.page));
  if (view.pageSize !== DEFAULT_VIEW.pageSize) params.set('pageSize', String(view.pageSize));
  return params;
}

/** The query string for `GET /api/recordings`: the view with sort, page and page size always given. */
export function apiSearchFromView(view: RecordingView): string {
  const params = searchFromView(view);
  params.set('sort', view.sort);
  params.set('page', String(view.page));
  params.set('pageSize', String(view.pageSize));
  return params.toString();
}

/** Changes filters; any change of what is shown goes back to the first page. */
export function withFilters(view: RecordingView, patch: Partial<Omit<RecordingView, 'page' | 'sort'>>): RecordingView {
  return { ...view, ...patch, page: 1 };
}

/** Clicking a column header: a new column sorts its natural way first, the same column flips. */
export function toggleSort(view: RecordingView, field: SortField): RecordingView {
  const current = sortState(view.sort, field);
  const firstDirection = field === 'startedAt' || field === 'durationS' ? 'descending' : 'ascending';
  const next = current === 'none' ? firstDirection : current === 'ascending' ? 'descending' : 'ascending';
  const sort = (next === 'descending' ? `-${field}` : field) as RecordingSort;
  return { ...view, sort, page: 1 };
}

/** How `field` is sorted, in the words of `aria-sort`. */
export function sortState(sort: RecordingSort, field: SortField): 'ascending' | 'descending' | 'none' {
  if (sort === field) return 'ascending';
  if (sort === `-${field}`) return 'descending';
  return 'none';
}

/** How many filters narrow the list (the search box counts as one). */
export function activeFilterCount(view: RecordingView): number {
  return (['q', 'event', 'kind', 'alliance', 'tag', 'from', 'to'] as const).filter((k) => view[k].trim() !== '').length;
}

export function pageCount(total: number, pageSize: number): number {
  return Math.max(1, Math.ceil(total / pageSize));
}

/** "26–50 of 61", or "None" for an empty list. */
export function rangeLabel(page: number, pageSize: number, total: number): string {
  if (total === 0) return 'None';
  const first = (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return `${first}–${last} of ${total}`;
}
