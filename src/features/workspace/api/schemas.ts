import { z } from 'zod';
import { type AlterationEntry, alterationEntrySchema } from '../../../../geometry/index.ts';

/** Entries are validated on arrival and kept as the server sent them (the input shape). */
const entriesSchema = z.array(z.unknown()).transform((list, ctx) => {
  for (const [i, raw] of list.entries()) {
    const r = alterationEntrySchema.safeParse(raw);
    if (!r.success) ctx.addIssue({ code: 'custom', path: [i], message: r.error.issues[0]?.message ?? 'not an alteration' });
  }
  return list as AlterationEntry[];
});

export const revisionSummarySchema = z.object({
  number: z.number(),
  summary: z.string(),
  author: z.object({ id: z.string(), displayName: z.string() }).nullable(),
  restoredFrom: z.number().nullable(),
  alterationCount: z.number(),
  createdAt: z.string(),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

export const revisionSchema = revisionSummarySchema.extend({ alterations: entriesSchema });
export type Revision = z.infer<typeof revisionSchema>;

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
