// `npm start`: the whole product with demo data.
import { DEMO_MEMBERS, DEMO_PASSWORD, DEMO_TEAM } from '../features/demo/demo-team';
import { readEnv } from '../env';
import { createLogger } from '../lib/logger';
import { provideDatabase, startServer } from '../runtime';
import { buildClientIfStale } from './build-client';
import { startSimulator } from './simulator-process';

async function main(): Promise<void> {
  const started = Date.now();
  const env = readEnv();
  const logger = createLogger(env.LOG_LEVEL, { human: true });
  buildClientIfStale((line) => logger.info(line));
  const database = await provideDatabase(env, logger);
  const running = await startServer({ env, logger, databaseUrl: database.url, seed: true }).catch(async (err: unknown) => {
    // Leave nothing running behind a failed start.
    await database.stop();
    if ((err as NodeJS.ErrnoException).code === 'EADDRINUSE') {
      throw new Error(`port ${env.PORT} on ${env.HOST} is in use: stop what runs there or start with PORT=5811 npm start`);
    }
    throw err;
  });
  const simulator = env.PITWALL_SIMULATOR && running.simulatorKeyFile ? startSimulator(running.relayUrl, running.simulatorKeyFile) : undefined;

  const width = Math.max(...DEMO_MEMBERS.map((m) => m.email.length));
  const lines = [
    '',
    `  Pitwall is running at ${running.url}   (started in ${((Date.now() - started) / 1000).toFixed(1)} s)`,
    '',
    `  Demo sign-ins for team ${DEMO_TEAM.number} ${DEMO_TEAM.name} (password for all: ${DEMO_PASSWORD})`,
    ...DEMO_MEMBERS.map((m) => `    ${m.role.padEnd(11)} ${m.email.padEnd(width)}  ${m.name}`),
    '',
    simulator
      ? `  A SIMULATED robot (${DEMO_TEAM.robot}) is on the relay: watch it at ${running.url}/live`
      : '  No simulator (PITWALL_SIMULATOR=0).',
    running.devInbox ? `  Mail is caught locally: open ${running.url}/dev/inbox` : '  Mail goes out through SMTP_HOST.',
    '  Stop with Ctrl+C.',
    '',
  ];
  process.stdout.write(`${lines.join('\n')}\n`);

  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    logger.info('stopping…');
    simulator?.kill('SIGTERM');
    await running.stop();
    await database.stop();
    process.exit(0);
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
  process.on('SIGHUP', stop);
}

main().catch((err: unknown) => {
  process.stderr.write(`pitwall: ${err instanceof Error ? err.message : String(err)}\n`);
  process.exit(1);
});
