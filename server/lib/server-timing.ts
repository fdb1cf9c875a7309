// The Server-Timing header (W3C Server Timing): how long the server spent on a request, for benchmarks and
// the browser's network panel.
import type { RequestHandler, Response } from 'express';

/** Notes when the request reached the API, before sign-in and parsing. */
export const markRequestStart: RequestHandler = (_req, res, next) => {
  res.locals.requestStartMs = performance.now();
  next();
};

/** Sets `Server-Timing: app;dur=<ms>` from the request's arrival until now; call just before sending. */
export function setServerTiming(res: Response): void {
  const startMs = res.locals.requestStartMs;
  if (typeof startMs !== 'number') return;
  res.set('Server-Timing', `app;dur=${(performance.now() - startMs).toFixed(2)}`);
}
