import { describe, expect, it } from 'vitest';
import {
  activeFilterCount,
  apiSearchFromView,
  DEFAULT_VIEW,
  pageCount,
  rangeLabel,
  searchFromView,
  sortState,
  toggleSort,
  viewFromSearch,
  withFilters,
} from './list-query';

const parse = (qs: string) => viewFromSearch(new URLSearchParams(qs));

describe('viewFromSearch', () => {
  it('gives the default view for an empty query string', () => {
    expect(parse('')).toEqual(DEFAULT_VIEW);
  });

  it('reads every filter, the sort and the page', () => {
    expect(parse('q=reef&event=Lakeshore&kind=match&alliance=red&tag=brownout&from=2025-03-01&to=2025-03-02&sort=durationS&page=3&pageSize=50')).toEqual({
      q: 'reef',
      event: 'Lakeshore',
      kind: 'match',
      alliance: 'red',
      tag: 'brownout',
      from: '2025-03-01',
      to: '2025-03-02',
      sort: 'durationS',
      page: 3,
      pageSize: 50,
    });
  });

  it('drops what the server would refuse instead of breaking the page', () => {
    const view = parse('kind=scrimmage&alliance=green&sort=robot&page=0&pageSize=500&from=March');
    expect(view).toEqual(DEFAULT_VIEW);
  });

  it('drops a "to" day before the "from" day', () => {
    expect(parse('from=2025-03-05&to=2025-03-01')).toMatchObject({ from: '2025-03-05', to: '' });
  });

  it('does not read "1.5" or "2abc" as a page', () => {
    expect(parse('page=1.5').page).toBe(1);
    expect(parse('page=2abc').page).toBe(1);
  });
});

describe('searchFromView', () => {
  it('leaves defaults out so a plain link stays plain', () => {
    expect(searchFromView(DEFAULT_VIEW).toString()).toBe('');
  });

  it('round-trips through the query string', () => {
    const view = { ...DEFAULT_VIEW, q: 'L4 miss', kind: 'practice' as const, sort: 'event' as const, page: 2 };
    expect(viewFromSearch(searchFromView(view))).toEqual(view);
  });

  it('trims filters and leaves blank ones out', () => {
    expect(searchFromView({ ...DEFAULT_VIEW, event: '  Lakeshore ', tag: '   ' }).toString()).toBe('event=Lakeshore');
  });
});

describe('apiSearchFromView', () => {
  it('always names sort, page and page size for the API', () => {
    expect(apiSearchFromView(DEFAULT_VIEW)).toBe('sort=-startedAt&page=1&pageSize=25');
  });
});

describe('sorting', () => {
  it('sorts a new time column newest first, a new text column A to Z', () => {
    expect(toggleSort(DEFAULT_VIEW, 'durationS').sort).toBe('-durationS');
    expect(toggleSort(DEFAULT_VIEW, 'event').sort).toBe('event');
  });

  it('flips the column already sorted, and goes back to page 1', () => {
    const view = { ...DEFAULT_VIEW, page: 4 };
    expect(toggleSort(view, 'startedAt')).toMatchObject({ sort: 'startedAt', page: 1 });
    expect(toggleSort({ ...view, sort: 'matchNumber' }, 'matchNumber').sort).toBe('-matchNumber');
  });

  it('states the sort as aria-sort does', () => {
    expect(sortState('-startedAt', 'startedAt')).toBe('descending');
    expect(sortState('event', 'event')).toBe('ascending');
    expect(sortState('event', 'durationS')).toBe('none');
  });
});

describe('filters and paging', () => {
  it('goes back to the first page when a filter changes', () => {
    expect(withFilters({ ...DEFAULT_VIEW, page: 5 }, { kind: 'drill' })).toMatchObject({ kind: 'drill', page: 1 });
  });

  it('counts the filters in use', () => {
    expect(activeFilterCount(DEFAULT_VIEW)).toBe(0);
    expect(activeFilterCount({ ...DEFAULT_VIEW, q: 'x', from: '2025-03-01', alliance: 'blue' })).toBe(3);
  });

  it('counts pages and labels the range shown', () => {
    expect(pageCount(0, 25)).toBe(1);
    expect(pageCount(51, 25)).toBe(3);
    expect(rangeLabel(1, 25, 0)).toBe('None');
    expect(rangeLabel(3, 25, 61)).toBe('51–61 of 61');
  });
});
