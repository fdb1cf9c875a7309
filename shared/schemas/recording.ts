// The HTTP contract of recordings: list, detail, metadata edits, signals, samples, events, upload and export.
import { z } from 'zod';
import { signalSchema } from '../protocol/messages';
import { channelValueSchema } from '../protocol/messages';
import { allianceSchema } from '../domain/season/season-profile';
import { isoDateSchema } from './team';

export const RECORDING_KINDS = ['match', 'practice', 'drill', 'simulated'] as const;
export const RECORDING_SOURCES = ['live', 'upload', 'simulator'] as const;
export const RECORDING_STATUSES = ['recording', 'finished'] as const;
export const MATCH_TYPES = ['practice', 'qualification', 'playoff'] as const;

export const recordingKindSchema = z.enum(RECORDING_KINDS, { message: 'Kind is match, practice, drill or simulated' });
export const recordingSourceSchema = z.enum(RECORDING_SOURCES);
export const recordingStatusSchema = z.enum(RECORDING_STATUSES);
export const matchTypeSchema = z.enum(MATCH_TYPES, { message: 'Match type is practice, qualification or playoff' });
export type MatchType = z.infer<typeof matchTypeSchema>;

const tagSchema = z
  .string()
  .trim()
  .min(1, 'A tag cannot be blank')
  .max(32, 'A tag has at most 32 characters');

/** What a member can say about a recording; null where nobody has said yet. */
export const recordingMetadataSchema = z.object({
  event: z.string().trim().max(120, 'The event name has at most 120 characters').nullable(),
  matchType: matchTypeSchema.nullable(),
  matchNumber: z.number({ message: 'The match number is a whole number' }).int('The match number is a whole number').min(1, 'Match numbers start at 1').max(999, 'The match number is at most 999').nullable(),
  alliance: allianceSchema.nullable(),
  station: z.number({ message: 'The station is 1, 2 or 3' }).int('The station is 1, 2 or 3').min(1, 'The station is 1, 2 or 3').max(3, 'The station is 1, 2 or 3').nullable(),
  operatorName: z.string().trim().max(80, 'The operator name has at most 80 characters').nullable(),
  tags: z.array(tagSchema).max(20, 'At most 20 tags'),
  notes: z.string().max(4000, 'Notes have at most 4000 characters'),
});
export type RecordingMetadata = z.infer<typeof recordingMetadataSchema>;

export const recordingSummarySchema = z.object({
  id: z.string().uuid(),
  kind: recordingKindSchema,
  source: recordingSourceSchema,
  status: recordingStatusSchema,
  robot: z.string(),
  startedAt: isoDateSchema,
  endedAt: isoDateSchema.nullable(),
  durationS: z.number().nonnegative(),
  metadata: recordingMetadataSchema,
});
export type RecordingSummary = z.infer<typeof recordingSummarySchema>;

export const recordingDetailSchema = recordingSummarySchema.extend({
  signalCount: z.number().int().nonnegative(),
  eventCount: z.number().int().nonnegative(),
});
export type RecordingDetail = z.infer<typeof recordingDetailSchema>;

export const RECORDING_SORTS = ['startedAt', '-startedAt', 'durationS', '-durationS', 'event', '-event', 'matchNumber', '-matchNumber'] as const;
export const recordingSortSchema = z.enum(RECORDING_SORTS);
export type RecordingSort = z.infer<typeof recordingSortSchema>;
export const MAX_PAGE_SIZE = 100;

const blankToUndefined = (v: unknown) => (v === '' ? undefined : v);
const queryDate = z.preprocess(blankToUndefined, z.iso.date({ message: 'Dates are YYYY-MM-DD' }).optional());

/** GET /api/recordings query string; dates filter startedAt (from and to are whole days, both included). */
export const recordingListQuerySchema = z
  .object({
    event: z.preprocess(blankToUndefined, z.string().max(120).optional()),
    kind: z.preprocess(blankToUndefined, recordingKindSchema.optional()),
    alliance: z.preprocess(blankToUndefined, allianceSchema.optional()),
    tag: z.preprocess(blankToUndefined, z.string().max(32).optional()),
    from: queryDate,
    to: queryDate,
    q: z.preprocess(blankToUndefined, z.string().max(120).optional()),
    sort: z.preprocess(blankToUndefined, recordingSortSchema.default('-startedAt')),
    page: z.coerce.number().int('The page is a whole number').min(1, 'Pages start at 1').default(1),
    pageSize: z.coerce
      .number()
      .int('The page size is a whole number')
      .min(1, 'The page size is at least 1')
      .max(MAX_PAGE_SIZE, `The page size is at most ${MAX_PAGE_SIZE}`)
      .default(25),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: 'from is after to', path: ['to'] });
export type RecordingListQuery = z.infer<typeof recordingListQuerySchema>;

export const recordingPageSchema = z.object({
  items: z.array(recordingSummarySchema),
  total: z.number().int().nonnegative(),
  page: z.number().int().min(1),
  pageSize: z.number().int().min(1),
});
export type RecordingPage = z.infer<typeof recordingPageSchema>;

/** PATCH /api/recordings/:id: only the fields given change. */
export const recordingPatchSchema = z.strictObject({
  kind: recordingKindSchema.optional(),
  robot: z.string().trim().min(1, 'The robot needs a name').max(64, 'The robot name has at most 64 characters').optional(),
  metadata: recordingMetadataSchema.partial().strict().optional(),
});
export type RecordingPatch = z.infer<typeof recordingPatchSchema>;

export const recordingParamsSchema = z.object({ id: z.string().uuid({ message: 'Not a recording id' }) });

export const recordingSignalsSchema = z.object({ signals: z.array(signalSchema) });

export const samplesQuerySchema = z
  .object({
    signal: z.string({ message: 'Name the signal' }).min(1, 'Name the signal').max(128),
    from: z.preprocess(blankToUndefined, z.coerce.number({ message: 'from is a number of seconds' }).optional()),
    to: z.preprocess(blankToUndefined, z.coerce.number({ message: 'to is a number of seconds' }).optional()),
  })
  .refine((q) => q.from === undefined || q.to === undefined || q.from <= q.to, { message: 'from is after to', path: ['to'] });
export type SamplesQuery = z.infer<typeof samplesQuerySchema>;

/**
 * One signal's samples; tS in seconds from the recording's start. Values are float32 as stored (read them with
 * Math.fround to get the exact bits); null where the value is not a finite number (unknown, NaN or infinite).
 */
export const samplesSchema = z.object({
  signal: z.string(),
  tS: z.array(z.number()),
  values: z.array(z.number().nullable()),
});
export type SamplesAnswer = z.infer<typeof samplesSchema>;

export const recordingEventSchema = z.object({
  seq: z.number().int().nonnegative(),
  /** Seconds from the recording's start. */
  tS: z.number(),
  kind: z.string(),
  data: z.record(z.string(), channelValueSchema).nullable(),
});
export type RecordingEvent = z.infer<typeof recordingEventSchema>;
export const recordingEventsSchema = z.object({ events: z.array(recordingEventSchema) });

export const EXPORT_FORMATS = ['pitwall', 'csv'] as const;
export const exportQuerySchema = z.object({
  format: z.enum(EXPORT_FORMATS, { message: 'The format is pitwall or csv' }).default('pitwall'),
});

/** The fields of the upload form besides `file`. */
export const uploadFieldsSchema = z.object({
  kind: z.preprocess(blankToUndefined, recordingKindSchema.default('practice')),
});
export const uploadedSchema = z.object({ id: z.string().uuid() });
