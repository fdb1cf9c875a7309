// The demo team's drills and a few weeks of drill sessions before the invented Lakeshore District Event, so
// the drills page has content on a first start. Every number is invented, drawn from a seeded source.
import { seededRandom, type DrillCall, type RandomSource } from '../../../shared/domain/drills/drill-calls';
import { callWindowMs, planCalls } from '../../../shared/domain/drills/drill-plan';
import type { DrillCallRecord, DrillTap } from '../../../shared/domain/drills/drill-scoring';
import type { Role } from '../../../shared/domain/roles';
import type { DrillBody } from '../../../shared/schemas/drill';
import type { Db } from '../../db/client';
import type { Actor } from '../auth/actor';
import { authStore } from '../auth/auth.repo';
import { drillsStore } from '../drills/drills.repo';
import { createDrillsService } from '../drills/drills.service';
import { DEMO_MEMBERS, DEMO_TEAM } from './demo-team';

export const DEMO_DRILLS: readonly DrillBody[] = [
  {
    name: 'Full reef, L2–L4',
    plan: { mode: 'random', targets: { branches: ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'I', 'J', 'K', 'L'], levels: ['L2', 'L3', 'L4'], stations: [] }, count: 12 },
    pace: { mode: 'interval', intervalMs: 4000 },
  },
  {
    name: 'Cycle rhythm: station then reef',
    plan: {
      mode: 'scripted',
      calls: [
        { station: 'left' },
        { branch: 'C', level: 'L4' },
        { station: 'right' },
        { branch: 'J', level: 'L4' },
        { station: 'left' },
        { branch: 'D', level: 'L3' },
        { station: 'right' },
        { branch: 'I', level: 'L2' },
      ],
    },
    pace: { mode: 'on-answer', limitMs: 8000 },
  },
  {
    name: 'Far faces warm-up',
    plan: { mode: 'random', targets: { branches: ['F', 'G', 'H', 'I'], levels: ['L4'], stations: [] }, count: 10 },
    pace: { mode: 'on-answer', limitMs: 6000 },
  },
];

type Session = { email: string; drill: number; day: string; time: string; seed: number };

/** Tomas Reyes (the operator) drills most days before the event; Priya Dunmore stands in twice. */
const SESSIONS: readonly Session[] = [
  { email: 'operator@harborlight.example', drill: 0, day: '2025-02-24', time: '18:10', seed: 101 },
  { email: 'operator@harborlight.example', drill: 1, day: '2025-02-24', time: '18:25', seed: 102 },
  { email: 'operator@harborlight.example', drill: 0, day: '2025-02-27', time: '18:05', seed: 103 },
  { email: 'operator@harborlight.example', drill: 2, day: '2025-02-27', time: '18:20', seed: 104 },
  { email: 'programmer@harborlight.example', drill: 0, day: '2025-02-27', time: '19:00', seed: 105 },
  { email: 'operator@harborlight.example', drill: 0, day: '2025-03-03', time: '18:15', seed: 106 },
  { email: 'operator@harborlight.example', drill: 1, day: '2025-03-03', time: '18:30', seed: 107 },
  { email: 'operator@harborlight.example', drill: 0, day: '2025-03-06', time: '18:00', seed: 108 },
  { email: 'operator@harborlight.example', drill: 2, day: '2025-03-06', time: '18:12', seed: 109 },
  { email: 'programmer@harborlight.example', drill: 0, day: '2025-03-06', time: '19:10', seed: 110 },
  { email: 'operator@harborlight.example', drill: 0, day: '2025-03-10', time: '18:20', seed: 111 },
  { email: 'operator@harborlight.example', drill: 1, day: '2025-03-10', time: '18:35', seed: 112 },
  { email: 'operator@harborlight.example', drill: 0, day: '2025-03-12', time: '18:05', seed: 113 },
];

/** How quick and sure an invented operator is on a given session (0 = first, 1 = last before the event). */
function skill(email: string, progress: number) {
  const isOperator = email.startsWith('operator');
  return {
    partMs: (isOperator ? 720 : 860) - progress * (isOperator ? 230 : 90),
    wrongChance: (isOperator ? 0.1 : 0.14) - progress * 0.06,
  };
}

const jitter = (random: RandomSource, spreadMs: number) => (random() + random() + random() - 1.5) * spreadMs;

const WRONG: Record<keyof DrillCall, readonly string[]> = {
  branch: ['A', 'B', 'C', 'D', 'E', 'F', 'G', 'H', 'I', 'J', 'K', 'L'],
  level: ['L1', 'L2', 'L3', 'L4'],
  station: ['left', 'right'],
};

/** The taps an invented operator makes for one call, starting at `shownAtMs`. */
function tapsFor(call: DrillCall, shownAtMs: number, random: RandomSource, s: ReturnType<typeof skill>): DrillTap[] {
  const taps: DrillTap[] = [];
  let tMs = shownAtMs + 180;
  const parts = (['level', 'branch', 'station'] as const).filter((p) => call[p] !== undefined);
  for (const part of parts) {
    tMs += Math.max(220, s.partMs + jitter(random, 260));
    if (random() < s.wrongChance) {
      const wrong = WRONG[part].filter((v) => v !== call[part]);
      taps.push({ part, value: wrong[Math.floor(random() * wrong.length)]!, tMs: Math.round(tMs) });
      tMs += Math.max(200, 380 + jitter(random, 200));
    }
    taps.push({ part, value: call[part]!, tMs: Math.round(tMs) });
  }
  return taps;
}

/** Adds the demo drills that are missing, and the drill sessions once (when the team has no results yet). */
export async function seedDemoDrills(db: Db): Promise<{ drills: number; results: number }> {
  const auth = authStore(db);
  const team = await auth.findTeamByNumber(DEMO_TEAM.number);
  if (!team) throw new Error('the demo team is missing: seed it first');
  const store = drillsStore(db);
  let clock = new Date();
  const service = createDrillsService({ store, now: () => clock });
  const actorFor = async (email: string): Promise<Actor> => {
    const member = DEMO_MEMBERS.find((m) => m.email === email)!;
    const user = (await auth.findUserByEmail(email))!;
    return { user: { id: user.id, email, name: member.name }, team: { id: team.id, number: DEMO_TEAM.number, name: DEMO_TEAM.name }, role: member.role as Role, sessionVersion: 0 };
  };

  const coach = await actorFor('coach@harborlight.example');
  const existing = await service.list(coach);
  let drillCount = 0;
  const drills = [];
  for (const body of DEMO_DRILLS) {
    const found = existing.find((d) => d.name === body.name);
    if (found) drills.push(found);
    else {
      drills.push(await service.create(coach, body));
      drillCount += 1;
    }
  }
  if (await store.hasResults(team.id)) return { drills: drillCount, results: 0 };

  let results = 0;
  for (const [i, session] of SESSIONS.entries()) {
    const drill = drills[session.drill]!;
    const random = seededRandom(session.seed);
    const calls = planCalls(drill.plan, random);
    const s = skill(session.email, i / (SESSIONS.length - 1));
    const windowMs = callWindowMs(drill.pace);
    const records: DrillCallRecord[] = [];
    let shownAtMs = 1500;
    for (const call of calls) {
      const taps = random() < 0.025 ? [] : tapsFor(call, shownAtMs, random, s);
      records.push({ call, shownAtMs, taps });
      const answeredAtMs = taps.at(-1)?.tMs ?? shownAtMs + windowMs;
      shownAtMs = drill.pace.mode === 'interval' ? shownAtMs + windowMs : Math.min(answeredAtMs, shownAtMs + windowMs) + 700;
    }
    const startedAt = new Date(`${session.day}T${session.time}:00-05:00`);
    clock = new Date(startedAt.getTime() + shownAtMs);
    await service.submitResult(await actorFor(session.email), {
      drillId: drill.id,
      startedAt: startedAt.toISOString(),
      mode: session.drill === 1 ? 'coached' : 'self',
      coachName: session.drill === 1 ? coach.user.name : null,
      isSimulatorDriven: session.drill === 1,
      seed: drill.plan.mode === 'random' ? session.seed : null,
      calls: records,
    });
    results += 1;
  }
  return { drills: drillCount, results };
}
