import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { like } from 'drizzle-orm';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { recordings } from '../../server/db/schema/index';
import { freePort } from '../../server/db/embedded-postgres';
import { DEMO_TEAM } from '../../server/features/demo/demo-team';
import { SIMULATOR_KEY_NAME } from '../../server/features/demo/simulator-key';
import { authStore } from '../../server/features/auth/auth.repo';
import { recordingsStore } from '../../server/features/recordings/recordings.repo';
import { createRecordingsService } from '../../server/features/recordings/recordings.service';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { runHeadlessMatch } from '../../simulator/src/headless';
import { RobotClient } from '../../simulator/src/robot-client';
import { createTestDatabase, type TestDatabase } from '../support/test-db';

let db: TestDatabase;
let dataDir: string;
let port: number;
let child: ChildProcess | undefined;
let robot: RobotClient | undefined;

const match = runHeadlessMatch({ seed: 11, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'red' });
type Send = { seq: number; send: (r: RobotClient) => number };
const sends: Send[] = [
  ...match.batches.map((b) => ({ seq: b.seq, send: (r: RobotClient) => r.sendTelemetry(b.rows, b.t0Ms, b.dtMs) })),
  ...match.events.map((e) => ({ seq: e.seq, send: (r: RobotClient) => r.sendEvent(e.kind, e.tMs, e.data) })),
].sort((a, b) => a.seq - b.seq);

/** Starts the server process; resolves with the demo robot key once it listens. */
function startServer(stallAtSeq?: number, options: { recorder?: boolean } = {}): Promise<string> {
  const stall = stallAtSeq === undefined ? {} : { PITWALL_TEST_STALL_AT_SEQ: String(stallAtSeq) };
  if (options.recorder) Object.assign(stall, { PITWALL_TEST_RECORDER: '1' });
  const proc = spawn(process.execPath, ['--import', 'tsx', 'tests/support/recording-server.ts'], {
    env: { ...process.env, DATABASE_URL: db.url, PORT: String(port), PITWALL_DATA_DIR: dataDir, ...stall },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  child = proc;
  let err = '';
  proc.stderr!.on('data', (d) => (err += d));
  return new Promise((resolve, reject) => {
    let out = '';
    proc.stdout!.on('data', (d) => {
      out += d;
      const ready = /ready (\S+)/.exec(out);
      if (ready) resolve(ready[1]!);
    });
    proc.on('exit', (code) => reject(new Error(`server exited with ${code}: ${err}`)));
  });
}

function killServer(): Promise<void> {
  const proc = child!;
  return new Promise((resolve) => {
    proc.once('exit', () => resolve());
    proc.kill('SIGKILL');
  });
}

async function until(test: () => boolean, what: string, timeoutMs = 20_000): Promise<void> {
  const start = Date.now();
  while (!test()) {
    if (Date.now() - start > timeoutMs) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 10));
  }
}

/** Sends at most 20 frames per 50 ms, under the relay's 400 frames/s. */
async function sendPaced(r: RobotClient, list: Send[]): Promise<void> {
  for (let i = 0; i < list.length; i += 20) {
    for (const s of list.slice(i, i + 20)) expect(s.send(r)).toBe(s.seq);
    await new Promise((done) => setTimeout(done, 50));
  }
}

beforeAll(async () => {
  db = await createTestDatabase();
  dataDir = mkdtempSync(path.join(tmpdir(), 'pitwall-kill-'));
  port = await freePort();
});
afterAll(async () => {
  robot?.stop();
  if (child && child.exitCode === null && child.signalCode === null) await killServer();
  await db?.drop();
  rmSync(dataDir, { recursive: true, force: true });
});

it('keeps every seq of a match exactly once across a server killed mid-stream', { timeout: 90_000 }, async () => {
  const half = Math.floor(sends.length / 2);
  // The first life of the server stores up to and past this seq but confirms none of the later ones.
  const stallSeq = sends[half + 10]!.seq;
  const key = await startServer(stallSeq);
  const service = createRecordingsService({ store: recordingsStore(db.db), now: () => new Date() });
  const team = (await authStore(db.db).findTeamByNumber(DEMO_TEAM.number))!;
  const stored = async (): Promise<number[]> => {
    const recording = await service.findByStream(team.id, r.streamId);
    return recording ? service.listStoredSeqs(recording.id) : [];
  };
  const r = new RobotClient({ url: `ws://127.0.0.1:${port}/relay`, key, name: DEMO_TEAM.robot });
  robot = r;
  r.start();
  await until(() => r.status === 'open', 'the robot to connect');
  r.declareSignals(match.signals);

  await sendPaced(r, sends.slice(0, half + 20));
  let storedAtKill: number[] = [];
  const deadline = Date.now() + 20_000;
  while (!(storedAtKill = await stored()).includes(stallSeq)) {
    if (Date.now() > deadline) throw new Error('the stall seq was never stored');
    await new Promise((done) => setTimeout(done, 10));
  }
  await killServer();
  // Stored in the database but never confirmed: the robot will resend these and they must not double.
  const unconfirmedButStored = storedAtKill.filter((seq) => seq > r.storedUpTo);
  expect(unconfirmedButStored.length).toBeGreaterThan(0);
  // The robot keeps sampling while the server is down.
  for (const s of sends.slice(half + 20, half + 300)) s.send(r);

  await startServer();
  await until(() => r.storedUpTo >= sends[half + 299]!.seq, 'the resent messages to be stored');
  await sendPaced(r, sends.slice(half + 300));
  const lastSeq = sends.at(-1)!.seq;
  await until(() => r.storedUpTo >= lastSeq, 'the whole match to be stored');
  expect(r.pendingCount).toBe(0);

  const recording = (await service.findByStream(team.id, r.streamId))!;
  // The relay names a robot stream after its key.
  expect(recording).toMatchObject({ kind: 'simulated', robot: SIMULATOR_KEY_NAME });
  expect(await service.listStoredSeqs(recording.id)).toEqual(sends.map((s) => s.seq));
  const events = await service.listEvents(team.id, recording.id);
  expect(events.map((e) => [e.seq, e.kind])).toEqual(match.events.map((e) => [e.seq, e.kind]));

  const rows = match.batches.flatMap((b) => b.rows);
  for (const index of [0, 7, 64, 106]) {
    const samples = await service.readSamples(team.id, recording.id, match.signals[index]!.name);
    const sent = Uint32Array.from(rows, (row) => new Uint32Array(row.buffer, row.byteOffset, row.length)[index]!);
    expect(new Uint32Array(samples.values.buffer, samples.values.byteOffset, samples.values.length)).toEqual(sent);
  }
});

it('continues the same live recording when the server with the recorder is killed in the middle of a match', { timeout: 90_000 }, async () => {
  robot?.stop();
  if (child && child.exitCode === null && child.signalCode === null) await killServer();
  const key = await startServer(undefined, { recorder: true });
  const service = createRecordingsService({ store: recordingsStore(db.db), now: () => new Date() });
  const team = (await authStore(db.db).findTeamByNumber(DEMO_TEAM.number))!;
  const r = new RobotClient({ url: `ws://127.0.0.1:${port}/relay`, key, name: DEMO_TEAM.robot });
  robot = r;
  r.start();
  await until(() => r.status === 'open', 'the robot to connect');
  r.declareSignals(match.signals);
  const ofThisStream = () => db.db.select().from(recordings).where(like(recordings.streamId, `${r.streamId}:%`));

  // Into teleop (the mode events start the recording), then the server dies without warning.
  const half = Math.floor(sends.length / 2);
  await sendPaced(r, sends.slice(0, half));
  await until(() => r.storedUpTo >= sends[half - 1]!.seq, 'the first half to be stored');
  const before = await ofThisStream();
  expect(before.map((x) => [x.kind, x.status, x.source])).toEqual([['match', 'recording', 'live']]);
  await killServer();
  for (const s of sends.slice(half, half + 200)) s.send(r);

  // The next life takes the unfinished recording up again; the robot resends and plays to the end.
  await startServer(undefined, { recorder: true });
  await until(() => r.storedUpTo >= sends[half + 199]!.seq, 'the resent messages to be stored');
  await sendPaced(r, sends.slice(half + 200));
  await until(() => r.storedUpTo >= sends.at(-1)!.seq, 'the whole match to be stored');
  const deadline = Date.now() + 10_000;
  let after = await ofThisStream();
  while (after[0]?.status !== 'finished' && Date.now() < deadline) {
    await new Promise((done) => setTimeout(done, 50));
    after = await ofThisStream();
  }

  // One recording, finished, from its first seq to the end of the match's tail with nothing missing or doubled.
  expect(after).toHaveLength(1);
  expect(after[0]).toMatchObject({ id: before[0]!.id, status: 'finished', kind: 'match', source: 'live' });
  const seqs = await service.listStoredSeqs(after[0]!.id);
  const fromSeq = Number(after[0]!.streamId!.split(':').at(-1));
  const tailEnd = match.batches.find((b) => b.t0Ms >= 150_000 + 500)!.seq;
  expect(seqs).toEqual(sends.map((s) => s.seq).filter((seq) => seq >= fromSeq && seq < tailEnd));
  const modes = (await service.listEvents(team.id, after[0]!.id)).filter((e) => e.kind === 'mode_changed').map((e) => e.data?.to);
  expect(modes).toEqual(['auto', 'teleop', 'disabled']);
});
