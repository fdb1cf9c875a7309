import { sql } from 'drizzle-orm';
import express from 'express';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { RELAY_EVENT_SEQ_BASE } from '../../server/features/recordings/recording-files';
import { ROLES, type Role } from '../../shared/domain/roles';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { decodeRecording } from '../../shared/protocol/recording-file';
import { samplesSchema } from '../../shared/schemas/recording';
import { decodeTelemetry } from '../../shared/protocol/telemetry-codec';
import { runHeadlessMatch, type HeadlessMatch } from '../../simulator/src/headless';
import { encodeHeadlessMatch } from '../../simulator/src/match-file';
import { recordingsStore } from '../../server/features/recordings/recordings.repo';
import { recordingsRouter } from '../../server/features/recordings/recordings.routes';
import { createRecordingsService } from '../../server/features/recordings/recordings.service';
import { errorHandler } from '../../server/lib/errors';
import { createLogger } from '../../server/lib/logger';
import { addMember, signUpTeam, startTestServer, type TestClient, type TestServer } from '../support/test-server';

let server: TestServer;
let other: TestClient;
const clients = {} as Record<Role, TestClient>;
let match: HeadlessMatch;
let file: Uint8Array;
let recordingId: string;

const bits = (f: Float32Array) => Array.from(new Uint32Array(f.buffer, f.byteOffset, f.length));
const jsonBits = (values: (number | null)[]) => bits(Float32Array.from(values, (v) => (v === null ? Number.NaN : v)));
/** Every tick's value of one signal, as the simulator sampled it. */
const column = (index: number) => Float32Array.from(match.batches.flatMap((b) => b.rows), (row) => row[index]!);

function binary(res: request.Response, done: (err: Error | null, body: Buffer) => void) {
  const stream = res as unknown as NodeJS.ReadableStream;
  const parts: Buffer[] = [];
  stream.on('data', (p: Buffer) => parts.push(p));
  stream.on('end', () => done(null, Buffer.concat(parts)));
}

async function counts(): Promise<{ recordings: number; chunks: number }> {
  const r = await server.db.db.execute<{ recordings: number; chunks: number }>(
    sql`select (select count(*)::int from recordings) as recordings, (select count(*)::int from recording_chunks) as chunks`,
  );
  return r.rows[0]!;
}

const upload = (client: TestClient, bytes: Uint8Array | string, name = 'match.pwrec', kind?: string) => {
  const req = client.post('/api/recordings/upload');
  if (kind) req.field('kind', kind);
  return req.attach('file', Buffer.from(bytes), name);
};

beforeAll(async () => {
  server = await startTestServer();
  clients.lead = await signUpTeam(server, { email: 'lead@harborlight.example', teamNumber: 19850 });
  for (const role of ROLES.filter((r) => r !== 'lead')) {
    clients[role] = await addMember(server, clients.lead, { email: `${role}@harborlight.example`, role, name: `The ${role}` });
  }
  other = await signUpTeam(server, { email: 'lead@otherharbor.example', teamNumber: 91850, teamName: 'Other Harbor' });
  match = runHeadlessMatch({ seed: 7, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'blue' });
  file = encodeHeadlessMatch(match, { source: 'simulator', robot: 'Gullwing', teamNumber: 19850, startedAtMs: Date.parse('2025-03-14T15:00:00Z'), seed: 7 });
  const res = await upload(clients.programmer, file, 'whatever.bin', 'simulated').expect(201);
  recordingId = res.body.id;
}, 60_000);
afterAll(async () => {
  await server?.close();
});

describe('upload a Pitwall recording and read it back', () => {
  it('lists the uploaded recording with its metadata', async () => {
    const res = await clients.viewer.get('/api/recordings').expect(200);
    expect(res.body.total).toBe(1);
    expect(res.body.items[0]).toMatchObject({ id: recordingId, kind: 'simulated', source: 'upload', status: 'finished', robot: 'Gullwing' });
    expect(res.body.items[0].startedAt).toBe('2025-03-14T15:00:00.000Z');
    const detail = await clients.viewer.get(`/api/recordings/${recordingId}`).expect(200);
    // The robot's events and the operator's selections (the file's selection records).
    expect(detail.body).toMatchObject({ signalCount: match.signals.length, eventCount: match.events.length + match.selections.length });
    expect(detail.body.durationS).toBeCloseTo((match.batches.at(-1)!.t0Ms + (match.batches.at(-1)!.ticks - 1) * 20) / 1000, 6);
  });

  it('gives the signals, one signal bit for bit, a time range of it, and the events', async () => {
    const signals = await clients.operator.get(`/api/recordings/${recordingId}/signals`).expect(200);
    expect(signals.body.signals).toEqual(match.signals);
    for (const signal of [match.signals[0]!, match.signals[5]!, match.signals.at(-1)!]) {
      const res = await clients.coach.get(`/api/recordings/${recordingId}/samples`).query({ signal: signal.name }).expect(200);
      expect(res.body.signal).toBe(signal.name);
      expect(samplesSchema.safeParse(res.body).success).toBe(true);
      expect(jsonBits(res.body.values)).toEqual(bits(column(signal.index)));
      expect(res.body.tS[1]).toBeCloseTo(0.02, 9);
    }
    const range = await clients.viewer.get(`/api/recordings/${recordingId}/samples`).query({ signal: match.signals[0]!.name, from: 10, to: 12 }).expect(200);
    expect(range.body.tS[0]).toBeCloseTo(10, 9);
    expect(range.body.tS.at(-1)).toBeCloseTo(12, 9);
    expect(range.body.tS).toHaveLength(101);

    const events = await clients.viewer.get(`/api/recordings/${recordingId}/events`).expect(200);
    expect(events.body.events.map((e: { seq: number; kind: string }) => [e.seq, e.kind])).toEqual([
      ...match.events.map((e) => [e.seq, e.kind]),
      ...match.selections.map((_, i) => [RELAY_EVENT_SEQ_BASE + i, 'selection']),
    ]);
    expect(events.body.events[0].tS).toBeCloseTo(match.events[0]!.tMs / 1000, 9);
    const firstSelection = events.body.events[match.events.length];
    expect(firstSelection.data).toEqual({ channel: match.selections[0]!.channel, value: match.selections[0]!.value });
  });

  it('answers 404 for a signal the recording lacks and 400 for a bad range', async () => {
    await clients.viewer.get(`/api/recordings/${recordingId}/samples`).query({ signal: 'no/such' }).expect(404);
    const bad = await clients.viewer.get(`/api/recordings/${recordingId}/samples`).query({ signal: match.signals[0]!.name, from: 5, to: 1 }).expect(400);
    expect(bad.body.error.issues[0].path).toBe('to');
  });
});

describe('export', () => {
  it('exports the Pitwall file, which decodes to the same samples and events', async () => {
    const res = await clients.viewer.get(`/api/recordings/${recordingId}/export?format=pitwall`).buffer(true).parse(binary).expect(200);
    expect(res.headers['content-disposition']).toMatch(/^attachment; filename="?Gullwing-2025-03-14-[0-9a-f]{8}\.pwrec"?$/);
    const { header, records } = decodeRecording(new Uint8Array(res.body));
    expect(header).toMatchObject({ format: 'pitwall-recording', version: 1, robot: 'Gullwing', teamNumber: 19850, startedAtMs: Date.parse('2025-03-14T15:00:00Z') });
    const signalsRecord = records.find((r) => r.type === 'signals');
    expect(signalsRecord && signalsRecord.type === 'signals' && signalsRecord.signals).toEqual(match.signals);
    const rows = records.flatMap((r) => (r.type === 'telemetry_batch' ? decodeTelemetry(r.data).rows : []));
    expect(rows).toHaveLength(column(0).length);
    for (const index of [0, 7, match.signals.length - 1]) expect(bits(Float32Array.from(rows, (row) => row[index]!))).toEqual(bits(column(index)));
    const events = records.flatMap((r) => (r.type === 'event' ? [r] : []));
    expect(events.filter((e) => e.kind !== 'selection').map((e) => [e.tMs, e.kind])).toEqual(match.events.map((e) => [e.tMs, e.kind]));
    expect(events.filter((e) => e.kind === 'selection').map((e) => [e.tMs, e.data])).toEqual(
      match.selections.map((x) => [x.tMs, { channel: x.channel, value: x.value }]),
    );
    const seqs = records.flatMap((r) => ('seq' in r ? [r.seq] : []));
    expect(new Set(seqs).size).toBe(seqs.length);

    const again = await upload(clients.lead, new Uint8Array(res.body)).expect(201);
    const samples = await clients.lead.get(`/api/recordings/${again.body.id}/samples`).query({ signal: match.signals[3]!.name }).expect(200);
    expect(jsonBits(samples.body.values)).toEqual(bits(column(3)));
    await clients.lead.delete(`/api/recordings/${again.body.id}`).expect(204);
  });

  it('exports CSV in long form, and the CSV uploads back to the same float32 values', async () => {
    const res = await clients.viewer.get(`/api/recordings/${recordingId}/export?format=csv`).buffer(true).parse(binary).expect(200);
    expect(res.headers['content-type']).toContain('text/csv');
    expect(res.headers['content-disposition']).toMatch(/\.csv"?$/);
    const text = res.body.toString('utf8');
    expect(text.startsWith('time_s,signal,value\n')).toBe(true);
    expect(text.trimEnd().split('\n')).toHaveLength(1 + match.signals.length * column(0).length);

    const again = await upload(clients.programmer, text, 'export.txt').expect(201);
    const detail = await clients.lead.get(`/api/recordings/${again.body.id}`).expect(200);
    expect(detail.body).toMatchObject({ kind: 'practice', source: 'upload', signalCount: match.signals.length, eventCount: 0 });
    for (const index of [0, 9, match.signals.length - 1]) {
      const samples = await clients.lead.get(`/api/recordings/${again.body.id}/samples`).query({ signal: match.signals[index]!.name }).expect(200);
      expect(jsonBits(samples.body.values)).toEqual(bits(column(index)));
      expect(samples.body.tS.at(-1)).toBeCloseTo((column(index).length - 1) * 0.02, 9);
    }
    await clients.lead.delete(`/api/recordings/${again.body.id}`).expect(204);
  });

  it('refuses an unknown format', async () => {
    const res = await clients.viewer.get(`/api/recordings/${recordingId}/export?format=xlsx`).expect(400);
    expect(res.body.error.issues[0].path).toBe('format');
  });
});

describe('bad uploads store nothing', () => {
  const garbage = Uint8Array.from({ length: 4096 }, (_, i) => (i * 7919 + 0x85) % 256);
  const cases: [string, () => Uint8Array | string, RegExp][] = [
    ['garbage bytes', () => garbage, /at byte \d+/],
    ['a truncated Pitwall file', () => file.subarray(0, Math.floor(file.byteLength * 0.6)), /truncated.*at byte \d+/],
    ['a PNG image', () => Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]), /PNG image \(at byte 0\)/],
    ['plain text', () => 'Gullwing ran well today.\nNo faults.\n', /Not a Pitwall recording.*at byte 0/],
    ['a CSV with a bad line', () => 'time_s,signal,value\n0,drive/speed,1.5\n0.02,drive/speed,fast\n', /line 3.*"fast" is not a number/],
    ['a CSV cut mid-line', () => 'time_s,signal,value\n0,drive/speed,1.5\n0.02,drive/sp', /line 3 has 2 fields/],
    ['an empty file', () => new Uint8Array(), /empty/],
  ];
  it.each(cases)('refuses %s with where the problem is', async (_name, bytes, message) => {
    const before = await counts();
    const res = await upload(clients.lead, bytes(), 'match.pwrec').expect(400);
    expect(res.body.error.code).toBe('bad_request');
    expect(res.body.error.message).toMatch(message);
    expect(res.body.error.issues[0].path).toBe('file');
    expect(await counts()).toEqual(before);
  });

  it('refuses a request without a file, and one that is not multipart', async () => {
    const none = await clients.lead.post('/api/recordings/upload').field('kind', 'match').expect(400);
    expect(none.body.error.issues[0].path).toBe('file');
    await clients.lead.post('/api/recordings/upload').send({ file: 'x' }).expect(400);
  });

  it('refuses a file over the size limit with 413 and stores nothing', async () => {
    // The router on its own with a 1 kB limit, acting for this team's lead.
    const me = (await clients.lead.get('/api/me').expect(200)).body;
    const app = express();
    app.use((req, _res, next) => {
      req.actor = { user: me.user, team: me.team, role: 'lead', sessionVersion: 0 };
      next();
    });
    app.use('/api', recordingsRouter({ recordings: createRecordingsService({ store: recordingsStore(server.db.db), now: () => new Date() }), uploadLimitBytes: 1024 }));
    app.use(errorHandler(createLogger('silent')));
    const before = await counts();
    const res = await request(app).post('/api/recordings/upload').attach('file', Buffer.from(file), 'match.pwrec').expect(413);
    expect(res.body.error).toMatchObject({ code: 'payload_too_large', message: 'The file is larger than 1 kB' });
    expect(await counts()).toEqual(before);
  });
});

describe('PATCH metadata', () => {
  it('changes the fields given and keeps the rest', async () => {
    const res = await clients.programmer
      .patch(`/api/recordings/${recordingId}`)
      .send({ kind: 'match', metadata: { event: 'Lakeshore District Event', matchType: 'qualification', matchNumber: 14, alliance: 'blue', station: 2, tags: ['auto-test'] } })
      .expect(200);
    expect(res.body).toMatchObject({ kind: 'match', robot: 'Gullwing', metadata: { event: 'Lakeshore District Event', matchNumber: 14, station: 2, tags: ['auto-test'], operatorName: null } });
    const list = await clients.viewer.get('/api/recordings').query({ event: 'lakeshore', kind: 'match', alliance: 'blue', tag: 'auto-test', from: '2025-03-14', to: '2025-03-14' }).expect(200);
    expect(list.body.items.map((i: { id: string }) => i.id)).toEqual([recordingId]);
    const none = await clients.viewer.get('/api/recordings').query({ alliance: 'red' }).expect(200);
    expect(none.body).toMatchObject({ items: [], total: 0, page: 1, pageSize: 25 });
    const searched = await clients.viewer.get('/api/recordings').query({ q: 'gullw', sort: 'matchNumber', pageSize: 5 }).expect(200);
    expect(searched.body.total).toBe(1);
  });

  it('refuses bad fields with their issues and changes nothing', async () => {
    const res = await clients.lead
      .patch(`/api/recordings/${recordingId}`)
      .send({ metadata: { matchType: 'final', matchNumber: 0, station: 4, tags: [''] } })
      .expect(400);
    const paths = res.body.error.issues.map((i: { path: string }) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['metadata.matchType', 'metadata.matchNumber', 'metadata.station', 'metadata.tags.0']));
    expect(res.body.error.issues.find((i: { path: string }) => i.path === 'metadata.station').message).toBe('The station is 1, 2 or 3');
    const detail = await clients.lead.get(`/api/recordings/${recordingId}`).expect(200);
    expect(detail.body.metadata.station).toBe(2);
    await clients.lead.patch(`/api/recordings/${recordingId}`).send({ colour: 'teal' }).expect(400);
  });

  it('refuses a bad list query', async () => {
    const res = await clients.viewer.get('/api/recordings').query({ pageSize: 1000, kind: 'scrimmage' }).expect(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['kind', 'pageSize']);
  });
});

describe('roles and teams', () => {
  const reads = (id: string) => [
    `/api/recordings/${id}`,
    `/api/recordings/${id}/signals`,
    `/api/recordings/${id}/samples?signal=${encodeURIComponent(match.signals[0]!.name)}`,
    `/api/recordings/${id}/events`,
    `/api/recordings/${id}/export?format=csv`,
    `/api/recordings/${id}/export?format=pitwall`,
  ];

  it('lets every role read', async () => {
    for (const role of ROLES) {
      await clients[role].get('/api/recordings').expect(200);
      for (const path of reads(recordingId)) await clients[role].get(path).expect(200);
    }
  });

  it.each(['viewer', 'operator', 'coach'] as const)('refuses a %s PATCH, upload and DELETE with 403', async (role) => {
    await clients[role].patch(`/api/recordings/${recordingId}`).send({ metadata: { notes: 'x' } }).expect(403);
    const before = await counts();
    await upload(clients[role], file).expect(403);
    expect(await counts()).toEqual(before);
    await clients[role].delete(`/api/recordings/${recordingId}`).expect(403);
  });

  it('refuses a programmer DELETE with 403', async () => {
    await clients.programmer.delete(`/api/recordings/${recordingId}`).expect(403);
  });

  it('answers 401 signed out on every route', async () => {
    const guest = await server.client();
    await guest.get('/api/recordings').expect(401);
    for (const path of reads(recordingId)) await guest.get(path).expect(401);
    await guest.patch(`/api/recordings/${recordingId}`).send({}).expect(401);
    await guest.delete(`/api/recordings/${recordingId}`).expect(401);
    await upload(guest, file).expect(401);
  });

  it("hides this team's recording from another team (404 everywhere)", async () => {
    const list = await other.get('/api/recordings').expect(200);
    expect(list.body.total).toBe(0);
    for (const path of reads(recordingId)) await other.get(path).expect(404);
    await other.patch(`/api/recordings/${recordingId}`).send({ metadata: { notes: 'mine now' } }).expect(404);
    await other.delete(`/api/recordings/${recordingId}`).expect(404);
    expect((await clients.lead.get(`/api/recordings/${recordingId}`).expect(200)).body.metadata.notes).toBe('');
  });

  it('a lead deletes the recording with everything under it, in one go', async () => {
    const { id } = (await upload(clients.lead, file).expect(201)).body;
    const before = await counts();
    await clients.lead.delete(`/api/recordings/${id}`).expect(204);
    const left = await server.db.db.execute<{ n: number }>(sql`
      select (select count(*) from recording_chunks where recording_id = ${id})
           + (select count(*) from recording_events where recording_id = ${id})
           + (select count(*) from recording_signals where recording_id = ${id})
           + (select count(*) from recording_stream_seqs where recording_id = ${id})
           + (select count(*) from recordings where id = ${id}) as n`);
    expect(Number(left.rows[0]!.n)).toBe(0);
    expect((await counts()).recordings).toBe(before.recordings - 1);
    await clients.lead.get(`/api/recordings/${id}`).expect(404);
  });
});
