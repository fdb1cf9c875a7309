// Test-only entry: the Pitwall app with the PostgreSQL telemetry store, as its own process, so a test can
// kill it with SIGKILL mid-stream. Env: DATABASE_URL (migrated), PORT, PITWALL_DATA_DIR (the simulator key
// file goes there), PITWALL_TEST_STALL_AT_SEQ optional: once a message with that seq or later is stored, the
// store never returns, so the relay never confirms it (stored in the database, unknown to the robot).
// PITWALL_TEST_RECORDER=1: the app's own recorder instead (one recording per match from the robot's mode),
// taking up the recordings an earlier life left unfinished before robots are let in, as npm start does.
// Prints `ready <robot key>` once it listens.
import http from 'node:http';
import path from 'node:path';
import { createApp } from '../../server/app';
import { connectDb } from '../../server/db/client';
import { seedDemo } from '../../server/features/demo/seed';
import { ensureSimulatorKey } from '../../server/features/demo/simulator-key';
import { recordingsStore } from '../../server/features/recordings/recordings.repo';
import { createRecordingsService } from '../../server/features/recordings/recordings.service';
import { createLogger } from '../../server/lib/logger';
import { PgTelemetryStore } from '../../server/relay/pg-telemetry-store';
import type { DurableMessage, StreamRef, TelemetryStore } from '../../server/relay/telemetry-store';

const { DATABASE_URL, PORT, PITWALL_DATA_DIR } = process.env;
if (!DATABASE_URL || !PORT || !PITWALL_DATA_DIR) throw new Error('DATABASE_URL, PORT and PITWALL_DATA_DIR are needed');

const handle = connectDb(DATABASE_URL);
await seedDemo(handle.db);
const logger = createLogger('warn');
const recordings = createRecordingsService({ store: recordingsStore(handle.db), now: () => new Date() });
const pgStore = new PgTelemetryStore(recordings, { logger, classify: () => ({ kind: 'simulated', source: 'simulator' }) });
const stallAt = process.env.PITWALL_TEST_STALL_AT_SEQ === undefined ? undefined : Number(process.env.PITWALL_TEST_STALL_AT_SEQ);
const telemetryStore: TelemetryStore = {
  async append(stream: StreamRef, messages: DurableMessage[]) {
    await pgStore.append(stream, messages);
    if (stallAt !== undefined && messages.some((m) => m.seq >= stallAt)) await new Promise(() => {});
  },
};
const url = `http://127.0.0.1:${PORT}`;
const useRecorder = process.env.PITWALL_TEST_RECORDER === '1';
const app = createApp({
  db: handle.db,
  logger,
  mailer: { send: async () => {} },
  tokenSecret: 'test-secret-that-is-long-enough-for-hs256-signing',
  publicUrl: url,
  ...(useRecorder ? {} : { telemetryStore }),
});
if (useRecorder) await app.services.recorder.resumeUnfinished();
const key = await ensureSimulatorKey(handle.db, app.services.team, path.join(PITWALL_DATA_DIR, 'simulator-key'));
const server = http.createServer(app.express);
server.on('upgrade', (req, socket, head) => app.relay.handleUpgrade(req, socket, head));
server.listen(Number(PORT), '127.0.0.1', () => process.stdout.write(`ready ${key}\n`));
