import { spawnSync } from 'node:child_process';
import { existsSync, readdirSync, statSync } from 'node:fs';
import path from 'node:path';
import { CLIENT_DIST, PROJECT_ROOT } from '../runtime';

function newestMtime(dir: string): number {
  let newest = 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    if (entry.name === 'node_modules') continue;
    const full = path.join(dir, entry.name);
    newest = Math.max(newest, entry.isDirectory() ? newestMtime(full) : statSync(full).mtimeMs);
  }
  return newest;
}

/** Builds the client with Vite when dist/client is missing or older than its sources. */
export function buildClientIfStale(log: (line: string) => void): void {
  const index = path.join(CLIENT_DIST, 'index.html');
  const sources = ['client', 'shared'].map((d) => newestMtime(path.join(PROJECT_ROOT, d)));
  if (existsSync(index) && statSync(index).mtimeMs >= Math.max(...sources)) return;
  log('building the client (vite build)…');
  const vite = path.join(PROJECT_ROOT, 'node_modules', 'vite', 'bin', 'vite.js');
  const result = spawnSync(process.execPath, [vite, 'build', '--logLevel', 'warn'], { cwd: PROJECT_ROOT, stdio: 'inherit' });
  if (result.status !== 0) throw new Error('vite build failed; see the messages above');
}
