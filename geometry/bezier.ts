/**
 * Cubic and quadratic Bézier curves. `t` is always the curve parameter in [0, 1];
 * `length` is always arc length in mm.
 */
import { FLATNESS, LENGTH_TOLERANCE, PARAM_EPSILON, POINT_EPSILON } from './tolerance.ts';
import { type Point, vecCross, vecDistance, vecDot, vecHypot, vecLength, vecLerp, vecSub } from './vec.ts';

/** A cubic Bézier: start, first control, second control, end. */
export type Cubic = readonly [Point, Point, Point, Point];
/** A quadratic Bézier: start, control, end. */
export type Quadratic = readonly [Point, Point, Point];

export function cubicPoint(c: Cubic, t: number): Point {
  const mt = 1 - t;
  const a = mt * mt * mt;
  const b = 3 * mt * mt * t;
  const d = 3 * mt * t * t;
  const e = t * t * t;
  return {
    x: a * c[0].x + b * c[1].x + d * c[2].x + e * c[3].x,
    y: a * c[0].y + b * c[1].y + d * c[2].y + e * c[3].y,
  };
}

/** First derivative dB/dt (mm per unit t). */
export function cubicDerivative(c: Cubic, t: number): Point {
  const mt = 1 - t;
  const a = 3 * mt * mt;
  const b = 6 * mt * t;
  const d = 3 * t * t;
  return {
    x: a * (c[1].x - c[0].x) + b * (c[2].x - c[1].x) + d * (c[3].x - c[2].x),
    y: a * (c[1].y - c[0].y) + b * (c[2].y - c[1].y) + d * (c[3].y - c[2].y),
  };
}

/**
 * Unit tangent at t. Degenerate: where the derivative vanishes (a control point on an end
 * point) the direction is taken a little inside the curve, then from the chord; a curve
 * collapsed to a point returns {0, 0}.
 */
export function cubicTangent(c: Cubic, t: number): Point {
  let d = cubicDerivative(c, t);
  if (vecLength(d) < POINT_EPSILON) d = cubicDerivative(c, t < 0.5 ? t + 1e-6 : t - 1e-6);
  if (vecLength(d) < POINT_EPSILON) d = vecSub(c[3], c[0]);
  const l = vecLength(d);
  return l < POINT_EPSILON ? { x: 0, y: 0 } : { x: d.x / l, y: d.y / l };
}

/** Split at t by de Casteljau; the two halves share the split point exactly. */
export function cubicSplit(c: Cubic, t: number): [Cubic, Cubic] {
  const p01 = vecLerp(c[0], c[1], t);
  const p12 = vecLerp(c[1], c[2], t);
  const p23 = vecLerp(c[2], c[3], t);
  const p012 = vecLerp(p01, p12, t);
  const p123 = vecLerp(p12, p23, t);
  const m = vecLerp(p012, p123, t);
  return [
    [c[0], p01, p012, m],
    [m, p123, p23, c[3]],
  ];
}

/** The part of the curve between t0 and t1 (t0 < t1 expected; swapped otherwise). */
export function cubicSlice(c: Cubic, t0: number, t1: number): Cubic {
  if (t0 > t1) [t0, t1] = [t1, t0];
  let right: Cubic = c;
  if (t0 > 0) right = cubicSplit(c, t0)[1];
  if (t1 >= 1) return right;
  const local = t0 >= 1 ? 0 : (t1 - t0) / (1 - t0);
  return cubicSplit(right, local)[0];
}

/** Exact degree elevation of a quadratic to a cubic. */
export function quadraticToCubic(q: Quadratic): Cubic {
  return [q[0], vecLerp(q[0], q[1], 2 / 3), vecLerp(q[2], q[1], 2 / 3), q[2]];
}

export function quadraticPoint(q: Quadratic, t: number): Point {
  const mt = 1 - t;
  return {
    x: mt * mt * q[0].x + 2 * mt * t * q[1].x + t * t * q[2].x,
    y: mt * mt * q[0].y + 2 * mt * t * q[1].y + t * t * q[2].y,
  };
}

/** A straight line as a cubic (controls at thirds, so t is proportional to arc length). */
export function lineToCubic(a: Point, b: Point): Cubic {
  return [a, vecLerp(a, b, 1 / 3), vecLerp(a, b, 2 / 3), b];
}

// 8-point Gauss–Legendre nodes and weights on [−1, 1].
const GL_X = [
  -0.9602898564975363, -0.7966664774136267, -0.525532409916329, -0.1834346424956498, 0.1834346424956498,
  0.525532409916329, 0.7966664774136267, 0.9602898564975363,
];
const GL_W = [
  0.1012285362903763, 0.2223810344533745, 0.3137066458778873, 0.362683783378362, 0.362683783378362,
  0.3137066458778873, 0.2223810344533745, 0.1012285362903763,
];

function speedIntegral(c: Cubic, t0: number, t1: number): number {
  const h = (t1 - t0) / 2;
  const m = (t1 + t0) / 2;
  let s = 0;
  for (let i = 0; i < 8; i++) s += GL_W[i]! * vecLength(cubicDerivative(c, m + h * GL_X[i]!));
  return s * h;
}

function adaptiveLength(c: Cubic, t0: number, t1: number, whole: number, tol: number, depth: number): number {
  const m = (t0 + t1) / 2;
  const left = speedIntegral(c, t0, m);
  const right = speedIntegral(c, m, t1);
  // Depth 14 bounds the work (≤ 16 384 pieces) even for curves no rule integrates well
  // (subnormal or wildly uneven control points); the relative floor stops chasing round-off.
  if (depth >= 14 || Math.abs(left + right - whole) <= Math.max(tol, 1e-13 * Math.abs(whole))) return left + right;
  return adaptiveLength(c, t0, m, left, tol / 2, depth + 1) + adaptiveLength(c, m, t1, right, tol / 2, depth + 1);
}

/**
 * Arc length between t0 and t1 by adaptive 8-point Gauss–Legendre quadrature, to an absolute
 * error of about `tolerance` mm. Degenerate: a curve collapsed to a point has length 0; cusps
 * are handled by the adaptive subdivision.
 */
export function cubicLength(c: Cubic, tolerance = LENGTH_TOLERANCE, t0 = 0, t1 = 1): number {
  if (t1 <= t0) return 0;
  // The speed |B'| is smooth except where B' vanishes (a cusp); such places are minima of
  // |B'|², i.e. roots of B'·B''. Splitting there keeps every quadrature piece smooth.
  const breaks = [t0, ...speedMinima(c).filter((t) => t > t0 && t < t1).sort((a, b) => a - b), t1];
  let sum = 0;
  for (let i = 1; i < breaks.length; i++) {
    const a = breaks[i - 1]!;
    const b = breaks[i]!;
    const m = (a + b) / 2;
    const tol = (tolerance * (b - a)) / (t1 - t0) / 2;
    sum += adaptiveLength(c, a, m, speedIntegral(c, a, m), tol, 1) + adaptiveLength(c, m, b, speedIntegral(c, m, b), tol, 1);
  }
  return sum;
}

/** Parameters in (0, 1) where the speed |B'(t)| has a stationary point (roots of B'·B''). */
function speedMinima(c: Cubic): number[] {
  const a = vecSub(c[1], c[0]);
  const b = vecSub(c[2], c[1]);
  const cc = vecSub(c[3], c[2]);
  const A = { x: a.x - 2 * b.x + cc.x, y: a.y - 2 * b.y + cc.y };
  const B = { x: 2 * (b.x - a.x), y: 2 * (b.y - a.y) };
  const C = a;
  return solveCubic(2 * vecDot(A, A), 3 * vecDot(A, B), vecDot(B, B) + 2 * vecDot(A, C), vecDot(B, C)).filter(
    (t) => t > PARAM_EPSILON && t < 1 - PARAM_EPSILON,
  );
}

/**
 * The parameter t at which the arc length from t = 0 equals `length`. Lengths ≤ 0 give 0 and
 * lengths beyond the curve give 1. Newton steps guarded by bisection; error ≤ `tolerance` mm.
 */
export function cubicTimeAtLength(c: Cubic, length: number, tolerance = LENGTH_TOLERANCE): number {
  if (length <= 0) return 0;
  const total = cubicLength(c, tolerance);
  if (length >= total) return 1;
  let lo = 0;
  let hi = 1;
  let t = length / total;
  for (let i = 0; i < 60; i++) {
    const f = cubicLength(c, tolerance / 4, 0, t) - length;
    if (Math.abs(f) <= tolerance) return t;
    if (f > 0) hi = t;
    else lo = t;
    const speed = vecLength(cubicDerivative(c, t));
    let next = speed > POINT_EPSILON ? t - f / speed : (lo + hi) / 2;
    if (!(next > lo && next < hi)) next = (lo + hi) / 2;
    t = next;
  }
  return t;
}

function distanceToSegment(p: Point, a: Point, b: Point): number {
  const ab = vecSub(b, a);
  const l2 = vecDot(ab, ab);
  if (l2 < POINT_EPSILON * POINT_EPSILON) return vecDistance(p, a);
  const k = Math.max(0, Math.min(1, vecDot(vecSub(p, a), ab) / l2));
  return vecDistance(p, { x: a.x + ab.x * k, y: a.y + ab.y * k });
}

/** Largest distance of the control points from the chord: bounds the curve's distance from it. */
export function cubicFlatness(c: Cubic): number {
  return Math.max(distanceToSegment(c[1], c[0], c[3]), distanceToSegment(c[2], c[0], c[3]));
}

/** True when the cubic is a straight segment (controls on the chord, within `tolerance`). */
export function cubicIsStraight(c: Cubic, tolerance = POINT_EPSILON): boolean {
  return cubicFlatness(c) <= tolerance;
}

/**
 * Flatten to a polyline whose distance from the curve is at most `tolerance` (mm), by
 * adaptive subdivision (the convex-hull bound), never a fixed count. Returns the parameters
 * t of the polyline vertices, starting with 0 and ending with 1.
 */
export function cubicFlattenTimes(c: Cubic, tolerance = FLATNESS): number[] {
  // Scalar form of: split at ½ by de Casteljau until cubicFlatness(part) <= tolerance (or
  // depth 20). Same arithmetic as cubicSplit/cubicFlatness, without allocating a point per
  // step, so the parameters are exactly those of the plain recursion. The recursion runs on an
  // explicit stack of parts (the right half pushed under the left one), so the leaves come in
  // the same order, left to right.
  const out = new Array<number>(); // not `[0]`: see ContourValue in path.ts
  out.push(0);
  const tol2 = tolerance * tolerance;
  const st = FLATTEN_STACK;
  const depths = FLATTEN_DEPTHS;
  st[0] = c[0].x;
  st[1] = c[0].y;
  st[2] = c[1].x;
  st[3] = c[1].y;
  st[4] = c[2].x;
  st[5] = c[2].y;
  st[6] = c[3].x;
  st[7] = c[3].y;
  st[8] = 0;
  st[9] = 1;
  depths[0] = 0;
  let sp = 1;
  while (sp > 0) {
    sp--;
    let o = sp * 10;
    const x0 = st[o]!;
    const y0 = st[o + 1]!;
    const x1 = st[o + 2]!;
    const y1 = st[o + 3]!;
    const x2 = st[o + 4]!;
    const y2 = st[o + 5]!;
    const x3 = st[o + 6]!;
    const y3 = st[o + 7]!;
    const t0 = st[o + 8]!;
    const t1 = st[o + 9]!;
    const depth = depths[sp]!;
    if (depth >= 20 || flatWithin(x0, y0, x1, y1, x2, y2, x3, y3, tolerance, tol2)) {
      out.push(t1);
      continue;
    }
    const x01 = x0 + (x1 - x0) * 0.5;
    const y01 = y0 + (y1 - y0) * 0.5;
    const x12 = x1 + (x2 - x1) * 0.5;
    const y12 = y1 + (y2 - y1) * 0.5;
    const x23 = x2 + (x3 - x2) * 0.5;
    const y23 = y2 + (y3 - y2) * 0.5;
    const x012 = x01 + (x12 - x01) * 0.5;
    const y012 = y01 + (y12 - y01) * 0.5;
    const x123 = x12 + (x23 - x12) * 0.5;
    const y123 = y12 + (y23 - y12) * 0.5;
    const xm = x012 + (x123 - x012) * 0.5;
    const ym = y012 + (y123 - y012) * 0.5;
    const tm = (t0 + t1) / 2;
    // the right half, then the left half on top of it
    st[o] = xm;
    st[o + 1] = ym;
    st[o + 2] = x123;
    st[o + 3] = y123;
    st[o + 4] = x23;
    st[o + 5] = y23;
    st[o + 6] = x3;
    st[o + 7] = y3;
    st[o + 8] = tm;
    st[o + 9] = t1;
    depths[sp] = depth + 1;
    sp++;
    o = sp * 10;
    st[o] = x0;
    st[o + 1] = y0;
    st[o + 2] = x01;
    st[o + 3] = y01;
    st[o + 4] = x012;
    st[o + 5] = y012;
    st[o + 6] = xm;
    st[o + 7] = ym;
    st[o + 8] = t0;
    st[o + 9] = tm;
    depths[sp] = depth + 1;
    sp++;
  }
  return out;
}

/** The parts waiting on cubicFlattenTimes' stack (10 numbers each; at most one per depth, plus one). */
const FLATTEN_STACK = new Float64Array(10 * 22);
const FLATTEN_DEPTHS = new Int32Array(22);

/** cubicFlatness(c) <= tolerance, decided without the root unless the squares are too close to call. */
function flatWithin(x0: number, y0: number, x1: number, y1: number, x2: number, y2: number, x3: number, y3: number, tolerance: number, tol2: number): boolean {
  return pointNearChord(x1, y1, x0, y0, x3, y3, tolerance, tol2) && pointNearChord(x2, y2, x0, y0, x3, y3, tolerance, tol2);
}

/** distanceToSegment(p, a, b) <= tolerance, same arithmetic. */
function pointNearChord(px: number, py: number, ax: number, ay: number, bx: number, by: number, tolerance: number, tol2: number): boolean {
  const abx = bx - ax;
  const aby = by - ay;
  const l2 = abx * abx + aby * aby;
  let dx: number;
  let dy: number;
  if (l2 < POINT_EPSILON * POINT_EPSILON) {
    dx = px - ax;
    dy = py - ay;
  } else {
    const k = Math.max(0, Math.min(1, ((px - ax) * abx + (py - ay) * aby) / l2));
    dx = px - (ax + abx * k);
    dy = py - (ay + aby * k);
  }
  const d2 = dx * dx + dy * dy;
  // the squared sum differs from hypot² by a few ulps at most: decide directly away from the boundary
  if (d2 < tol2 * (1 - 1e-9)) return true;
  if (d2 > tol2 * (1 + 1e-9)) return false;
  return vecHypot(dx, dy) <= tolerance;
}

/** The polyline of cubicFlattenTimes as points (first = c[0], last = c[3]). */
export function cubicFlatten(c: Cubic, tolerance = FLATNESS): Point[] {
  const ts = cubicFlattenTimes(c, tolerance);
  return ts.map((t) => (t === 0 ? c[0] : t === 1 ? c[3] : cubicPoint(c, t)));
}

/** Real roots of a·x² + b·x + c = 0 (degenerate lower degrees handled; all-zero gives []). */
export function solveQuadratic(a: number, b: number, c: number): number[] {
  const scale = Math.max(Math.abs(a), Math.abs(b), Math.abs(c));
  if (scale === 0) return [];
  if (Math.abs(a) < 1e-12 * scale) return Math.abs(b) < 1e-12 * scale ? [] : [-c / b];
  const disc = b * b - 4 * a * c;
  if (disc < 0) {
    if (disc > -1e-12 * b * b) return [-b / (2 * a)];
    return [];
  }
  const sq = Math.sqrt(disc);
  const q = -0.5 * (b + (b >= 0 ? sq : -sq));
  const r1 = q / a;
  const r2 = q !== 0 ? c / q : -b / (2 * a);
  return r1 === r2 ? [r1] : [r1, r2];
}

/** Real roots of a·x³ + b·x² + c·x + d = 0 (falls back to quadratic when a ≈ 0). */
export function solveCubic(a: number, b: number, c: number, d: number): number[] {
  const n = cubicRootsInto(a, b, c, d, ROOTS);
  const out: number[] = [];
  for (let k = 0; k < n; k++) out.push(ROOTS[k]!);
  return out;
}

/** Scratch list of cubicRootsInto's roots (at most 5; read right after each call, never handed out). */
const ROOTS = new Float64Array(5);

/** Candidate roots of cubicRootsInto before polishing (at most 3 + 2). */
const CANDIDATES = new Float64Array(5);

/**
 * solveCubic's roots written to `out` from index 0, in solveCubic's order; returns how many.
 * The same arithmetic, without the arrays and objects of the candidates.
 */
function cubicRootsInto(a: number, b: number, c: number, d: number, out: Float64Array): number {
  const scale = Math.max(Math.abs(a), Math.abs(b), Math.abs(c), Math.abs(d));
  if (scale === 0) return 0;
  if (Math.abs(a) < 1e-12 * scale) {
    const q = solveQuadratic(b, c, d);
    for (let k = 0; k < q.length; k++) out[k] = q[k]!;
    return q.length;
  }
  const A = b / a;
  const B = c / a;
  const C = d / a;
  const Q = (A * A - 3 * B) / 9;
  const R = (2 * A * A * A - 9 * A * B + 27 * C) / 54;
  const roots = CANDIDATES;
  let count: number;
  if (R * R < Q * Q * Q) {
    const th = Math.acos(Math.max(-1, Math.min(1, R / Math.sqrt(Q * Q * Q))));
    const m = -2 * Math.sqrt(Q);
    roots[0] = m * Math.cos(th / 3) - A / 3;
    roots[1] = m * Math.cos((th + 2 * Math.PI) / 3) - A / 3;
    roots[2] = m * Math.cos((th - 2 * Math.PI) / 3) - A / 3;
    count = 3;
  } else {
    const s = -Math.sign(R) * Math.cbrt(Math.abs(R) + Math.sqrt(R * R - Q * Q * Q));
    const u = s === 0 ? 0 : Q / s;
    roots[0] = s + u - A / 3;
    count = 1;
  }
  // A leading coefficient that is small beside the others (a cubic that is nearly a parabola)
  // makes A, B, C huge and the closed form loses the roots near 0; the parabola's roots, polished
  // on the cubic below, find them.
  if (Math.abs(a) < 1e-6 * scale) {
    const q = solveQuadratic(b, c, d);
    for (let k = 0; k < q.length; k++) roots[count++] = q[k]!;
  }
  // Newton polish: the closed form loses accuracy at multiple roots (a triple root is only
  // found to ~1e-5·scale^(1/3)); Newton converges there too, linearly, so iterate while |f| falls.
  // A candidate that does not polish into a root (its residual stays above ROOT_RESIDUAL of the
  // coefficients' scale) is dropped, and repeats are merged.
  let n = 0;
  for (let k = 0; k < count; k++) {
    let x = roots[k]!;
    let fx = ((a * x + b) * x + c) * x + d;
    for (let i = 0; i < 60 && fx !== 0; i++) {
      const df = (3 * a * x + 2 * b) * x + c;
      if (df === 0) break;
      const nx = x - fx / df;
      const nf = ((a * nx + b) * nx + c) * nx + d;
      if (!(Math.abs(nf) < Math.abs(fx))) break;
      x = nx;
      fx = nf;
    }
    const size = Math.max(1, Math.abs(x));
    if (!(Math.abs(fx) <= ROOT_RESIDUAL * scale * size * size * size)) continue;
    let repeat = false;
    for (let j = 0; j < n && !repeat; j++) repeat = Math.abs(out[j]! - x) <= 1e-12 * size;
    if (!repeat) out[n++] = x;
  }
  return n;
}

/** Relative residual below which a polished cubic root is accepted (see solveCubic). */
const ROOT_RESIDUAL = 1e-9;

/**
 * Parameters t in [0, 1] where the cubic meets the infinite line through `origin` with
 * direction `direction`, sorted. Degenerate: a zero direction gives []; a cubic lying on the
 * line gives [] (no transversal crossing).
 */
export function cubicLineIntersections(c: Cubic, origin: Point, direction: Point): readonly number[] {
  return cubicPointsLineIntersections(c[0], c[1], c[2], c[3], origin, direction);
}

/** No parameters: one shared, frozen empty list (most segments meet most lines nowhere; read-only, so it is never changed). */
export const NO_TIMES: readonly number[] = Object.freeze([]);

/** cubicLineIntersections of the cubic with control points p0…p3 (no tuple needed). */
export function cubicPointsLineIntersections(p0: Point, p1: Point, p2: Point, p3: Point, origin: Point, direction: Point): readonly number[] {
  const dl = vecLength(direction);
  if (dl < POINT_EPSILON) return NO_TIMES;
  const nx = -direction.y / dl;
  const ny = direction.x / dl;
  const ox = origin.x;
  const oy = origin.y;
  const s0 = nx * (p0.x - ox) + ny * (p0.y - oy);
  const s1 = nx * (p1.x - ox) + ny * (p1.y - oy);
  const s2 = nx * (p2.x - ox) + ny * (p2.y - oy);
  const s3 = nx * (p3.x - ox) + ny * (p3.y - oy);
  const sMax = Math.max(Math.abs(s0), Math.abs(s1), Math.abs(s2), Math.abs(s3));
  if (sMax < POINT_EPSILON) return NO_TIMES;
  // All four control points clearly on one side of the line: no root can be accepted. On [0, 1]
  // the curve's distance is a convex combination of s0…s3, so |f| ≥ m (m: the smallest |s_i|,
  // all of one sign); on the PARAM_EPSILON margins it falls by at most 1e-9 · 54·sMax (|f′| ≤
  // 3|a| + 2|b| + |cc| ≤ 54·sMax). With m > 1e-6·sMax, |f| stays above 9e-7·sMax there, while
  // cubicRootsInto accepts a root only where |f| ≤ ROOT_RESIDUAL (1e-9) · its coefficients'
  // scale (≤ 12·sMax) · (1 + 1e-9)³: the full search would return [] as well.
  const m = 1e-6 * sMax;
  if ((s0 > m && s1 > m && s2 > m && s3 > m) || (s0 < -m && s1 < -m && s2 < -m && s3 < -m)) return NO_TIMES;
  // Bernstein → power basis.
  const a = -s0 + 3 * s1 - 3 * s2 + s3;
  const b = 3 * s0 - 6 * s1 + 3 * s2;
  const cc = -3 * s0 + 3 * s1;
  const d = s0;
  // the roots in [0, 1] (within PARAM_EPSILON, clamped), sorted (insertion: at most five), then
  // without values within 10 PARAM_EPSILON of the one kept before
  const roots = ROOTS;
  const count = cubicRootsInto(a, b, cc, d, roots);
  let n = 0;
  for (let k = 0; k < count; k++) {
    const t = roots[k]!;
    if (!(t >= -PARAM_EPSILON && t <= 1 + PARAM_EPSILON)) continue;
    const v = Math.min(1, Math.max(0, t));
    let j = n - 1;
    while (j >= 0 && roots[j]! > v) {
      roots[j + 1] = roots[j]!;
      j--;
    }
    roots[j + 1] = v;
    n++;
  }
  const unique: number[] = [];
  for (let k = 0; k < n; k++) {
    const t = roots[k]!;
    if (unique.length === 0 || t - unique[unique.length - 1]! > PARAM_EPSILON * 10) unique.push(t);
  }
  return unique;
}

/**
 * Signed area contribution ½∫(x dy − y dx) of the curve (mm²). Summed over a closed contour
 * it is the enclosed signed area. The integrand is a degree-5 polynomial, so 3-point
 * Gauss–Legendre is exact.
 */
export function cubicAreaContribution(c: Cubic): number {
  const xs = [-0.7745966692414834, 0, 0.7745966692414834];
  const ws = [5 / 9, 8 / 9, 5 / 9];
  let s = 0;
  for (let i = 0; i < 3; i++) {
    const t = 0.5 + 0.5 * xs[i]!;
    const p = cubicPoint(c, t);
    const d = cubicDerivative(c, t);
    s += ws[i]! * (p.x * d.y - p.y * d.x);
  }
  return 0.25 * s; // ½ (outer) × ½ (interval [0,1] Jacobian)
}

/** Tight axis-aligned bounds from the derivative's roots. */
export function cubicBounds(c: Cubic): { minX: number; minY: number; maxX: number; maxY: number } {
  const ts = [0, 1];
  for (const axis of ['x', 'y'] as const) {
    const p0 = c[0][axis];
    const p1 = c[1][axis];
    const p2 = c[2][axis];
    const p3 = c[3][axis];
    const a = 3 * (-p0 + 3 * p1 - 3 * p2 + p3);
    const b = 6 * (p0 - 2 * p1 + p2);
    const cc = 3 * (p1 - p0);
    for (const t of solveQuadratic(a, b, cc)) if (t > 0 && t < 1) ts.push(t);
  }
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const t of ts) {
    const p = cubicPoint(c, t);
    minX = Math.min(minX, p.x);
    minY = Math.min(minY, p.y);
    maxX = Math.max(maxX, p.x);
    maxY = Math.max(maxY, p.y);
  }
  return { minX, minY, maxX, maxY };
}

/**
 * Parameter of the point on the curve nearest to p (coarse sampling, then Newton refinement).
 * Degenerate: ties resolve to the smaller t.
 */
export function cubicNearestTime(c: Cubic, p: Point): number {
  let best = 0;
  let bestD2 = Infinity;
  const n = 32;
  const [p0, p1, p2, p3] = c;
  for (let i = 0; i <= n; i++) {
    const t = i / n;
    // the squared distance from cubicPoint(c, t) to p, cubicPoint's arithmetic inline (the
    // nearest sample is the same by squares; the root is only taken for the winner)
    const mt = 1 - t;
    const a = mt * mt * mt;
    const b = 3 * mt * mt * t;
    const e = 3 * mt * t * t;
    const f = t * t * t;
    const dx = a * p0.x + b * p1.x + e * p2.x + f * p3.x - p.x;
    const dy = a * p0.y + b * p1.y + e * p2.y + f * p3.y - p.y;
    const d2 = dx * dx + dy * dy;
    if (d2 < bestD2) {
      bestD2 = d2;
      best = t;
    }
  }
  const bestD = vecDistance(cubicPoint(c, best), p);
  // Newton on (B(t) − p)·B′(t) = 0, with cubicPoint, cubicDerivative and vecDot inline (same arithmetic)
  const ax2 = c[2].x - 2 * c[1].x + c[0].x;
  const ay2 = c[2].y - 2 * c[1].y + c[0].y;
  const bx2 = c[3].x - 2 * c[2].x + c[1].x;
  const by2 = c[3].y - 2 * c[2].y + c[1].y;
  let t = best;
  for (let i = 0; i < 20; i++) {
    const mt = 1 - t;
    const a = mt * mt * mt;
    const b = 3 * mt * mt * t;
    const d = 3 * mt * t * t;
    const e = t * t * t;
    const qx = a * p0.x + b * p1.x + d * p2.x + e * p3.x;
    const qy = a * p0.y + b * p1.y + d * p2.y + e * p3.y;
    const da = 3 * mt * mt;
    const db = 6 * mt * t;
    const dd = 3 * t * t;
    const d1x = da * (p1.x - p0.x) + db * (p2.x - p1.x) + dd * (p3.x - p2.x);
    const d1y = da * (p1.y - p0.y) + db * (p2.y - p1.y) + dd * (p3.y - p2.y);
    const d2x = 6 * mt * ax2 + 6 * t * bx2;
    const d2y = 6 * mt * ay2 + 6 * t * by2;
    const diffx = qx - p.x;
    const diffy = qy - p.y;
    const num = diffx * d1x + diffy * d1y;
    const den = d1x * d1x + d1y * d1y + (diffx * d2x + diffy * d2y);
    if (Math.abs(den) < 1e-18) break;
    const next = Math.min(1, Math.max(0, t - num / den));
    if (Math.abs(next - t) < PARAM_EPSILON) {
      t = next;
      break;
    }
    t = next;
  }
  return vecDistance(cubicPoint(c, t), p) <= bestD ? t : best;
}

/** Winding-independent turn test used by callers: cross of the end tangents. */
export function cubicEndTurn(c: Cubic): number {
  return vecCross(cubicTangent(c, 0), cubicTangent(c, 1));
}
