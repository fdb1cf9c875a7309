// The client side of a relay connection: hello, heartbeats, clock sync, stale detection and reconnect
// with backoff. It owns no globals: the socket factory, clock and timers are passed in, so the browser,
// the robot client and the tests all drive the same code.
import { ClockFilter, onWire, type ClockSample } from './clock-sync';
import { decodeServerFrame, encodeFrame } from './frame-codec';
import { CLOSE, PROTOCOL_VERSION, type ClientMessage, type Hello, type ServerMessage, type Welcome } from './messages';

/** The part of the WebSocket interface the link uses (browsers' WebSocket and the `ws` package both fit). */
export interface SocketLike {
  binaryType: string;
  readonly readyState: number;
  send(data: Uint8Array): void;
  close(code?: number, reason?: string): void;
  onopen: ((event: unknown) => void) | null;
  onmessage: ((event: { data: unknown }) => void) | null;
  onclose: ((event: { code: number; reason: string }) => void) | null;
  onerror: ((event: unknown) => void) | null;
}

export interface LinkDeps {
  connect(): SocketLike;
  now(): number;
  setTimer(fn: () => void, ms: number): unknown;
  clearTimer(handle: unknown): void;
  random(): number;
}

export type LinkStatus = 'connecting' | 'open' | 'stale' | 'reconnecting' | 'refused' | 'stopped';

export interface LinkEvents {
  onMessage(message: ServerMessage): void;
  /** After each welcome: re-send declarations and subscriptions here. */
  onOpen?(welcome: Welcome): void;
  onStatus?(status: LinkStatus, detail: string): void;
}

export interface LinkOptions {
  hello: Omit<Hello, 'type' | 'v'>;
  heartbeatMs?: number;
  staleMs?: number;
  backoffInitialMs?: number;
  backoffMaxMs?: number;
}

/**
 * How a watching client (the app's live pages) keeps its link: it pings every 250 ms and calls the link
 * dead after 1.5 s without a relay frame (the relay pings watchers every 500 ms).
 */
export const WATCHER_LINK_TIMING = { heartbeatMs: 250, staleMs: 1500 } as const;

const OPEN = 1;
/** Close codes after which trying again cannot help. */
const FINAL: readonly number[] = [CLOSE.unauthenticated, CLOSE.versionMismatch, CLOSE.revoked];

export function toBytes(data: unknown): Uint8Array | undefined {
  if (data instanceof ArrayBuffer) return new Uint8Array(data);
  if (ArrayBuffer.isView(data)) return new Uint8Array(data.buffer, data.byteOffset, data.byteLength);
  return undefined;
}

/** Backoff before reconnect attempt `attempt` (0-based): doubling from initialMs up to maxMs, with ±25 % jitter. */
export function backoffMs(attempt: number, initialMs: number, maxMs: number, random: number): number {
  const base = Math.min(maxMs, initialMs * 2 ** attempt);
  return Math.round(base * (0.75 + random * 0.5));
}

export class RelayLink {
  private socket: SocketLike | undefined;
  private timer: unknown;
  private reconnectTimer: unknown;
  private attempt = 0;
  private lastFrameAtMs = 0;
  private readonly clockFilter = new ClockFilter(8);
  private currentStatus: LinkStatus = 'stopped';
  private currentWelcome: Welcome | undefined;
  private readonly heartbeatMs: number;
  private readonly staleMs: number;

  constructor(
    private readonly deps: LinkDeps,
    private readonly options: LinkOptions,
    private readonly events: LinkEvents,
  ) {
    this.heartbeatMs = options.heartbeatMs ?? 100;
    this.staleMs = options.staleMs ?? 400;
  }

  get status(): LinkStatus {
    return this.currentStatus;
  }

  get welcome(): Welcome | undefined {
    return this.currentWelcome;
  }

  /** Our clock → relay clock: relay time ≈ local time + offsetMs; delayMs is the best round trip. */
  get clock(): ClockSample | undefined {
    return this.clockFilter.best();
  }

  start(): void {
    if (this.currentStatus !== 'stopped' && this.currentStatus !== 'refused') return;
    this.open();
  }

  stop(): void {
    this.setStatus('stopped', 'stopped by the client');
    this.deps.clearTimer(this.reconnectTimer);
    this.deps.clearTimer(this.timer);
    this.socket?.close(1000, 'bye');
    this.detach();
  }

  /** Sends when the relay has welcomed us; false otherwise (the caller keeps what must not be lost). */
  send(message: ClientMessage): boolean {
    if (this.currentStatus !== 'open' || !this.socket || this.socket.readyState !== OPEN) return false;
    this.socket.send(encodeFrame(message));
    return true;
  }

  /** Closes the socket as if the network dropped it; the link reconnects. For tests and diagnostics. */
  dropConnection(): void {
    this.socket?.close(4000, 'dropped by the client');
  }

  private open(): void {
    this.setStatus(this.attempt === 0 ? 'connecting' : 'reconnecting', `attempt ${this.attempt + 1}`);
    let socket: SocketLike;
    try {
      socket = this.deps.connect();
    } catch (err) {
      this.scheduleReconnect(err instanceof Error ? err.message : 'could not connect');
      return;
    }
    this.socket = socket;
    socket.binaryType = 'arraybuffer';
    socket.onopen = () => {
      this.lastFrameAtMs = this.deps.now();
      socket.send(encodeFrame({ type: 'hello', v: PROTOCOL_VERSION, ...this.options.hello }));
    };
    socket.onmessage = (event) => this.handleData(event.data);
    socket.onerror = () => {};
    socket.onclose = (event) => this.handleClose(socket, event.code, event.reason);
    this.deps.clearTimer(this.timer);
    this.timer = this.deps.setTimer(() => this.tick(), this.heartbeatMs);
  }

  private detach(): void {
    if (!this.socket) return;
    this.socket.onopen = this.socket.onmessage = this.socket.onclose = null;
    this.socket = undefined;
  }

  private tick(): void {
    const now = this.deps.now();
    if (this.socket && this.socket.readyState === OPEN) {
      if (now - this.lastFrameAtMs > this.staleMs) {
        this.setStatus('stale', `no frame from the relay for ${Math.round(now - this.lastFrameAtMs)} ms`);
        this.socket.close(CLOSE.stale, 'stale');
        this.handleClose(this.socket, CLOSE.stale, 'stale');
        return;
      }
      this.socket.send(encodeFrame({ type: 'ping', t1: now }));
    }
    this.timer = this.deps.setTimer(() => this.tick(), this.heartbeatMs);
  }

  private handleData(data: unknown): void {
    const receivedAt = this.deps.now();
    this.lastFrameAtMs = receivedAt;
    const bytes = toBytes(data);
    if (!bytes) return;
    const decoded = decodeServerFrame(bytes);
    if (!decoded.ok) return;
    const message = decoded.message;
    switch (message.type) {
      case 'ping':
        this.socket?.send(encodeFrame({ type: 'pong', t1: message.t1, t2: receivedAt, t3: this.deps.now() }));
        return;
      case 'pong':
        this.clockFilter.add(onWire(message.t1, message.t2, message.t3, receivedAt));
        return;
      case 'welcome':
        this.currentWelcome = message;
        this.attempt = 0;
        this.setStatus('open', `welcomed as ${message.role}`);
        this.events.onOpen?.(message);
        this.events.onMessage(message);
        return;
      default:
        this.events.onMessage(message);
    }
  }

  private handleClose(socket: SocketLike, code: number, reason: string): void {
    if (socket !== this.socket) return;
    this.detach();
    this.deps.clearTimer(this.timer);
    if (this.currentStatus === 'stopped') return;
    if (FINAL.includes(code)) {
      this.setStatus('refused', reason || `closed with ${code}`);
      return;
    }
    this.scheduleReconnect(reason || `closed with ${code}`);
  }

  private scheduleReconnect(detail: string): void {
    const wait = backoffMs(this.attempt, this.options.backoffInitialMs ?? 250, this.options.backoffMaxMs ?? 5000, this.deps.random());
    this.attempt += 1;
    this.setStatus('reconnecting', `${detail}; trying again in ${wait} ms`);
    this.deps.clearTimer(this.reconnectTimer);
    this.reconnectTimer = this.deps.setTimer(() => this.open(), wait);
  }

  private setStatus(status: LinkStatus, detail: string): void {
    this.currentStatus = status;
    this.events.onStatus?.(status, detail);
  }
}
