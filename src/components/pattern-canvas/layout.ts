/**
 * Where each piece sits on the canvas: side by side on shelves, tops aligned, a gap between.
 * Pure (no DOM, no paper.js), so screens and tests can map coordinates the same way the
 * canvas does: world = piece point + { dx, dy }.
 */
import { contourBounds, pathFromSvg, type Pattern, type Piece } from '../../../geometry/index.ts';

/** Space between neighbouring pieces (mm). */
export const PIECE_GAP_MM = 40;

export interface Bounds {
  minX: number;
  minY: number;
  maxX: number;
  maxY: number;
}

export interface PieceOffset {
  dx: number;
  dy: number;
}

export interface PiecePlacement extends PieceOffset {
  /** The piece's bounds in its own coordinates (outlines, cut lines and internal lines). */
  bounds: Bounds;
}

export interface CanvasLayout {
  /** Piece name → placement, in drawing order. */
  placements: ReadonlyMap<string, PiecePlacement>;
  /** Bounds of every placed piece in canvas (world) millimetres; all zero for nothing drawable. */
  bounds: Bounds;
}

const EMPTY: Bounds = { minX: Infinity, minY: Infinity, maxX: -Infinity, maxY: -Infinity };

function grow(b: Bounds, c: Bounds): Bounds {
  return { minX: Math.min(b.minX, c.minX), minY: Math.min(b.minY, c.minY), maxX: Math.max(b.maxX, c.maxX), maxY: Math.max(b.maxY, c.maxY) };
}

function pathBounds(d: string, into: Bounds): Bounds {
  let b = into;
  for (const contour of pathFromSvg(d)) if (contour.segments.length > 0) b = grow(b, contourBounds(contour));
  return b;
}

/** Bounds of a piece in its own coordinates: every outline, cut line and internal line. Infinite for an empty piece. */
export function pieceBounds(piece: Piece): Bounds {
  let b = EMPTY;
  for (const outline of piece.outlines) {
    b = pathBounds(outline.d, b);
    if (outline.cut) b = pathBounds(outline.cut, b);
  }
  for (const line of piece.lines) b = pathBounds(line.d, b);
  return b;
}

/**
 * Place the pieces left to right in pattern order on shelves, `gap` mm apart: a shelf is at most
 * as wide as the widest piece or 1.6 × the square root of the pieces' total box area, whichever
 * is more (so a long waistband does not squeeze the legs into a strip); the next shelf starts
 * below the tallest piece of the last. Sizes come from `reference` when given (so pieces stay
 * put while the altered outline changes); pieces only in `pattern` follow, sized from `pattern`.
 * Deterministic; the inputs are not changed.
 */
export function layoutPieces(pattern: Pattern, reference?: Pattern, gap: number = PIECE_GAP_MM): CanvasLayout {
  const order: Piece[] = [];
  const seen = new Set<string>();
  const add = (piece: Piece) => {
    if (seen.has(piece.name)) return;
    seen.add(piece.name);
    order.push(piece);
  };
  if (reference) for (const piece of reference.pieces) if (pattern.pieces.some((p) => p.name === piece.name)) add(piece);
  for (const piece of pattern.pieces) add(piece);

  const boxes = order.map((piece) => ({ piece, bounds: pieceBounds(piece) }));
  const sized = boxes.filter((b) => Number.isFinite(b.bounds.minX));
  const widest = Math.max(0, ...sized.map((b) => b.bounds.maxX - b.bounds.minX));
  const area = sized.reduce((a, b) => a + (b.bounds.maxX - b.bounds.minX + gap) * (b.bounds.maxY - b.bounds.minY + gap), 0);
  const shelfWidth = Math.max(widest, 1.6 * Math.sqrt(area));

  const placements = new Map<string, PiecePlacement>();
  let all = EMPTY;
  let x = 0;
  let y = 0;
  let shelfHeight = 0;
  for (const { piece, bounds } of boxes) {
    if (!Number.isFinite(bounds.minX)) {
      placements.set(piece.name, { dx: x, dy: y, bounds: { minX: 0, minY: 0, maxX: 0, maxY: 0 } });
      continue;
    }
    const width = bounds.maxX - bounds.minX;
    const height = bounds.maxY - bounds.minY;
    if (x > 0 && x + width > shelfWidth) {
      y += shelfHeight + gap;
      x = 0;
      shelfHeight = 0;
    }
    const dx = x - bounds.minX;
    const dy = y - bounds.minY;
    placements.set(piece.name, { dx, dy, bounds });
    all = grow(all, { minX: bounds.minX + dx, minY: bounds.minY + dy, maxX: bounds.maxX + dx, maxY: bounds.maxY + dy });
    x += width + gap;
    shelfHeight = Math.max(shelfHeight, height);
  }
  return { placements, bounds: Number.isFinite(all.minX) ? all : { minX: 0, minY: 0, maxX: 0, maxY: 0 } };
}

/** Piece name → { dx, dy }: add to a point in a piece's coordinates to get canvas millimetres. */
export function pieceOffsets(pattern: Pattern, reference?: Pattern, gap: number = PIECE_GAP_MM): Map<string, PieceOffset> {
  const out = new Map<string, PieceOffset>();
  for (const [name, { dx, dy }] of layoutPieces(pattern, reference, gap).placements) out.set(name, { dx, dy });
  return out;
}
