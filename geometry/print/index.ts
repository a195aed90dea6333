/**
 * Print geometry (issue 4): paper sizes, tile grid, shelf layout, empty pages, page labels and
 * the drawing data of each page. Pure; millimetres, y down. The server writes PDF and SVG from it.
 */
export * from './errors.ts';
export * from './paper.ts';
export * from './grid.ts';
export * from './pieces.ts';
export * from './layout.ts';
export * from './empty.ts';
export * from './plan.ts';
export * from './scene.ts';
