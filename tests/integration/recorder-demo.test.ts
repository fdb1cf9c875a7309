// The demo seed's simulated matches of the Lakeshore District Event, stored once however often it runs.
import { eq } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { recordings } from '../../server/db/schema/index';
import { authStore } from '../../server/features/auth/auth.repo';
import { DEMO_EVENT, DEMO_MATCHES, seedDemoRecordings } from '../../server/features/demo/demo-recordings';
import { DEMO_TEAM } from '../../server/features/demo/demo-team';
import { seedDemo } from '../../server/features/demo/seed';
import { recordingsStore } from '../../server/features/recordings/recordings.repo';
import { createRecordingsService } from '../../server/features/recordings/recordings.service';
import { createTestDatabase, type TestDatabase } from '../support/test-db';

let db: TestDatabase;

beforeAll(async () => {
  db = await createTestDatabase();
  await seedDemo(db.db);
});
afterAll(async () => {
  await db?.drop();
});

describe('seedDemoRecordings', () => {
  it('stores each demo match once as a finished simulated recording with its match details', async () => {
    const t0 = performance.now();
    expect(await seedDemoRecordings(db.db)).toEqual({ created: DEMO_MATCHES.length });
    const firstMs = performance.now() - t0;
    const t1 = performance.now();
    expect(await seedDemoRecordings(db.db)).toEqual({ created: 0 });
    const againMs = performance.now() - t1;
    console.info(`demo seed: ${DEMO_MATCHES.length} matches in ${Math.round(firstMs)} ms, again in ${Math.round(againMs)} ms`);

    const teamId = (await authStore(db.db).findTeamByNumber(DEMO_TEAM.number))!.id;
    const rows = await db.db.select().from(recordings).where(eq(recordings.teamId, teamId));
    expect(rows).toHaveLength(DEMO_MATCHES.length);
    expect(new Set(rows.map((r) => r.matchNumber))).toEqual(new Set(DEMO_MATCHES.map((m) => m.matchNumber)));
    for (const r of rows) {
      expect(r).toMatchObject({ kind: 'simulated', source: 'simulator', status: 'finished', event: DEMO_EVENT, matchType: 'qualification', operatorName: 'Tomas Reyes' });
      expect(r.durationMs).toBeGreaterThan(150_000);
    }
    expect(new Set(rows.map((r) => r.alliance))).toEqual(new Set(['red', 'blue']));
    expect(new Set(rows.map((r) => r.station))).toEqual(new Set([1, 2, 3]));

    const service = createRecordingsService({ store: recordingsStore(db.db), now: () => new Date() });
    const events = await service.listEvents(teamId, rows[0]!.id);
    expect(events.some((e) => e.kind === 'selection')).toBe(true);
    expect(events.some((e) => e.kind === 'placed')).toBe(true);
    const samples = await service.readSamples(teamId, rows[0]!.id, (await service.listSignals(teamId, rows[0]!.id))[0]!.name);
    expect(samples.values.length).toBeGreaterThan(7000);
  });
});
