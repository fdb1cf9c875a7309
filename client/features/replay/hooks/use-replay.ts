import { createContext, useContext, useSyncExternalStore } from 'react';
import type { ReplayState, ReplayStore } from '../model/replay-store';

export const ReplayContext = createContext<ReplayStore | null>(null);

export function useReplayStore(): ReplayStore {
  const store = useContext(ReplayContext);
  if (!store) throw new Error('useReplayStore outside a replay');
  return store;
}

/** One slice of the replay state; the component re-renders only when that slice changes. */
export function useReplay<T>(select: (s: ReplayState) => T): T {
  const store = useReplayStore();
  return useSyncExternalStore(store.subscribe, () => select(store.get()));
}
