// Recordings through the HTTP API of a real server process (server/bin/serve.ts as a child):
//  1. upload of a 3-minute, 200-signal, 50 Hz recording file (1.8 M samples) with POST /api/recordings/upload,
//     against a raw psql COPY FROM STDIN of the same samples, row per sample, in the same run;
//  2. one signal for the whole match with GET /api/recordings/:id/samples: server time from `Server-Timing`
//     when the route sends one, otherwise the time the client observes (said so in the figure's name).
import { spawnSync } from 'node:child_process';
import { randomWalks } from './bench-kit';
import { psql, psqlCopy, signInDemo, startBenchServer, type BenchServer } from './bench-server';
import type { RecordingRecord } from '../../shared/protocol/recording-file';
import { encodeRecording, RECORDING_FORMAT, RECORDING_VERSION } from '../../shared/protocol/recording-file';
import { encodeTelemetry } from '../../shared/protocol/telemetry-codec';

const SIGNALS = 200;
const TICKS = 3 * 60 * 50;
const BATCH_TICKS = 5;
const RUNS = 3;
const READS = 50;
const READ_SIGNAL = 17;

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export interface BenchMatchFile {
  bytes: Uint8Array<ArrayBuffer>;
  /** Row-major samples: tick k, signal i at k·SIGNALS + i. */
  values: Float32Array;
  signalName(index: number): string;
}

/** A recording file of deterministic random walks for 200 signals over 9,000 ticks at 50 Hz. */
export function makeMatchFile(): BenchMatchFile {
  // The replay page's default traces (six) and the field map's pose come first, so a replay shows them.
  const named = ['drive/speed', 'drive/velocity/vx', 'drive/velocity/vy', 'elevator/height', 'elevator/setpoint', 'battery/voltage', 'drive/pose/x', 'drive/pose/y', 'drive/pose/heading'];
  const signalName = (index: number) => named[index] ?? `bench/signal_${index}`;
  const values = randomWalks(TICKS, SIGNALS, 4242);
  const records: RecordingRecord[] = [
    { type: 'signals', signals: Array.from({ length: SIGNALS }, (_, index) => ({ index, name: signalName(index), type: 'number' as const, unit: '' })) },
  ];
  for (let k = 0, seq = 0; k < TICKS; k += BATCH_TICKS, seq += 1) {
    const rows = Array.from({ length: BATCH_TICKS }, (_, j) => values.subarray((k + j) * SIGNALS, (k + j + 1) * SIGNALS));
    records.push({ type: 'telemetry_batch', seq, t0Ms: k * 20, dtMs: 20, ticks: BATCH_TICKS, data: encodeTelemetry(rows, SIGNALS) });
  }
  const bytes = new Uint8Array(encodeRecording({ format: RECORDING_FORMAT, version: RECORDING_VERSION, source: 'upload', robot: 'Bench' }, records));
  return { bytes, values, signalName };
}

/** Uploads a recording file through the API; resolves with the new recording's id. */
export async function uploadRecording(url: string, auth: { cookie: string; csrf: string }, bytes: Uint8Array<ArrayBuffer>): Promise<string> {
  const form = new FormData();
  form.append('file', new Blob([bytes], { type: 'application/octet-stream' }), 'bench.pitwall');
  const res = await fetch(`${url}/api/recordings/upload`, { method: 'POST', headers: { cookie: auth.cookie, 'x-csrf-token': auth.csrf }, body: form });
  if (res.status !== 201) throw new Error(`bench upload failed: ${res.status} ${await res.text()}`);
  return ((await res.json()) as { id: string }).id;
}


/** Sum of the `dur` values of a Server-Timing header, or undefined without one. */
function serverTimingMs(header: string | null): number | undefined {
  if (!header) return undefined;
  const durs = [...header.matchAll(/dur=([\d.]+)/g)].map((m) => Number(m[1]));
  return durs.length ? durs.reduce((a, b) => a + b, 0) : undefined;
}

export interface RecordingsApiBench {
  lines: string[];
  /** The last uploaded recording, left in place for the replay bench (deleted with the bench database). */
  recordingId: string;
  server: BenchServer;
}

/**
 * Runs the API figures against a server child of `databaseUrl` (migrated, demo team seeded by the server).
 * With `keepServer`, the server is left running and returned for the next bench; otherwise stopped.
 */
export async function benchRecordingsApi(options: { databaseUrl: string; keepServer?: boolean }): Promise<RecordingsApiBench> {
  const { databaseUrl } = options;
  if (spawnSync('psql', ['--version']).status !== 0) throw new Error('recordings API bench: psql is not on the PATH (needed for the COPY baseline)');
  const file = makeMatchFile();
  const n = TICKS * SIGNALS;
  const copyText = (recording: number) => {
    const lines = new Array<string>(n);
    for (let k = 0, r = 0; k < TICKS; k += 1) {
      for (let i = 0; i < SIGNALS; i += 1, r += 1) lines[r] = `${recording}\t${i}\t${k * 20}\t${file.values[r]}\n`;
    }
    return lines.join('');
  };
  const server = await startBenchServer(databaseUrl);
  try {
    const lead = await signInDemo(server.url, 'lead@harborlight.example');
    psql(databaseUrl, 'drop table if exists bench_api_samples');
    psql(databaseUrl, 'create table bench_api_samples (recording int not null, signal_index int not null, t_ms float8 not null, value real not null)');
    psql(databaseUrl, 'create index bench_api_samples_signal_idx on bench_api_samples (recording, signal_index, t_ms)');
    const uploadMs: number[] = [];
    const copyMs: number[] = [];
    let recordingId = '';
    try {
      for (let run = 0; run < RUNS; run += 1) {
        let t0 = performance.now();
        recordingId = await uploadRecording(server.url, lead, file.bytes);
        uploadMs.push(performance.now() - t0);
        const text = copyText(run);
        t0 = performance.now();
        await psqlCopy(databaseUrl, 'bench_api_samples', text);
        copyMs.push(performance.now() - t0);
      }
    } finally {
      psql(databaseUrl, 'drop table if exists bench_api_samples');
    }

    // One signal, whole match, as a member reads it for a chart.
    const coach = await signInDemo(server.url, 'coach@harborlight.example');
    const samplesUrl = `${server.url}/api/recordings/${recordingId}/samples?signal=${encodeURIComponent(file.signalName(READ_SIGNAL))}`;
    const readSamples = async () => {
      const t0 = performance.now();
      const res = await fetch(samplesUrl, { headers: { cookie: coach.cookie } });
      const body = (await res.json()) as { tS: number[]; values: (number | null)[] };
      const clientMs = performance.now() - t0;
      if (!res.ok) throw new Error(`bench samples read failed: ${res.status}`);
      return { clientMs, serverMs: serverTimingMs(res.headers.get('server-timing')), body };
    };
    const first = await readSamples();
    const bitsOk =
      first.body.values.length === TICKS &&
      first.body.values.every((v, k) => v !== null && Object.is(Math.fround(v), file.values[k * SIGNALS + READ_SIGNAL]!));
    for (let i = 0; i < 5; i += 1) await readSamples();
    const reads = [];
    for (let i = 0; i < READS; i += 1) reads.push(await readSamples());
    const hasServerTiming = reads.every((r) => r.serverMs !== undefined);
    const readTimes = reads.map((r) => (hasServerTiming ? r.serverMs! : r.clientMs)).sort((a, b) => a - b);
    const p = (q: number) => readTimes[Math.min(readTimes.length - 1, Math.floor(q * readTimes.length))]!;
    const copy = median(copyMs);
    const upload = median(uploadMs);
    const lines = [
      `  ${(n / 1e6).toFixed(1)} M samples (${SIGNALS} signals × ${TICKS} ticks), file ${(file.bytes.byteLength / 1e6).toFixed(1)} MB, median of ${RUNS} runs, interleaved`,
      `  ${'row per sample: COPY FROM STDIN (psql, text)'.padEnd(58)} ${copy.toFixed(0).padStart(6)} ms   1.00× COPY`,
      `  ${'POST /api/recordings/upload (multipart, server process)'.padEnd(58)} ${upload.toFixed(0).padStart(6)} ms   ${(upload / copy).toFixed(2)}× COPY (target ≤ 2×)`,
      `  GET /api/recordings/:id/samples, one signal, whole match (${TICKS} samples), ${READS} requests, ` +
        (hasServerTiming ? 'server time (Server-Timing):' : 'client-observed time (the route sends no Server-Timing):'),
      `    p50 ${p(0.5).toFixed(2)} ms   p90 ${p(0.9).toFixed(2)} ms   max ${readTimes.at(-1)!.toFixed(2)} ms   (target p50 ≤ 10 ms server time)`,
      `  samples back through the API bit for bit: ${bitsOk ? 'yes' : 'NO'}`,
    ];
    if (!options.keepServer) await server.stop();
    return { lines, recordingId, server };
  } catch (error) {
    await server.stop();
    throw error;
  }
}
