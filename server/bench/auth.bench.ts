// Sign-in and session cost, as ratios to an unauthenticated health check measured in the same run.
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import { createApp } from '../app';
import type { Db } from '../db/client';
import { seedDemo } from '../features/demo/seed';
import { DEMO_MEMBERS, DEMO_PASSWORD } from '../features/demo/demo-team';
import { createLogger } from '../lib/logger';
import type { BenchResult } from './bench-kit';
import { measure } from './bench-kit';

export async function benchAuth(db: Db): Promise<BenchResult[]> {
  await seedDemo(db);
  const app = createApp({
    db,
    logger: createLogger('silent'),
    mailer: { send: async () => {} },
    tokenSecret: 'bench-secret-that-is-long-enough-for-hs256-signing',
    publicUrl: 'http://127.0.0.1',
    signInLimit: { windowMs: 1000, max: 1_000_000 },
  });
  const server = http.createServer(app.express);
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const base = `http://127.0.0.1:${(server.address() as AddressInfo).port}/api`;
  const csrfRes = await fetch(`${base}/auth/csrf`);
  const csrf = ((await csrfRes.json()) as { csrfToken: string }).csrfToken;
  const signIn = () =>
    fetch(`${base}/auth/sign-in`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie: `pw_csrf=${csrf}`, 'x-csrf-token': csrf },
      body: JSON.stringify({ email: DEMO_MEMBERS[0]!.email, password: DEMO_PASSWORD }),
    });
  const first = await signIn();
  const session = first.headers.getSetCookie().find((c) => c.startsWith('pw_session='))!.split(';')[0]!;

  try {
    const health = await measure('GET /api/health (baseline)', 400, async () => {
      await (await fetch(`${base}/health`)).arrayBuffer();
    });
    const me = await measure('GET /api/me (verify JWT, load member)', 400, async () => {
      await (await fetch(`${base}/me`, { headers: { cookie: session } })).arrayBuffer();
    });
    const signInResult = await measure('POST /api/auth/sign-in (argon2id verify)', 40, async () => {
      await (await signIn()).arrayBuffer();
    });
    return [health, { ...me, baseline: health }, { ...signInResult, baseline: health }];
  } finally {
    server.closeAllConnections();
    await new Promise<void>((resolve) => server.close(() => resolve()));
  }
}
