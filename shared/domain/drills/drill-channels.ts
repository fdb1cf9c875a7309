// Pure: imports only zod and shared files. The relay channels of a coached drill: the coach's device sends
// each call on op/drill/call; the operator's drill view follows it and reports each answer on op/drill/answer.
import { z } from 'zod';
import { drillCallSchema } from './drill-calls';

export const DRILL_CALL_CHANNEL = 'op/drill/call';
export const DRILL_ANSWER_CHANNEL = 'op/drill/answer';
/** Every drill channel starts with this; the relay lets drill roles publish under it. */
export const DRILL_CHANNEL_PREFIX = 'op/drill/';

/**
 * The value of op/drill/call. `call`: show this call now (index of count); `end`: the coach finished or
 * stopped the session; the operator's view then scores and stores the run. `sessionId` is the coach's
 * session, so a view joins only one session at a time.
 */
export const drillCallValueSchema = z.discriminatedUnion('kind', [
  z.object({
    kind: z.literal('call'),
    sessionId: z.string().min(8).max(64),
    drillId: z.string().uuid(),
    drillName: z.string().max(80),
    index: z.number().int().nonnegative(),
    count: z.number().int().positive(),
    call: drillCallSchema,
    /** How long the call stays open before it is a miss, ms. */
    windowMs: z.number().int().positive(),
    coachName: z.string().max(80),
  }),
  z.object({ kind: z.literal('end'), sessionId: z.string().min(8).max(64), isStopped: z.boolean() }),
]);
export type DrillCallValue = z.infer<typeof drillCallValueSchema>;

/** The value of op/drill/answer: how the operator did on one call of a coached session. */
export const drillAnswerValueSchema = z.object({
  sessionId: z.string().min(8).max(64),
  index: z.number().int().nonnegative(),
  reactionMs: z.number().nonnegative().nullable(),
  errors: z.number().int().nonnegative(),
  operatorName: z.string().max(80),
});
export type DrillAnswerValue = z.infer<typeof drillAnswerValueSchema>;
