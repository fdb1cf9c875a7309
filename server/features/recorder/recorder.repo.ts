import { and, desc, eq, inArray, sql } from 'drizzle-orm';
import type { ChannelValue } from '../../../shared/protocol/messages';
import type { Executor } from '../../db/executor';
import { recordingEvents, recordings, recordingStreamSeqs } from '../../db/schema/index';
import { RELAY_EVENT_SEQ_BASE } from '../recordings/recording-files';

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

    /** Live recordings still being made, as a server that stopped mid-match left them, with their newest stored seq. */
    async listUnfinishedLive(): Promise<UnfinishedRecording[]> {
      const rows = await db
        .select({
          id: recordings.id,
          teamId: recordings.teamId,
          robot: recordings.robot,
          streamKey: recordings.streamId,
          kind: recordings.kind,
          maxSeq: sql<number | null>`(select max(${recordingStreamSeqs.seq}) from ${recordingStreamSeqs} where ${recordingStreamSeqs.recordingId} = ${recordings.id})`,
          lastMode: sql<string | null>`(select ${recordingEvents.data}->>'to' from ${recordingEvents}
            where ${recordingEvents.recordingId} = ${recordings.id} and ${recordingEvents.kind} = 'mode_changed'
            order by ${recordingEvents.seq} desc limit 1)`,
          sawTeleop: sql<boolean>`exists(select 1 from ${recordingEvents} where ${recordingEvents.recordingId} = ${recordings.id}
            and ${recordingEvents.kind} = 'mode_changed' and ${recordingEvents.data}->>'to' = 'teleop')`,
        })
        .from(recordings)
        .where(and(eq(recordings.status, 'recording'), eq(recordings.source, 'live')));
      return rows.flatMap((r) => (r.streamKey ? [{ ...r, streamKey: r.streamKey, maxSeq: r.maxSeq === null ? null : Number(r.maxSeq) }] : []));
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

export interface UnfinishedRecording {
  id: string;
  teamId: string;
  robot: string;
  /** `<streamId>:<fromSeq>`, as the recorder keyed it. */
  streamKey: string;
  kind: typeof recordings.$inferSelect.kind;
  maxSeq: number | null;
  /** The mode of the newest stored `mode_changed` event, if any. */
  lastMode: string | null;
  sawTeleop: boolean;
}
