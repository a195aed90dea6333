/**
 * Paper sizes for printing, in millimetres (portrait: width ≤ height), with their sources.
 *
 * - ISO 216 A series: A4 210 × 297, A3 297 × 420, A0 841 × 1189.
 * - North American sizes are defined in inches (Letter 8.5 × 11, Legal 8.5 × 14, Tabloid
 *   11 × 17; Letter = ANSI/ASME Y14.1 size A, Tabloid = size B); the millimetres here are
 *   exact conversions (1 in = 25.4 mm).
 * - Wide-format rolls: 36 in (914 mm) and 44 in (1118 mm) wide, length cut to the content
 *   (common practice, no source; the nominal millimetre widths are the trade's usual labels).
 */

export const MM_PER_INCH = 25.4;
/** PDF user space: 1 unit = 1/72 in (ISO 32000-1 §8.3.2.3, UserUnit 1). */
export const PT_PER_MM = 72 / MM_PER_INCH;
/** CSS/SVG px: 1/96 in (CSS Values and Units Level 3 §5.2). */
export const PX_PER_MM = 96 / MM_PER_INCH;

export const PAPER_IDS = ['letter', 'legal', 'tabloid', 'a4', 'a3', 'a0', 'roll-914', 'roll-1118'] as const;
export type PaperId = (typeof PAPER_IDS)[number];

export interface Paper {
  readonly id: PaperId;
  /** As shown to people, e.g. "US Letter (8.5 × 11 in)". */
  readonly label: string;
  /** Portrait width in mm. */
  readonly width: number;
  /** Portrait height in mm; for a roll, undefined (cut to the content's length). */
  readonly height: number | undefined;
  /** `tiled`: home printer, pages taped together; `single`: one large-format sheet. */
  readonly format: 'tiled' | 'single';
  readonly source: string;
}

const inch = (v: number): number => v * MM_PER_INCH;

export const PAPERS: Readonly<Record<PaperId, Paper>> = {
  letter: { id: 'letter', label: 'US Letter (8.5 × 11 in)', width: inch(8.5), height: inch(11), format: 'tiled', source: 'US Letter, ANSI/ASME Y14.1 size A' },
  legal: { id: 'legal', label: 'US Legal (8.5 × 14 in)', width: inch(8.5), height: inch(14), format: 'tiled', source: 'US Legal (North American size)' },
  tabloid: { id: 'tabloid', label: 'Tabloid (11 × 17 in)', width: inch(11), height: inch(17), format: 'tiled', source: 'Tabloid, ANSI/ASME Y14.1 size B' },
  a4: { id: 'a4', label: 'A4 (210 × 297 mm)', width: 210, height: 297, format: 'tiled', source: 'ISO 216' },
  a3: { id: 'a3', label: 'A3 (297 × 420 mm)', width: 297, height: 420, format: 'tiled', source: 'ISO 216' },
  a0: { id: 'a0', label: 'A0 (841 × 1189 mm)', width: 841, height: 1189, format: 'single', source: 'ISO 216' },
  'roll-914': { id: 'roll-914', label: 'Roll, 914 mm (36 in) wide', width: 914, height: undefined, format: 'single', source: 'wide-format roll, common practice' },
  'roll-1118': { id: 'roll-1118', label: 'Roll, 1118 mm (44 in) wide', width: 1118, height: undefined, format: 'single', source: 'wide-format roll, common practice' },
};

export type Orientation = 'portrait' | 'landscape';

/** Sheet size in mm for an orientation (a roll has no fixed length: `height` is undefined). */
export function paperSheet(paper: Paper, orientation: Orientation): { width: number; height: number | undefined } {
  if (paper.height === undefined || orientation === 'portrait') return { width: paper.width, height: paper.height };
  return { width: paper.height, height: paper.width };
}

/** Default non-printable margin of home printers: 1/4 in (trade reference §5.4, common practice). */
export const DEFAULT_MARGIN = 6.35;
