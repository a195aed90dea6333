/**
 * The measurements shown beside the drawing: each piece's named edges, the crotch length, the
 * paired-seam report (front against back), each with what it was before a chosen alteration.
 * Pure: numbers in millimetres from geometry/measure.ts.
 */
import {
  CROTCH_JOIN_TOLERANCE_DEG,
  type CrotchJoin,
  crotchJoin,
  crotchLength,
  EDGE_ROLES,
  type EdgeRole,
  edgeLength,
  formatLength,
  type LengthUnit,
  MeasureError,
  PAIRED_SEAM_TOLERANCE,
  type PairedSeam,
  pairedSeamReport,
  pairedSizes,
  type Pattern,
  type Piece,
} from '../../../../geometry/index.ts';

export const EDGE_LABELS: Record<EdgeRole, string> = {
  waist: 'Waist',
  'centre-front': 'Centre front',
  'centre-back': 'Centre back',
  'crotch-curve': 'Crotch curve',
  inseam: 'Inseam',
  'side-seam': 'Side seam',
  hem: 'Hem',
  other: 'Other seam',
};

export interface MeasureRow {
  key: string;
  piece: string;
  label: string;
  now: number;
  before?: number;
}

/** The size line measured in a piece: the one named `size` when it has it, else its only (or middle) one. */
export function sizeShown(piece: Piece, size: string | undefined): string {
  if (size !== undefined && piece.outlines.some((o) => o.size === size)) return size;
  return piece.outlines[Math.floor((piece.outlines.length - 1) / 2)]!.size;
}

function edgeRows(pattern: Pattern, size: string | undefined): MeasureRow[] {
  const rows: MeasureRow[] = [];
  for (const piece of pattern.pieces) {
    const s = sizeShown(piece, size);
    for (const role of EDGE_ROLES) {
      if (role === 'other' || !piece.edges.some((e) => e.role === role)) continue;
      const length = edgeLength(piece, s, role);
      if (length !== undefined) rows.push({ key: `${piece.name}:${role}`, piece: piece.name, label: EDGE_LABELS[role], now: length });
    }
  }
  return rows;
}

function crotchRows(pattern: Pattern, size: string | undefined): MeasureRow[] {
  // the size asked for alone when the pattern has it; else the only size, when there is one
  const asked = size !== undefined ? crotchLength(pattern, { sizes: [size] })[0] : undefined;
  const all = asked ? [] : crotchLength(pattern);
  const row = asked ?? (all.length === 1 ? all[0] : undefined);
  return row ? [{ key: 'crotch:total', piece: 'front + back', label: 'Crotch length', now: row.total }] : [];
}

/** Edge lengths and crotch length now, with `before` filled from the other pattern where it has the same thing. */
export function measureRows(now: Pattern, before: Pattern | undefined, size: string | undefined): MeasureRow[] {
  const rows = [...edgeRows(now, size), ...crotchRows(now, size)];
  if (!before) return rows;
  const old = new Map([...edgeRows(before, size), ...crotchRows(before, size)].map((r) => [r.key, r.now]));
  return rows.map((r) => ({ ...r, before: old.get(r.key) }));
}

/**
 * The size front against back is shown for: the one asked for when both pieces have it, else
 * the middle one of the sizes they share. Only that size is measured (a drag replays often).
 */
function shownSize(pattern: Pattern, size: string | undefined): string | undefined {
  const sizes = pairedSizes(pattern);
  return size !== undefined && sizes.includes(size) ? size : sizes[Math.floor((sizes.length - 1) / 2)];
}

/** Front against back for inseam and side seam; empty when there is no front and back with those edges. */
export function pairedSeams(pattern: Pattern, size: string | undefined): PairedSeam[] {
  const chosen = shownSize(pattern, size);
  if (chosen === undefined) return [];
  try {
    return pairedSeamReport(pattern, { sizes: [chosen] });
  } catch (e) {
    if (e instanceof MeasureError) return [];
    throw e;
  }
}

/** Where the front and back crotch curves meet the inseam, in the size shown; undefined when a piece lacks those edges. */
export function crotchJoinShown(pattern: Pattern, size: string | undefined): CrotchJoin | undefined {
  const chosen = shownSize(pattern, size);
  if (chosen === undefined) return undefined;
  try {
    return crotchJoin(pattern, { sizes: [chosen] })[0];
  } catch (e) {
    if (e instanceof MeasureError) return undefined;
    throw e;
  }
}

/** The crotch curves' join in words: each piece's angle at the crotch point, and whether the joined curve turns there. */
export function crotchJoinWords(j: CrotchJoin): string {
  const angles = `${j.first.piece} ${Math.round(j.first.angle)}°, ${j.second.piece} ${Math.round(j.second.angle)}° at the crotch point`;
  return j.smooth
    ? `Crotch curves: ${angles} — laid together at the inseam they join smoothly`
    : `Crotch curves: ${angles} — laid together at the inseam they turn ${Math.round(j.turn)}° where they meet: true the crotch curve before cutting (more than ${CROTCH_JOIN_TOLERANCE_DEG}°)`;
}

/**
 * The notches of a paired seam in words, or undefined when neither side has any or a side cannot
 * be measured from the hem: that they meet (within the tolerance), or each pair that does not and
 * a side with notches the other lacks.
 */
export function notchWords(p: PairedSeam, unit: LengthUnit): string | undefined {
  if (p.first.notches === undefined || p.second.notches === undefined) return undefined;
  const a = p.first.notches.length;
  const b = p.second.notches.length;
  if (a === 0 && b === 0) return undefined;
  if (p.notchesMatch) return `${a === 1 ? 'the notch meets' : a === 2 ? 'both notches meet' : `all ${a} notches meet`} within ${formatLength(PAIRED_SEAM_TOLERANCE, unit)}`;
  const words = p.notches
    .filter((n) => !n.withinTolerance)
    .map((n) => `notch ${n.first.name} is ${formatLength(n.first.fromHem, unit)} from the hem on the ${p.first.piece}, ${formatLength(n.second.fromHem, unit)} on the ${p.second.piece}: ${formatLength(Math.abs(n.difference), unit)} apart`);
  if (a !== b) words.push(`the ${p.first.piece} has ${a} ${a === 1 ? 'notch' : 'notches'} here, the ${p.second.piece} ${b}`);
  return words.join('; ');
}
