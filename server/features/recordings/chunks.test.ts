import { describe, expect, it } from 'vitest';
import { groupForMerge, joinTimes, mergeChunks, packColumns, packTimes, planRuns, runChunks, sliceSamples, unpackTimes, type DecodedBatch } from './chunks';

const bitsOf = (f: Float32Array) => [...new Uint32Array(f.buffer, f.byteOffset, f.length)];

function batch(seq: number, t0Ms: number, dtMs: number, rows: number[][]): DecodedBatch {
  return { seq, t0Ms, dtMs, rows: rows.map((r) => Float32Array.from(r)) };
}

describe('packColumns', () => {
  it('transposes rows into little-endian float32 columns', () => {
    const [a, b] = packColumns([Float32Array.from([1.5, 0]), Float32Array.from([2, 1])], 2);
    expect([...a!]).toEqual([0x00, 0x00, 0xc0, 0x3f, 0x00, 0x00, 0x00, 0x40]);
    expect([...b!]).toEqual([0, 0, 0, 0, 0x00, 0x00, 0x80, 0x3f]);
  });

  it('keeps the bits of a NaN payload and of negative zero', () => {
    const row = new Float32Array(2);
    new Uint32Array(row.buffer).set([0x7fc00123, 0x80000000]);
    const chunks = runChunks({ firstSeq: 0, t0Ms: 0, dtMs: 20, ticks: 1, timesMs: null, rows: [row] }, 2);
    expect(bitsOf(sliceSamples([chunks[0]!], 0).values)).toEqual([0x7fc00123]);
    expect(bitsOf(sliceSamples([chunks[1]!], 0).values)).toEqual([0x80000000]);
  });

  it('refuses a row of the wrong width', () => {
    expect(() => packColumns([new Float32Array(3)], 2)).toThrow(/expected 2/);
  });
});

describe('joinTimes', () => {
  it('stays evenly spaced when each part continues the last exactly', () => {
    const joined = joinTimes([
      { t0Ms: 100, dtMs: 20, ticks: 5, timesMs: null },
      { t0Ms: 200, dtMs: 20, ticks: 5, timesMs: null },
    ]);
    expect(joined).toEqual({ t0Ms: 100, dtMs: 20, ticks: 10, timesMs: null });
  });

  it('spells out the times after a gap', () => {
    const joined = joinTimes([
      { t0Ms: 0, dtMs: 20, ticks: 2, timesMs: null },
      { t0Ms: 100, dtMs: 20, ticks: 2, timesMs: null },
    ]);
    expect([...joined.timesMs!]).toEqual([0, 20, 100, 120]);
  });
});

describe('planRuns', () => {
  it('groups consecutive batches up to the tick limit', () => {
    const batches = [0, 1, 2, 3, 4].map((i) => batch(i * 2, i * 100, 20, [[i], [i], [i], [i], [i]]));
    const runs = planRuns(batches, 10);
    expect(runs.map((r) => [r.firstSeq, r.ticks, r.t0Ms])).toEqual([
      [0, 10, 0],
      [4, 10, 200],
      [8, 5, 400],
    ]);
  });

  it('keeps a batch larger than the limit whole', () => {
    expect(planRuns([batch(0, 0, 20, [[1], [2], [3]])], 2).map((r) => r.ticks)).toEqual([3]);
  });
});

describe('mergeChunks', () => {
  it('concatenates values and joins times', () => {
    const runs = planRuns([batch(0, 0, 20, [[1], [2]]), batch(1, 40, 20, [[3]]), batch(2, 500, 20, [[4]])], 1);
    const chunks = runs.map((r) => runChunks(r, 1)[0]!);
    const merged = mergeChunks(chunks);
    expect(merged.firstSeq).toBe(0);
    expect([...sliceSamples([merged], 0).values]).toEqual([1, 2, 3, 4]);
    expect([...sliceSamples([merged], 0).tS]).toEqual([0, 0.02, 0.04, 0.5]);
  });
});

describe('groupForMerge', () => {
  it('fills groups up to the tick limit in order', () => {
    const chunk = (firstSeq: number, ticks: number) => ({ firstSeq, t0Ms: 0, dtMs: 20, ticks, timesMs: null, values: new Uint8Array(ticks * 4) });
    const groups = groupForMerge([chunk(0, 4), chunk(1, 4), chunk(2, 4), chunk(3, 1)], 8);
    expect(groups.map((g) => g.map((c) => c.firstSeq))).toEqual([[0, 1], [2, 3]]);
  });
});

describe('sliceSamples', () => {
  it('returns seconds from the origin within the inclusive range', () => {
    const [chunk] = runChunks(planRuns([batch(0, 1000, 20, [[1], [2], [3], [4]])])[0]!, 1);
    const s = sliceSamples([chunk!], 1000, { fromS: 0.02, toS: 0.04 });
    expect([...s.tS]).toEqual([0.02, 0.04]);
    expect([...s.values]).toEqual([2, 3]);
  });
});

describe('packTimes', () => {
  it('round-trips float64 times', () => {
    const t = Float64Array.from([0.1, 12345.678901, -3]);
    expect([...unpackTimes(packTimes(t))]).toEqual([...t]);
  });
});
