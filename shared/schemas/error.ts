import { z } from 'zod';

export const ERROR_CODES = [
  'validation_failed',
  'bad_request',
  'unauthenticated',
  'forbidden',
  'csrf_failed',
  'not_found',
  'conflict',
  'rate_limited',
  'payload_too_large',
  'internal',
] as const;
export const errorCodeSchema = z.enum(ERROR_CODES);
export type ErrorCode = z.infer<typeof errorCodeSchema>;

export const fieldIssueSchema = z.object({ path: z.string(), message: z.string() });
export type FieldIssue = z.infer<typeof fieldIssueSchema>;

/** The one error shape every API error uses. */
export const apiErrorBodySchema = z.object({
  error: z.object({
    code: errorCodeSchema,
    message: z.string(),
    issues: z.array(fieldIssueSchema).optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;
