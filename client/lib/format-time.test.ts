import { describe, expect, it } from 'vitest';
import { formatDate, formatDateTime, formatRelative } from './format-time';

const now = Date.parse('2025-03-14T16:00:00Z');

describe('formatRelative', () => {
  it.each([
    ['2025-03-14T15:59:40Z', 'just now'],
    ['2025-03-14T15:55:00Z', '5 minutes ago'],
    ['2025-03-14T13:00:00Z', '3 hours ago'],
    ['2025-03-13T16:00:00Z', 'yesterday'],
    ['2025-03-21T16:00:00Z', 'next week'],
    ['2025-03-20T16:00:00Z', 'in 6 days'],
    ['2025-03-14T17:00:00+01:00', 'just now'],
  ])('formats %s as "%s"', (iso, expected) => {
    expect(formatRelative(iso, now)).toBe(expected);
  });

  it('shows a dash for a date it cannot read', () => {
    expect(formatRelative('not a date', now)).toBe('—');
  });
});

describe('formatDateTime', () => {
  it('formats date and time in the given zone', () => {
    expect(formatDateTime('2025-03-14T16:05:00Z', 'UTC')).toBe('Mar 14, 2025, 4:05 PM');
  });
});

describe('formatDate', () => {
  it('formats the day only', () => {
    expect(formatDate('2025-03-14T23:30:00-05:00', 'UTC')).toBe('Mar 15, 2025');
  });
});
