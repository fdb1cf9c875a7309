import type { ErrorCode, FieldIssue } from '../../shared/schemas/error';

/** Server codes plus the two failures that happen on the client's side of the wire. */
export type ApiErrorCode = ErrorCode | 'network_error' | 'bad_response';

/** Every failed API call becomes one of these: a bad status, no answer, or an answer of the wrong shape. */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly status: number;
  readonly code: ApiErrorCode;
  readonly issues: readonly FieldIssue[];

  constructor(status: number, code: ApiErrorCode, message: string, issues: readonly FieldIssue[] = []) {
    super(message);
    this.status = status;
    this.code = code;
    this.issues = issues;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

/** Whether the error means "no valid session". */
export function isUnauthenticated(error: unknown): boolean {
  return isApiError(error) && error.status === 401;
}
