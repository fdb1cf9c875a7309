import type { Role } from '../../../shared/domain/roles';

/** The invented demo team of the product brief. Every name and address here is made up. */
export const DEMO_TEAM = { number: 19850, name: 'Harborlight Robotics', robot: 'Gullwing' } as const;

export const DEMO_PASSWORD = 'harborlight-demo';

export const DEMO_MEMBERS: readonly { email: string; name: string; role: Role }[] = [
  { email: 'lead@harborlight.example', name: 'Rowan Vale', role: 'lead' },
  { email: 'programmer@harborlight.example', name: 'Priya Dunmore', role: 'programmer' },
  { email: 'operator@harborlight.example', name: 'Tomas Reyes', role: 'operator' },
  { email: 'coach@harborlight.example', name: 'Hana Whitcombe', role: 'coach' },
  { email: 'viewer@harborlight.example', name: 'Eli Marsh', role: 'viewer' },
];
