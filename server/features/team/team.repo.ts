import { and, desc, eq, gt, isNull, sql } from 'drizzle-orm';
import type { Role } from '../../../shared/domain/roles';
import type { Invite, InvitePreview, Member, RobotKey } from '../../../shared/schemas/team';
import type { Db } from '../../db/client';
import type { Executor } from '../../db/executor';
import { invites, memberships, robotKeys, teams, users } from '../../db/schema/index';
import { authRepo, type AuthRepo } from '../auth/auth.repo';

const iso = (d: Date) => d.toISOString();
const isoOrNull = (d: Date | null) => (d ? d.toISOString() : null);

export interface PendingInvite extends InvitePreview {
  id: string;
  teamId: string;
}

export function teamRepo(db: Executor) {
  const inviter = sql<string>`(select ${users.name} from ${users} where ${users.id} = ${invites.invitedBy})`;

  return {
    async listMembers(teamId: string): Promise<Member[]> {
      const rows = await db
        .select({
          userId: users.id,
          name: users.name,
          email: users.email,
          role: memberships.role,
          joinedAt: memberships.joinedAt,
        })
        .from(memberships)
        .innerJoin(users, eq(users.id, memberships.userId))
        .where(eq(memberships.teamId, teamId))
        .orderBy(memberships.joinedAt, users.name);
      return rows.map((r) => ({ ...r, joinedAt: iso(r.joinedAt) }));
    },

    /** The team's member roles, locked until the transaction ends so lead checks cannot race. */
    async lockRoles(teamId: string): Promise<{ userId: string; role: Role }[]> {
      return db
        .select({ userId: memberships.userId, role: memberships.role })
        .from(memberships)
        .where(eq(memberships.teamId, teamId))
        .for('update');
    },

    async setRole(teamId: string, userId: string, role: Role): Promise<void> {
      await db
        .update(memberships)
        .set({ role })
        .where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
    },

    /** Removes the membership and the account, which belongs to this team alone. */
    async removeMember(teamId: string, userId: string): Promise<void> {
      await db.delete(memberships).where(and(eq(memberships.teamId, teamId), eq(memberships.userId, userId)));
      await db.delete(users).where(eq(users.id, userId));
    },

    async emailHasAccount(email: string): Promise<boolean> {
      const [row] = await db
        .select({ id: users.id })
        .from(users)
        .where(sql`lower(${users.email}) = lower(${email})`)
        .limit(1);
      return row !== undefined;
    },

    async listPendingInvites(teamId: string, now: Date): Promise<Invite[]> {
      const rows = await db
        .select({
          id: invites.id,
          email: invites.email,
          role: invites.role,
          invitedByName: inviter,
          createdAt: invites.createdAt,
          expiresAt: invites.expiresAt,
        })
        .from(invites)
        .where(pending(teamId, now))
        .orderBy(desc(invites.createdAt));
      return rows.map((r) => ({ ...r, createdAt: iso(r.createdAt), expiresAt: iso(r.expiresAt) }));
    },

    async hasPendingInvite(teamId: string, email: string, now: Date): Promise<boolean> {
      const [row] = await db
        .select({ id: invites.id })
        .from(invites)
        .where(and(pending(teamId, now), sql`lower(${invites.email}) = lower(${email})`))
        .limit(1);
      return row !== undefined;
    },

    async insertInvite(input: {
      teamId: string;
      email: string;
      role: Role;
      tokenHash: string;
      invitedBy: string;
      expiresAt: Date;
    }): Promise<string> {
      const [row] = await db.insert(invites).values(input).returning({ id: invites.id });
      return row!.id;
    },

    async findInvite(teamId: string, id: string, now: Date): Promise<Invite | undefined> {
      return (await this.listPendingInvites(teamId, now)).find((i) => i.id === id);
    },

    async revokeInvite(teamId: string, id: string, now: Date): Promise<boolean> {
      const rows = await db
        .update(invites)
        .set({ revokedAt: now })
        .where(and(eq(invites.id, id), pending(teamId, now)))
        .returning({ id: invites.id });
      return rows.length > 0;
    },

    async findPendingInviteByToken(tokenHash: string, now: Date): Promise<PendingInvite | undefined> {
      const [row] = await db
        .select({
          id: invites.id,
          teamId: invites.teamId,
          email: invites.email,
          role: invites.role,
          teamNumber: teams.number,
          teamName: teams.name,
          invitedByName: inviter,
          expiresAt: invites.expiresAt,
        })
        .from(invites)
        .innerJoin(teams, eq(teams.id, invites.teamId))
        .where(
          and(
            eq(invites.tokenHash, tokenHash),
            isNull(invites.acceptedAt),
            isNull(invites.revokedAt),
            gt(invites.expiresAt, now),
          ),
        )
        .limit(1);
      return row ? { ...row, expiresAt: iso(row.expiresAt) } : undefined;
    },

    async markInviteAccepted(id: string, now: Date): Promise<boolean> {
      const rows = await db
        .update(invites)
        .set({ acceptedAt: now })
        .where(and(eq(invites.id, id), isNull(invites.acceptedAt), isNull(invites.revokedAt)))
        .returning({ id: invites.id });
      return rows.length > 0;
    },

    async listRobotKeys(teamId: string): Promise<RobotKey[]> {
      const rows = await db
        .select({
          id: robotKeys.id,
          name: robotKeys.name,
          prefix: robotKeys.prefix,
          createdByName: users.name,
          createdAt: robotKeys.createdAt,
          lastUsedAt: robotKeys.lastUsedAt,
          revokedAt: robotKeys.revokedAt,
        })
        .from(robotKeys)
        .innerJoin(users, eq(users.id, robotKeys.createdBy))
        .where(eq(robotKeys.teamId, teamId))
        .orderBy(desc(robotKeys.createdAt));
      return rows.map((r) => ({
        ...r,
        createdAt: iso(r.createdAt),
        lastUsedAt: isoOrNull(r.lastUsedAt),
        revokedAt: isoOrNull(r.revokedAt),
      }));
    },

    async insertRobotKey(input: {
      teamId: string;
      name: string;
      prefix: string;
      secretHash: string;
      createdBy: string;
    }): Promise<string> {
      const [row] = await db.insert(robotKeys).values(input).returning({ id: robotKeys.id });
      return row!.id;
    },

    async revokeRobotKey(teamId: string, id: string, now: Date): Promise<boolean> {
      const rows = await db
        .update(robotKeys)
        .set({ revokedAt: now })
        .where(and(eq(robotKeys.teamId, teamId), eq(robotKeys.id, id), isNull(robotKeys.revokedAt)))
        .returning({ id: robotKeys.id });
      return rows.length > 0;
    },

    /** The live key with this secret hash, marking it used. */
    async useRobotKey(
      secretHash: string,
      now: Date,
    ): Promise<{ id: string; teamId: string; teamNumber: number; name: string } | undefined> {
      const [row] = await db
        .update(robotKeys)
        .set({ lastUsedAt: now })
        .where(and(eq(robotKeys.secretHash, secretHash), isNull(robotKeys.revokedAt)))
        .returning({
          id: robotKeys.id,
          teamId: robotKeys.teamId,
          name: robotKeys.name,
          teamNumber: sql<number>`(select ${teams.number} from ${teams} where ${teams.id} = ${robotKeys.teamId})`,
        });
      return row;
    },
  };
}

function pending(teamId: string, now: Date) {
  return and(
    eq(invites.teamId, teamId),
    isNull(invites.acceptedAt),
    isNull(invites.revokedAt),
    gt(invites.expiresAt, now),
  );
}

export type TeamRepo = ReturnType<typeof teamRepo>;

/** Accepting an invite creates an account, so the team's transactions see the account tables too. */
export interface TeamTx extends TeamRepo {
  accounts: AuthRepo;
}

export function teamStore(db: Db) {
  return {
    ...teamRepo(db),
    transaction: <T>(fn: (repo: TeamTx) => Promise<T>): Promise<T> =>
      db.transaction((tx) => fn({ ...teamRepo(tx), accounts: authRepo(tx) })),
  };
}
export type TeamStore = ReturnType<typeof teamStore>;
