/**
 * Drag handles for amounts: a lengthen/shorten or rise alteration gets a handle on its line that
 * moves along the grain. Pure: positions in the piece's millimetres.
 */
import { type AlterationOp, type Pattern, pathFromSvg, pieceGrain, type Point, vecDot, vecSub } from '../../../../geometry/index.ts';

export interface AmountHandle {
  piece: string;
  /** Where the line crosses the middle of the piece, before the alteration. */
  origin: Point;
  /** Unit vector along the grain, toward the hem. */
  axis: Point;
  /** +1 when dragging toward the hem adds to the amount (lengthen), −1 when it takes away (rise: the waist moves up). */
  sense: 1 | -1;
}

/** The handle of a lengthen or rise alteration on `before` (the pattern before that alteration), if its line is there. */
export function amountHandle(before: Pattern, op: AlterationOp): AmountHandle | undefined {
  if (op.op !== 'lengthen' && op.op !== 'rise') return undefined;
  for (const piece of before.pieces) {
    if (op.pieces && !op.pieces.includes(piece.name)) continue;
    const line = piece.lines.find((l) => l.role === 'lengthen' && l.name === op.line);
    if (!line) continue;
    const segs = pathFromSvg(line.d).flatMap((c) => c.segments);
    const a = segs[0]?.from;
    const b = segs[segs.length - 1]?.to;
    if (!a || !b) continue;
    return { piece: piece.name, origin: { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 }, axis: pieceGrain(piece), sense: op.op === 'rise' ? -1 : 1 };
  }
  return undefined;
}

/** Where the handle sits for an amount (mm). */
export function handlePoint(h: AmountHandle, amount: number): Point {
  const s = h.sense * amount;
  return { x: h.origin.x + h.axis.x * s, y: h.origin.y + h.axis.y * s };
}

/** The amount a handle dragged to `p` stands for, rounded to `step` mm. */
export function amountAt(h: AmountHandle, p: Point, step: number): number {
  const raw = h.sense * vecDot(vecSub(p, h.origin), h.axis);
  return step > 0 ? Math.round(raw / step) * step : raw;
}
