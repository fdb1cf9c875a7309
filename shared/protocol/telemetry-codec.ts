// Pure: no imports. The compact payload of a telemetry batch (`data` of telemetry_batch).
//
// Layout, little-endian:
//   u8  format (1) | u16 signal count S | u16 tick count N
//   then per tick: a bitmap of ceil(S / 8) bytes (bit i of byte i>>3, least significant first = signal i
//   has a value in this tick), followed by one float32 per set bit in signal order.
// In the first tick a set bit means "the value is known"; in later ticks it means "changed since the
// previous tick" (compared as float32 bit patterns). A batch decodes on its own, without earlier batches.

export const TELEMETRY_FORMAT = 1;
const HEADER_BYTES = 5;

/** Packs `rows` (one array of S values per tick; NaN for unknown in the first tick) into the payload. */
export function encodeTelemetry(rows: readonly ArrayLike<number>[], signalCount: number): Uint8Array<ArrayBuffer> {
  const maskBytes = Math.ceil(signalCount / 8);
  const worst = HEADER_BYTES + rows.length * (maskBytes + signalCount * 4);
  const out = new Uint8Array(worst);
  const view = new DataView(out.buffer);
  view.setUint8(0, TELEMETRY_FORMAT);
  view.setUint16(1, signalCount, true);
  view.setUint16(3, rows.length, true);
  const previous = new Float32Array(signalCount);
  const previousBits = new Uint32Array(previous.buffer);
  const current = new Float32Array(1);
  const currentBits = new Uint32Array(current.buffer);
  let offset = HEADER_BYTES;
  rows.forEach((row, tick) => {
    const maskAt = offset;
    offset += maskBytes;
    for (let i = 0; i < signalCount; i += 1) {
      current[0] = row[i] ?? Number.NaN;
      const unknownAtStart = tick === 0 && Number.isNaN(row[i] ?? Number.NaN);
      const changed = tick === 0 ? !unknownAtStart : currentBits[0] !== previousBits[i];
      if (!changed) continue;
      out[maskAt + (i >> 3)]! |= 1 << (i & 7);
      view.setFloat32(offset, current[0]!, true);
      offset += 4;
      previousBits[i] = currentBits[0]!;
    }
  });
  return out.slice(0, offset);
}

export interface DecodedTelemetry {
  signalCount: number;
  /** One Float32Array of S values per tick; NaN where no value is known yet. */
  rows: Float32Array[];
}

export class TelemetryDecodeError extends Error {}

/** Unpacks a payload made by encodeTelemetry; throws TelemetryDecodeError naming the byte offset. */
export function decodeTelemetry(data: Uint8Array): DecodedTelemetry {
  if (data.byteLength < HEADER_BYTES) throw new TelemetryDecodeError('telemetry payload shorter than its header');
  const view = new DataView(data.buffer, data.byteOffset, data.byteLength);
  const format = view.getUint8(0);
  if (format !== TELEMETRY_FORMAT) throw new TelemetryDecodeError(`unknown telemetry format ${format}`);
  const signalCount = view.getUint16(1, true);
  const ticks = view.getUint16(3, true);
  const maskBytes = Math.ceil(signalCount / 8);
  const rows: Float32Array[] = [];
  const state = new Float32Array(signalCount).fill(Number.NaN);
  let offset = HEADER_BYTES;
  for (let tick = 0; tick < ticks; tick += 1) {
    if (offset + maskBytes > data.byteLength) throw new TelemetryDecodeError(`truncated at byte ${offset} (tick ${tick} mask)`);
    const maskAt = offset;
    offset += maskBytes;
    for (let i = 0; i < signalCount; i += 1) {
      if ((data[maskAt + (i >> 3)]! & (1 << (i & 7))) === 0) continue;
      if (offset + 4 > data.byteLength) throw new TelemetryDecodeError(`truncated at byte ${offset} (tick ${tick}, signal ${i})`);
      state[i] = view.getFloat32(offset, true);
      offset += 4;
    }
    rows.push(state.slice());
  }
  if (offset !== data.byteLength) throw new TelemetryDecodeError(`${data.byteLength - offset} bytes left over after ${ticks} ticks`);
  return { signalCount, rows };
}
