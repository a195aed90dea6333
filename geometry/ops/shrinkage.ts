/**
 * Shrinkage compensation (trade reference §4.4): enlarge each piece so that after the cloth
 * shrinks it has the drafted size. Exact rule P = F / (1 − s), applied separately along the
 * grain (lengthwise, warp) and across it (crosswise, weft): an anisotropic scale in the
 * piece's grain frame about a fixed origin (the start of the grain line, else the centre of
 * the piece's bounds). Lines, landmarks and any cut line scale with the piece.
 *
 * Shrinkage is given in percent as measured by a wash test (dimensional change DC = −s·100):
 * 3 means the cloth gets 3 % shorter. Negative values (cloth that grows) are allowed.
 * Add seam allowance after this operation so the allowance keeps its nominal width.
 */
import { z } from 'zod';
import type { Pattern, Piece } from '../model.ts';
import { contourBounds, pathFromSvg, pathTransform } from '../path.ts';
import { MAX_SHRINKAGE } from '../tolerance.ts';
import { type Point, affineApply, affineScaleInFrame } from '../vec.ts';
import { AlterationError, type Caution, type OpResult, mapLine, mapOutline, pieceGrain } from './common.ts';
import { outlineContour } from '../model.ts';

const percent = z.number().min(-100 * MAX_SHRINKAGE).max(100 * MAX_SHRINKAGE);

export const shrinkageOpSchema = z.object({
  op: z.literal('shrinkage'),
  /** Lengthwise (warp, along the grain) shrinkage in percent. */
  lengthwise: percent,
  /** Crosswise (weft, across the grain) shrinkage in percent. */
  crosswise: percent,
  pieces: z.array(z.string()).optional(),
});
export type ShrinkageOp = z.infer<typeof shrinkageOpSchema>;

/** The exact pattern factor for a shrinkage fraction s: 1 / (1 − s). */
export function shrinkageFactor(percentShrinkage: number): number {
  const s = percentShrinkage / 100;
  if (!(Math.abs(s) <= MAX_SHRINKAGE)) throw new AlterationError('bad-amount', `shrinkage of ${percentShrinkage} % is outside ±${MAX_SHRINKAGE * 100} %; was a decimal point left out?`);
  return 1 / (1 - s);
}

function pieceOrigin(piece: Piece): Point {
  const grain = piece.lines.find((l) => l.role === 'grain');
  const first = grain ? pathFromSvg(grain.d)[0]?.segments[0]?.from : undefined;
  if (first) return first;
  const b = contourBounds(outlineContour(piece.outlines[0]!));
  return { x: (b.minX + b.maxX) / 2, y: (b.minY + b.maxY) / 2 };
}

export function performShrinkage(pattern: Pattern, op: ShrinkageOp): OpResult {
  const along = shrinkageFactor(op.lengthwise);
  const across = shrinkageFactor(op.crosswise);
  if (op.pieces) for (const n of op.pieces) if (!pattern.pieces.some((p) => p.name === n)) throw new AlterationError('missing-piece', `there is no piece named "${n}"`);
  const cautions: Caution[] = [];
  const pieces = pattern.pieces.map((piece) => {
    if (op.pieces && !op.pieces.includes(piece.name)) return piece;
    if (piece.seamAllowanceIncluded || piece.outlines.some((o) => o.cut !== undefined))
      cautions.push({ code: 'seam-allowance-included', piece: piece.name, message: `piece "${piece.name}" already has seam allowance, which is scaled too; add seam allowance after shrinkage compensation` });
    const m = affineScaleInFrame(pieceGrain(piece), along, across, pieceOrigin(piece));
    return {
      ...piece,
      outlines: piece.outlines.map((o) => mapOutline(o, (p) => pathTransform(p, m), (p) => affineApply(m, p))),
      lines: piece.lines.map((l) => mapLine(l, (p) => pathTransform(p, m))),
    };
  });
  // A scale with positive factors is one-to-one, so simple outlines stay simple: no check needed.
  return { pattern: { ...pattern, pieces }, cautions };
}
