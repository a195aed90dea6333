import { z } from 'zod';
import type { AlterationEntry } from '../../geometry/index.ts';

/**
 * A make's revision as the server sends it, read by the makes list and the workspace.
 * Alterations are checked only for their frame (an id and an `op` name): the engine checks the
 * rest where it replays them, and its operation schemas stay out of the pages that only list makes.
 */
const alterationEntrySchema = z.custom<AlterationEntry>(
  (value) =>
    typeof value === 'object' &&
    value !== null &&
    typeof (value as { id?: unknown }).id === 'string' &&
    typeof (value as { op?: { op?: unknown } }).op?.op === 'string',
  'An alteration the page does not understand.',
);

export const revisionSummarySchema = z.object({
  number: z.number(),
  summary: z.string(),
  author: z.object({ id: z.string(), displayName: z.string() }).nullable(),
  restoredFrom: z.number().nullable(),
  alterationCount: z.number(),
  createdAt: z.string(),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

export const revisionSchema = revisionSummarySchema.extend({ alterations: z.array(alterationEntrySchema) });
export type Revision = z.infer<typeof revisionSchema>;
