// Recording storage: a 3-minute, 200-signal, 50 Hz match (1.8 M samples) through the recordings ingest
// against row-per-sample baselines of the same samples (multi-row INSERT, and COPY FROM STDIN through psql
// when a database URL is given and psql is on the PATH), then one whole signal read back from each.
import { psqlCopy } from './bench-server';
import { spawnSync } from 'node:child_process';
import { randomUUID } from 'node:crypto';
import { sql } from 'drizzle-orm';
import type { TelemetryBatch } from '../../shared/protocol/messages';
import type { Signal } from '../../shared/protocol/messages';
import { encodeTelemetry } from '../../shared/protocol/telemetry-codec';
import type { Db } from '../db/client';
import { teams } from '../db/schema/index';
import { recordingsStore } from '../features/recordings/recordings.repo';
import { createRecordingsService } from '../features/recordings/recordings.service';
import { formatResults, measure, randomWalks } from './bench-kit';

const SIGNALS = 200;
const TICKS = 3 * 60 * 50;
const BATCH_TICKS = 5;
/** Telemetry batches per ingest transaction: 250 ticks, 5 s of match (the relay stores what arrived meanwhile). */
const APPEND_BATCHES = 50;
const RUNS = 3;
const INSERT_ROWS = 50_000;

interface BenchMatch {
  signals: Signal[];
  batches: TelemetryBatch[];
  /** Row-major samples: tick k, signal i at k·SIGNALS + i. */
  values: Float32Array;
}

/** Deterministic random walks; a third of the signals hold still for stretches, as real telemetry does. */
function makeMatch(): BenchMatch {
  const signals: Signal[] = Array.from({ length: SIGNALS }, (_, index) => ({ index, name: `bench/signal_${index}`, type: 'number', unit: '' }));
  const values = randomWalks(TICKS, SIGNALS, 12345);
  const batches: TelemetryBatch[] = [];
  for (let k = 0, seq = 0; k < TICKS; k += BATCH_TICKS, seq += 1) {
    const rows = Array.from({ length: BATCH_TICKS }, (_, j) => values.subarray((k + j) * SIGNALS, (k + j + 1) * SIGNALS));
    batches.push({ type: 'telemetry_batch', seq, t0Ms: k * 20, dtMs: 20, ticks: BATCH_TICKS, data: encodeTelemetry(rows, SIGNALS) });
  }
  return { signals, batches, values };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;
async function timed(fn: () => Promise<void>): Promise<number> {
  const t0 = performance.now();
  await fn();
  return performance.now() - t0;
}


export async function benchRecordings(db: Db, options: { databaseUrl?: string } = {}): Promise<string[]> {
  const match = makeMatch();
  const [team] = await db.insert(teams).values({ number: 90000 + (process.pid % 9999), name: 'Bench Harbor' }).returning();
  const teamId = team!.id;
  const service = createRecordingsService({ store: recordingsStore(db), now: () => new Date() });
  await db.execute(sql`drop table if exists bench_samples`);
  await db.execute(sql`create table bench_samples (recording int not null, signal_index int not null, t_ms float8 not null, value real not null)`);
  await db.execute(sql`create index bench_samples_signal_idx on bench_samples (recording, signal_index, t_ms)`);
  const hasPsql = options.databaseUrl !== undefined && spawnSync('psql', ['--version']).status === 0;

  // Row-per-sample columns, built once (outside the timings).
  const n = TICKS * SIGNALS;
  const signalCol = new Array<number>(n);
  const tCol = new Array<number>(n);
  const valueCol = new Array<number>(n);
  for (let k = 0, r = 0; k < TICKS; k += 1) {
    for (let i = 0; i < SIGNALS; i += 1, r += 1) {
      signalCol[r] = i;
      tCol[r] = k * 20;
      valueCol[r] = match.values[r]!;
    }
  }
  const copyText = (recording: number) => {
    const lines: string[] = [];
    for (let r = 0; r < n; r += 1) lines.push(`${recording}\t${signalCol[r]}\t${tCol[r]}\t${valueCol[r]}\n`);
    return lines.join('');
  };

  const ingestMs: number[] = [];
  const oneTxMs: number[] = [];
  const insertMs: number[] = [];
  const copyMs: number[] = [];
  let lastRecordingId = '';
  try {
    for (let run = 0; run < RUNS; run += 1) {
      const stream = (streamId: string) => ({ teamId, robot: 'Bench', robotKeyId: undefined, streamId, signals: match.signals, kind: 'practice' as const, source: 'live' as const });
      const live = stream(randomUUID());
      ingestMs.push(
        await timed(async () => {
          let recordingId = '';
          for (let b = 0; b < match.batches.length; b += APPEND_BATCHES) {
            recordingId = (await service.ingest(live, match.batches.slice(b, b + APPEND_BATCHES))).recordingId;
          }
          await service.finish(teamId, recordingId);
          lastRecordingId = recordingId;
        }),
      );
      const upload = stream(randomUUID());
      oneTxMs.push(
        await timed(async () => {
          const { recordingId } = await service.ingest(upload, match.batches);
          await service.compact(recordingId);
        }),
      );
      insertMs.push(
        await timed(async () => {
          for (let r = 0; r < n; r += INSERT_ROWS) {
            const end = Math.min(n, r + INSERT_ROWS);
            await db.execute(sql`
              insert into bench_samples (recording, signal_index, t_ms, value)
              select ${run * 2}, * from unnest(${sql.param(signalCol.slice(r, end))}::int[], ${sql.param(tCol.slice(r, end))}::float8[], ${sql.param(valueCol.slice(r, end))}::real[])`);
          }
        }),
      );
      if (hasPsql) {
        const text = copyText(run * 2 + 1);
        copyMs.push(await timed(() => psqlCopy(options.databaseUrl!, 'bench_samples', text)));
      }
    }
    await db.execute(sql`analyze bench_samples`);

    const signalName = match.signals[17]!.name;
    const chunked = await service.readSamples(teamId, lastRecordingId, signalName);
    const sent = new Uint32Array(match.values.buffer);
    const back = new Uint32Array(chunked.values.buffer, chunked.values.byteOffset, chunked.values.length);
    const bitsOk = back.length === TICKS && back.every((b, k) => b === sent[k * SIGNALS + 17]);
    const rowRead = await measure('one signal, whole match: row per sample', 50, async () => {
      const result = await db.execute<{ t_ms: number; value: number }>(
        sql`select t_ms, value from bench_samples where recording = 0 and signal_index = 17 order by t_ms`,
      );
      Float64Array.from(result.rows, (r) => r.t_ms);
      Float32Array.from(result.rows, (r) => r.value);
    });
    const chunkRead = await measure('one signal, whole match: recording chunks', 50, async () => {
      await service.readSamples(teamId, lastRecordingId, signalName);
    });
    const baseline = hasPsql ? median(copyMs) : median(insertMs);
    const baselineName = hasPsql ? 'COPY' : 'multi-row INSERT';
    const line = (name: string, ms: number) => `  ${name.padEnd(58)} ${ms.toFixed(0).padStart(6)} ms   ${(ms / baseline).toFixed(2)}× ${baselineName}`;
    const size = await db.execute<{ chunks: number; rows: number }>(sql`
      select pg_total_relation_size('recording_chunks')::float8 as chunks, pg_total_relation_size('bench_samples')::float8 as rows`);
    const mbPerMatch = (bytes: number, copies: number) => `${(bytes / copies / 1e6).toFixed(1)} MB`;
    return [
      `  ${(n / 1e6).toFixed(1)} M samples (${SIGNALS} signals × ${TICKS} ticks), median of ${RUNS} runs, interleaved`,
      ...(hasPsql ? [line('row per sample: COPY FROM STDIN (psql, text)', median(copyMs))] : ['  (psql not found: no COPY baseline)']),
      line('row per sample: multi-row INSERT (unnest, 50 k rows each)', median(insertMs)),
      line(`recordings ingest, ${APPEND_BATCHES}-batch transactions + finish`, median(ingestMs)),
      line('recordings ingest, one transaction + merge', median(oneTxMs)),
      formatResults([rowRead, { ...chunkRead, baseline: rowRead }]),
      `  samples back bit for bit: ${bitsOk ? 'yes' : 'NO'}; on disk per match (with indexes): ` +
        `chunks ${mbPerMatch(size.rows[0]!.chunks, RUNS * 2)}, row per sample ${mbPerMatch(size.rows[0]!.rows, RUNS * (hasPsql ? 2 : 1))}`,
    ];
  } finally {
    await db.execute(sql`drop table if exists bench_samples`);
    await db.delete(teams).where(sql`${teams.id} = ${teamId}`);
  }
}
