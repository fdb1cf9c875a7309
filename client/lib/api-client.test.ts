import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { createApiClient } from './api-client';
import { ApiError } from './api-error';

type Call = { url: string; init: RequestInit };

function fakeServer(answers: Array<(call: Call) => Response>) {
  const calls: Call[] = [];
  const fetchFn = (async (url: string, init: RequestInit) => {
    const call = { url, init };
    calls.push(call);
    const answer = answers.shift();
    if (!answer) throw new Error(`unexpected request ${url}`);
    return answer(call);
  }) as unknown as typeof fetch;
  return { calls, fetchFn };
}

const json = (status: number, body: unknown) =>
  new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
const header = (call: Call | undefined, name: string) => (call?.init.headers as Record<string, string>)[name];

const thing = z.object({ id: z.string() });

describe('createApiClient', () => {
  it('parses a successful answer with the given schema', async () => {
    const { fetchFn, calls } = fakeServer([() => json(200, { id: 'a', extra: 1 })]);
    const api = createApiClient({ fetchFn, readCookie: () => undefined });
    await expect(api.get('/things/a', thing)).resolves.toEqual({ id: 'a' });
    expect(calls[0]?.url).toBe('/api/things/a');
    expect(calls[0]?.init.credentials).toBe('same-origin');
  });

  it('throws bad_response when the answer does not match the schema', async () => {
    const { fetchFn } = fakeServer([() => json(200, { id: 7 })]);
    const api = createApiClient({ fetchFn, readCookie: () => undefined });
    await expect(api.get('/things/a', thing)).rejects.toMatchObject({ code: 'bad_response', status: 200 });
  });

  it('turns the error shape into an ApiError with its issues', async () => {
    const body = { error: { code: 'validation_failed', message: 'Check the form', issues: [{ path: 'email', message: 'Enter a valid e-mail address' }] } };
    const { fetchFn } = fakeServer([() => json(400, body)]);
    const api = createApiClient({ fetchFn, readCookie: () => 'tok' });
    const error = await api.post('/auth/sign-in', { email: 'x' }, thing).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({ status: 400, code: 'validation_failed', message: 'Check the form' });
    expect((error as ApiError).issues).toEqual(body.error.issues);
  });

  it('falls back to a code from the status when the body is not the error shape', async () => {
    const { fetchFn } = fakeServer([() => new Response('<html>gateway</html>', { status: 404 })]);
    const api = createApiClient({ fetchFn, readCookie: () => undefined });
    await expect(api.get('/nowhere', thing)).rejects.toMatchObject({ status: 404, code: 'not_found' });
  });

  it('reports network_error with status 0 when fetch itself fails', async () => {
    const fetchFn = (async () => {
      throw new TypeError('Failed to fetch');
    }) as unknown as typeof fetch;
    const api = createApiClient({ fetchFn, readCookie: () => undefined });
    await expect(api.get('/me', thing)).rejects.toMatchObject({ status: 0, code: 'network_error' });
  });

  it('sends the pw_csrf cookie as X-CSRF-Token on unsafe methods', async () => {
    const { fetchFn, calls } = fakeServer([() => new Response(null, { status: 204 })]);
    const api = createApiClient({ fetchFn, readCookie: (name) => (name === 'pw_csrf' ? 'cookie-token' : undefined) });
    await api.delete('/team/invites/1');
    expect(calls[0]?.init.method).toBe('DELETE');
    expect(header(calls[0], 'X-CSRF-Token')).toBe('cookie-token');
  });

  it('asks for a CSRF token first when the cookie is missing', async () => {
    const { fetchFn, calls } = fakeServer([() => json(200, { csrfToken: 'fresh' }), () => json(201, { id: 'k' })]);
    const api = createApiClient({ fetchFn, readCookie: () => undefined });
    await expect(api.post('/team/robot-keys', { name: 'Gullwing' }, thing)).resolves.toEqual({ id: 'k' });
    expect(calls.map((c) => c.url)).toEqual(['/api/auth/csrf', '/api/team/robot-keys']);
    expect(header(calls[1], 'X-CSRF-Token')).toBe('fresh');
    expect(calls[1]?.init.body).toBe(JSON.stringify({ name: 'Gullwing' }));
  });

  it('retries once with a fresh token after csrf_failed', async () => {
    const failed = { error: { code: 'csrf_failed', message: 'Bad token' } };
    const { fetchFn, calls } = fakeServer([
      () => json(403, failed),
      () => json(200, { csrfToken: 'fresh' }),
      () => new Response(null, { status: 204 }),
    ]);
    const api = createApiClient({ fetchFn, readCookie: () => 'stale' });
    await api.post('/auth/sign-out', undefined, undefined);
    expect(calls.map((c) => header(c, 'X-CSRF-Token'))).toEqual(['stale', undefined, 'fresh']);
  });

  it('does not retry a second csrf_failed', async () => {
    const failed = { error: { code: 'csrf_failed', message: 'Bad token' } };
    const { fetchFn } = fakeServer([() => json(403, failed), () => json(200, { csrfToken: 'x' }), () => json(403, failed)]);
    const api = createApiClient({ fetchFn, readCookie: () => 'stale' });
    await expect(api.post('/auth/sign-out', undefined, undefined)).rejects.toMatchObject({ code: 'csrf_failed' });
  });
});
