import { useEffect, useState } from 'react';

const localNow = () => performance.timeOrigin + performance.now();

/** Our clock in epoch ms, re-read every `intervalMs` so ages on screen keep counting. */
export function useNow(intervalMs = 500): number {
  const [nowMs, setNowMs] = useState(localNow);
  useEffect(() => {
    const timer = window.setInterval(() => setNowMs(localNow()), intervalMs);
    return () => window.clearInterval(timer);
  }, [intervalMs]);
  return nowMs;
}
