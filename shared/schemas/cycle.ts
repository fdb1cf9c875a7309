// The HTTP contract of cycles: a recording's cycles with its match summary, and the coach review across recordings.
import { z } from 'zod';
import { branchLetterSchema } from '../domain/channels';
import { reefLevelSchema } from '../domain/season/season-profile';
import { recordingKindSchema } from './recording';
import { isoDateSchema } from './team';

export const CYCLE_PIECES = ['coral', 'algae'] as const;
export const cyclePieceSchema = z.enum(CYCLE_PIECES);
export type CyclePiece = z.infer<typeof cyclePieceSchema>;

/** scored and missed end in a place attempt; dropped lost the piece; unfinished was still held when play stopped. */
export const CYCLE_OUTCOMES = ['scored', 'missed', 'dropped', 'unfinished'] as const;
export const cycleOutcomeSchema = z.enum(CYCLE_OUTCOMES);
export type CycleOutcome = z.infer<typeof cycleOutcomeSchema>;

/** What ended the cycle: its own event, a second pickup of the same piece, the robot disabled, or the recording's end. */
export const CYCLE_END_CAUSES = ['placed', 'missed', 'algae_scored', 'dropped', 'reacquired', 'disabled', 'recording_end'] as const;
export const cycleEndCauseSchema = z.enum(CYCLE_END_CAUSES);
export type CycleEndCause = z.infer<typeof cycleEndCauseSchema>;

export const cyclePhaseSchema = z.enum(['auto', 'teleop']);
export type CyclePhase = z.infer<typeof cyclePhaseSchema>;

export const algaeTargetSchema = z.enum(['processor', 'net']);

/** A reef target (branch and level) or an algae target; parts nobody called or reached are null. */
export const cycleTargetSchema = z.object({
  branch: branchLetterSchema.nullable(),
  level: reefLevelSchema.nullable(),
  algae: algaeTargetSchema.nullable(),
});
export type CycleTarget = z.infer<typeof cycleTargetSchema>;

const seconds = z.number().finite();
const duration = z.number().finite().nonnegative();

/**
 * One cycle; every time is seconds from the recording's start. Segments: acquire (startS → acquiredS), travel
 * (→ alignStartS), align (→ placeStartS), place (→ endS). Travel, align and place are null without a drive-speed signal.
 */
export const cycleSchema = z.object({
  index: z.number().int().nonnegative(),
  piece: cyclePieceSchema,
  /** The phase the cycle ended in (where its points count). */
  phase: cyclePhaseSchema,
  /** Started in auto and ended in teleop. */
  crossesPhase: z.boolean(),
  /** The piece was in the robot at the cycle's start (a preload, or a pickup the log does not show). */
  isPreload: z.boolean(),
  startS: seconds,
  acquiredS: seconds,
  alignStartS: seconds.nullable(),
  placeStartS: seconds.nullable(),
  endS: seconds,
  durationS: duration,
  segments: z.object({
    acquireS: duration,
    travelS: duration.nullable(),
    alignS: duration.nullable(),
    placeS: duration.nullable(),
  }),
  called: cycleTargetSchema,
  /** When the called target was last tapped, before the cycle's end; null when nothing was called. */
  calledAtS: seconds.nullable(),
  reached: cycleTargetSchema,
  /** The called target and the one reached agree (null when either is unknown). */
  isOnTarget: z.boolean().nullable(),
  level: reefLevelSchema.nullable(),
  /** The reef face by its branch pair, e.g. "C/D". */
  face: z.string().nullable(),
  /** Where the piece came from: a coral station (left/right), the reef for algae, null when unknown. */
  station: z.string().nullable(),
  outcome: cycleOutcomeSchema,
  endedBy: cycleEndCauseSchema,
  points: z.number().finite(),
  /** endS − calledAtS. */
  callToPlaceS: duration.nullable(),
});
export type Cycle = z.infer<typeof cycleSchema>;

export const levelCountsSchema = z.object({ L1: z.number(), L2: z.number(), L3: z.number(), L4: z.number() });

/** Median and p90 use linear interpolation between closest ranks (R type 7, SQL percentile_cont); null for no data. */
export const durationStatsSchema = z.object({
  count: z.number().int().nonnegative(),
  medianS: duration.nullable(),
  p90S: duration.nullable(),
  meanS: duration.nullable(),
});
export type DurationStats = z.infer<typeof durationStatsSchema>;

const rpPartSource = { fromMemory: z.boolean(), source: z.string() };

/** The match summary: this robot's points and cycle figures; RP progress counts only this robot's events. */
export const matchSummarySchema = z.object({
  points: z.object({
    total: z.number(),
    byPhase: z.object({ auto: z.number(), teleop: z.number() }),
    byCategory: z.object({ leave: z.number(), coral: z.number(), algae: z.number(), barge: z.number() }),
    /** Points of each category in each phase. */
    byCategoryAndPhase: z.object({
      auto: z.object({ leave: z.number(), coral: z.number(), algae: z.number(), barge: z.number() }),
      teleop: z.object({ leave: z.number(), coral: z.number(), algae: z.number(), barge: z.number() }),
    }),
    coralByLevel: levelCountsSchema,
    coralCountByLevel: levelCountsSchema,
  }),
  cycleCount: z.number().int().nonnegative(),
  outcomes: z.object({ scored: z.number().int(), missed: z.number().int(), dropped: z.number().int(), unfinished: z.number().int() }),
  /** Over cycles ending in a place attempt (scored or missed). */
  cycleTime: durationStatsSchema,
  callToPlace: durationStatsSchema,
  rankingPoints: z.object({
    coral: z.object({
      countByLevel: levelCountsSchema,
      neededPerLevel: z.number(),
      levelsMet: z.array(reefLevelSchema),
      levelsNeeded: z.number(),
      isEarned: z.boolean(),
      ...rpPartSource,
    }),
    auto: z.object({
      leaves: z.number(),
      leavesNeeded: z.number(),
      autoCoral: z.number(),
      autoCoralNeeded: z.number(),
      isEarned: z.boolean(),
      ...rpPartSource,
    }),
    barge: z.object({ points: z.number(), pointsNeeded: z.number(), isEarned: z.boolean(), ...rpPartSource }),
    bonusRankingPoints: z.number().int().nonnegative(),
  }),
});
export type MatchSummary = z.infer<typeof matchSummarySchema>;

/** GET /api/recordings/:id/cycles */
export const recordingCyclesSchema = z.object({
  recordingId: z.string().uuid(),
  analysisVersion: z.number().int().positive(),
  computedAt: isoDateSchema,
  cycles: z.array(cycleSchema),
  summary: matchSummarySchema,
});
export type RecordingCycles = z.infer<typeof recordingCyclesSchema>;

const blankToUndefined = (v: unknown) => (v === '' ? undefined : v);
const queryDate = z.preprocess(blankToUndefined, z.iso.date({ message: 'Dates are YYYY-MM-DD' }).optional());

/** GET /api/review/cycles query string; from and to are whole days of the recording's start (UTC), both included. */
export const reviewQuerySchema = z
  .object({
    event: z.preprocess(blankToUndefined, z.string().trim().max(120, 'The event name has at most 120 characters').optional()),
    from: queryDate,
    to: queryDate,
    kind: z.preprocess(blankToUndefined, recordingKindSchema.optional()),
    operator: z.preprocess(blankToUndefined, z.string().trim().max(80, 'The operator name has at most 80 characters').optional()),
    format: z.preprocess(blankToUndefined, z.enum(['json', 'csv'], { message: 'The format is json or csv' }).default('json')),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'from is after to', path: ['to'] });
export type ReviewQuery = z.infer<typeof reviewQuerySchema>;
export type ReviewFilters = Omit<ReviewQuery, 'format'>;

/** One cycle row as the review reads it: the cycle's figures and its recording's labels. */
export const reviewCycleSchema = z.object({
  recordingId: z.string().uuid(),
  recordingStartedAt: isoDateSchema,
  event: z.string().nullable(),
  matchType: z.string().nullable(),
  matchNumber: z.number().int().nullable(),
  operatorName: z.string().nullable(),
  index: z.number().int().nonnegative(),
  piece: cyclePieceSchema,
  phase: cyclePhaseSchema,
  startS: seconds,
  durationS: duration,
  level: reefLevelSchema.nullable(),
  face: z.string().nullable(),
  station: z.string().nullable(),
  outcome: cycleOutcomeSchema,
  points: z.number(),
  callToPlaceS: duration.nullable(),
});
export type ReviewCycle = z.infer<typeof reviewCycleSchema>;

export const reviewMatchSchema = z.object({
  recordingId: z.string().uuid(),
  startedAt: isoDateSchema,
  event: z.string().nullable(),
  matchType: z.string().nullable(),
  matchNumber: z.number().int().nullable(),
  operatorName: z.string().nullable(),
  cycleCount: z.number().int().nonnegative(),
  cycleTime: durationStatsSchema,
  points: z.number(),
});
export type ReviewMatch = z.infer<typeof reviewMatchSchema>;

/** One group of a breakdown; `key` is null for cycles without that attribute (shown as "not known"). */
export const reviewGroupSchema = z.object({
  key: z.string().nullable(),
  cycleCount: z.number().int().nonnegative(),
  scored: z.number().int().nonnegative(),
  missed: z.number().int().nonnegative(),
  cycleTime: durationStatsSchema,
  points: z.number(),
});
export type ReviewGroup = z.infer<typeof reviewGroupSchema>;

export const cycleReviewSchema = z.object({
  recordingCount: z.number().int().nonnegative(),
  cycleCount: z.number().int().nonnegative(),
  cycleTime: durationStatsSchema,
  /** One row per recording, oldest first. */
  matches: z.array(reviewMatchSchema),
  byLevel: z.array(reviewGroupSchema),
  byFace: z.array(reviewGroupSchema),
  byStation: z.array(reviewGroupSchema),
  byOperator: z.array(reviewGroupSchema),
  /** The slowest place attempts, slowest first. */
  slowest: z.array(reviewCycleSchema),
  /** Values the filters can take, over all of the team's analysed recordings. */
  options: z.object({ events: z.array(z.string()), operators: z.array(z.string()) }),
});
export type CycleReview = z.infer<typeof cycleReviewSchema>;
