// Pure: imports only zod and shared files. The coach review across recordings: per-match trend, breakdowns, slowest
// cycles and the CSV export, from stored cycle rows.
import type { CycleReview, ReviewCycle, ReviewGroup, ReviewMatch } from '../../schemas/cycle';
import { REEF_LEVELS } from '../season/season-profile';
import { durationStats } from './stats';

/** A recording in the review with its labels and the match summary's total points. */
export type ReviewRecording = Omit<ReviewMatch, 'cycleCount' | 'cycleTime' | 'points'> & { totalPoints: number };

export const SLOWEST_COUNT = 10;

const isAttempt = (c: ReviewCycle) => c.outcome === 'scored' || c.outcome === 'missed';

function group(cycles: readonly ReviewCycle[], keyOf: (c: ReviewCycle) => string | null, order?: readonly string[]): ReviewGroup[] {
  const groups = new Map<string | null, ReviewCycle[]>();
  for (const c of cycles) {
    const key = keyOf(c);
    let list = groups.get(key);
    if (!list) groups.set(key, (list = []));
    list.push(c);
  }
  const rank = (key: string | null) => (key === null ? Number.POSITIVE_INFINITY : order ? order.indexOf(key) : 0);
  return [...groups.entries()]
    .sort(([a], [b]) => rank(a) - rank(b) || (a ?? '').localeCompare(b ?? ''))
    .map(([key, list]) => ({
      key,
      cycleCount: list.length,
      scored: list.filter((c) => c.outcome === 'scored').length,
      missed: list.filter((c) => c.outcome === 'missed').length,
      cycleTime: durationStats(list.filter(isAttempt).map((c) => c.durationS)),
      points: list.reduce((s, c) => s + c.points, 0),
    }));
}

/**
 * The review of the given recordings and their cycles (already filtered). Cycle times count place attempts only
 * (scored or missed); medians and p90 as in durationStats. Matches come oldest first, the slowest attempts slowest first.
 */
export function reviewCycles(
  recordings: readonly ReviewRecording[],
  cycles: readonly ReviewCycle[],
  options: CycleReview['options'],
): CycleReview {
  const byRecording = new Map<string, ReviewCycle[]>();
  for (const c of cycles) {
    let list = byRecording.get(c.recordingId);
    if (!list) byRecording.set(c.recordingId, (list = []));
    list.push(c);
  }
  const matches = [...recordings]
    .sort((a, b) => a.startedAt.localeCompare(b.startedAt) || a.recordingId.localeCompare(b.recordingId))
    .map(({ totalPoints, ...r }) => {
      const own = byRecording.get(r.recordingId) ?? [];
      return { ...r, cycleCount: own.length, cycleTime: durationStats(own.filter(isAttempt).map((c) => c.durationS)), points: totalPoints };
    });
  const coral = cycles.filter((c) => c.piece === 'coral');
  const slowest = cycles
    .filter(isAttempt)
    .sort((a, b) => b.durationS - a.durationS || a.recordingStartedAt.localeCompare(b.recordingStartedAt) || a.index - b.index)
    .slice(0, SLOWEST_COUNT);
  return {
    recordingCount: recordings.length,
    cycleCount: cycles.length,
    cycleTime: durationStats(cycles.filter(isAttempt).map((c) => c.durationS)),
    matches,
    byLevel: group(coral, (c) => c.level, REEF_LEVELS),
    byFace: group(coral, (c) => c.face),
    byStation: group(cycles, (c) => c.station),
    byOperator: group(cycles, (c) => c.operatorName),
    slowest,
    options,
  };
}

export const CYCLES_CSV_COLUMNS = [
  'recording_id',
  'recording_started_at',
  'event',
  'match_type',
  'match_number',
  'operator',
  'cycle',
  'piece',
  'phase',
  'start_s',
  'duration_s',
  'level',
  'face',
  'station',
  'outcome',
  'points',
  'call_to_place_s',
] as const;

/** One CSV field: quoted when it holds a comma, quote or line break (RFC 4180), and a leading =+-@ defused. */
export function csvField(value: string | number | null): string {
  if (value === null) return '';
  if (typeof value === 'number') return String(value);
  const safe = /^[=+\-@]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** The cycles as CSV with a header line, CRLF line ends; seconds rounded to milliseconds. */
export function cyclesCsv(cycles: readonly ReviewCycle[]): string {
  const ms = (s: number | null) => (s === null ? null : Math.round(s * 1000) / 1000);
  const lines = cycles.map((c) =>
    [
      c.recordingId,
      c.recordingStartedAt,
      c.event,
      c.matchType,
      c.matchNumber,
      c.operatorName,
      c.index + 1,
      c.piece,
      c.phase,
      ms(c.startS),
      ms(c.durationS),
      c.level,
      c.face,
      c.station,
      c.outcome,
      c.points,
      ms(c.callToPlaceS),
    ]
      .map(csvField)
      .join(','),
  );
  return [CYCLES_CSV_COLUMNS.join(','), ...lines].join('\r\n') + '\r\n';
}
