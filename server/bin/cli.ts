// `npm run cli -- <command>`: maintenance commands against DATABASE_URL or the embedded cluster.
import { connectDb, type Db } from '../db/client';
import { runMigrations } from '../db/migrate';
import { authStore } from '../features/auth/auth.repo';
import { seedDemo } from '../features/demo/seed';
import { createLogger } from '../lib/logger';
import { robotProfileRepo } from '../features/season/robot-profile.repo';
import { createSeasonService } from '../features/season/season.service';
import { teamStore } from '../features/team/team.repo';
import type { BranchTargets } from '../../shared/domain/season/targets';
import { targetsQuerySchema } from '../../shared/schemas/season';
import { writeFileSync } from 'node:fs';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { runHeadlessMatch } from '../../simulator/src/headless';
import { encodeHeadlessMatch } from '../../simulator/src/match-file';
import { createTeamService } from '../features/team/team.service';
import { readEnv } from '../env';
import { provideDatabase } from '../runtime';

interface Command {
  summary: string;
  usage: string;
  /** Whether the command opens the database; `targets` with --depth and --side does not. */
  needsDb(args: Map<string, string>): boolean;
  run(args: Map<string, string>, db: Db | undefined): Promise<void>;
}

const always = () => true;

function requireDb(db: Db | undefined): Db {
  if (!db) throw new Error('this command needs the database');
  return db;
}

function parseFlags(argv: string[]): Map<string, string> {
  const flags = new Map<string, string>();
  for (let i = 0; i < argv.length; i += 1) {
    const arg = argv[i]!;
    if (!arg.startsWith('--')) continue;
    const next = argv[i + 1];
    const hasValue = next !== undefined && !next.startsWith('--');
    flags.set(arg.slice(2), hasValue ? next : 'true');
    if (hasValue) i += 1;
  }
  return flags;
}

const COMMANDS: Record<string, Command> = {
  seed: {
    summary: 'add the demo team (idempotent)',
    usage: 'seed',
    needsDb: always,
    async run(_args, db) {
      const { created } = await seedDemo(requireDb(db));
      process.stdout.write(`demo data: ${created ? `added ${created} rows` : 'already there'}\n`);
    },
  },
  'robot-key': {
    summary: "create a robot key for a team's first lead and print its secret once",
    usage: 'robot-key --team 19850 --name Gullwing',
    needsDb: always,
    async run(args, maybeDb) {
      const db = requireDb(maybeDb);
      const number = Number(args.get('team'));
      const name = args.get('name') ?? 'robot';
      const team = await authStore(db).findTeamByNumber(number);
      if (!team) throw new Error(`no team ${args.get('team') ?? '(give --team)'}`);
      const store = teamStore(db);
      const lead = (await store.listMembers(team.id)).find((m) => m.role === 'lead');
      const actor = lead && (await authStore(db).findActor(lead.userId));
      if (!actor) throw new Error('that team has no lead');
      const service = createTeamService({
        store,
        mailer: { send: async () => {} },
        publicUrl: '',
        logger: createLogger('silent'),
        now: () => new Date(),
      });
      const { key, secret } = await service.createRobotKey(actor, name);
      process.stdout.write(`${key.name} (${key.prefix}): ${secret}\n`);
    },
  },
  targets: {
    summary: 'the 12 branch targets of an alliance (a team\'s robot profile, or --depth/--side)',
    usage: 'targets --alliance red [--depth 0.45] [--side left] [--team 19850] [--json]',
    needsDb: (args) => !(args.has('depth') && args.has('side')),
    async run(args, db) {
      const query = targetsQuerySchema.parse({ alliance: args.get('alliance'), depth: args.get('depth'), side: args.get('side') });
      const teamNumber = args.has('team') ? Number(args.get('team')) : undefined;
      const teamId = db && teamNumber !== undefined ? (await authStore(db).findTeamByNumber(teamNumber))?.id : undefined;
      if (teamNumber !== undefined && !teamId) throw new Error(`no team ${args.get('team')}`);
      const profiles = db ? robotProfileRepo(db) : { find: async () => undefined, save: async () => {} };
      const result = await createSeasonService({ profiles }).targets(teamId ?? '00000000-0000-4000-8000-000000000000', query);
      if (args.has('json')) {
        process.stdout.write(`${JSON.stringify(result, null, 2)}\n`);
        return;
      }
      process.stdout.write(`${formatTargets(result)}\n`);
    },
  },
  simulate: {
    summary: 'play a whole simulated match faster than real time and write it as a recording file',
    usage: 'simulate --seed 7 --out match.pwrec [--alliance blue] [--team 19850]',
    needsDb: (args) => args.has('team'),
    async run(args, db) {
      const seed = Number(args.get('seed') ?? '7');
      const out = args.get('out');
      if (!Number.isInteger(seed)) throw new Error('--seed takes a whole number');
      if (!out) throw new Error('give --out FILE');
      const alliance = args.get('alliance') === 'red' ? 'red' : 'blue';
      let robot = DEFAULT_ROBOT_PROFILE;
      if (db && args.has('team')) {
        const team = await authStore(db).findTeamByNumber(Number(args.get('team')));
        if (!team) throw new Error(`no team ${args.get('team')}`);
        robot = (await robotProfileRepo(db).find(team.id))?.profile ?? DEFAULT_ROBOT_PROFILE;
      }
      const started = performance.now();
      const match = runHeadlessMatch({ seed, season: season2025, robot, alliance });
      const bytes = encodeHeadlessMatch(match, { source: 'simulator', robot: robot.name, seed });
      writeFileSync(out, bytes);
      const samples = match.batches.reduce((n, b) => n + b.ticks, 0) * match.signals.length;
      const placed = match.events.filter((e) => e.kind === 'placed').length;
      process.stdout.write(
        `${out}: ${match.signals.length} signals, ${samples} samples, ${match.events.length} events (${placed} coral placed), ` +
          `${bytes.byteLength} bytes (${(bytes.byteLength / samples).toFixed(2)} B/sample), ${(performance.now() - started).toFixed(0)} ms\n`,
      );
    },
  },
};

function formatTargets(result: BranchTargets): string {
  const head = `${result.alliance} reef, scoring side ${result.side}, ${result.depthM.toFixed(3)} m from face to robot centre`;
  const rows = result.targets.map(
    (t) =>
      `  ${t.branch}  ${t.face}  tag ${String(t.tagId).padStart(2)}  x ${t.x.toFixed(3).padStart(7)} m  y ${t.y.toFixed(3).padStart(6)} m  heading ${t.headingDeg.toFixed(1).padStart(6)}°`,
  );
  return [head, ...rows].join('\n');
}

function help(): void {
  const lines = Object.entries(COMMANDS).map(([, c]) => `  npm run cli -- ${c.usage.padEnd(44)} ${c.summary}`);
  process.stdout.write(`Pitwall command line\n\n${lines.join('\n')}\n`);
}

async function main(): Promise<void> {
  const [name, ...rest] = process.argv.slice(2);
  const command = name ? COMMANDS[name] : undefined;
  if (!command) {
    help();
    process.exitCode = name && name !== 'help' ? 2 : 0;
    return;
  }
  const flags = parseFlags(rest);
  if (!command.needsDb(flags)) {
    await command.run(flags, undefined);
    return;
  }
  const env = readEnv();
  const logger = createLogger('warn');
  const database = await provideDatabase(env, logger);
  const handle = connectDb(database.url);
  try {
    await runMigrations(handle.db);
    await command.run(flags, handle.db);
  } finally {
    await handle.close();
    await database.stop();
  }
}

main().catch((err: unknown) => {
  process.stderr.write(`pitwall cli: ${err instanceof Error ? err.message : String(err)}\n`);
  process.exit(1);
});
