import { describe, expect, it } from 'vitest';
import { barPercent, cycleIndexAt, formatClock, matchShort, replayLink, segmentColumns, targetLabel, trendColumns } from './cycles-view';

describe('segmentColumns', () => {
  it('stacks the segments as running sums, longest first, and shows an unsplit cycle only as its duration', () => {
    const cycles = [
      { durationS: 6, segments: { acquireS: 2.5, travelS: 2, alignS: 1, placeS: 0.5 } },
      { durationS: 4, segments: { acquireS: 1, travelS: null, alignS: null, placeS: null } },
    ];
    expect(segmentColumns(cycles)).toEqual([[1, 2], [6, 4], [6, null], [5.5, null], [4.5, null], [2.5, null]]);
  });
});

describe('cycleIndexAt', () => {
  const cycles = [{ startS: 0, endS: 3 }, { startS: 3, endS: 9 }, { startS: 12, endS: 15 }];
  it.each([
    [0, 0],
    [2.99, 0],
    [3, 1],
    [10, null],
    [15, null],
  ])('at %f s is cycle %s', (tS, index) => {
    expect(cycleIndexAt(cycles, tS)).toBe(index);
  });
});

describe('labels', () => {
  it('names targets, matches, moments and links', () => {
    expect(targetLabel({ branch: 'C', level: 'L4', algae: null })).toBe('C · L4');
    expect(targetLabel({ branch: null, level: null, algae: 'net' })).toBe('Net');
    expect(targetLabel({ branch: null, level: null, algae: null })).toBe('—');
    expect(matchShort({ matchType: 'qualification', matchNumber: 7 })).toBe('Q7');
    expect(matchShort({ matchType: null, matchNumber: null })).toBeNull();
    expect(formatClock(83.04)).toBe('1:23.0');
    expect(formatClock(9.96)).toBe('0:10.0');
    expect(replayLink('abc', 93.204)).toBe('/recordings/abc?t=93.2');
  });
});

describe('trendColumns and barPercent', () => {
  it('lines matches up by number with nulls for none', () => {
    const matches = [{ cycleTime: { count: 2, medianS: 5, p90S: 6, meanS: 5 } }, { cycleTime: { count: 0, medianS: null, p90S: null, meanS: null } }];
    expect(trendColumns(matches)).toEqual([[1, 2], [5, null], [6, null]]);
    expect(barPercent(3, 12)).toBe(25);
    expect(barPercent(null, 12)).toBe(0);
    expect(barPercent(5, 0)).toBe(0);
  });
});
