import { describe, expect, it } from 'vitest';
import type { DrillCall } from '../../../../shared/domain/drills/drill-calls';
import { coachAnswer, coachDueAtMs, coachTick, outbox, readyCoach, startCoach, stopCoach } from './coach-session';

const calls: DrillCall[] = [{ branch: 'C', level: 'L4' }, { station: 'left' }, { level: 'L2' }];
const drill = { id: '6f1d2c3b-4a59-4e8f-9b0a-1c2d3e4f5a6b', name: 'Ladder' };
const answer = (index: number) => ({ sessionId: 'session-a1', index, reactionMs: 900, errors: 0, operatorName: 'Tomas Reyes' });

describe('a coached session at an interval', () => {
  it('sends a call every interval, answered or not, then the end', () => {
    let s = startCoach(readyCoach('session-a1', { mode: 'interval', intervalMs: 3000 }, calls), 1000);
    expect(outbox(s, drill, 'Hana Whitcombe')).toMatchObject({ kind: 'call', index: 0, count: 3, windowMs: 3000, call: calls[0] });
    s = coachAnswer(s, answer(0), 1800);
    expect(s.phase).toBe('closed');
    expect(coachDueAtMs(s)).toBe(4000);
    s = coachTick(s, 4000);
    expect(s.index).toBe(1);
    s = coachTick(s, 7000);
    expect(s.index).toBe(2);
    s = coachTick(s, 10_000);
    expect(outbox(s, drill, 'Hana Whitcombe')).toEqual({ kind: 'end', sessionId: 'session-a1', isStopped: false });
  });
});

describe('a coached session on answer', () => {
  it('moves on a break after each answer and ignores answers of other sessions', () => {
    let s = startCoach(readyCoach('session-a1', { mode: 'on-answer', limitMs: 6000 }, calls), 0);
    expect(coachAnswer(s, { ...answer(0), sessionId: 'session-zz' }, 10)).toBe(s);
    s = coachTick(coachAnswer(s, answer(0), 1200), 1900);
    expect(s).toMatchObject({ phase: 'open', index: 1, sentAtMs: 1900 });
    expect(s.answers[0]).toEqual(answer(0));
    s = stopCoach(s);
    expect(outbox(s, drill, 'Hana')).toEqual({ kind: 'end', sessionId: 'session-a1', isStopped: true });
  });
});
