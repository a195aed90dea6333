import { useEffect, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import type { Pattern, Point } from '../../../geometry/index.ts';
import { cx } from '../../lib/cx';
import type { Bounds, CanvasLayout } from './layout.ts';
import { pickAt, type CanvasPick } from './pick.ts';
import { HANDLE_PX, PatternScene, type CanvasHighlight, type CanvasOverlay } from './scene.ts';
import {
  centredTransform,
  constrainAlong,
  fitTransform,
  panBy,
  pieceToWorld,
  screenToWorld,
  viewCentre,
  wheelZoomFactor,
  worldToPiece,
  worldToScreen,
  zoomAbout,
  type ViewTransform,
  type ViewportSize,
} from './view-math.ts';

/**
 * How the canvas frames the drawing.
 * - `fit`: every piece visible (refitted when the canvas or the layout's bounds change).
 * - `scale`: `pxPerMm` CSS px per mm, i.e. calibrated px per mm × zoom (1 × calibration =
 *   true scale); `centre` is the canvas point (mm, layout coordinates) in the middle, kept
 *   where it was when absent.
 */
export type CanvasView = { mode: 'fit' } | { mode: 'scale'; pxPerMm: number; centre?: Point };

export type HandleDragPhase = 'start' | 'move' | 'end';

export interface PatternCanvasProps {
  /**
   * The altered pattern, drawn bold: each piece's outlines (one after a blend, else every size
   * line thin in one ink), the cut line outside it when present, internal lines (grainline as
   * an arrow, lengthen/shorten as a double line, level lines dashed, fold long-dashed, each
   * named), landmarks (notches as short ticks across the outline) and the piece's name.
   * A new object redraws by updating the existing items' path data; the items are rebuilt only
   * when the pieces, outlines, landmarks or lines themselves change.
   */
  pattern: Pattern;
  /** The original size lines, drawn faint beneath. Pieces are laid out from it when given. */
  reference?: Pattern;
  /** How to frame the drawing; see CanvasView. */
  view: CanvasView;
  /** Called after the user zooms (wheel, +/−), pans (drag, arrow keys) or asks for fit (0). */
  onViewChange?: (view: CanvasView) => void;
  /** A click (no drag) on the drawing: the point in the piece's own mm, and what is near it. */
  onPick?: (pick: CanvasPick) => void;
  /** Extra drawing in piece coordinates: lines, points, draggable handles. Redrawn when the array changes: memoise it. */
  overlays?: readonly CanvasOverlay[];
  /**
   * A handle is dragged (pointer, or arrow keys on its button: 1 mm, Shift 10 mm): the handle's
   * point in its piece's mm, constrained along its `axis` when it has one.
   */
  onHandleDrag?: (id: string, point: Point, phase: HandleDragPhase) => void;
  /** A piece, one of its edges (name or role) or one of its lines, drawn emphasised. */
  highlight?: CanvasHighlight;
  /** Pick radius in screen px (default 6). */
  pickTolerancePx?: number;
  /** The canvas's accessible name. */
  label?: string;
  /** Classes for the frame; give it a height (default h-96). */
  className?: string;
}

const CLICK_SLOP_PX = 3;
const KEY_PAN_PX = 48;
const KEY_ZOOM = 1.25;

type Drag =
  | { kind: 'pan'; pointerId: number; start: Point; startT: ViewTransform; moved: boolean }
  | { kind: 'handle'; pointerId: number; id: string; piece: string; origin: Point; axis?: Point; grab: Point; last: Point };

function sameTransform(a: ViewTransform | null, b: ViewTransform): boolean {
  return !!a && Math.abs(a.scale - b.scale) < 1e-12 && Math.abs(a.tx - b.tx) < 1e-6 && Math.abs(a.ty - b.ty) < 1e-6;
}

const EMPTY_BOUNDS: Bounds = { minX: 0, minY: 0, maxX: 0, maxY: 0 };

const boundsKey = (b: Bounds) => `${b.minX.toFixed(1)},${b.minY.toFixed(1)},${b.maxX.toFixed(1)},${b.maxY.toFixed(1)}`;

/**
 * The drawing core shared by the pattern screens: paper.js on a canvas, one PaperScope per
 * instance (never the global one), torn down on unmount. Import it only from lazily loaded
 * routes: paper.js and geometry/ must stay out of the sign-in bundle.
 */
export function PatternCanvas({
  pattern,
  reference,
  view,
  onViewChange,
  onPick,
  overlays,
  onHandleDrag,
  highlight,
  pickTolerancePx = 6,
  label = 'Pattern pieces',
  className,
}: PatternCanvasProps) {
  const frameRef = useRef<HTMLDivElement>(null);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const referenceCanvasRef = useRef<HTMLCanvasElement>(null);
  /** The canvas's client rect while a pointer is pressed (read once, not on every move). */
  const rectRef = useRef<DOMRect | null>(null);
  const sceneRef = useRef<PatternScene | null>(null);
  const dragRef = useRef<Drag | null>(null);
  const spaceRef = useRef(false);
  const [size, setSize] = useState<ViewportSize>({ width: 0, height: 0 });
  const [layout, setLayout] = useState<CanvasLayout | null>(null);
  const bounds = layout?.bounds ?? EMPTY_BOUNDS;

  // The view prop, compared by value (so echoing onViewChange back is harmless), is turned
  // into a transform while rendering; the user's zooming and panning replace it until the
  // prop, the canvas size or (in fit mode) the layout's bounds change.
  const viewKey = view.mode === 'fit' ? 'fit' : `${view.pxPerMm}|${view.centre ? `${view.centre.x},${view.centre.y}` : ''}`;
  const key = `${viewKey}|${view.mode === 'fit' ? boundsKey(bounds) : ''}|${size.width}x${size.height}`;
  const [viewState, setViewState] = useState<{ key: string; transform: ViewTransform | null }>({ key: '', transform: null });
  let transform = viewState.transform;
  if (size.width > 0 && size.height > 0 && viewState.key !== key) {
    const current = viewState.transform;
    if (view.mode === 'fit') transform = fitTransform(bounds, size);
    else if (view.centre) transform = centredTransform(view.pxPerMm, view.centre, size);
    // no centre: zoom about the middle of the canvas; a resize keeps the top-left corner
    else if (current) transform = zoomAbout(current, view.pxPerMm / current.scale, { x: size.width / 2, y: size.height / 2 });
    else transform = centredTransform(view.pxPerMm, { x: (bounds.minX + bounds.maxX) / 2, y: (bounds.minY + bounds.maxY) / 2 }, size);
    if (current && sameTransform(current, transform)) transform = current;
    setViewState({ key, transform });
  }
  const setTransform = (next: ViewTransform) => setViewState((s) => ({ key: s.key, transform: next }));

  // Latest props for event handlers, so changing a callback never touches the paper scene.
  const latest = useRef({ pattern, onViewChange, onPick, onHandleDrag, overlays, pickTolerancePx, transform, size });
  useEffect(() => {
    latest.current = { pattern, onViewChange, onPick, onHandleDrag, overlays, pickTolerancePx, transform, size };
  });

  // One scene per mounted canvas.
  useEffect(() => {
    const canvas = canvasRef.current;
    const frame = frameRef.current;
    if (!canvas || !frame) return;
    const scene = new PatternScene(canvas);
    sceneRef.current = scene;
    const observer = new ResizeObserver(([entry]) => {
      rectRef.current = null;
      if (!entry) return;
      const { width, height } = entry.contentRect;
      scene.setSize(width, height);
      setSize((s) => (s.width === width && s.height === height ? s : { width, height }));
    });
    observer.observe(frame);
    return () => {
      observer.disconnect();
      scene.destroy();
      sceneRef.current = null;
    };
  }, []);

  // The faint reference lines have a canvas of their own beneath, present while there is a reference.
  const hasReference = reference !== undefined;
  useEffect(() => {
    sceneRef.current?.attachReferenceCanvas(hasReference ? referenceCanvasRef.current : null);
  }, [hasReference]);

  // A scroll moves the canvas under a pressed pointer: read its rect again.
  useEffect(() => {
    const forget = () => {
      rectRef.current = null;
    };
    window.addEventListener('scroll', forget, { capture: true, passive: true });
    return () => window.removeEventListener('scroll', forget, { capture: true });
  }, []);

  // Shapes: update in place (every animation frame while a handle is dragged).
  useEffect(() => {
    const scene = sceneRef.current;
    if (!scene) return;
    scene.setPatterns(pattern, reference);
    setLayout(scene.layout);
  }, [pattern, reference]);

  useEffect(() => {
    sceneRef.current?.setOverlays(overlays ?? []);
  }, [overlays]);

  // By value: an inline `highlight={{ piece: 'front' }}` does not redraw on every render.
  const highlightPiece = highlight?.piece;
  const highlightEdge = highlight?.edge;
  const highlightLine = highlight?.line;
  useEffect(() => {
    sceneRef.current?.setHighlight(
      highlightPiece === undefined
        ? undefined
        : { piece: highlightPiece, ...(highlightEdge !== undefined ? { edge: highlightEdge } : {}), ...(highlightLine !== undefined ? { line: highlightLine } : {}) },
    );
  }, [highlightPiece, highlightEdge, highlightLine]);

  useEffect(() => {
    if (transform) sceneRef.current?.setView(transform);
  }, [transform]);

  // Wheel zoom about the pointer (a native listener: React's wheel listener is passive).
  useEffect(() => {
    const frame = frameRef.current;
    if (!frame) return;
    const onWheel = (e: WheelEvent) => {
      const t = latest.current.transform;
      if (!t) return;
      e.preventDefault();
      const rect = (canvasRef.current ?? frame).getBoundingClientRect();
      const delta = e.deltaMode === 1 ? e.deltaY * 16 : e.deltaY;
      const next = zoomAbout(t, wheelZoomFactor(delta), { x: e.clientX - rect.left, y: e.clientY - rect.top });
      latest.current.transform = next;
      setTransform(next);
      latest.current.onViewChange?.({ mode: 'scale', pxPerMm: next.scale, centre: viewCentre(next, latest.current.size) });
    };
    frame.addEventListener('wheel', onWheel, { passive: false });
    return () => frame.removeEventListener('wheel', onWheel);
  }, []);

  // Relative to the canvas (inside the frame's border), where the view transform starts. While a
  // pointer is pressed the rect read at the press is used: a layout read on every move would
  // force the browser to lay the page out again after each redraw.
  const local = (e: { clientX: number; clientY: number }): Point => {
    const rect = rectRef.current ?? canvasRef.current!.getBoundingClientRect();
    if (dragRef.current) rectRef.current = rect;
    return { x: e.clientX - rect.left, y: e.clientY - rect.top };
  };

  const handles = useMemo(() => (overlays ?? []).filter((o) => o.kind === 'handle'), [overlays]);

  const onPointerDown = (e: PointerEvent<HTMLCanvasElement>) => {
    const scene = sceneRef.current;
    if (!transform || !scene || e.button !== 0) return;
    rectRef.current = canvasRef.current!.getBoundingClientRect();
    const p = local(e);
    if (!spaceRef.current) {
      for (const h of handles) {
        const at = scene.layout.placements.get(h.piece);
        if (!at) continue;
        const s = worldToScreen(transform, pieceToWorld(at, h.at));
        if (Math.hypot(s.x - p.x, s.y - p.y) <= HANDLE_PX + 4) {
          const pointer = worldToPiece(at, screenToWorld(transform, p));
          dragRef.current = { kind: 'handle', pointerId: e.pointerId, id: h.id, piece: h.piece, origin: h.at, ...(h.axis ? { axis: h.axis } : {}), grab: { x: pointer.x - h.at.x, y: pointer.y - h.at.y }, last: h.at };
          e.currentTarget.setPointerCapture(e.pointerId);
          onHandleDrag?.(h.id, h.at, 'start');
          return;
        }
      }
    }
    dragRef.current = { kind: 'pan', pointerId: e.pointerId, start: p, startT: transform, moved: false };
    e.currentTarget.setPointerCapture(e.pointerId);
  };

  const onPointerMove = (e: PointerEvent<HTMLCanvasElement>) => {
    const drag = dragRef.current;
    const scene = sceneRef.current;
    if (!drag || drag.pointerId !== e.pointerId || !scene || !transform) return;
    const p = local(e);
    if (drag.kind === 'pan') {
      const dx = p.x - drag.start.x;
      const dy = p.y - drag.start.y;
      if (!drag.moved && Math.hypot(dx, dy) < CLICK_SLOP_PX) return;
      drag.moved = true;
      setTransform(panBy(drag.startT, dx, dy));
    } else {
      const at = scene.layout.placements.get(drag.piece);
      if (!at) return;
      const pointer = worldToPiece(at, screenToWorld(transform, p));
      drag.last = constrainAlong(drag.origin, drag.axis, { x: pointer.x - drag.grab.x, y: pointer.y - drag.grab.y });
      onHandleDrag?.(drag.id, drag.last, 'move');
    }
  };

  const endDrag = (e: PointerEvent<HTMLCanvasElement>, cancelled: boolean) => {
    const drag = dragRef.current;
    if (!drag || drag.pointerId !== e.pointerId) return;
    const p = local(e);
    dragRef.current = null;
    rectRef.current = null;
    if (drag.kind === 'handle') {
      onHandleDrag?.(drag.id, drag.last, 'end');
      return;
    }
    const scene = sceneRef.current;
    if (drag.moved) {
      if (transform) onViewChange?.({ mode: 'scale', pxPerMm: transform.scale, centre: viewCentre(transform, size) });
    } else if (!cancelled && scene && transform && onPick) {
      const world = screenToWorld(transform, p);
      onPick(pickAt(pattern, scene.layout, world, pickTolerancePx / transform.scale));
    }
  };

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    if (e.target !== e.currentTarget) return;
    if (e.key === ' ') {
      spaceRef.current = true;
      e.preventDefault();
      return;
    }
    if (!transform) return;
    let next: ViewTransform | null = null;
    const middle = { x: size.width / 2, y: size.height / 2 };
    if (e.key === '+' || e.key === '=') next = zoomAbout(transform, KEY_ZOOM, middle);
    else if (e.key === '-' || e.key === '_') next = zoomAbout(transform, 1 / KEY_ZOOM, middle);
    else if (e.key === 'ArrowLeft') next = panBy(transform, KEY_PAN_PX, 0);
    else if (e.key === 'ArrowRight') next = panBy(transform, -KEY_PAN_PX, 0);
    else if (e.key === 'ArrowUp') next = panBy(transform, 0, KEY_PAN_PX);
    else if (e.key === 'ArrowDown') next = panBy(transform, 0, -KEY_PAN_PX);
    else if (e.key === '0') {
      e.preventDefault();
      setTransform(fitTransform(bounds, size));
      onViewChange?.({ mode: 'fit' });
      return;
    }
    if (!next) return;
    e.preventDefault();
    setTransform(next);
    onViewChange?.({ mode: 'scale', pxPerMm: next.scale, centre: viewCentre(next, size) });
  };

  const nudgeHandle = (e: KeyboardEvent<HTMLButtonElement>, h: Extract<CanvasOverlay, { kind: 'handle' }>) => {
    const step = e.shiftKey ? 10 : 1;
    const dirs: Record<string, Point> = { ArrowLeft: { x: -1, y: 0 }, ArrowRight: { x: 1, y: 0 }, ArrowUp: { x: 0, y: -1 }, ArrowDown: { x: 0, y: 1 } };
    const d = dirs[e.key];
    if (!d || !onHandleDrag) return;
    e.preventDefault();
    let move = { x: d.x * step, y: d.y * step };
    if (h.axis) {
      // along the axis: the arrow key's direction decides the sign
      const len = Math.hypot(h.axis.x, h.axis.y) || 1;
      const ux = h.axis.x / len;
      const uy = h.axis.y / len;
      const along = Math.sign(d.x * ux + d.y * uy) || (d.x + d.y > 0 ? 1 : -1);
      move = { x: ux * along * step, y: uy * along * step };
    }
    const to = { x: h.at.x + move.x, y: h.at.y + move.y };
    onHandleDrag(h.id, h.at, 'start');
    onHandleDrag(h.id, to, 'move');
    onHandleDrag(h.id, to, 'end');
  };

  return (
    <div
      ref={frameRef}
      tabIndex={0}
      onKeyDown={onKeyDown}
      onKeyUp={(e) => {
        if (e.key === ' ') spaceRef.current = false;
      }}
      className={cx(
        'relative isolate h-96 w-full touch-none overflow-hidden rounded-lg border border-calico-300 bg-calico-50 select-none focus-visible:outline-3 focus-visible:outline-tape-400',
        className,
      )}
    >
      <canvas
        ref={canvasRef}
        role="img"
        aria-label={`${label}. Drag to move the view, wheel or + and − to zoom, 0 to fit.`}
        className="absolute inset-0 block cursor-crosshair active:cursor-grabbing"
        onPointerDown={onPointerDown}
        onPointerMove={onPointerMove}
        onPointerUp={(e) => endDrag(e, false)}
        onPointerCancel={(e) => endDrag(e, true)}
      />
      {hasReference && (
        // After the drawing canvas (which stays the first canvas) but stacked beneath it, above the frame's background.
        <canvas ref={referenceCanvasRef} aria-hidden className="pointer-events-none absolute inset-0 -z-10 block" />
      )}
      {transform &&
        handles.map((h) => {
          const at = layout?.placements.get(h.piece);
          if (!at) return null;
          const s = worldToScreen(transform, pieceToWorld(at, h.at));
          return (
            <button
              key={h.id}
              type="button"
              aria-label={h.label ?? `Handle ${h.id}`}
              onKeyDown={(e) => nudgeHandle(e, h)}
              tabIndex={0}
              // Invisible over the drawn handle: it carries focus and the keyboard; the canvas takes the pointer.
              className="pointer-events-none absolute size-4 -translate-x-1/2 -translate-y-1/2 rounded-full opacity-0 focus-visible:opacity-100 focus-visible:outline-3 focus-visible:outline-tape-400"
              style={{ left: s.x, top: s.y }}
            />
          );
        })}
    </div>
  );
}
