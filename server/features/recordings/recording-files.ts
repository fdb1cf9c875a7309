// Pure: no I/O, clocks or randomness; imports only shared/ and chunks.ts. Uploaded files recognised by their
// content, validated whole and turned into storable chunks and events; recordings turned back into Pitwall
// recording records and CSV text. A problem is named with where it is: the byte offset in a Pitwall file, the
// line in a CSV file.
import { signalSchema, type RobotEvent, type Signal, type TelemetryBatch } from '../../../shared/protocol/messages';
import {
  decodeRecording,
  encodeRecording,
  RecordingFileError,
  type RecordingHeader,
  type RecordingRecord,
} from '../../../shared/protocol/recording-file';
import { decodeTelemetry, encodeTelemetry, TelemetryDecodeError } from '../../../shared/protocol/telemetry-codec';
import { CHUNK_TICKS, planRuns, runChunks, tickTimeMs, type Chunk, type DecodedBatch } from './chunks';

export type FileFormat = 'pitwall' | 'csv';

/** A file that cannot be stored; the message says what is wrong and where. */
export class UploadFileError extends Error {}

export interface StoredEventInput {
  seq: number;
  tMs: number;
  kind: string;
  data: NonNullable<RobotEvent['data']> | null;
}

/** Everything an uploaded file stores, ready for one transaction. */
export interface UploadPlan {
  format: FileFormat;
  robot: string | undefined;
  /** Wall-clock ms of robot time 0, when the file says. */
  startedAtMs: number | undefined;
  notes: string | undefined;
  signals: Signal[];
  chunks: (Chunk & { signalIndex: number })[];
  events: StoredEventInput[];
  /** Robot time (ms) of the first tick or event: t = 0 s of the recording. */
  originTMs: number;
  durationMs: number;
}

export const CSV_HEADERS = ['time_s,signal,value', 'time,signal,value'] as const;

/**
 * Events without a robot seq (operator selections, robot acks, as the recorder adds them or a file's
 * `selection` records) are numbered from here up, per recording, so they never meet the robot's seqs.
 */
export const RELAY_EVENT_SEQ_BASE = 1_000_000_000;
const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47];

const isMsgpackMap = (b: number) => (b >= 0x80 && b <= 0x8f) || b === 0xde || b === 0xdf;

function firstLine(bytes: Uint8Array): string {
  let end = bytes.indexOf(0x0a);
  if (end < 0) end = Math.min(bytes.byteLength, 200);
  let start = 0;
  if (bytes[0] === 0xef && bytes[1] === 0xbb && bytes[2] === 0xbf) start = 3;
  return new TextDecoder('utf-8', { fatal: false }).decode(bytes.subarray(start, end)).replace(/\r$/, '');
}

const normaliseHeader = (line: string) => line.replace(/\s+/g, '').toLowerCase();

/** Which format the bytes are in, from their first bytes only (never the file name). */
export function sniffFormat(bytes: Uint8Array): FileFormat {
  if (bytes.byteLength === 0) throw new UploadFileError('The file is empty (at byte 0)');
  // A PNG's first byte (0x89) is also a MessagePack map of 9 entries: look for its signature first.
  const isPng = PNG_SIGNATURE.every((b, i) => bytes[i] === b);
  if (!isPng && isMsgpackMap(bytes[0]!)) return 'pitwall';
  const header = normaliseHeader(firstLine(bytes));
  if ((CSV_HEADERS as readonly string[]).includes(header)) return 'csv';
  const hex = Array.from(bytes.subarray(0, 4), (b) => b.toString(16).padStart(2, '0')).join(' ');
  const what = isPng ? 'a PNG image (at byte 0)' : header.includes(',') ? 'a CSV line that is not that header (line 1)' : `bytes ${hex} (at byte 0)`;
  throw new UploadFileError(
    `Not a Pitwall recording (a MessagePack map with format "pitwall-recording") nor a CSV with the header time_s,signal,value: the file starts with ${what}`,
  );
}

/** Validates and plans a whole file; throws UploadFileError before anything could be stored. */
export function planUpload(bytes: Uint8Array): UploadPlan {
  return sniffFormat(bytes) === 'pitwall' ? planPitwallFile(bytes) : planCsvFile(bytes);
}

function planPitwallFile(bytes: Uint8Array): UploadPlan {
  let file: ReturnType<typeof decodeRecording>;
  try {
    file = decodeRecording(bytes);
  } catch (error) {
    if (error instanceof RecordingFileError) throw new UploadFileError(`Not a valid Pitwall recording: ${error.message}`);
    throw error;
  }
  let signals: Signal[] | undefined;
  const batches: DecodedBatch[] = [];
  const events: StoredEventInput[] = [];
  const selections: Extract<RecordingRecord, { type: 'selection' }>[] = [];
  const seqs = new Set<number>();
  file.records.forEach((record, i) => {
    const where = `record ${i + 1} (${record.type}${'seq' in record ? ` seq ${record.seq}` : ''})`;
    if ('seq' in record) {
      if (seqs.has(record.seq)) throw new UploadFileError(`Not a valid Pitwall recording: ${where} repeats a seq`);
      seqs.add(record.seq);
    }
    switch (record.type) {
      case 'signals':
        if (signals) throw new UploadFileError(`Not a valid Pitwall recording: ${where} declares the signals a second time`);
        signals = checkSignals(record.signals, where);
        return;
      case 'telemetry_batch':
        if (!signals) throw new UploadFileError(`Not a valid Pitwall recording: ${where} comes before the signals record`);
        batches.push(decodeBatch(record, signals.length, where));
        return;
      case 'event':
        events.push({ seq: record.seq, tMs: record.tMs, kind: record.kind, data: record.data ?? null });
        return;
      case 'selection':
        selections.push(record);
        return;
    }
  });
  // Selections carry no seq: they are numbered as the recorder numbers the relay's own events.
  const firstSelectionSeq = events.reduce((next, e) => Math.max(next, e.seq + 1), RELAY_EVENT_SEQ_BASE);
  selections.forEach((s, n) =>
    events.push({ seq: firstSelectionSeq + n, tMs: s.tMs, kind: 'selection', data: { channel: s.channel, value: s.value } }),
  );
  if (!signals || batches.length === 0) throw new UploadFileError('Not a valid Pitwall recording: it has no telemetry (no signals or no telemetry_batch records)');
  const signalCount = signals.length;
  batches.sort((a, b) => a.seq - b.seq);
  const chunks = planRuns(batches).flatMap((run) => runChunks(run, signalCount).map((c, signalIndex) => ({ ...c, signalIndex })));
  const times = [...chunks.flatMap((c) => [c.t0Ms, tickTimeMs(c, c.ticks - 1)]), ...events.map((e) => e.tMs)];
  const originTMs = Math.min(...times);
  return {
    format: 'pitwall',
    robot: file.header.robot || undefined,
    startedAtMs: file.header.startedAtMs,
    notes: file.header.notes,
    signals,
    chunks,
    events,
    originTMs,
    durationMs: Math.max(...times) - originTMs,
  };
}

function checkSignals(signals: Signal[], where: string): Signal[] {
  const names = new Set<string>();
  signals.forEach((s, i) => {
    if (s.index !== i) throw new UploadFileError(`Not a valid Pitwall recording: ${where}: signal ${s.name} has index ${s.index}, expected ${i}`);
    if (names.has(s.name)) throw new UploadFileError(`Not a valid Pitwall recording: ${where}: signal ${s.name} is declared twice`);
    names.add(s.name);
  });
  return signals;
}

function decodeBatch(batch: TelemetryBatch, signalCount: number, where: string): DecodedBatch {
  let decoded: ReturnType<typeof decodeTelemetry>;
  try {
    decoded = decodeTelemetry(batch.data);
  } catch (error) {
    if (error instanceof TelemetryDecodeError) throw new UploadFileError(`Not a valid Pitwall recording: ${where}: ${error.message}`);
    throw error;
  }
  if (decoded.signalCount !== signalCount) {
    throw new UploadFileError(`Not a valid Pitwall recording: ${where} has ${decoded.signalCount} signals, ${signalCount} declared`);
  }
  if (decoded.rows.length !== batch.ticks) {
    throw new UploadFileError(`Not a valid Pitwall recording: ${where} has ${decoded.rows.length} ticks, says ${batch.ticks}`);
  }
  return { seq: batch.seq, t0Ms: batch.t0Ms, dtMs: batch.dtMs, rows: decoded.rows };
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const SPECIAL: Record<string, number> = { nan: Number.NaN, inf: Infinity, '+inf': Infinity, '-inf': -Infinity, infinity: Infinity, '+infinity': Infinity, '-infinity': -Infinity };

/** A CSV number: decimal or exponent notation; for values also NaN and ±Infinity. Undefined when it is not one. */
export function parseCsvNumber(text: string, allowSpecial: boolean): number | undefined {
  const t = text.trim();
  if (NUMBER.test(t)) return Number(t);
  if (!allowSpecial) return undefined;
  return SPECIAL[t.toLowerCase()];
}

const unquote = (s: string) => (s.length >= 2 && s.startsWith('"') && s.endsWith('"') ? s.slice(1, -1) : s).trim();

function planCsvFile(bytes: Uint8Array): UploadPlan {
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true, ignoreBOM: false }).decode(bytes);
  } catch {
    throw new UploadFileError('Not a valid CSV file: it is not UTF-8 text');
  }
  const lines = text.split('\n');
  const bySignal = new Map<string, { timesMs: number[]; values: number[] }>();
  for (let i = 1; i < lines.length; i += 1) {
    const line = lines[i]!.replace(/\r$/, '');
    const at = `line ${i + 1}`;
    if (line.trim() === '') continue;
    const fields = line.split(',');
    if (fields.length !== 3) throw new UploadFileError(`Not a valid CSV file: ${at} has ${fields.length} fields, expected 3 (time_s,signal,value)`);
    const timeS = parseCsvNumber(fields[0]!, false);
    if (timeS === undefined || !Number.isFinite(timeS)) throw new UploadFileError(`Not a valid CSV file: ${at}: the time "${fields[0]!.trim()}" is not a number of seconds`);
    const name = unquote(fields[1]!);
    if (!signalSchema.shape.name.safeParse(name).success) {
      throw new UploadFileError(`Not a valid CSV file: ${at}: "${name}" is not a signal name (letters, digits and _ - . /, at most 128)`);
    }
    const value = parseCsvNumber(fields[2]!, true);
    if (value === undefined) throw new UploadFileError(`Not a valid CSV file: ${at}: the value "${fields[2]!.trim()}" is not a number`);
    let column = bySignal.get(name);
    if (!column) {
      if (bySignal.size === 4096) throw new UploadFileError(`Not a valid CSV file: ${at}: more than 4096 signals`);
      bySignal.set(name, (column = { timesMs: [], values: [] }));
    }
    column.timesMs.push(timeS * 1000);
    column.values.push(value);
  }
  if (bySignal.size === 0) throw new UploadFileError(`Not a valid CSV file: it has a header but no samples (line 2)`);

  const signals: Signal[] = [];
  const chunks: UploadPlan['chunks'] = [];
  let first = Infinity;
  let last = -Infinity;
  [...bySignal].forEach(([name, column], signalIndex) => {
    signals.push({ index: signalIndex, name, type: 'number', unit: '' });
    const order = column.timesMs.map((_, k) => k).sort((a, b) => column.timesMs[a]! - column.timesMs[b]! || a - b);
    for (let start = 0, part = 0; start < order.length; start += CHUNK_TICKS, part += 1) {
      const slice = order.slice(start, start + CHUNK_TICKS);
      const timesMs = Float64Array.from(slice, (k) => column.timesMs[k]!);
      const values = new Uint8Array(new Float32Array(slice.map((k) => column.values[k]!)).buffer);
      chunks.push({ signalIndex, firstSeq: part, t0Ms: timesMs[0]!, dtMs: 0, ticks: slice.length, timesMs, values });
      first = Math.min(first, timesMs[0]!);
      last = Math.max(last, timesMs[timesMs.length - 1]!);
    }
  });
  return { format: 'csv', robot: undefined, startedAtMs: undefined, notes: undefined, signals, chunks, events: [], originTMs: first, durationMs: last - first };
}

// ---- export -------------------------------------------------------------------------------------------

export const CSV_HEADER_LINE = `${CSV_HEADERS[0]}\n`;

const csvNumber = (v: number) =>
  Number.isNaN(v) ? 'NaN' : v === Infinity ? 'Infinity' : v === -Infinity ? '-Infinity' : Object.is(v, -0) ? '-0' : String(v);

/** A JSON number that keeps -0 (JSON.stringify writes 0); null for NaN and ±Infinity, which JSON lacks. */
const jsonNumber = (v: number | null) => (v === null || !Number.isFinite(v) ? 'null' : Object.is(v, -0) ? '-0' : String(v));

/**
 * The samples answer as JSON text, like JSON.stringify but keeping the sign of zero, so a client that reads
 * the values with Math.fround gets every finite sample back bit for bit. Takes the service's typed arrays
 * (NaN and ±Infinity become null).
 */
export function samplesJson(answer: { signal: string; tS: ArrayLike<number>; values: ArrayLike<number | null> }): string {
  return `{"signal":${JSON.stringify(answer.signal)},"tS":${numbersJson(answer.tS)},"values":${numbersJson(answer.values)}}`;
}

/** V8's JSON.stringify writes a plain number array fastest (9,000 floats in ~1 ms), but writes -0 as 0. */
function numbersJson(xs: ArrayLike<number | null>): string {
  for (let i = 0; i < xs.length; i += 1) {
    if (Object.is(xs[i], -0)) return `[${Array.from(xs, jsonNumber).join(',')}]`;
  }
  return JSON.stringify(Array.from(xs));
}

/**
 * CSV lines `time_s,signal,value` of one signal. A float32 value is written as the shortest decimal of its exact
 * double, so Math.fround of the parsed text gives the same bits back.
 */
export function csvLines(signal: string, tS: Float64Array, values: Float32Array): string {
  let out = '';
  for (let k = 0; k < tS.length; k += 1) out += `${csvNumber(tS[k]!)},${signal},${csvNumber(values[k]!)}\n`;
  return out;
}

/** One signal's stored samples: robot times (ms) and float32 values. */
export interface StoredColumn {
  timesMs: Float64Array;
  values: Float32Array;
}

/** One signal's chunks (in seq order) as one column of robot times and values, bits unchanged. */
export function storedColumn(chunks: readonly Chunk[]): StoredColumn {
  const total = chunks.reduce((n, c) => n + c.ticks, 0);
  const timesMs = new Float64Array(total);
  const bits = new Uint32Array(total);
  let n = 0;
  for (const c of chunks) {
    const view = new DataView(c.values.buffer, c.values.byteOffset, c.values.byteLength);
    for (let k = 0; k < c.ticks; k += 1) {
      timesMs[n] = tickTimeMs(c, k);
      bits[n++] = view.getUint32(k * 4, true);
    }
  }
  return { timesMs, values: new Float32Array(bits.buffer) };
}

const BATCH_TICKS = 250;

/**
 * The records of a Pitwall recording file rebuilt from storage. Ticks are the union of every signal's times;
 * a signal without a sample at a tick keeps its previous value (as the telemetry payload does), unknown (NaN)
 * until its first sample. Batches cover evenly spaced ticks; batches and events are numbered by one seq in
 * time order, an event before a batch that ends at the same time.
 */
export function recordingRecords(signals: readonly Signal[], columns: readonly StoredColumn[], events: readonly StoredEventInput[]): RecordingRecord[] {
  const all = new Set<number>();
  for (const c of columns) for (const t of c.timesMs) all.add(t);
  const times = Float64Array.from(all).sort();
  const cursor = new Array<number>(columns.length).fill(0);
  const state = new Float32Array(signals.length).fill(Number.NaN);
  const rows = Array.from(times, (t) => {
    columns.forEach((c, i) => {
      while (cursor[i]! < c.timesMs.length && c.timesMs[cursor[i]!]! <= t) state[i] = c.values[cursor[i]!++]!;
    });
    return state.slice();
  });

  const timed: { tMs: number; order: number; record: Omit<TelemetryBatch, 'seq'> | Omit<RobotEvent, 'seq'> }[] = [];
  for (let start = 0; start < times.length; ) {
    const t0Ms = times[start]!;
    const gap = start + 1 < times.length ? times[start + 1]! - t0Ms : 0;
    // The payload allows 0 < dtMs ≤ 1000; a tick alone in its batch takes 1 ms, which no tick uses.
    const dtMs = gap > 0 && gap <= 1000 ? gap : 1;
    let end = start + 1;
    while (end < times.length && end - start < BATCH_TICKS && times[end] === t0Ms + (end - start) * dtMs) end += 1;
    timed.push({
      tMs: times[end - 1]!,
      order: 1,
      record: { type: 'telemetry_batch', t0Ms, dtMs, ticks: end - start, data: encodeTelemetry(rows.slice(start, end), signals.length) },
    });
    start = end;
  }
  for (const e of [...events].sort((a, b) => a.seq - b.seq)) {
    timed.push({ tMs: e.tMs, order: 0, record: { type: 'event', tMs: e.tMs, kind: e.kind, ...(e.data ? { data: e.data } : {}) } });
  }
  timed.sort((a, b) => a.tMs - b.tMs || a.order - b.order);
  return [{ type: 'signals', signals: [...signals] }, ...timed.map((t, seq) => ({ ...t.record, seq }) as RecordingRecord)];
}

/** The file's bytes in pieces: the header, then the records in groups, so a download can start at once. */
export function* recordingFilePieces(header: RecordingHeader, records: readonly RecordingRecord[], group = 200): Generator<Uint8Array> {
  const head = encodeRecording(header, []);
  yield head;
  for (let i = 0; i < records.length; i += group) yield encodeRecording(header, records.slice(i, i + group)).subarray(head.byteLength);
}
