// Pure: the coach review's filters and the URL that keeps them.
import { RECORDING_KINDS } from '../../../../shared/schemas/recording';

export type ReviewView = {
  event: string;
  from: string;
  to: string;
  kind: '' | (typeof RECORDING_KINDS)[number];
  operator: string;
};

export const EMPTY_REVIEW: ReviewView = { event: '', from: '', to: '', kind: '', operator: '' };
const KEYS = ['event', 'from', 'to', 'kind', 'operator'] as const;
const DATE = /^\d{4}-\d{2}-\d{2}$/;

/** The filters in an address; unknown kinds and malformed dates are dropped, a reversed range is swapped. */
export function reviewViewFromSearch(search: URLSearchParams): ReviewView {
  const text = (key: string, max: number) => (search.get(key) ?? '').trim().slice(0, max);
  const date = (key: string) => (DATE.test(search.get(key) ?? '') ? search.get(key)! : '');
  const kind = RECORDING_KINDS.find((k) => k === search.get('kind')) ?? '';
  let from = date('from');
  let to = date('to');
  if (from && to && from > to) [from, to] = [to, from];
  return { event: text('event', 120), from, to, kind, operator: text('operator', 80) };
}

/** The address's query for a view: only the filters that are set, in a fixed order. */
export function searchFromReviewView(view: ReviewView): URLSearchParams {
  const out = new URLSearchParams();
  for (const key of KEYS) if (view[key]) out.set(key, view[key]);
  return out;
}

/** The API's query for a view (the same names as the address). */
export const reviewApiSearch = (view: ReviewView): string => searchFromReviewView(view).toString();

export const activeReviewFilters = (view: ReviewView): number => KEYS.filter((k) => view[k] !== '').length;

