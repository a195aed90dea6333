/**
 * Shared machinery of the alteration operations: results, cautions, errors, the grain frame
 * of a piece, and piecewise-affine deformations of a whole piece.
 */
import {
  type Contour,
  type Path,
  contourFlatPoints,
  contourSelfCrossings,
  pathFromSvg,
  pathToSvg,
  segmentLineIntersections,
  segmentSplitAt,
  segmentTransform,
  segmentPoint,
  lineSegment,
  contourOf,
  curveSegment,
  type CubicSegment,
  type Segment,
} from '../path.ts';
import { PARAM_EPSILON, REDRAW_CHECKS, REDRAW_TOLERANCE, SMOOTH_MERGE_TOLERANCE } from '../tolerance.ts';
import { type Outline, type Pattern, type PatternLine, type Piece, landmarkOf, outlineContour, orderedOutlines } from '../model.ts';
import { type Affine, type Point, AFFINE_IDENTITY, pt, affineApply, affineInvert, affineMultiply, vecCross, vecDistance, vecDot, vecHypot, vecNormalize, vecSub } from '../vec.ts';

/** Something the person should know about a result (an estimate, a large change, …). */
export interface Caution {
  readonly code: 'extrapolated-size' | 'fractional-size' | 'large-change' | 'missing-level' | 'seam-allowance-included' | 'estimate';
  readonly message: string;
  readonly piece?: string;
}

export interface OpResult {
  readonly pattern: Pattern;
  readonly cautions: readonly Caution[];
}

export type AlterationErrorCode = 'missing-line' | 'missing-piece' | 'bad-amount' | 'fold' | 'no-correspondence' | 'bad-level' | 'bad-size';

/** An operation refused: the pattern is returned unchanged by the caller; `message` says why. */
export class AlterationError extends Error {
  override readonly name = 'AlterationError';
  constructor(
    readonly code: AlterationErrorCode,
    message: string,
    readonly where?: Point,
  ) {
    super(message);
  }
}

export const fmtMm = (v: number): string => `${Math.round(v * 100) / 100} mm`;
export const fmtPt = (p: Point): string => `(${Math.round(p.x * 10) / 10}, ${Math.round(p.y * 10) / 10})`;

/**
 * The unit grain direction of a piece, pointing from the waist toward the hem.
 * Taken from the first `grain` line (first to last point); without one, +y (pieces drawn
 * upright). Oriented toward the hem edge when the piece names hem and waist edges, else so
 * that it does not point up the page (y < 0).
 */
export function pieceGrain(piece: Piece): Point {
  let g: Point = { x: 0, y: 1 };
  const line = piece.lines.find((l) => l.role === 'grain');
  if (line) {
    const path = pathFromSvg(line.d);
    const segs = path.flatMap((c) => c.segments);
    if (segs.length > 0) {
      const d = vecNormalize(vecSub(segs[segs.length - 1]!.to, segs[0]!.from));
      if (d.x !== 0 || d.y !== 0) g = d;
    }
  }
  const outline = piece.outlines[0]!;
  const hem = piece.edges.find((e) => e.role === 'hem');
  const top = piece.edges.find((e) => e.role === 'waist') ?? piece.edges.find((e) => e.role === 'other');
  const hemPt = hem ? landmarkOf(outline, hem.from) : undefined;
  const topPt = top ? landmarkOf(outline, top.from) : undefined;
  if (hemPt && topPt) {
    if (vecDot(vecSub(hemPt, topPt), g) < 0) g = { x: -g.x, y: -g.y };
  } else if (g.y < 0 || (g.y === 0 && g.x < 0)) g = { x: -g.x, y: -g.y };
  return g;
}

/** Range of the projection of an outline on a direction (by its flattening). */
export function projectionRange(contour: Contour, direction: Point, origin: Point = { x: 0, y: 0 }): { min: number; max: number } {
  let min = Infinity;
  let max = -Infinity;
  for (const p of contourFlatPoints(contour, 0.05)) {
    const v = vecDot(vecSub(p, origin), direction);
    min = Math.min(min, v);
    max = Math.max(max, v);
  }
  return { min, max };
}

/** The affine map sending the three source points to the three destination points. */
export function affineFromPoints(src: readonly [Point, Point, Point], dst: readonly [Point, Point, Point]): Affine {
  const S: Affine = { a: src[1].x - src[0].x, b: src[1].y - src[0].y, c: src[2].x - src[0].x, d: src[2].y - src[0].y, e: src[0].x, f: src[0].y };
  const D: Affine = { a: dst[1].x - dst[0].x, b: dst[1].y - dst[0].y, c: dst[2].x - dst[0].x, d: dst[2].y - dst[0].y, e: dst[0].x, f: dst[0].y };
  return affineMultiply(D, affineInvert(S));
}

/**
 * A piecewise-affine map of the plane: the plane is cut by parallel lines `origin + s·direction`
 * at offsets `breaks` (measured with `coordinate`), and each band between cuts has its own
 * affine map (`maps.length === breaks.length + 1`). Continuous when neighbouring maps agree on
 * their shared cut line (the caller's duty). Lines and cubics inside one band map exactly.
 */
export interface BandMap {
  /** Signed coordinate of a point across the cut lines (increasing across bands). */
  readonly coordinate: (p: Point) => number;
  /** A point on the cut line at coordinate b. */
  readonly lineAt: (b: number) => Point;
  readonly direction: Point;
  readonly breaks: readonly number[];
  readonly maps: readonly Affine[];
}

function bandIndex(m: BandMap, v: number): number {
  let i = 0;
  while (i < m.breaks.length && v > m.breaks[i]!) i++;
  return i;
}

export function bandMapPoint(m: BandMap, p: Point): Point {
  return affineApply(m.maps[bandIndex(m, m.coordinate(p))]!, p);
}

/** Split a segment at every cut line and map each part with its band's affine map (exact). */
export function bandMapSegment(m: BandMap, s: Segment): Segment[] {
  return mapSegmentAt(m, s, cutsOf(m, s));
}

/** Where a segment meets each cut line, per cut line (`origins`: m.lineAt of each break, when the caller has them). */
function cutsOf(m: BandMap, s: Segment, origins: readonly Point[] = m.breaks.map((b) => m.lineAt(b))): (readonly number[])[] {
  const out: (readonly number[])[] = [];
  for (let i = 0; i < origins.length; i++) out.push(segmentLineIntersections(s, origins[i]!, m.direction));
  return out;
}

function mapSegmentAt(m: BandMap, s: Segment, cuts: readonly (readonly number[])[]): Segment[] {
  const ts: number[] = [];
  for (let i = 0; i < cuts.length; i++) {
    const c = cuts[i]!;
    for (let k = 0; k < c.length; k++) ts.push(c[k]!);
  }
  // A part in an identity band is handed back as it is: the identity moves no number (it only
  // turns −0 into 0, which prints and reads back the same), and an unsplit segment that stays
  // the very same object keeps its flattenings for the next check or operation.
  return segmentSplitAt(s, ts).map((part) => {
    const map = m.maps[bandIndex(m, m.coordinate(segmentPoint(part, 0.5)))]!;
    return map === AFFINE_IDENTITY ? part : segmentTransform(part, map);
  });
}

/** Map a path; returns the very same path when every part lies in an identity band (nothing moves). */
export function bandMapPath(m: BandMap, path: Path): Path {
  // the cut-line intersections of each segment, found once for the test and for the mapping;
  // a segment no cut line splits (no time strictly inside by more than PARAM_EPSILON, so
  // segmentSplitAt hands it back whole) keeps the map of its band, found once for both too
  const origins = m.breaks.map((b) => m.lineAt(b));
  const cuts: ((readonly number[])[] | undefined)[][] = [];
  const whole: (Affine | undefined)[][] = [];
  // a segment's crossings with each cut line, kept (copied) only for a segment they split
  const found = new Array<readonly number[]>(origins.length);
  let untouched = true;
  for (let ci = 0; ci < path.length; ci++) {
    const c = path[ci]!;
    const cc: ((readonly number[])[] | undefined)[] = [];
    const cw: (Affine | undefined)[] = [];
    for (let si = 0; si < c.segments.length; si++) {
      const s = c.segments[si]!;
      let split = false;
      for (let i = 0; i < origins.length; i++) {
        const list = segmentLineIntersections(s, origins[i]!, m.direction);
        found[i] = list;
        for (let k = 0; k < list.length; k++) if (list[k]! > PARAM_EPSILON && list[k]! < 1 - PARAM_EPSILON) split = true;
      }
      if (split) {
        untouched = false;
        cc.push(found.slice());
        cw.push(undefined);
      } else {
        const map = m.maps[bandIndex(m, m.coordinate(segmentPoint(s, 0.5)))]!;
        if (map !== AFFINE_IDENTITY) untouched = false;
        cc.push(undefined);
        cw.push(map);
      }
    }
    cuts.push(cc);
    whole.push(cw);
  }
  if (untouched) return path;
  return path.map((c, ci) => {
    const segments = new Array<Segment>();
    const cc = cuts[ci]!;
    const cw = whole[ci]!;
    for (let si = 0; si < c.segments.length; si++) {
      const s = c.segments[si]!;
      const map = cw[si];
      if (map === undefined) {
        const parts = mapSegmentAt(m, s, cc[si]!);
        for (let k = 0; k < parts.length; k++) segments.push(parts[k]!);
      } else segments.push(map === AFFINE_IDENTITY ? s : segmentTransform(s, map));
    }
    return contourOf(segments, c.closed);
  });
}

/** Map path data; the same text comes back when the map returns the same path (nothing moved). */
function mapD(d: string, pathMap: (p: Path) => Path): string {
  const before = pathFromSvg(d);
  const after = pathMap(before);
  return after === before ? d : pathToSvg(after, 6);
}

/** Map an outline (its path, landmarks and cut line). */
export function mapOutline(outline: Outline, pathMap: (p: Path) => Path, pointMap: (p: Point) => Point): Outline {
  return {
    ...outline,
    d: mapD(outline.d, pathMap),
    points: outline.points.map((lm) => ({ ...lm, ...roundPoint(pointMap(lm)) })),
    ...(outline.cut !== undefined ? { cut: mapD(outline.cut, pathMap) } : {}),
  };
}

function roundPoint(p: Point): Point {
  return pt(round6(p.x), round6(p.y));
}

/**
 * Number(v.toFixed(6)) without the string. toFixed rounds the exact value of v·10⁶ to the
 * nearest integer n (halves away from zero) and the text reads back as the double nearest to
 * n / 10⁶, which is what the division n / 1e6 gives (both correctly rounded). Below 1e9 the
 * product v·1e6 is off the exact value by at most 1/16, so where it lies less than 0.4 from
 * the integer it rounds to, that integer is n. Elsewhere (near a half, huge or non-finite
 * values) toFixed itself decides. A zero keeps toFixed's sign: "-0.000000" only for v < 0.
 */
export function round6(v: number): number {
  const s = v * 1e6;
  const n = Math.round(s);
  if (!(Math.abs(v) < 1e9 && Math.abs(s - n) < 0.4)) return Number(v.toFixed(6));
  if (n === 0) return v < 0 ? -0 : 0;
  return n / 1e6;
}

export function mapLine(line: PatternLine, pathMap: (p: Path) => Path): PatternLine {
  const d = mapD(line.d, pathMap);
  return d === line.d ? line : { ...line, d };
}

/**
 * Refuse an outline that is not closed and simple after an operation, naming where it
 * crosses itself.
 */
export function assertSimple(contour: Contour, what: string): void {
  if (!contour.closed) throw new AlterationError('fold', `${what}: the outline is no longer closed`);
  const x = contourSelfCrossings(contour);
  if (x.length > 0) throw new AlterationError('fold', `${what}: the outline would fold over itself near ${fmtPt(x[0]!.point)}`, x[0]!.point);
}

/** Check every outline of a pattern is closed and simple (see assertSimple). */
export function assertPatternSimple(pattern: Pattern, what: string): void {
  for (const piece of pattern.pieces) for (const o of piece.outlines) assertSimple(outlineContour(o), `${what}, piece "${piece.name}" size "${o.size}"`);
}

/** The middle outline of a piece in size order (for piece-level lines when sizes disagree). */
export function middleOutline(piece: Piece): Outline {
  const o = orderedOutlines(piece);
  return o[Math.floor((o.length - 1) / 2)]!;
}

/** Cross of two unit vectors: sine of the angle between them. */
export function sinBetween(a: Point, b: Point): number {
  return vecCross(vecNormalize(a), vecNormalize(b));
}

/**
 * Smooth cubic pieces through points: Hermite cubics with chord-length parabola tangents
 * (ends use the 3-point one-sided derivative), merged greedily where one cubic passes within
 * `mergeTolerance` mm of the points it spans.
 */
export function smoothThrough(q: readonly Point[], mergeTolerance = SMOOTH_MERGE_TOLERANCE): Segment[] {
  const n = q.length - 1;
  if (n < 1) return [];
  if (n === 1) return [lineSegment(q[0]!, q[1]!)];
  const h = Array.from({ length: n }, (_, k) => Math.max(vecDistance(q[k]!, q[k + 1]!), 1e-9));
  const tangent = (k: number): Point => {
    if (k === 0) {
      const [h1, h2] = [h[0]!, h[1]!];
      const a = -(2 * h1 + h2) / (h1 * (h1 + h2));
      const b = (h1 + h2) / (h1 * h2);
      const c = -h1 / (h2 * (h1 + h2));
      return pt(a * q[0]!.x + b * q[1]!.x + c * q[2]!.x, a * q[0]!.y + b * q[1]!.y + c * q[2]!.y);
    }
    if (k === n) {
      const [h1, h2] = [h[n - 1]!, h[n - 2]!];
      const a = -(2 * h1 + h2) / (h1 * (h1 + h2));
      const b = (h1 + h2) / (h1 * h2);
      const c = -h1 / (h2 * (h1 + h2));
      return pt(-(a * q[n]!.x + b * q[n - 1]!.x + c * q[n - 2]!.x), -(a * q[n]!.y + b * q[n - 1]!.y + c * q[n - 2]!.y));
    }
    // derivative of the parabola through k−1, k, k+1 at k (chord-length parameter)
    const [h0, h1] = [h[k - 1]!, h[k]!];
    const a = -h1 / (h0 * (h0 + h1));
    const b = (h1 - h0) / (h0 * h1);
    const c = h0 / (h1 * (h0 + h1));
    return pt(a * q[k - 1]!.x + b * q[k]!.x + c * q[k + 1]!.x, a * q[k - 1]!.y + b * q[k]!.y + c * q[k + 1]!.y);
  };
  const t = Array.from({ length: n + 1 }, (_, k) => tangent(k));
  const hermite = (k: number, m: number, len: number): CubicSegment => {
    const a = q[k]!;
    const b = q[m]!;
    return curveSegment(a, pt(a.x + (t[k]!.x * len) / 3, a.y + (t[k]!.y * len) / 3), pt(b.x - (t[m]!.x * len) / 3, b.y - (t[m]!.y * len) / 3), b);
  };
  // Greedy merge: one cubic spans as many points as it passes within `mergeTolerance` of
  // (checked at their chord-length parameters), so nearly straight or evenly curved runs
  // become a few cubics instead of one per point.
  const cum = [0];
  for (let k = 0; k < n; k++) cum.push(cum[k]! + h[k]!);
  const tol2 = mergeTolerance * mergeTolerance;
  const fits = (k: number, m: number): CubicSegment | undefined => {
    const len = cum[m]! - cum[k]!;
    const seg = hermite(k, m, len);
    const { from: p0, c1: p1, c2: p2, to: p3 } = seg;
    for (let i = k + 1; i < m; i++) {
      // vecDistance(cubicPoint(seg, u), q[i]) > mergeTolerance, with cubicPoint's arithmetic
      // inline and the root only when the squared distance is too close to call
      const u = (cum[i]! - cum[k]!) / len;
      const mu = 1 - u;
      const a = mu * mu * mu;
      const b = 3 * mu * mu * u;
      const c = 3 * mu * u * u;
      const e = u * u * u;
      const dx = a * p0.x + b * p1.x + c * p2.x + e * p3.x - q[i]!.x;
      const dy = a * p0.y + b * p1.y + c * p2.y + e * p3.y - q[i]!.y;
      const d2 = dx * dx + dy * dy;
      if (d2 > tol2 * (1 + 1e-9) || (d2 >= tol2 * (1 - 1e-9) && vecHypot(dx, dy) > mergeTolerance)) return undefined;
    }
    return seg;
  };
  const out = new Array<Segment>();
  let k = 0;
  while (k < n) {
    let best = k + 1;
    let bestSeg = hermite(k, k + 1, h[k]!);
    if (mergeTolerance > 0) {
      // grow the span by doubling while it fits, then bisect between the last fit and the first miss
      let step = 1;
      let miss = -1;
      while (true) {
        const m = Math.min(n, k + 1 + step, k + MERGE_MAX_POINTS);
        if (m <= best) break;
        const seg = fits(k, m);
        if (!seg) {
          miss = m;
          break;
        }
        best = m;
        bestSeg = seg;
        if (m === n || m === k + MERGE_MAX_POINTS) break;
        step *= 2;
      }
      let lo = best;
      let hi = miss;
      while (hi > lo + 1) {
        const mid = (lo + hi) >> 1;
        const seg = fits(k, mid);
        if (seg) {
          lo = mid;
          best = mid;
          bestSeg = seg;
        } else hi = mid;
      }
    }
    out.push(bestSeg);
    k = best;
  }
  return out;
}

/** The most points one merged cubic may span in smoothThrough. */
const MERGE_MAX_POINTS = 256;


/**
 * A smooth map of the plane given with its derivative: it writes the image of (x, y) to
 * out[0], out[1] and its Jacobian to out[2..5] (∂x′/∂x, ∂x′/∂y, ∂y′/∂x, ∂y′/∂y).
 */
export type SmoothPlaneMap = (x: number, y: number, out: Float64Array) => void;

/**
 * The image of the part t0..t1 of a segment under a smooth map, as cubics that lie within
 * `tolerance` of the exact image, measured between points of the same parameter at
 * REDRAW_CHECKS evenly spaced parameters inside each cubic (REDRAW_TOLERANCE). Each cubic is
 * the Hermite cubic through the exact images of its ends with the exact end derivatives
 * (J·P′, chain rule), so neighbouring cubics join with the same tangent; a part that fails the
 * checks is halved in parameter (at most MAX_REDRAW_DEPTH times). Where the map is smooth the
 * error of a Hermite cubic falls as the fourth power of its span, so a few cubics do.
 */
export function redrawMapped(s: Segment, t0: number, t1: number, map: SmoothPlaneMap, tolerance = REDRAW_TOLERANCE): Segment[] {
  const out = new Array<Segment>();
  const a = mappedAt(s, t0, map);
  const b = mappedAt(s, t1, map);
  fitSpan(s, t0, t1, a, b, map, tolerance * tolerance, 0, out);
  return out;
}

/** Halvings of a redrawn part before a cubic is taken as it is (a span of 2^-24 of a segment). */
const MAX_REDRAW_DEPTH = 24;

interface MappedEnd {
  readonly point: Point;
  /** derivative of the image by the segment's parameter */
  readonly dx: number;
  readonly dy: number;
}

const MAP_OUT = new Float64Array(6);

/** The segment's point and derivative at t (cubicPoint/cubicDerivative arithmetic), mapped. */
function mappedAt(s: Segment, t: number, map: SmoothPlaneMap): MappedEnd {
  let x: number;
  let y: number;
  let vx: number;
  let vy: number;
  if (s.kind === 'line') {
    vx = s.to.x - s.from.x;
    vy = s.to.y - s.from.y;
    x = s.from.x + vx * t;
    y = s.from.y + vy * t;
  } else {
    const mt = 1 - t;
    const a = mt * mt * mt;
    const b = 3 * mt * mt * t;
    const d = 3 * mt * t * t;
    const e = t * t * t;
    x = a * s.from.x + b * s.c1.x + d * s.c2.x + e * s.to.x;
    y = a * s.from.y + b * s.c1.y + d * s.c2.y + e * s.to.y;
    const da = 3 * mt * mt;
    const db = 6 * mt * t;
    const dd = 3 * t * t;
    vx = da * (s.c1.x - s.from.x) + db * (s.c2.x - s.c1.x) + dd * (s.to.x - s.c2.x);
    vy = da * (s.c1.y - s.from.y) + db * (s.c2.y - s.c1.y) + dd * (s.to.y - s.c2.y);
  }
  map(x, y, MAP_OUT);
  return { point: pt(MAP_OUT[0]!, MAP_OUT[1]!), dx: MAP_OUT[2]! * vx + MAP_OUT[3]! * vy, dy: MAP_OUT[4]! * vx + MAP_OUT[5]! * vy };
}

function fitSpan(s: Segment, ta: number, tb: number, a: MappedEnd, b: MappedEnd, map: SmoothPlaneMap, tol2: number, depth: number, out: Segment[]): void {
  const h = tb - ta;
  const p0 = a.point;
  const p3 = b.point;
  const c1x = p0.x + (a.dx * h) / 3;
  const c1y = p0.y + (a.dy * h) / 3;
  const c2x = p3.x - (b.dx * h) / 3;
  const c2y = p3.y - (b.dy * h) / 3;
  let fits = true;
  if (depth < MAX_REDRAW_DEPTH)
    for (let k = 1; k <= REDRAW_CHECKS && fits; k++) {
      const u = k / (REDRAW_CHECKS + 1);
      const t = ta + u * h;
      // the exact image at t
      let x: number;
      let y: number;
      if (s.kind === 'line') {
        x = s.from.x + (s.to.x - s.from.x) * t;
        y = s.from.y + (s.to.y - s.from.y) * t;
      } else {
        const mt = 1 - t;
        const ca = mt * mt * mt;
        const cb = 3 * mt * mt * t;
        const cd = 3 * mt * t * t;
        const ce = t * t * t;
        x = ca * s.from.x + cb * s.c1.x + cd * s.c2.x + ce * s.to.x;
        y = ca * s.from.y + cb * s.c1.y + cd * s.c2.y + ce * s.to.y;
      }
      map(x, y, MAP_OUT);
      // the Hermite cubic at u
      const mu = 1 - u;
      const ha = mu * mu * mu;
      const hb = 3 * mu * mu * u;
      const hc = 3 * mu * u * u;
      const he = u * u * u;
      const dx = ha * p0.x + hb * c1x + hc * c2x + he * p3.x - MAP_OUT[0]!;
      const dy = ha * p0.y + hb * c1y + hc * c2y + he * p3.y - MAP_OUT[1]!;
      fits = dx * dx + dy * dy <= tol2;
    }
  if (fits) {
    out.push(curveSegment(p0, pt(c1x, c1y), pt(c2x, c2y), p3));
    return;
  }
  const tm = ta + h / 2;
  const m = mappedAt(s, tm, map);
  fitSpan(s, ta, tm, a, m, map, tol2, depth + 1, out);
  fitSpan(s, tm, tb, m, b, map, tol2, depth + 1, out);
}

/**
 * Parameters in (0, 1) where a segment meets any of the given infinite lines, sorted, without
 * values within PARAM_EPSILON of each other or of the ends (the places where a piecewise
 * defined map changes its formula).
 */
export function segmentCutTimes(s: Segment, lines: readonly { readonly origin: Point; readonly direction: Point }[]): number[] {
  const ts: number[] = [];
  for (let i = 0; i < lines.length; i++) {
    const l = lines[i]!;
    const found = segmentLineIntersections(s, l.origin, l.direction);
    for (let k = 0; k < found.length; k++) if (found[k]! > PARAM_EPSILON && found[k]! < 1 - PARAM_EPSILON) ts.push(found[k]!);
  }
  if (ts.length < 2) return ts;
  ts.sort((p, q) => p - q);
  const out = [ts[0]!];
  for (let i = 1; i < ts.length; i++) if (ts[i]! - out[out.length - 1]! > PARAM_EPSILON) out.push(ts[i]!);
  return out;
}

/**
 * f applied to segmentPoint(s, t) given as coordinates: the arithmetic of vecLerp (lines) and
 * cubicPoint (cubics) inline, so no point object is made.
 */
export function segmentPointThen<T>(s: Segment, t: number, f: (x: number, y: number) => T): T {
  if (s.kind === 'line') return f(s.from.x + (s.to.x - s.from.x) * t, s.from.y + (s.to.y - s.from.y) * t);
  const mt = 1 - t;
  const a = mt * mt * mt;
  const b = 3 * mt * mt * t;
  const d = 3 * mt * t * t;
  const e = t * t * t;
  return f(a * s.from.x + b * s.c1.x + d * s.c2.x + e * s.to.x, a * s.from.y + b * s.c1.y + d * s.c2.y + e * s.to.y);
}
