/**
 * The path model: contours made of line and cubic segments, read from and written to SVG
 * path data. Quadratics become cubics exactly; elliptical arcs become cubics of at most 45°
 * each (radial error ≤ 4.3e-6 × radius, i.e. < 0.005 mm for radii up to 1 m).
 */
import { SVGPathData } from 'svg-pathdata';
import {
  type Cubic,
  cubicAreaContribution,
  cubicBounds,
  cubicDerivative,
  cubicFlattenTimes,
  cubicLength,
  cubicNearestTime,
  cubicPoint,
  cubicPointsLineIntersections,
  cubicSlice,
  cubicSplit,
  cubicTangent,
  cubicTimeAtLength,
  NO_TIMES,
  quadraticToCubic,
  solveQuadratic,
} from './bezier.ts';
import { F64_SLOT, I32_SLOT, orderByKey, scratchF64, scratchI32 } from './sweep.ts';
import { CLOSE_GAP, FLATNESS, LENGTH_TOLERANCE, PARAM_EPSILON, POINT_EPSILON } from './tolerance.ts';
import {
  type Affine,
  type Point,
  affineApply,
  vecCross,
  vecDistance,
  vecDot,
  vecHypot,
  vecLerp,
  vecNormalize,
  pt,
  vecSub,
} from './vec.ts';

export type Segment =
  | { readonly kind: 'line'; readonly from: Point; readonly to: Point }
  | { readonly kind: 'cubic'; readonly from: Point; readonly c1: Point; readonly c2: Point; readonly to: Point };

/** One sub-path. Consecutive segments share end points; a closed contour ends where it starts. */
export interface Contour {
  readonly segments: readonly Segment[];
  readonly closed: boolean;
}

/** A whole path: one or more contours. */
export type Path = readonly Contour[];

/** Thrown for path data that cannot be read; `message` says what and where. */
export class PathDataError extends Error {
  override readonly name = 'PathDataError';
}

/** A cubic segment. */
export type CubicSegment = Extract<Segment, { kind: 'cubic' }>;

// Segments and contours, like points (see `pt` in vec.ts), are made by constructors rather than
// literals: the same plain data, but V8 never moves a constructor's objects to "allocate old".
class LineSegmentValue {
  declare readonly kind: 'line';
  declare readonly from: Point;
  declare readonly to: Point;
  constructor(from: Point, to: Point) {
    this.kind = 'line';
    this.from = from;
    this.to = to;
  }
}

class CubicSegmentValue {
  declare readonly kind: 'cubic';
  declare readonly from: Point;
  declare readonly c1: Point;
  declare readonly c2: Point;
  declare readonly to: Point;
  constructor(from: Point, c1: Point, c2: Point, to: Point) {
    this.kind = 'cubic';
    this.from = from;
    this.c1 = c1;
    this.c2 = c2;
    this.to = to;
  }
}

class ContourValue implements Contour {
  declare readonly segments: readonly Segment[];
  declare readonly closed: boolean;
  constructor(segments: readonly Segment[], closed: boolean) {
    this.segments = segments;
    this.closed = closed;
  }
}

export function lineSegment(from: Point, to: Point): Segment {
  return new LineSegmentValue(from, to);
}

/** The cubic from `from` to `to` with control points c1, c2. */
export function curveSegment(from: Point, c1: Point, c2: Point, to: Point): CubicSegment {
  return new CubicSegmentValue(from, c1, c2, to);
}

export function cubicSegment(c: Cubic): Segment {
  return new CubicSegmentValue(c[0], c[1], c[2], c[3]);
}

/** A contour of these segments (see ContourValue). */
export function contourOf(segments: readonly Segment[], closed: boolean): Contour {
  return new ContourValue(segments, closed);
}

/** The segment as a cubic (a line gets controls at its thirds). */
export function segmentCubic(s: Segment): Cubic {
  return s.kind === 'cubic' ? [s.from, s.c1, s.c2, s.to] : [s.from, vecLerp(s.from, s.to, 1 / 3), vecLerp(s.from, s.to, 2 / 3), s.to];
}

export function segmentPoint(s: Segment, t: number): Point {
  if (s.kind === 'line') return vecLerp(s.from, s.to, t);
  // cubicPoint's arithmetic, without the tuple
  const mt = 1 - t;
  const a = mt * mt * mt;
  const b = 3 * mt * mt * t;
  const d = 3 * mt * t * t;
  const e = t * t * t;
  return pt(a * s.from.x + b * s.c1.x + d * s.c2.x + e * s.to.x, a * s.from.y + b * s.c1.y + d * s.c2.y + e * s.to.y);
}

/** Unit tangent at t (see cubicTangent for degenerate cases). */
export function segmentTangent(s: Segment, t: number): Point {
  return s.kind === 'line' ? vecNormalize(vecSub(s.to, s.from)) : cubicTangent(segmentCubic(s), t);
}

export function segmentLength(s: Segment, tolerance = LENGTH_TOLERANCE): number {
  return s.kind === 'line' ? vecDistance(s.from, s.to) : cubicLength(segmentCubic(s), tolerance);
}

/** Split at t; the halves share the split point. */
export function segmentSplit(s: Segment, t: number): [Segment, Segment] {
  if (s.kind === 'line') {
    const m = vecLerp(s.from, s.to, t);
    return [lineSegment(s.from, m), lineSegment(m, s.to)];
  }
  const [a, b] = cubicSplit(segmentCubic(s), t);
  return [cubicSegment(a), cubicSegment(b)];
}

/** The part between t0 and t1. */
export function segmentSlice(s: Segment, t0: number, t1: number): Segment {
  if (s.kind === 'line') return lineSegment(vecLerp(s.from, s.to, t0), vecLerp(s.from, s.to, t1));
  return cubicSegment(cubicSlice(segmentCubic(s), t0, t1));
}

/**
 * Split a segment at several parameters (any order; values within PARAM_EPSILON of each
 * other, of 0 or of 1 are ignored). Returns the pieces in order.
 */
export function segmentSplitAt(s: Segment, ts: readonly number[]): Segment[] {
  if (ts.length === 0) return [s];
  const cuts = [...ts].filter((t) => t > PARAM_EPSILON && t < 1 - PARAM_EPSILON).sort((a, b) => a - b);
  const out: Segment[] = [];
  let rest = s;
  let done = 0;
  for (const t of cuts) {
    if (t - done <= PARAM_EPSILON) continue;
    const local = (t - done) / (1 - done);
    const [a, b] = segmentSplit(rest, local);
    out.push(a);
    rest = b;
    done = t;
  }
  out.push(rest);
  return out;
}

export function segmentReverse(s: Segment): Segment {
  return s.kind === 'line' ? lineSegment(s.to, s.from) : curveSegment(s.to, s.c2, s.c1, s.from);
}

/** Apply an affine map (exact for lines and cubics). */
export function segmentTransform(s: Segment, m: Affine): Segment {
  return s.kind === 'line'
    ? lineSegment(affineApply(m, s.from), affineApply(m, s.to))
    : curveSegment(affineApply(m, s.from), affineApply(m, s.c1), affineApply(m, s.c2), affineApply(m, s.to));
}

/** Apply any point map to the defining points (exact only for affine maps). */
export function segmentMapPoints(s: Segment, f: (p: Point) => Point): Segment {
  return s.kind === 'line' ? lineSegment(f(s.from), f(s.to)) : curveSegment(f(s.from), f(s.c1), f(s.c2), f(s.to));
}

/** Parameters where the segment meets an infinite line, sorted. */
export function segmentLineIntersections(s: Segment, origin: Point, direction: Point): readonly number[] {
  if (s.kind === 'line') {
    // vecSub and vecCross written out (the same arithmetic in the same order, without the objects)
    const dx = s.to.x - s.from.x;
    const dy = s.to.y - s.from.y;
    const den = dx * direction.y - dy * direction.x;
    if (Math.abs(den) < 1e-12 * Math.max(1, vecHypot(dx, dy) * vecHypot(direction.x, direction.y))) return NO_TIMES;
    const t = ((origin.x - s.from.x) * direction.y - (origin.y - s.from.y) * direction.x) / den;
    return t >= -PARAM_EPSILON && t <= 1 + PARAM_EPSILON ? [Math.min(1, Math.max(0, t))] : NO_TIMES;
  }
  return cubicPointsLineIntersections(s.from, s.c1, s.c2, s.to, origin, direction);
}

/** Parameters of the flattening polyline (lines give [0, 1]). */
export function segmentFlattenTimes(s: Segment, tolerance = FLATNESS): number[] {
  return s.kind === 'line' ? [0, 1] : cubicFlattenTimes(segmentCubic(s), tolerance);
}

export function segmentAreaContribution(s: Segment): number {
  if (s.kind === 'line') return 0.5 * (s.from.x * s.to.y - s.to.x * s.from.y);
  return cubicAreaContribution(segmentCubic(s));
}

// ---------------------------------------------------------------- SVG path data

function arcToCubics(
  from: Point,
  rx: number,
  ry: number,
  xRotDeg: number,
  large: boolean,
  sweep: boolean,
  to: Point,
): Cubic[] {
  // SVG 1.1 implementation notes F.6.5 (endpoint → centre) and F.6.6 (radius correction).
  if (vecDistance(from, to) < POINT_EPSILON) return [];
  rx = Math.abs(rx);
  ry = Math.abs(ry);
  if (rx < POINT_EPSILON || ry < POINT_EPSILON) return [[from, vecLerp(from, to, 1 / 3), vecLerp(from, to, 2 / 3), to]];
  const phi = (xRotDeg * Math.PI) / 180;
  const cos = Math.cos(phi);
  const sin = Math.sin(phi);
  const dx = (from.x - to.x) / 2;
  const dy = (from.y - to.y) / 2;
  const x1p = cos * dx + sin * dy;
  const y1p = -sin * dx + cos * dy;
  const lambda = (x1p * x1p) / (rx * rx) + (y1p * y1p) / (ry * ry);
  if (lambda > 1) {
    const k = Math.sqrt(lambda);
    rx *= k;
    ry *= k;
  }
  const num = rx * rx * ry * ry - rx * rx * y1p * y1p - ry * ry * x1p * x1p;
  const den = rx * rx * y1p * y1p + ry * ry * x1p * x1p;
  let coef = Math.sqrt(Math.max(0, num / den));
  if (large === sweep) coef = -coef;
  const cxp = (coef * rx * y1p) / ry;
  const cyp = (-coef * ry * x1p) / rx;
  const cx = cos * cxp - sin * cyp + (from.x + to.x) / 2;
  const cy = sin * cxp + cos * cyp + (from.y + to.y) / 2;
  const ang = (ux: number, uy: number, vx: number, vy: number): number => Math.atan2(ux * vy - uy * vx, ux * vx + uy * vy);
  const theta1 = ang(1, 0, (x1p - cxp) / rx, (y1p - cyp) / ry);
  let dtheta = ang((x1p - cxp) / rx, (y1p - cyp) / ry, (-x1p - cxp) / rx, (-y1p - cyp) / ry);
  if (!sweep && dtheta > 0) dtheta -= 2 * Math.PI;
  if (sweep && dtheta < 0) dtheta += 2 * Math.PI;
  const n = Math.max(1, Math.ceil(Math.abs(dtheta) / (Math.PI / 4) - 1e-9));
  const step = dtheta / n;
  const k = (4 / 3) * Math.tan(step / 4);
  const at = (th: number): Point => ({
    x: cx + rx * Math.cos(th) * cos - ry * Math.sin(th) * sin,
    y: cy + rx * Math.cos(th) * sin + ry * Math.sin(th) * cos,
  });
  const deriv = (th: number): Point => ({
    x: -rx * Math.sin(th) * cos - ry * Math.cos(th) * sin,
    y: -rx * Math.sin(th) * sin + ry * Math.cos(th) * cos,
  });
  const out: Cubic[] = [];
  let prev = from;
  for (let i = 0; i < n; i++) {
    const a = theta1 + i * step;
    const b = a + step;
    const pa = prev;
    const pb = i === n - 1 ? to : at(b);
    const da = deriv(a);
    const db = deriv(b);
    out.push([pa, pt(pa.x + k * da.x, pa.y + k * da.y), pt(pb.x - k * db.x, pb.y - k * db.y), pb]);
    prev = pb;
  }
  return out;
}

/**
 * Read SVG path data (all commands, absolute or relative, shorthand S/T, arcs A). Each M
 * starts a contour; Z closes it. A contour whose end lies within CLOSE_GAP of its start is
 * also marked closed. Zero-length segments are dropped; contours with no segments are dropped.
 * Throws PathDataError for unreadable data or non-finite numbers.
 */
export function pathFromSvg(d: string): Path {
  if (deferred && d.startsWith(DEFERRED_PREFIX)) {
    const entry = deferred.texts.get(d);
    if (entry) return (entry.read ??= readBackOf(entry.path, entry.decimals));
  }
  const cached = PARSE_CACHE.get(d);
  if (cached) return cached;
  const path = readPath(d);
  if (d.length <= PARSE_CACHE_MAX_LENGTH) {
    if (PARSE_CACHE.size >= PARSE_CACHE_SIZE) PARSE_CACHE.clear();
    PARSE_CACHE.set(d, path);
  }
  return path;
}

/**
 * Parsed paths by their text. Paths are read-only values and parsing is a pure function of
 * the text, so sharing them changes no result; it saves re-reading the outlines and lines
 * that an operation leaves as they were. Bounded: cleared when full.
 */
const PARSE_CACHE = new Map<string, Path>();
const PARSE_CACHE_SIZE = 4096;
const PARSE_CACHE_MAX_LENGTH = 500_000;

function readPath(d: string): Path {
  return buildPath(fastCommands(d) ?? libraryCommands(d));
}

/**
 * vecHypot(dx, dy) > limit (limit ≥ 0), decided on the squares unless they are too close to
 * call, then by vecHypot itself: the squared sum is within a few ulps of hypot², so away
 * from a 1e-9 relative band the two decide alike (non-finite values and underflow fall into
 * the band or decide alike too).
 */
export function hypotAbove(dx: number, dy: number, limit: number): boolean {
  const d2 = dx * dx + dy * dy;
  const l2 = limit * limit;
  if (d2 > l2 * (1 + 1e-9)) return true;
  if (d2 < l2 * (1 - 1e-9)) return false;
  return vecHypot(dx, dy) > limit;
}

/**
 * Builds contours from absolute commands by the reading rules of pathFromSvg (the second half
 * of reading path data; see buildPath). Shared by buildPath and readBackOf.
 */
class PathBuilder {
  // lists by `new Array`, not `[]`: an array literal is pretenured like an object literal (see ContourValue)
  readonly contours: Contour[] = new Array<Contour>();
  private segments: Segment[] = new Array<Segment>();
  private start: Point | null = null;
  current: Point | null = null;
  private closed = false;

  move(x: number, y: number): void {
    this.finish();
    this.start = this.current = pt(x, y);
  }

  /**
   * The segment `s` itself where line()/curve() would build one with its very numbers (the
   * current point is s.from by value, and s's other numbers are those passed): the same
   * reading rule, without a copy.
   */
  same(s: Segment): void {
    const from = this.current!;
    const to = s.to;
    if (s.kind === 'line') {
      if (hypotAbove(from.x - to.x, from.y - to.y, POINT_EPSILON)) this.segments.push(s);
    } else if (hypotAbove(from.x - to.x, from.y - to.y, POINT_EPSILON) || hypotAbove(from.x - s.c1.x, from.y - s.c1.y, POINT_EPSILON) || hypotAbove(from.x - s.c2.x, from.y - s.c2.y, POINT_EPSILON))
      this.segments.push(s);
    this.current = to;
  }

  line(x: number, y: number): void {
    const from = this.current!;
    const to = pt(x, y);
    // vecDistance(from, to) > POINT_EPSILON
    if (hypotAbove(from.x - x, from.y - y, POINT_EPSILON)) this.segments.push(lineSegment(from, to));
    this.current = to;
  }

  curve(x1: number, y1: number, x2: number, y2: number, x: number, y: number): void {
    const from = this.current!;
    const c1 = pt(x1, y1);
    const c2 = pt(x2, y2);
    const to = pt(x, y);
    if (hypotAbove(from.x - x, from.y - y, POINT_EPSILON) || hypotAbove(from.x - x1, from.y - y1, POINT_EPSILON) || hypotAbove(from.x - x2, from.y - y2, POINT_EPSILON))
      this.segments.push(curveSegment(from, c1, c2, to));
    this.current = to;
  }

  /** A segment from the current point, taken as it is (quadratics and arcs), ending at `to`. */
  push(s: Segment): void {
    this.segments.push(s);
  }

  close(): void {
    if (this.start) {
      this.closed = true;
      this.finish();
      this.current = this.start;
    }
  }

  finish(): void {
    const segments = this.segments;
    const start = this.start;
    if (segments.length > 0 && start) {
      const last = segments[segments.length - 1]!;
      const gap = vecDistance(last.to, start);
      if (this.closed && gap > POINT_EPSILON) segments.push(lineSegment(last.to, start));
      else if (this.closed || gap <= CLOSE_GAP) {
        // snap the end exactly onto the start (only the end: a segment taken as it is by same()
        // may share one point object between its end and a control point)
        segments[segments.length - 1] = last.kind === 'line' ? lineSegment(last.from, start) : curveSegment(last.from, last.c1, last.c2, start);
        this.closed = true;
      }
      this.contours.push(contourOf(segments, this.closed));
    }
    this.segments = new Array<Segment>();
    this.closed = false;
  }
}

/** The contours of a list of absolute commands (the second half of reading path data). */
function buildPath(commands: readonly RawCommand[]): Path {
  const b = new PathBuilder();
  for (let k = 0; k < commands.length; k++) {
    const { c, v } = commands[k]!;
    for (let i = 0; i < v.length; i++) if (!Number.isFinite(v[i]!)) throw new PathDataError('path data contains a number that is not finite');
    if (c !== 'M' && c !== 'Z' && !b.current) throw new PathDataError('path data must start with M');
    switch (c) {
      case 'M':
        b.move(v[0]!, v[1]!);
        break;
      case 'Z':
        b.close();
        break;
      case 'L':
        b.line(v[0]!, v[1]!);
        break;
      case 'C':
        b.curve(v[0]!, v[1]!, v[2]!, v[3]!, v[4]!, v[5]!);
        break;
      case 'Q': {
        const to = pt(v[2]!, v[3]!);
        b.push(cubicSegment(quadraticToCubic([b.current!, pt(v[0]!, v[1]!), to])));
        b.current = to;
        break;
      }
      case 'A': {
        const to = pt(v[5]!, v[6]!);
        for (const cu of arcToCubics(b.current!, v[0]!, v[1]!, v[2]!, v[3] === 1, v[4] === 1, to)) b.push(cubicSegment(cu));
        b.current = to;
        break;
      }
    }
  }
  b.finish();
  return b.contours;
}

interface RawCommand {
  readonly c: 'M' | 'L' | 'C' | 'Q' | 'A' | 'Z';
  readonly v: readonly number[];
}

const FAST_ARITY: Record<string, number> = { M: 2, L: 2, C: 6, Z: 0 };

/**
 * Fast reader for the plain form that pathToSvg writes (absolute M, L, C, Z with plain
 * decimal numbers separated by spaces or commas, one letter per command). Anything else
 * returns undefined and is read by svg-pathdata; both give the same commands.
 */
function fastCommands(d: string): RawCommand[] | undefined {
  const out: RawCommand[] = [];
  let cmd: RawCommand['c'] | undefined;
  let nums: number[] = [];
  const flush = (): boolean => {
    if (!cmd) return nums.length === 0;
    if (nums.length !== FAST_ARITY[cmd]) return false;
    out.push({ c: cmd, v: nums });
    nums = [];
    return true;
  };
  const n = d.length;
  let i = 0;
  while (i < n) {
    const ch = d.charCodeAt(i);
    if (ch === 32 || ch === 44 || ch === 10 || ch === 13 || ch === 9) {
      i++;
      continue;
    }
    if (ch === 77 || ch === 76 || ch === 67 || ch === 90) {
      // M L C Z
      if (!flush()) return undefined;
      cmd = d[i] as RawCommand['c'];
      i++;
      continue;
    }
    // a plain decimal: -?digits[.digits] or -?.digits
    let j = i;
    if (ch === 45) j++;
    const startDigits = j;
    while (j < n && d.charCodeAt(j) >= 48 && d.charCodeAt(j) <= 57) j++;
    if (j < n && d.charCodeAt(j) === 46) {
      j++;
      while (j < n && d.charCodeAt(j) >= 48 && d.charCodeAt(j) <= 57) j++;
    }
    if (j === startDigits || (j === startDigits + 1 && d.charCodeAt(startDigits) === 46)) return undefined;
    const next = j < n ? d.charCodeAt(j) : 32;
    // anything but a separator, a command letter or a sign after a number: not the plain form
    if (!(next === 32 || next === 44 || next === 10 || next === 13 || next === 9 || next === 45 || next === 77 || next === 76 || next === 67 || next === 90)) return undefined;
    nums.push(Number(d.slice(i, j)));
    i = j;
  }
  if (!flush()) return undefined;
  return out.length === 0 || out[0]!.c === 'M' ? out : undefined;
}

function libraryCommands(d: string): RawCommand[] {
  let commands;
  try {
    commands = new SVGPathData(d).toAbs().normalizeHVZ(false, true, true).normalizeST().qtToC().commands;
  } catch (error) {
    throw new PathDataError(`unreadable path data: ${(error as Error).message}`);
  }
  return commands.map((c): RawCommand => {
    switch (c.type) {
      case SVGPathData.MOVE_TO:
        return { c: 'M', v: [c.x, c.y] };
      case SVGPathData.CLOSE_PATH:
        return { c: 'Z', v: [] };
      case SVGPathData.LINE_TO:
        return { c: 'L', v: [c.x, c.y] };
      case SVGPathData.CURVE_TO:
        return { c: 'C', v: [c.x1, c.y1, c.x2, c.y2, c.x, c.y] };
      case SVGPathData.QUAD_TO:
        return { c: 'Q', v: [c.x1, c.y1, c.x, c.y] };
      case SVGPathData.ARC:
        return { c: 'A', v: [c.rX, c.rY, c.xRot, c.lArcFlag, c.sweepFlag, c.x, c.y] };
      default:
        throw new PathDataError(`unsupported path command type ${String(c.type)}`);
    }
  });
}

function fmt(v: number, decimals: number): string {
  // rounding by an integer power of ten then String() prints the shortest exact decimal
  const k = POW10[decimals] ?? 10 ** decimals;
  const n = Math.round(v * k);
  if (n === 0) return '0';
  // Fast form of String(n / k): print the integer n and put the decimal point in. For at most
  // 6 decimals and |n / k| < 1e6 mm the two agree: n / k is the double nearest to that decimal,
  // and no shorter decimal is that near (the 10^-decimals grid is far coarser than a double's
  // spacing there), so it is also the shortest decimal String() would print; below 1e-6 String()
  // would switch to exponents, which 6 decimals never reach.
  if (decimals <= 6 && Math.abs(n) < k * 1e6) {
    // the integer part and the decimals of |n| / k as integers (exact: |n| < 2^53, and the
    // quotient, below 1e6, is at least 1/k away from the next integer unless it is one), the
    // decimals without their trailing zeros, zero-padded on the left
    const a = Math.abs(n);
    const sign = n < 0 ? '-' : '';
    const whole = Math.floor(a / k);
    let part = a - whole * k;
    if (part === 0) return sign + whole;
    let places = decimals;
    while (part % 10 === 0) {
      part /= 10;
      places--;
    }
    const text = String(part);
    return sign + whole + '.' + ZEROS[places - text.length]! + text;
  }
  return String(n / k);
}
const ZEROS = ['', '0', '00', '000', '0000', '00000', '000000'];
const POW10 = [1, 10, 100, 1000, 10000, 100000, 1000000, 10000000, 100000000];

/**
 * pathToSvg's text printed at once, also during a replay: for a result that no later step of a
 * replay is likely to read again (a cut line), whose text is smaller than its path objects,
 * which would otherwise stay alive (and be copied by the garbage collector) until the end.
 */
export function pathToSvgNow(path: Path, decimals = 4): string {
  return writePath(path, decimals);
}

/** Write SVG path data with absolute M/L/C/Z and at most `decimals` decimals (default 4 = 0.1 µm). */
export function pathToSvg(path: Path, decimals = 4): string {
  if (deferred && allFinite(path, decimals)) {
    const token = deferred.prefix + deferred.issued++;
    deferred.texts.set(token, new DeferredText(path, decimals));
    return token;
  }
  return writePath(path, decimals);
}

/**
 * The text pathToSvg prints: absolute M/L/C/Z commands, parts separated by one space, each
 * number as fmt prints it. Written as character codes into one growing scratch array and made
 * into a string once, instead of a string per number and per part joined at the end (the
 * printing of a replayed stack's results was a tenth of its time, most of it in those strings).
 */
function writePath(path: Path, decimals: number): string {
  const w = TEXT;
  w.length = 0;
  for (const c of path) {
    const segs = c.segments;
    if (segs.length === 0) continue;
    if (w.length > 0) w.code(SPACE);
    w.code(CHAR_M);
    w.point(segs[0]!.from, decimals);
    for (let i = 0; i < segs.length; i++) {
      const s = segs[i]!;
      if (c.closed && i === segs.length - 1 && s.kind === 'line') continue; // Z draws it
      w.code(SPACE);
      if (s.kind === 'line') {
        w.code(CHAR_L);
        w.point(s.to, decimals);
      } else {
        w.code(CHAR_C);
        w.point(s.c1, decimals);
        w.code(SPACE);
        w.point(s.c2, decimals);
        w.code(SPACE);
        w.point(s.to, decimals);
      }
    }
    if (c.closed) {
      w.code(SPACE);
      w.code(CHAR_Z);
    }
  }
  return w.text();
}

const SPACE = 0x20;
const CHAR_M = 0x4d;
const CHAR_L = 0x4c;
const CHAR_C = 0x43;
const CHAR_Z = 0x5a;
const CHAR_0 = 0x30;
const CHAR_MINUS = 0x2d;
const CHAR_DOT = 0x2e;

/** Character codes of path text being written (ASCII only), reused from one path to the next. */
class TextWriter {
  codes = new Uint8Array(4096);
  length = 0;

  code(c: number): void {
    if (this.length === this.codes.length) this.grow();
    this.codes[this.length++] = c;
  }

  private grow(): void {
    const bigger = new Uint8Array(this.codes.length * 2);
    bigger.set(this.codes);
    this.codes = bigger;
  }

  point(q: Point, decimals: number): void {
    this.xy(q.x, q.y, decimals);
  }

  xy(x: number, y: number, decimals: number): void {
    this.number(x, decimals);
    this.code(SPACE);
    this.number(y, decimals);
  }

  /** fmt(v, decimals), written digit by digit where fmt takes its fast form, else fmt's text. */
  number(v: number, decimals: number): void {
    const k = POW10[decimals] ?? 10 ** decimals;
    const n = Math.round(v * k);
    if (n === 0) {
      this.code(CHAR_0);
      return;
    }
    if (!(decimals <= 6 && Math.abs(n) < k * 1e6)) {
      const text = fmt(v, decimals);
      for (let i = 0; i < text.length; i++) this.code(text.charCodeAt(i));
      return;
    }
    // as fmt: the integer part and the decimals of |n| / k as integers, trailing zeros dropped
    const a = Math.abs(n);
    if (n < 0) this.code(CHAR_MINUS);
    const whole = Math.floor(a / k);
    this.digits(whole, 1);
    let part = a - whole * k;
    if (part === 0) return;
    let places = decimals;
    while (part % 10 === 0) {
      part /= 10;
      places--;
    }
    this.code(CHAR_DOT);
    this.digits(part, places);
  }

  /** The decimal digits of a non-negative integer below 2^53, zero-padded on the left to `width`. */
  private digits(value: number, width: number): void {
    let count = 1;
    for (let p = 10; p <= value; p *= 10) count++;
    if (count < width) count = width;
    if (this.length + count > this.codes.length) this.grow();
    let v = value;
    for (let i = this.length + count - 1; i >= this.length; i--) {
      const q = Math.floor(v / 10);
      this.codes[i] = CHAR_0 + (v - q * 10);
      v = q;
    }
    this.length += count;
  }

  /** The text written so far: ASCII codes read as UTF-8 are the same characters; decoding them is one fast call. */
  text(): string {
    return ASCII.decode(this.codes.subarray(0, this.length));
  }
}
/** UTF-8 TextDecoder (WHATWG Encoding; in every browser and in Node), typed here: geometry/ compiles without DOM or Node types. */
const ASCII = new (globalThis as unknown as { TextDecoder: new () => { decode(input: Uint8Array): string } }).TextDecoder();
const TEXT = new TextWriter();

// ------------------------------------------------------- deferred writing (applyOps)

/**
 * While `pathTextDeferred` runs, pathToSvg does not print: it hands out a placeholder that
 * pathFromSvg reads back as exactly the path that printing and reading the text would give
 * (the same rounding to `decimals`, the same reading rules), and the real text is printed once
 * at the end. A replayed list of operations thus stops printing and re-reading every outline
 * it changes between one operation and the next, with the very same results.
 */
interface DeferredRun {
  readonly run: number;
  /** The placeholders handed out and still in use, with their paths. */
  readonly texts: Map<string, DeferredText>;
  /** Placeholders handed out so far (the number in the next one; entries may have been dropped by `retain`). */
  issued: number;
  /** Calls of `retain` so far: the entries found in use by the last one carry its number as their `mark`. */
  retained: number;
  /** The placeholders' common start: DEFERRED_PREFIX, the run's number and a colon. */
  readonly prefix: string;
  /**
   * Flattenings of cubics first flattened during the run (see cubicFlattening). Dropped at its
   * end but for the cubics of the run's input, which the next run on the same input meets again.
   */
  flattenings: Map<Segment, CubicFlattening[]>;
  /** The run's flattenings before the last `retain` (between operations): found again, an entry moves back. */
  flatteningsBefore: Map<Segment, CubicFlattening[]>;
}
/** A deferred text's path; `read` is made when first asked for: text printed by the last operation is never read back. */
class DeferredText {
  declare readonly path: Path;
  declare readonly decimals: number;
  declare read: Path | undefined;
  /** See DeferredRun.retained. */
  declare mark: number;
  constructor(path: Path, decimals: number) {
    this.path = path;
    this.decimals = decimals;
    this.read = undefined;
    this.mark = 0;
  }
}
let deferred: DeferredRun | undefined;
let deferredRuns = 0;
const DEFERRED_PREFIX = '\u0000path:';

/**
 * Run `body` with path printing deferred; `body` gets `resolve`, which turns a placeholder back
 * into its text (other strings come back unchanged), and must resolve every string it returns.
 * It also gets `retain`: given every placeholder still in use (between operations: the texts of
 * the current pattern), it lets the paths behind all others go. A dropped placeholder must not
 * be read or resolved again; paths an operation replaced then die young instead of being kept
 * (and copied by the garbage collector) until the end of the replay.
 * Nested calls run inside the outer one. Any text that already looks like a placeholder (never
 * valid path data) turns deferral off, so such input fails exactly as it would without it.
 */
export function pathTextDeferred<T>(texts: readonly string[], body: (resolve: (d: string) => string, retain: (inUse: readonly string[]) => void) => T): T {
  if (deferred || texts.some((d) => d.startsWith(DEFERRED_PREFIX))) return body((d) => d, () => {});
  const number = ++deferredRuns;
  const run: DeferredRun = { run: number, prefix: `${DEFERRED_PREFIX}${number}:`, texts: new Map(), issued: 0, retained: 0, flattenings: new Map(), flatteningsBefore: new Map() };
  deferred = run;
  try {
    return body(
      (d) => {
        const entry = d.startsWith(DEFERRED_PREFIX) ? run.texts.get(d) : undefined;
        return entry ? writePath(entry.path, entry.decimals) : d;
      },
      (inUse) => {
        run.flatteningsBefore = run.flattenings;
        run.flattenings = new Map();
        if (run.texts.size === 0) return;
        // mark the entries in use, then drop the others (no set of the texts in use is built)
        const mark = ++run.retained;
        for (let i = 0; i < inUse.length; i++) {
          const entry = run.texts.get(inUse[i]!);
          if (entry) entry.mark = mark;
        }
        for (const [token, entry] of run.texts) if (entry.mark !== mark) run.texts.delete(token);
      },
    );
  } finally {
    deferred = undefined;
    keepInputFlattenings(texts, run.flattenings);
    keepInputFlattenings(texts, run.flatteningsBefore);
  }
}

/** Move the flattenings a run made of its input's cubics (the parsed texts it was given) to the lasting memo. */
function keepInputFlattenings(texts: readonly string[], flattenings: Map<Segment, CubicFlattening[]>): void {
  if (flattenings.size === 0) return;
  for (const d of texts) {
    const path = PARSE_CACHE.get(d);
    if (!path) continue;
    for (const c of path)
      for (const s of c.segments) {
        if (s.kind !== 'cubic') continue;
        const kept = flattenings.get(s);
        if (kept) rememberFlattenings(s, kept);
      }
  }
}

/** True when every number the path would print stays finite once rounded (other text fails differently when read). */
function allFinite(path: Path, decimals: number): boolean {
  const k = POW10[decimals] ?? 10 ** decimals;
  for (let ci = 0; ci < path.length; ci++) {
    const segs = path[ci]!.segments;
    for (let i = 0; i < segs.length; i++) {
      const s = segs[i]!;
      if (!roundsFinite(s.from, k) || !roundsFinite(s.to, k) || (s.kind === 'cubic' && (!roundsFinite(s.c1, k) || !roundsFinite(s.c2, k)))) return false;
    }
  }
  return true;
}

function roundsFinite(p: Point, k: number): boolean {
  return Number.isFinite(Math.round(p.x * k)) && Number.isFinite(Math.round(p.y * k));
}

/**
 * What pathFromSvg(pathToSvg(path, decimals)) gives, without the text: the same commands with
 * each number rounded as fmt rounds it (a printed number reads back as exactly n / 10^decimals),
 * read by the same rules. For finite numbers only (see allFinite).
 */
function readBackOf(path: Path, decimals: number): Path {
  const k = POW10[decimals] ?? 10 ** decimals;
  const r = (v: number): number => {
    const n = Math.round(v * k);
    return n === 0 ? 0 : n / k;
  };
  // the commands pathToSvg prints, each number as it reads back, fed straight to the reader's rules
  const b = new PathBuilder();
  for (const c of path) {
    const segs = c.segments;
    if (segs.length === 0) continue;
    const first = segs[0]!;
    b.move(r(first.from.x), r(first.from.y));
    const same = Object.is;
    for (let i = 0; i < segs.length; i++) {
      const s = segs[i]!;
      if (c.closed && i === segs.length - 1 && s.kind === 'line') continue; // Z draws it
      // a segment whose numbers read back as they are (one an operation left alone), starting
      // at the current point by value, is taken itself
      const keep = same(b.current!.x, s.from.x) && same(b.current!.y, s.from.y);
      if (s.kind === 'line') {
        const x = r(s.to.x);
        const y = r(s.to.y);
        if (keep && same(x, s.to.x) && same(y, s.to.y)) b.same(s);
        else b.line(x, y);
      } else {
        const x1 = r(s.c1.x);
        const y1 = r(s.c1.y);
        const x2 = r(s.c2.x);
        const y2 = r(s.c2.y);
        const x = r(s.to.x);
        const y = r(s.to.y);
        if (keep && same(x1, s.c1.x) && same(y1, s.c1.y) && same(x2, s.c2.x) && same(y2, s.c2.y) && same(x, s.to.x) && same(y, s.to.y)) b.same(s);
        else b.curve(x1, y1, x2, y2, x, y);
      }
    }
    if (c.closed) b.close();
  }
  b.finish();
  return keepUnchangedSegments(path, b.contours);
}

/**
 * `read` with each segment that has exactly the kind and coordinates of the segment at the
 * same place in `path` replaced by that very object (equal values, so nothing changes; later
 * memos by segment, such as the cubic flattenings, then find it). Contours whose segment count
 * changed on reading are left as read.
 */
function keepUnchangedSegments(path: Path, read: Path): Path {
  let source = path;
  for (let j = 0; j < path.length; j++)
    if (path[j]!.segments.length === 0) {
      source = path.filter((c) => c.segments.length > 0);
      break;
    }
  if (source.length !== read.length) return read;
  for (let j = 0; j < read.length; j++) {
    const src = source[j]!.segments;
    // `read` was just built by readBackOf: its segment lists are its own, changed here in place
    const segments = read[j]!.segments as Segment[];
    if (src.length !== segments.length) continue;
    for (let i = 0; i < src.length; i++) {
      const a = src[i]!;
      if (a !== segments[i] && sameSegment(a, segments[i]!)) segments[i] = a;
    }
  }
  return read;
}

/** Same kind and the very same numbers (Object.is: −0 is not 0, which atan2 would tell apart). */
function sameSegment(a: Segment, b: Segment): boolean {
  const same = Object.is;
  if (a.kind !== b.kind || !same(a.from.x, b.from.x) || !same(a.from.y, b.from.y) || !same(a.to.x, b.to.x) || !same(a.to.y, b.to.y)) return false;
  return a.kind === 'line' || (b.kind === 'cubic' && same(a.c1.x, b.c1.x) && same(a.c1.y, b.c1.y) && same(a.c2.x, b.c2.x) && same(a.c2.y, b.c2.y));
}

/** A contour through the given points joined by straight lines. Fewer than 2 points give an empty contour. */
export function contourFromPoints(input: readonly Point[], closed: boolean): Contour {
  // consecutive duplicates (within POINT_EPSILON) would make zero-length segments
  const points = input.filter((p, i) => i === 0 || hypotAbove(p.x - input[i - 1]!.x, p.y - input[i - 1]!.y, POINT_EPSILON));
  const segments = new Array<Segment>();
  for (let i = 1; i < points.length; i++) segments.push(lineSegment(points[i - 1]!, points[i]!));
  if (closed && points.length > 2 && hypotAbove(points[points.length - 1]!.x - points[0]!.x, points[points.length - 1]!.y - points[0]!.y, POINT_EPSILON))
    segments.push(lineSegment(points[points.length - 1]!, points[0]!));
  return contourOf(segments, closed && points.length > 2);
}

export function contourTransform(c: Contour, m: Affine): Contour {
  return contourOf(c.segments.map((s) => segmentTransform(s, m)), c.closed);
}

export function pathTransform(path: Path, m: Affine): Path {
  return path.map((c) => contourTransform(c, m));
}

export function contourReverse(c: Contour): Contour {
  return contourOf([...c.segments].reverse().map(segmentReverse), c.closed);
}

export function contourLength(c: Contour, tolerance = LENGTH_TOLERANCE): number {
  const per = tolerance / Math.max(1, c.segments.length);
  return c.segments.reduce((sum, s) => sum + segmentLength(s, per), 0);
}

export function pathLength(path: Path, tolerance = LENGTH_TOLERANCE): number {
  return path.reduce((sum, c) => sum + contourLength(c, tolerance / Math.max(1, path.length)), 0);
}

/**
 * Signed enclosed area (mm²), exact for lines and cubics. With y down, positive = clockwise
 * on screen. An open contour is measured as if closed by its chord.
 */
export function contourSignedArea(c: Contour): number {
  let a = 0;
  for (const s of c.segments) a += segmentAreaContribution(s);
  if (!c.closed && c.segments.length > 0) a += segmentAreaContribution(lineSegment(c.segments[c.segments.length - 1]!.to, c.segments[0]!.from));
  return a;
}

export function contourArea(c: Contour): number {
  return Math.abs(contourSignedArea(c));
}

export function contourStart(c: Contour): Point | undefined {
  return c.segments[0]?.from;
}

/** Tight bounds; an empty contour gives infinities. */
export function contourBounds(c: Contour): { minX: number; minY: number; maxX: number; maxY: number } {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const s of c.segments) {
    const b = cubicBounds(segmentCubic(s));
    minX = Math.min(minX, b.minX);
    minY = Math.min(minY, b.minY);
    maxX = Math.max(maxX, b.maxX);
    maxY = Math.max(maxY, b.maxY);
  }
  return { minX, minY, maxX, maxY };
}

/**
 * The points of a contour where its projection on `direction` can be greatest or least: every
 * segment's ends and, on cubics, the points where the derivative of the projection vanishes
 * (the roots in (0, 1) of a quadratic). The exact extent of the contour along the direction is
 * the range of the projection over these points — no flattening, no tolerance.
 */
export function contourExtremePoints(c: Contour, direction: Point): Point[] {
  const out: Point[] = [];
  const segs = c.segments;
  for (let i = 0; i < segs.length; i++) {
    const s = segs[i]!;
    if (i === 0) out.push(s.from);
    if (s.kind === 'cubic') {
      // d/dt (B(t)·u) = 3[(1−t)²a0 + 2(1−t)t·a1 + t²a2], a_k = (P_k+1 − P_k)·u
      const a0 = (s.c1.x - s.from.x) * direction.x + (s.c1.y - s.from.y) * direction.y;
      const a1 = (s.c2.x - s.c1.x) * direction.x + (s.c2.y - s.c1.y) * direction.y;
      const a2 = (s.to.x - s.c2.x) * direction.x + (s.to.y - s.c2.y) * direction.y;
      const roots = solveQuadratic(a0 - 2 * a1 + a2, 2 * (a1 - a0), a0);
      for (let k = 0; k < roots.length; k++) {
        const t = roots[k]!;
        if (t > 0 && t < 1) out.push(cubicPoint([s.from, s.c1, s.c2, s.to], t));
      }
    }
    out.push(s.to);
  }
  return out;
}

/** A flattened contour: polyline vertices with the segment and parameter each came from. */
export interface FlatPoint {
  readonly point: Point;
  readonly segmentIndex: number;
  readonly t: number;
}

/**
 * Flatten to a polyline within `tolerance` of the contour. For a closed contour the first
 * point is not repeated at the end.
 */
export function contourFlatten(c: Contour, tolerance = FLATNESS): FlatPoint[] {
  return contourFlattenShared(c, tolerance).slice();
}

/**
 * The same flattening as contourFlatten, without the copy: the memoised array itself, typed
 * read-only, for callers that only read it (it is shared, so it must never be changed).
 */
export function contourFlattenShared(c: Contour, tolerance = FLATNESS): readonly FlatPoint[] {
  let byTolerance = FLATTEN_CACHE.get(c);
  if (!byTolerance) {
    byTolerance = new Map();
    FLATTEN_CACHE.set(c, byTolerance);
  }
  let flat = byTolerance.get(tolerance);
  if (!flat) {
    flat = flattenContour(c, tolerance);
    byTolerance.set(tolerance, flat);
  }
  return flat;
}

/**
 * The points of contourFlattenShared(c, tolerance) in order (equal values; the segment ends
 * are the very objects), without FlatPoint objects and without a memo for the contour (for
 * callers that only need the points once).
 */
export function contourFlatPoints(c: Contour, tolerance = FLATNESS): Point[] {
  const out: Point[] = [];
  const segs = c.segments;
  for (let i = 0; i < segs.length; i++) {
    const s = segs[i]!;
    if (i === 0) out.push(s.from);
    if (s.kind === 'line') {
      out.push(s.to);
      continue;
    }
    // the flattening's own points when made already, else new ones not kept with it: most
    // callers (the seam allowance's runs, extents, the hinge check) read them once, and kept
    // they stayed alive with the memo (most of what the garbage collector copied)
    const f = cubicFlattening(s, tolerance);
    const points = f.points;
    const n = f.ts.length;
    if (points) for (let k = 1; k < n; k++) out.push(points[k]!);
    else for (let k = 1; k < n; k++) out.push(f.ts[k] === 1 ? s.to : pt(f.xs[k]!, f.ys[k]!));
  }
  if (c.closed && out.length > 1) out.pop();
  return out;
}

/** How many points contourFlatPoints(c, tolerance) gives. */
export function contourFlatCount(c: Contour, tolerance = FLATNESS): number {
  const segs = c.segments;
  if (segs.length === 0) return 0;
  let m = 1;
  for (let i = 0; i < segs.length; i++) {
    const s = segs[i]!;
    m += s.kind === 'line' ? 1 : cubicFlattening(s, tolerance).ts.length - 1;
  }
  return c.closed && m > 1 ? m - 1 : m;
}

/**
 * The points of contourFlatPoints(c, tolerance) as coordinates, written into xs and ys from
 * index `at` (room for contourFlatCount of them); returns the index after the last.
 */
export function contourFlatInto(c: Contour, tolerance: number, xs: Float64Array, ys: Float64Array, at: number): number {
  let m = at;
  const segs = c.segments;
  for (let i = 0; i < segs.length; i++) {
    const s = segs[i]!;
    if (i === 0) {
      xs[m] = s.from.x;
      ys[m] = s.from.y;
      m++;
    }
    if (s.kind === 'line') {
      xs[m] = s.to.x;
      ys[m] = s.to.y;
      m++;
      continue;
    }
    const f = cubicFlattening(s, tolerance);
    const n = f.ts.length;
    for (let k = 1; k < n; k++) {
      const end = f.ts[k] === 1;
      xs[m] = end ? s.to.x : f.xs[k]!;
      ys[m] = end ? s.to.y : f.ys[k]!;
      m++;
    }
  }
  if (c.closed && m - at > 1) m--;
  return m;
}

/**
 * The length of contourFlatPoints(c, tolerance) taken as a closed polygon: the chords between
 * its points in order, then the one from its last point back to its first, summed in that
 * order; the same number (the same chords, added in the same order) without the list.
 */
export function contourFlatPerimeter(c: Contour, tolerance = FLATNESS): number {
  const segs = c.segments;
  if (segs.length === 0) return 0;
  const x0 = segs[0]!.from.x;
  const y0 = segs[0]!.from.y;
  let total = 0;
  let count = 1;
  // the last point, the one before it, and the chord between them (added once a next point comes)
  let lx = x0;
  let ly = y0;
  let bx = x0;
  let by = y0;
  let pending = 0;
  const visit = (x: number, y: number): void => {
    if (count > 1) total += pending;
    pending = vecHypot(lx - x, ly - y);
    bx = lx;
    by = ly;
    lx = x;
    ly = y;
    count++;
  };
  for (let i = 0; i < segs.length; i++) {
    const s = segs[i]!;
    if (s.kind === 'line') {
      visit(s.to.x, s.to.y);
      continue;
    }
    const f = cubicFlattening(s, tolerance);
    const xs = f.xs;
    const ys = f.ys;
    for (let k = 1; k < xs.length; k++) visit(xs[k]!, ys[k]!);
  }
  // contourFlatPoints leaves out a closed contour's last point: its chord goes, the one before closes
  if (c.closed && count > 1) return total + vecHypot(bx - x0, by - y0);
  if (count > 1) total += pending;
  return total + vecHypot(lx - x0, ly - y0);
}

/**
 * Flattenings by contour object and tolerance. Contours are read-only values and flattening is
 * a pure function of them, so sharing the result changes nothing; it saves flattening the same
 * outline again in the next check or operation (outlines an operation leaves alone are the
 * very same objects, through the parse memo of pathFromSvg). Held weakly: no growth.
 */
const FLATTEN_CACHE = new WeakMap<Contour, Map<number, readonly FlatPoint[]>>();

/** A FlatPoint made by a constructor (it is kept in FLATTEN_CACHE; see ContourValue). */
class FlatPointValue implements FlatPoint {
  declare readonly point: Point;
  declare readonly segmentIndex: number;
  declare readonly t: number;
  constructor(point: Point, segmentIndex: number, t: number) {
    this.point = point;
    this.segmentIndex = segmentIndex;
    this.t = t;
  }
}

function flattenContour(c: Contour, tolerance: number): FlatPoint[] {
  const out = new Array<FlatPoint>();
  c.segments.forEach((s, i) => {
    if (i === 0) out.push(new FlatPointValue(s.from, 0, 0));
    if (s.kind === 'line') {
      out.push(new FlatPointValue(s.to, i, 1));
      return;
    }
    const f = cubicFlattening(s, tolerance);
    const ts = f.ts;
    const points = flatteningPoints(s, f);
    for (let k = 1; k < ts.length; k++) out.push(new FlatPointValue(points[k]!, i, ts[k]!));
  });
  if (c.closed && out.length > 1) out.pop();
  return out;
}

/**
 * The flattening of one cubic: its parameters and the coordinates of its points (index 0 is
 * the start). Point objects are made only when a caller asks for them (flatteningPoints); the
 * self-crossing check reads the coordinates.
 */
class CubicFlattening {
  declare readonly tolerance: number;
  declare readonly ts: readonly number[];
  declare readonly xs: readonly number[];
  declare readonly ys: readonly number[];
  declare points: Point[] | undefined;
  constructor(tolerance: number, ts: readonly number[], xs: readonly number[], ys: readonly number[]) {
    this.tolerance = tolerance;
    this.ts = ts;
    this.xs = xs;
    this.ys = ys;
    this.points = undefined;
  }
}

/**
 * Flattenings of single cubics by segment object (the last few tolerances asked: lengthen
 * reads the extent at 0.05 mm, the self-crossing check flattens at FLATNESS). A cubic flattens
 * the same wherever it sits, so a contour that keeps most of its segments — an operation
 * changes a few curves, and readBackOf hands the unchanged ones back as the very same objects —
 * reflattens only the changed ones. Bounded, in two generations: a Map of up to
 * CUBIC_FLATTEN_GENERATION cubics and the one before it (a cubic found in the older one moves
 * to the newer). A Map, not a WeakMap: setting a key in a WeakMap cost about 1 µs and work for
 * the garbage collector (a tenth of the stack's time); a Map costs about half, and the bound
 * keeps what it holds to a few thousand flattenings. During a replay (pathTextDeferred), cubics
 * not yet in it go to a memo of the run instead, which ends with the run but for the cubics of
 * the run's input: the intermediate results of a replay are garbage once it ends, and keeping
 * their flattenings for the next few thousand cubics made the garbage collector copy them and
 * move them to the old generation (most of what survived a young collection). Which entries are
 * kept changes only the speed: a flattening made again is the same.
 */
let CUBIC_FLATTEN_CACHE = new Map<Segment, CubicFlattening[]>();
let CUBIC_FLATTEN_OLDER = new Map<Segment, CubicFlattening[]>();
const CUBIC_FLATTEN_GENERATION = 2048;

function rememberFlattenings(s: Segment, kept: CubicFlattening[]): void {
  if (CUBIC_FLATTEN_CACHE.size >= CUBIC_FLATTEN_GENERATION) {
    CUBIC_FLATTEN_OLDER = CUBIC_FLATTEN_CACHE;
    CUBIC_FLATTEN_CACHE = new Map();
  }
  CUBIC_FLATTEN_CACHE.set(s, kept);
}

/** The most tolerances kept per cubic (the oldest is dropped). */
const CUBIC_FLATTEN_KEEP = 3;

function cubicFlattening(s: CubicSegment, tolerance: number): CubicFlattening {
  let kept = CUBIC_FLATTEN_CACHE.get(s);
  if (!kept) {
    const local = deferred?.flattenings;
    kept = local?.get(s);
    if (!kept && deferred) {
      kept = deferred.flatteningsBefore.get(s);
      if (kept) local!.set(s, kept);
    }
    if (!kept) {
      const older = CUBIC_FLATTEN_OLDER.get(s);
      kept = older ?? new Array<CubicFlattening>();
      // a cubic new to a replay (applyOps) is most likely one of its intermediate results: its
      // flattenings stay with the run and die with it (see keepInputFlattenings)
      if (local && !older) local.set(s, kept);
      else rememberFlattenings(s, kept);
    }
  }
  for (const f of kept) if (f.tolerance === tolerance) return f;
  const ts = cubicFlattenTimes([s.from, s.c1, s.c2, s.to], tolerance);
  const n = ts.length;
  // plain arrays of the final size: a small typed array costs several times as much to make
  const xs = new Array<number>(n);
  const ys = new Array<number>(n);
  const { from, c1, c2, to } = s;
  xs[0] = from.x;
  ys[0] = from.y;
  for (let k = 1; k < n; k++) {
    const t = ts[k]!;
    if (t === 1) {
      xs[k] = to.x;
      ys[k] = to.y;
      continue;
    }
    // cubicPoint's arithmetic, inline
    const mt = 1 - t;
    const a = mt * mt * mt;
    const b = 3 * mt * mt * t;
    const d = 3 * mt * t * t;
    const e = t * t * t;
    xs[k] = a * from.x + b * c1.x + d * c2.x + e * to.x;
    ys[k] = a * from.y + b * c1.y + d * c2.y + e * to.y;
  }
  const f = new CubicFlattening(tolerance, ts, xs, ys);
  if (kept.length >= CUBIC_FLATTEN_KEEP) kept.shift();
  kept.push(f);
  return f;
}

/** The points of a cubic's flattening (the start and t = 1 as the segment's own points), made once per flattening. */
function flatteningPoints(s: CubicSegment, f: CubicFlattening): readonly Point[] {
  if (f.points) return f.points;
  const n = f.ts.length;
  const points = new Array<Point>(n);
  points[0] = s.from;
  for (let k = 1; k < n; k++) points[k] = f.ts[k] === 1 ? s.to : pt(f.xs[k]!, f.ys[k]!);
  f.points = points;
  return points;
}

/** Where a contour crosses or touches itself. */
export interface SelfCrossing {
  readonly point: Point;
  /** Indices of the two segments that meet. */
  readonly segments: readonly [number, number];
}

function segmentsIntersect(a: Point, b: Point, c: Point, d: Point): Point | null {
  const r = vecSub(b, a);
  const s = vecSub(d, c);
  const den = vecCross(r, s);
  const qp = vecSub(c, a);
  if (Math.abs(den) < 1e-15) {
    // parallel: overlapping collinear pieces count as touching
    if (Math.abs(vecCross(qp, r)) > 1e-9 * Math.max(1, vecHypot(r.x, r.y))) return null;
    const rr = vecDot(r, r);
    if (rr === 0) return null;
    const t0 = vecDot(qp, r) / rr;
    const t1 = t0 + vecDot(s, r) / rr;
    const lo = Math.max(0, Math.min(t0, t1));
    const hi = Math.min(1, Math.max(t0, t1));
    return lo <= hi ? vecLerp(a, b, (lo + hi) / 2) : null;
  }
  const t = vecCross(qp, s) / den;
  const u = vecCross(qp, r) / den;
  const e = 1e-12;
  return t >= -e && t <= 1 + e && u >= -e && u <= 1 + e ? vecLerp(a, b, t) : null;
}

/**
 * Find places where a contour crosses or touches itself, on its flattening within
 * `tolerance` (so two parts nearer than about `tolerance` may be reported as touching).
 * Neighbouring polyline edges share a vertex and are not reported. Sweep over x (a lean
 * sweep first asks whether there is anything to list).
 */
export function contourSelfCrossings(c: Contour, tolerance = FLATNESS): SelfCrossing[] {
  // Nearly every outline checked is simple: a lean sweep on typed arrays first says whether any
  // pair meets (every pair the listing sweep below tests, both ways round), on the vertices of
  // the flattening taken straight from the per-cubic memo (no FlatPoint objects); only then list them.
  if (!mayCross(c, tolerance)) return [];
  const raw = contourFlattenShared(c, tolerance);
  const flat = raw.filter((f, i) => i === 0 || vecDistance(f.point, raw[i - 1]!.point) > POINT_EPSILON);
  if (c.closed && flat.length > 1 && vecDistance(flat[0]!.point, flat[flat.length - 1]!.point) <= POINT_EPSILON) flat.pop();
  const n = flat.length;
  const edgeCount = c.closed ? n : n - 1;
  if (edgeCount < 3) return [];
  const edges = Array.from({ length: edgeCount }, (_, i) => {
    const a = flat[i]!;
    const b = flat[(i + 1) % n]!;
    return { i, a: a.point, b: b.point, seg: b.t === 0 ? a.segmentIndex : b.segmentIndex, minX: Math.min(a.point.x, b.point.x), maxX: Math.max(a.point.x, b.point.x) };
  });
  const order = [...edges].sort((p, q) => p.minX - q.minX);
  const out: SelfCrossing[] = [];
  const active: typeof edges = [];
  for (const e of order) {
    for (let k = active.length - 1; k >= 0; k--) if (active[k]!.maxX < e.minX - 1e-12) active.splice(k, 1);
    for (const o of active) {
      const gap = Math.abs(o.i - e.i);
      if (gap <= 1 || (c.closed && gap === edgeCount - 1)) continue;
      if (Math.max(o.a.y, o.b.y) < Math.min(e.a.y, e.b.y) || Math.max(e.a.y, e.b.y) < Math.min(o.a.y, o.b.y)) continue;
      const p = segmentsIntersect(o.a, o.b, e.a, e.b);
      if (p) out.push({ point: p, segments: o.seg < e.seg ? [o.seg, e.seg] : [e.seg, o.seg] });
    }
    active.push(e);
  }
  return out;
}

/**
 * The vertices contourSelfCrossings works on, as coordinates: the flattening of flattenContour
 * (the same per-cubic memo, the same points), without vertices within POINT_EPSILON of the
 * vertex before them (and, closed, of the first), as its filter drops them.
 */
function flatVertices(c: Contour, tolerance: number): { xs: Float64Array; ys: Float64Array; n: number } {
  const segs = c.segments;
  // each cubic's flattening, looked up once
  const flats: (CubicFlattening | undefined)[] = new Array<CubicFlattening | undefined>(segs.length);
  let total = 1;
  for (let i = 0; i < segs.length; i++) {
    const s = segs[i]!;
    if (s.kind === 'line') total += 1;
    else {
      const f = cubicFlattening(s, tolerance);
      flats[i] = f;
      total += f.ts.length - 1;
    }
  }
  // scratch arrays: mayCross, the only caller, reads them before anything else uses them
  const xs = scratchF64(F64_SLOT.crossXs, total);
  const ys = scratchF64(F64_SLOT.crossYs, total);
  // raw vertices in order, as flattenContour lists them
  let m = 0;
  if (segs.length > 0) {
    xs[0] = segs[0]!.from.x;
    ys[0] = segs[0]!.from.y;
    m = 1;
  }
  for (let i = 0; i < segs.length; i++) {
    const s = segs[i]!;
    if (s.kind === 'line') {
      xs[m] = s.to.x;
      ys[m] = s.to.y;
      m++;
      continue;
    }
    const f = flats[i]!;
    const fx = f.xs;
    const fy = f.ys;
    for (let k = 1; k < fx.length; k++) {
      xs[m] = fx[k]!;
      ys[m] = fy[k]!;
      m++;
    }
  }
  if (c.closed && m > 1) m--;
  return { xs, ys, n: dropNearRepeats(xs, ys, m, c.closed) };
}

/**
 * The filter of contourSelfCrossings on m raw vertices, in place: each vertex within
 * POINT_EPSILON of the raw vertex before it is dropped, and (closed) the last one when it is
 * that near the first. Returns how many are left.
 */
function dropNearRepeats(xs: Float64Array, ys: Float64Array, m: number, closed: boolean): number {
  let n = 0;
  let px = 0;
  let py = 0;
  for (let k = 0; k < m; k++) {
    const x = xs[k]!;
    const y = ys[k]!;
    if (k === 0 || hypotAbove(x - px, y - py, POINT_EPSILON)) {
      xs[n] = x;
      ys[n] = y;
      n++;
    }
    px = x;
    py = y;
  }
  if (closed && n > 1 && !hypotAbove(xs[0]! - xs[n - 1]!, ys[0]! - ys[n - 1]!, POINT_EPSILON)) n--;
  return n;
}

/**
 * segmentsIntersect(a, b, c, d) !== null on coordinates, with the same arithmetic in the same
 * order (vecSub, vecCross, vecDot inline), so it decides exactly as segmentsIntersect does.
 */
function segmentsMeet(ax: number, ay: number, bx: number, by: number, cx: number, cy: number, dx: number, dy: number): boolean {
  const rx = bx - ax;
  const ry = by - ay;
  const sx = dx - cx;
  const sy = dy - cy;
  const den = rx * sy - ry * sx;
  const qx = cx - ax;
  const qy = cy - ay;
  if (Math.abs(den) < 1e-15) {
    if (Math.abs(qx * ry - qy * rx) > 1e-9 * Math.max(1, vecHypot(rx, ry))) return false;
    const rr = rx * rx + ry * ry;
    if (rr === 0) return false;
    const t0 = (qx * rx + qy * ry) / rr;
    const t1 = t0 + (sx * rx + sy * ry) / rr;
    return Math.max(0, Math.min(t0, t1)) <= Math.min(1, Math.max(t0, t1));
  }
  const t = (qx * sy - qy * sx) / den;
  const u = (qx * ry - qy * rx) / den;
  const e = 1e-12;
  return t >= -e && t <= 1 + e && u >= -e && u <= 1 + e;
}

/**
 * True when two non-neighbouring edges of the flattened contour meet by segmentsIntersect. The
 * same pairs as the sweep over x of contourSelfCrossings, on typed arrays and collecting
 * nothing (swept over y when the contour is taller than wide; see below).
 */
function mayCross(c: Contour, tolerance: number): boolean {
  const { xs, ys, n } = flatVertices(c, tolerance);
  return verticesMayCross(xs, ys, n, c.closed);
}

/** mayCross on the vertices flatVertices gives (n of them in xs, ys; closed: the last joins the first). */
function verticesMayCross(xs: Float64Array, ys: Float64Array, n: number, closed: boolean): boolean {
  const edgeCount = closed ? n : n - 1;
  if (edgeCount < 3) return false;
  const minX = scratchF64(F64_SLOT.crossMinX, edgeCount);
  const maxX = scratchF64(F64_SLOT.crossMaxX, edgeCount);
  const minY = scratchF64(F64_SLOT.crossMinY, edgeCount);
  const maxY = scratchF64(F64_SLOT.crossMaxY, edgeCount);
  for (let i = 0; i < edgeCount; i++) {
    const j = i + 1 === n ? 0 : i + 1;
    minX[i] = Math.min(xs[i]!, xs[j]!);
    maxX[i] = Math.max(xs[i]!, xs[j]!);
    minY[i] = Math.min(ys[i]!, ys[j]!);
    maxY[i] = Math.max(ys[i]!, ys[j]!);
  }
  // The pairs tested are those whose x ranges overlap within 1e-12 and whose y ranges overlap:
  // a sweep over x (any order by minX: a pair is tested when the later of the two arrives and the
  // earlier still reaches it, whichever of two equal keys comes first) prunes on the first and
  // tests the second. The answer (does any tested pair meet) does not depend on the order the
  // pairs come in, so a piece taller than wide is swept over y instead, pruning on the y overlap
  // and testing the x overlap (with its 1e-12): the same pairs, far fewer active at a time.
  let boxMinX = Infinity;
  let boxMaxX = -Infinity;
  let boxMinY = Infinity;
  let boxMaxY = -Infinity;
  for (let i = 0; i < edgeCount; i++) {
    if (minX[i]! < boxMinX) boxMinX = minX[i]!;
    if (maxX[i]! > boxMaxX) boxMaxX = maxX[i]!;
    if (minY[i]! < boxMinY) boxMinY = minY[i]!;
    if (maxY[i]! > boxMaxY) boxMaxY = maxY[i]!;
  }
  const overY = boxMaxY - boxMinY > boxMaxX - boxMinX;
  const lo = overY ? minY : minX; // sweep key
  const hi = overY ? maxY : maxX;
  const lo2 = overY ? minX : minY; // tested
  const hi2 = overY ? maxX : maxY;
  const sweepSlack = overY ? 0 : 1e-12;
  const testSlack = overY ? 1e-12 : 0;
  const order = orderByKey(lo, edgeCount);
  const active = scratchI32(I32_SLOT.crossActive, edgeCount);
  let count = 0;
  for (let r = 0; r < edgeCount; r++) {
    const e = order[r]!;
    const left = overY ? lo[e]! : lo[e]! - sweepSlack;
    const e1 = e + 1 === n ? 0 : e + 1;
    const eLo = overY ? lo2[e]! - testSlack : lo2[e]!;
    const eHi = hi2[e]!;
    // one pass: drop the active edges the sweep has left behind, test the others
    let kept = 0;
    for (let j = 0; j < count; j++) {
      const o = active[j]!;
      if (hi[o]! < left) continue;
      active[kept++] = o;
      const gap = Math.abs(o - e);
      if (gap <= 1 || (closed && gap === edgeCount - 1)) continue;
      if (hi2[o]! < eLo || eHi < (overY ? lo2[o]! - testSlack : lo2[o]!)) continue;
      const o1 = o + 1 === n ? 0 : o + 1;
      if (
        segmentsMeet(xs[o]!, ys[o]!, xs[o1]!, ys[o1]!, xs[e]!, ys[e]!, xs[e1]!, ys[e1]!) ||
        segmentsMeet(xs[e]!, ys[e]!, xs[e1]!, ys[e1]!, xs[o]!, ys[o]!, xs[o1]!, ys[o1]!)
      )
        return true;
    }
    count = kept;
    active[count++] = e;
  }
  return false;
}

/** True when the contour is closed and neither crosses nor touches itself. */
export function contourIsSimple(c: Contour, tolerance = FLATNESS): boolean {
  return c.closed && contourSelfCrossings(c, tolerance).length === 0;
}

/**
 * For the closed polygon through `count` points (xs, ys), read as contourFromPoints(points, true)
 * reads them: its text as pathToSvgNow prints it when contourIsSimple finds it simple and its
 * signed area is positive; undefined when it is not closed, or simple with an area ≤ 0; null
 * when the lean test finds edges that may meet (the caller then asks contourIsSimple, which
 * lists them). Works on the coordinates: no point, segment or contour objects. The same rules
 * step by step: contourFromPoints' dropping of points within POINT_EPSILON of the point before
 * them and its closing line, then flatVertices' vertices of that contour, then mayCross.
 */
export function simplePolygonText(xs: Float64Array, ys: Float64Array, count: number, decimals: number): string | undefined | null {
  // contourFromPoints: each point against the point before it in the input
  const ax = scratchF64(F64_SLOT.polygonXs, count);
  const ay = scratchF64(F64_SLOT.polygonYs, count);
  let k = 0;
  for (let i = 0; i < count; i++)
    if (i === 0 || hypotAbove(xs[i]! - xs[i - 1]!, ys[i]! - ys[i - 1]!, POINT_EPSILON)) {
      ax[k] = xs[i]!;
      ay[k] = ys[i]!;
      k++;
    }
  if (k <= 2) return undefined; // not closed: contourIsSimple says no
  const closing = hypotAbove(ax[k - 1]! - ax[0]!, ay[k - 1]! - ay[0]!, POINT_EPSILON);
  const segmentCount = closing ? k : k - 1;
  // flatVertices of that contour: the segment ends in order (the start once), the last dropped
  // (closed), then each against the one before it, and the last if it meets the first
  const vx = scratchF64(F64_SLOT.crossXs, k + 1);
  const vy = scratchF64(F64_SLOT.crossYs, k + 1);
  let m = 0;
  for (let i = 0; i <= segmentCount; i++) {
    const j = i === k ? 0 : i; // the closing line ends at the first point
    vx[m] = ax[j]!;
    vy[m] = ay[j]!;
    m++;
  }
  m--; // closed
  const n = dropNearRepeats(vx, vy, m, true);
  if (verticesMayCross(vx, vy, n, true)) return null;
  // contourSignedArea: each line's share in order, the closing line last
  let area = 0;
  for (let i = 1; i < k; i++) area += 0.5 * (ax[i - 1]! * ay[i]! - ax[i]! * ay[i - 1]!);
  if (closing) area += 0.5 * (ax[k - 1]! * ay[0]! - ax[0]! * ay[k - 1]!);
  if (!(area > 0)) return undefined;
  // writePath: M, then L to the end of every segment but the last (Z draws it), then Z
  const w = TEXT;
  w.length = 0;
  w.code(CHAR_M);
  w.xy(ax[0]!, ay[0]!, decimals);
  for (let i = 1; i < segmentCount; i++) {
    w.code(SPACE);
    w.code(CHAR_L);
    w.xy(ax[i]!, ay[i]!, decimals);
  }
  w.code(SPACE);
  w.code(CHAR_Z);
  return w.text();
}

/** A location on a contour. */
export interface ContourLocation {
  readonly segmentIndex: number;
  readonly t: number;
  readonly point: Point;
}

/** Nearest location on the contour to p; `distance` in mm. An empty contour throws RangeError. */
export function contourNearest(c: Contour, p: Point): ContourLocation & { readonly distance: number } {
  if (c.segments.length === 0) throw new RangeError('contourNearest: empty contour');
  // memo by contour object and point: a landmark is looked up again by the next edge that
  // starts there, by the next check and by the next operation (read-only values, pure function)
  let memo = NEAREST_CACHE.get(c);
  if (!memo) {
    memo = new NearestMemo();
    NEAREST_CACHE.set(c, memo);
  }
  // by x, then y: numbers as keys compare as the text `${x},${y}` did (0 and −0 alike, every
  // other pair of doubles apart), without printing two numbers per look-up
  let byY = memo.byX.get(p.x);
  const hit = byY?.get(p.y);
  if (hit) return hit;
  let best: ContourLocation & { distance: number } = new NearestLocation(0, 0, c.segments[0]!.from, Infinity);
  const segs = c.segments;
  for (let i = 0; i < segs.length; i++) {
    // nothing can come closer than 0 (the comparison below is strict): the rest cannot replace it
    if (best.distance === 0) break;
    const s = segs[i]!;
    // the curve lies in the box of its control points: skip segments whose box is farther than the best so far
    let minX = Math.min(s.from.x, s.to.x);
    let maxX = Math.max(s.from.x, s.to.x);
    let minY = Math.min(s.from.y, s.to.y);
    let maxY = Math.max(s.from.y, s.to.y);
    if (s.kind === 'cubic') {
      minX = Math.min(minX, s.c1.x, s.c2.x);
      maxX = Math.max(maxX, s.c1.x, s.c2.x);
      minY = Math.min(minY, s.c1.y, s.c2.y);
      maxY = Math.max(maxY, s.c1.y, s.c2.y);
    }
    const dx = Math.max(minX - p.x, 0, p.x - maxX);
    const dy = Math.max(minY - p.y, 0, p.y - maxY);
    // The point found on a segment is rounded and can lie outside its box by a few units in the
    // last place of the box's coordinates (e.g. from + (to − from)·1 ≠ to): skip only a box
    // farther than the best distance by more than that, so the pruned search still picks what
    // the search over every segment picks.
    const slack = 1e-12 * Math.max(Math.abs(minX), Math.abs(maxX), Math.abs(minY), Math.abs(maxY));
    if (hypotAbove(dx, dy, best.distance + slack)) continue;
    // the point at t by segmentPoint's arithmetic, made only for a new best (vecSub, vecDot,
    // vecLerp and vecDistance written out on numbers, in the same order)
    let t: number;
    let qx: number;
    let qy: number;
    if (s.kind === 'line') {
      const dx0 = s.to.x - s.from.x;
      const dy0 = s.to.y - s.from.y;
      const l2 = dx0 * dx0 + dy0 * dy0;
      t = l2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - s.from.x) * dx0 + (p.y - s.from.y) * dy0) / l2));
      qx = s.from.x + (s.to.x - s.from.x) * t;
      qy = s.from.y + (s.to.y - s.from.y) * t;
    } else {
      t = cubicNearestTime(segmentCubic(s), p);
      const mt = 1 - t;
      const a = mt * mt * mt;
      const b = 3 * mt * mt * t;
      const d = 3 * mt * t * t;
      const e = t * t * t;
      qx = a * s.from.x + b * s.c1.x + d * s.c2.x + e * s.to.x;
      qy = a * s.from.y + b * s.c1.y + d * s.c2.y + e * s.to.y;
    }
    const dist = vecHypot(p.x - qx, p.y - qy);
    if (dist < best.distance) best = new NearestLocation(i, t, pt(qx, qy), dist);
  }
  if (memo.count < 4096) {
    if (!byY) {
      byY = new Map();
      memo.byX.set(p.x, byY);
    }
    byY.set(p.y, best);
    memo.count++;
  }
  return best;
}

/** contourNearest results by contour object, then by point (held weakly, bounded per contour). */
const NEAREST_CACHE = new WeakMap<Contour, NearestMemo>();

class NearestMemo {
  count = 0;
  readonly byX = new Map<number, Map<number, ContourLocation & { readonly distance: number }>>();
}

/** A contourNearest result, kept in NEAREST_CACHE: made by a constructor (see ContourValue). */
class NearestLocation implements ContourLocation {
  declare readonly segmentIndex: number;
  declare readonly t: number;
  declare readonly point: Point;
  declare distance: number;
  constructor(segmentIndex: number, t: number, point: Point, distance: number) {
    this.segmentIndex = segmentIndex;
    this.t = t;
    this.point = point;
    this.distance = distance;
  }
}

/** All places where the contour meets an infinite line, in contour order. */
export function contourLineIntersections(c: Contour, origin: Point, direction: Point): ContourLocation[] {
  const out: ContourLocation[] = [];
  c.segments.forEach((s, i) => {
    for (const t of segmentLineIntersections(s, origin, direction)) {
      const point = segmentPoint(s, t);
      const prev = out[out.length - 1];
      if (prev && vecDistance(prev.point, point) < POINT_EPSILON) continue;
      out.push({ segmentIndex: i, t, point });
    }
  });
  if (c.closed && out.length > 1 && vecDistance(out[0]!.point, out[out.length - 1]!.point) < POINT_EPSILON) out.pop();
  return out;
}

/** Arc length from the contour start to a location. */
export function contourOffsetOf(c: Contour, loc: { segmentIndex: number; t: number }, tolerance = LENGTH_TOLERANCE): number {
  let sum = 0;
  for (let i = 0; i < loc.segmentIndex; i++) sum += segmentLength(c.segments[i]!, tolerance);
  const s = c.segments[loc.segmentIndex];
  if (!s) return sum;
  return sum + (s.kind === 'line' ? vecDistance(s.from, s.to) * loc.t : cubicLength(segmentCubic(s), tolerance, 0, loc.t));
}

/** Location at an arc-length offset from the start (clamped to [0, length]). */
export function contourLocationAtOffset(c: Contour, offset: number, tolerance = LENGTH_TOLERANCE): ContourLocation {
  if (c.segments.length === 0) throw new RangeError('contourLocationAtOffset: empty contour');
  let rest = Math.max(0, offset);
  for (let i = 0; i < c.segments.length; i++) {
    const s = c.segments[i]!;
    const l = segmentLength(s, tolerance);
    if (rest <= l || i === c.segments.length - 1) {
      const t = l === 0 ? 0 : s.kind === 'line' ? Math.min(1, rest / l) : cubicTimeAtLength(segmentCubic(s), Math.min(rest, l), tolerance);
      return { segmentIndex: i, t, point: segmentPoint(s, t) };
    }
    rest -= l;
  }
  const last = c.segments[c.segments.length - 1]!;
  return { segmentIndex: c.segments.length - 1, t: 1, point: last.to };
}

function compareLoc(a: { segmentIndex: number; t: number }, b: { segmentIndex: number; t: number }): number {
  return a.segmentIndex - b.segmentIndex || a.t - b.t;
}

/**
 * The open stretch of a contour from location `a` to location `b`, following the drawing
 * direction. On a closed contour the stretch wraps past the start when b comes before a;
 * a === b on a closed contour gives the whole loop. On an open contour b before a gives an
 * empty stretch.
 */
export function contourStretch(c: Contour, a: { segmentIndex: number; t: number }, b: { segmentIndex: number; t: number }): Contour {
  const segs = c.segments;
  const out = new Array<Segment>();
  const push = (s: Segment): void => {
    // arc length ≥ chord: a chord ten times POINT_EPSILON settles it without the quadrature
    if (hypotAbove(s.from.x - s.to.x, s.from.y - s.to.y, 10 * POINT_EPSILON) || segmentLength(s, 1e-3) > POINT_EPSILON) out.push(s);
  };
  // A cubic taken whole (from 0 to 1: a location on its end vertex) is the cubic itself:
  // segmentSlice would make a new segment of the very same points (cubicSlice hands the curve
  // back as it is), which the per-cubic flattening memo would not find. Lines are sliced as
  // before (their interpolation may move the last digit).
  const slice = (s: Segment, t0: number, t1: number): Segment => (s.kind === 'cubic' && t0 <= 0 && t1 >= 1 ? s : segmentSlice(s, t0, t1));
  const cmp = compareLoc(a, b);
  if (cmp < 0 || (cmp === 0 && !c.closed)) {
    if (a.segmentIndex === b.segmentIndex) {
      if (cmp < 0) push(slice(segs[a.segmentIndex]!, a.t, b.t));
    } else {
      push(slice(segs[a.segmentIndex]!, a.t, 1));
      for (let i = a.segmentIndex + 1; i < b.segmentIndex; i++) push(segs[i]!);
      push(slice(segs[b.segmentIndex]!, 0, b.t));
    }
    return contourOf(out, false);
  }
  if (!c.closed) return contourOf([], false);
  push(slice(segs[a.segmentIndex]!, a.t, 1));
  for (let i = a.segmentIndex + 1; i < segs.length; i++) push(segs[i]!);
  for (let i = 0; i < b.segmentIndex; i++) push(segs[i]!);
  push(slice(segs[b.segmentIndex]!, 0, b.t));
  return contourOf(out, false);
}

/** Rotate a closed contour so that it starts at the given location (splitting a segment if needed). */
export function contourStartAt(c: Contour, loc: { segmentIndex: number; t: number }): Contour {
  if (!c.closed) throw new RangeError('contourStartAt: the contour is open');
  const s = contourStretch(c, loc, loc);
  return contourOf(s.segments, true);
}

/** Tangent direction at the start and end of a segment, for corner tests. */
export function segmentEndTangents(s: Segment): { start: Point; end: Point } {
  if (s.kind === 'line') {
    const d = vecNormalize(vecSub(s.to, s.from));
    return { start: d, end: d };
  }
  const c = segmentCubic(s);
  return { start: cubicTangent(c, 0), end: cubicTangent(c, 1) };
}

/** Derivative of a segment at t (for advanced callers). */
export function segmentDerivative(s: Segment, t: number): Point {
  return s.kind === 'line' ? vecSub(s.to, s.from) : cubicDerivative(segmentCubic(s), t);
}
