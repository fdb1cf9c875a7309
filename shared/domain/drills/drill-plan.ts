// Pure: imports only zod and shared files. What a drill is: where its calls come from, its pace and its count.
import { z } from 'zod';
import { drillCallSchema, drillTargetSetSchema, randomCalls, type DrillCall, type RandomSource } from './drill-calls';

export const DRILL_MAX_CALLS = 100;

/**
 * `interval`: a new call every `intervalMs`, answered or not; a call not answered by then is a miss.
 * `on-answer`: the next call follows the answer after a short break; a call not answered within `limitMs`
 * is a miss.
 */
export const drillPaceSchema = z.discriminatedUnion('mode', [
  z.object({
    mode: z.literal('interval'),
    intervalMs: z.number().int().min(1000, 'Give at least 1 s between calls').max(60_000, 'Give at most 60 s between calls'),
  }),
  z.object({
    mode: z.literal('on-answer'),
    limitMs: z.number().int().min(2000, 'Allow at least 2 s per call').max(120_000, 'Allow at most 120 s per call'),
  }),
]);
export type DrillPace = z.infer<typeof drillPaceSchema>;

/** Random calls from a target set, `count` of them, or a script played in order. */
export const drillPlanSchema = z.discriminatedUnion('mode', [
  z.object({
    mode: z.literal('random'),
    targets: drillTargetSetSchema,
    count: z.number().int().min(1, 'A drill has at least 1 call').max(DRILL_MAX_CALLS, `A drill has at most ${DRILL_MAX_CALLS} calls`),
  }),
  z.object({
    mode: z.literal('scripted'),
    calls: z.array(drillCallSchema).min(1, 'Script at least one call').max(DRILL_MAX_CALLS, `Script at most ${DRILL_MAX_CALLS} calls`),
  }),
]);
export type DrillPlan = z.infer<typeof drillPlanSchema>;

/** The break between an answer and the next call in `on-answer` pace, so the operator sees the result. */
export const ON_ANSWER_BREAK_MS = 700;

/** How long a call stays open before it counts as a miss, ms. */
export function callWindowMs(pace: DrillPace): number {
  return pace.mode === 'interval' ? pace.intervalMs : pace.limitMs;
}

/** How many calls a run of the plan has. */
export function planCallCount(plan: DrillPlan): number {
  return plan.mode === 'random' ? plan.count : plan.calls.length;
}

/** The calls of one run: the script as written, or `count` calls drawn with `random` (pass a seeded source). */
export function planCalls(plan: DrillPlan, random: RandomSource): DrillCall[] {
  return plan.mode === 'scripted' ? plan.calls.map((c) => ({ ...c })) : randomCalls(plan.targets, plan.count, random);
}

/** Roughly how long a run lasts at worst, ms (every call missed), for the editor's summary. */
export function planLongestMs(plan: DrillPlan, pace: DrillPace): number {
  return planCallCount(plan) * callWindowMs(pace) + (pace.mode === 'on-answer' ? planCallCount(plan) * ON_ANSWER_BREAK_MS : 0);
}
