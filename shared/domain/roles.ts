// Pure: imports nothing but zod. Roles of a team member and what each may do.
import { z } from 'zod';

/** Team roles, most privileged first. */
export const ROLES = ['lead', 'programmer', 'operator', 'coach', 'viewer'] as const;
export const roleSchema = z.enum(ROLES);
export type Role = z.infer<typeof roleSchema>;

export const ROLE_LABELS: Record<Role, string> = {
  lead: 'Lead',
  programmer: 'Programmer',
  operator: 'Operator',
  coach: 'Coach',
  viewer: 'Viewer',
};

export const ROLE_SUMMARIES: Record<Role, string> = {
  lead: 'Everything, including members, invites, robot keys and deleting recordings.',
  programmer: 'Create, edit and publish panels; manage recordings; run simulator sessions.',
  operator: 'Run published panels at the driver station, do drills, view recordings.',
  coach: 'View recordings and cycles, write notes, run drills for operators.',
  viewer: 'Read only.',
};

/** Actions that the server checks by role. */
export type TeamAction =
  | 'team.read'
  | 'members.manage'
  | 'invites.manage'
  | 'robotKeys.manage'
  | 'robotProfile.edit'
  | 'panels.edit'
  | 'panels.run'
  | 'recordings.manage'
  | 'recordings.delete'
  | 'notes.write'
  | 'drills.run'
  | 'drills.send';

const ALLOWED: Record<TeamAction, readonly Role[]> = {
  'team.read': ROLES,
  'members.manage': ['lead'],
  'invites.manage': ['lead'],
  'robotKeys.manage': ['lead'],
  'robotProfile.edit': ['lead', 'programmer'],
  'panels.edit': ['lead', 'programmer'],
  'panels.run': ['lead', 'programmer', 'operator'],
  'recordings.manage': ['lead', 'programmer'],
  'recordings.delete': ['lead'],
  'notes.write': ['lead', 'programmer', 'coach'],
  'drills.run': ['lead', 'programmer', 'operator', 'coach'],
  'drills.send': ['lead', 'programmer', 'coach'],
};

/** Whether a member with `role` may perform `action`. */
export function can(role: Role, action: TeamAction): boolean {
  return ALLOWED[action].includes(role);
}

/** Roles that may perform `action`, for error messages and docs. */
export function rolesFor(action: TeamAction): readonly Role[] {
  return ALLOWED[action];
}

/**
 * Whether changing the roles or removing members leaves the team with at least one lead.
 * `roles` are the team's member roles after the change.
 */
export function keepsALead(roles: readonly Role[]): boolean {
  return roles.includes('lead');
}
