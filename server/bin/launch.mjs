#!/usr/bin/env node
// Plain Node on purpose: this runs before node_modules exists. It installs the npm dependencies when
// they are missing or out of date with package-lock.json, then runs the TypeScript entry point.
import { createHash } from 'node:crypto';
import { spawn, spawnSync } from 'node:child_process';
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import path from 'node:path';

const root = path.resolve(path.dirname(fileURLToPath(import.meta.url)), '../..');

const ENTRIES = {
  start: 'server/bin/start.ts',
  dev: 'server/bin/dev.ts',
  test: 'tests/support/run-tests.ts',
  bench: 'server/bin/bench.ts',
  cli: 'server/bin/cli.ts',
  sim: 'simulator/src/main.ts',
  migrate: 'server/bin/migrate.ts',
};

function ensureDependencies() {
  const lock = readFileSync(path.join(root, 'package-lock.json'));
  const wanted = createHash('sha256').update(lock).digest('hex');
  const stamp = path.join(root, 'node_modules', '.pitwall-lock-sha256');
  if (existsSync(stamp) && readFileSync(stamp, 'utf8').trim() === wanted) return;
  console.log('pitwall: installing npm dependencies (npm ci), once per change of package-lock.json…');
  const result = spawnSync('npm', ['ci', '--no-audit', '--no-fund'], { cwd: root, stdio: 'inherit' });
  if (result.status !== 0) {
    console.error('pitwall: npm ci failed; see the messages above.');
    process.exit(result.status ?? 1);
  }
  writeFileSync(stamp, wanted);
}

const [command, ...args] = process.argv.slice(2);
const entry = ENTRIES[command ?? ''];
if (!entry) {
  console.error(`usage: node server/bin/launch.mjs <${Object.keys(ENTRIES).join('|')}> [args…]`);
  process.exit(2);
}
ensureDependencies();
const child = spawn(process.execPath, ['--import', 'tsx', path.join(root, entry), ...args], {
  cwd: root,
  stdio: 'inherit',
});
for (const signal of ['SIGINT', 'SIGTERM', 'SIGHUP']) {
  process.on(signal, () => child.kill(signal));
}
child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
