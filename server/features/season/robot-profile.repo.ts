import { eq } from 'drizzle-orm';
import { robotProfileSchema, type RobotProfile } from '../../../shared/schemas/robot-profile';
import type { Db } from '../../db/client';
import { robotProfiles, users } from '../../db/schema/index';

export interface RobotProfileRow {
  profile: RobotProfile;
  updatedAt: Date;
  updatedByName: string | null;
}

export function robotProfileRepo(db: Db) {
  return {
    async find(teamId: string): Promise<RobotProfileRow | undefined> {
      const [row] = await db
        .select({ profile: robotProfiles.profile, updatedAt: robotProfiles.updatedAt, updatedByName: users.name })
        .from(robotProfiles)
        .leftJoin(users, eq(users.id, robotProfiles.updatedBy))
        .where(eq(robotProfiles.teamId, teamId))
        .limit(1);
      // Stored JSON is checked on the way out too, so an older shape fails loudly rather than silently.
      return row ? { ...row, profile: robotProfileSchema.parse(row.profile) } : undefined;
    },

    async save(teamId: string, profile: RobotProfile, userId: string | null): Promise<void> {
      const now = new Date();
      await db
        .insert(robotProfiles)
        .values({ teamId, profile, updatedAt: now, updatedBy: userId })
        .onConflictDoUpdate({ target: robotProfiles.teamId, set: { profile, updatedAt: now, updatedBy: userId } });
    },
  };
}
export type RobotProfileRepo = ReturnType<typeof robotProfileRepo>;
