/**
 * Measurements of a pattern: named edges, widths at levels, paired seams and crotch length.
 * All lengths are arc lengths in mm along the outline (the seam line unless seam allowance is
 * included in the outline).
 */
import { type Edge, type EdgeRole, type Outline, type Pattern, type Piece, landmarkOf, outlineContour } from './model.ts';
import { type Contour, contourArea, contourFlatten, contourLength, contourLineIntersections, contourNearest, contourOffsetOf, contourStretch, pathFromSvg, segmentEndTangents } from './path.ts';
import { CROTCH_JOIN_TOLERANCE_DEG, PAIRED_SEAM_TOLERANCE } from './tolerance.ts';
import { type Point, vecDistance, vecDot, vecNormalize, vecSub } from './vec.ts';

/** Thrown when something to measure is missing (an edge's landmark, a level line). */
export class MeasureError extends Error {
  override readonly name = 'MeasureError';
}

/**
 * Each outline's contour, parsed once while the outline object lives: measuring reads one
 * outline for many edges and notches, and outlines are never changed in place.
 */
const parsedOutlines = new WeakMap<Outline, Contour>();
function contourOfOutline(outline: Outline): Contour {
  let contour = parsedOutlines.get(outline);
  if (!contour) {
    contour = outlineContour(outline);
    parsedOutlines.set(outline, contour);
  }
  return contour;
}

/** The stretch of the outline that an edge names, in drawing direction. */
export function edgeContour(outline: Outline, edge: Edge): Contour {
  const contour = contourOfOutline(outline);
  const a = landmarkOf(outline, edge.from);
  const b = landmarkOf(outline, edge.to);
  if (!a || !b) throw new MeasureError(`edge "${edge.name}" needs landmarks "${edge.from}" and "${edge.to}" in size "${outline.size}"`);
  return contourStretch(contour, contourNearest(contour, a), contourNearest(contour, b));
}

export interface EdgeMeasure {
  readonly name: string;
  readonly role: EdgeRole;
  readonly length: number;
}

export interface OutlineMeasure {
  readonly size: string;
  /** Enclosed area (mm²). */
  readonly area: number;
  readonly perimeter: number;
  readonly edges: readonly EdgeMeasure[];
  /** Centre front/back seam of this piece: its centre-front, centre-back and crotch-curve edges (mm). */
  readonly crotchSeam: number;
}

export interface PieceMeasure {
  readonly piece: string;
  readonly outlines: readonly OutlineMeasure[];
}

const CROTCH_ROLES: readonly EdgeRole[] = ['centre-front', 'centre-back', 'crotch-curve'];

export function measureOutline(piece: Piece, outline: Outline): OutlineMeasure {
  const contour = contourOfOutline(outline);
  const edges = piece.edges.map((e) => ({ name: e.name, role: e.role, length: contourLength(edgeContour(outline, e)) }));
  return {
    size: outline.size,
    area: contourArea(contour),
    perimeter: contourLength(contour),
    edges,
    crotchSeam: edges.filter((e) => CROTCH_ROLES.includes(e.role)).reduce((s, e) => s + e.length, 0),
  };
}

export function measurePiece(piece: Piece): PieceMeasure {
  return { piece: piece.name, outlines: piece.outlines.map((o) => measureOutline(piece, o)) };
}

export function measurePattern(pattern: Pattern): PieceMeasure[] {
  return pattern.pieces.map(measurePiece);
}

/** Length of the first edge with this role (or name) in one size; undefined when the piece has none. */
export function edgeLength(piece: Piece, size: string, roleOrName: string): number | undefined {
  const outline = piece.outlines.find((o) => o.size === size);
  if (!outline) throw new MeasureError(`piece "${piece.name}" has no size "${size}"`);
  const edge = piece.edges.find((e) => e.name === roleOrName) ?? piece.edges.find((e) => e.role === roleOrName);
  return edge ? contourLength(edgeContour(outline, edge)) : undefined;
}

/**
 * Width of an outline along a line (mm): the total length of the line lying inside the
 * outline (even–odd), so a piece the line crosses twice gives the distance between the two
 * crossings. A line that misses the outline gives 0.
 */
export function widthAlongLine(outline: Outline, origin: Point, direction: Point): number {
  const contour = contourOfOutline(outline);
  const dir = vecNormalize(direction);
  const hits = contourLineIntersections(contour, origin, dir)
    .map((h) => vecDot(vecSub(h.point, origin), dir))
    .sort((a, b) => a - b);
  let w = 0;
  for (let i = 0; i + 1 < hits.length; i += 2) w += hits[i + 1]! - hits[i]!;
  return w;
}

/**
 * Width of a piece's outline at a named level line (role "level"; a line for that size if
 * there is one, else the piece-level line). Throws MeasureError when the level is missing.
 */
export function widthAtLevel(piece: Piece, size: string, level: string): number {
  const outline = piece.outlines.find((o) => o.size === size);
  if (!outline) throw new MeasureError(`piece "${piece.name}" has no size "${size}"`);
  const line =
    piece.lines.find((l) => l.role === 'level' && l.name === level && l.size === size) ??
    piece.lines.find((l) => l.role === 'level' && l.name === level && l.size === undefined);
  if (!line) throw new MeasureError(`piece "${piece.name}" has no level line "${level}" for size "${size}"`);
  const segs = pathFromSvg(line.d).flatMap((c) => c.segments);
  const a = segs[0]!.from;
  const b = segs[segs.length - 1]!.to;
  return widthAlongLine(outline, a, vecSub(b, a));
}

/** A notch on a seam: its landmark and its distance along the seam from the hem (mm). */
export interface SeamNotch {
  readonly piece: string;
  readonly name: string;
  readonly fromHem: number;
}

/** One side of a paired seam: the pieces sewn into it, end to end, and their summed length. */
export interface SeamSide {
  /** The pieces' names joined with " + " ("back + yoke"). */
  readonly piece: string;
  /** The named piece first, then the pieces that continue its seam. */
  readonly pieces: readonly string[];
  readonly length: number;
  /** The notches on the seam, nearest the hem first; undefined when the named piece has no hem edge to measure from. */
  readonly notches?: readonly SeamNotch[];
}

/** The k-th notch from the hem on each side, where both sides have one. */
export interface NotchPair {
  readonly first: SeamNotch;
  readonly second: SeamNotch;
  /** first.fromHem − second.fromHem (mm). */
  readonly difference: number;
  readonly withinTolerance: boolean;
}

export interface PairedSeam {
  readonly size: string;
  readonly role: EdgeRole;
  readonly first: SeamSide;
  readonly second: SeamSide;
  /** first − second (mm). */
  readonly difference: number;
  readonly withinTolerance: boolean;
  /** The notches matched in order from the hem; a side with more notches than the other leaves the rest unmatched. Empty when a side cannot be measured from the hem. */
  readonly notches: readonly NotchPair[];
  /** Both sides have as many notches and every pair is within the tolerance (true when a side cannot be measured from the hem: nothing to compare). */
  readonly notchesMatch: boolean;
}

/** A landmark counts as on a seam within this distance of it (mm): landmarks are stored to 0.001 mm. */
const ON_SEAM = 0.05;

/**
 * One piece's part of a seam in a size: the length of its edge with this role and the notches on
 * it, by their distance along it from its end shared with an edge of role `fromRole` (undefined
 * when it shares none: nothing to measure from). Undefined when the piece has no such edge.
 */
function seamPart(piece: Piece, size: string, role: EdgeRole, fromRole: EdgeRole): { length: number; notches?: { name: string; at: number }[] } | undefined {
  const edge = piece.edges.find((e) => e.role === role);
  const outline = piece.outlines.find((o) => o.size === size);
  if (!edge || !outline) return undefined;
  const stretch = edgeContour(outline, edge);
  const length = contourLength(stretch);
  const other = piece.edges.find((e) => e.role === fromRole);
  const start = !other ? undefined : [other.from, other.to].includes(edge.from) ? 'from' : [other.from, other.to].includes(edge.to) ? 'to' : undefined;
  if (!start) return { length };
  const notches: { name: string; at: number }[] = [];
  for (const lm of outline.points) {
    if (lm.kind !== 'notch') continue;
    const near = contourNearest(stretch, lm);
    if (near.distance > ON_SEAM) continue;
    const along = contourOffsetOf(stretch, near);
    notches.push({ name: lm.name, at: start === 'from' ? along : length - along });
  }
  return { length, notches: notches.sort((a, b) => a.at - b.at) };
}

/** The sizes two pieces (by name; front and back unless named) both have, in the first one's order. */
export function pairedSizes(pattern: Pattern, first = 'front', second = 'back'): string[] {
  const a = pattern.pieces.find((p) => p.name === first);
  const b = pattern.pieces.find((p) => p.name === second);
  if (!a || !b) return [];
  return a.outlines.map((o) => o.size).filter((size) => b.outlines.some((o) => o.size === size));
}

/** Which side of the body a piece lies on, by its centre seam. */
const bodySide = (piece: Piece): 'front' | 'back' | undefined =>
  piece.edges.some((e) => e.role === 'centre-back') ? 'back' : piece.edges.some((e) => e.role === 'centre-front') ? 'front' : undefined;

/**
 * Compare the seams that are sewn together: for each size the two pieces share, the edges
 * with each role (default inseam and side seam). `tolerance` defaults to
 * PAIRED_SEAM_TOLERANCE (trade reference §3.11, common practice).
 *
 * A seam is measured whole (§3.11: "front and back outseams, waist to hem"): a side takes, with
 * its named piece, every other piece on the same side of the body (by its centre-front or
 * centre-back edge) that has an edge of that role in that size — a back yoke's side seam is
 * added to the back's, as the two are sewn end to end before the side seam is closed.
 *
 * Notches are walked too (§3.11: notches match within about 2–3 mm): on each side, the notch
 * landmarks lying on the seam, by their distance along it from the hem (the end the named
 * piece's seam shares with its hem edge; a continuing piece's from its end away from its waist
 * edge, after the named piece's seam). The k-th from the hem on one side is paired with the k-th
 * on the other; `tolerance` applies to each pair. `sizes`: only these (all the two pieces share
 * when not given).
 */
export function pairedSeamReport(
  pattern: Pattern,
  options: { first?: string; second?: string; roles?: readonly EdgeRole[]; tolerance?: number; sizes?: readonly string[] } = {},
): PairedSeam[] {
  const first = pattern.pieces.find((p) => p.name === (options.first ?? 'front'));
  const second = pattern.pieces.find((p) => p.name === (options.second ?? 'back'));
  if (!first || !second) throw new MeasureError(`paired-seam report needs pieces "${options.first ?? 'front'}" and "${options.second ?? 'back'}"`);
  const roles = options.roles ?? (['inseam', 'side-seam'] as const);
  const tol = options.tolerance ?? PAIRED_SEAM_TOLERANCE;
  const others = pattern.pieces.filter((p) => p !== first && p !== second);
  // pieces continue a side only when the two named pieces lie on different sides of the body
  const continued = bodySide(first) !== bodySide(second);
  const sideOf = (named: Piece, size: string, role: EdgeRole): SeamSide | undefined => {
    const own = seamPart(named, size, role, 'hem');
    if (own === undefined) return undefined;
    const side = bodySide(named);
    const pieces = [named.name];
    let length = own.length;
    // notches from the hem up: the named piece's, then a continuing piece's from its end away from the waist
    const notches: SeamNotch[] | undefined = own.notches?.map((n) => ({ piece: named.name, name: n.name, fromHem: n.at }));
    if (side !== undefined && continued) {
      for (const p of others) {
        if (bodySide(p) !== side || !p.outlines.some((o) => o.size === size)) continue;
        const more = seamPart(p, size, role, 'waist');
        if (more === undefined) continue;
        if (notches && more.notches) for (const n of more.notches) notches.push({ piece: p.name, name: n.name, fromHem: length + more.length - n.at });
        pieces.push(p.name);
        length += more.length;
      }
    }
    return { piece: pieces.join(' + '), pieces, length, ...(notches ? { notches: notches.sort((a, b) => a.fromHem - b.fromHem) } : {}) };
  };
  const out: PairedSeam[] = [];
  for (const size of pairedSizes(pattern, first.name, second.name)) {
    if (options.sizes && !options.sizes.includes(size)) continue;
    for (const role of roles) {
      const a = sideOf(first, size, role);
      const b = sideOf(second, size, role);
      if (a === undefined || b === undefined) continue;
      const difference = a.length - b.length;
      const an = a.notches ?? [];
      const bn = b.notches ?? [];
      const measurable = a.notches !== undefined && b.notches !== undefined;
      const notches: NotchPair[] = [];
      for (let k = 0; measurable && k < Math.min(an.length, bn.length); k++) {
        const d = an[k]!.fromHem - bn[k]!.fromHem;
        notches.push({ first: an[k]!, second: bn[k]!, difference: d, withinTolerance: Math.abs(d) <= tol });
      }
      const notchesMatch = !measurable || (an.length === bn.length && notches.every((n) => n.withinTolerance));
      out.push({ size, role, first: a, second: b, difference, withinTolerance: Math.abs(difference) <= tol, notches, notchesMatch });
    }
  }
  return out;
}

/** Where front and back crotch curves meet the inseam, per size the two pieces share. */
export interface CrotchJoin {
  readonly size: string;
  /** The angle between the crotch curve and the inseam at the crotch point (degrees), front and back. */
  readonly first: { readonly piece: string; readonly angle: number };
  readonly second: { readonly piece: string; readonly angle: number };
  /** How far the joined crotch curve turns where front and back meet: |180° − (first + second)|. */
  readonly turn: number;
  readonly smooth: boolean;
}

/** The unit direction from an edge's end at `corner` into the edge. */
function awayFrom(outline: Outline, edge: Edge, corner: string): Point {
  const stretch = edgeContour(outline, edge);
  const segments = stretch.segments;
  if (edge.from === corner) return segmentEndTangents(segments[0]!).start;
  const end = segmentEndTangents(segments[segments.length - 1]!).end;
  return { x: -end.x, y: -end.y };
}

/**
 * The crotch curves where they meet the inseam (trade reference §3.11 shape checks: put the
 * front and back crotch curves together at the crotch point, inseams aligned, and check that the
 * combined curve is smooth). On each piece, the angle at the crotch point — the landmark its
 * crotch-curve and inseam edges share — between the two; laid together along the inseam, the
 * two curves continue each other without a turn when the angles add up to 180°.
 * `tolerance` (degrees) defaults to CROTCH_JOIN_TOLERANCE_DEG; `sizes` as in pairedSeamReport.
 * Empty when a piece lacks the edges.
 */
export function crotchJoin(pattern: Pattern, options: { first?: string; second?: string; tolerance?: number; sizes?: readonly string[] } = {}): CrotchJoin[] {
  const first = pattern.pieces.find((p) => p.name === (options.first ?? 'front'));
  const second = pattern.pieces.find((p) => p.name === (options.second ?? 'back'));
  if (!first || !second) return [];
  const tol = options.tolerance ?? CROTCH_JOIN_TOLERANCE_DEG;
  const angleAt = (piece: Piece, size: string): number | undefined => {
    const curve = piece.edges.find((e) => e.role === 'crotch-curve');
    const inseam = piece.edges.find((e) => e.role === 'inseam');
    const outline = piece.outlines.find((o) => o.size === size);
    if (!curve || !inseam || !outline) return undefined;
    const corner = [curve.from, curve.to].find((n) => n === inseam.from || n === inseam.to);
    if (corner === undefined) return undefined;
    const a = awayFrom(outline, curve, corner);
    const b = awayFrom(outline, inseam, corner);
    return (Math.acos(Math.max(-1, Math.min(1, vecDot(a, b)))) * 180) / Math.PI;
  };
  const out: CrotchJoin[] = [];
  for (const size of pairedSizes(pattern, first.name, second.name)) {
    if (options.sizes && !options.sizes.includes(size)) continue;
    const a = angleAt(first, size);
    const b = angleAt(second, size);
    if (a === undefined || b === undefined) continue;
    const turn = Math.abs(180 - a - b);
    out.push({ size, first: { piece: first.name, angle: a }, second: { piece: second.name, angle: b }, turn, smooth: turn <= tol });
  }
  return out;
}

/**
 * Total crotch length per size: the centre-front, centre-back and crotch-curve edges of every
 * piece (front + back, and a yoke's centre back). `sizes`: only these.
 */
export function crotchLength(pattern: Pattern, options: { sizes?: readonly string[] } = {}): { size: string; front: number; back: number; total: number }[] {
  const sizes = new Map<string, { front: number; back: number }>();
  for (const piece of pattern.pieces) {
    // only the crotch seam's edges are measured
    const seam = piece.edges.filter((e) => CROTCH_ROLES.includes(e.role));
    const isBack = piece.edges.some((x) => x.role === 'centre-back');
    for (const o of piece.outlines) {
      if (options.sizes && !options.sizes.includes(o.size)) continue;
      const entry = sizes.get(o.size) ?? { front: 0, back: 0 };
      for (const e of seam) {
        const length = contourLength(edgeContour(o, e));
        if (e.role === 'centre-back' || (e.role === 'crotch-curve' && isBack)) entry.back += length;
        else entry.front += length;
      }
      sizes.set(o.size, entry);
    }
  }
  return [...sizes.entries()].filter(([, v]) => v.front + v.back > 0).map(([size, v]) => ({ size, front: v.front, back: v.back, total: v.front + v.back }));
}

/** Extent of an outline along a direction (mm): the piece's length along the grain for the grain direction. */
export function extentAlong(outline: Outline, direction: Point): number {
  const d = vecNormalize(direction);
  let min = Infinity;
  let max = -Infinity;
  for (const f of contourFlatten(contourOfOutline(outline), 1e-4)) {
    const v = vecDot(f.point, d);
    min = Math.min(min, v);
    max = Math.max(max, v);
  }
  return max - min;
}

/** Distance between two landmarks of an outline in a straight line (mm). */
export function landmarkDistance(outline: Outline, a: string, b: string): number {
  const p = landmarkOf(outline, a);
  const q = landmarkOf(outline, b);
  if (!p || !q) throw new MeasureError(`size "${outline.size}" lacks landmark "${p ? b : a}"`);
  return vecDistance(p, q);
}

