import { randomUUID } from 'node:crypto';
import type { RobotEvent, Signal, TelemetryBatch } from '../../../shared/protocol/messages';
import type { RecordingHeader } from '../../../shared/protocol/recording-file';
import type {
  RecordingDetail,
  RecordingEvent,
  RecordingListQuery,
  RecordingPage,
  RecordingPatch,
  SamplesQuery,
} from '../../../shared/schemas/recording';
import type { Actor } from '../auth/actor';
import { decodeTelemetry } from '../../../shared/protocol/telemetry-codec';
import { AppError, notFound } from '../../lib/errors';
import { CHUNK_TICKS, groupForMerge, mergeChunks, planRuns, runChunks, sliceSamples, tickTimeMs, type DecodedBatch, type Samples } from './chunks';
import { csvLines, CSV_HEADER_LINE, planUpload, recordingFilePieces, recordingRecords, storedColumn, UploadFileError, type FileFormat } from './recording-files';
import { toRecordingSummary, type RecordingRow, type RecordingsStore, type SignalChunk, type StoredEvent } from './recordings.repo';

export type RecordingKind = RecordingRow['kind'];
export type RecordingSource = RecordingRow['source'];

/** Which robot stream the messages come from, and how to label its recording when it is new. */
export interface IngestStream {
  teamId: string;
  robot: string;
  robotKeyId: string | undefined;
  streamId: string;
  signals: readonly Signal[] | undefined;
  kind: RecordingKind;
  source: RecordingSource;
}

export interface IngestResult {
  recordingId: string;
  /** Messages stored now; the rest were stored before. */
  stored: number;
  skipped: number;
  /** Ticks of telemetry stored now. */
  ticks: number;
}

export interface RecordingsServiceDeps {
  store: RecordingsStore;
  now: () => Date;
  /** Called once a recording is finished (live end, upload, seed), e.g. to store its cycles. */
  onFinished?: (teamId: string, recordingId: string) => Promise<void>;
}

export class IngestError extends Error {}

/** A file download: its name, type and bytes in pieces. */
export interface RecordingDownload {
  fileName: string;
  contentType: string;
  body: AsyncIterable<Uint8Array | string>;
}

const fileStem = (row: RecordingRow) =>
  `${row.robot.replace(/[^A-Za-z0-9_-]+/g, '-') || 'recording'}-${row.startedAt.toISOString().slice(0, 10)}-${row.id.slice(0, 8)}`;

export function createRecordingsService({ store, now, onFinished }: RecordingsServiceDeps) {
  async function recordingOrThrow(teamId: string, id: string): Promise<RecordingRow> {
    const row = await store.find(teamId, id);
    if (!row) throw notFound('That recording');
    return row;
  }

  return {
    findByStream: (teamId: string, streamId: string) => store.findByStream(teamId, streamId),
    get: recordingOrThrow,

    async list(actor: Actor, query: RecordingListQuery): Promise<RecordingPage> {
      const { rows, total } = await store.listPage(actor.team.id, query);
      return { items: rows.map(toRecordingSummary), total, page: query.page, pageSize: query.pageSize };
    },

    async describe(actor: Actor, id: string): Promise<RecordingDetail> {
      const row = await recordingOrThrow(actor.team.id, id);
      const [signalCount, eventCount] = await Promise.all([store.countSignals(id), store.countEvents(id)]);
      return { ...toRecordingSummary(row), signalCount, eventCount };
    },

    async update(actor: Actor, id: string, patch: RecordingPatch): Promise<RecordingDetail> {
      const row = await store.update(actor.team.id, id, { kind: patch.kind, robot: patch.robot, ...patch.metadata });
      if (!row) throw notFound('That recording');
      return this.describe(actor, id);
    },

    /** Deletes the recording with its signals, samples, events and stored seqs, in one transaction. */
    async remove(actor: Actor, id: string): Promise<void> {
      await store.transaction(async (repo) => {
        if (!(await repo.find(actor.team.id, id))) throw notFound('That recording');
        await repo.deleteRecording(id);
      });
    },

    /** One signal's samples as typed arrays (the route writes them as `samplesSchema` JSON, non-finite as null). */
    async samples(actor: Actor, id: string, query: SamplesQuery): Promise<{ signal: string } & Samples> {
      const { tS, values } = await this.readSamples(actor.team.id, id, query.signal, { fromS: query.from, toS: query.to });
      return { signal: query.signal, tS, values };
    },

    async events(actor: Actor, id: string): Promise<RecordingEvent[]> {
      const row = await recordingOrThrow(actor.team.id, id);
      const events = await store.listEvents(id);
      return events.map((e) => ({ seq: e.seq, tS: (e.tMs - row.originTMs) / 1000, kind: e.kind, data: e.data }));
    },

    /**
     * Stores an uploaded file (Pitwall recording or long-form CSV, told apart by content) as a finished
     * recording: validated whole first, then written in one transaction, so a bad file stores nothing.
     */
    async upload(actor: Actor, bytes: Uint8Array, kind: RecordingKind): Promise<{ id: string }> {
      let plan: ReturnType<typeof planUpload>;
      try {
        plan = planUpload(bytes);
      } catch (error) {
        if (error instanceof UploadFileError) throw new AppError('bad_request', error.message, [{ path: 'file', message: error.message }]);
        throw error;
      }
      const startedAt = plan.startedAtMs === undefined ? now() : new Date(plan.startedAtMs + plan.originTMs);
      const stored = await store.transaction(async (repo) => {
        const recording = await repo.insertRecording({
          teamId: actor.team.id,
          robot: plan.robot ?? 'Unnamed robot',
          robotKeyId: null,
          streamId: `upload/${randomUUID()}`,
          kind,
          source: 'upload',
          status: 'finished',
          originTMs: plan.originTMs,
          startedAt,
          endedAt: new Date(startedAt.getTime() + plan.durationMs),
          durationMs: plan.durationMs,
          notes: plan.notes ?? '',
        });
        await repo.insertSignals(recording.id, plan.signals);
        await repo.insertChunks(recording.id, plan.chunks);
        await repo.insertEvents(recording.id, plan.events);
        return { id: recording.id };
      });
      await onFinished?.(actor.team.id, stored.id);
      return stored;
    },

    /** The recording as a Pitwall recording file or as long-form CSV (time_s,signal,value), produced piece by piece. */
    async exportFile(actor: Actor, id: string, format: FileFormat): Promise<RecordingDownload> {
      const row = await recordingOrThrow(actor.team.id, id);
      const signals = await store.listSignals(id);
      if (format === 'csv') {
        return {
          fileName: `${fileStem(row)}.csv`,
          contentType: 'text/csv; charset=utf-8',
          body: (async function* () {
            yield CSV_HEADER_LINE;
            for (const signal of signals) {
              const { tS, values } = sliceSamples(await store.readChunks(id, signal.index), row.originTMs);
              yield csvLines(signal.name, tS, values);
            }
          })(),
        };
      }
      const columns = [];
      for (const signal of signals) columns.push(storedColumn(await store.readChunks(id, signal.index)));
      const header: RecordingHeader = {
        format: 'pitwall-recording',
        version: 1,
        source: row.source,
        robot: row.robot.slice(0, 64),
        teamNumber: actor.team.number,
        startedAtMs: row.startedAt.getTime() - row.originTMs,
        ...(row.notes ? { notes: row.notes.slice(0, 2000) } : {}),
      };
      const records = recordingRecords(signals, columns, await store.listEvents(id));
      return {
        fileName: `${fileStem(row)}.pwrec`,
        contentType: 'application/vnd.pitwall.recording',
        body: (async function* () {
          yield* recordingFilePieces(header, records);
        })(),
      };
    },

    /**
     * Stores relay messages of one stream in one transaction: all of them or none. Seqs stored before are
     * skipped, so a resend after a reconnect or a server restart never duplicates anything.
     */
    async ingest(stream: IngestStream, messages: readonly (TelemetryBatch | RobotEvent)[]): Promise<IngestResult> {
      // Decode before touching the database: a bad payload throws and nothing is written.
      const batches: DecodedBatch[] = [];
      const events: StoredEvent[] = [];
      for (const m of messages) {
        if (m.type === 'event') {
          events.push({ seq: m.seq, tMs: m.tMs, kind: m.kind, data: m.data ?? null });
          continue;
        }
        if (!stream.signals) throw new IngestError(`telemetry seq ${m.seq} before any signals were declared`);
        const decoded = decodeTelemetry(m.data);
        if (decoded.signalCount !== stream.signals.length) {
          throw new IngestError(`telemetry seq ${m.seq} has ${decoded.signalCount} signals, ${stream.signals.length} declared`);
        }
        if (decoded.rows.length !== m.ticks) throw new IngestError(`telemetry seq ${m.seq} has ${decoded.rows.length} ticks, says ${m.ticks}`);
        batches.push({ seq: m.seq, t0Ms: m.t0Ms, dtMs: m.dtMs, rows: decoded.rows });
      }
      const firstTimes = [...batches.map((b) => b.t0Ms), ...events.map((e) => e.tMs)];

      return store.transaction(async (repo) => {
        const recording =
          (await repo.findByStream(stream.teamId, stream.streamId)) ??
          (await repo.insertRecording({
            teamId: stream.teamId,
            robot: stream.robot,
            robotKeyId: stream.robotKeyId ?? null,
            streamId: stream.streamId,
            kind: stream.kind,
            source: stream.source,
            originTMs: firstTimes.length > 0 ? Math.min(...firstTimes) : 0,
            startedAt: now(),
          }));
        const id = recording.id;
        if (stream.signals && batches.length > 0 && (await repo.countSignals(id)) === 0) await repo.insertSignals(id, stream.signals);

        const fresh = await repo.claimSeqs(id, messages.map((m) => m.seq));
        const freshBatches = batches.filter((b) => fresh.has(b.seq));
        const freshEvents = events.filter((e) => fresh.has(e.seq));
        const signalCount = stream.signals?.length ?? 0;
        const chunks: SignalChunk[] = [];
        let lastMs = Number.NEGATIVE_INFINITY;
        let ticks = 0;
        for (const run of planRuns(freshBatches)) {
          runChunks(run, signalCount).forEach((c, signalIndex) => chunks.push({ ...c, signalIndex }));
          lastMs = Math.max(lastMs, tickTimeMs(run, run.ticks - 1));
          ticks += run.ticks;
        }
        for (const e of freshEvents) lastMs = Math.max(lastMs, e.tMs);
        await repo.insertChunks(id, chunks);
        await repo.insertEvents(id, freshEvents);
        if (Number.isFinite(lastMs)) await repo.extendDuration(id, lastMs - recording.originTMs);
        return { recordingId: id, stored: fresh.size, skipped: messages.length - fresh.size, ticks };
      });
    },

    /** Merges each signal's short chunks into chunks of up to maxTicks, so a whole signal reads in a few rows. */
    async compact(recordingId: string, maxTicks = CHUNK_TICKS): Promise<{ before: number; after: number }> {
      return store.transaction(async (repo) => {
        const chunks = await repo.chunksToCompact(recordingId, maxTicks);
        const bySignal = new Map<number, SignalChunk[]>();
        for (const c of chunks) {
          let list = bySignal.get(c.signalIndex);
          if (!list) bySignal.set(c.signalIndex, (list = []));
          list.push(c);
        }
        const removed: SignalChunk[] = [];
        const merged: SignalChunk[] = [];
        for (const [signalIndex, list] of bySignal) {
          for (const group of groupForMerge(list, maxTicks)) {
            if (group.length < 2) continue;
            removed.push(...(group as SignalChunk[]));
            merged.push({ ...mergeChunks(group), signalIndex });
          }
        }
        await repo.deleteChunks(recordingId, removed);
        await repo.insertChunks(recordingId, merged);
        return { before: removed.length, after: merged.length };
      });
    },

    async finish(teamId: string, recordingId: string): Promise<RecordingRow> {
      await recordingOrThrow(teamId, recordingId);
      await store.finish(recordingId, now());
      await this.compact(recordingId);
      await onFinished?.(teamId, recordingId);
      return recordingOrThrow(teamId, recordingId);
    },

    async listSignals(teamId: string, recordingId: string): Promise<Signal[]> {
      await recordingOrThrow(teamId, recordingId);
      return store.listSignals(recordingId);
    },

    async listEvents(teamId: string, recordingId: string): Promise<StoredEvent[]> {
      await recordingOrThrow(teamId, recordingId);
      return store.listEvents(recordingId);
    },

    /** One signal's samples with tS (seconds from the recording's origin) in [fromS, toS], both optional. */
    async readSamples(teamId: string, recordingId: string, signalName: string, range: { fromS?: number; toS?: number } = {}): Promise<Samples> {
      const found = await store.readSignalChunks(teamId, recordingId, signalName, range);
      if (!found) throw notFound('That recording');
      if (found.signalIndex === undefined) throw new AppError('not_found', `This recording has no signal ${signalName}`);
      return sliceSamples(found.chunks, found.originTMs, range);
    },

    listStoredSeqs: (recordingId: string) => store.listStoredSeqs(recordingId),
  };
}

export type RecordingsService = ReturnType<typeof createRecordingsService>;
