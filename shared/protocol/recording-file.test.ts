import { pack } from 'msgpackr';
import { describe, expect, it } from 'vitest';
import { decodeRecording, encodeRecording, RecordingFileError, type RecordingHeader, type RecordingRecord } from './recording-file';

const header: RecordingHeader = { format: 'pitwall-recording', version: 1, source: 'simulator', robot: 'Gullwing', seed: 7 };
const records: RecordingRecord[] = [
  { type: 'signals', signals: [{ index: 0, name: 'drive/pose/x', type: 'number', unit: 'm' }] },
  { type: 'selection', tMs: 10, channel: 'op/reef/branch', value: 'C' },
  { type: 'event', seq: 0, tMs: 12, kind: 'acquired', data: { station: 'left' } },
  { type: 'telemetry_batch', seq: 1, t0Ms: 0, dtMs: 20, ticks: 1, data: new Uint8Array([1, 1, 0, 1, 0, 1, 0, 0, 0, 0]) },
];

describe('encodeRecording', () => {
  it('round-trips a header and every kind of record', () => {
    const decoded = decodeRecording(encodeRecording(header, records));
    expect(decoded.header).toEqual(header);
    expect(decoded.records.map((r) => r.type)).toEqual(['signals', 'selection', 'event', 'telemetry_batch']);
    const batch = decoded.records[3] as Extract<RecordingRecord, { type: 'telemetry_batch' }>;
    expect([...batch.data]).toEqual([1, 1, 0, 1, 0, 1, 0, 0, 0, 0]);
  });
});

describe('decodeRecording', () => {
  it('names a truncated file', () => {
    const bytes = encodeRecording(header, records);
    expect(() => decodeRecording(bytes.slice(0, bytes.byteLength - 3))).toThrow(RecordingFileError);
    const lastStart = encodeRecording(header, records.slice(0, 3)).byteLength;
    expect(() => decodeRecording(bytes.slice(0, bytes.byteLength - 3))).toThrow(`truncated or not MessagePack (at byte ${lastStart})`);
  });

  it('names the byte offset of a bad record', () => {
    const good = encodeRecording(header, records.slice(0, 2));
    const bad = pack({ type: 'event', seq: -1, tMs: 0, kind: 'x' });
    const bytes = new Uint8Array([...good, ...bad]);
    expect(() => decodeRecording(bytes)).toThrow(new RegExp(`at byte ${good.byteLength}\\)`));
  });

  it('refuses a file that is not a Pitwall recording', () => {
    expect(() => decodeRecording(pack({ format: 'something-else' }))).toThrow(/not a Pitwall recording header/);
    expect(() => decodeRecording(new Uint8Array())).toThrow(/empty/);
  });
});
