// The channels of one team: retained values, subscriptions, acks and fan-out.
import { encodeFrame } from '../../shared/protocol/frame-codec';
import { matchesPrefix } from '../../shared/domain/relay-permissions';
import type { ChannelValue, Sender, ServerMessage } from '../../shared/protocol/messages';
import type { Lane, RelaySession } from './session';

export interface RetainedValue {
  channel: string;
  value: ChannelValue;
  rev: number;
  tMs: number;
  from: Sender;
  ackedRev?: number;
}

interface Revision {
  acceptedAtMs: number;
  publisherId: string;
}

/** Pseudo-channels under which robot streams are delivered to subscribers. */
export const STREAM_CHANNELS = { telemetry: 'robot/telemetry', events: 'robot/events', signals: 'robot/signals' } as const;

const KEEP_REVISIONS = 64;

export class TeamHub {
  readonly sessions = new Set<RelaySession>();
  readonly retained = new Map<string, RetainedValue>();
  private readonly revisions = new Map<string, Map<number, Revision>>();
  /** The last signal declaration of each robot, delivered to new telemetry subscribers. */
  readonly signals = new Map<string, ServerMessage>();

  constructor(private readonly now: () => number) {}

  /** Stores the value as the channel's next revision and delivers it to every subscriber. */
  publish(from: RelaySession, channel: string, value: ChannelValue): RetainedValue {
    const previous = this.retained.get(channel);
    const entry: RetainedValue = { channel, value, rev: (previous?.rev ?? 0) + 1, tMs: this.now(), from: from.sender() };
    this.retained.set(channel, entry);
    const revs = this.revisions.get(channel) ?? new Map<number, Revision>();
    revs.set(entry.rev, { acceptedAtMs: entry.tMs, publisherId: from.id });
    if (revs.size > KEEP_REVISIONS) revs.delete(revs.keys().next().value!);
    this.revisions.set(channel, revs);
    this.fanout(channel, valueMessage(entry, false), 'reliable');
    return entry;
  }

  /**
   * Records a robot's acknowledgement and tells the publisher and the channel's subscribers.
   * Returns the relay's round trip (ms) from accepting the value to the ack, or undefined for a revision the
   * relay never issued.
   */
  ack(robot: RelaySession, channel: string, rev: number): number | undefined {
    const entry = this.retained.get(channel);
    const revision = this.revisions.get(channel)?.get(rev);
    if (!entry || !revision || rev > entry.rev) return undefined;
    if (rev > (entry.ackedRev ?? 0) && rev === entry.rev) entry.ackedRev = rev;
    const message: ServerMessage = {
      type: 'acked',
      channel,
      rev,
      relayRttMs: Math.max(0, this.now() - revision.acceptedAtMs),
      robot: robot.identity.principal,
    };
    const bytes = encodeFrame(message);
    // The publisher waits for this ack; the channel's other subscribers only watch.
    const publisher = [...this.sessions].find((s) => s.id === revision.publisherId);
    publisher?.sendBytes(bytes, 'reliable', 'now');
    for (const s of this.subscribersOf(channel)) if (s !== publisher) s.sendBytes(bytes, 'reliable', 'soon');
    return message.relayRttMs;
  }

  /** Adds prefixes and delivers what is retained under them at once. */
  subscribe(session: RelaySession, prefixes: string[]): void {
    for (const prefix of prefixes) session.prefixes.add(prefix);
    for (const entry of this.retained.values()) {
      if (prefixes.some((p) => matchesPrefix(p, entry.channel))) session.send(valueMessage(entry, true), 'reliable');
    }
    if (prefixes.some((p) => matchesPrefix(p, STREAM_CHANNELS.signals) || matchesPrefix(p, STREAM_CHANNELS.telemetry))) {
      for (const declaration of this.signals.values()) session.send(declaration, 'reliable');
    }
  }

  unsubscribe(session: RelaySession, prefixes: string[]): void {
    for (const prefix of prefixes) session.prefixes.delete(prefix);
  }

  /**
   * Encodes once and queues for every open subscriber of `channel`. Robots act on op/ values, so theirs are
   * written at once; panels and viewers only watch, so theirs are written a few sockets per turn after.
   */
  fanout(channel: string, message: ServerMessage, lane: Lane, except?: RelaySession): void {
    const targets = this.subscribersOf(channel).filter((s) => s !== except);
    if (targets.length === 0) return;
    const bytes = encodeFrame(message);
    const actsOnIt = channel.startsWith('op/');
    for (const s of targets) s.sendBytes(bytes, lane, actsOnIt && s.kind === 'robot' ? 'now' : 'soon');
  }

  /** Sets a relay-owned sys/ value (rev counts like any other channel). */
  setSystemValue(channel: string, value: ChannelValue, relay: Sender): void {
    const previous = this.retained.get(channel);
    const entry: RetainedValue = { channel, value, rev: (previous?.rev ?? 0) + 1, tMs: this.now(), from: relay };
    this.retained.set(channel, entry);
    this.fanout(channel, valueMessage(entry, false), 'reliable');
  }

  private subscribersOf(channel: string): RelaySession[] {
    const out: RelaySession[] = [];
    for (const s of this.sessions) {
      if (!s.isOpen) continue;
      for (const p of s.prefixes) {
        if (matchesPrefix(p, channel)) {
          out.push(s);
          break;
        }
      }
    }
    return out;
  }
}

function valueMessage(entry: RetainedValue, retained: boolean): ServerMessage {
  return {
    type: 'value',
    channel: entry.channel,
    value: entry.value,
    rev: entry.rev,
    tMs: entry.tMs,
    from: entry.from,
    retained,
    ...(entry.ackedRev !== undefined ? { ackedRev: entry.ackedRev } : {}),
  };
}
