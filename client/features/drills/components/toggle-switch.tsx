import { useId, type ReactNode } from 'react';
import { cx } from '../../../lib/cx';

type ToggleSwitchProps = { label: string; hint?: ReactNode; isOn: boolean; isDisabled?: boolean; onChange: (on: boolean) => void };

/** A labelled on/off switch (role switch), at least 44 px tall for touch. */
export function ToggleSwitch({ label, hint, isOn, isDisabled = false, onChange }: ToggleSwitchProps) {
  const hintId = useId();
  return (
    <div className="flex min-h-11 items-center gap-3">
      <button
        type="button"
        role="switch"
        aria-checked={isOn}
        aria-label={label}
        aria-describedby={hint ? hintId : undefined}
        disabled={isDisabled}
        onClick={() => onChange(!isOn)}
        className={cx(
          'relative inline-flex h-7 w-12 shrink-0 items-center rounded-full ring-1 transition-colors ring-inset disabled:cursor-not-allowed disabled:opacity-50',
          isOn ? 'bg-signal-500 ring-signal-300' : 'bg-asphalt-750 ring-asphalt-600',
        )}
      >
        <span aria-hidden="true" className={cx('inline-block size-5 rounded-full bg-asphalt-100 shadow transition-transform', isOn ? 'translate-x-6' : 'translate-x-1')} />
      </button>
      <span className="flex flex-col leading-tight">
        <span className="text-sm font-semibold text-asphalt-100">{label}</span>
        {hint && (
          <span id={hintId} className="text-2xs text-asphalt-400">
            {hint}
          </span>
        )}
      </span>
    </div>
  );
}
