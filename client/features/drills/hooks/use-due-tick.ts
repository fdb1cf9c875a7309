import { useEffect, useRef } from 'react';

/** The page's clock, the one the relay client stamps values with (ms since the epoch, sub-ms resolution). */
export const pageNowMs = () => performance.timeOrigin + performance.now();

/** Calls `onDue(now)` once when the clock reaches `dueAtMs` (again for each new `dueAtMs`); null waits for nothing. */
export function useDueTick(dueAtMs: number | null, onDue: (nowMs: number) => void): void {
  const callback = useRef(onDue);
  callback.current = onDue;
  useEffect(() => {
    if (dueAtMs === null) return;
    // A timer may fire a hair early; the moment handed on is never before the one asked for.
    const handle = window.setTimeout(() => callback.current(Math.max(pageNowMs(), dueAtMs)), Math.max(0, dueAtMs - pageNowMs()));
    return () => window.clearTimeout(handle);
  }, [dueAtMs]);
}
