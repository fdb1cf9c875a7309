import type { ResetConfirmBody, SignInBody, SignUpBody } from '../../../shared/schemas/auth';
import { AppError, conflict } from '../../lib/errors';
import type { Logger } from '../../lib/logger';
import { randomToken, sha256 } from '../../lib/secrets';
import type { Mailer } from '../mail/mailer';
import { passwordResetMail } from '../mail/templates';
import type { Actor } from './actor';
import type { AuthStore } from './auth.repo';
import { hashPassword, verifyAgainstDummy, verifyPassword } from './passwords';

export const RESET_TTL_MS = 60 * 60 * 1000;

export interface AuthServiceDeps {
  store: AuthStore;
  mailer: Mailer;
  publicUrl: string;
  logger: Logger;
  now: () => Date;
}

const badCredentials = () => new AppError('unauthenticated', 'That e-mail address and password do not match');

export function createAuthService({ store, mailer, publicUrl, logger, now }: AuthServiceDeps) {
  async function loadActor(userId: string): Promise<Actor> {
    const actor = await store.findActor(userId);
    if (!actor) throw new AppError('unauthenticated', 'This account has no team any more');
    return actor;
  }

  return {
    loadActor,

    async signUp(body: SignUpBody): Promise<Actor> {
      const passwordHash = await hashPassword(body.password);
      const userId = await store.transaction(async (repo) => {
        if (await repo.findUserByEmail(body.email)) {
          throw conflict('An account with this e-mail address exists already', 'email');
        }
        if (await repo.findTeamByNumber(body.teamNumber)) {
          throw conflict(`Team ${body.teamNumber} is on Pitwall already: ask its lead for an invite`, 'teamNumber');
        }
        const teamId = await repo.insertTeam({ number: body.teamNumber, name: body.teamName });
        const id = await repo.insertUser({ email: body.email, name: body.name, passwordHash });
        await repo.insertMembership({ teamId, userId: id, role: 'lead' });
        return id;
      });
      return loadActor(userId);
    },

    async signIn(body: SignInBody): Promise<Actor> {
      const user = await store.findUserByEmail(body.email);
      if (!user) {
        await verifyAgainstDummy(body.password);
        throw badCredentials();
      }
      if (!(await verifyPassword(user.passwordHash, body.password))) throw badCredentials();
      return loadActor(user.id);
    },

    /** Mails a reset link when the address has an account; says nothing either way. */
    async requestPasswordReset(email: string): Promise<void> {
      const user = await store.findUserByEmail(email);
      if (!user) return;
      const token = randomToken();
      await store.insertPasswordReset({
        userId: user.id,
        tokenHash: sha256(token),
        expiresAt: new Date(now().getTime() + RESET_TTL_MS),
      });
      const link = `${publicUrl}/reset?token=${encodeURIComponent(token)}`;
      try {
        await mailer.send(passwordResetMail({ to: user.email, link, name: user.name }));
      } catch (err) {
        logger.error({ err }, 'password reset mail failed');
      }
    },

    async confirmPasswordReset(body: ResetConfirmBody): Promise<void> {
      const passwordHash = await hashPassword(body.password);
      await store.transaction(async (repo) => {
        const userId = await repo.consumePasswordReset(sha256(body.token), now());
        if (!userId) {
          throw new AppError('bad_request', 'This reset link is used or has expired: ask for a new one', [
            { path: 'token', message: 'Used or expired' },
          ]);
        }
        await repo.setPassword(userId, passwordHash);
      });
    },
  };
}

export type AuthService = ReturnType<typeof createAuthService>;
