// Where the relay puts robot telemetry and events before confirming them to the robot. The recordings
// feature provides the PostgreSQL store; this in-memory one keeps each stream for tests and the demo.
import type { RobotEvent, Signal, TelemetryBatch } from '../../shared/protocol/messages';

export interface StreamRef {
  teamId: string;
  /** The robot key that sent it. */
  keyId: string | undefined;
  robot: string;
  streamId: string;
  signals: Signal[] | undefined;
}

export type DurableMessage = TelemetryBatch | RobotEvent;

export interface TelemetryStore {
  /** Stores the messages (in seq order); duplicates of stored seqs must be ignored. */
  append(stream: StreamRef, messages: DurableMessage[]): Promise<void>;
}

export interface StoredStream {
  ref: StreamRef;
  batches: Map<number, TelemetryBatch>;
  events: Map<number, RobotEvent>;
}

export class MemoryTelemetryStore implements TelemetryStore {
  readonly streams = new Map<string, StoredStream>();

  constructor(private readonly maxStreams = 20) {}

  async append(stream: StreamRef, messages: DurableMessage[]): Promise<void> {
    let stored = this.streams.get(stream.streamId);
    if (!stored) {
      stored = { ref: stream, batches: new Map(), events: new Map() };
      this.streams.set(stream.streamId, stored);
      if (this.streams.size > this.maxStreams) this.streams.delete(this.streams.keys().next().value!);
    }
    stored.ref = stream;
    for (const m of messages) {
      if (m.type === 'telemetry_batch') stored.batches.set(m.seq, m);
      else stored.events.set(m.seq, m);
    }
  }
}
