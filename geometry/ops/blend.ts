/**
 * Blend between nested size lines by body level (trade reference §3.9).
 *
 * `levels` names a size at each level: `waist` is the top edge (the edge with role "waist", or
 * the top of the piece), `hem` the bottom edge, any other name a `level` line of the piece
 * (hip, crotch, thigh, knee, calf, …). The result is one outline per piece that follows the
 * chosen size exactly at each level and changes size smoothly between levels (a smoothstep in
 * the level coordinate, so it leaves each level tangentially).
 *
 * Correspondence between sizes: the landmarks that every size has, matched by name and
 * required in the same order around the outline; between two landmarks the sizes are matched
 * by arc-length fraction. Without landmarks, segment end points are used when every size has
 * the same number of segments, else the contour starts (with a caution).
 *
 * Sizes are numbers when every label of the piece is a number (fractional and extrapolated
 * sizes are then allowed, with a caution), otherwise the labels themselves.
 *
 * Each piece is blended with the levels it has; a piece with none of the levels (a pocket, a
 * waistband) takes the size named at its top-most level, i.e. the first entry (with a caution).
 */
import { z } from 'zod';
import { type Landmark, type Outline, type Pattern, type PatternLine, type Piece, landmarkOf, orderedOutlines, outlineContour } from '../model.ts';
import { sizeNumber } from '../sizes.ts';
import {
  type Contour,
  type Segment,
  contourFlatten,
  contourFlattenShared,
  contourLength,
  contourOf,
  contourNearest,
  contourOffsetOf,
  contourStretch,
  lineSegment,
  pathFromSvg,
  pathToSvg,
  segmentEndTangents,
  segmentPoint,
} from '../path.ts';
import { BLEND_SAMPLE_SPACING, POINT_EPSILON } from '../tolerance.ts';
import { type Point, pt, vecDistance, vecDot, vecHypot, vecSub } from '../vec.ts';
import { AlterationError, type Caution, type OpResult, assertSimple, pieceGrain, smoothThrough } from './common.ts';

export const blendOpSchema = z.object({
  op: z.literal('blend'),
  levels: z
    .array(z.object({ level: z.string().trim().min(1), size: z.union([z.string().trim().min(1), z.number()]).transform((s) => String(s)) }))
    .min(1, 'a blend needs at least one level'),
  /** Sample spacing along the outline (mm); see BLEND_SAMPLE_SPACING. */
  spacing: z.number().min(0.5).max(50).optional(),
});
export type BlendOp = z.input<typeof blendOpSchema>;

interface SizeScale {
  /** numeric value of each outline in size order */
  readonly values: readonly number[];
  readonly numeric: boolean;
  readonly labels: readonly string[];
}

function sizeScale(outlines: readonly Outline[]): SizeScale {
  const nums = outlines.map((o) => sizeNumber(o.size));
  const numeric = nums.every((n) => n !== undefined);
  return { values: numeric ? (nums as number[]) : outlines.map((_, i) => i), numeric, labels: outlines.map((o) => o.size) };
}

/** Interpolation weights across sizes at σ: index i and weight w on i+1 (w outside [0,1] extrapolates). */
function bracket(scale: SizeScale, sigma: number): { i: number; w: number } {
  const v = scale.values;
  if (v.length === 1) return { i: 0, w: 0 };
  let i = 0;
  while (i < v.length - 2 && sigma > v[i + 1]!) i++;
  return { i, w: (sigma - v[i]!) / (v[i + 1]! - v[i]!) };
}

function lerpAt<T>(items: readonly T[], scale: SizeScale, sigma: number, f: (a: T, b: T, w: number) => T): T {
  const { i, w } = bracket(scale, sigma);
  if (items.length === 1) return items[0]!;
  return f(items[i]!, items[i + 1]!, w);
}

const lerpPoint = (a: Point, b: Point, w: number): Point => pt(a.x + (b.x - a.x) * w, a.y + (b.y - a.y) * w);
const lerpNum = (a: number, b: number, w: number): number => a + (b - a) * w;
const smoothstep = (u: number): number => u * u * (3 - 2 * u);

/** Sample a stretch at fractions k/n of its length (k = 0…n−1), exactly on the curve. */
function sampleStretch(stretch: Contour, n: number): Point[] {
  const flat = contourFlatten(stretch, 0.002);
  if (stretch.segments.length === 0) return Array.from({ length: n }, () => ({ x: NaN, y: NaN }));
  const cum = [0];
  for (let i = 1; i < flat.length; i++) cum.push(cum[i - 1]! + vecDistance(flat[i - 1]!.point, flat[i]!.point));
  const total = cum[cum.length - 1]!;
  const out: Point[] = [];
  let j = 0;
  for (let k = 0; k < n; k++) {
    const target = (total * k) / n;
    while (j < flat.length - 2 && cum[j + 1]! < target) j++;
    const a = flat[j]!;
    const b = flat[j + 1] ?? a;
    const span = cum[j + 1]! - cum[j]!;
    const u = span > 0 ? (target - cum[j]!) / span : 0;
    if (a.segmentIndex === b.segmentIndex || b.t === 0) {
      const t = a.segmentIndex === b.segmentIndex ? a.t + (b.t - a.t) * u : a.t + (1 - a.t) * u;
      out.push(segmentPoint(stretch.segments[a.segmentIndex]!, t));
    } else out.push(lerpPoint(a.point, b.point, u));
  }
  return out;
}

/** True when all points lie on the chord from the first to the last (within 1e-6 mm). */
function collinear(q: readonly Point[]): boolean {
  const a = q[0]!;
  const b = q[q.length - 1]!;
  const d = vecSub(b, a);
  const l = vecHypot(d.x, d.y);
  if (l < POINT_EPSILON) return false;
  return q.every((p) => Math.abs((p.x - a.x) * d.y - (p.y - a.y) * d.x) / l < 1e-6);
}

/** A turn sharper than this at a segment joint is a corner (radians, 3°). */
const CORNER_ANGLE = (3 * Math.PI) / 180;

/** Indices of the segments of a stretch that start at a corner. */
function cornerJoints(stretch: Contour): number[] {
  const out: number[] = [];
  for (let i = 1; i < stretch.segments.length; i++) {
    const a = segmentEndTangents(stretch.segments[i - 1]!).end;
    const b = segmentEndTangents(stretch.segments[i]!).start;
    if (Math.abs(Math.atan2(a.x * b.y - a.y * b.x, a.x * b.x + a.y * b.y)) > CORNER_ANGLE) out.push(i);
  }
  return out;
}

interface Anchor {
  readonly name: string;
  readonly kind: Landmark['kind'];
}

/** Anchors common to all sizes, in outline order, with their locations per size. */
function correspondence(piece: Piece, outlines: readonly Outline[], contours: readonly Contour[], cautions: Caution[]): { anchors: Anchor[]; locs: { segmentIndex: number; t: number }[][] } {
  const common = outlines[0]!.points.filter((p) => outlines.every((o) => landmarkOf(o, p.name)));
  if (common.length > 0) {
    const perSize = outlines.map((o, si) => {
      const c = contours[si]!;
      return common
        .map((p) => {
          const loc = contourNearest(c, landmarkOf(o, p.name)!);
          return { name: p.name, kind: p.kind, loc, offset: contourOffsetOf(c, loc, 1e-3) };
        })
        .sort((a, b) => a.offset - b.offset);
    });
    const ref = perSize[0]!.map((a) => a.name);
    perSize.forEach((list, si) => {
      const names = list.map((a) => a.name);
      const shift = names.indexOf(ref[0]!);
      const rotated = [...names.slice(shift), ...names.slice(0, shift)];
      if (rotated.join('\u0000') !== ref.join('\u0000'))
        throw new AlterationError('no-correspondence', `piece "${piece.name}": the landmarks of size "${outlines[si]!.size}" are in a different order around the outline than in size "${outlines[0]!.size}"; the sizes cannot be matched point for point`);
      perSize[si] = [...list.slice(shift), ...list.slice(0, shift)];
    });
    return { anchors: perSize[0]!.map((a) => ({ name: a.name, kind: a.kind })), locs: perSize.map((list) => list.map((a) => a.loc)) };
  }
  const counts = new Set(contours.map((c) => c.segments.length));
  if (counts.size === 1) {
    const n = contours[0]!.segments.length;
    return {
      anchors: Array.from({ length: n }, (_, i) => ({ name: `node ${i}`, kind: 'mark' as const })),
      locs: contours.map(() => Array.from({ length: n }, (_, i) => ({ segmentIndex: i, t: 0 }))),
    };
  }
  cautions.push({ code: 'estimate', piece: piece.name, message: `piece "${piece.name}" has no landmarks shared by every size: sizes were matched by arc length from their start points only; check the blended outline` });
  return { anchors: [{ name: 'start', kind: 'mark' }], locs: contours.map(() => [{ segmentIndex: 0, t: 0 }]) };
}

interface LevelPos {
  readonly name: string;
  /** chosen size value at this level */
  readonly sigma: number;
  /** β of the level in each size */
  readonly beta: readonly number[];
}

function lineMidBeta(d: string, g: Point): number {
  const segs = pathFromSvg(d).flatMap((c) => c.segments);
  const a = segs[0]!.from;
  const b = segs[segs.length - 1]!.to;
  return vecDot({ x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 }, g);
}

/** A size that is not one of a piece's size lines (put into words once for the whole blend). */
interface OffLineSize {
  readonly label: string;
  readonly piece: string;
  /** The piece's printed range, "0–20", when the size is outside it; undefined between sizes. */
  readonly outside?: string;
}

function blendPiece(piece: Piece, op: z.output<typeof blendOpSchema>, cautions: Caution[], offLine: OffLineSize[]): Piece {
  const outlines = orderedOutlines(piece);
  const scale = sizeScale(outlines);
  const contours = outlines.map((o) => outlineContour(o));
  const g = pieceGrain(piece);
  const spacing = op.spacing ?? BLEND_SAMPLE_SPACING;

  const resolveSize = (label: string): number => {
    const exact = scale.labels.indexOf(label);
    if (exact >= 0) return scale.values[exact]!;
    const n = sizeNumber(label);
    if (!scale.numeric || n === undefined)
      throw new AlterationError('bad-size', `piece "${piece.name}" has no size "${label}" (sizes: ${scale.labels.join(', ')})`);
    const lo = scale.values[0]!;
    const hi = scale.values[scale.values.length - 1]!;
    if (n < lo || n > hi) offLine.push({ label, piece: piece.name, outside: `${scale.labels[0]}–${scale.labels[scale.labels.length - 1]}` });
    else offLine.push({ label, piece: piece.name });
    return n;
  };

  // levels available on this piece, with β per size
  const betaRange = contours.map((c) => {
    let min = Infinity;
    let max = -Infinity;
    for (const f of contourFlattenShared(c, 0.05)) {
      const v = vecDot(f.point, g);
      min = Math.min(min, v);
      max = Math.max(max, v);
    }
    return { min, max };
  });
  const edgeBeta = (role: 'waist' | 'hem'): number[] | undefined => {
    const e = piece.edges.find((x) => x.role === role);
    if (!e) return role === 'waist' ? betaRange.map((r) => r.min) : betaRange.map((r) => r.max);
    return outlines.map((o) => (vecDot(landmarkOf(o, e.from)!, g) + vecDot(landmarkOf(o, e.to)!, g)) / 2);
  };
  const levels: LevelPos[] = [];
  for (const l of op.levels) {
    let beta: number[] | undefined;
    if (l.level === 'waist' || l.level === 'hem') beta = edgeBeta(l.level);
    else {
      const perSize = outlines.map((o) => piece.lines.find((x) => x.role === 'level' && x.name === l.level && x.size === o.size) ?? piece.lines.find((x) => x.role === 'level' && x.name === l.level && x.size === undefined));
      if (perSize.every((x) => x !== undefined)) beta = perSize.map((x) => lineMidBeta(x!.d, g));
    }
    if (beta) levels.push({ name: l.level, sigma: resolveSize(l.size), beta });
  }
  if (levels.length === 0) {
    const first = op.levels[0]!;
    cautions.push({ code: 'missing-level', piece: piece.name, message: `piece "${piece.name}" has none of the blend levels; it takes size ${first.size} (named at ${first.level})` });
    levels.push({ name: first.level, sigma: resolveSize(first.size), beta: betaRange.map((r) => r.min) });
  }
  const mid = Math.floor((outlines.length - 1) / 2);
  levels.sort((a, b) => a.beta[mid]! - b.beta[mid]!);
  for (let k = 1; k < levels.length; k++)
    for (let s = 0; s < outlines.length; s++)
      if (!(levels[k]!.beta[s]! > levels[k - 1]!.beta[s]!))
        throw new AlterationError('bad-level', `piece "${piece.name}" size "${outlines[s]!.size}": levels "${levels[k - 1]!.name}" and "${levels[k]!.name}" are not in the same order as in the other sizes, or coincide`);
  const waistIndex = levels.findIndex((l) => l.name === 'waist');
  const hemIndex = levels.findIndex((l) => l.name === 'hem');

  const sigmaOfLambda = (lambda: number): number => {
    if (levels.length === 1 || lambda <= 0) return levels[0]!.sigma;
    if (lambda >= levels.length - 1) return levels[levels.length - 1]!.sigma;
    const k = Math.floor(lambda);
    return lerpNum(levels[k]!.sigma, levels[k + 1]!.sigma, smoothstep(lambda - k));
  };
  const lambdaOf = (beta: number, levelBeta: readonly number[]): number => {
    if (levelBeta.length === 1 || beta <= levelBeta[0]!) return 0;
    for (let k = 0; k + 1 < levelBeta.length; k++) if (beta <= levelBeta[k + 1]!) return k + (beta - levelBeta[k]!) / (levelBeta[k + 1]! - levelBeta[k]!);
    return levelBeta.length - 1;
  };
  const levelBetaAt = (sigma: number): number[] => levels.map((l) => lerpAt(l.beta, scale, sigma, lerpNum));

  // correspondence
  const { anchors, locs } = correspondence(piece, outlines, contours, cautions);
  const edgeStretches = (role: 'waist' | 'hem'): Set<number> => {
    const e = piece.edges.find((x) => x.role === role);
    const set = new Set<number>();
    if (!e) return set;
    const a = anchors.findIndex((x) => x.name === e.from);
    const b = anchors.findIndex((x) => x.name === e.to);
    if (a < 0 || b < 0) return set;
    for (let j = a; j !== b; j = (j + 1) % anchors.length) set.add(j);
    return set;
  };
  const waistStretches = edgeStretches('waist');
  const hemStretches = edgeStretches('hem');

  // Stretches between anchors, further split at corners that every size has there (a turn of
  // more than CORNER_ANGLE at a segment joint), so that unnamed corners stay sharp.
  const m = anchors.length;
  interface Part {
    readonly stretch: number;
    readonly perSize: Contour[];
  }
  const parts: Part[] = [];
  for (let j = 0; j < m; j++) {
    const stretches = contours.map((c, s) => contourStretch(c, locs[s]![j]!, locs[s]![(j + 1) % m]!));
    const corners = stretches.map(cornerJoints);
    const same = corners.every((c) => c.length === corners[0]!.length);
    if (!same || corners[0]!.length === 0) {
      parts.push({ stretch: j, perSize: stretches });
      continue;
    }
    const cuts = corners[0]!.length;
    for (let k = 0; k <= cuts; k++)
      parts.push({
        stretch: j,
        perSize: stretches.map((c, s) => {
          const from = k === 0 ? 0 : corners[s]![k - 1]!;
          const to = k === cuts ? c.segments.length : corners[s]![k]!;
          return contourOf(c.segments.slice(from, to), false);
        }),
      });
  }
  const blendedParts: Point[][] = [];
  for (const part of parts) {
    const j = part.stretch;
    const stretches = part.perSize;
    const lengths = stretches.map((c) => contourLength(c, 1e-3));
    const n = Math.max(2, Math.ceil(Math.max(...lengths) / spacing));
    const samples = stretches.map((c, s) => (c.segments.length === 0 ? Array.from({ length: n }, () => contours[s]!.segments[locs[s]![j]!.segmentIndex]!.from) : sampleStretch(c, n)));
    const pts: Point[] = [];
    for (let k = 0; k < n; k++) {
      const perSize = samples.map((list) => list[k]!);
      let lambda: number;
      if (waistIndex >= 0 && waistStretches.has(j) && k > 0) lambda = waistIndex;
      else if (hemIndex >= 0 && hemStretches.has(j) && k > 0) lambda = hemIndex;
      else {
        lambda = lambdaOf(vecDot(perSize[mid]!, g), levels.map((l) => l.beta[mid]!));
        for (let it = 0; it < 4; it++) {
          const sigma = sigmaOfLambda(lambda);
          const p = lerpAt(perSize, scale, sigma, lerpPoint);
          lambda = lambdaOf(vecDot(p, g), levelBetaAt(sigma));
        }
      }
      pts.push(lerpAt(perSize, scale, sigmaOfLambda(lambda), lerpPoint));
    }
    blendedParts.push(pts);
  }
  const segments = new Array<Segment>();
  for (let i = 0; i < parts.length; i++) {
    const q = [...blendedParts[i]!, blendedParts[(i + 1) % parts.length]![0]!];
    segments.push(...(collinear(q) ? [lineSegment(q[0]!, q[q.length - 1]!)] : smoothThrough(q)));
  }
  // anchor j's blended point is the first point of the first part of stretch j
  const anchorPoint = (j: number): Point => blendedParts[parts.findIndex((p) => p.stretch === j)]![0]!;
  const contour = contourOf(segments, true);
  const label = op.levels.map((l) => `${l.level} ${l.size}`).join(' · ');
  assertSimple(contour, `blend of piece "${piece.name}"`);
  const points: Landmark[] = anchors
    .map((a, j) => ({ a, p: anchorPoint(j) }))
    .filter(({ a }) => outlines[0]!.points.some((p) => p.name === a.name))
    .map(({ a, p }) => ({ name: a.name, kind: a.kind, x: Number(p.x.toFixed(6)), y: Number(p.y.toFixed(6)) }));
  const outline: Outline = { size: label, d: pathToSvg([contour], 6), points };

  // lines: piece-level lines stay; per-size lines are interpolated at the size that applies where they lie
  const lines: PatternLine[] = piece.lines.filter((l) => l.size === undefined);
  const groups = new Map<string, PatternLine[]>();
  for (const l of piece.lines) if (l.size !== undefined) groups.set(`${l.role}\u0000${l.name}`, [...(groups.get(`${l.role}\u0000${l.name}`) ?? []), l]);
  for (const group of groups.values()) {
    const bySize = outlines.map((o) => group.find((l) => l.size === o.size));
    if (bySize.some((l) => l === undefined)) continue;
    const level = levels.find((l) => group[0]!.role === 'level' && l.name === group[0]!.name);
    const sigma = level ? level.sigma : sigmaOfLambda(lambdaOf(lineMidBeta(bySize[mid]!.d, g), levels.map((l) => l.beta[mid]!)));
    const paths = bySize.map((l) => pathFromSvg(l!.d));
    const shape = (p: typeof paths[number]): string => p.map((c) => c.segments.map((s) => s.kind).join(',')).join('|');
    let d: string;
    if (paths.every((p) => shape(p) === shape(paths[0]!))) {
      const { i, w } = bracket(scale, sigma);
      const a = paths[Math.min(i, paths.length - 1)]!;
      const b = paths[Math.min(i + 1, paths.length - 1)]!;
      d = pathToSvg(
        a.map((c, ci) => ({
          closed: c.closed,
          segments: c.segments.map((s, si) => {
            const t = b[ci]!.segments[si]!;
            const L = (p: Point, q: Point): Point => lerpPoint(p, q, paths.length === 1 ? 0 : w);
            return s.kind === 'line' || t.kind === 'line' ? lineSegment(L(s.from, t.from), L(s.to, t.to)) : { kind: 'cubic' as const, from: L(s.from, t.from), c1: L(s.c1, t.c1), c2: L(s.c2, t.c2), to: L(s.to, t.to) };
          }),
        })),
        6,
      );
    } else {
      let best = 0;
      scale.values.forEach((v, si) => {
        if (Math.abs(v - sigma) < Math.abs(scale.values[best]! - sigma)) best = si;
      });
      d = bySize[best]!.d;
    }
    const { role, name } = group[0]!;
    lines.push({ role, name, d });
  }
  return { ...piece, outlines: [outline], lines };
}

/** Blend every multi-size piece (see the module comment). Single-outline pieces are left as they are. */
export function performBlend(pattern: Pattern, input: BlendOp): OpResult {
  const op = blendOpSchema.parse(input);
  const cautions: Caution[] = [];
  const offLine: OffLineSize[] = [];
  const blended = pattern.pieces.filter((p) => p.outlines.length >= 2);
  const pieces = pattern.pieces.map((p) => (p.outlines.length < 2 ? p : blendPiece(p, op, cautions, offLine)));
  // one caution per distinct message
  const seen = new Set<string>();
  const unique = cautions.filter((c) => {
    const key = `${c.code}\u0000${c.message}`;
    if (seen.has(key)) return false;
    seen.add(key);
    return true;
  });
  return { pattern: { ...pattern, pieces }, cautions: [...offLineCautions(offLine, blended.length), ...unique] };
}

/**
 * The cautions for sizes between or beyond the printed ones, once for the whole blend rather
 * than per piece and level: one naming every in-between size, and one per size outside the
 * printed range (naming the pieces when not all of them).
 */
function offLineCautions(offLine: readonly OffLineSize[], blendedPieces: number): Caution[] {
  const cautions: Caution[] = [];
  const between = [...new Set(offLine.filter((o) => o.outside === undefined).map((o) => o.label))];
  if (between.length > 0)
    cautions.push({
      code: 'fractional-size',
      message: `${between.length === 1 ? `size ${between[0]} is` : `sizes ${between.slice(0, -1).join(', ')} and ${between[between.length - 1]} are`} between the printed sizes: ${between.length === 1 ? 'it is' : 'each is'} interpolated between the neighbouring sizes`,
    });
  const outside = new Map<string, { label: string; range: string; pieces: string[] }>();
  for (const o of offLine) {
    if (o.outside === undefined) continue;
    const key = `${o.label}\u0000${o.outside}`;
    const entry = outside.get(key) ?? { label: o.label, range: o.outside, pieces: [] };
    if (!entry.pieces.includes(o.piece)) entry.pieces.push(o.piece);
    outside.set(key, entry);
  }
  for (const { label, range, pieces } of outside.values()) {
    const which = pieces.length < blendedPieces ? ` of ${pieces.map((p) => `"${p}"`).join(', ')}` : '';
    cautions.push({
      code: 'extrapolated-size',
      ...(pieces.length === 1 ? { piece: pieces[0] } : {}),
      message: `size ${label} is outside the printed sizes ${range}${which}: it is extrapolated from the grade between the nearest sizes, an estimate — sew a test garment first`,
    });
  }
  return cautions;
}
