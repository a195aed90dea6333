import { z } from 'zod';
import { sizeChartSchema } from '../../../geometry/index.ts';

export const patternNameSchema = z
  .string({ error: 'Enter a name for the pattern.' })
  .trim()
  .min(1, 'Enter a name for the pattern.')
  .max(120, 'Keep the name to 120 characters.');

/** The text fields sent with an upload (multipart). */
export const uploadFieldsSchema = z.object({ name: patternNameSchema.optional() });

export const listQuerySchema = z.object({
  scope: z.enum(['mine', 'library'], { error: 'scope must be "mine" or "library".' }).default('mine'),
});

/** A change to a pattern: its name, its labelled geometry (the review), whether it is in the shared library. */
export const updatePatternSchema = z
  .object({
    name: patternNameSchema.optional(),
    pattern: z.unknown().optional(),
    published: z.boolean({ error: 'published must be true or false.' }).optional(),
  })
  .strict()
  .refine((v) => v.name !== undefined || v.pattern !== undefined || v.published !== undefined, {
    message: 'Send a name, a pattern or published.',
  });

/** The pattern's printed size table (geometry/fit/chart.ts), replaced whole. */
export const putSizeChartSchema = z.object({ chart: sizeChartSchema }).strict();

/** Seam allowance (mm) to take off pieces that include it when measuring the pieces. */
export const sizeChartQuerySchema = z.object({
  seamAllowance: z.coerce.number({ error: 'seamAllowance must be a number of millimetres.' }).min(0, 'seamAllowance must be 0 mm or more.').max(100, 'seamAllowance must be 100 mm or less.').optional(),
});
