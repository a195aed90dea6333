/**
 * Uploaded files are read in a worker thread, one at a time, with a time and a memory limit.
 * The importers check what they read (sizes, counts, structure), but they hand DXF text to a
 * third-party parser; if a file still makes a parser loop or allocate without end, the worker is
 * stopped and replaced, the upload is refused (422), and the server goes on serving.
 */
import { Worker } from 'node:worker_threads';
import { AppError } from '../../errors/app-error.ts';
import type { ImportReply, ImportRequest } from './import-job.ts';
import type { ImportedUpload, UploadedFile } from './import-upload.ts';

export interface ImportLimits {
  /** How long one file may take to read (ms). */
  readonly timeoutMs: number;
  /** The worker's heap (MB): a file that needs more is refused. */
  readonly maxHeapMb: number;
}

/** A 5 MB pattern file reads in well under a second; twenty is a file that will not finish. */
export const DEFAULT_IMPORT_LIMITS: ImportLimits = { timeoutMs: 20_000, maxHeapMb: 512 };

const tooSlow = (limits: ImportLimits) =>
  new AppError('unprocessable', `The file could not be read within ${limits.timeoutMs / 1000} s: it may be damaged. Nothing was imported.`, 422, { file: 'took too long to read' });
const tooBig = () => new AppError('unprocessable', 'The file needs more memory to read than a pattern should: it may be damaged. Nothing was imported.', 422, { file: 'needs too much memory to read' });

export class ImportRunner {
  private worker: Worker | undefined;
  private queue: Promise<unknown> = Promise.resolve();

  constructor(private readonly limits: ImportLimits = DEFAULT_IMPORT_LIMITS) {}

  /** Read one file (after those already waiting); rejects with the importer's AppError or a limit's. */
  run(file: UploadedFile): Promise<ImportedUpload> {
    const task = this.queue.then(() => this.runNow(file));
    this.queue = task.catch(() => undefined);
    return task;
  }

  private spawn(): Worker {
    const worker = new Worker(new URL('./import-worker.mjs', import.meta.url), { resourceLimits: { maxOldGenerationSizeMb: this.limits.maxHeapMb } });
    // an idle worker does not keep the process alive
    worker.unref();
    return worker;
  }

  private stop(worker: Worker): void {
    if (this.worker === worker) this.worker = undefined;
    void worker.terminate();
  }

  private runNow(file: UploadedFile): Promise<ImportedUpload> {
    const worker = (this.worker ??= this.spawn());
    return new Promise<ImportedUpload>((resolve, reject) => {
      const done = () => {
        clearTimeout(timer);
        worker.off('message', onMessage);
        worker.off('error', onError);
        worker.off('exit', onExit);
      };
      const onMessage = (reply: ImportReply) => {
        done();
        if ('ok' in reply) resolve(reply.ok);
        else if ('refused' in reply) reject(new AppError(reply.refused.code, reply.refused.message, reply.refused.status, reply.refused.fields));
        else reject(new Error(`the import worker failed: ${reply.failed}`));
      };
      const onError = (error: Error & { code?: string }) => {
        done();
        this.stop(worker);
        reject(error.code === 'ERR_WORKER_OUT_OF_MEMORY' ? tooBig() : error);
      };
      const onExit = (code: number) => {
        done();
        if (this.worker === worker) this.worker = undefined;
        reject(new Error(`the import worker stopped (exit code ${code})`));
      };
      const timer = setTimeout(() => {
        done();
        this.stop(worker);
        reject(tooSlow(this.limits));
      }, this.limits.timeoutMs);
      worker.on('message', onMessage);
      worker.on('error', onError);
      worker.on('exit', onExit);
      const request: ImportRequest = { originalname: file.originalname, bytes: file.buffer };
      worker.postMessage(request);
    });
  }
}
