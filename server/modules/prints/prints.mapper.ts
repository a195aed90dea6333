import type { PrintJobEntity } from './print-job.entity.ts';

export interface PrintJobDto {
  id: string;
  /** The make printed; null for a pattern sent as it is. */
  makeId: string | null;
  status: PrintJobEntity['status'];
  progress: number;
  format: 'pdf' | 'svg';
  title: string;
  options: Record<string, unknown>;
  fileSize: number | null;
  pageCount: number | null;
  emptyPages: string[] | null;
  error: string | null;
  createdAt: string;
  finishedAt: string | null;
  /** Where to download the file once `status` is `done`. */
  fileUrl: string | null;
}

export const toPrintJobDto = (p: PrintJobEntity): PrintJobDto => ({
  id: p.id,
  makeId: p.makeId,
  status: p.status,
  progress: p.progress,
  format: p.format,
  title: p.title,
  options: p.options,
  fileSize: p.fileSize,
  pageCount: p.pageCount,
  emptyPages: p.emptyPages,
  error: p.error,
  createdAt: p.createdAt.toISOString(),
  finishedAt: p.finishedAt?.toISOString() ?? null,
  fileUrl: p.status === 'done' ? `/api/prints/${p.id}/file` : null,
});
