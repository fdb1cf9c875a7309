// The app's one relay connection and the store the Live page reads. DOM-free: the socket factory, clock,
// timers and the once-per-frame scheduler are passed in (hooks/use-relay.ts wires the browser's), so the
// reducer, statistics and the client itself run under Vitest with a fake socket and a fake clock.
import { z } from 'zod';
import type { ClockSample } from '../../shared/protocol/clock-sync';
import {
  clientKindSchema,
  relayRoleSchema,
  type ChannelValue,
  type ClientKind,
  type RelayErrorCode,
  type Sender,
  type ServerMessage,
  type Signal,
  type Welcome,
} from '../../shared/protocol/messages';
import { RelayLink, type LinkDeps, type LinkStatus } from '../../shared/protocol/relay-link';
import { decodeTelemetry, TelemetryDecodeError } from '../../shared/protocol/telemetry-codec';

// ---- state ------------------------------------------------------------------------------------------

/** `idle` before the first subscriber starts the link. */
export type RelayStatus = LinkStatus | 'idle';

export type ChannelEntry = {
  channel: string;
  value: ChannelValue;
  rev: number;
  /** Relay time when the relay accepted this revision. */
  tMs: number;
  from: Sender;
  ackedRev?: number;
  /** Our clock when this revision reached us. */
  receivedAtMs: number;
};

/** One entry of the relay's `sys/clients` value. */
export const sysClientSchema = z.object({
  sessionId: z.string(),
  kind: clientKindSchema,
  name: z.string(),
  role: relayRoleSchema,
  principal: z.string(),
  connectedAtMs: z.number(),
  rttMs: z.number().nullable(),
  reads: z.array(z.string()).optional(),
});
export type SysClient = z.infer<typeof sysClientSchema>;
const sysClientsSchema = z.array(sysClientSchema);

export type TrailPoint = { tMs: number; xM: number; yM: number };

export type RobotSample = {
  /** Relay time of the newest tick. */
  tMs: number;
  /** Newest known value of each declared signal, by name (enums as their index, booleans as 0/1). */
  values: Readonly<Record<string, number>>;
};

export type RobotTelemetry = {
  robot: string;
  signals?: readonly Signal[];
  latest?: RobotSample;
  /** Our clock when the last batch arrived. */
  receivedAtMs?: number;
  /** drive/pose/x and drive/pose/y over the last TRAIL_WINDOW_MS, oldest first. */
  trail: readonly TrailPoint[];
};

export type RelayEventEntry = {
  key: string;
  robot: string;
  kind: string;
  /** Relay time. */
  tMs: number;
  data?: Readonly<Record<string, ChannelValue>>;
};

export type PublishState = 'pending' | 'acked' | 'stale' | 'refused';

export type PublishTrack = {
  id: number;
  channel: string;
  value: ChannelValue;
  /** Our clock when it was handed to the socket. */
  sentAtMs: number;
  state: PublishState;
  rev?: number;
  /** Our send → the robot's ack reaching us. */
  roundTripMs?: number;
  /** The relay's share: accepting the value → the robot's ack. */
  relayRttMs?: number;
  /** True when the ack came after the publish was called stale. */
  isLate?: boolean;
  /** True when the client sent it again by itself after a reconnect (resendAfterReconnect). */
  isResend?: boolean;
  refusal?: { code: RelayErrorCode | 'not_connected'; message: string };
};

export type LatencyStats = { count: number; windowCount: number; lastMs: number; p50Ms: number; p90Ms: number; p99Ms: number };

export type RelayState = {
  status: RelayStatus;
  detail: string;
  statusSinceMs: number;
  /** The last time the link went stale, with what the link said. */
  lastStale?: { atMs: number; detail: string };
  welcome?: Welcome;
  clock?: ClockSample;
  channels: Readonly<Record<string, ChannelEntry>>;
  /** Undefined until the relay has sent sys/clients on this connection. */
  clients?: readonly SysClient[];
  robots: Readonly<Record<string, RobotTelemetry>>;
  /** Newest first. */
  events: readonly RelayEventEntry[];
  publishes: Readonly<Record<number, PublishTrack>>;
  /** The id of the newest publish on each channel. */
  latestPublish: Readonly<Record<string, number>>;
  /** Round trips of this client's acknowledged publishes, oldest first, at most LATENCY_WINDOW. */
  roundTripsMs: readonly number[];
  roundTripCount: number;
  lastError?: { code: RelayErrorCode; message: string; atMs: number };
};

export const TRAIL_WINDOW_MS = 5000;
export const EVENTS_KEPT = 40;
export const LATENCY_WINDOW = 200;
const PUBLISHES_KEPT = 32;
const CLOCK_POLL_MS = 1000;
export const POSE_SIGNALS = { x: 'drive/pose/x', y: 'drive/pose/y', heading: 'drive/pose/heading' } as const;

export const initialRelayState = (atMs = 0): RelayState => ({
  status: 'idle',
  detail: 'not started',
  statusSinceMs: atMs,
  channels: {},
  robots: {},
  events: [],
  publishes: {},
  latestPublish: {},
  roundTripsMs: [],
  roundTripCount: 0,
});

// ---- pure pieces ------------------------------------------------------------------------------------

/**
 * The p-quantile (0 ≤ p ≤ 1) of ascending `sorted` by linear interpolation between closest ranks
 * (R type 7, numpy's default); NaN for an empty list.
 */
export function quantileSorted(sorted: readonly number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  const at = (sorted.length - 1) * Math.min(1, Math.max(0, p));
  const lower = Math.floor(at);
  const upper = Math.ceil(at);
  return sorted[lower]! + (at - lower) * (sorted[upper]! - sorted[lower]!);
}

/** Count, last and p50/p90/p99 of round trips (ms, oldest first); undefined before the first. */
export function latencyStats(roundTripsMs: readonly number[], count: number): LatencyStats | undefined {
  const last = roundTripsMs[roundTripsMs.length - 1];
  if (last === undefined) return undefined;
  const sorted = [...roundTripsMs].sort((a, b) => a - b);
  return {
    count,
    windowCount: sorted.length,
    lastMs: last,
    p50Ms: quantileSorted(sorted, 0.5),
    p90Ms: quantileSorted(sorted, 0.9),
    p99Ms: quantileSorted(sorted, 0.99),
  };
}

/** `trail` plus `points`, keeping what lies within `windowMs` of the newest point (times in ms, ascending). */
export function extendTrail(trail: readonly TrailPoint[], points: readonly TrailPoint[], windowMs = TRAIL_WINDOW_MS): TrailPoint[] {
  const all = points.length === 0 ? [...trail] : [...trail, ...points];
  const newest = all[all.length - 1];
  if (!newest) return all;
  const from = all.findIndex((p) => p.tMs >= newest.tMs - windowMs);
  return from <= 0 ? all : all.slice(from);
}

/** A bounded list with the newest entry first. */
export function pushNewest<T>(list: readonly T[], item: T, max: number): T[] {
  return [item, ...list.slice(0, max - 1)];
}

/** Relay events the store reacts to, in the order they happen. */
export type RelayAction =
  | { type: 'status'; status: LinkStatus; detail: string; atMs: number }
  | { type: 'message'; message: ServerMessage; atMs: number }
  | { type: 'sent'; id: number; channel: string; value: ChannelValue; atMs: number; isResend?: boolean }
  | { type: 'unsent'; id: number; channel: string; value: ChannelValue; atMs: number; isResend?: boolean }
  | { type: 'publish_timeout'; id: number }
  | { type: 'clock'; clock: ClockSample | undefined };

function withPublish(state: RelayState, track: PublishTrack): RelayState {
  const publishes: Record<number, PublishTrack> = { ...state.publishes, [track.id]: track };
  const ids = Object.keys(publishes).map(Number);
  // Keep the newest ones and whatever a channel still points at.
  const keep = new Set([...ids.sort((a, b) => b - a).slice(0, PUBLISHES_KEPT), ...Object.values(state.latestPublish), track.id]);
  for (const id of ids) if (!keep.has(id)) delete publishes[id];
  return { ...state, publishes };
}

function handleAcked(state: RelayState, m: Extract<ServerMessage, { type: 'acked' }>, atMs: number): RelayState {
  let next = state;
  const entry = state.channels[m.channel];
  if (entry && m.rev === entry.rev && (entry.ackedRev ?? 0) < m.rev) {
    next = { ...next, channels: { ...next.channels, [m.channel]: { ...entry, ackedRev: m.rev } } };
  }
  const mine = Object.values(state.publishes).find((p) => p.channel === m.channel && p.rev === m.rev);
  if (!mine || mine.state === 'acked' || mine.state === 'refused') return next;
  const roundTripMs = atMs - mine.sentAtMs;
  next = withPublish(next, { ...mine, state: 'acked', roundTripMs, relayRttMs: m.relayRttMs, isLate: mine.state === 'stale' });
  return {
    ...next,
    roundTripsMs: [...next.roundTripsMs, roundTripMs].slice(-LATENCY_WINDOW),
    roundTripCount: next.roundTripCount + 1,
  };
}

function handleTelemetry(state: RelayState, m: Extract<ServerMessage, { type: 'telemetry_batch' }>, atMs: number): RelayState {
  const robot = state.robots[m.robot] ?? { robot: m.robot, trail: [] };
  const signals = robot.signals;
  if (!signals) return state;
  let rows: Float32Array[];
  try {
    rows = decodeTelemetry(m.data).rows;
  } catch (err) {
    if (err instanceof TelemetryDecodeError) return state;
    throw err;
  }
  if (rows.length === 0) return state;
  const values: Record<string, number> = { ...robot.latest?.values };
  // The newest tick that knows each signal: NaN means the robot had no value then.
  for (const s of signals) {
    for (let i = rows.length - 1; i >= 0; i -= 1) {
      const v = rows[i]![s.index];
      if (v !== undefined && !Number.isNaN(v)) {
        values[s.name] = v;
        break;
      }
    }
  }
  const xIndex = signals.find((s) => s.name === POSE_SIGNALS.x)?.index;
  const yIndex = signals.find((s) => s.name === POSE_SIGNALS.y)?.index;
  const points: TrailPoint[] = [];
  if (xIndex !== undefined && yIndex !== undefined) {
    rows.forEach((row, i) => {
      const xM = row[xIndex];
      const yM = row[yIndex];
      if (xM === undefined || yM === undefined || Number.isNaN(xM) || Number.isNaN(yM)) return;
      points.push({ tMs: m.t0Ms + i * m.dtMs + m.offsetMs, xM, yM });
    });
  }
  const tMs = m.t0Ms + (rows.length - 1) * m.dtMs + m.offsetMs;
  const next: RobotTelemetry = { ...robot, latest: { tMs, values }, receivedAtMs: atMs, trail: extendTrail(robot.trail, points) };
  return { ...state, robots: { ...state.robots, [m.robot]: next } };
}

function handleMessage(state: RelayState, m: ServerMessage, atMs: number): RelayState {
  switch (m.type) {
    case 'welcome':
      // A new connection: the relay re-sends everything retained, so forget what the last one knew.
      return { ...state, welcome: m, channels: {}, clients: undefined };
    case 'value': {
      const entry: ChannelEntry = { channel: m.channel, value: m.value, rev: m.rev, tMs: m.tMs, from: m.from, receivedAtMs: atMs };
      if (m.ackedRev !== undefined) entry.ackedRev = m.ackedRev;
      let next: RelayState = { ...state, channels: { ...state.channels, [m.channel]: entry } };
      if (m.channel === 'sys/clients') {
        const parsed = sysClientsSchema.safeParse(m.value);
        if (parsed.success) next = { ...next, clients: parsed.data };
      }
      return next;
    }
    case 'published': {
      const mine = state.publishes[m.id];
      if (!mine) return state;
      // The relay queues `published` before it can forward the robot's ack, so the rev is known first.
      return withPublish(state, { ...mine, rev: m.rev });
    }
    case 'acked':
      return handleAcked(state, m, atMs);
    case 'error': {
      const mine = m.id !== undefined ? state.publishes[m.id] : undefined;
      if (mine && (mine.state === 'pending' || mine.state === 'stale')) {
        return withPublish(state, { ...mine, state: 'refused', refusal: { code: m.code, message: m.message } });
      }
      return { ...state, lastError: { code: m.code, message: m.message, atMs } };
    }
    case 'signals': {
      const robot = state.robots[m.robot] ?? { robot: m.robot, trail: [] };
      const signals = [...m.signals].sort((a, b) => a.index - b.index);
      return { ...state, robots: { ...state.robots, [m.robot]: { ...robot, signals } } };
    }
    case 'telemetry_batch':
      return handleTelemetry(state, m, atMs);
    case 'event': {
      const entry: RelayEventEntry = { key: `${m.robot}:${m.seq}`, robot: m.robot, kind: m.kind, tMs: m.tMs + m.offsetMs };
      if (m.data) entry.data = m.data;
      if (state.events.some((e) => e.key === entry.key)) return state;
      return { ...state, events: pushNewest(state.events, entry, EVENTS_KEPT) };
    }
    case 'ping':
    case 'pong':
    case 'stored':
      return state;
    default:
      return assertNever(m);
  }
}

/** The store's reducer: the state after `action`. Pure. */
export function reduceRelay(state: RelayState, action: RelayAction): RelayState {
  switch (action.type) {
    case 'status': {
      const next = { ...state, status: action.status, detail: action.detail, statusSinceMs: action.atMs };
      return action.status === 'stale' ? { ...next, lastStale: { atMs: action.atMs, detail: action.detail } } : next;
    }
    case 'message':
      return handleMessage(state, action.message, action.atMs);
    case 'sent':
    case 'unsent': {
      const track: PublishTrack = { id: action.id, channel: action.channel, value: action.value, sentAtMs: action.atMs, state: 'pending' };
      if (action.isResend) track.isResend = true;
      if (action.type === 'unsent') {
        track.state = 'refused';
        track.refusal = { code: 'not_connected', message: 'Not sent: the relay is not connected.' };
      }
      const next = { ...state, latestPublish: { ...state.latestPublish, [action.channel]: action.id } };
      return withPublish(next, track);
    }
    case 'publish_timeout': {
      const mine = state.publishes[action.id];
      if (!mine || mine.state !== 'pending') return state;
      return withPublish(state, { ...mine, state: 'stale' });
    }
    case 'clock':
      return { ...state, clock: action.clock };
    default:
      return assertNever(action);
  }
}

function assertNever(value: never): never {
  throw new Error(`unhandled relay action ${JSON.stringify(value)}`);
}

// ---- the client -------------------------------------------------------------------------------------

export interface RelayClientDeps extends LinkDeps {
  /** Runs `fn` once before the next paint (requestAnimationFrame in a browser). */
  scheduleFlush(fn: () => void): void;
}

export interface RelayClientOptions {
  hello: { kind: ClientKind; name: string };
  /** A publish without an ack after this long is called stale. */
  ackTimeoutMs?: number;
  /** The link stays up this long after the last subscriber leaves (route changes, StrictMode remounts). */
  releaseGraceMs?: number;
  heartbeatMs?: number;
  staleMs?: number;
  /**
   * Keep the newest value published on each channel (the operator's current selection) and publish it again
   * after every reconnect, so a robot that missed it while the link was down, or a restarted relay, has it.
   */
  resendAfterReconnect?: boolean;
}

/** What to publish again after a reconnect: every kept selection, in the order the channels were first chosen. */
export function selectionsToResend(kept: ReadonlyMap<string, ChannelValue>): { channel: string; value: ChannelValue }[] {
  return [...kept].map(([channel, value]) => ({ channel, value }));
}

export type PublishTicket = { id: number; channel: string; settled: Promise<PublishTrack> };

/**
 * One relay connection shared by every subscriber. The first subscriber starts it, the last one leaving
 * stops it; listeners hear about changes at most once per `scheduleFlush`.
 */
export class RelayClient {
  private state: RelayState;
  private snapshot: RelayState;
  private readonly listeners = new Set<() => void>();
  private readonly link: RelayLink;
  private isFlushScheduled = false;
  private releaseTimer: unknown;
  private clockTimer: unknown;
  private nextId = 1;
  private readonly waiting = new Map<number, (track: PublishTrack) => void>();
  private readonly kept = new Map<string, ChannelValue>();

  constructor(
    private readonly deps: RelayClientDeps,
    private readonly options: RelayClientOptions,
  ) {
    this.state = initialRelayState(deps.now());
    this.snapshot = this.state;
    this.link = new RelayLink(
      deps,
      { hello: options.hello, heartbeatMs: options.heartbeatMs, staleMs: options.staleMs },
      {
        onOpen: () => {
          this.link.send({ type: 'subscribe', prefixes: ['op/', 'robot/', 'sys/'] });
          if (this.options.resendAfterReconnect) for (const s of selectionsToResend(this.kept)) this.send(s.channel, s.value, true);
        },
        onMessage: (message) => this.dispatch({ type: 'message', message, atMs: this.deps.now() }),
        onStatus: (status, detail) => this.dispatch({ type: 'status', status, detail, atMs: this.deps.now() }),
      },
    );
  }

  /** The state as of the last flush (stable between flushes, as useSyncExternalStore needs). */
  getSnapshot = (): RelayState => this.snapshot;

  subscribe = (listener: () => void): (() => void) => {
    this.listeners.add(listener);
    this.deps.clearTimer(this.releaseTimer);
    this.releaseTimer = undefined;
    if (this.link.status === 'stopped' || this.link.status === 'refused') {
      this.link.start();
      this.pollClock();
    }
    return () => {
      this.listeners.delete(listener);
      if (this.listeners.size > 0) return;
      this.deps.clearTimer(this.releaseTimer);
      this.releaseTimer = this.deps.setTimer(() => {
        if (this.listeners.size > 0) return;
        this.link.stop();
        this.deps.clearTimer(this.clockTimer);
      }, this.options.releaseGraceMs ?? 3000);
    };
  };

  /** Sends `value` on `channel` and tracks it: pending → acked (with the round trip) | stale | refused. */
  publish(channel: string, value: ChannelValue): PublishTicket {
    if (this.options.resendAfterReconnect) this.kept.set(channel, value);
    return this.send(channel, value, false);
  }

  /** The selections kept for resending (resendAfterReconnect), by channel. */
  keptSelections(): ReadonlyMap<string, ChannelValue> {
    return this.kept;
  }

  private send(channel: string, value: ChannelValue, isResend: boolean): PublishTicket {
    const id = this.nextId;
    this.nextId = this.nextId >= 2 ** 31 ? 1 : this.nextId + 1;
    const atMs = this.deps.now();
    const isSent = this.link.send({ type: 'publish', id, channel, value });
    const settled = new Promise<PublishTrack>((resolve) => this.waiting.set(id, resolve));
    this.dispatch({ type: isSent ? 'sent' : 'unsent', id, channel, value, atMs, ...(isResend ? { isResend } : {}) });
    if (isSent) this.deps.setTimer(() => this.dispatch({ type: 'publish_timeout', id }), this.options.ackTimeoutMs ?? 1000);
    return { id, channel, settled };
  }

  /** Drops the socket as a pulled cable would; the link reconnects. */
  dropConnection(): void {
    this.link.dropConnection();
  }

  /** The link refines its clock on every pong without telling anyone: look at each flush and once a second. */
  private pollClock(): void {
    this.deps.clearTimer(this.clockTimer);
    this.clockTimer = this.deps.setTimer(() => {
      if (this.hasClockChanged()) this.dispatch({ type: 'clock', clock: this.link.clock });
      this.pollClock();
    }, CLOCK_POLL_MS);
  }

  private hasClockChanged(): boolean {
    const clock = this.link.clock;
    return clock?.offsetMs !== this.state.clock?.offsetMs || clock?.delayMs !== this.state.clock?.delayMs;
  }

  private dispatch(action: RelayAction): void {
    this.state = reduceRelay(this.state, action);
    for (const [id, resolve] of this.waiting) {
      const track = this.state.publishes[id];
      if (track && track.state !== 'pending') {
        this.waiting.delete(id);
        resolve(track);
      }
    }
    if (this.isFlushScheduled) return;
    this.isFlushScheduled = true;
    this.deps.scheduleFlush(() => this.flush());
  }

  private flush(): void {
    this.isFlushScheduled = false;
    if (this.hasClockChanged()) this.state = reduceRelay(this.state, { type: 'clock', clock: this.link.clock });
    this.snapshot = this.state;
    for (const listener of [...this.listeners]) listener();
  }
}
