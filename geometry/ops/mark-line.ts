/**
 * Mark a line on a piece as part of a make: a lengthen/shorten line (or a rise line) or a body
 * level where the printed pattern has none. The line is straight, through `at`; square to the
 * piece's grainline by default (the usual way a lengthen/shorten line is drawn), or along the
 * direction to `toward` when `square` is false. It is drawn across the whole piece: from where
 * it leaves the widest size line on one side to where it leaves it on the other, plus
 * MARK_OVERHANG on each side, and belongs to every size (no `size`).
 */
import { z } from 'zod';
import type { Pattern } from '../model.ts';
import { outlineContour } from '../model.ts';
import { contourArea, contourFromPoints, contourLineIntersections, pathToSvg } from '../path.ts';
import { type Point, vecDot, vecLength, vecNormalize, vecPerp, vecSub } from '../vec.ts';
import { AlterationError, type OpResult, fmtPt, pieceGrain } from './common.ts';

/** How far (mm) a marked line runs past the outline on each side. */
export const MARK_OVERHANG = 5;

const point = z.object({ x: z.number().finite(), y: z.number().finite() });

export const markLineOpSchema = z
  .object({
    op: z.literal('mark-line'),
    piece: z.string().trim().min(1),
    role: z.enum(['lengthen', 'level']),
    name: z.string().trim().min(1).max(120),
    at: point,
    /** Square to the grainline (default) or along at → toward. */
    square: z.boolean().default(true),
    toward: point.optional(),
  })
  .refine((o) => o.square || o.toward !== undefined, { message: 'give toward when the line is not square to the grain', path: ['toward'] });
export type MarkLineOp = z.input<typeof markLineOpSchema>;

export function performMarkLine(pattern: Pattern, op: z.output<typeof markLineOpSchema>): OpResult {
  const index = pattern.pieces.findIndex((p) => p.name === op.piece);
  const piece = pattern.pieces[index];
  if (!piece) throw new AlterationError('missing-piece', `there is no piece named "${op.piece}"`);
  if (piece.lines.some((l) => l.name === op.name && (l.role === 'lengthen' || l.role === 'level')))
    throw new AlterationError('bad-amount', `piece "${piece.name}" has a line named "${op.name}" already`);
  let direction: Point;
  if (op.square) direction = vecPerp(pieceGrain(piece));
  else {
    const d = vecSub(op.toward!, op.at);
    if (vecLength(d) < 1) throw new AlterationError('bad-amount', 'the two points of the line are less than 1 mm apart');
    direction = vecNormalize(d);
  }
  // The widest size line decides where the line ends, so it crosses every size.
  const widest = piece.outlines.map(outlineContour).reduce((a, b) => (contourArea(b) > contourArea(a) ? b : a));
  const hits = contourLineIntersections(widest, op.at, direction).map((h) => vecDot(vecSub(h.point, op.at), direction));
  const before = hits.filter((s) => s < 0);
  const after = hits.filter((s) => s > 0);
  if (before.length === 0 || after.length === 0)
    throw new AlterationError('missing-line', `a line through ${fmtPt(op.at)} does not cross piece "${piece.name}": mark it inside the piece`);
  const s0 = Math.min(...before) - MARK_OVERHANG;
  const s1 = Math.max(...after) + MARK_OVERHANG;
  const from = { x: op.at.x + direction.x * s0, y: op.at.y + direction.y * s0 };
  const to = { x: op.at.x + direction.x * s1, y: op.at.y + direction.y * s1 };
  const d = pathToSvg([contourFromPoints([from, to], false)], 4);
  const pieces = pattern.pieces.map((p, i) => (i === index ? { ...p, lines: [...p.lines, { role: op.role, name: op.name, d }] } : p));
  return { pattern: { ...pattern, pieces }, cautions: [] };
}
