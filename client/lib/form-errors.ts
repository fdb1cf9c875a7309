import type { z } from 'zod';
import type { FieldIssue } from '../../shared/schemas/error';
import { isApiError } from './api-error';

export type FormErrors<F extends string> = {
  fields: Partial<Record<F, string>>;
  /** Problems that belong to no field on this form; shown above the submit button. */
  form: string | null;
};

export const noFormErrors = { fields: {}, form: null } as const satisfies FormErrors<never>;

/**
 * Maps issues to the form's fields. A path matches a field by its full name or its last segment
 * (`body.email` → `email`); the first message per field wins; the rest become the form message.
 */
export function mapIssues<F extends string>(issues: readonly FieldIssue[], fields: readonly F[]): FormErrors<F> {
  const result: Partial<Record<F, string>> = {};
  const leftover: string[] = [];
  for (const issue of issues) {
    const field = fields.find((f) => issue.path === f || issue.path.split('.').at(-1) === f);
    if (field === undefined) leftover.push(issue.message);
    else result[field] ??= issue.message;
  }
  return { fields: result, form: leftover.length > 0 ? leftover.join(' ') : null };
}

/** Issues from a zod error, with paths joined by dots as the server sends them. */
export function issuesFromZod(error: z.ZodError): FieldIssue[] {
  return error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message }));
}

const CODE_MESSAGES: Partial<Record<string, string>> = {
  rate_limited: 'Too many attempts. Wait a few minutes, then try again.',
  forbidden: 'Your role doesn’t allow this. Ask a lead if you need it.',
  csrf_failed: 'Your session token went stale. Reload the page and try again.',
  internal: 'Something went wrong on the server. Try again; if it keeps happening, check the server log.',
};

/** One sentence for any error, to show where no field fits. */
export function errorMessage(error: unknown): string {
  if (isApiError(error)) return CODE_MESSAGES[error.code] ?? error.message;
  return 'Something went wrong. Try again.';
}

/** Form errors for a failed request: field issues where they fit, a sentence otherwise. */
export function formErrorsFrom<F extends string>(error: unknown, fields: readonly F[]): FormErrors<F> {
  if (isApiError(error) && error.issues.length > 0) {
    const mapped = mapIssues(error.issues, fields);
    const hasField = Object.keys(mapped.fields).length > 0;
    return { fields: mapped.fields, form: mapped.form ?? (hasField ? null : errorMessage(error)) };
  }
  return { fields: {}, form: errorMessage(error) };
}
