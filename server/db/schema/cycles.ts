import { boolean, doublePrecision, index, integer, jsonb, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { MatchSummary } from '../../../shared/schemas/cycle';
import { teams } from './auth';
import { recordings } from './recordings';

/**
 * One row per cycle of a finished recording, computed once by the cycle analysis (shared/domain/cycles) and
 * deleted with its recording. Times are seconds from the recording's start; the team is kept for the review's filter.
 */
export const recordingCycles = pgTable(
  'recording_cycles',
  {
    recordingId: uuid('recording_id').notNull().references(() => recordings.id, { onDelete: 'cascade' }),
    teamId: uuid('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    index: integer('index').notNull(),
    piece: text('piece').notNull(),
    phase: text('phase').notNull(),
    crossesPhase: boolean('crosses_phase').notNull(),
    isPreload: boolean('is_preload').notNull(),
    startS: doublePrecision('start_s').notNull(),
    acquiredS: doublePrecision('acquired_s').notNull(),
    alignStartS: doublePrecision('align_start_s'),
    placeStartS: doublePrecision('place_start_s'),
    endS: doublePrecision('end_s').notNull(),
    durationS: doublePrecision('duration_s').notNull(),
    acquireS: doublePrecision('acquire_s').notNull(),
    travelS: doublePrecision('travel_s'),
    alignS: doublePrecision('align_s'),
    placeS: doublePrecision('place_s'),
    calledBranch: text('called_branch'),
    calledLevel: text('called_level'),
    calledAlgae: text('called_algae'),
    calledAtS: doublePrecision('called_at_s'),
    reachedBranch: text('reached_branch'),
    reachedLevel: text('reached_level'),
    reachedAlgae: text('reached_algae'),
    isOnTarget: boolean('is_on_target'),
    level: text('level'),
    face: text('face'),
    station: text('station'),
    outcome: text('outcome').notNull(),
    endedBy: text('ended_by').notNull(),
    points: doublePrecision('points').notNull(),
    callToPlaceS: doublePrecision('call_to_place_s'),
  },
  (t) => [primaryKey({ columns: [t.recordingId, t.index] }), index('recording_cycles_team_idx').on(t.teamId, t.recordingId)],
);

/** The match summary of a recording's cycles; its presence at the current analysis version marks the cycles as stored. */
export const recordingCycleSummaries = pgTable(
  'recording_cycle_summaries',
  {
    recordingId: uuid('recording_id')
      .primaryKey()
      .references(() => recordings.id, { onDelete: 'cascade' }),
    teamId: uuid('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    analysisVersion: integer('analysis_version').notNull(),
    computedAt: timestamp('computed_at', { withTimezone: true }).notNull(),
    cycleCount: integer('cycle_count').notNull(),
    totalPoints: doublePrecision('total_points').notNull(),
    summary: jsonb('summary').$type<MatchSummary>().notNull(),
  },
  (t) => [index('recording_cycle_summaries_team_idx').on(t.teamId)],
);
