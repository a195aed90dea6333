/**
 * Notes between makes: after sewing, how the garment fit at each level and what to change next
 * time. "Sew it again" hands the earlier make's note to the planner, which turns each "too tight
 * / too loose by so much" into more or less ease there, and "too short / too long" into rise and
 * leg length.
 */
import { z } from 'zod';
import { FitInputError, describeZodError } from './body.ts';

/** Girth levels a note can speak of (the planner's levels). */
export const NOTE_GIRTH_LEVELS = ['waist', 'hip', 'thigh', 'knee', 'calf'] as const;
export type NoteGirthLevel = (typeof NOTE_GIRTH_LEVELS)[number];
/** Lengths a note can speak of: the rise (crotch depth) and the leg length. */
export const NOTE_LENGTHS = ['rise', 'length'] as const;
export type NoteLength = (typeof NOTE_LENGTHS)[number];

/** How much (mm) a note may say it was off by: more than this is a different garment, not a fit note. */
export const MAX_NOTE_AMOUNT = 200;

const amount = z
  .number({ error: 'must be a number of millimetres' })
  .min(0, 'give how much as a positive amount; the verdict says which way')
  .max(MAX_NOTE_AMOUNT, `must be ${MAX_NOTE_AMOUNT} mm or less`);

const girthVerdict = z.object({ verdict: z.enum(['tight', 'right', 'loose'], { error: 'must be tight, right or loose' }), amount: amount.optional() }).strict();
const lengthVerdict = z.object({ verdict: z.enum(['short', 'right', 'long'], { error: 'must be short, right or long' }), amount: amount.optional() }).strict();

export const fitNoteSchema = z
  .object({
    levels: z
      .object({
        ...(Object.fromEntries(NOTE_GIRTH_LEVELS.map((l) => [l, girthVerdict.optional()])) as Record<NoteGirthLevel, z.ZodOptional<typeof girthVerdict>>),
        ...(Object.fromEntries(NOTE_LENGTHS.map((l) => [l, lengthVerdict.optional()])) as Record<NoteLength, z.ZodOptional<typeof lengthVerdict>>),
      })
      .strict()
      .default({}),
    nextTime: z.string({ error: 'must be text' }).trim().max(2000, 'keep it to 2000 characters').default(''),
  })
  .strict();
export type FitNoteInput = z.input<typeof fitNoteSchema>;
export type FitNote = z.output<typeof fitNoteSchema>;

/** Validate a fit note; throws FitInputError naming the field. */
export function parseFitNote(input: unknown): FitNote {
  const r = fitNoteSchema.safeParse(input);
  if (!r.success) throw new FitInputError(describeZodError('fit note', r.error));
  return r.data;
}

/**
 * What a note asks of the next plan, in mm: + more girth (ease) or length, − less.
 * "right" and verdicts without an amount give 0 (and are listed in `unsized` so the plan can
 * say it could not act on them).
 */
export function noteCorrections(note: FitNote): { girth: Partial<Record<NoteGirthLevel, number>>; rise: number; length: number; unsized: string[] } {
  const girth: Partial<Record<NoteGirthLevel, number>> = {};
  const unsized: string[] = [];
  for (const level of NOTE_GIRTH_LEVELS) {
    const v = note.levels[level];
    if (!v || v.verdict === 'right') continue;
    if (v.amount === undefined || v.amount === 0) unsized.push(`${level} too ${v.verdict}`);
    else girth[level] = v.verdict === 'tight' ? v.amount : -v.amount;
  }
  const len = (k: NoteLength): number => {
    const v = note.levels[k];
    if (!v || v.verdict === 'right') return 0;
    if (v.amount === undefined || v.amount === 0) {
      unsized.push(`${k} too ${v.verdict}`);
      return 0;
    }
    return v.verdict === 'short' ? v.amount : -v.amount;
  };
  return { girth, rise: len('rise'), length: len('length'), unsized };
}
