import { z } from 'zod';
import { roleSchema } from '../domain/roles';

export const emailSchema = z
  .string()
  .trim()
  .toLowerCase()
  .max(254, 'E-mail address is too long')
  .pipe(z.email({ message: 'Enter a valid e-mail address' }));

export const passwordSchema = z
  .string()
  .min(10, 'Use at least 10 characters')
  .max(200, 'Use at most 200 characters');

export const personNameSchema = z.string().trim().min(1, 'Enter a name').max(80, 'Use at most 80 characters');

export const teamNumberSchema = z.coerce
  .number({ message: 'Enter the team number' })
  .int('Team number is a whole number')
  .min(1, 'Team number is at least 1')
  .max(99999, 'Team number is at most 99999');

export const teamNameSchema = z.string().trim().min(2, 'Enter the team name').max(80, 'Use at most 80 characters');

export const signUpBodySchema = z.object({
  email: emailSchema,
  password: passwordSchema,
  name: personNameSchema,
  teamNumber: teamNumberSchema,
  teamName: teamNameSchema,
});
export type SignUpBody = z.infer<typeof signUpBodySchema>;

export const signInBodySchema = z.object({
  email: emailSchema,
  password: z.string().min(1, 'Enter your password').max(200),
});
export type SignInBody = z.infer<typeof signInBodySchema>;

export const resetRequestBodySchema = z.object({ email: emailSchema });
export const resetConfirmBodySchema = z.object({
  token: z.string().min(20).max(200),
  password: passwordSchema,
});
export type ResetConfirmBody = z.infer<typeof resetConfirmBodySchema>;

export const userSchema = z.object({ id: z.string().uuid(), email: z.string(), name: z.string() });
export type User = z.infer<typeof userSchema>;

export const teamSchema = z.object({ id: z.string().uuid(), number: z.number().int(), name: z.string() });
export type Team = z.infer<typeof teamSchema>;

/** `GET /api/me`, and the answer to sign-up, sign-in and accepting an invite. */
export const meSchema = z.object({ user: userSchema, team: teamSchema, role: roleSchema });
export type Me = z.infer<typeof meSchema>;

export const csrfSchema = z.object({ csrfToken: z.string() });

export const okSchema = z.object({ ok: z.literal(true) });

export const healthSchema = z.object({ ok: z.boolean(), db: z.enum(['up', 'down']) });
export type Health = z.infer<typeof healthSchema>;

/** `GET /api/config`: what the client needs to know about this server. */
export const serverConfigSchema = z.object({ devInbox: z.boolean(), version: z.string() });
export type ServerConfig = z.infer<typeof serverConfigSchema>;
