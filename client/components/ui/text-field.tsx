import type { InputHTMLAttributes, ReactNode } from 'react';
import { cx } from '../../lib/cx';
import { Field, controlClasses } from './field';

type TextFieldProps = Omit<InputHTMLAttributes<HTMLInputElement>, 'id'> & {
  label: string;
  name: string;
  hint?: ReactNode;
  error?: string | undefined;
  isMono?: boolean;
};

export function TextField({ label, hint, error, isMono = false, className, ...input }: TextFieldProps) {
  return (
    <Field label={label} hint={hint} error={error}>
      {(control) => <input {...input} {...control} className={cx(controlClasses, isMono && 'num', className)} />}
    </Field>
  );
}
