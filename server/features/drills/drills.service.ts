import { possibleCalls, seededRandom, type DrillCall } from '../../../shared/domain/drills/drill-calls';
import { callWindowMs, planCallCount, planCalls } from '../../../shared/domain/drills/drill-plan';
import { newBests, personalBests, runStats, scoreRun, type RunSummary } from '../../../shared/domain/drills/drill-scoring';
import type {
  Drill,
  DrillBody,
  DrillResult,
  DrillResultBody,
  DrillResultDetail,
  DrillResultQuery,
  PersonalBestEntry,
  SubmittedDrillResult,
} from '../../../shared/schemas/drill';
import type { FieldIssue } from '../../../shared/schemas/error';
import type { Db } from '../../db/client';
import { AppError, notFound } from '../../lib/errors';
import type { Actor } from '../auth/actor';
import { drillsStore, type DrillsStore } from './drills.repo';

export interface DrillsServiceDeps {
  store: DrillsStore;
  now: () => Date;
}

const sameCall = (a: DrillCall, b: DrillCall) => a.branch === b.branch && a.level === b.level && a.station === b.station;

/** Where a submitted run disagrees with its drill: more calls than the plan, calls it cannot make, time order. */
function resultIssues(drill: Drill, body: DrillResultBody): FieldIssue[] {
  const issues: FieldIssue[] = [];
  const maxCalls = planCallCount(drill.plan);
  if (body.calls.length > maxCalls) issues.push({ path: 'calls', message: `The drill has ${maxCalls} calls, not ${body.calls.length}` });
  const allowed = drill.plan.mode === 'random' ? possibleCalls(drill.plan.targets) : [];
  // A script, or a random plan with the seed its calls were drawn with, fixes every call in order.
  const fixed = drill.plan.mode === 'scripted' ? drill.plan.calls : body.seed !== null ? planCalls(drill.plan, seededRandom(body.seed)) : undefined;
  body.calls.forEach((record, i) => {
    const expected = fixed?.[i];
    const isAllowed = fixed ? expected !== undefined && sameCall(expected, record.call) : allowed.some((c) => sameCall(c, record.call));
    if (!isAllowed) issues.push({ path: `calls.${i}.call`, message: fixed ? 'This is not the call the drill made here' : 'This call is not one the drill makes' });
    const previous = body.calls[i - 1];
    if (previous && record.shownAtMs < previous.shownAtMs) issues.push({ path: `calls.${i}.shownAtMs`, message: 'Calls must be in the order they were shown' });
  });
  return issues.slice(0, 20);
}

export function createDrillsService({ store, now }: DrillsServiceDeps) {
  const bestsOf = async (teamId: string, query: Pick<DrillResultQuery, 'drillId' | 'operatorId'>): Promise<PersonalBestEntry[]> => {
    const results = await store.listResults(teamId, { ...query, isComplete: true });
    const names = new Map<string, { operator: string; drill: string }>();
    const runs: RunSummary[] = results.flatMap((r) => {
      if (!r.operator.id) return [];
      names.set(`${r.operator.id}\u0000${r.drillId ?? ''}`, { operator: r.operator.name, drill: r.drillName });
      return [{ id: r.id, operatorId: r.operator.id, drillId: r.drillId, finishedAt: r.startedAt, stats: r.stats }];
    });
    return personalBests(runs).map(({ operatorId, ...best }) => {
      const named = names.get(`${operatorId}\u0000${best.drillId ?? ''}`)!;
      return { ...best, operator: { id: operatorId, name: named.operator }, drillName: named.drill };
    });
  };

  return {
    list: (actor: Actor): Promise<Drill[]> => store.list(actor.team.id),

    async get(actor: Actor, id: string): Promise<Drill> {
      const drill = await store.find(actor.team.id, id);
      if (!drill) throw notFound('That drill');
      return drill;
    },

    create: (actor: Actor, body: DrillBody): Promise<Drill> =>
      store.insert({ teamId: actor.team.id, ...body, createdById: actor.user.id, createdByName: actor.user.name }),

    async update(actor: Actor, id: string, body: DrillBody): Promise<Drill> {
      const drill = await store.update(actor.team.id, id, body, now());
      if (!drill) throw notFound('That drill');
      return drill;
    },

    /** Deletes the drill; its results stay, under the drill's name. */
    async remove(actor: Actor, id: string): Promise<void> {
      if (!(await store.remove(actor.team.id, id))) throw notFound('That drill');
    },

    /** Scores a run with the drill's pace and stores it with its calls in one transaction. */
    async submitResult(actor: Actor, body: DrillResultBody): Promise<SubmittedDrillResult> {
      return store.transaction(async (repo) => {
        const drill = await repo.find(actor.team.id, body.drillId, true);
        if (!drill) throw notFound('That drill');
        const issues = resultIssues(drill, body);
        if (issues.length) throw new AppError('validation_failed', 'The result does not match the drill', issues);
        const scored = scoreRun(body.calls, callWindowMs(drill.pace));
        const stats = runStats(scored);
        const isComplete = body.calls.length === planCallCount(drill.plan);
        const [previous] = personalBests(
          (await repo.listResults(actor.team.id, { drillId: drill.id, operatorId: actor.user.id, isComplete: true })).map((r) => ({
            id: r.id,
            operatorId: actor.user.id,
            drillId: r.drillId,
            finishedAt: r.startedAt,
            stats: r.stats,
          })),
        );
        const calls = scored.map((c, i) => ({ ...c, taps: body.calls[i]!.taps }));
        const stored = await repo.insertResult({
          teamId: actor.team.id,
          drillId: drill.id,
          drillName: drill.name,
          operatorId: actor.user.id,
          operatorName: actor.user.name,
          operatorRole: actor.role,
          mode: body.mode,
          coachName: body.coachName,
          isSimulatorDriven: body.isSimulatorDriven,
          isComplete,
          seed: body.seed,
          startedAt: new Date(body.startedAt),
          finishedAt: now(),
          stats,
          calls,
        });
        return { ...stored, calls, newBests: isComplete ? newBests(previous, stats) : { median: false, fastest: false, accuracy: false } };
      });
    },

    listResults: (actor: Actor, query: DrillResultQuery): Promise<DrillResult[]> => store.listResults(actor.team.id, query),

    async getResult(actor: Actor, resultId: string): Promise<DrillResultDetail> {
      const result = await store.findResult(actor.team.id, resultId);
      if (!result) throw notFound('That result');
      return result;
    },

    /** Personal bests per operator and drill, from complete runs only. */
    bests: (actor: Actor, query: Pick<DrillResultQuery, 'drillId' | 'operatorId'>): Promise<PersonalBestEntry[]> => bestsOf(actor.team.id, query),
  };
}

export type DrillsService = ReturnType<typeof createDrillsService>;

export const drillsServiceFor = (db: Db, now: () => Date = () => new Date()): DrillsService =>
  createDrillsService({ store: drillsStore(db), now });
