import { describe, expect, it } from 'vitest';
import type { DrillResult } from '../../../../shared/schemas/drill';
import { defaultOperatorId, resultColumns, resultOperators } from './results-series';

const result = (id: string, startedAt: string, medianMs: number | null, operator = { id: 'u-1', name: 'Tomas Reyes' }): DrillResult => ({
  id,
  drillId: null,
  drillName: 'Ladder',
  operator: { ...operator, role: 'operator' },
  mode: 'self',
  coachName: null,
  isSimulatorDriven: false,
  isComplete: true,
  startedAt,
  finishedAt: startedAt,
  stats: { callCount: 4, answeredCount: medianMs === null ? 0 : 4, missCount: 0, errorCount: 0, cleanCount: 4, accuracy: 1, medianMs, p90Ms: medianMs === null ? null : medianMs + 400, meanMs: medianMs, fastestMs: medianMs },
});

describe('resultColumns', () => {
  it('orders by start and converts to seconds, leaving a gap for a run without answers', () => {
    const cols = resultColumns([result('b', '2025-03-02T00:00:10Z', null), result('a', '2025-03-02T00:00:00Z', 1250)]);
    expect(cols[0]).toEqual([Date.parse('2025-03-02T00:00:00Z') / 1000, Date.parse('2025-03-02T00:00:10Z') / 1000]);
    expect(cols[1]).toEqual([1.25, null]);
    expect(cols[2]).toEqual([1.65, null]);
  });
});

describe('resultOperators', () => {
  it('lists each operator once, by name', () => {
    const ops = resultOperators([result('a', '2025-03-02T00:00:00Z', 1), result('b', '2025-03-02T00:00:00Z', 1, { id: 'u-2', name: 'Priya Dunmore' }), result('c', '2025-03-02T00:00:00Z', 1)]);
    expect(ops).toEqual([
      { id: 'u-2', name: 'Priya Dunmore', runCount: 1, isOperatorRole: true },
      { id: 'u-1', name: 'Tomas Reyes', runCount: 2, isOperatorRole: true },
    ]);
  });

  it('opens on your own runs, else the operator with the most runs', () => {
    const ops = resultOperators([result('a', '2025-03-02T00:00:00Z', 1), result('b', '2025-03-02T00:00:00Z', 1, { id: 'u-2', name: 'Priya Dunmore' }), result('c', '2025-03-02T00:00:00Z', 1)]);
    expect(defaultOperatorId(ops, 'u-2')).toBe('u-2');
    expect(defaultOperatorId(ops, 'coach')).toBe('u-1');
    expect(defaultOperatorId([], 'coach')).toBe('');
  });
});
