/**
 * What a printed page shows, as plain drawing data in millimetres (y down), shared by the PDF
 * and SVG writers so both print the same thing. Coordinates of piece marks are content
 * coordinates (the layout); page furniture is in sheet coordinates.
 */
import { type Contour, contourFlatten, pathToSvg, pathTransform } from '../path.ts';
import { type Affine, type Point, affineApply, affineApplyVector, pointInPolygon, polygonDistance, vecHypot, vecNormalize } from '../vec.ts';
import type { Rect, Tile } from './grid.ts';
import { MM_PER_INCH } from './paper.ts';
import type { PrintPiece } from './pieces.ts';
import type { PrintPlan, SinglePlan, TiledPlan } from './plan.ts';
import { SHEET_HEADER } from './plan.ts';

export interface Stroke {
  readonly width: number;
  readonly colour: string;
  readonly dash?: readonly number[];
}

export type Mark =
  | { readonly kind: 'path'; readonly role: string; readonly d: string; readonly stroke?: Stroke; readonly fill?: string }
  | { readonly kind: 'text'; readonly at: Point; readonly text: string; readonly size: number; readonly bold: boolean; readonly anchor: 'start' | 'middle' | 'end'; readonly colour: string }
  | { readonly kind: 'clip'; readonly d: string; readonly marks: readonly Mark[] }
  /** A test square: the writers draw it as a plain rectangle (PDF `re`), side in mm. */
  | { readonly kind: 'square'; readonly x: number; readonly y: number; readonly side: number; readonly stroke: Stroke };

/** Line styles (mm). The cut line is the boldest: it is what the scissors follow. */
export const STYLE = {
  cut: { width: 0.6, colour: '#1d1b19' },
  seam: { width: 0.22, colour: '#1d1b19', dash: [3, 1.5] },
  seamOnly: { width: 0.6, colour: '#1d1b19' },
  grain: { width: 0.35, colour: '#1d1b19' },
  lengthen: { width: 0.3, colour: '#2f5d8a' },
  level: { width: 0.25, colour: '#6b6259', dash: [4, 2] },
  fold: { width: 0.35, colour: '#1d1b19', dash: [6, 2, 1, 2] },
  internal: { width: 0.25, colour: '#6b6259' },
  notch: { width: 0.4, colour: '#1d1b19' },
  frame: { width: 0.15, colour: '#8a8178', dash: [2, 2] },
  band: { width: 0.15, colour: '#8a8178', dash: [1, 1.5] },
  join: { width: 0.3, colour: '#b3432a' },
  testSquare: { width: 0.3, colour: '#0f6b4f' },
  bar: { width: 0.3, colour: '#1d1b19' },
  map: { width: 0.2, colour: '#6b6259' },
} as const satisfies Record<string, Stroke>;

export const INK = '#1d1b19';
export const CAUTION_INK = '#b3432a';
export const GREY_FILL = '#dedad5';

/** The instruction printed beside the test squares (one line). */
export const SCALE_INSTRUCTION = 'Print at 100 % (actual size), then measure both squares before cutting: a wrong scale ruins fabric.';

export interface SceneText {
  readonly title: string;
  readonly date: string;
}

const f = (v: number): string => String(Math.round(v * 1000) / 1000);
const line = (a: Point, b: Point): string => `M${f(a.x)} ${f(a.y)} L${f(b.x)} ${f(b.y)}`;
const rectD = (r: Rect): string => `M${f(r.x)} ${f(r.y)} L${f(r.x + r.width)} ${f(r.y)} L${f(r.x + r.width)} ${f(r.y + r.height)} L${f(r.x)} ${f(r.y + r.height)} Z`;
const polyD = (pts: readonly Point[]): string => (pts.length ? `M${pts.map((p) => `${f(p.x)} ${f(p.y)}`).join(' L')} Z` : '');
const text = (at: Point, t: string, size: number, opts: { bold?: boolean; anchor?: 'start' | 'middle' | 'end'; colour?: string } = {}): Mark => ({
  kind: 'text',
  at,
  text: t,
  size,
  bold: opts.bold ?? false,
  anchor: opts.anchor ?? 'start',
  colour: opts.colour ?? INK,
});

/** The size as shown on a label: "Size 8" or "Blend: waist 0, hip 4, …". */
export function sizeCaption(piece: PrintPiece): string {
  return piece.blended ? `Blend: ${piece.size.split('·').map((s) => s.trim()).join(', ')}` : `Size ${piece.size}`;
}

/** An interior point far from the outline (grid search), and its clearance in mm. */
export function labelSpot(poly: readonly Point[]): { at: Point; clearance: number } {
  const xs = poly.map((p) => p.x);
  const ys = poly.map((p) => p.y);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  let best = { at: { x: (minX + maxX) / 2, y: (minY + maxY) / 2 }, clearance: 0 };
  const n = 24;
  for (let i = 1; i < n; i++)
    for (let j = 1; j < n; j++) {
      const p = { x: minX + ((maxX - minX) * i) / n, y: minY + ((maxY - minY) * j) / n };
      if (!pointInPolygon(p, poly)) continue;
      const d = polygonDistance(p, poly);
      if (d > best.clearance) best = { at: p, clearance: d };
    }
  return best;
}

function arrowHead(tip: Point, dir: Point, size: number): string {
  const u = vecNormalize(dir);
  const n = { x: -u.y, y: u.x };
  const back = { x: tip.x - u.x * size, y: tip.y - u.y * size };
  return polyD([tip, { x: back.x + n.x * size * 0.35, y: back.y + n.y * size * 0.35 }, { x: back.x - n.x * size * 0.35, y: back.y - n.y * size * 0.35 }]);
}

/** Parts of a polyline inside a polygon (sampled every `step` mm along each segment). */
function insideRun(points: readonly Point[], poly: readonly Point[]): { from: Point; to: Point } | undefined {
  const samples: Point[] = [];
  for (let i = 0; i + 1 < points.length; i++) {
    const a = points[i]!;
    const b = points[i + 1]!;
    const n = Math.max(1, Math.ceil(vecHypot(b.x - a.x, b.y - a.y) / 2));
    for (let k = 0; k <= n; k++) samples.push({ x: a.x + ((b.x - a.x) * k) / n, y: a.y + ((b.y - a.y) * k) / n });
  }
  const inside = samples.filter((p) => pointInPolygon(p, poly));
  if (inside.length < 2) return undefined;
  return { from: inside[0]!, to: inside[inside.length - 1]! };
}

const LINE_CAPTION: Record<string, (name: string) => string> = {
  lengthen: (n) => (n === 'rise' ? 'rise: lengthen / shorten here' : `lengthen / shorten here (${n})`),
  level: (n) => `${n} line`,
  fold: () => 'place on fold',
  internal: (n) => n,
};

/** Everything drawn for one placed piece, in content coordinates. */
export function pieceMarks(piece: PrintPiece, transform: Affine, polygon: readonly Point[], words: SceneText): Mark[] {
  const T = (c: Contour): string => pathToSvg(pathTransform([c], transform), 3);
  const outerD = polyD(polygon);
  const inner: Mark[] = [];
  for (const l of piece.lines) {
    const placed = pathTransform(l.path, transform);
    const d = pathToSvg(placed, 3);
    const pts = placed.flatMap((c) => contourFlatten(c).map((p) => p.point));
    const run = insideRun(pts, polygon);
    if (l.role === 'grain') {
      inner.push({ kind: 'path', role: 'grain', d, stroke: STYLE.grain });
      const first = pts[0];
      const last = pts[pts.length - 1];
      if (first && last) {
        inner.push({ kind: 'path', role: 'grain-arrow', d: arrowHead(last, { x: last.x - first.x, y: last.y - first.y }, 6), fill: INK });
        inner.push({ kind: 'path', role: 'grain-arrow', d: arrowHead(first, { x: first.x - last.x, y: first.y - last.y }, 6), fill: INK });
        const mid = { x: (first.x + last.x) / 2, y: (first.y + last.y) / 2 };
        inner.push(text({ x: mid.x + 2, y: mid.y }, 'grain', 3));
      }
      continue;
    }
    const style = l.role === 'lengthen' ? STYLE.lengthen : l.role === 'level' ? STYLE.level : l.role === 'fold' ? STYLE.fold : STYLE.internal;
    inner.push({ kind: 'path', role: l.role, d, stroke: style });
    const ends: [Point, Point] | undefined = pts.length > 1 ? [pts[0]!, pts[pts.length - 1]!] : undefined;
    if (l.role === 'lengthen' && ends) {
      // the trade draws lengthen/shorten lines doubled: a second line 3 mm beside the first
      // (below it when the piece is upright)
      const u = vecNormalize({ x: ends[1].x - ends[0].x, y: ends[1].y - ends[0].y });
      let nrm = { x: -u.y, y: u.x };
      if (nrm.y < 0 || (nrm.y === 0 && nrm.x < 0)) nrm = { x: -nrm.x, y: -nrm.y };
      const beside = pathToSvg(pathTransform(placed, { a: 1, b: 0, c: 0, d: 1, e: 3 * nrm.x, f: 3 * nrm.y }), 3);
      inner.push({ kind: 'path', role: 'lengthen', d: beside, stroke: STYLE.lengthen });
    }
    if (run) {
      const at = { x: run.from.x + 3, y: run.from.y - 1.2 };
      inner.push(text(at, (LINE_CAPTION[l.role] ?? LINE_CAPTION.internal!)(l.name), 2.8, { colour: l.role === 'lengthen' ? STYLE.lengthen.colour : INK }));
    }
  }
  // the label: name, size or blend, cut count and fold, make name, date
  const spot = labelSpot(polygon);
  const big = Math.max(3, Math.min(8, spot.clearance / 3));
  const small = Math.max(2.4, Math.min(3.6, big * 0.55));
  const lines = [
    sizeCaption(piece),
    `Cut ${piece.cutCount}${piece.onFold ? ' on fold' : ''}`,
    words.title,
    words.date,
  ];
  const top = spot.at.y - (big + lines.length * small * 1.25) / 2 + big;
  inner.push(text({ x: spot.at.x, y: top }, piece.name.toUpperCase(), big, { bold: true, anchor: 'middle' }));
  lines.forEach((t, i) => inner.push(text({ x: spot.at.x, y: top + (i + 1) * small * 1.3 }, t, small, { anchor: 'middle' })));

  const marks: Mark[] = [{ kind: 'clip', d: outerD, marks: inner }];
  if (piece.cut) {
    marks.push({ kind: 'path', role: 'seam', d: T(piece.seam), stroke: STYLE.seam });
    marks.push({ kind: 'path', role: 'cut', d: T(piece.cut), stroke: STYLE.cut });
  } else {
    marks.push({ kind: 'path', role: 'cut', d: T(piece.seam), stroke: STYLE.seamOnly });
  }
  for (const n of piece.notches) {
    const at = affineApply(transform, n.at);
    const normal = vecNormalize(affineApplyVector(transform, n.normal));
    // across the seam allowance when there is one, else 6 mm into the piece
    const depth = piece.cut ? nearestDistance(polygon, at) : -6;
    const end = { x: at.x + normal.x * depth, y: at.y + normal.y * depth };
    marks.push({ kind: 'path', role: 'notch', d: line(at, end), stroke: STYLE.notch });
  }
  return marks;
}

function nearestDistance(poly: readonly Point[], p: Point): number {
  let d = Infinity;
  for (const q of poly) d = Math.min(d, vecHypot(q.x - p.x, q.y - p.y));
  return Number.isFinite(d) ? d : 6;
}

/** One piece's marks with a box (content coordinates) that holds them all. */
export interface MarkGroup {
  readonly box: Rect;
  readonly marks: readonly Mark[];
}

/** How far marks may reach outside a piece's outer line (notch ticks, stroke widths), mm. */
export const MARK_REACH = 2;

/** All pieces of a plan, in content coordinates, one group per piece. */
export function contentMarks(plan: PrintPlan, words: SceneText): MarkGroup[] {
  return plan.layout.placements.map((pl) => ({
    box: { x: pl.box.x - MARK_REACH, y: pl.box.y - MARK_REACH, width: pl.box.width + 2 * MARK_REACH, height: pl.box.height + 2 * MARK_REACH },
    marks: pieceMarks(plan.pieces[pl.index]!, pl.transform, plan.polygons[pl.index]!, words),
  }));
}

/** Do two rectangles overlap (closed)? */
export function rectsMeet(a: Rect, b: Rect): boolean {
  return a.x <= b.x + b.width && b.x <= a.x + a.width && a.y <= b.y + b.height && b.y <= a.y + a.height;
}

/** A scale bar: 5 cm with 1 cm ticks over a 2 in bar with ½ in ticks; `at` is its top left. */
export function scaleBar(at: Point): Mark[] {
  const out: Mark[] = [];
  const bar = (y: number, length: number, ticks: number, caption: string) => {
    out.push({ kind: 'path', role: 'scale-bar', d: line({ x: at.x, y }, { x: at.x + length, y }), stroke: STYLE.bar });
    for (let i = 0; i <= ticks; i++) {
      const x = at.x + (length * i) / ticks;
      out.push({ kind: 'path', role: 'scale-bar', d: line({ x, y: y - 1.5 }, { x, y: y + 1.5 }), stroke: STYLE.bar });
    }
    out.push(text({ x: at.x + length + 2, y: y + 1 }, caption, 2.6));
  };
  bar(at.y + 2, 50, 5, '5 cm');
  bar(at.y + 8, 2 * MM_PER_INCH, 4, '2 in');
  return out;
}

/** Test squares (1 in and 5 cm, labelled) under the one-line instruction; `at` is the top left; 60 mm tall. */
export function testSquares(at: Point): Mark[] {
  const inch = MM_PER_INCH;
  const out: Mark[] = [
    text({ x: at.x, y: at.y + 4 }, SCALE_INSTRUCTION, 3.4, { bold: true, colour: CAUTION_INK }),
    { kind: 'square', x: at.x, y: at.y + 8, side: inch, stroke: STYLE.testSquare },
    text({ x: at.x + inch / 2, y: at.y + 8 + inch / 2 + 1.5 }, '1 in', 4, { bold: true, anchor: 'middle', colour: INK }),
    text({ x: at.x + inch / 2, y: at.y + 8 + inch + 5 }, '1 in × 1 in', 2.8, { anchor: 'middle' }),
    { kind: 'square', x: at.x + inch + 12, y: at.y + 8, side: 50, stroke: STYLE.testSquare },
    text({ x: at.x + inch + 37, y: at.y + 35 }, '5 cm', 5, { bold: true, anchor: 'middle', colour: INK }),
    text({ x: at.x + inch + 37, y: at.y + 41 }, '5 cm × 5 cm', 2.8, { anchor: 'middle' }),
  ];
  return out;
}

export interface PageScene {
  readonly width: number;
  readonly height: number;
  /** Drawn on the sheet, clipped to `clip` when given. */
  readonly clip: Rect | undefined;
  /** Content marks are drawn through this map (content → sheet); undefined = none. */
  readonly content: Affine | undefined;
  /** The part of the content this page shows (content coordinates); groups outside it are skipped. */
  readonly view: Rect | undefined;
  readonly furniture: readonly Mark[];
}

/** Marks where two pages join: a circle half filled on the lower-numbered page's side, with a cross through it. */
function joinMark(centre: Point, across: 'x' | 'y'): Mark[] {
  const r = 3.5;
  const arm = 8;
  const c = centre;
  const k = 0.5523 * r;
  const circle = `M${f(c.x + r)} ${f(c.y)} C${f(c.x + r)} ${f(c.y + k)} ${f(c.x + k)} ${f(c.y + r)} ${f(c.x)} ${f(c.y + r)} C${f(c.x - k)} ${f(c.y + r)} ${f(c.x - r)} ${f(c.y + k)} ${f(c.x - r)} ${f(c.y)} C${f(c.x - r)} ${f(c.y - k)} ${f(c.x - k)} ${f(c.y - r)} ${f(c.x)} ${f(c.y - r)} C${f(c.x + k)} ${f(c.y - r)} ${f(c.x + r)} ${f(c.y - k)} ${f(c.x + r)} ${f(c.y)} Z`;
  // filled half: left of a vertical join, above a horizontal one
  const half =
    across === 'x'
      ? `M${f(c.x)} ${f(c.y - r)} C${f(c.x - k)} ${f(c.y - r)} ${f(c.x - r)} ${f(c.y - k)} ${f(c.x - r)} ${f(c.y)} C${f(c.x - r)} ${f(c.y + k)} ${f(c.x - k)} ${f(c.y + r)} ${f(c.x)} ${f(c.y + r)} Z`
      : `M${f(c.x - r)} ${f(c.y)} C${f(c.x - r)} ${f(c.y - k)} ${f(c.x - k)} ${f(c.y - r)} ${f(c.x)} ${f(c.y - r)} C${f(c.x + k)} ${f(c.y - r)} ${f(c.x + r)} ${f(c.y - k)} ${f(c.x + r)} ${f(c.y)} Z`;
  return [
    { kind: 'path', role: 'join', d: half, fill: STYLE.join.colour },
    { kind: 'path', role: 'join', d: circle, stroke: STYLE.join },
    { kind: 'path', role: 'join', d: line({ x: c.x - arm, y: c.y }, { x: c.x + arm, y: c.y }), stroke: STYLE.join },
    { kind: 'path', role: 'join', d: line({ x: c.x, y: c.y - arm }, { x: c.x, y: c.y + arm }), stroke: STYLE.join },
  ];
}

/** The page for one tile: content mapped into the printable area, plus frame, labels, join marks, scale bar. */
export function tileScene(plan: TiledPlan, tile: Tile, pageNumber: number, words: SceneText): PageScene {
  const { grid } = plan;
  const m = grid.margin;
  const o = grid.overlap;
  const w = tile.area.width;
  const h = tile.area.height;
  const area: Rect = { x: m, y: m, width: w, height: h };
  const used = new Set(plan.used.map((t) => `${t.row},${t.col}`));
  const neighbour = (dr: number, dc: number): Tile | undefined =>
    used.has(`${tile.row + dr},${tile.col + dc}`) ? grid.tiles[(tile.row + dr) * grid.cols + tile.col + dc] : undefined;
  const fur: Mark[] = [{ kind: 'path', role: 'frame', d: rectD(area), stroke: STYLE.frame }];
  const sides = [
    { dr: 0, dc: 1, across: 'x' as const, centre: (k: number) => ({ x: m + w - o / 2, y: m + h * k }), label: { x: m + w - o - 12, y: m + h / 2 + 1.5 }, anchor: 'end' as const },
    { dr: 0, dc: -1, across: 'x' as const, centre: (k: number) => ({ x: m + o / 2, y: m + h * k }), label: { x: m + o + 12, y: m + h / 2 + 1.5 }, anchor: 'start' as const },
    { dr: 1, dc: 0, across: 'y' as const, centre: (k: number) => ({ x: m + w * k, y: m + h - o / 2 }), label: { x: m + w / 2, y: m + h - o - 12 }, anchor: 'middle' as const },
    { dr: -1, dc: 0, across: 'y' as const, centre: (k: number) => ({ x: m + w * k, y: m + o / 2 }), label: { x: m + w / 2, y: m + o + 15 }, anchor: 'middle' as const },
  ];
  for (const s of sides) {
    const n = neighbour(s.dr, s.dc);
    if (!n) continue;
    for (const k of [0.25, 0.75]) fur.push(...joinMark(s.centre(k), s.across));
    if (o > 0) {
      const band: Rect =
        s.across === 'x'
          ? { x: s.dc > 0 ? m + w - o : m, y: m, width: o, height: h }
          : { x: m, y: s.dr > 0 ? m + h - o : m, width: w, height: o };
      fur.push({ kind: 'path', role: 'band', d: rectD(band), stroke: STYLE.band });
    }
    // Figtree's latin file has no arrow glyphs: a drawn triangle points at the neighbour
    const dir = { x: s.dc, y: s.dr };
    const caption = `joins ${n.label}`;
    const tip =
      s.across === 'x'
        ? { x: s.dc > 0 ? s.label.x + 7 : s.label.x - 7, y: s.label.y - 1.2 }
        : { x: s.label.x, y: s.dr > 0 ? s.label.y + 4 : s.label.y - 8 };
    fur.push({ kind: 'path', role: 'join-arrow', d: arrowHead(tip, dir, 4), fill: STYLE.join.colour });
    fur.push(text(s.label, caption, 3.6, { bold: true, anchor: s.anchor, colour: STYLE.join.colour }));
  }
  const inset = o + 3;
  // white behind the page label and the scale bar, so pattern lines do not run through them
  fur.push({ kind: 'path', role: 'label-ground', d: rectD({ x: m + inset - 1.5, y: m + inset - 1, width: 72, height: 17.5 }), fill: '#ffffff' });
  fur.push({ kind: 'path', role: 'label-ground', d: rectD({ x: m + inset - 1.5, y: m + h - inset - 12.5, width: 68, height: 13 }), fill: '#ffffff' });
  fur.push(text({ x: m + inset, y: m + inset + 9 }, tile.label, 11, { bold: true }));
  fur.push(text({ x: m + inset, y: m + inset + 14 }, `page ${pageNumber} of ${plan.pageCount} · ${words.title}`, 2.8));
  fur.push(...scaleBar({ x: m + inset, y: m + h - inset - 12 }));
  return {
    width: grid.sheet.width,
    height: grid.sheet.height,
    clip: area,
    content: { a: 1, b: 0, c: 0, d: 1, e: m - tile.area.x, f: m - tile.area.y },
    view: tile.area,
    furniture: fur,
  };
}

/** Page 1 of a tiled print: test squares, instruction, assembly map with empty pages greyed and listed. */
export function coverScene(plan: TiledPlan, words: SceneText): PageScene {
  const { grid } = plan;
  const m = grid.margin;
  const W = grid.sheet.width;
  const H = grid.sheet.height;
  const x0 = m + 6;
  const fur: Mark[] = [];
  fur.push(text({ x: x0, y: m + 12 }, words.title, 7, { bold: true }));
  const sizes = [...new Set(plan.pieces.map((p) => sizeCaption(p)))].join('; ');
  fur.push(text({ x: x0, y: m + 19 }, `${sizes} · ${plan.paper.label}, ${grid.orientation} · ${words.date}`, 3));
  fur.push(...testSquares({ x: x0, y: m + 24 }));
  fur.push(...scaleBar({ x: x0 + 90, y: m + 40 }));
  fur.push(text({ x: W - m - 6, y: m + 12 }, `page 1 of ${plan.pageCount}`, 3.2, { anchor: 'end' }));
  // assembly map
  const mapTop = m + 100;
  fur.push(text({ x: x0, y: mapTop - 6 }, `Assembly map: ${grid.rows} row(s) × ${grid.cols} column(s); pattern pages are numbered 2 to ${plan.pageCount}`, 3.4, { bold: true }));
  const joinHow =
    grid.overlap > 0
      ? `Overlap neighbouring pages by ${Math.round(grid.overlap * 10) / 10} mm so that the half-filled circles lie exactly on top of each other.`
      : 'Trim each page on its frame where it meets a neighbour and butt the pages so the half circles join into whole ones.';
  fur.push(text({ x: x0, y: mapTop - 1.5 }, joinHow, 2.8));
  const box = { x: x0, y: mapTop + 3, width: W - 2 * x0, height: H - m - 18 - (mapTop + 3) };
  const contentW = grid.cols * grid.step.x + grid.overlap;
  const contentH = grid.rows * grid.step.y + grid.overlap;
  const s = Math.min(box.width / contentW, box.height / contentH);
  const map = (p: Point): Point => ({ x: box.x + p.x * s, y: box.y + p.y * s });
  const pageOf = new Map(plan.used.map((t, i) => [t.label, i + 2]));
  for (const t of grid.tiles) {
    const a = map({ x: t.area.x, y: t.area.y });
    const r: Rect = { x: a.x, y: a.y, width: t.area.width * s, height: t.area.height * s };
    const isUsed = pageOf.has(t.label);
    fur.push({ kind: 'path', role: isUsed ? 'map-tile' : 'map-empty', d: rectD(r), stroke: STYLE.map, ...(isUsed ? {} : { fill: GREY_FILL }) });
    const cs = Math.max(2.4, Math.min(6, r.width / 5));
    fur.push(text({ x: r.x + 1.5, y: r.y + cs + 1 }, isUsed ? `${t.label} · p${pageOf.get(t.label)}` : `${t.label} (left out)`, isUsed ? cs * 0.8 : cs * 0.6, { bold: isUsed, colour: isUsed ? INK : '#8a8178' }));
  }
  for (const poly of plan.polygons) fur.push({ kind: 'path', role: 'map-piece', d: polyD(poly.filter((_, i) => i % 4 === 0).map(map)), stroke: { width: 0.3, colour: '#2f5d8a' } });
  plan.layout.placements.forEach((pl) => {
    const c = map({ x: pl.box.x + pl.box.width / 2, y: pl.box.y + pl.box.height / 2 });
    fur.push(text(c, plan.pieces[pl.index]!.name, 2.6, { anchor: 'middle', colour: '#2f5d8a' }));
  });
  const emptyList = plan.empty.map((t) => t.label).join(', ');
  fur.push(text({ x: x0, y: H - m - 10 }, plan.empty.length ? `Left out, no pattern on them (greyed): ${emptyList}` : 'No page is left out.', 3));
  return { width: W, height: H, clip: { x: m, y: m, width: W - 2 * m, height: H - 2 * m }, content: undefined, view: undefined, furniture: fur };
}

/** One sheet with everything: header (title, squares, instruction, scale bar) above the pieces. */
export function sheetScene(plan: PrintPlan, words: SceneText): PageScene {
  let width: number;
  let height: number;
  let origin: Point;
  const m = plan.options.margin;
  if (plan.format === 'single') {
    ({ width, height } = plan.sheet);
    origin = plan.origin;
  } else {
    width = Math.max(plan.layout.width, 190) + 2 * m;
    height = plan.layout.height + SHEET_HEADER + 2 * m;
    origin = { x: m, y: m + SHEET_HEADER };
  }
  const x0 = m + 4;
  const sizes = [...new Set(plan.pieces.map((p) => sizeCaption(p)))].join('; ');
  const fur: Mark[] = [
    text({ x: x0, y: m + 9 }, words.title, 6, { bold: true }),
    text({ x: x0, y: m + 15 }, `${sizes} · ${words.date}${plan.format === 'single' ? ` · ${(plan as SinglePlan).paper.label}` : ''} · true scale, 1 unit = 1 mm`, 3),
    ...testSquares({ x: x0, y: m + 17 }),
    ...scaleBar({ x: x0 + 100, y: m + 40 }),
  ];
  return { width, height, clip: { x: m, y: m, width: width - 2 * m, height: height - 2 * m }, content: { a: 1, b: 0, c: 0, d: 1, e: origin.x, f: origin.y }, view: undefined, furniture: fur };
}
