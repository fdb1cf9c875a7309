import { jwtVerify, SignJWT } from 'jose';

export const SESSION_COOKIE = 'pw_session';
export const CSRF_COOKIE = 'pw_csrf';
export const CSRF_HEADER = 'x-csrf-token';
export const SESSION_TTL_S = 12 * 60 * 60;

export interface SessionClaims {
  userId: string;
  /** The user's session version when the token was issued. */
  sessionVersion: number;
}

export interface SessionTokens {
  issue(claims: SessionClaims): Promise<string>;
  /** The claims of a valid token, or undefined for an expired, tampered or malformed one. */
  verify(token: string): Promise<SessionClaims | undefined>;
}

const ISSUER = 'pitwall';

export function createSessionTokens(secret: string, now: () => Date = () => new Date()): SessionTokens {
  const key = new TextEncoder().encode(secret);
  return {
    async issue({ userId, sessionVersion }) {
      const iat = Math.floor(now().getTime() / 1000);
      return new SignJWT({ sv: sessionVersion })
        .setProtectedHeader({ alg: 'HS256' })
        .setSubject(userId)
        .setIssuer(ISSUER)
        .setIssuedAt(iat)
        .setExpirationTime(iat + SESSION_TTL_S)
        .sign(key);
    },
    async verify(token) {
      try {
        const { payload } = await jwtVerify(token, key, {
          algorithms: ['HS256'],
          issuer: ISSUER,
          currentDate: now(),
        });
        if (typeof payload.sub !== 'string' || typeof payload.sv !== 'number') return undefined;
        return { userId: payload.sub, sessionVersion: payload.sv };
      } catch {
        return undefined;
      }
    },
  };
}
