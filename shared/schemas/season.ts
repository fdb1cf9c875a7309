import { z } from 'zod';
import { scoringSideSchema } from '../domain/season/scoring-pose';
import { allianceSchema } from '../domain/season/season-profile';

/** `GET /api/season/targets` query: alliance required; depth and side override the robot profile. */
export const targetsQuerySchema = z.object({
  alliance: allianceSchema,
  depth: z.coerce
    .number({ message: 'depth is a number of metres' })
    .min(0, 'depth cannot be negative')
    .max(3, 'depth is at most 3 m')
    .optional(),
  side: scoringSideSchema.optional(),
});
export type TargetsQuery = z.infer<typeof targetsQuerySchema>;
