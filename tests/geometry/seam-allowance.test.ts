import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  AlterationError,
  applyOps,
  type Contour,
  contourArea,
  cutLineByUnion,
  cutLineDirect,
  cutLineOf,
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

describe('seam allowance — the direct construction against the union (property)', () => {
  // cutLineOf builds the cut line directly where it can show the union's boundary is the same;
  // cutLineByUnion is the union of clipper2-ts offsets it replaces. They must agree to well
  // within the 1e-4 mm the cut line is printed to, in both directions.
  const hausdorff = (a: Contour, b: Contour): number => {
    let d = 0;
    for (const f of contourFlatten(a, 0.05)) d = Math.max(d, contourNearest(b, f.point).distance);
    for (const f of contourFlatten(b, 0.05)) d = Math.max(d, contourNearest(a, f.point).distance);
    return d;
  };
  const demo = parsePattern(demoPattern());
  const widthsArb = fc.record({
    width: fc.double({ min: 0, max: 40, noNaN: true }),
    edges: fc.dictionary(fc.constantFrom('hem', 'inseam', 'crotch-curve', 'side-seam', 'waist', 'centre back', 'yoke seam'), fc.double({ min: 0, max: 40, noNaN: true }), { maxKeys: 3 }),
  });
  const stackArb = fc.array(
    fc.oneof(
      fc.record({ op: fc.constant('lengthen' as const), line: fc.constantFrom('upper leg', 'lower leg'), amount: fc.double({ min: -60, max: 60, noNaN: true }) }),
      fc.record({ op: fc.constant('rise' as const), line: fc.constant('rise'), amount: fc.double({ min: -20, max: 50, noNaN: true }) }),
      fc.record({ op: fc.constant('girth' as const), edge: fc.constantFrom('side-seam', 'inseam'), level: fc.constantFrom('hip', 'thigh', 'knee'), amount: fc.double({ min: -10, max: 15, noNaN: true }) }),
    ),
    { maxLength: 3 },
  );

  it('gives the union’s cut line within 1e-4 mm on every piece and size of the altered demo pattern', () => {
    let direct = 0;
    let all = 0;
    fc.assert(
      fc.property(stackArb, widthsArb, (stack, widths) => {
        let altered;
        try {
          altered = applyOps(demo, stack).pattern;
        } catch (error) {
          expect(error).toBeInstanceOf(AlterationError);
          return;
        }
        const op = { op: 'seam-allowance' as const, ...widths };
        for (const piece of altered.pieces)
          for (const o of [piece.outlines[0]!, piece.outlines[piece.outlines.length - 1]!]) {
            const fast = cutLineDirect(piece, o, op);
            all++;
            if (!fast) continue;
            direct++;
            expect(hausdorff(fast, cutLineByUnion(piece, o, op)), `${piece.name} ${o.size}`).toBeLessThan(1e-4);
            expect(contourIsSimple(fast)).toBe(true);
          }
      }),
      { numRuns: 25 },
    );
    // the direct construction is really exercised
    expect(direct).toBeGreaterThan(all / 4);
  });

  it('gives the union’s cut line on random convex and star-shaped polygons with per-edge widths', () => {
    let direct = 0;
    fc.assert(
      fc.property(
        fc.integer({ min: 4, max: 9 }),
        fc.array(fc.double({ min: 0.55, max: 1, noNaN: true }), { minLength: 9, maxLength: 9 }),
        // widths from a few values, so that neighbouring edges often share one (a corner the direct
        // construction takes) and sometimes do not (a butt-end step it leaves to the union)
        fc.array(fc.constantFrom(0, 10, 15, 15, 15, 15, 15, 15, 40), { minLength: 9, maxLength: 9 }),
        fc.constantFrom(10, 15),
        (k, radii, widths, width) => {
          const pts = Array.from({ length: k }, (_, i) => {
            const a = (2 * Math.PI * i) / k;
            const r = 200 * radii[i]!;
            return { name: `p${i}`, kind: 'corner' as const, x: r * Math.cos(a), y: r * Math.sin(a) };
          });
          const d = `M${pts.map((p) => `${p.x} ${p.y}`).join(' L')} Z`;
          const piece = patternOf({
            name: 'shape',
            outlines: [{ size: '1', d, points: pts }],
            lines: [],
            edges: pts.map((p, i) => ({ name: `e${i}`, role: 'other' as const, from: p.name, to: pts[(i + 1) % k]!.name })),
            cut: { count: 1, onFold: false },
            seamAllowanceIncluded: false,
          }).pieces[0]!;
          const edges = Object.fromEntries(pts.map((_, i) => [`e${i}`, widths[i]!]));
          const op = { op: 'seam-allowance' as const, width, edges };
          const fast = cutLineDirect(piece, piece.outlines[0]!, op);
          if (fast) direct++;
          expect(hausdorff(cutLineOf(piece, piece.outlines[0]!, op), cutLineByUnion(piece, piece.outlines[0]!, op))).toBeLessThan(1e-4);
        },
      ),
      { numRuns: 100 },
    );
    expect(direct).toBeGreaterThan(5);
  });

  it('gives the union’s cut line on strips thinner than their allowance (a band’s inner half reaching past the far side)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 4, max: 60, noNaN: true }),
        fc.double({ min: -30, max: 30, noNaN: true }),
        fc.array(fc.constantFrom(0, 5, 15, 15, 40), { minLength: 4, maxLength: 4 }),
        (h, lean, widths) => {
          const piece = rect(200, h).pieces[0]!;
          const o = piece.outlines[0]!;
          // lean the right-hand side so the corners are not all square
          const outline = { ...o, d: `M0 0 L200 0 L${200 + lean} ${h} L0 ${h} Z`, points: o.points.map((p) => (p.name === 'br' ? { ...p, x: 200 + lean } : p)) };
          const op = { op: 'seam-allowance' as const, width: widths[0]!, edges: { waist: widths[1]!, inseam: widths[2]!, hem: widths[3]! } };
          expect(hausdorff(cutLineOf(piece, outline, op), cutLineByUnion(piece, outline, op))).toBeLessThan(1e-4);
        },
      ),
      { numRuns: 100 },
    );
  });
});
