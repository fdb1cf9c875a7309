import { apiErrorBodySchema } from '../../../../shared/schemas/error';
import { uploadedSchema } from '../../../../shared/schemas/recording';

export type UploadOutcome =
  | { type: 'stored'; id: string }
  | { type: 'rejected'; message: string }
  | { type: 'too-large' }
  | { type: 'failed'; message: string };

/** What the server's answer to an upload means for the person who sent it. `body` is the raw text. */
export function uploadOutcome(status: number, body: string): UploadOutcome {
  let json: unknown = null;
  try {
    json = JSON.parse(body);
  } catch {
    // Not JSON (a proxy page, an empty body): decided by the status alone below.
  }
  if (status === 201) {
    const parsed = uploadedSchema.safeParse(json);
    return parsed.success
      ? { type: 'stored', id: parsed.data.id }
      : { type: 'failed', message: 'The server stored something but its answer wasn’t understood. Reload the list.' };
  }
  if (status === 413) return { type: 'too-large' };
  const error = apiErrorBodySchema.safeParse(json);
  if (status === 400 && error.success) {
    const fileIssue = error.data.error.issues?.find((i) => i.path === 'file') ?? error.data.error.issues?.[0];
    return { type: 'rejected', message: fileIssue?.message ?? error.data.error.message };
  }
  if (status === 0) return { type: 'failed', message: 'Pitwall can’t reach its server. Check that it is running and try again.' };
  if (status === 401) return { type: 'failed', message: 'You are signed out. Sign in again, then upload.' };
  if (status === 403) return { type: 'failed', message: 'Your role can’t upload recordings. Programmers and leads can.' };
  if (error.success) return { type: 'failed', message: error.data.error.message };
  return { type: 'failed', message: `The server answered ${status}. Try again; if it keeps happening, check the server log.` };
}

/** Whether the server refused the double-submit token (stale cookie); worth one retry with a fresh one. */
export function isCsrfRefusal(status: number, body: string): boolean {
  if (status !== 403) return false;
  try {
    const parsed = apiErrorBodySchema.safeParse(JSON.parse(body));
    return parsed.success && parsed.data.error.code === 'csrf_failed';
  } catch {
    return false;
  }
}
