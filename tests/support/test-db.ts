import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { inject } from 'vitest';
import { connectDb, type DbHandle } from '../../server/db/client';
import { withDatabase } from '../../server/db/embedded-postgres';

export interface TestDatabase extends DbHandle {
  url: string;
  name: string;
  /** Closes the pool and drops the database. */
  drop(): Promise<void>;
}

/** A fresh, migrated database of its own for one test file. */
export async function createTestDatabase(): Promise<TestDatabase> {
  const adminUrl = inject('pgAdminUrl');
  const template = inject('pgTemplate');
  const name = `pitwall_test_${randomBytes(6).toString('hex')}`;
  await adminQuery(adminUrl, `create database ${name} template ${template}`);
  const url = withDatabase(adminUrl, name);
  const handle = connectDb(url);
  return {
    ...handle,
    url,
    name,
    async drop() {
      await handle.close();
      await adminQuery(adminUrl, `drop database if exists ${name} with (force)`);
    },
  };
}

async function adminQuery(url: string, sql: string): Promise<void> {
  for (let attempt = 0; ; attempt += 1) {
    const client = new pg.Client({ connectionString: url });
    await client.connect();
    try {
      await client.query(sql);
      return;
    } catch (err) {
      // Two files copying the template at once: PostgreSQL refuses the second while the first copies.
      const busy = err instanceof Error && /being accessed by other users/.test(err.message);
      if (!busy || attempt >= 20) throw err;
    } finally {
      await client.end();
    }
    await new Promise((r) => setTimeout(r, 100 + attempt * 50));
  }
}
