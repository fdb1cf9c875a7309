import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_MEMBERS, DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import { DEMO_DRILLS, seedDemoDrills } from '../../server/features/demo/demo-drills';
import { seedDemo } from '../../server/features/demo/seed';
import { MemoryTelemetryStore } from '../../server/relay/telemetry-store';
import { DRILL_ANSWER_CHANNEL, DRILL_CALL_CHANNEL, drillAnswerValueSchema, drillCallValueSchema, type DrillCallValue } from '../../shared/domain/drills/drill-channels';
import type { Role } from '../../shared/domain/roles';
import type { ServerMessage } from '../../shared/protocol/messages';
import { RobotClient } from '../../simulator/src/robot-client';
import { relayUrl, sessionCookie, TestRelayClient } from '../support/relay-clients';
import { startTestServer, type TestServer } from '../support/test-server';

// Coached drills over real sockets: a coach's device sends calls on op/drill/call, the operator's tablet
// follows them and answers on op/drill/answer (shared/domain/relay-permissions.ts, docs/relay-protocol.md).
let server: TestServer;
let url: string;
const cookies = {} as Record<Role, string>;
let robotKey: string;
const clients: { stop(): void }[] = [];

beforeAll(async () => {
  server = await startTestServer({ telemetryStore: new MemoryTelemetryStore() });
  url = relayUrl(server);
  await seedDemo(server.db.db);
  for (const m of DEMO_MEMBERS) cookies[m.role] = await sessionCookie(server, m.email, DEMO_PASSWORD);
  const lead = await server.client();
  await lead.post('/api/auth/sign-in').send({ email: 'lead@harborlight.example', password: DEMO_PASSWORD }).expect(200);
  robotKey = (await lead.post('/api/team/robot-keys').send({ name: 'Gullwing' }).expect(201)).body.secret;
});
afterAll(async () => {
  for (const c of clients) c.stop();
  await server.close();
});

async function person(role: Role): Promise<TestRelayClient> {
  const c = await TestRelayClient.connect(url, { cookie: cookies[role], origin: server.url }, 'panel', `${role} tablet`);
  clients.push(c);
  return c;
}

const call = (index: number): DrillCallValue => ({
  kind: 'call',
  sessionId: 'coach-session-1',
  drillId: '6f1d2c3b-4a59-4e8f-9b0a-1c2d3e4f5a6b',
  drillName: 'Full reef, L2–L4',
  index,
  count: 12,
  call: { branch: 'C', level: 'L4' },
  windowMs: 4000,
  coachName: 'Hana Whitcombe',
});

const answerTo = (c: TestRelayClient, id: number) => c.next((m) => (m.type === 'published' || m.type === 'error') && 'id' in m && m.id === id);

describe('drill calls over the relay', () => {
  it('carries a coach’s call to the operator’s tablet and the operator’s answer back to the coach', async () => {
    const operator = await person('operator');
    operator.send({ type: 'subscribe', prefixes: ['op/drill/'] });
    const coach = await person('coach');
    coach.send({ type: 'subscribe', prefixes: [DRILL_ANSWER_CHANNEL] });

    coach.send({ type: 'publish', id: 1, channel: DRILL_CALL_CHANNEL, value: call(0) });
    expect((await answerTo(coach, 1)).type).toBe('published');
    const seen = await operator.next<Extract<ServerMessage, { type: 'value' }>>((m) => m.type === 'value' && m.channel === DRILL_CALL_CHANNEL);
    expect(drillCallValueSchema.parse(seen.value)).toEqual(call(0));
    expect(seen.from).toMatchObject({ role: 'coach', name: 'coach tablet' });

    const answer = { sessionId: 'coach-session-1', index: 0, reactionMs: 912, errors: 0, operatorName: 'Tomas Reyes' };
    operator.send({ type: 'publish', id: 2, channel: DRILL_ANSWER_CHANNEL, value: answer });
    expect((await answerTo(operator, 2)).type).toBe('published');
    const back = await coach.next<Extract<ServerMessage, { type: 'value' }>>((m) => m.type === 'value' && m.channel === DRILL_ANSWER_CHANNEL);
    expect(drillAnswerValueSchema.parse(back.value)).toEqual(answer);
  });

  it('hands the current call to a tablet that joins late (the value is retained)', async () => {
    const coach = await person('coach');
    coach.send({ type: 'publish', id: 3, channel: DRILL_CALL_CHANNEL, value: call(5) });
    await answerTo(coach, 3);
    const late = await person('operator');
    late.send({ type: 'subscribe', prefixes: [DRILL_CALL_CHANNEL] });
    const got = await late.next<Extract<ServerMessage, { type: 'value' }>>((m) => m.type === 'value' && m.channel === DRILL_CALL_CHANNEL);
    expect(got).toMatchObject({ retained: true, value: { index: 5 } });
  });

  it.each([
    ['lead', true],
    ['programmer', true],
    ['coach', true],
    ['operator', false],
    ['viewer', false],
  ] as const)('a %s sending a call is allowed: %s', async (role, allowed) => {
    const c = await person(role);
    c.send({ type: 'publish', id: 10, channel: DRILL_CALL_CHANNEL, value: call(1) });
    const answer = await answerTo(c, 10);
    expect(answer.type).toBe(allowed ? 'published' : 'error');
    if (!allowed) expect(answer).toMatchObject({ code: 'forbidden', channel: DRILL_CALL_CHANNEL });
  });

  it('still refuses a coach on the robot’s op/ channels and a viewer on the answer channel', async () => {
    const coach = await person('coach');
    coach.send({ type: 'publish', id: 20, channel: 'op/reef/branch', value: 'C' });
    expect(await answerTo(coach, 20)).toMatchObject({ type: 'error', code: 'forbidden' });
    const viewer = await person('viewer');
    viewer.send({ type: 'publish', id: 21, channel: DRILL_ANSWER_CHANNEL, value: { sessionId: 'x'.repeat(8), index: 0, reactionMs: null, errors: 0, operatorName: 'Eli' } });
    expect(await answerTo(viewer, 21)).toMatchObject({ type: 'error', code: 'forbidden' });
  });

  it('lets a robot read drill calls but not send one', async () => {
    const seen: ServerMessage[] = [];
    const robot = new RobotClient({ url, key: robotKey, name: 'Gullwing', onMessage: (m) => seen.push(m) });
    clients.push(robot);
    robot.start();
    const start = Date.now();
    while (robot.status !== 'open' && Date.now() - start < 3000) await new Promise((r) => setTimeout(r, 10));
    expect(robot.publish(DRILL_CALL_CHANNEL, call(2) as never)).toBe(true);
    const coach = await person('coach');
    coach.send({ type: 'publish', id: 30, channel: DRILL_CALL_CHANNEL, value: call(3) });
    await answerTo(coach, 30);
    while (!(seen.some((m) => m.type === 'error' && m.code === 'forbidden') && seen.some((m) => m.type === 'value' && m.channel === DRILL_CALL_CHANNEL && (m.value as { index: number }).index === 3))) {
      if (Date.now() - start > 5000) throw new Error('the robot saw neither the refusal nor the call');
      await new Promise((r) => setTimeout(r, 10));
    }
    robot.stop();
  });
});

describe('the demo drill sessions', () => {
  it('gives the demo drills and a few weeks of plausible sessions, once', async () => {
    const coach = await server.client();
    await coach.post('/api/auth/sign-in').send({ email: 'coach@harborlight.example', password: DEMO_PASSWORD }).expect(200);
    const drills = (await coach.get('/api/drills').expect(200)).body.drills as { name: string; resultCount: number }[];
    expect(drills.map((d) => d.name).sort()).toEqual(DEMO_DRILLS.map((d) => d.name).sort());
    const results = (await coach.get('/api/drills/results').expect(200)).body.results as { operator: { name: string }; stats: { medianMs: number; accuracy: number } }[];
    expect(results.length).toBeGreaterThanOrEqual(10);
    expect(new Set(results.map((r) => r.operator.name))).toEqual(new Set(['Tomas Reyes', 'Priya Dunmore']));
    for (const r of results) {
      expect(r.stats.medianMs).toBeGreaterThan(500);
      expect(r.stats.medianMs).toBeLessThan(3000);
      expect(r.stats.accuracy).toBeGreaterThan(0.5);
    }
    const bests = (await coach.get('/api/drills/bests').expect(200)).body.bests as unknown[];
    expect(bests.length).toBeGreaterThanOrEqual(4);
    expect(await seedDemoDrills(server.db.db)).toEqual({ drills: 0, results: 0 });
    expect((await coach.get('/api/drills/results').expect(200)).body.results).toHaveLength(results.length);
  });
});
