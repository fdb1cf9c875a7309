import { describe, expect, it } from 'vitest';
import { signUpBodySchema } from '../../shared/schemas/auth';
import { ApiError } from './api-error';
import { errorMessage, formErrorsFrom, issuesFromZod, mapIssues } from './form-errors';

const fields = ['email', 'password', 'name'] as const;

describe('mapIssues', () => {
  it('puts each issue on the field its path names', () => {
    const out = mapIssues(
      [
        { path: 'email', message: 'Enter a valid e-mail address' },
        { path: 'password', message: 'Use at least 10 characters' },
      ],
      fields,
    );
    expect(out).toEqual({
      fields: { email: 'Enter a valid e-mail address', password: 'Use at least 10 characters' },
      form: null,
    });
  });

  it('matches a dotted path by its last segment', () => {
    expect(mapIssues([{ path: 'body.name', message: 'Enter a name' }], fields).fields).toEqual({ name: 'Enter a name' });
  });

  it('keeps the first message when a field has several', () => {
    const out = mapIssues(
      [
        { path: 'email', message: 'first' },
        { path: 'email', message: 'second' },
      ],
      fields,
    );
    expect(out.fields.email).toBe('first');
  });

  it('collects issues without a matching field into the form message', () => {
    const out = mapIssues([{ path: 'token', message: 'This link is broken.' }], fields);
    expect(out).toEqual({ fields: {}, form: 'This link is broken.' });
  });
});

describe('issuesFromZod', () => {
  it('joins paths with dots so they match the server’s issues', () => {
    const parsed = signUpBodySchema.safeParse({ email: 'nope', password: 'short', name: '', teamNumber: 'abc', teamName: 'H' });
    expect(parsed.success).toBe(false);
    if (parsed.success) return;
    const paths = issuesFromZod(parsed.error).map((i) => i.path);
    expect(paths).toEqual(expect.arrayContaining(['email', 'password', 'name', 'teamNumber', 'teamName']));
  });
});

describe('formErrorsFrom', () => {
  it('maps a 400 with issues onto fields', () => {
    const error = new ApiError(400, 'validation_failed', 'Check the form', [{ path: 'email', message: 'Taken' }]);
    expect(formErrorsFrom(error, fields)).toEqual({ fields: { email: 'Taken' }, form: null });
  });

  it('uses the server message when no issue fits a field', () => {
    const error = new ApiError(409, 'conflict', 'That e-mail address already has an account.');
    expect(formErrorsFrom(error, fields)).toEqual({ fields: {}, form: 'That e-mail address already has an account.' });
  });

  it('words rate limiting for people', () => {
    expect(errorMessage(new ApiError(429, 'rate_limited', 'Too Many Requests'))).toMatch(/Wait a few minutes/);
  });

  it('has a sentence for errors that are not ApiErrors', () => {
    expect(formErrorsFrom(new Error('boom'), fields).form).toBe('Something went wrong. Try again.');
  });
});
