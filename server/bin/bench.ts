// `npm run bench`: benchmarks on a throw-away database of the embedded cluster (or DATABASE_URL's server).
import pg from 'pg';
import { benchAuth } from '../bench/auth.bench';
import { benchCycles } from '../bench/cycles.bench';
import { formatResults } from '../bench/bench-kit';
import { benchRecordings } from '../bench/recordings.bench';
import { benchRecordingsApi } from '../bench/recordings-api.bench';
import { benchRelay } from '../bench/relay.bench';
import { benchPanelDesigner } from '../bench/panel-designer';
import { benchReplayBrowser } from '../bench/replay-browser.bench';
import { benchPanelRun } from '../bench/panel-run.bench';
import { connectDb } from '../db/client';
import { withDatabase } from '../db/embedded-postgres';
import { runMigrations } from '../db/migrate';
import { readEnv } from '../env';
import { createLogger } from '../lib/logger';
import { provideDatabase } from '../runtime';
import { ensureChromium } from '../../tests/support/ensure-chromium';

// PITWALL_BENCH_ONLY=relay,cycles runs only those groups: auth, relay, storage, api (with the browser cases), cycles.
const only = new Set((process.env.PITWALL_BENCH_ONLY ?? '').split(',').map((x) => x.trim()).filter(Boolean));
const runs = (group: 'auth' | 'relay' | 'storage' | 'api' | 'cycles') => only.size === 0 || only.has(group);

const env = readEnv();
const database = await provideDatabase(env, createLogger('warn'));
const name = `pitwall_bench_${process.pid}`;
const admin = new pg.Client({ connectionString: database.url });
await admin.connect();
await admin.query(`create database ${name}`);
const handle = connectDb(withDatabase(database.url, name));
try {
  await runMigrations(handle.db);
  process.stdout.write('Pitwall benchmarks (each figure per call; ratios against the baseline of this run)\n\n');
  if (runs('auth')) process.stdout.write(`auth and sessions\n${formatResults(await benchAuth(handle.db))}\n\n`);
  const fanoutSeconds = Number(process.env.PITWALL_BENCH_FANOUT_S ?? '60');
  if (runs('relay')) {
    process.stdout.write(`relay\n${(await benchRelay({ databaseUrl: withDatabase(database.url, name), fanoutSeconds })).join('\n')}\n`);
  }
  if (runs('storage')) {
    const recordings = await benchRecordings(handle.db, { databaseUrl: withDatabase(database.url, name) });
    process.stdout.write(`\nrecording storage\n${recordings.join('\n')}\n`);
  }
  if (runs('api')) await benchApiAndBrowser();
  if (runs('cycles')) {
    process.stdout.write(`\ncycles\n${(await benchCycles(handle.db, { databaseUrl: withDatabase(database.url, name) })).join('\n')}\n`);
  }
} finally {
  await handle.close();
  await admin.query(`drop database if exists ${name} with (force)`);
  await admin.end();
  await database.stop();
}

/** The recordings API, then the browser cases on the same server and recording. */
async function benchApiAndBrowser(): Promise<void> {
  const recordingsApi = await benchRecordingsApi({ databaseUrl: withDatabase(database.url, name), keepServer: true });
  process.stdout.write(`\nrecordings API\n${recordingsApi.lines.join('\n')}\n`);
  try {
    ensureChromium();
    const replay = await benchReplayBrowser({ server: recordingsApi.server, recordingId: recordingsApi.recordingId });
    process.stdout.write(`\nreplay in the browser\n${replay.join('\n')}\n`);
    const designer = await benchPanelDesigner({ server: recordingsApi.server });
    process.stdout.write(`\npanel designer in the browser\n${designer.join('\n')}\n`);
    const run = await benchPanelRun({ server: recordingsApi.server });
    process.stdout.write(`\nrun mode in the browser\n${run.join('\n')}\n`);
  } finally {
    await recordingsApi.server.stop();
  }
}
