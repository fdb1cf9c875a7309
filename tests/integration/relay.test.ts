import { pack } from 'msgpackr';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_MEMBERS, DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import { seedDemo } from '../../server/features/demo/seed';
import { MemoryTelemetryStore } from '../../server/relay/telemetry-store';
import { decodeServerFrame, encodeFrame } from '../../shared/protocol/frame-codec';
import { decodeTelemetry } from '../../shared/protocol/telemetry-codec';
import { CLOSE, PROTOCOL_VERSION, type ServerMessage, type Signal } from '../../shared/protocol/messages';
import type { Role } from '../../shared/domain/roles';
import { RobotClient } from '../../simulator/src/robot-client';
import { rawSocket, relayUrl, sessionCookie, TestRelayClient } from '../support/relay-clients';
import { startTestServer, type TestServer } from '../support/test-server';

const store = new MemoryTelemetryStore();
let server: TestServer;
let url: string;
const cookies = {} as Record<Role, string>;
let robotKey: string;
let robotKeyId: string;
const clients: { stop(): void }[] = [];

const SIGNALS: Signal[] = [
  { index: 0, name: 'drive/pose/x', type: 'number', unit: 'm' },
  { index: 1, name: 'drive/pose/y', type: 'number', unit: 'm' },
  { index: 2, name: 'battery/voltage', type: 'number', unit: 'V' },
];

beforeAll(async () => {
  server = await startTestServer({ telemetryStore: store, relay: { heartbeatMs: 100, staleMs: 400, maxFrameBytes: 64 * 1024 } });
  url = relayUrl(server);
  await seedDemo(server.db.db);
  for (const m of DEMO_MEMBERS) cookies[m.role] = await sessionCookie(server, m.email, DEMO_PASSWORD);
  const lead = await server.client();
  await lead.post('/api/auth/sign-in').send({ email: 'lead@harborlight.example', password: DEMO_PASSWORD }).expect(200);
  const created = await lead.post('/api/team/robot-keys').send({ name: 'Gullwing' }).expect(201);
  robotKey = created.body.secret;
  robotKeyId = created.body.key.id;
});
afterAll(async () => {
  for (const c of clients) c.stop();
  await server.close();
});

async function person(role: Role, kind: 'panel' | 'viewer' = 'panel'): Promise<TestRelayClient> {
  const c = await TestRelayClient.connect(url, { cookie: cookies[role], origin: server.url }, kind, `${role} tablet`);
  clients.push(c);
  return c;
}

async function robot(options: Partial<ConstructorParameters<typeof RobotClient>[0]> = {}): Promise<RobotClient> {
  const r = new RobotClient({ url, key: robotKey, name: 'Gullwing', ...options });
  clients.push(r);
  r.start();
  await until(() => r.status === 'open');
  return r;
}

async function until(test: () => boolean, timeoutMs = 3000): Promise<void> {
  const start = Date.now();
  while (!test()) {
    if (Date.now() - start > timeoutMs) throw new Error('condition not met in time');
    await new Promise((r) => setTimeout(r, 10));
  }
}

const isType = <T extends ServerMessage['type']>(type: T) => (m: ServerMessage): m is Extract<ServerMessage, { type: T }> => m.type === type;

describe('handshake', () => {
  it('refuses a connection with no credentials (401) or a cross-site page (403)', async () => {
    await expect(rawSocket(url, {})).rejects.toThrow('HTTP 401');
    await expect(rawSocket(url, { cookie: cookies.lead, origin: 'http://evil.example' })).rejects.toThrow('HTTP 403');
    await expect(rawSocket(url, { authorization: 'Bearer pwk_nope_nope' })).rejects.toThrow('HTTP 401');
  });

  it('welcomes a person with their role and a robot key as robot', async () => {
    const coach = await person('coach');
    expect(coach.link.welcome).toMatchObject({ role: 'coach', v: PROTOCOL_VERSION, teamNumber: 19850 });
    const r = await robot();
    expect(r.status).toBe('open');
    r.stop();
  });
});

describe('publish rules per role', () => {
  it.each([
    ['lead', true],
    ['programmer', true],
    ['operator', true],
    ['coach', false],
    ['viewer', false],
  ] as const)('a %s publishing op/* is allowed: %s', async (role, allowed) => {
    const c = await person(role);
    const channel = `op/test/${role}`;
    c.send({ type: 'publish', id: 11, channel, value: 'C' });
    const answer = await c.next((m) => (m.type === 'published' || m.type === 'error') && 'id' in m && m.id === 11);
    expect(answer.type).toBe(allowed ? 'published' : 'error');
    if (!allowed) expect(answer).toMatchObject({ code: 'forbidden', channel });
    const watcher = await person('viewer', 'viewer');
    watcher.send({ type: 'subscribe', prefixes: [channel] });
    const got = await watcher.next(isType('value'), 300).catch(() => undefined);
    expect(got !== undefined).toBe(allowed);
    c.stop();
    watcher.stop();
  });

  it('lets only a robot publish robot/* and nobody publish sys/*', async () => {
    const lead = await person('lead');
    lead.send({ type: 'publish', id: 21, channel: 'robot/mode', value: 'teleop' });
    expect(await lead.next((m) => m.type === 'error' && m.id === 21)).toMatchObject({ code: 'forbidden' });
    lead.send({ type: 'publish', id: 22, channel: 'sys/clients', value: [] });
    expect(await lead.next((m) => m.type === 'error' && m.id === 22)).toMatchObject({ code: 'forbidden' });

    const seen: ServerMessage[] = [];
    const r = await robot({ onMessage: (m) => seen.push(m) });
    expect(r.publish('robot/mode', 'teleop')).toBe(true);
    expect(r.publish('op/reef/branch', 'A')).toBe(true);
    await until(() => seen.some((m) => m.type === 'error' && m.code === 'forbidden'));
    lead.send({ type: 'subscribe', prefixes: ['robot/mode', 'op/reef/branch'] });
    await lead.next((m) => m.type === 'value' && m.channel === 'robot/mode' && m.value === 'teleop');
    expect(lead.messages.some((m) => m.type === 'value' && m.channel === 'op/reef/branch' && m.value === 'A')).toBe(false);
    r.stop();
  });
});

describe('retained values', () => {
  it('delivers the last value of each channel on subscribe, by prefix, to a reconnecting panel', async () => {
    const op = await person('operator');
    op.send({ type: 'publish', id: 1, channel: 'op/reef/branch', value: 'D' });
    op.send({ type: 'publish', id: 2, channel: 'op/reef/level', value: 'L3' });
    await op.next((m) => m.type === 'published' && m.id === 2);
    op.stop();

    const again = await person('operator');
    again.send({ type: 'subscribe', prefixes: ['op/reef/'] });
    const branch = await again.next((m) => m.type === 'value' && m.channel === 'op/reef/branch');
    const level = await again.next((m) => m.type === 'value' && m.channel === 'op/reef/level');
    expect(branch).toMatchObject({ value: 'D', retained: true, from: { role: 'operator' } });
    expect(level).toMatchObject({ value: 'L3', retained: true });
  });
});

describe('acknowledgements', () => {
  it('forwards the robot’s ack to the publisher with the relay-measured round trip', async () => {
    const r = await robot({
      onValue: (channel, _value, rev, retained) => {
        if (!retained) r.ack(channel, rev);
      },
    });
    const op = await person('operator');
    const sentAt = performance.now();
    op.send({ type: 'publish', id: 31, channel: 'op/reef/branch', value: 'G' });
    const published = await op.next<Extract<ServerMessage, { type: 'published' }>>((m) => m.type === 'published' && m.id === 31);
    const acked = await op.next<Extract<ServerMessage, { type: 'acked' }>>((m) => m.type === 'acked' && m.rev === published.rev);
    const roundTripMs = performance.now() - sentAt;
    expect(acked).toMatchObject({ channel: 'op/reef/branch', robot: 'Gullwing' });
    expect(acked.relayRttMs).toBeLessThanOrEqual(roundTripMs);
    expect(roundTripMs).toBeLessThan(500);

    const late = await person('viewer', 'viewer');
    late.send({ type: 'subscribe', prefixes: ['op/reef/branch'] });
    expect(await late.next(isType('value'))).toMatchObject({ value: 'G', ackedRev: published.rev });
    r.stop();
  });

  it('refuses an ack from a person and an ack of a revision that never existed', async () => {
    const op = await person('operator');
    op.send({ type: 'ack', channel: 'op/reef/branch', rev: 1 });
    expect(await op.next(isType('error'))).toMatchObject({ code: 'not_a_robot' });
    const seen: ServerMessage[] = [];
    const r = await robot({ onMessage: (m) => seen.push(m) });
    r.ack('op/reef/branch', 9999);
    await until(() => seen.some((m) => m.type === 'error' && m.code === 'bad_frame'));
    r.stop();
  });
});

describe('stale detection', () => {
  it('closes a client that goes silent within 500 ms', async () => {
    const ws = await rawSocket(url, { cookie: cookies.operator, origin: server.url });
    ws.send(encodeFrame({ type: 'hello', v: PROTOCOL_VERSION, kind: 'panel', name: 'silent tablet' }));
    let lastSentAt = performance.now();
    const closed = new Promise<{ code: number; afterMs: number }>((resolve) =>
      ws.once('close', (code) => resolve({ code, afterMs: performance.now() - lastSentAt })),
    );
    lastSentAt = performance.now();
    const { code, afterMs } = await closed;
    expect(code).toBe(CLOSE.stale);
    expect(afterMs).toBeGreaterThanOrEqual(390);
    expect(afterMs).toBeLessThan(600);
  });

  it('pings robots and panels every 100 ms and watchers every 500 ms, as each one\'s welcome says', async () => {
    const listen = async (kind: 'panel' | 'viewer') => {
      const ws = await rawSocket(url, { cookie: cookies.coach, origin: server.url });
      const frames: ServerMessage[] = [];
      ws.on('message', (data) => {
        const decoded = decodeServerFrame(new Uint8Array(data as Buffer));
        if (!decoded.ok) return;
        frames.push(decoded.message);
        // Answer pings, so the panel (stale after 400 ms) stays connected.
        if (decoded.message.type === 'ping') ws.send(encodeFrame({ type: 'pong', t1: decoded.message.t1, t2: Date.now(), t3: Date.now() }));
      });
      ws.send(encodeFrame({ type: 'hello', v: PROTOCOL_VERSION, kind, name: `${kind} listening` }));
      return { ws, frames };
    };
    const panel = await listen('panel');
    const viewer = await listen('viewer');
    await new Promise((r) => setTimeout(r, 1600));
    const welcome = (frames: ServerMessage[]) => frames.find(isType('welcome'))!;
    expect(welcome(panel.frames)).toMatchObject({ heartbeatMs: 100, staleMs: 400 });
    expect(welcome(viewer.frames)).toMatchObject({ heartbeatMs: 500, staleMs: 5000 });
    const pings = (frames: ServerMessage[]) => frames.filter(isType('ping')).length;
    expect(pings(panel.frames)).toBeGreaterThanOrEqual(12);
    expect(pings(viewer.frames)).toBeGreaterThanOrEqual(2);
    expect(pings(viewer.frames)).toBeLessThanOrEqual(4);
    panel.ws.close();
    viewer.ws.close();
  });

  it('lets the client side notice a relay that stops answering', async () => {
    const op = await person('operator');
    const before = op.statuses.length;
    // The relay's frames stop arriving, as when a cable is pulled.
    (op.socket as unknown as { _socket: { pause(): void } })._socket.pause();
    const t0 = performance.now();
    await until(() => op.statuses.slice(before).includes('stale'), 2000);
    expect(performance.now() - t0).toBeLessThan(600);
  });
});

describe('bad input', () => {
  it('answers garbage and unknown messages with error frames and keeps serving', async () => {
    const ws = await rawSocket(url, { cookie: cookies.viewer, origin: server.url });
    const errors: ServerMessage[] = [];
    ws.on('message', (data) => {
      const decoded = decodeServerFrame(new Uint8Array(data as Buffer));
      if (decoded.ok && decoded.message.type === 'error') errors.push(decoded.message);
    });
    ws.send(encodeFrame({ type: 'hello', v: PROTOCOL_VERSION, kind: 'viewer', name: 'probe' }));
    ws.send(new Uint8Array([0xc1, 0xc1, 0xc1]));
    ws.send(pack({ type: 'teleport', to: 'barge' }));
    ws.send('text is not a frame');
    ws.send(new Uint8Array(80 * 1024));
    await until(() => errors.length >= 4);
    expect(errors.map((e) => e.type === 'error' && e.code).sort()).toEqual(['bad_frame', 'bad_frame', 'bad_frame', 'frame_too_large']);
    expect(ws.readyState).toBe(ws.OPEN);
    ws.close();
  });

  it('closes a socket that keeps sending garbage, and one whose frame is far too large', async () => {
    const abusive = await rawSocket(url, { cookie: cookies.viewer, origin: server.url });
    const abuseClosed = new Promise<number>((resolve) => abusive.once('close', resolve));
    for (let i = 0; i < 60; i += 1) abusive.send(new Uint8Array([0xc1]));
    expect(await abuseClosed).toBe(CLOSE.abuse);

    const huge = await rawSocket(url, { cookie: cookies.viewer, origin: server.url });
    const hugeClosed = new Promise<number>((resolve) => huge.once('close', resolve));
    huge.send(new Uint8Array(300 * 1024));
    expect(await hugeClosed).toBe(1009);

    const op = await person('operator');
    op.send({ type: 'subscribe', prefixes: ['op/reef/branch'] });
    expect(await op.next(isType('value'))).toMatchObject({ channel: 'op/reef/branch' });
  });
});

describe('telemetry', () => {
  it('maps robot time to server time with the RFC 5905 offset', async () => {
    const skewMs = 5000;
    const r = await robot({ now: () => Date.now() - skewMs, streamId: 'skewed-robot-0001' });
    const viewer = await person('viewer', 'viewer');
    viewer.send({ type: 'subscribe', prefixes: ['robot/'] });
    r.declareSignals(SIGNALS);
    await new Promise((resolve) => setTimeout(resolve, 400));
    r.sendTelemetry([[1, 2, 12.5]], Date.now() - skewMs, 20);
    const batch = await viewer.next<Extract<ServerMessage, { type: 'telemetry_batch' }>>(isType('telemetry_batch'));
    expect(batch.offsetMs).toBeGreaterThan(skewMs - 25);
    expect(batch.offsetMs).toBeLessThan(skewMs + 25);
    expect([...decodeTelemetry(batch.data).rows[0]!]).toEqual([1, 2, 12.5]);
    r.stop();
  });

  it('refuses telemetry before signals are declared', async () => {
    const seen: ServerMessage[] = [];
    const r = await robot({ onMessage: (m) => seen.push(m), streamId: 'undeclared-0001' });
    r.sendTelemetry.call(Object.assign(Object.create(RobotClient.prototype), r, { signals: SIGNALS }), [[1, 2, 3]], 0, 20);
    await until(() => seen.some((m) => m.type === 'error' && m.code === 'unknown_signal'));
    r.stop();
  });

  it('loses nothing across dropped links: every batch is stored exactly once', async () => {
    const r = await robot({ streamId: 'dropping-robot-0001' });
    r.declareSignals(SIGNALS);
    for (let i = 0; i < 300; i += 1) {
      r.sendTelemetry([[i, i * 2, 12], [i + 0.5, i * 2, 12]], i * 40, 20);
      if (i % 10 === 9) r.sendEvent('tick', i * 40, { i });
      if (i === 100 || i === 200) r.dropConnection();
      if (i % 25 === 0) await new Promise((resolve) => setTimeout(resolve, 5));
    }
    await until(() => r.pendingCount === 0 && r.status === 'open', 10_000);
    const stored = store.streams.get('dropping-robot-0001')!;
    const seqs = [...stored.batches.keys(), ...stored.events.keys()].sort((a, b) => a - b);
    expect(seqs).toEqual(Array.from({ length: 330 }, (_, i) => i));
    const xs = [...stored.batches.values()].sort((a, b) => a.seq - b.seq).map((b) => decodeTelemetry(b.data).rows[0]![0]);
    expect(xs).toEqual(Array.from({ length: 300 }, (_, i) => i));
    r.stop();
  });
});

describe('backpressure', () => {
  it('a stuck viewer neither delays a healthy viewer nor the tap → ack path', async () => {
    const stuck = await rawSocket(url, { cookie: cookies.viewer, origin: server.url });
    stuck.send(encodeFrame({ type: 'hello', v: PROTOCOL_VERSION, kind: 'viewer', name: 'stuck' }));
    stuck.send(encodeFrame({ type: 'subscribe', prefixes: ['robot/', 'op/'] }));
    await new Promise((resolve) => setTimeout(resolve, 100));
    (stuck as unknown as { _socket: { pause(): void } })._socket.pause();

    const healthy = await person('viewer', 'viewer');
    healthy.send({ type: 'subscribe', prefixes: ['robot/telemetry'] });
    const r = await robot({
      streamId: 'busy-robot-0001',
      onValue: (channel, _v, rev, retained) => {
        if (!retained) r.ack(channel, rev);
      },
    });
    // 200 signals, every value changing, in one-second batches of 50 ticks (about 40 kB each), sent ten
    // times faster than real time so that the stuck viewer's socket buffers fill within the test.
    r.declareSignals(Array.from({ length: 200 }, (_, index) => ({ index, name: `load/s${index}`, type: 'number' as const, unit: '' })));
    const wide = Array.from({ length: 50 }, () => Array.from({ length: 200 }, () => Math.random() * 1000));
    const op = await person('operator');
    const rtts: number[] = [];
    for (let i = 0; i < 200; i += 1) {
      r.sendTelemetry(wide, i * 1000, 20);
      if (i % 10 === 0) {
        const t0 = performance.now();
        op.send({ type: 'publish', id: 1000 + i, channel: 'op/reef/level', value: i % 20 === 0 ? 'L2' : 'L4' });
        const p = await op.next<Extract<ServerMessage, { type: 'published' }>>((m) => m.type === 'published' && m.id === 1000 + i, 3000, false);
        await op.next((m) => m.type === 'acked' && m.rev === p.rev, 3000);
        rtts.push(performance.now() - t0);
      }
      await new Promise((resolve) => setTimeout(resolve, 10));
    }
    await until(() => healthy.messages.filter((m) => m.type === 'telemetry_batch').length === 200, 10_000);
    expect(Math.max(...rtts)).toBeLessThan(250);
    const hub = server.app.relay.hub((await server.db.pool.query('select id from teams where number = 19850')).rows[0].id)!;
    const stuckSession = [...hub.sessions].find((s) => s.name === 'stuck');
    // The stuck viewer's frames wait (or are dropped, oldest first) in its own queue; nobody else waits.
    expect(stuckSession?.isOpen).toBe(true);
    expect(stuckSession!.queued + stuckSession!.stats.dropped).toBeGreaterThan(0);
    expect(stuckSession!.stats.framesOut).toBeLessThan(healthy.messages.length);
    r.stop();
  });
});

describe('robot keys', () => {
  it('closes a live robot session when its key is revoked', async () => {
    const r = await robot({ streamId: 'revoked-robot-0001' });
    const lead = await server.client();
    await lead.post('/api/auth/sign-in').send({ email: 'lead@harborlight.example', password: DEMO_PASSWORD }).expect(200);
    await lead.delete(`/api/team/robot-keys/${robotKeyId}`).expect(204);
    await until(() => r.status === 'refused', 2000);
    await expect(rawSocket(url, { authorization: `Bearer ${robotKey}` })).rejects.toThrow('HTTP 401');
  });
});
