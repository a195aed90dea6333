/**
 * Lengths at the edges: what people type and read (inches with fractions, or centimetres)
 * to and from the millimetres used everywhere inside.
 *
 * 1 in = 25.4 mm exactly (the international inch, international yard and pound agreement
 * of 1959); 1 cm = 10 mm.
 *
 * Reading (`parseLength`): an optional sign, a number, an optional unit.
 * - numbers: `2`, `2.5`, `.5`, `6,35` (a comma is a decimal separator; thousands separators
 *   are not accepted), `1/4`, `2 1/2`, `2-1/2` (a mixed number's fraction must be proper);
 * - units: `in`, `inch`, `inches`, `"`, `″`, `cm`, `mm` (any case); none = the chosen unit;
 * - sign: `-`, `−` (U+2212) or `+`, spaces allowed after it: `- 1 1/2 in`.
 * Anything else throws `LengthParseError` saying what was expected.
 *
 * Writing (`formatLength`, `formatLengthParts`): inches to the nearest 1/16 as a mixed number in
 * lowest terms (`2 1/2 in`, `1/16 in`, `-3 in`, `0 in`); centimetres to the nearest 0.1
 * (`6.4 cm`, `5 cm`). `exact` tells whether the rounding hid a difference (more than
 * `POINT_EPSILON`). Halves round away from zero, so a length and its negative read alike.
 */
import { MM_PER_INCH } from './print/paper.ts';
import { POINT_EPSILON } from './tolerance.ts';

export type LengthUnit = 'in' | 'cm';

export const LENGTH_UNITS: readonly LengthUnit[] = ['in', 'cm'];

export const MM_PER_CM = 10;

/** Inches are shown to the nearest 1/INCH_DENOMINATOR in. */
export const INCH_DENOMINATOR = 16;

/** Longer typed lengths (100 m) are refused as typing errors: no pattern piece is that long. */
export const MAX_TYPED_LENGTH_MM = 100_000;

/** Thrown for text that is not a length. `input` is the text as given. */
export class LengthParseError extends Error {
  override readonly name = 'LengthParseError';
  constructor(
    message: string,
    readonly input: string,
  ) {
    super(message);
  }
}

const MM_PER_UNIT: Record<LengthUnit | 'mm', number> = { in: MM_PER_INCH, cm: MM_PER_CM, mm: 1 };

const UNIT_WORDS: Record<string, LengthUnit | 'mm'> = {
  in: 'in',
  inch: 'in',
  inches: 'in',
  '"': 'in',
  '″': 'in',
  cm: 'cm',
  mm: 'mm',
};

// sign, then one of: whole + proper fraction | fraction | decimal; then an optional unit word.
const LENGTH_RE =
  /^([-+−])?\s*(?:(\d+)(?:\s+|\s*-\s*)(\d+)\s*\/\s*(\d+)|(\d+)\s*\/\s*(\d+)|(\d+(?:[.,]\d+)?|[.,]\d+))\s*([a-z]+|"|″)?$/i;

function quote(text: string): string {
  const t = text.length > 40 ? `${text.slice(0, 40)}…` : text;
  return `"${t}"`;
}

const EXPECTED = 'expected a length such as 2 1/2, 2.5, 2.5 in, 6.35 cm or 63.5 mm';

/**
 * Read a typed length and return millimetres. A number without a unit is in `unit`.
 * Throws LengthParseError (with the reason) for empty text, a zero denominator, an improper
 * fraction in a mixed number, an unknown or repeated unit, a non-finite value, or a length
 * over 100 m.
 */
export function parseLength(text: string, unit: LengthUnit): number {
  const t = text.trim();
  if (t === '') throw new LengthParseError(`no length given: ${EXPECTED}`, text);
  const m = LENGTH_RE.exec(t);
  if (!m && /\d\s*(?:[a-z]+|"|″)\s+(?:[a-z]+|"|″)$/i.test(t)) throw new LengthParseError(`${quote(t)} gives more than one unit: use one of in, cm or mm`, text);
  if (!m) throw new LengthParseError(`${quote(t)} is not a length: ${EXPECTED}`, text);
  const [, sign, whole, num, den, fNum, fDen, decimal, unitWord] = m;
  let value: number;
  if (whole !== undefined) {
    const n = Number(num);
    const d = Number(den);
    if (d === 0) throw new LengthParseError(`${quote(t)}: a fraction cannot have 0 below the line`, text);
    if (n >= d) throw new LengthParseError(`${quote(t)}: in a mixed number the fraction must be less than 1 (write ${whole} and ${num}/${den} as ${Number(whole) + n / d})`, text);
    value = Number(whole) + n / d;
  } else if (fNum !== undefined) {
    const d = Number(fDen);
    if (d === 0) throw new LengthParseError(`${quote(t)}: a fraction cannot have 0 below the line`, text);
    value = Number(fNum) / d;
  } else {
    value = Number(decimal!.replace(',', '.'));
  }
  let chosen: LengthUnit | 'mm' = unit;
  if (unitWord !== undefined) {
    const known = UNIT_WORDS[unitWord.toLowerCase()];
    if (known === undefined) throw new LengthParseError(`${quote(t)}: unknown unit "${unitWord}" (use in, cm or mm)`, text);
    chosen = known;
  }
  const mm = (sign === '-' || sign === '−' ? -1 : 1) * value * MM_PER_UNIT[chosen];
  if (!Number.isFinite(mm)) throw new LengthParseError(`${quote(t)} is too large to be a length`, text);
  if (Math.abs(mm) > MAX_TYPED_LENGTH_MM) throw new LengthParseError(`${quote(t)} is over 100 m: check the number and its unit`, text);
  return mm === 0 ? 0 : mm;
}

export interface FormatLengthOptions {
  /** Show `+` before positive lengths (amounts of change: `+2 in`, `-1/4 in`). Zero has no sign. */
  signed?: boolean;
}

export interface FormattedLength {
  /** e.g. `2 1/2 in`, `6.4 cm`. */
  text: string;
  /** False when the shown value differs from `mm` by more than POINT_EPSILON. */
  exact: boolean;
  /** The millimetres the text stands for (what `parseLength(text)` gives back). */
  shownMm: number;
}

function gcd(a: number, b: number): number {
  while (b !== 0) [a, b] = [b, a % b];
  return a;
}

/** Round half away from zero (Math.round rounds -2.5 to -2). */
function roundHalfAway(x: number): number {
  return Math.sign(x) * Math.round(Math.abs(x));
}

/** Format millimetres in `unit`, with whether the rounding hid a difference. Throws RangeError for a non-finite length. */
export function formatLengthParts(mm: number, unit: LengthUnit, opts: FormatLengthOptions = {}): FormattedLength {
  if (!Number.isFinite(mm)) throw new RangeError(`cannot show a length of ${mm} mm`);
  let steps: number; // whole steps of the shown resolution
  let stepMm: number;
  if (unit === 'in') {
    stepMm = MM_PER_INCH / INCH_DENOMINATOR;
    steps = roundHalfAway((mm / MM_PER_INCH) * INCH_DENOMINATOR);
  } else {
    stepMm = MM_PER_CM / 10;
    steps = roundHalfAway(mm / stepMm);
  }
  if (steps === 0) steps = 0; // no "-0"
  const abs = Math.abs(steps);
  let magnitude: string;
  if (unit === 'in') {
    const whole = Math.floor(abs / INCH_DENOMINATOR);
    const rest = abs % INCH_DENOMINATOR;
    const g = rest === 0 ? 1 : gcd(rest, INCH_DENOMINATOR);
    const fraction = rest === 0 ? '' : `${rest / g}/${INCH_DENOMINATOR / g}`;
    magnitude = whole === 0 ? fraction || '0' : fraction ? `${whole} ${fraction}` : `${whole}`;
  } else {
    const whole = Math.floor(abs / 10);
    const tenth = abs % 10;
    magnitude = tenth === 0 ? `${whole}` : `${whole}.${tenth}`;
  }
  const sign = steps < 0 ? '-' : steps > 0 && opts.signed ? '+' : '';
  const shownMm = steps === 0 ? 0 : steps * stepMm;
  return { text: `${sign}${magnitude} ${unit}`, exact: Math.abs(shownMm - mm) <= POINT_EPSILON, shownMm };
}

/** Format millimetres in `unit`: `2 1/2 in` (nearest 1/16), `6.4 cm` (nearest 0.1). */
export function formatLength(mm: number, unit: LengthUnit, opts: FormatLengthOptions = {}): string {
  return formatLengthParts(mm, unit, opts).text;
}
