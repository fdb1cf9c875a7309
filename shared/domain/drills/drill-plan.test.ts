import { describe, expect, it } from 'vitest';
import { seededRandom } from './drill-calls';
import { callWindowMs, drillPaceSchema, drillPlanSchema, planCallCount, planCalls, planLongestMs } from './drill-plan';

describe('planCalls', () => {
  it('plays a script as written, whatever the random source', () => {
    const plan = drillPlanSchema.parse({ mode: 'scripted', calls: [{ branch: 'A', level: 'L4' }, { station: 'left' }] });
    expect(planCalls(plan, () => 0.99)).toEqual([{ branch: 'A', level: 'L4' }, { station: 'left' }]);
    expect(planCallCount(plan)).toBe(2);
  });

  it('draws count random calls from the target set', () => {
    const plan = drillPlanSchema.parse({ mode: 'random', targets: { branches: ['C', 'D'], levels: ['L4'], stations: [] }, count: 12 });
    const calls = planCalls(plan, seededRandom(4));
    expect(calls).toHaveLength(12);
    expect(calls.every((c) => c.level === 'L4' && (c.branch === 'C' || c.branch === 'D'))).toBe(true);
    expect(planCallCount(plan)).toBe(12);
  });
});

describe('drillPlanSchema and drillPaceSchema', () => {
  it.each([
    [{ mode: 'random', targets: { branches: ['A'], levels: [], stations: [] }, count: 0 }],
    [{ mode: 'random', targets: { branches: ['A'], levels: [], stations: [] }, count: 101 }],
    [{ mode: 'scripted', calls: [] }],
    [{ mode: 'shuffled', calls: [{ branch: 'A' }] }],
  ])('refuses the plan %j', (plan) => {
    expect(drillPlanSchema.safeParse(plan).success).toBe(false);
  });

  it.each([[{ mode: 'interval', intervalMs: 500 }], [{ mode: 'on-answer', limitMs: 200_000 }], [{ mode: 'interval', intervalMs: 2500.5 }]])('refuses the pace %j', (pace) => {
    expect(drillPaceSchema.safeParse(pace).success).toBe(false);
  });
});

describe('callWindowMs and planLongestMs', () => {
  it('opens each call for the interval, or for the limit when the pace follows the answer', () => {
    expect(callWindowMs({ mode: 'interval', intervalMs: 4000 })).toBe(4000);
    expect(callWindowMs({ mode: 'on-answer', limitMs: 10_000 })).toBe(10_000);
  });

  it('adds the break after each answer to the longest run', () => {
    const plan = drillPlanSchema.parse({ mode: 'scripted', calls: [{ branch: 'A' }, { branch: 'B' }] });
    expect(planLongestMs(plan, { mode: 'interval', intervalMs: 3000 })).toBe(6000);
    expect(planLongestMs(plan, { mode: 'on-answer', limitMs: 5000 })).toBe(2 * 5000 + 2 * 700);
  });
});
