import { useCallback, useRef, useSyncExternalStore } from 'react';
import type { ChannelValue } from '../../shared/protocol/messages';
import { WATCHER_LINK_TIMING, type SocketLike } from '../../shared/protocol/relay-link';
import { RelayClient, type PublishTicket, type RelayClientDeps, type RelayState } from '../lib/relay-client';

let shared: RelayClient | undefined;

const relayUrl = () => `${location.protocol === 'https:' ? 'wss' : 'ws'}://${location.host}/relay`;

/** What a relay client needs from the browser: a same-origin socket (the session cookie signs it in), clocks, frames. */
export function browserRelayDeps(): RelayClientDeps {
  return {
    connect: () => new WebSocket(relayUrl()) as unknown as SocketLike,
    now: () => performance.timeOrigin + performance.now(),
    setTimer: (fn, ms) => window.setTimeout(fn, ms),
    clearTimer: (handle) => window.clearTimeout(handle as number),
    random: Math.random,
    scheduleFlush: (fn) => requestAnimationFrame(() => fn()),
  };
}

/** The app's one relay client, made on first use. */
export function relayClient(): RelayClient {
  shared ??= new RelayClient(
    browserRelayDeps(),
    // A browser tab is a viewer to the relay: it gets a longer stale limit, because browsers slow the
    // timers of a tab in the background. Its role, not its kind, decides what it may publish.
    { hello: { kind: 'viewer', name: 'Live page' }, ...WATCHER_LINK_TIMING },
  );
  return shared;
}

/** The whole relay state, re-read at most once per animation frame, and the client's publish. */
export function useRelay(): { state: RelayState; publish: (channel: string, value: ChannelValue) => PublishTicket } {
  const client = relayClient();
  const state = useSyncExternalStore(client.subscribe, client.getSnapshot);
  const publish = useCallback((channel: string, value: ChannelValue) => client.publish(channel, value), [client]);
  return { state, publish };
}

/**
 * One derived piece of the relay state. The selector runs once per new snapshot, and the component
 * re-renders only when what it returns changes (by Object.is).
 */
export function useRelaySelector<T>(selector: (state: RelayState) => T): T {
  const client = relayClient();
  const cache = useRef<{ snapshot: RelayState; selector: (state: RelayState) => T; value: T } | undefined>(undefined);
  const getSelection = () => {
    const snapshot = client.getSnapshot();
    const hit = cache.current;
    if (hit && hit.snapshot === snapshot && hit.selector === selector) return hit.value;
    const value = selector(snapshot);
    cache.current = { snapshot, selector, value: hit && Object.is(hit.value, value) ? hit.value : value };
    return cache.current.value;
  };
  return useSyncExternalStore(client.subscribe, getSelection);
}
