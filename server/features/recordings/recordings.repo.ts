import { and, asc, desc, eq, gte, ilike, lt, lte, or, sql, type SQL } from 'drizzle-orm';
import type { ChannelValue, Signal } from '../../../shared/protocol/messages';
import type { MatchType, RecordingListQuery, RecordingMetadata, RecordingSort, RecordingSummary } from '../../../shared/schemas/recording';
import type { Alliance } from '../../../shared/domain/season/season-profile';
import type { Db } from '../../db/client';
import type { Executor } from '../../db/executor';
import { recordingChunks, recordingEvents, recordings, recordingSignals, recordingStreamSeqs } from '../../db/schema/index';
import { packTimes, unpackTimes, type Chunk } from './chunks';

export type RecordingRow = typeof recordings.$inferSelect;
export type NewRecording = Pick<
  typeof recordings.$inferInsert,
  'teamId' | 'robot' | 'robotKeyId' | 'streamId' | 'kind' | 'source' | 'originTMs' | 'startedAt'
> &
  Partial<Pick<typeof recordings.$inferInsert, 'status' | 'endedAt' | 'durationMs' | 'notes'>>;

/** The columns a member edits. */
export type RecordingChanges = Partial<Pick<typeof recordings.$inferInsert, 'kind' | 'robot'>> & Partial<RecordingMetadata>;

/** A row as the API's summary. */
export function toRecordingSummary(row: RecordingRow): RecordingSummary {
  return {
    id: row.id,
    kind: row.kind,
    source: row.source,
    status: row.status,
    robot: row.robot,
    startedAt: row.startedAt.toISOString(),
    endedAt: row.endedAt ? row.endedAt.toISOString() : null,
    durationS: row.durationMs / 1000,
    metadata: {
      event: row.event,
      matchType: row.matchType as MatchType | null,
      matchNumber: row.matchNumber,
      alliance: row.alliance as Alliance | null,
      station: row.station,
      operatorName: row.operatorName,
      tags: row.tags,
      notes: row.notes,
    },
  };
}

const SORT_COLUMNS = {
  startedAt: recordings.startedAt,
  durationS: recordings.durationMs,
  event: recordings.event,
  matchNumber: recordings.matchNumber,
} as const;

function orderFor(sort: RecordingSort): SQL[] {
  const column = SORT_COLUMNS[sort.replace(/^-/, '') as keyof typeof SORT_COLUMNS];
  const primary = sort.startsWith('-') ? sql`${column} desc nulls last` : sql`${column} asc nulls last`;
  return [primary, desc(recordings.startedAt), asc(recordings.id)];
}

const likePattern = (q: string) => `%${q.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
const DAY_MS = 86_400_000;

function listFilter(teamId: string, q: RecordingListQuery): SQL | undefined {
  const pattern = q.q ? likePattern(q.q) : undefined;
  return and(
    eq(recordings.teamId, teamId),
    q.event ? ilike(recordings.event, likePattern(q.event)) : undefined,
    q.kind ? eq(recordings.kind, q.kind) : undefined,
    q.alliance ? eq(recordings.alliance, q.alliance) : undefined,
    q.tag ? sql`${q.tag} = any(${recordings.tags})` : undefined,
    q.from ? gte(recordings.startedAt, new Date(`${q.from}T00:00:00Z`)) : undefined,
    q.to ? lt(recordings.startedAt, new Date(Date.parse(`${q.to}T00:00:00Z`) + DAY_MS)) : undefined,
    pattern
      ? or(
          ilike(recordings.robot, pattern),
          ilike(recordings.event, pattern),
          ilike(recordings.operatorName, pattern),
          ilike(recordings.notes, pattern),
          sql`array_to_string(${recordings.tags}, ' ') ilike ${pattern}`,
        )
      : undefined,
  );
}

export interface StoredEvent {
  seq: number;
  tMs: number;
  kind: string;
  data: Record<string, ChannelValue> | null;
}

export interface SignalChunk extends Chunk {
  signalIndex: number;
}

const buffer = (b: Uint8Array) => Buffer.from(b.buffer, b.byteOffset, b.byteLength);
const lastTickMs = (c: Chunk) => (c.timesMs ? c.timesMs[c.ticks - 1]! : c.t0Ms + (c.ticks - 1) * c.dtMs);

/** The columns of a chunk a read needs. */
const CHUNK_COLUMNS = {
  firstSeq: recordingChunks.firstSeq,
  t0Ms: recordingChunks.t0Ms,
  dtMs: recordingChunks.dtMs,
  ticks: recordingChunks.ticks,
  timesMs: recordingChunks.timesMs,
  values: recordingChunks.values,
};

export function recordingsRepo(db: Executor) {
  // The replay's hot path, one round trip: the recording (team checked), the signal by name and its chunks
  // in the range (seconds from the origin; null for open ends), prepared once per connection.
  const fromS = sql.placeholder('fromS');
  const toS = sql.placeholder('toS');
  const signalChunksStatement = db
    .select({ originTMs: recordings.originTMs, signalIndex: recordingSignals.index, ...CHUNK_COLUMNS })
    .from(recordings)
    .leftJoin(recordingSignals, and(eq(recordingSignals.recordingId, recordings.id), eq(recordingSignals.name, sql.placeholder('signalName'))))
    .leftJoin(
      recordingChunks,
      and(
        eq(recordingChunks.recordingId, recordings.id),
        eq(recordingChunks.signalIndex, recordingSignals.index),
        sql`(${toS}::float8 is null or ${recordingChunks.t0Ms} <= ${recordings.originTMs} + ${toS}::float8 * 1000)`,
        sql`(${fromS}::float8 is null or ${recordingChunks.tLastMs} >= ${recordings.originTMs} + ${fromS}::float8 * 1000)`,
      ),
    )
    .where(and(eq(recordings.id, sql.placeholder('recordingId')), eq(recordings.teamId, sql.placeholder('teamId'))))
    .orderBy(asc(recordingChunks.firstSeq))
    .prepare('recordings_signal_chunks');
  return {
    async findByStream(teamId: string, streamId: string): Promise<RecordingRow | undefined> {
      const [row] = await db
        .select()
        .from(recordings)
        .where(and(eq(recordings.teamId, teamId), eq(recordings.streamId, streamId)));
      return row;
    },

    async find(teamId: string, id: string): Promise<RecordingRow | undefined> {
      const [row] = await db
        .select()
        .from(recordings)
        .where(and(eq(recordings.teamId, teamId), eq(recordings.id, id)));
      return row;
    },

    /** Creates the stream's recording, or returns the one a concurrent writer created first. */
    async insertRecording(input: NewRecording): Promise<RecordingRow> {
      const [row] = await db.insert(recordings).values(input).onConflictDoNothing().returning();
      return row ?? (await this.findByStream(input.teamId, input.streamId))!;
    },

    /** One page of a team's recordings (dates in UTC days) and how many match in all. */
    async listPage(teamId: string, q: RecordingListQuery): Promise<{ rows: RecordingRow[]; total: number }> {
      const where = listFilter(teamId, q);
      const [count] = await db.select({ n: sql<number>`count(*)::int` }).from(recordings).where(where);
      const rows = await db
        .select()
        .from(recordings)
        .where(where)
        .orderBy(...orderFor(q.sort))
        .limit(q.pageSize)
        .offset((q.page - 1) * q.pageSize);
      return { rows, total: count!.n };
    },

    async update(teamId: string, id: string, changes: RecordingChanges): Promise<RecordingRow | undefined> {
      if (Object.keys(changes).length === 0) return this.find(teamId, id);
      const [row] = await db
        .update(recordings)
        .set(changes)
        .where(and(eq(recordings.teamId, teamId), eq(recordings.id, id)))
        .returning();
      return row;
    },

    /** Removes the recording and everything stored under it; run inside a transaction. */
    async deleteRecording(recordingId: string): Promise<void> {
      await db.delete(recordingChunks).where(eq(recordingChunks.recordingId, recordingId));
      await db.delete(recordingEvents).where(eq(recordingEvents.recordingId, recordingId));
      await db.delete(recordingStreamSeqs).where(eq(recordingStreamSeqs.recordingId, recordingId));
      await db.delete(recordingSignals).where(eq(recordingSignals.recordingId, recordingId));
      await db.delete(recordings).where(eq(recordings.id, recordingId));
    },

    async countEvents(recordingId: string): Promise<number> {
      const [row] = await db
        .select({ n: sql<number>`count(*)::int` })
        .from(recordingEvents)
        .where(eq(recordingEvents.recordingId, recordingId));
      return row!.n;
    },

    async countSignals(recordingId: string): Promise<number> {
      const [row] = await db
        .select({ n: sql<number>`count(*)::int` })
        .from(recordingSignals)
        .where(eq(recordingSignals.recordingId, recordingId));
      return row!.n;
    },

    async insertSignals(recordingId: string, signals: readonly Signal[]): Promise<void> {
      if (signals.length === 0) return;
      await db
        .insert(recordingSignals)
        .values(signals.map((s) => ({ recordingId, index: s.index, name: s.name, type: s.type, unit: s.unit, labels: s.labels ?? null })))
        .onConflictDoNothing();
    },

    async listSignals(recordingId: string): Promise<Signal[]> {
      const rows = await db
        .select()
        .from(recordingSignals)
        .where(eq(recordingSignals.recordingId, recordingId))
        .orderBy(asc(recordingSignals.index));
      return rows.map((r) => ({ index: r.index, name: r.name, type: r.type, unit: r.unit, ...(r.labels ? { labels: r.labels } : {}) }));
    },

    /** Records the seqs as stored; returns those that were not stored before. */
    async claimSeqs(recordingId: string, seqs: readonly number[]): Promise<Set<number>> {
      if (seqs.length === 0) return new Set();
      const result = await db.execute<{ seq: number }>(sql`
        insert into ${recordingStreamSeqs} (recording_id, seq)
        select ${recordingId}::uuid, s from unnest(${sql.param(seqs)}::int[]) as s
        on conflict do nothing
        returning seq`);
      return new Set(result.rows.map((r) => r.seq));
    },

    async insertChunks(recordingId: string, chunks: readonly SignalChunk[]): Promise<void> {
      if (chunks.length === 0) return;
      await db.execute(sql`
        insert into ${recordingChunks} (recording_id, signal_index, first_seq, t0_ms, t_last_ms, dt_ms, ticks, times_ms, values)
        select ${recordingId}::uuid, * from unnest(
          ${sql.param(chunks.map((c) => c.signalIndex))}::int[],
          ${sql.param(chunks.map((c) => c.firstSeq))}::int[],
          ${sql.param(chunks.map((c) => c.t0Ms))}::float8[],
          ${sql.param(chunks.map(lastTickMs))}::float8[],
          ${sql.param(chunks.map((c) => c.dtMs))}::float8[],
          ${sql.param(chunks.map((c) => c.ticks))}::int[],
          ${sql.param(chunks.map((c) => (c.timesMs ? buffer(packTimes(c.timesMs)) : null)))}::bytea[],
          ${sql.param(chunks.map((c) => buffer(c.values)))}::bytea[])`);
    },

    async insertEvents(recordingId: string, events: readonly StoredEvent[]): Promise<void> {
      if (events.length === 0) return;
      await db.insert(recordingEvents).values(events.map((e) => ({ recordingId, ...e })));
    },

    async extendDuration(recordingId: string, durationMs: number): Promise<void> {
      await db
        .update(recordings)
        .set({ durationMs: sql`greatest(${recordings.durationMs}, ${durationMs})` })
        .where(eq(recordings.id, recordingId));
    },

    async finish(recordingId: string, endedAt: Date): Promise<void> {
      await db.update(recordings).set({ status: 'finished', endedAt }).where(eq(recordings.id, recordingId));
    },

    /** One signal's chunks in seq order, those overlapping [fromMs, toMs] (robot time) when given. */
    async readChunks(recordingId: string, signalIndex: number, range: { fromMs?: number; toMs?: number } = {}): Promise<Chunk[]> {
      const rows = await db
        .select(CHUNK_COLUMNS)
        .from(recordingChunks)
        .where(
          and(
            eq(recordingChunks.recordingId, recordingId),
            eq(recordingChunks.signalIndex, signalIndex),
            range.toMs === undefined ? undefined : lte(recordingChunks.t0Ms, range.toMs),
            range.fromMs === undefined ? undefined : gte(recordingChunks.tLastMs, range.fromMs),
          ),
        )
        .orderBy(asc(recordingChunks.firstSeq));
      return rows.map((r) => ({ ...r, timesMs: r.timesMs ? unpackTimes(r.timesMs) : null }));
    },

    /**
     * One signal's chunks by name, with the recording's origin, in one round trip (the replay's hot path):
     * undefined when the team has no such recording, `signalIndex` undefined when it has no such signal.
     * The range is in seconds from the origin, as the API takes it.
     */
    async readSignalChunks(
      teamId: string,
      recordingId: string,
      signalName: string,
      range: { fromS?: number; toS?: number } = {},
    ): Promise<{ originTMs: number; signalIndex: number | undefined; chunks: Chunk[] } | undefined> {
      const rows = await signalChunksStatement.execute({ teamId, recordingId, signalName, fromS: range.fromS ?? null, toS: range.toS ?? null });
      const [first] = rows;
      if (!first) return undefined;
      const chunks: Chunk[] = [];
      for (const r of rows) {
        if (r.firstSeq === null) continue;
        chunks.push({ firstSeq: r.firstSeq, t0Ms: r.t0Ms!, dtMs: r.dtMs!, ticks: r.ticks!, timesMs: r.timesMs ? unpackTimes(r.timesMs) : null, values: r.values! });
      }
      return { originTMs: first.originTMs, signalIndex: first.signalIndex ?? undefined, chunks };
    },

    /** Every chunk from the first one shorter than maxTicks on, for merging; locked until the transaction ends. */
    async chunksToCompact(recordingId: string, maxTicks: number): Promise<SignalChunk[]> {
      const rows = await db.execute<{
        signal_index: number;
        first_seq: number;
        t0_ms: number;
        dt_ms: number;
        ticks: number;
        times_ms: Buffer | null;
        values: Buffer;
      }>(sql`
        select signal_index, first_seq, t0_ms, dt_ms, ticks, times_ms, values from ${recordingChunks}
        where recording_id = ${recordingId}
          and first_seq >= (select coalesce(min(first_seq), 2147483647) from ${recordingChunks}
                            where recording_id = ${recordingId} and ticks < ${maxTicks})
        order by signal_index, first_seq
        for update`);
      return rows.rows.map((r) => ({
        signalIndex: r.signal_index,
        firstSeq: r.first_seq,
        t0Ms: r.t0_ms,
        dtMs: r.dt_ms,
        ticks: r.ticks,
        timesMs: r.times_ms ? unpackTimes(r.times_ms) : null,
        values: r.values,
      }));
    },

    async deleteChunks(recordingId: string, keys: readonly { signalIndex: number; firstSeq: number }[]): Promise<void> {
      if (keys.length === 0) return;
      await db.execute(sql`
        delete from ${recordingChunks} c
        using unnest(${sql.param(keys.map((k) => k.signalIndex))}::int[], ${sql.param(keys.map((k) => k.firstSeq))}::int[]) as k(signal_index, first_seq)
        where c.recording_id = ${recordingId} and c.signal_index = k.signal_index and c.first_seq = k.first_seq`);
    },

    async listEvents(recordingId: string): Promise<StoredEvent[]> {
      return db
        .select({ seq: recordingEvents.seq, tMs: recordingEvents.tMs, kind: recordingEvents.kind, data: recordingEvents.data })
        .from(recordingEvents)
        .where(eq(recordingEvents.recordingId, recordingId))
        .orderBy(asc(recordingEvents.seq));
    },

    async listStoredSeqs(recordingId: string): Promise<number[]> {
      const rows = await db
        .select({ seq: recordingStreamSeqs.seq })
        .from(recordingStreamSeqs)
        .where(eq(recordingStreamSeqs.recordingId, recordingId))
        .orderBy(asc(recordingStreamSeqs.seq));
      return rows.map((r) => r.seq);
    },
  };
}

export type RecordingsRepo = ReturnType<typeof recordingsRepo>;

export function recordingsStore(db: Db) {
  return {
    ...recordingsRepo(db),
    transaction: <T>(fn: (repo: RecordingsRepo) => Promise<T>): Promise<T> => db.transaction((tx) => fn(recordingsRepo(tx))),
  };
}
export type RecordingsStore = ReturnType<typeof recordingsStore>;
