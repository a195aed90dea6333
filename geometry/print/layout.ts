/**
 * A simple shelf layout of the pieces (mm, y down, origin at the content box's top left).
 *
 * Every piece is first turned so that its grainline is vertical. It then keeps that turn or is
 * turned 180° (grain still vertical); a quarter turn (grain horizontal) only when allowed. Pieces
 * are sorted tallest first and placed left to right on shelves no wider than `width`; a new
 * shelf starts below the tallest piece of the last one. `spacing` separates pieces and shelves;
 * `padding` is kept free round the whole layout (so cut lines are not drawn at a tile's edge).
 */
import { type Contour, contourFlatten, contourTransform } from '../path.ts';
import { type Affine, type Point, affineApply, affineMultiply, affineTranslate } from '../vec.ts';
import { PrintError } from './errors.ts';
import type { PrintPiece } from './pieces.ts';

export type Turn = 0 | 90 | 180 | 270;

export interface Placement {
  readonly index: number;
  /** Extra turn after the grain was made vertical: 0 or 180, or 90/270 when allowed. */
  readonly turn: Turn;
  /** Pattern coordinates → content coordinates. */
  readonly transform: Affine;
  /** The outer line's bounds in content coordinates. */
  readonly box: { readonly x: number; readonly y: number; readonly width: number; readonly height: number };
}

export interface Layout {
  readonly width: number;
  readonly height: number;
  readonly placements: readonly Placement[];
}

export interface LayoutOptions {
  /** Widest a shelf may be (mm); at least the widest piece. */
  readonly width: number;
  readonly spacing: number;
  readonly padding: number;
  /** Per piece: may it lie with its grain horizontal? */
  readonly quarterTurn: readonly boolean[];
}

/** Rotation by a whole angle with exact quarter turns (cos/sin snapped to 0, ±1). */
export function rotation(angle: number): Affine {
  let c = Math.cos(angle);
  let s = Math.sin(angle);
  for (const v of [0, 1, -1]) {
    if (Math.abs(c - v) < 1e-12) c = v;
    if (Math.abs(s - v) < 1e-12) s = v;
  }
  return { a: c, b: s, c: -s, d: c, e: 0, f: 0 };
}

/** Pattern coordinates → grain-vertical frame turned by `turn`. */
export function pieceFrame(piece: PrintPiece, turn: Turn): Affine {
  return rotation(piece.grainTurn + (turn * Math.PI) / 180);
}

function boundsOf(points: readonly Point[]): { minX: number; minY: number; maxX: number; maxY: number } {
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const p of points) {
    if (p.x < minX) minX = p.x;
    if (p.y < minY) minY = p.y;
    if (p.x > maxX) maxX = p.x;
    if (p.y > maxY) maxY = p.y;
  }
  return { minX, minY, maxX, maxY };
}

/** The outer line, flattened, in pattern coordinates (shared by layout and emptiness tests). */
export function outerPolygon(piece: PrintPiece): Point[] {
  return contourFlatten(piece.outer).map((f) => f.point);
}

/** Bounds of a piece's outer line in its turned frame. Cubic bounds are exact enough via flattening (0.01 mm). */
export function turnedBounds(piece: PrintPiece, turn: Turn): { minX: number; minY: number; maxX: number; maxY: number } {
  const m = pieceFrame(piece, turn);
  return boundsOf(outerPolygon(piece).map((p) => affineApply(m, p)));
}

/**
 * Shelf layout. A piece turns a quarter (when allowed) only if it does not fit the shelf width
 * upright, or if lying down makes it lower while still fitting. Throws PrintError when a piece is
 * wider than `width` in every allowed turn.
 */
export function shelfLayout(pieces: readonly PrintPiece[], options: LayoutOptions): Layout {
  const { width, spacing, padding } = options;
  const inner = width - 2 * padding;
  const items = pieces.map((piece, index) => {
    const turns: Turn[] = options.quarterTurn[index] ? [0, 90] : [0];
    const choices = turns.map((turn) => {
      const b = turnedBounds(piece, turn);
      return { turn, b, w: b.maxX - b.minX, h: b.maxY - b.minY };
    });
    const fitting = choices.filter((c) => c.w <= inner + 1e-9);
    if (fitting.length === 0)
      throw new PrintError('too-large', `piece "${piece.name}" is ${Math.ceil(Math.min(...choices.map((c) => c.w)))} mm wide, wider than the ${Math.floor(inner)} mm available`);
    const best = fitting.reduce((a, c) => (c.h < a.h - 1e-9 ? c : a));
    return { index, piece, ...best };
  });
  const order = [...items].sort((a, b) => b.h - a.h || a.index - b.index);
  const placements: Placement[] = [];
  let x = padding;
  let y = padding;
  let shelfHeight = 0;
  let usedWidth = 0;
  for (const it of order) {
    if (x > padding && x + it.w > padding + inner + 1e-9) {
      y += shelfHeight + spacing;
      x = padding;
      shelfHeight = 0;
    }
    const transform = affineMultiply(affineTranslate(x - it.b.minX, y - it.b.minY), pieceFrame(it.piece, it.turn));
    placements.push({ index: it.index, turn: it.turn, transform, box: { x, y, width: it.w, height: it.h } });
    usedWidth = Math.max(usedWidth, x + it.w);
    shelfHeight = Math.max(shelfHeight, it.h);
    x += it.w + spacing;
  }
  placements.sort((a, b) => a.index - b.index);
  return { width: usedWidth + padding, height: y + shelfHeight + padding, placements };
}

/** A placed piece's outer line in content coordinates. */
export function placedOuter(piece: PrintPiece, placement: Placement): Contour {
  return contourTransform(piece.outer, placement.transform);
}
