/**
 * Fit notes between makes: how the last one fitted at each level and what to change next time.
 * Pure: the form's text in the person's unit ↔ the note in millimetres (contract: FitNote).
 */
import { type LengthUnit, LengthParseError, MAX_NOTE_AMOUNT, formatLength, parseLength } from '../../../../geometry/index.ts';

export const GIRTH_NOTE_LEVELS = ['waist', 'hip', 'thigh', 'knee', 'calf'] as const;
export const LENGTH_NOTE_LEVELS = ['rise', 'length'] as const;
export type GirthNoteLevel = (typeof GIRTH_NOTE_LEVELS)[number];
export type LengthNoteLevel = (typeof LENGTH_NOTE_LEVELS)[number];
export type NoteLevel = GirthNoteLevel | LengthNoteLevel;
export const NOTE_LEVELS: readonly NoteLevel[] = [...GIRTH_NOTE_LEVELS, ...LENGTH_NOTE_LEVELS];

export type GirthVerdict = 'tight' | 'right' | 'loose';
export type LengthVerdict = 'short' | 'right' | 'long';
export type Verdict = GirthVerdict | LengthVerdict;

export interface FitNoteLevel {
  readonly verdict: Verdict;
  /** mm, ≥ 0; how far off (none for "right"). */
  readonly amount?: number;
}

/** Per level: girths tight/right/loose, rise and length short/right/long (contract #6 FitNote). */
export type FitNoteLevels = { [L in GirthNoteLevel]?: { verdict: GirthVerdict; amount?: number } } & { [L in LengthNoteLevel]?: { verdict: LengthVerdict; amount?: number } };

export interface FitNote {
  readonly levels: FitNoteLevels;
  readonly nextTime: string;
  readonly updatedAt?: string;
}

export const NEXT_TIME_MAX = 2000;

export const isGirthLevel = (level: NoteLevel): level is GirthNoteLevel => (GIRTH_NOTE_LEVELS as readonly string[]).includes(level);

export const LEVEL_LABELS: Record<NoteLevel, string> = { waist: 'Waist', hip: 'Hip', thigh: 'Thigh', knee: 'Knee', calf: 'Calf', rise: 'Rise', length: 'Leg length' };

/** The choices at a level, in the order shown. */
export const verdictsFor = (level: NoteLevel): readonly Verdict[] => (isGirthLevel(level) ? ['tight', 'right', 'loose'] : ['short', 'right', 'long']);

export const VERDICT_LABELS: Record<Verdict, string> = { tight: 'Too tight', loose: 'Too loose', short: 'Too short', long: 'Too long', right: 'Right' };

/** What the form holds: per level a verdict ('' = not said) and the amount as typed. */
export interface FitNoteDraft {
  readonly levels: Record<NoteLevel, { readonly verdict: Verdict | ''; readonly amount: string }>;
  readonly nextTime: string;
}

export function draftFromNote(note: FitNote | null | undefined, unit: LengthUnit): FitNoteDraft {
  const levels = Object.fromEntries(
    NOTE_LEVELS.map((level) => {
      const l = note?.levels[level];
      return [level, { verdict: l?.verdict ?? '', amount: l?.amount !== undefined && l.amount > 0 ? formatLength(l.amount, unit) : '' }];
    }),
  ) as FitNoteDraft['levels'];
  return { levels, nextTime: note?.nextTime ?? '' };
}

export type NoteRead = { note: { levels: FitNote['levels']; nextTime: string } } | { errors: Partial<Record<NoteLevel | 'nextTime', string>> };

/**
 * The note to send, or what is wrong with the form: an amount must be a length (in the person's
 * unit unless it names its own) of 0 or more; "right" takes no amount; a verdict for a girth
 * level must be tight/right/loose and for rise and length short/right/long.
 */
export function noteFromDraft(draft: FitNoteDraft, unit: LengthUnit): NoteRead {
  const errors: Partial<Record<NoteLevel | 'nextTime', string>> = {};
  const levels: Partial<Record<NoteLevel, FitNoteLevel>> = {}; // each verdict checked against verdictsFor(level)
  for (const level of NOTE_LEVELS) {
    const { verdict, amount } = draft.levels[level];
    if (verdict === '') {
      if (amount.trim() !== '') errors[level] = `Say whether the ${LEVEL_LABELS[level].toLowerCase()} was ${isGirthLevel(level) ? 'too tight or too loose' : 'too short or too long'} by that much.`;
      continue;
    }
    if (!verdictsFor(level).includes(verdict)) {
      errors[level] = `${VERDICT_LABELS[verdict]} does not apply to the ${LEVEL_LABELS[level].toLowerCase()}.`;
      continue;
    }
    if (verdict === 'right' || amount.trim() === '') {
      levels[level] = { verdict };
      continue;
    }
    try {
      const mm = parseLength(amount, unit);
      if (mm < 0) errors[level] = 'Give how much as a length without a sign: the choice says which way.';
      else if (mm > MAX_NOTE_AMOUNT) errors[level] = `At most ${formatLength(MAX_NOTE_AMOUNT, unit)}: more than that is a different garment, not a fit note.`;
      else levels[level] = mm === 0 ? { verdict } : { verdict, amount: mm };
    } catch (e) {
      if (e instanceof LengthParseError) errors[level] = e.message;
      else throw e;
    }
  }
  const nextTime = draft.nextTime.trim();
  if (nextTime.length > NEXT_TIME_MAX) errors.nextTime = `Keep it to ${NEXT_TIME_MAX} characters (now ${nextTime.length}).`;
  if (Object.keys(errors).length > 0) return { errors };
  return { note: { levels: levels as FitNoteLevels, nextTime } };
}

/** One line per level said, in the person's unit: `Waist: too tight by 1/2 in`. */
export function describeFitNote(note: FitNote, unit: LengthUnit): string[] {
  return NOTE_LEVELS.flatMap((level) => {
    const l = note.levels[level];
    if (!l) return [];
    const verdict = VERDICT_LABELS[l.verdict].toLowerCase();
    return [`${LEVEL_LABELS[level]}: ${verdict}${l.verdict !== 'right' && l.amount !== undefined && l.amount > 0 ? ` by ${formatLength(l.amount, unit)}` : ''}`];
  });
}

/** Whether a note says anything at all. */
export const noteIsEmpty = (note: FitNote): boolean => Object.keys(note.levels).length === 0 && note.nextTime.trim() === '';

/** Whether the previous make's note changed a plan step or level (the planner flags it: `fromNote`). */
export function fromPreviousNote(step: { readonly fromNote?: unknown }): boolean {
  return step.fromNote !== undefined && step.fromNote !== false;
}
