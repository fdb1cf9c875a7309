import { useEffect, useId, useRef, useState } from 'react';
import { ALLIANCES, DRIVER_STATIONS } from '../../../../shared/domain/season/season-profile';
import type { Theme } from '../../../../shared/schemas/panel';
import { seatText, type RunSettings } from '../model/run-settings';
import type { OfflineState, WakeLockState } from '../hooks/use-run-screen';

type SeatChooserProps = {
  settings: RunSettings;
  theme: Theme;
  wakeLock: WakeLockState;
  offline?: OfflineState;
  canVibrate: boolean;
  onChange: (change: Partial<RunSettings>) => void;
};

function Choice({ label, isChosen, theme, onChoose }: { label: string; isChosen: boolean; theme: Theme; onChoose: () => void }) {
  return (
    <button
      type="button"
      aria-pressed={isChosen}
      onPointerDown={(e) => {
        if (e.button === 0) onChoose();
      }}
      onKeyDown={(e) => {
        if (e.key === 'Enter' || e.key === ' ') {
          e.preventDefault();
          onChoose();
        }
      }}
      className="min-h-12 min-w-14 flex-1 rounded-lg px-3 text-lg font-bold"
      style={isChosen ? { background: theme.accent, color: theme.accentText } : { background: theme.canvas, color: theme.text, boxShadow: `inset 0 0 0 1.5px ${theme.muted}` }}
    >
      {label}
    </button>
  );
}

/** A compact button showing the seat ("Blue 2"); it opens the alliance, driver station and vibration choices. */
export function SeatChooser({ settings, theme, wakeLock, offline, canVibrate, onChange }: SeatChooserProps) {
  const [isOpen, setIsOpen] = useState(false);
  const panelId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (!isOpen) return;
    const close = (e: PointerEvent) => {
      if (!rootRef.current?.contains(e.target as Node)) setIsOpen(false);
    };
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && setIsOpen(false);
    document.addEventListener('pointerdown', close);
    document.addEventListener('keydown', onKey);
    return () => {
      document.removeEventListener('pointerdown', close);
      document.removeEventListener('keydown', onKey);
    };
  }, [isOpen]);
  return (
    <div ref={rootRef} className="relative">
      <button
        type="button"
        aria-expanded={isOpen}
        aria-controls={panelId}
        aria-label={`Seat: ${seatText(settings)}. Change alliance, driver station and settings`}
        onClick={() => setIsOpen((o) => !o)}
        className="inline-flex min-h-10 items-center gap-2 rounded-lg px-3 text-[15px] font-bold whitespace-nowrap"
        style={{ background: theme.surface, color: theme.text, boxShadow: `inset 0 0 0 1.5px ${theme.muted}` }}
      >
        <span className="text-xs font-semibold tracking-wider uppercase opacity-70">Seat</span>
        {seatText(settings)}
        <span aria-hidden="true">▾</span>
      </button>
      {isOpen ? (
        <div
          id={panelId}
          role="dialog"
          aria-label="Seat and settings"
          className="absolute top-full right-0 z-30 mt-2 flex w-80 flex-col gap-4 rounded-xl p-4 shadow-2xl"
          style={{ background: theme.surface, color: theme.text, boxShadow: `0 0 0 1.5px ${theme.muted}, 0 20px 40px -12px #000` }}
        >
          <fieldset className="flex flex-col gap-2">
            <legend className="mb-2 text-sm font-semibold tracking-wide uppercase opacity-75">Alliance</legend>
            <div className="flex gap-2">
              {ALLIANCES.map((a) => (
                <Choice key={a} label={a === 'red' ? 'Red' : 'Blue'} isChosen={settings.alliance === a} theme={theme} onChoose={() => onChange({ alliance: a })} />
              ))}
            </div>
          </fieldset>
          <fieldset className="flex flex-col gap-2">
            <legend className="mb-2 text-sm font-semibold tracking-wide uppercase opacity-75">Driver station</legend>
            <div className="flex gap-2">
              {DRIVER_STATIONS.map((d) => (
                <Choice key={d} label={String(d)} isChosen={settings.driverStation === d} theme={theme} onChoose={() => onChange({ driverStation: d })} />
              ))}
            </div>
          </fieldset>
          <p className="text-sm opacity-75">The reef turns to what you see from this seat. Remembered on this tablet.</p>
          <fieldset className="flex flex-col gap-2">
            <legend className="mb-2 text-sm font-semibold tracking-wide uppercase opacity-75">Buzz on each tap</legend>
            <div className="flex gap-2">
              <Choice label="On" isChosen={settings.isVibrationOn} theme={theme} onChoose={() => onChange({ isVibrationOn: true })} />
              <Choice label="Off" isChosen={!settings.isVibrationOn} theme={theme} onChoose={() => onChange({ isVibrationOn: false })} />
            </div>
            {!canVibrate ? <p className="text-sm opacity-75">This browser cannot vibrate.</p> : null}
          </fieldset>
          <p className="text-sm" style={{ color: wakeLock === 'on' ? theme.ok : theme.warn }}>
            {wakeLock === 'on' ? '✓ Screen kept awake' : wakeLock === 'unsupported' ? '▲ This browser cannot keep the screen awake' : '▲ Screen may sleep (tap to keep it awake)'}
          </p>
          {offline ? (
            <p className="-mt-2 text-sm" style={{ color: offline === 'ready' ? theme.ok : theme.warn }}>
              {offline === 'ready' ? '✓ Opens with no network' : offline === 'preparing' ? '… Keeping the panel for offline use' : '▲ This browser cannot keep the panel offline'}
            </p>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
