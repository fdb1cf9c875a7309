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

/** The distinct operators of the results, by name. */
export function resultOperators(results: readonly DrillResult[]): { id: string; name: string }[] {
  const byId = new Map<string, string>();
  for (const r of results) if (r.operator.id) byId.set(r.operator.id, r.operator.name);
  return [...byId].map(([id, name]) => ({ id, name })).sort((a, b) => a.name.localeCompare(b.name));
}
