/**
 * The profiles screen's pure logic: typed lengths read into millimetres, the measurement form
 * and its girths at heights turned into the API's shapes (with a message per field), dates,
 * and the history of dated sets with the change from one set to the one before it.
 * No React here, so tests/client/profiles-model.test.ts can check it directly.
 */
import { formatLength, type LengthUnit } from '../../../geometry/units';
import { MAX_LENGTH_MM, readLength } from '../../lib/read-length';
import { MEASUREMENT_NAMES, type MeasurementName, type Measurements } from '../../types/measurement-names';

export type FieldErrors = Record<string, string>;

/** The API keeps body measurements up to 3 m (geometry/fit/body.ts). */
export const MAX_MEASUREMENT_MM = MAX_LENGTH_MM;
/** Girths at heights are taken within 400 mm of the natural waist (geometry/fit/body.ts). */
export const MAX_HEIGHT_OFFSET_MM = 400;
/** The API keeps at most this many girths at heights per set. */
export const MAX_GIRTHS_AT_HEIGHTS = 40;
/** A note on a dated set is at most this long (the API keeps up to 500 characters). */
export const MAX_NOTE_LENGTH = 500;

export { readLength };

// ---------------------------------------------------------------------------------------------
// Dates

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** `YYYY-MM-DD` of `now` in the person's own time zone (a date input's value). */
export function todayIso(now: Date = new Date()): string {
  const pad = (n: number) => String(n).padStart(2, '0');
  return `${now.getFullYear()}-${pad(now.getMonth() + 1)}-${pad(now.getDate())}`;
}

/** True for a real calendar date written `YYYY-MM-DD` (2026-02-30 is not one). */
export function isIsoDate(text: string): boolean {
  const match = ISO_DATE.exec(text);
  if (!match) return false;
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const date = new Date(Date.UTC(year, month - 1, day));
  return date.getUTCFullYear() === year && date.getUTCMonth() === month - 1 && date.getUTCDate() === day;
}

/** A `YYYY-MM-DD` date for people to read, without a time zone shifting it a day. */
export function formatTakenOn(iso: string, locale?: string): string {
  if (!isIsoDate(iso)) return iso;
  const [year, month, day] = iso.split('-').map(Number) as [number, number, number];
  return new Intl.DateTimeFormat(locale, { dateStyle: 'medium', timeZone: 'UTC' }).format(new Date(Date.UTC(year, month - 1, day)));
}

// ---------------------------------------------------------------------------------------------
// The measurement form

export type GirthAtHeight = { offset: number; girth: number };

/** One row of girths at heights as typed: a distance above or below the waist, and the girth there. */
export type GirthRowDraft = { side: 'above' | 'below'; distance: string; girth: string };

export type MeasurementsDraft = {
  measurements: Partial<Record<MeasurementName, string>>;
  girthRows: GirthRowDraft[];
  takenOn: string;
  note: string;
};

/** The values a draft was made from, so unchanged text keeps its exact millimetres. */
export type DraftOrigin = { measurements: Measurements; girthsAtHeights: readonly GirthAtHeight[] };

/** A form to take measurements again, filled with the current set in `unit` (dated today). */
export function draftFrom(current: DraftOrigin | null, unit: LengthUnit, today = todayIso()): MeasurementsDraft {
  const measurements: Partial<Record<MeasurementName, string>> = {};
  for (const name of MEASUREMENT_NAMES) {
    const mm = current?.measurements[name];
    if (mm !== undefined) measurements[name] = formatLength(mm, unit);
  }
  const girthRows = [...(current?.girthsAtHeights ?? [])]
    .sort((a, b) => b.offset - a.offset)
    .map((g): GirthRowDraft => ({
      side: g.offset > 0 ? 'above' : 'below',
      distance: formatLength(Math.abs(g.offset), unit),
      girth: formatLength(g.girth, unit),
    }));
  return { measurements, girthRows, takenOn: today, note: '' };
}

export type DatedSetInput = {
  measurements: Measurements;
  girthsAtHeights: GirthAtHeight[];
  takenOn: string;
  note?: string;
};

/**
 * Read a measurement form into the API's shape, or the problems keyed as the API names its
 * fields (`measurements.waistGirth`, `girthsAtHeights.0.offset`, `takenOn`, `note`), so the
 * client's and the server's messages land beside the same fields. Empty rows are left out;
 * `rowOfSent[i]` is the form row of the i-th girth sent (for the server's `girthsAtHeights.<i>`).
 */
export function readDraft(
  draft: MeasurementsDraft,
  unit: LengthUnit,
  origin: DraftOrigin | null = null,
  today = todayIso(),
): { value: DatedSetInput; rowOfSent: number[] } | { errors: FieldErrors } {
  const errors: FieldErrors = {};
  const measurements: Measurements = {};
  for (const name of MEASUREMENT_NAMES) {
    const read = readLength(draft.measurements[name] ?? '', unit, { keepMm: origin?.measurements[name] });
    if ('error' in read) errors[`measurements.${name}`] = read.error;
    else if (read.mm !== undefined) measurements[name] = read.mm;
  }

  const girthsAtHeights: GirthAtHeight[] = [];
  const rowOfSent: number[] = [];
  const seen = new Set<number>();
  draft.girthRows.forEach((row, index) => {
    if (row.distance.trim() === '' && row.girth.trim() === '') return;
    const key = (field: string) => `girthsAtHeights.${index}.${field}`;
    const sign = row.side === 'above' ? 1 : -1;
    const keepOffset = origin?.girthsAtHeights.find((g) => Math.sign(g.offset) === sign && formatLength(Math.abs(g.offset), unit) === row.distance.trim());
    const distance = readLength(row.distance, unit, { max: MAX_HEIGHT_OFFSET_MM, keepMm: keepOffset ? Math.abs(keepOffset.offset) : undefined });
    const girth = readLength(row.girth, unit, { keepMm: keepOffset?.girth });
    let ok = true;
    if ('error' in distance) {
      errors[key('offset')] = distance.error.startsWith('That is over')
        ? `Keep within ${formatLength(MAX_HEIGHT_OFFSET_MM, unit)} of the waist.`
        : distance.error;
      ok = false;
    } else if (distance.mm === undefined) {
      errors[key('offset')] = 'How far above or below the waist?';
      ok = false;
    }
    if ('error' in girth) {
      errors[key('girth')] = girth.error;
      ok = false;
    } else if (girth.mm === undefined) {
      errors[key('girth')] = 'Enter the girth at this height.';
      ok = false;
    }
    if (!ok || !('mm' in distance) || !('mm' in girth) || distance.mm === undefined || girth.mm === undefined) return;
    const offset = sign * distance.mm;
    const rounded = Math.round(offset * 1000);
    if (seen.has(rounded)) {
      errors[key('offset')] = 'This height is given twice.';
      return;
    }
    seen.add(rounded);
    girthsAtHeights.push({ offset, girth: girth.mm });
    rowOfSent.push(index);
  });
  if (girthsAtHeights.length > MAX_GIRTHS_AT_HEIGHTS) errors.girthsAtHeights = `Keep to ${MAX_GIRTHS_AT_HEIGHTS} heights.`;

  if (!isIsoDate(draft.takenOn)) errors.takenOn = 'Enter the date you measured.';
  else if (draft.takenOn > today) errors.takenOn = 'The date is in the future: enter the day you measured.';
  const note = draft.note.trim();
  if (note.length > MAX_NOTE_LENGTH) errors.note = `Keep the note to ${MAX_NOTE_LENGTH} characters.`;

  if (Object.keys(errors).length > 0) return { errors };
  return { value: { measurements, girthsAtHeights, takenOn: draft.takenOn, ...(note ? { note } : {}) }, rowOfSent };
}

/** The server's field keys for girths (`girthsAtHeights.<sent index>…`) renamed to the form's rows. */
export function fieldsForRows(fields: FieldErrors, rowOfSent: readonly number[]): FieldErrors {
  return Object.fromEntries(
    Object.entries(fields).map(([key, message]) => {
      const match = /^girthsAtHeights\.(\d+)(\..*)?$/.exec(key);
      const row = match ? rowOfSent[Number(match[1])] : undefined;
      return [match && row !== undefined ? `girthsAtHeights.${row}${match[2] ?? ''}` : key, message];
    }),
  );
}

// ---------------------------------------------------------------------------------------------
// History

export type DatedSet = {
  id: string;
  takenOn: string;
  measurements: Measurements;
  girthsAtHeights: readonly GirthAtHeight[];
  note: string | null;
  createdAt: string;
};

/** One cell of the history table: the value in that set and its change from the set before. */
export type HistoryCell = {
  value: number | undefined;
  /** value − the same measurement in the next older set; undefined when either is missing. */
  change: number | undefined;
};

export type HistoryRow =
  | { kind: 'measurement'; name: MeasurementName; cells: HistoryCell[] }
  | { kind: 'height'; offset: number; cells: HistoryCell[] };

/** Differences smaller than this (mm) are float noise from unit conversions, not a change. */
export const CHANGE_EPSILON_MM = 1e-6;

/**
 * The history as a table: one column per dated set (newest first, as given), one row per
 * measurement any set has (in the ISO list's order), then one per height (highest first).
 * Each cell carries the change from the next older set that has a value in the column after it.
 */
export function historyTable(sets: readonly DatedSet[]): HistoryRow[] {
  const cellsFor = (valueOf: (set: DatedSet) => number | undefined): HistoryCell[] =>
    sets.map((set, i) => {
      const value = valueOf(set);
      const older = sets[i + 1];
      const previous = older ? valueOf(older) : undefined;
      let change = value !== undefined && previous !== undefined ? value - previous : undefined;
      if (change !== undefined && Math.abs(change) < CHANGE_EPSILON_MM) change = 0;
      return { value, change };
    });

  const rows: HistoryRow[] = [];
  for (const name of MEASUREMENT_NAMES) {
    if (!sets.some((set) => set.measurements[name] !== undefined)) continue;
    rows.push({ kind: 'measurement', name, cells: cellsFor((set) => set.measurements[name]) });
  }
  const offsets = [...new Set(sets.flatMap((set) => set.girthsAtHeights.map((g) => g.offset)))].sort((a, b) => b - a);
  for (const offset of offsets) {
    rows.push({
      kind: 'height',
      offset,
      cells: cellsFor((set) => set.girthsAtHeights.find((g) => Math.abs(g.offset - offset) < CHANGE_EPSILON_MM)?.girth),
    });
  }
  return rows;
}

/** "2 in above the waist" / "5 cm below the waist". */
export function heightLabel(offset: number, unit: LengthUnit): string {
  return `${formatLength(Math.abs(offset), unit)} ${offset > 0 ? 'above' : 'below'} the waist`;
}

/** A change for the table: "+1/2 in", "−1 cm", "no change", or null when there is nothing to compare. */
export function changeText(change: number | undefined, unit: LengthUnit): string | null {
  if (change === undefined) return null;
  const text = formatLength(change, unit, { signed: true });
  if (text === `0 ${unit}`) return 'no change';
  return text.replace(/^-/, '−');
}
