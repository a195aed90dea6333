/**
 * The only barrel of geometry/: the pure numeric core of Blockwright.
 * Units: millimetres, y grows downward, angles in radians. See README.md.
 */
export * from './tolerance.ts';
export * from './vec.ts';
export * from './bezier.ts';
export * from './path.ts';
export * from './model.ts';
export * from './sizes.ts';
export * from './demo-pattern.ts';
export * from './measure.ts';
export * from './units.ts';
export * from './ops/common.ts';
export * from './ops/lengthen.ts';
export * from './ops/blend.ts';
export * from './ops/shrinkage.ts';
export * from './ops/apply.ts';
export * from './make.ts';
export * from './labelling.ts';
export * from './ops/seam-allowance.ts';
export * from './ops/girth.ts';
export * from './ops/slash-spread.ts';
export * from './ops/mark-line.ts';
export * from './xml.ts';
export * from './svg-import.ts';
export * from './dxf-import.ts';
// Print geometry: paper, tiles, layout, empty pages, page drawing data (geometry/print/README.md).
export * from './print/errors.ts';
export * from './print/paper.ts';
export * from './print/grid.ts';
export * from './print/pieces.ts';
export * from './print/layout.ts';
export * from './print/empty.ts';
export * from './print/plan.ts';
export * from './print/scene.ts';
// Fit planner: body, fabric, size tables, the plan (geometry/README.md, "Fit planner").
export * from './fit/body.ts';
export * from './fit/chart.ts';
export * from './fit/plan.ts';
export * from './fit/notes.ts';
