import { describe, expect, it } from 'vitest';
import {
  eventPoints,
  matchPhaseAt,
  matchRankingPoints,
  rankingPointProgress,
  scoreEvents,
  scoringEventSchema,
  type ScoringEvent,
} from './points';
import { season2025 } from './season-2025';
import type { ReefLevel } from './season-profile';

// The scoring table is [GM] table 6-2 from memory (FACTS.md, med); every check below inherits that status.
const leave: ScoringEvent = { kind: 'leave' };
const coral = (level: ReefLevel, phase: 'auto' | 'teleop'): ScoringEvent => ({ kind: 'coral', level, phase });
const processor: ScoringEvent = { kind: 'algae', target: 'processor', phase: 'teleop' };
const times = (n: number, e: ScoringEvent): ScoringEvent[] => Array.from({ length: n }, () => e);

describe('eventPoints', () => {
  it.each([
    [leave, 3, 'auto'],
    [coral('L1', 'auto'), 3, 'auto'],
    [coral('L1', 'teleop'), 2, 'teleop'],
    [coral('L2', 'auto'), 4, 'auto'],
    [coral('L2', 'teleop'), 3, 'teleop'],
    [coral('L3', 'auto'), 6, 'auto'],
    [coral('L3', 'teleop'), 4, 'teleop'],
    [coral('L4', 'auto'), 7, 'auto'],
    [coral('L4', 'teleop'), 5, 'teleop'],
    [{ kind: 'algae', target: 'processor', phase: 'auto' }, 6, 'auto'],
    [{ kind: 'algae', target: 'net', phase: 'teleop' }, 4, 'teleop'],
    [{ kind: 'barge', state: 'park' }, 2, 'teleop'],
    [{ kind: 'barge', state: 'shallow' }, 6, 'teleop'],
    [{ kind: 'barge', state: 'deep' }, 12, 'teleop'],
  ] as [ScoringEvent, number, string][])('scores %o as %d points in %s (table from memory)', (event, points, phase) => {
    expect(eventPoints(season2025, event)).toEqual({ points, phase });
  });
});

describe('scoreEvents', () => {
  // FACTS.md worked arithmetic (inherits the table's "from memory" status):
  // auto with 3 leaves, 1 coral on L4 and 2 in the trough = 9 + 7 + 6 = 22.
  it('scores 3 leaves, one L4 and two trough coral in auto as 22 (from memory)', () => {
    const events = [leave, leave, leave, coral('L4', 'auto'), coral('L1', 'auto'), coral('L1', 'auto')];
    const result = scoreEvents(season2025, events);
    expect(result.totalPoints).toBe(22);
    expect(result.byPhase).toEqual({ auto: 22, teleop: 0 });
    expect(result.byCategory).toEqual({ leave: 9, coral: 13, algae: 0, barge: 0 });
    expect(result.coralCountByLevel).toEqual({ L1: 2, L2: 0, L3: 0, L4: 1 });
    expect(result.coralPointsByLevel).toEqual({ L1: 6, L2: 0, L3: 0, L4: 7 });
  });

  // Hand sum with the table from memory: 2 × 6 processor + 3 × 4 net + 12 deep = 36, all teleop.
  it('adds algae and barge points into teleop', () => {
    const events: ScoringEvent[] = [
      processor,
      processor,
      ...times(3, { kind: 'algae', target: 'net', phase: 'teleop' }),
      { kind: 'barge', state: 'deep' },
    ];
    const result = scoreEvents(season2025, events);
    expect(result.totalPoints).toBe(36);
    expect(result.byPhase.teleop).toBe(36);
    expect(result.processorAlgaeCount).toBe(2);
    expect(result.netAlgaeCount).toBe(3);
  });

  it('scores an empty match as 0', () => {
    expect(scoreEvents(season2025, []).totalPoints).toBe(0);
  });
});

describe('rankingPointProgress', () => {
  // FACTS.md: deep + park = 12 + 2 = 14 meets the barge RP (≥ 14); shallow + shallow = 6 + 6 = 12 does not (from memory).
  it.each([
    [['deep', 'park'], 14, true],
    [['shallow', 'shallow'], 12, false],
    [['deep', 'shallow', 'park'], 20, true],
  ] as const)('counts barge %o as %d points, RP earned: %s (from memory)', (states, points, isEarned) => {
    const events: ScoringEvent[] = states.map((state) => ({ kind: 'barge', state }));
    expect(rankingPointProgress(season2025, events, 0).barge).toEqual({ points, pointsNeeded: 14, isEarned });
  });

  // [GM] 6.5.4 via secondary text: ≥ 5 coral on each of the four levels.
  it('needs 5 coral on all four levels without coopertition', () => {
    const events = [...times(5, coral('L1', 'teleop')), ...times(5, coral('L2', 'teleop')), ...times(5, coral('L3', 'teleop'))];
    const progress = rankingPointProgress(season2025, events, 5);
    expect(progress.coral.levelsMet).toEqual(['L1', 'L2', 'L3']);
    expect(progress.coral.levelsNeeded).toBe(4);
    expect(progress.coral.isCoopertition).toBe(false);
    expect(progress.coral.isEarned).toBe(false);
  });

  // [GM] 4: when each alliance scores ≥ 2 algae in its processor, 3 levels are enough.
  it('needs only 3 levels when both alliances put 2 algae in their processors', () => {
    const events = [
      ...times(5, coral('L2', 'teleop')),
      ...times(4, coral('L3', 'teleop')),
      coral('L3', 'auto'),
      ...times(6, coral('L4', 'teleop')),
      processor,
      processor,
    ];
    const progress = rankingPointProgress(season2025, events, 2);
    expect(progress.coral.isCoopertition).toBe(true);
    expect(progress.coral.levelsNeeded).toBe(3);
    expect(progress.coral.levelsMet).toEqual(['L2', 'L3', 'L4']);
    expect(progress.coral.isEarned).toBe(true);
  });

  it('withholds coopertition when the opponent has only 1 processor algae', () => {
    const events = [processor, processor];
    expect(rankingPointProgress(season2025, events, 1).coral.isCoopertition).toBe(false);
  });

  // Auto RP from memory (FACTS.md): every robot leaves and at least 1 coral is scored in auto.
  it.each([
    [[leave, leave, leave, coral('L1', 'auto')], true],
    [[leave, leave, coral('L4', 'auto')], false],
    [[leave, leave, leave, coral('L4', 'teleop')], false],
  ] as const)('decides the auto RP for %o as %s (from memory)', (events, isEarned) => {
    expect(rankingPointProgress(season2025, events, 0).auto.isEarned).toBe(isEarned);
  });

  it('counts at most one leave per robot', () => {
    expect(rankingPointProgress(season2025, times(5, leave), 0).auto.leaves).toBe(3);
  });

  it('counts the bonus ranking points earned', () => {
    const events: ScoringEvent[] = [leave, leave, leave, coral('L1', 'auto'), { kind: 'barge', state: 'deep' }, { kind: 'barge', state: 'park' }];
    expect(rankingPointProgress(season2025, events, 0).bonusRankingPoints).toBe(2);
  });
});

describe('matchRankingPoints', () => {
  // Win 3, tie 1 (from memory), plus bonus points.
  it.each([
    [100, 80, 0, 3],
    [80, 80, 0, 1],
    [60, 80, 2, 2],
    [100, 80, 3, 6],
  ])('gives %d vs %d with %d bonus RP a total of %d RP (from memory)', (own, opp, bonus, expected) => {
    expect(matchRankingPoints(season2025, own, opp, { bonusRankingPoints: bonus })).toBe(expected);
  });
});

describe('matchPhaseAt', () => {
  // [GM] 4: auto 15 s, teleop 135 s; endgame the last 20 s (from memory) → from 130 s to 150 s.
  it.each([
    [-1, 'pre', false],
    [0, 'auto', false],
    [14.99, 'auto', false],
    [15, 'teleop', false],
    [129.9, 'teleop', false],
    [130, 'teleop', true],
    [149.9, 'teleop', true],
    [150, 'post', false],
  ] as const)('at %f s is %s (endgame: %s)', (tS, phase, isEndgame) => {
    expect(matchPhaseAt(season2025, tS)).toEqual({ phase, isEndgame });
  });
});

describe('scoringEventSchema', () => {
  it('rejects coral at a level the reef lacks', () => {
    expect(scoringEventSchema.safeParse({ kind: 'coral', level: 'L5', phase: 'auto' }).success).toBe(false);
  });
});
