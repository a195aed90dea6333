import { LengthParseError, formatLength, parseLength, type LengthUnit } from '../../../geometry/units';
import { DEFAULT_MARGIN, PAPERS, PAPER_IDS, type Paper, type PaperId } from '../../../geometry/print/paper';

/** Paper sizes as the panel offers them: home printers (pages taped together) and large format. */
export const paperGroups: { label: string; papers: Paper[] }[] = [
  {
    label: 'Home printer: pages to tape together',
    papers: PAPER_IDS.map((id) => PAPERS[id]).filter((paper) => paper.format === 'tiled'),
  },
  {
    label: 'Large format: one sheet, from a print shop',
    papers: PAPER_IDS.map((id) => PAPERS[id]).filter((paper) => paper.format === 'single'),
  },
];

export const paperLabel = (id: unknown): string =>
  typeof id === 'string' && id in PAPERS ? PAPERS[id as PaperId].label : String(id ?? 'US Letter');

export { DEFAULT_MARGIN };

/** The API's bounds for the two lengths (mm). */
export const LENGTH_LIMITS = {
  margin: { min: 0, max: 50 },
  overlap: { min: 0, max: 60 },
} as const;

/**
 * A length field's state: exact millimetres until the user types (shown in their units, so a
 * default of 6.35 mm reads "1/4 in" or "0.6 cm" and still prints 6.35 mm), then the typed text.
 */
export type LengthInput = { mm: number } | { text: string };

export const lengthText = (input: LengthInput, unit: LengthUnit): string =>
  'text' in input ? input.text : formatLength(input.mm, unit);

/** Millimetres from a length field, or the reason it cannot be used. */
export function readPrintLength(
  input: LengthInput,
  unit: LengthUnit,
  { min, max }: { min: number; max: number },
): { mm: number } | { error: string } {
  if ('mm' in input) return { mm: input.mm };
  let mm: number;
  try {
    mm = parseLength(input.text, unit);
  } catch (error) {
    if (error instanceof LengthParseError) return { error: `${error.message.charAt(0).toUpperCase()}${error.message.slice(1)}.` };
    throw error;
  }
  if (mm < min || mm > max) {
    // The bounds are whole millimetres: say them exactly rather than rounded to 1/16 in.
    const bound = (mm: number) => (unit === 'cm' ? `${mm / 10} cm` : `${mm} mm`);
    return { error: `Use a length from ${bound(min)} to ${bound(max)}.` };
  }
  return { mm };
}
