// Debian's Chromium for the browser tests and browser benchmarks, installed with apt-get when missing.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

/** Installs Debian's chromium when it is missing and this runs as root (CI); otherwise says how, and exits. */
export function ensureChromium(env: NodeJS.ProcessEnv = process.env): void {
  if (existsSync('/usr/bin/chromium')) return;
  if (process.getuid?.() !== 0) {
    process.stderr.write('Browser tests and benchmarks need Debian\'s Chromium: run `sudo apt-get install -y chromium` and try again.\n');
    process.exit(1);
  }
  const apt = (args: string[]) =>
    spawnSync('apt-get', ['-o', 'DPkg::Lock::Timeout=900', ...args], {
      stdio: 'inherit',
      env: { ...env, DEBIAN_FRONTEND: 'noninteractive' },
    }).status === 0;
  process.stdout.write('installing Debian\'s chromium for the browser tests and benchmarks (apt-get), once…\n');
  if (!(apt(['update']) && apt(['install', '-y', 'chromium']))) {
    process.stderr.write('apt-get could not install chromium.\n');
    process.exit(1);
  }
}

