import type { InputHTMLAttributes, ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { Field, controlClasses } from './field';

type TextFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> & {
  label: string;
  name: string;
  hint?: ReactNode;
  error?: string | undefined;
  isMono?: boolean;
  /** A unit shown inside the input's right edge, e.g. "m" or "m/s". */
  unit?: string;
};

export function TextField({ label, hint, error, isMono = false, unit, className, ...input }: TextFieldProps) {
  return (
    <Field
      label={
        unit === undefined ? (
          label
        ) : (
          <>
            {label}
            <span className="sr-only"> ({unit})</span>
          </>
        )
      }
      hint={hint}
      error={error}
    >
      {(control) =>
        unit === undefined ? (
          <input {...input} {...control} className={cx(controlClasses, isMono && 'num', className)} />
        ) : (
          <div className="relative">
            <input {...input} {...control} className={cx(controlClasses, 'pr-14', isMono && 'num', className)} />
            <span
              aria-hidden="true"
              className="num pointer-events-none absolute top-1/2 right-3 -translate-y-1/2 text-sm text-asphalt-400"
            >
              {unit}
            </span>
          </div>
        )
      }
    </Field>
  );
}
