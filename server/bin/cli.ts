// `npm run cli -- <command>`: maintenance commands against DATABASE_URL or the embedded cluster.
import { connectDb, type Db } from '../db/client';
import { runMigrations } from '../db/migrate';
import { authStore } from '../features/auth/auth.repo';
import { seedDemo } from '../features/demo/seed';
import { createLogger } from '../lib/logger';
import { teamStore } from '../features/team/team.repo';
import { createTeamService } from '../features/team/team.service';
import { readEnv } from '../env';
import { provideDatabase } from '../runtime';

interface Command {
  summary: string;
  usage: string;
  run(args: Map<string, string>, db: Db): Promise<void>;
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
    async run(_args, db) {
      const { created } = await seedDemo(db);
      process.stdout.write(`demo data: ${created ? `added ${created} rows` : 'already there'}\n`);
    },
  },
  'robot-key': {
    summary: "create a robot key for a team's first lead and print its secret once",
    usage: 'robot-key --team 19850 --name Gullwing',
    async run(args, db) {
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
};

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
  const env = readEnv();
  const logger = createLogger('warn');
  const database = await provideDatabase(env, logger);
  const handle = connectDb(database.url);
  try {
    await runMigrations(handle.db);
    await command.run(parseFlags(rest), handle.db);
  } finally {
    await handle.close();
    await database.stop();
  }
}

main().catch((err: unknown) => {
  process.stderr.write(`pitwall cli: ${err instanceof Error ? err.message : String(err)}\n`);
  process.exit(1);
});
