import type { ErrorRequestHandler } from 'express';
import { ZodError } from 'zod';
import type { ApiErrorBody, ErrorCode, FieldIssue } from '../../shared/schemas/error';
import type { Logger } from './logger';

const STATUS: Record<ErrorCode, number> = {
  validation_failed: 400,
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  csrf_failed: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  rate_limited: 429,
  internal: 500,
};

/** An expected failure with a code the client can act on. */
export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly issues?: FieldIssue[],
  ) {
    super(message);
  }
  get status(): number {
    return STATUS[this.code];
  }
}

export const notFound = (what: string) => new AppError('not_found', `${what} was not found`);
export const conflict = (message: string, field?: string) =>
  new AppError('conflict', message, field ? [{ path: field, message }] : undefined);

export function zodIssues(error: ZodError): FieldIssue[] {
  return error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
}

export function errorBody(code: ErrorCode, message: string, issues?: FieldIssue[]): ApiErrorBody {
  return { error: { code, message, ...(issues ? { issues } : {}) } };
}

/** Maps every error to the one error shape; stacks stay in the log. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (err instanceof ZodError) {
      res.status(400).json(errorBody('validation_failed', 'Some fields need attention', zodIssues(err)));
      return;
    }
    if (err instanceof AppError) {
      res.status(err.status).json(errorBody(err.code, err.message, err.issues));
      return;
    }
    const status = typeof err?.status === 'number' ? err.status : 500;
    if (status === 400 && err?.type === 'entity.parse.failed') {
      res.status(400).json(errorBody('bad_request', 'The request body is not valid JSON'));
      return;
    }
    if (status === 413) {
      res.status(413).json(errorBody('payload_too_large', 'The request body is too large'));
      return;
    }
    logger.error({ err, url: req.originalUrl }, 'unhandled error');
    res.status(500).json(errorBody('internal', 'Something went wrong on the server'));
  };
}
