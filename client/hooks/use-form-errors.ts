import { useCallback, useRef, useState, type FormEvent } from 'react';
import type { z } from 'zod';
import { formErrorsFrom, issuesFromZod, mapIssues, noFormErrors, type FormErrors } from '../lib/form-errors';

/**
 * Field and form errors for one form. `check` validates with the shared schema before sending;
 * `fail` maps a failed request. Both move focus to the first field with an error.
 */
export function useFormErrors<F extends string>(fields: readonly F[]) {
  const [errors, setErrors] = useState<FormErrors<F>>(noFormErrors);
  const formRef = useRef<HTMLFormElement>(null);

  const show = useCallback(
    (next: FormErrors<F>) => {
      setErrors(next);
      const first = fields.find((f) => next.fields[f]);
      if (first) {
        // After React renders aria-invalid, so screen readers announce the message with the field.
        requestAnimationFrame(() => formRef.current?.querySelector<HTMLElement>(`[name="${first}"]`)?.focus());
      }
    },
    [fields],
  );

  const check = useCallback(
    <S extends z.ZodType>(schema: S, input: unknown): z.output<S> | null => {
      const parsed = schema.safeParse(input);
      if (parsed.success) {
        setErrors(noFormErrors);
        return parsed.data;
      }
      show(mapIssues(issuesFromZod(parsed.error), fields));
      return null;
    },
    [fields, show],
  );

  const fail = useCallback((error: unknown) => show(formErrorsFrom(error, fields)), [fields, show]);
  const clear = useCallback(() => setErrors(noFormErrors), []);

  /** A submit handler: reads the form, checks it with `schema` (plus `extra` values), sends only what parsed. */
  const submitWith =
    <S extends z.ZodType>(schema: S, send: (body: z.output<S>, form: HTMLFormElement) => void, extra?: Record<string, string>) =>
    (e: FormEvent<HTMLFormElement>) => {
      e.preventDefault();
      const form = e.currentTarget;
      const body = check(schema, { ...formValues(form), ...extra });
      if (body !== null) send(body, form);
    };

  return { errors, check, fail, clear, submitWith, formRef };
}

/** The form's values as plain strings, keyed by input name. */
export function formValues(form: HTMLFormElement): Record<string, string> {
  const out: Record<string, string> = {};
  new FormData(form).forEach((value, key) => {
    if (typeof value === 'string') out[key] = value;
  });
  return out;
}
