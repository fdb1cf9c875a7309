// Pure: imports nothing. Timeline maths of the replay: finding samples by time, min/max downsampling,
// aligning series into uPlot's columnar arrays, and the playback clock. Times are seconds from the start.

export type Series = { tS: ArrayLike<number>; values: ArrayLike<number | null> };
export type SeriesArrays = { tS: number[]; values: (number | null)[] };
export type TimeWindow = { fromS: number; toS: number };

/** One tick of the robot's 50 Hz loop, in seconds: what "step" moves by. */
export const TICK_S = 0.02;
export const PLAYBACK_SPEEDS = [0.25, 0.5, 1, 2, 4] as const;
export type PlaybackSpeed = (typeof PLAYBACK_SPEEDS)[number];

/** First index whose time is ≥ tS (tS.length when none); times ascending. */
export function lowerBound(times: ArrayLike<number>, tS: number): number {
  let lo = 0;
  let hi = times.length;
  while (lo < hi) {
    const mid = (lo + hi) >>> 1;
    if (times[mid]! < tS) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

/** Index of the time nearest tS (the earlier one on a tie); -1 for no times. */
export function closestIndex(times: ArrayLike<number>, tS: number): number {
  const n = times.length;
  if (n === 0) return -1;
  const i = lowerBound(times, tS);
  if (i === 0) return 0;
  if (i === n) return n - 1;
  return tS - times[i - 1]! <= times[i]! - tS ? i - 1 : i;
}

/** Index of the last time ≤ tS, i.e. the sample holding at tS; -1 before the first sample or for none. */
export function indexAtOrBefore(times: ArrayLike<number>, tS: number): number {
  const i = lowerBound(times, tS);
  if (i < times.length && times[i] === tS) {
    let j = i;
    while (j + 1 < times.length && times[j + 1] === tS) j += 1;
    return j;
  }
  return i - 1;
}

/** The value holding at tS (the last sample at or before it), or null before the first sample. */
export function valueAt(series: Series, tS: number): number | null {
  const i = indexAtOrBefore(series.tS, tS);
  return i < 0 ? null : (series.values[i] ?? null);
}

/**
 * Min/max downsampling of the samples inside `window` (all when omitted) to about `buckets` equal-time buckets:
 * each bucket keeps its lowest and highest finite sample, in time order, plus the window's first and last
 * samples, so peaks survive and the line starts and ends where the data does. A bucket holding only nulls keeps
 * one null so a gap stays a gap. At most 2 × buckets + 2 points; fewer samples than that are returned as they are.
 */
export function downsampleMinMax(series: Series, buckets: number, window?: TimeWindow): SeriesArrays {
  const { tS, values } = series;
  const start = window ? lowerBound(tS, window.fromS) : 0;
  const end = window ? lowerBound(tS, window.toS + 1e-9) : tS.length; // exclusive
  const count = end - start;
  const out: SeriesArrays = { tS: [], values: [] };
  if (count <= 0) return out;
  const push = (i: number) => {
    out.tS.push(tS[i]!);
    out.values.push(values[i] ?? null);
  };
  const wanted = Math.max(1, Math.floor(buckets));
  if (count <= 2 * wanted + 2) {
    for (let i = start; i < end; i++) push(i);
    return out;
  }
  const t0 = tS[start]!;
  const span = tS[end - 1]! - t0 || 1;
  const last = end - 1;
  push(start);
  let i = start + 1;
  for (let b = 0; b < wanted && i < last; b++) {
    const bucketEndS = t0 + (span * (b + 1)) / wanted;
    let minI = -1;
    let maxI = -1;
    let nullI = -1;
    while (i < last && (tS[i]! < bucketEndS || b === wanted - 1)) {
      const v = values[i] ?? null;
      if (v === null || !Number.isFinite(v)) {
        if (nullI < 0) nullI = i;
      } else {
        if (minI < 0 || v < values[minI]!) minI = i;
        if (maxI < 0 || v > values[maxI]!) maxI = i;
      }
      i += 1;
    }
    if (minI < 0) {
      if (nullI >= 0) push(nullI);
    } else if (minI === maxI) {
      push(minI);
    } else {
      push(Math.min(minI, maxI));
      push(Math.max(minI, maxI));
    }
  }
  push(last);
  return out;
}

/**
 * Aligns series onto one ascending time column, uPlot's `[x, ...ys]` layout: each series keeps its own values at
 * its own times and has null where it has no sample at a time another series has.
 */
export function alignSeries(series: readonly Series[]): [number[], ...(number | null)[][]] {
  const times: number[] = [];
  const cursors = series.map(() => 0);
  for (;;) {
    let next = Infinity;
    for (let s = 0; s < series.length; s++) {
      const c = cursors[s]!;
      if (c < series[s]!.tS.length && series[s]!.tS[c]! < next) next = series[s]!.tS[c]!;
    }
    if (next === Infinity) break;
    times.push(next);
    for (let s = 0; s < series.length; s++) {
      while (cursors[s]! < series[s]!.tS.length && series[s]!.tS[cursors[s]!] === next) cursors[s]! += 1;
    }
  }
  const columns = series.map((s) => {
    const column: (number | null)[] = new Array(times.length).fill(null);
    let j = 0;
    for (let i = 0; i < s.tS.length; i++) {
      while (times[j]! < s.tS[i]!) j += 1;
      column[j] = s.values[i] ?? null;
    }
    return column;
  });
  return [times, ...columns];
}

/** tS kept inside [0, durationS]; 0 for a non-finite time. */
export function clampTime(tS: number, durationS: number): number {
  if (!Number.isFinite(tS)) return 0;
  return Math.min(Math.max(tS, 0), Math.max(durationS, 0));
}

/**
 * The cursor after `elapsedMs` of wall time at `speed`, stopped at the end: `hasEnded` says playback should stop.
 */
export function advanceCursor(tS: number, elapsedMs: number, speed: number, durationS: number): { tS: number; hasEnded: boolean } {
  const next = tS + (Math.max(elapsedMs, 0) / 1000) * speed;
  return next >= durationS ? { tS: Math.max(durationS, 0), hasEnded: true } : { tS: clampTime(next, durationS), hasEnded: false };
}

/** The cursor moved by `ticks` robot ticks (negative steps back), kept inside the recording and snapped to the tick grid. */
export function stepTicks(tS: number, ticks: number, durationS: number): number {
  const onGrid = Math.round(tS / TICK_S);
  return clampTime(Number(((onGrid + ticks) * TICK_S).toFixed(6)), durationS);
}

/**
 * The time of the first mark strictly after tS (direction 1) or strictly before it (-1), ignoring marks within
 * 1 ms of tS so repeated jumps move on; null when there is none. `marks` ascending.
 */
export function adjacentMark(marks: readonly number[], tS: number, direction: 1 | -1): number | null {
  const EPS = 0.001;
  if (direction === 1) {
    const i = lowerBound(marks, tS + EPS);
    return i < marks.length ? marks[i]! : null;
  }
  const i = lowerBound(marks, tS - EPS) - 1;
  return i >= 0 ? marks[i]! : null;
}

/** The next playback speed up (1) or down (-1) the ladder, staying at its ends. */
export function nextSpeed(speed: number, direction: 1 | -1): PlaybackSpeed {
  const i = PLAYBACK_SPEEDS.findIndex((s) => s >= speed);
  const at = i < 0 ? PLAYBACK_SPEEDS.length - 1 : i;
  return PLAYBACK_SPEEDS[Math.min(Math.max(at + direction, 0), PLAYBACK_SPEEDS.length - 1)]!;
}

/** Reads a `?t=` moment in seconds (e.g. "93.2"), kept inside the recording; null when missing or not a number. */
export function parseMoment(raw: string | null, durationS: number): number | null {
  if (raw === null || raw.trim() === '') return null;
  const t = Number(raw);
  return Number.isFinite(t) ? clampTime(t, durationS) : null;
}

/** A moment for a link: seconds to two decimals, trailing zeros dropped ("93.2", "12", "0.04"). */
export function formatMoment(tS: number): string {
  return String(Number(tS.toFixed(2)));
}

/**
 * The visible window after the cursor moves to tS: unchanged while tS is inside it, otherwise paged so tS sits a
 * tenth of the way in, keeping the window's width and staying inside [0, durationS].
 */
export function followWindow(window: TimeWindow, tS: number, durationS: number): TimeWindow {
  if (tS >= window.fromS && tS <= window.toS) return window;
  const width = Math.min(window.toS - window.fromS, durationS);
  const fromS = Math.min(Math.max(tS - width * 0.1, 0), Math.max(durationS - width, 0));
  return { fromS, toS: fromS + width };
}

/** The samples of `series` in the `seconds` before tS up to tS, e.g. a trail. */
export function sliceBefore(series: Series, tS: number, seconds: number): { start: number; end: number } {
  return { start: lowerBound(series.tS, tS - seconds), end: indexAtOrBefore(series.tS, tS) + 1 };
}

/** Seconds of the newest telemetry the traces show while a live recording is followed. */
export const LIVE_WINDOW_S = 30;

/** The window that follows a growing recording: its last `spanS` seconds (all of it while shorter). */
export function liveWindow(durationS: number, spanS = LIVE_WINDOW_S): TimeWindow {
  const toS = Math.max(durationS, 0.02);
  return { fromS: Math.max(toS - spanS, 0), toS };
}
