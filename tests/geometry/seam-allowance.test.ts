import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  contourArea,
  contourFlatten,
  contourIsSimple,
  contourNearest,
  demoPattern,
  outlineContour,
  parsePattern,
  pathFromSvg,
  performSeamAllowance,
  performBlend,
} from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';
import { patternOf } from './builders.ts';

const rect = (w: number, h: number, withEdges = true) =>
  patternOf({
    name: 'panel',
    outlines: [
      {
        size: '10',
        d: `M0 0 L${w} 0 L${w} ${h} L0 ${h} Z`,
        points: [
          { name: 'tl', kind: 'corner', x: 0, y: 0 },
          { name: 'tr', kind: 'corner', x: w, y: 0 },
          { name: 'br', kind: 'corner', x: w, y: h },
          { name: 'bl', kind: 'corner', x: 0, y: h },
        ],
      },
    ],
    lines: [],
    edges: withEdges
      ? [
          { name: 'waist', role: 'waist', from: 'tl', to: 'tr' },
          { name: 'inseam', role: 'inseam', from: 'tr', to: 'br' },
          { name: 'hem', role: 'hem', from: 'br', to: 'bl' },
          { name: 'side seam', role: 'side-seam', from: 'bl', to: 'tl' },
        ]
      : [],
    cut: { count: 2, onFold: false },
    seamAllowanceIncluded: false,
  });

const cutOf = (p: ReturnType<typeof rect>) => pathFromSvg(p.pieces[0]!.outlines[0]!.cut!)[0]!;

describe('seam allowance — closed-form shapes', () => {
  it('a uniform 10 mm allowance on a 100 × 50 rectangle gives a square-cornered 120 × 70 cut line', () => {
    for (const withEdges of [true, false]) {
      const out = performSeamAllowance(rect(100, 50, withEdges), { op: 'seam-allowance', width: 10 }).pattern;
      expectNear(contourArea(cutOf(out)), 120 * 70, 0.5);
    }
  });

  it('per-edge widths: hem 40 mm, the rest 15 mm (trade reference §3.12 typical widths, common practice)', () => {
    const out = performSeamAllowance(rect(100, 50), { op: 'seam-allowance', width: 15, edges: { hem: 40 } }).pattern;
    expectNear(contourArea(cutOf(out)), 130 * (15 + 50 + 40), 0.5);
    // the seam line itself is kept
    expectNear(contourArea(outlineContour(out.pieces[0]!.outlines[0]!)), 5000, 1e-9);
  });

  it('a disc of radius r with allowance w is cut as a disc of radius r + w (within the flattening)', () => {
    fc.assert(
      fc.property(fc.double({ min: 20, max: 300, noNaN: true }), fc.double({ min: 3, max: 40, noNaN: true }), (r, w) => {
        const p = patternOf({
          name: 'disc',
          outlines: [{ size: '1', d: `M${-r} 0 A${r} ${r} 0 0 1 ${r} 0 A${r} ${r} 0 0 1 ${-r} 0 Z`, points: [] }],
          lines: [],
          edges: [],
          cut: { count: 1, onFold: false },
          seamAllowanceIncluded: false,
        });
        const cut = cutOf(performSeamAllowance(p, { op: 'seam-allowance', width: w }).pattern);
        const seam = outlineContour(p.pieces[0]!.outlines[0]!);
        for (const f of contourFlatten(cut, 0.05)) expectNear(contourNearest(seam, f.point).distance, w, 0.05);
      }),
      { numRuns: 15 },
    );
  });
});

describe('seam allowance — on the demo pattern', () => {
  it('every cut line is closed, simple, encloses the seam line and keeps at least the allowance everywhere', () => {
    const demo = performBlend(parsePattern(demoPattern()), { op: 'blend', levels: [{ level: 'waist', size: '8' }] }).pattern;
    const out = performSeamAllowance(demo, { op: 'seam-allowance', width: 15, edges: { hem: 40, crotch: 10 } }).pattern;
    for (const piece of out.pieces) {
      const o = piece.outlines[0]!;
      const cut = pathFromSvg(o.cut!)[0]!;
      const seam = outlineContour(o);
      expect(contourIsSimple(cut), piece.name).toBe(true);
      expect(contourArea(cut)).toBeGreaterThan(contourArea(seam));
      let min = Infinity;
      for (const f of contourFlatten(cut, 0.05)) min = Math.min(min, contourNearest(seam, f.point).distance);
      expect(min, piece.name).toBeGreaterThan(15 - 0.05);
    }
  });
});
