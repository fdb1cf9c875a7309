import type { AuthService } from '../features/auth/auth.service';
import { SESSION_COOKIE, type SessionTokens } from '../features/auth/session-token';
import type { TeamService } from '../features/team/team.service';
import type { Principal } from './relay-server';

function readCookie(header: string | undefined, name: string): string | undefined {
  if (!header) return undefined;
  for (const part of header.split(';')) {
    const eq = part.indexOf('=');
    if (eq > 0 && part.slice(0, eq).trim() === name) return decodeURIComponent(part.slice(eq + 1).trim());
  }
  return undefined;
}

/** How the relay turns a handshake's cookie or robot key into a principal, using the same rules as the API. */
export function relayAuthenticators(deps: { tokens: SessionTokens; auth: AuthService; team: TeamService }) {
  return {
    async authenticateCookie(cookieHeader: string | undefined): Promise<Principal | undefined> {
      const token = readCookie(cookieHeader, SESSION_COOKIE);
      const claims = token ? await deps.tokens.verify(token) : undefined;
      if (!claims) return undefined;
      const actor = await deps.auth.loadActor(claims.userId).catch(() => undefined);
      if (!actor || actor.sessionVersion !== claims.sessionVersion) return undefined;
      return { teamId: actor.team.id, teamNumber: actor.team.number, role: actor.role, principal: actor.user.name };
    },
    async authenticateRobot(secret: string): Promise<Principal | undefined> {
      const key = await deps.team.authenticateRobot(secret);
      if (!key) return undefined;
      return { teamId: key.teamId, teamNumber: key.teamNumber, role: 'robot', principal: key.name, keyId: key.keyId };
    },
  };
}
