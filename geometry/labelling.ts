/**
 * Labelling a multi-size piece from clicks on one outline: the helpers behind the pattern
 * review screen. A click lands on one size line; the label it makes (a landmark, an edge, a
 * cross line) must exist in every size, so each click is carried over to the other sizes.
 *
 * Correspondence rule (`correspondingPoints`):
 * 1. When the click is within `LABEL_SNAP_MM` of a segment end point (vertex) of any size, the
 *    nearest such vertex is the clicked point and its outline the clicked size; otherwise the
 *    outline nearest the click is the clicked size and the nearest point on it is clicked.
 * 2. When the click snapped to segment end point i and every size has the same number of
 *    segments (graded size lines drawn alike), every size takes its own end point i.
 * 3. Otherwise each other size takes its nearest corner (a segment end where the outline turns
 *    by more than `CORNER_TURN`) within `CORNER_SEARCH_MM` of the clicked point, when the
 *    clicked point is itself such a corner;
 * 4. else the nearest point on that size's outline.
 *
 * Every function is pure (new plain data, inputs untouched) and its result passes
 * `parsePattern`; bad input (an empty name, a click far from the piece, two ends on the same
 * point, a line that misses the piece) throws `LabellingError` with the reason.
 */
import { type EdgeRole, type LandmarkKind, type Outline, type Pattern, type Piece, LANDMARK_SNAP, outlineContour } from './model.ts';
import { pieceGrain } from './ops/common.ts';
import { type Contour, contourFromPoints, contourLength, contourLineIntersections, contourNearest, contourOffsetOf, pathToSvg, segmentEndTangents } from './path.ts';
import { type Point, vecAngleBetween, vecDistance, vecDot, vecNormalize, vecPerp, vecSub } from './vec.ts';

/** A click this close (mm) to a segment end point is taken as that point. */
export const LABEL_SNAP_MM = 4;
/** How far (mm) from the clicked corner another size's corner may lie and still correspond. */
export const CORNER_SEARCH_MM = 25;
/** A segment end where the outline turns more than this (radians, 20°) is a corner. */
export const CORNER_TURN = (20 * Math.PI) / 180;
/** How far (mm) a click may lie from every outline of the piece. */
export const CLICK_REACH_MM = 40;
/** Cross lines run this far (mm) past the outermost outline on each side. */
export const CROSS_LINE_SPARE_MM = 10;

/** Thrown when a label cannot be made from the given input; `message` says why. */
export class LabellingError extends Error {
  override readonly name = 'LabellingError';
}

export interface CorrespondingPoint {
  readonly size: string;
  readonly point: Point;
  /** True when the point is a segment end point of its outline (a vertex). */
  readonly vertex: boolean;
  /** True when it is a vertex where the outline turns by more than CORNER_TURN. */
  readonly corner: boolean;
  /** True for the size the click landed on. */
  readonly clicked: boolean;
}

interface Vertex {
  readonly index: number;
  readonly point: Point;
  /** Turn of the outline at this vertex (radians, ≥ 0). */
  readonly turn: number;
}

function verticesOf(contour: Contour): Vertex[] {
  const segs = contour.segments;
  return segs.map((s, i) => {
    const before = segs[(i - 1 + segs.length) % segs.length]!;
    const turn = Math.abs(vecAngleBetween(segmentEndTangents(before).end, segmentEndTangents(s).start));
    return { index: i, point: s.from, turn };
  });
}

function cleanName(name: string, what: string): string {
  const t = name.trim();
  if (t === '') throw new LabellingError(`Give the ${what} a name.`);
  if (t.length > 120) throw new LabellingError(`Keep the ${what}'s name to 120 characters.`);
  return t;
}

const round = (v: number) => Math.round(v * 1000) / 1000;
const roundPoint = (p: Point): Point => ({ x: round(p.x), y: round(p.y) });

/**
 * For the clicked outline, the point clicked on it (`clicked: true`); for every other size, the
 * corresponding point (see the rule in the file header). In the piece's outline order.
 * Throws LabellingError when the click is more than CLICK_REACH_MM from every outline.
 */
export function correspondingPoints(piece: Piece, clicked: Point): CorrespondingPoint[] {
  const contours = piece.outlines.map((o) => outlineContour(o));
  // a segment end point of any size within LABEL_SNAP_MM: that size and that vertex were clicked
  let base = -1;
  let snapped: Vertex | undefined;
  let snapDistance = Infinity;
  for (const [i, c] of contours.entries())
    for (const v of verticesOf(c)) {
      const d = vecDistance(v.point, clicked);
      if (d <= LABEL_SNAP_MM && d < snapDistance) {
        snapDistance = d;
        snapped = v;
        base = i;
      }
    }
  if (!snapped) {
    // else the nearest outline
    let baseDistance = Infinity;
    for (const [i, c] of contours.entries()) {
      const d = contourNearest(c, clicked).distance;
      if (d < baseDistance) {
        baseDistance = d;
        base = i;
      }
    }
    if (base < 0 || baseDistance > CLICK_REACH_MM)
      throw new LabellingError(`Click on an outline of "${piece.name}" (the nearest is ${Math.round(baseDistance)} mm away).`);
  }
  const baseContour = contours[base]!;
  const basePoint = snapped ? snapped.point : contourNearest(baseContour, clicked).point;
  const sameCount = contours.every((c) => c.segments.length === baseContour.segments.length);
  return piece.outlines.map((outline, i) => {
    if (i === base) return { size: outline.size, point: roundPoint(basePoint), vertex: snapped !== undefined, corner: snapped !== undefined && snapped.turn > CORNER_TURN, clicked: true };
    const contour = contours[i]!;
    if (snapped && sameCount) {
      const v = verticesOf(contour)[snapped.index]!;
      return { size: outline.size, point: roundPoint(v.point), vertex: true, corner: v.turn > CORNER_TURN, clicked: false };
    }
    if (snapped && snapped.turn > CORNER_TURN) {
      let best: Vertex | undefined;
      for (const v of verticesOf(contour)) {
        if (v.turn <= CORNER_TURN) continue;
        const d = vecDistance(v.point, basePoint);
        if (d <= CORNER_SEARCH_MM && (!best || d < vecDistance(best.point, basePoint))) best = v;
      }
      if (best) return { size: outline.size, point: roundPoint(best.point), vertex: true, corner: true, clicked: false };
    }
    return { size: outline.size, point: roundPoint(contourNearest(contour, basePoint).point), vertex: false, corner: false, clicked: false };
  });
}

function setLandmark(outline: Outline, name: string, kind: LandmarkKind, at: Point): Outline {
  return { ...outline, points: [...outline.points.filter((p) => p.name !== name), { name, kind, x: at.x, y: at.y }] };
}

/** The piece with landmark `name` on every size at the click's corresponding points (replacing one of that name). */
export function withLandmark(piece: Piece, name: string, kind: LandmarkKind, clicked: Point): Piece {
  const label = cleanName(name, 'point');
  const points = correspondingPoints(piece, clicked);
  return { ...piece, outlines: piece.outlines.map((o, i) => setLandmark(o, label, kind, points[i]!.point)) };
}

/** A landmark present in every size whose point in the clicked size lies within LABEL_SNAP_MM of `at`. */
function existingLandmarkNear(piece: Piece, clicked: Point): string | undefined {
  const points = correspondingPoints(piece, clicked);
  let best: { name: string; d: number } | undefined;
  piece.outlines.forEach((outline, i) => {
    const at = points[i]!.point;
    for (const lm of outline.points) {
      const d = vecDistance(lm, at);
      if (d <= LABEL_SNAP_MM && piece.outlines.every((o) => o.points.some((p) => p.name === lm.name)) && (!best || d < best.d)) best = { name: lm.name, d };
    }
  });
  return best?.name;
}

/**
 * The piece with edge `name` (role `role`) between the two clicks. Each end reuses a landmark
 * already there (within LABEL_SNAP_MM in every size) or gets a new one, `<name> start` and
 * `<name> end` (a corner where the outline turns sharply there, else a mark). The ends are ordered so
 * that the edge — which runs from → to in the outline's drawing direction — is the shorter way
 * round the outline, measured on the size `fromClick` landed on. Replaces an edge of that name.
 */
export function withEdge(piece: Piece, edge: { name: string; role: EdgeRole }, fromClick: Point, toClick: Point): Piece {
  const name = cleanName(edge.name, 'edge');
  let next = piece;
  const ends: string[] = [];
  for (const [click, suffix] of [
    [fromClick, 'start'],
    [toClick, 'end'],
  ] as const) {
    const existing = existingLandmarkNear(next, click);
    if (existing !== undefined) ends.push(existing);
    else {
      const at = correspondingPoints(next, click);
      const landmark = `${name} ${suffix}`;
      next = { ...next, outlines: next.outlines.map((o, i) => setLandmark(o, landmark, at[i]!.corner ? 'corner' : 'mark', at[i]!.point)) };
      ends.push(landmark);
    }
  }
  const [a, b] = ends as [string, string];
  const i = Math.max(0, correspondingPoints(next, fromClick).findIndex((c) => c.clicked));
  const outline = next.outlines[i]!;
  const pa = outline.points.find((p) => p.name === a)!;
  const pb = outline.points.find((p) => p.name === b)!;
  if (a === b || vecDistance(pa, pb) < LANDMARK_SNAP) throw new LabellingError('The start and end of the edge are the same point: click its two ends.');
  const contour = outlineContour(outline);
  const total = contourLength(contour);
  const oa = contourOffsetOf(contour, contourNearest(contour, pa));
  const ob = contourOffsetOf(contour, contourNearest(contour, pb));
  const forward = (((ob - oa) % total) + total) % total;
  const [from, to] = forward <= total / 2 ? [a, b] : [b, a];
  return { ...next, edges: [...next.edges.filter((e) => e.name !== name), { name, role: edge.role, from, to }] };
}

/** Straight-line path data through two points. */
function lineData(a: Point, b: Point): string {
  return pathToSvg([contourFromPoints([roundPoint(a), roundPoint(b)], false)], 3);
}

/**
 * The piece with a straight line (role `lengthen` or `level`) through `a`: square to the
 * grainline when `squareToGrain` (the grain of `pieceGrain`: the piece's grain line, else
 * down the page), else through `a` and `b`. It runs across every size's outline (so the
 * largest) with CROSS_LINE_SPARE_MM to spare each side and applies to all sizes (no `size`).
 * Replaces lines of the same role and name, including per-size ones.
 */
export function withCrossLine(piece: Piece, line: { role: 'lengthen' | 'level'; name: string }, a: Point, b: Point, options: { squareToGrain: boolean }): Piece {
  const name = cleanName(line.name, 'line');
  const dir = options.squareToGrain ? vecPerp(pieceGrain(piece)) : vecNormalize(vecSub(b, a));
  if (dir.x === 0 && dir.y === 0) throw new LabellingError('Click two different points to place the line.');
  let min = Infinity;
  let max = -Infinity;
  for (const outline of piece.outlines)
    for (const hit of contourLineIntersections(outlineContour(outline), a, dir)) {
      const t = vecDot(vecSub(hit.point, a), dir);
      min = Math.min(min, t);
      max = Math.max(max, t);
    }
  if (!(max > min)) throw new LabellingError(`The line does not cross "${piece.name}": click inside the piece.`);
  const p1 = { x: a.x + dir.x * (min - CROSS_LINE_SPARE_MM), y: a.y + dir.y * (min - CROSS_LINE_SPARE_MM) };
  const p2 = { x: a.x + dir.x * (max + CROSS_LINE_SPARE_MM), y: a.y + dir.y * (max + CROSS_LINE_SPARE_MM) };
  return {
    ...piece,
    lines: [...piece.lines.filter((l) => !(l.role === line.role && l.name === name)), { role: line.role, name, d: lineData(p1, p2) }],
  };
}

/** Shortest grainline accepted (mm): a shorter one gives a poor direction. */
export const MIN_GRAINLINE_MM = 20;

/** The piece with its grainline from `a` to `b` (replacing any grain line). */
export function withGrainline(piece: Piece, a: Point, b: Point): Piece {
  if (vecDistance(a, b) < MIN_GRAINLINE_MM) throw new LabellingError(`Draw the grainline at least ${MIN_GRAINLINE_MM} mm long: click its two ends further apart.`);
  return { ...piece, lines: [...piece.lines.filter((l) => l.role !== 'grain'), { role: 'grain', name: 'grain', d: lineData(a, b) }] };
}

/** The pattern with piece `from` named `to`. Refuses an empty name or one another piece has. */
export function renamePiece(pattern: Pattern, from: string, to: string): Pattern {
  const name = cleanName(to, 'piece');
  if (!pattern.pieces.some((p) => p.name === from)) throw new LabellingError(`There is no piece "${from}".`);
  if (name === from) return pattern;
  if (pattern.pieces.some((p) => p.name === name)) throw new LabellingError(`Another piece is already called "${name}".`);
  return { ...pattern, pieces: pattern.pieces.map((p) => (p.name === from ? { ...p, name } : p)) };
}

/**
 * The pattern with size `from` called `to`, in every piece that has it (or only in
 * `options.piece`), outlines and per-size lines alike. Refuses an empty label or one such a
 * piece already has.
 */
export function renameSize(pattern: Pattern, from: string, to: string, options: { piece?: string } = {}): Pattern {
  const size = cleanName(to, 'size');
  const touched = pattern.pieces.filter((p) => (options.piece === undefined || p.name === options.piece) && p.outlines.some((o) => o.size === from));
  if (touched.length === 0) throw new LabellingError(`There is no size "${from}"${options.piece !== undefined ? ` in "${options.piece}"` : ''}.`);
  if (size === from) return pattern;
  for (const p of touched) if (p.outlines.some((o) => o.size === size)) throw new LabellingError(`"${p.name}" already has a size "${size}".`);
  return {
    ...pattern,
    pieces: pattern.pieces.map((p) =>
      touched.includes(p)
        ? {
            ...p,
            outlines: p.outlines.map((o) => (o.size === from ? { ...o, size } : o)),
            lines: p.lines.map((l) => (l.size === from ? { ...l, size } : l)),
          }
        : p,
    ),
  };
}

/** What a piece has labelled, for the review's checklist. */
export interface PieceLabels {
  readonly grainline: boolean;
  readonly levels: readonly string[];
  readonly lengthenLines: readonly string[];
  readonly edges: readonly { name: string; role: EdgeRole }[];
  readonly notches: readonly string[];
}

export function pieceLabels(piece: Piece): PieceLabels {
  const unique = (names: string[]) => [...new Set(names)];
  return {
    grainline: piece.lines.some((l) => l.role === 'grain'),
    levels: unique(piece.lines.filter((l) => l.role === 'level').map((l) => l.name)),
    lengthenLines: unique(piece.lines.filter((l) => l.role === 'lengthen').map((l) => l.name)),
    edges: piece.edges.map((e) => ({ name: e.name, role: e.role })),
    notches: unique(piece.outlines.flatMap((o) => o.points.filter((p) => p.kind === 'notch').map((p) => p.name))),
  };
}
