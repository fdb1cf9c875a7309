import { and, eq, gt, isNull, sql } from 'drizzle-orm';
import type { Role } from '../../../shared/domain/roles';
import type { Db } from '../../db/client';
import type { Executor } from '../../db/executor';
import { memberships, passwordResets, teams, users } from '../../db/schema/index';
import type { Actor } from './actor';

export interface UserRow {
  id: string;
  email: string;
  name: string;
  passwordHash: string;
  sessionVersion: number;
}

export function authRepo(db: Executor) {
  const findActorStatement = db
    .select({
      userId: users.id,
      email: users.email,
      name: users.name,
      sessionVersion: users.sessionVersion,
      teamId: teams.id,
      teamNumber: teams.number,
      teamName: teams.name,
      role: memberships.role,
    })
    .from(memberships)
    .innerJoin(users, eq(users.id, memberships.userId))
    .innerJoin(teams, eq(teams.id, memberships.teamId))
    .where(eq(memberships.userId, sql.placeholder('userId')))
    .limit(1)
    .prepare('auth_find_actor');
  return {
    async findUserByEmail(email: string): Promise<UserRow | undefined> {
      const [row] = await db
        .select()
        .from(users)
        .where(sql`lower(${users.email}) = lower(${email})`)
        .limit(1);
      return row;
    },

    /** Every signed-in request asks this: a prepared statement, parsed and planned once per connection. */
    async findActor(userId: string): Promise<Actor | undefined> {
      const [row] = await findActorStatement.execute({ userId });
      if (!row) return undefined;
      return {
        user: { id: row.userId, email: row.email, name: row.name },
        team: { id: row.teamId, number: row.teamNumber, name: row.teamName },
        role: row.role,
        sessionVersion: row.sessionVersion,
      };
    },

    async findTeamByNumber(number: number): Promise<{ id: string } | undefined> {
      const [row] = await db.select({ id: teams.id }).from(teams).where(eq(teams.number, number)).limit(1);
      return row;
    },

    async insertUser(input: { email: string; name: string; passwordHash: string }): Promise<string> {
      const [row] = await db.insert(users).values(input).returning({ id: users.id });
      return row!.id;
    },

    async insertTeam(input: { number: number; name: string }): Promise<string> {
      const [row] = await db.insert(teams).values(input).returning({ id: teams.id });
      return row!.id;
    },

    async insertMembership(input: { teamId: string; userId: string; role: Role }): Promise<void> {
      await db.insert(memberships).values(input);
    },

    async insertPasswordReset(input: { userId: string; tokenHash: string; expiresAt: Date }): Promise<void> {
      await db.insert(passwordResets).values(input);
    },

    /** Marks a valid reset used and returns its user, or undefined when it is unknown, used or expired. */
    async consumePasswordReset(tokenHash: string, now: Date): Promise<string | undefined> {
      const [row] = await db
        .update(passwordResets)
        .set({ usedAt: now })
        .where(
          and(eq(passwordResets.tokenHash, tokenHash), isNull(passwordResets.usedAt), gt(passwordResets.expiresAt, now)),
        )
        .returning({ userId: passwordResets.userId });
      return row?.userId;
    },

    async setPassword(userId: string, passwordHash: string): Promise<void> {
      await db
        .update(users)
        .set({ passwordHash, sessionVersion: sql`${users.sessionVersion} + 1` })
        .where(eq(users.id, userId));
    },
  };
}

export type AuthRepo = ReturnType<typeof authRepo>;

export function authStore(db: Db) {
  return {
    ...authRepo(db),
    transaction: <T>(fn: (repo: AuthRepo) => Promise<T>): Promise<T> => db.transaction((tx) => fn(authRepo(tx))),
  };
}
export type AuthStore = ReturnType<typeof authStore>;
