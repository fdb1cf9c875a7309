import { analyzeCycles, CYCLE_ANALYSIS_VERSION, type CycleEvent, type SpeedTrace } from '../../../shared/domain/cycles/analyze';
import { cyclesCsv, reviewCycles } from '../../../shared/domain/cycles/review';
import { matchSummary } from '../../../shared/domain/cycles/summary';
import { season2025 } from '../../../shared/domain/season/season-2025';
import type { SeasonProfile } from '../../../shared/domain/season/season-profile';
import type { CycleReview, RecordingCycles, ReviewFilters } from '../../../shared/schemas/cycle';
import type { Db } from '../../db/client';
import { notFound } from '../../lib/errors';
import type { Logger } from '../../lib/logger';
import type { Actor } from '../auth/actor';
import { sliceSamples } from '../recordings/chunks';
import { recordingsStore, type RecordingRow, type RecordingsStore } from '../recordings/recordings.repo';
import { cyclesStore, type CyclesStore, type StoredCycles } from './cycles.repo';

/** The drive-speed signal that splits travel from align and place (m/s). */
export const SPEED_SIGNAL = 'drive/speed';

export interface CyclesServiceDeps {
  store: CyclesStore;
  /** Read-only use: the recording, its events and the drive-speed samples. */
  recordings: RecordingsStore;
  now: () => Date;
  season?: SeasonProfile;
}

export function createCyclesService({ store, recordings, now, season = season2025 }: CyclesServiceDeps) {
  /** Runs the analysis over a recording as stored now. */
  async function analyse(row: RecordingRow): Promise<StoredCycles> {
    const stored = await recordings.listEvents(row.id);
    // Relay selections carry seqs from 1e9 up, so time (then seq) gives the order things happened in.
    const events: CycleEvent[] = [...stored]
      .sort((a, b) => a.tMs - b.tMs || a.seq - b.seq)
      .map((e) => ({ tS: (e.tMs - row.originTMs) / 1000, kind: e.kind, data: e.data }));
    const signal = (await recordings.listSignals(row.id)).find((s) => s.name === SPEED_SIGNAL && s.type === 'number');
    let speed: SpeedTrace | undefined;
    if (signal) speed = sliceSamples(await recordings.readChunks(row.id, signal.index), row.originTMs);
    const cycles = analyzeCycles(season, { events, durationS: row.durationMs / 1000, speed });
    return { analysisVersion: CYCLE_ANALYSIS_VERSION, computedAt: now(), cycles, summary: matchSummary(season, events, cycles) };
  }

  async function recordingOrThrow(teamId: string, recordingId: string): Promise<RecordingRow> {
    const row = await recordings.find(teamId, recordingId);
    if (!row) throw notFound('That recording');
    return row;
  }

  /** Computes and stores a finished recording's cycles, replacing any from before. */
  async function computeAndStore(teamId: string, recordingId: string): Promise<StoredCycles> {
    const row = await recordingOrThrow(teamId, recordingId);
    const result = await analyse(row);
    await store.transaction(async (repo) => {
      // The recording may have been deleted meanwhile; then there is nothing to store under it.
      if (await repo.findRecording(teamId, recordingId, true)) await repo.replace(recordingId, teamId, result);
    });
    return result;
  }

  /** Stores cycles for the team's finished recordings that have none at the current analysis version. */
  async function backfill(teamId: string): Promise<number> {
    const ids = await store.listUnanalysed(teamId, CYCLE_ANALYSIS_VERSION);
    for (const id of ids) await computeAndStore(teamId, id);
    return ids.length;
  }

  async function reviewData(actor: Actor, filters: ReviewFilters) {
    await backfill(actor.team.id);
    const [recordingRows, cycles, options] = await Promise.all([
      store.reviewRecordings(actor.team.id, filters),
      store.reviewCycles(actor.team.id, filters),
      store.reviewOptions(actor.team.id),
    ]);
    return { recordingRows, cycles, options };
  }

  return {
    computeAndStore,
    backfill,

    /**
     * A recording's cycles and match summary. A finished recording's come from storage (computed now when missing or
     * from an older analysis); one still being recorded is analysed as it stands and not stored.
     */
    async forRecording(actor: Actor, recordingId: string): Promise<RecordingCycles> {
      const row = await recordingOrThrow(actor.team.id, recordingId);
      let result = row.status === 'finished' ? await store.find(recordingId) : undefined;
      if (!result || result.analysisVersion !== CYCLE_ANALYSIS_VERSION) {
        result = row.status === 'finished' ? await computeAndStore(actor.team.id, recordingId) : await analyse(row);
      }
      return { recordingId, analysisVersion: result.analysisVersion, computedAt: result.computedAt.toISOString(), cycles: result.cycles, summary: result.summary };
    },

    async review(actor: Actor, filters: ReviewFilters): Promise<CycleReview> {
      const { recordingRows, cycles, options } = await reviewData(actor, filters);
      return reviewCycles(recordingRows, cycles, options);
    },

    /** Every cycle the filters select, as CSV. */
    async reviewCsv(actor: Actor, filters: ReviewFilters): Promise<string> {
      const { cycles } = await reviewData(actor, filters);
      return cyclesCsv(cycles);
    },
  };
}

export type CyclesService = ReturnType<typeof createCyclesService>;

/** The service over the database, as the app and the seed use it. */
export const cyclesServiceFor = (db: Db, now: () => Date = () => new Date()): CyclesService =>
  createCyclesService({ store: cyclesStore(db), recordings: recordingsStore(db), now });

/**
 * What the recordings service calls once a recording is finished: store its cycles. With a logger, a failing analysis
 * is logged and the recording still finishes (the review stores the cycles later); without one it throws.
 */
export const storeCyclesOnFinish =
  (db: Db, options: { now?: () => Date; logger?: Logger } = {}) =>
  async (teamId: string, recordingId: string): Promise<void> => {
    try {
      await cyclesServiceFor(db, options.now).computeAndStore(teamId, recordingId);
    } catch (error) {
      if (!options.logger) throw error;
      options.logger.error({ err: error, recordingId }, 'cycle analysis failed; the review will retry it');
    }
  };
