// `npm run dev`: Vite's dev server with the API proxied to a server that restarts on change.
import { spawn } from 'node:child_process';
import path from 'node:path';
import { readEnv } from '../env';
import { createLogger } from '../lib/logger';
import { PROJECT_ROOT, provideDatabase } from '../runtime';

const env = readEnv();
const logger = createLogger(env.LOG_LEVEL, { human: true });
const database = await provideDatabase(env, logger);
const apiPort = String(env.PORT);
const childEnv = {
  ...process.env,
  DATABASE_URL: database.url,
  PORT: apiPort,
  PITWALL_API_PORT: apiPort,
  // Links in mails open the Vite dev server, which proxies the API.
  PUBLIC_URL: env.PUBLIC_URL ?? 'http://127.0.0.1:5173',
};
const bin = (pkg: string, file: string) => path.join(PROJECT_ROOT, 'node_modules', pkg, file);

const children = [
  spawn(process.execPath, [bin('tsx', 'dist/cli.mjs'), 'watch', '--clear-screen=false', 'server/bin/serve.ts'], {
    cwd: PROJECT_ROOT,
    stdio: 'inherit',
    env: childEnv,
  }),
  spawn(process.execPath, [bin('vite', 'bin/vite.js')], { cwd: PROJECT_ROOT, stdio: 'inherit', env: childEnv }),
];

let stopping = false;
async function stop(): Promise<void> {
  if (stopping) return;
  stopping = true;
  for (const child of children) child.kill('SIGTERM');
  await Promise.all(children.map((c) => new Promise((resolve) => (c.exitCode !== null ? resolve(null) : c.once('exit', resolve)))));
  await database.stop();
  process.exit(0);
}
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
for (const child of children) child.on('exit', () => void stop());
