import { spawn, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import { PROJECT_ROOT } from '../runtime';

/** Runs the simulator as its own process (it speaks the relay protocol like any robot). */
export function startSimulator(relayUrl: string, keyFile: string): ChildProcess {
  const child = spawn(
    process.execPath,
    ['--import', 'tsx', path.join(PROJECT_ROOT, 'simulator/src/main.ts'), '--url', relayUrl, '--key-file', keyFile],
    { cwd: PROJECT_ROOT, stdio: ['ignore', 'inherit', 'inherit'] },
  );
  child.on('exit', (code, signal) => {
    if (signal !== 'SIGTERM') process.stderr.write(`simulator stopped (${signal ?? `exit ${code}`})\n`);
  });
  return child;
}
