// The real Pitwall server as a child process for the benchmarks, demo sign-in, and psql for raw baselines.
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { freePort } from '../db/embedded-postgres';
import { DEMO_PASSWORD } from '../features/demo/demo-team';
import { PROJECT_ROOT } from '../runtime';

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

export interface BenchServer {
  child: ChildProcess;
  url: string;
  /** ws://…/relay of the same server. */
  relayUrl: string;
  stop(): Promise<void>;
}

/** The real server as a child process on a free port, with its own data directory. */
export async function startBenchServer(databaseUrl: string): Promise<BenchServer> {
  const port = await freePort();
  const dataDir = mkdtempSync(path.join(os.tmpdir(), 'pitwall-bench-'));
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(PROJECT_ROOT, 'server/bin/serve.ts')], {
    cwd: PROJECT_ROOT,
    env: { ...process.env, DATABASE_URL: databaseUrl, PORT: String(port), PITWALL_DATA_DIR: dataDir, LOG_LEVEL: 'warn' },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const url = `http://127.0.0.1:${port}`;
  for (let i = 0; ; i += 1) {
    if (await fetch(`${url}/api/health`).then((r) => r.ok, () => false)) break;
    if (i > 300) throw new Error('the bench server did not start');
    await sleep(50);
  }
  return {
    child,
    url,
    relayUrl: `ws://127.0.0.1:${port}/relay`,
    async stop() {
      child.kill('SIGTERM');
      await new Promise((r) => child.once('exit', r));
      rmSync(dataDir, { recursive: true, force: true });
    },
  };
}

/** Signs a demo member in: the Cookie header to send and the CSRF token for writes. */
export async function signInDemo(url: string, email: string): Promise<{ cookie: string; csrf: string }> {
  const csrf = ((await (await fetch(`${url}/api/auth/csrf`)).json()) as { csrfToken: string }).csrfToken;
  const res = await fetch(`${url}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: `pw_csrf=${csrf}`, 'x-csrf-token': csrf },
    body: JSON.stringify({ email, password: DEMO_PASSWORD }),
  });
  if (!res.ok) throw new Error(`bench sign-in as ${email} failed: ${res.status}`);
  const cookies = res.headers.getSetCookie().map((c) => c.split(';')[0]!);
  return { cookie: [...cookies, `pw_csrf=${csrf}`].join('; '), csrf };
}


/** COPY `text` (tab-separated rows) into `table` through psql: the raw baseline of the storage benchmarks. */
export function psqlCopy(databaseUrl: string, table: string, text: string): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn('psql', [databaseUrl, '-q', '-v', 'ON_ERROR_STOP=1', '-c', `copy ${table} (recording, signal_index, t_ms, value) from stdin`], {
      stdio: ['pipe', 'ignore', 'pipe'],
    });
    let err = '';
    child.stderr.on('data', (d) => (err += d));
    child.on('error', reject);
    child.on('exit', (code) => (code === 0 ? resolve() : reject(new Error(`psql copy failed: ${err}`))));
    child.stdin.end(text);
  });
}

export function psql(databaseUrl: string, command: string): void {
  const result = spawnSync('psql', [databaseUrl, '-q', '-v', 'ON_ERROR_STOP=1', '-c', command], { encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`psql failed: ${result.stderr}`);
}
