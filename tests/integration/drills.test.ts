import { sql } from 'drizzle-orm';
import { median, quantile } from 'simple-statistics';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seededRandom } from '../../shared/domain/drills/drill-calls';
import { planCalls } from '../../shared/domain/drills/drill-plan';
import { ROLES, type Role } from '../../shared/domain/roles';
import {
  drillListSchema,
  drillResultDetailSchema,
  drillResultListSchema,
  drillSchema,
  personalBestListSchema,
  submittedDrillResultSchema,
  type DrillBody,
  type DrillResultBody,
} from '../../shared/schemas/drill';
import { addMember, signUpTeam, startTestServer, type TestClient, type TestServer } from '../support/test-server';

let server: TestServer;
let other: TestClient;
const clients = {} as Record<Role, TestClient>;
const ids = {} as Record<Role, string>;

const scripted: DrillBody = {
  name: 'Reef ladder',
  plan: { mode: 'scripted', calls: [{ branch: 'C', level: 'L4' }, { station: 'left' }, { branch: 'H', level: 'L2' }] },
  pace: { mode: 'interval', intervalMs: 4000 },
};
const random: DrillBody = {
  name: 'Far faces, high levels',
  plan: { mode: 'random', targets: { branches: ['G', 'H'], levels: ['L3', 'L4'], stations: [] }, count: 2 },
  pace: { mode: 'on-answer', limitMs: 6000 },
};

const tap = (part: 'branch' | 'level' | 'station', value: string, tMs: number) => ({ part, value, tMs });

/** A run of the scripted drill: reaction times 850, 600 and 1300 ms, one wrong tap on the first call. */
const scriptedRun = (drillId: string, slowerMs = 0): DrillResultBody => ({
  drillId,
  startedAt: '2025-03-14T14:00:00.000Z',
  mode: 'self',
  coachName: null,
  isSimulatorDriven: false,
  seed: null,
  calls: [
    { call: { branch: 'C', level: 'L4' }, shownAtMs: 0, taps: [tap('branch', 'D', 300), tap('branch', 'C', 500), tap('level', 'L4', 850 + slowerMs)] },
    { call: { station: 'left' }, shownAtMs: 4000, taps: [tap('station', 'left', 4600 + slowerMs)] },
    { call: { branch: 'H', level: 'L2' }, shownAtMs: 8000, taps: [tap('level', 'L2', 8700), tap('branch', 'H', 9300 + slowerMs)] },
  ],
});

async function counts(): Promise<{ drills: number; results: number; calls: number }> {
  const r = await server.db.db.execute<{ drills: number; results: number; calls: number }>(
    sql`select (select count(*)::int from drills) as drills, (select count(*)::int from drill_results) as results, (select count(*)::int from drill_result_calls) as calls`,
  );
  return r.rows[0]!;
}

beforeAll(async () => {
  server = await startTestServer();
  clients.lead = await signUpTeam(server, { email: 'lead@harborlight.example', teamNumber: 19850 });
  for (const role of ROLES.filter((r) => r !== 'lead')) {
    clients[role] = await addMember(server, clients.lead, { email: `${role}@harborlight.example`, role, name: `The ${role}` });
  }
  for (const role of ROLES) ids[role] = (await clients[role].get('/api/me').expect(200)).body.user.id;
  other = await signUpTeam(server, { email: 'lead@otherharbor.example', teamNumber: 91850, teamName: 'Other Harbor' });
}, 60_000);
afterAll(async () => {
  await server?.close();
});

describe('drills', () => {
  it('creates, lists, reads, replaces and deletes a drill', async () => {
    const created = drillSchema.parse((await clients.coach.post('/api/drills').send({ ...scripted, name: '  Ladder  ' }).expect(201)).body);
    expect(created).toMatchObject({ name: 'Ladder', plan: scripted.plan, pace: scripted.pace, createdBy: { id: ids.coach, name: 'The coach' }, resultCount: 0 });
    const list = drillListSchema.parse((await clients.viewer.get('/api/drills').expect(200)).body);
    expect(list.drills.map((d) => d.id)).toContain(created.id);
    expect((await clients.operator.get(`/api/drills/${created.id}`).expect(200)).body.name).toBe('Ladder');

    const replaced = (await clients.programmer.put(`/api/drills/${created.id}`).send(random).expect(200)).body;
    expect(replaced).toMatchObject({ id: created.id, name: random.name, plan: random.plan, pace: random.pace });
    expect(Date.parse(replaced.updatedAt)).toBeGreaterThanOrEqual(Date.parse(created.updatedAt));

    await clients.lead.delete(`/api/drills/${created.id}`).expect(204);
    await clients.lead.get(`/api/drills/${created.id}`).expect(404);
    await clients.lead.delete(`/api/drills/${created.id}`).expect(404);
  });

  it.each(['lead', 'programmer', 'coach'] as const)('lets a %s create a drill', async (role) => {
    await clients[role].post('/api/drills').send({ ...scripted, name: `By the ${role}` }).expect(201);
  });

  it.each(['operator', 'viewer'] as const)('refuses drill edits from a %s and changes nothing', async (role) => {
    const drill = (await clients.lead.post('/api/drills').send(scripted).expect(201)).body;
    const before = await counts();
    expect((await clients[role].post('/api/drills').send(scripted).expect(403)).body.error.code).toBe('forbidden');
    await clients[role].put(`/api/drills/${drill.id}`).send(random).expect(403);
    await clients[role].delete(`/api/drills/${drill.id}`).expect(403);
    expect(await counts()).toEqual(before);
    expect((await clients.lead.get(`/api/drills/${drill.id}`).expect(200)).body.name).toBe(scripted.name);
  });

  it.each([
    ['no name', { ...scripted, name: '  ' }, 'name'],
    ['no targets', { ...random, plan: { mode: 'random', targets: { branches: [], levels: [], stations: [] }, count: 5 } }, 'plan.targets'],
    ['a count over 100', { ...random, plan: { ...random.plan, count: 101 } }, 'plan.count'],
    ['an empty script', { ...scripted, plan: { mode: 'scripted', calls: [] } }, 'plan.calls'],
    ['a call with a station and a branch', { ...scripted, plan: { mode: 'scripted', calls: [{ branch: 'A', station: 'left' }] } }, 'plan.calls.0'],
    ['a pace under a second', { ...scripted, pace: { mode: 'interval', intervalMs: 200 } }, 'pace.intervalMs'],
    ['an unknown pace', { ...scripted, pace: { mode: 'whenever' } }, 'pace.mode'],
  ])('answers 400 with a field issue and stores nothing for %s', async (_name, body, field) => {
    const before = await counts();
    const res = await clients.lead.post('/api/drills').send(body).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(field);
    expect(await counts()).toEqual(before);
  });
});

describe('drill results', () => {
  it('scores a run on the server, stores it with its calls and gives it back', async () => {
    const drill = (await clients.coach.post('/api/drills').send(scripted).expect(201)).body;
    const res = await clients.operator.post('/api/drills/results').send(scriptedRun(drill.id)).expect(201);
    const result = submittedDrillResultSchema.parse(res.body);
    const times = [850, 600, 1300];
    expect(result).toMatchObject({
      drillId: drill.id,
      drillName: 'Reef ladder',
      operator: { id: ids.operator, name: 'The operator', role: 'operator' },
      isComplete: true,
      mode: 'self',
      newBests: { median: false, fastest: false, accuracy: false },
    });
    expect(result.calls.map((c) => [c.reactionMs, c.errors, c.isMiss])).toEqual([
      [850, 1, false],
      [600, 0, false],
      [1300, 0, false],
    ]);
    expect(result.stats).toMatchObject({ callCount: 3, answeredCount: 3, missCount: 0, errorCount: 1, cleanCount: 2, fastestMs: 600 });
    expect(result.stats.accuracy).toBeCloseTo(2 / 3, 9);
    // Reference: simple-statistics median() and quantile(…, 0.9) of the same reaction times.
    expect(result.stats.medianMs).toBeCloseTo(median(times), 9);
    expect(result.stats.p90Ms).toBeCloseTo(quantile(times, 0.9), 9);

    const detail = drillResultDetailSchema.parse((await clients.viewer.get(`/api/drills/results/${result.id}`).expect(200)).body);
    expect(detail.calls).toHaveLength(3);
    expect(detail.calls[0]!.taps).toEqual(scriptedRun(drill.id).calls[0]!.taps);
    expect((await clients.viewer.get(`/api/drills/${drill.id}`).expect(200)).body.resultCount).toBe(1);
  });

  it('scores with the drill’s pace: an answer after the interval is a miss', async () => {
    const drill = (await clients.coach.post('/api/drills').send(scripted).expect(201)).body;
    const body = scriptedRun(drill.id);
    body.calls[1]!.taps = [tap('station', 'left', 8100)];
    const result = (await clients.operator.post('/api/drills/results').send(body).expect(201)).body;
    expect(result.calls[1]).toMatchObject({ reactionMs: null, isMiss: true });
    expect(result.stats).toMatchObject({ answeredCount: 2, missCount: 1 });
  });

  it('lists results per operator over time and keeps personal bests from complete runs', async () => {
    const drill = (await clients.coach.post('/api/drills').send({ ...scripted, name: 'Bests' }).expect(201)).body;
    const first = (await clients.operator.post('/api/drills/results').send({ ...scriptedRun(drill.id, 400), startedAt: '2025-03-14T14:00:00Z' }).expect(201)).body;
    const second = (await clients.operator.post('/api/drills/results').send({ ...scriptedRun(drill.id), startedAt: '2025-03-14T15:00:00Z' }).expect(201)).body;
    expect(second.newBests).toEqual({ median: true, fastest: true, accuracy: false });
    // A stopped run (one of three calls) is stored but does not count for bests.
    const stopped = scriptedRun(drill.id);
    stopped.calls = [{ ...stopped.calls[0]!, taps: [tap('branch', 'C', 100), tap('level', 'L4', 200)] }];
    const partial = (await clients.operator.post('/api/drills/results').send({ ...stopped, startedAt: '2025-03-14T16:00:00Z' }).expect(201)).body;
    expect(partial).toMatchObject({ isComplete: false, newBests: { median: false, fastest: false, accuracy: false } });
    await clients.programmer.post('/api/drills/results').send({ ...scriptedRun(drill.id, 900), startedAt: '2025-03-14T15:30:00Z' }).expect(201);

    const mine = drillResultListSchema.parse((await clients.viewer.get(`/api/drills/results?drillId=${drill.id}&operatorId=${ids.operator}`).expect(200)).body);
    expect(mine.results.map((r) => r.id)).toEqual([first.id, second.id, partial.id]);
    const newestTwo = (await clients.viewer.get(`/api/drills/results?drillId=${drill.id}&limit=2`).expect(200)).body.results;
    expect(newestTwo.map((r: { startedAt: string }) => r.startedAt)).toEqual(['2025-03-14T15:30:00.000Z', '2025-03-14T16:00:00.000Z']);

    const bests = personalBestListSchema.parse((await clients.coach.get(`/api/drills/bests?drillId=${drill.id}`).expect(200)).body).bests;
    const operatorBest = bests.find((b) => b.operator.id === ids.operator)!;
    expect(operatorBest).toMatchObject({ drillName: 'Bests', runCount: 2, bestMedianMs: 850, bestMedianRunId: second.id, fastestMs: 600 });
    expect(bests.find((b) => b.operator.id === ids.programmer)).toMatchObject({ runCount: 1, bestMedianMs: 1750, fastestMs: 1500 });
  });

  it.each(ROLES.filter((r) => r !== 'viewer'))('lets a %s submit a result', async (role) => {
    const drill = (await clients.lead.post('/api/drills').send(scripted).expect(201)).body;
    const res = await clients[role].post('/api/drills/results').send(scriptedRun(drill.id)).expect(201);
    expect(res.body.operator.role).toBe(role);
  });

  it('refuses a result from a viewer and stores nothing', async () => {
    const drill = (await clients.lead.post('/api/drills').send(scripted).expect(201)).body;
    const before = await counts();
    expect((await clients.viewer.post('/api/drills/results').send(scriptedRun(drill.id)).expect(403)).body.error.code).toBe('forbidden');
    expect(await counts()).toEqual(before);
  });

  it.each([
    ['more calls than the drill has', (b: DrillResultBody) => ({ ...b, calls: [...b.calls, b.calls[0]!] }), 'calls'],
    ['a call the script does not make', (b: DrillResultBody) => ({ ...b, calls: [{ ...b.calls[0]!, call: { branch: 'A', level: 'L4' } }, ...b.calls.slice(1)] }), 'calls.0.call'],
    ['calls out of order', (b: DrillResultBody) => ({ ...b, calls: [b.calls[0]!, { ...b.calls[1]!, shownAtMs: 0 }, { ...b.calls[2]!, shownAtMs: 0 - 1 }] }), 'calls.2.shownAtMs'],
    ['a tap of an unknown part', (b: DrillResultBody) => ({ ...b, calls: [{ ...b.calls[0]!, taps: [{ part: 'cage', value: 'deep', tMs: 10 }] }] }), 'calls.0.taps.0.part'],
    ['no calls', (b: DrillResultBody) => ({ ...b, calls: [] }), 'calls'],
    ['a bad start time', (b: DrillResultBody) => ({ ...b, startedAt: 'yesterday' }), 'startedAt'],
  ])('answers 400 and stores nothing for %s', async (_name, change, field) => {
    const drill = (await clients.lead.post('/api/drills').send(scripted).expect(201)).body;
    const before = await counts();
    const res = await clients.operator.post('/api/drills/results').send(change(scriptedRun(drill.id))).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(field);
    expect(await counts()).toEqual(before);
  });

  it('refuses a call a random drill cannot make', async () => {
    const drill = (await clients.lead.post('/api/drills').send(random).expect(201)).body;
    const body: DrillResultBody = { ...scriptedRun(drill.id), calls: [{ call: { branch: 'A', level: 'L4' }, shownAtMs: 0, taps: [] }] };
    const res = await clients.operator.post('/api/drills/results').send(body).expect(400);
    expect(res.body.error.issues[0].path).toBe('calls.0.call');
    const ok: DrillResultBody = { ...body, calls: [{ call: { branch: 'G', level: 'L3' }, shownAtMs: 0, taps: [tap('level', 'L3', 400), tap('branch', 'G', 700)] }] };
    expect((await clients.operator.post('/api/drills/results').send(ok).expect(201)).body.stats.medianMs).toBe(700);
  });

  it('checks a random run against the calls its seed draws', async () => {
    const drill = (await clients.lead.post('/api/drills').send(random).expect(201)).body;
    const drawn = planCalls(drill.plan, seededRandom(4242));
    const records = drawn.map((call, i) => ({ call, shownAtMs: i * 3000, taps: [tap('level', call.level!, i * 3000 + 500), tap('branch', call.branch!, i * 3000 + 900)] }));
    const body: DrillResultBody = { ...scriptedRun(drill.id), seed: 4242, calls: records };
    expect((await clients.operator.post('/api/drills/results').send(body).expect(201)).body.stats).toMatchObject({ answeredCount: 2, medianMs: 900 });
    const before = await counts();
    const other = drawn[0]!.branch === 'G' ? 'H' : 'G';
    const swapped = { ...body, calls: [{ ...records[0]!, call: { ...drawn[0]!, branch: other } }, records[1]!] };
    const res = await clients.operator.post('/api/drills/results').send(swapped).expect(400);
    expect(res.body.error.issues[0]).toMatchObject({ path: 'calls.0.call', message: 'This is not the call the drill made here' });
    expect(await counts()).toEqual(before);
  });

  it('keeps results when their drill is deleted', async () => {
    const drill = (await clients.lead.post('/api/drills').send({ ...scripted, name: 'Short lived' }).expect(201)).body;
    const result = (await clients.operator.post('/api/drills/results').send(scriptedRun(drill.id)).expect(201)).body;
    await clients.lead.delete(`/api/drills/${drill.id}`).expect(204);
    expect((await clients.viewer.get(`/api/drills/results/${result.id}`).expect(200)).body).toMatchObject({ drillId: null, drillName: 'Short lived' });
  });
});

describe('drills across teams and sessions', () => {
  it('hides another team’s drills and results (404) and lists none of them', async () => {
    const drill = (await clients.lead.post('/api/drills').send(scripted).expect(201)).body;
    const result = (await clients.operator.post('/api/drills/results').send(scriptedRun(drill.id)).expect(201)).body;
    const before = await counts();
    await other.get(`/api/drills/${drill.id}`).expect(404);
    await other.put(`/api/drills/${drill.id}`).send(random).expect(404);
    await other.delete(`/api/drills/${drill.id}`).expect(404);
    await other.get(`/api/drills/results/${result.id}`).expect(404);
    await other.post('/api/drills/results').send(scriptedRun(drill.id)).expect(404);
    expect((await other.get('/api/drills').expect(200)).body.drills).toEqual([]);
    expect((await other.get('/api/drills/results').expect(200)).body.results).toEqual([]);
    expect((await other.get('/api/drills/bests').expect(200)).body.bests).toEqual([]);
    expect(await counts()).toEqual(before);
  });

  it('answers 401 when signed out', async () => {
    const anon = await server.client();
    await anon.get('/api/drills').expect(401);
    await anon.post('/api/drills').send(scripted).expect(401);
    await anon.get('/api/drills/results').expect(401);
    await anon.post('/api/drills/results').send(scriptedRun('00000000-0000-4000-8000-000000000000')).expect(401);
    await anon.get('/api/drills/bests').expect(401);
  });

  it('answers 400 for ids that are not ids and 404 for unknown ones', async () => {
    expect((await clients.lead.get('/api/drills/not-an-id').expect(400)).body.error.issues[0].path).toBe('id');
    expect((await clients.lead.get('/api/drills/results?operatorId=nope').expect(400)).body.error.issues[0].path).toBe('operatorId');
    await clients.lead.get('/api/drills/results/00000000-0000-4000-8000-000000000000').expect(404);
  });
});
