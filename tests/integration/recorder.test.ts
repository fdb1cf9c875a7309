// The recorder on a real relay and PostgreSQL: a robot's modes cut its stream into recordings.
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recordings } from '../../server/db/schema/index';
import { DEMO_PASSWORD, DEMO_TEAM } from '../../server/features/demo/demo-team';
import { seedDemo } from '../../server/features/demo/seed';
import { authStore } from '../../server/features/auth/auth.repo';
import type { ServerMessage, Signal } from '../../shared/protocol/messages';
import { RobotClient } from '../../simulator/src/robot-client';
import { relayUrl, sessionCookie, TestRelayClient } from '../support/relay-clients';
import { startTestServer, type TestServer } from '../support/test-server';

const SIGNALS: Signal[] = [
  { index: 0, name: 'drive/pose/x', type: 'number', unit: 'm' },
  { index: 1, name: 'drive/pose/y', type: 'number', unit: 'm' },
  { index: 2, name: 'intake/has_coral', type: 'boolean', unit: '' },
];
const TICKS = 5;
const DT_MS = 20;
const BATCH_MS = TICKS * DT_MS;

let server: TestServer;
let key: string;
let teamId: string;
let operator: TestRelayClient;
const robots: RobotClient[] = [];

async function until(test: () => boolean | Promise<boolean>, what: string, timeoutMs = 5000): Promise<void> {
  const deadline = performance.now() + timeoutMs;
  while (!(await test())) {
    if (performance.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((resolve) => setTimeout(resolve, 10));
  }
}

/** A robot that plays its match from the test, as fast as the relay takes it. */
class ScriptedRobot {
  readonly client: RobotClient;
  robotMs = 0;
  mode = 'disabled';
  lastSeq = -1;

  constructor(readonly options: { events: boolean }) {
    this.client = new RobotClient({
      url: relayUrl(server),
      key,
      name: 'Gullwing',
      reads: ['op/reef/branch'],
      onValue: (channel, _value, rev, retained) => {
        if (!retained) this.client.ack(channel, rev);
      },
    });
    robots.push(this.client);
    this.client.declareSignals(SIGNALS);
  }

  async open(): Promise<void> {
    this.client.start();
    await until(() => this.client.status === 'open', 'the robot to connect');
  }

  setMode(mode: 'disabled' | 'auto' | 'teleop'): void {
    if (this.options.events) this.lastSeq = this.client.sendEvent('mode_changed', this.robotMs, { from: this.mode, to: mode });
    this.client.publish('robot/mode', mode);
    this.mode = mode;
  }

  /** Sends `seconds` of telemetry; x counts ticks so samples can be told apart. */
  play(seconds: number): void {
    for (let n = 0; n < (seconds * 1000) / BATCH_MS; n += 1) {
      const rows = Array.from({ length: TICKS }, (_, k) => [this.robotMs / 1000 + k * 0.02, 1, this.mode === 'teleop' ? 1 : 0]);
      this.lastSeq = this.client.sendTelemetry(rows, this.robotMs, DT_MS);
      this.robotMs += BATCH_MS;
    }
  }

  async confirmed(): Promise<void> {
    await until(() => this.client.storedUpTo >= this.lastSeq, `seq ${this.lastSeq} to be confirmed stored`);
  }
}

const teamRecordings = () => server.db.db.select().from(recordings).where(eq(recordings.teamId, teamId));

beforeAll(async () => {
  server = await startTestServer({ recorder: { graceMs: 1500 } });
  await seedDemo(server.db.db);
  teamId = (await authStore(server.db.db).findTeamByNumber(DEMO_TEAM.number))!.id;
  const lead = await server.client();
  await lead.post('/api/auth/sign-in').send({ email: 'lead@harborlight.example', password: DEMO_PASSWORD }).expect(200);
  key = (await lead.post('/api/team/robot-keys').send({ name: 'Gullwing' }).expect(201)).body.secret as string;
  const cookie = await sessionCookie(server, 'operator@harborlight.example', DEMO_PASSWORD);
  operator = await TestRelayClient.connect(relayUrl(server), { cookie, origin: server.url }, 'panel', 'driver tablet');
});
afterAll(async () => {
  operator?.stop();
  for (const r of robots) r.stop();
  await server?.close();
});

describe('the recorder', () => {
  it('records one match from disabled → auto → teleop → disabled, with the selections and acks', async () => {
    const robot = new ScriptedRobot({ events: true });
    await robot.open();
    robot.setMode('disabled');
    robot.play(3);
    await robot.confirmed();
    expect(await teamRecordings()).toHaveLength(0);

    const autoStartMs = robot.robotMs;
    robot.setMode('auto');
    robot.play(1);
    await robot.confirmed();
    operator.send({ type: 'publish', id: 1, channel: 'op/reef/branch', value: 'C' });
    const published = await operator.next<Extract<ServerMessage, { type: 'published' }>>((m) => m.type === 'published' && m.id === 1);
    const acked = await operator.next<Extract<ServerMessage, { type: 'acked' }>>((m) => m.type === 'acked' && m.rev === published.rev);
    robot.play(1);
    robot.setMode('teleop');
    robot.play(2);
    robot.setMode('disabled');
    const disabledAtMs = robot.robotMs;
    // Disabled time after the match: confirmed to the robot, kept only for the recorder's tail.
    robot.play(3);
    await robot.confirmed();
    await server.app.services.recorder.settle();

    const rows = await teamRecordings();
    expect(rows).toHaveLength(1);
    const recording = rows[0]!;
    expect(recording).toMatchObject({ status: 'finished', kind: 'match', source: 'live', robot: 'Gullwing' });
    // A second of pre-roll before auto, half a second of tail after teleop; nothing else of the disabled time.
    expect(recording.originTMs).toBeGreaterThanOrEqual(autoStartMs - 1000 - BATCH_MS);
    expect(recording.originTMs).toBeLessThan(autoStartMs);
    const endMs = recording.originTMs + recording.durationMs;
    expect(endMs).toBeGreaterThanOrEqual(disabledAtMs);
    expect(endMs).toBeLessThan(disabledAtMs + 500 + BATCH_MS);

    const service = server.app.services.recordings;
    const samples = await service.readSamples(teamId, recording.id, 'drive/pose/x');
    expect(samples.values.length).toBe(Math.round((endMs - recording.originTMs) / DT_MS) + 1);
    expect(samples.values[0]).toBeCloseTo(recording.originTMs / 1000, 4);

    const events = await service.listEvents(teamId, recording.id);
    expect(events.filter((e) => e.kind === 'mode_changed').map((e) => e.data?.to)).toEqual(['auto', 'teleop', 'disabled']);
    const selection = events.find((e) => e.kind === 'selection');
    expect(selection?.data).toMatchObject({ channel: 'op/reef/branch', value: 'C', rev: published.rev, by: { kind: 'panel', role: 'operator' } });
    const ack = events.find((e) => e.kind === 'ack');
    expect(ack?.data).toMatchObject({ channel: 'op/reef/branch', rev: published.rev, relayRttMs: acked.relayRttMs });

    // Another stretch of disabled telemetry is confirmed but makes no recording.
    robot.play(2);
    await robot.confirmed();
    await server.app.services.recorder.settle();
    expect(await teamRecordings()).toHaveLength(1);
    robot.client.stop();
  });

  it('continues a recording over a brief reconnect and finishes it when the robot stays away past the grace', async () => {
    const before = (await teamRecordings()).length;
    // This robot only publishes robot/mode (no mode_changed events).
    const robot = new ScriptedRobot({ events: false });
    await robot.open();
    robot.client.publish('robot/simulated', true);
    robot.setMode('disabled');
    robot.play(1);
    await robot.confirmed();
    robot.setMode('teleop');
    robot.play(1);
    await robot.confirmed();

    robot.client.dropConnection();
    await until(() => robot.client.status !== 'open', 'the link to drop');
    robot.play(1);
    await robot.open();
    await robot.confirmed();
    robot.play(1);
    await robot.confirmed();
    await server.app.services.recorder.settle();
    let rows = (await teamRecordings()).slice(before);
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({ status: 'recording', kind: 'simulated' });

    robot.client.stop();
    await until(async () => (await teamRecordings()).slice(before)[0]?.status === 'finished', 'the recording to finish after the grace', 5000);
    rows = (await teamRecordings()).slice(before);
    expect(rows).toHaveLength(1);
    const samples = await server.app.services.recordings.readSamples(teamId, rows[0]!.id, 'drive/pose/x');
    // One second of disabled pre-roll, then three of teleop, the middle one resent after the reconnect.
    expect(samples.values.length).toBe(4 * (1000 / DT_MS));
  });
});
