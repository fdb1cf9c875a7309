// `npm test`: typecheck, build the client, then every Vitest project (unit, integration against a
// real PostgreSQL it starts itself, browser tests in headless Chromium). Prints `N passed, N failed`.
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import path from 'node:path';
import { PROJECT_ROOT } from '../../server/runtime';
import { ensureChromium } from './ensure-chromium';

const started = Date.now();
const env = { ...process.env, NO_COLOR: '1', FORCE_COLOR: '0' };
const bin = (pkg: string, file: string) => path.join(PROJECT_ROOT, 'node_modules', pkg, file);

function step(title: string, command: string, args: string[]): void {
  const t0 = Date.now();
  process.stdout.write(`\n== ${title}\n`);
  const result = spawnSync(command, args, { cwd: PROJECT_ROOT, stdio: 'inherit', env });
  const seconds = ((Date.now() - t0) / 1000).toFixed(1);
  if (result.status !== 0) {
    process.stdout.write(`\n${title} failed after ${seconds} s\n0 passed, 1 failed\n`);
    process.exit(result.status ?? 1);
  }
  process.stdout.write(`== ${title}: ok in ${seconds} s\n`);
}

ensureChromium(env);
step('typecheck (tsc --noEmit)', process.execPath, [bin('typescript', 'bin/tsc'), '--noEmit', '-p', 'tsconfig.json']);
step('client build (vite build)', process.execPath, [bin('vite', 'bin/vite.js'), 'build', '--logLevel', 'warn']);

const reportDir = path.join(PROJECT_ROOT, '.data');
mkdirSync(reportDir, { recursive: true });
const report = path.join(reportDir, 'vitest-report.json');
rmSync(report, { force: true });
const t0 = Date.now();
process.stdout.write('\n== tests (vitest: unit, integration, browser)\n');
const vitest = spawnSync(
  process.execPath,
  [bin('vitest', 'vitest.mjs'), 'run', '--reporter=default', '--reporter=json', `--outputFile.json=${report}`, ...process.argv.slice(2)],
  { cwd: PROJECT_ROOT, stdio: 'inherit', env },
);

let passed = 0;
let failed = vitest.status === 0 ? 0 : 1;
if (existsSync(report)) {
  const summary = JSON.parse(readFileSync(report, 'utf8')) as { numPassedTests: number; numFailedTests: number };
  passed = summary.numPassedTests;
  failed = summary.numFailedTests + (vitest.status !== 0 && summary.numFailedTests === 0 ? 1 : 0);
}
const total = ((Date.now() - started) / 1000).toFixed(1);
process.stdout.write(`\ntests took ${((Date.now() - t0) / 1000).toFixed(1)} s; the whole command ${total} s\n`);
process.stdout.write(`${passed} passed, ${failed} failed\n`);
process.exitCode = vitest.status ?? 1;
