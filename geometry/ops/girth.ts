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
 * opposite edge does not move. Each segment is cut where the field changes its formula (the
 * grain line, the level, the ends of the taper). Parts the field leaves alone stay exact
 * slices; parts on which it is affine (a line square to the grain, or the untapered side of a
 * `waist`/`hem` corner) move their control points, which is exact; the other parts are redrawn
 * as cubics within REDRAW_TOLERANCE of the exact displaced curve (redrawMapped).
 *
 * Applies to every piece that has the edge, e.g. both side seams: "hip +4 cm" on a trouser is
 * `amount: 10` on the side seams of front and back (2 × (10 + 10) = 40 mm).
 *
 * Refused: taking in at least the distance from the grain line to the edge (the piece would
 * fold); a level the piece lacks; an edge the piece lacks.
 */
import { z } from 'zod';
import { REDRAW_CHECKS } from '../tolerance.ts';
import type { Outline, Pattern, Piece } from '../model.ts';
import { landmarkOf, outlineContour } from '../model.ts';
import { type Path, contourOf, contourLineIntersections, contourNearest, contourStretch, pathFromSvg, segmentMapPoints, segmentSlice, type Segment } from '../path.ts';
import { type Point, pt, vecAdd, vecDot, vecPerp, vecScale } from '../vec.ts';
import { AlterationError, type Caution, type OpResult, type SmoothPlaneMap, assertSimple, fmtMm, mapLine, mapOutline, pieceGrain, redrawMapped, segmentCutTimes, segmentPointThen } from './common.ts';

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
/** d smoothstep / du */
const smoothstepSlope = (u: number): number => (u <= 0 || u >= 1 ? 0 : 6 * u * (1 - u));

interface Field {
  readonly displace: (p: Point) => Point;
  /** The same as displace, for a point given by its coordinates (one object, made only when it moves). */
  readonly displaceXY: (x: number, y: number) => Point;
  /** β-range where the field may be non-zero */
  readonly active: (p: Point) => boolean;
  /** The same as active, for a point given by its coordinates (no object). */
  readonly activeXY: (x: number, y: number) => boolean;
  /** False when no point of the convex hull of the segment's defining points can move (a quick reject). */
  readonly mayMove: (s: Segment) => boolean;
  /** The lines where the field changes its formula: the grain line, the level, the ends of the taper. */
  readonly cuts: readonly { readonly origin: Point; readonly direction: Point }[];
  /** The field as a smooth map with its derivative (redrawMapped). */
  readonly smooth: SmoothPlaneMap;
  /**
   * For a part of a segment lying between two neighbouring cuts (`mid`: a point of it), the
   * field as the affine map it is on that part, when it is one: the part runs square to the
   * grain (one taper value) or lies on the untapered side of a waist/hem corner.
   */
  readonly affineOn: (part: Segment, mid: Point) => ((p: Point) => Point) | undefined;
}

/**
 * What girthField reads of the piece alone, worked out at most once per piece (not once per
 * size line: eleven on the all-sizes demo): its grain, and where its grain line starts across
 * it. Each is found where girthField first asks for it, so errors come in the same order.
 */
interface PieceFrame {
  grain: () => Point;
  /** vecDot(start of the grain line, or the origin, across): `alpha` is that dot product, the same function for every size line (across is square to the one grain). */
  centre: (alpha: (p: Point) => number) => number;
}

function pieceFrame(piece: Piece): PieceFrame {
  let grain: Point | undefined;
  let centre: number | undefined;
  return {
    grain: () => (grain ??= pieceGrain(piece)),
    centre: (alpha) => {
      if (centre === undefined) {
        const grainLine = piece.lines.find((l) => l.role === 'grain');
        centre = grainLine ? alpha(pathFromSvg(grainLine.d)[0]!.segments[0]!.from) : alpha({ x: 0, y: 0 });
      }
      return centre;
    },
  };
}

function girthField(piece: Piece, outline: Outline, op: z.output<typeof girthOpSchema>, frame: PieceFrame): Field {
  const g = frame.grain();
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
  const centre = frame.centre(alpha);
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
  const profileSlope = (bt: number): number => {
    if (op.level === 'waist' && bt <= bLevel) return 0;
    if (op.level === 'hem' && bt >= bLevel) return 0;
    if (bt <= bLevel) return smoothstepSlope((bLevel - bt) / op.above) / op.above;
    return -smoothstepSlope((bt - bLevel) / op.below) / op.below;
  };
  const cuts = [{ origin: vecScale(across, centre), direction: g }];
  for (const b of [op.level === 'waist' ? undefined : bLevel - op.above, bLevel, op.level === 'hem' ? undefined : bLevel + op.below])
    if (b !== undefined) cuts.push({ origin: vecScale(g, b), direction: across });
  const k0 = sign * op.amount;
  /** The displacement k0·w·(alpha − centre)/half along `across` with one taper value w (no clamping): affine. */
  const affineWith = (w: number) => (p: Point): Point => {
    const k = (k0 * w * (p.x * ax + p.y * ay - centre)) / half;
    return pt(p.x + ax * k, p.y + ay * k);
  };
  return {
    cuts,
    smooth: (x, y, out) => {
      const lin = (x * ax + y * ay - centre) / half;
      const bt = x * gx + y * gy;
      const w = Math.max(0, lin);
      const pr = profile(bt);
      const k = k0 * w * pr;
      out[0] = x + ax * k;
      out[1] = y + ay * k;
      // ∇k = k0·(pr·∇w + w·pr′·∇β), ∇w = across/half (0 where clamped), ∇β = g
      const dw = lin > 0 ? pr / half : 0;
      const dp = w * profileSlope(bt);
      const kx = k0 * (dw * ax + dp * gx);
      const ky = k0 * (dw * ay + dp * gy);
      out[2] = 1 + ax * kx;
      out[3] = ax * ky;
      out[4] = ay * kx;
      out[5] = 1 + ay * ky;
    },
    affineOn: (part, mid) => {
      if ((mid.x * ax + mid.y * ay - centre) / half <= 0) return undefined;
      const bm = mid.x * gx + mid.y * gy;
      if ((op.level === 'waist' && bm < bLevel) || (op.level === 'hem' && bm > bLevel)) return affineWith(1);
      const pts = part.kind === 'line' ? [part.from, part.to] : [part.from, part.c1, part.c2, part.to];
      for (const p of pts) if (p.x * gx + p.y * gy !== bm) return undefined;
      return affineWith(profile(bm));
    },
    displace: (p) => {
      const w = weight(p) * profile(beta(p));
      return w === 0 ? p : vecAdd(p, vecScale(across, sign * op.amount * w));
    },
    displaceXY: (x, y) => {
      const w = weightXY(x, y) * profile(x * gx + y * gy);
      if (w === 0) return pt(x, y);
      const k = sign * op.amount * w;
      return pt(x + ax * k, y + ay * k);
    },
    active: (p) => weight(p) > 0 && profile(beta(p)) > 0,
    activeXY: (x, y) => weightXY(x, y) > 0 && profile(x * gx + y * gy) > 0,
    mayMove: (s) => {
      // the segment's defining points: their range along the grain, then whether any lies on the moving side
      const lo = op.level === 'waist' ? -Infinity : bLevel - op.above;
      const hi = op.level === 'hem' ? Infinity : bLevel + op.below;
      let bMin = s.from.x * gx + s.from.y * gy;
      let bMax = bMin;
      const bTo = s.to.x * gx + s.to.y * gy;
      bMin = Math.min(bMin, bTo);
      bMax = Math.max(bMax, bTo);
      if (s.kind === 'cubic') {
        const b1 = s.c1.x * gx + s.c1.y * gy;
        const b2 = s.c2.x * gx + s.c2.y * gy;
        bMin = Math.min(bMin, b1, b2);
        bMax = Math.max(bMax, b1, b2);
      }
      if (bMax <= lo || bMin >= hi) return false;
      const side = (p: Point): boolean => (p.x * ax + p.y * ay - centre) * sign > 0;
      return side(s.from) || (s.kind === 'cubic' && (side(s.c1) || side(s.c2))) || side(s.to);
    },
  };
}

/** Push the deformed segment onto `out`; false when it is the segment itself (nothing of it moves). */
function deformSegmentInto(s: Segment, field: Field, out: Segment[]): boolean {
  if (!field.mayMove(s)) {
    out.push(s);
    return false;
  }
  // parts between the lines where the field changes its formula; on each the field is smooth
  const cuts = segmentCutTimes(s, field.cuts);
  const ts = [0];
  for (let i = 0; i < cuts.length; i++) ts.push(cuts[i]!);
  ts.push(1);
  const moves: boolean[] = [];
  let any = false;
  for (let i = 1; i < ts.length; i++) {
    // A part lies wholly inside or wholly outside the moving zone (it crosses none of its
    // boundaries), so its middle decides; the redraw checks are probed too, in case a root of
    // a tangent touch was lost to round-off (the field is then ~0 there, but it moves).
    const [t0, t1] = [ts[i - 1]!, ts[i]!];
    let m = segmentPointThen(s, (t0 + t1) / 2, field.activeXY);
    for (let k = 1; k <= REDRAW_CHECKS && !m; k++) m = segmentPointThen(s, t0 + ((t1 - t0) * k) / (REDRAW_CHECKS + 1), field.activeXY);
    moves.push(m);
    any ||= m;
  }
  if (!any) {
    out.push(s);
    return false;
  }
  for (let i = 1; i < ts.length; i++) {
    const [t0, t1] = [ts[i - 1]!, ts[i]!];
    const part = ts.length === 2 ? s : segmentSlice(s, t0, t1);
    if (!moves[i - 1]) {
      out.push(part);
      continue;
    }
    const affine = field.affineOn(part, segmentPointThen(s, (t0 + t1) / 2, pt));
    if (affine) out.push(segmentMapPoints(part, affine));
    else {
      const redrawn = redrawMapped(s, t0, t1, field.smooth);
      for (let k = 0; k < redrawn.length; k++) out.push(redrawn[k]!);
    }
  }
  return true;
}

function deformPath(path: Path, field: Field): Path {
  let changed = false;
  const out = path.map((c) => {
    const segments = new Array<Segment>();
    for (let i = 0; i < c.segments.length; i++) if (deformSegmentInto(c.segments[i]!, field, segments)) changed = true;
    return contourOf(segments, c.closed);
  });
  return changed ? out : path;
}

export function performGirth(pattern: Pattern, input: GirthOp): OpResult {
  return performGirthParsed(pattern, girthOpSchema.parse(input));
}

/** performGirth for an operation girthOpSchema has already parsed (applyOps parses each once). */
export function performGirthParsed(pattern: Pattern, op: z.output<typeof girthOpSchema>): OpResult {
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
    const frame = pieceFrame(piece);
    const fields = new Map(piece.outlines.map((o) => [o.size, girthField(piece, o, op, frame)]));
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
