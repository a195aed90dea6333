/**
 * Drag handles for amounts: a lengthen/shorten or rise alteration gets a handle on its line that
 * moves along the grain; a slash and spread gets one at the slash's start on the edge, moving
 * across the slash (toward the part that turns opens it). Pure: positions in the piece's millimetres.
 */
import { type AlterationOp, type Pattern, pathFromSvg, pieceGrain, type Point, vecDot, vecNormalize, vecPerp, vecSub } from '../../../../geometry/index.ts';

export interface AmountHandle {
  piece: string;
  /** Where the line crosses the middle of the piece, before the alteration. */
  origin: Point;
  /** Unit vector along the grain, toward the hem. */
  axis: Point;
  /** +1 when dragging toward the hem adds to the amount (lengthen), −1 when it takes away (rise: the waist moves up). */
  sense: 1 | -1;
}

/** Does this alteration have an amount to drag? */
export function hasAmountHandle(op: AlterationOp): op is Extract<AlterationOp, { op: 'lengthen' | 'rise' | 'slash-spread' }> & { amount: number } {
  return op.op === 'lengthen' || op.op === 'rise' || (op.op === 'slash-spread' && op.amount !== undefined);
}

/** The handle of a lengthen, rise or slash-and-spread alteration on `before` (the pattern before it), if it can be placed. */
export function amountHandle(before: Pattern, op: AlterationOp): AmountHandle | undefined {
  if (op.op === 'slash-spread') {
    const piece = before.pieces.find((p) => p.name === op.piece);
    const along = vecSub(op.hinge, op.from);
    if (!piece || op.amount === undefined || Math.hypot(along.x, along.y) < 1e-9) return undefined;
    let axis = vecPerp(vecNormalize(along));
    // Point the axis toward the part that turns: the waist side (against the grain) unless the hem side turns.
    const towardHem = vecDot(axis, pieceGrain(piece)) > 0;
    const turnsHem = op.move === 'hem';
    if (towardHem !== turnsHem) axis = { x: -axis.x, y: -axis.y };
    return { piece: piece.name, origin: op.from, axis, sense: 1 };
  }
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
