import { useEffect, useRef } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import type { DrillResult } from '../../../../shared/schemas/drill';
import { resultColumns } from '../model/results-series';

const AXIS = { stroke: '#8893a0', grid: { stroke: '#232931', width: 1 }, ticks: { stroke: '#2c333c', width: 1 }, font: '11px "JetBrains Mono", monospace' };
const HEIGHT_PX = 220;
const MEDIAN_COLOUR = '#f5a30f';
const P90_COLOUR = '#56b4e9';

/** Median and p90 reaction time of each run over time (uPlot; made once, data through setData). */
export function ResultsChart({ results }: { results: readonly DrillResult[] }) {
  const hostRef = useRef<HTMLDivElement>(null);
  const chartRef = useRef<uPlot | null>(null);

  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    const opts: uPlot.Options = {
      width: Math.max(host.clientWidth, 240),
      height: HEIGHT_PX,
      legend: { show: false },
      padding: [10, 12, 0, 0],
      cursor: { drag: { x: false, y: false } },
      scales: { x: { time: true }, s: { auto: true, range: (_u, min, max) => [0, Math.max(1, Math.ceil((max ?? min) * 1.15 * 2) / 2)] } },
      axes: [
        {
          ...AXIS,
          space: 70,
          // Runs are hours or days apart: ticks of whole hours at the finest, labelled by day.
          incrs: [3600, 6 * 3600, 86_400, 2 * 86_400, 7 * 86_400, 14 * 86_400, 30 * 86_400],
          values: (_u, ticks, _axis, _space, incrS) =>
            ticks.map((t) => {
              const d = new Date(t * 1000);
              const day = d.toLocaleDateString(undefined, { month: 'short', day: 'numeric' });
              return incrS < 86_400 ? `${day} ${d.toLocaleTimeString(undefined, { hour: '2-digit', minute: '2-digit' })}` : day;
            }),
        },
        { ...AXIS, scale: 's', size: 52, values: (_u, ticks) => ticks.map((t) => `${t.toFixed(1)} s`) },
      ],
      series: [
        {},
        { label: 'Median', scale: 's', stroke: MEDIAN_COLOUR, width: 2, spanGaps: true, points: { show: true, size: 7, fill: MEDIAN_COLOUR } },
        { label: 'p90', scale: 's', stroke: P90_COLOUR, width: 1.5, dash: [6, 4], spanGaps: true, points: { show: true, size: 5, fill: P90_COLOUR } },
      ],
    };
    const chart = new uPlot(opts, resultColumns([]), host);
    chartRef.current = chart;
    const observer = new ResizeObserver(() => chart.setSize({ width: Math.max(host.clientWidth, 240), height: HEIGHT_PX }));
    observer.observe(host);
    return () => {
      observer.disconnect();
      chart.destroy();
      chartRef.current = null;
    };
  }, []);

  useEffect(() => {
    chartRef.current?.setData(resultColumns(results));
  }, [results]);

  return (
    <figure className="flex flex-col gap-2">
      <div ref={hostRef} data-testid="drill-results-chart" data-points={results.length} className="w-full" role="img" aria-label={`Median and p90 reaction time of ${results.length} runs over time`} />
      <figcaption className="flex gap-4 text-sm text-asphalt-300">
        <span className="inline-flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block h-0.5 w-5" style={{ background: MEDIAN_COLOUR }} /> Median reaction time
        </span>
        <span className="inline-flex items-center gap-1.5">
          <span aria-hidden="true" className="inline-block h-0.5 w-5 border-t-2 border-dashed" style={{ borderColor: P90_COLOUR }} /> p90
        </span>
      </figcaption>
    </figure>
  );
}
