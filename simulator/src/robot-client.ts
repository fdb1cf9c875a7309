// A robot's connection to the relay: key authentication, subscriptions, acks, signal declaration and
// telemetry that is kept until the relay confirms it stored it, then resent after any reconnect.
import { randomUUID } from 'node:crypto';
import { WebSocket } from 'ws';
import { encodeTelemetry } from '../../shared/protocol/telemetry-codec';
import type { ChannelValue, ClientMessage, RobotEvent, ServerMessage, Signal, TelemetryBatch } from '../../shared/protocol/messages';
import { RelayLink, type LinkStatus, type SocketLike } from '../../shared/protocol/relay-link';

export interface RobotClientOptions {
  /** ws://host:port/relay */
  url: string;
  key: string;
  name: string;
  /** op/ channels the robot code reads, announced to the relay for the panel check. */
  reads?: string[];
  /** Prefixes to subscribe to after every (re)connect; op/ by default. */
  subscribe?: string[];
  streamId?: string;
  /** Unconfirmed messages kept at most; beyond it the oldest are dropped and counted. */
  maxPending?: number;
  onValue?(channel: string, value: ChannelValue, rev: number, retained: boolean): void;
  onStatus?(status: LinkStatus, detail: string): void;
  onMessage?(message: ServerMessage): void;
  now?: () => number;
}

type Durable = (TelemetryBatch | RobotEvent) & { seq: number };

export class RobotClient {
  readonly streamId: string;
  private readonly link: RelayLink;
  private signals: Signal[] | undefined;
  private readonly pending = new Map<number, Durable>();
  private nextSeq = 0;
  private confirmedUpTo = -1;
  private droppedUnconfirmed = 0;
  private readonly now: () => number;

  constructor(private readonly options: RobotClientOptions) {
    this.streamId = options.streamId ?? randomUUID();
    this.now = options.now ?? (() => performance.timeOrigin + performance.now());
    this.link = new RelayLink(
      {
        connect: () =>
          new WebSocket(options.url, { headers: { authorization: `Bearer ${options.key}` }, perMessageDeflate: false }) as unknown as SocketLike,
        now: this.now,
        setTimer: (fn, ms) => setTimeout(fn, ms),
        clearTimer: (h) => clearTimeout(h as NodeJS.Timeout),
        random: Math.random,
      },
      { hello: { kind: 'robot', name: options.name, streamId: this.streamId, reads: options.reads ?? [] } },
      {
        onOpen: () => this.resume(),
        onMessage: (m) => this.handle(m),
        onStatus: (status, detail) => options.onStatus?.(status, detail),
      },
    );
  }

  get status(): LinkStatus {
    return this.link.status;
  }

  /** Messages sent but not yet confirmed stored. */
  get pendingCount(): number {
    return this.pending.size;
  }

  get storedUpTo(): number {
    return this.confirmedUpTo;
  }

  get dropped(): number {
    return this.droppedUnconfirmed;
  }

  /** Relay time minus robot time, from the RFC 5905 exchange. */
  get clockOffsetMs(): number | undefined {
    return this.link.clock?.offsetMs;
  }

  start(): void {
    this.link.start();
  }

  stop(): void {
    this.link.stop();
  }

  /** Simulates a dropped link (the client reconnects by itself). */
  dropConnection(): void {
    this.link.dropConnection();
  }

  declareSignals(signals: Signal[]): void {
    this.signals = signals;
    this.link.send({ type: 'signals', signals });
  }

  /** Packs and sends `rows` sampled every dtMs from robot time t0Ms; returns the batch's seq. */
  sendTelemetry(rows: readonly ArrayLike<number>[], t0Ms: number, dtMs: number): number {
    if (!this.signals) throw new Error('declare signals before sending telemetry');
    const data = encodeTelemetry(rows, this.signals.length);
    return this.sendDurable({ type: 'telemetry_batch', seq: this.nextSeq, t0Ms, dtMs, ticks: rows.length, data });
  }

  sendEvent(kind: string, tMs: number, data?: Record<string, ChannelValue>): number {
    return this.sendDurable({ type: 'event', seq: this.nextSeq, tMs, kind, ...(data ? { data } : {}) });
  }

  /** Publishes a retained robot/ value (not kept for resend: the next value replaces it). */
  publish(channel: string, value: ChannelValue): boolean {
    return this.link.send({ type: 'publish', id: this.nextSeq, channel, value });
  }

  ack(channel: string, rev: number): boolean {
    return this.link.send({ type: 'ack', channel, rev });
  }

  private sendDurable(message: Durable): number {
    this.nextSeq += 1;
    this.pending.set(message.seq, message);
    const max = this.options.maxPending ?? 30_000;
    while (this.pending.size > max) {
      this.pending.delete(this.pending.keys().next().value!);
      this.droppedUnconfirmed += 1;
    }
    this.link.send(message as ClientMessage);
    return message.seq;
  }

  /** After each welcome: declarations, subscriptions, then every unconfirmed message in order. */
  private resume(): void {
    if (this.signals) this.link.send({ type: 'signals', signals: this.signals });
    this.link.send({ type: 'subscribe', prefixes: this.options.subscribe ?? ['op/'] });
    for (const message of this.pending.values()) this.link.send(message as ClientMessage);
  }

  private handle(message: ServerMessage): void {
    this.options.onMessage?.(message);
    if (message.type === 'stored' && message.streamId === this.streamId) {
      this.confirmedUpTo = Math.max(this.confirmedUpTo, message.upTo);
      for (const seq of this.pending.keys()) {
        if (seq > message.upTo) break;
        this.pending.delete(seq);
      }
    } else if (message.type === 'value') {
      this.options.onValue?.(message.channel, message.value, message.rev, message.retained);
    }
  }
}
