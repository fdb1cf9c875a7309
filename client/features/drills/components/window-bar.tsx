import { useEffect, useRef } from 'react';

/** A bar emptying over the call's window; restarts for each `callKey`. Drawn by the browser's animation clock. */
export function WindowBar({ callKey, windowMs, isRunning }: { callKey: string; windowMs: number; isRunning: boolean }) {
  const barRef = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const bar = barRef.current;
    if (!bar || !isRunning || typeof bar.animate !== 'function') return;
    const animation = bar.animate([{ transform: 'scaleX(1)' }, { transform: 'scaleX(0)' }], { duration: windowMs, fill: 'forwards', easing: 'linear' });
    return () => animation.pause();
  }, [callKey, windowMs, isRunning]);
  return (
    <div aria-hidden="true" className="h-1.5 w-full overflow-hidden rounded-full bg-asphalt-800">
      <div ref={barRef} className="h-full w-full origin-left rounded-full bg-signal-500" />
    </div>
  );
}
