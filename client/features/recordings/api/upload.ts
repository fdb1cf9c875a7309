import { csrfSchema } from '../../../../shared/schemas/auth';
import type { RecordingSummary } from '../../../../shared/schemas/recording';
import { api, readDocumentCookie } from '../../../lib/api-client';
import { isCsrfRefusal, uploadOutcome, type UploadOutcome } from '../model/upload-outcome';

export type UploadProgress = { sentBytes: number; totalBytes: number };

type UploadOptions = {
  file: File;
  kind: RecordingSummary['kind'] | '';
  onProgress: (p: UploadProgress) => void;
  /** Aborts the transfer; the promise then settles as failed. */
  signal?: AbortSignal;
};

async function csrfToken(forceFresh: boolean): Promise<string> {
  const fromCookie = forceFresh ? undefined : readDocumentCookie('pw_csrf');
  return fromCookie ?? (await api.get('/auth/csrf', csrfSchema)).csrfToken;
}

/** One multipart POST through XMLHttpRequest, because fetch reports no upload progress. */
function send({ file, kind, onProgress, signal }: UploadOptions, token: string): Promise<{ status: number; body: string }> {
  return new Promise((resolve) => {
    const form = new FormData();
    if (kind) form.append('kind', kind);
    form.append('file', file);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', '/api/recordings/upload');
    xhr.setRequestHeader('X-CSRF-Token', token);
    xhr.setRequestHeader('Accept', 'application/json');
    xhr.upload.onprogress = (e) => onProgress({ sentBytes: e.loaded, totalBytes: e.lengthComputable ? e.total : file.size });
    xhr.onload = () => resolve({ status: xhr.status, body: xhr.responseText });
    xhr.onerror = () => resolve({ status: 0, body: '' });
    xhr.onabort = () => resolve({ status: 0, body: '' });
    signal?.addEventListener('abort', () => xhr.abort(), { once: true });
    onProgress({ sentBytes: 0, totalBytes: file.size });
    xhr.send(form);
  });
}

/** Uploads a recording file and says what came of it; a stale CSRF token is refreshed once. */
export async function uploadRecording(options: UploadOptions): Promise<UploadOutcome> {
  let token: string;
  try {
    token = await csrfToken(false);
  } catch {
    return uploadOutcome(0, '');
  }
  let answer = await send(options, token);
  if (isCsrfRefusal(answer.status, answer.body)) {
    answer = await send(options, await csrfToken(true));
  }
  return uploadOutcome(answer.status, answer.body);
}
