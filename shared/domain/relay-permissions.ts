// Pure: imports only shared files. Who may publish and read which relay channels.
import type { RelayRole } from '../protocol/messages';
import { DRILL_CALL_CHANNEL, DRILL_CHANNEL_PREFIX } from './drills/drill-channels';
import { can } from './roles';

const OP_PUBLISHERS: readonly RelayRole[] = ['lead', 'programmer', 'operator'];

/**
 * op/* by operators, programmers and leads; robot/* by robot keys only; sys/* by the relay alone. Drill
 * channels follow the drill actions: op/drill/call by `drills.send` roles (coaches too), the rest of
 * op/drill/ by `drills.run` roles.
 */
export function canPublish(role: RelayRole, channel: string): boolean {
  if (channel.startsWith(DRILL_CHANNEL_PREFIX)) {
    if (role === 'robot') return false;
    return can(role, channel === DRILL_CALL_CHANNEL ? 'drills.send' : 'drills.run');
  }
  if (channel.startsWith('op/')) return OP_PUBLISHERS.includes(role);
  if (channel.startsWith('robot/')) return role === 'robot';
  return false;
}

/** People read everything of their team; a robot reads op/* and sys/*. */
export function canSubscribe(role: RelayRole, prefix: string): boolean {
  if (role !== 'robot') return true;
  return prefix.startsWith('op') || prefix.startsWith('sys');
}

/** Whether `channel` falls under a subscription `prefix` (a prefix ends at any character). */
export function matchesPrefix(prefix: string, channel: string): boolean {
  return channel.startsWith(prefix);
}
