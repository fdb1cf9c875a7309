import { describe, expect, it } from 'vitest';
import { ApiError } from './api-error';
import { shouldRetry } from './query-client';

describe('shouldRetry', () => {
  it.each([
    [new ApiError(401, 'unauthenticated', 'x'), false],
    [new ApiError(404, 'not_found', 'x'), false],
    [new ApiError(200, 'bad_response', 'x'), false],
    [new ApiError(503, 'internal', 'x'), true],
    [new ApiError(0, 'network_error', 'x'), true],
  ])('retries %o: %s', (error, expected) => {
    expect(shouldRetry(0, error)).toBe(expected);
  });

  it('gives up after two failures', () => {
    expect(shouldRetry(2, new ApiError(0, 'network_error', 'x'))).toBe(false);
  });
});
