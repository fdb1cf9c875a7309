import { max, min } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import {
  adjacentMark,
  advanceCursor,
  alignSeries,
  closestIndex,
  downsampleMinMax,
  followWindow,
  liveWindow,
  formatMoment,
  indexAtOrBefore,
  nextSpeed,
  parseMoment,
  stepTicks,
  valueAt,
} from './timeline';

/** A 50 Hz series of n samples from a deterministic wobble with a few spikes. */
function wobble(n: number): { tS: number[]; values: number[] } {
  const tS: number[] = [];
  const values: number[] = [];
  for (let i = 0; i < n; i++) {
    tS.push(i * 0.02);
    values.push(Math.sin(i / 37) * 3 + Math.sin(i / 5.3) + (i % 997 === 0 ? 40 : 0) - (i % 1511 === 0 ? 25 : 0));
  }
  return { tS, values };
}

describe('closestIndex', () => {
  const times = [0, 0.02, 0.04, 0.1];
  it.each([
    [-5, 0],
    [0, 0],
    [0.011, 1],
    [0.01, 0],
    [0.069, 2],
    [0.071, 3],
    [99, 3],
  ])('finds the sample nearest %f at index %i', (t, i) => {
    expect(closestIndex(times, t)).toBe(i);
  });
  it('answers -1 for no samples', () => {
    expect(closestIndex([], 3)).toBe(-1);
  });
});

describe('indexAtOrBefore', () => {
  it('finds the sample holding at a time, and -1 before the first', () => {
    expect(indexAtOrBefore([1, 2, 3], 0.5)).toBe(-1);
    expect(indexAtOrBefore([1, 2, 3], 2)).toBe(1);
    expect(indexAtOrBefore([1, 2, 3], 2.9)).toBe(1);
    expect(indexAtOrBefore([1, 2, 3], 10)).toBe(2);
  });
  it('gives the value holding at the cursor', () => {
    expect(valueAt({ tS: [1, 2], values: [5, null] }, 1.5)).toBe(5);
    expect(valueAt({ tS: [1, 2], values: [5, null] }, 2.5)).toBeNull();
    expect(valueAt({ tS: [1, 2], values: [5, 6] }, 0)).toBeNull();
  });
});

describe('downsampleMinMax', () => {
  it.each([9_000, 180_000])('keeps every bucket’s min and max and the first and last points of %i samples', (n) => {
    const s = wobble(n);
    const buckets = 400;
    const out = downsampleMinMax(s, buckets);
    expect(out.tS.length).toBeLessThanOrEqual(2 * buckets + 2);
    expect(out.tS[0]).toBe(s.tS[0]);
    expect(out.tS.at(-1)).toBe(s.tS.at(-1));
    expect(out.values[0]).toBe(s.values[0]);
    expect(out.values.at(-1)).toBe(s.values.at(-1));
    // Times stay ascending so uPlot can draw them.
    for (let i = 1; i < out.tS.length; i++) expect(out.tS[i]).toBeGreaterThan(out.tS[i - 1]!);
    // The extremes checked against a direct computation with simple-statistics' min and max.
    const kept = out.values.filter((v): v is number => v !== null);
    expect(min(kept)).toBe(min(s.values));
    expect(max(kept)).toBe(max(s.values));
    // And per bucket: every bucket's own extremes are among the kept points.
    const span = s.tS.at(-1)! - s.tS[0]!;
    for (let b = 0; b < buckets; b += 37) {
      const lo = (span * b) / buckets;
      const hi = (span * (b + 1)) / buckets;
      const inBucket = s.values.filter((_, i) => i > 0 && i < n - 1 && s.tS[i]! >= lo && s.tS[i]! < hi);
      if (inBucket.length === 0) continue;
      const keptInBucket = out.values.filter((_, i) => out.tS[i]! >= lo && out.tS[i]! < hi) as number[];
      expect(keptInBucket).toContain(min(inBucket));
      expect(keptInBucket).toContain(max(inBucket));
    }
  });

  it('returns a short series as it is', () => {
    const s = { tS: [0, 1, 2], values: [3, null, 5] };
    expect(downsampleMinMax(s, 10)).toEqual({ tS: [0, 1, 2], values: [3, null, 5] });
  });

  it('downsamples only the samples inside a window, both ends included', () => {
    const s = wobble(10_000);
    const out = downsampleMinMax(s, 50, { fromS: 20, toS: 40 });
    expect(out.tS[0]).toBeCloseTo(20);
    expect(out.tS.at(-1)).toBeCloseTo(40);
    expect(out.tS.length).toBeLessThanOrEqual(102);
  });

  it('keeps a gap of nulls as a null', () => {
    const tS = Array.from({ length: 1000 }, (_, i) => i);
    const values = tS.map((t) => (t >= 400 && t < 600 ? null : t));
    const out = downsampleMinMax({ tS, values }, 10);
    expect(out.values).toContain(null);
    expect(out.values).toContain(399);
    expect(out.values).toContain(600);
  });

  it('answers nothing for an empty window', () => {
    expect(downsampleMinMax({ tS: [1, 2], values: [1, 2] }, 10, { fromS: 5, toS: 6 })).toEqual({ tS: [], values: [] });
  });
});

describe('alignSeries', () => {
  it('puts several series on one time column with nulls where a series has no sample', () => {
    const a = { tS: [0, 1, 2], values: [10, 11, 12] };
    const b = { tS: [1, 1.5, 3], values: [20, null, 23] };
    expect(alignSeries([a, b])).toEqual([
      [0, 1, 1.5, 2, 3],
      [10, 11, null, 12, null],
      [null, 20, null, null, 23],
    ]);
  });
  it('leaves series on the same ticks untouched', () => {
    const a = { tS: [0, 0.02], values: [1, 2] };
    expect(alignSeries([a, a])).toEqual([[0, 0.02], [1, 2], [1, 2]]);
  });
  it('answers only an empty time column for no series', () => {
    expect(alignSeries([])).toEqual([[]]);
  });
});

describe('playback clock', () => {
  it('advances by wall time times speed and stops at the end', () => {
    expect(advanceCursor(10, 500, 2, 150).tS).toBeCloseTo(11);
    expect(advanceCursor(10, 1000, 0.25, 150).tS).toBeCloseTo(10.25);
    expect(advanceCursor(149.9, 1000, 1, 150)).toEqual({ tS: 150, hasEnded: true });
  });
  it('steps one tick on the 20 ms grid and stays inside the recording', () => {
    expect(stepTicks(1.005, 1, 150)).toBeCloseTo(1.02);
    expect(stepTicks(1, -1, 150)).toBeCloseTo(0.98);
    expect(stepTicks(0, -1, 150)).toBe(0);
    expect(stepTicks(150, 1, 150)).toBe(150);
  });
  it('finds the next and the previous mark, moving on from one it sits on', () => {
    const marks = [1, 5, 9];
    expect(adjacentMark(marks, 5, 1)).toBe(9);
    expect(adjacentMark(marks, 5, -1)).toBe(1);
    expect(adjacentMark(marks, 9.5, 1)).toBeNull();
    expect(adjacentMark(marks, 0.5, -1)).toBeNull();
  });
  it('moves along the speed ladder and stays at its ends', () => {
    expect(nextSpeed(1, 1)).toBe(2);
    expect(nextSpeed(4, 1)).toBe(4);
    expect(nextSpeed(0.25, -1)).toBe(0.25);
    expect(nextSpeed(1, -1)).toBe(0.5);
  });
  it('reads and writes the moment of a link', () => {
    expect(parseMoment('93.2', 150)).toBeCloseTo(93.2);
    expect(parseMoment('900', 150)).toBe(150);
    expect(parseMoment('soon', 150)).toBeNull();
    expect(parseMoment(null, 150)).toBeNull();
    expect(formatMoment(93.2000001)).toBe('93.2');
    expect(formatMoment(12)).toBe('12');
  });
  it('pages the visible window when the cursor leaves it', () => {
    const w = { fromS: 10, toS: 20 };
    expect(followWindow(w, 15, 150)).toBe(w);
    const next = followWindow(w, 25, 150);
    expect(next.fromS).toBeCloseTo(24);
    expect(next.toS).toBeCloseTo(34);
    expect(followWindow(w, 149, 150)).toEqual({ fromS: 140, toS: 150 });
  });
});

describe('liveWindow', () => {
  it('shows the last 30 s of a growing recording, or all of a shorter one', () => {
    expect(liveWindow(95.5)).toEqual({ fromS: 65.5, toS: 95.5 });
    expect(liveWindow(12)).toEqual({ fromS: 0, toS: 12 });
    expect(liveWindow(0)).toEqual({ fromS: 0, toS: 0.02 });
    expect(liveWindow(50, 10)).toEqual({ fromS: 40, toS: 50 });
  });
});
