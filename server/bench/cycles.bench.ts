// Cycles: the analysis of one 3-minute simulated match (pure, then with its database reads and writes), and the coach
// review GET /api/review/cycles of a real server process over 200 analysed recordings (the demo event's twelve
// copied with their cycle rows), against GET /api/health of the same server in the same run.
import { sql } from 'drizzle-orm';
import { analyzeCycles, type CycleEvent } from '../../shared/domain/cycles/analyze';
import { matchSummary } from '../../shared/domain/cycles/summary';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { runHeadlessMatch } from '../../simulator/src/headless';
import { simSignalIndex } from '../../simulator/src/signals';
import type { Db } from '../db/client';
import { cyclesServiceFor } from '../features/cycles/cycles.service';
import { DEMO_EVENT } from '../features/demo/demo-recordings';
import { formatResults, measure } from './bench-kit';
import { signInDemo, startBenchServer } from './bench-server';

const REVIEW_RECORDINGS = 200;
const REVIEW_RUNS = 60;

type CallTimes = { p50Ms: number; p95Ms: number; serverP50Ms: number | null };

/** p50 and p95 of client-observed times of `runs` calls after a warm-up of 5, and the p50 of the server's own time. */
async function timeCalls(runs: number, call: () => Promise<number | null>): Promise<CallTimes> {
  for (let i = 0; i < 5; i += 1) await call();
  const times: number[] = [];
  const server: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const t0 = performance.now();
    const serverMs = await call();
    times.push(performance.now() - t0);
    if (serverMs !== null) server.push(serverMs);
  }
  const at = (xs: number[], q: number) => [...xs].sort((a, b) => a - b)[Math.min(xs.length - 1, Math.floor(q * xs.length))]!;
  return { p50Ms: at(times, 0.5), p95Ms: at(times, 0.95), serverP50Ms: server.length === runs ? at(server, 0.5) : null };
}

/** The headless simulator's match as the analysis reads it: events with selections, and the drive speed. */
function simulatedMatch() {
  const match = runHeadlessMatch({ seed: 1985, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'blue', station: 2 });
  const events: CycleEvent[] = [
    ...match.events.map((e) => ({ tS: e.tMs / 1000, kind: e.kind, data: e.data, seq: e.seq })),
    ...match.selections.map((s, i) => ({ tS: s.tMs / 1000, kind: 'selection', data: { channel: s.channel, value: s.value }, seq: 1e9 + i })),
  ]
    .sort((a, b) => a.tS - b.tS || a.seq - b.seq)
    .map(({ tS, kind, data }) => ({ tS, kind, data }));
  const speedIndex = simSignalIndex('drive/speed');
  const tS: number[] = [];
  const values: number[] = [];
  for (const b of match.batches) b.rows.forEach((row, k) => (tS.push((b.t0Ms + k * b.dtMs) / 1000), values.push(row[speedIndex]!)));
  return { events, speed: { tS, values }, durationS: tS.at(-1) ?? 0 };
}

/** Copies the demo event's analysed recordings (rows, cycles, summaries) until the team has `total` of them. */
async function seedCopies(db: Db, total: number): Promise<number> {
  const sources = (
    await db.execute<{ id: string }>(sql`
      select r.id from recordings r join recording_cycle_summaries s on s.recording_id = r.id
      where r.event = ${DEMO_EVENT} order by r.started_at`)
  ).rows.map((r) => r.id);
  if (sources.length === 0) throw new Error('cycles bench: the demo event has no analysed recordings');
  let count = sources.length;
  for (let copy = 1; count < total; copy += 1) {
    for (const source of sources) {
      if (count >= total) break;
      const [row] = (
        await db.execute<{ id: string }>(sql`
          insert into recordings (team_id, robot, stream_id, kind, source, status, origin_t_ms, started_at, ended_at, duration_ms,
                                  event, match_type, match_number, alliance, station, operator_name)
          select team_id, robot, stream_id || ':bench-copy-' || ${copy}, kind, source, status, origin_t_ms,
                 started_at + make_interval(days => ${copy * 7}), ended_at + make_interval(days => ${copy * 7}), duration_ms,
                 event, match_type, match_number, alliance, station, operator_name
          from recordings where id = ${source} returning id`)
      ).rows;
      const id = row!.id;
      await db.execute(sql`
        insert into recording_cycles
        select ${id}::uuid, team_id, index, piece, phase, crosses_phase, is_preload, start_s, acquired_s, align_start_s, place_start_s, end_s,
               duration_s, acquire_s, travel_s, align_s, place_s, called_branch, called_level, called_algae, called_at_s, reached_branch,
               reached_level, reached_algae, is_on_target, level, face, station, outcome, ended_by, points, call_to_place_s
        from recording_cycles where recording_id = ${source}`);
      await db.execute(sql`
        insert into recording_cycle_summaries
        select ${id}::uuid, team_id, analysis_version, computed_at, cycle_count, total_points, summary
        from recording_cycle_summaries where recording_id = ${source}`);
      count += 1;
    }
  }
  return count;
}

export async function benchCycles(db: Db, options: { databaseUrl: string }): Promise<string[]> {
  const lines: string[] = [];
  const match = simulatedMatch();
  const copyEvents = await measure('baseline: structuredClone of the events', 200, async () => {
    structuredClone(match.events);
  });
  const analysis = await measure('analyse one 3-minute match', 200, async () => {
    const cycles = analyzeCycles(season2025, { events: match.events, durationS: match.durationS, speed: match.speed });
    matchSummary(season2025, match.events, cycles);
  });
  const cycleCount = analyzeCycles(season2025, { events: match.events, durationS: match.durationS, speed: match.speed }).length;
  lines.push(`  ${match.events.length} events, ${match.speed.tS.length} drive-speed samples, ${cycleCount} cycles`);
  lines.push(formatResults([copyEvents, { ...analysis, baseline: copyEvents }]));

  const server = await startBenchServer(options.databaseUrl);
  try {
    // The server seeds the demo team and its twelve matches (cycles stored as each is finished) on start.
    const [demo] = (
      await db.execute<{ id: string; team_id: string }>(sql`select id, team_id from recordings where event = ${DEMO_EVENT} order by started_at limit 1`)
    ).rows;
    if (!demo) throw new Error('cycles bench: the server did not seed the demo event');
    const service = cyclesServiceFor(db);
    const stored = await measure('analyse and store one match (with the db)', 20, async () => {
      await service.computeAndStore(demo.team_id, demo.id);
    });
    lines.push(formatResults([{ ...stored, baseline: analysis }]).replace('× baseline', '× the pure analysis'));

    const recordings = await seedCopies(db, REVIEW_RECORDINGS);
    const [{ n } = { n: 0 }] = (
      await db.execute<{ n: number }>(sql`select count(*)::int as n from recording_cycles c join recordings r on r.id = c.recording_id where r.event = ${DEMO_EVENT}`)
    ).rows;
    const coach = await signInDemo(server.url, 'coach@harborlight.example');
    const get = (path: string) => async () => {
      const res = await fetch(`${server.url}${path}`, { headers: { cookie: coach.cookie } });
      if (!res.ok) throw new Error(`cycles bench: ${path} answered ${res.status}`);
      await res.arrayBuffer();
      const timing = /dur=([\d.]+)/.exec(res.headers.get('server-timing') ?? '');
      return timing ? Number(timing[1]) : null;
    };
    const query = new URLSearchParams({ event: DEMO_EVENT }).toString();
    const health = await timeCalls(REVIEW_RUNS, get('/api/health'));
    const review = await timeCalls(REVIEW_RUNS, get(`/api/review/cycles?${query}`));
    const csv = await timeCalls(REVIEW_RUNS, get(`/api/review/cycles?${query}&format=csv`));
    const row = (name: string, t: CallTimes, isBaseline = false) =>
      `  ${name.padEnd(46)} p50 ${t.p50Ms.toFixed(2).padStart(8)} ms   p95 ${t.p95Ms.toFixed(2).padStart(8)} ms   ` +
      `${isBaseline ? 'baseline' : `${(t.p50Ms / health.p50Ms).toFixed(1)}× baseline`}` +
      (t.serverP50Ms === null ? '' : `   (server p50 ${t.serverP50Ms.toFixed(2)} ms)`);
    lines.push(`  review over ${recordings} recordings, ${n} cycles (target ≤ 300 ms), ${REVIEW_RUNS} calls each, client-observed`);
    lines.push(row('baseline: GET /api/health', health, true));
    lines.push(row('GET /api/review/cycles', review));
    lines.push(row('GET /api/review/cycles&format=csv', csv));
  } finally {
    await server.stop();
  }
  return lines;
}
