import { keepsALead, type Role } from '../../../shared/domain/roles';
import type { CreateInviteBody, CreatedRobotKey, Invite, InvitePreview, Member } from '../../../shared/schemas/team';
import { AppError, conflict, notFound } from '../../lib/errors';
import type { Logger } from '../../lib/logger';
import { randomToken, sha256 } from '../../lib/secrets';
import type { Actor } from '../auth/actor';
import { hashPassword } from '../auth/passwords';
import type { Mailer } from '../mail/mailer';
import { inviteMail } from '../mail/templates';
import type { TeamStore } from './team.repo';

export const INVITE_TTL_MS = 7 * 24 * 60 * 60 * 1000;
export const ROBOT_KEY_PREFIX = 'pwk';

export interface TeamServiceDeps {
  store: TeamStore;
  mailer: Mailer;
  publicUrl: string;
  logger: Logger;
  now: () => Date;
  /** Told after a key is revoked, so live robot sessions using it can be closed. */
  onRobotKeyRevoked?: (keyId: string) => void;
}

const noLeadLeft = () => conflict('A team keeps at least one lead: make someone else lead first');

export function createTeamService({ store, mailer, publicUrl, logger, now, onRobotKeyRevoked }: TeamServiceDeps) {
  async function memberOrThrow(teamId: string, userId: string): Promise<Member> {
    const member = (await store.listMembers(teamId)).find((m) => m.userId === userId);
    if (!member) throw notFound('That member');
    return member;
  }

  return {
    listMembers: (actor: Actor) => store.listMembers(actor.team.id),

    async changeRole(actor: Actor, userId: string, role: Role): Promise<Member> {
      await store.transaction(async (repo) => {
        const roles = await repo.lockRoles(actor.team.id);
        if (!roles.some((r) => r.userId === userId)) throw notFound('That member');
        const after = roles.map((r) => (r.userId === userId ? role : r.role));
        if (!keepsALead(after)) throw noLeadLeft();
        await repo.setRole(actor.team.id, userId, role);
      });
      return memberOrThrow(actor.team.id, userId);
    },

    async removeMember(actor: Actor, userId: string): Promise<void> {
      await store.transaction(async (repo) => {
        const roles = await repo.lockRoles(actor.team.id);
        if (!roles.some((r) => r.userId === userId)) throw notFound('That member');
        if (!keepsALead(roles.filter((r) => r.userId !== userId).map((r) => r.role))) throw noLeadLeft();
        await repo.removeMember(actor.team.id, userId);
      });
    },

    listInvites: (actor: Actor) => store.listPendingInvites(actor.team.id, now()),

    async createInvite(actor: Actor, body: CreateInviteBody): Promise<Invite> {
      const token = randomToken();
      const id = await store.transaction(async (repo) => {
        if (await repo.emailHasAccount(body.email)) {
          throw conflict('This e-mail address already has a Pitwall account', 'email');
        }
        if (await repo.hasPendingInvite(actor.team.id, body.email, now())) {
          throw conflict('This address has a pending invite already: revoke it to send a new one', 'email');
        }
        return repo.insertInvite({
          teamId: actor.team.id,
          email: body.email,
          role: body.role,
          tokenHash: sha256(token),
          invitedBy: actor.user.id,
          expiresAt: new Date(now().getTime() + INVITE_TTL_MS),
        });
      });
      const mail = inviteMail({
        to: body.email,
        link: `${publicUrl}/invite/${encodeURIComponent(token)}`,
        role: body.role,
        teamNumber: actor.team.number,
        teamName: actor.team.name,
        invitedByName: actor.user.name,
      });
      try {
        await mailer.send(mail);
      } catch (err) {
        logger.error({ err }, 'invite mail failed');
      }
      const invite = await store.findInvite(actor.team.id, id, now());
      if (!invite) throw notFound('The invite');
      return invite;
    },

    async revokeInvite(actor: Actor, id: string): Promise<void> {
      if (!(await store.revokeInvite(actor.team.id, id, now()))) throw notFound('That pending invite');
    },

    async previewInvite(token: string): Promise<InvitePreview> {
      const invite = await store.findPendingInviteByToken(sha256(token), now());
      if (!invite) throw notFound('This invite (it may have been used, revoked or expired)');
      const { id: _id, teamId: _teamId, ...preview } = invite;
      return preview;
    },

    /** Creates the invitee's account as a member with the invited role; returns the new user's id. */
    async acceptInvite(token: string, body: { name: string; password: string }): Promise<string> {
      const passwordHash = await hashPassword(body.password);
      return store.transaction(async (repo) => {
        const invite = await repo.findPendingInviteByToken(sha256(token), now());
        if (!invite) throw notFound('This invite (it may have been used, revoked or expired)');
        if (await repo.emailHasAccount(invite.email)) {
          throw conflict('This e-mail address already has a Pitwall account: sign in instead');
        }
        if (!(await repo.markInviteAccepted(invite.id, now()))) throw conflict('This invite was used just now');
        const userId = await repo.accounts.insertUser({ email: invite.email, name: body.name, passwordHash });
        await repo.accounts.insertMembership({ teamId: invite.teamId, userId, role: invite.role });
        return userId;
      });
    },

    listRobotKeys: (actor: Actor) => store.listRobotKeys(actor.team.id),

    async createRobotKey(actor: Actor, name: string): Promise<CreatedRobotKey> {
      const prefix = randomToken(6).replace(/[-_]/g, 'x').slice(0, 8);
      const secret = `${ROBOT_KEY_PREFIX}_${prefix}_${randomToken(32)}`;
      const id = await store.insertRobotKey({
        teamId: actor.team.id,
        name,
        prefix: `${ROBOT_KEY_PREFIX}_${prefix}`,
        secretHash: sha256(secret),
        createdBy: actor.user.id,
      });
      const key = (await store.listRobotKeys(actor.team.id)).find((k) => k.id === id);
      if (!key) throw new AppError('internal', 'The new key was not stored');
      return { key, secret };
    },

    async revokeRobotKey(actor: Actor, id: string): Promise<void> {
      if (!(await store.revokeRobotKey(actor.team.id, id, now()))) throw notFound('That live robot key');
      onRobotKeyRevoked?.(id);
    },

    /** The team and key a robot's secret belongs to, or undefined for an unknown or revoked key. */
    async authenticateRobot(
      secret: string,
    ): Promise<{ keyId: string; teamId: string; teamNumber: number; name: string } | undefined> {
      if (!secret.startsWith(`${ROBOT_KEY_PREFIX}_`)) return undefined;
      const key = await store.useRobotKey(sha256(secret), now());
      return key ? { keyId: key.id, teamId: key.teamId, teamNumber: key.teamNumber, name: key.name } : undefined;
    },
  };
}

export type TeamService = ReturnType<typeof createTeamService>;
