import type { Theme } from '../../../../shared/schemas/panel';

/** Covers the panel when the tablet is held the other way round from the panel's design. */
export function TurnOverlay({ theme, to }: { theme: Theme; to: 'landscape' | 'portrait' }) {
  return (
    <div role="alert" className="fixed inset-0 z-40 grid place-items-center p-8 text-center" style={{ background: theme.canvas, color: theme.text }}>
      <div className="flex flex-col items-center gap-6">
        <svg viewBox="0 0 120 120" aria-hidden="true" className="size-32">
          <rect x="38" y="18" width="44" height="76" rx="8" fill="none" stroke={theme.muted} strokeWidth="5" />
          <rect x="22" y="38" width="76" height="44" rx="8" fill="none" stroke={theme.accent} strokeWidth="5" />
          <path d="M92 22 a 30 30 0 0 1 10 24" fill="none" stroke={theme.accent} strokeWidth="5" strokeLinecap="round" />
          <path d="M96 44 l6 4 l3 -7" fill="none" stroke={theme.accent} strokeWidth="5" strokeLinecap="round" strokeLinejoin="round" />
        </svg>
        <p className="text-3xl font-bold">Turn the tablet to {to}</p>
        <p className="max-w-md text-lg" style={{ color: theme.muted }}>
          This panel was laid out for a {to} screen. It comes back as soon as the tablet is turned.
        </p>
      </div>
    </div>
  );
}
