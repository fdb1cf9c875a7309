import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { DEFAULT_ROBOT_PROFILE } from '../../shared/domain/robot-profile';
import { season2025 } from '../../shared/domain/season/season-2025';
import { decodeRecording } from '../../shared/protocol/recording-file';
import { decodeTelemetry } from '../../shared/protocol/telemetry-codec';
import { runHeadlessMatch } from './headless';
import { encodeHeadlessMatch } from './match-file';

const play = (seed: number) => runHeadlessMatch({ seed, season: season2025, robot: DEFAULT_ROBOT_PROFILE, alliance: 'blue' });
const sha = (bytes: Uint8Array) => createHash('sha256').update(bytes).digest('hex');

describe('encodeHeadlessMatch', () => {
  const match = play(7);
  const bytes = encodeHeadlessMatch(match, { source: 'simulator', robot: 'Gullwing', seed: 7 });

  it('writes the same bytes for the same seed', () => {
    expect(sha(encodeHeadlessMatch(play(7), { source: 'simulator', robot: 'Gullwing', seed: 7 }))).toBe(sha(bytes));
    expect(sha(encodeHeadlessMatch(play(8), { source: 'simulator', robot: 'Gullwing', seed: 8 }))).not.toBe(sha(bytes));
  });

  it('reads back as a recording with every batch, event and selection in seq order', () => {
    const { header, records } = decodeRecording(bytes);
    expect(header).toMatchObject({ source: 'simulator', seed: 7 });
    expect(records[0]!.type).toBe('signals');
    const seqs = records.flatMap((r) => (r.type === 'telemetry_batch' || r.type === 'event' ? [r.seq] : []));
    expect(seqs).toEqual(Array.from({ length: match.batches.length + match.events.length }, (_, i) => i));
    expect(records.filter((r) => r.type === 'selection')).toHaveLength(match.selections.length);
    const first = records.find((r) => r.type === 'telemetry_batch')!;
    expect(first.type === 'telemetry_batch' && decodeTelemetry(first.data).rows[0]).toEqual(match.batches[0]!.rows[0]);
  });

  it('spends at most 4 bytes per sample on the whole file (the relay issue’s target)', () => {
    const samples = match.batches.reduce((n, b) => n + b.ticks, 0) * match.signals.length;
    expect(bytes.byteLength / samples).toBeLessThanOrEqual(4);
  });
});
