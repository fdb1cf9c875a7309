// Pure: imports only zod and shared files. The match summary of one recording: points, cycle figures, RP progress.
import type { Cycle, MatchSummary } from '../../schemas/cycle';
import { bargeStateSchema, rankingPointProgress, scoreEvents, type ScoringEvent, type ScoringPhase } from '../season/points';
import { reefLevelSchema, type SeasonProfile } from '../season/season-profile';
import { phaseOfEvent, phaseTimeline, str, type CycleEvent } from './analyze';
import { durationStats } from './stats';

/** The season's scoring events of this robot: leave, coral placed, algae scored and the barge state at the end. */
export function scoringEvents(events: readonly CycleEvent[]): (ScoringEvent & { tS: number })[] {
  const phaseAt = phaseTimeline(events);
  const phaseFor = (e: CycleEvent): ScoringPhase => phaseOfEvent(phaseAt, e.tS, e.data);
  const out: (ScoringEvent & { tS: number })[] = [];
  for (const e of events) {
    if (e.kind === 'leave') out.push({ kind: 'leave', tS: e.tS });
    if (e.kind === 'placed') {
      const level = reefLevelSchema.safeParse(str(e.data, 'level'));
      if (level.success) out.push({ kind: 'coral', level: level.data, phase: phaseFor(e), tS: e.tS });
    }
    if (e.kind === 'algae_scored') {
      const where = str(e.data, 'where');
      if (where === 'processor' || where === 'net') out.push({ kind: 'algae', target: where, phase: phaseFor(e), tS: e.tS });
    }
    if (e.kind === 'cage') {
      const state = bargeStateSchema.safeParse(str(e.data, 'kind'));
      if (state.success) out.push({ kind: 'barge', state: state.data, tS: e.tS });
    }
  }
  // The barge is judged once, at the end: only the last barge state counts.
  const lastBarge = out.findLastIndex((e) => e.kind === 'barge');
  return out.filter((e, i) => e.kind !== 'barge' || i === lastBarge);
}

const phaseOf = (e: ScoringEvent): ScoringPhase => (e.kind === 'leave' ? 'auto' : e.kind === 'barge' ? 'teleop' : e.phase);

/**
 * Points by category and phase from the season's table, cycle count and outcomes, median/p90 cycle time over place
 * attempts, call-to-place latency, and ranking-point progress from this robot's events alone (the other alliance's
 * processor count is unknown here, so coopertition is never assumed).
 */
export function matchSummary(season: SeasonProfile, events: readonly CycleEvent[], cycles: readonly Cycle[]): MatchSummary {
  const scoring = scoringEvents(events);
  const all = scoreEvents(season, scoring);
  const inPhase = (phase: ScoringPhase) => scoreEvents(season, scoring.filter((e) => phaseOf(e) === phase)).byCategory;
  const attempts = cycles.filter((c) => c.outcome === 'scored' || c.outcome === 'missed');
  const progress = rankingPointProgress(season, scoring, 0);
  const rules = season.rankingPoints;
  const count = (outcome: Cycle['outcome']) => cycles.filter((c) => c.outcome === outcome).length;
  return {
    points: {
      total: all.totalPoints,
      byPhase: all.byPhase,
      byCategory: all.byCategory,
      byCategoryAndPhase: { auto: inPhase('auto'), teleop: inPhase('teleop') },
      coralByLevel: all.coralPointsByLevel,
      coralCountByLevel: all.coralCountByLevel,
    },
    cycleCount: cycles.length,
    outcomes: { scored: count('scored'), missed: count('missed'), dropped: count('dropped'), unfinished: count('unfinished') },
    cycleTime: durationStats(attempts.map((c) => c.durationS)),
    callToPlace: durationStats(attempts.flatMap((c) => (c.callToPlaceS === null ? [] : [c.callToPlaceS]))),
    rankingPoints: {
      coral: {
        countByLevel: progress.coral.countByLevel,
        neededPerLevel: progress.coral.neededPerLevel,
        levelsMet: progress.coral.levelsMet,
        levelsNeeded: progress.coral.levelsNeeded,
        isEarned: progress.coral.isEarned,
        fromMemory: rules.coral.fromMemory,
        source: rules.coral.source,
      },
      auto: { ...progress.auto, fromMemory: rules.auto.fromMemory, source: rules.auto.source },
      barge: { ...progress.barge, fromMemory: rules.barge.fromMemory, source: rules.barge.source },
      bonusRankingPoints: progress.bonusRankingPoints,
    },
  };
}
