import { describe, expect, it } from 'vitest';
import type { DrillCallRecord } from '../../../shared/domain/drills/drill-scoring';
import type { Drill, DrillResult, DrillResultBody } from '../../../shared/schemas/drill';
import { AppError } from '../../lib/errors';
import type { Actor } from '../auth/actor';
import type { DrillsRepo, DrillsStore, NewDrillResult } from './drills.repo';
import { createDrillsService } from './drills.service';

// An in-memory store with the repo's contract, passed in through deps (no database, no module mocks).
function memoryStore(): DrillsStore {
  const drills: (Drill & { teamId: string })[] = [];
  const results: (NewDrillResult & { id: string })[] = [];
  let n = 0;
  const id = () => `00000000-0000-4000-8000-${String(++n).padStart(12, '0')}`;
  const toResult = (r: NewDrillResult & { id: string }): DrillResult => ({
    id: r.id,
    drillId: r.drillId,
    drillName: r.drillName,
    operator: { id: r.operatorId, name: r.operatorName, role: r.operatorRole },
    mode: r.mode,
    coachName: r.coachName,
    isSimulatorDriven: r.isSimulatorDriven,
    isComplete: r.isComplete,
    startedAt: r.startedAt.toISOString(),
    finishedAt: r.finishedAt.toISOString(),
    stats: r.stats,
  });
  const repo: DrillsRepo = {
    list: async (teamId) => drills.filter((d) => d.teamId === teamId),
    find: async (teamId, drillId) => drills.find((d) => d.teamId === teamId && d.id === drillId),
    insert: async (d) => {
      const drill = { id: id(), teamId: d.teamId, name: d.name, plan: d.plan, pace: d.pace, createdBy: { id: d.createdById, name: d.createdByName }, createdAt: '2025-03-01T00:00:00.000Z', updatedAt: '2025-03-01T00:00:00.000Z', resultCount: 0 };
      drills.push(drill);
      return drill;
    },
    update: async () => undefined,
    remove: async () => false,
    insertResult: async (r) => {
      const stored = { ...r, id: id() };
      results.push(stored);
      return toResult(stored);
    },
    listResults: async (teamId, f) =>
      results
        .filter((r) => r.teamId === teamId && (!f.drillId || r.drillId === f.drillId) && (!f.operatorId || r.operatorId === f.operatorId) && (f.isComplete === undefined || r.isComplete === f.isComplete))
        .map(toResult),
    findResult: async () => undefined,
    hasResults: async (teamId) => results.some((r) => r.teamId === teamId),
  };
  return { ...repo, transaction: (fn) => fn(repo) };
}

const actor = (userId: string, teamId = 'team-harborlight'): Actor => ({
  user: { id: userId, email: `${userId}@harborlight.example`, name: userId === 'u-tomas' ? 'Tomas Reyes' : 'Priya Dunmore' },
  team: { id: teamId, number: 19850, name: 'Harborlight Robotics' },
  role: 'operator',
  sessionVersion: 0,
});

const run = (drillId: string, extraMs: number, calls = 2): DrillResultBody => ({
  drillId,
  startedAt: '2025-03-10T23:00:00.000Z',
  mode: 'self',
  coachName: null,
  isSimulatorDriven: false,
  seed: null,
  calls: (
    [
      { call: { branch: 'C', level: 'L4' }, shownAtMs: 0, taps: [{ part: 'branch', value: 'C', tMs: 400 }, { part: 'level', value: 'L4', tMs: 900 + extraMs }] },
      { call: { station: 'left' }, shownAtMs: 4000, taps: [{ part: 'station', value: 'left', tMs: 4700 + extraMs }] },
    ] satisfies DrillCallRecord[]
  ).slice(0, calls),
});

describe('createDrillsService', () => {
  const setUp = async () => {
    const service = createDrillsService({ store: memoryStore(), now: () => new Date('2025-03-10T23:01:00Z') });
    const drill = await service.create(actor('u-coach'), {
      name: 'Ladder',
      plan: { mode: 'scripted', calls: [{ branch: 'C', level: 'L4' }, { station: 'left' }] },
      pace: { mode: 'interval', intervalMs: 4000 },
    });
    return { service, drill };
  };

  it('names the bests a run beats against the operator’s own earlier complete runs only', async () => {
    const { service, drill } = await setUp();
    expect((await service.submitResult(actor('u-tomas'), run(drill.id, 300))).newBests).toEqual({ median: false, fastest: false, accuracy: false });
    // Priya's faster run is not Tomas's best; a stopped run of his does not count either.
    await service.submitResult(actor('u-priya'), run(drill.id, -200));
    expect((await service.submitResult(actor('u-tomas'), run(drill.id, -300, 1))).isComplete).toBe(false);
    const better = await service.submitResult(actor('u-tomas'), run(drill.id, 0));
    expect(better.newBests).toEqual({ median: true, fastest: true, accuracy: false });
    expect(better.stats).toMatchObject({ medianMs: 800, fastestMs: 700 });
    const bests = await service.bests(actor('u-coach'), { drillId: drill.id });
    expect(bests.map((b) => [b.operator.name, b.runCount, b.bestMedianMs])).toEqual([
      ['Priya Dunmore', 1, 600],
      ['Tomas Reyes', 2, 800],
    ]);
  });

  it('refuses a run of another team’s drill as not found', async () => {
    const { service, drill } = await setUp();
    await expect(service.submitResult(actor('u-tomas', 'team-other'), run(drill.id, 0))).rejects.toMatchObject({ code: 'not_found' });
    await expect(service.submitResult(actor('u-tomas', 'team-other'), run(drill.id, 0))).rejects.toBeInstanceOf(AppError);
  });
});
