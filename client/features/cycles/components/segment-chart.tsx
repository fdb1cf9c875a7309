import { useMemo } from 'react';
import uPlot from 'uplot';
import type { Cycle } from '../../../../shared/schemas/cycle';
import { segmentColumns, SEGMENTS } from '../model/cycles-view';
import { UPlotChart } from './uplot-chart';

const AXIS = { stroke: '#8893a0', grid: { stroke: '#232931', width: 1 }, ticks: { stroke: '#2c333c', width: 1 }, font: '11px "JetBrains Mono", monospace' };
const WHOLE = '#5a6571';
// Drawn longest first, each bar over the one before, so the visible bands are the segments (see segmentColumns).
const LAYERS = [
  { label: 'Whole cycle', colour: WHOLE },
  ...[...SEGMENTS].reverse().map((s) => ({ label: s.label, colour: s.colour })),
];

/** Each cycle as one stacked bar of its segments; clicking a bar picks that cycle. */
export function SegmentChart({ cycles, onPick }: { cycles: readonly Cycle[]; onPick: (index: number) => void }) {
  const data = useMemo(() => segmentColumns(cycles) as uPlot.AlignedData, [cycles]);
  const options = useMemo<Omit<uPlot.Options, 'width' | 'height'>>(
    () => ({
      legend: { show: false },
      padding: [8, 8, 0, 0],
      cursor: { points: { show: false }, drag: { x: false, y: false } },
      scales: { x: { time: false, range: (_u, min, max) => [min - 0.6, max + 0.6] }, y: { range: (_u, _min, max) => [0, Math.max(1, max * 1.08)] } },
      axes: [
        { ...AXIS, values: (_u, ticks) => ticks.map((t) => (Number.isInteger(t) ? String(t) : '')), label: 'Cycle', labelSize: 14, labelFont: '11px Barlow, sans-serif' },
        { ...AXIS, size: 48, values: (_u, ticks) => ticks.map((t) => `${t}s`) },
      ],
      series: [
        {},
        ...LAYERS.map((l) => ({ label: l.label, stroke: l.colour, fill: l.colour, width: 0, paths: uPlot.paths.bars!({ size: [0.62, 44] }), points: { show: false } })),
      ],
    }),
    [],
  );
  return (
    <div data-cycle-chart="">
      <UPlotChart options={options} optionsKey="segments" data={data} heightPx={200} onPick={onPick} label="Cycle times, each bar split into acquire, travel, align and place" />
      <ul className="mt-2 flex flex-wrap gap-x-4 gap-y-1 text-sm text-asphalt-300" aria-label="Segments">
        {SEGMENTS.map((s) => (
          <li key={s.key} className="flex items-center gap-1.5">
            <span aria-hidden="true" className="size-3 rounded-sm" style={{ background: s.colour }} />
            {s.label}
          </li>
        ))}
        <li className="flex items-center gap-1.5">
          <span aria-hidden="true" className="size-3 rounded-sm" style={{ background: WHOLE }} />
          Not split (no drive speed)
        </li>
      </ul>
    </div>
  );
}
