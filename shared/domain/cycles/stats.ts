// Pure: imports only shared files. Order statistics for cycle times.
import type { DurationStats } from '../../schemas/cycle';

/**
 * The p-quantile (0 ≤ p ≤ 1) of ascending values by linear interpolation between closest ranks — R's type 7,
 * numpy's default and SQL's percentile_cont; null for no values.
 */
export function quantileSorted(sorted: readonly number[], p: number): number | null {
  if (sorted.length === 0) return null;
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile p must be within [0, 1], got ${p}`);
  const at = (sorted.length - 1) * p;
  const lower = Math.floor(at);
  const upper = Math.ceil(at);
  const low = sorted[lower]!;
  return low + (at - lower) * (sorted[upper]! - low);
}

/** Count, median, p90 and mean of durations in seconds (any order); nulls when there are none. */
export function durationStats(values: readonly number[]): DurationStats {
  const sorted = [...values].sort((a, b) => a - b);
  const sum = sorted.reduce((s, v) => s + v, 0);
  return {
    count: sorted.length,
    medianS: quantileSorted(sorted, 0.5),
    p90S: quantileSorted(sorted, 0.9),
    meanS: sorted.length === 0 ? null : sum / sorted.length,
  };
}
