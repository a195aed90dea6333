/**
 * Seam allowance (trade reference §3.12): draw the cut line beside the seam line, with a width
 * per edge. The seam line (the outline) is kept; the cut line is stored in `outline.cut`.
 *
 * Method: each edge's stretch of the outline is flattened and offset outward on its own with
 * mitred joins between the short chords of its flattening (at most ~0.01 mm wider than the
 * width on curves) and butt ends (clipper2-ts); at each corner between two edges the two offset
 * lines are extended to meet (a mitred corner — "square it off" when the seams meet at right
 * angles), or bevelled when the mitre would reach more than MITRE_LIMIT × the wider width.
 * The union of the piece and all the bands is the area to cut; its outer boundary is the cut
 * line. Parts of the outline not covered by a named edge take the default width.
 *
 * Add seam allowance after every other alteration (and after shrinkage) so its width is not
 * changed by them.
 */
import { EndType, FillRule, JoinType, areaD, inflatePathsD, unionD, type PathD } from 'clipper2-ts';
import { z } from 'zod';
import type { Outline, Pattern, Piece } from '../model.ts';
import { landmarkOf, outlineContour } from '../model.ts';
import { type Contour, contourFlatten, contourFromPoints, contourNearest, contourReverse, contourSignedArea, contourStretch, pathToSvg } from '../path.ts';
import { type Point, vecAdd, vecCross, vecDistance, vecNormalize, vecPerp, vecScale, vecSub } from '../vec.ts';
import { AlterationError, type Caution, type OpResult, assertSimple } from './common.ts';

/** Widths below this (mm) are taken as no allowance: a thinner band is below cutting precision and only adds round-off slivers. */
export const MIN_SEAM_ALLOWANCE = 0.05;
const effective = (w: number): number => (w < MIN_SEAM_ALLOWANCE ? 0 : w);

/** A mitre longer than this many widths is bevelled instead. */
export const MITRE_LIMIT = 4;

const width = z.number().min(0, 'a seam allowance cannot be negative').max(150, 'a seam allowance of more than 150 mm is not plausible');

export const seamAllowanceOpSchema = z.object({
  op: z.literal('seam-allowance'),
  /** Width for every edge not listed in `edges` (mm); 15 mm ≈ the home-sewing ⅝ in (15.875 mm). */
  width,
  /** Widths by edge name or edge role, e.g. `{ "hem": 40, "centre back": 25 }`. */
  edges: z.record(z.string(), width).optional(),
  pieces: z.array(z.string()).optional(),
});
export type SeamAllowanceOp = z.infer<typeof seamAllowanceOpSchema>;

/** Flattening tolerance of the cut line (mm): well below what scissors follow. */
const CUT_FLATNESS = 0.02;

interface Run {
  readonly points: Point[];
  readonly width: number;
}

function toPathD(points: readonly Point[]): PathD {
  return points.map((p) => ({ x: p.x, y: p.y }));
}

/** Split a clockwise contour into runs of equal width, one per edge, in order. */
function runsOf(piece: Piece, outline: Outline, contour: Contour, op: SeamAllowanceOp): Run[] {
  const widthOf = (name: string, role: string): number => effective(op.edges?.[name] ?? op.edges?.[role] ?? op.width);
  const marks = piece.edges
    .map((e) => {
      const a = landmarkOf(outline, e.from);
      const b = landmarkOf(outline, e.to);
      return a && b ? { from: contourNearest(contour, a), to: contourNearest(contour, b), w: widthOf(e.name, e.role) } : undefined;
    })
    .filter((x) => x !== undefined);
  if (marks.length === 0) {
    const pts = contourFlatten(contour, CUT_FLATNESS).map((f) => f.point);
    return [{ points: [...pts, pts[0]!], width: effective(op.width) }];
  }
  // walk the loop from the first edge's start; gaps between edges get the default width
  const order = [...marks].sort((p, q) => p.from.segmentIndex - q.from.segmentIndex || p.from.t - q.from.t);
  const runs: Run[] = [];
  order.forEach((m, i) => {
    const next = order[(i + 1) % order.length]!;
    const edge = contourStretch(contour, m.from, m.to);
    if (edge.segments.length > 0) runs.push({ points: flatOpen(edge), width: m.w });
    if (vecDistance(m.to.point, next.from.point) > 1e-6) runs.push({ points: flatOpen(contourStretch(contour, m.to, next.from)), width: effective(op.width) });
  });
  return runs;
}

/**
 * Lengthen an open polyline by END_OVERLAP at both ends along its end directions, so that
 * neighbouring bands and corner patches overlap instead of sharing an edge (a shared edge
 * can leave a zero-width slit in the union after rounding).
 */
const END_OVERLAP = 0.05;
function extendEnds(points: readonly Point[]): Point[] {
  const n = points.length;
  const d0 = vecNormalize(vecSub(points[0]!, points[1]!));
  const d1 = vecNormalize(vecSub(points[n - 1]!, points[n - 2]!));
  return [vecAdd(points[0]!, vecScale(d0, END_OVERLAP)), ...points, vecAdd(points[n - 1]!, vecScale(d1, END_OVERLAP))];
}

/** Remove zero-width spikes (a vertex whose neighbours coincide) left by rounding. */
function removeSpikes(points: Point[]): Point[] {
  let pts = points;
  let changed = true;
  while (changed && pts.length > 3) {
    changed = false;
    for (let i = 0; i < pts.length; i++) {
      const prev = pts[(i - 1 + pts.length) % pts.length]!;
      const next = pts[(i + 1) % pts.length]!;
      if (vecDistance(prev, next) < 1e-3) {
        pts = pts.filter((_, k) => k !== i && k !== (i + 1) % pts.length);
        changed = true;
        break;
      }
    }
  }
  return pts;
}

function flatOpen(c: Contour): Point[] {
  return contourFlatten(c, CUT_FLATNESS).map((f) => f.point);
}

/** Outward normal of a clockwise (positive-area) contour at the direction d: −perp(d). */
function outward(d: Point): Point {
  const p = vecPerp(vecNormalize(d));
  return { x: -p.x, y: -p.y };
}

function lineIntersection(p: Point, d: Point, q: Point, e: Point): Point | undefined {
  const den = vecCross(d, e);
  if (Math.abs(den) < 1e-12) return undefined;
  const t = vecCross(vecSub(q, p), e) / den;
  return vecAdd(p, vecScale(d, t));
}

function cornerPatch(corner: Point, before: Run, after: Run): Point[] | undefined {
  const pa = before.points;
  const pb = after.points;
  if (pa.length < 2 || pb.length < 2) return undefined;
  const da = vecSub(pa[pa.length - 1]!, pa[pa.length - 2]!);
  const db = vecSub(pb[1]!, pb[0]!);
  const turn = vecCross(vecNormalize(da), vecNormalize(db));
  if (turn <= 1e-9) return undefined; // concave or straight: the bands already overlap
  const a = vecAdd(corner, vecScale(outward(da), before.width));
  const b = vecAdd(corner, vecScale(outward(db), after.width));
  const m = lineIntersection(a, da, b, db);
  const limit = MITRE_LIMIT * Math.max(before.width, after.width);
  if (m && vecDistance(m, corner) <= limit) return [corner, a, m, b];
  return [corner, a, b];
}

export function cutLineOf(piece: Piece, outline: Outline, op: SeamAllowanceOp): Contour {
  let contour = outlineContour(outline);
  if (contourSignedArea(contour) < 0) contour = contourReverse(contour);
  const polygon = toPathD(contourFlatten(contour, CUT_FLATNESS).map((f) => f.point));
  const shapes: PathD[] = [polygon];
  if (piece.edges.length === 0) {
    // no named edges: one width all round, mitred corners
    if (effective(op.width) > 0) shapes.push(...inflatePathsD([polygon], op.width, JoinType.Miter, EndType.Polygon, MITRE_LIMIT, 6, CUT_FLATNESS));
    return outerBoundary(piece, outline, shapes);
  }
  const runs = runsOf(piece, outline, contour, op);
  runs.forEach((run, i) => {
    if (run.width > 0 && run.points.length >= 2) shapes.push(...inflatePathsD([toPathD(extendEnds(run.points))], run.width, JoinType.Miter, EndType.Butt, 2, 6, CUT_FLATNESS));
    const next = runs[(i + 1) % runs.length]!;
    const patch = cornerPatch(run.points[run.points.length - 1]!, run, next);
    if (patch && (run.width > 0 || next.width > 0)) shapes.push(toPathD(patch));
  });
  return outerBoundary(piece, outline, shapes);
}

function outerBoundary(piece: Piece, outline: Outline, shapes: PathD[]): Contour {
  // same orientation for every shape, so overlaps add up under the non-zero rule
  const oriented = shapes.filter((p) => p.length >= 3).map((p) => (areaD(p) < 0 ? [...p].reverse() : p));
  const union = unionD(oriented, [], FillRule.NonZero, 6);
  let best: PathD | undefined;
  for (const p of union) if (!best || Math.abs(areaD(p)) > Math.abs(areaD(best))) best = p;
  if (!best || best.length < 3) throw new AlterationError('fold', `seam allowance of piece "${piece.name}" size "${outline.size}" could not be drawn`);
  const cut = contourFromPoints(removeSpikes(best.map((p) => ({ x: p.x, y: p.y }))), true);
  return contourSignedArea(cut) < 0 ? contourReverse(cut) : cut;
}

export function performSeamAllowance(pattern: Pattern, op: SeamAllowanceOp): OpResult {
  if (op.pieces) for (const n of op.pieces) if (!pattern.pieces.some((p) => p.name === n)) throw new AlterationError('missing-piece', `there is no piece named "${n}"`);
  const cautions: Caution[] = [];
  const pieces = pattern.pieces.map((piece) => {
    if (op.pieces && !op.pieces.includes(piece.name)) return piece;
    if (piece.seamAllowanceIncluded) {
      cautions.push({ code: 'seam-allowance-included', piece: piece.name, message: `piece "${piece.name}" already includes seam allowance; none was added` });
      return piece;
    }
    return {
      ...piece,
      outlines: piece.outlines.map((o) => {
        const cut = cutLineOf(piece, o, op);
        assertSimple(cut, `seam allowance of piece "${piece.name}" size "${o.size}"`);
        return { ...o, cut: pathToSvg([cut], 4) };
      }),
    };
  });
  return { pattern: { ...pattern, pieces }, cautions };
}
