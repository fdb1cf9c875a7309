// Pure: imports only shared files. Who may publish and read which relay channels.
import type { RelayRole } from '../protocol/messages';

const OP_PUBLISHERS: readonly RelayRole[] = ['lead', 'programmer', 'operator'];

/** op/* by operators, programmers and leads; robot/* by robot keys only; sys/* by the relay alone. */
export function canPublish(role: RelayRole, channel: string): boolean {
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
