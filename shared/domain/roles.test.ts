import { describe, expect, it } from 'vitest';
import { can, keepsALead, ROLES, rolesFor, type Role, type TeamAction } from './roles';

// Expected permissions written out from the product brief's role table (../shared/PRODUCT.md), not derived
// from the code's own table.
const BRIEF: [TeamAction, Role[]][] = [
  ['members.manage', ['lead']],
  ['invites.manage', ['lead']],
  ['robotKeys.manage', ['lead']],
  ['recordings.delete', ['lead']],
  ['panels.edit', ['lead', 'programmer']],
  ['robotProfile.edit', ['lead', 'programmer']],
  ['recordings.manage', ['lead', 'programmer']],
  ['panels.run', ['lead', 'programmer', 'operator']],
  ['notes.write', ['lead', 'programmer', 'coach']],
  ['drills.send', ['lead', 'programmer', 'coach']],
  ['team.read', ['lead', 'programmer', 'operator', 'coach', 'viewer']],
];

describe('can', () => {
  it.each(BRIEF)('allows %s to exactly %j', (action, allowed) => {
    for (const role of ROLES) expect(can(role, action)).toBe(allowed.includes(role));
    expect([...rolesFor(action)].sort()).toEqual([...allowed].sort());
  });

  it('lets a viewer do nothing but read', () => {
    const writes = BRIEF.map(([a]) => a).filter((a) => a !== 'team.read');
    expect(writes.filter((a) => can('viewer', a))).toEqual([]);
  });
});

describe('keepsALead', () => {
  it.each([
    [['lead'], true],
    [['programmer', 'lead', 'viewer'], true],
    [['programmer', 'viewer'], false],
    [[], false],
  ] as [Role[], boolean][])('is %j → %s', (roles, expected) => {
    expect(keepsALead(roles)).toBe(expected);
  });
});
