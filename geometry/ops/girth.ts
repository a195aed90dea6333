/**
 * Girth: let out or take in an edge at one level and taper the change along the seam
 * (trade reference §3.8 outer thigh, §3.10 waist and hip; §6 examples 4–5).
 *
 * Parameters a practitioner gives: which edge (`edge`: an edge name or role, e.g. `side-seam`),
 * at which level (`level`: a level line such as `hip` or `thigh`, or `waist`/`hem` for the top
 * or bottom end of the edge, i.e. the corner), by how much (`amount` mm across the grain, +
 * lets out, − takes in), and how far the change runs out along the grain above and below
 * the level (`above`, `below`, mm; default 100 each).
 *
 * The change is a smooth displacement across the grain: full at the level, fading to zero at
 * `above`/`below` along the grain (smoothstep), and across the piece fading linearly from the
 * edge to zero at the grain line, so the adjoining seams (waist, hem) are trued with it and the
 * opposite edge does not move. Curves in the changed zone are re-drawn as smooth cubics through
 * points of the displaced curve (3 mm apart); everything else stays exact.
 *
 * Applies to every piece that has the edge, e.g. both side seams: "hip +4 cm" on a trouser is
 * `amount: 10` on the side seams of front and back (2 × (10 + 10) = 40 mm).
 *
 * Refused: taking in at least the distance from the grain line to the edge (the piece would
 * fold); a level the piece lacks; an edge the piece lacks.
 */
import { z } from 'zod';
import type { Outline, Pattern, Piece } from '../model.ts';
import { landmarkOf, outlineContour } from '../model.ts';
import { type Path, contourLineIntersections, contourNearest, contourStretch, pathFromSvg, segmentLength, type Segment } from '../path.ts';
import { type Point, vecAdd, vecDot, vecPerp, vecScale } from '../vec.ts';
import { AlterationError, type Caution, type OpResult, assertSimple, fmtMm, mapLine, mapOutline, pieceGrain, smoothThrough } from './common.ts';

export const girthOpSchema = z.object({
  op: z.literal('girth'),
  edge: z.string().min(1),
  level: z.string().min(1),
  amount: z.number().min(-200).max(200),
  above: z.number().positive().max(2000).default(100),
  below: z.number().positive().max(2000).default(100),
  pieces: z.array(z.string()).optional(),
});
export type GirthOp = z.input<typeof girthOpSchema>;

const smoothstep = (u: number): number => (u <= 0 ? 0 : u >= 1 ? 1 : u * u * (3 - 2 * u));

interface Field {
  readonly displace: (p: Point) => Point;
  /** The same as displace, for a point given by its coordinates (one object, made only when it moves). */
  readonly displaceXY: (x: number, y: number) => Point;
  /** β-range where the field may be non-zero */
  readonly active: (p: Point) => boolean;
  /** The same as active, for a point given by its coordinates (no object). */
  readonly activeXY: (x: number, y: number) => boolean;
  /** False when no point of the convex hull of `points` can move (a quick reject). */
  readonly mayMove: (points: readonly Point[]) => boolean;
}

function girthField(piece: Piece, outline: Outline, op: z.output<typeof girthOpSchema>): Field {
  const g = pieceGrain(piece);
  const across = vecPerp(g);
  const edge = piece.edges.find((e) => e.name === op.edge) ?? piece.edges.find((e) => e.role === op.edge);
  if (!edge) throw new AlterationError('missing-line', `piece "${piece.name}" has no edge "${op.edge}"`);
  const contour = outlineContour(outline);
  const a = landmarkOf(outline, edge.from)!;
  const b = landmarkOf(outline, edge.to)!;
  const stretch = contourStretch(contour, contourNearest(contour, a), contourNearest(contour, b));
  const beta = (p: Point): number => vecDot(p, g);
  const alpha = (p: Point): number => vecDot(p, across);
  // the edge point at the level
  let at: Point;
  if (op.level === 'waist' || op.level === 'hem') {
    at = (beta(a) < beta(b)) === (op.level === 'waist') ? a : b;
  } else {
    const line = piece.lines.find((l) => l.role === 'level' && l.name === op.level && l.size === outline.size) ?? piece.lines.find((l) => l.role === 'level' && l.name === op.level && l.size === undefined);
    if (!line) throw new AlterationError('bad-level', `piece "${piece.name}" has no level line "${op.level}"`);
    const segs = pathFromSvg(line.d).flatMap((c) => c.segments);
    const o = segs[0]!.from;
    const d = { x: segs[segs.length - 1]!.to.x - o.x, y: segs[segs.length - 1]!.to.y - o.y };
    const hits = contourLineIntersections(stretch, o, d);
    if (hits.length === 0) throw new AlterationError('bad-level', `level "${op.level}" does not cross edge "${edge.name}" of piece "${piece.name}" size "${outline.size}"`);
    at = hits[0]!.point;
  }
  const grainLine = piece.lines.find((l) => l.role === 'grain');
  const centre = grainLine ? alpha(pathFromSvg(grainLine.d)[0]!.segments[0]!.from) : alpha({ x: 0, y: 0 });
  const half = alpha(at) - centre;
  if (Math.abs(half) < 1) throw new AlterationError('bad-level', `edge "${edge.name}" of piece "${piece.name}" lies on the grain line; there is no width to change`);
  if (op.amount < 0 && -op.amount >= Math.abs(half))
    throw new AlterationError('bad-amount', `taking in ${fmtMm(-op.amount)} at ${op.level} would fold piece "${piece.name}" over itself: the edge is only ${fmtMm(Math.abs(half))} from the grain line there`);
  const bLevel = beta(at);
  const sign = Math.sign(half);
  const profile = (bt: number): number => {
    if (op.level === 'waist' && bt <= bLevel) return 1;
    if (op.level === 'hem' && bt >= bLevel) return 1;
    if (bt <= bLevel) return 1 - smoothstep((bLevel - bt) / op.above);
    return 1 - smoothstep((bt - bLevel) / op.below);
  };
  const weight = (p: Point): number => Math.max(0, (alpha(p) - centre) / half);
  // The *XY forms below repeat weight, profile, vecDot, vecScale and vecAdd with the same
  // arithmetic in the same order, so they give the very same numbers without the objects.
  const [gx, gy, ax, ay] = [g.x, g.y, across.x, across.y];
  const weightXY = (x: number, y: number): number => Math.max(0, (x * ax + y * ay - centre) / half);
  return {
    displace: (p) => {
      const w = weight(p) * profile(beta(p));
      return w === 0 ? p : vecAdd(p, vecScale(across, sign * op.amount * w));
    },
    displaceXY: (x, y) => {
      const w = weightXY(x, y) * profile(x * gx + y * gy);
      if (w === 0) return { x, y };
      const k = sign * op.amount * w;
      return { x: x + ax * k, y: y + ay * k };
    },
    active: (p) => weight(p) > 0 && profile(beta(p)) > 0,
    activeXY: (x, y) => weightXY(x, y) > 0 && profile(x * gx + y * gy) > 0,
    mayMove: (points) => {
      const bs = points.map(beta);
      const lo = op.level === 'waist' ? -Infinity : bLevel - op.above;
      const hi = op.level === 'hem' ? Infinity : bLevel + op.below;
      if (Math.max(...bs) <= lo || Math.min(...bs) >= hi) return false;
      return points.some((p) => (alpha(p) - centre) * sign > 0);
    },
  };
}

function deformSegment(s: Segment, field: Field): Segment[] {
  if (!field.mayMove(s.kind === 'line' ? [s.from, s.to] : [s.from, s.c1, s.c2, s.to])) return [s];
  const len = segmentLength(s, 1e-3);
  const m = Math.max(2, Math.ceil(len / 2));
  let moves = false;
  for (let k = 0; k <= m && !moves; k++) moves = pointAt(s, k / m, field.activeXY);
  if (!moves) return [s];
  const n = Math.max(2, Math.ceil(len / 3));
  const pts: Point[] = new Array<Point>(n + 1);
  for (let k = 0; k <= n; k++) pts[k] = pointAt(s, k / n, field.displaceXY);
  return smoothThrough(pts);
}

/**
 * f applied to segmentPoint(s, t) given as coordinates: the arithmetic of vecLerp (lines) and
 * cubicPoint (cubics) inline, so no point object is made.
 */
function pointAt<T>(s: Segment, t: number, f: (x: number, y: number) => T): T {
  if (s.kind === 'line') return f(s.from.x + (s.to.x - s.from.x) * t, s.from.y + (s.to.y - s.from.y) * t);
  const mt = 1 - t;
  const a = mt * mt * mt;
  const b = 3 * mt * mt * t;
  const d = 3 * mt * t * t;
  const e = t * t * t;
  return f(a * s.from.x + b * s.c1.x + d * s.c2.x + e * s.to.x, a * s.from.y + b * s.c1.y + d * s.c2.y + e * s.to.y);
}

function deformPath(path: Path, field: Field): Path {
  let changed = false;
  const out = path.map((c) => ({
    closed: c.closed,
    segments: c.segments.flatMap((s) => {
      const r = deformSegment(s, field);
      if (r.length !== 1 || r[0] !== s) changed = true;
      return r;
    }),
  }));
  return changed ? out : path;
}

export function performGirth(pattern: Pattern, input: GirthOp): OpResult {
  const op = girthOpSchema.parse(input);
  if (op.pieces) for (const n of op.pieces) if (!pattern.pieces.some((p) => p.name === n)) throw new AlterationError('missing-piece', `there is no piece named "${n}"`);
  const has = (p: Piece): boolean => p.edges.some((e) => e.name === op.edge || e.role === op.edge);
  const hasLevel = (p: Piece): boolean => op.level === 'waist' || op.level === 'hem' || p.lines.some((l) => l.role === 'level' && l.name === op.level);
  const withEdge = pattern.pieces.filter((p) => (!op.pieces || op.pieces.includes(p.name)) && has(p));
  if (withEdge.length === 0) throw new AlterationError('missing-line', `no piece has an edge "${op.edge}"`);
  const targets = withEdge.filter(hasLevel);
  if (targets.length === 0) throw new AlterationError('bad-level', `no piece with edge "${op.edge}" has a level line "${op.level}"`);
  const cautions: Caution[] = [];
  for (const p of withEdge)
    if (!targets.includes(p)) cautions.push({ code: 'missing-level', piece: p.name, message: `piece "${p.name}" has edge "${op.edge}" but no level "${op.level}"; it was left unchanged — check that it still matches its neighbour` });
  if (Math.abs(op.amount) > 25) cautions.push({ code: 'large-change', message: `a girth change of ${fmtMm(op.amount)} per edge is large; blending sizes may fit better (trade reference §3.10) — sew a test garment first` });
  const pieces = pattern.pieces.map((piece) => {
    if (!targets.includes(piece)) return piece;
    const fields = new Map(piece.outlines.map((o) => [o.size, girthField(piece, o, op)]));
    const mid = fields.get(piece.outlines[Math.floor((piece.outlines.length - 1) / 2)]!.size)!;
    const outlines = piece.outlines.map((o) => {
      const f = fields.get(o.size)!;
      const mapped = mapOutline(o, (p) => deformPath(p, f), f.displace);
      assertSimple(outlineContour(mapped), `girth on piece "${piece.name}" size "${o.size}"`);
      return mapped;
    });
    const lines = piece.lines.map((l) => mapLine(l, (p) => deformPath(p, l.size !== undefined && fields.has(l.size) ? fields.get(l.size)! : mid)));
    return { ...piece, outlines, lines };
  });
  return { pattern: { ...pattern, pieces }, cautions };
}
