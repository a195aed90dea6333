/**
 * The paper.js side of the pattern canvas: one PaperScope per canvas, items kept between
 * updates. `setPatterns` updates the existing items' path data when only shapes changed and
 * rebuilds when the set of pieces, outlines, lines or landmarks changed; pieces whose paths and
 * landmarks are unchanged are left alone. The faint reference lines go on their own canvas
 * (ReferenceDrawing) so a redraw of the bold pattern does not repaint them. Browser only.
 */
import paperCore from 'paper/dist/paper-core';
import {
  contourLength,
  contourLocationAtOffset,
  contourNearest,
  contourStretch,
  outlineContour,
  pathFromSvg,
  pathToSvg,
  segmentPoint,
  segmentTangent,
  vecNormalize,
  vecPerp,
  type Outline,
  type Pattern,
  type PatternLine,
  type Piece,
  type Point,
} from '../../../geometry/index.ts';
import { layoutPieces, type CanvasLayout } from './layout.ts';
import { ReferenceDrawing } from './reference-drawing.ts';
import { overlayStructure, pieceShapeChanged, pieceStructure, sameLayout } from './scene-diff.ts';
import { type ViewTransform, labelLines } from './view-math.ts';

type Scope = paper.PaperScope;
type Item = paper.Item;

/** Palette (src/styles.css @theme). */
export const INK = {
  ink900: '#1e2428',
  ink700: '#3a444b',
  ink500: '#646f77',
  calico50: '#fcfaf5',
  calico400: '#c5b697',
  denim600: '#2f4f75',
  denim700: '#243e5e',
  chalk600: '#b1532e',
  chalk700: '#8f4123',
  tape400: '#e2b144',
  sage700: '#3d6043',
} as const;

export type OverlayColour = 'ink' | 'denim' | 'chalk' | 'tape' | 'sage';
const OVERLAY_INK: Record<OverlayColour, string> = { ink: INK.ink900, denim: INK.denim600, chalk: INK.chalk600, tape: INK.tape400, sage: INK.sage700 };

/** Extra drawing in a piece's coordinates (mm). */
export type CanvasOverlay =
  | { kind: 'line'; piece: string; from: Point; to: Point; style?: { colour?: OverlayColour; dashed?: boolean; widthPx?: number } }
  | { kind: 'point'; piece: string; at: Point; label?: string; colour?: OverlayColour }
  | {
      kind: 'handle';
      id: string;
      piece: string;
      at: Point;
      /** Unit vector: a drag moves the handle along this direction only. */
      axis?: Point;
      /** Accessible name, also shown beside the handle. */
      label?: string;
    };

/** What to draw emphasised: a whole piece, one named edge of it, or one internal line. */
export type CanvasHighlight = { piece: string; edge?: string; line?: string };

/** Screen sizes (CSS px), kept constant while zooming. */
const LABEL_PX = { piece: 14, line: 10, point: 11 };
/** A piece's name shrinks to fit its piece down to this (CSS px). */
const LABEL_MIN_PX = 9;
const DOT_PX = 2.5;
const POINT_PX = 3.5;
export const HANDLE_PX = 7;
const DOUBLE_GAP_PX = 1.75;
/** Physical sizes (mm): marks on the pattern itself. */
const NOTCH_MM = 6;
const ARROW_MM = 10;

interface LineItems {
  line: PatternLine;
  main: paper.CompoundPath;
  /** The second stroke of a lengthen/shorten line. */
  twin?: paper.CompoundPath;
  arrows?: paper.Path;
  label: paper.PointText;
}

interface PieceItems {
  /** The piece last drawn: its unchanged paths are not set again. */
  piece: Piece;
  group: paper.Group;
  outlines: { outline: Outline; path: paper.CompoundPath; cut?: paper.CompoundPath; marks: Item[] }[];
  lines: LineItems[];
  label: paper.PointText;
}

function lineMidpoint(d: string): { point: Point; tangent: Point } | undefined {
  const c = pathFromSvg(d)[0];
  if (!c || c.segments.length === 0) return undefined;
  const loc = contourLocationAtOffset(c, contourLength(c) / 2);
  const seg = c.segments[loc.segmentIndex]!;
  return { point: segmentPoint(seg, loc.t), tangent: vecNormalize(segmentTangent(seg, loc.t)) };
}

function lineEnds(d: string): { start: Point; end: Point } | undefined {
  const c = pathFromSvg(d)[0];
  const first = c?.segments[0];
  const last = c?.segments[c.segments.length - 1];
  return first && last ? { start: first.from, end: last.to } : undefined;
}

/** Arrowheads at both ends of a grainline (common practice, no source), ARROW_MM long. */
function arrowData(d: string): string {
  const ends = lineEnds(d);
  if (!ends) return '';
  const dir = vecNormalize({ x: ends.end.x - ends.start.x, y: ends.end.y - ends.start.y });
  const n = vecPerp(dir);
  const head = (tip: Point, back: Point) => {
    const bx = tip.x + back.x * ARROW_MM;
    const by = tip.y + back.y * ARROW_MM;
    const w = ARROW_MM * 0.35;
    return `M ${bx + n.x * w} ${by + n.y * w} L ${tip.x} ${tip.y} L ${bx - n.x * w} ${by - n.y * w}`;
  };
  return `${head(ends.end, { x: -dir.x, y: -dir.y })} ${head(ends.start, dir)}`;
}

/** One overlay's items, kept while only positions and label texts change. */
interface OverlayItems {
  overlay: CanvasOverlay;
  item: paper.Path | paper.Shape;
  text?: paper.PointText;
}

export class PatternScene {
  readonly scope: Scope;
  private readonly patternLayer: paper.Layer;
  private readonly highlightLayer: paper.Layer;
  private readonly overlayLayer: paper.Layer;
  private readonly referenceDrawing = new ReferenceDrawing(INK.calico400, 1);
  private pieces = new Map<string, PieceItems>();
  private overlayItems: OverlayItems[] = [];
  private overlayKey = '';
  private key = '';
  /** Piece → its part of the structure key (pieces are not mutated: a changed piece is a new object). */
  private pieceKeys = new WeakMap<Piece, string>();
  /** Path data → number of contours, from the last structure key. */
  private contourCounts = new Map<string, number>();
  private layoutNames: string | undefined;
  private pattern: Pattern | undefined;
  private reference: Pattern | undefined;
  private highlight: CanvasHighlight | undefined;
  /** The piece the highlight was drawn from: a new piece object draws it again. */
  private highlighted: Piece | undefined;
  private overlays: readonly CanvasOverlay[] = [];
  private scale = 1;
  layout: CanvasLayout = { placements: new Map(), bounds: { minX: 0, minY: 0, maxX: 0, maxY: 0 } };
  /** How many times the items were rebuilt (not just updated): for checks and debugging. */
  rebuilds = 0;

  constructor(canvas: HTMLCanvasElement) {
    this.scope = new paperCore.PaperScope();
    this.scope.setup(canvas);
    this.scope.settings.insertItems = false;
    const layer = () => {
      const l = new this.scope.Layer();
      this.scope.project.addLayer(l);
      return l;
    };
    this.highlightLayer = layer();
    this.patternLayer = layer();
    this.overlayLayer = layer();
  }

  /** Make this canvas's scope the active one before creating items (paper.js inserts into the active project). */
  private activate(): void {
    this.scope.activate();
  }

  /** The canvas beneath this one where the reference's faint size lines are drawn (null: none). */
  attachReferenceCanvas(canvas: HTMLCanvasElement | null): void {
    this.referenceDrawing.attach(canvas);
  }

  /** Remove the project, its view (and the view's canvas listeners) and the scope itself. */
  destroy(): void {
    this.referenceDrawing.destroy();
    // PaperScope#remove (paper-core 0.12.20: clear() removes every project and its view, then the
    // scope leaves PaperScope._scopes) is missing from the bundled typings.
    (this.scope as Scope & { remove(): void }).remove();
  }

  setSize(width: number, height: number): void {
    this.activate();
    this.scope.view.viewSize = new this.scope.Size(Math.max(1, width), Math.max(1, height));
    this.referenceDrawing.setSize(width, height);
  }

  setView(t: ViewTransform): void {
    this.activate();
    this.scope.view.matrix = new this.scope.Matrix(t.scale, 0, 0, t.scale, t.tx, t.ty);
    this.referenceDrawing.setView(t);
    if (t.scale !== this.scale) {
      this.scale = t.scale;
      this.applyScreenSizes();
    }
  }

  /**
   * Draw `pattern` over `reference`. Updates path data in place unless the structure changed,
   * and only for the pieces whose paths or landmarks changed; the same reference object is not
   * drawn again.
   */
  setPatterns(pattern: Pattern, reference: Pattern | undefined): void {
    this.activate();
    const referenceChanged = reference !== this.reference;
    this.pattern = pattern;
    this.reference = reference;
    const layoutChanged = this.updateLayout(pattern, reference, referenceChanged);
    const key = this.structureKey(pattern);
    let changed: ReadonlySet<string> | 'all';
    if (key !== this.key) {
      this.key = key;
      this.buildPattern(pattern);
      this.rebuilds++;
      changed = 'all';
    } else {
      changed = this.updatePattern(pattern);
    }
    this.referenceDrawing.setReference(reference, this.layout, referenceChanged);
    if (layoutChanged) this.placeGroups();
    const h = this.highlight;
    if (layoutChanged || (h && pattern.pieces.find((p) => p.name === h.piece) !== this.highlighted)) this.drawHighlight();
    if (layoutChanged) {
      this.drawOverlays();
      this.sizeOverlays();
    }
    for (const piece of pattern.pieces) {
      if (changed !== 'all' && !changed.has(piece.name)) continue;
      const items = this.pieces.get(piece.name);
      if (items) this.placeLabels(piece, items);
    }
  }

  setHighlight(h: CanvasHighlight | undefined): void {
    this.activate();
    this.highlight = h;
    this.drawHighlight();
  }

  setOverlays(overlays: readonly CanvasOverlay[]): void {
    this.activate();
    this.overlays = overlays;
    const key = overlayStructure(overlays);
    if (key === this.overlayKey) {
      this.moveOverlays();
    } else {
      this.drawOverlays();
    }
    this.sizeOverlays();
  }

  /** Lay the pieces out again unless nothing the layout depends on changed; true when it moved anything. */
  private updateLayout(pattern: Pattern, reference: Pattern | undefined, referenceChanged: boolean): boolean {
    const names = pattern.pieces.map((p) => p.name).join('\u0000');
    // Sizes come from the reference for every piece it has: the same reference and the same
    // pieces give the same layout, however the altered outlines moved.
    const fromReference = reference !== undefined && pattern.pieces.every((p) => reference.pieces.some((r) => r.name === p.name));
    if (!referenceChanged && fromReference && names === this.layoutNames) return false;
    this.layoutNames = names;
    const next = layoutPieces(pattern, reference);
    if (sameLayout(this.layout, next)) return false;
    this.layout = next;
    return true;
  }

  private structureKey(pattern: Pattern): string {
    const previous = this.contourCounts;
    const counts = new Map<string, number>();
    const contours = (d: string) => {
      let n = counts.get(d) ?? previous.get(d);
      if (n === undefined) n = pathFromSvg(d).length;
      counts.set(d, n);
      return n;
    };
    const parts = pattern.pieces.map((piece) => {
      let k = this.pieceKeys.get(piece);
      if (k === undefined) {
        k = JSON.stringify(pieceStructure(piece, contours));
        this.pieceKeys.set(piece, k);
      }
      return k;
    });
    if (counts.size > 0) this.contourCounts = counts;
    return parts.join('\n');
  }

  private placeGroups(): void {
    for (const [name, items] of this.pieces) {
      const at = this.layout.placements.get(name);
      items.group.matrix = new this.scope.Matrix(1, 0, 0, 1, at?.dx ?? 0, at?.dy ?? 0);
    }
  }

  private newGroup(layer: paper.Layer): paper.Group {
    const group = new this.scope.Group();
    group.applyMatrix = false;
    layer.addChild(group);
    return group;
  }

  private compound(d: string, style: Partial<paper.Style>): paper.CompoundPath {
    const c = new this.scope.CompoundPath(d);
    c.strokeScaling = false;
    Object.assign(c, style);
    return c;
  }

  private label(text: string, px: number, colour: string, weight: string | number = 'normal'): paper.PointText {
    const t = new this.scope.PointText({ content: text, fillColor: colour, fontFamily: 'Figtree Variable, ui-sans-serif, sans-serif', fontWeight: weight, justification: 'center' });
    t.data = { px };
    return t;
  }

  private buildPattern(pattern: Pattern): void {
    this.patternLayer.removeChildren();
    this.pieces.clear();
    for (const piece of pattern.pieces) {
      const group = this.newGroup(this.patternLayer);
      const single = piece.outlines.length === 1;
      const outlines = piece.outlines.map((outline) => {
        const cut = outline.cut !== undefined ? this.compound(outline.cut, { strokeColor: new this.scope.Color(INK.ink700), strokeWidth: 1 }) : undefined;
        const path = this.compound(outline.d, {
          strokeColor: new this.scope.Color(single ? INK.ink900 : INK.ink700),
          strokeWidth: single ? 2 : 1,
          ...(single ? { fillColor: new this.scope.Color(1, 1, 1, 0.35) } : {}),
        });
        if (cut) group.addChild(cut);
        group.addChild(path);
        const marks = outline.points.map((lm) => {
          const item: Item =
            lm.kind === 'notch'
              ? Object.assign(new this.scope.Path(), { strokeColor: new this.scope.Color(INK.chalk700), strokeWidth: 1.5, strokeScaling: false })
              : Object.assign(new this.scope.Shape.Circle(new this.scope.Point(0, 0), 1), {
                  fillColor: new this.scope.Color(lm.kind === 'corner' ? INK.ink700 : INK.chalk600),
                });
          item.data = { landmark: lm.name, px: DOT_PX };
          group.addChild(item);
          return item;
        });
        return { outline, path, ...(cut ? { cut } : {}), marks };
      });
      const lines = piece.lines.map((line) => this.buildLine(group, line));
      const label = this.label(piece.name, LABEL_PX.piece, INK.ink900, 600);
      group.addChild(label);
      // the paths hold the piece's data already; placeLabels sets the lengthen lines' two strokes
      this.pieces.set(piece.name, { piece, group, outlines, lines, label });
      const at = this.layout.placements.get(piece.name);
      group.matrix = new this.scope.Matrix(1, 0, 0, 1, at?.dx ?? 0, at?.dy ?? 0);
    }
  }

  private buildLine(group: paper.Group, line: PatternLine): LineItems {
    const colour = (hex: string) => new this.scope.Color(hex);
    let main: paper.CompoundPath;
    let twin: paper.CompoundPath | undefined;
    let arrows: paper.Path | undefined;
    switch (line.role) {
      case 'grain':
        main = this.compound(line.d, { strokeColor: colour(INK.denim700), strokeWidth: 1.25 });
        arrows = Object.assign(new this.scope.Path(), { strokeColor: colour(INK.denim700), strokeWidth: 1.25, strokeScaling: false });
        arrows.pathData = arrowData(line.d);
        break;
      case 'lengthen':
        main = this.compound(line.d, { strokeColor: colour(INK.chalk600), strokeWidth: 1 });
        twin = this.compound(line.d, { strokeColor: colour(INK.chalk600), strokeWidth: 1 });
        break;
      case 'level':
        main = this.compound(line.d, { strokeColor: colour(INK.ink500), strokeWidth: 1, dashArray: [6, 4] });
        break;
      case 'fold':
        main = this.compound(line.d, { strokeColor: colour(INK.denim600), strokeWidth: 1.5, dashArray: [12, 3, 2, 3] });
        break;
      default:
        main = this.compound(line.d, { strokeColor: colour(INK.ink500), strokeWidth: 1 });
    }
    const label = this.label(line.name, LABEL_PX.line, line.role === 'lengthen' ? INK.chalk700 : INK.ink700);
    for (const item of [main, twin, arrows, label]) if (item) group.addChild(item);
    return { line, main, ...(twin ? { twin } : {}), ...(arrows ? { arrows } : {}), label };
  }

  /** Set the paths that changed; the names of the pieces that drew differently. */
  private updatePattern(pattern: Pattern): Set<string> {
    const changed = new Set<string>();
    for (const piece of pattern.pieces) {
      const items = this.pieces.get(piece.name);
      if (!items) continue;
      const before = items.piece;
      items.piece = piece;
      const moved = pieceShapeChanged(before, piece);
      if (moved) changed.add(piece.name);
      piece.outlines.forEach((outline, i) => {
        const o = items.outlines[i];
        if (!o) return;
        const was = o.outline;
        o.outline = outline;
        if (!moved) return;
        // Setting path data rebuilds the compound path's children: only when it differs.
        if (outline.d !== was.d) o.path.pathData = outline.d;
        if (o.cut && outline.cut !== undefined && outline.cut !== was.cut) o.cut.pathData = outline.cut;
      });
      piece.lines.forEach((line, i) => {
        const l = items.lines[i];
        if (!l) return;
        const was = l.line;
        l.line = line;
        if (!moved || line.d === was.d) return;
        // a lengthen/shorten line's two strokes are set beside it by placeLabels
        if (!l.twin) l.main.pathData = line.d;
        if (l.arrows) l.arrows.pathData = arrowData(line.d);
      });
    }
    return changed;
  }

  /** Positions that depend on the pattern and the zoom: labels, marks, the lengthen line's twin. */
  private placeLabels(piece: Piece, items: PieceItems): void {
    const mm = (px: number) => px / this.scale;
    const setPoint = (t: paper.PointText, x: number, y: number) => {
      const p = t.point;
      if (p.x !== x || p.y !== y) t.point = new this.scope.Point(x, y);
    };
    const setFontSize = (t: paper.PointText, size: number) => {
      if (t.fontSize !== size) t.fontSize = size;
    };
    for (const o of items.outlines) {
      const contour = o.outline.points.some((lm) => lm.kind === 'notch') ? outlineContour(o.outline) : undefined;
      o.outline.points.forEach((lm, i) => {
        const item = o.marks[i];
        if (!item) return;
        if (item instanceof this.scope.Path) {
          if (!contour) return;
          const near = contourNearest(contour, lm);
          const seg = contour.segments[near.segmentIndex]!;
          const n = vecPerp(vecNormalize(segmentTangent(seg, near.t)));
          const h = NOTCH_MM / 2;
          item.pathData = `M ${lm.x - n.x * h} ${lm.y - n.y * h} L ${lm.x + n.x * h} ${lm.y + n.y * h}`;
        } else if (item instanceof this.scope.Shape) {
          const at = item.position;
          if (at.x !== lm.x || at.y !== lm.y) item.position = new this.scope.Point(lm.x, lm.y);
          if (item.radius !== mm(DOT_PX)) item.radius = mm(DOT_PX);
        }
      });
    }
    for (const l of items.lines) {
      const mid = lineMidpoint(l.line.d);
      if (mid) {
        const n = vecPerp(mid.tangent);
        setFontSize(l.label, mm(LABEL_PX.line));
        // beside the line, on the side away from the piece label above it
        setPoint(l.label, mid.point.x - n.x * mm(6), mid.point.y - n.y * mm(6) + mm(LABEL_PX.line) / 3);
        if (l.twin) {
          l.main.pathData = l.line.d;
          l.main.translate(new this.scope.Point(n.x * mm(DOUBLE_GAP_PX), n.y * mm(DOUBLE_GAP_PX)));
          l.twin.pathData = l.line.d;
          l.twin.translate(new this.scope.Point(-n.x * mm(DOUBLE_GAP_PX), -n.y * mm(DOUBLE_GAP_PX)));
        }
      }
    }
    const b = this.layout.placements.get(piece.name)?.bounds;
    const first = items.outlines[0];
    const fb = first ? first.path.bounds : undefined;
    // the piece's name over its middle; wider than the piece, it takes two lines, then a smaller
    // size (not below LABEL_MIN_PX), so a small piece's name does not run over its neighbour
    const label = items.label;
    const full = mm(LABEL_PX.piece);
    setFontSize(label, full);
    if (label.content !== piece.name) label.content = piece.name;
    const room = fb ? fb.width * 0.9 : Infinity;
    if (label.bounds.width > room) {
      const lines = labelLines(piece.name);
      if (lines) label.content = lines.join('\n');
      const wide = label.bounds.width;
      if (wide > room) setFontSize(label, Math.max(mm(LABEL_MIN_PX), (full * room) / wide));
    }
    // the point is the first line's baseline: lift by half a second line (line spacing 1.2 × size)
    const leading = Number(label.fontSize) * 1.2;
    if (label.leading !== leading) label.leading = leading;
    const lift = label.content.includes('\n') ? leading / 2 : 0;
    if (fb) setPoint(label, fb.center.x, fb.center.y - lift);
    else if (b) setPoint(label, (b.minX + b.maxX) / 2, (b.minY + b.maxY) / 2 - lift);
  }

  private applyScreenSizes(): void {
    if (this.pattern) {
      for (const piece of this.pattern.pieces) {
        const items = this.pieces.get(piece.name);
        if (items) this.placeLabels(piece, items);
      }
    }
    this.sizeOverlays();
  }

  private drawHighlight(): void {
    this.highlightLayer.removeChildren();
    const h = this.highlight;
    const piece = h && this.pattern?.pieces.find((p) => p.name === h.piece);
    this.highlighted = piece;
    const at = piece && this.layout.placements.get(piece.name);
    if (!h || !piece || !at) return;
    const group = this.newGroup(this.highlightLayer);
    group.matrix = new this.scope.Matrix(1, 0, 0, 1, at.dx, at.dy);
    const mark = (d: string) => group.addChild(this.compound(d, { strokeColor: new this.scope.Color(INK.tape400), strokeWidth: 7, strokeCap: 'round', strokeJoin: 'round' }));
    if (h.line !== undefined) {
      for (const line of piece.lines) if (line.name === h.line) mark(line.d);
    } else if (h.edge !== undefined) {
      const edge = piece.edges.find((e) => e.name === h.edge || e.role === h.edge);
      if (!edge) return;
      for (const outline of piece.outlines) {
        const from = outline.points.find((p) => p.name === edge.from);
        const to = outline.points.find((p) => p.name === edge.to);
        if (!from || !to) continue;
        const c = outlineContour(outline);
        mark(pathToSvg([contourStretch(c, contourNearest(c, from), contourNearest(c, to))]));
      }
    } else {
      for (const outline of piece.outlines) mark(outline.d);
    }
  }

  /** Build the overlay items afresh. */
  private drawOverlays(): void {
    this.overlayLayer.removeChildren();
    this.overlayItems = [];
    this.overlayKey = overlayStructure(this.overlays);
    for (const o of this.overlays) {
      if (o.kind === 'line') {
        const path = new this.scope.Path.Line(new this.scope.Point(0, 0), new this.scope.Point(0, 0));
        Object.assign(path, {
          strokeColor: new this.scope.Color(OVERLAY_INK[o.style?.colour ?? 'chalk']),
          strokeWidth: o.style?.widthPx ?? 1.5,
          strokeScaling: false,
          ...(o.style?.dashed ? { dashArray: [5, 4] } : {}),
        });
        this.overlayLayer.addChild(path);
        this.overlayItems.push({ overlay: o, item: path });
        continue;
      }
      const handle = o.kind === 'handle';
      const dot = new this.scope.Shape.Circle(new this.scope.Point(0, 0), 1);
      Object.assign(dot, handle
        ? { fillColor: new this.scope.Color(INK.calico50), strokeColor: new this.scope.Color(INK.denim600), strokeWidth: 2, strokeScaling: false }
        : { fillColor: new this.scope.Color(OVERLAY_INK[o.colour ?? 'denim']) });
      dot.data = { px: handle ? HANDLE_PX : POINT_PX };
      this.overlayLayer.addChild(dot);
      const text = o.label;
      let t: paper.PointText | undefined;
      if (text) {
        t = this.label(text, LABEL_PX.point, INK.ink900, 600);
        t.justification = 'left';
        t.data = { px: LABEL_PX.point, anchor: { x: 0, y: 0 } };
        this.overlayLayer.addChild(t);
      }
      this.overlayItems.push({ overlay: o, item: dot, ...(t ? { text: t } : {}) });
    }
    this.moveOverlays(true);
  }

  /** Put the overlay items where the current overlays (same structure) say, with their label texts. */
  private moveOverlays(all = false): void {
    this.overlays.forEach((o, i) => {
      const items = this.overlayItems[i];
      if (!items) return;
      const was = items.overlay;
      items.overlay = o;
      if (!all && was === o) return;
      const at = this.layout.placements.get(o.piece);
      const visible = at !== undefined;
      items.item.visible = visible;
      if (items.text) items.text.visible = visible;
      if (!at) return;
      if (o.kind === 'line') {
        if (items.item instanceof this.scope.Path) {
          items.item.pathData = `M ${o.from.x + at.dx} ${o.from.y + at.dy} L ${o.to.x + at.dx} ${o.to.y + at.dy}`;
        }
        return;
      }
      const centre = { x: o.at.x + at.dx, y: o.at.y + at.dy };
      const p = items.item.position;
      if (p.x !== centre.x || p.y !== centre.y) items.item.position = new this.scope.Point(centre.x, centre.y);
      const t = items.text;
      if (t) {
        if (o.label && t.content !== o.label) t.content = o.label;
        t.data = { px: LABEL_PX.point, anchor: centre };
        this.sizeOverlayText(t);
      }
    });
  }

  private sizeOverlayText(t: paper.PointText): void {
    const { px, anchor } = t.data as { px: number; anchor: Point };
    if (t.fontSize !== px / this.scale) t.fontSize = px / this.scale;
    const x = anchor.x + 8 / this.scale;
    const y = anchor.y - 6 / this.scale;
    const p = t.point;
    if (p.x !== x || p.y !== y) t.point = new this.scope.Point(x, y);
  }

  /** Screen sizes of the overlay items (constant while zooming). */
  private sizeOverlays(): void {
    for (const { item, text } of this.overlayItems) {
      const px = (item.data as { px?: number } | undefined)?.px;
      if (px !== undefined && item instanceof this.scope.Shape && item.radius !== px / this.scale) item.radius = px / this.scale;
      if (text) this.sizeOverlayText(text);
    }
  }
}
