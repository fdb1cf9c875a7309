// Pure: what the Live page shows, derived from the relay state. No React, no DOM, no clock of its own.
import { z } from 'zod';
import { ROBOT_CHANNELS } from '../../../../shared/domain/channels';
import { canPublish } from '../../../../shared/domain/relay-permissions';
import { ROLE_LABELS } from '../../../../shared/domain/roles';
import type { ChannelValue, RelayRole, Signal } from '../../../../shared/protocol/messages';
import type { ChannelEntry, PublishTrack, RelayState, RobotTelemetry, SysClient } from '../../../lib/relay-client';

/** Telemetry older than this is called paused. */
export const TELEMETRY_PAUSED_MS = 1000;

export const RELAY_ROLE_LABELS: Record<RelayRole, string> = { ...ROLE_LABELS, robot: 'Robot' };

/** Relay time now: our clock plus the RFC 5905 offset, or our clock alone before the first sample. */
export const relayNowMs = (state: RelayState, localNowMs: number) => localNowMs + (state.clock?.offsetMs ?? 0);

/** How old a channel's current revision is, in ms (never negative). */
export function channelAgeMs(entry: ChannelEntry, state: RelayState, localNowMs: number): number {
  const ageMs = state.clock ? relayNowMs(state, localNowMs) - entry.tMs : localNowMs - entry.receivedAtMs;
  return Math.max(0, ageMs);
}

/** "0.4 s", "12 s", "4 min", "2 h". */
export function formatAge(ageMs: number): string {
  if (!Number.isFinite(ageMs)) return '—';
  // Clock estimates can put a fresh value a hair in the future.
  ageMs = Math.max(0, ageMs);
  if (ageMs < 10_000) return `${(ageMs / 1000).toFixed(1)} s`;
  if (ageMs < 60_000) return `${Math.floor(ageMs / 1000)} s`;
  if (ageMs < 3_600_000) return `${Math.floor(ageMs / 60_000)} min`;
  return `${Math.floor(ageMs / 3_600_000)} h`;
}

/** Whole milliseconds below 100, then whole ones with a thin grouping: "7 ms", "1 420 ms". */
export function formatMs(ms: number | null | undefined): string {
  if (ms === null || ms === undefined || !Number.isFinite(ms)) return '—';
  if (ms < 10) return `${ms.toFixed(1)} ms`;
  return `${Math.round(ms).toLocaleString('en-US').replace(/,/g, '\u2009')} ms`;
}

/** A channel value as one short line. */
export function formatValue(value: ChannelValue, maxChars = 60): string {
  const text = typeof value === 'string' ? value : JSON.stringify(value);
  return text.length > maxChars ? `${text.slice(0, maxChars - 1)}…` : text;
}

export const isSimulated = (state: RelayState) => state.channels[ROBOT_CHANNELS.simulated]?.value === true;

export const robotClients = (clients: readonly SysClient[] | undefined) => (clients ?? []).filter((c) => c.kind === 'robot');

/** The robot the page follows: the first connected one, with whatever telemetry it has sent. */
export function followedRobot(state: RelayState): { client: SysClient; telemetry: RobotTelemetry | undefined } | undefined {
  const client = robotClients(state.clients)[0];
  if (!client) return undefined;
  return { client, telemetry: state.robots[client.principal] };
}

export function isTelemetryPaused(telemetry: RobotTelemetry | undefined, localNowMs: number): boolean {
  return telemetry?.receivedAtMs === undefined || localNowMs - telemetry.receivedAtMs > TELEMETRY_PAUSED_MS;
}

const targetSchema = z.object({
  branch: z.string().optional(),
  level: z.string().optional(),
  xM: z.number().finite().optional(),
  yM: z.number().finite().optional(),
  headingDeg: z.number().finite().optional(),
});

export type RobotTarget = { label: string; pose?: { xM: number; yM: number; headingDeg?: number } };

/** The robot's current target from robot/target ({branch, level, xM, yM, headingDeg}, any part missing). */
export function robotTarget(state: RelayState): RobotTarget | undefined {
  const entry = state.channels[ROBOT_CHANNELS.target];
  if (!entry || entry.value === null) return undefined;
  if (typeof entry.value === 'string') return { label: entry.value };
  const parsed = targetSchema.safeParse(entry.value);
  if (!parsed.success) return { label: formatValue(entry.value, 24) };
  const t = parsed.data;
  const label = [t.branch, t.level].filter(Boolean).join(' · ') || 'set';
  if (t.xM === undefined || t.yM === undefined) return { label };
  return { label, pose: { xM: t.xM, yM: t.yM, ...(t.headingDeg !== undefined ? { headingDeg: t.headingDeg } : {}) } };
}

export type Readout = { name: string; label: string; text: string; unit: string; tone: 'normal' | 'caution' | 'stop' | 'missing' };

const READOUTS: { name: string; label: string; digits: number }[] = [
  { name: 'battery/voltage', label: 'Battery', digits: 2 },
  { name: 'elevator/height', label: 'Elevator', digits: 2 },
  { name: 'state/machine', label: 'State', digits: 0 },
  { name: 'game/piece', label: 'Game piece', digits: 0 },
];

/** A signal's value as text: enum labels, yes/no for booleans, numbers to `digits` places. */
export function formatSignal(signal: Signal, value: number, digits = 2): string {
  if (signal.type === 'enum') {
    const label = signal.labels?.[Math.round(value)]?.replace(/_/g, ' ');
    return label ? label.charAt(0).toUpperCase() + label.slice(1) : String(value);
  }
  if (signal.type === 'boolean') return value ? 'yes' : 'no';
  return value.toFixed(digits);
}

// Under load a healthy battery dips well below its resting 12–13 V; near 7 V the robot controller browns out
// (from memory). Thresholds: common practice, no source.
function batteryTone(volts: number): Readout['tone'] {
  if (volts < 8) return 'stop';
  if (volts < 10) return 'caution';
  return 'normal';
}

/** Battery, elevator, state and game piece, each "—" until the robot declares and sends it. */
export function readouts(telemetry: RobotTelemetry | undefined): Readout[] {
  return READOUTS.map(({ name, label, digits }) => {
    const signal = telemetry?.signals?.find((s) => s.name === name);
    const value = telemetry?.latest?.values[name];
    if (!signal || value === undefined) return { name, label, text: '—', unit: '', tone: 'missing' };
    const tone = name === 'battery/voltage' ? batteryTone(value) : 'normal';
    return { name, label, text: formatSignal(signal, value, digits), unit: signal.type === 'number' ? signal.unit : '', tone };
  });
}

export type ChannelRow = {
  channel: string;
  value: string;
  setBy: string;
  ageMs: number;
  /** Whether a robot acknowledged the current revision; `none` for the robot's own channels. */
  ack: 'acked' | 'waiting' | 'none';
  rev: number;
};

/** op/ then robot/ channels, by name, with who set them (the member's name while connected), age and ack state. */
export function channelRows(state: RelayState, localNowMs: number): ChannelRow[] {
  const principals = new Map((state.clients ?? []).map((c) => [c.sessionId, c.principal]));
  return Object.values(state.channels)
    .filter((e) => e.channel.startsWith('op/') || e.channel.startsWith('robot/'))
    .sort((a, b) => (a.channel.startsWith('op/') === b.channel.startsWith('op/') ? a.channel.localeCompare(b.channel) : a.channel.startsWith('op/') ? -1 : 1))
    .map((e) => ({
      channel: e.channel,
      value: formatValue(e.value),
      setBy: `${principals.get(e.from.sessionId) ?? e.from.name} (${RELAY_ROLE_LABELS[e.from.role].toLowerCase()})`,
      ageMs: channelAgeMs(e, state, localNowMs),
      ack: e.channel.startsWith('op/') ? ((e.ackedRev ?? 0) >= e.rev ? 'acked' : 'waiting') : 'none',
      rev: e.rev,
    }));
}

export type SendPermission = { canSend: true } | { canSend: false; reason: string };

/** Whether `role` may send targets on the op/ channels, and why not. */
export function sendPermission(role: RelayRole): SendPermission {
  if (canPublish(role, 'op/reef/branch')) return { canSend: true };
  if (role === 'coach') return { canSend: false, reason: 'Coaches watch here. Operators, programmers and leads send targets.' };
  return { canSend: false, reason: 'Your role is read-only. Operators, programmers and leads send targets.' };
}

export type SendStatus = { tone: 'pending' | 'go' | 'caution' | 'stop'; text: string };

/** The line under a target control: pending → robot has it (N ms) → stale, or refused. */
export function sendStatus(track: PublishTrack | undefined): SendStatus | undefined {
  if (!track) return undefined;
  const value = formatValue(track.value, 12);
  switch (track.state) {
    case 'pending':
      return { tone: 'pending', text: `Sending ${value}…` };
    case 'acked':
      return { tone: track.isLate ? 'caution' : 'go', text: `${value}: robot has it · ${formatMs(track.roundTripMs)}${track.isLate ? ' (late)' : ''}` };
    case 'stale':
      return { tone: 'caution', text: `${value}: no answer from the robot yet — stale` };
    case 'refused':
      return { tone: 'stop', text: `${value}: refused — ${track.refusal?.message ?? 'the relay said no'}` };
  }
}
