// Pure: imports only zod and relative shared files. Match points and ranking-point progress from scoring events.
import { z } from 'zod';
import { REEF_LEVELS, reefLevelSchema, type ReefLevel, type SeasonProfile } from './season-profile';

export const scoringPhaseSchema = z.enum(['auto', 'teleop']);
export type ScoringPhase = z.infer<typeof scoringPhaseSchema>;

export const bargeStateSchema = z.enum(['park', 'shallow', 'deep']);
export type BargeState = z.infer<typeof bargeStateSchema>;

/** One alliance's scoring event. Leaving only scores in auto; the barge is judged at the end of teleop. */
export const scoringEventSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('leave') }),
  z.object({ kind: z.literal('coral'), level: reefLevelSchema, phase: scoringPhaseSchema }),
  z.object({ kind: z.literal('algae'), target: z.enum(['processor', 'net']), phase: scoringPhaseSchema }),
  z.object({ kind: z.literal('barge'), state: bargeStateSchema }),
]);
export type ScoringEvent = z.infer<typeof scoringEventSchema>;

export type PointsCategory = 'leave' | 'coral' | 'algae' | 'barge';

export type PointsBreakdown = {
  totalPoints: number;
  byPhase: Record<ScoringPhase, number>;
  byCategory: Record<PointsCategory, number>;
  coralPointsByLevel: Record<ReefLevel, number>;
  coralCountByLevel: Record<ReefLevel, number>;
  processorAlgaeCount: number;
  netAlgaeCount: number;
};

const perLevel = (n: number): Record<ReefLevel, number> => ({ L1: n, L2: n, L3: n, L4: n });

/** Points of one event in the season's scoring table, with the phase they count in. */
export function eventPoints(season: SeasonProfile, event: ScoringEvent): { points: number; phase: ScoringPhase } {
  const table = season.scoring;
  switch (event.kind) {
    case 'leave':
      return { points: table.leave.value, phase: 'auto' };
    case 'coral': {
      const row = table.coral[event.level].value;
      return { points: event.phase === 'auto' ? row.autoPoints : row.teleopPoints, phase: event.phase };
    }
    case 'algae':
      return { points: table.algae[event.target].value, phase: event.phase };
    case 'barge':
      return { points: table.barge[event.state].value, phase: 'teleop' };
  }
}

/** Points for one alliance's events by phase, category and level; an empty list scores 0 everywhere. */
export function scoreEvents(season: SeasonProfile, events: readonly ScoringEvent[]): PointsBreakdown {
  const out: PointsBreakdown = {
    totalPoints: 0,
    byPhase: { auto: 0, teleop: 0 },
    byCategory: { leave: 0, coral: 0, algae: 0, barge: 0 },
    coralPointsByLevel: perLevel(0),
    coralCountByLevel: perLevel(0),
    processorAlgaeCount: 0,
    netAlgaeCount: 0,
  };
  for (const event of events) {
    const { points, phase } = eventPoints(season, event);
    out.totalPoints += points;
    out.byPhase[phase] += points;
    out.byCategory[event.kind] += points;
    if (event.kind === 'coral') {
      out.coralPointsByLevel[event.level] += points;
      out.coralCountByLevel[event.level] += 1;
    }
    if (event.kind === 'algae' && event.target === 'processor') out.processorAlgaeCount += 1;
    if (event.kind === 'algae' && event.target === 'net') out.netAlgaeCount += 1;
  }
  return out;
}

export type RankingPointProgress = {
  coral: {
    countByLevel: Record<ReefLevel, number>;
    neededPerLevel: number;
    levelsMet: ReefLevel[];
    levelsNeeded: number;
    isCoopertition: boolean;
    isEarned: boolean;
  };
  auto: { leaves: number; leavesNeeded: number; autoCoral: number; autoCoralNeeded: number; isEarned: boolean };
  barge: { points: number; pointsNeeded: number; isEarned: boolean };
  /** Bonus ranking points earned so far (coral + auto + barge), not counting win or tie. */
  bonusRankingPoints: number;
};

/**
 * Ranking-point progress for one alliance's events; opponentProcessorAlgae is the other alliance's processor count,
 * which with this alliance's own decides coopertition. Leaves count up to one per robot on the alliance.
 */
export function rankingPointProgress(
  season: SeasonProfile,
  events: readonly ScoringEvent[],
  opponentProcessorAlgae: number,
): RankingPointProgress {
  const rules = season.rankingPoints;
  const points = scoreEvents(season, events);
  const coralRule = rules.coral.value;
  const isCoopertition =
    points.processorAlgaeCount >= rules.coopertition.value.processorAlgaePerAlliance &&
    opponentProcessorAlgae >= rules.coopertition.value.processorAlgaePerAlliance;
  const levelsNeeded = isCoopertition ? coralRule.levelsNeededWithCoopertition : coralRule.levelsNeeded;
  const levelsMet = REEF_LEVELS.filter((l) => points.coralCountByLevel[l] >= coralRule.coralPerLevel);

  const robots = season.robotsPerAlliance.value;
  const autoRule = rules.auto.value;
  const leaves = Math.min(robots, events.filter((e) => e.kind === 'leave').length);
  const leavesNeeded = autoRule.allRobotsLeave ? robots : 0;
  const autoCoral = events.filter((e) => e.kind === 'coral' && e.phase === 'auto').length;

  const bargeNeeded = rules.barge.value.minBargePoints;
  const coral = {
    countByLevel: points.coralCountByLevel,
    neededPerLevel: coralRule.coralPerLevel,
    levelsMet,
    levelsNeeded,
    isCoopertition,
    isEarned: levelsMet.length >= levelsNeeded,
  };
  const auto = {
    leaves,
    leavesNeeded,
    autoCoral,
    autoCoralNeeded: autoRule.minAutoCoral,
    isEarned: leaves >= leavesNeeded && autoCoral >= autoRule.minAutoCoral,
  };
  const barge = { points: points.byCategory.barge, pointsNeeded: bargeNeeded, isEarned: points.byCategory.barge >= bargeNeeded };
  return { coral, auto, barge, bonusRankingPoints: [coral, auto, barge].filter((rp) => rp.isEarned).length };
}

/** Ranking points for a qualification match: win/tie points plus the bonus ones; a loss scores only the bonus. */
export function matchRankingPoints(
  season: SeasonProfile,
  ownPoints: number,
  opponentPoints: number,
  progress: Pick<RankingPointProgress, 'bonusRankingPoints'>,
): number {
  const rules = season.rankingPoints;
  const result = ownPoints > opponentPoints ? rules.win.value : ownPoints === opponentPoints ? rules.tie.value : 0;
  return result + progress.bonusRankingPoints;
}

export type MatchPhase = 'pre' | 'auto' | 'teleop' | 'post';

/** Phase at tS seconds of match time (0 = auto starts, teleop follows with no gap); endgame is teleop's last part. */
export function matchPhaseAt(season: SeasonProfile, tS: number): { phase: MatchPhase; isEndgame: boolean } {
  const autoS = season.phases.autoDurationS.value;
  const endS = autoS + season.phases.teleopDurationS.value;
  if (tS < 0) return { phase: 'pre', isEndgame: false };
  if (tS < autoS) return { phase: 'auto', isEndgame: false };
  if (tS < endS) return { phase: 'teleop', isEndgame: tS >= endS - season.phases.endgameDurationS.value };
  return { phase: 'post', isEndgame: false };
}
