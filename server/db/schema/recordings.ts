import { sql } from 'drizzle-orm';
import {
  customType,
  doublePrecision,
  index,
  integer,
  jsonb,
  pgEnum,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uniqueIndex,
  uuid,
} from 'drizzle-orm/pg-core';
import type { ChannelValue } from '../../../shared/protocol/messages';
import { SIGNAL_TYPES } from '../../../shared/protocol/messages';
import { robotKeys, teams } from './auth';

export const RECORDING_KINDS = ['match', 'practice', 'drill', 'simulated'] as const;
export const RECORDING_SOURCES = ['live', 'upload', 'simulator'] as const;
export const RECORDING_STATUSES = ['recording', 'finished'] as const;

export const recordingKindEnum = pgEnum('recording_kind', RECORDING_KINDS);
export const recordingSourceEnum = pgEnum('recording_source', RECORDING_SOURCES);
export const recordingStatusEnum = pgEnum('recording_status', RECORDING_STATUSES);
export const signalTypeEnum = pgEnum('recording_signal_type', SIGNAL_TYPES);

const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => 'bytea' });

export const recordings = pgTable(
  'recordings',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    teamId: uuid('team_id').notNull().references(() => teams.id, { onDelete: 'cascade' }),
    robot: text('robot').notNull(),
    robotKeyId: uuid('robot_key_id').references(() => robotKeys.id, { onDelete: 'set null' }),
    /** The robot program run's streamId (relay hello); one recording per stream. */
    streamId: text('stream_id').notNull(),
    kind: recordingKindEnum('kind').notNull(),
    source: recordingSourceEnum('source').notNull(),
    status: recordingStatusEnum('status').notNull().default('recording'),
    /** Robot time (ms) that is t = 0 s of the recording: the first tick or event stored. */
    originTMs: doublePrecision('origin_t_ms').notNull(),
    startedAt: timestamp('started_at', { withTimezone: true }).notNull(),
    endedAt: timestamp('ended_at', { withTimezone: true }),
    /** From the origin to the last tick or event stored. */
    durationMs: doublePrecision('duration_ms').notNull().default(0),
    event: text('event'),
    matchType: text('match_type'),
    matchNumber: integer('match_number'),
    alliance: text('alliance'),
    station: integer('station'),
    operatorName: text('operator_name'),
    tags: text('tags').array().notNull().default(sql`'{}'::text[]`),
    notes: text('notes').notNull().default(''),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [uniqueIndex('recordings_team_stream_key').on(t.teamId, t.streamId), index('recordings_team_started_idx').on(t.teamId, t.startedAt)],
);

export const recordingSignals = pgTable(
  'recording_signals',
  {
    recordingId: uuid('recording_id').notNull().references(() => recordings.id, { onDelete: 'cascade' }),
    index: integer('index').notNull(),
    name: text('name').notNull(),
    type: signalTypeEnum('type').notNull(),
    unit: text('unit').notNull(),
    labels: jsonb('labels').$type<string[]>(),
  },
  (t) => [primaryKey({ columns: [t.recordingId, t.index] }), uniqueIndex('recording_signals_name_key').on(t.recordingId, t.name)],
);

/**
 * Samples, one row per (recording, signal, run of consecutive ticks). Tick k of a chunk is at robot time
 * t0_ms + k·dt_ms, or times_ms[k] (float64 little-endian) when the ticks are not evenly spaced. `values`
 * holds `ticks` float32 little-endian, exactly the bits the robot sent.
 */
export const recordingChunks = pgTable(
  'recording_chunks',
  {
    recordingId: uuid('recording_id').notNull().references(() => recordings.id, { onDelete: 'cascade' }),
    signalIndex: integer('signal_index').notNull(),
    /** The seq of the first telemetry batch in the chunk: orders chunks, survives merging. */
    firstSeq: integer('first_seq').notNull(),
    t0Ms: doublePrecision('t0_ms').notNull(),
    /** Robot time of the last tick, for time-range lookups. */
    tLastMs: doublePrecision('t_last_ms').notNull(),
    dtMs: doublePrecision('dt_ms').notNull(),
    ticks: integer('ticks').notNull(),
    timesMs: bytea('times_ms'),
    values: bytea('values').notNull(),
  },
  (t) => [primaryKey({ columns: [t.recordingId, t.signalIndex, t.firstSeq] })],
);

export const recordingEvents = pgTable(
  'recording_events',
  {
    recordingId: uuid('recording_id').notNull().references(() => recordings.id, { onDelete: 'cascade' }),
    seq: integer('seq').notNull(),
    tMs: doublePrecision('t_ms').notNull(),
    kind: text('kind').notNull(),
    data: jsonb('data').$type<Record<string, ChannelValue>>(),
  },
  (t) => [primaryKey({ columns: [t.recordingId, t.seq] })],
);

/** Every relay seq stored for a recording's stream: a resend after a reconnect or restart is skipped. */
export const recordingStreamSeqs = pgTable(
  'recording_stream_seqs',
  {
    recordingId: uuid('recording_id').notNull().references(() => recordings.id, { onDelete: 'cascade' }),
    seq: integer('seq').notNull(),
  },
  (t) => [primaryKey({ columns: [t.recordingId, t.seq] })],
);
