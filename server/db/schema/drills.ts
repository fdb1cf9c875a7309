import { boolean, doublePrecision, index, integer, jsonb, pgTable, primaryKey, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { DrillCall } from '../../../shared/domain/drills/drill-calls';
import type { DrillPace, DrillPlan } from '../../../shared/domain/drills/drill-plan';
import type { DrillTap } from '../../../shared/domain/drills/drill-scoring';
import { roleEnum, teams, users } from './auth';

/** A team's drills: where the calls come from, their pace and count. */
export const drills = pgTable(
  'drills',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    plan: jsonb('plan').$type<DrillPlan>().notNull(),
    pace: jsonb('pace').$type<DrillPace>().notNull(),
    createdById: uuid('created_by_id').references(() => users.id, { onDelete: 'set null' }),
    createdByName: text('created_by_name').notNull(),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index('drills_team_idx').on(t.teamId, t.name)],
);

/** One run of a drill by one operator, with the stats the server scored. Kept when the drill is deleted. */
export const drillResults = pgTable(
  'drill_results',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    drillId: uuid('drill_id').references(() => drills.id, { onDelete: 'set null' }),
    drillName: text('drill_name').notNull(),
    operatorId: uuid('operator_id').references(() => users.id, { onDelete: 'set null' }),
    operatorName: text('operator_name').notNull(),
    operatorRole: roleEnum('operator_role').notNull(),
    /** 'self' | 'coached' */
    mode: text('mode').notNull(),
    coachName: text('coach_name'),
    isSimulatorDriven: boolean('is_simulator_driven').notNull(),
    isComplete: boolean('is_complete').notNull(),
    seed: integer('seed'),
    startedAt: timestamp('started_at', { withTimezone: true }).notNull(),
    finishedAt: timestamp('finished_at', { withTimezone: true }).notNull().defaultNow(),
    callCount: integer('call_count').notNull(),
    answeredCount: integer('answered_count').notNull(),
    missCount: integer('miss_count').notNull(),
    errorCount: integer('error_count').notNull(),
    cleanCount: integer('clean_count').notNull(),
    accuracy: doublePrecision('accuracy').notNull(),
    medianMs: doublePrecision('median_ms'),
    p90Ms: doublePrecision('p90_ms'),
    meanMs: doublePrecision('mean_ms'),
    fastestMs: doublePrecision('fastest_ms'),
  },
  (t) => [
    index('drill_results_team_time_idx').on(t.teamId, t.startedAt),
    index('drill_results_operator_idx').on(t.teamId, t.operatorId, t.startedAt),
  ],
);

/** Each call of a run: what was called, when, the taps while it was open and how it scored. */
export const drillResultCalls = pgTable(
  'drill_result_calls',
  {
    resultId: uuid('result_id').notNull().references(() => drillResults.id, { onDelete: 'cascade' }),
    index: integer('index').notNull(),
    call: jsonb('call').$type<DrillCall>().notNull(),
    /** Ms from the run's start. */
    shownAtMs: doublePrecision('shown_at_ms').notNull(),
    reactionMs: doublePrecision('reaction_ms'),
    errors: integer('errors').notNull(),
    isMiss: boolean('is_miss').notNull(),
    taps: jsonb('taps').$type<DrillTap[]>().notNull(),
  },
  (t) => [primaryKey({ columns: [t.resultId, t.index] })],
);
