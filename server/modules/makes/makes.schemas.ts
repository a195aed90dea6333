import { z } from 'zod';
import { alterationEntriesSchema, fitNoteSchema } from '../../../geometry/index.ts';

export const makeNameSchema = z
  .string({ error: 'Enter a name for the make.' })
  .trim()
  .min(1, 'Enter a name for the make.')
  .max(120, 'Keep the name to 120 characters.');
const fabricNoteSchema = z.string({ error: 'The fabric note must be text.' }).trim().max(2000, 'Keep the fabric note to 2000 characters.');
const optionalId = z.uuid({ error: 'Not a valid id.' }).nullable();

export const createMakeSchema = z
  .object({
    name: makeNameSchema,
    patternId: z.uuid({ error: 'Choose a pattern.' }),
    profileId: optionalId.default(null),
    fabricNote: fabricNoteSchema.default(''),
  })
  .strict();

export const updateMakeSchema = z
  .object({
    name: makeNameSchema.optional(),
    profileId: optionalId.optional(),
    fabricNote: fabricNoteSchema.optional(),
    fabricId: optionalId.optional(),
    archived: z.boolean({ error: 'archived must be true or false.' }).optional(),
  })
  .strict()
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: 'Send at least one change.' });

export const duplicateMakeSchema = z.object({ name: makeNameSchema.optional() }).strict();

export const listMakesQuerySchema = z.object({
  archived: z.enum(['true', 'false'], { error: 'archived must be "true" or "false".' }).default('false').transform((v) => v === 'true'),
});

export const saveRevisionSchema = z
  .object({
    /** The revision the change was made on: the save is refused (409) unless it is still the newest. */
    baseRevision: z.number({ error: 'baseRevision must be a revision number.' }).int().min(0),
    alterations: alterationEntriesSchema,
    summary: z.string().trim().min(1, 'Say in a few words what changed.').max(300, 'Keep the summary to 300 characters.'),
    /** When the change restores an earlier revision: its number. */
    restoredFrom: z.number().int().min(1).optional(),
  })
  .strict();

export const revisionParamsSchema = z.object({
  id: z.uuid({ error: 'Not a valid id.' }),
  number: z.coerce.number({ error: 'Not a revision number.' }).int('Not a revision number.').min(1, 'Not a revision number.'),
});

/** Fabric and planner options (geometry/fit checks them in detail). */
export const planRequestSchema = z
  .object({
    fabric: z.record(z.string(), z.unknown()).optional(),
    /** One of the person's kept fabrics, in place of `fabric`. */
    fabricId: z.uuid({ error: 'Not a valid fabric id.' }).optional(),
    options: z.record(z.string(), z.unknown()).default({}),
    /** The pattern's printed size table, or the finished measurements measured on its pieces. */
    chart: z.enum(['printed', 'measured'], { error: 'chart must be "printed" or "measured".' }).optional(),
  })
  .strict()
  .refine((v) => v.fabric === undefined || v.fabricId === undefined, { message: 'Send fabric or fabricId, not both.', path: ['fabricId'] });

/** How the make fit at each level and what to change next time (geometry/fit/notes.ts). */
export const fitNoteRequestSchema = fitNoteSchema;
