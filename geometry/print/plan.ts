/**
 * planPrint: pieces → layout → pages. For home-printer paper the layout width and the page
 * orientation are searched (each orientation unless one is given; shelf widths of 1, 2, …
 * tile columns; upright and, when allowed, quarter-turned pieces) and the plan with the fewest
 * pages in use wins (then fewer tiles in all, then portrait). Large format puts everything on
 * one sheet.
 */
import type { Pattern } from '../model.ts';
import type { Point } from '../vec.ts';
import { affineApply } from '../vec.ts';
import { polygonMeetsRect } from './empty.ts';
import { PrintError } from './errors.ts';
import { type Tile, type TileGrid, tileGrid } from './grid.ts';
import { type Layout, outerPolygon, shelfLayout, turnedBounds } from './layout.ts';
import { type Orientation, type Paper, DEFAULT_MARGIN, PAPERS, type PaperId, paperSheet } from './paper.ts';
import { type PrintPiece, printPieces } from './pieces.ts';

export interface PrintOptions {
  readonly paper: PaperId;
  readonly orientation: Orientation | 'auto';
  /** Non-printable margin on every side, mm (default 6.35). */
  readonly margin: number;
  /** Overlap band between neighbouring tiles, mm; 0 = trim lines, butt the pages. */
  readonly overlap: number;
  /** Pieces may lie with the grain horizontal. */
  readonly allowRotate90: boolean;
  /** The size to print when pieces still have several size lines. */
  readonly size?: string | undefined;
  /** Gap between pieces, mm. */
  readonly spacing: number;
}

export const DEFAULT_PRINT_OPTIONS: PrintOptions = { paper: 'letter', orientation: 'auto', margin: DEFAULT_MARGIN, overlap: 0, allowRotate90: false, spacing: 10 };

/** Free space kept round the layout so no cut line sits on a tile's edge (mm). */
export const LAYOUT_PADDING = 4;
/** Height of the band above the pieces on a single sheet: title, test squares, instruction (mm). */
export const SHEET_HEADER = 84;

export interface TiledPlan {
  readonly format: 'tiled';
  readonly paper: Paper;
  readonly options: PrintOptions;
  readonly pieces: readonly PrintPiece[];
  readonly layout: Layout;
  /** Each piece's outer line, flattened, in content coordinates. */
  readonly polygons: readonly (readonly Point[])[];
  readonly grid: TileGrid;
  /** Tiles that carry part of a piece, row by row: the pattern pages. */
  readonly used: readonly Tile[];
  /** Tiles left out: no piece touches their printable area. */
  readonly empty: readonly Tile[];
  /** Page 1 is the test-square and assembly-map page; tile pages follow. */
  readonly pageCount: number;
}

export interface SinglePlan {
  readonly format: 'single';
  readonly paper: Paper;
  readonly options: PrintOptions;
  readonly pieces: readonly PrintPiece[];
  readonly layout: Layout;
  readonly polygons: readonly (readonly Point[])[];
  readonly orientation: Orientation;
  /** Sheet size, mm (a roll's length is cut to the content). */
  readonly sheet: { readonly width: number; readonly height: number };
  /** Where the layout's origin lies on the sheet, mm. */
  readonly origin: Point;
  readonly pageCount: 1;
}

export type PrintPlan = TiledPlan | SinglePlan;

function placedPolygons(pieces: readonly PrintPiece[], layout: Layout, base: readonly Point[][]): Point[][] {
  return layout.placements.map((pl) => base[pl.index]!.map((p) => affineApply(pl.transform, p)));
}

/** Tiles whose printable area meets some piece. */
export function usedTiles(grid: TileGrid, polygons: readonly (readonly Point[])[]): { used: Tile[]; empty: Tile[] } {
  const used: Tile[] = [];
  const empty: Tile[] = [];
  for (const t of grid.tiles) (polygons.some((poly) => polygonMeetsRect(poly, t.area)) ? used : empty).push(t);
  return { used, empty };
}

export function planPrint(pattern: Pattern, input: Partial<PrintOptions> = {}): PrintPlan {
  const options: PrintOptions = { ...DEFAULT_PRINT_OPTIONS, ...input };
  const paper = PAPERS[options.paper];
  if (!paper) throw new PrintError('bad-paper', `unknown paper "${String(options.paper)}"`);
  const pieces = printPieces(pattern, options.size);
  const base = pieces.map((p) => outerPolygon(p));
  const quarterTurn = pieces.map(() => options.allowRotate90);
  const { margin, overlap, spacing } = options;

  if (paper.format === 'single') {
    const orientations: Orientation[] = paper.height === undefined ? ['portrait'] : options.orientation === 'auto' ? ['portrait', 'landscape'] : [options.orientation];
    let lastError: unknown;
    for (const orientation of orientations) {
      const sheet = paperSheet(paper, orientation);
      const width = sheet.width - 2 * margin;
      if (width < 100) throw new PrintError('bad-margin', `a ${margin} mm margin leaves too little of ${paper.label}`);
      let layout: Layout;
      try {
        layout = shelfLayout(pieces, { width, spacing, padding: LAYOUT_PADDING, quarterTurn });
      } catch (e) {
        lastError = e;
        continue;
      }
      const height = layout.height + SHEET_HEADER + 2 * margin;
      if (sheet.height !== undefined && height > sheet.height + 1e-9) {
        // report the first orientation tried (portrait unless one was chosen)
        lastError ??= new PrintError(
          'too-large',
          `the pieces do not fit on one ${paper.label} sheet: ${orientation}, they need ${Math.ceil(height)} mm of its ${sheet.height} mm; print on a roll or on home-printer paper${options.allowRotate90 ? '' : ', or let pieces lie crosswise'}`,
        );
        continue;
      }
      return {
        format: 'single',
        paper,
        options,
        pieces,
        layout,
        polygons: placedPolygons(pieces, layout, base),
        orientation,
        sheet: { width: sheet.width, height: sheet.height ?? height },
        origin: { x: margin, y: margin + SHEET_HEADER },
        pageCount: 1,
      };
    }
    throw lastError instanceof Error ? lastError : new PrintError('too-large', `the pieces do not fit on ${paper.label}`);
  }

  const orientations: Orientation[] = options.orientation === 'auto' ? ['portrait', 'landscape'] : [options.orientation];
  let best: TiledPlan | undefined;
  let lastError: unknown;
  for (const orientation of orientations) {
    const sheet = paperSheet(paper, orientation);
    const printable = sheet.width - 2 * margin;
    // Validates margin and overlap for this paper (throws PrintError with the reason).
    tileGrid({ width: 1, height: 1 }, paper, orientation, margin, overlap);
    const step = printable - overlap;
    // the widest a shelf need be: all pieces side by side, grain vertical
    const totalWidth = pieces.reduce((s, piece) => {
      const b = turnedBounds(piece, 0);
      return s + b.maxX - b.minX + spacing;
    }, 2 * LAYOUT_PADDING);
    const maxCols = Math.min(16, Math.max(1, Math.ceil(totalWidth / step) + 1));
    const turnSets = options.allowRotate90 ? [pieces.map(() => false), quarterTurn] : [quarterTurn];
    for (let cols = 1; cols <= maxCols; cols++) {
      for (const turns of turnSets) {
        let layout: Layout;
        try {
          layout = shelfLayout(pieces, { width: cols * step + overlap, spacing, padding: LAYOUT_PADDING, quarterTurn: turns });
        } catch (e) {
          lastError = e;
          continue;
        }
        const polygons = placedPolygons(pieces, layout, base);
        const grid = tileGrid(layout, paper, orientation, margin, overlap);
        const { used, empty } = usedTiles(grid, polygons);
        const better =
          !best || used.length < best.used.length || (used.length === best.used.length && grid.tiles.length < best.grid.tiles.length);
        if (better) best = { format: 'tiled', paper, options, pieces, layout, polygons, grid, used, empty, pageCount: used.length + 1 };
      }
    }
  }
  if (!best) throw lastError instanceof Error ? lastError : new PrintError('too-large', `the pieces do not fit on ${paper.label}`);
  return best;
}
