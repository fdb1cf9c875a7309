// Recording by hand over HTTP: the recorder's status, start and stop, with role rules; and the samples
// route's Server-Timing header.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import { seedDemo } from '../../server/features/demo/seed';
import type { Signal } from '../../shared/protocol/messages';
import { recorderStatusSchema } from '../../shared/schemas/recorder';
import { RobotClient } from '../../simulator/src/robot-client';
import { relayUrl } from '../support/relay-clients';
import { startTestServer, type TestServer } from '../support/test-server';

const SIGNALS: Signal[] = [{ index: 0, name: 'drive/pose/x', type: 'number', unit: 'm' }];

let server: TestServer;
let robot: RobotClient;
let robotMs = 0;

async function until(test: () => boolean | Promise<boolean>, what: string, timeoutMs = 5000): Promise<void> {
  const deadline = performance.now() + timeoutMs;
  while (!(await test())) {
    if (performance.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
}

async function signedIn(role: string) {
  const agent = await server.client();
  await agent.post('/api/auth/sign-in').send({ email: `${role}@harborlight.example`, password: DEMO_PASSWORD }).expect(200);
  return agent;
}

/** `count` batches of five 20 ms ticks, x = robot time in seconds; returns the last seq. */
function sendBatches(count: number): number {
  let seq = -1;
  for (let n = 0; n < count; n += 1) {
    seq = robot.sendTelemetry(Array.from({ length: 5 }, (_, k) => [robotMs / 1000 + k * 0.02]), robotMs, 20);
    robotMs += 100;
  }
  return seq;
}

/** Half a second of telemetry, confirmed stored. */
async function play(): Promise<void> {
  const seq = sendBatches(5);
  await until(() => robot.storedUpTo >= seq, 'the telemetry to be confirmed');
}

beforeAll(async () => {
  server = await startTestServer();
  await seedDemo(server.db.db);
  const lead = await signedIn('lead');
  const key = (await lead.post('/api/team/robot-keys').send({ name: 'Bench robot' }).expect(201)).body.secret as string;
  robot = new RobotClient({ url: relayUrl(server), key, name: 'Bench robot', reads: [], onValue: () => {} });
  robot.declareSignals(SIGNALS);
  robot.start();
  await until(() => robot.status === 'open', 'the robot to connect');
  robot.publish('robot/mode', 'disabled');
  await play();
});
afterAll(async () => {
  robot?.stop();
  await server?.close();
});

describe('the recorder API', () => {
  it('lists the connected robot, records by hand from start to stop, and the recording replays', async () => {
    const programmer = await signedIn('programmer');
    const idle = recorderStatusSchema.parse((await programmer.get('/api/recorder').expect(200)).body);
    expect(idle.robots).toEqual([{ robot: 'Bench robot', mode: 'disabled', recording: null }]);

    const started = await programmer.post('/api/recorder/start').send({ robot: 'Bench robot' }).expect(200);
    expect(started.body).toMatchObject({ robot: 'Bench robot', recording: { kind: 'practice', isManual: true } });
    await play();
    await play();
    const recording = recorderStatusSchema.parse((await programmer.get('/api/recorder').expect(200)).body).robots[0]!.recording;
    expect(recording?.recordingId).toMatch(/^[0-9a-f-]{36}$/);

    // The last batches are still on their way through the relay when the stop comes: they belong in the recording.
    const lastSeq = sendBatches(5);
    const lastTickMs = robotMs - 20;
    const stopped = await programmer.post('/api/recorder/stop').send({ robot: 'Bench robot' }).expect(200);
    expect(stopped.body.recordingId).toBe(recording!.recordingId);
    const detail = await programmer.get(`/api/recordings/${stopped.body.recordingId}`).expect(200);
    expect(detail.body).toMatchObject({ status: 'finished', source: 'live', robot: 'Bench robot' });
    expect(detail.body.durationS).toBeGreaterThanOrEqual(1.4);
    const samples = await programmer.get(`/api/recordings/${stopped.body.recordingId}/samples?signal=drive/pose/x`).expect(200);
    expect(samples.body.values.at(-1)).toBeCloseTo(lastTickMs / 1000, 4);
    await until(() => robot.storedUpTo >= lastSeq, 'the last batches to be confirmed');
    const later = await programmer.get(`/api/recordings/${stopped.body.recordingId}`).expect(200);
    expect(later.body.durationS).toBe(detail.body.durationS);
    const after = recorderStatusSchema.parse((await programmer.get('/api/recorder').expect(200)).body);
    expect(after.robots[0]!.recording).toBeNull();
    await programmer.post('/api/recorder/stop').send({ robot: 'Bench robot' }).expect(409);
  });

  it('refuses unknown robots and bad bodies with clear errors', async () => {
    const lead = await signedIn('lead');
    const missing = await lead.post('/api/recorder/start').send({ robot: 'Nobody' }).expect(404);
    expect(missing.body.error.message).toBe('No robot called Nobody is connected');
    const bad = await lead.post('/api/recorder/start').send({}).expect(400);
    expect(bad.body.error.issues).toEqual([{ path: 'robot', message: 'Name the robot' }]);
  });

  it('lets every member see the status but only leads and programmers start or stop', async () => {
    for (const role of ['operator', 'coach', 'viewer']) {
      const member = await signedIn(role);
      await member.get('/api/recorder').expect(200);
      await member.post('/api/recorder/start').send({ robot: 'Bench robot' }).expect(403);
      await member.post('/api/recorder/stop').send({ robot: 'Bench robot' }).expect(403);
    }
    const anonymous = await server.client();
    await anonymous.get('/api/recorder').expect(401);
  });
});

describe('Server-Timing on the samples route', () => {
  it('reports the server time of a samples request (W3C Server Timing, `app;dur=<ms>`)', async () => {
    const lead = await signedIn('lead');
    await lead.post('/api/recorder/start').send({ robot: 'Bench robot' }).expect(200);
    await play();
    const { recordingId } = (await lead.post('/api/recorder/stop').send({ robot: 'Bench robot' }).expect(200)).body;
    const res = await lead.get(`/api/recordings/${recordingId}/samples?signal=drive/pose/x`).expect(200);
    const header = res.headers['server-timing'] as string;
    expect(header).toMatch(/^app;dur=\d+\.\d{2}$/);
    const durMs = Number(header.split('=')[1]);
    expect(durMs).toBeGreaterThan(0);
    expect(durMs).toBeLessThan(5000);
  });
});
