import { describe, expect, it } from 'vitest';
import { coachCall, coachEnd, dueAtMs, missingParts, readyRun, scoredSoFar, startRun, stopRun, tapRun, tickRun } from './drill-runner';

const calls = [{ branch: 'C', level: 'L4' }, { station: 'left' }] as const;

describe('a self-paced run at an interval', () => {
  it('counts down, shows each call on the interval and finishes after the last', () => {
    let s = startRun(readyRun({ mode: 'interval', intervalMs: 4000 }, [...calls]), 10_000);
    expect(s.phase).toBe('countdown');
    expect(dueAtMs(s)).toBe(13_000);
    s = tickRun(s, 13_000);
    expect(s).toMatchObject({ phase: 'open', records: [{ call: calls[0], shownAtMs: 0, taps: [] }] });
    s = tapRun(s, 'branch', 'D', 13_400);
    s = tapRun(s, 'branch', 'C', 13_700);
    expect(missingParts(s)).toEqual(['level']);
    s = tapRun(s, 'level', 'L4', 14_100);
    expect(s.phase).toBe('closed');
    expect(s.outcome).toMatchObject({ reactionMs: 1100, errors: 1, isMiss: false });
    expect(dueAtMs(s)).toBe(17_000);
    s = tickRun(s, 17_000);
    expect(s.records[1]).toMatchObject({ call: calls[1], shownAtMs: 4000 });
    expect(tickRun(s, 20_999).phase).toBe('open');
    // The last call's window and the run end together at an interval pace.
    s = tickRun(s, 21_000);
    expect(s.phase).toBe('finished');
    expect(s.outcome).toMatchObject({ isMiss: true, reactionMs: null });
    expect(scoredSoFar(s).map((c) => c.reactionMs)).toEqual([1100, null]);
  });

  it('catches up when the page was asleep past several moments', () => {
    const s = tickRun(startRun(readyRun({ mode: 'interval', intervalMs: 2000 }, [...calls]), 0, 1000), 5200);
    expect(s.records.map((r) => r.shownAtMs)).toEqual([0, 2000]);
    expect(s.phase).toBe('closed');
  });

  it('leaves out the call still open when stopped', () => {
    let s = tickRun(startRun(readyRun({ mode: 'interval', intervalMs: 4000 }, [...calls]), 0, 1000), 1000);
    s = tapRun(tapRun(s, 'branch', 'C', 1500), 'level', 'L4', 1900);
    s = tickRun(s, 5000);
    s = stopRun(tapRun(s, 'station', 'right', 5400), 5600);
    expect(s).toMatchObject({ phase: 'finished', isStopped: true, outcome: null });
    expect(s.records.map((r) => r.call)).toEqual([calls[0]]);
    expect(stopRun(s, 9000)).toBe(s);
  });

  it('ignores taps outside an open call', () => {
    const s = startRun(readyRun({ mode: 'interval', intervalMs: 2000 }, [...calls]), 0);
    expect(tapRun(s, 'branch', 'C', 100)).toBe(s);
  });
});

describe('a self-paced run on answer', () => {
  it('shows the next call a break after the answer', () => {
    let s = tickRun(startRun(readyRun({ mode: 'on-answer', limitMs: 5000 }, [...calls]), 0, 1000), 1000);
    s = tapRun(tapRun(s, 'level', 'L4', 1600), 'branch', 'C', 1900);
    expect(dueAtMs(s)).toBe(1900 + 700);
    s = tickRun(s, 2600);
    expect(s.records[1]!.shownAtMs).toBe(1600);
  });
});

describe('a coached run', () => {
  it('follows the coach’s calls, closes an open call when the next arrives and finishes on end', () => {
    let s = readyRun({ mode: 'coached', windowMs: 4000 });
    s = coachCall(s, 'session-a1', 0, { branch: 'A', level: 'L2' }, 4000, 50_000);
    expect(s).toMatchObject({ phase: 'open', t0Ms: 50_000, sessionId: 'session-a1' });
    expect(coachCall(s, 'session-a1', 0, { branch: 'A', level: 'L2' }, 4000, 50_100)).toBe(s);
    s = tapRun(s, 'branch', 'A', 50_600);
    s = coachCall(s, 'session-a1', 1, { station: 'right' }, 4000, 51_000);
    expect(s.records.map((r) => r.shownAtMs)).toEqual([0, 1000]);
    s = tapRun(s, 'station', 'right', 51_800);
    expect(s.outcome).toMatchObject({ reactionMs: 800 });
    s = coachEnd(s, 'session-a1', false, 53_000);
    expect(s.phase).toBe('finished');
    expect(scoredSoFar(s).map((c) => c.isMiss)).toEqual([true, false]);
  });

  it('leaves out the open call when the coach stops', () => {
    let s = coachCall(readyRun({ mode: 'coached', windowMs: 4000 }), 'session-a1', 0, { level: 'L1' }, 4000, 0);
    s = tapRun(s, 'level', 'L1', 500);
    s = coachCall(s, 'session-a1', 1, { level: 'L2' }, 4000, 1000);
    s = coachEnd(s, 'session-a1', true, 1500);
    expect(s).toMatchObject({ phase: 'finished', isStopped: true });
    expect(s.records.map((r) => r.call)).toEqual([{ level: 'L1' }]);
  });

  it('starts over when a new session begins, and ignores the end of another session', () => {
    let s = coachCall(readyRun({ mode: 'coached', windowMs: 4000 }), 'session-a1', 0, { level: 'L1' }, 4000, 0);
    expect(coachEnd(s, 'session-b2', true, 10)).toBe(s);
    s = coachCall(s, 'session-b2', 0, { level: 'L3' }, 3000, 100);
    expect(s.records).toEqual([{ call: { level: 'L3' }, shownAtMs: 0, taps: [] }]);
  });
});
