import type { z } from 'zod';
import { apiErrorBodySchema, type ErrorCode } from '../../shared/schemas/error';
import { csrfSchema } from '../../shared/schemas/auth';
import { ApiError } from './api-error';

type Method = 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';

export type ApiClientDeps = {
  fetchFn: typeof fetch;
  /** Returns the value of a cookie readable by scripts, or undefined. */
  readCookie: (name: string) => string | undefined;
  basePath?: string;
};

const CSRF_COOKIE = 'pw_csrf';
const CSRF_HEADER = 'X-CSRF-Token';

const STATUS_CODES: Record<number, ErrorCode> = {
  400: 'bad_request',
  401: 'unauthenticated',
  403: 'forbidden',
  404: 'not_found',
  409: 'conflict',
  413: 'payload_too_large',
  429: 'rate_limited',
};

export type ApiClient = ReturnType<typeof createApiClient>;

/**
 * JSON over `/api`. Unsafe methods carry the double-submit CSRF token; every answer is parsed
 * with the caller's schema, so nothing unvalidated leaves this module.
 */
export function createApiClient({ fetchFn, readCookie, basePath = '/api' }: ApiClientDeps) {
  let pendingToken: Promise<string> | null = null;

  function fetchCsrfToken(): Promise<string> {
    pendingToken ??= send('GET', '/auth/csrf', undefined, csrfSchema, false)
      .then((r) => r.csrfToken)
      .finally(() => {
        pendingToken = null;
      });
    return pendingToken;
  }

  async function csrfToken(forceFresh: boolean): Promise<string> {
    const fromCookie = forceFresh ? undefined : readCookie(CSRF_COOKIE);
    return fromCookie ?? fetchCsrfToken();
  }

  async function send<S extends z.ZodType | undefined>(
    method: Method,
    path: string,
    body: unknown,
    schema: S,
    isRetry: boolean,
  ): Promise<S extends z.ZodType ? z.output<S> : void> {
    const headers: Record<string, string> = { Accept: 'application/json' };
    if (body !== undefined) headers['Content-Type'] = 'application/json';
    if (method !== 'GET') headers[CSRF_HEADER] = await csrfToken(isRetry);

    let res: Response;
    try {
      res = await fetchFn(basePath + path, {
        method,
        headers,
        credentials: 'same-origin',
        body: body === undefined ? undefined : JSON.stringify(body),
      });
    } catch {
      throw new ApiError(0, 'network_error', 'Pitwall can’t reach its server. Check that it is running and that this device is on the same network.');
    }

    if (!res.ok) {
      const error = await errorFrom(res);
      // A stale or missing CSRF cookie is recoverable once: fetch a fresh token and try again.
      if (error.code === 'csrf_failed' && !isRetry && method !== 'GET') {
        return send(method, path, body, schema, true);
      }
      throw error;
    }

    if (schema === undefined) return undefined as never;
    let json: unknown;
    try {
      json = await res.json();
    } catch {
      throw new ApiError(res.status, 'bad_response', 'The server sent an answer that isn’t JSON.');
    }
    const parsed = schema.safeParse(json);
    if (!parsed.success) {
      throw new ApiError(res.status, 'bad_response', 'The server sent an answer Pitwall doesn’t understand. Is the server the same version as this page?');
    }
    return parsed.data as never;
  }

  return {
    get: <S extends z.ZodType>(path: string, schema: S) => send('GET', path, undefined, schema, false),
    post: <S extends z.ZodType | undefined>(path: string, body: unknown, schema: S) =>
      send('POST', path, body, schema, false),
    patch: <S extends z.ZodType | undefined>(path: string, body: unknown, schema: S) =>
      send('PATCH', path, body, schema, false),
    put: <S extends z.ZodType | undefined>(path: string, body: unknown, schema: S) =>
      send('PUT', path, body, schema, false),
    delete: (path: string) => send('DELETE', path, undefined, undefined, false),
  };
}

async function errorFrom(res: Response): Promise<ApiError> {
  const fallbackCode: ErrorCode = STATUS_CODES[res.status] ?? 'internal';
  let json: unknown = null;
  try {
    json = await res.json();
  } catch {
    // Not JSON (a proxy page, an empty body): fall back to the status alone.
  }
  const parsed = apiErrorBodySchema.safeParse(json);
  if (parsed.success) {
    const { code, message, issues } = parsed.data.error;
    return new ApiError(res.status, code, message, issues ?? []);
  }
  return new ApiError(res.status, fallbackCode, res.statusText || `The server answered ${res.status}.`);
}

/** Reads a cookie from `document.cookie`. */
export function readDocumentCookie(name: string): string | undefined {
  for (const part of document.cookie.split(';')) {
    const [key, ...rest] = part.trim().split('=');
    if (key === name) return decodeURIComponent(rest.join('='));
  }
  return undefined;
}

export const api = createApiClient({
  fetchFn: (...args) => fetch(...args),
  readCookie: readDocumentCookie,
});
