// Boots the whole product: database (embedded or DATABASE_URL), migrations, demo seed, mail, HTTP.
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { createApp } from './app';
import { connectDb, type DbHandle } from './db/client';
import { startEmbeddedPostgres, withDatabase, type EmbeddedPostgres } from './db/embedded-postgres';
import { runMigrations } from './db/migrate';
import { seedDemoRecordings } from './features/demo/demo-recordings';
import { seedDemo } from './features/demo/seed';
import { ensureSimulatorKey } from './features/demo/simulator-key';
import { RELAY_PATH } from './relay/relay-server';
import { startFakeSmtp, type DevInbox, type FakeSmtp } from './features/mail/fake-smtp';
import { createSmtpMailer, type Mailer } from './features/mail/mailer';
import { loadTokenSecret, type Env } from './env';
import type { Logger } from './lib/logger';

export const PROJECT_ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '..');
export const CLIENT_DIST = path.join(PROJECT_ROOT, 'dist', 'client');
const DATABASE_NAME = 'pitwall';

export interface Running {
  url: string;
  port: number;
  /** ws://…/relay */
  relayUrl: string;
  /** The demo simulator's robot key file, when the demo was seeded. */
  simulatorKeyFile: string | undefined;
  databaseUrl: string;
  devInbox: DevInbox | undefined;
  stop(): Promise<void>;
}

export interface DatabaseHandle {
  url: string;
  /** Stops the embedded cluster when this process started it. */
  stop(): Promise<void>;
}

/** DATABASE_URL when given, else the embedded cluster under the data folder (with a `pitwall` database). */
export async function provideDatabase(env: Env, logger: Logger): Promise<DatabaseHandle> {
  if (env.DATABASE_URL) return { url: env.DATABASE_URL, stop: async () => {} };
  const cluster: EmbeddedPostgres = await startEmbeddedPostgres({
    dataDir: path.resolve(PROJECT_ROOT, env.PITWALL_DATA_DIR, 'pg'),
    log: (line) => logger.info(line),
  });
  await createDatabaseIfMissing(cluster.adminUrl, DATABASE_NAME);
  return { url: withDatabase(cluster.adminUrl, DATABASE_NAME), stop: () => cluster.stop() };
}

export async function createDatabaseIfMissing(adminUrl: string, name: string): Promise<void> {
  const client = new pg.Client({ connectionString: adminUrl });
  await client.connect();
  try {
    const { rowCount } = await client.query('select 1 from pg_database where datname = $1', [name]);
    if (!rowCount) await client.query(`create database "${name.replace(/"/g, '')}"`);
  } finally {
    await client.end();
  }
}

async function provideMail(env: Env): Promise<{ mailer: Mailer; fake?: FakeSmtp }> {
  if (env.SMTP_HOST) {
    return {
      mailer: createSmtpMailer({
        host: env.SMTP_HOST,
        port: env.SMTP_PORT,
        secure: env.SMTP_SECURE,
        user: env.SMTP_USER,
        pass: env.SMTP_PASS,
        from: env.SMTP_FROM,
      }),
    };
  }
  const fake = await startFakeSmtp(0);
  const mailer = createSmtpMailer({ host: '127.0.0.1', port: fake.port, secure: false, from: env.SMTP_FROM, ignoreTls: true });
  return { mailer, fake };
}

export interface StartOptions {
  env: Env;
  logger: Logger;
  databaseUrl: string;
  seed: boolean;
}

/** Migrates, seeds when asked, and serves the API and the built client. */
export async function startServer({ env, logger, databaseUrl, seed }: StartOptions): Promise<Running> {
  const handle: DbHandle = connectDb(databaseUrl);
  await runMigrations(handle.db);
  if (seed) {
    const { created } = await seedDemo(handle.db);
    logger.info(created ? `demo data: added ${created} rows` : 'demo data: already there');
    // About 5 s on the first start (12 headless matches); later starts only check they are there.
    const t0 = performance.now();
    const matches = await seedDemoRecordings(handle.db);
    if (matches.created) logger.info(`demo data: added ${matches.created} simulated matches in ${Math.round(performance.now() - t0)} ms`);
  }
  const mail = await provideMail(env);
  const server = http.createServer();
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(env.PORT, env.HOST, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  const shownHost = env.HOST === '0.0.0.0' || env.HOST === '::' ? '127.0.0.1' : env.HOST;
  const url = `http://${shownHost}:${port}`;
  const app = createApp({
    db: handle.db,
    logger,
    mailer: mail.mailer,
    devInbox: mail.fake?.inbox,
    tokenSecret: loadTokenSecret({ ...env, PITWALL_DATA_DIR: path.resolve(PROJECT_ROOT, env.PITWALL_DATA_DIR) }),
    publicUrl: env.PUBLIC_URL ?? url,
    cookies: { secure: env.PITWALL_COOKIE_SECURE },
    clientDir: CLIENT_DIST,
  });
  server.on('request', app.express);
  // Robots are let in once the recordings a previous run left unfinished are taken up again.
  await app.services.recorder.resumeUnfinished();
  server.on('upgrade', (req, socket, head) => app.relay.handleUpgrade(req, socket, head));
  const dataDir = path.resolve(PROJECT_ROOT, env.PITWALL_DATA_DIR);
  const simulatorKeyFile = seed ? path.join(dataDir, 'simulator-key') : undefined;
  if (simulatorKeyFile) await ensureSimulatorKey(handle.db, app.services.team, simulatorKeyFile);

  return {
    url,
    port,
    relayUrl: `${url.replace(/^http/, 'ws')}${RELAY_PATH}`,
    simulatorKeyFile,
    databaseUrl,
    devInbox: mail.fake?.inbox,
    async stop() {
      await app.relay.close();
      app.services.recorder.close();
      await app.services.recorder.settle();
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await mail.fake?.close();
      await handle.close();
    },
  };
}
