import { quantile } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { decodeClientFrame, encodeFrame } from '../../shared/protocol/frame-codec';
import { PROTOCOL_VERSION, type ClientMessage, type Sender, type ServerMessage, type Signal } from '../../shared/protocol/messages';
import type { SocketLike } from '../../shared/protocol/relay-link';
import { encodeTelemetry } from '../../shared/protocol/telemetry-codec';
import {
  EVENTS_KEPT,
  extendTrail,
  initialRelayState,
  latencyStats,
  quantileSorted,
  reduceRelay,
  RelayClient,
  selectionsToResend,
  type RelayAction,
  type RelayClientOptions,
  type RelayState,
} from './relay-client';

const OPERATOR: Sender = { sessionId: 's-op', kind: 'panel', name: 'Driver station tablet', role: 'operator' };
const WELCOME: ServerMessage = {
  type: 'welcome',
  v: PROTOCOL_VERSION,
  sessionId: 's-me',
  role: 'operator',
  teamNumber: 19850,
  serverTimeMs: 1000,
  heartbeatMs: 100,
  staleMs: 400,
  maxFrameBytes: 262144,
};
const SIGNALS: Signal[] = [
  { index: 0, name: 'drive/pose/x', type: 'number', unit: 'm' },
  { index: 1, name: 'drive/pose/y', type: 'number', unit: 'm' },
  { index: 2, name: 'battery/voltage', type: 'number', unit: 'V' },
];

const run = (actions: RelayAction[], from: RelayState = initialRelayState()) => actions.reduce(reduceRelay, from);
const msg = (message: ServerMessage, atMs = 0): RelayAction => ({ type: 'message', message, atMs });

describe('quantileSorted', () => {
  const samples = [
    [12],
    [3, 6, 7, 8, 8, 9, 10, 13, 15, 16, 20],
    [21.5, 22, 23.25, 30, 31, 48, 90],
    Array.from({ length: 200 }, (_, i) => 10 + ((i * 37) % 91) / 3),
  ];
  it.each(samples.flatMap((s) => [0, 0.5, 0.9, 0.99, 1].map((p) => [s.length, p, s] as const)))(
    'matches simple-statistics over %i samples at p = %f',
    (_n, p, sample) => {
      const sorted = [...sample].sort((a, b) => a - b);
      // Reference: simple-statistics `quantile` (linear interpolation, R type 7).
      expect(quantileSorted(sorted, p)).toBeCloseTo(quantile([...sample], p), 9);
    },
  );

  it('is NaN for no samples', () => {
    expect(quantileSorted([], 0.5)).toBeNaN();
  });
});

describe('latencyStats', () => {
  it('is undefined before the first round trip', () => {
    expect(latencyStats([], 0)).toBeUndefined();
  });

  it('reports the last value, the total count and percentiles of the window', () => {
    const stats = latencyStats([40, 10, 30, 20], 9)!;
    expect(stats).toMatchObject({ count: 9, windowCount: 4, lastMs: 20 });
    expect(stats.p50Ms).toBeCloseTo(quantile([40, 10, 30, 20], 0.5));
    expect(stats.p99Ms).toBeCloseTo(quantile([40, 10, 30, 20], 0.99));
  });
});

describe('extendTrail', () => {
  it('keeps only the points within the window of the newest one', () => {
    const trail = [0, 1000, 2000, 3000].map((tMs) => ({ tMs, xM: tMs / 1000, yM: 0 }));
    const next = extendTrail(trail, [{ tMs: 6500, xM: 6.5, yM: 0 }], 5000);
    expect(next.map((p) => p.tMs)).toEqual([2000, 3000, 6500]);
  });

  it('returns the trail as it was when nothing new came', () => {
    const trail = [{ tMs: 5, xM: 1, yM: 2 }];
    expect(extendTrail(trail, [])).toEqual(trail);
  });
});

describe('reduceRelay', () => {
  const sent: RelayAction = { type: 'sent', id: 7, channel: 'op/reef/branch', value: 'C', atMs: 100 };

  it('follows a publish from pending to acknowledged with our round trip', () => {
    const s = run([
      sent,
      msg({ type: 'value', channel: 'op/reef/branch', value: 'C', rev: 3, tMs: 5000, from: OPERATOR, retained: false }, 104),
      msg({ type: 'published', id: 7, channel: 'op/reef/branch', rev: 3 }, 105),
      msg({ type: 'acked', channel: 'op/reef/branch', rev: 3, relayRttMs: 9, robot: 'Gullwing' }, 118),
    ]);
    expect(s.publishes[7]).toMatchObject({ state: 'acked', rev: 3, roundTripMs: 18, relayRttMs: 9, isLate: false });
    expect(s.latestPublish['op/reef/branch']).toBe(7);
    expect(s.channels['op/reef/branch']).toMatchObject({ value: 'C', rev: 3, ackedRev: 3 });
    expect(s.roundTripsMs).toEqual([18]);
    expect(s.roundTripCount).toBe(1);
  });

  it('calls a publish stale at the timeout, and still counts an ack that comes later', () => {
    const stale = run([sent, msg({ type: 'published', id: 7, channel: 'op/reef/branch', rev: 3 }), { type: 'publish_timeout', id: 7 }]);
    expect(stale.publishes[7]!.state).toBe('stale');
    const late = run([msg({ type: 'acked', channel: 'op/reef/branch', rev: 3, relayRttMs: 1400, robot: 'Gullwing' }, 1600)], stale);
    expect(late.publishes[7]).toMatchObject({ state: 'acked', isLate: true, roundTripMs: 1500 });
  });

  it('ignores the timeout of a publish that was answered', () => {
    const acked = run([
      sent,
      msg({ type: 'published', id: 7, channel: 'op/reef/branch', rev: 1 }),
      msg({ type: 'acked', channel: 'op/reef/branch', rev: 1, relayRttMs: 2, robot: 'Gullwing' }, 110),
      { type: 'publish_timeout', id: 7 },
    ]);
    expect(acked.publishes[7]!.state).toBe('acked');
  });

  it('marks a publish the relay refused, with its reason, and keeps other errors apart', () => {
    const s = run([
      sent,
      msg({ type: 'error', code: 'forbidden', message: 'a coach may not publish op/reef/branch', id: 7, channel: 'op/reef/branch' }),
      msg({ type: 'error', code: 'rate_limited', message: 'slow down' }, 50),
    ]);
    expect(s.publishes[7]).toMatchObject({ state: 'refused', refusal: { code: 'forbidden' } });
    expect(s.lastError).toMatchObject({ code: 'rate_limited', atMs: 50 });
  });

  it('refuses at once what could not be sent', () => {
    const s = run([{ type: 'unsent', id: 8, channel: 'op/station', value: 'left', atMs: 0 }]);
    expect(s.publishes[8]).toMatchObject({ state: 'refused', refusal: { code: 'not_connected' } });
  });

  it('does not count acks of other clients’ publishes', () => {
    const s = run([msg({ type: 'acked', channel: 'op/reef/level', rev: 4, relayRttMs: 3, robot: 'Gullwing' })]);
    expect(s.roundTripCount).toBe(0);
  });

  it('reads sys/clients and forgets channels on a new welcome', () => {
    const client = { sessionId: 'r1', kind: 'robot', name: 'Gullwing', role: 'robot', principal: 'Gullwing', connectedAtMs: 1, rttMs: 4.5, reads: [] };
    const s = run([
      msg({ type: 'value', channel: 'op/reef/level', value: 'L2', rev: 1, tMs: 1, from: OPERATOR, retained: true }),
      msg({ type: 'value', channel: 'sys/clients', value: [client], rev: 2, tMs: 1, from: OPERATOR, retained: false }),
    ]);
    expect(s.clients).toEqual([client]);
    const again = run([msg(WELCOME)], s);
    expect(again.channels).toEqual({});
    expect(again.clients).toBeUndefined();
    expect(again.welcome?.role).toBe('operator');
  });

  it('decodes telemetry into the newest values by name and a pose trail in relay time', () => {
    const data = encodeTelemetry(
      [
        [1, 2, 12.5],
        [1.1, 2.05, 12.5],
        [1.2, 2.1, Number.NaN],
      ],
      3,
    );
    const s = run([
      msg({ type: 'signals', signals: SIGNALS, robot: 'Gullwing' }),
      msg({ type: 'telemetry_batch', seq: 0, t0Ms: 1000, dtMs: 20, ticks: 3, data, robot: 'Gullwing', offsetMs: 500 }, 1600),
    ]);
    const robot = s.robots.Gullwing!;
    expect(robot.latest!.tMs).toBe(1540);
    expect(robot.latest!.values['drive/pose/x']).toBeCloseTo(1.2, 5);
    expect(robot.latest!.values['battery/voltage']).toBeCloseTo(12.5, 5);
    expect(robot.trail.map((p) => p.tMs)).toEqual([1500, 1520, 1540]);
    expect(robot.receivedAtMs).toBe(1600);
  });

  it('skips telemetry until the robot has declared its signals', () => {
    const data = encodeTelemetry([[1, 2, 3]], 3);
    const s = run([msg({ type: 'telemetry_batch', seq: 0, t0Ms: 0, dtMs: 20, ticks: 1, data, robot: 'Gullwing', offsetMs: 0 })]);
    expect(s.robots.Gullwing).toBeUndefined();
  });

  it('keeps the newest events first, each once, up to the limit', () => {
    const events = Array.from({ length: EVENTS_KEPT + 5 }, (_, seq) =>
      msg({ type: 'event', seq, tMs: seq * 10, kind: 'coral_placed', robot: 'Gullwing', offsetMs: 100 }),
    );
    const s = run([...events, events[events.length - 1]!]);
    expect(s.events).toHaveLength(EVENTS_KEPT);
    expect(s.events[0]).toMatchObject({ key: `Gullwing:${EVENTS_KEPT + 4}`, tMs: (EVENTS_KEPT + 4) * 10 + 100 });
  });

  it('remembers when the link last went stale', () => {
    const s = run([{ type: 'status', status: 'stale', detail: 'no frame from the relay for 420 ms', atMs: 77 }]);
    expect(s.lastStale).toEqual({ atMs: 77, detail: 'no frame from the relay for 420 ms' });
  });
});

class FakeSocket implements SocketLike {
  binaryType = 'blob';
  readyState = 0;
  readonly sent: ClientMessage[] = [];
  onopen: ((event: unknown) => void) | null = null;
  onmessage: ((event: { data: unknown }) => void) | null = null;
  onclose: ((event: { code: number; reason: string }) => void) | null = null;
  onerror: ((event: unknown) => void) | null = null;
  send(data: Uint8Array): void {
    const decoded = decodeClientFrame(data);
    if (decoded.ok) this.sent.push(decoded.message);
  }
  close(code = 1000, reason = ''): void {
    this.readyState = 3;
    this.onclose?.({ code, reason });
  }
  open(): void {
    this.readyState = 1;
    this.onopen?.({});
  }
  receive(message: ServerMessage): void {
    this.onmessage?.({ data: encodeFrame(message) });
  }
}

function harness(options: Partial<RelayClientOptions> = {}) {
  let nowMs = 0;
  const timers = new Map<number, { at: number; fn: () => void }>();
  let nextTimer = 1;
  const frames: (() => void)[] = [];
  const sockets: FakeSocket[] = [];
  const client = new RelayClient(
    {
      connect: () => {
        const s = new FakeSocket();
        sockets.push(s);
        return s;
      },
      now: () => nowMs,
      setTimer: (fn, ms) => {
        timers.set(nextTimer, { at: nowMs + ms, fn });
        return nextTimer++;
      },
      clearTimer: (h) => timers.delete(h as number),
      random: () => 0.5,
      scheduleFlush: (fn) => frames.push(fn),
    },
    { hello: { kind: 'viewer', name: 'Live page' }, heartbeatMs: 1000, staleMs: 5000, releaseGraceMs: 2000, ...options },
  );
  return {
    client,
    sockets,
    advance(ms: number) {
      nowMs += ms;
      for (const [id, t] of [...timers].sort((a, b) => a[1].at - b[1].at)) {
        if (t.at <= nowMs && timers.delete(id)) t.fn();
      }
    },
    /** Runs the pending animation frame(s). */
    paint() {
      for (const fn of frames.splice(0)) fn();
    },
  };
}

describe('RelayClient', () => {
  it('connects for its first subscriber, says hello and subscribes to op/, robot/ and sys/', () => {
    const h = harness();
    expect(h.sockets).toHaveLength(0);
    h.client.subscribe(() => {});
    const socket = h.sockets[0]!;
    socket.open();
    expect(socket.sent[0]).toMatchObject({ type: 'hello', kind: 'viewer', name: 'Live page' });
    socket.receive(WELCOME);
    expect(socket.sent[1]).toEqual({ type: 'subscribe', prefixes: ['op/', 'robot/', 'sys/'] });
  });

  it('tells listeners once per frame however many frames arrived, with a snapshot that holds between frames', () => {
    const h = harness();
    let calls = 0;
    h.client.subscribe(() => (calls += 1));
    const socket = h.sockets[0]!;
    socket.open();
    socket.receive(WELCOME);
    for (let rev = 1; rev <= 5; rev += 1) {
      socket.receive({ type: 'value', channel: 'robot/mode', value: 'teleop', rev, tMs: rev, from: OPERATOR, retained: false });
    }
    const before = h.client.getSnapshot();
    expect(before.channels['robot/mode']).toBeUndefined();
    expect(calls).toBe(0);
    h.paint();
    expect(calls).toBe(1);
    expect(h.client.getSnapshot().channels['robot/mode']!.rev).toBe(5);
    expect(h.client.getSnapshot()).toBe(h.client.getSnapshot());
  });

  it('resolves a publish with the robot’s ack and measures the round trip on its own clock', async () => {
    const h = harness();
    h.client.subscribe(() => {});
    const socket = h.sockets[0]!;
    socket.open();
    socket.receive(WELCOME);
    const ticket = h.client.publish('op/reef/branch', 'C');
    expect(socket.sent.at(-1)).toEqual({ type: 'publish', id: ticket.id, channel: 'op/reef/branch', value: 'C' });
    h.advance(6);
    socket.receive({ type: 'published', id: ticket.id, channel: 'op/reef/branch', rev: 1 });
    h.advance(9);
    socket.receive({ type: 'acked', channel: 'op/reef/branch', rev: 1, relayRttMs: 11, robot: 'Gullwing' });
    await expect(ticket.settled).resolves.toMatchObject({ state: 'acked', roundTripMs: 15 });
    h.paint();
    expect(h.client.getSnapshot().roundTripsMs).toEqual([15]);
  });

  it('calls an unanswered publish stale after a second', async () => {
    const h = harness();
    h.client.subscribe(() => {});
    h.sockets[0]!.open();
    h.sockets[0]!.receive(WELCOME);
    const ticket = h.client.publish('op/reef/level', 'L4');
    h.advance(999);
    h.paint();
    expect(h.client.getSnapshot().publishes[ticket.id]!.state).toBe('pending');
    h.advance(1);
    await expect(ticket.settled).resolves.toMatchObject({ state: 'stale' });
  });

  it('refuses a publish at once while the link is down', async () => {
    const h = harness();
    h.client.subscribe(() => {});
    await expect(h.client.publish('op/station', 'left').settled).resolves.toMatchObject({ state: 'refused' });
  });

  it('keeps the link through a quick remount and closes it when the last subscriber is gone for the grace period', () => {
    const h = harness();
    const leave = h.client.subscribe(() => {});
    const socket = h.sockets[0]!;
    socket.open();
    socket.receive(WELCOME);
    leave();
    h.advance(500);
    const leaveAgain = h.client.subscribe(() => {});
    h.advance(3000);
    expect(socket.readyState).toBe(1);
    leaveAgain();
    h.advance(2000);
    expect(socket.readyState).toBe(3);
    h.paint();
    expect(h.client.getSnapshot().status).toBe('stopped');
    expect(h.sockets).toHaveLength(1);
  });

  it('publishes the kept selection again after a reconnect, marked as a resend, and tracks its ack', async () => {
    const h = harness({ hello: { kind: 'panel', name: 'Run mode' }, resendAfterReconnect: true });
    h.client.subscribe(() => {});
    const first = h.sockets[0]!;
    first.open();
    first.receive(WELCOME);
    h.client.publish('op/reef/branch', 'C');
    h.client.publish('op/reef/level', 'L2');
    h.client.publish('op/reef/branch', 'G');
    h.client.dropConnection();
    h.advance(10_000);
    const second = h.sockets[1]!;
    second.open();
    second.receive({ ...WELCOME, sessionId: 's-me-2' });
    const resent = second.sent.filter((m) => m.type === 'publish');
    expect(resent).toEqual([
      { type: 'publish', id: expect.any(Number), channel: 'op/reef/branch', value: 'G' },
      { type: 'publish', id: expect.any(Number), channel: 'op/reef/level', value: 'L2' },
    ]);
    const id = (resent[0] as { id: number }).id;
    second.receive({ type: 'published', id, channel: 'op/reef/branch', rev: 9 });
    second.receive({ type: 'acked', channel: 'op/reef/branch', rev: 9, relayRttMs: 4, robot: 'Gullwing' });
    h.paint();
    const state = h.client.getSnapshot();
    const latest = state.publishes[state.latestPublish['op/reef/branch']!]!;
    expect(latest).toMatchObject({ value: 'G', state: 'acked', isResend: true });
  });

  it('sends a selection tapped while the link was down as soon as it is back', () => {
    const h = harness({ resendAfterReconnect: true });
    h.client.subscribe(() => {});
    h.client.publish('op/station', 'right');
    const socket = h.sockets[0]!;
    socket.open();
    socket.receive(WELCOME);
    expect(socket.sent.filter((m) => m.type === 'publish')).toEqual([{ type: 'publish', id: expect.any(Number), channel: 'op/station', value: 'right' }]);
  });

  it('resends nothing when not asked to', () => {
    const h = harness();
    h.client.subscribe(() => {});
    h.sockets[0]!.open();
    h.sockets[0]!.receive(WELCOME);
    h.client.publish('op/reef/branch', 'C');
    h.client.dropConnection();
    h.advance(10_000);
    h.sockets[1]!.open();
    h.sockets[1]!.receive(WELCOME);
    expect(h.sockets[1]!.sent.some((m) => m.type === 'publish')).toBe(false);
    expect(h.client.keptSelections().size).toBe(0);
  });
});

describe('selectionsToResend', () => {
  it('lists each channel once with its newest value, in first-chosen order', () => {
    const kept = new Map<string, string>([['op/reef/branch', 'A'], ['op/cage', 'deep']]);
    kept.set('op/reef/branch', 'K');
    expect(selectionsToResend(kept)).toEqual([
      { channel: 'op/reef/branch', value: 'K' },
      { channel: 'op/cage', value: 'deep' },
    ]);
  });
});
