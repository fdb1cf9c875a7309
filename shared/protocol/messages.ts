// Pure: imports only zod. The relay's messages in both directions, as discriminated unions on `type`.
// docs/relay-protocol.md is the prose version of this file; keep the two together.
import { z } from 'zod';

export const PROTOCOL_VERSION = 1;

/** Channel names: `op/...` (panels), `robot/...` (robots), `sys/...` (the relay itself). */
export const channelSchema = z
  .string()
  .min(3)
  .max(128)
  .regex(/^(op|robot|sys)\/[A-Za-z0-9_\-./]+$/, 'channel must look like op/target or robot/mode');
export const prefixSchema = z.string().min(1).max(128).regex(/^(op|robot|sys)(\/[A-Za-z0-9_\-./]*)?$/);

/** A channel value: JSON-like data, kept small. */
export type ChannelValue = string | number | boolean | null | ChannelValue[] | { [key: string]: ChannelValue };
export const channelValueSchema: z.ZodType<ChannelValue> = z.lazy(() =>
  z.union([
    z.string().max(4096),
    z.number(),
    z.boolean(),
    z.null(),
    z.array(channelValueSchema).max(256),
    z.record(z.string().max(64), channelValueSchema),
  ]),
);

export const CLIENT_KINDS = ['panel', 'viewer', 'robot', 'recorder'] as const;
export const clientKindSchema = z.enum(CLIENT_KINDS);
export type ClientKind = z.infer<typeof clientKindSchema>;

export const SIGNAL_TYPES = ['number', 'boolean', 'enum'] as const;
export const signalSchema = z.object({
  /** Position in the declaration; telemetry values come in this order. */
  index: z.number().int().nonnegative().max(4095),
  name: z.string().min(1).max(128).regex(/^[A-Za-z0-9_\-./]+$/),
  type: z.enum(SIGNAL_TYPES),
  unit: z.string().max(16),
  /** Labels of an enum signal's values 0, 1, 2 … */
  labels: z.array(z.string().max(64)).max(64).optional(),
});
export type Signal = z.infer<typeof signalSchema>;

const msgId = z.number().int().nonnegative().max(2 ** 31);
const timeMs = z.number().finite();
const seq = z.number().int().nonnegative();

// ---- client → relay -------------------------------------------------------------------------------

export const helloSchema = z.object({
  type: z.literal('hello'),
  v: z.number().int(),
  kind: clientKindSchema,
  name: z.string().min(1).max(64),
  /** Robots: a stable id for this run of the robot program; telemetry `seq` counts within it. */
  streamId: z.string().min(8).max(64).optional(),
  /** Robots: the `op/` channels the robot code reads (the panel check warns about others). */
  reads: z.array(channelSchema).max(256).optional(),
});

export const subscribeSchema = z.object({ type: z.literal('subscribe'), prefixes: z.array(prefixSchema).min(1).max(32) });
export const unsubscribeSchema = z.object({ type: z.literal('unsubscribe'), prefixes: z.array(prefixSchema).min(1).max(32) });

export const publishSchema = z.object({
  type: z.literal('publish'),
  /** Chosen by the client; echoed in `published` or `error`. */
  id: msgId,
  channel: channelSchema,
  value: channelValueSchema,
});

/** Robot → relay: the robot has applied revision `rev` of `channel`. */
export const ackSchema = z.object({ type: z.literal('ack'), channel: channelSchema, rev: z.number().int().positive() });

export const pingSchema = z.object({ type: z.literal('ping'), t1: timeMs });
export const pongSchema = z.object({ type: z.literal('pong'), t1: timeMs, t2: timeMs, t3: timeMs });

export const declareSignalsSchema = z.object({
  type: z.literal('signals'),
  signals: z.array(signalSchema).min(1).max(4096),
});

/**
 * Robot → relay: `ticks` rows of all declared signals sampled every `dtMs` from robot time `t0Ms`,
 * packed by telemetry-codec.ts.
 */
export const telemetryBatchSchema = z.object({
  type: z.literal('telemetry_batch'),
  seq,
  t0Ms: timeMs,
  dtMs: z.number().positive().max(1000),
  ticks: z.number().int().positive().max(500),
  data: z.instanceof(Uint8Array),
});

export const eventSchema = z.object({
  type: z.literal('event'),
  seq,
  tMs: timeMs,
  kind: z.string().min(1).max(64),
  data: z.record(z.string().max(64), channelValueSchema).optional(),
});

export const clientMessageSchema = z.discriminatedUnion('type', [
  helloSchema,
  subscribeSchema,
  unsubscribeSchema,
  publishSchema,
  ackSchema,
  pingSchema,
  pongSchema,
  declareSignalsSchema,
  telemetryBatchSchema,
  eventSchema,
]);
export type ClientMessage = z.infer<typeof clientMessageSchema>;
export type Hello = z.infer<typeof helloSchema>;
export type Publish = z.infer<typeof publishSchema>;
export type TelemetryBatch = z.infer<typeof telemetryBatchSchema>;
export type RobotEvent = z.infer<typeof eventSchema>;

// ---- relay → client -------------------------------------------------------------------------------

export const ROLES_ON_RELAY = ['lead', 'programmer', 'operator', 'coach', 'viewer', 'robot'] as const;
export const relayRoleSchema = z.enum(ROLES_ON_RELAY);
export type RelayRole = z.infer<typeof relayRoleSchema>;

export const welcomeSchema = z.object({
  type: z.literal('welcome'),
  v: z.number().int(),
  sessionId: z.string(),
  role: relayRoleSchema,
  teamNumber: z.number().int(),
  serverTimeMs: timeMs,
  heartbeatMs: z.number().int().positive(),
  staleMs: z.number().int().positive(),
  maxFrameBytes: z.number().int().positive(),
});

export const senderSchema = z.object({ sessionId: z.string(), kind: clientKindSchema, name: z.string(), role: relayRoleSchema });
export type Sender = z.infer<typeof senderSchema>;

export const valueSchema = z.object({
  type: z.literal('value'),
  channel: channelSchema,
  value: channelValueSchema,
  /** Revision of this channel, counting from 1; acks name it. */
  rev: z.number().int().positive(),
  /** Server time when the relay accepted it. */
  tMs: timeMs,
  from: senderSchema,
  /** True when delivered from the retained store on subscribe. */
  retained: z.boolean(),
  /** The highest revision of this channel a robot has acknowledged, if any. */
  ackedRev: z.number().int().positive().optional(),
});

export const publishedSchema = z.object({ type: z.literal('published'), id: msgId, channel: channelSchema, rev: z.number().int().positive() });

export const ackedSchema = z.object({
  type: z.literal('acked'),
  channel: channelSchema,
  rev: z.number().int().positive(),
  /** Server-measured time from accepting the value to the robot's ack. */
  relayRttMs: z.number().nonnegative(),
  robot: z.string(),
});

export const RELAY_ERROR_CODES = [
  'bad_frame',
  'hello_required',
  'version_mismatch',
  'forbidden',
  'frame_too_large',
  'rate_limited',
  'unknown_signal',
  'not_a_robot',
] as const;
export const relayErrorCodeSchema = z.enum(RELAY_ERROR_CODES);
export type RelayErrorCode = z.infer<typeof relayErrorCodeSchema>;

export const errorSchema = z.object({
  type: z.literal('error'),
  code: relayErrorCodeSchema,
  message: z.string(),
  /** The `id` of the refused publish, when there was one. */
  id: msgId.optional(),
  channel: z.string().optional(),
});

/** Telemetry as viewers get it: the robot's batch with the offset that maps robot time to server time. */
export const telemetryOutSchema = telemetryBatchSchema.extend({
  robot: z.string(),
  /** server time = robot time + offsetMs (RFC 5905 on-wire estimate). */
  offsetMs: z.number(),
});

export const signalsOutSchema = declareSignalsSchema.extend({ robot: z.string() });
export const eventOutSchema = eventSchema.extend({ robot: z.string(), offsetMs: z.number() });

/** Relay → robot: every telemetry batch and event up to and including `upTo` is stored. */
export const storedSchema = z.object({ type: z.literal('stored'), streamId: z.string(), upTo: seq });

export const serverMessageSchema = z.discriminatedUnion('type', [
  welcomeSchema,
  valueSchema,
  publishedSchema,
  ackedSchema,
  errorSchema,
  pingSchema,
  pongSchema,
  telemetryOutSchema,
  signalsOutSchema,
  eventOutSchema,
  storedSchema,
]);
export type ServerMessage = z.infer<typeof serverMessageSchema>;
export type ValueMessage = z.infer<typeof valueSchema>;
export type AckedMessage = z.infer<typeof ackedSchema>;
export type TelemetryOut = z.infer<typeof telemetryOutSchema>;
export type Welcome = z.infer<typeof welcomeSchema>;

/** WebSocket close codes of the relay (4000–4999 is the application range of RFC 6455). */
export const CLOSE = {
  shuttingDown: 1001,
  unauthenticated: 4001,
  versionMismatch: 4002,
  helloTimeout: 4004,
  stale: 4005,
  abuse: 4008,
  tooSlow: 4009,
  revoked: 4011,
} as const;
export type CloseCode = (typeof CLOSE)[keyof typeof CLOSE];
