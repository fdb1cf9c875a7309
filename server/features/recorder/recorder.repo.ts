import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import type { ChannelValue } from '../../../shared/protocol/messages';
import type { Executor } from '../../db/executor';
import { recordingEvents, recordings } from '../../db/schema/index';

/**
 * Events the relay adds itself (operator selections, robot acks) have no robot seq: they are numbered from
 * here up, per recording, so they never meet the robot's seqs (which count from 0 within a stream).
 */
export const RELAY_EVENT_SEQ_BASE = 1_000_000_000;

export interface RelayEvent {
  /** Robot time, like the robot's own events. */
  tMs: number;
  kind: 'selection' | 'ack';
  data: Record<string, ChannelValue>;
}

export type MatchDetails = Partial<
  Pick<typeof recordings.$inferInsert, 'event' | 'matchType' | 'matchNumber' | 'alliance' | 'station' | 'operatorName' | 'tags'>
>;

export function recorderRepo(db: Executor) {
  return {
    /** Inserts relay events numbered after the recording's last one at or above RELAY_EVENT_SEQ_BASE. */
    async insertRelayEvents(recordingId: string, events: readonly RelayEvent[]): Promise<void> {
      if (events.length === 0) return;
      await db.execute(sql`
        insert into ${recordingEvents} (recording_id, seq, t_ms, kind, data)
        select ${recordingId}::uuid,
               (select coalesce(max(seq), ${RELAY_EVENT_SEQ_BASE - 1}) from ${recordingEvents}
                where recording_id = ${recordingId} and seq >= ${RELAY_EVENT_SEQ_BASE}) + e.n,
               e.t_ms, e.kind, e.data
        from unnest(${sql.param(events.map((e) => e.tMs))}::float8[], ${sql.param(events.map((e) => e.kind))}::text[],
                    ${sql.param(events.map((e) => JSON.stringify(e.data)))}::jsonb[]) with ordinality as e(t_ms, kind, data, n)`);
    },

    /** Deletes the team's finished live simulated recordings beyond the newest `keep`; returns how many. */
    async trimLiveSimulated(teamId: string, keep: number): Promise<number> {
      const rows = await db
        .select({ id: recordings.id })
        .from(recordings)
        .where(and(eq(recordings.teamId, teamId), eq(recordings.kind, 'simulated'), eq(recordings.source, 'live'), eq(recordings.status, 'finished')))
        .orderBy(desc(recordings.startedAt))
        .offset(keep);
      if (rows.length === 0) return 0;
      await db.delete(recordings).where(inArray(recordings.id, rows.map((r) => r.id)));
      return rows.length;
    },

    async updateMatchDetails(recordingId: string, details: MatchDetails): Promise<void> {
      if (Object.keys(details).length === 0) return;
      await db.update(recordings).set(details).where(eq(recordings.id, recordingId));
    },
  };
}

export type RecorderRepo = ReturnType<typeof recorderRepo>;
