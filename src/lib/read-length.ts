import { formatLength, LengthParseError, parseLength, type LengthUnit } from '../../geometry/units';

/** The API keeps lengths (body measurements, test lengths) up to 3 m (geometry/fit/body.ts). */
export const MAX_LENGTH_MM = 3000;

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/**
 * A typed length in `unit` read into millimetres, for fields that may be left blank: blank is
 * "not given"; otherwise it must be a length above 0 and at most `max` mm. `keepMm`: when the
 * text is exactly how that value is shown, the value itself is kept, so showing and saving again
 * does not round it to 1/16 in.
 */
export function readLength(
  text: string,
  unit: LengthUnit,
  { max = MAX_LENGTH_MM, keepMm }: { max?: number; keepMm?: number | undefined } = {},
): { mm: number | undefined } | { error: string } {
  const trimmed = text.trim();
  if (trimmed === '') return { mm: undefined };
  if (keepMm !== undefined && trimmed === formatLength(keepMm, unit)) return { mm: keepMm };
  let mm: number;
  try {
    mm = parseLength(trimmed, unit);
  } catch (error) {
    if (error instanceof LengthParseError) return { error: capitalise(error.message) + '.' };
    throw error;
  }
  if (mm <= 0) return { error: 'Give a length above 0.' };
  if (mm > max) return { error: `That is over ${formatLength(max, unit)}: check the number and its unit.` };
  return { mm };
}
