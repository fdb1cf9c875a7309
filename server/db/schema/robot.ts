import { jsonb, pgTable, timestamp, uuid } from 'drizzle-orm/pg-core';
import type { RobotProfile } from '../../../shared/schemas/robot-profile';
import { teams, users } from './auth';

/** One robot profile per team, validated with robotProfileSchema on the way in and out. */
export const robotProfiles = pgTable('robot_profiles', {
  teamId: uuid('team_id').primaryKey().references(() => teams.id, { onDelete: 'cascade' }),
  profile: jsonb('profile').$type<RobotProfile>().notNull(),
  updatedAt: timestamp('updated_at', { withTimezone: true }).notNull().defaultNow(),
  updatedBy: uuid('updated_by').references(() => users.id, { onDelete: 'set null' }),
});
