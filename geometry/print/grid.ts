/**
 * The tile grid: which part of the layout (content coordinates, mm, y down) each home-printer
 * page carries. Each page's printable area is the sheet minus the non-printable margin on every
 * side; neighbouring tiles share an `overlap` band (0 = trim-and-butt).
 *
 * Tile count (trade reference §5.4): columns = ⌈(W − o)/(w − o)⌉, rows = ⌈(H − o)/(h − o)⌉ for
 * a content box W × H, printable area w × h and overlap o; at least one of each.
 */
import { PrintError } from './errors.ts';
import type { Orientation, Paper } from './paper.ts';
import { paperSheet } from './paper.ts';

export interface Rect {
  readonly x: number;
  readonly y: number;
  readonly width: number;
  readonly height: number;
}

export interface Tile {
  readonly row: number;
  readonly col: number;
  /** Row letter + column number: A1, A2 … B1. */
  readonly label: string;
  /** The printable area, in content coordinates. */
  readonly area: Rect;
}

export interface TileGrid {
  readonly orientation: Orientation;
  /** Sheet size (mm) in this orientation. */
  readonly sheet: { readonly width: number; readonly height: number };
  readonly margin: number;
  readonly overlap: number;
  readonly rows: number;
  readonly cols: number;
  /** Distance between the origins of neighbouring tiles: printable size − overlap. */
  readonly step: { readonly x: number; readonly y: number };
  /** Row-major: tiles[row * cols + col]. */
  readonly tiles: readonly Tile[];
}

/** Smallest printable side we accept (mm): below this a page carries too little to assemble. */
export const MIN_PRINTABLE = 50;

/** A, B, … Z, AA, AB, … (bijective base 26) for row index 0, 1, … */
export function rowLetters(row: number): string {
  if (!Number.isInteger(row) || row < 0) throw new RangeError(`row index must be a whole number ≥ 0, got ${row}`);
  let n = row + 1;
  let s = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

/** Page label: row letter(s) + 1-based column number, e.g. tileLabel(1, 2) = "B3". */
export function tileLabel(row: number, col: number): string {
  return `${rowLetters(row)}${col + 1}`;
}

/** Tiles along one axis for content length L, printable length w, overlap o. */
export function tileCount(length: number, printable: number, overlap: number): number {
  if (length <= printable) return 1;
  // A tiny epsilon keeps an exact fit (e.g. 2 × step + o) from asking for one more tile.
  return Math.max(1, Math.ceil((length - overlap) / (printable - overlap) - 1e-9));
}

/**
 * The grid covering the content box [0, W] × [0, H] on `paper` in `orientation`.
 * Throws PrintError when the margin or overlap leave no usable tile.
 */
export function tileGrid(content: { width: number; height: number }, paper: Paper, orientation: Orientation, margin: number, overlap: number): TileGrid {
  const sheet = paperSheet(paper, orientation);
  if (sheet.height === undefined) throw new PrintError('bad-paper', `${paper.label} is a roll: it prints on one sheet, not tiles`);
  const w = sheet.width - 2 * margin;
  const h = sheet.height - 2 * margin;
  if (!(margin >= 0)) throw new PrintError('bad-margin', `the margin must be 0 mm or more, got ${margin}`);
  if (w < MIN_PRINTABLE || h < MIN_PRINTABLE)
    throw new PrintError('bad-margin', `a ${margin} mm margin leaves less than ${MIN_PRINTABLE} mm to print on ${paper.label}`);
  if (!(overlap >= 0) || overlap > Math.min(w, h) / 2)
    throw new PrintError('bad-overlap', `the overlap must be between 0 and ${Math.floor(Math.min(w, h) / 2)} mm on ${paper.label}, got ${overlap}`);
  if (!(content.width >= 0 && content.height >= 0)) throw new PrintError('bad-layout', 'the content box has a negative size');
  const cols = tileCount(content.width, w, overlap);
  const rows = tileCount(content.height, h, overlap);
  const step = { x: w - overlap, y: h - overlap };
  const tiles: Tile[] = [];
  for (let row = 0; row < rows; row++)
    for (let col = 0; col < cols; col++) tiles.push({ row, col, label: tileLabel(row, col), area: { x: col * step.x, y: row * step.y, width: w, height: h } });
  return { orientation, sheet: { width: sheet.width, height: sheet.height }, margin, overlap, rows, cols, step, tiles };
}
