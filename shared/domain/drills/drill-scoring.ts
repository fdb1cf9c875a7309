// Pure: imports only zod and shared files. Scoring a drill run: per call the reaction time (call shown → the
// complete correct selection), the wrong taps before it and whether it was missed; per run the median, p90
// and accuracy; personal bests across runs.
import { z } from 'zod';
import { CALL_PARTS, callParts, drillCallSchema, type CallPart, type DrillCall } from './drill-calls';

export const drillTapSchema = z.object({
  part: z.enum(CALL_PARTS),
  value: z.string().min(1).max(16),
  /** Ms from the run's start. */
  tMs: z.number().finite().nonnegative(),
});
export type DrillTap = z.infer<typeof drillTapSchema>;

/** What the operator's device saw of one call: when it appeared and every tap while it was open. */
export const drillCallRecordSchema = z.object({
  call: drillCallSchema,
  /** Ms from the run's start. */
  shownAtMs: z.number().finite().nonnegative(),
  taps: z.array(drillTapSchema).max(200),
});
export type DrillCallRecord = z.infer<typeof drillCallRecordSchema>;

export type ScoredCall = {
  call: DrillCall;
  shownAtMs: number;
  /** Call shown → the tap that completed the correct selection; null when missed. */
  reactionMs: number | null;
  /** Wrong taps before the answer (all wrong taps of a missed call). */
  errors: number;
  isMiss: boolean;
};

export type DrillRunStats = {
  callCount: number;
  answeredCount: number;
  missCount: number;
  errorCount: number;
  /** Answered without a single wrong tap. */
  cleanCount: number;
  /** cleanCount / callCount, 0…1 (0 for no calls). */
  accuracy: number;
  /** Of the answered calls' reaction times, ms; null when nothing was answered. */
  medianMs: number | null;
  p90Ms: number | null;
  meanMs: number | null;
  fastestMs: number | null;
};

/**
 * Scores one call. Taps are read in time order; each sets its part of the selection, and a tap whose value
 * is not the called one (or whose part the call does not ask for) is an error. The call is answered at the
 * first tap after which every called part holds its called value. Taps after `windowMs` from the call do not
 * count: the call was already missed.
 */
export function scoreCall(record: DrillCallRecord, windowMs: number): ScoredCall {
  const parts = callParts(record.call);
  const deadlineMs = record.shownAtMs + windowMs;
  const selection: Partial<Record<CallPart, string>> = {};
  let errors = 0;
  const taps = [...record.taps].sort((a, b) => a.tMs - b.tMs);
  for (const tap of taps) {
    if (tap.tMs < record.shownAtMs || tap.tMs > deadlineMs) continue;
    selection[tap.part] = tap.value;
    if (record.call[tap.part] !== tap.value) {
      errors += 1;
      continue;
    }
    if (parts.every((p) => selection[p] === record.call[p])) {
      return { call: record.call, shownAtMs: record.shownAtMs, reactionMs: tap.tMs - record.shownAtMs, errors, isMiss: false };
    }
  }
  return { call: record.call, shownAtMs: record.shownAtMs, reactionMs: null, errors, isMiss: true };
}

/** Every call of a run, scored with the pace's window. */
export function scoreRun(records: readonly DrillCallRecord[], windowMs: number): ScoredCall[] {
  return records.map((r) => scoreCall(r, windowMs));
}

/**
 * The p-quantile of ascending `sorted`, interpolating linearly between closest ranks (index (n − 1)·p, the
 * method numpy calls "linear"); undefined for an empty list. p in [0, 1].
 */
export function quantileSorted(sorted: readonly number[], p: number): number | undefined {
  if (sorted.length === 0) return undefined;
  const idx = (sorted.length - 1) * Math.min(1, Math.max(0, p));
  const lo = Math.floor(idx);
  const hi = Math.ceil(idx);
  return sorted[lo]! + (idx - lo) * (sorted[hi]! - sorted[lo]!);
}

/** Median, p90 and accuracy of a scored run. */
export function runStats(scored: readonly ScoredCall[]): DrillRunStats {
  const times = scored.flatMap((c) => (c.reactionMs === null ? [] : [c.reactionMs])).sort((a, b) => a - b);
  const answeredCount = times.length;
  const cleanCount = scored.filter((c) => !c.isMiss && c.errors === 0).length;
  return {
    callCount: scored.length,
    answeredCount,
    missCount: scored.length - answeredCount,
    errorCount: scored.reduce((sum, c) => sum + c.errors, 0),
    cleanCount,
    accuracy: scored.length ? cleanCount / scored.length : 0,
    medianMs: quantileSorted(times, 0.5) ?? null,
    p90Ms: quantileSorted(times, 0.9) ?? null,
    meanMs: answeredCount ? times.reduce((s, t) => s + t, 0) / answeredCount : null,
    fastestMs: times[0] ?? null,
  };
}

/** One stored run as personal bests need it. */
export type RunSummary = {
  id: string;
  operatorId: string;
  drillId: string | null;
  finishedAt: string;
  stats: Pick<DrillRunStats, 'medianMs' | 'p90Ms' | 'accuracy' | 'fastestMs' | 'answeredCount' | 'callCount'>;
};

export type PersonalBest = {
  operatorId: string;
  drillId: string | null;
  runCount: number;
  /** The lowest median of runs that answered at least half their calls (a run of misses proves nothing). */
  bestMedianMs: number | null;
  bestMedianRunId: string | null;
  bestAccuracy: number;
  fastestMs: number | null;
  lastRunAt: string;
};

/** Whether a run counts for the best median: at least half its calls answered. */
export const countsForBestMedian = (s: RunSummary['stats']) => s.medianMs !== null && s.answeredCount * 2 >= s.callCount;

/** Personal bests per operator and drill, ordered by operator then drill, from runs in any order. */
export function personalBests(runs: readonly RunSummary[]): PersonalBest[] {
  const byKey = new Map<string, PersonalBest>();
  const ordered = [...runs].sort((a, b) => a.finishedAt.localeCompare(b.finishedAt) || a.id.localeCompare(b.id));
  for (const run of ordered) {
    const key = `${run.operatorId}\u0000${run.drillId ?? ''}`;
    const best = byKey.get(key) ?? {
      operatorId: run.operatorId,
      drillId: run.drillId,
      runCount: 0,
      bestMedianMs: null,
      bestMedianRunId: null,
      bestAccuracy: 0,
      fastestMs: null,
      lastRunAt: run.finishedAt,
    };
    best.runCount += 1;
    best.lastRunAt = run.finishedAt;
    best.bestAccuracy = Math.max(best.bestAccuracy, run.stats.accuracy);
    if (run.stats.fastestMs !== null && (best.fastestMs === null || run.stats.fastestMs < best.fastestMs)) best.fastestMs = run.stats.fastestMs;
    if (countsForBestMedian(run.stats) && (best.bestMedianMs === null || run.stats.medianMs! < best.bestMedianMs)) {
      best.bestMedianMs = run.stats.medianMs;
      best.bestMedianRunId = run.id;
    }
    byKey.set(key, best);
  }
  return [...byKey.values()].sort((a, b) => a.operatorId.localeCompare(b.operatorId) || (a.drillId ?? '').localeCompare(b.drillId ?? ''));
}

/** Which of a new run's figures beat the operator's earlier bests on that drill (none on a first run). */
export function newBests(previous: PersonalBest | undefined, stats: RunSummary['stats']): { median: boolean; fastest: boolean; accuracy: boolean } {
  if (!previous || previous.runCount === 0) return { median: false, fastest: false, accuracy: false };
  return {
    median: countsForBestMedian(stats) && (previous.bestMedianMs === null || stats.medianMs! < previous.bestMedianMs),
    fastest: stats.fastestMs !== null && (previous.fastestMs === null || stats.fastestMs < previous.fastestMs),
    accuracy: stats.accuracy > previous.bestAccuracy,
  };
}
