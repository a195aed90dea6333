/**
 * What the canvas compares between updates to decide what to redraw: pure (no DOM, no paper.js)
 * so it is unit-tested. Patterns are never mutated (a changed piece is a new object), but an
 * unchanged piece may be a new object too: these compare by content.
 */
import type { Piece } from '../../../geometry/index.ts';
import type { CanvasLayout } from './layout.ts';

/** The parts of an overlay (CanvasOverlay in scene.ts) that decide its items; kept structural so this file needs no DOM types. */
type OverlayShape =
  | { kind: 'line'; piece: string; style?: object }
  | { kind: 'point'; piece: string; label?: string; colour?: string }
  | { kind: 'handle'; piece: string; label?: string };

/** Everything about a piece that decides which items exist (not where they are). */
export function pieceStructure(piece: Piece, contours: (d: string) => number): unknown {
  return [
    piece.name,
    piece.outlines.map((o) => [o.size, o.cut !== undefined, o.points.map((lm) => [lm.name, lm.kind])]),
    piece.lines.map((l) => [l.role, l.name, l.size ?? null, contours(l.d)]),
  ];
}

/** Does `next` draw differently from `prev` (paths or landmark positions), given the same structure? */
export function pieceShapeChanged(prev: Piece, next: Piece): boolean {
  if (prev === next) return false;
  if (prev.outlines.length !== next.outlines.length || prev.lines.length !== next.lines.length) return true;
  for (let i = 0; i < next.outlines.length; i++) {
    const a = prev.outlines[i]!;
    const b = next.outlines[i]!;
    if (a.d !== b.d || a.cut !== b.cut || a.points.length !== b.points.length) return true;
    for (let k = 0; k < b.points.length; k++) {
      const p = a.points[k]!;
      const q = b.points[k]!;
      if (p.x !== q.x || p.y !== q.y) return true;
    }
  }
  for (let i = 0; i < next.lines.length; i++) if (prev.lines[i]!.d !== next.lines[i]!.d) return true;
  return false;
}

/** What decides which overlay items exist and how they look (not where they are, nor the label's words). */
export function overlayStructure(overlays: readonly OverlayShape[]): string {
  return JSON.stringify(
    overlays.map((o) =>
      o.kind === 'line' ? [o.kind, o.piece, o.style ?? null] : o.kind === 'point' ? [o.kind, o.piece, o.label !== undefined && o.label !== '', o.colour ?? null] : [o.kind, o.piece, o.label !== undefined && o.label !== ''],
    ),
  );
}

/** The same placements (names in order, offsets, bounds) and overall bounds. */
export function sameLayout(a: CanvasLayout, b: CanvasLayout): boolean {
  const eq = (p: { minX: number; minY: number; maxX: number; maxY: number }, q: typeof p) => p.minX === q.minX && p.minY === q.minY && p.maxX === q.maxX && p.maxY === q.maxY;
  if (a.placements.size !== b.placements.size || !eq(a.bounds, b.bounds)) return false;
  const bs = [...b.placements];
  let i = 0;
  for (const [name, p] of a.placements) {
    const [nameB, q] = bs[i++]!;
    if (name !== nameB || p.dx !== q.dx || p.dy !== q.dy || !eq(p.bounds, q.bounds)) return false;
  }
  return true;
}
