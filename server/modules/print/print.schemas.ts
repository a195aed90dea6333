import { z } from 'zod';
import { DEFAULT_MARGIN, PAPER_IDS } from '../../../geometry/index.ts';

/** Print options as a request or the command line gives them (lengths in mm). */
export const printOptionsSchema = z
  .object({
    format: z.enum(['pdf', 'svg']).default('pdf'),
    paper: z.enum(PAPER_IDS).default('letter'),
    orientation: z.enum(['auto', 'portrait', 'landscape']).default('auto'),
    margin: z.number().min(0, 'must be 0 mm or more').max(50, 'must be 50 mm or less').default(DEFAULT_MARGIN),
    overlap: z.number().min(0, 'must be 0 mm or more').max(60, 'must be 60 mm or less').default(0),
    allowRotate90: z.boolean().default(false),
    /** The size to print when the pieces still have several size lines (else blend first). */
    size: z.string().trim().min(1).max(60).optional(),
    spacing: z.number().min(0).max(100).default(10),
    /** Make or pattern name on every label; defaults to the pattern's name. */
    title: z.string().trim().min(1).max(80).optional(),
    /** Date printed on labels (YYYY-MM-DD); defaults to today. */
    date: z.string().regex(/^\d{4}-\d{2}-\d{2}$/, 'must be YYYY-MM-DD').optional(),
  })
  .strict();
export type PrintRequest = z.infer<typeof printOptionsSchema>;
export type PrintRequestInput = z.input<typeof printOptionsSchema>;
