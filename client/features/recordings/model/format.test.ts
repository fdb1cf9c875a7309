import { describe, expect, it } from 'vitest';
import { formatBytes, formatDuration, matchLabel, percentOf, stationLabel } from './format';

describe('formatDuration', () => {
  it('shows tenths under ten seconds', () => {
    expect(formatDuration(0)).toBe('0.0 s');
    expect(formatDuration(4.27)).toBe('4.2 s');
  });

  it('shows minutes and seconds, then hours', () => {
    expect(formatDuration(10)).toBe('0:10');
    expect(formatDuration(153.9)).toBe('2:33');
    expect(formatDuration(3600 + 62)).toBe('1:01:02');
  });

  it('shows a dash for nonsense', () => {
    expect(formatDuration(-1)).toBe('—');
    expect(formatDuration(Number.NaN)).toBe('—');
  });
});

describe('matchLabel', () => {
  it('names the type and number', () => {
    expect(matchLabel({ matchType: 'qualification', matchNumber: 7 })).toEqual({ long: 'Qualification 7', short: 'Q7' });
    expect(matchLabel({ matchType: 'playoff', matchNumber: 2 })).toEqual({ long: 'Playoff 2', short: 'PO2' });
  });

  it('says what is known when half is missing', () => {
    expect(matchLabel({ matchType: 'practice', matchNumber: null })).toEqual({ long: 'Practice', short: 'P' });
    expect(matchLabel({ matchType: null, matchNumber: 12 })).toEqual({ long: 'Match 12', short: '#12' });
  });

  it('is null when nothing is known', () => {
    expect(matchLabel({ matchType: null, matchNumber: null })).toBeNull();
  });
});

describe('stationLabel', () => {
  it('names alliance and station', () => {
    expect(stationLabel({ alliance: 'blue', station: 2 })).toBe('Blue 2');
    expect(stationLabel({ alliance: 'red', station: null })).toBe('Red');
    expect(stationLabel({ alliance: null, station: 3 })).toBeNull();
  });
});

describe('transfer sizes', () => {
  it('formats bytes', () => {
    expect(formatBytes(812)).toBe('812 B');
    expect(formatBytes(14_321)).toBe('14.3 KB');
    expect(formatBytes(2_100_000)).toBe('2.1 MB');
  });

  it('clamps the percent and survives an unknown total', () => {
    expect(percentOf(50, 200)).toBe(25);
    expect(percentOf(300, 200)).toBe(100);
    expect(percentOf(10, 0)).toBe(0);
  });
});
