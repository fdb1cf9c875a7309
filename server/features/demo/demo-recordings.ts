// The demo team's qualification matches at the invented Lakeshore District Event, played by the headless
// simulator and stored through the recordings service, so a first start has recordings to replay.
import { DEFAULT_ROBOT_PROFILE } from '../../../shared/domain/robot-profile';
import type { Alliance, DriverStation } from '../../../shared/domain/season/season-profile';
import { season2025 } from '../../../shared/domain/season/season-2025';
import type { RobotEvent, TelemetryBatch } from '../../../shared/protocol/messages';
import { runHeadlessMatch } from '../../../simulator/src/headless';
import { headlessMatchRecords } from '../../../simulator/src/match-file';
import type { Db } from '../../db/client';
import { authStore } from '../auth/auth.repo';
import { recorderRepo } from '../recorder/recorder.repo';
import { recordingsStore } from '../recordings/recordings.repo';
import { createRecordingsService } from '../recordings/recordings.service';
import { storeCyclesOnFinish } from '../cycles/cycles.service';
import { DEMO_MEMBERS, DEMO_TEAM } from './demo-team';

export const DEMO_EVENT = 'Lakeshore District Event';

export interface DemoMatch {
  matchNumber: number;
  alliance: Alliance;
  station: DriverStation;
  seed: number;
  /** When auto started. */
  startedAt: Date;
}

const ALLIANCES: Alliance[] = ['blue', 'red', 'red', 'blue', 'red', 'blue', 'blue', 'red', 'blue', 'red', 'red', 'blue'];
const STATIONS: DriverStation[] = [2, 1, 3, 3, 2, 1, 2, 3, 1, 1, 2, 3];

/** Twelve qualification matches over two days (Friday 14 and Saturday 15 March 2025), about an hour apart. */
export const DEMO_MATCHES: readonly DemoMatch[] = ALLIANCES.map((alliance, i) => {
  const day = i < 6 ? '2025-03-14' : '2025-03-15';
  const slot = i % 6;
  const minutes = 9 * 60 + 40 + slot * 58 + (i % 3) * 7;
  const hh = String(Math.floor(minutes / 60)).padStart(2, '0');
  const mm = String(minutes % 60).padStart(2, '0');
  return { matchNumber: i + 1, alliance, station: STATIONS[i]!, seed: 1985 + i * 17, startedAt: new Date(`${day}T${hh}:${mm}:00-05:00`) };
});

const OPERATOR = DEMO_MEMBERS.find((m) => m.role === 'operator')!.name;
const streamKey = (m: DemoMatch) => `demo:lakeshore:qm${String(m.matchNumber).padStart(2, '0')}`;

/**
 * Adds whichever demo matches are missing (or were left unfinished), each as one simulated recording; running it
 * again changes nothing. Needs the demo team (seedDemo first).
 */
export async function seedDemoRecordings(db: Db, matches: readonly DemoMatch[] = DEMO_MATCHES): Promise<{ created: number }> {
  const team = await authStore(db).findTeamByNumber(DEMO_TEAM.number);
  if (!team) throw new Error('the demo team is missing: seed it first');
  let clock = new Date();
  const recordings = createRecordingsService({ store: recordingsStore(db), now: () => clock, onFinished: storeCyclesOnFinish(db) });
  const extra = recorderRepo(db);
  let created = 0;
  for (const m of matches) {
    if ((await recordings.findByStream(team.id, streamKey(m)))?.status === 'finished') continue;
    const match = runHeadlessMatch({ seed: m.seed, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: m.alliance, station: m.station });
    const messages = headlessMatchRecords(match).filter((r): r is TelemetryBatch | RobotEvent => r.type === 'telemetry_batch' || r.type === 'event');
    clock = m.startedAt;
    const { recordingId } = await recordings.ingest(
      { teamId: team.id, robot: DEMO_TEAM.robot, robotKeyId: undefined, streamId: streamKey(m), signals: match.signals, kind: 'simulated', source: 'simulator' },
      messages,
    );
    // Selections before a crash of an earlier seed run may be stored already: only a fresh recording gets them.
    if ((await recordings.listEvents(team.id, recordingId)).every((e) => e.kind !== 'selection')) {
      await extra.insertRelayEvents(
        recordingId,
        match.selections.map((s) => ({ tMs: s.tMs, kind: 'selection' as const, data: { channel: s.channel, value: s.value, by: { name: OPERATOR, role: 'operator' } } })),
      );
    }
    await extra.updateMatchDetails(recordingId, {
      event: DEMO_EVENT,
      matchType: 'qualification',
      matchNumber: m.matchNumber,
      alliance: m.alliance,
      station: m.station,
      operatorName: OPERATOR,
    });
    const row = await recordings.get(team.id, recordingId);
    clock = new Date(m.startedAt.getTime() + row.durationMs);
    await recordings.finish(team.id, recordingId);
    created += 1;
  }
  return { created };
}
