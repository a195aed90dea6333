import { z } from 'zod';
import { revisionSchema } from '../../../types/make-revision';

/** The shapes of makes as the API sends them. */
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

export { revisionSchema, revisionSummarySchema, type Revision, type RevisionSummary } from '../../../types/make-revision';

export const makeDetailSchema = makeSummarySchema.extend({ revision: revisionSchema });
export type MakeDetail = z.infer<typeof makeDetailSchema>;

export const makeResponseSchema = z.object({ make: makeDetailSchema });

/** True when the newest revision blends sizes, so every piece has one outline left to print. */
export function hasBlend(make: Pick<MakeDetail, 'revision'>): boolean {
  return make.revision.alterations.some((entry) => entry.enabled !== false && entry.op.op === 'blend');
}
