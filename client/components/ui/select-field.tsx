import type { ReactNode, SelectHTMLAttributes } from 'react';
import { Field, controlClasses } from './field';
import { SelectChevron } from './select-chevron';

type SelectFieldProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id'> & {
  label: string;
  name: string;
  hint?: ReactNode;
  error?: string | undefined;
  children: ReactNode;
};

export function SelectField({ label, hint, error, children, ...select }: SelectFieldProps) {
  return (
    <Field label={label} hint={hint} error={error}>
      {(control) => (
        <div className="relative">
          <select {...select} {...control} className={`${controlClasses} appearance-none pr-10`}>
            {children}
          </select>
          <SelectChevron />
        </div>
      )}
    </Field>
  );
}
