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
 * That union is what the cut line is. Where local checks show that the union's boundary is
 * simply every chord's offset joined to the next where their lines meet, the line is built so,
 * directly (cutLineDirect; a quarter to a fifth of the time on the demo pattern); otherwise
 * the union is drawn (cutLineByUnion). See cutLineOf.
 *
 * Add seam allowance after every other alteration (and after shrinkage) so its width is not
 * changed by them.
 */
import { EndType, FillRule, JoinType, areaD, inflatePathsD, unionD, type PathD } from 'clipper2-ts';
import { z } from 'zod';
import type { Outline, Pattern, Piece } from '../model.ts';
import { landmarkOf, outlineContour } from '../model.ts';
import { F64_SLOT, I32_SLOT, orderByKey, scratchF64, scratchI32 } from '../sweep.ts';
import { type Contour, contourFlatCount, contourFlatInto, contourFlatPerimeter, contourFlatPoints, contourFromPoints, contourIsSimple, contourNearest, contourReverse, contourSignedArea, contourStretch, pathToSvgNow, simplePolygonText } from '../path.ts';
import { type Point, vecAdd, vecCross, vecDistance, vecHypot, vecNormalize, vecPerp, vecScale, vecSub } from '../vec.ts';
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

/** A stretch of the loop with its width; `whole`: the loop itself (no edge found), closed. */
interface Stretch {
  readonly contour: Contour;
  readonly width: number;
  readonly whole: boolean;
}

/** Split a clockwise contour into stretches of equal width, one per edge, in order (see runsOf). */
function stretchesOf(piece: Piece, outline: Outline, contour: Contour, op: SeamAllowanceOp): Stretch[] {
  const widthOf = (name: string, role: string): number => effective(op.edges?.[name] ?? op.edges?.[role] ?? op.width);
  const marks = piece.edges
    .map((e) => {
      const a = landmarkOf(outline, e.from);
      const b = landmarkOf(outline, e.to);
      return a && b ? { from: contourNearest(contour, a), to: contourNearest(contour, b), w: widthOf(e.name, e.role) } : undefined;
    })
    .filter((x) => x !== undefined);
  if (marks.length === 0) return [{ contour, width: effective(op.width), whole: true }];
  // walk the loop from the first edge's start; gaps between edges get the default width
  const order = [...marks].sort((p, q) => p.from.segmentIndex - q.from.segmentIndex || p.from.t - q.from.t);
  const stretches: Stretch[] = [];
  order.forEach((m, i) => {
    const next = order[(i + 1) % order.length]!;
    const edge = contourStretch(contour, m.from, m.to);
    if (edge.segments.length > 0) stretches.push({ contour: edge, width: m.w, whole: false });
    if (vecDistance(m.to.point, next.from.point) > 1e-6) stretches.push({ contour: contourStretch(contour, m.to, next.from), width: effective(op.width), whole: false });
  });
  return stretches;
}

/** Split a clockwise contour into runs of equal width, one per edge, in order. */
function runsOf(piece: Piece, outline: Outline, contour: Contour, op: SeamAllowanceOp): Run[] {
  return stretchesOf(piece, outline, contour, op).map((st) => {
    if (!st.whole) return { points: flatOpen(st.contour), width: st.width };
    const pts = contourFlatPoints(st.contour, CUT_FLATNESS);
    return { points: [...pts, pts[0]!], width: st.width };
  });
}

/**
 * The runs of runsOf as coordinates (the same numbers, no point objects): the points of run r
 * are xs/ys[start[r] … start[r + 1] − 1] (scratch arrays: read them before the next call).
 */
function runCoordinates(stretches: readonly Stretch[]): { xs: Float64Array; ys: Float64Array; start: Int32Array } {
  let total = 0;
  for (const st of stretches) total += contourFlatCount(st.contour, CUT_FLATNESS) + (st.whole ? 1 : 0);
  const xs = scratchF64(F64_SLOT.runXs, total);
  const ys = scratchF64(F64_SLOT.runYs, total);
  const start = scratchI32(I32_SLOT.runStart, stretches.length + 1);
  let at = 0;
  stretches.forEach((st, r) => {
    start[r] = at;
    const first = at;
    at = contourFlatInto(st.contour, CUT_FLATNESS, xs, ys, at);
    if (st.whole && at > first) {
      // the loop's first point again at its end, as runsOf adds it
      xs[at] = xs[first]!;
      ys[at] = ys[first]!;
      at++;
    }
  });
  start[stretches.length] = at;
  return { xs, ys, start };
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
  return contourFlatPoints(c, CUT_FLATNESS);
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

/**
 * The cut line by the method in the header: clipper2-ts offsets of each edge's stretch, corner
 * patches, and the outer boundary of their union with the piece. Always used when the direct
 * construction (cutLineOf) cannot show that it gives the same line; exported as the reference
 * the direct construction is tested against.
 */
export function cutLineByUnion(piece: Piece, outline: Outline, op: SeamAllowanceOp): Contour {
  let contour = outlineContour(outline);
  if (contourSignedArea(contour) < 0) contour = contourReverse(contour);
  const polygon = toPathD(contourFlatPoints(contour, CUT_FLATNESS));
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

/**
 * The cut line, built directly where that gives the outer boundary of the union above, else by
 * the union (cutLineByUnion). A direct line has been found simple by contourIsSimple (the
 * check assertSimple makes); performSeamAllowance checks only a line drawn by the union.
 *
 * The direct construction offsets every chord of the flattened seam line outward by its run's
 * width and joins neighbouring offset chords where their lines meet: at a convex join that is
 * the mitre (clipper's mitre within a run, the corner patch's mitre point between runs); at a
 * concave join it is the crossing that the union trims the two bands to. It is taken only when
 * each of these local facts holds, each of which makes the union's boundary near that join the
 * same two lines meeting at that point:
 *  - every convex join within a run mitres (clipper squares past its mitre limit), and every
 *    corner between runs mitres within MITRE_LIMIT (not bevelled);
 *  - at a corner between runs, the 0.05 mm end overlap of each band stays inside the mitre or
 *    the other band (no butt-end step, e.g. next to a run of width 0 or a much narrower one),
 *    and so does the end of each band's inner half (clipper draws a band on both sides);
 *  - no offset chord is trimmed to less than nothing by the joins at its two ends (a concave
 *    curve tighter than the width, where the union cuts deeper than one chord);
 *  - the runs tile the loop once (edges that overlap go to the union);
 * and then globally that the polygon so built is simple (contourIsSimple) and holds every
 * band's inner half (innerHalvesInside: a piece thinner than its allowance). A simple closed
 * polygon made of outward offsets of every chord, with the joins above, bounds exactly the
 * piece, the bands and the corner patches together: each band and patch lies inside it (every
 * boundary piece of a band is either on the polygon or, by the checks above, inside another
 * band or the piece), and every point inside it lies within a band, a patch or the piece. It
 * differs from the union's boundary only by clipper's rounding to 1e-6 mm and by keeping
 * points that the union drops as collinear. tests/geometry/seam-allowance.test.ts compares the
 * two on the demo pattern after random alteration stacks and on random shapes.
 */
export function cutLineOf(piece: Piece, outline: Outline, op: SeamAllowanceOp): Contour {
  return cutLineDirect(piece, outline, op) ?? cutLineByUnion(piece, outline, op);
}

/** Largest trimming of an offset chord past its other end (mm) still taken as none: round-off. */
const TRIM_SLACK = 1e-9;
/** Largest part (mm) of a band's end overlap allowed to stick out past a mitre: below printing and far below the 1e-4 mm the line is printed to. */
const OVERLAP_SLACK = 1e-5;

/** The direct construction of cutLineOf, or undefined where it cannot show that it equals the union. */
export function cutLineDirect(piece: Piece, outline: Outline, op: SeamAllowanceOp): Contour | undefined {
  const joins = directJoins(piece, outline, op);
  if (!joins) return undefined;
  const out = new Array<Point>(joins.count);
  for (let i = 0; i < joins.count; i++) out[i] = { x: joins.xs[i]!, y: joins.ys[i]! };
  // `out[i]` joins chord i to chord i + 1; the polygon runs through them in order
  const cut = contourFromPoints(out, true);
  if (!contourIsSimple(cut) || contourSignedArea(cut) <= 0) return undefined;
  return cut;
}

/**
 * The text of cutLineDirect's line as pathToSvgNow([cut], 4) prints it, written from the join
 * points without point and segment objects (the seam allowance of every outline of a pattern
 * makes thousands); undefined where cutLineDirect gives undefined.
 */
function cutTextDirect(piece: Piece, outline: Outline, op: SeamAllowanceOp): string | undefined {
  const joins = directJoins(piece, outline, op);
  if (!joins) return undefined;
  const text = simplePolygonText(joins.xs, joins.ys, joins.count, 4);
  if (text !== null) return text;
  // the lean test could not rule out a crossing: decide as cutLineDirect does
  const cut = cutLineDirect(piece, outline, op);
  return cut ? pathToSvgNow([cut], 4) : undefined;
}

/**
 * The join points of the direct construction in order (scratch arrays: read them before the
 * next call), or undefined where the checks below cannot show that it gives the union.
 */
function directJoins(piece: Piece, outline: Outline, op: SeamAllowanceOp): { xs: Float64Array; ys: Float64Array; count: number } | undefined {
  let contour = outlineContour(outline);
  if (contourSignedArea(contour) < 0) contour = contourReverse(contour);
  let stretches: Stretch[];
  let closedRun = false;
  if (piece.edges.length === 0) {
    stretches = [{ contour, width: effective(op.width), whole: true }];
    closedRun = true;
  } else stretches = stretchesOf(piece, outline, contour, op);
  // the runs' points as coordinates: run r is rx/ry[rs[r] … rs[r + 1] − 1]
  const { xs: rx, ys: ry, start: rs } = runCoordinates(stretches);
  const runCount = stretches.length;
  if (!closedRun) {
    if (runCount === 0) return undefined;
    // the runs must tile the loop once, end to start (their length is checked with the chords below)
    for (let r = 0; r < runCount; r++) {
      const first = rs[r]!;
      const end = rs[r + 1]!;
      if (end - first < 2) return undefined;
      const nextFirst = rs[r + 1 === runCount ? 0 : r + 1]!;
      if (vecHypot(rx[end - 1]! - rx[nextFirst]!, ry[end - 1]! - ry[nextFirst]!) > 1e-6) return undefined;
    }
  }
  // chords: seam start (px, py), unit direction (dx, dy), length, width, run index
  let count = 0;
  for (let r = 0; r < runCount; r++) count += rs[r + 1]! - rs[r]! - 1;
  const px = scratchF64(F64_SLOT.cutPx, count);
  const py = scratchF64(F64_SLOT.cutPy, count);
  const dx = scratchF64(F64_SLOT.cutDx, count);
  const dy = scratchF64(F64_SLOT.cutDy, count);
  const len = scratchF64(F64_SLOT.cutLen, count);
  const wd = scratchF64(F64_SLOT.cutWd, count);
  const run = scratchI32(I32_SLOT.cutRun, count);
  let k = 0;
  // the length of the runs, chord by chord in order (each chord's length is its vecDistance: hypot is symmetric)
  let total = 0;
  for (let ri = 0; ri < runCount; ri++) {
    const width = stretches[ri]!.width;
    for (let i = rs[ri]! + 1; i < rs[ri + 1]!; i++) {
      const ax = rx[i - 1]!;
      const ay = ry[i - 1]!;
      const bx = rx[i]!;
      const by = ry[i]!;
      const l = vecHypot(bx - ax, by - ay);
      total += l;
      if (!(l > 1e-9)) continue;
      px[k] = ax;
      py[k] = ay;
      dx[k] = (bx - ax) / l;
      dy[k] = (by - ay) / l;
      len[k] = l;
      wd[k] = width;
      run[k] = ri;
      k++;
    }
  }
  if (!closedRun) {
    // ... and together as long as the flattened loop
    const perimeter = contourFlatPerimeter(contour, CUT_FLATNESS);
    if (Math.abs(total - perimeter) > 1e-6 * Math.max(1, perimeter)) return undefined;
  }
  const n = k;
  if (n < 3) return undefined;
  // where each offset chord starts and ends after its joins (mm along it from its seam start),
  // and the join point after each chord; chords are linked so that one trimmed away can go
  const from = scratchF64(F64_SLOT.cutFrom, n);
  const to = scratchF64(F64_SLOT.cutTo, n);
  const jx = scratchF64(F64_SLOT.cutJx, n);
  const jy = scratchF64(F64_SLOT.cutJy, n);
  const next = scratchI32(I32_SLOT.cutNext, n);
  const prev = scratchI32(I32_SLOT.cutPrev, n);
  for (let i = 0; i < n; i++) {
    next[i] = i + 1 === n ? 0 : i + 1;
    prev[i] = i === 0 ? n - 1 : i - 1;
  }
  /** Join chord i to chord j (the next one kept); false when the union may differ there. */
  const join = (i: number, j: number): boolean => {
    // the corner: end of chord i (= start of chord j unless chords between were trimmed away)
    const cx = px[i]! + len[i]! * dx[i]!;
    const cy = py[i]! + len[i]! * dy[i]!;
    const ox = px[j]! - cx; // start of chord j from the corner (0 unless chords were dropped)
    const oy = py[j]! - cy;
    // outward normals (−perp of the direction)
    const nix = dy[i]!;
    const niy = -dx[i]!;
    const njx = dy[j]!;
    const njy = -dx[j]!;
    const wi = wd[i]!;
    const wj = wd[j]!;
    const sin = dx[i]! * dy[j]! - dy[i]! * dx[j]!; // > 0: convex
    const cos = dx[i]! * dx[j]! + dy[i]! * dy[j]!;
    const between = !closedRun && run[i] !== run[j];
    // the offset lines: A = c + wi·ni + s·di, B = c + o + wj·nj + t·dj; where they meet
    let sA: number; // along A from the corner
    let sB: number; // along B from chord j's start
    if (Math.abs(sin) < 1e-9) {
      if (cos < 0 || Math.abs(wi - wj) > 1e-12 || vecHypot(ox, oy) > 1e-9) return false;
      sA = 0;
      sB = 0;
    } else {
      // c + wi·ni + sA·di = c + o + wj·nj + sB·dj
      const qx = ox + wj * njx - wi * nix;
      const qy = oy + wj * njy - wi * niy;
      sA = (qx * dy[j]! - qy * dx[j]!) / sin;
      sB = (qx * dy[i]! - qy * dx[i]!) / sin;
    }
    if (sin > 1e-9) {
      // convex: a mitre
      if (between) {
        const mx = wi * nix + sA * dx[i]!;
        const my = wi * niy + sA * dy[i]!;
        if (vecHypot(mx, my) > MITRE_LIMIT * Math.max(wi, wj)) return false; // bevelled
        // each band's end overlap must stay inside the mitre (or stick out by a negligible sliver)
        if (sA < END_OVERLAP && (sA < 0 || (END_OVERLAP - sA) * sin > OVERLAP_SLACK)) return false;
        if (-sB < END_OVERLAP && (-sB < 0 || (END_OVERLAP + sB) * sin > OVERLAP_SLACK)) return false;
        // each band is drawn on both sides of its stretch; the inner half's end must stay inside
        // the piece (behind the other stretch's line) or inside the other band
        const ax = END_OVERLAP * dx[i]! - wi * nix;
        const ay = END_OVERLAP * dy[i]! - wi * niy;
        const aOut = ax * njx + ay * njy;
        if (aOut > 0 && (aOut > wj || ax * dx[j]! + ay * dy[j]! < -END_OVERLAP)) return false;
        const bx = -END_OVERLAP * dx[j]! - wj * njx;
        const by = -END_OVERLAP * dy[j]! - wj * njy;
        const bOut = bx * nix + by * niy;
        if (bOut > 0 && (bOut > wi || bx * dx[i]! + by * dy[i]! > END_OVERLAP)) return false;
      } else {
        const limit = closedRun ? MITRE_LIMIT : 2;
        if (!(cos > 0.999 || cos > 2 / (limit * limit) - 1)) return false; // clipper squares it
      }
    } else if (sin < -1e-9) {
      // concave: the two bands cross; clipper's near-reversal joins go another way
      if (cos <= -0.99) return false;
      if (between) {
        // each band's extended outer end lies inside the other band
        const ax = END_OVERLAP * dx[i]! + wi * nix;
        const ay = END_OVERLAP * dy[i]! + wi * niy;
        if (ax * njx + ay * njy > wj + 1e-9 || ax * dx[j]! + ay * dy[j]! < -END_OVERLAP) return false;
        const bx = -END_OVERLAP * dx[j]! + wj * njx;
        const by = -END_OVERLAP * dy[j]! + wj * njy;
        if (bx * nix + by * niy > wi + 1e-9 || bx * dx[i]! + by * dy[i]! > END_OVERLAP) return false;
      }
    } else if (Math.abs(wi - wj) > 1e-12) return false; // straight, widths differ: a butt-end step
    to[i] = len[i]! + sA;
    from[j] = sB;
    jx[i] = cx + wi * nix + sA * dx[i]!;
    jy[i] = cy + wi * niy + sA * dy[i]!;
    return true;
  };
  for (let i = 0; i < n; i++) if (!join(i, next[i]!)) return undefined;
  // A chord whose offset its neighbours trim to less than nothing (a sliver of a chord at a
  // concave turn) lies inside their bands: drop it and join its neighbours, as the union does.
  // Only inside a run, and only a chord shorter than its width.
  let kept = n;
  let changed = true;
  while (changed) {
    changed = false;
    for (let i = 0; i < n; i++) {
      if (prev[i] === -1 || !(to[i]! < from[i]! - TRIM_SLACK)) continue;
      const p = prev[i]!;
      const q = next[i]!;
      if (kept <= 3 || len[i]! >= wd[i]! || (!closedRun && (run[p] !== run[i] || run[q] !== run[i]))) return undefined;
      next[p] = q;
      prev[q] = p;
      prev[i] = -1;
      kept--;
      if (!join(p, q)) return undefined;
      changed = true;
    }
  }
  // the join points of the chords kept, in order
  const ox = scratchF64(F64_SLOT.cutOutX, kept);
  const oy = scratchF64(F64_SLOT.cutOutY, kept);
  for (let i = 0, o = 0; i < n; i++)
    if (prev[i] !== -1) {
      ox[o] = jx[i]!;
      oy[o] = jy[i]!;
      o++;
    }
  if (!innerHalvesInside(ox, oy, kept, n, px, py, dx, dy, len, wd, closedRun ? undefined : run)) return undefined;
  return { xs: ox, ys: oy, count: kept };
}

/**
 * True when, at the vertex v where chord a ends and chord b starts (same width w), the seam
 * turns toward the inside by φ with 0 ≤ φ ≤ 90° and w·sin φ ≤ both chord lengths. Then the end
 * of a's half-band, v + s·m_a (s in [0, w], m the inward normal), lies in b's half-band: along b
 * it is at s·sin φ ∈ [0, len_b], inward s·cos φ ∈ [0, w]; and symmetrically b's end lies in a's
 * half-band (at len_a − s·sin φ along a). So neither end is a side of the union of the two.
 */
function hiddenEnd(a: number, b: number, dx: Float64Array, dy: Float64Array, len: Float64Array, w: number): boolean {
  const sin = dx[a]! * dy[b]! - dy[a]! * dx[b]!;
  const cos = dx[a]! * dx[b]! + dy[a]! * dy[b]!;
  return sin >= 0 && cos >= 0 && w * sin <= Math.min(len[a]!, len[b]!);
}

/**
 * True when every chord's inner half-band (clipper draws each band on both sides of its
 * stretch; the 0.05 mm end overlap at the ends of a run included) lies inside the polygon
 * `cut`. Each half-band is a rectangle standing on its seam chord, and the seam chord lies on
 * the inner side of its own offset, an edge of `cut`; so the half-bands of a run, a connected
 * union of rectangles, lie inside when none of the sides of that union meets an edge of the
 * polygon (every side of every rectangle is tested but the ends hidden inside a neighbour).
 * Touching counts as meeting, so a chord next to a run of width 0, whose seam is part of the
 * cut line, is left to the union. A sweep over x on typed arrays.
 */
function innerHalvesInside(
  cutX: Float64Array,
  cutY: Float64Array,
  c: number,
  n: number,
  px: Float64Array,
  py: Float64Array,
  dx: Float64Array,
  dy: Float64Array,
  len: Float64Array,
  wd: Float64Array,
  /** the run of each chord; undefined for one closed run (no run ends) */
  run: Int32Array | undefined,
): boolean {
  const m = 4 * n + c;
  const ax = scratchF64(F64_SLOT.halvesAx, m);
  const ay = scratchF64(F64_SLOT.halvesAy, m);
  const bx = scratchF64(F64_SLOT.halvesBx, m);
  const by = scratchF64(F64_SLOT.halvesBy, m);
  let count = 0;
  const add = (x0: number, y0: number, x1: number, y1: number): void => {
    ax[count] = x0;
    ay[count] = y0;
    bx[count] = x1;
    by[count] = y1;
    count++;
  };
  for (let k = 0; k < c; k++) {
    const q = k + 1 === c ? 0 : k + 1;
    add(cutX[k]!, cutY[k]!, cutX[q]!, cutY[q]!);
  }
  const probesFrom = count;
  // the sides of each kind in chord order, one kind after another (the seam chords, the inner
  // sides, the ends): their keys then rise and fall in long runs, which orderByKey merges
  for (let kind = 0; kind < 3; kind++)
    for (let i = 0; i < n; i++) {
      const w = wd[i]!;
      if (!(w > 0)) continue;
      if (kind === 0) {
        add(px[i]!, py[i]!, px[i]! + len[i]! * dx[i]!, py[i]! + len[i]! * dy[i]!);
        continue;
      }
      // whether the chord starts or ends a run (its band's end overlap is drawn there)
      const first = run !== undefined && run[i === 0 ? n - 1 : i - 1] !== run[i];
      const last = run !== undefined && run[i + 1 === n ? 0 : i + 1] !== run[i];
      const s0 = first ? -END_OVERLAP : 0;
      const s1 = len[i]! + (last ? END_OVERLAP : 0);
      // inward normal: perp of the direction
      const inx = -dy[i]! * w;
      const iny = dx[i]! * w;
      const x0 = px[i]! + s0 * dx[i]!;
      const y0 = py[i]! + s0 * dy[i]!;
      const x1 = px[i]! + s1 * dx[i]!;
      const y1 = py[i]! + s1 * dy[i]!;
      if (kind === 1) {
        add(x0 + inx, y0 + iny, x1 + inx, y1 + iny);
        continue;
      }
      // An end of a half-band at a convex vertex inside a run lies inside the neighbouring
      // half-band (see hiddenEnd), so it is not a side of their union and need not be tested.
      if (first || !hiddenEnd(i === 0 ? n - 1 : i - 1, i, dx, dy, len, w)) add(x0, y0, x0 + inx, y0 + iny);
      if (last || !hiddenEnd(i, i + 1 === n ? 0 : i + 1, dx, dy, len, w)) add(x1, y1, x1 + inx, y1 + iny);
    }
  // The pairs tested are those whose x ranges and y ranges both overlap; whether any of them
  // crosses does not depend on the order they come in, so the sweep runs along the longer side
  // of the box (a leg piece is several times taller than wide: far fewer segments active at once).
  let boxMinX = Infinity;
  let boxMaxX = -Infinity;
  let boxMinY = Infinity;
  let boxMaxY = -Infinity;
  for (let s = 0; s < count; s++) {
    boxMinX = Math.min(boxMinX, ax[s]!, bx[s]!);
    boxMaxX = Math.max(boxMaxX, ax[s]!, bx[s]!);
    boxMinY = Math.min(boxMinY, ay[s]!, by[s]!);
    boxMaxY = Math.max(boxMaxY, ay[s]!, by[s]!);
  }
  const overY = boxMaxY - boxMinY > boxMaxX - boxMinX;
  const ua = overY ? ay : ax; // the sweep's coordinate
  const ub = overY ? by : bx;
  const va = overY ? ax : ay; // the other one
  const vb = overY ? bx : by;
  const lo = scratchF64(F64_SLOT.halvesLo, count);
  const hi = scratchF64(F64_SLOT.halvesHi, count);
  const vLo = scratchF64(F64_SLOT.halvesVLo, count);
  const vHi = scratchF64(F64_SLOT.halvesVHi, count);
  for (let s = 0; s < count; s++) {
    lo[s] = Math.min(ua[s]!, ub[s]!);
    hi[s] = Math.max(ua[s]!, ub[s]!);
    vLo[s] = Math.min(va[s]!, vb[s]!);
    vHi[s] = Math.max(va[s]!, vb[s]!);
  }
  // any order by lo tests the same pairs (see mayCross in path.ts)
  const order = orderByKey(lo, count);
  const orient = (x0: number, y0: number, x1: number, y1: number, x2: number, y2: number): number => (x1 - x0) * (y2 - y0) - (y1 - y0) * (x2 - x0);
  // two active lists (edges of the cut, probes): each segment is tested against the other kind only
  const activeEdges = scratchI32(I32_SLOT.halvesEdges, count);
  const activeProbes = scratchI32(I32_SLOT.halvesProbes, count);
  let liveEdges = 0;
  let liveProbes = 0;
  for (let r = 0; r < count; r++) {
    const e = order[r]!;
    const left = lo[e]!;
    const probe = e >= probesFrom;
    const others = probe ? activeEdges : activeProbes;
    const live = probe ? liveEdges : liveProbes;
    const eMin = vLo[e]!;
    const eMax = vHi[e]!;
    // one pass: drop the other kind's segments the sweep has left behind, test the others
    let kept = 0;
    for (let k = 0; k < live; k++) {
      const o = others[k]!;
      if (hi[o]! < left) continue;
      others[kept++] = o;
      if (vHi[o]! < eMin || eMax < vLo[o]!) continue;
      const d1 = orient(ax[o]!, ay[o]!, bx[o]!, by[o]!, ax[e]!, ay[e]!);
      const d2 = orient(ax[o]!, ay[o]!, bx[o]!, by[o]!, bx[e]!, by[e]!);
      if (d1 * d2 > 0) continue;
      const d3 = orient(ax[e]!, ay[e]!, bx[e]!, by[e]!, ax[o]!, ay[o]!);
      const d4 = orient(ax[e]!, ay[e]!, bx[e]!, by[e]!, bx[o]!, by[o]!);
      if (d3 * d4 <= 0) return false;
    }
    if (probe) {
      liveEdges = kept;
      activeProbes[liveProbes++] = e;
    } else {
      liveProbes = kept;
      activeEdges[liveEdges++] = e;
    }
  }
  return true;
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
        const direct = cutTextDirect(piece, o, op);
        if (direct !== undefined) return { ...o, cut: direct };
        const cut = cutLineByUnion(piece, o, op);
        assertSimple(cut, `seam allowance of piece "${piece.name}" size "${o.size}"`);
        return { ...o, cut: pathToSvgNow([cut], 4) };
      }),
    };
  });
  return { pattern: { ...pattern, pieces }, cautions };
}
