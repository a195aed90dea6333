import { z } from 'zod';
import { PAPER_IDS } from '../../../../geometry/print/paper';

export const printStatusSchema = z.enum(['queued', 'running', 'done', 'failed']);
export type PrintStatus = z.infer<typeof printStatusSchema>;

export const printJobSchema = z.object({
  id: z.string(),
  /** The make printed; null for a pattern sent as it is. */
  makeId: z.string().nullable(),
  status: printStatusSchema,
  progress: z.number(),
  format: z.enum(['pdf', 'svg']),
  title: z.string(),
  /** The options as they were asked for (lengths in mm). */
  options: z.record(z.string(), z.unknown()),
  fileSize: z.number().nullable(),
  pageCount: z.number().nullable(),
  emptyPages: z.array(z.string()).nullable(),
  error: z.string().nullable(),
  createdAt: z.string(),
  finishedAt: z.string().nullable(),
  fileUrl: z.string().nullable(),
});
export type PrintJob = z.infer<typeof printJobSchema>;

export const printResponseSchema = z.object({ print: printJobSchema });

/** Options a print request may carry; lengths in millimetres (the API's unit). */
export type PrintOptions = {
  format: 'pdf' | 'svg';
  paper: (typeof PAPER_IDS)[number];
  orientation: 'auto' | 'portrait' | 'landscape';
  margin: number;
  overlap: number;
  allowRotate90: boolean;
  /** The size to print while pieces still have several size lines; absent after a blend. */
  size?: string;
  title?: string;
  /** YYYY-MM-DD, printed on the labels; the server's today when absent. */
  date?: string;
};

export const isWorking = (status: PrintStatus) => status === 'queued' || status === 'running';
