import type { CSSProperties, ReactNode } from 'react';
import { cx } from '../../lib/cx';

export type SegmentOption<T extends string> = {
  value: T;
  label: ReactNode;
  /** Colour of the ring around the chosen option; the signal colour when omitted. */
  accent?: string;
};

type SegmentedControlProps<T extends string> = {
  legend: string;
  isLegendHidden?: boolean;
  name: string;
  value: T;
  options: readonly SegmentOption<T>[];
  onChange: (value: T) => void;
};

/** One of a few choices, as native radio buttons drawn as a row of segments (arrow keys move between them). */
export function SegmentedControl<T extends string>({ legend, isLegendHidden = false, name, value, options, onChange }: SegmentedControlProps<T>) {
  return (
    <fieldset className="flex flex-col gap-1.5">
      <legend className={cx('mb-1.5 text-sm font-semibold text-asphalt-200', isLegendHidden && 'sr-only')}>{legend}</legend>
      <div className="inline-flex w-fit divide-x divide-asphalt-700 rounded-lg bg-asphalt-900 ring-1 ring-asphalt-600 ring-inset">
        {options.map((o) => (
          <label
            key={o.value}
            style={{ '--segment-accent': o.accent ?? 'var(--color-signal-500)' } as CSSProperties}
            className={cx(
              'relative flex min-h-11 cursor-pointer items-center gap-2 px-4 text-[0.9375rem] font-semibold whitespace-nowrap text-asphalt-300 transition-colors select-none first:rounded-l-lg last:rounded-r-lg',
              'hover:bg-asphalt-800 hover:text-asphalt-100',
              'has-checked:bg-asphalt-700 has-checked:text-asphalt-100 has-checked:ring-2 has-checked:ring-(--segment-accent) has-checked:ring-inset',
              'has-focus-visible:outline-2 has-focus-visible:outline-offset-2 has-focus-visible:outline-signal-400',
            )}
          >
            <input
              type="radio"
              name={name}
              value={o.value}
              checked={o.value === value}
              onChange={() => onChange(o.value)}
              // Invisible but covering the whole segment, so a click anywhere on it is a click on the radio.
              className="absolute inset-0 m-0 cursor-pointer appearance-none rounded-[inherit] opacity-0"
            />
            {o.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
