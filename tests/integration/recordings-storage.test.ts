import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { teams } from '../../server/db/schema/index';
import { recordingsStore } from '../../server/features/recordings/recordings.repo';
import { createRecordingsService, type RecordingsService } from '../../server/features/recordings/recordings.service';
import { PgTelemetryStore } from '../../server/relay/pg-telemetry-store';
import type { DurableMessage, StreamRef } from '../../server/relay/telemetry-store';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { runHeadlessMatch, type HeadlessMatch } from '../../simulator/src/headless';
import { headlessMatchRecords } from '../../simulator/src/match-file';
import { createTestDatabase, type TestDatabase } from '../support/test-db';

let db: TestDatabase;
let service: RecordingsService;
let store: PgTelemetryStore;
let teamId: string;
let otherTeamId: string;
let match: HeadlessMatch;
let messages: DurableMessage[];

const bits = (f: Float32Array) => new Uint32Array(f.buffer, f.byteOffset, f.length);

/** Every tick's value of one signal, as the simulator sampled it. */
function column(signalIndex: number): Uint32Array {
  const rows = match.batches.flatMap((b) => b.rows);
  return Uint32Array.from(rows, (row) => bits(row)[signalIndex]!);
}

function streamRef(streamId = randomUUID()): StreamRef {
  return { teamId, keyId: undefined, robot: 'Gullwing', streamId, signals: match.signals };
}

async function appendInGroups(ref: StreamRef, list: DurableMessage[], size = 40): Promise<void> {
  for (let i = 0; i < list.length; i += size) await store.append(ref, list.slice(i, i + size));
}

async function count(table: string, recordingId: string): Promise<number> {
  const result = await db.db.execute<{ n: number }>(sql`select count(*)::int as n from ${sql.identifier(table)} where recording_id = ${recordingId}`);
  return result.rows[0]!.n;
}

beforeAll(async () => {
  db = await createTestDatabase();
  service = createRecordingsService({ store: recordingsStore(db.db), now: () => new Date() });
  store = new PgTelemetryStore(service, { classify: () => ({ kind: 'simulated', source: 'simulator' }) });
  const [team] = await db.db.insert(teams).values({ number: 19850, name: 'Harborlight Robotics' }).returning();
  const [other] = await db.db.insert(teams).values({ number: 91850, name: 'Other Harbor' }).returning();
  teamId = team!.id;
  otherTeamId = other!.id;
  match = runHeadlessMatch({ seed: 7, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'blue' });
  messages = headlessMatchRecords(match).filter((r): r is DurableMessage => r.type === 'telemetry_batch' || r.type === 'event');
});
afterAll(async () => {
  await db?.drop();
});

describe('recordings storage', () => {
  it('gives back every sample of a simulated match bit for bit, and its events in order', async () => {
    const ref = streamRef();
    await appendInGroups(ref, messages);
    const recording = (await service.findByStream(teamId, ref.streamId))!;
    expect(recording).toMatchObject({ kind: 'simulated', source: 'simulator', status: 'recording', robot: 'Gullwing' });
    await service.finish(teamId, recording.id);

    const totalTicks = match.batches.reduce((n, b) => n + b.ticks, 0);
    expect(match.signals.length).toBe(107);
    expect(totalTicks).toBeGreaterThan(7000);
    // Merged into chunks of ≤ 1000 ticks: a whole signal is a handful of rows.
    expect(await count('recording_chunks', recording.id)).toBeLessThanOrEqual(107 * Math.ceil(totalTicks / 1000) + 107);

    for (const signal of [match.signals[0]!, match.signals[1]!, match.signals[53]!, match.signals[106]!]) {
      const samples = await service.readSamples(teamId, recording.id, signal.name);
      expect(samples.values.length).toBe(totalTicks);
      expect(bits(samples.values)).toEqual(column(signal.index));
      expect(samples.tS[0]).toBe(0);
      expect(samples.tS[totalTicks - 1]).toBeCloseTo(((totalTicks - 1) * 20) / 1000, 9);
    }

    expect(await service.listSignals(teamId, recording.id)).toEqual(match.signals);
    const events = await service.listEvents(teamId, recording.id);
    expect(events.map((e) => ({ seq: e.seq, tMs: e.tMs, kind: e.kind, data: e.data }))).toEqual(
      match.events.map((e) => ({ seq: e.seq, tMs: e.tMs, kind: e.kind, data: e.data })),
    );
    const finished = await service.get(teamId, recording.id);
    expect(finished.status).toBe('finished');
    expect(finished.durationMs).toBeCloseTo((totalTicks - 1) * 20, 6);
  });

  it('stores a resent stream once', async () => {
    const ref = streamRef();
    const part = messages.slice(0, 300);
    await appendInGroups(ref, part, 25);
    // A reconnect resends from an older seq, overlapping what is stored, in other group sizes.
    await appendInGroups(ref, part.slice(100), 37);
    await appendInGroups(ref, part, 300);
    const recording = (await service.findByStream(teamId, ref.streamId))!;
    expect(await service.listStoredSeqs(recording.id)).toEqual(part.map((m) => m.seq));
    expect(await count('recording_events', recording.id)).toBe(part.filter((m) => m.type === 'event').length);
    const ticks = part.reduce((n, m) => n + (m.type === 'telemetry_batch' ? m.ticks : 0), 0);
    const samples = await service.readSamples(teamId, recording.id, match.signals[2]!.name);
    expect(bits(samples.values)).toEqual(column(2).slice(0, ticks));
  });

  it('writes nothing of a list with a corrupt batch in the middle', async () => {
    const ref = streamRef();
    await store.append(ref, messages.slice(0, 10));
    const recording = (await service.findByStream(teamId, ref.streamId))!;
    const before = await service.listStoredSeqs(recording.id);
    const next = messages.slice(10, 30);
    const corruptAt = next.findIndex((m, i) => i > 3 && m.type === 'telemetry_batch');
    const corrupt = next.map((m, i) => (i === corruptAt && m.type === 'telemetry_batch' ? { ...m, data: m.data.subarray(0, m.data.length - 3) } : m));
    await expect(store.append(ref, corrupt)).rejects.toThrow(/truncated/);
    expect(await service.listStoredSeqs(recording.id)).toEqual(before);

    // The robot resends the good bytes and all of it is stored.
    await store.append(ref, next);
    expect(await service.listStoredSeqs(recording.id)).toEqual(messages.slice(0, 30).map((m) => m.seq));
  });

  it('rolls back a list whose batch does not fit the declared signals', async () => {
    const ref = streamRef();
    const withFewerSignals = { ...ref, signals: match.signals.slice(0, 10) };
    await expect(store.append(withFewerSignals, messages.slice(0, 12))).rejects.toThrow(/10 declared/);
    expect(await service.findByStream(teamId, ref.streamId)).toBeUndefined();
  });

  it('reads a time range of one signal', async () => {
    const ref = streamRef();
    await appendInGroups(ref, messages.slice(0, 1200), 60);
    const recording = (await service.findByStream(teamId, ref.streamId))!;
    const samples = await service.readSamples(teamId, recording.id, match.signals[5]!.name, { fromS: 10, toS: 20 });
    expect(samples.tS.length).toBe(501);
    expect(samples.tS[0]).toBeCloseTo(10, 9);
    expect(samples.tS[500]).toBeCloseTo(20, 9);
    expect(bits(samples.values)).toEqual(column(5).slice(500, 1001));
  });

  it('keeps a recording from another team', async () => {
    const ref = streamRef();
    await store.append(ref, messages.slice(0, 20));
    const recording = (await service.findByStream(teamId, ref.streamId))!;
    expect(await service.findByStream(otherTeamId, ref.streamId)).toBeUndefined();
    const name = match.signals[0]!.name;
    await expect(service.readSamples(otherTeamId, recording.id, name)).rejects.toMatchObject({ code: 'not_found' });
    await expect(service.listEvents(otherTeamId, recording.id)).rejects.toMatchObject({ code: 'not_found' });
    await expect(service.listSignals(otherTeamId, recording.id)).rejects.toMatchObject({ code: 'not_found' });
    await expect(service.finish(otherTeamId, recording.id)).rejects.toMatchObject({ code: 'not_found' });
    expect((await service.readSamples(teamId, recording.id, name)).values.length).toBeGreaterThan(0);
  });
});
