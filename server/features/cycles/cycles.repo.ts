import { and, asc, eq, gte, isNotNull, isNull, lt, ne, or, type SQL } from 'drizzle-orm';
import {
  cycleSchema,
  reviewCycleSchema,
  type Cycle,
  type MatchSummary,
  type ReviewCycle,
  type ReviewFilters,
} from '../../../shared/schemas/cycle';
import type { ReviewRecording } from '../../../shared/domain/cycles/review';
import type { Db } from '../../db/client';
import type { Executor } from '../../db/executor';
import { recordingCycles, recordingCycleSummaries, recordings } from '../../db/schema/index';

type CycleRow = typeof recordingCycles.$inferSelect;

export interface StoredCycles {
  analysisVersion: number;
  computedAt: Date;
  cycles: Cycle[];
  summary: MatchSummary;
}

function toRow(recordingId: string, teamId: string, c: Cycle): typeof recordingCycles.$inferInsert {
  return {
    recordingId,
    teamId,
    index: c.index,
    piece: c.piece,
    phase: c.phase,
    crossesPhase: c.crossesPhase,
    isPreload: c.isPreload,
    startS: c.startS,
    acquiredS: c.acquiredS,
    alignStartS: c.alignStartS,
    placeStartS: c.placeStartS,
    endS: c.endS,
    durationS: c.durationS,
    acquireS: c.segments.acquireS,
    travelS: c.segments.travelS,
    alignS: c.segments.alignS,
    placeS: c.segments.placeS,
    calledBranch: c.called.branch,
    calledLevel: c.called.level,
    calledAlgae: c.called.algae,
    calledAtS: c.calledAtS,
    reachedBranch: c.reached.branch,
    reachedLevel: c.reached.level,
    reachedAlgae: c.reached.algae,
    isOnTarget: c.isOnTarget,
    level: c.level,
    face: c.face,
    station: c.station,
    outcome: c.outcome,
    endedBy: c.endedBy,
    points: c.points,
    callToPlaceS: c.callToPlaceS,
  };
}

/** A stored row back as the contract's cycle; the parse catches a row the contract no longer allows. */
function toCycle(r: CycleRow): Cycle {
  return cycleSchema.parse({
    index: r.index,
    piece: r.piece,
    phase: r.phase,
    crossesPhase: r.crossesPhase,
    isPreload: r.isPreload,
    startS: r.startS,
    acquiredS: r.acquiredS,
    alignStartS: r.alignStartS,
    placeStartS: r.placeStartS,
    endS: r.endS,
    durationS: r.durationS,
    segments: { acquireS: r.acquireS, travelS: r.travelS, alignS: r.alignS, placeS: r.placeS },
    called: { branch: r.calledBranch, level: r.calledLevel, algae: r.calledAlgae },
    calledAtS: r.calledAtS,
    reached: { branch: r.reachedBranch, level: r.reachedLevel, algae: r.reachedAlgae },
    isOnTarget: r.isOnTarget,
    level: r.level,
    face: r.face,
    station: r.station,
    outcome: r.outcome,
    endedBy: r.endedBy,
    points: r.points,
    callToPlaceS: r.callToPlaceS,
  });
}

const DAY_MS = 86_400_000;

/** The review's filters over recordings: exact event, kind and operator; from/to are whole UTC days, both included. */
function reviewFilter(teamId: string, f: ReviewFilters): SQL | undefined {
  return and(
    eq(recordings.teamId, teamId),
    f.event ? eq(recordings.event, f.event) : undefined,
    f.kind ? eq(recordings.kind, f.kind) : undefined,
    f.operator ? eq(recordings.operatorName, f.operator) : undefined,
    f.from ? gte(recordings.startedAt, new Date(`${f.from}T00:00:00Z`)) : undefined,
    f.to ? lt(recordings.startedAt, new Date(Date.parse(`${f.to}T00:00:00Z`) + DAY_MS)) : undefined,
  );
}

export function cyclesRepo(db: Executor) {
  return {
    /** The team's recording; with `lock`, held until the transaction ends, so two analyses of it store one after the other. */
    async findRecording(teamId: string, recordingId: string, lock = false) {
      const query = db
        .select({ id: recordings.id, status: recordings.status })
        .from(recordings)
        .where(and(eq(recordings.teamId, teamId), eq(recordings.id, recordingId)));
      const [row] = lock ? await query.for('update') : await query;
      return row;
    },

    /** Replaces a recording's cycles and summary (call inside a transaction). */
    async replace(recordingId: string, teamId: string, stored: StoredCycles): Promise<void> {
      await db.delete(recordingCycles).where(eq(recordingCycles.recordingId, recordingId));
      await db.delete(recordingCycleSummaries).where(eq(recordingCycleSummaries.recordingId, recordingId));
      if (stored.cycles.length > 0) await db.insert(recordingCycles).values(stored.cycles.map((c) => toRow(recordingId, teamId, c)));
      await db.insert(recordingCycleSummaries).values({
        recordingId,
        teamId,
        analysisVersion: stored.analysisVersion,
        computedAt: stored.computedAt,
        cycleCount: stored.cycles.length,
        totalPoints: stored.summary.points.total,
        summary: stored.summary,
      });
    },

    async find(recordingId: string): Promise<StoredCycles | undefined> {
      const [summary] = await db.select().from(recordingCycleSummaries).where(eq(recordingCycleSummaries.recordingId, recordingId));
      if (!summary) return undefined;
      const rows = await db.select().from(recordingCycles).where(eq(recordingCycles.recordingId, recordingId)).orderBy(asc(recordingCycles.index));
      return { analysisVersion: summary.analysisVersion, computedAt: summary.computedAt, cycles: rows.map(toCycle), summary: summary.summary };
    },

    /** The team's finished recordings whose cycles are missing or from another analysis version. */
    async listUnanalysed(teamId: string, version: number): Promise<string[]> {
      const rows = await db
        .select({ id: recordings.id })
        .from(recordings)
        .leftJoin(recordingCycleSummaries, eq(recordingCycleSummaries.recordingId, recordings.id))
        .where(
          and(
            eq(recordings.teamId, teamId),
            eq(recordings.status, 'finished'),
            or(isNull(recordingCycleSummaries.recordingId), ne(recordingCycleSummaries.analysisVersion, version)),
          ),
        )
        .orderBy(asc(recordings.startedAt));
      return rows.map((r) => r.id);
    },

    /** The analysed recordings the filters select, with their labels and total points. */
    async reviewRecordings(teamId: string, filters: ReviewFilters): Promise<ReviewRecording[]> {
      const rows = await db
        .select({
          recordingId: recordings.id,
          startedAt: recordings.startedAt,
          event: recordings.event,
          matchType: recordings.matchType,
          matchNumber: recordings.matchNumber,
          operatorName: recordings.operatorName,
          totalPoints: recordingCycleSummaries.totalPoints,
        })
        .from(recordingCycleSummaries)
        .innerJoin(recordings, eq(recordings.id, recordingCycleSummaries.recordingId))
        .where(reviewFilter(teamId, filters));
      return rows.map((r) => ({ ...r, startedAt: r.startedAt.toISOString() }));
    },

    /** The cycles of the recordings the filters select, oldest recording first, in cycle order. */
    async reviewCycles(teamId: string, filters: ReviewFilters): Promise<ReviewCycle[]> {
      const rows = await db
        .select({
          recordingId: recordingCycles.recordingId,
          recordingStartedAt: recordings.startedAt,
          event: recordings.event,
          matchType: recordings.matchType,
          matchNumber: recordings.matchNumber,
          operatorName: recordings.operatorName,
          index: recordingCycles.index,
          piece: recordingCycles.piece,
          phase: recordingCycles.phase,
          startS: recordingCycles.startS,
          durationS: recordingCycles.durationS,
          level: recordingCycles.level,
          face: recordingCycles.face,
          station: recordingCycles.station,
          outcome: recordingCycles.outcome,
          points: recordingCycles.points,
          callToPlaceS: recordingCycles.callToPlaceS,
        })
        .from(recordingCycles)
        .innerJoin(recordings, eq(recordings.id, recordingCycles.recordingId))
        .where(and(eq(recordingCycles.teamId, teamId), reviewFilter(teamId, filters)))
        .orderBy(asc(recordings.startedAt), asc(recordingCycles.recordingId), asc(recordingCycles.index));
      return rows.map((r) => reviewCycleSchema.parse({ ...r, recordingStartedAt: r.recordingStartedAt.toISOString() }));
    },

    /** Events and operators named on the team's analysed recordings, for the filter choices. */
    async reviewOptions(teamId: string): Promise<{ events: string[]; operators: string[] }> {
      const namesIn = async (column: typeof recordings.event | typeof recordings.operatorName) => {
        const rows = await db
          .selectDistinct({ value: column })
          .from(recordingCycleSummaries)
          .innerJoin(recordings, eq(recordings.id, recordingCycleSummaries.recordingId))
          .where(and(eq(recordings.teamId, teamId), isNotNull(column)))
          .orderBy(asc(column));
        return rows.flatMap((r) => (r.value === null ? [] : [r.value]));
      };
      const [events, operators] = await Promise.all([namesIn(recordings.event), namesIn(recordings.operatorName)]);
      return { events, operators };
    },
  };
}
export type CyclesRepo = ReturnType<typeof cyclesRepo>;

export function cyclesStore(db: Db) {
  return {
    ...cyclesRepo(db),
    transaction: <T>(fn: (repo: CyclesRepo) => Promise<T>): Promise<T> => db.transaction((tx) => fn(cyclesRepo(tx))),
  };
}
export type CyclesStore = ReturnType<typeof cyclesStore>;

