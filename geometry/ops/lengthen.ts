/**
 * Lengthen/shorten and rise: a parallel spread at a named line (trade reference §3.1–3.3).
 *
 * The piece is cut at the line; the part on the moving side (the hem side for `lengthen`, the
 * waist side for `rise`) moves along the grain by `amount` (negative = shorten: a tuck of that
 * depth is folded out on the moving side). The edges crossing the line are trued by blending
 * the jog over a truing zone of `trueZone` mm along the grain, starting `trueZone/2` on the
 * fixed side of the line: inside the zone the piece is stretched (or compressed) evenly along
 * the grain, so slanted edges stay continuous with no step, and lines, notches and landmarks
 * move with the part they belong to. The line itself stays with the fixed part.
 *
 * Exact properties (up to round-off): the extent of the piece along the grain changes by
 * exactly `amount`; lengthening by +d then −d at the same line restores the outline; amount 0
 * is the identity. Curves stay exact Béziers (the map is affine in each band).
 *
 * Refused: a line that does not cross the piece or is within 30° of the grain; a truing zone
 * that does not fit inside the piece; a shortening that would remove more than the piece has
 * on the moving side.
 */
import { z } from 'zod';
import { type Pattern, type Piece, outlineContour } from '../model.ts';
import { contourExtremePoints, pathFromSvg } from '../path.ts';
import { MIN_LINE_GRAIN_ANGLE, TRUE_ZONE } from '../tolerance.ts';
import { type Affine, type Point, AFFINE_IDENTITY, affineTranslate, vecAdd, vecCross, vecNormalize, vecScale, vecSub } from '../vec.ts';
import {
  AlterationError,
  type BandMap,
  type Caution,
  type OpResult,
  affineFromPoints,
  bandMapPath,
  bandMapPoint,
  fmtMm,
  mapLine,
  mapOutline,
  middleOutline,
  pieceGrain,
} from './common.ts';

const amountSchema = z.number().min(-500, 'amount must be at least −500 mm').max(500, 'amount must be at most 500 mm');

export const lengthenOpSchema = z.object({
  op: z.literal('lengthen'),
  /** Name of a line with role "lengthen" (e.g. "lower leg"). */
  line: z.string().min(1),
  /** mm along the grain; negative shortens. */
  amount: amountSchema,
  /** Width of the truing zone along the grain (mm). */
  trueZone: z.number().positive().max(200).optional(),
  /** Restrict to these pieces (default: every piece that has the line). */
  pieces: z.array(z.string()).optional(),
});
export type LengthenOp = z.infer<typeof lengthenOpSchema>;

export const riseOpSchema = z.object({
  op: z.literal('rise'),
  /** Name of the rise line (role "lengthen"), between the hip and crotch levels. */
  line: z.string().min(1),
  /** mm along the grain; negative lowers the waist (reduces the rise). */
  amount: amountSchema,
  trueZone: z.number().positive().max(200).optional(),
  pieces: z.array(z.string()).optional(),
});
export type RiseOp = z.infer<typeof riseOpSchema>;

interface SpreadLine {
  readonly origin: Point;
  readonly direction: Point;
}

function lineGeometry(d: string, name: string): SpreadLine {
  const segs = pathFromSvg(d).flatMap((c) => c.segments);
  if (segs.length === 0) throw new AlterationError('missing-line', `line "${name}" has no length`);
  const origin = segs[0]!.from;
  const direction = vecNormalize(vecSub(segs[segs.length - 1]!.to, origin));
  if (direction.x === 0 && direction.y === 0) throw new AlterationError('missing-line', `line "${name}" has no length`);
  return { origin, direction };
}

/**
 * The band map of a parallel spread. `g` points toward the moving side; coordinates β are
 * measured along g from the line, in the oblique frame (line direction, g).
 */
export function parallelSpreadMap(line: SpreadLine, g: Point, amount: number, zone: number): BandMap {
  const c = line.direction;
  const k = vecCross(c, g);
  const coordinate = (p: Point): number => vecCross(c, vecSub(p, line.origin)) / k;
  const lineAt = (b: number): Point => vecAdd(line.origin, vecScale(g, b));
  const b0 = -zone / 2;
  const b1Old = zone / 2 + Math.max(0, -amount);
  const b1New = zone / 2 + Math.max(0, amount);
  const ratio = (b1New - b0) / (b1Old - b0);
  const stretchAt = (b: number): Point => lineAt(b0 + (b - b0) * ratio);
  const stretch: Affine = affineFromPoints(
    [lineAt(b0), vecAdd(lineAt(b0), c), lineAt(b1Old)],
    [stretchAt(b0), vecAdd(stretchAt(b0), c), stretchAt(b1Old)],
  );
  return {
    coordinate,
    lineAt,
    direction: c,
    breaks: [b0, b1Old],
    maps: [AFFINE_IDENTITY, stretch, affineTranslate(g.x * amount, g.y * amount)],
  };
}

function spreadPiece(piece: Piece, lineName: string, amount: number, zone: number, side: 1 | -1, what: string): Piece {
  const grain = pieceGrain(piece);
  const g = side === 1 ? grain : { x: -grain.x, y: -grain.y };
  // one map per size (the outline of a size and its size's lines share it); a refusal is never kept
  const maps = new Map<string | undefined, { map: BandMap; line: SpreadLine }>();
  const mapFor = (size: string | undefined): { map: BandMap; line: SpreadLine } => {
    let known = maps.get(size);
    if (!known) {
      known = findMap(size);
      maps.set(size, known);
    }
    return known;
  };
  const findMap = (size: string | undefined): { map: BandMap; line: SpreadLine } => {
    const candidates = piece.lines.filter((l) => l.role === 'lengthen' && l.name === lineName && (size === undefined ? true : l.size === undefined || l.size === size));
    const chosen = candidates.find((l) => l.size === size) ?? candidates.find((l) => l.size === undefined) ?? candidates[0];
    if (!chosen) throw new AlterationError('missing-line', `piece "${piece.name}" has no lengthen line "${lineName}"${size ? ` for size "${size}"` : ''}`);
    const line = lineGeometry(chosen.d, lineName);
    if (Math.abs(vecCross(line.direction, g)) < Math.sin(MIN_LINE_GRAIN_ANGLE))
      throw new AlterationError('missing-line', `line "${lineName}" of piece "${piece.name}" runs within 30° of the grain; a ${what} line must cross the grain`);
    return { map: parallelSpreadMap(line, g, amount, zone), line };
  };
  const outlines = piece.outlines.map((o) => {
    const { map, line } = mapFor(o.size);
    const contour = outlineContour(o);
    // extent of the outline along g measured from the line (in the oblique β coordinate), exact:
    // β is linear, so its extremes lie where its gradient's projection is extreme
    let min = Infinity;
    let max = -Infinity;
    for (const p of contourExtremePoints(contour, { x: -line.direction.y, y: line.direction.x })) {
      const b = map.coordinate(p);
      min = Math.min(min, b);
      max = Math.max(max, b);
    }
    const label = `${what} at "${lineName}" on piece "${piece.name}" size "${o.size}"`;
    if (min >= 0 || max <= 0) throw new AlterationError('missing-line', `${label}: the line does not cross the piece`);
    if (min > -zone / 2) throw new AlterationError('bad-amount', `${label}: the line is within ${fmtMm(zone / 2)} of the fixed end; the truing zone does not fit`);
    const need = zone / 2 + Math.max(0, -amount);
    if (max <= need)
      throw new AlterationError(
        'bad-amount',
        amount < 0
          ? `${label}: shortening by ${fmtMm(-amount)} would fold the piece over itself — only ${fmtMm(Math.max(0, max - zone / 2))} lies beyond the line on the moving side`
          : `${label}: the line is within ${fmtMm(zone / 2)} of the moving end; the truing zone does not fit`,
      );
    const mapped = mapOutline(o, (p) => bandMapPath(map, p), (p) => bandMapPoint(map, p));
    // No self-crossing check is needed: the band map is strictly increasing along the grain
    // and the identity across it, i.e. a one-to-one map of the plane, so a simple outline stays
    // simple (the property tests check this).
    return mapped;
  });
  const shared = mapFor(middleOutline(piece).size).map;
  const lines = piece.lines.map((l) => {
    if (l.role === 'lengthen' && l.name === lineName) return l; // the cut line stays with the fixed part
    const map = l.size !== undefined ? mapFor(l.size).map : shared;
    return mapLine(l, (p) => bandMapPath(map, p));
  });
  return { ...piece, outlines, lines };
}

function applySpread(pattern: Pattern, lineName: string, amount: number, zone: number | undefined, pieces: readonly string[] | undefined, side: 1 | -1, what: string): OpResult {
  const z = zone ?? TRUE_ZONE;
  const has = (p: Piece): boolean => p.lines.some((l) => l.role === 'lengthen' && l.name === lineName);
  const targets = pattern.pieces.filter((p) => (pieces ? pieces.includes(p.name) : true) && has(p));
  if (pieces)
    for (const n of pieces) {
      const named = pattern.pieces.find((p) => p.name === n);
      if (!named) throw new AlterationError('missing-piece', `there is no piece named "${n}"`);
      if (!has(named)) throw new AlterationError('missing-line', `piece "${n}" has no lengthen line named "${lineName}"`);
    }
  if (targets.length === 0) throw new AlterationError('missing-line', `no piece has a lengthen line named "${lineName}"`);
  const cautions: Caution[] = [];
  if (Math.abs(amount) > 50)
    cautions.push({ code: 'large-change', message: `a ${what} of ${fmtMm(amount)} is a large change: check the altered seams and sew a test garment first` });
  return {
    pattern: { ...pattern, pieces: pattern.pieces.map((p) => (targets.includes(p) ? spreadPiece(p, lineName, amount, z, side, what) : p)) },
    cautions,
  };
}

/** Lengthen (amount > 0) or shorten (amount < 0) at a lengthen/shorten line; the hem side moves. */
export function performLengthen(pattern: Pattern, op: LengthenOp): OpResult {
  return applySpread(pattern, op.line, op.amount, op.trueZone ?? TRUE_ZONE, op.pieces, 1, 'lengthen');
}

/** Raise (amount > 0) or lower (amount < 0) the rise at a rise line; the waist side moves, the leg stays. */
export function performRise(pattern: Pattern, op: RiseOp): OpResult {
  return applySpread(pattern, op.line, op.amount, op.trueZone ?? TRUE_ZONE, op.pieces, -1, 'rise');
}
