// The relay's TelemetryStore on PostgreSQL: each append is one transaction of the recordings service, so a
// seq the relay confirms as `stored` is durable. One recording per robot stream (streamId), started by the
// stream's first message; short chunks are merged every CHUNK_TICKS ticks of a stream.
import { CHUNK_TICKS } from '../features/recordings/chunks';
import type { RecordingKind, RecordingSource, RecordingsService } from '../features/recordings/recordings.service';
import type { Logger } from '../lib/logger';
import type { DurableMessage, StreamRef, TelemetryStore } from './telemetry-store';

export interface PgTelemetryStoreOptions {
  /** How a new stream's recording is labelled; practice from a live robot unless told otherwise. */
  classify?: (stream: StreamRef) => { kind: RecordingKind; source: RecordingSource };
  compactEveryTicks?: number;
  logger?: Logger;
}

export class PgTelemetryStore implements TelemetryStore {
  private readonly ticksSinceCompaction = new Map<string, number>();
  private readonly classify: NonNullable<PgTelemetryStoreOptions['classify']>;
  private readonly compactEveryTicks: number;

  constructor(
    private readonly recordings: RecordingsService,
    private readonly options: PgTelemetryStoreOptions = {},
  ) {
    this.classify = options.classify ?? (() => ({ kind: 'practice', source: 'live' }));
    this.compactEveryTicks = options.compactEveryTicks ?? CHUNK_TICKS;
  }

  async append(stream: StreamRef, messages: DurableMessage[]): Promise<void> {
    const result = await this.recordings.ingest(
      { teamId: stream.teamId, robot: stream.robot, robotKeyId: stream.keyId, streamId: stream.streamId, signals: stream.signals, ...this.classify(stream) },
      messages,
    );
    const key = `${stream.teamId}/${stream.streamId}`;
    const ticks = (this.ticksSinceCompaction.get(key) ?? 0) + result.ticks;
    if (ticks < this.compactEveryTicks) {
      this.ticksSinceCompaction.set(key, ticks);
      return;
    }
    this.ticksSinceCompaction.set(key, 0);
    // The messages are stored already: a failed merge must not hold back the confirmation; the next one retries.
    await this.recordings.compact(result.recordingId).catch((err: unknown) => {
      this.options.logger?.warn({ err, recordingId: result.recordingId }, 'recordings: merging chunks failed');
    });
  }
}
