// Pure: the columns one trace pane hands to uPlot for the visible window.
import type uPlot from 'uplot';
import { alignSeries, downsampleMinMax, type Series, type TimeWindow } from '../../../../shared/domain/timeline';

/** Trace colours, distinct on the dark surface and apart for colour-blind eyes. */
export const TRACE_COLOURS = ['#F5A30F', '#56B4E9', '#2FBF8F', '#E069A8', '#D3D9DF', '#FF7A59'] as const;

/**
 * Each series downsampled to about one min/max pair per pixel over the window (a little beyond it, so lines run
 * to the edges), then aligned on one time column.
 */
export function traceColumns(series: readonly Series[], window: TimeWindow, widthPx: number): uPlot.AlignedData {
  const pad = (window.toS - window.fromS) * 0.02;
  const padded = { fromS: window.fromS - pad, toS: window.toS + pad };
  const buckets = Math.max(50, Math.round(widthPx));
  return alignSeries(series.map((s) => downsampleMinMax(s, buckets, padded))) as uPlot.AlignedData;
}
