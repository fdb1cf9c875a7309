import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, type Role } from '../../shared/domain/roles';
import {
  addMember,
  inviteToken,
  signUpTeam,
  startTestServer,
  TEST_PASSWORD,
  type TestClient,
  type TestServer,
} from '../support/test-server';

let server: TestServer;
let lead: TestClient;
const clients = {} as Record<Role, TestClient>;

beforeAll(async () => {
  server = await startTestServer();
  lead = await signUpTeam(server, { email: 'lead@harborlight.example', teamNumber: 19850 });
  clients.lead = lead;
  for (const role of ROLES.filter((r) => r !== 'lead')) {
    clients[role] = await addMember(server, lead, { email: `${role}@harborlight.example`, role, name: `The ${role}` });
  }
});
afterAll(async () => {
  await server.close();
});

async function memberId(email: string): Promise<string> {
  const res = await lead.get('/api/team/members').expect(200);
  return res.body.members.find((m: { email: string }) => m.email === email).userId;
}

describe('invite → mail → accept → role change', () => {
  it('mails the invite link, shows the invite, and makes the invitee a member with the role', async () => {
    const mail = server.smtp.inbox.waitFor('newcomer@harborlight.example');
    const created = await lead.post('/api/team/invites').send({ email: 'Newcomer@Harborlight.example', role: 'operator' }).expect(201);
    expect(created.body).toMatchObject({ email: 'newcomer@harborlight.example', role: 'operator', invitedByName: 'Rowan Vale' });

    const received = await mail;
    expect(received.subject).toContain('Team 19850 Harborlight Robotics');
    const token = inviteToken(received.links);

    const pending = await lead.get('/api/team/invites').expect(200);
    expect(pending.body.invites.map((i: { email: string }) => i.email)).toContain('newcomer@harborlight.example');

    const guest = await server.client();
    const preview = await guest.get(`/api/invites/${token}`).expect(200);
    expect(preview.body).toMatchObject({ teamNumber: 19850, role: 'operator', email: 'newcomer@harborlight.example' });

    const accepted = await guest.post(`/api/invites/${token}/accept`).send({ name: 'Nia Calder', password: TEST_PASSWORD }).expect(201);
    expect(accepted.body).toMatchObject({ role: 'operator', team: { number: 19850 }, user: { name: 'Nia Calder' } });
    await guest.get('/api/me').expect(200);

    const again = await (await server.client()).post(`/api/invites/${token}/accept`).send({ name: 'X', password: TEST_PASSWORD });
    expect(again.status).toBe(404);

    const id = await memberId('newcomer@harborlight.example');
    const changed = await lead.patch(`/api/team/members/${id}`).send({ role: 'coach' }).expect(200);
    expect(changed.body.role).toBe('coach');
    expect((await guest.get('/api/me').expect(200)).body.role).toBe('coach');

    const after = await lead.get('/api/team/invites').expect(200);
    expect(after.body.invites.map((i: { email: string }) => i.email)).not.toContain('newcomer@harborlight.example');
  });

  it('refuses a second invite to the same address and an invite to an existing account', async () => {
    await lead.post('/api/team/invites').send({ email: 'twice@harborlight.example', role: 'viewer' }).expect(201);
    const twice = await lead.post('/api/team/invites').send({ email: 'twice@harborlight.example', role: 'viewer' });
    expect(twice.status).toBe(409);
    const existing = await lead.post('/api/team/invites').send({ email: 'coach@harborlight.example', role: 'viewer' });
    expect(existing.status).toBe(409);
    expect(existing.body.error.issues[0].path).toBe('email');
  });

  it('revoking an invite stops its link', async () => {
    const mail = server.smtp.inbox.waitFor('revoked@harborlight.example');
    const created = await lead.post('/api/team/invites').send({ email: 'revoked@harborlight.example', role: 'viewer' }).expect(201);
    const token = inviteToken((await mail).links);
    await lead.delete(`/api/team/invites/${created.body.id}`).expect(204);
    await (await server.client()).get(`/api/invites/${token}`).expect(404);
  });
});

describe('a team keeps at least one lead', () => {
  it('refuses to demote or remove the last lead with 409', async () => {
    const id = await memberId('lead@harborlight.example');
    const demote = await lead.patch(`/api/team/members/${id}`).send({ role: 'programmer' });
    expect(demote.status).toBe(409);
    const remove = await lead.delete(`/api/team/members/${id}`);
    expect(remove.status).toBe(409);
    expect((await lead.get('/api/me').expect(200)).body.role).toBe('lead');
  });

  it('removes a member, whose session then ends', async () => {
    const gone = await addMember(server, lead, { email: 'leaving@harborlight.example', role: 'viewer' });
    await gone.get('/api/me').expect(200);
    await lead.delete(`/api/team/members/${await memberId('leaving@harborlight.example')}`).expect(204);
    await gone.get('/api/me').expect(401);
  });
});

describe('robot keys', () => {
  it('shows the secret once, keeps only a hash, authenticates it until revoked', async () => {
    const created = await lead.post('/api/team/robot-keys').send({ name: 'Gullwing' }).expect(201);
    const { key, secret } = created.body as { key: { id: string; prefix: string }; secret: string };
    expect(secret.startsWith(`${key.prefix}_`)).toBe(true);

    const listed = await lead.get('/api/team/robot-keys').expect(200);
    expect(JSON.stringify(listed.body)).not.toContain(secret);
    const { rows } = await server.db.pool.query('select secret_hash from robot_keys where id = $1', [key.id]);
    expect(rows[0].secret_hash).not.toContain(secret.slice(-20));

    const robot = await server.app.services.team.authenticateRobot(secret);
    expect(robot?.keyId).toBe(key.id);
    expect(await server.app.services.team.authenticateRobot(`${secret}x`)).toBeUndefined();

    await lead.delete(`/api/team/robot-keys/${key.id}`).expect(204);
    expect(await server.app.services.team.authenticateRobot(secret)).toBeUndefined();
    const revoked = (await lead.get('/api/team/robot-keys').expect(200)).body.keys.find((k: { id: string }) => k.id === key.id);
    expect(revoked.revokedAt).not.toBeNull();
  });
});

const someId = '00000000-0000-4000-8000-000000000000';
const LEAD_ONLY: { what: string; call: (c: TestClient) => Promise<{ status: number; body: { error?: { code: string } } }> }[] = [
  { what: 'list invites', call: (c) => c.get('/api/team/invites') },
  { what: 'send an invite', call: (c) => c.post('/api/team/invites').send({ email: 'x@example.org', role: 'viewer' }) },
  { what: 'revoke an invite', call: (c) => c.delete(`/api/team/invites/${someId}`) },
  { what: 'change a role', call: (c) => c.patch(`/api/team/members/${someId}`).send({ role: 'lead' }) },
  { what: 'remove a member', call: (c) => c.delete(`/api/team/members/${someId}`) },
  { what: 'list robot keys', call: (c) => c.get('/api/team/robot-keys') },
  { what: 'create a robot key', call: (c) => c.post('/api/team/robot-keys').send({ name: 'Sneaky' }) },
  { what: 'revoke a robot key', call: (c) => c.delete(`/api/team/robot-keys/${someId}`) },
];

describe('roles', () => {
  const others = ROLES.filter((r) => r !== 'lead');
  it.each(others.flatMap((role) => LEAD_ONLY.map((a) => ({ role, ...a }))))(
    'a $role may not $what (403)',
    async ({ role, call }) => {
      const res = await call(clients[role]);
      expect(res.status).toBe(403);
      expect(res.body.error?.code).toBe('forbidden');
    },
  );

  it.each(ROLES)('a %s may read the members list', async (role) => {
    const res = await clients[role].get('/api/team/members').expect(200);
    expect(res.body.members.length).toBeGreaterThanOrEqual(ROLES.length);
  });

  it('a signed-out client gets 401, not 403', async () => {
    const guest = await server.client();
    for (const { call } of LEAD_ONLY) expect((await call(guest)).status).toBe(401);
  });
});

describe('teams are isolated', () => {
  it('a lead of another team cannot read or change this team’s members, invites or keys', async () => {
    const rival = await signUpTeam(server, { email: 'lead@tidewater.example', teamNumber: 19851, teamName: 'Tidewater Works', name: 'Ada Finch' });
    const members = (await rival.get('/api/team/members').expect(200)).body.members;
    expect(members.map((m: { email: string }) => m.email)).toEqual(['lead@tidewater.example']);

    const victim = await memberId('operator@harborlight.example');
    expect((await rival.patch(`/api/team/members/${victim}`).send({ role: 'viewer' })).status).toBe(404);
    expect((await rival.delete(`/api/team/members/${victim}`)).status).toBe(404);

    const invite = await lead.post('/api/team/invites').send({ email: 'isolated@harborlight.example', role: 'viewer' }).expect(201);
    expect((await rival.get('/api/team/invites').expect(200)).body.invites).toEqual([]);
    expect((await rival.delete(`/api/team/invites/${invite.body.id}`)).status).toBe(404);

    const key = await lead.post('/api/team/robot-keys').send({ name: 'Gullwing spare' }).expect(201);
    expect((await rival.get('/api/team/robot-keys').expect(200)).body.keys).toEqual([]);
    expect((await rival.delete(`/api/team/robot-keys/${key.body.key.id}`)).status).toBe(404);

    expect((await clients.operator.get('/api/me').expect(200)).body.role).toBe('operator');
    expect((await lead.get('/api/team/invites').expect(200)).body.invites.map((i: { id: string }) => i.id)).toContain(invite.body.id);
  });
});

describe('validation', () => {
  it('answers a bad role or address with 400 and writes nothing', async () => {
    const before = (await lead.get('/api/team/invites').expect(200)).body.invites.length;
    const res = await lead.post('/api/team/invites').send({ email: 'nope', role: 'captain' }).expect(400);
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort()).toEqual(['email', 'role']);
    expect((await lead.get('/api/team/invites').expect(200)).body.invites.length).toBe(before);
    await lead.patch('/api/team/members/not-a-uuid').send({ role: 'lead' }).expect(400);
  });
});
