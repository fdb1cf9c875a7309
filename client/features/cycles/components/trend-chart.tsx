import { useMemo } from 'react';
import type uPlot from 'uplot';
import type { ReviewMatch } from '../../../../shared/schemas/cycle';
import { matchShort, trendColumns } from '../model/cycles-view';
import { UPlotChart } from './uplot-chart';

const AXIS = { stroke: '#8893a0', grid: { stroke: '#232931', width: 1 }, ticks: { stroke: '#2c333c', width: 1 }, font: '11px "JetBrains Mono", monospace' };
const MEDIAN = '#F5A30F';
const P90 = '#56B4E9';

/** Cycle time per match, oldest first: the median and the p90; clicking a match picks it. */
export function TrendChart({ matches, onPick }: { matches: readonly ReviewMatch[]; onPick?: (index: number) => void }) {
  const data = useMemo(() => trendColumns(matches) as uPlot.AlignedData, [matches]);
  const labels = useMemo(() => matches.map((m, i) => matchShort(m) ?? String(i + 1)), [matches]);
  const options = useMemo<Omit<uPlot.Options, 'width' | 'height'>>(
    () => ({
      legend: { show: false },
      padding: [10, 12, 0, 0],
      cursor: { drag: { x: false, y: false }, points: { size: 9 } },
      scales: { x: { time: false, range: (_u, min, max) => [min - 0.5, max + 0.5] }, y: { range: (_u, _min, max) => [0, Math.max(1, (max ?? 1) * 1.1)] } },
      axes: [
        {
          ...AXIS,
          splits: () => labels.map((_, i) => i + 1).filter((_, i) => labels.length <= 24 || i % Math.ceil(labels.length / 24) === 0),
          values: (_u, ticks) => ticks.map((t) => labels[t - 1] ?? ''),
        },
        { ...AXIS, size: 48, values: (_u, ticks) => ticks.map((t) => `${t}s`) },
      ],
      series: [
        {},
        { label: 'Median', stroke: MEDIAN, width: 2, points: { show: true, size: 7, fill: MEDIAN }, spanGaps: false },
        { label: 'p90', stroke: P90, width: 1.5, dash: [6, 4], points: { show: true, size: 5, fill: P90 }, spanGaps: false },
      ],
    }),
    [labels],
  );
  return (
    <div data-trend-chart="">
      <UPlotChart options={options} optionsKey={labels.join('|')} data={data} heightPx={240} onPick={onPick} label="Median and p90 cycle time per match, oldest first" />
      <ul className="mt-2 flex gap-4 text-sm text-asphalt-300" aria-label="Lines">
        <li className="flex items-center gap-1.5">
          <span aria-hidden="true" className="h-0.5 w-5" style={{ background: MEDIAN }} />
          Median cycle time
        </li>
        <li className="flex items-center gap-1.5">
          <span aria-hidden="true" className="h-0 w-5 border-t-2 border-dashed" style={{ borderColor: P90 }} />
          p90 cycle time
        </li>
      </ul>
    </div>
  );
}
