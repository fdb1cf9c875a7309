// Pure: the operator's side of a drill run as a reducer over clock times passed in (ms, the page's clock).
// The component dispatches taps, relay calls and ticks at `dueAtMs`; scoring is shared/domain/drills.
import type { CallPart, DrillCall } from '../../../../shared/domain/drills/drill-calls';
import { callParts } from '../../../../shared/domain/drills/drill-calls';
import { ON_ANSWER_BREAK_MS, type DrillPace } from '../../../../shared/domain/drills/drill-plan';
import { scoreCall, type DrillCallRecord, type ScoredCall } from '../../../../shared/domain/drills/drill-scoring';

/** Self-paced runs follow the drill's pace; coached runs follow the coach's calls, each open for `windowMs`. */
export type RunTiming = DrillPace | { mode: 'coached'; windowMs: number };

export type RunPhase = 'ready' | 'countdown' | 'open' | 'closed' | 'finished';

export type RunnerState = {
  phase: RunPhase;
  timing: RunTiming;
  /** The planned calls (self) or the calls received so far (coached). */
  calls: DrillCall[];
  /** One per call shown; times in ms from `t0Ms`. */
  records: DrillCallRecord[];
  /** Absolute time the run's clock starts (the countdown's end). */
  t0Ms: number;
  /** Absolute time the current call closed (answered or missed). */
  closedAtMs: number | null;
  /** The current call's selection since it was shown. */
  selection: Partial<Record<CallPart, string>>;
  /** The current call's outcome once closed. */
  outcome: ScoredCall | null;
  /** The coach's session a coached run follows. */
  sessionId: string | null;
  /** The coach ended the session before the last call. */
  isStopped: boolean;
};

export const COUNTDOWN_MS = 3000;

export function readyRun(timing: RunTiming, calls: DrillCall[] = []): RunnerState {
  return { phase: 'ready', timing, calls, records: [], t0Ms: 0, closedAtMs: null, selection: {}, outcome: null, sessionId: null, isStopped: false };
}

export const windowOf = (timing: RunTiming): number =>
  timing.mode === 'interval' ? timing.intervalMs : timing.mode === 'on-answer' ? timing.limitMs : timing.windowMs;

/** Starts the countdown of a self-paced run at `atMs`. */
export function startRun(state: RunnerState, atMs: number, countdownMs = COUNTDOWN_MS): RunnerState {
  return { ...readyRun(state.timing, state.calls), phase: 'countdown', t0Ms: atMs + countdownMs };
}

const current = (s: RunnerState) => s.records[s.records.length - 1];

function show(state: RunnerState, call: DrillCall, atMs: number): RunnerState {
  const record: DrillCallRecord = { call, shownAtMs: Math.max(0, atMs - state.t0Ms), taps: [] };
  return { ...state, phase: 'open', records: [...state.records, record], selection: {}, outcome: null, closedAtMs: null };
}

function close(state: RunnerState, atMs: number): RunnerState {
  const record = current(state);
  if (!record || state.phase !== 'open') return state;
  return { ...state, phase: 'closed', closedAtMs: atMs, outcome: scoreCall(record, windowOf(state.timing)) };
}

/** When the next call of a self-paced run is due, absolute ms. */
function nextShowAtMs(state: RunnerState): number {
  const n = state.records.length;
  if (state.timing.mode === 'interval') return state.t0Ms + n * state.timing.intervalMs;
  return (state.closedAtMs ?? state.t0Ms) + ON_ANSWER_BREAK_MS;
}

/** The next moment the run changes by itself (countdown end, a miss, the next call), or null. */
export function dueAtMs(state: RunnerState): number | null {
  switch (state.phase) {
    case 'countdown':
      return state.t0Ms;
    case 'open':
      return state.t0Ms + current(state)!.shownAtMs + windowOf(state.timing);
    case 'closed':
      return state.timing.mode === 'coached' ? null : nextShowAtMs(state);
    default:
      return null;
  }
}

/** Moves the run on to `atMs`: shows the first call, closes a call whose window ran out, shows the next or finishes. */
export function tickRun(state: RunnerState, atMs: number): RunnerState {
  let s = state;
  for (let guard = 0; guard < 4; guard++) {
    const due = dueAtMs(s);
    if (due === null || atMs < due) return s;
    if (s.phase === 'countdown') {
      s = s.calls[0] ? show(s, s.calls[0], due) : { ...s, phase: 'finished' };
    } else if (s.phase === 'open') {
      s = close(s, due);
    } else if (s.phase === 'closed') {
      const next = s.calls[s.records.length];
      s = next ? show(s, next, due) : { ...s, phase: 'finished' };
    }
  }
  return s;
}

/** A tap on the panel: counted while a call is open; the call closes when the selection is complete and right. */
export function tapRun(state: RunnerState, part: CallPart, value: string, atMs: number): RunnerState {
  if (state.phase !== 'open') return state;
  const record = current(state)!;
  const tMs = Math.max(record.shownAtMs, atMs - state.t0Ms);
  const records = [...state.records.slice(0, -1), { ...record, taps: [...record.taps, { part, value, tMs }] }];
  const next = { ...state, records, selection: { ...state.selection, [part]: value } };
  const scored = scoreCall(records[records.length - 1]!, windowOf(state.timing));
  return scored.isMiss ? next : { ...next, phase: 'closed', closedAtMs: atMs, outcome: scored };
}

/**
 * A call from the coach (op/drill/call). The first call of a session starts the run's clock; a call while
 * another is open closes that one (scored as it stands); a repeat of the current index is ignored.
 */
export function coachCall(state: RunnerState, sessionId: string, index: number, call: DrillCall, windowMs: number, atMs: number): RunnerState {
  const isNewSession = state.sessionId !== sessionId || state.phase === 'ready' || state.phase === 'finished';
  let s: RunnerState = isNewSession
    ? { ...readyRun({ mode: 'coached', windowMs }), phase: 'closed', t0Ms: atMs, sessionId }
    : { ...state, timing: { mode: 'coached', windowMs } };
  if (!isNewSession && index < s.records.length) return state;
  s = close(s, atMs);
  return show({ ...s, calls: [...s.calls, call] }, call, atMs);
}

/** Stopped before the end: a call still open is left out (it was never finished), and the run is over. */
export function stopRun(state: RunnerState, atMs: number): RunnerState {
  if (state.phase === 'ready' || state.phase === 'finished') return state;
  const s = tickRun(state, atMs);
  if (s.phase === 'finished') return s;
  const records = s.phase === 'open' ? s.records.slice(0, -1) : s.records;
  return { ...s, phase: 'finished', isStopped: true, records, outcome: s.phase === 'open' ? null : s.outcome };
}

/** The coach ended the session: after the last call the open call is closed and scored; a stop leaves it out. */
export function coachEnd(state: RunnerState, sessionId: string, isStopped: boolean, atMs: number): RunnerState {
  if (state.sessionId !== sessionId || state.phase === 'finished' || state.phase === 'ready') return state;
  if (isStopped) return stopRun(state, atMs);
  return { ...close(state, atMs), phase: 'finished', isStopped };
}

/** The called parts still to be selected right (for the prompt under the call). */
export function missingParts(state: RunnerState): CallPart[] {
  const record = current(state);
  if (!record || state.phase !== 'open') return [];
  return callParts(record.call).filter((p) => state.selection[p] !== record.call[p]);
}

/** Scored calls so far, for the results screen and the live tally. */
export function scoredSoFar(state: RunnerState): ScoredCall[] {
  const window = windowOf(state.timing);
  return state.records.filter((_, i) => i < state.records.length - 1 || state.phase !== 'open').map((r) => scoreCall(r, window));
}

export const currentCall = (state: RunnerState): DrillCall | undefined => current(state)?.call;
