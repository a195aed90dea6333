/**
 * Which tiles carry part of a piece. Exact on the flattened outer line (within FLATNESS,
 * 0.01 mm, of the curves), not by bounding boxes: a tile is in use when the piece's outer line
 * crosses or touches its printable area, or the area lies wholly inside the piece.
 */
import { type Point, pointInPolygon } from '../vec.ts';
import type { Rect } from './grid.ts';

/** Does the segment a–b meet the closed rectangle? (Liang–Barsky clipping.) */
export function segmentMeetsRect(a: Point, b: Point, r: Rect): boolean {
  let t0 = 0;
  let t1 = 1;
  const dx = b.x - a.x;
  const dy = b.y - a.y;
  const checks: [number, number][] = [
    [-dx, a.x - r.x],
    [dx, r.x + r.width - a.x],
    [-dy, a.y - r.y],
    [dy, r.y + r.height - a.y],
  ];
  for (const [p, q] of checks) {
    if (p === 0) {
      if (q < 0) return false;
    } else {
      const t = q / p;
      if (p < 0) {
        if (t > t1) return false;
        if (t > t0) t0 = t;
      } else {
        if (t < t0) return false;
        if (t < t1) t1 = t;
      }
    }
  }
  return t0 <= t1;
}

/** Does the closed polygon (its boundary or its inside) meet the closed rectangle? */
export function polygonMeetsRect(poly: readonly Point[], r: Rect): boolean {
  const n = poly.length;
  if (n === 0) return false;
  for (let i = 0; i < n; i++) if (segmentMeetsRect(poly[i]!, poly[(i + 1) % n]!, r)) return true;
  // no boundary in the rectangle: either the rectangle is inside the polygon or apart from it
  return pointInPolygon({ x: r.x + r.width / 2, y: r.y + r.height / 2 }, poly);
}
