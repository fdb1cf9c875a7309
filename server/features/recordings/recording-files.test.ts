import { describe, expect, it } from 'vitest';
import { decodeTelemetry, encodeTelemetry } from '../../../shared/protocol/telemetry-codec';
import { encodeRecording } from '../../../shared/protocol/recording-file';
import { csvLines, parseCsvNumber, planUpload, RELAY_EVENT_SEQ_BASE, recordingRecords, samplesJson, sniffFormat, storedColumn } from './recording-files';

const text = (s: string) => new TextEncoder().encode(s);
const bits = (f: Float32Array) => Array.from(new Uint32Array(f.buffer, f.byteOffset, f.length));

describe('sniffFormat', () => {
  it.each([
    ['a MessagePack fixmap', Uint8Array.from([0x88, 0xa6]), 'pitwall'],
    ['a MessagePack map16', Uint8Array.from([0xde, 0, 9]), 'pitwall'],
    ['the time_s header', text('time_s,signal,value\n0,a,1\n'), 'csv'],
    ['the time header with a BOM, spaces and CRLF', text('\ufeffTime, Signal, Value\r\n0,a,1\r\n'), 'csv'],
  ] as const)('recognises %s', (_name, bytes, format) => {
    expect(sniffFormat(bytes)).toBe(format);
  });

  it.each([
    ['a PNG image', Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a]), /a PNG image \(at byte 0\)/],
    ['plain text', text('hello robot\n'), /starts with bytes 68 65 6c 6c \(at byte 0\)/],
    ['another CSV', text('t,name,v\n'), /a CSV line that is not that header \(line 1\)$/],
    ['nothing', new Uint8Array(), /empty \(at byte 0\)/],
  ])('refuses %s, saying where', (_name, bytes, message) => {
    expect(() => sniffFormat(bytes)).toThrow(message);
  });
});

describe('parseCsvNumber', () => {
  it.each([
    ['1.5', 1.5],
    ['-0', -0],
    ['1e-3', 0.001],
    [' .25 ', 0.25],
    ['NaN', Number.NaN],
    ['-Infinity', -Infinity],
  ])('reads %s', (t, v) => {
    expect(Object.is(parseCsvNumber(t, true), v)).toBe(true);
  });
  it.each(['', 'fast', '1,5', '0x10', '1e'])('refuses %j', (t) => {
    expect(parseCsvNumber(t, true)).toBeUndefined();
  });
  it('refuses NaN where specials are not allowed (times)', () => {
    expect(parseCsvNumber('NaN', false)).toBeUndefined();
  });
});

describe('planUpload (CSV)', () => {
  it('builds one number signal per name with irregular, sorted times and float32 values', () => {
    const plan = planUpload(text('time_s,signal,value\n0.5,arm/angle,1.25\n0.1,arm/angle,-0\n0.3,drive/v,0.1\n\n'));
    expect(plan.signals).toEqual([
      { index: 0, name: 'arm/angle', type: 'number', unit: '' },
      { index: 1, name: 'drive/v', type: 'number', unit: '' },
    ]);
    const arm = storedColumn(plan.chunks.filter((c) => c.signalIndex === 0));
    expect(Array.from(arm.timesMs)).toEqual([100, 500]);
    expect(bits(arm.values)).toEqual(bits(Float32Array.from([-0, 1.25])));
    expect(plan.originTMs).toBe(100);
    expect(plan.durationMs).toBe(400);
  });

  it.each([
    ['time_s,signal,value\n0,a\n', /line 2 has 2 fields/],
    ['time_s,signal,value\n0,a,1\nx,a,1\n', /line 3: the time "x"/],
    ['time_s,signal,value\n0,bad name,1\n', /line 2: "bad name" is not a signal name/],
    ['time_s,signal,value\n', /no samples \(line 2\)/],
  ])('refuses %j naming the line', (csv, message) => {
    expect(() => planUpload(text(csv))).toThrow(message);
  });
});

describe('csvLines', () => {
  it('writes values that read back to the same float32 bits', () => {
    const values = Float32Array.from([0.1, -0, 3.4028234663852886e38, 1.401298464324817e-45, Number.NaN]);
    const lines = csvLines('s', Float64Array.from([0, 0.02, 0.04, 0.06, 0.08]), values).trimEnd().split('\n');
    expect(lines[1]).toBe('0.02,s,-0');
    const back = Float32Array.from(lines, (l) => parseCsvNumber(l.split(',')[2]!, true)!);
    expect(bits(back)).toEqual(bits(values));
  });
});

describe('samplesJson', () => {
  it('is JSON that keeps -0 and writes null for non-finite values', () => {
    const json = samplesJson({ signal: 'a "b"', tS: [0, 0.02], values: [-0, null] });
    const parsed = JSON.parse(json);
    expect(parsed.signal).toBe('a "b"');
    expect(Object.is(parsed.values[0], -0)).toBe(true);
    expect(parsed.values[1]).toBeNull();
  });

  it('writes typed arrays: non-finite float32 values as null, the rest back bit for bit through Math.fround', () => {
    const values = Float32Array.from([1.1, NaN, -Infinity, 3.4028234663852886e38, 1.401298464324817e-45, -7.25]);
    const parsed = JSON.parse(samplesJson({ signal: 's', tS: Float64Array.from([0, 0.02, 0.04, 0.06, 0.08, 0.1]), values }));
    expect(parsed.tS).toEqual([0, 0.02, 0.04, 0.06, 0.08, 0.1]);
    expect(parsed.values[1]).toBeNull();
    expect(parsed.values[2]).toBeNull();
    const back = Float32Array.from(parsed.values.map((v: number | null) => (v === null ? NaN : Math.fround(v))));
    expect(bits(back).filter((_, i) => i !== 1 && i !== 2)).toEqual(bits(values).filter((_, i) => i !== 1 && i !== 2));
  });

  it('keeps -0 in a typed array too', () => {
    const parsed = JSON.parse(samplesJson({ signal: 's', tS: Float64Array.from([0, 0.02]), values: Float32Array.from([2.5, -0]) }));
    expect(parsed.values[0]).toBe(2.5);
    expect(Object.is(parsed.values[1], -0)).toBe(true);
  });
});

describe('recordingRecords', () => {
  const signals = [
    { index: 0, name: 'a', type: 'number' as const, unit: '' },
    { index: 1, name: 'b', type: 'number' as const, unit: '' },
  ];

  it('batches evenly spaced ticks, numbers events and batches in time order', () => {
    const column = { timesMs: Float64Array.from([0, 20, 40, 60]), values: Float32Array.from([1, 2, 3, 4]) };
    const records = recordingRecords(signals, [column, column], [{ seq: 3, tMs: 60, kind: 'placed', data: null }]);
    expect(records.map((r) => r.type)).toEqual(['signals', 'event', 'telemetry_batch']);
    const batch = records[2]!;
    expect(batch).toMatchObject({ type: 'telemetry_batch', seq: 1, t0Ms: 0, dtMs: 20, ticks: 4 });
    expect(records[1]).toMatchObject({ type: 'event', seq: 0, kind: 'placed' });
  });

  it('carries a signal forward where it has no sample, unknown before its first', () => {
    const a = { timesMs: Float64Array.from([0, 10, 35]), values: Float32Array.from([1, 2, 3]) };
    const b = { timesMs: Float64Array.from([10]), values: Float32Array.from([7]) };
    const batches = recordingRecords(signals, [a, b], []).filter((r) => r.type === 'telemetry_batch');
    const rows = batches.flatMap((r) => (r.type === 'telemetry_batch' ? decodeTelemetry(r.data).rows.map((row) => Array.from(row)) : []));
    expect(rows).toEqual([
      [1, Number.NaN],
      [2, 7],
      [3, 7],
    ]);
    expect(batches.map((r) => r.type === 'telemetry_batch' && [r.t0Ms, r.ticks])).toEqual([
      [0, 2],
      [35, 1],
    ]);
  });
});

describe('planUpload (Pitwall file)', () => {
  it('keeps the operator selections as selection events, numbered after the robot events from RELAY_EVENT_SEQ_BASE', () => {
    const bytes = encodeRecording({ format: 'pitwall-recording', version: 1, source: 'live', robot: 'Gullwing', startedAtMs: 0 }, [
      { type: 'signals', signals: [{ index: 0, name: 'drive/pose/x', type: 'number', unit: 'm' }] },
      { type: 'selection', tMs: 1000, channel: 'op/reef/branch', value: 'C' },
      { type: 'telemetry_batch', seq: 0, t0Ms: 1000, dtMs: 20, ticks: 2, data: encodeTelemetry([[0.5], [0.6]], 1) },
      { type: 'event', seq: 1, tMs: 1010, kind: 'placed', data: { branch: 'C', level: 'L4' } },
      { type: 'selection', tMs: 1020, channel: 'op/reef/level', value: 'L4' },
    ]);
    const plan = planUpload(bytes);
    expect(plan.events).toEqual([
      { seq: 1, tMs: 1010, kind: 'placed', data: { branch: 'C', level: 'L4' } },
      { seq: RELAY_EVENT_SEQ_BASE, tMs: 1000, kind: 'selection', data: { channel: 'op/reef/branch', value: 'C' } },
      { seq: RELAY_EVENT_SEQ_BASE + 1, tMs: 1020, kind: 'selection', data: { channel: 'op/reef/level', value: 'L4' } },
    ]);
  });
});
