import { describe, expect, it } from 'vitest';
import { applySelection, type OperatorSelection } from '../../shared/domain/channels';
import { season2025 } from '../../shared/domain/season/season-2025';
import { createOperatorScript, type OperatorView } from './operator-script';

const view = (over: Partial<OperatorView>): OperatorView => ({
  matchTimeS: 0,
  mode: 'disabled',
  state: 'disabled',
  holding: 'coral',
  selection: {},
  ...over,
});

describe('createOperatorScript', () => {
  it('sets a whole valid selection on its first call, L4 for the preload', () => {
    const writes = createOperatorScript({ seed: 1, season: season2025 }).decide(view({}));
    let selection: OperatorSelection | undefined = {};
    for (const w of writes) selection = selection && applySelection(selection, w.channel, w.value);
    expect(selection).toMatchObject({ level: 'L4', algae: 'none', cage: 'none' });
    expect(Object.keys(selection ?? {}).sort()).toEqual(['algae', 'branch', 'cage', 'level', 'station']);
  });

  it('calls the next reef target within 0.2–1.2 s of each pickup', () => {
    const script = createOperatorScript({ seed: 2, season: season2025 });
    script.decide(view({}));
    script.decide(view({ matchTimeS: 20, mode: 'teleop', holding: 'none' }));
    const called: number[] = [];
    for (let t = 30; t < 32; t += 0.02) {
      const writes = script.decide(view({ matchTimeS: t, mode: 'teleop', state: 'to_reef', holding: 'coral' }));
      if (writes.some((w) => w.channel === 'op/reef/level')) called.push(t);
    }
    expect(called.length).toBe(1);
    expect(called[0]! - 30).toBeGreaterThanOrEqual(0.2 - 0.02);
    expect(called[0]! - 30).toBeLessThanOrEqual(1.2 + 0.02);
  });

  it('calls a cage once, 15–21 s before the end of teleop', () => {
    const script = createOperatorScript({ seed: 3, season: season2025 });
    script.decide(view({}));
    const cageCalls: number[] = [];
    for (let t = 15; t < 150; t += 0.1) {
      const writes = script.decide(view({ matchTimeS: t, mode: 'teleop', state: 'idle', holding: 'none' }));
      if (writes.some((w) => w.channel === 'op/cage' && w.value !== 'none')) cageCalls.push(t);
    }
    expect(cageCalls.length).toBe(1);
    expect(cageCalls[0]!).toBeGreaterThanOrEqual(129);
    expect(cageCalls[0]!).toBeLessThanOrEqual(135.1);
  });
});
