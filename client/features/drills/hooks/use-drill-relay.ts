import { useCallback } from 'react';
import { DRILL_ANSWER_CHANNEL, DRILL_CALL_CHANNEL } from '../../../../shared/domain/drills/drill-channels';
import { ROBOT_CHANNELS } from '../../../../shared/domain/channels';
import type { ChannelValue } from '../../../../shared/protocol/messages';
import { relayClient, useRelaySelector } from '../../../hooks/use-relay';
import type { ChannelEntry, RelayState, RelayStatus } from '../../../lib/relay-client';

const selectCall = (s: RelayState): ChannelEntry | undefined => s.channels[DRILL_CALL_CHANNEL];
const selectAnswer = (s: RelayState): ChannelEntry | undefined => s.channels[DRILL_ANSWER_CHANNEL];
const selectStatus = (s: RelayState): RelayStatus => s.status;
const selectOffset = (s: RelayState): number => s.clock?.offsetMs ?? 0;
const selectRobot = (s: RelayState): 'none' | 'simulator' | 'robot' => {
  const robots = s.clients?.filter((c) => c.kind === 'robot') ?? [];
  if (robots.length === 0) return 'none';
  return s.channels[ROBOT_CHANNELS.simulated]?.value === true ? 'simulator' : 'robot';
};
const selectOperators = (s: RelayState): string =>
  (s.clients ?? [])
    .filter((c) => c.role === 'operator')
    .map((c) => c.name)
    .join('\u0000');

/** The latest value of op/drill/call as this tab received it. */
export const useDrillCallEntry = () => useRelaySelector(selectCall);
/** The latest value of op/drill/answer. */
export const useDrillAnswerEntry = () => useRelaySelector(selectAnswer);
export const useRelayStatus = () => useRelaySelector(selectStatus);
/** Relay clock − this page's clock, ms (0 until the clocks are compared). */
export const useRelayOffsetMs = () => useRelaySelector(selectOffset);
/** Whether a robot is on the relay, and whether it says it is the simulator. */
export const useRobotPresence = () => useRelaySelector(selectRobot);
/** How many operator devices the relay has right now. */
export const useOperatorCount = () => {
  const joined = useRelaySelector(selectOperators);
  return joined === '' ? 0 : joined.split('\u0000').length;
};

export function usePublish(): (channel: string, value: ChannelValue) => void {
  return useCallback((channel: string, value: ChannelValue) => {
    relayClient().publish(channel, value);
  }, []);
}
