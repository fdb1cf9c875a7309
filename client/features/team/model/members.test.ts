import { describe, expect, it } from 'vitest';
import type { Role } from '../../../../shared/domain/roles';
import type { Member, RobotKey } from '../../../../shared/schemas/team';
import { canChangeRole, canRemoveMember, robotKeyStatus, sortMembers, sortRobotKeys } from './members';

const member = (userId: string, name: string, role: Role): Member => ({
  userId,
  name,
  role,
  email: `${name.toLowerCase()}@harborlight.example`,
  joinedAt: '2025-01-10T18:00:00Z',
});

const team = [
  member('u3', 'Priya', 'operator'),
  member('u1', 'Marisol', 'lead'),
  member('u2', 'dev', 'programmer'),
  member('u4', 'Ben', 'programmer'),
];

describe('sortMembers', () => {
  it('puts leads first, then roles in order, names alphabetically within a role', () => {
    expect(sortMembers(team).map((m) => m.name)).toEqual(['Marisol', 'Ben', 'dev', 'Priya']);
  });
});

describe('canChangeRole', () => {
  it('refuses to demote the only lead', () => {
    expect(canChangeRole(team, 'u1', 'programmer')).toBe(false);
  });

  it('allows demoting a lead when another lead remains', () => {
    const twoLeads = [...team, member('u5', 'Jonah', 'lead')];
    expect(canChangeRole(twoLeads, 'u1', 'viewer')).toBe(true);
  });

  it('allows any change to a member who is not the last lead', () => {
    expect(canChangeRole(team, 'u3', 'coach')).toBe(true);
  });
});

describe('canRemoveMember', () => {
  it('refuses to remove the only lead', () => {
    expect(canRemoveMember(team, 'u1')).toBe(false);
  });

  it('allows removing anyone else', () => {
    expect(canRemoveMember(team, 'u4')).toBe(true);
  });
});

const key = (id: string, createdAt: string, extra: Partial<RobotKey> = {}): RobotKey => ({
  id,
  name: 'Gullwing',
  prefix: 'pwk_ab12',
  createdByName: 'Marisol',
  createdAt,
  lastUsedAt: null,
  revokedAt: null,
  ...extra,
});

describe('robotKeyStatus', () => {
  it.each([
    [{ revokedAt: null, lastUsedAt: null }, 'never-used'],
    [{ revokedAt: null, lastUsedAt: '2025-03-01T10:00:00Z' }, 'in-use'],
    [{ revokedAt: '2025-03-02T10:00:00Z', lastUsedAt: '2025-03-01T10:00:00Z' }, 'revoked'],
  ])('reads %o as %s', (k, expected) => {
    expect(robotKeyStatus(k)).toBe(expected);
  });
});

describe('sortRobotKeys', () => {
  it('lists working keys newest first and revoked keys last', () => {
    const keys = [
      key('old', '2025-01-01T00:00:00Z'),
      key('gone', '2025-03-01T00:00:00Z', { revokedAt: '2025-03-02T00:00:00Z' }),
      key('new', '2025-02-01T00:00:00Z'),
    ];
    expect(sortRobotKeys(keys).map((k) => k.id)).toEqual(['new', 'old', 'gone']);
  });
});
