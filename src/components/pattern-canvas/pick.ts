/**
 * What a click on the canvas hit: the point in the piece's own coordinates (mm) and the
 * nearest outline, internal line or landmark within a tolerance. Pure; uses geometry's
 * `contourNearest`, so the canvas and the alteration code agree on where a point lies.
 */
import { contourNearest, pathFromSvg, type Pattern, type Point } from '../../../geometry/index.ts';
import type { CanvasLayout } from './layout.ts';
import { worldToPiece } from './view-math.ts';

export interface PickNearest {
  kind: 'outline' | 'line' | 'landmark';
  pieceName: string;
  /** The outline's (or the landmark's) size; for a line, its size when it belongs to one. */
  size?: string;
  lineName?: string;
  landmarkName?: string;
  /** The nearest point, in the piece's coordinates (mm). */
  point: Point;
  distanceMm: number;
}

export interface CanvasPick {
  /** In the coordinates of `piece` when there is one, else canvas (world) millimetres. */
  point: Point;
  /** The piece under the pointer (within its bounds), else the piece of `nearest`. */
  piece?: string;
  nearest?: PickNearest;
}

/**
 * Pick at `world` (canvas mm). Landmarks within `toleranceMm` win over lines and outlines (they
 * sit on the outline); otherwise the nearest outline or internal line within `toleranceMm`.
 * Ties keep drawing order (pieces, then outlines before lines).
 */
export function pickAt(pattern: Pattern, layout: CanvasLayout, world: Point, toleranceMm: number): CanvasPick {
  let nearest: PickNearest | undefined;
  let landmark: PickNearest | undefined;
  let inside: string | undefined;
  for (const piece of pattern.pieces) {
    const placement = layout.placements.get(piece.name);
    if (!placement) continue;
    const p = worldToPiece(placement, world);
    const b = placement.bounds;
    if (inside === undefined && p.x >= b.minX - toleranceMm && p.x <= b.maxX + toleranceMm && p.y >= b.minY - toleranceMm && p.y <= b.maxY + toleranceMm) inside = piece.name;
    for (const outline of piece.outlines) {
      for (const lm of outline.points) {
        const d = Math.hypot(lm.x - p.x, lm.y - p.y);
        if (d <= toleranceMm && (!landmark || d < landmark.distanceMm))
          landmark = { kind: 'landmark', pieceName: piece.name, size: outline.size, landmarkName: lm.name, point: { x: lm.x, y: lm.y }, distanceMm: d };
      }
      for (const contour of pathFromSvg(outline.d)) {
        if (contour.segments.length === 0) continue;
        const near = contourNearest(contour, p);
        if (near.distance <= toleranceMm && (!nearest || near.distance < nearest.distanceMm))
          nearest = { kind: 'outline', pieceName: piece.name, size: outline.size, point: near.point, distanceMm: near.distance };
      }
    }
    for (const line of piece.lines) {
      for (const contour of pathFromSvg(line.d)) {
        if (contour.segments.length === 0) continue;
        const near = contourNearest(contour, p);
        if (near.distance <= toleranceMm && (!nearest || near.distance < nearest.distanceMm))
          nearest = { kind: 'line', pieceName: piece.name, lineName: line.name, ...(line.size !== undefined ? { size: line.size } : {}), point: near.point, distanceMm: near.distance };
      }
    }
  }
  const hit = landmark ?? nearest;
  const pieceName = inside ?? hit?.pieceName;
  const placement = pieceName === undefined ? undefined : layout.placements.get(pieceName);
  return {
    point: placement ? worldToPiece(placement, world) : world,
    ...(pieceName !== undefined ? { piece: pieceName } : {}),
    ...(hit ? { nearest: hit } : {}),
  };
}
