/**
 * A make's alteration list: the ordered operations a person applied, each with a stable id (so
 * the list can be reordered, switched off and edited) and an on/off switch. Replaying the list
 * applies the operations that are on, in order, to the pattern the make started from.
 */
import { z } from 'zod';
import type { Pattern } from './model.ts';
import { type AppliedCaution, alterationOpSchema, applyOps } from './ops/apply.ts';
import { AlterationError } from './ops/common.ts';

/** Most alterations one make may hold (a real make has a handful; this bounds a hostile request). */
export const MAX_ALTERATIONS = 200;

export const alterationEntrySchema = z.object({
  /** Chosen by whoever adds the entry (a UUID in the app); unique within the list. */
  id: z.string().trim().min(1).max(64),
  /** Off entries stay in the list and are skipped in the replay. */
  enabled: z.boolean().default(true),
  op: alterationOpSchema,
});
export type AlterationEntry = z.input<typeof alterationEntrySchema>;

export const alterationEntriesSchema = z
  .array(alterationEntrySchema)
  .max(MAX_ALTERATIONS, `a make holds at most ${MAX_ALTERATIONS} alterations`)
  .superRefine((entries, ctx) => {
    const seen = new Set<string>();
    entries.forEach((entry, i) => {
      if (seen.has(entry.id)) ctx.addIssue({ code: 'custom', path: [i, 'id'], message: `alteration id "${entry.id}" is used twice` });
      seen.add(entry.id);
    });
  });

/** Where in the list the replay stopped, and why. */
export class AlterationListError extends Error {
  override readonly name = 'AlterationListError';
  constructor(
    /** Position in the whole list (switched-off entries counted), 0-based. */
    readonly index: number,
    readonly id: string,
    message: string,
  ) {
    super(message);
  }
}

export interface ReplayResult {
  readonly pattern: Pattern;
  /** Cautions with `op` as the position in the whole list. */
  readonly cautions: readonly AppliedCaution[];
}

/**
 * Apply the switched-on entries in order. Throws AlterationListError naming the first entry that
 * is refused (its message says why); nothing is half-applied.
 */
export function replayAlterations(pattern: Pattern, entries: readonly AlterationEntry[]): ReplayResult {
  const on = entries.map((e, index) => ({ e, index })).filter(({ e }) => e.enabled !== false);
  try {
    // One replay for the whole list: path text is printed once, at the end (see applyOps).
    const r = applyOps(pattern, on.map(({ e }) => e.op));
    return { pattern: r.pattern, cautions: r.cautions.map((c) => ({ ...c, op: on[c.op]!.index })) };
  } catch (error) {
    if (!(error instanceof AlterationError)) throw error;
  }
  // Refused somewhere: replay entry by entry to name the one refused, with its own message.
  let current = pattern;
  for (const { e, index } of on) {
    try {
      current = applyOps(current, [e.op]).pattern;
    } catch (error) {
      if (error instanceof AlterationError)
        throw new AlterationListError(index, e.id, `alteration ${index + 1} (${e.op.op}): ${error.message.replace(/^operation 1 \([^)]*\): /, '')}`);
      throw error;
    }
  }
  // Unreachable while operations are deterministic: the whole list was refused, so one entry is.
  throw new AlterationListError(on.length - 1, on[on.length - 1]?.e.id ?? '', 'the alterations were refused');
}
