// The API server alone, for `npm run dev` (which restarts it on change) and for DATABASE_URL setups.
import { readEnv } from '../env';
import { createLogger } from '../lib/logger';
import { provideDatabase, startServer } from '../runtime';

const env = readEnv();
const logger = createLogger(env.LOG_LEVEL, { human: true });
const database = await provideDatabase(env, logger);
const running = await startServer({ env, logger, databaseUrl: database.url, seed: true });
logger.info(`API listening on ${running.url}${running.devInbox ? ` (dev inbox at ${running.url}/dev/inbox)` : ''}`);

const stop = async () => {
  await running.stop();
  await database.stop();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
