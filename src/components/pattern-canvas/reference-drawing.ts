/**
 * The faint reference size lines on their own plain 2D canvas beneath the paper.js one. They
 * change only when the reference, the layout, the view or the canvas size does, so dragging an
 * amount (which redraws the bold pattern on every animation frame) no longer repaints them:
 * the browser composites this canvas as it is. Browser only.
 */
import type { Pattern } from '../../../geometry/index.ts';
import type { CanvasLayout } from './layout.ts';
import type { ViewTransform } from './view-math.ts';

export class ReferenceDrawing {
  private ctx: CanvasRenderingContext2D | null = null;
  private canvas: HTMLCanvasElement | null = null;
  /** Piece name → its size lines, parsed once per reference. */
  private paths = new Map<string, Path2D[]>();
  private layout: CanvasLayout | undefined;
  private view: ViewTransform | undefined;
  private width = 0;
  private height = 0;
  private frame = 0;

  constructor(
    private readonly colour: string,
    /** Stroke width in CSS px at every zoom. */
    private readonly widthPx: number,
  ) {}

  /** Draw into `canvas` from now on (null: draw nowhere). */
  attach(canvas: HTMLCanvasElement | null): void {
    if (canvas === this.canvas) return;
    this.canvas = canvas;
    this.ctx = canvas?.getContext('2d') ?? null;
    this.resizeCanvas();
    this.drawNow();
  }

  setSize(width: number, height: number): void {
    if (width === this.width && height === this.height) return;
    this.width = width;
    this.height = height;
    // Resizing clears the canvas: draw again at once rather than show a blank frame.
    this.resizeCanvas();
    this.drawNow();
  }

  setView(view: ViewTransform): void {
    const v = this.view;
    if (v && v.scale === view.scale && v.tx === view.tx && v.ty === view.ty) return;
    this.view = view;
    this.requestDraw();
  }

  /** The size lines of `reference` placed by `layout`; the same objects again change nothing. */
  setReference(reference: Pattern | undefined, layout: CanvasLayout, referenceChanged: boolean): void {
    if (!referenceChanged && layout === this.layout) return;
    if (referenceChanged) {
      this.paths = new Map((reference?.pieces ?? []).map((piece) => [piece.name, piece.outlines.map((o) => new Path2D(o.d))]));
    }
    this.layout = layout;
    this.requestDraw();
  }

  destroy(): void {
    if (this.frame) cancelAnimationFrame(this.frame);
    this.frame = 0;
    this.canvas = null;
    this.ctx = null;
  }

  private resizeCanvas(): void {
    const canvas = this.canvas;
    if (!canvas) return;
    // Like paper.js on the canvas above: a backing store of CSS size × device pixel ratio.
    const ratio = window.devicePixelRatio || 1;
    canvas.width = Math.max(1, Math.round(this.width * ratio));
    canvas.height = Math.max(1, Math.round(this.height * ratio));
    canvas.style.width = `${this.width}px`;
    canvas.style.height = `${this.height}px`;
  }

  /** On the next animation frame, when paper.js draws its own changes too (so both move together). */
  private requestDraw(): void {
    if (this.frame || !this.ctx) return;
    this.frame = requestAnimationFrame(() => {
      this.frame = 0;
      this.drawNow();
    });
  }

  private drawNow(): void {
    if (this.frame) cancelAnimationFrame(this.frame);
    this.frame = 0;
    const ctx = this.ctx;
    const canvas = this.canvas;
    if (!ctx || !canvas) return;
    ctx.setTransform(1, 0, 0, 1, 0, 0);
    ctx.clearRect(0, 0, canvas.width, canvas.height);
    const view = this.view;
    const layout = this.layout;
    if (!view || !layout || !(view.scale > 0)) return;
    const ratio = canvas.width / Math.max(1, this.width);
    const m = ratio * view.scale;
    ctx.strokeStyle = this.colour;
    ctx.lineWidth = this.widthPx / view.scale;
    for (const [name, paths] of this.paths) {
      const at = layout.placements.get(name);
      ctx.setTransform(m, 0, 0, m, ratio * (view.tx + (at?.dx ?? 0) * view.scale), ratio * (view.ty + (at?.dy ?? 0) * view.scale));
      for (const p of paths) ctx.stroke(p);
    }
  }
}
