// Pure: what run mode shows, from the relay state and our clock (passed in). No DOM, no timers.
import type { ChannelValue } from '../../../../shared/protocol/messages';
import type { Tile } from '../../../../shared/schemas/panel';
import type { ChannelLive, SelectionPhase, TileLive } from '../../../components/panel-tiles/tile-types';
import type { RelayState, RobotTelemetry, SysClient } from '../../../lib/relay-client';

/** Telemetry older than this (our clock) means the robot link is quiet. */
export const ROBOT_QUIET_AFTER_MS = 1000;

export type RelayLinkView = {
  state: 'up' | 'connecting' | 'down' | 'refused';
  /** Big words for the status strip. */
  words: string;
  detail: string;
};

export type RobotLinkView = {
  state: 'live' | 'quiet' | 'none';
  name?: string;
  /** The robot's relay session: a new one is a new connection. */
  sessionId?: string;
  words: string;
  /** The robot published robot/simulated = true. */
  isSimulated: boolean;
  /** A robot is connected and it is not the simulator: taps can move a real machine. */
  isRealRobot: boolean;
};

/** The relay link as run mode words it. */
export function relayLinkView(state: Pick<RelayState, 'status' | 'detail'>): RelayLinkView {
  switch (state.status) {
    case 'open':
      return { state: 'up', words: 'Relay connected', detail: state.detail };
    case 'idle':
    case 'connecting':
      return { state: 'connecting', words: 'Connecting to relay…', detail: state.detail };
    case 'refused':
      return { state: 'refused', words: 'Relay refused this tablet', detail: state.detail };
    case 'stale':
    case 'reconnecting':
    case 'stopped':
      return { state: 'down', words: 'Relay link lost · reconnecting', detail: state.detail };
  }
}

/** The robot this tablet follows: the first robot connected to the relay, with its telemetry. */
export function followedRobot(state: Pick<RelayState, 'clients' | 'robots'>): { client: SysClient; telemetry: RobotTelemetry | undefined } | undefined {
  const client = (state.clients ?? []).find((c) => c.kind === 'robot');
  return client ? { client, telemetry: state.robots[client.principal] } : undefined;
}

/** The robot link: live (telemetry within ROBOT_QUIET_AFTER_MS), quiet (connected, no recent telemetry) or none. */
export function robotLinkView(state: Pick<RelayState, 'status' | 'clients' | 'robots' | 'channels'>, localNowMs: number): RobotLinkView {
  const isSimulated = state.channels['robot/simulated']?.value === true;
  const robot = state.status === 'open' ? followedRobot(state) : undefined;
  if (!robot) return { state: 'none', words: state.status === 'open' ? 'No robot connected' : 'Robot unknown', isSimulated: false, isRealRobot: false };
  const receivedAtMs = robot.telemetry?.receivedAtMs;
  const isLive = receivedAtMs !== undefined && localNowMs - receivedAtMs <= ROBOT_QUIET_AFTER_MS;
  return {
    state: isLive ? 'live' : 'quiet',
    name: robot.client.name,
    sessionId: robot.client.sessionId,
    words: isLive ? `Robot ${robot.client.name}` : `Robot ${robot.client.name} · no telemetry`,
    isSimulated,
    isRealRobot: !isSimulated,
  };
}

/**
 * One of our selections: our newest publish on the channel (shown at once), else the relay's retained value.
 * pending → acked (robot has it, with the round trip) → stale; lost while the relay link is down (it is
 * resent on reconnect); refused when the relay said no.
 */
export function selectionLive(state: Pick<RelayState, 'status' | 'channels' | 'publishes' | 'latestPublish'>, channel: string): ChannelLive {
  const isLinkUp = state.status === 'open';
  const id = state.latestPublish[channel];
  const track = id === undefined ? undefined : state.publishes[id];
  if (track) {
    const isNotConnected = track.state === 'refused' && track.refusal?.code === 'not_connected';
    let phase: SelectionPhase = track.state === 'acked' ? 'acked' : isNotConnected ? 'lost' : track.state;
    if (!isLinkUp && phase !== 'refused') phase = 'lost';
    const live: ChannelLive = { value: track.value, phase };
    if (phase === 'acked' && track.roundTripMs !== undefined) live.roundTripMs = track.roundTripMs;
    return live;
  }
  const retained = state.channels[channel];
  if (!retained) return {};
  const isAcked = retained.ackedRev !== undefined && retained.ackedRev >= retained.rev;
  return { value: retained.value, phase: !isLinkUp ? 'lost' : isAcked ? 'acked' : 'pending' };
}

/**
 * A robot value for a lamp, readout or match clock bound to `robot/<signal>`: a retained value on that exact
 * channel wins, else the followed robot's telemetry signal `<signal>` (enums as their label).
 */
export function robotValueLive(state: Pick<RelayState, 'status' | 'clients' | 'robots' | 'channels'>, channel: string, localNowMs: number): ChannelLive {
  const isRobotLive = robotLinkView(state, localNowMs).state === 'live';
  const retained = state.channels[channel];
  if (retained) return { value: retained.value, isFresh: state.status === 'open' };
  if (!channel.startsWith('robot/')) return {};
  const signalName = channel.slice('robot/'.length);
  const telemetry = followedRobot(state)?.telemetry;
  const signal = telemetry?.signals?.find((s) => s.name === signalName);
  const raw = telemetry?.latest?.values[signalName];
  if (!signal || raw === undefined) return {};
  let value: ChannelValue = raw;
  if (signal.type === 'boolean') value = raw !== 0;
  if (signal.type === 'enum') value = signal.labels?.[Math.round(raw)] ?? raw;
  return { value, isFresh: isRobotLive };
}

/** Every channel the page's tiles write or show, resolved for the tiles. */
export function panelLive(tiles: readonly Tile[], state: RelayState, localNowMs: number): TileLive {
  const channels: Record<string, ChannelLive> = {};
  for (const tile of tiles) {
    const names = tile.kind === 'caption' ? [] : tile.kind === 'target-echo' ? tile.channels : [tile.channel];
    for (const name of names) {
      if (channels[name]) continue;
      channels[name] = name.startsWith('robot/') ? robotValueLive(state, name, localNowMs) : selectionLive(state, name);
    }
  }
  // Taps while the link is down are kept and sent on reconnect, so only a refused tablet cannot write.
  return { channels, canWrite: state.status !== 'refused' };
}

/** The robot's current target from robot/target ({ branch, level, … }), as "G · L4", if it has one. */
export function robotTargetText(state: Pick<RelayState, 'channels'>): string | undefined {
  const value = state.channels['robot/target']?.value;
  if (!value || typeof value !== 'object' || Array.isArray(value)) return undefined;
  const parts = [value.branch, value.level].filter((p): p is string => typeof p === 'string');
  return parts.length > 0 ? parts.join(' · ') : undefined;
}
