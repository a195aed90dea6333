import { z } from 'zod';

export { revisionSchema, revisionSummarySchema, type Revision, type RevisionSummary } from '../../../types/make-revision';
import { revisionSchema } from '../../../types/make-revision';

export const workspaceMakeSchema = z.object({
  id: z.string(),
  name: z.string(),
  pattern: z.object({ id: z.string(), name: z.string() }),
  profile: z.object({ id: z.string(), name: z.string() }).nullable(),
  fabricNote: z.string(),
  latestRevision: z.number(),
  archived: z.boolean(),
  revision: revisionSchema,
});
export type WorkspaceMake = z.infer<typeof workspaceMakeSchema>;
