import { useId, type ReactNode } from 'react';

export type FieldControlProps = { id: string; 'aria-invalid': boolean | undefined; 'aria-describedby': string | undefined };

type FieldProps = {
  label: ReactNode;
  hint?: ReactNode;
  error?: string | undefined;
  children: (control: FieldControlProps) => ReactNode;
};

/** Label, control, hint and error, wired together by ids so assistive tech reads them as one. */
export function Field({ label, hint, error, children }: FieldProps) {
  const id = useId();
  // The error replaces the hint: both at once mostly say the same thing twice.
  const hintId = hint && !error ? `${id}-hint` : undefined;
  const errorId = error ? `${id}-error` : undefined;
  const describedBy = [errorId, hintId].filter(Boolean).join(' ') || undefined;
  return (
    <div className="flex flex-col gap-1.5">
      <label htmlFor={id} className="text-sm font-semibold text-asphalt-200">
        {label}
      </label>
      {children({ id, 'aria-invalid': error ? true : undefined, 'aria-describedby': describedBy })}
      {error && (
        <p id={errorId} className="flex items-start gap-1.5 text-sm font-medium text-stop">
          <svg viewBox="0 0 16 16" aria-hidden="true" className="mt-0.5 size-3.5 shrink-0">
            <path d="M8 1.5 15 14H1L8 1.5Z" fill="currentColor" />
            <path d="M8 6v3.5M8 11.5v.5" stroke="var(--color-asphalt-950)" strokeWidth="1.6" strokeLinecap="round" />
          </svg>
          {error}
        </p>
      )}
      {hintId && (
        <p id={hintId} className="text-sm text-asphalt-400">
          {hint}
        </p>
      )}
    </div>
  );
}

export const controlClasses =
  'min-h-11 w-full rounded-lg bg-asphalt-900 px-3 text-[0.9375rem] text-asphalt-100 ring-1 ring-inset ring-asphalt-600 ' +
  'placeholder:text-asphalt-500 hover:ring-asphalt-500 focus-visible:outline-2 focus-visible:outline-offset-0 focus-visible:ring-signal-500 ' +
  'aria-invalid:ring-stop disabled:cursor-not-allowed disabled:opacity-60';
