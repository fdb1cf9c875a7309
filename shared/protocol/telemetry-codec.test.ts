import { describe, expect, it } from 'vitest';
import { decodeTelemetry, encodeTelemetry, TelemetryDecodeError } from './telemetry-codec';

const f32 = (v: number) => Math.fround(v);

describe('encodeTelemetry', () => {
  it('round-trips values as float32, carrying unchanged values forward', () => {
    const rows = [
      [1.5, 0, Number.NaN, 12.25],
      [1.6, 0, 3, 12.25],
      [1.7, 1, 3, 12.25],
    ];
    const decoded = decodeTelemetry(encodeTelemetry(rows, 4));
    expect(decoded.signalCount).toBe(4);
    expect(decoded.rows.map((r) => [...r])).toEqual([
      [f32(1.5), 0, Number.NaN, 12.25],
      [f32(1.6), 0, 3, 12.25],
      [f32(1.7), 1, 3, 12.25],
    ]);
  });

  // Byte count worked by hand from the layout: header 5; tick 0: mask 1 + 3 values × 4 = 13;
  // tick 1: mask 1 + 2 changed × 4 = 9; tick 2: mask 1 + 2 changed × 4 = 9 → 36.
  it('spends a mask and four bytes per changed value', () => {
    expect(encodeTelemetry([[1.5, 0, Number.NaN, 12.25], [1.6, 0, 3, 12.25], [1.7, 1, 3, 12.25]], 4).byteLength).toBe(36);
  });

  // The worked example of docs/relay-protocol.md; float32 bit patterns from IEEE 754 (1.5 = 0x3fc00000,
  // 1 = 0x3f800000, 12 = 0x41400000), written little-endian.
  it('writes the bytes of the protocol document’s worked example', () => {
    const hex = Buffer.from(encodeTelemetry([[1.5, 0, 12], [1.5, 1, 12]], 3)).toString('hex');
    expect(hex).toBe('0103000200' + '07' + '0000c03f' + '00000000' + '00004041' + '02' + '0000803f');
  });

  it('sends an unchanged tick as its mask alone', () => {
    const rows = Array.from({ length: 10 }, () => Array.from({ length: 200 }, (_, i) => i));
    // 5 + (25 + 200 × 4) + 9 × 25
    expect(encodeTelemetry(rows, 200).byteLength).toBe(5 + 825 + 225);
  });
});

describe('decodeTelemetry', () => {
  it.each([
    [new Uint8Array([1, 2]), /shorter than its header/],
    [new Uint8Array([9, 1, 0, 1, 0, 1]), /unknown telemetry format 9/],
    [new Uint8Array([1, 1, 0, 1, 0, 1, 0, 0]), /truncated at byte 6/],
    [new Uint8Array([1, 1, 0, 1, 0, 0, 7]), /1 bytes left over/],
  ])('refuses a bad payload %#, naming where', (bytes, message) => {
    expect(() => decodeTelemetry(bytes)).toThrow(TelemetryDecodeError);
    expect(() => decodeTelemetry(bytes)).toThrow(message);
  });
});
