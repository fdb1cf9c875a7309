// Pure: imports only zod and shared files; no I/O, clocks or randomness. Cycle segmentation of one recording
// from its events (robot events, operator selections) and, where present, the drive speed.
import type { ChannelValue } from '../../protocol/messages';
import {
  algaeTargetSchema,
  type Cycle,
  type CycleEndCause,
  type CycleOutcome,
  type CyclePhase,
  type CyclePiece,
  type CycleTarget,
} from '../../schemas/cycle';
import { branchLetterSchema } from '../channels';
import { eventPoints } from '../season/points';
import { reefLevelSchema, type SeasonProfile } from '../season/season-profile';

/** A recording event as the analysis reads it; tS is seconds from the recording's start. */
export interface CycleEvent {
  tS: number;
  kind: string;
  data: Record<string, ChannelValue> | null;
}

/** A drive-speed trace in m/s at times tS (ascending); non-finite values count as unknown. */
export interface SpeedTrace {
  tS: ArrayLike<number>;
  values: ArrayLike<number>;
}

export interface CycleInput {
  /** In the order they happened (ties keep their order). */
  events: readonly CycleEvent[];
  durationS: number;
  speed?: SpeedTrace;
}

export interface CycleOptions {
  /** Below this speed the robot is lining up rather than travelling; default 1.5 m/s (invented, no source). */
  alignSpeedMps?: number;
  /** Below this speed the robot stands still to place; default 0.1 m/s (invented, no source). */
  settleSpeedMps?: number;
}

/** Bump when the analysis changes, so stored cycles are recomputed. */
export const CYCLE_ANALYSIS_VERSION = 1;

const DEFAULTS = { alignSpeedMps: 1.5, settleSpeedMps: 0.1 };
const ENABLED = new Set(['auto', 'teleop']);

interface OpenCycle {
  piece: CyclePiece;
  startS: number;
  acquiredS: number;
  station: string | null;
  isPreload: boolean;
}

interface Taps {
  branch?: { value: string; tS: number };
  level?: { value: string; tS: number };
  algae?: { value: string; tS: number };
}

/** A string field of an event's data, or null when it is missing or not a string. */
export const str = (data: CycleEvent['data'], key: string): string | null => {
  const v = data?.[key];
  return typeof v === 'string' ? v : null;
};

/** The phase an event counts in: the mode at its time, else its own `phase` field, else teleop. */
export function phaseOfEvent(phaseAt: (tS: number) => CyclePhase | null, tS: number, data: CycleEvent['data']): CyclePhase {
  const fromData = str(data, 'phase');
  return phaseAt(tS) ?? (fromData === 'auto' || fromData === 'teleop' ? fromData : 'teleop');
}
const branchOf = (v: string | null | undefined) => branchLetterSchema.safeParse(v).data ?? null;
const levelOf = (v: string | null | undefined) => reefLevelSchema.safeParse(v).data ?? null;
const algaeOf = (v: string | null | undefined) => algaeTargetSchema.safeParse(v).data ?? null;
const pieceOf = (data: CycleEvent['data']): CyclePiece => (str(data, 'piece') === 'algae' ? 'algae' : 'coral');

/** The phase at each moment, from mode_changed events: the last enabled mode at or before tS. */
export function phaseTimeline(events: readonly CycleEvent[]): (tS: number) => CyclePhase | null {
  const changes = events
    .filter((e) => e.kind === 'mode_changed' && ENABLED.has(str(e.data, 'to') ?? ''))
    .map((e) => ({ tS: e.tS, phase: str(e.data, 'to') as CyclePhase }));
  return (tS) => {
    let phase: CyclePhase | null = null;
    for (const c of changes) {
      if (c.tS > tS) break;
      phase = c.phase;
    }
    return phase;
  };
}

/** The reef face of a branch by its branch pair, e.g. "C/D", from the season's lettering; null for no branch. */
export function faceOfBranch(season: SeasonProfile, branch: string | null): string | null {
  if (!branch) return null;
  const letters = season.reef.branchLetters.value;
  const i = letters.indexOf(branch);
  if (i < 0) return null;
  const face = Math.floor(i / 2);
  return `${letters[2 * face]}/${letters[2 * face + 1]}`;
}

function lastIndexAtOrBefore(times: ArrayLike<number>, tS: number): number {
  let lo = 0;
  let hi = times.length - 1;
  let found = -1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (times[mid]! <= tS) {
      found = mid;
      lo = mid + 1;
    } else hi = mid - 1;
  }
  return found;
}

/**
 * Splits [acquiredS, endS] by the drive speed: place is the final stretch below the settle speed, align the
 * stretch below the align speed just before it, travel the rest.
 */
export function splitBySpeed(
  speed: SpeedTrace,
  acquiredS: number,
  endS: number,
  options: Required<CycleOptions>,
): { alignStartS: number; placeStartS: number } {
  const last = lastIndexAtOrBefore(speed.tS, endS);
  // No samples inside the cycle: nothing tells travel from align, so it all counts as travel.
  if (last < 0 || speed.tS[last]! < acquiredS) return { alignStartS: endS, placeStartS: endS };
  const isBelow = (i: number, limit: number) => {
    const v = speed.values[i]!;
    return Number.isFinite(v) && Math.abs(v) < limit;
  };
  let i = last;
  while (i >= 0 && speed.tS[i]! >= acquiredS && isBelow(i, options.settleSpeedMps)) i -= 1;
  const placeStartS = i === last ? endS : i >= 0 && speed.tS[i]! >= acquiredS ? speed.tS[i + 1]! : acquiredS;
  while (i >= 0 && speed.tS[i]! >= acquiredS && isBelow(i, options.alignSpeedMps)) i -= 1;
  const alignStartS = i >= 0 && speed.tS[i]! >= acquiredS ? Math.min(speed.tS[i + 1] ?? placeStartS, placeStartS) : acquiredS;
  return { alignStartS: Math.max(acquiredS, alignStartS), placeStartS: Math.max(acquiredS, Math.min(endS, placeStartS)) };
}

const NO_TARGET: CycleTarget = { branch: null, level: null, algae: null };

/**
 * The cycles of one recording, in the order they ended. A cycle starts when the robot is free (the end of the
 * previous cycle, or the robot enabled), runs through the pickup (`acquired`) and ends at `placed`, `missed` or
 * `algae_scored`; a `dropped` event or a second pickup of the same piece ends it as dropped, and a piece still held
 * when the match is over (disabled after teleop, or the recording ends) as unfinished. Points follow the season's
 * table; the called target is the operator's selection (`selection` events) in force at the cycle's end.
 */
export function analyzeCycles(season: SeasonProfile, input: CycleInput, options: CycleOptions = {}): Cycle[] {
  const opts = { ...DEFAULTS, ...options };
  const phaseAt = phaseTimeline(input.events);
  const cycles: Cycle[] = [];
  const open = new Map<CyclePiece, OpenCycle>();
  const taps: Taps = {};
  let freeS: number | null = null;
  let mode: string | null = null;
  let pausedAfterAutoS: number | null = null;


  function openCycle(piece: CyclePiece, tS: number, station: string | null, isPreload: boolean): OpenCycle {
    const cycle = { piece, startS: Math.min(freeS ?? tS, tS), acquiredS: tS, station, isPreload };
    open.set(piece, cycle);
    return cycle;
  }

  function close(c: OpenCycle, endS: number, outcome: CycleOutcome, endedBy: CycleEndCause, data: CycleEvent['data']) {
    open.delete(c.piece);
    const phase = phaseOfEvent(phaseAt, endS, data);
    const startPhase = phaseAt(c.startS) ?? phase;
    const isAttempt = outcome === 'scored' || outcome === 'missed';
    const called: CycleTarget =
      c.piece === 'coral'
        ? { branch: branchOf(taps.branch?.value), level: levelOf(taps.level?.value), algae: null }
        : { ...NO_TARGET, algae: algaeOf(taps.algae?.value) };
    const callTimes =
      c.piece === 'coral'
        ? [called.branch ? taps.branch?.tS : undefined, called.level ? taps.level?.tS : undefined]
        : [called.algae ? taps.algae?.tS : undefined];
    const known = callTimes.filter((t): t is number => t !== undefined);
    const calledAtS = known.length > 0 ? Math.max(...known) : null;
    const reached: CycleTarget = !isAttempt
      ? NO_TARGET
      : c.piece === 'coral'
        ? { branch: branchOf(str(data, 'branch')), level: levelOf(str(data, 'level')), algae: null }
        : { ...NO_TARGET, algae: algaeOf(str(data, 'where')) };
    const isOnTarget = !isAttempt
      ? null
      : c.piece === 'coral'
        ? called.branch && called.level && reached.branch && reached.level
          ? called.branch === reached.branch && called.level === reached.level
          : null
        : called.algae && reached.algae
          ? called.algae === reached.algae
          : null;
    const level = c.piece === 'coral' ? (reached.level ?? called.level) : null;
    let points = 0;
    if (outcome === 'scored' && c.piece === 'coral' && level) points = eventPoints(season, { kind: 'coral', level, phase }).points;
    if (outcome === 'scored' && c.piece === 'algae' && reached.algae) points = eventPoints(season, { kind: 'algae', target: reached.algae, phase }).points;

    let alignStartS: number | null = null;
    let placeStartS: number | null = null;
    let travelS: number | null = null;
    if (input.speed && isAttempt) {
      ({ alignStartS, placeStartS } = splitBySpeed(input.speed, c.acquiredS, endS, opts));
      travelS = alignStartS - c.acquiredS;
    } else if (input.speed) {
      travelS = endS - c.acquiredS;
    }
    cycles.push({
      index: cycles.length,
      piece: c.piece,
      phase,
      crossesPhase: startPhase === 'auto' && phase === 'teleop',
      isPreload: c.isPreload,
      startS: c.startS,
      acquiredS: c.acquiredS,
      alignStartS,
      placeStartS,
      endS,
      durationS: endS - c.startS,
      segments: {
        acquireS: c.acquiredS - c.startS,
        travelS,
        alignS: alignStartS !== null && placeStartS !== null ? placeStartS - alignStartS : null,
        placeS: placeStartS !== null ? endS - placeStartS : null,
      },
      called,
      calledAtS,
      reached,
      isOnTarget,
      level,
      face: c.piece === 'coral' ? faceOfBranch(season, reached.branch) : null,
      station: c.station,
      outcome,
      endedBy,
      points,
      callToPlaceS: isAttempt && calledAtS !== null && calledAtS <= endS ? endS - calledAtS : null,
    });
    freeS = endS;
  }

  const closeAll = (tS: number, endedBy: CycleEndCause) => {
    for (const c of [...open.values()].sort((a, b) => a.acquiredS - b.acquiredS)) close(c, tS, 'unfinished', endedBy, null);
  };

  for (const e of input.events) {
    switch (e.kind) {
      case 'selection': {
        const channel = str(e.data, 'channel');
        const value = str(e.data, 'value');
        if (value === null) break;
        if (channel === 'op/reef/branch') taps.branch = { value, tS: e.tS };
        if (channel === 'op/reef/level') taps.level = { value, tS: e.tS };
        if (channel === 'op/algae') taps.algae = { value, tS: e.tS };
        break;
      }
      case 'mode_changed': {
        const to = str(e.data, 'to');
        const from = mode ?? str(e.data, 'from');
        if (to === 'disabled') {
          // A pause between auto and teleop keeps the cycles going; after teleop the match is over.
          if (from === 'auto') pausedAfterAutoS = e.tS;
          else closeAll(e.tS, 'disabled');
        } else if (to && ENABLED.has(to)) {
          if (pausedAfterAutoS === null && open.size === 0 && (freeS === null || from === 'disabled' || from === null)) freeS = e.tS;
          pausedAfterAutoS = null;
        }
        mode = to;
        break;
      }
      case 'acquired': {
        const piece = pieceOf(e.data);
        const held = open.get(piece);
        if (held) close(held, e.tS, 'dropped', 'reacquired', null);
        openCycle(piece, e.tS, str(e.data, 'station'), false);
        break;
      }
      case 'placed':
      case 'missed': {
        const c = open.get('coral') ?? openCycle('coral', freeS ?? e.tS, null, true);
        close(c, e.tS, e.kind === 'placed' ? 'scored' : 'missed', e.kind, e.data);
        break;
      }
      case 'algae_scored': {
        const c = open.get('algae') ?? openCycle('algae', freeS ?? e.tS, null, true);
        close(c, e.tS, 'scored', 'algae_scored', e.data);
        break;
      }
      case 'dropped': {
        const c = open.get(pieceOf(e.data));
        if (c) close(c, e.tS, 'dropped', 'dropped', null);
        break;
      }
      default:
        break;
    }
  }
  if (pausedAfterAutoS !== null) closeAll(pausedAfterAutoS, 'disabled');
  else closeAll(Math.max(input.durationS, ...[...open.values()].map((c) => c.acquiredS)), 'recording_end');
  return cycles;
}
