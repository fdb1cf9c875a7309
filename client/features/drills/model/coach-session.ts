// Pure: the coach's side of a coached drill. The coach's device decides when each call goes out (the drill's
// pace, or the operator's answer on op/drill/answer); the page publishes what `outbox` says. Times are ms of
// the page's clock, passed in.
import type { DrillCall } from '../../../../shared/domain/drills/drill-calls';
import type { DrillAnswerValue, DrillCallValue } from '../../../../shared/domain/drills/drill-channels';
import { callWindowMs, ON_ANSWER_BREAK_MS, type DrillPace } from '../../../../shared/domain/drills/drill-plan';

export type CoachPhase = 'ready' | 'open' | 'closed' | 'finished';

export type CoachState = {
  phase: CoachPhase;
  sessionId: string;
  pace: DrillPace;
  calls: DrillCall[];
  /** The call on the operator's screen, -1 before the first. */
  index: number;
  t0Ms: number;
  sentAtMs: number;
  closedAtMs: number;
  /** The operator's answers by call index. */
  answers: Readonly<Record<number, DrillAnswerValue>>;
  isStopped: boolean;
};

export function readyCoach(sessionId: string, pace: DrillPace, calls: DrillCall[]): CoachState {
  return { phase: 'ready', sessionId, pace, calls, index: -1, t0Ms: 0, sentAtMs: 0, closedAtMs: 0, answers: {}, isStopped: false };
}

export function startCoach(state: CoachState, atMs: number): CoachState {
  if (state.calls.length === 0) return { ...state, phase: 'finished' };
  return { ...readyCoach(state.sessionId, state.pace, state.calls), phase: 'open', index: 0, t0Ms: atMs, sentAtMs: atMs };
}

/** The next moment the session moves by itself, or null. */
export function coachDueAtMs(state: CoachState): number | null {
  if (state.phase === 'open') return state.sentAtMs + callWindowMs(state.pace);
  if (state.phase !== 'closed') return null;
  return state.pace.mode === 'interval' ? state.t0Ms + (state.index + 1) * state.pace.intervalMs : state.closedAtMs + ON_ANSWER_BREAK_MS;
}

export function coachTick(state: CoachState, atMs: number): CoachState {
  let s = state;
  for (let guard = 0; guard < 3; guard++) {
    const due = coachDueAtMs(s);
    if (due === null || atMs < due) return s;
    if (s.phase === 'open') s = { ...s, phase: 'closed', closedAtMs: due };
    else if (s.index + 1 < s.calls.length) s = { ...s, phase: 'open', index: s.index + 1, sentAtMs: due };
    else s = { ...s, phase: 'finished' };
  }
  return s;
}

/** The operator answered (or missed) a call; in on-answer pace the next call follows after the break. */
export function coachAnswer(state: CoachState, answer: DrillAnswerValue, atMs: number): CoachState {
  if (answer.sessionId !== state.sessionId || state.phase === 'ready') return state;
  const answers = { ...state.answers, [answer.index]: answer };
  const closesNow = state.phase === 'open' && answer.index === state.index;
  return { ...state, answers, ...(closesNow ? { phase: 'closed' as const, closedAtMs: atMs } : {}) };
}

export function stopCoach(state: CoachState): CoachState {
  return state.phase === 'finished' || state.phase === 'ready' ? state : { ...state, phase: 'finished', isStopped: true };
}

/** What op/drill/call should hold now, or undefined before the start. */
export function outbox(state: CoachState, drill: { id: string; name: string }, coachName: string): DrillCallValue | undefined {
  if (state.phase === 'ready') return undefined;
  if (state.phase === 'finished') return { kind: 'end', sessionId: state.sessionId, isStopped: state.isStopped };
  return {
    kind: 'call',
    sessionId: state.sessionId,
    drillId: drill.id,
    drillName: drill.name,
    index: state.index,
    count: state.calls.length,
    call: state.calls[state.index]!,
    windowMs: callWindowMs(state.pace),
    coachName,
  };
}
