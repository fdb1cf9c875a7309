// Pure: stored drill results as uPlot's columnar arrays (uPlot wants seconds: epoch seconds on x, reaction
// times in seconds on y).
import type { DrillResult } from '../../../../shared/schemas/drill';

export type ResultColumns = [xS: number[], medianS: (number | null)[], p90S: (number | null)[]];

/** Results oldest first → [startedAt s, median s, p90 s]; runs without an answer leave gaps. */
export function resultColumns(results: readonly DrillResult[]): ResultColumns {
  const sorted = [...results].sort((a, b) => a.startedAt.localeCompare(b.startedAt));
  return [
    sorted.map((r) => Date.parse(r.startedAt) / 1000),
    sorted.map((r) => (r.stats.medianMs === null ? null : r.stats.medianMs / 1000)),
    sorted.map((r) => (r.stats.p90Ms === null ? null : r.stats.p90Ms / 1000)),
  ];
}

export type ResultOperator = { id: string; name: string; runCount: number; isOperatorRole: boolean };

/** The distinct members who ran drills, by name, with how many runs each. */
export function resultOperators(results: readonly DrillResult[]): ResultOperator[] {
  const byId = new Map<string, ResultOperator>();
  for (const r of results) {
    if (!r.operator.id) continue;
    const seen = byId.get(r.operator.id) ?? { id: r.operator.id, name: r.operator.name, runCount: 0, isOperatorRole: false };
    byId.set(r.operator.id, { ...seen, name: r.operator.name, runCount: seen.runCount + 1, isOperatorRole: seen.isOperatorRole || r.operator.role === 'operator' });
  }
  return [...byId.values()].sort((a, b) => a.name.localeCompare(b.name));
}

/** Whose results the page opens on: your own if you have runs, else the operator with the most runs. */
export function defaultOperatorId(operators: readonly ResultOperator[], myUserId: string): string {
  if (operators.some((o) => o.id === myUserId)) return myUserId;
  const ranked = [...operators].sort((a, b) => Number(b.isOperatorRole) - Number(a.isOperatorRole) || b.runCount - a.runCount);
  return ranked[0]?.id ?? '';
}
