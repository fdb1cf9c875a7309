// Server + simulator on loopback: an operator's tap reaches the simulated robot, which acknowledges it and
// turns toward the new branch.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import type { ServerMessage } from '../../shared/protocol/messages';
import { DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import { seedDemo } from '../../server/features/demo/seed';
import { startLiveRobot, type LiveRobot } from '../../simulator/src/live-robot';
import { relayUrl, sessionCookie, TestRelayClient } from '../support/relay-clients';
import { startTestServer, type TestServer } from '../support/test-server';

let server: TestServer;
let sim: LiveRobot;
let operator: TestRelayClient;

beforeAll(async () => {
  server = await startTestServer();
  await seedDemo(server.db.db);
  const lead = await server.client();
  await lead.post('/api/auth/sign-in').send({ email: 'lead@harborlight.example', password: DEMO_PASSWORD }).expect(200);
  const key = (await lead.post('/api/team/robot-keys').send({ name: 'Gullwing' }).expect(201)).body.secret as string;
  sim = startLiveRobot({ url: relayUrl(server), key, name: 'Gullwing (simulator)', season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'blue', seed: 7 });
  const cookie = await sessionCookie(server, 'operator@harborlight.example', DEMO_PASSWORD);
  operator = await TestRelayClient.connect(relayUrl(server), { cookie, origin: server.url }, 'panel', 'driver tablet');
});
afterAll(async () => {
  operator?.stop();
  sim?.stop();
  await server.close();
});

describe('the simulator on the relay', () => {
  it('acknowledges a tap, adopts the branch, and says so on robot/target', async () => {
    operator.send({ type: 'subscribe', prefixes: ['robot/', 'sys/'] });
    await operator.next((m) => m.type === 'value' && m.channel === 'robot/simulated' && m.value === true, 3000);
    const clients = await operator.next<Extract<ServerMessage, { type: 'value' }>>(
      (m) => m.type === 'value' && m.channel === 'sys/clients' && JSON.stringify(m.value).includes('"robot"'),
    );
    expect(JSON.stringify(clients.value)).toContain('op/reef/branch');

    const t0 = performance.now();
    operator.send({ type: 'publish', id: 1, channel: 'op/reef/branch', value: 'C' });
    const published = await operator.next<Extract<ServerMessage, { type: 'published' }>>((m) => m.type === 'published' && m.id === 1);
    await operator.next((m) => m.type === 'acked' && m.channel === 'op/reef/branch' && m.rev === published.rev);
    expect(performance.now() - t0).toBeLessThan(200);
    expect(sim.model.selection.branch).toBe('C');

    // The robot adopts it after the driver's reaction (at most 0.6 s) and publishes its target.
    const target = await operator.next<Extract<ServerMessage, { type: 'value' }>>(
      (m) => m.type === 'value' && m.channel === 'robot/target' && (m.value as { branch?: string }).branch === 'C',
      3000,
    );
    expect(target.value).toMatchObject({ branch: 'C' });
  });

  it('streams 100+ signals of telemetry that viewers receive', async () => {
    const declaration = await operator.next<Extract<ServerMessage, { type: 'signals' }>>((m) => m.type === 'signals');
    expect(declaration.signals.length).toBeGreaterThanOrEqual(100);
    await operator.next((m) => m.type === 'telemetry_batch', 2000, false);
  });

  it('stamps events in robot time that the relay maps to server time', async () => {
    operator.send({ type: 'publish', id: 2, channel: 'op/reef/branch', value: 'H' });
    const event = await operator.next<Extract<ServerMessage, { type: 'event' }>>((m) => m.type === 'event' && m.kind === 'target_changed', 3000, false);
    expect(Math.abs(event.tMs + event.offsetMs - Date.now())).toBeLessThan(1000);
  });
});
