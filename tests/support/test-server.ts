import http from 'node:http';
import type { AddressInfo } from 'node:net';
import request from 'supertest';
import { createApp, type App, type AppDeps } from '../../server/app';
import { startFakeSmtp, type FakeSmtp } from '../../server/features/mail/fake-smtp';
import { createSmtpMailer } from '../../server/features/mail/mailer';
import { createLogger } from '../../server/lib/logger';
import { createTestDatabase, type TestDatabase } from './test-db';

export interface TestServer {
  app: App;
  db: TestDatabase;
  smtp: FakeSmtp;
  url: string;
  /** A client with its own cookie jar that sends the CSRF header on every write. */
  client(): Promise<TestClient>;
  close(): Promise<void>;
}

export type TestClient = ReturnType<typeof request.agent> & { csrf: string };

export async function startTestServer(overrides: Partial<AppDeps> = {}): Promise<TestServer> {
  const db = await createTestDatabase();
  const smtp = await startFakeSmtp(0);
  const server = http.createServer();
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  const app = createApp({
    db: db.db,
    logger: createLogger('silent'),
    mailer: createSmtpMailer({ host: '127.0.0.1', port: smtp.port, secure: false, from: 'Pitwall <pitwall@localhost>', ignoreTls: true }),
    devInbox: smtp.inbox,
    tokenSecret: 'test-secret-that-is-long-enough-for-hs256-signing',
    publicUrl: url,
    ...overrides,
  });
  server.on('request', app.express);
  server.on('upgrade', (req, socket, head) => app.relay.handleUpgrade(req, socket, head));
  return {
    app,
    db,
    smtp,
    url,
    async client() {
      const agent = request.agent(server);
      const res = await agent.get('/api/auth/csrf').expect(200);
      const csrf: string = res.body.csrfToken;
      agent.set('X-CSRF-Token', csrf);
      return Object.assign(agent, { csrf });
    },
    async close() {
      await app.relay.close();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await smtp.close();
      await db.drop();
    },
  };
}

export const TEST_PASSWORD = 'correct-horse-battery';

/** Signs up a fresh team; returns a signed-in client for its lead. */
export async function signUpTeam(
  server: TestServer,
  input: { email: string; teamNumber: number; teamName?: string; name?: string },
): Promise<TestClient> {
  const client = await server.client();
  await client
    .post('/api/auth/sign-up')
    .send({
      email: input.email,
      password: TEST_PASSWORD,
      name: input.name ?? 'Rowan Vale',
      teamNumber: input.teamNumber,
      teamName: input.teamName ?? 'Harborlight Robotics',
    })
    .expect(201);
  return client;
}

/** Invites `email` with `role` from `lead`, accepts through the mailed link, returns the new member's client. */
export async function addMember(
  server: TestServer,
  lead: TestClient,
  input: { email: string; role: string; name?: string },
): Promise<TestClient> {
  const mail = server.smtp.inbox.waitFor(input.email);
  await lead.post('/api/team/invites').send({ email: input.email, role: input.role }).expect(201);
  const token = inviteToken((await mail).links);
  const client = await server.client();
  await client
    .post(`/api/invites/${token}/accept`)
    .send({ name: input.name ?? 'Tomas Reyes', password: TEST_PASSWORD })
    .expect(201);
  return client;
}

export function inviteToken(links: string[]): string {
  const link = links.find((l) => l.includes('/invite/'));
  if (!link) throw new Error(`no invite link in ${links.join(', ')}`);
  return decodeURIComponent(new URL(link).pathname.split('/').pop()!);
}
