import { z } from 'zod';
import { roleSchema } from '../domain/roles';
import { emailSchema, passwordSchema, personNameSchema } from './auth';

export const isoDateSchema = z.string().datetime({ offset: true });

export const memberSchema = z.object({
  userId: z.string().uuid(),
  name: z.string(),
  email: z.string(),
  role: roleSchema,
  joinedAt: isoDateSchema,
});
export type Member = z.infer<typeof memberSchema>;
export const memberListSchema = z.object({ members: z.array(memberSchema) });

export const changeRoleBodySchema = z.object({ role: roleSchema });
export const userIdParamsSchema = z.object({ userId: z.string().uuid({ message: 'Not a member id' }) });
export const idParamsSchema = z.object({ id: z.string().uuid({ message: 'Not an id' }) });

export const inviteSchema = z.object({
  id: z.string().uuid(),
  email: z.string(),
  role: roleSchema,
  invitedByName: z.string(),
  createdAt: isoDateSchema,
  expiresAt: isoDateSchema,
});
export type Invite = z.infer<typeof inviteSchema>;
export const inviteListSchema = z.object({ invites: z.array(inviteSchema) });
export const createInviteBodySchema = z.object({ email: emailSchema, role: roleSchema });
export type CreateInviteBody = z.infer<typeof createInviteBodySchema>;

/** What the accept-invite page shows before the invitee signs up. */
export const invitePreviewSchema = z.object({
  email: z.string(),
  role: roleSchema,
  teamNumber: z.number().int(),
  teamName: z.string(),
  invitedByName: z.string(),
  expiresAt: isoDateSchema,
});
export type InvitePreview = z.infer<typeof invitePreviewSchema>;
export const inviteTokenParamsSchema = z.object({ token: z.string().min(20).max(200) });
export const acceptInviteBodySchema = z.object({ name: personNameSchema, password: passwordSchema });

export const robotKeySchema = z.object({
  id: z.string().uuid(),
  name: z.string(),
  prefix: z.string(),
  createdByName: z.string(),
  createdAt: isoDateSchema,
  lastUsedAt: isoDateSchema.nullable(),
  revokedAt: isoDateSchema.nullable(),
});
export type RobotKey = z.infer<typeof robotKeySchema>;
export const robotKeyListSchema = z.object({ keys: z.array(robotKeySchema) });
export const createRobotKeyBodySchema = z.object({
  name: z.string().trim().min(1, 'Name the robot').max(60, 'Use at most 60 characters'),
});
/** The secret appears in this answer only; the server keeps a hash. */
export const createdRobotKeySchema = z.object({ key: robotKeySchema, secret: z.string() });
export type CreatedRobotKey = z.infer<typeof createdRobotKeySchema>;

export const devMailSchema = z.object({
  id: z.string(),
  from: z.string(),
  to: z.array(z.string()),
  subject: z.string(),
  text: z.string(),
  links: z.array(z.string()),
  receivedAt: isoDateSchema,
});
export type DevMail = z.infer<typeof devMailSchema>;
export const devMailListSchema = z.object({ mails: z.array(devMailSchema) });
