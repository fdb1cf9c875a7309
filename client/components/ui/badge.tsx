import type { ReactNode } from 'react';
import { cx } from '../../lib/cx';

export type BadgeTone = 'signal' | 'neutral' | 'go' | 'stop' | 'sky';

const TONES: Record<BadgeTone, string> = {
  signal: 'bg-signal-950 text-signal-300 ring-signal-500/40',
  neutral: 'bg-asphalt-750 text-asphalt-200 ring-asphalt-600',
  go: 'bg-go-950 text-go ring-go/40',
  stop: 'bg-stop-950 text-stop ring-stop/40',
  sky: 'bg-sky-950 text-sky ring-sky/40',
};

export function Badge({ tone = 'neutral', children, className }: { tone?: BadgeTone; children: ReactNode; className?: string }) {
  return (
    <span
      className={cx(
        'inline-flex items-center rounded-md px-2 py-0.5 text-xs font-semibold tracking-wide ring-1 ring-inset',
        TONES[tone],
        className,
      )}
    >
      {children}
    </span>
  );
}
