import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import type { Db } from '../../db/client';
import { authStore } from '../auth/auth.repo';
import { teamStore } from '../team/team.repo';
import type { TeamService } from '../team/team.service';
import { DEMO_TEAM } from './demo-team';

export const SIMULATOR_KEY_NAME = `${DEMO_TEAM.robot} simulator`;

/**
 * The demo team's robot key for the simulator, kept in `file` (mode 600) and reused while it still works;
 * a new one is created when the file is missing or its key was revoked.
 */
export async function ensureSimulatorKey(db: Db, team: TeamService, file: string): Promise<string> {
  if (existsSync(file)) {
    const secret = readFileSync(file, 'utf8').trim();
    const live = await team.authenticateRobot(secret);
    if (live) return secret;
  }
  const store = authStore(db);
  const teamRow = await store.findTeamByNumber(DEMO_TEAM.number);
  if (!teamRow) throw new Error('the demo team is missing: seed first');
  const members = await teamStore(db).listMembers(teamRow.id);
  const lead = members.find((m) => m.role === 'lead');
  const actor = lead && (await store.findActor(lead.userId));
  if (!actor) throw new Error('the demo team has no lead');
  const { secret } = await team.createRobotKey(actor, SIMULATOR_KEY_NAME);
  writeFileSync(file, `${secret}\n`, { mode: 0o600 });
  return secret;
}
