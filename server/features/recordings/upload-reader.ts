// The streamed multipart upload: busboy reads the request, the file is kept in memory up to a limit (a match
// file is tens of MB) and the other form fields are collected. Rejects with AppError, so no route needs try/catch.
import busboy from 'busboy';
import type { Request } from 'express';
import { AppError } from '../../lib/errors';

export const DEFAULT_UPLOAD_LIMIT_BYTES = 200 * 1024 * 1024;

export interface UploadedForm {
  file: Uint8Array;
  fields: Record<string, string>;
}

const sizeText = (bytes: number) => (bytes >= 1024 * 1024 ? `${Math.round(bytes / 1024 / 1024)} MB` : `${Math.round(bytes / 1024)} kB`);

/** Reads a multipart/form-data request with one file in `fileField`; 413 beyond limitBytes, 400 without a file. */
export function readUploadForm(req: Request, options: { limitBytes: number; fileField?: string }): Promise<UploadedForm> {
  const fileField = options.fileField ?? 'file';
  return new Promise((resolve, reject) => {
    let parser: busboy.Busboy;
    try {
      parser = busboy({ headers: req.headers, limits: { fileSize: options.limitBytes, files: 1, fields: 20 } });
    } catch {
      reject(new AppError('bad_request', `Send the file as multipart/form-data in the field "${fileField}"`));
      return;
    }
    const fields: Record<string, string> = {};
    const parts: Buffer[] = [];
    let sawFile = false;
    let failed = false;
    const fail = (error: AppError) => {
      if (failed) return;
      failed = true;
      req.unpipe(parser);
      req.resume();
      reject(error);
    };
    parser.on('field', (name, value) => {
      fields[name] = value;
    });
    parser.on('file', (name, stream) => {
      if (name !== fileField || sawFile) {
        stream.resume();
        return;
      }
      sawFile = true;
      stream.on('data', (part: Buffer) => parts.push(part));
      stream.on('limit', () => fail(new AppError('payload_too_large', `The file is larger than ${sizeText(options.limitBytes)}`)));
    });
    parser.on('error', () => fail(new AppError('bad_request', 'The upload was cut off or is not valid multipart/form-data')));
    parser.on('close', () => {
      if (failed) return;
      if (!sawFile) return fail(new AppError('validation_failed', `Choose a file`, [{ path: fileField, message: 'Choose a file' }]));
      resolve({ file: Buffer.concat(parts), fields });
    });
    req.pipe(parser);
  });
}
