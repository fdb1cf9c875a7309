// Pure: no I/O; imports nothing. How a recording's samples are cut into per-signal chunks, packed to bytes,
// merged and read back. Values are moved as float32 bit patterns (Uint32), never through a JS number, so a
// sample comes back with exactly the bits the robot sent (NaN payloads included). Bytes are little-endian.

/** When the ticks of a run are evenly spaced: tick k is at t0Ms + k·dtMs. */
export interface TickTimes {
  t0Ms: number;
  dtMs: number;
  ticks: number;
  /** Explicit robot times (ms) when the ticks are not evenly spaced; null when t0Ms + k·dtMs is exact. */
  timesMs: Float64Array | null;
}

/** One signal's samples for consecutive ticks, as stored in a row of recording_chunks. */
export interface Chunk extends TickTimes {
  firstSeq: number;
  /** `ticks` float32, little-endian. */
  values: Uint8Array;
}

/** A decoded telemetry batch: one Float32Array of S values per tick. */
export interface DecodedBatch {
  seq: number;
  t0Ms: number;
  dtMs: number;
  rows: Float32Array[];
}

/** Consecutive batches stored as one chunk per signal. */
export interface Run extends TickTimes {
  firstSeq: number;
  rows: Float32Array[];
}

export const CHUNK_TICKS = 1000;

/** Time of tick k (ms, robot time). */
export function tickTimeMs(t: TickTimes, k: number): number {
  return t.timesMs ? t.timesMs[k]! : t.t0Ms + k * t.dtMs;
}

/** Joins tick runs that follow each other; stays evenly spaced only when every part continues the last exactly. */
export function joinTimes(parts: readonly TickTimes[]): TickTimes {
  const first = parts[0];
  if (!first) throw new Error('joinTimes needs at least one part');
  const ticks = parts.reduce((n, p) => n + p.ticks, 0);
  let regular = true;
  let expected = first.t0Ms;
  for (const p of parts) {
    if (p.timesMs || p.dtMs !== first.dtMs || p.t0Ms !== expected) {
      regular = false;
      break;
    }
    expected = p.t0Ms + p.ticks * p.dtMs;
  }
  if (regular) return { t0Ms: first.t0Ms, dtMs: first.dtMs, ticks, timesMs: null };
  const timesMs = new Float64Array(ticks);
  let at = 0;
  for (const p of parts) for (let k = 0; k < p.ticks; k += 1) timesMs[at++] = tickTimeMs(p, k);
  return { t0Ms: first.t0Ms, dtMs: first.dtMs, ticks, timesMs };
}

/** Groups batches (in seq order) into runs of at most maxTicks ticks (a single larger batch stays whole). */
export function planRuns(batches: readonly DecodedBatch[], maxTicks = CHUNK_TICKS): Run[] {
  const runs: Run[] = [];
  let group: DecodedBatch[] = [];
  let groupTicks = 0;
  const close = () => {
    if (group.length === 0) return;
    const times = joinTimes(group.map((b) => ({ t0Ms: b.t0Ms, dtMs: b.dtMs, ticks: b.rows.length, timesMs: null })));
    runs.push({ ...times, firstSeq: group[0]!.seq, rows: group.flatMap((b) => b.rows) });
    group = [];
    groupTicks = 0;
  };
  for (const b of batches) {
    if (b.rows.length === 0) continue;
    if (groupTicks + b.rows.length > maxTicks) close();
    group.push(b);
    groupTicks += b.rows.length;
  }
  close();
  return runs;
}

/** Transposes rows (one Float32Array of S values per tick) into S columns of float32 little-endian bytes. */
export function packColumns(rows: readonly Float32Array[], signalCount: number): Uint8Array[] {
  const columns = Array.from({ length: signalCount }, () => new Uint8Array(rows.length * 4));
  const views = columns.map((c) => new DataView(c.buffer));
  rows.forEach((row, k) => {
    if (row.length !== signalCount) throw new Error(`tick ${k} has ${row.length} values, expected ${signalCount}`);
    const bits = new Uint32Array(row.buffer, row.byteOffset, row.length);
    for (let i = 0; i < signalCount; i += 1) views[i]!.setUint32(k * 4, bits[i]!, true);
  });
  return columns;
}

/** One chunk per signal for a run. */
export function runChunks(run: Run, signalCount: number): Chunk[] {
  const { rows, ...rest } = run;
  return packColumns(rows, signalCount).map((values) => ({ ...rest, values }));
}

/** Merges one signal's chunks (in seq order) into one. */
export function mergeChunks(chunks: readonly Chunk[]): Chunk {
  const times = joinTimes(chunks);
  const values = new Uint8Array(times.ticks * 4);
  let at = 0;
  for (const c of chunks) {
    values.set(c.values, at);
    at += c.values.byteLength;
  }
  return { ...times, firstSeq: chunks[0]!.firstSeq, values };
}

/** Groups one signal's chunks (in seq order) for merging: consecutive small chunks up to maxTicks together. */
export function groupForMerge(chunks: readonly Chunk[], maxTicks = CHUNK_TICKS): Chunk[][] {
  const groups: Chunk[][] = [];
  let group: Chunk[] = [];
  let ticks = 0;
  for (const c of chunks) {
    if (group.length > 0 && ticks + c.ticks > maxTicks) {
      groups.push(group);
      group = [];
      ticks = 0;
    }
    group.push(c);
    ticks += c.ticks;
  }
  if (group.length > 0) groups.push(group);
  return groups;
}

export interface Samples {
  /** Seconds from the recording's origin. */
  tS: Float64Array;
  values: Float32Array;
}

/** One signal's samples from its chunks (in seq order) with tS in [fromS, toS] (both inclusive, both optional). */
export function sliceSamples(chunks: readonly Chunk[], originMs: number, range: { fromS?: number; toS?: number } = {}): Samples {
  const fromS = range.fromS ?? Number.NEGATIVE_INFINITY;
  const toS = range.toS ?? Number.POSITIVE_INFINITY;
  const total = chunks.reduce((n, c) => n + c.ticks, 0);
  const tS = new Float64Array(total);
  const bits = new Uint32Array(total);
  let n = 0;
  for (const c of chunks) {
    const view = new DataView(c.values.buffer, c.values.byteOffset, c.values.byteLength);
    for (let k = 0; k < c.ticks; k += 1) {
      const t = (tickTimeMs(c, k) - originMs) / 1000;
      if (t < fromS || t > toS) continue;
      tS[n] = t;
      bits[n] = view.getUint32(k * 4, true);
      n += 1;
    }
  }
  return { tS: tS.slice(0, n), values: new Float32Array(bits.buffer.slice(0, n * 4)) };
}

/** Float64 times as little-endian bytes, and back. */
export function packTimes(timesMs: Float64Array): Uint8Array {
  const out = new Uint8Array(timesMs.length * 8);
  const view = new DataView(out.buffer);
  timesMs.forEach((t, k) => view.setFloat64(k * 8, t, true));
  return out;
}

export function unpackTimes(bytes: Uint8Array): Float64Array {
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const out = new Float64Array(bytes.byteLength / 8);
  for (let k = 0; k < out.length; k += 1) out[k] = view.getFloat64(k * 8, true);
  return out;
}
