/**
 * A simple shelf layout of the pieces (mm, y down, origin at the content box's top left).
 *
 * Every piece is first turned so that its grainline is vertical. It then keeps that turn or is
 * turned 180° (grain still vertical); a quarter turn (grain horizontal) only when allowed. Pieces
 * are sorted tallest first and placed left to right on shelves no wider than `width`, each slid
 * against the shapes already on its shelf; a new shelf starts below the tallest piece of the last
 * one. `spacing` separates pieces (within one band height, LAYOUT_BAND) and shelves; `padding`
 * is kept free round the whole layout (so cut lines are not drawn at a tile's edge).
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

/** Height of the horizontal bands in which shapes are compared when pieces slide together (mm). */
export const LAYOUT_BAND = 2;

/**
 * Left and right extent of a polygon in each horizontal band [iB, (i+1)B) of its frame (after
 * moving its bounds' corner to 0, 0): exact for the polyline, conservative for the band.
 */
function bandProfile(poly: readonly Point[], height: number): { left: number[]; right: number[] } {
  const n = Math.max(1, Math.ceil(height / LAYOUT_BAND));
  const left = new Array<number>(n).fill(Infinity);
  const right = new Array<number>(n).fill(-Infinity);
  const put = (i: number, x: number) => {
    if (i < 0 || i >= n) return;
    if (x < left[i]!) left[i] = x;
    if (x > right[i]!) right[i] = x;
  };
  for (let k = 0; k < poly.length; k++) {
    const a = poly[k]!;
    const b = poly[(k + 1) % poly.length]!;
    const [lo, hi] = a.y <= b.y ? [a, b] : [b, a];
    const i0 = Math.floor(lo.y / LAYOUT_BAND);
    const i1 = Math.floor(hi.y / LAYOUT_BAND);
    for (let i = i0; i <= i1; i++) {
      // the part of the edge inside band i: its ends are where it enters and leaves the band
      const y0 = Math.max(lo.y, i * LAYOUT_BAND);
      const y1 = Math.min(hi.y, (i + 1) * LAYOUT_BAND);
      const at = (y: number) => (hi.y === lo.y ? lo.x : lo.x + ((hi.x - lo.x) * (y - lo.y)) / (hi.y - lo.y));
      put(i, at(y0));
      put(i, at(y1));
      if (hi.y === lo.y) put(i, hi.x);
    }
  }
  return { left, right };
}

interface Candidate {
  readonly turn: Turn;
  readonly b: { minX: number; minY: number; maxX: number; maxY: number };
  readonly w: number;
  readonly h: number;
  readonly profile: { left: number[]; right: number[] };
}

/**
 * Shelf layout with shapes slid together. Pieces go tallest first onto shelves; on a shelf each
 * piece slides left until it comes within `spacing` of the pieces already there (compared band by
 * band, so a narrow hem can sit beside a wide waist), trying each allowed turn — grain vertical
 * (0° or 180°), or lying (90°/270°) when allowed — and keeping the one that ends furthest left.
 * Throws PrintError when a piece is wider than `width` in every allowed turn.
 */
export function shelfLayout(pieces: readonly PrintPiece[], options: LayoutOptions): Layout {
  const { width, spacing, padding } = options;
  const inner = width - 2 * padding;
  const reach = Math.ceil(spacing / LAYOUT_BAND);
  const items = pieces.map((piece, index) => {
    const turns: Turn[] = options.quarterTurn[index] ? [0, 180, 90, 270] : [0, 180];
    const poly = outerPolygon(piece);
    const choices: Candidate[] = turns.map((turn) => {
      const m = pieceFrame(piece, turn);
      const pts = poly.map((p) => affineApply(m, p));
      const b = boundsOf(pts);
      const h = b.maxY - b.minY;
      return { turn, b, w: b.maxX - b.minX, h, profile: bandProfile(pts.map((p) => ({ x: p.x - b.minX, y: p.y - b.minY })), h) };
    });
    const fitting = choices.filter((c) => c.w <= inner + 1e-9);
    if (fitting.length === 0)
      throw new PrintError('too-large', `piece "${piece.name}" is ${Math.ceil(Math.min(...choices.map((c) => c.w)))} mm wide, wider than the ${Math.floor(inner)} mm available`);
    // lying down only when that makes the piece lower
    const low = Math.min(...fitting.map((c) => c.h));
    return { index, piece, choices: fitting.filter((c) => c.h <= low + 1e-6) };
  });
  const order = [...items].sort((a, b) => b.choices[0]!.h - a.choices[0]!.h || a.index - b.index);
  const placements: Placement[] = [];
  let y = padding;
  let shelfHeight = 0;
  let skyline: number[] = []; // right-most x of the shelf's pieces in each band below the shelf top
  let usedWidth = 0;
  const slide = (c: Candidate): number => {
    let x = padding;
    for (let i = 0; i < c.profile.left.length; i++) {
      const l = c.profile.left[i]!;
      if (!Number.isFinite(l)) continue;
      for (let j = Math.max(0, i - reach); j <= i + reach && j < skyline.length; j++) {
        const r = skyline[j]!;
        if (Number.isFinite(r)) x = Math.max(x, r + spacing - l);
      }
    }
    return x;
  };
  for (const it of order) {
    let best: { c: Candidate; x: number } | undefined;
    for (const c of it.choices) {
      const x = slide(c);
      if (x + c.w <= padding + inner + 1e-9 && (!best || x + c.w < best.x + best.c.w - 1e-9)) best = { c, x };
    }
    if (!best) {
      y += shelfHeight + spacing;
      shelfHeight = 0;
      skyline = [];
      const c = it.choices[0]!;
      best = { c, x: padding };
    }
    const { c, x } = best;
    const transform = affineMultiply(affineTranslate(x - c.b.minX, y - c.b.minY), pieceFrame(it.piece, c.turn));
    placements.push({ index: it.index, turn: c.turn, transform, box: { x, y, width: c.w, height: c.h } });
    c.profile.right.forEach((r, i) => {
      if (!Number.isFinite(r)) return;
      while (skyline.length <= i) skyline.push(-Infinity);
      skyline[i] = Math.max(skyline[i]!, x + r);
    });
    usedWidth = Math.max(usedWidth, x + c.w);
    shelfHeight = Math.max(shelfHeight, c.h);
  }
  placements.sort((a, b) => a.index - b.index);
  return { width: usedWidth + padding, height: y + shelfHeight + padding, placements };
}

/** A placed piece's outer line in content coordinates. */
export function placedOuter(piece: PrintPiece, placement: Placement): Contour {
  return contourTransform(piece.outer, placement.transform);
}
