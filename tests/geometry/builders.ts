/** Builders of small synthetic pieces for geometry tests. */
import fc from 'fast-check';
import {
  type Contour,
  type Outline,
  type Pattern,
  type Piece,
  contourFlatten,
  contourNearest,
  outlineContour,
  parsePattern,
} from '../../geometry/index.ts';

export interface LegParams {
  /** half widths at top and bottom (mm) */
  topHalf: number;
  bottomHalf: number;
  height: number;
  /** lengthen line position as a fraction of the height */
  lineAt: number;
  /** horizontal bow of the side edges (mm), curves the sides */
  bow: number;
}

/** A leg-like piece: waist on top (y = 0), hem at y = height, curved sides, grain down x = 0. */
export function legPiece(p: LegParams, name = 'leg'): Piece {
  const { topHalf: a, bottomHalf: b, height: h, bow } = p;
  const d = `M${-a} 0 L${a} 0 C${a + bow} ${h / 3} ${b + bow} ${(2 * h) / 3} ${b} ${h} L${-b} ${h} C${-b - bow} ${(2 * h) / 3} ${-a - bow} ${h / 3} ${-a} 0 Z`;
  const y = p.lineAt * h;
  return {
    name,
    outlines: [
      {
        size: '10',
        d,
        points: [
          { name: 'waist-side', kind: 'corner', x: -a, y: 0 },
          { name: 'waist-in', kind: 'corner', x: a, y: 0 },
          { name: 'hem-in', kind: 'corner', x: b, y: h },
          { name: 'hem-side', kind: 'corner', x: -b, y: h },
        ],
      },
    ],
    lines: [
      { role: 'grain', name: 'grain', d: `M0 ${h * 0.1} L0 ${h * 0.9}` },
      { role: 'lengthen', name: 'cut', d: `M${-a - b - 50} ${y} L${a + b + 50} ${y}` },
    ],
    edges: [
      { name: 'waist', role: 'waist', from: 'waist-side', to: 'waist-in' },
      { name: 'inseam', role: 'inseam', from: 'waist-in', to: 'hem-in' },
      { name: 'hem', role: 'hem', from: 'hem-in', to: 'hem-side' },
      { name: 'side seam', role: 'side-seam', from: 'hem-side', to: 'waist-side' },
    ],
    cut: { count: 2, onFold: false },
    seamAllowanceIncluded: false,
  };
}

export function patternOf(...pieces: Piece[]): Pattern {
  return parsePattern({ version: 1, units: 'mm', pieces });
}

/** Leg shapes with near-parallel sides (each side within 1.5 % ≈ 0.9° of the grain) and a line away from the ends. */
export const nearParallelLeg: fc.Arbitrary<LegParams> = fc
  .record({
    topHalf: fc.double({ min: 80, max: 200, noNaN: true }),
    taper: fc.double({ min: -0.015, max: 0.015, noNaN: true }),
    height: fc.double({ min: 300, max: 1100, noNaN: true }),
    lineAt: fc.double({ min: 0.3, max: 0.7, noNaN: true }),
    bow: fc.double({ min: -2, max: 2, noNaN: true }),
  })
  .map(({ topHalf, taper, height, lineAt, bow }) => ({ topHalf, bottomHalf: topHalf - taper * height, height, lineAt, bow }));

/** General leg shapes: strong taper and bow. */
export const anyLeg: fc.Arbitrary<LegParams> = fc.record({
  topHalf: fc.double({ min: 60, max: 250, noNaN: true }),
  bottomHalf: fc.double({ min: 40, max: 200, noNaN: true }),
  height: fc.double({ min: 200, max: 1200, noNaN: true }),
  lineAt: fc.double({ min: 0.2, max: 0.8, noNaN: true }),
  bow: fc.double({ min: -30, max: 30, noNaN: true }),
});

/** Largest distance from the flattened points of `a` to the contour `b`, both ways (mm). */
export function hausdorff(a: Contour, b: Contour): number {
  let worst = 0;
  for (const [p, q] of [
    [a, b],
    [b, a],
  ] as const)
    for (const f of contourFlatten(p, 0.05)) worst = Math.max(worst, contourNearest(q, f.point).distance);
  return worst;
}

export function outlineDistance(a: Outline, b: Outline): number {
  return hausdorff(outlineContour(a), outlineContour(b));
}
