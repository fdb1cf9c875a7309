import { mean, median, quantile } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { durationStats, quantileSorted } from './stats';

const SAMPLES: number[][] = [
  [5.2],
  [6.1, 4.8],
  [3, 14, 5, 4],
  [6.86, 5.7, 5.38, 5.2, 3.14, 5.94, 3.12, 6.14, 6.56, 6.88, 6.06],
  [2.74, 2.74, 2.74, 9.5, 3.3, 7.25, 6.04, 5.5, 8.32, 5.66, 4.4, 3.9, 6.2, 7.7],
];

describe('durationStats', () => {
  // Checked against simple-statistics 7.12 (npm): median, mean, and quantile, which implements R's type 7 linear
  // interpolation — the same definition as SQL percentile_cont.
  it.each(SAMPLES.map((s) => [s.length, s] as const))('agrees with simple-statistics on %i values', (_n, values) => {
    const stats = durationStats(values);
    expect(stats.count).toBe(values.length);
    expect(stats.medianS).toBeCloseTo(median(values), 12);
    expect(stats.p90S).toBeCloseTo(quantile(values, 0.9), 12);
    expect(stats.meanS).toBeCloseTo(mean(values), 12);
  });

  it('gives nulls for no values', () => {
    expect(durationStats([])).toEqual({ count: 0, medianS: null, p90S: null, meanS: null });
  });

  it('does not reorder its input', () => {
    const values = [3, 1, 2];
    durationStats(values);
    expect(values).toEqual([3, 1, 2]);
  });
});

describe('quantileSorted', () => {
  it('matches the worked example in the simple-statistics documentation', () => {
    // simple-statistics' quantileSorted doc comment: [3, 6, 7, 8, 8, 9, 10, 13, 15, 16, 20] at 0.5 gives 9.
    expect(quantileSorted([3, 6, 7, 8, 8, 9, 10, 13, 15, 16, 20], 0.5)).toBe(9);
  });
  it.each([0, 0.25, 0.9, 1])('agrees with simple-statistics at p = %f', (p) => {
    const sorted = [1, 2, 4, 8, 16, 32];
    expect(quantileSorted(sorted, p)).toBeCloseTo(quantile(sorted, p), 12);
  });
  it('refuses p outside [0, 1]', () => {
    expect(() => quantileSorted([1], 1.5)).toThrow(RangeError);
  });
});
