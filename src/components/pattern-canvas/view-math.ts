/**
 * The canvas view as plain numbers: screen px = world mm × scale + (tx, ty). World millimetres
 * are the pieces' own coordinates plus their layout offset. Pure, for the canvas and its tests.
 */
import type { Point } from '../../../geometry/index.ts';
import type { Bounds, PieceOffset } from './layout.ts';

export interface ViewTransform {
  /** CSS px per mm. */
  scale: number;
  tx: number;
  ty: number;
}

export interface ViewportSize {
  width: number;
  height: number;
}

/** Zoom limits (CSS px per mm): 0.02 shows 50 m across 1000 px; 60 shows a 1/16 in as 95 px. */
export const MIN_SCALE = 0.02;
export const MAX_SCALE = 60;

const clampScale = (s: number) => Math.min(MAX_SCALE, Math.max(MIN_SCALE, s));

export function worldToScreen(t: ViewTransform, p: Point): Point {
  return { x: p.x * t.scale + t.tx, y: p.y * t.scale + t.ty };
}

export function screenToWorld(t: ViewTransform, p: Point): Point {
  return { x: (p.x - t.tx) / t.scale, y: (p.y - t.ty) / t.scale };
}

export function pieceToWorld(offset: PieceOffset, p: Point): Point {
  return { x: p.x + offset.dx, y: p.y + offset.dy };
}

export function worldToPiece(offset: PieceOffset, p: Point): Point {
  return { x: p.x - offset.dx, y: p.y - offset.dy };
}

/** Everything in `bounds` visible and centred, `padding` px from the edges. An empty box is centred at the default scale 1. */
export function fitTransform(bounds: Bounds, size: ViewportSize, padding = 24): ViewTransform {
  const w = bounds.maxX - bounds.minX;
  const h = bounds.maxY - bounds.minY;
  const availW = Math.max(1, size.width - 2 * padding);
  const availH = Math.max(1, size.height - 2 * padding);
  const scale = w <= 0 && h <= 0 ? 1 : clampScale(Math.min(w > 0 ? availW / w : Infinity, h > 0 ? availH / h : Infinity));
  return centredTransform(scale, { x: (bounds.minX + bounds.maxX) / 2, y: (bounds.minY + bounds.maxY) / 2 }, size);
}

/** `scale` px per mm with the world point `centre` at the middle of the viewport. */
export function centredTransform(scale: number, centre: Point, size: ViewportSize): ViewTransform {
  const s = clampScale(scale);
  return { scale: s, tx: size.width / 2 - centre.x * s, ty: size.height / 2 - centre.y * s };
}

/** The world point at the middle of the viewport. */
export function viewCentre(t: ViewTransform, size: ViewportSize): Point {
  return screenToWorld(t, { x: size.width / 2, y: size.height / 2 });
}

/** Zoom by `factor` keeping the world point under `anchor` (screen px) where it is. */
export function zoomAbout(t: ViewTransform, factor: number, anchor: Point): ViewTransform {
  const scale = clampScale(t.scale * factor);
  const w = screenToWorld(t, anchor);
  return { scale, tx: anchor.x - w.x * scale, ty: anchor.y - w.y * scale };
}

export function panBy(t: ViewTransform, dx: number, dy: number): ViewTransform {
  return { scale: t.scale, tx: t.tx + dx, ty: t.ty + dy };
}

/** Wheel delta (px, or lines × 16) to a zoom factor: 100 px of wheel ≈ ×1.16 (e^0.15). */
export function wheelZoomFactor(deltaY: number): number {
  return Math.exp(-deltaY * 0.0015);
}

/**
 * The point of a drag constrained to the line through `origin` along `axis` (normalised here;
 * a zero axis leaves the point free).
 */
export function constrainAlong(origin: Point, axis: Point | undefined, p: Point): Point {
  if (!axis) return p;
  const len = Math.hypot(axis.x, axis.y);
  if (!(len > 0)) return p;
  const ux = axis.x / len;
  const uy = axis.y / len;
  const k = (p.x - origin.x) * ux + (p.y - origin.y) * uy;
  return { x: origin.x + k * ux, y: origin.y + k * uy };
}

/**
 * A label on two lines, split at the space nearest its middle ("front pocket bag" → "front",
 * "pocket bag"); undefined when it has no space to split at.
 */
export function labelLines(text: string): [string, string] | undefined {
  const middle = text.length / 2;
  let best = -1;
  for (let i = text.indexOf(' '); i !== -1; i = text.indexOf(' ', i + 1)) if (best === -1 || Math.abs(i - middle) < Math.abs(best - middle)) best = i;
  return best === -1 ? undefined : [text.slice(0, best).trimEnd(), text.slice(best + 1).trimStart()];
}
