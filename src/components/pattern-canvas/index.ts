/**
 * The pattern drawing core shared by the pattern screens. paper.js comes in with
 * PatternCanvas: import this folder only from lazily loaded routes.
 */
export { PatternCanvas, type CanvasView, type HandleDragPhase, type PatternCanvasProps } from './pattern-canvas';
export { CalibrationPanel, useCalibration } from './calibration-panel';
export * from './calibration.ts';
export * from './layout.ts';
export * from './pick.ts';
export * from './view-math.ts';
export type { CanvasHighlight, CanvasOverlay, OverlayColour } from './scene.ts';
