import { z } from 'zod';

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
