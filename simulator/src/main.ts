// `npm run sim`: the simulator as a live robot on the relay. `npm start` runs it for the demo.
import { readFileSync } from 'node:fs';
import { parseArgs } from 'node:util';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { storedRobotProfileSchema, type RobotProfile } from '../../shared/schemas/robot-profile';
import { startLiveRobot } from './live-robot';

const { values } = parseArgs({
  options: {
    url: { type: 'string', default: process.env.PITWALL_RELAY_URL ?? 'ws://127.0.0.1:5810/relay' },
    key: { type: 'string', default: process.env.PITWALL_ROBOT_KEY },
    'key-file': { type: 'string', default: process.env.PITWALL_ROBOT_KEY_FILE },
    alliance: { type: 'string', default: 'blue' },
    seed: { type: 'string', default: '7' },
    name: { type: 'string', default: 'Gullwing (simulator)' },
  },
});

const log = (line: string) => process.stdout.write(`simulator: ${line}\n`);

function robotKey(): string {
  const key = values.key ?? (values['key-file'] ? readFileSync(values['key-file'], 'utf8').trim() : undefined);
  if (!key) {
    process.stderr.write(
      'simulator: give a robot key with --key, --key-file or PITWALL_ROBOT_KEY (a lead creates one in Team settings → Robot keys)\n',
    );
    process.exit(2);
  }
  return key;
}

/** The team's robot profile from the server, or the default one when the server does not answer. */
async function loadProfile(url: string, key: string): Promise<RobotProfile> {
  const http = url.replace(/^ws/, 'http').replace(/\/relay$/, '/api/robot/profile');
  try {
    const res = await fetch(http, { headers: { authorization: `Bearer ${key}` } });
    if (res.ok) return storedRobotProfileSchema.parse(await res.json()).profile;
    log(`robot profile: ${res.status}; using the default profile`);
  } catch (err) {
    log(`robot profile not loaded (${err instanceof Error ? err.message : String(err)}); using the default profile`);
  }
  return DEFAULT_ROBOT_PROFILE;
}

const key = robotKey();
const alliance = values.alliance === 'red' ? 'red' : 'blue';
const robot = await loadProfile(values.url!, key);
log(`SIMULATED ROBOT "${values.name}" (${alliance}, seed ${values.seed}) → ${values.url}`);
const live = startLiveRobot({ url: values.url!, key, name: values.name!, season: season2025, robot, alliance, seed: Number(values.seed), log });
const stop = () => {
  live.stop();
  process.exit(0);
};
process.on('SIGINT', stop);
process.on('SIGTERM', stop);
