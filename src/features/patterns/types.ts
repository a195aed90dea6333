import { z } from 'zod';

/**
 * The pattern shapes the server sends. The geometry itself (`pattern` in a detail) is read
 * here as plain JSON; the review checks it with geometry's own parser.
 */
export const patternSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  owner: z.object({ id: z.string(), displayName: z.string() }),
  sourceFormat: z.string(),
  sourceName: z.string(),
  pieceCount: z.number(),
  sizes: z.array(z.string()),
  published: z.boolean(),
  publishedAt: z.string().nullable(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type PatternSummary = z.infer<typeof patternSummarySchema>;

export const patternDetailSchema = patternSummarySchema.extend({
  importNotes: z.array(z.string()),
  canEdit: z.boolean(),
  pattern: z.unknown(),
});
export type PatternDetail = z.infer<typeof patternDetailSchema>;

export const patternResponseSchema = z.object({ pattern: patternDetailSchema });

/** How each source format is named on screen. */
export const sourceFormatLabels: Record<string, string> = {
  svg: 'SVG',
  dxf: 'DXF (ASTM D6673)',
  json: 'Blockwright JSON',
  demo: 'Demo pattern',
};
