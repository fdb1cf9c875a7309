import { describe, expect, it } from 'vitest';
import type { WebSocket } from 'ws';
import { decodeServerFrame } from '../../shared/protocol/frame-codec';
import type { RelayRole } from '../../shared/protocol/messages';
import { DeferredFlush } from './deferred-flush';
import { DEFAULT_LIMITS, RelaySession } from './session';
import { TeamHub } from './team-hub';

/** A turn scheduler the test drives by hand, standing in for setImmediate. */
function manualTurns() {
  const queue: (() => void)[] = [];
  return {
    schedule: (fn: () => void) => queue.push(fn),
    get pending() {
      return queue.length;
    },
    /** Runs one scheduled turn. */
    turn: () => queue.shift()?.(),
    runAll: () => {
      while (queue.length) queue.shift()!();
    },
  };
}

describe('DeferredFlush', () => {
  it('flushes each added target once, in the order added, a few per turn', () => {
    const turns = manualTurns();
    const flush = new DeferredFlush(2, turns.schedule);
    const flushed: string[] = [];
    const target = (name: string) => ({ flush: () => flushed.push(name) });
    const [a, b, c, d, e] = ['a', 'b', 'c', 'd', 'e'].map(target);
    for (const t of [a, b, a, c, d, e, b]) flush.add(t!);
    expect(flushed).toEqual([]);
    expect(turns.pending).toBe(1);
    turns.turn();
    expect(flushed).toEqual(['a', 'b']);
    turns.turn();
    expect(flushed).toEqual(['a', 'b', 'c', 'd']);
    turns.turn();
    expect(flushed).toEqual(['a', 'b', 'c', 'd', 'e']);
    expect(turns.pending).toBe(0);
    expect(flush.size).toBe(0);
  });

  it('schedules again for a target added after its turn', () => {
    const turns = manualTurns();
    const flush = new DeferredFlush(4, turns.schedule);
    let count = 0;
    const target = { flush: () => (count += 1) };
    flush.add(target);
    turns.runAll();
    flush.add(target);
    turns.runAll();
    expect(count).toBe(2);
  });
});

/** A socket that keeps the frames written to it, completing each write at once. */
class RecordingSocket {
  readonly frames: { type: string; channel?: string }[] = [];
  send(data: Uint8Array, _options: unknown, done: () => void): void {
    const decoded = decodeServerFrame(data);
    if (decoded.ok) this.frames.push(decoded.message as { type: string; channel?: string });
    done();
  }
  close(): void {}
  terminate(): void {}
}

function session(hub: TeamHub, flush: DeferredFlush, name: string, kind: 'robot' | 'panel' | 'viewer', role: RelayRole) {
  const socket = new RecordingSocket();
  const s = new RelaySession(
    socket as unknown as WebSocket,
    { sessionId: name, teamId: 't', teamNumber: 1, role, principal: name },
    DEFAULT_LIMITS,
    () => 0,
    flush,
  );
  s.kind = kind;
  s.name = name;
  hub.sessions.add(s);
  return { s, socket };
}

describe('TeamHub write order', () => {
  it('writes an op/ value to the robot and its ack to the publisher at once, and watchers their copies on later turns, in order', () => {
    const turns = manualTurns();
    const flush = new DeferredFlush(4, turns.schedule);
    const hub = new TeamHub(() => 0);
    const viewers = Array.from({ length: 6 }, (_, i) => session(hub, flush, `viewer${i}`, 'viewer', 'viewer'));
    const robot = session(hub, flush, 'robot', 'robot', 'robot');
    const panel = session(hub, flush, 'panel', 'panel', 'operator');
    for (const x of [...viewers, robot, panel]) hub.subscribe(x.s, ['op/']);

    const entry = hub.publish(panel.s, 'op/reef/level', 'L4');
    expect(robot.socket.frames.map((f) => f.type)).toEqual(['value']);
    expect(viewers.every((v) => v.socket.frames.length === 0)).toBe(true);
    expect(panel.socket.frames).toEqual([]);

    hub.ack(robot.s, 'op/reef/level', entry.rev);
    // The publisher's own copy of the value was queued first, so it goes out ahead of the ack.
    expect(panel.socket.frames.map((f) => f.type)).toEqual(['value', 'acked']);
    expect(viewers.every((v) => v.socket.frames.length === 0)).toBe(true);

    turns.turn();
    expect(viewers.filter((v) => v.socket.frames.length > 0)).toHaveLength(4);
    turns.runAll();
    for (const v of viewers) expect(v.socket.frames.map((f) => f.type)).toEqual(['value', 'acked']);
    expect(robot.socket.frames.map((f) => f.type)).toEqual(['value', 'acked']);
  });
});
