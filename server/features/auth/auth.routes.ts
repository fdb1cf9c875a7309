import { Router } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import {
  csrfSchema,
  meSchema,
  okSchema,
  resetConfirmBodySchema,
  resetRequestBodySchema,
  signInBodySchema,
  signUpBodySchema,
  type Me,
} from '../../../shared/schemas/auth';
import { errorBody } from '../../lib/errors';
import type { Actor } from './actor';
import type { AuthService } from './auth.service';
import {
  actorOf,
  clearSessionCookie,
  ensureCsrfCookie,
  requireMember,
  setSessionCookie,
  type CookiePolicy,
} from './session.middleware';
import type { SessionTokens } from './session-token';

export interface SignInLimit {
  windowMs: number;
  max: number;
}

export const DEFAULT_SIGN_IN_LIMIT: SignInLimit = { windowMs: 15 * 60 * 1000, max: 10 };

export function toMe(actor: Actor): Me {
  return meSchema.parse({ user: actor.user, team: actor.team, role: actor.role });
}

export function authRouter(deps: {
  auth: AuthService;
  tokens: SessionTokens;
  cookies: CookiePolicy;
  signInLimit: SignInLimit;
}): Router {
  const { auth, tokens, cookies } = deps;
  const router = Router();

  const signInLimiter = rateLimit({
    windowMs: deps.signInLimit.windowMs,
    limit: deps.signInLimit.max,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    // Only failed attempts count, so a team signing in on several devices is never locked out.
    skipSuccessfulRequests: true,
    keyGenerator: (req) => {
      const email = typeof req.body?.email === 'string' ? req.body.email.trim().toLowerCase() : '';
      return `${ipKeyGenerator(req.ip ?? '')}|${email}`;
    },
    handler: (_req, res) => {
      res.status(429).json(errorBody('rate_limited', 'Too many sign-in attempts: wait a few minutes and try again'));
    },
  });

  async function startSession(res: Parameters<typeof setSessionCookie>[0], actor: Actor) {
    const token = await tokens.issue({ userId: actor.user.id, sessionVersion: actor.sessionVersion });
    setSessionCookie(res, token, cookies);
  }

  router.get('/auth/csrf', (req, res) => {
    res.json(csrfSchema.parse({ csrfToken: ensureCsrfCookie(req, res, cookies) }));
  });

  router.post('/auth/sign-up', async (req, res) => {
    const body = signUpBodySchema.parse(req.body);
    const actor = await auth.signUp(body);
    await startSession(res, actor);
    res.status(201).json(toMe(actor));
  });

  router.post('/auth/sign-in', signInLimiter, async (req, res) => {
    const body = signInBodySchema.parse(req.body);
    const actor = await auth.signIn(body);
    await startSession(res, actor);
    res.json(toMe(actor));
  });

  router.post('/auth/sign-out', (_req, res) => {
    clearSessionCookie(res, cookies);
    res.status(204).end();
  });

  router.post('/auth/password-reset/request', async (req, res) => {
    const { email } = resetRequestBodySchema.parse(req.body);
    await auth.requestPasswordReset(email);
    res.status(202).json(okSchema.parse({ ok: true }));
  });

  router.post('/auth/password-reset/confirm', async (req, res) => {
    const body = resetConfirmBodySchema.parse(req.body);
    await auth.confirmPasswordReset(body);
    clearSessionCookie(res, cookies);
    res.json(okSchema.parse({ ok: true }));
  });

  router.get('/me', requireMember, (req, res) => {
    res.json(toMe(actorOf(req)));
  });

  return router;
}
