import type { CookieOptions, RequestHandler, Response } from 'express';
import { rolesFor, can, type TeamAction } from '../../../shared/domain/roles';
import { AppError } from '../../lib/errors';
import { randomToken, safeEqual } from '../../lib/secrets';
import type { Actor } from './actor';
import type { AuthService } from './auth.service';
import { CSRF_COOKIE, CSRF_HEADER, SESSION_COOKIE, SESSION_TTL_S, type SessionTokens } from './session-token';

export interface CookiePolicy {
  secure: boolean;
}

/** Resolves the session cookie into `req.actor`; a bad or stale token simply leaves it empty. */
export function loadSession(tokens: SessionTokens, auth: AuthService): RequestHandler {
  return async (req, _res, next) => {
    const token: unknown = req.cookies?.[SESSION_COOKIE];
    if (typeof token !== 'string' || token === '') return next();
    const claims = await tokens.verify(token);
    if (!claims) return next();
    const actor = await auth.loadActor(claims.userId).catch(() => undefined);
    if (actor && actor.sessionVersion === claims.sessionVersion) req.actor = actor;
    next();
  };
}

/** 401 without a valid session. */
export const requireMember: RequestHandler = (req, _res, next) => {
  if (!req.actor) throw new AppError('unauthenticated', 'Sign in to continue');
  next();
};

/** 401 without a session, 403 when the member's role does not allow `action`. */
export function requireAction(action: TeamAction): RequestHandler {
  return (req, _res, next) => {
    if (!req.actor) throw new AppError('unauthenticated', 'Sign in to continue');
    if (!can(req.actor.role, action)) {
      const who = rolesFor(action).join(' or ');
      throw new AppError('forbidden', `Only a ${who} may do this; you are signed in as ${req.actor.role}`);
    }
    next();
  };
}

/** The actor of a route behind `requireMember` or `requireAction`. */
export function actorOf(req: { actor?: Actor }): Actor {
  if (!req.actor) throw new AppError('unauthenticated', 'Sign in to continue');
  return req.actor;
}

const UNSAFE = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

/** Double-submit check: unsafe requests carry the CSRF cookie's value in a header. */
export const checkCsrf: RequestHandler = (req, _res, next) => {
  if (!UNSAFE.has(req.method)) return next();
  const cookie: unknown = req.cookies?.[CSRF_COOKIE];
  const header = req.get(CSRF_HEADER);
  if (typeof cookie !== 'string' || !cookie || !header || !safeEqual(cookie, header)) {
    throw new AppError('csrf_failed', 'The request lacks a valid CSRF token: reload the page and try again');
  }
  next();
};

export function cookieOptions(policy: CookiePolicy, httpOnly: boolean): CookieOptions {
  return { httpOnly, sameSite: 'lax', secure: policy.secure, path: '/' };
}

export function setSessionCookie(res: Response, token: string, policy: CookiePolicy): void {
  res.cookie(SESSION_COOKIE, token, { ...cookieOptions(policy, true), maxAge: SESSION_TTL_S * 1000 });
}

export function clearSessionCookie(res: Response, policy: CookiePolicy): void {
  res.clearCookie(SESSION_COOKIE, cookieOptions(policy, true));
}

/** Returns the request's CSRF token, setting a new cookie when there is none. */
export function ensureCsrfCookie(req: { cookies?: Record<string, unknown> }, res: Response, policy: CookiePolicy): string {
  const existing = req.cookies?.[CSRF_COOKIE];
  if (typeof existing === 'string' && existing.length >= 20) return existing;
  const token = randomToken(24);
  res.cookie(CSRF_COOKIE, token, cookieOptions(policy, false));
  return token;
}
