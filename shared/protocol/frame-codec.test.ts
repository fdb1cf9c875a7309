import { pack, unpack } from 'msgpackr';
import { describe, expect, it } from 'vitest';
import { decodeClientFrame, decodeServerFrame, encodeFrame } from './frame-codec';
import { PROTOCOL_VERSION, type ClientMessage } from './messages';

describe('encodeFrame', () => {
  it('writes plain MessagePack maps that a generic decoder reads', () => {
    const hello: ClientMessage = { type: 'hello', v: PROTOCOL_VERSION, kind: 'panel', name: 'Driver tablet' };
    // A plain fixmap of 4 entries starts with 0x84 (MessagePack spec, "fixmap").
    const bytes = encodeFrame(hello);
    expect(bytes[0]).toBe(0x84);
    expect(unpack(bytes)).toEqual(hello);
  });

  it('carries telemetry payloads as MessagePack bin', () => {
    const data = new Uint8Array([1, 2, 3, 250]);
    const decoded = decodeClientFrame(encodeFrame({ type: 'telemetry_batch', seq: 4, t0Ms: 100, dtMs: 20, ticks: 1, data }));
    expect(decoded.ok && decoded.message.type === 'telemetry_batch' && [...decoded.message.data]).toEqual([1, 2, 3, 250]);
  });
});

describe('decodeClientFrame', () => {
  it('accepts a publish to an op channel', () => {
    const result = decodeClientFrame(pack({ type: 'publish', id: 7, channel: 'op/target', value: { branch: 'C', level: 'L4' } }));
    expect(result).toEqual({ ok: true, message: { type: 'publish', id: 7, channel: 'op/target', value: { branch: 'C', level: 'L4' } } });
  });

  it.each([
    ['garbage bytes', new Uint8Array([0xc1, 0xff, 0x00])],
    ['an unknown type', pack({ type: 'teleport', to: 'A' })],
    ['a bad channel name', pack({ type: 'publish', id: 1, channel: 'motors/left', value: 1 })],
    ['a missing field', pack({ type: 'ack', channel: 'op/target' })],
    ['a number where a list belongs', pack({ type: 'subscribe', prefixes: 5 })],
  ])('refuses %s with a reason', (_what, bytes) => {
    const result = decodeClientFrame(bytes);
    expect(result.ok).toBe(false);
    expect(!result.ok && result.error.length).toBeGreaterThan(3);
  });
});

describe('decodeServerFrame', () => {
  it('reads a value frame', () => {
    const frame = {
      type: 'value',
      channel: 'op/target',
      value: 'C',
      rev: 3,
      tMs: 1000,
      retained: true,
      from: { sessionId: 's1', kind: 'panel', name: 'tablet', role: 'operator' },
    } as const;
    expect(decodeServerFrame(encodeFrame(frame))).toEqual({ ok: true, message: frame });
  });
});
