import type { RobotEvent, Signal, TelemetryBatch } from '../../../shared/protocol/messages';
import { decodeTelemetry } from '../../../shared/protocol/telemetry-codec';
import { AppError, notFound } from '../../lib/errors';
import { CHUNK_TICKS, groupForMerge, mergeChunks, planRuns, runChunks, sliceSamples, tickTimeMs, type DecodedBatch, type Samples } from './chunks';
import type { RecordingRow, RecordingsStore, SignalChunk, StoredEvent } from './recordings.repo';

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
}

export class IngestError extends Error {}

export function createRecordingsService({ store, now }: RecordingsServiceDeps) {
  async function recordingOrThrow(teamId: string, id: string): Promise<RecordingRow> {
    const row = await store.find(teamId, id);
    if (!row) throw notFound('That recording');
    return row;
  }

  return {
    findByStream: (teamId: string, streamId: string) => store.findByStream(teamId, streamId),
    get: recordingOrThrow,

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
      const recording = await recordingOrThrow(teamId, recordingId);
      const signal = (await store.listSignals(recordingId)).find((s) => s.name === signalName);
      if (!signal) throw new AppError('not_found', `This recording has no signal ${signalName}`);
      const originMs = recording.originTMs;
      const chunks = await store.readChunks(recordingId, signal.index, {
        fromMs: range.fromS === undefined ? undefined : originMs + range.fromS * 1000,
        toMs: range.toS === undefined ? undefined : originMs + range.toS * 1000,
      });
      return sliceSamples(chunks, originMs, range);
    },

    listStoredSeqs: (recordingId: string) => store.listStoredSeqs(recordingId),
  };
}

export type RecordingsService = ReturnType<typeof createRecordingsService>;
