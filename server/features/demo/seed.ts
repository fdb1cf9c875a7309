import type { Db } from '../../db/client';
import { authStore } from '../auth/auth.repo';
import { hashPassword } from '../auth/passwords';
import { seedDemoPanels } from './demo-panel-seed';
import { seedDemoDrills } from './demo-drills';
import { DEMO_MEMBERS, DEMO_PASSWORD, DEMO_TEAM } from './demo-team';

/** Adds whatever of the demo team is missing; running it again changes nothing. */
export async function seedDemo(db: Db): Promise<{ created: number }> {
  const store = authStore(db);
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const seeded = await store.transaction(async (repo) => {
    let created = 0;
    let teamId = (await repo.findTeamByNumber(DEMO_TEAM.number))?.id;
    if (!teamId) {
      teamId = await repo.insertTeam({ number: DEMO_TEAM.number, name: DEMO_TEAM.name });
      created += 1;
    }
    for (const member of DEMO_MEMBERS) {
      if (await repo.findUserByEmail(member.email)) continue;
      const userId = await repo.insertUser({ email: member.email, name: member.name, passwordHash });
      await repo.insertMembership({ teamId, userId, role: member.role });
      created += 1;
    }
    return { created };
  });
  const drills = await seedDemoDrills(db);
  return { created: seeded.created + (await seedDemoPanels(db)).created + drills.drills + drills.results };
}
