/**
 * The import worker's side (started by import-worker.mjs): reads each file it is sent with
 * `importUpload` and answers with the pattern or the refusal. See import-runner.ts.
 */
import { parentPort } from 'node:worker_threads';
import { AppError } from '../../errors/app-error.ts';
import { type ImportedUpload, importUpload } from './import-upload.ts';

export interface ImportRequest {
  readonly originalname: string;
  readonly bytes: Uint8Array;
}

export type ImportReply =
  | { readonly ok: ImportedUpload }
  | { readonly refused: { readonly code: AppError['code']; readonly message: string; readonly status: number; readonly fields?: AppError['fields'] } }
  | { readonly failed: string };

const port = parentPort;
if (!port) throw new Error('import-job.ts runs in a worker thread');
port.on('message', (request: ImportRequest) => {
  let reply: ImportReply;
  try {
    reply = { ok: importUpload({ originalname: request.originalname, buffer: Buffer.from(request.bytes.buffer, request.bytes.byteOffset, request.bytes.byteLength) }) };
  } catch (e) {
    reply = e instanceof AppError ? { refused: { code: e.code, message: e.message, status: e.status, ...(e.fields ? { fields: e.fields } : {}) } } : { failed: e instanceof Error ? (e.stack ?? e.message) : String(e) };
  }
  port.postMessage(reply);
});
