import type { Request, Response } from 'express';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { apiErrorBodySchema } from '../../shared/schemas/error';
import { AppError, errorHandler } from './errors';
import { createLogger } from './logger';

function run(err: unknown): { status: number; body: unknown } {
  const out = { status: 0, body: undefined as unknown };
  const res = {
    status(code: number) {
      out.status = code;
      return this;
    },
    json(body: unknown) {
      out.body = body;
      return this;
    },
  } as unknown as Response;
  errorHandler(createLogger('silent'))(err, { originalUrl: '/x' } as Request, res, () => {});
  return out;
}

describe('errorHandler', () => {
  it('maps a ZodError to 400 with one issue per field path', () => {
    const parsed = z.object({ a: z.string(), b: z.object({ c: z.number() }) }).safeParse({ a: 1, b: { c: 'x' } });
    const { status, body } = run(parsed.error);
    expect(status).toBe(400);
    expect(apiErrorBodySchema.parse(body).error.issues?.map((i) => i.path)).toEqual(['a', 'b.c']);
  });

  it.each([
    ['unauthenticated', 401],
    ['forbidden', 403],
    ['csrf_failed', 403],
    ['not_found', 404],
    ['conflict', 409],
    ['rate_limited', 429],
  ] as const)('maps AppError(%s) to %i', (code, status) => {
    const result = run(new AppError(code, 'nope'));
    expect(result.status).toBe(status);
    expect(result.body).toEqual({ error: { code, message: 'nope' } });
  });

  it('hides an unexpected error behind a 500 without its message', () => {
    const result = run(new Error('secret stack detail'));
    expect(result.status).toBe(500);
    expect(JSON.stringify(result.body)).not.toContain('secret');
  });
});
