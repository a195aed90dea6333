/**
 * Points, vectors and affine maps. Plain `{ x, y }` data in millimetres, y grows downward.
 * Every function is pure and returns new objects.
 */
import { POINT_EPSILON } from './tolerance.ts';

/** A point or a vector (mm). */
export interface Point {
  readonly x: number;
  readonly y: number;
}

/**
 * The engine makes its points with `pt`, not with `{ x, y }` literals. The object is the same
 * plain data (own `x` and `y`, nothing else); only how V8 allocates it differs: objects from a
 * literal that were alive at a young collection get their literal moved to "allocate in the
 * old generation" for good (allocation-site pretenuring), while objects made by a constructor
 * stay young. A replay's intermediate paths outlive a young collection or two and then die;
 * allocated old, they filled the old generation and kept young objects alive through it (see
 * geometry/README, engine-speed-7).
 */
class PointValue implements Point {
  declare readonly x: number;
  declare readonly y: number;
  constructor(x: number, y: number) {
    this.x = x;
    this.y = y;
  }
}

/** A point (see PointValue for why not a literal). */
export function pt(x: number, y: number): Point {
  return new PointValue(x, y);
}

export function vecAdd(a: Point, b: Point): Point {
  return pt(a.x + b.x, a.y + b.y);
}

export function vecSub(a: Point, b: Point): Point {
  return pt(a.x - b.x, a.y - b.y);
}

export function vecScale(a: Point, k: number): Point {
  return pt(a.x * k, a.y * k);
}

export function vecDot(a: Point, b: Point): number {
  return a.x * b.x + a.y * b.y;
}

/** z of the 3-D cross product. With y down, a positive value means b is clockwise of a on screen. */
export function vecCross(a: Point, b: Point): number {
  return a.x * b.y - a.y * b.x;
}

/**
 * √(dx² + dy²) without overflow or underflow: Math.hypot's result for two numbers, by the
 * algorithm V8 (Node, Chromium) uses for it (scale both by the larger magnitude, add the squares
 * with Kahan compensation, take the root, scale back), so every length is the same double as
 * before. Math.hypot takes any number of arguments and V8 allocates an array of them on each
 * call; this takes two and allocates nothing (about 7× faster). The result is the same in every
 * engine, where Math.hypot is only required to be close (ECMAScript: implementation-approximated).
 * tests/geometry/vec.test.ts checks it against Math.hypot.
 */
export function vecHypot(dx: number, dy: number): number {
  const ax = Math.abs(dx);
  const ay = Math.abs(dy);
  if (ax === Infinity || ay === Infinity) return Infinity;
  if (Number.isNaN(ax) || Number.isNaN(ay)) return NaN;
  const max = ax > ay ? ax : ay;
  if (max === 0) return 0;
  const a = ax / max;
  const b = ay / max;
  // V8's Kahan sum of the two squares: its compensation after the first square is exactly 0
  // (x − 0 and 0 + x are x), so for two numbers it is the plain sum
  return Math.sqrt(a * a + b * b) * max;
}

export function vecLength(a: Point): number {
  return vecHypot(a.x, a.y);
}

export function vecDistance(a: Point, b: Point): number {
  return vecHypot(a.x - b.x, a.y - b.y);
}

/** Unit vector. Degenerate: a zero vector (length < POINT_EPSILON) returns {0, 0}. */
export function vecNormalize(a: Point): Point {
  const l = vecLength(a);
  return l < POINT_EPSILON ? pt(0, 0) : pt(a.x / l, a.y / l);
}

/** a + (b − a)·k; k outside [0, 1] extrapolates. */
export function vecLerp(a: Point, b: Point, k: number): Point {
  return pt(a.x + (b.x - a.x) * k, a.y + (b.y - a.y) * k);
}

/** Rotate by angle (radians) about the origin; positive angles turn clockwise on screen (y down). */
export function vecRotate(a: Point, angle: number): Point {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  return pt(a.x * c - a.y * s, a.x * s + a.y * c);
}

/** Rotate about a centre. */
export function vecRotateAbout(a: Point, centre: Point, angle: number): Point {
  return vecAdd(centre, vecRotate(vecSub(a, centre), angle));
}

/** The vector turned +90° (clockwise on screen with y down): (x, y) → (−y, x). */
export function vecPerp(a: Point): Point {
  return pt(-a.y, a.x);
}

/** Same point within a tolerance (default POINT_EPSILON). */
export function vecEquals(a: Point, b: Point, tolerance = POINT_EPSILON): boolean {
  return vecDistance(a, b) <= tolerance;
}

/** Signed angle from a to b in (−π, π]; degenerate zero vectors give 0. */
export function vecAngleBetween(a: Point, b: Point): number {
  return Math.atan2(vecCross(a, b), vecDot(a, b));
}

/**
 * An affine map in SVG `matrix(a b c d e f)` order:
 * x' = a·x + c·y + e, y' = b·x + d·y + f.
 */
export interface Affine {
  readonly a: number;
  readonly b: number;
  readonly c: number;
  readonly d: number;
  readonly e: number;
  readonly f: number;
}

export const AFFINE_IDENTITY: Affine = { a: 1, b: 0, c: 0, d: 1, e: 0, f: 0 };

export function affineApply(m: Affine, p: Point): Point {
  return pt(m.a * p.x + m.c * p.y + m.e, m.b * p.x + m.d * p.y + m.f);
}

/** Apply only the linear part (for vectors). */
export function affineApplyVector(m: Affine, v: Point): Point {
  return pt(m.a * v.x + m.c * v.y, m.b * v.x + m.d * v.y);
}

/** The map "first n, then m". */
export function affineMultiply(m: Affine, n: Affine): Affine {
  return {
    a: m.a * n.a + m.c * n.b,
    b: m.b * n.a + m.d * n.b,
    c: m.a * n.c + m.c * n.d,
    d: m.b * n.c + m.d * n.d,
    e: m.a * n.e + m.c * n.f + m.e,
    f: m.b * n.e + m.d * n.f + m.f,
  };
}

export function affineDeterminant(m: Affine): number {
  return m.a * m.d - m.b * m.c;
}

/** Inverse map. Throws RangeError when the map is singular (|det| < 1e-12). */
export function affineInvert(m: Affine): Affine {
  const det = affineDeterminant(m);
  if (Math.abs(det) < 1e-12) throw new RangeError('affineInvert: the map is singular (determinant ≈ 0)');
  return {
    a: m.d / det,
    b: -m.b / det,
    c: -m.c / det,
    d: m.a / det,
    e: (m.c * m.f - m.d * m.e) / det,
    f: (m.b * m.e - m.a * m.f) / det,
  };
}

export function affineTranslate(dx: number, dy: number): Affine {
  return { a: 1, b: 0, c: 0, d: 1, e: dx, f: dy };
}

export function affineScale(sx: number, sy = sx): Affine {
  return { a: sx, b: 0, c: 0, d: sy, e: 0, f: 0 };
}

/** Rotation by angle (radians, clockwise on screen) about a centre (default origin). */
export function affineRotate(angle: number, centre: Point = pt(0, 0)): Affine {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  return {
    a: c,
    b: s,
    c: -s,
    d: c,
    e: centre.x - c * centre.x + s * centre.y,
    f: centre.y - s * centre.x - c * centre.y,
  };
}

/**
 * Scale by `along` in direction `axis` and by `across` at right angles to it, about `origin`.
 * Degenerate: a zero axis is taken as +y.
 */
export function affineScaleInFrame(axis: Point, along: number, across: number, origin: Point): Affine {
  let u = vecNormalize(axis);
  if (u.x === 0 && u.y === 0) u = pt(0, 1);
  const v = vecPerp(u);
  // M = along·u uᵀ + across·v vᵀ
  const a = along * u.x * u.x + across * v.x * v.x;
  const b = along * u.x * u.y + across * v.x * v.y;
  const d = along * u.y * u.y + across * v.y * v.y;
  const lin: Affine = { a, b, c: b, d, e: 0, f: 0 };
  const moved = affineApplyVector(lin, origin);
  return { ...lin, e: origin.x - moved.x, f: origin.y - moved.y };
}

/** Even–odd point-in-polygon test on a polyline (closed implicitly). */
export function pointInPolygon(p: Point, poly: readonly Point[]): boolean {
  let inside = false;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[i]!;
    const b = poly[j]!;
    if (a.y > p.y !== b.y > p.y && p.x < ((b.x - a.x) * (p.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/** Distance from p to the edges of a polygon (closed implicitly); Infinity for an empty one. */
export function polygonDistance(p: Point, poly: readonly Point[]): number {
  let best = Infinity;
  for (let i = 0, j = poly.length - 1; i < poly.length; j = i++) {
    const a = poly[j]!;
    const b = poly[i]!;
    const dx = b.x - a.x;
    const dy = b.y - a.y;
    const len2 = dx * dx + dy * dy;
    const t = len2 > 0 ? Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / len2)) : 0;
    best = Math.min(best, vecHypot(p.x - (a.x + t * dx), p.y - (a.y + t * dy)));
  }
  return best;
}
