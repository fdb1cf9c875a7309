import { mean, median, min, quantile } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { seededRandom } from './drill-calls';
import { newBests, personalBests, quantileSorted, runStats, scoreCall, scoreRun, type DrillCallRecord, type RunSummary } from './drill-scoring';

const tap = (part: 'branch' | 'level' | 'station', value: string, tMs: number) => ({ part, value, tMs });

describe('scoreCall', () => {
  it('times the call to the tap that completes the selection, branch and level both right', () => {
    const record: DrillCallRecord = { call: { branch: 'C', level: 'L4' }, shownAtMs: 1000, taps: [tap('level', 'L4', 1600), tap('branch', 'C', 1850)] };
    expect(scoreCall(record, 5000)).toEqual({ call: record.call, shownAtMs: 1000, reactionMs: 850, errors: 0, isMiss: false });
  });

  it('counts wrong taps before the right one, including a part the call does not ask for', () => {
    const record: DrillCallRecord = {
      call: { branch: 'C', level: 'L4' },
      shownAtMs: 0,
      taps: [tap('branch', 'D', 400), tap('station', 'left', 500), tap('branch', 'C', 700), tap('level', 'L3', 800), tap('level', 'L4', 1100)],
    };
    expect(scoreCall(record, 5000)).toMatchObject({ reactionMs: 1100, errors: 3, isMiss: false });
  });

  it('needs every part right at once: a wrong level after the right one undoes it', () => {
    const record: DrillCallRecord = {
      call: { branch: 'H', level: 'L2' },
      shownAtMs: 0,
      taps: [tap('level', 'L2', 300), tap('level', 'L3', 500), tap('branch', 'H', 700), tap('level', 'L2', 900)],
    };
    expect(scoreCall(record, 5000)).toMatchObject({ reactionMs: 900, errors: 1 });
  });

  it('reads taps in time order whatever order they arrive in', () => {
    const record: DrillCallRecord = { call: { branch: 'A', level: 'L1' }, shownAtMs: 0, taps: [tap('branch', 'A', 900), tap('level', 'L1', 400)] };
    expect(scoreCall(record, 5000).reactionMs).toBe(900);
  });

  it('calls it a miss with no answer within the window, and ignores taps after it and before the call', () => {
    const record: DrillCallRecord = {
      call: { station: 'left' },
      shownAtMs: 2000,
      taps: [tap('station', 'left', 1900), tap('station', 'right', 2500), tap('station', 'left', 6001)],
    };
    expect(scoreCall(record, 4000)).toEqual({ call: record.call, shownAtMs: 2000, reactionMs: null, errors: 1, isMiss: true });
    expect(scoreCall({ ...record, taps: [tap('station', 'left', 6000)] }, 4000).reactionMs).toBe(4000);
  });

  it('ignores taps after the answer', () => {
    const record: DrillCallRecord = { call: { level: 'L3' }, shownAtMs: 0, taps: [tap('level', 'L3', 500), tap('level', 'L1', 600)] };
    expect(scoreCall(record, 3000)).toMatchObject({ reactionMs: 500, errors: 0 });
  });
});

describe('quantileSorted', () => {
  it('interpolates between closest ranks', () => {
    // Worked by hand: index (4 − 1) · 0.9 = 2.7 → 300 + 0.7 · (400 − 300) = 370.
    expect(quantileSorted([100, 200, 300, 400], 0.9)).toBeCloseTo(370, 9);
    expect(quantileSorted([5], 0.9)).toBe(5);
    expect(quantileSorted([], 0.5)).toBeUndefined();
  });

  it('agrees with simple-statistics quantile() on random samples', () => {
    const random = seededRandom(19850);
    for (let n = 1; n <= 40; n++) {
      const sample = Array.from({ length: n }, () => Math.round(300 + random() * 2400));
      const sorted = [...sample].sort((a, b) => a - b);
      for (const p of [0, 0.1, 0.5, 0.9, 0.95, 1]) {
        // Reference: simple-statistics quantile(), linear interpolation (numpy "linear", R type 7).
        expect(quantileSorted(sorted, p)).toBeCloseTo(quantile(sample, p), 9);
      }
    }
  });
});

describe('runStats', () => {
  it('gives count, misses, errors, accuracy and the answered calls’ median and p90', () => {
    const records: DrillCallRecord[] = [
      { call: { branch: 'A', level: 'L4' }, shownAtMs: 0, taps: [tap('branch', 'A', 700), tap('level', 'L4', 1200)] },
      { call: { branch: 'B', level: 'L4' }, shownAtMs: 4000, taps: [tap('branch', 'C', 4500), tap('branch', 'B', 4900), tap('level', 'L4', 5600)] },
      { call: { station: 'left' }, shownAtMs: 8000, taps: [] },
      { call: { level: 'L2' }, shownAtMs: 12_000, taps: [tap('level', 'L2', 12_950)] },
      { call: { branch: 'G', level: 'L3' }, shownAtMs: 16_000, taps: [tap('level', 'L3', 16_800), tap('branch', 'G', 17_400)] },
    ];
    const scored = scoreRun(records, 4000);
    const stats = runStats(scored);
    const times = [1200, 1600, 950, 1400];
    expect(scored.map((s) => s.reactionMs)).toEqual([1200, 1600, null, 950, 1400]);
    expect(stats).toMatchObject({ callCount: 5, answeredCount: 4, missCount: 1, errorCount: 1, cleanCount: 3, accuracy: 0.6 });
    // Reference: simple-statistics median(), quantile(…, 0.9), mean() and min() over the answered times.
    expect(stats.medianMs).toBeCloseTo(median(times), 9);
    expect(stats.p90Ms).toBeCloseTo(quantile(times, 0.9), 9);
    expect(stats.meanMs).toBeCloseTo(mean(times), 9);
    expect(stats.fastestMs).toBe(min(times));
  });

  it('has no times for a run of misses, and accuracy 0 for no calls', () => {
    expect(runStats(scoreRun([{ call: { branch: 'A' }, shownAtMs: 0, taps: [] }], 3000))).toMatchObject({
      answeredCount: 0,
      missCount: 1,
      medianMs: null,
      p90Ms: null,
      fastestMs: null,
      accuracy: 0,
    });
    expect(runStats([]).accuracy).toBe(0);
  });
});

describe('personalBests', () => {
  const run = (id: string, operatorId: string, finishedAt: string, medianMs: number | null, fastestMs: number | null, accuracy: number, answeredCount = 10): RunSummary => ({
    id,
    operatorId,
    drillId: 'drill-1',
    finishedAt,
    stats: { medianMs, p90Ms: medianMs, fastestMs, accuracy, answeredCount, callCount: 10 },
  });

  it('keeps the lowest median, the fastest call and the best accuracy per operator and drill', () => {
    const bests = personalBests([
      run('r2', 'tomas', '2025-03-02T10:00:00Z', 1100, 640, 0.8),
      run('r1', 'tomas', '2025-03-01T10:00:00Z', 1300, 590, 0.9),
      run('r3', 'tomas', '2025-03-03T10:00:00Z', 900, 700, 0.7, 4),
      run('r4', 'ines', '2025-03-01T11:00:00Z', 1500, 800, 1),
    ]);
    expect(bests).toEqual([
      { operatorId: 'ines', drillId: 'drill-1', runCount: 1, bestMedianMs: 1500, bestMedianRunId: 'r4', bestAccuracy: 1, fastestMs: 800, lastRunAt: '2025-03-01T11:00:00Z' },
      // r3's median does not count: it answered 4 of 10 calls.
      { operatorId: 'tomas', drillId: 'drill-1', runCount: 3, bestMedianMs: 1100, bestMedianRunId: 'r2', bestAccuracy: 0.9, fastestMs: 590, lastRunAt: '2025-03-03T10:00:00Z' },
    ]);
  });

  it('names what a new run beats, and nothing on a first run', () => {
    const [previous] = personalBests([run('r1', 'tomas', '2025-03-01T10:00:00Z', 1300, 590, 0.9)]);
    expect(newBests(previous, { medianMs: 1200, p90Ms: 1500, fastestMs: 600, accuracy: 1, answeredCount: 10, callCount: 10 })).toEqual({ median: true, fastest: false, accuracy: true });
    expect(newBests(undefined, { medianMs: 1, p90Ms: 1, fastestMs: 1, accuracy: 1, answeredCount: 10, callCount: 10 })).toEqual({ median: false, fastest: false, accuracy: false });
  });
});
