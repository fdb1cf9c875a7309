import { useEffect, useRef } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';

type UPlotChartProps = {
  /** Options without size; a new `optionsKey` makes a new chart, otherwise data changes go through setData. */
  options: Omit<uPlot.Options, 'width' | 'height'>;
  optionsKey: string;
  data: uPlot.AlignedData;
  heightPx: number;
  /** Called with the data index under the pointer when the chart is clicked or tapped. */
  onPick?: (index: number) => void;
  label: string;
  /** A change redraws the chart without new data (for overlays drawn in a draw hook). */
  redrawKey?: string | number | null;
};

/** A uPlot chart made once, fed with setData, sized to its container and destroyed on unmount. */
export function UPlotChart({ options, optionsKey, data, heightPx, onPick, label, redrawKey }: UPlotChartProps) {
  const hostRef = useRef<HTMLDivElement>(null);
  const chartRef = useRef<uPlot | null>(null);
  const pickRef = useRef(onPick);
  pickRef.current = onPick;
  const dataRef = useRef(data);
  dataRef.current = data;

  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    const chart = new uPlot({ ...options, width: Math.max(host.clientWidth, 200), height: heightPx }, dataRef.current, host);
    chartRef.current = chart;
    const onClick = () => {
      const index = chart.cursor.idx;
      if (index !== null && index !== undefined) pickRef.current?.(index);
    };
    chart.over.addEventListener('click', onClick);
    chart.over.style.cursor = pickRef.current ? 'pointer' : '';
    const resize = new ResizeObserver(() => chart.setSize({ width: Math.max(host.clientWidth, 200), height: heightPx }));
    resize.observe(host);
    return () => {
      resize.disconnect();
      chart.over.removeEventListener('click', onClick);
      chart.destroy();
      chartRef.current = null;
    };
    // The chart is rebuilt only when its options key changes.
  }, [optionsKey, heightPx]);

  useEffect(() => {
    chartRef.current?.setData(data);
  }, [data]);

  useEffect(() => {
    chartRef.current?.redraw(false, false);
  }, [redrawKey]);

  return <div ref={hostRef} role="img" aria-label={label} className="w-full" />;
}
