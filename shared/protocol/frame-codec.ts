// Pure: msgpackr only (no I/O). One relay message per WebSocket binary frame, as plain MessagePack maps
// (no msgpackr records or extensions) so a client in any language with a MessagePack library can read it.
import { Packr } from 'msgpackr';
import { clientMessageSchema, serverMessageSchema, type ClientMessage, type ServerMessage } from './messages';

const packr = new Packr({
  useRecords: false,
  mapsAsObjects: true,
  moreTypes: false,
  variableMapSize: true,
  int64AsType: 'number',
});

export type DecodeResult<T> = { ok: true; message: T } | { ok: false; error: string };

/** MessagePack bytes of any message (no validation: the sender's types already hold). */
export function encodeFrame(message: ClientMessage | ServerMessage): Uint8Array {
  return packr.pack(message);
}

type SafeParse<T> = (
  raw: unknown,
) => { success: true; data: T } | { success: false; error: { issues: { path: PropertyKey[]; message: string }[] } };

function decodeWith<T>(bytes: Uint8Array, parse: SafeParse<T>): DecodeResult<T> {
  let raw: unknown;
  try {
    raw = packr.unpack(bytes);
  } catch {
    return { ok: false, error: 'not MessagePack' };
  }
  const parsed = parse(raw);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    return { ok: false, error: first ? `${first.path.map(String).join('.') || 'message'}: ${first.message}` : 'invalid message' };
  }
  return { ok: true, message: parsed.data };
}

/** A client's frame, checked against the protocol. */
export function decodeClientFrame(bytes: Uint8Array): DecodeResult<ClientMessage> {
  return decodeWith(bytes, (raw) => clientMessageSchema.safeParse(raw));
}

/** A relay frame, checked against the protocol. */
export function decodeServerFrame(bytes: Uint8Array): DecodeResult<ServerMessage> {
  return decodeWith(bytes, (raw) => serverMessageSchema.safeParse(raw));
}
