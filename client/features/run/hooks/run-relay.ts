import { useCallback, useEffect, useSyncExternalStore } from 'react';
import type { ChannelValue } from '../../../../shared/protocol/messages';
import { browserRelayDeps } from '../../../hooks/use-relay';
import { RelayClient, type PublishTicket, type RelayState } from '../../../lib/relay-client';

let shared: RelayClient | undefined;

/**
 * Run mode's relay connection. It says hello as a `panel`, so the relay holds it to the panel stale limit
 * (400 ms without a frame) and the tablet notices a pulled cable as fast; it keeps the current selection
 * and sends it again after every reconnect.
 */
export function runRelayClient(): RelayClient {
  shared ??= new RelayClient(
    browserRelayDeps(),
    { hello: { kind: 'panel', name: 'Run mode tablet' }, heartbeatMs: 100, staleMs: 400, ackTimeoutMs: 1000, resendAfterReconnect: true },
  );
  return shared;
}

/** The run relay's state (re-read at most once per frame) and its publish. */
export function useRunRelay(): { state: RelayState; publish: (channel: string, value: ChannelValue) => PublishTicket; client: RelayClient } {
  const client = runRelayClient();
  const state = useSyncExternalStore(client.subscribe, client.getSnapshot);
  const publish = useCallback((channel: string, value: ChannelValue) => client.publish(channel, value), [client]);
  return { state, publish, client };
}

/** Starts the run relay link without reading it (no re-renders), so it connects while the panel loads. */
export function useRunRelayWarmUp(): void {
  useEffect(() => runRelayClient().subscribe(() => {}), []);
}
