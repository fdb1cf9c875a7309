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
