import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createSessionTokens, SESSION_COOKIE } from '../../server/features/auth/session-token';
import { signUpTeam, startTestServer, TEST_PASSWORD, type TestServer } from '../support/test-server';

const SECRET = 'test-secret-that-is-long-enough-for-hs256-signing';
let server: TestServer;

beforeAll(async () => {
  server = await startTestServer({ signInLimit: { windowMs: 60_000, max: 3 } });
});
afterAll(async () => {
  await server.close();
});

async function countUsers(): Promise<number> {
  const { rows } = await server.db.pool.query<{ n: string }>('select count(*) as n from users');
  return Number(rows[0]!.n);
}

describe('GET /api/health', () => {
  it('reports the database as up', async () => {
    const client = await server.client();
    const res = await client.get('/api/health').expect(200);
    expect(res.body).toEqual({ ok: true, db: 'up' });
  });
});

describe('sign-up, sign-in and sign-out', () => {
  it('creates a team with its creator as lead and signs them in', async () => {
    const lead = await signUpTeam(server, { email: 'Rowan@Harborlight.example', teamNumber: 19850 });
    const me = await lead.get('/api/me').expect(200);
    expect(me.body).toMatchObject({
      user: { email: 'rowan@harborlight.example', name: 'Rowan Vale' },
      team: { number: 19850, name: 'Harborlight Robotics' },
      role: 'lead',
    });
  });

  it('sets an httpOnly, SameSite session cookie with an expiry', async () => {
    const client = await server.client();
    const res = await client.post('/api/auth/sign-in').send({ email: 'rowan@harborlight.example', password: TEST_PASSWORD }).expect(200);
    const cookies = res.headers['set-cookie'] as unknown as string[];
    const cookie = cookies.find((c) => c.startsWith(`${SESSION_COOKIE}=`)) ?? '';
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).toMatch(/Max-Age=43200/);
  });

  it('refuses a second team with the same number or a second account with the same address', async () => {
    const before = await countUsers();
    const client = await server.client();
    const sameNumber = await client
      .post('/api/auth/sign-up')
      .send({ email: 'other@example.org', password: TEST_PASSWORD, name: 'A', teamNumber: 19850, teamName: 'Other' })
      .expect(409);
    expect(sameNumber.body.error.issues[0].path).toBe('teamNumber');
    const sameEmail = await client
      .post('/api/auth/sign-up')
      .send({ email: 'ROWAN@harborlight.example', password: TEST_PASSWORD, name: 'A', teamNumber: 19851, teamName: 'Other' })
      .expect(409);
    expect(sameEmail.body.error.issues[0].path).toBe('email');
    expect(await countUsers()).toBe(before);
  });

  it('answers bad input with 400, a field error for each field, and writes nothing', async () => {
    const before = await countUsers();
    const client = await server.client();
    const res = await client
      .post('/api/auth/sign-up')
      .send({ email: 'not-an-address', password: 'short', name: '', teamNumber: 'abc', teamName: 'X' })
      .expect(400);
    expect(res.body.error.code).toBe('validation_failed');
    const paths = res.body.error.issues.map((i: { path: string }) => i.path).sort();
    expect(paths).toEqual(['email', 'name', 'password', 'teamName', 'teamNumber']);
    expect(await countUsers()).toBe(before);
  });

  it('answers a body that is not JSON with 400 in the one error shape', async () => {
    const client = await server.client();
    const res = await client.post('/api/auth/sign-in').set('Content-Type', 'application/json').send('{"email":').expect(400);
    expect(res.body).toEqual({ error: { code: 'bad_request', message: expect.any(String) } });
  });

  it('refuses a wrong password with 401 and no cookie', async () => {
    const client = await server.client();
    const res = await client.post('/api/auth/sign-in').send({ email: 'rowan@harborlight.example', password: 'wrong-password-1' }).expect(401);
    expect(res.body.error.code).toBe('unauthenticated');
    expect(String(res.headers['set-cookie'] ?? '')).not.toContain(SESSION_COOKIE);
  });

  it('signs out: the next request is 401', async () => {
    const client = await server.client();
    await client.post('/api/auth/sign-in').send({ email: 'rowan@harborlight.example', password: TEST_PASSWORD }).expect(200);
    await client.get('/api/me').expect(200);
    await client.post('/api/auth/sign-out').expect(204);
    await client.get('/api/me').expect(401);
  });

  it('rate-limits sign-in per address and e-mail with 429', async () => {
    const client = await server.client();
    const attempt = () => client.post('/api/auth/sign-in').send({ email: 'limit@example.org', password: 'whatever-123' });
    for (let i = 0; i < 3; i += 1) expect((await attempt()).status).toBe(401);
    const limited = await attempt();
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe('rate_limited');
  });
});

describe('CSRF protection', () => {
  it('refuses a cookie-authenticated write without the CSRF header', async () => {
    const client = await server.client();
    await client.post('/api/auth/sign-in').send({ email: 'rowan@harborlight.example', password: TEST_PASSWORD }).expect(200);
    const res = await client.post('/api/team/invites').set('X-CSRF-Token', '').send({ email: 'x@example.org', role: 'viewer' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_failed');
  });

  it('refuses a header that does not match the cookie', async () => {
    const client = await server.client();
    const res = await client.post('/api/auth/sign-out').set('X-CSRF-Token', 'a'.repeat(32));
    expect(res.body.error.code).toBe('csrf_failed');
  });
});

describe('session tokens', () => {
  async function userId(): Promise<string> {
    const { rows } = await server.db.pool.query<{ id: string }>("select id from users where email = 'rowan@harborlight.example'");
    return rows[0]!.id;
  }

  it('answers an expired token with 401', async () => {
    const past = createSessionTokens(SECRET, () => new Date(Date.now() - 13 * 60 * 60 * 1000));
    const token = await past.issue({ userId: await userId(), sessionVersion: 1 });
    const client = await server.client();
    await client.get('/api/me').set('Cookie', `${SESSION_COOKIE}=${token}`).expect(401);
  });

  it('answers a tampered token with 401, and the untampered one with 200', async () => {
    const token = await createSessionTokens(SECRET).issue({ userId: await userId(), sessionVersion: 1 });
    const client = await server.client();
    await client.get('/api/me').set('Cookie', `${SESSION_COOKIE}=${token}`).expect(200);
    const [header, payload, signature] = token.split('.');
    const forged = Buffer.from(JSON.stringify({ ...JSON.parse(Buffer.from(payload!, 'base64url').toString()), sv: 2 })).toString('base64url');
    await client.get('/api/me').set('Cookie', `${SESSION_COOKIE}=${header}.${forged}.${signature}`).expect(401);
    const otherKey = await createSessionTokens('another-secret-that-is-also-long-enough-1').issue({ userId: await userId(), sessionVersion: 1 });
    await client.get('/api/me').set('Cookie', `${SESSION_COOKIE}=${otherKey}`).expect(401);
  });
});

describe('password reset', () => {
  it('mails a link; the new password works, the old one and old sessions stop working', async () => {
    const old = await server.client();
    await old.post('/api/auth/sign-in').send({ email: 'rowan@harborlight.example', password: TEST_PASSWORD }).expect(200);

    const client = await server.client();
    const mail = server.smtp.inbox.waitFor('rowan@harborlight.example');
    await client.post('/api/auth/password-reset/request').send({ email: 'rowan@harborlight.example' }).expect(202);
    const link = (await mail).links.find((l) => l.includes('/reset?token='))!;
    const token = new URL(link).searchParams.get('token')!;

    await client.post('/api/auth/password-reset/confirm').send({ token, password: 'a-brand-new-password' }).expect(200);
    await old.get('/api/me').expect(401);
    await client.post('/api/auth/sign-in').send({ email: 'rowan@harborlight.example', password: TEST_PASSWORD }).expect(401);
    await client.post('/api/auth/sign-in').send({ email: 'rowan@harborlight.example', password: 'a-brand-new-password' }).expect(200);

    const reused = await client.post('/api/auth/password-reset/confirm').send({ token, password: 'yet-another-password' });
    expect(reused.status).toBe(400);
  });

  it('answers an unknown address the same way and sends nothing', async () => {
    const client = await server.client();
    const before = server.smtp.inbox.list().length;
    await client.post('/api/auth/password-reset/request').send({ email: 'nobody@example.org' }).expect(202);
    expect(server.smtp.inbox.list().length).toBe(before);
  });
});
