// Pure: imports only zod and shared files. The drills API contract: drills, results of runs, personal bests.
import { z } from 'zod';
import { drillCallSchema } from '../domain/drills/drill-calls';
import { drillPaceSchema, drillPlanSchema, DRILL_MAX_CALLS } from '../domain/drills/drill-plan';
import { drillCallRecordSchema, drillTapSchema } from '../domain/drills/drill-scoring';
import { roleSchema } from '../domain/roles';

const isoTime = z.string().datetime({ offset: true });
const person = z.object({ id: z.string().uuid().nullable(), name: z.string() });

export const drillNameSchema = z.string().trim().min(1, 'Name the drill').max(80, 'Use at most 80 characters');

export const drillSchema = z.object({
  id: z.string().uuid(),
  name: z.string(),
  plan: drillPlanSchema,
  pace: drillPaceSchema,
  createdBy: person,
  createdAt: isoTime,
  updatedAt: isoTime,
  /** Runs stored for this drill, by anyone of the team. */
  resultCount: z.number().int().nonnegative(),
});
export type Drill = z.infer<typeof drillSchema>;
export const drillListSchema = z.object({ drills: z.array(drillSchema) });

/** Create, or replace on PUT. */
export const drillBodySchema = z.object({ name: drillNameSchema, plan: drillPlanSchema, pace: drillPaceSchema });
export type DrillBody = z.infer<typeof drillBodySchema>;

/** `self`: the operator started it on their device; `coached`: a coach sent the calls over the relay. */
export const drillRunModeSchema = z.enum(['self', 'coached']);
export type DrillRunMode = z.infer<typeof drillRunModeSchema>;

/** What the operator's device submits after a run; the server scores it with the drill's pace. */
export const drillResultBodySchema = z.object({
  drillId: z.string().uuid({ message: 'Not a drill id' }),
  startedAt: isoTime,
  mode: drillRunModeSchema,
  /** The coach who sent the calls of a coached run, as the relay named them. */
  coachName: z.string().trim().max(80).nullable(),
  /** Whether each answer was also published to the standard op/ channels for the simulator. */
  isSimulatorDriven: z.boolean(),
  /** The seed of a random plan's calls, when the device drew them. */
  seed: z.number().int().nonnegative().max(2 ** 32 - 1).nullable(),
  calls: z.array(drillCallRecordSchema).min(1, 'A result has at least one call').max(DRILL_MAX_CALLS),
});
export type DrillResultBody = z.infer<typeof drillResultBodySchema>;

export const drillStatsSchema = z.object({
  callCount: z.number().int().nonnegative(),
  answeredCount: z.number().int().nonnegative(),
  missCount: z.number().int().nonnegative(),
  errorCount: z.number().int().nonnegative(),
  cleanCount: z.number().int().nonnegative(),
  accuracy: z.number().min(0).max(1),
  medianMs: z.number().nullable(),
  p90Ms: z.number().nullable(),
  meanMs: z.number().nullable(),
  fastestMs: z.number().nullable(),
});

export const drillResultSchema = z.object({
  id: z.string().uuid(),
  /** Null once the drill is deleted; the name stays. */
  drillId: z.string().uuid().nullable(),
  drillName: z.string(),
  operator: person.extend({ role: roleSchema }),
  mode: drillRunModeSchema,
  coachName: z.string().nullable(),
  isSimulatorDriven: z.boolean(),
  /** Every call of the drill was shown (a stopped run is stored but not counted for bests). */
  isComplete: z.boolean(),
  startedAt: isoTime,
  finishedAt: isoTime,
  stats: drillStatsSchema,
});
export type DrillResult = z.infer<typeof drillResultSchema>;
export const drillResultListSchema = z.object({ results: z.array(drillResultSchema) });

export const scoredCallSchema = z.object({
  call: drillCallSchema,
  shownAtMs: z.number(),
  reactionMs: z.number().nullable(),
  errors: z.number().int().nonnegative(),
  isMiss: z.boolean(),
  taps: z.array(drillTapSchema),
});
export const drillResultDetailSchema = drillResultSchema.extend({ calls: z.array(scoredCallSchema) });
export type DrillResultDetail = z.infer<typeof drillResultDetailSchema>;

/** The answer to a submitted result: the stored result and which personal bests it beat. */
export const submittedDrillResultSchema = drillResultDetailSchema.extend({
  newBests: z.object({ median: z.boolean(), fastest: z.boolean(), accuracy: z.boolean() }),
});
export type SubmittedDrillResult = z.infer<typeof submittedDrillResultSchema>;

export const personalBestSchema = z.object({
  operator: person,
  drillId: z.string().uuid().nullable(),
  drillName: z.string(),
  runCount: z.number().int().positive(),
  bestMedianMs: z.number().nullable(),
  bestMedianRunId: z.string().uuid().nullable(),
  bestAccuracy: z.number().min(0).max(1),
  fastestMs: z.number().nullable(),
  lastRunAt: isoTime,
});
export type PersonalBestEntry = z.infer<typeof personalBestSchema>;
export const personalBestListSchema = z.object({ bests: z.array(personalBestSchema) });

export const drillParamsSchema = z.object({ id: z.string().uuid({ message: 'Not a drill id' }) });
export const drillResultParamsSchema = z.object({ resultId: z.string().uuid({ message: 'Not a result id' }) });

/** Filters of GET /api/drills/results and /api/drills/bests. */
export const drillResultQuerySchema = z.object({
  drillId: z.string().uuid({ message: 'Not a drill id' }).optional(),
  operatorId: z.string().uuid({ message: 'Not a member id' }).optional(),
  /** Newest N, returned oldest first. */
  limit: z.coerce.number().int().min(1).max(500).default(200),
});
export type DrillResultQuery = z.infer<typeof drillResultQuerySchema>;
