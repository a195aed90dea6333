import { z } from 'zod';
import type { AlterationEntry } from '../../../../geometry/make';

/**
 * The shapes of makes as the API sends them. Alterations are checked only for their frame (an
 * id, the on/off switch and an `op` name); the geometry engine checks the rest where it replays them.
 */
const alterationEntrySchema = z.custom<AlterationEntry>(
  (value) =>
    typeof value === 'object' &&
    value !== null &&
    typeof (value as { id?: unknown }).id === 'string' &&
    typeof (value as { op?: { op?: unknown } }).op?.op === 'string',
  'An alteration the page does not understand.',
);

export const makeSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  pattern: z.object({ id: z.string(), name: z.string() }),
  profile: z.object({ id: z.string(), name: z.string() }).nullable(),
  fabricNote: z.string(),
  sourceMakeId: z.string().nullable(),
  latestRevision: z.number(),
  alterationCount: z.number(),
  archived: z.boolean(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type MakeSummary = z.infer<typeof makeSummarySchema>;

export const revisionSummarySchema = z.object({
  number: z.number(),
  summary: z.string(),
  author: z.object({ id: z.string(), displayName: z.string() }).nullable(),
  restoredFrom: z.number().nullable(),
  alterationCount: z.number(),
  createdAt: z.string(),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

export const revisionSchema = revisionSummarySchema.extend({
  alterations: z.array(alterationEntrySchema),
});
export type Revision = z.infer<typeof revisionSchema>;

export const makeDetailSchema = makeSummarySchema.extend({ revision: revisionSchema });
export type MakeDetail = z.infer<typeof makeDetailSchema>;

export const makeResponseSchema = z.object({ make: makeDetailSchema });

/** True when the newest revision blends sizes, so every piece has one outline left to print. */
export function hasBlend(make: Pick<MakeDetail, 'revision'>): boolean {
  return make.revision.alterations.some((entry) => entry.enabled !== false && entry.op.op === 'blend');
}
