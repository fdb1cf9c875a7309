import { describe, expect, it } from 'vitest';
import { decodeClientFrame, encodeFrame } from './frame-codec';
import { CLOSE, PROTOCOL_VERSION, type ClientMessage, type ServerMessage } from './messages';
import { backoffMs, RelayLink, type LinkStatus, type SocketLike } from './relay-link';

class FakeSocket implements SocketLike {
  binaryType = 'blob';
  readyState = 0;
  sent: ClientMessage[] = [];
  closedWith: number | undefined;
  onopen: SocketLike['onopen'] = null;
  onmessage: SocketLike['onmessage'] = null;
  onclose: SocketLike['onclose'] = null;
  onerror: SocketLike['onerror'] = null;
  send(data: Uint8Array) {
    const decoded = decodeClientFrame(data);
    if (decoded.ok) this.sent.push(decoded.message);
  }
  close(code = 1000) {
    this.closedWith = code;
    this.readyState = 3;
  }
  open() {
    this.readyState = 1;
    this.onopen?.({});
  }
  receive(message: ServerMessage) {
    this.onmessage?.({ data: new Uint8Array(encodeFrame(message)).buffer });
  }
  serverClose(code: number, reason = '') {
    this.readyState = 3;
    this.onclose?.({ code, reason });
  }
}

/** A clock and timers that move only when told. */
function fakeTime() {
  let nowMs = 1000;
  const timers = new Map<number, { at: number; fn: () => void }>();
  let nextId = 1;
  return {
    now: () => nowMs,
    setTimer: (fn: () => void, ms: number) => {
      timers.set(nextId, { at: nowMs + ms, fn });
      return nextId++;
    },
    clearTimer: (h: unknown) => void timers.delete(h as number),
    advance(ms: number) {
      const end = nowMs + ms;
      for (;;) {
        const due = [...timers.entries()].filter(([, t]) => t.at <= end).sort((a, b) => a[1].at - b[1].at)[0];
        if (!due) break;
        timers.delete(due[0]);
        nowMs = due[1].at;
        due[1].fn();
      }
      nowMs = end;
    },
  };
}

const WELCOME: ServerMessage = {
  type: 'welcome', v: PROTOCOL_VERSION, sessionId: 's', role: 'operator', teamNumber: 19850,
  serverTimeMs: 0, heartbeatMs: 100, staleMs: 400, maxFrameBytes: 262144,
};

function setup() {
  const time = fakeTime();
  const sockets: FakeSocket[] = [];
  const statuses: LinkStatus[] = [];
  const received: ServerMessage[] = [];
  const link = new RelayLink(
    { connect: () => (sockets.push(new FakeSocket()), sockets.at(-1)!), now: time.now, setTimer: time.setTimer, clearTimer: time.clearTimer, random: () => 0.5 },
    { hello: { kind: 'panel', name: 'driver tablet' } },
    { onMessage: (m) => received.push(m), onStatus: (s) => statuses.push(s) },
  );
  return { time, sockets, statuses, received, link };
}

describe('RelayLink', () => {
  it('says hello on open and is open after the welcome', () => {
    const { link, sockets } = setup();
    link.start();
    sockets[0]!.open();
    expect(sockets[0]!.sent[0]).toEqual({ type: 'hello', v: PROTOCOL_VERSION, kind: 'panel', name: 'driver tablet' });
    expect(link.send({ type: 'subscribe', prefixes: ['op/'] })).toBe(false);
    sockets[0]!.receive(WELCOME);
    expect(link.status).toBe('open');
    expect(link.send({ type: 'subscribe', prefixes: ['op/'] })).toBe(true);
  });

  it('answers a relay ping with its receive and send times, and takes the clock from pongs', () => {
    const { link, sockets, time } = setup();
    link.start();
    sockets[0]!.open();
    sockets[0]!.receive(WELCOME);
    sockets[0]!.receive({ type: 'ping', t1: 5 });
    expect(sockets[0]!.sent.at(-1)).toEqual({ type: 'pong', t1: 5, t2: 1000, t3: 1000 });
    time.advance(100);
    const ping = sockets[0]!.sent.at(-1) as Extract<ClientMessage, { type: 'ping' }>;
    expect(ping).toEqual({ type: 'ping', t1: 1100 });
    time.advance(20);
    // Relay 500 ms ahead, 10 ms each way (RFC 5905 on-wire): θ = ((1610 − 1100) + (1610 − 1120)) / 2 = 500.
    sockets[0]!.receive({ type: 'pong', t1: 1100, t2: 1610, t3: 1610 });
    expect(link.clock).toEqual({ offsetMs: 500, delayMs: 20 });
  });

  it('goes stale after 400 ms without a frame, then reconnects with backoff', () => {
    const { link, sockets, statuses, time } = setup();
    link.start();
    sockets[0]!.open();
    sockets[0]!.receive(WELCOME);
    time.advance(399);
    expect(statuses).not.toContain('stale');
    time.advance(101);
    expect(statuses).toContain('stale');
    expect(sockets[0]!.closedWith).toBe(CLOSE.stale);
    expect(sockets).toHaveLength(1);
    time.advance(250);
    expect(sockets).toHaveLength(2);
  });

  it('stops trying after a final close code', () => {
    const { link, sockets, time } = setup();
    link.start();
    sockets[0]!.open();
    sockets[0]!.serverClose(CLOSE.revoked, 'robot key revoked');
    expect(link.status).toBe('refused');
    time.advance(10_000);
    expect(sockets).toHaveLength(1);
  });
});

describe('backoffMs', () => {
  it.each([
    [0, 0.5, 250],
    [1, 0.5, 500],
    [3, 0.5, 2000],
    [6, 0.5, 5000],
    [2, 0, 750],
    [2, 1, 1250],
  ])('attempt %i with random %f waits %i ms', (attempt, random, expected) => {
    expect(backoffMs(attempt, 250, 5000, random)).toBe(expected);
  });
});
