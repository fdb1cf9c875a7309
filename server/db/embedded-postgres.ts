// Runs a private cluster of Debian's PostgreSQL under the project's .data/ folder, on 127.0.0.1 only.
// Trust authentication is acceptable only because the server listens on loopback alone.
import { execFileSync, spawnSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readdirSync, readFileSync, appendFileSync } from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

export interface EmbeddedPostgres {
  /** Connection string for the `postgres` maintenance database. */
  adminUrl: string;
  port: number;
  dataDir: string;
  /** Stops the cluster (fast shutdown) if this call started it. */
  stop(): Promise<void>;
}

export interface EmbeddedPostgresOptions {
  dataDir: string;
  /** Faster, crash-unsafe settings for throw-away test clusters. */
  ephemeral?: boolean;
  log?: (line: string) => void;
}

export class PostgresUnavailableError extends Error {}

const isRoot = () => process.getuid?.() === 0;

function findBinDir(): string | undefined {
  const base = '/usr/lib/postgresql';
  if (!existsSync(base)) return undefined;
  const versions = readdirSync(base)
    .filter((v) => existsSync(path.join(base, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions[0] ? path.join(base, versions[0], 'bin') : undefined;
}

function installPostgres(log: (line: string) => void): void {
  if (!isRoot()) {
    throw new PostgresUnavailableError(
      'PostgreSQL is not installed. Install Debian\'s package with `sudo apt-get install -y postgresql`, ' +
        'or set DATABASE_URL to a PostgreSQL server you already have, then run the command again.',
    );
  }
  log('installing Debian\'s postgresql package (apt-get), once…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  const apt = (args: string[]) =>
    spawnSync('apt-get', ['-o', 'DPkg::Lock::Timeout=900', ...args], { stdio: 'inherit', env }).status === 0;
  if (!apt(['install', '-y', 'postgresql']) && !(apt(['update']) && apt(['install', '-y', 'postgresql']))) {
    throw new PostgresUnavailableError('apt-get could not install postgresql; see the messages above.');
  }
}

/** Runs a PostgreSQL tool as the `postgres` system user when we are root (initdb refuses root). */
function runPg(binDir: string, tool: string, args: string[]): { status: number; output: string } {
  const cmd = path.join(binDir, tool);
  const [file, argv] = isRoot() ? ['runuser', ['-u', 'postgres', '--', cmd, ...args]] : [cmd, args];
  const result = spawnSync(file, argv, { cwd: '/', encoding: 'utf8' });
  return { status: result.status ?? 1, output: `${result.stdout ?? ''}${result.stderr ?? ''}` };
}

function canPostgresUserEnter(dir: string): boolean {
  if (!isRoot()) return true;
  return spawnSync('runuser', ['-u', 'postgres', '--', 'test', '-x', dir], { cwd: '/' }).status === 0;
}

/**
 * The postgres user must be able to enter every parent of the data folder. Where a parent is closed
 * (for example a 700 home folder), fall back to a folder under the system's temporary directory.
 */
function chooseDataDir(requested: string, log: (line: string) => void): string {
  mkdirSync(path.dirname(requested), { recursive: true });
  if (canPostgresUserEnter(path.dirname(requested))) return requested;
  const id = createHash('sha256').update(requested).digest('hex').slice(0, 12);
  const fallback = path.join(os.tmpdir(), `pitwall-pg-${id}`, path.basename(requested));
  log(`the postgres user cannot enter ${path.dirname(requested)}; keeping the cluster in ${fallback}`);
  mkdirSync(path.dirname(fallback), { recursive: true, mode: 0o755 });
  return fallback;
}

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.unref();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

function runningPort(dataDir: string, binDir: string): number | undefined {
  const pidFile = path.join(dataDir, 'postmaster.pid');
  if (!existsSync(pidFile)) return undefined;
  if (runPg(binDir, 'pg_ctl', ['-D', dataDir, 'status']).status !== 0) return undefined;
  const port = Number(readFileSync(pidFile, 'utf8').split('\n')[3]);
  return Number.isFinite(port) && port > 0 ? port : undefined;
}

/** Creates the cluster on first use, then starts it (or reuses it when it is already running). */
export async function startEmbeddedPostgres(options: EmbeddedPostgresOptions): Promise<EmbeddedPostgres> {
  const log = options.log ?? (() => {});
  let binDir = findBinDir();
  if (!binDir) {
    installPostgres(log);
    binDir = findBinDir();
    if (!binDir) throw new PostgresUnavailableError('postgresql was installed but initdb was not found.');
  }
  const dataDir = chooseDataDir(path.resolve(options.dataDir), log);

  if (!existsSync(path.join(dataDir, 'PG_VERSION'))) {
    log(`creating a PostgreSQL cluster in ${dataDir}…`);
    if (isRoot()) {
      execFileSync('install', ['-d', '-o', 'postgres', '-g', 'postgres', '-m', '700', dataDir]);
    } else {
      mkdirSync(dataDir, { recursive: true, mode: 0o700 });
    }
    const init = runPg(binDir, 'initdb', [
      '-D', dataDir, '-U', 'postgres', '--auth=trust', '--encoding=UTF8', '--locale=C.UTF-8',
    ]);
    if (init.status !== 0) throw new PostgresUnavailableError(`initdb failed:\n${init.output}`);
    const settings = [
      "listen_addresses = '127.0.0.1'",
      "unix_socket_directories = ''",
      ...(options.ephemeral ? ['fsync = off', 'synchronous_commit = off', 'full_page_writes = off'] : []),
    ];
    const conf = path.join(dataDir, 'postgresql.conf');
    const append = `\n# Pitwall\n${settings.join('\n')}\n`;
    if (isRoot()) {
      spawnSync('runuser', ['-u', 'postgres', '--', 'sh', '-c', `cat >> '${conf}'`], { input: append, cwd: '/' });
    } else {
      appendFileSync(conf, append);
    }
  }

  const existing = runningPort(dataDir, binDir);
  if (existing) {
    log(`PostgreSQL is already running on 127.0.0.1:${existing}`);
    return { adminUrl: urlFor(existing), port: existing, dataDir, stop: async () => {} };
  }
  const port = await freePort();
  const started = runPg(binDir, 'pg_ctl', [
    '-D', dataDir, '-l', path.join(dataDir, 'server.log'), '-w', '-t', '60', '-o', `-p ${port}`, 'start',
  ]);
  if (started.status !== 0) {
    const tail = existsSync(path.join(dataDir, 'server.log'))
      ? readFileSync(path.join(dataDir, 'server.log'), 'utf8').split('\n').slice(-15).join('\n')
      : '';
    throw new PostgresUnavailableError(`PostgreSQL did not start:\n${started.output}\n${tail}`);
  }
  log(`PostgreSQL is running on 127.0.0.1:${port} (data in ${dataDir})`);
  let stopped = false;
  return {
    adminUrl: urlFor(port),
    port,
    dataDir,
    stop: async () => {
      if (stopped) return;
      stopped = true;
      runPg(binDir, 'pg_ctl', ['-D', dataDir, '-m', 'fast', '-w', 'stop']);
    },
  };
}

function urlFor(port: number): string {
  return `postgres://postgres@127.0.0.1:${port}/postgres`;
}

/** The same server, another database. */
export function withDatabase(url: string, database: string): string {
  const u = new URL(url);
  u.pathname = `/${database}`;
  return u.toString();
}
