import { describe, expect, it } from 'vitest';
import { activeReviewFilters, EMPTY_REVIEW, reviewViewFromSearch, searchFromReviewView } from './review-query';

describe('reviewViewFromSearch', () => {
  it('reads every filter from the address', () => {
    const search = new URLSearchParams('event=Lakeshore+District+Event&from=2025-03-14&to=2025-03-15&kind=simulated&operator=Tomas+Reyes');
    expect(reviewViewFromSearch(search)).toEqual({ event: 'Lakeshore District Event', from: '2025-03-14', to: '2025-03-15', kind: 'simulated', operator: 'Tomas Reyes' });
  });
  it('drops an unknown kind and malformed dates, and swaps a reversed range', () => {
    expect(reviewViewFromSearch(new URLSearchParams('kind=scrimmage&from=14/03/2025'))).toEqual(EMPTY_REVIEW);
    expect(reviewViewFromSearch(new URLSearchParams('from=2025-03-15&to=2025-03-14'))).toMatchObject({ from: '2025-03-14', to: '2025-03-15' });
  });
});

describe('searchFromReviewView', () => {
  it('writes only the filters that are set, and reads back the same view', () => {
    const view = { ...EMPTY_REVIEW, event: 'Lakeshore District Event', kind: 'match' as const };
    const search = searchFromReviewView(view);
    expect(search.toString()).toBe('event=Lakeshore+District+Event&kind=match');
    expect(reviewViewFromSearch(search)).toEqual(view);
    expect(activeReviewFilters(view)).toBe(2);
  });
});
