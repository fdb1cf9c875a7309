// Pure: msgpackr and zod only. Pitwall's recording file: a MessagePack stream, a header map first, then one
// map per record — the same `signals`, `telemetry_batch` and `event` messages a robot sends the relay, plus
// `selection` records for the operator's values. Documented in docs/recording-format.md.
import { Packr } from 'msgpackr';
import { z } from 'zod';
import { channelValueSchema, declareSignalsSchema, eventSchema, telemetryBatchSchema } from './messages';

export const RECORDING_FORMAT = 'pitwall-recording';
export const RECORDING_VERSION = 1;

export const recordingHeaderSchema = z.object({
  format: z.literal(RECORDING_FORMAT),
  version: z.literal(RECORDING_VERSION),
  source: z.enum(['live', 'upload', 'simulator']),
  robot: z.string().max(64),
  teamNumber: z.number().int().optional(),
  /** Wall-clock time of robot time 0, ms since 1970, when known. */
  startedAtMs: z.number().optional(),
  seed: z.number().int().optional(),
  notes: z.string().max(2000).optional(),
});
export type RecordingHeader = z.infer<typeof recordingHeaderSchema>;

export const selectionRecordSchema = z.object({
  type: z.literal('selection'),
  tMs: z.number(),
  channel: z.string().max(128),
  value: channelValueSchema,
});

export const recordingRecordSchema = z.discriminatedUnion('type', [
  declareSignalsSchema,
  telemetryBatchSchema,
  eventSchema,
  selectionRecordSchema,
]);
export type RecordingRecord = z.infer<typeof recordingRecordSchema>;

const packr = new Packr({ useRecords: false, mapsAsObjects: true, moreTypes: false, variableMapSize: true, int64AsType: 'number' });

/** The file's bytes: the header, then each record, concatenated. */
export function encodeRecording(header: RecordingHeader, records: readonly RecordingRecord[]): Uint8Array {
  const parts = [packr.pack(header), ...records.map((r) => packr.pack(r))];
  const out = new Uint8Array(parts.reduce((n, p) => n + p.byteLength, 0));
  let offset = 0;
  for (const part of parts) {
    out.set(part, offset);
    offset += part.byteLength;
  }
  return out;
}

export class RecordingFileError extends Error {
  constructor(
    message: string,
    /** Byte offset of the item that is wrong. */
    readonly offset: number,
  ) {
    super(`${message} (at byte ${offset})`);
  }
}

/** Reads a whole file; throws RecordingFileError naming the problem and its byte offset. */
export function decodeRecording(bytes: Uint8Array): { header: RecordingHeader; records: RecordingRecord[] } {
  if (bytes.byteLength === 0) throw new RecordingFileError('the file is empty', 0);
  const items: { value: unknown; start: number; end: number }[] = [];
  try {
    packr.unpackMultiple(bytes, (value: unknown, start?: number, end?: number) => {
      items.push({ value, start: start ?? 0, end: end ?? 0 });
    });
  } catch {
    throw new RecordingFileError('the file is truncated or not MessagePack', items.at(-1)?.end ?? 0);
  }
  const first = items[0];
  if (!first) throw new RecordingFileError('the file is empty', 0);
  const header = recordingHeaderSchema.safeParse(first.value);
  if (!header.success) throw new RecordingFileError(`not a Pitwall recording header: ${header.error.issues[0]?.message}`, 0);
  const records = items.slice(1).map(({ value, start }) => {
    const parsed = recordingRecordSchema.safeParse(value);
    if (!parsed.success) {
      const issue = parsed.error.issues[0];
      throw new RecordingFileError(`bad record: ${issue ? `${issue.path.join('.') || 'record'}: ${issue.message}` : 'invalid'}`, start);
    }
    return parsed.data;
  });
  return { header: header.data, records };
}
