// Vitest global setup: one PostgreSQL for the whole run, shared by the projects that need it.
// It also builds a migrated template database, so each test file gets a fresh copy in milliseconds.
import path from 'node:path';
import type { TestProject } from 'vitest/node';
import pg from 'pg';
import { connectDb } from '../../server/db/client';
import { startEmbeddedPostgres, withDatabase } from '../../server/db/embedded-postgres';
import { runMigrations } from '../../server/db/migrate';
import { PROJECT_ROOT } from '../../server/runtime';

declare module 'vitest' {
  export interface ProvidedContext {
    pgAdminUrl: string;
    pgTemplate: string;
  }
}

interface SharedCluster {
  adminUrl: string;
  template: string;
  stop(): Promise<void>;
  users: number;
}

const KEY = Symbol.for('pitwall.test-postgres');
type Holder = { [KEY]?: Promise<SharedCluster> };
const holder = globalThis as Holder;

/** `.data/pg-test`, or PITWALL_TEST_PG_DIR so two test runs in one checkout keep to their own clusters. */
function testClusterDir(): string {
  return process.env.PITWALL_TEST_PG_DIR ?? path.join(PROJECT_ROOT, '.data', 'pg-test');
}

async function boot(): Promise<SharedCluster> {
  const given = process.env.DATABASE_URL;
  const cluster = given
    ? { adminUrl: given, stop: async () => {} }
    : await startEmbeddedPostgres({ dataDir: testClusterDir(), ephemeral: true });
  const template = `pitwall_test_template_${process.pid}`;
  const admin = new pg.Client({ connectionString: cluster.adminUrl });
  await admin.connect();
  try {
    await admin.query(`drop database if exists ${template}`);
    await admin.query(`create database ${template}`);
  } finally {
    await admin.end();
  }
  const handle = connectDb(withDatabase(cluster.adminUrl, template), { max: 1 });
  await runMigrations(handle.db);
  await handle.close();
  return {
    adminUrl: cluster.adminUrl,
    template,
    users: 0,
    async stop() {
      const client = new pg.Client({ connectionString: cluster.adminUrl });
      await client.connect();
      const { rows } = await client.query<{ datname: string }>(
        "select datname from pg_database where datname like 'pitwall_test_%'",
      );
      for (const { datname } of rows) await client.query(`drop database if exists "${datname}" with (force)`);
      await client.end();
      await cluster.stop();
    },
  };
}

export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  holder[KEY] ??= boot();
  const shared = await holder[KEY];
  shared.users += 1;
  project.provide('pgAdminUrl', shared.adminUrl);
  project.provide('pgTemplate', shared.template);
  return async () => {
    shared.users -= 1;
    if (shared.users === 0) {
      delete holder[KEY];
      await shared.stop();
    }
  };
}
