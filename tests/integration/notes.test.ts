import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../shared/domain/roles';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { noteListSchema, noteSchema } from '../../shared/schemas/note';
import { runHeadlessMatch } from '../../simulator/src/headless';
import { encodeHeadlessMatch } from '../../simulator/src/match-file';
import { addMember, signUpTeam, startTestServer, type TestClient, type TestServer } from '../support/test-server';

let server: TestServer;
let other: TestClient;
const clients = {} as Record<Role, TestClient>;
let file: Uint8Array;
let recordingId: string;
let durationS: number;

const notesUrl = (id = recordingId) => `/api/recordings/${id}/notes`;
const upload = (client: TestClient) => client.post('/api/recordings/upload').field('kind', 'simulated').attach('file', Buffer.from(file), 'match.pwrec');

async function noteCount(): Promise<number> {
  const r = await server.db.db.execute<{ n: number }>(sql`select count(*)::int as n from recording_notes`);
  return r.rows[0]!.n;
}

beforeAll(async () => {
  server = await startTestServer();
  clients.lead = await signUpTeam(server, { email: 'lead@harborlight.example', teamNumber: 19850 });
  for (const role of ROLES.filter((r) => r !== 'lead')) {
    clients[role] = await addMember(server, clients.lead, { email: `${role}@harborlight.example`, role, name: `The ${role}` });
  }
  other = await signUpTeam(server, { email: 'lead@otherharbor.example', teamNumber: 91850, teamName: 'Other Harbor' });
  const match = runHeadlessMatch({ seed: 7, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'blue' });
  file = encodeHeadlessMatch(match, { source: 'simulator', robot: 'Gullwing', teamNumber: 19850, startedAtMs: Date.parse('2025-03-14T15:00:00Z'), seed: 7 });
  recordingId = (await upload(clients.programmer).expect(201)).body.id;
  durationS = (await clients.viewer.get(`/api/recordings/${recordingId}`).expect(200)).body.durationS;
}, 60_000);
afterAll(async () => {
  await server?.close();
});

describe('notes on a recording', () => {
  it('creates notes, lists them by moment then by writing time, and deletes one', async () => {
    const late = await clients.programmer.post(notesUrl()).send({ tS: 42.5, text: '  Intake jammed here  ' }).expect(201);
    expect(noteSchema.parse(late.body)).toMatchObject({
      recordingId,
      tS: 42.5,
      text: 'Intake jammed here',
      authorName: 'The programmer',
      authorRole: 'programmer',
    });
    const first = await clients.coach.post(notesUrl()).send({ tS: 3, text: 'Slow start' }).expect(201);
    const second = await clients.lead.post(notesUrl()).send({ tS: 3, text: 'Agreed' }).expect(201);
    const end = await clients.lead.post(notesUrl()).send({ tS: durationS, text: 'The very end' }).expect(201);

    const list = await clients.viewer.get(notesUrl()).expect(200);
    expect(noteListSchema.parse(list.body).notes.map((n) => n.id)).toEqual([first.body.id, second.body.id, late.body.id, end.body.id]);
    expect(list.body.notes[0]).not.toHaveProperty('authorId');

    await clients.lead.delete(`${notesUrl()}/${end.body.id}`).expect(204);
    const after = await clients.operator.get(notesUrl()).expect(200);
    expect(after.body.notes.map((n: { id: string }) => n.id)).toEqual([first.body.id, second.body.id, late.body.id]);
    await clients.lead.delete(`${notesUrl()}/${end.body.id}`).expect(404);
  });

  it.each(ROLES)('lets a %s read the notes', async (role) => {
    await clients[role].get(notesUrl()).expect(200);
  });

  it.each(['lead', 'programmer', 'coach'] as const)('lets a %s write a note', async (role) => {
    const res = await clients[role].post(notesUrl()).send({ tS: 1, text: `From the ${role}` }).expect(201);
    expect(res.body.authorRole).toBe(role);
  });

  it.each(['operator', 'viewer'] as const)('refuses a note from a %s and writes nothing', async (role) => {
    const before = await noteCount();
    const res = await clients[role].post(notesUrl()).send({ tS: 1, text: 'Not allowed' }).expect(403);
    expect(res.body.error.code).toBe('forbidden');
    expect(await noteCount()).toBe(before);
  });

  it('lets the author delete their note, refuses other members who are not leads, and lets a lead delete anyone\'s', async () => {
    const byProgrammer = (await clients.programmer.post(notesUrl()).send({ tS: 5, text: 'Mine' }).expect(201)).body.id;
    for (const role of ['coach', 'operator', 'viewer'] as const) {
      const res = await clients[role].delete(`${notesUrl()}/${byProgrammer}`).expect(403);
      expect(res.body.error.code).toBe('forbidden');
    }
    await clients.lead.delete(`${notesUrl()}/${byProgrammer}`).expect(204);

    const byCoach = (await clients.coach.post(notesUrl()).send({ tS: 6, text: 'Coach note' }).expect(201)).body.id;
    await clients.programmer.delete(`${notesUrl()}/${byCoach}`).expect(403);
    await clients.coach.delete(`${notesUrl()}/${byCoach}`).expect(204);

    const notes = (await clients.viewer.get(notesUrl()).expect(200)).body.notes.map((n: { id: string }) => n.id);
    expect(notes).not.toContain(byProgrammer);
    expect(notes).not.toContain(byCoach);
  });

  it('answers 401 when signed out', async () => {
    const anon = await server.client();
    const note = (await clients.coach.post(notesUrl()).send({ tS: 7, text: 'Still here' }).expect(201)).body.id;
    await anon.get(notesUrl()).expect(401);
    await anon.post(notesUrl()).send({ tS: 1, text: 'Hello' }).expect(401);
    await anon.delete(`${notesUrl()}/${note}`).expect(401);
  });

  it('hides another team\'s recording and its notes (404) on every route', async () => {
    const note = (await clients.coach.post(notesUrl()).send({ tS: 8, text: 'Ours' }).expect(201)).body.id;
    const before = await noteCount();
    expect((await other.get(notesUrl()).expect(404)).body.error.code).toBe('not_found');
    await other.post(notesUrl()).send({ tS: 1, text: 'Theirs' }).expect(404);
    await other.delete(`${notesUrl()}/${note}`).expect(404);
    expect(await noteCount()).toBe(before);
    await clients.viewer.get(notesUrl()).expect(200).expect((res) => expect(res.body.notes.map((n: { id: string }) => n.id)).toContain(note));
  });

  it('answers 404 for an unknown recording or note', async () => {
    const unknown = '00000000-0000-4000-8000-000000000000';
    await clients.lead.get(notesUrl(unknown)).expect(404);
    await clients.lead.post(notesUrl(unknown)).send({ tS: 1, text: 'Nowhere' }).expect(404);
    await clients.lead.delete(`${notesUrl()}/${unknown}`).expect(404);
  });

  it.each([
    ['a moment after the end', () => ({ tS: durationS + 0.01, text: 'Too late' }), 'tS'],
    ['a negative moment', () => ({ tS: -1, text: 'Too early' }), 'tS'],
    ['a moment that is not a number', () => ({ tS: '3', text: 'Text' }), 'tS'],
    ['no moment', () => ({ text: 'When?' }), 'tS'],
    ['blank text', () => ({ tS: 1, text: '   ' }), 'text'],
    ['text over 2000 characters', () => ({ tS: 1, text: 'x'.repeat(2001) }), 'text'],
  ])('answers 400 with a field issue and writes nothing for %s', async (_name, body, field) => {
    const before = await noteCount();
    const res = await clients.lead.post(notesUrl()).send(body()).expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(field);
    expect(await noteCount()).toBe(before);
  });

  it('answers 400 for ids that are not ids', async () => {
    const res = await clients.lead.get('/api/recordings/not-an-id/notes').expect(400);
    expect(res.body.error.issues[0].path).toBe('id');
    const del = await clients.lead.delete(`${notesUrl()}/not-a-note`).expect(400);
    expect(del.body.error.issues[0].path).toBe('noteId');
  });

  it('removes the notes with their recording', async () => {
    const doomed = (await upload(clients.lead).expect(201)).body.id;
    await clients.coach.post(notesUrl(doomed)).send({ tS: 2, text: 'Gone soon' }).expect(201);
    await clients.programmer.post(notesUrl(doomed)).send({ tS: 4, text: 'Also gone' }).expect(201);
    const kept = (await clients.viewer.get(notesUrl()).expect(200)).body.notes.length;
    const count = async () =>
      (await server.db.db.execute<{ n: number }>(sql`select count(*)::int as n from recording_notes where recording_id = ${doomed}`)).rows[0]!.n;
    expect(await count()).toBe(2);

    await clients.lead.delete(`/api/recordings/${doomed}`).expect(204);
    expect(await count()).toBe(0);
    await clients.lead.get(notesUrl(doomed)).expect(404);
    expect((await clients.viewer.get(notesUrl()).expect(200)).body.notes).toHaveLength(kept);
  });
});
