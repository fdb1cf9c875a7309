import { keepsALead, ROLES, type Role } from '../../../../shared/domain/roles';
import type { Member, RobotKey } from '../../../../shared/schemas/team';

/** Leads first, then down the roles; by name within a role. */
export function sortMembers(members: readonly Member[]): Member[] {
  return [...members].sort(
    (a, b) => ROLES.indexOf(a.role) - ROLES.indexOf(b.role) || a.name.localeCompare(b.name, 'en', { sensitivity: 'base' }),
  );
}

/** Whether giving `userId` the role `next` still leaves the team a lead (the server refuses otherwise). */
export function canChangeRole(members: readonly Member[], userId: string, next: Role): boolean {
  return keepsALead(members.map((m) => (m.userId === userId ? next : m.role)));
}

/** Whether removing `userId` still leaves the team a lead. */
export function canRemoveMember(members: readonly Member[], userId: string): boolean {
  return keepsALead(members.filter((m) => m.userId !== userId).map((m) => m.role));
}

export type RobotKeyStatus = 'revoked' | 'never-used' | 'in-use';

export function robotKeyStatus(key: Pick<RobotKey, 'revokedAt' | 'lastUsedAt'>): RobotKeyStatus {
  if (key.revokedAt) return 'revoked';
  return key.lastUsedAt ? 'in-use' : 'never-used';
}

/** Keys still working first (newest first), revoked ones after. */
export function sortRobotKeys(keys: readonly RobotKey[]): RobotKey[] {
  return [...keys].sort(
    (a, b) => Number(Boolean(a.revokedAt)) - Number(Boolean(b.revokedAt)) || b.createdAt.localeCompare(a.createdAt),
  );
}
