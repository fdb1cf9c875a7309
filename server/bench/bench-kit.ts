export interface BenchResult {
  name: string;
  runs: number;
  medianMs: number;
  p90Ms: number;
  baseline?: BenchResult;
}

/** Times `fn` `runs` times after a short warm-up; the figures are per call. */
export async function measure(name: string, runs: number, fn: () => Promise<void>): Promise<BenchResult> {
  for (let i = 0; i < Math.min(20, runs); i += 1) await fn();
  const times: number[] = [];
  for (let i = 0; i < runs; i += 1) {
    const t0 = performance.now();
    await fn();
    times.push(performance.now() - t0);
  }
  times.sort((a, b) => a - b);
  const at = (q: number) => times[Math.min(times.length - 1, Math.floor(q * times.length))]!;
  return { name, runs, medianMs: at(0.5), p90Ms: at(0.9) };
}

export function formatResults(results: BenchResult[]): string {
  const rows = results.map((r) => {
    const ratio = r.baseline ? `${(r.medianMs / r.baseline.medianMs).toFixed(1)}× baseline` : 'baseline';
    return `  ${r.name.padEnd(46)} median ${r.medianMs.toFixed(2).padStart(8)} ms   p90 ${r.p90Ms.toFixed(2).padStart(8)} ms   ${ratio}`;
  });
  return rows.join('\n');
}

/**
 * Deterministic random walks, row-major (tick k, signal i at k·signals + i); a third of the signals hold
 * still for stretches, as real telemetry does.
 */
export function randomWalks(ticks: number, signals: number, seed: number): Float32Array {
  const values = new Float32Array(ticks * signals);
  let state = seed;
  const random = () => ((state = (state * 1103515245 + 12345) >>> 0) / 2 ** 32);
  const current = new Float32Array(signals);
  for (let k = 0; k < ticks; k += 1) {
    for (let i = 0; i < signals; i += 1) {
      if (i % 3 !== 0 || random() < 0.05) current[i] = current[i]! + (random() - 0.5);
      values[k * signals + i] = current[i]!;
    }
  }
  return values;
}
