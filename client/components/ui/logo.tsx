import { cx } from '../../lib/cx';

/**
 * Pitwall's mark: a pit-wall slab seen end-on with a signal lamp above it, set in a rounded tile.
 * The wordmark beside it is live text so it scales and reads as the product name.
 */
export function LogoMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" aria-hidden="true" className={cx('size-8 shrink-0', className)}>
      <rect x="1" y="1" width="30" height="30" rx="8" fill="var(--color-asphalt-800)" stroke="var(--color-asphalt-600)" />
      <path d="M7 25 L12.5 12 H25 L19.5 25 Z" fill="var(--color-signal-500)" />
      <path d="M10.6 20.5 H22.3" stroke="var(--color-asphalt-950)" strokeWidth="1.6" />
      <circle cx="20.5" cy="7.5" r="2.5" fill="var(--color-go)" />
    </svg>
  );
}

export function Logo({ className }: { className?: string }) {
  return (
    <span className={cx('inline-flex items-center gap-2.5', className)}>
      <LogoMark />
      <span className="text-xl leading-none font-bold tracking-[0.14em] text-asphalt-100 uppercase">
        Pit<span className="text-signal-400">wall</span>
      </span>
    </span>
  );
}
