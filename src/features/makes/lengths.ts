import { LengthParseError, parseLength, type LengthUnit } from '../../../geometry/units';

/**
 * A typed body measurement read into millimetres: blank means "not measured", anything else
 * must be a length above zero (the API keeps measurements up to 3 m).
 */
export function readMeasurement(text: string, unit: LengthUnit): { mm: number | undefined } | { error: string } {
  if (text.trim() === '') return { mm: undefined };
  try {
    const mm = parseLength(text, unit);
    if (mm <= 0) return { error: 'A measurement is more than 0.' };
    if (mm > 3000) return { error: 'That is over 3 m: check the number and its unit.' };
    return { mm };
  } catch (error) {
    if (error instanceof LengthParseError) return { error: capitalise(error.message) + '.' };
    throw error;
  }
}

const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);
