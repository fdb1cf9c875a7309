// Relay benchmarks of the relay issue, each against a raw baseline of the same run:
//  1. tap → robot → ack round trip with 20 viewers and a 200-signal stream at 50 Hz, against a bare ws echo,
//     and beside a bare four-hop forward chain (what the same hops cost with no relay work: its floor);
//  2. fan-out of 200-signal batches at 50 Hz to 50 viewers (and one stuck viewer) for 60 s, with the server's
//     CPU share;
//  3. bytes on the wire per telemetry sample of the simulator's stream, against the field's bandwidth limit.
import { execFileSync, spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { setPriority } from 'node:os';
import path from 'node:path';
import { WebSocket } from 'ws';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { encodeFrame } from '../../shared/protocol/frame-codec';
import { RelayLink, type SocketLike } from '../../shared/protocol/relay-link';
import { encodeTelemetry } from '../../shared/protocol/telemetry-codec';
import { runHeadlessMatch } from '../../simulator/src/headless';
import { freePort } from '../db/embedded-postgres';
import { PROJECT_ROOT } from '../runtime';
import { signInDemo, startBenchServer, type BenchServer } from './bench-server';

export interface RelayBenchOptions {
  databaseUrl: string;
  fanoutSeconds: number;
}

const now = () => performance.timeOrigin + performance.now();
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

function quantile(sorted: number[], q: number): number {
  return sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))]!;
}
const summary = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return { n: s.length, p50: quantile(s, 0.5), p99: quantile(s, 0.99) };
};

const ms = (v: number) => `${v.toFixed(3)} ms`.padStart(9);

/** A client of a raw ws process: each round trip sends one small frame and waits for the next frame back. */
function roundTripper(ws: WebSocket) {
  const frame = encodeFrame({ type: 'publish', id: 1, channel: 'op/reef/level', value: 'L4' });
  return () =>
    new Promise<number>((resolve) => {
      const t0 = performance.now();
      ws.once('message', () => resolve(performance.now() - t0));
      ws.send(frame);
    });
}

/** Spawns a raw ws bench process and waits for its "ready" line. */
async function spawnRaw(args: string[]) {
  const child = spawn(process.execPath, ['--import', 'tsx', ...args], { cwd: PROJECT_ROOT, stdio: ['ignore', 'pipe', 'inherit'] });
  await new Promise<void>((resolve) => child.stdout!.once('data', () => resolve()));
  return {
    async stop() {
      child.kill('SIGTERM');
      await new Promise((r) => child.once('exit', r));
    },
  };
}

interface RawBaseline {
  roundTrip(): Promise<number>;
  stop(): Promise<void>;
}

/** A client of `url` timing round trips; stopping it closes the client, then `processes` in order. */
async function rawBaseline(url: string, processes: { stop(): Promise<void> }[]): Promise<RawBaseline> {
  const ws = new WebSocket(url, { perMessageDeflate: false });
  await new Promise((r) => ws.once('open', r));
  return {
    roundTrip: roundTripper(ws),
    async stop() {
      ws.close();
      for (const p of processes) await p.stop();
    },
  };
}

/** A bare ws echo server on loopback, in its own process like the relay, and a client of it: the raw baseline. */
async function startEcho(): Promise<RawBaseline> {
  const port = await freePort();
  const server = await spawnRaw([path.join(PROJECT_ROOT, 'server/bench/echo-server.ts'), String(port)]);
  return rawBaseline(`ws://127.0.0.1:${port}`, [server]);
}

/**
 * The floor of any relay: a tap's four loopback hops (panel → relay → robot → relay → panel) through bare ws
 * processes that only forward bytes. What the real tap costs above this is the relay's and clients' own work.
 */
async function startBareChain(): Promise<RawBaseline> {
  const port = await freePort();
  const script = path.join(PROJECT_ROOT, 'server/bench/bare-chain.ts');
  const relay = await spawnRaw([script, 'relay', String(port)]);
  const robot = await spawnRaw([script, 'robot', `ws://127.0.0.1:${port}`]);
  return rawBaseline(`ws://127.0.0.1:${port}/panel`, [robot, relay]);
}

async function createRobotKey(url: string): Promise<string> {
  const { cookie, csrf } = await signInDemo(url, 'lead@harborlight.example');
  const res = await fetch(`${url}/api/team/robot-keys`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie, 'x-csrf-token': csrf },
    body: JSON.stringify({ name: 'Gullwing bench' }),
  });
  return ((await res.json()) as { secret: string }).secret;
}

/** A person's relay client for the bench; remembers when each publish and ack arrived. */
class Viewer {
  batches = 0;
  // Several frames can arrive in one socket read, before a waiter is set: keep every arrival.
  private readonly seen = new Map<string, { atMs: number; rev: number }>();
  private readonly waiting = new Map<string, (hit: { atMs: number; rev: number }) => void>();
  readonly link: RelayLink;

  constructor(relayUrl: string, cookie: string, origin: string, kind: 'viewer' | 'panel') {
    this.link = new RelayLink(
      {
        connect: () => new WebSocket(relayUrl, { headers: { cookie, origin }, perMessageDeflate: false }) as unknown as SocketLike,
        now,
        setTimer: (fn, ms) => setTimeout(fn, ms),
        clearTimer: (h) => clearTimeout(h as NodeJS.Timeout),
        random: Math.random,
      },
      { hello: { kind, name: `${kind} bench` } },
      {
        onOpen: () => kind === 'viewer' && this.link.send({ type: 'subscribe', prefixes: ['robot/', 'op/'] }),
        onMessage: (m) => {
          if (m.type === 'telemetry_batch') this.batches += 1;
          else if (m.type === 'acked') this.arrived(`acked:${m.rev}`, m.rev);
          else if (m.type === 'published') this.arrived(`published:${m.id}`, m.rev);
          else if (m.type === 'error') process.stderr.write(`bench: relay error ${m.code}: ${m.message}\n`);
        },
      },
    );
    this.link.start();
  }

  private arrived(key: string, rev: number): void {
    const hit = { atMs: performance.now(), rev };
    const waiter = this.waiting.get(key);
    this.waiting.delete(key);
    if (waiter) waiter(hit);
    else this.seen.set(key, hit);
  }

  /** Each arrival is taken once, so the maps stay small over thousands of taps (less garbage to collect). */
  private when(key: string): Promise<{ atMs: number; rev: number }> {
    const hit = this.seen.get(key);
    this.seen.delete(key);
    if (hit) return Promise.resolve(hit);
    return new Promise((resolve) => this.waiting.set(key, resolve));
  }

  /** Publishes; resolves with the revision the relay gave it. */
  async publish(id: number, channel: string, value: string): Promise<number> {
    this.link.send({ type: 'publish', id, channel, value });
    return (await this.when(`published:${id}`)).rev;
  }

  /** When the robot's ack of `rev` arrived (performance.now() time). */
  async ackedAt(rev: number): Promise<number> {
    return (await this.when(`acked:${rev}`)).atMs;
  }
}

async function until(test: () => boolean, timeoutMs: number): Promise<boolean> {
  const start = Date.now();
  while (!test()) {
    if (Date.now() - start > timeoutMs) return false;
    await sleep(20);
  }
  return true;
}

const CLOCK_TICKS_PER_S = Number(execFileSync('getconf', ['CLK_TCK'], { encoding: 'utf8' }).trim()) || 100;

/** User + system CPU time of a process so far (fields 14 and 15 of /proc/PID/stat). */
function cpuSeconds(pid: number): number {
  const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1]!.split(' ');
  return (Number(fields[11]) + Number(fields[12])) / CLOCK_TICKS_PER_S;
}

interface LoadProcess {
  reset(): void;
  report(): Promise<number[]>;
  stop(): Promise<void>;
}

interface ChildLines {
  command(text: string): void;
  nextLine(): Promise<string>;
  stop(): Promise<void>;
}

/** A bench helper process that reads commands on stdin and answers in lines on stdout; resolves once it says "ready". */
const VIEWER_NICE = 10;

/** A helper process; `nice` lowers its CPU priority (Unix nice value, 0–19). */
async function startHelper(script: string, args: string[], options: { nice?: number } = {}): Promise<ChildLines> {
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(PROJECT_ROOT, script), ...args], {
    cwd: PROJECT_ROOT,
    stdio: ['pipe', 'pipe', 'inherit'],
  });
  if (options.nice) setPriority(child.pid!, options.nice);
  const lines: string[] = [];
  const waiters: ((line: string) => void)[] = [];
  let buffer = '';
  child.stdout!.setEncoding('utf8');
  child.stdout!.on('data', (chunk: string) => {
    buffer += chunk;
    for (let i = buffer.indexOf('\n'); i >= 0; i = buffer.indexOf('\n')) {
      const line = buffer.slice(0, i);
      buffer = buffer.slice(i + 1);
      const waiter = waiters.shift();
      if (waiter) waiter(line);
      else lines.push(line);
    }
  });
  const nextLine = () => (lines.length ? Promise.resolve(lines.shift()!) : new Promise<string>((resolve) => waiters.push(resolve)));
  if ((await nextLine()) !== 'ready') throw new Error(`${script} did not start`);
  return {
    command: (text) => child.stdin!.write(`${text}\n`),
    nextLine,
    async stop() {
      child.stdin!.write('quit\n');
      await new Promise((r) => child.once('exit', r));
    },
  };
}

interface LoadProcess {
  reset(): void;
  report(): Promise<number[]>;
  stop(): Promise<void>;
}

/**
 * Starts `viewers` relay viewers (and `stuck` stuck ones) in a process of their own. Viewers are other devices
 * (laptops and phones in the pit); here they share the server's two cores, so they run at a lower CPU priority
 * (nice 10) to cost the server what their network traffic would, not their decoding.
 */
async function startLoad(server: BenchServer, cookie: string, viewers: number, stuck: number): Promise<LoadProcess> {
  const helper = await startHelper(
    'server/bench/viewer-load.ts',
    ['--url', server.relayUrl, '--cookie', cookie, '--origin', server.url, '--viewers', String(viewers), '--stuck', String(stuck)],
    { nice: VIEWER_NICE },
  );
  return {
    reset: () => helper.command('reset'),
    async report() {
      helper.command('report');
      return (JSON.parse(await helper.nextLine()) as { counts: number[] }).counts;
    },
    stop: () => helper.stop(),
  };
}

/** The robot, in its own process: acks op/ values, streams 200 signals at 50 Hz on request. */
async function startRobot(server: BenchServer, key: string) {
  const helper = await startHelper('server/bench/robot-process.ts', ['--url', server.relayUrl, '--key', key]);
  return {
    stream: () => helper.command('stream'),
    halt: () => helper.command('halt'),
    async sent(): Promise<number> {
      helper.command('report');
      return (JSON.parse(await helper.nextLine()) as { sent: number }).sent;
    },
    stop: () => helper.stop(),
  };
}

type Summary = ReturnType<typeof summary>;

/** Times `count` round trips of each of `runs`, taking turns; each resolves with its duration in ms. */
async function interleaved(count: number, runs: (() => Promise<number>)[]): Promise<Summary[]> {
  const times = runs.map(() => [] as number[]);
  for (let i = 0; i < count; i += 1) {
    for (const [k, run] of runs.entries()) {
      times[k]!.push(await run());
      await sleep(3);
    }
  }
  return times.map(summary);
}

export async function benchRelay(options: RelayBenchOptions): Promise<string[]> {
  const lines: string[] = [];
  const echo = await startEcho();
  const chain = await startBareChain();
  const server = await startBenchServer(options.databaseUrl);
  try {
    const key = await createRobotKey(server.url);
    const viewerCookie = (await signInDemo(server.url, 'viewer@harborlight.example')).cookie;
    const operatorCookie = (await signInDemo(server.url, 'operator@harborlight.example')).cookie;
    const robot = await startRobot(server, key);
    const panel = new Viewer(server.relayUrl, operatorCookie, server.url, 'panel');
    await until(() => panel.link.status === 'open', 5000);

    let id = 0;
    const tapOnce = async () => {
      const t0 = performance.now();
      const rev = await panel.publish((id += 1), 'op/reef/level', id % 2 ? 'L4' : 'L3');
      return (await panel.ackedAt(rev)) - t0;
    };
    // Echo, bare chain and tap take turns, so all meet the same moments of a noisy machine; 200 warm up.
    const runs = [echo.roundTrip, chain.roundTrip, tapOnce];
    await interleaved(200, runs);
    // Enough round trips that each p99 stands on 10 (quiet) and 20 (loaded) of the slowest, not 5.
    const [quietEcho, quietChain, quietTap] = await interleaved(1000, runs);
    const load = await startLoad(server, viewerCookie, 20, 0);
    robot.stream();
    await sleep(500);
    const [loadedEcho, loadedChain, loadedTap] = await interleaved(2000, runs);
    const viewerCounts = await load.report();
    await load.stop();
    const row = (label: string, r: Summary, echoP99?: number) =>
      `  ${label.padEnd(52)} p50 ${ms(r.p50)}   p99 ${ms(r.p99)}` + (echoP99 ? `   p99 ${(r.p99 / echoP99).toFixed(2)}× the echo` : '');
    lines.push(row('bare ws echo on loopback, quiet (baseline)', quietEcho!));
    lines.push(row('bare 4-hop forward chain, quiet (floor of a relay)', quietChain!, quietEcho!.p99));
    lines.push(row('tap → robot → ack, quiet', quietTap!, quietEcho!.p99));
    lines.push(row('bare ws echo, with the load below (baseline)', loadedEcho!));
    lines.push(row('bare 4-hop forward chain, with the load', loadedChain!, loadedEcho!.p99));
    lines.push(
      `${row('tap → robot → ack, 20 viewers + 200 signals @ 50 Hz', loadedTap!, loadedEcho!.p99)} (target ≤ 2×; ` +
        `${(loadedTap!.p99 / loadedChain!.p99).toFixed(2)}× the bare chain); viewers got ${Math.min(...viewerCounts)}–${Math.max(...viewerCounts)} batches`,
    );

    const fan = await startLoad(server, viewerCookie, 50, 1);
    await sleep(300);
    fan.reset();
    const sentBefore = await robot.sent();
    const cpuBefore = cpuSeconds(server.child.pid!);
    const wallBefore = performance.now();
    await sleep(options.fanoutSeconds * 1000);
    const sentDuring = (await robot.sent()) - sentBefore;
    const cpu = cpuSeconds(server.child.pid!) - cpuBefore;
    const wall = (performance.now() - wallBefore) / 1000;
    robot.halt();
    await sleep(1000);
    const received = await fan.report();
    await fan.stop();
    const lost = received.filter((n) => n < sentDuring).length;
    lines.push(
      `  fan-out to 50 viewers + 1 stuck, ${options.fanoutSeconds} s                ${sentDuring} batches (${(sentDuring * 5 * 200).toLocaleString('en')} samples) each; ` +
        `healthy viewers with loss: ${lost}/50 (fewest received ${Math.min(...received)}); server CPU ${((cpu / wall) * 100).toFixed(1)} % of one core`,
    );
    panel.link.stop();
    await robot.stop();
  } finally {
    await server.stop();
    await chain.stop();
    await echo.stop();
  }
  // Bytes on the wire for the simulator's own stream (one headless match, batches of 5 ticks).
  const match = runHeadlessMatch({ seed: 7, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'blue' });
  let bytes = 0;
  for (const b of match.batches) {
    const data = encodeTelemetry(b.rows, match.signals.length);
    bytes += encodeFrame({ type: 'telemetry_batch', seq: b.seq, t0Ms: b.t0Ms, dtMs: b.dtMs, ticks: b.ticks, data }).byteLength;
  }
  const samples = match.batches.reduce((n, b) => n + b.ticks, 0) * match.signals.length;
  const durationS = (match.batches.at(-1)!.t0Ms + match.batches.at(-1)!.ticks * 20) / 1000;
  const mbps = (bytes * 8) / durationS / 1e6;
  // Per-robot bandwidth between robot and operator console: 7 Mbit/s with the 2025 radio, 4 Mbit/s with the
  // older one (game manual R704, FACTS.md).
  lines.push(
    `  simulator stream on the wire                     ${(bytes / samples).toFixed(2)} B/sample (target ≤ 4; raw float32 = 4.00), ` +
      `${mbps.toFixed(3)} Mbit/s = ${((mbps / 7) * 100).toFixed(1)} % of the 7 Mbit/s limit (${((mbps / 4) * 100).toFixed(1)} % of 4 Mbit/s)`,
  );
  return lines;
}
