// Pure: labels, formats and chart columns for the cycles view and the coach review.
import { formatMoment } from '../../../../shared/domain/timeline';
import type { Cycle, CycleEndCause, CycleOutcome, CycleTarget, ReviewMatch } from '../../../../shared/schemas/cycle';

export const OUTCOME_LABELS: Record<CycleOutcome, string> = { scored: 'Scored', missed: 'Missed', dropped: 'Dropped', unfinished: 'Unfinished' };
export const END_LABELS: Record<CycleEndCause, string> = {
  placed: 'placed',
  missed: 'missed',
  algae_scored: 'algae scored',
  dropped: 'dropped',
  reacquired: 'picked up again',
  disabled: 'robot disabled',
  recording_end: 'recording ended',
};
export const STATION_LABELS: Record<string, string> = { left: 'Left station', right: 'Right station', reef: 'Reef (algae)' };
export const SEGMENTS = [
  { key: 'acquireS', label: 'Acquire', colour: '#56B4E9' },
  { key: 'travelS', label: 'Travel', colour: '#F5A30F' },
  { key: 'alignS', label: 'Align', colour: '#E069A8' },
  { key: 'placeS', label: 'Place', colour: '#2FBF8F' },
] as const;

/** Seconds to two decimals with the unit, or a dash for nothing. */
export function formatSeconds(s: number | null | undefined): string {
  return s === null || s === undefined || !Number.isFinite(s) ? '—' : `${s.toFixed(2)} s`;
}

/** A moment in the match clock style, "1:23.4" (minutes, seconds to a tenth). */
export function formatClock(tS: number): string {
  const tenths = Math.max(0, Math.round(tS * 10));
  const m = Math.floor(tenths / 600);
  const s = (tenths % 600) / 10;
  return `${m}:${s.toFixed(1).padStart(4, '0')}`;
}

/** "C · L4", "Net", "Processor", or a dash when nothing is known. */
export function targetLabel(t: CycleTarget): string {
  if (t.algae) return t.algae === 'net' ? 'Net' : 'Processor';
  const parts = [t.branch, t.level].filter(Boolean);
  return parts.length > 0 ? parts.join(' · ') : '—';
}

/** A group key as a reader says it; null is a cycle without that attribute. */
export function groupLabel(kind: 'level' | 'face' | 'station' | 'operator', key: string | null): string {
  if (key === null) return kind === 'operator' ? 'No operator named' : kind === 'station' ? 'Preload or not known' : 'Not known';
  if (kind === 'face') return `Face ${key}`;
  if (kind === 'station') return STATION_LABELS[key] ?? key;
  return key;
}

/** "Q7" for a qualification, "P2" playoff, "Pr1" practice, "#3" without a type; null with no number. */
export function matchShort(m: Pick<ReviewMatch, 'matchType' | 'matchNumber'>): string | null {
  if (m.matchNumber === null) return null;
  const prefix = m.matchType === 'qualification' ? 'Q' : m.matchType === 'playoff' ? 'P' : m.matchType === 'practice' ? 'Pr' : '#';
  return `${prefix}${m.matchNumber}`;
}

/** The replay at a moment: `/recordings/:id?t=<seconds>`. */
export const replayLink = (recordingId: string, tS: number) => `/recordings/${encodeURIComponent(recordingId)}?t=${formatMoment(tS)}`;

/** The cycle the cursor is in (start ≤ t < end), or null between cycles. */
export function cycleIndexAt(cycles: readonly Pick<Cycle, 'startS' | 'endS'>[], tS: number): number | null {
  const i = cycles.findIndex((c) => c.startS <= tS && tS < c.endS);
  return i < 0 ? null : i;
}

/**
 * uPlot columns for stacked segment bars, one per cycle at x = its number (1…n), in drawing order: the whole
 * duration, then the running sums to place, align, travel and acquire, each drawn over the one before. A cycle
 * without split segments has only its whole duration.
 */
export function segmentColumns(cycles: readonly Pick<Cycle, 'durationS' | 'segments'>[]): [number[], ...(number | null)[][]] {
  const x = cycles.map((_, i) => i + 1);
  const cols: (number | null)[][] = [[], [], [], [], []];
  for (const c of cycles) {
    const { acquireS, travelS, alignS, placeS } = c.segments;
    const isSplit = travelS !== null && alignS !== null && placeS !== null;
    cols[0]!.push(c.durationS);
    cols[1]!.push(isSplit ? acquireS + travelS + alignS + placeS : null);
    cols[2]!.push(isSplit ? acquireS + travelS + alignS : null);
    cols[3]!.push(isSplit ? acquireS + travelS : null);
    cols[4]!.push(isSplit ? acquireS : null);
  }
  return [x, ...cols];
}

/** uPlot columns for the per-match trend: x = 1…n, then median and p90 cycle time (null for a match without any). */
export function trendColumns(matches: readonly Pick<ReviewMatch, 'cycleTime'>[]): [number[], (number | null)[], (number | null)[]] {
  return [matches.map((_, i) => i + 1), matches.map((m) => m.cycleTime.medianS), matches.map((m) => m.cycleTime.p90S)];
}

/** Width of a bar as a percentage of the largest value (0 for nothing to compare). */
export function barPercent(value: number | null, max: number): number {
  if (value === null || !(max > 0)) return 0;
  return Math.max(0, Math.min(100, (value / max) * 100));
}
