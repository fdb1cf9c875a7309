import { useEffect, useId, useState, type ReactNode } from 'react';
import { THEME_COLOUR_NAMES } from '../../../../shared/domain/panels/tile-catalogue';
import { THEME_COLOURS, type Theme, type ThemeColour } from '../../../../shared/schemas/panel';
import { controlClasses, Field } from '../../../components/ui/field';
import { SelectChevron } from '../../../components/ui/select-chevron';
import { cx } from '../../../lib/cx';
import type { Checked } from '../model/property-rules';

type DraftFieldProps<T> = {
  label: string;
  value: T;
  /** How the committed value reads in the input. */
  format: (value: T) => string;
  check: (text: string) => Checked<T>;
  onCommit: (value: T) => void;
  onBlur?: () => void;
  hint?: ReactNode;
  suggestions?: readonly string[];
  isMono?: boolean;
  unit?: string;
  inputMode?: 'text' | 'decimal' | 'numeric';
  placeholder?: string;
  isDisabled?: boolean;
  name: string;
};

/**
 * A text input that keeps what is typed even when it is not valid yet, says why, and applies the value as
 * soon as it is valid. An undo elsewhere brings the input back to the document's value.
 */
export function DraftField<T>({ label, value, format, check, onCommit, onBlur, hint, suggestions, isMono, unit, inputMode, placeholder, isDisabled, name }: DraftFieldProps<T>) {
  const [draft, setDraft] = useState(() => format(value));
  const [error, setError] = useState<string | undefined>();
  const listId = useId();
  const committed = format(value);

  useEffect(() => {
    setDraft((d) => {
      const parsed = check(d);
      return parsed.ok && format(parsed.value) === committed ? d : committed;
    });
    setError(undefined);
    // Runs when the document's value changes (an undo, another tile), not on every keystroke.
  }, [committed]);

  return (
    <Field label={unit ? <>{label} <span className="font-normal text-asphalt-400">({unit})</span></> : label} hint={hint} error={error}>
      {(control) => (
        <>
          <input
            {...control}
            name={name}
            value={draft}
            disabled={isDisabled}
            inputMode={inputMode}
            placeholder={placeholder}
            autoComplete="off"
            spellCheck={false}
            list={suggestions ? listId : undefined}
            className={cx(controlClasses, isMono && 'num')}
            onChange={(e) => {
              const text = e.target.value;
              setDraft(text);
              const parsed = check(text);
              if (parsed.ok) {
                setError(undefined);
                if (format(parsed.value) !== committed) onCommit(parsed.value);
              } else {
                setError(parsed.message);
              }
            }}
            onBlur={onBlur}
          />
          {suggestions && (
            <datalist id={listId}>
              {suggestions.map((s) => (
                <option key={s} value={s} />
              ))}
            </datalist>
          )}
        </>
      )}
    </Field>
  );
}

type ChoiceFieldProps<T extends string> = {
  label: string;
  name: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange: (value: T) => void;
  isDisabled?: boolean;
  hint?: ReactNode;
};

export function ChoiceField<T extends string>({ label, name, value, options, onChange, isDisabled, hint }: ChoiceFieldProps<T>) {
  return (
    <Field label={label} hint={hint}>
      {(control) => (
        <div className="relative">
          <select {...control} name={name} value={value} disabled={isDisabled} onChange={(e) => onChange(e.target.value as T)} className={`${controlClasses} appearance-none pr-10`}>
            {options.map((o) => (
              <option key={o.value} value={o.value}>
                {o.label}
              </option>
            ))}
          </select>
          <SelectChevron />
        </div>
      )}
    </Field>
  );
}

/** One of the theme's named colours, as a row of swatches (radio buttons; arrow keys move). */
export function ColourSwatches({ legend, name, theme, value, onChange, isDisabled }: { legend: string; name: string; theme: Theme; value: ThemeColour; onChange: (c: ThemeColour) => void; isDisabled?: boolean }) {
  return (
    <fieldset disabled={isDisabled}>
      <legend className="mb-1.5 text-sm font-semibold text-asphalt-200">
        {legend} <span className="font-normal text-asphalt-400">· {THEME_COLOUR_NAMES[value]}</span>
      </legend>
      <div className="flex flex-wrap gap-1.5">
        {THEME_COLOURS.map((c) => (
          <label key={c} title={`${THEME_COLOUR_NAMES[c]} ${theme[c]}`} className="relative cursor-pointer">
            <input type="radio" name={name} value={c} checked={c === value} onChange={() => onChange(c)} className="peer sr-only" aria-label={THEME_COLOUR_NAMES[c]} />
            <span
              aria-hidden="true"
              className="block size-8 rounded-md ring-1 ring-asphalt-500 peer-checked:ring-[3px] peer-checked:ring-signal-400 peer-focus-visible:outline-2 peer-focus-visible:outline-offset-2 peer-focus-visible:outline-sky"
              style={{ background: theme[c] }}
            />
          </label>
        ))}
      </div>
    </fieldset>
  );
}
