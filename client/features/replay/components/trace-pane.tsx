import { useQueries } from '@tanstack/react-query';
import { useEffect, useMemo, useRef } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import type { Signal } from '../../../../shared/protocol/messages';
import type { Series } from '../../../../shared/domain/timeline';
import { Spinner } from '../../../components/ui/spinner';
import { samplesQuery } from '../api/replay';
import { useReplayStore } from '../hooks/use-replay';
import { TRACE_COLOURS, traceColumns } from '../model/trace-data';
import { SignalPicker } from './signal-picker';

const AXIS = { stroke: '#8893a0', grid: { stroke: '#232931', width: 1 }, ticks: { stroke: '#2c333c', width: 1 }, font: '11px "JetBrains Mono", monospace' };
const HEIGHT_PX = 168;

type TracePaneProps = {
  recordingId: string;
  /** The recording is still being made: its samples are read again as it grows. */
  isLive: boolean;
  index: number;
  signals: readonly Signal[];
  allSignals: readonly Signal[];
  colourOffset: number;
  onChange: (names: string[]) => void;
};

/** One uPlot chart of a few signals over the visible window, with the timeline cursor as a vertical line. */
export function TracePane({ recordingId, isLive, index, signals, allSignals, colourOffset, onChange }: TracePaneProps) {
  const store = useReplayStore();
  const queries = useQueries({ queries: signals.map((s) => samplesQuery(recordingId, s.name, isLive)) });
  const isLoading = queries.some((q) => q.isPending);
  const failed = queries.find((q) => q.isError);
  const stamp = queries.map((q) => q.dataUpdatedAt).join('|');
  // the stamp changes exactly when some data does
  const series = useMemo<Series[]>(() => queries.map((q) => q.data ?? { tS: [], values: [] }), [stamp]);
  const seriesKey = signals.map((s) => s.name).join('|');
  const hostRef = useRef<HTMLDivElement>(null);
  const drawRef = useRef<(() => void) | null>(null);
  const seriesRef = useRef(series);
  seriesRef.current = series;

  // The chart is made once per set of signals; data and window changes go through setData and setScale.
  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    let afterDraw = () => {};
    const units = [...new Set(signals.map((s) => s.unit || s.name))];
    const opts: uPlot.Options = {
      width: Math.max(host.clientWidth, 200),
      height: HEIGHT_PX,
      legend: { show: false },
      padding: [8, 8, 0, 0],
      cursor: {
        drag: { x: true, y: false, setScale: false },
        points: { show: false },
        bind: { dblclick: () => null },
      },
      select: { show: true, left: 0, top: 0, width: 0, height: 0 },
      scales: { x: { time: false }, ...Object.fromEntries(units.map((u) => [u, { auto: true }])) },
      axes: [
        { ...AXIS, values: (_u, ticks) => ticks.map((t) => `${t}s`) },
        ...units.slice(0, 2).map((unit, i) => ({
          ...AXIS,
          scale: unit,
          side: i === 0 ? 3 : 1,
          size: 52,
          grid: i === 0 ? AXIS.grid : { show: false },
          label: signals.find((s) => (s.unit || s.name) === unit)?.unit || undefined,
          labelSize: 14,
          labelFont: '11px Barlow, sans-serif',
        })),
      ],
      series: [
        {},
        ...signals.map((s, i) => ({
          label: s.name,
          scale: s.unit || s.name,
          stroke: TRACE_COLOURS[(colourOffset + i) % TRACE_COLOURS.length],
          width: 1.5,
          spanGaps: true,
          ...(s.type === 'number' ? {} : { paths: uPlot.paths.stepped!({ align: 1 }) }),
        })),
      ],
      hooks: {
        // uPlot commits a new scale on a microtask, so the cursor line is placed after each draw.
        draw: [() => afterDraw()],
        setSelect: [
          (u) => {
            if (u.select.width < 4) return;
            const fromS = u.posToVal(u.select.left, 'x');
            const toS = u.posToVal(u.select.left + u.select.width, 'x');
            u.setSelect({ left: 0, top: 0, width: 0, height: 0 }, false);
            store.setWindow({ fromS, toS });
          },
        ],
      },
    };
    const chart = new uPlot(opts, [[]], host);

    const line = document.createElement('div');
    line.className = 'pointer-events-none absolute inset-y-0 w-px bg-signal-400 shadow-[0_0_0_1px_rgb(245_163_15/0.25)]';
    line.dataset.cursorLine = '';
    chart.over.appendChild(line);

    let shownWindow = store.get().window;
    const draw = () => {
      const { window } = store.get();
      shownWindow = window;
      chart.setData(traceColumns(seriesRef.current, window, chart.bbox.width / devicePixelRatio), false);
      chart.setScale('x', { min: window.fromS, max: window.toS });
      placeLine();
    };
    function placeLine() {
      const { tS, window } = store.get();
      const isInside = tS >= window.fromS && tS <= window.toS;
      line.style.display = isInside ? '' : 'none';
      if (isInside) line.style.transform = `translateX(${chart.valToPos(tS, 'x')}px)`;
    }
    afterDraw = placeLine;
    drawRef.current = draw;
    draw();

    const unsubscribe = store.subscribe(() => {
      if (store.get().window !== shownWindow) draw();
      else placeLine();
    });

    // A click without a drag moves the cursor there; a drag zooms (setSelect above).
    let downX = 0;
    const onDown = (e: MouseEvent) => {
      downX = e.clientX;
    };
    const onUp = (e: MouseEvent) => {
      if (Math.abs(e.clientX - downX) < 4) store.seek(chart.posToVal(e.offsetX, 'x'));
    };
    const onDoubleClick = () => store.setWindow({ fromS: 0, toS: store.durationS });
    // Horizontal scrolling (or shift + wheel) pans; ctrl + wheel zooms about the pointer.
    const onWheel = (e: WheelEvent) => {
      const { window } = store.get();
      const width = window.toS - window.fromS;
      if (e.ctrlKey || e.metaKey) {
        e.preventDefault();
        const atS = chart.posToVal(e.offsetX, 'x');
        const factor = e.deltaY > 0 ? 1.25 : 0.8;
        store.setWindow({ fromS: atS - (atS - window.fromS) * factor, toS: atS + (window.toS - atS) * factor });
        return;
      }
      const delta = e.shiftKey ? e.deltaY : e.deltaX;
      if (Math.abs(delta) < 1 || Math.abs(e.deltaX) < Math.abs(e.deltaY) && !e.shiftKey) return;
      e.preventDefault();
      const shiftS = Math.max(Math.min((delta / chart.bbox.width) * width * devicePixelRatio, store.durationS - window.toS), -window.fromS);
      store.setWindow({ fromS: window.fromS + shiftS, toS: window.toS + shiftS });
    };
    chart.over.addEventListener('mousedown', onDown);
    chart.over.addEventListener('mouseup', onUp);
    chart.over.addEventListener('dblclick', onDoubleClick);
    chart.over.addEventListener('wheel', onWheel, { passive: false });

    const resize = new ResizeObserver(() => {
      const width = Math.max(host.clientWidth, 200);
      if (Math.abs(width - chart.width) < 1) return;
      chart.setSize({ width, height: HEIGHT_PX });
      draw();
    });
    resize.observe(host);

    return () => {
      resize.disconnect();
      unsubscribe();
      chart.destroy();
      drawRef.current = null;
    };
    // one chart per set of signals
  }, [seriesKey, store]);

  useEffect(() => {
    drawRef.current?.();
  }, [series]);

  return (
    <div className="rounded-lg bg-asphalt-900 ring-1 ring-asphalt-750" data-trace-pane={index + 1}>
      <div className="flex flex-wrap items-center gap-x-3 gap-y-1 border-b border-asphalt-750 px-3 py-1.5">
        <span className="text-2xs font-semibold tracking-widest text-asphalt-500 uppercase">Pane {index + 1}</span>
        <ul className="flex min-w-0 flex-1 flex-wrap items-center gap-x-3 gap-y-1">
          {signals.map((s, i) => (
            <li key={s.name} className="flex items-center gap-1.5 text-sm text-asphalt-200">
              <span aria-hidden="true" className="h-0.5 w-3.5 rounded-full" style={{ backgroundColor: TRACE_COLOURS[(colourOffset + i) % TRACE_COLOURS.length] }} />
              <code className="text-xs">{s.name}</code>
              {s.unit && <span className="text-xs text-asphalt-500">{s.unit}</span>}
            </li>
          ))}
          {signals.length === 0 && <li className="text-sm text-asphalt-500">No signals in this pane</li>}
        </ul>
        {isLoading && <Spinner className="size-4 text-signal-500" />}
        <SignalPicker label={`Signals of pane ${index + 1}`} signals={allSignals} chosen={signals.map((s) => s.name)} onChange={onChange} />
      </div>
      {failed && <p className="px-3 pt-2 text-sm text-stop">Couldn’t load {signals[queries.indexOf(failed)]?.name}: {failed.error.message}</p>}
      <div ref={hostRef} className="replay-trace relative px-1 pt-1" />
    </div>
  );
}
