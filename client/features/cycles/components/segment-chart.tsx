import { useMemo, useRef } from 'react';
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

const CURRENT = '#FFCF6E';
const BAR_SHARE = 0.62;

type SegmentChartProps = { cycles: readonly Cycle[]; currentIndex: number | null; onPick: (index: number) => void };

/** Each cycle as one stacked bar of its segments, the cycle under the cursor outlined; clicking a bar picks that cycle. */
export function SegmentChart({ cycles, currentIndex, onPick }: SegmentChartProps) {
  const data = useMemo(() => segmentColumns(cycles) as uPlot.AlignedData, [cycles]);
  const currentRef = useRef(currentIndex);
  currentRef.current = currentIndex;
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
        ...LAYERS.map((l) => ({ label: l.label, stroke: l.colour, fill: l.colour, width: 0, paths: uPlot.paths.bars!({ size: [BAR_SHARE, 44] }), points: { show: false } })),
      ],
      hooks: {
        draw: [
          (u) => {
            const i = currentRef.current;
            if (i === null) return;
            const x = u.valToPos(i + 1, 'x', true);
            const slotPx = Math.abs(u.valToPos(2, 'x', true) - u.valToPos(1, 'x', true));
            const widthPx = Math.min(slotPx * BAR_SHARE, 44 * devicePixelRatio) + 6 * devicePixelRatio;
            u.ctx.save();
            u.ctx.strokeStyle = CURRENT;
            u.ctx.lineWidth = 2 * devicePixelRatio;
            u.ctx.strokeRect(x - widthPx / 2, u.bbox.top, widthPx, u.bbox.height);
            u.ctx.restore();
          },
        ],
      },
    }),
    [],
  );
  return (
    <div data-cycle-chart="">
      <UPlotChart options={options} optionsKey="segments" data={data} heightPx={200} onPick={onPick} redrawKey={currentIndex} label="Cycle times, each bar split into acquire, travel, align and place" />
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
        <li className="flex items-center gap-1.5">
          <span aria-hidden="true" className="size-3 rounded-sm" style={{ boxShadow: `inset 0 0 0 2px ${CURRENT}` }} />
          At the cursor
        </li>
      </ul>
    </div>
  );
}
