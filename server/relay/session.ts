// One connected client of the relay: its identity, its outbound queues and its limits. Hides `ws`.
import type { WebSocket } from 'ws';
import { ClockFilter, type ClockSample } from '../../shared/protocol/clock-sync';
import { encodeFrame } from '../../shared/protocol/frame-codec';
import { CLOSE, type ClientKind, type CloseCode, type RelayRole, type Sender, type ServerMessage } from '../../shared/protocol/messages';
import { createBucket, takeToken, type TokenBucket } from '../../shared/protocol/token-bucket';
import type { DeferredFlush } from './deferred-flush';

export interface SessionIdentity {
  sessionId: string;
  teamId: string;
  teamNumber: number;
  role: RelayRole;
  /** The person's name, or the robot key's name. */
  principal: string;
  /** Robot key id, for revocation. */
  keyId?: string;
}

export interface SessionLimits {
  /** Frames a client may send per second, sustained, and in a burst. */
  ratePerS: number;
  burst: number;
  /** Lossy frames (telemetry) waiting for a slow client before the oldest is dropped. */
  lossyQueue: number;
  /** Reliable frames waiting before the client is judged stuck and closed. */
  reliableQueue: number;
  /** Frames handed to the socket whose write has not completed. */
  inFlight: number;
}

export const DEFAULT_LIMITS: SessionLimits = { ratePerS: 400, burst: 800, lossyQueue: 256, reliableQueue: 20_000, inFlight: 16 };

export type Lane = 'reliable' | 'lossy';

/**
 * `now`: written at once (replies, pongs, an op/ value to a robot, an ack to its publisher). `soon`: fan-out to
 * watchers, written a few sockets per event-loop turn. A session's frames keep their order either way.
 */
export type Urgency = 'now' | 'soon';

export interface SessionStats {
  framesIn: number;
  framesOut: number;
  bytesIn: number;
  bytesOut: number;
  dropped: number;
  violations: number;
}

export class RelaySession {
  kind: ClientKind | undefined;
  name = '';
  streamId: string | undefined;
  reads: string[] = [];
  readonly prefixes = new Set<string>();
  readonly connectedAtMs: number;
  lastFrameAtMs: number;
  /** When the relay last pinged this client. */
  lastPingAtMs = Number.NEGATIVE_INFINITY;
  /** Client time minus server time (RFC 5905 estimate from the relay's pings), once measured. */
  offsetMs = 0;
  rttMs: number | undefined;
  private readonly clock = new ClockFilter(8);
  private readonly reliable: Uint8Array[] = [];
  private readonly lossy: Uint8Array[] = [];
  private inFlight = 0;
  private closed = false;
  private readonly bucket: TokenBucket;
  private violationTimes: number[] = [];
  readonly stats: SessionStats = { framesIn: 0, framesOut: 0, bytesIn: 0, bytesOut: 0, dropped: 0, violations: 0 };

  constructor(
    private readonly ws: WebSocket,
    readonly identity: SessionIdentity,
    private readonly limits: SessionLimits,
    private readonly now: () => number,
    private readonly deferred?: DeferredFlush,
  ) {
    this.connectedAtMs = now();
    this.lastFrameAtMs = this.connectedAtMs;
    this.bucket = createBucket(limits.burst, this.connectedAtMs);
  }

  get id(): string {
    return this.identity.sessionId;
  }

  get role(): RelayRole {
    return this.identity.role;
  }

  get isOpen(): boolean {
    return !this.closed;
  }

  get hasHello(): boolean {
    return this.kind !== undefined;
  }

  get queued(): number {
    return this.reliable.length + this.lossy.length;
  }

  sender(): Sender {
    return { sessionId: this.id, kind: this.kind ?? 'viewer', name: this.name, role: this.role };
  }

  /** Counts an inbound frame against the rate limit; false when over it. */
  admit(bytes: number): boolean {
    this.lastFrameAtMs = this.now();
    this.stats.framesIn += 1;
    this.stats.bytesIn += bytes;
    return takeToken(this.bucket, this.lastFrameAtMs, this.limits.ratePerS, this.limits.burst);
  }

  /** Records a protocol violation; true when there were too many in the last 10 s. */
  violation(): boolean {
    const now = this.now();
    this.stats.violations += 1;
    this.violationTimes = this.violationTimes.filter((t) => now - t < 10_000);
    this.violationTimes.push(now);
    return this.violationTimes.length > 40;
  }

  /** Takes the clock sample of a pong: server t1/t4, client t2/t3. */
  clockSample(sample: ClockSample): void {
    this.rttMs = Math.max(0, sample.delayMs);
    this.clock.add(sample);
    this.offsetMs = this.clock.best()?.offsetMs ?? 0;
  }

  send(message: ServerMessage, lane: Lane = 'reliable'): void {
    this.sendBytes(encodeFrame(message), lane);
  }

  /** Queues pre-encoded bytes (fan-out encodes once for every subscriber). */
  sendBytes(bytes: Uint8Array, lane: Lane, urgency: Urgency = 'now'): void {
    if (this.closed) return;
    if (lane === 'lossy') {
      this.lossy.push(bytes);
      if (this.lossy.length > this.limits.lossyQueue) {
        this.lossy.shift();
        this.stats.dropped += 1;
      }
    } else {
      this.reliable.push(bytes);
      if (this.reliable.length > this.limits.reliableQueue) {
        this.close(CLOSE.tooSlow, 'too slow: reliable queue full');
        return;
      }
    }
    if (urgency === 'soon' && this.deferred) this.deferred.add(this);
    else this.flush();
  }

  close(code: CloseCode | 1000, reason: string): void {
    if (this.closed) return;
    this.closed = true;
    this.reliable.length = 0;
    this.lossy.length = 0;
    try {
      this.ws.close(code, reason);
    } catch {
      this.ws.terminate();
    }
    // A stuck peer never completes the closing handshake; do not wait for it.
    setTimeout(() => this.ws.terminate(), 1000).unref();
  }

  /** Marks the session closed after the socket went away by itself. */
  markClosed(): void {
    this.closed = true;
    this.reliable.length = 0;
    this.lossy.length = 0;
  }

  /** Hands queued frames to the socket, reliable first, up to the in-flight limit. */
  flush(): void {
    while (!this.closed && this.inFlight < this.limits.inFlight) {
      const next = this.reliable.shift() ?? this.lossy.shift();
      if (!next) return;
      this.inFlight += 1;
      this.stats.framesOut += 1;
      this.stats.bytesOut += next.byteLength;
      this.ws.send(next, { binary: true }, () => {
        this.inFlight -= 1;
        this.flush();
      });
    }
  }
}
