import { and, asc, count, desc, eq, inArray, type SQL } from 'drizzle-orm';
import type { DrillPace, DrillPlan } from '../../../shared/domain/drills/drill-plan';
import type { DrillRunStats, ScoredCall } from '../../../shared/domain/drills/drill-scoring';
import type { DrillTap } from '../../../shared/domain/drills/drill-scoring';
import type { Role } from '../../../shared/domain/roles';
import type { Drill, DrillResult, DrillResultDetail, DrillRunMode } from '../../../shared/schemas/drill';
import type { Db } from '../../db/client';
import type { Executor } from '../../db/executor';
import { drillResultCalls, drillResults, drills } from '../../db/schema/index';

type DrillRow = typeof drills.$inferSelect;
type ResultRow = typeof drillResults.$inferSelect;

function toDrill(row: DrillRow, resultCount: number): Drill {
  return {
    id: row.id,
    name: row.name,
    plan: row.plan,
    pace: row.pace,
    createdBy: { id: row.createdById, name: row.createdByName },
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    resultCount,
  };
}

function toResult(row: ResultRow): DrillResult {
  return {
    id: row.id,
    drillId: row.drillId,
    drillName: row.drillName,
    operator: { id: row.operatorId, name: row.operatorName, role: row.operatorRole },
    mode: row.mode as DrillRunMode,
    coachName: row.coachName,
    isSimulatorDriven: row.isSimulatorDriven,
    isComplete: row.isComplete,
    startedAt: row.startedAt.toISOString(),
    finishedAt: row.finishedAt.toISOString(),
    stats: {
      callCount: row.callCount,
      answeredCount: row.answeredCount,
      missCount: row.missCount,
      errorCount: row.errorCount,
      cleanCount: row.cleanCount,
      accuracy: row.accuracy,
      medianMs: row.medianMs,
      p90Ms: row.p90Ms,
      meanMs: row.meanMs,
      fastestMs: row.fastestMs,
    },
  };
}

export interface NewDrill {
  teamId: string;
  name: string;
  plan: DrillPlan;
  pace: DrillPace;
  createdById: string;
  createdByName: string;
}

export interface NewDrillResult {
  teamId: string;
  drillId: string;
  drillName: string;
  operatorId: string;
  operatorName: string;
  operatorRole: Role;
  mode: DrillRunMode;
  coachName: string | null;
  isSimulatorDriven: boolean;
  isComplete: boolean;
  seed: number | null;
  startedAt: Date;
  finishedAt: Date;
  stats: DrillRunStats;
  calls: (ScoredCall & { taps: DrillTap[] })[];
}

export interface ResultFilter {
  drillId?: string;
  operatorId?: string;
  isComplete?: boolean;
  limit?: number;
}

export function drillsRepo(db: Executor) {
  const resultCounts = async (teamId: string, ids: string[]): Promise<Map<string, number>> => {
    if (ids.length === 0) return new Map();
    const rows = await db
      .select({ drillId: drillResults.drillId, n: count() })
      .from(drillResults)
      .where(and(eq(drillResults.teamId, teamId), inArray(drillResults.drillId, ids)))
      .groupBy(drillResults.drillId);
    return new Map(rows.map((r) => [r.drillId!, r.n]));
  };

  return {
    async list(teamId: string): Promise<Drill[]> {
      const rows = await db.select().from(drills).where(eq(drills.teamId, teamId)).orderBy(asc(drills.name), asc(drills.createdAt));
      const counts = await resultCounts(teamId, rows.map((r) => r.id));
      return rows.map((r) => toDrill(r, counts.get(r.id) ?? 0));
    },

    /** The team's drill, or undefined for an unknown id or another team's drill; `lock` holds it until commit. */
    async find(teamId: string, id: string, lock = false): Promise<Drill | undefined> {
      const query = db.select().from(drills).where(and(eq(drills.teamId, teamId), eq(drills.id, id)));
      const [row] = lock ? await query.for('update') : await query;
      if (!row) return undefined;
      const counts = await resultCounts(teamId, [row.id]);
      return toDrill(row, counts.get(row.id) ?? 0);
    },

    async insert(drill: NewDrill): Promise<Drill> {
      const [row] = await db.insert(drills).values(drill).returning();
      return toDrill(row!, 0);
    },

    async update(teamId: string, id: string, patch: Pick<NewDrill, 'name' | 'plan' | 'pace'>, now: Date): Promise<Drill | undefined> {
      const [row] = await db
        .update(drills)
        .set({ ...patch, updatedAt: now })
        .where(and(eq(drills.teamId, teamId), eq(drills.id, id)))
        .returning();
      if (!row) return undefined;
      const counts = await resultCounts(teamId, [row.id]);
      return toDrill(row, counts.get(row.id) ?? 0);
    },

    async remove(teamId: string, id: string): Promise<boolean> {
      const rows = await db.delete(drills).where(and(eq(drills.teamId, teamId), eq(drills.id, id))).returning({ id: drills.id });
      return rows.length > 0;
    },

    /** Writes the result row and its calls; run inside a transaction. */
    async insertResult(result: NewDrillResult): Promise<DrillResult> {
      const { stats, calls, ...rest } = result;
      const [row] = await db
        .insert(drillResults)
        .values({ ...rest, ...stats })
        .returning();
      await db.insert(drillResultCalls).values(
        calls.map((c, index) => ({
          resultId: row!.id,
          index,
          call: c.call,
          shownAtMs: c.shownAtMs,
          reactionMs: c.reactionMs,
          errors: c.errors,
          isMiss: c.isMiss,
          taps: c.taps,
        })),
      );
      return toResult(row!);
    },

    /** The newest `limit` results matching the filter, returned oldest first. */
    async listResults(teamId: string, filter: ResultFilter): Promise<DrillResult[]> {
      const where: SQL[] = [eq(drillResults.teamId, teamId)];
      if (filter.drillId) where.push(eq(drillResults.drillId, filter.drillId));
      if (filter.operatorId) where.push(eq(drillResults.operatorId, filter.operatorId));
      if (filter.isComplete !== undefined) where.push(eq(drillResults.isComplete, filter.isComplete));
      const query = db
        .select()
        .from(drillResults)
        .where(and(...where))
        .orderBy(desc(drillResults.startedAt), desc(drillResults.id));
      const rows = filter.limit ? await query.limit(filter.limit) : await query;
      return rows.reverse().map(toResult);
    },

    async findResult(teamId: string, resultId: string): Promise<DrillResultDetail | undefined> {
      const [row] = await db.select().from(drillResults).where(and(eq(drillResults.teamId, teamId), eq(drillResults.id, resultId)));
      if (!row) return undefined;
      const calls = await db.select().from(drillResultCalls).where(eq(drillResultCalls.resultId, row.id)).orderBy(asc(drillResultCalls.index));
      return {
        ...toResult(row),
        calls: calls.map((c) => ({ call: c.call, shownAtMs: c.shownAtMs, reactionMs: c.reactionMs, errors: c.errors, isMiss: c.isMiss, taps: c.taps })),
      };
    },

    /** Whether any result of the team exists (the demo seed runs once). */
    async hasResults(teamId: string): Promise<boolean> {
      const [row] = await db.select({ n: count() }).from(drillResults).where(eq(drillResults.teamId, teamId));
      return (row?.n ?? 0) > 0;
    },
  };
}
export type DrillsRepo = ReturnType<typeof drillsRepo>;

export function drillsStore(db: Db) {
  return {
    ...drillsRepo(db),
    transaction: <T>(fn: (repo: DrillsRepo) => Promise<T>): Promise<T> => db.transaction((tx) => fn(drillsRepo(tx))),
  };
}
export type DrillsStore = ReturnType<typeof drillsStore>;
