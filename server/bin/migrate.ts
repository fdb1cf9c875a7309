// `npm run db:migrate`: applies drizzle/ to DATABASE_URL or the embedded cluster, then stops.
import { connectDb } from '../db/client';
import { runMigrations } from '../db/migrate';
import { readEnv } from '../env';
import { createLogger } from '../lib/logger';
import { provideDatabase } from '../runtime';

const env = readEnv();
const logger = createLogger(env.LOG_LEVEL);
const database = await provideDatabase(env, logger);
const handle = connectDb(database.url);
try {
  await runMigrations(handle.db);
  logger.info('migrations applied');
} finally {
  await handle.close();
  await database.stop();
}
