// The relay at /relay: authenticates the WebSocket upgrade, then handles each client's frames.
import { randomUUID } from 'node:crypto';
import type { IncomingMessage } from 'node:http';
import type { Duplex } from 'node:stream';
import { WebSocketServer, type WebSocket } from 'ws';
import { canPublish, canSubscribe } from '../../shared/domain/relay-permissions';
import { decodeClientFrame } from '../../shared/protocol/frame-codec';
import { onWire } from '../../shared/protocol/clock-sync';
import {
  CLOSE,
  PROTOCOL_VERSION,
  type ChannelValue,
  type ClientMessage,
  type RelayErrorCode,
  type RobotEvent,
  type Sender,
  type Signal,
  type TelemetryBatch,
} from '../../shared/protocol/messages';
import type { Logger } from '../lib/logger';
import { DeferredFlush } from './deferred-flush';
import { DEFAULT_LIMITS, RelaySession, type SessionIdentity, type SessionLimits } from './session';
import { STREAM_CHANNELS, TeamHub } from './team-hub';
import type { DurableMessage, StreamObserver, StreamRef, TelemetryStore } from './telemetry-store';

export type Principal = Omit<SessionIdentity, 'sessionId'>;

export interface RelayDeps {
  /** The member behind a session cookie header, or undefined. */
  authenticateCookie(cookieHeader: string | undefined): Promise<Principal | undefined>;
  /** The robot behind a key, or undefined for an unknown or revoked key. */
  authenticateRobot(secret: string): Promise<Principal | undefined>;
  store: TelemetryStore;
  /** Told of robot connections, modes, selections and acks as they happen (the recorder). */
  observer?: StreamObserver;
  logger: Logger;
  now?: () => number;
  limits?: Partial<SessionLimits>;
  heartbeatMs?: number;
  /** Viewers and recorders only watch: they are pinged this often (and told so in their welcome). */
  viewerHeartbeatMs?: number;
  /** Robots and panels are closed after this long without a frame. */
  staleMs?: number;
  /** Viewers and recorders get longer: a browser throttles the timers of a tab in the background. */
  viewerStaleMs?: number;
  /** Frames above this get an error frame; ws closes the socket above four times it. */
  maxFrameBytes?: number;
  helloTimeoutMs?: number;
}

export interface Relay {
  handleUpgrade(req: IncomingMessage, socket: Duplex, head: Buffer): void;
  /** Closes the sessions of a revoked robot key. */
  disconnectKey(keyId: string): void;
  hub(teamId: string): TeamHub | undefined;
  close(): Promise<void>;
}

export const RELAY_PATH = '/relay';
const RELAY_SENDER: Sender = { sessionId: 'relay', kind: 'viewer', name: 'relay', role: 'viewer' };

export function createRelay(deps: RelayDeps): Relay {
  const now = deps.now ?? (() => Date.now());
  const limits = { ...DEFAULT_LIMITS, ...deps.limits };
  const heartbeatMs = deps.heartbeatMs ?? 100;
  const staleMs = deps.staleMs ?? 400;
  const viewerStaleMs = deps.viewerStaleMs ?? 5000;
  const viewerHeartbeatMs = deps.viewerHeartbeatMs ?? 500;
  const watches = (s: RelaySession) => s.kind === 'viewer' || s.kind === 'recorder';
  const staleLimit = (s: RelaySession) => (watches(s) ? viewerStaleMs : staleMs);
  const heartbeatFor = (s: RelaySession) => (watches(s) ? viewerHeartbeatMs : heartbeatMs);
  const maxFrameBytes = deps.maxFrameBytes ?? 256 * 1024;
  const helloTimeoutMs = deps.helloTimeoutMs ?? 2000;
  const log = deps.logger;
  const wss = new WebSocketServer({ noServer: true, maxPayload: maxFrameBytes * 4, perMessageDeflate: false });
  const hubs = new Map<string, TeamHub>();
  // Fan-out to watchers, a few sockets per event-loop turn (see DeferredFlush).
  const watcherWrites = new DeferredFlush();
  const streams = new Map<string, StreamState>();

  const hubFor = (teamId: string) => {
    let hub = hubs.get(teamId);
    if (!hub) {
      hub = new TeamHub(now);
      hubs.set(teamId, hub);
    }
    return hub;
  };

  function refuseUpgrade(socket: Duplex, status: number, text: string): void {
    socket.write(`HTTP/1.1 ${status} ${text}\r\nConnection: close\r\nContent-Length: 0\r\n\r\n`);
    socket.destroy();
  }

  async function authenticate(req: IncomingMessage): Promise<Principal | 'bad_origin' | undefined> {
    const auth = req.headers.authorization;
    if (auth?.startsWith('Bearer ')) return deps.authenticateRobot(auth.slice('Bearer '.length).trim());
    // A browser sends cookies cross-site too: only accept a session from a page of this same host.
    const origin = req.headers.origin;
    if (origin && new URL(origin).host !== req.headers.host) return 'bad_origin';
    return deps.authenticateCookie(req.headers.cookie);
  }

  function publishClients(hub: TeamHub): void {
    const clients = [...hub.sessions]
      .filter((s) => s.isOpen && s.hasHello)
      .map((s) => ({
        sessionId: s.id,
        kind: s.kind ?? 'viewer',
        name: s.name,
        role: s.role,
        principal: s.identity.principal,
        connectedAtMs: s.connectedAtMs,
        rttMs: s.rttMs ?? null,
        reads: s.reads,
      }));
    hub.setSystemValue('sys/clients', clients, RELAY_SENDER);
  }

  function fail(s: RelaySession, code: RelayErrorCode, message: string, extra: { id?: number; channel?: string } = {}): void {
    s.send({ type: 'error', code, message, ...extra }, 'reliable');
    if (s.violation()) s.close(CLOSE.abuse, 'too many bad frames');
  }

  function streamKey(s: RelaySession): string {
    return `${s.identity.teamId}:${s.streamId ?? s.id}`;
  }

  function handleFrame(s: RelaySession, hub: TeamHub, bytes: Uint8Array): void {
    if (!s.admit(bytes.byteLength)) return fail(s, 'rate_limited', 'too many frames: slow down');
    if (bytes.byteLength > maxFrameBytes) return fail(s, 'frame_too_large', `frames are at most ${maxFrameBytes} bytes`);
    const decoded = decodeClientFrame(bytes);
    if (!decoded.ok) return fail(s, 'bad_frame', decoded.error);
    const message = decoded.message;
    if (!s.hasHello && message.type !== 'hello') return fail(s, 'hello_required', 'send hello first');
    dispatch(s, hub, message);
  }

  function dispatch(s: RelaySession, hub: TeamHub, message: ClientMessage): void {
    switch (message.type) {
      case 'hello':
        return handleHello(s, hub, message);
      case 'subscribe': {
        const refused = message.prefixes.filter((p) => !canSubscribe(s.role, p));
        if (refused.length) return fail(s, 'forbidden', `a ${s.role} may not read ${refused.join(', ')}`);
        return hub.subscribe(s, message.prefixes);
      }
      case 'unsubscribe':
        return hub.unsubscribe(s, message.prefixes);
      case 'publish': {
        if (!canPublish(s.role, message.channel)) {
          return fail(s, 'forbidden', `a ${s.role} may not publish ${message.channel}`, { id: message.id, channel: message.channel });
        }
        const entry = hub.publish(s, message.channel, message.value);
        if (deps.observer) observePublish(s, message.channel, message.value, entry.rev);
        return s.send({ type: 'published', id: message.id, channel: message.channel, rev: entry.rev }, 'reliable');
      }
      case 'ack':
        if (s.role !== 'robot') return fail(s, 'not_a_robot', 'only a robot acknowledges', { channel: message.channel });
      {
        const relayRttMs = hub.ack(s, message.channel, message.rev);
        if (relayRttMs === undefined) return fail(s, 'bad_frame', `no revision ${message.rev} of ${message.channel}`);
        deps.observer?.ack(streamFor(s).ref, { channel: message.channel, rev: message.rev, relayRttMs, serverMs: now() });
        return;
      }
      case 'ping':
        return s.send({ type: 'pong', t1: message.t1, t2: now(), t3: now() }, 'reliable');
      case 'pong': {
        const sample = onWire(message.t1, message.t2, message.t3, now());
        return s.clockSample(sample);
      }
      case 'signals':
        if (s.role !== 'robot') return fail(s, 'not_a_robot', 'only a robot declares signals');
        return handleSignals(s, hub, message.signals);
      case 'telemetry_batch':
      case 'event':
        if (s.role !== 'robot') return fail(s, 'not_a_robot', 'only a robot sends telemetry and events');
        return handleDurable(s, hub, message);
      default:
        return assertNever(message);
    }
  }

  function observePublish(s: RelaySession, channel: string, value: ChannelValue, rev: number): void {
    if (s.role === 'robot') deps.observer!.robotValue(streamFor(s).ref, channel, value);
    else if (channel.startsWith('op/')) deps.observer!.selection(s.identity.teamId, { channel, value, rev, from: s.sender(), serverMs: now() });
  }

  function handleHello(s: RelaySession, hub: TeamHub, hello: Extract<ClientMessage, { type: 'hello' }>): void {
    if (s.hasHello) return fail(s, 'bad_frame', 'hello was sent already');
    if (hello.v !== PROTOCOL_VERSION) {
      s.send({ type: 'error', code: 'version_mismatch', message: `this relay speaks version ${PROTOCOL_VERSION}` });
      return s.close(CLOSE.versionMismatch, 'version_mismatch');
    }
    if ((hello.kind === 'robot') !== (s.role === 'robot')) {
      s.send({ type: 'error', code: 'not_a_robot', message: 'kind robot goes with a robot key, and only with one' });
      return s.close(CLOSE.unauthenticated, 'kind does not match credentials');
    }
    s.kind = hello.kind;
    s.name = hello.name;
    s.streamId = hello.streamId;
    s.reads = hello.reads ?? [];
    s.send({
      type: 'welcome',
      v: PROTOCOL_VERSION,
      sessionId: s.id,
      role: s.role,
      teamNumber: s.identity.teamNumber,
      serverTimeMs: now(),
      heartbeatMs: heartbeatFor(s),
      staleMs: staleLimit(s),
      maxFrameBytes,
    });
    const stream = streams.get(streamKey(s));
    if (stream && stream.storedUpTo >= 0) s.send({ type: 'stored', streamId: s.streamId ?? s.id, upTo: stream.storedUpTo });
    if (s.role === 'robot') deps.observer?.robotConnected(streamFor(s).ref);
    publishClients(hub);
  }

  function streamFor(s: RelaySession): StreamState {
    const key = streamKey(s);
    let stream = streams.get(key);
    if (!stream) {
      stream = {
        ref: { teamId: s.identity.teamId, keyId: s.identity.keyId, robot: s.identity.principal, streamId: s.streamId ?? s.id, signals: undefined },
        storedUpTo: -1,
        pending: [],
        flushing: false,
      };
      streams.set(key, stream);
    }
    return stream;
  }

  function handleSignals(s: RelaySession, hub: TeamHub, signals: Signal[]): void {
    const indexes = new Set(signals.map((x) => x.index));
    if (indexes.size !== signals.length || signals.some((x) => x.index >= signals.length)) {
      return fail(s, 'bad_frame', 'signal indexes must be 0 … n−1, each once');
    }
    const stream = streamFor(s);
    stream.ref = { ...stream.ref, signals: [...signals].sort((a, b) => a.index - b.index) };
    const declaration = { type: 'signals' as const, signals: stream.ref.signals!, robot: s.identity.principal };
    hub.signals.set(s.identity.principal, declaration);
    hub.fanout(STREAM_CHANNELS.signals, declaration, 'reliable');
  }

  function handleDurable(s: RelaySession, hub: TeamHub, message: TelemetryBatch | RobotEvent): void {
    const stream = streamFor(s);
    if (message.type === 'telemetry_batch' && !stream.ref.signals) {
      return fail(s, 'unknown_signal', 'declare signals before sending telemetry');
    }
    const offsetMs = -s.offsetMs;
    deps.observer?.received(stream.ref, message, s.offsetMs);
    if (message.type === 'telemetry_batch') {
      hub.fanout(STREAM_CHANNELS.telemetry, { ...message, robot: s.identity.principal, offsetMs }, 'lossy');
    } else {
      hub.fanout(STREAM_CHANNELS.events, { ...message, robot: s.identity.principal, offsetMs }, 'reliable');
    }
    if (message.seq <= stream.storedUpTo) {
      s.send({ type: 'stored', streamId: stream.ref.streamId, upTo: stream.storedUpTo }, 'reliable');
      return;
    }
    stream.pending.push(message);
    if (!stream.flushing) void flush(stream, s);
  }

  async function flush(stream: StreamState, s: RelaySession): Promise<void> {
    stream.flushing = true;
    try {
      while (stream.pending.length > 0) {
        const batch = stream.pending.splice(0, stream.pending.length);
        await deps.store.append(stream.ref, batch);
        stream.storedUpTo = Math.max(stream.storedUpTo, ...batch.map((m) => m.seq));
        // The robot may have reconnected meanwhile: confirm to whichever session has the stream now.
        const owner = [...(hubs.get(stream.ref.teamId)?.sessions ?? [])].find((x) => x.isOpen && streamKey(x) === streamKey(s));
        owner?.send({ type: 'stored', streamId: stream.ref.streamId, upTo: stream.storedUpTo }, 'reliable');
      }
    } catch (err) {
      log.error({ err }, 'relay: storing telemetry failed; the robot keeps it and resends');
      stream.pending.length = 0;
    } finally {
      stream.flushing = false;
    }
  }

  function accept(ws: WebSocket, principal: Principal): void {
    const s = new RelaySession(ws, { ...principal, sessionId: randomUUID() }, limits, now, watcherWrites);
    const hub = hubFor(principal.teamId);
    hub.sessions.add(s);
    const helloTimer = setTimeout(() => {
      if (!s.hasHello) s.close(CLOSE.helloTimeout, 'no hello');
    }, helloTimeoutMs);
    ws.on('message', (data, isBinary) => {
      if (!isBinary) return fail(s, 'bad_frame', 'frames are binary MessagePack');
      const bytes = Array.isArray(data) ? Buffer.concat(data) : data instanceof ArrayBuffer ? new Uint8Array(data) : data;
      try {
        handleFrame(s, hub, bytes);
      } catch (err) {
        log.error({ err }, 'relay: frame handler failed');
        fail(s, 'bad_frame', 'the relay could not handle that frame');
      }
    });
    ws.on('close', () => {
      clearTimeout(helloTimer);
      s.markClosed();
      hub.sessions.delete(s);
      if (s.role === 'robot' && s.hasHello) deps.observer?.robotDisconnected(streamFor(s).ref);
      publishClients(hub);
    });
    ws.on('error', () => {});
  }

  const heartbeat = setInterval(() => {
    const t = now();
    for (const hub of hubs.values()) {
      for (const s of hub.sessions) {
        if (!s.isOpen) continue;
        if (t - s.lastFrameAtMs > staleLimit(s)) {
          s.close(CLOSE.stale, 'stale: no frame within the stale limit');
          continue;
        }
        if (s.hasHello && t - s.lastPingAtMs >= heartbeatFor(s) - heartbeatMs / 2) {
          s.lastPingAtMs = t;
          s.send({ type: 'ping', t1: t }, 'reliable');
        }
      }
    }
  }, heartbeatMs);
  heartbeat.unref();

  return {
    handleUpgrade(req, socket, head) {
      const url = new URL(req.url ?? '/', 'http://relay');
      if (url.pathname !== RELAY_PATH) return refuseUpgrade(socket, 404, 'Not Found');
      authenticate(req).then(
        (principal) => {
          if (principal === 'bad_origin') return refuseUpgrade(socket, 403, 'Forbidden');
          if (!principal) return refuseUpgrade(socket, 401, 'Unauthorized');
          wss.handleUpgrade(req, socket, head, (ws) => accept(ws, principal));
        },
        (err: unknown) => {
          log.error({ err }, 'relay: authentication failed');
          refuseUpgrade(socket, 500, 'Internal Server Error');
        },
      );
    },
    disconnectKey(keyId) {
      for (const hub of hubs.values()) {
        for (const s of hub.sessions) if (s.identity.keyId === keyId) s.close(CLOSE.revoked, 'robot key revoked');
      }
    },
    hub: (teamId) => hubs.get(teamId),
    async close() {
      clearInterval(heartbeat);
      for (const hub of hubs.values()) for (const s of hub.sessions) s.close(CLOSE.shuttingDown, 'relay shutting down');
      await new Promise<void>((resolve) => wss.close(() => resolve()));
    },
  };
}

interface StreamState {
  ref: StreamRef;
  storedUpTo: number;
  pending: DurableMessage[];
  flushing: boolean;
}

function assertNever(value: never): never {
  throw new Error(`unhandled relay message ${JSON.stringify(value)}`);
}
