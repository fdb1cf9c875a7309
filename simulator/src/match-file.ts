// Pure: a headless match as Pitwall's recording records, in the order a live robot would have sent them.
import { encodeTelemetry } from '../../shared/protocol/telemetry-codec';
import { encodeRecording, type RecordingHeader, type RecordingRecord } from '../../shared/protocol/recording-file';
import type { HeadlessMatch } from './headless';

export function headlessMatchRecords(match: HeadlessMatch): RecordingRecord[] {
  const timed: { seq: number; tMs: number; record: RecordingRecord }[] = [
    ...match.batches.map((b) => ({
      seq: b.seq,
      tMs: b.t0Ms,
      record: { type: 'telemetry_batch' as const, seq: b.seq, t0Ms: b.t0Ms, dtMs: b.dtMs, ticks: b.ticks, data: encodeTelemetry(b.rows, match.signals.length) },
    })),
    ...match.events.map((e) => ({ seq: e.seq, tMs: e.tMs, record: { type: 'event' as const, seq: e.seq, tMs: e.tMs, kind: e.kind, data: e.data } })),
  ];
  timed.sort((a, b) => a.seq - b.seq);
  const selections = match.selections.map((s) => ({ type: 'selection' as const, tMs: s.tMs, channel: s.channel, value: s.value }));
  // Selections go just before the first durable record at or after their time.
  const records: RecordingRecord[] = [{ type: 'signals', signals: match.signals }];
  let next = 0;
  for (const t of timed) {
    while (next < selections.length && selections[next]!.tMs <= t.tMs) records.push(selections[next++]!);
    records.push(t.record);
  }
  while (next < selections.length) records.push(selections[next++]!);
  return records;
}

export function encodeHeadlessMatch(match: HeadlessMatch, header: Omit<RecordingHeader, 'format' | 'version'>): Uint8Array {
  return encodeRecording({ format: 'pitwall-recording', version: 1, ...header }, headlessMatchRecords(match));
}
