// The cycles API over the demo event's twelve simulated matches: stored once when each recording is finished, the
// review's numbers equal to a direct SQL computation over the same rows, filters, CSV, roles and team isolation.
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../shared/domain/roles';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { cycleReviewSchema, recordingCyclesSchema, type CycleReview, type ReviewGroup } from '../../shared/schemas/cycle';
import { recordingEventsSchema, samplesSchema } from '../../shared/schemas/recording';
import { DEMO_EVENT, DEMO_MATCHES, seedDemoRecordings } from '../../server/features/demo/demo-recordings';
import { DEMO_MEMBERS, DEMO_PASSWORD } from '../../server/features/demo/demo-team';
import { seedDemo } from '../../server/features/demo/seed';
import { runHeadlessMatch } from '../../simulator/src/headless';
import { encodeHeadlessMatch, headlessMatchRecords } from '../../simulator/src/match-file';
import type { RobotEvent, TelemetryBatch } from '../../shared/protocol/messages';
import { signUpTeam, startTestServer, type TestClient, type TestServer } from '../support/test-server';

let server: TestServer;
const clients = {} as Record<Role, TestClient>;
let other: TestClient;
let otherRecordingId: string;
let demoIds: string[];

const reviewUrl = (query: Record<string, string> = {}) => `/api/review/cycles?${new URLSearchParams({ event: DEMO_EVENT, ...query })}`;

async function rows<T>(query: ReturnType<typeof sql>): Promise<T[]> {
  return (await server.db.db.execute(query)).rows as T[];
}

beforeAll(async () => {
  server = await startTestServer({ signInLimit: { windowMs: 60_000, max: 50 } });
  await seedDemo(server.db.db);
  await seedDemoRecordings(server.db.db);
  for (const role of ROLES) {
    const member = DEMO_MEMBERS.find((m) => m.role === role)!;
    const client = await server.client();
    await client.post('/api/auth/sign-in').send({ email: member.email, password: DEMO_PASSWORD }).expect(200);
    clients[role] = client;
  }
  other = await signUpTeam(server, { email: 'lead@otherharbor.example', teamNumber: 91850, teamName: 'Other Harbor' });
  const match = runHeadlessMatch({ seed: 7, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'red' });
  const file = encodeHeadlessMatch(match, { source: 'simulator', robot: 'Tern', teamNumber: 91850, startedAtMs: Date.parse('2025-03-14T15:00:00Z'), seed: 7 });
  otherRecordingId = (await other.post('/api/recordings/upload').field('kind', 'simulated').attach('file', Buffer.from(file), 'm.pwrec').expect(201)).body.id;
  demoIds = (
    await rows<{ id: string }>(sql`select r.id from recordings r join teams t on t.id = r.team_id where t.number = 19850 order by r.started_at`)
  ).map((r) => r.id);
}, 120_000);
afterAll(async () => {
  await server?.close();
});

describe('stored cycles', () => {
  it('stores cycles and a summary for every demo match when the seed finishes it, and for an upload', async () => {
    expect(demoIds).toHaveLength(DEMO_MATCHES.length);
    const stored = await rows<{ id: string; n: number }>(sql`
      select r.id, count(c.index)::int as n from recordings r
      join recording_cycle_summaries s on s.recording_id = r.id
      left join recording_cycles c on c.recording_id = r.id
      group by r.id`);
    expect(new Set(stored.map((s) => s.id))).toEqual(new Set([...demoIds, otherRecordingId]));
    for (const s of stored) expect(s.n).toBeGreaterThan(10);
  });

  it('analyses a recording still being made without storing it, and stores its cycles once the app finishes it, as the recorder does', async () => {
    const recordings = server.app.services.recordings;
    const teamId = (await rows<{ id: string }>(sql`select id from teams where number = 91850`))[0]!.id;
    const match = runHeadlessMatch({ seed: 11, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'blue' });
    const messages = headlessMatchRecords(match).filter((r): r is TelemetryBatch | RobotEvent => r.type === 'telemetry_batch' || r.type === 'event');
    const { recordingId } = await recordings.ingest(
      { teamId, robot: 'Tern', robotKeyId: undefined, streamId: 'live-stream:1', signals: match.signals, kind: 'match', source: 'live' },
      messages,
    );
    const live = recordingCyclesSchema.parse((await other.get(`/api/recordings/${recordingId}/cycles`).expect(200)).body);
    expect(live.cycles.length).toBeGreaterThan(10);
    const storedBefore = await rows<{ n: number }>(sql`select count(*)::int as n from recording_cycle_summaries where recording_id = ${recordingId}`);
    expect(storedBefore[0]!.n).toBe(0);

    await recordings.finish(teamId, recordingId);
    const [summary] = await rows<{ cycle_count: number; total_points: number }>(sql`
      select cycle_count, total_points from recording_cycle_summaries where recording_id = ${recordingId}`);
    expect(summary).toEqual({ cycle_count: live.cycles.length, total_points: live.summary.points.total });
    await other.delete(`/api/recordings/${recordingId}`).expect(204);
    const left = await rows<{ n: number }>(sql`select count(*)::int as n from recording_cycles where recording_id = ${recordingId}`);
    expect(left[0]!.n).toBe(0);
  });

  it('has varied cycles across the demo matches', async () => {
    const [spread] = await rows<{ levels: number; faces: number; stations: number; outcomes: number; min: number; max: number }>(sql`
      select count(distinct c.level)::int as levels, count(distinct c.face)::int as faces, count(distinct c.station)::int as stations,
             count(distinct c.outcome)::int as outcomes, min(c.duration_s) as min, max(c.duration_s) as max
      from recording_cycles c join recordings r on r.id = c.recording_id where r.event = ${DEMO_EVENT}`);
    console.info(`demo cycles: ${JSON.stringify(spread)}`);
    expect(spread!.levels).toBeGreaterThanOrEqual(3);
    expect(spread!.faces).toBe(6);
    expect(spread!.stations).toBe(3);
    expect(spread!.outcomes).toBeGreaterThanOrEqual(2);
    expect(spread!.max - spread!.min).toBeGreaterThan(3);
  });
});

describe('GET /api/recordings/:id/cycles', () => {
  it('answers the cycles and match summary, agreeing with the events and with the simulator’s own points count', async () => {
    const id = demoIds[0]!;
    const res = await clients.coach.get(`/api/recordings/${id}/cycles`).expect(200);
    const answer = recordingCyclesSchema.parse(res.body);
    const events = recordingEventsSchema.parse((await clients.coach.get(`/api/recordings/${id}/events`).expect(200)).body).events;
    const attempts = events.filter((e) => e.kind === 'placed' || e.kind === 'missed' || e.kind === 'algae_scored');
    expect(answer.cycles.filter((c) => c.outcome === 'scored' || c.outcome === 'missed').map((c) => c.endS)).toEqual(attempts.map((e) => e.tS));
    for (const c of answer.cycles) {
      const { acquireS, travelS, alignS, placeS } = c.segments;
      expect(acquireS + travelS! + alignS! + placeS!).toBeCloseTo(c.durationS, 9);
    }
    // The simulator counts its own points as it plays (game/points); the analysis scores the events separately.
    const points = samplesSchema.parse((await clients.coach.get(`/api/recordings/${id}/samples?signal=game/points`).expect(200)).body);
    expect(answer.summary.points.total).toBe(points.values.at(-1));
    expect(answer.summary.cycleCount).toBe(answer.cycles.length);
  });

  it('recomputes and stores the cycles of a recording that has none yet, once however many ask at once', async () => {
    const id = demoIds[1]!;
    const before = recordingCyclesSchema.parse((await clients.viewer.get(`/api/recordings/${id}/cycles`).expect(200)).body);
    await server.db.db.execute(sql`delete from recording_cycle_summaries where recording_id = ${id}`);
    await server.db.db.execute(sql`delete from recording_cycles where recording_id = ${id}`);
    // Three members open it at once: each analysis stores in turn, none fails.
    const answers = await Promise.all([clients.viewer, clients.coach, clients.lead].map((c) => c.get(`/api/recordings/${id}/cycles`).expect(200)));
    const again = recordingCyclesSchema.parse(answers[0]!.body);
    expect(again.cycles).toEqual(before.cycles);
    const [count] = await rows<{ n: number }>(sql`select count(*)::int as n from recording_cycles where recording_id = ${id}`);
    expect(count!.n).toBe(before.cycles.length);
  });

  it('refuses a bad id with 400, a signed-out request with 401 and another team’s recording with 404', async () => {
    await clients.coach.get('/api/recordings/not-a-uuid/cycles').expect(400);
    await (await server.client()).get(`/api/recordings/${demoIds[0]}/cycles`).expect(401);
    const res = await other.get(`/api/recordings/${demoIds[0]}/cycles`).expect(404);
    expect(res.body.error.code).toBe('not_found');
    await clients.coach.get(`/api/recordings/${otherRecordingId}/cycles`).expect(404);
  });

  it.each(ROLES)('lets a %s read a recording’s cycles', async (role) => {
    await clients[role].get(`/api/recordings/${demoIds[2]}/cycles`).expect(200);
  });
});

type Stat = { key: string | null; n: number; attempts: number; median: number | null; p90: number | null; points: number };

/** The same figures straight from the tables, with PostgreSQL's percentile_cont (linear interpolation). */
async function sqlGroups(keyColumn: string, where = sql``): Promise<Stat[]> {
  return rows<Stat>(sql`
    select ${sql.raw(keyColumn)} as key, count(*)::int as n,
           count(*) filter (where c.outcome in ('scored', 'missed'))::int as attempts,
           percentile_cont(0.5) within group (order by c.duration_s) filter (where c.outcome in ('scored', 'missed')) as median,
           percentile_cont(0.9) within group (order by c.duration_s) filter (where c.outcome in ('scored', 'missed')) as p90,
           sum(c.points)::float8 as points
    from recording_cycles c join recordings r on r.id = c.recording_id join teams t on t.id = r.team_id
    where t.number = 19850 and r.event = ${DEMO_EVENT} ${where}
    group by 1`);
}

function expectGroups(groups: readonly ReviewGroup[], expected: readonly Stat[]) {
  const byKey = new Map(expected.map((e) => [e.key, e]));
  expect(groups.map((g) => g.key).sort()).toEqual(expected.map((e) => e.key).sort());
  for (const g of groups) {
    const e = byKey.get(g.key)!;
    expect(g.cycleCount).toBe(e.n);
    expect(g.cycleTime.count).toBe(e.attempts);
    expect(g.points).toBeCloseTo(e.points, 9);
    if (e.median === null) expect(g.cycleTime.medianS).toBeNull();
    else expect(g.cycleTime.medianS).toBeCloseTo(e.median, 9);
    if (e.p90 === null) expect(g.cycleTime.p90S).toBeNull();
    else expect(g.cycleTime.p90S).toBeCloseTo(e.p90, 9);
  }
}

describe('GET /api/review/cycles', () => {
  let review: CycleReview;
  beforeAll(async () => {
    review = cycleReviewSchema.parse((await clients.coach.get(reviewUrl()).expect(200)).body);
  });

  it('covers the twelve demo matches, oldest first, with the filter choices', () => {
    expect(review.recordingCount).toBe(DEMO_MATCHES.length);
    expect(review.matches.map((m) => m.recordingId)).toEqual(demoIds);
    expect(review.matches.map((m) => m.matchNumber)).toEqual(DEMO_MATCHES.map((m) => m.matchNumber));
    expect(review.options).toEqual({ events: [DEMO_EVENT], operators: ['Tomas Reyes'] });
  });

  it('has the overall and per-match cycle times of a direct SQL computation', async () => {
    const [overall] = await sqlGroups(`'all'`);
    expect(review.cycleCount).toBe(overall!.n);
    expect(review.cycleTime.count).toBe(overall!.attempts);
    expect(review.cycleTime.medianS).toBeCloseTo(overall!.median!, 9);
    expect(review.cycleTime.p90S).toBeCloseTo(overall!.p90!, 9);

    const perMatch = await sqlGroups('c.recording_id::text');
    const totals = await rows<{ id: string; total: number }>(sql`select recording_id::text as id, total_points as total from recording_cycle_summaries`);
    for (const m of review.matches) {
      const e = perMatch.find((p) => p.key === m.recordingId)!;
      expect(m.cycleCount).toBe(e.n);
      expect(m.cycleTime.medianS).toBeCloseTo(e.median!, 9);
      expect(m.cycleTime.p90S).toBeCloseTo(e.p90!, 9);
      expect(m.points).toBe(totals.find((t) => t.id === m.recordingId)!.total);
    }
  });

  it('has the breakdowns by level, face, station and operator of a direct SQL computation', async () => {
    expectGroups(review.byLevel, await sqlGroups('c.level', sql`and c.piece = 'coral'`));
    expectGroups(review.byFace, await sqlGroups('c.face', sql`and c.piece = 'coral'`));
    expectGroups(review.byStation, await sqlGroups('c.station'));
    expectGroups(review.byOperator, await sqlGroups('r.operator_name'));
  });

  it('lists the slowest place attempts as SQL orders them', async () => {
    const slowest = await rows<{ id: string; index: number; duration: number; start: number }>(sql`
      select c.recording_id::text as id, c.index, c.duration_s as duration, c.start_s as start
      from recording_cycles c join recordings r on r.id = c.recording_id
      where r.event = ${DEMO_EVENT} and c.outcome in ('scored', 'missed')
      order by c.duration_s desc, r.started_at, c.index limit 10`);
    expect(review.slowest.map((c) => [c.recordingId, c.index, c.durationS, c.startS])).toEqual(slowest.map((s) => [s.id, s.index, s.duration, s.start]));
  });

  it('filters by date range, operator and kind', async () => {
    const saturday = cycleReviewSchema.parse((await clients.viewer.get(reviewUrl({ from: '2025-03-15', to: '2025-03-15' })).expect(200)).body);
    expect(saturday.matches.map((m) => m.matchNumber)).toEqual([7, 8, 9, 10, 11, 12]);
    const byOperator = cycleReviewSchema.parse((await clients.viewer.get(reviewUrl({ operator: 'Tomas Reyes' })).expect(200)).body);
    expect(byOperator.recordingCount).toBe(12);
    const nobody = cycleReviewSchema.parse((await clients.viewer.get(reviewUrl({ operator: 'Nobody Here' })).expect(200)).body);
    expect(nobody).toMatchObject({ recordingCount: 0, cycleCount: 0, matches: [], slowest: [] });
    const matches = cycleReviewSchema.parse((await clients.viewer.get(reviewUrl({ kind: 'match' })).expect(200)).body);
    expect(matches.recordingCount).toBe(0);
    const simulated = cycleReviewSchema.parse((await clients.viewer.get(reviewUrl({ kind: 'simulated' })).expect(200)).body);
    expect(simulated.cycleCount).toBe(review.cycleCount);
  });

  it('refuses bad filters with 400 and field issues', async () => {
    const backwards = await clients.coach.get(reviewUrl({ from: '2025-03-15', to: '2025-03-14' })).expect(400);
    expect(backwards.body.error.issues).toEqual(expect.arrayContaining([expect.objectContaining({ path: 'to' })]));
    await clients.coach.get(reviewUrl({ kind: 'scrimmage' })).expect(400);
    await clients.coach.get(reviewUrl({ from: '14/03/2025' })).expect(400);
    await clients.coach.get(reviewUrl({ format: 'xlsx' })).expect(400);
  });

  it('exports every selected cycle as CSV', async () => {
    const res = await clients.viewer.get(reviewUrl({ format: 'csv' })).expect(200);
    expect(res.headers['content-type']).toContain('text/csv');
    expect(res.headers['content-disposition']).toContain('attachment');
    const lines = res.text.trimEnd().split('\r\n');
    expect(lines[0]!.startsWith('recording_id,recording_started_at,event,')).toBe(true);
    expect(lines).toHaveLength(review.cycleCount + 1);
    expect(lines[1]!.startsWith(`${demoIds[0]},`)).toBe(true);
  });

  it('stores the cycles of a finished recording that has none before reviewing', async () => {
    const id = demoIds[5]!;
    await server.db.db.execute(sql`delete from recording_cycle_summaries where recording_id = ${id}`);
    await server.db.db.execute(sql`delete from recording_cycles where recording_id = ${id}`);
    const again = cycleReviewSchema.parse((await clients.coach.get(reviewUrl()).expect(200)).body);
    expect(again.cycleCount).toBe(review.cycleCount);
    expect(again.cycleTime).toEqual(review.cycleTime);
  });

  it.each(ROLES)('lets a %s read the review', async (role) => {
    await clients[role].get(reviewUrl()).expect(200);
  });

  it('refuses a signed-out review and keeps each team to its own recordings', async () => {
    await (await server.client()).get(reviewUrl()).expect(401);
    const theirs = cycleReviewSchema.parse((await other.get('/api/review/cycles').expect(200)).body);
    expect(theirs.recordingCount).toBe(1);
    expect(theirs.matches.map((m) => m.recordingId)).toEqual([otherRecordingId]);
    expect(theirs.options).toEqual({ events: [], operators: [] });
    const theirsDemo = cycleReviewSchema.parse((await other.get(reviewUrl()).expect(200)).body);
    expect(theirsDemo.recordingCount).toBe(0);
    const ours = cycleReviewSchema.parse((await clients.lead.get('/api/review/cycles').expect(200)).body);
    expect(ours.matches.map((m) => m.recordingId)).not.toContain(otherRecordingId);
  });
});
