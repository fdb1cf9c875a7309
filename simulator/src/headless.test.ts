import { describe, expect, it } from 'vitest';
import { BRANCH_LETTERS } from '../../shared/domain/channels';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { scoreEvents, type ScoringEvent } from '../../shared/domain/season/points';
import { season2025 } from '../../shared/domain/season/season-2025';
import { REEF_LEVELS } from '../../shared/domain/season/season-profile';
import { runHeadlessMatch, type HeadlessMatch } from './headless';
import { SIM_SIGNALS, simSignalIndex } from './signals';

const play = (seed: number, alliance: 'blue' | 'red' = 'blue') =>
  runHeadlessMatch({ seed, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance });

const toScoring = (match: HeadlessMatch): ScoringEvent[] =>
  match.events.flatMap((e): ScoringEvent[] => {
    if (e.kind === 'leave') return [{ kind: 'leave' }];
    if (e.kind === 'placed') return [{ kind: 'coral', level: e.data.level as 'L1', phase: e.data.phase as 'auto' }];
    if (e.kind === 'algae_scored') return [{ kind: 'algae', target: e.data.where as 'net', phase: e.data.phase as 'auto' }];
    if (e.kind === 'cage') return [{ kind: 'barge', state: e.data.kind as 'park' }];
    return [];
  });

describe('runHeadlessMatch', () => {
  const first = play(19850);

  // Two more whole matches: about 2 s on a quiet machine, so it gets room on a busy one.
  it('gives deep-equal output for the same seed and different events for another', { timeout: 30_000 }, () => {
    expect(play(19850)).toEqual(first);
    expect(play(19851).events).not.toEqual(first.events);
  });

  it('scores a plausible number of coral, each placed event naming its branch and level', () => {
    const placed = first.events.filter((e) => e.kind === 'placed');
    expect(placed.length).toBeGreaterThan(3);
    expect(placed.length).toBeLessThan(40);
    for (const e of placed) {
      expect(BRANCH_LETTERS).toContain(e.data.branch);
      expect(REEF_LEVELS).toContain(e.data.level);
    }
    expect(placed.some((e) => e.data.phase === 'auto')).toBe(true);
  });

  it('plays auto, teleop and a little disabled time, changing mode at 0 s, 15 s and 150 s', () => {
    const modes = first.events.filter((e) => e.kind === 'mode_changed').map((e) => [e.tMs, e.data.to]);
    expect(modes).toEqual([
      [0, 'auto'],
      [15000, 'teleop'],
      [150000, 'disabled'],
    ]);
  });

  it('covers robot time from 0 ms in back-to-back batches of 5 ticks of every signal', () => {
    expect(first.signals).toBe(SIM_SIGNALS);
    expect(first.batches[0]!.t0Ms).toBe(0);
    first.batches.forEach((b, i) => {
      expect(b.dtMs).toBeCloseTo(20, 9);
      expect(b.rows.length).toBe(b.ticks);
      expect(b.rows.every((r) => r.length === SIM_SIGNALS.length)).toBe(true);
      const next = first.batches[i + 1];
      if (next) expect(next.t0Ms).toBeCloseTo(b.t0Ms + b.ticks * b.dtMs, 6);
    });
    // 152 s at 50 Hz is 7600 steps after the t = 0 sample: 7601 rows, 1520 full batches and one of a single tick.
    expect(first.batches.reduce((n, b) => n + b.ticks, 0)).toBe(7601);
    expect(first.batches.length).toBe(1521);
  });

  it('numbers batches and events with one counter in sending order', () => {
    const sent = [
      ...first.events.map((e) => ({ seq: e.seq, atMs: e.tMs })),
      ...first.batches.map((b) => ({ seq: b.seq, atMs: b.t0Ms + (b.ticks - 1) * b.dtMs })),
    ].sort((a, b) => a.seq - b.seq);
    sent.forEach((s, i) => {
      expect(s.seq).toBe(i);
      if (i > 0) expect(s.atMs).toBeGreaterThanOrEqual(sent[i - 1]!.atMs - 1e-6);
    });
  });

  it('keeps the robot’s own points signal equal to the season’s scoring of its events', () => {
    const lastRow = first.batches.at(-1)!.rows.at(-1)!;
    expect(lastRow[simSignalIndex('game/points')]).toBe(scoreEvents(season2025, toScoring(first)).totalPoints);
  });

  it('records every applied selection with its time, and the robot adopts the final ones', () => {
    expect(first.selections.length).toBeGreaterThan(10);
    const lastCage = first.selections.filter((s) => s.channel === 'op/cage').at(-1)!;
    expect(['park', 'shallow', 'deep']).toContain(lastCage.value);
    expect(first.events.filter((e) => e.kind === 'cage').length).toBe(1);
  });

  it('plays a red match without NaN in any row', () => {
    const red = play(7, 'red');
    expect(red.events.filter((e) => e.kind === 'placed').length).toBeGreaterThan(3);
    expect(red.batches.every((b) => b.rows.every((r) => !r.some((v) => Number.isNaN(v))))).toBe(true);
  });
});
