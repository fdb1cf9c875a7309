// Where the relay puts robot telemetry and events before confirming them to the robot. The recordings
// feature provides the PostgreSQL store; this in-memory one keeps each stream for tests and the demo.
import type { ChannelValue, RobotEvent, Sender, Signal, TelemetryBatch } from '../../shared/protocol/messages';

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

/**
 * What the relay tells a recorder as it happens, synchronously and in each socket's frame order, so a match's
 * start and end fall between the right seqs. Robot time = server time + `robotMinusServerMs`.
 */
export interface StreamObserver {
  robotConnected(stream: StreamRef): void;
  robotDisconnected(stream: StreamRef): void;
  /** A telemetry batch or event as it arrives (resends too), before it is stored. */
  received(stream: StreamRef, message: DurableMessage, robotMinusServerMs: number): void;
  /** A value the robot published on a robot/ channel. */
  robotValue(stream: StreamRef, channel: string, value: ChannelValue): void;
  /** A value a person published on an op/ channel of the team. */
  selection(teamId: string, selection: { channel: string; value: ChannelValue; rev: number; from: Sender; serverMs: number }): void;
  /** The robot applied revision `rev` of an op/ channel. */
  ack(stream: StreamRef, ack: { channel: string; rev: number; relayRttMs: number; serverMs: number }): void;
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
