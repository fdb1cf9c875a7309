import { describe, expect, it } from 'vitest';
import { isCsrfRefusal, uploadOutcome } from './upload-outcome';

const error = (code: string, message: string, issues?: { path: string; message: string }[]) =>
  JSON.stringify({ error: { code, message, ...(issues ? { issues } : {}) } });

describe('uploadOutcome', () => {
  it('reads the new id from a 201', () => {
    const id = '5b0f5c0e-8a51-4d59-9a39-0a6a43f4a0f1';
    expect(uploadOutcome(201, JSON.stringify({ id }))).toEqual({ type: 'stored', id });
  });

  it('shows the server’s words about the file for a 400', () => {
    const body = error('bad_request', 'The file is not a recording', [{ path: 'file', message: 'Truncated MessagePack at byte 1041' }]);
    expect(uploadOutcome(400, body)).toEqual({ type: 'rejected', message: 'Truncated MessagePack at byte 1041' });
  });

  it('falls back to the error message when a 400 has no issues', () => {
    expect(uploadOutcome(400, error('bad_request', 'No file in the form'))).toEqual({ type: 'rejected', message: 'No file in the form' });
  });

  it('says "too large" for a 413, whatever the body', () => {
    expect(uploadOutcome(413, '<html>too big</html>')).toEqual({ type: 'too-large' });
  });

  it('explains a lost connection and a refused role', () => {
    expect(uploadOutcome(0, '')).toMatchObject({ type: 'failed' });
    expect(uploadOutcome(403, error('forbidden', 'no'))).toMatchObject({ type: 'failed', message: expect.stringContaining('Programmers') });
  });

  it('does not trust a 201 without an id', () => {
    expect(uploadOutcome(201, '{}')).toMatchObject({ type: 'failed' });
  });
});

describe('isCsrfRefusal', () => {
  it('spots a stale token only', () => {
    expect(isCsrfRefusal(403, error('csrf_failed', 'stale'))).toBe(true);
    expect(isCsrfRefusal(403, error('forbidden', 'no'))).toBe(false);
    expect(isCsrfRefusal(400, error('csrf_failed', 'stale'))).toBe(false);
    expect(isCsrfRefusal(403, 'not json')).toBe(false);
  });
});
