/**
 * Print layout and pages: shelf layout, grain kept vertical, exact empty pages, every outline
 * point on a page. Property tests on random patterns, plus the demo pattern.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { applyOps, contourFlatten, demoPattern, parsePattern, pathFromSvg, pieceGrain, type Pattern } from '../../geometry/index.ts';
import { affineApply, affineApplyVector } from '../../geometry/vec.ts';
import {
  PrintError,
  type Rect,
  planPrint,
  pointInPolygon,
  polygonMeetsRect,
  printPieces,
  segmentMeetsRect,
  shelfLayout,
  type TiledPlan,
} from '../../geometry/index.ts';
import { BLEND } from '../bench/alterations.ts';
import { expectNear } from './helpers.ts';

/** A star-shaped polygon round (cx, cy): n corners at random radii. */
const polygonArb = fc.record({
  n: fc.integer({ min: 3, max: 9 }),
  radii: fc.array(fc.double({ min: 20, max: 400, noNaN: true }), { minLength: 9, maxLength: 9 }),
  cx: fc.double({ min: -500, max: 500, noNaN: true }),
  cy: fc.double({ min: -500, max: 500, noNaN: true }),
  grain: fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }),
  seam: fc.boolean(),
});

type RandomPolygon = typeof polygonArb extends fc.Arbitrary<infer T> ? T : never;

function piecesFrom(polys: RandomPolygon[]): Pattern {
  return parsePattern({
    units: 'mm',
    name: 'random',
    pieces: polys.map((p, i) => {
      const pts = Array.from({ length: p.n }, (_, k) => {
        const a = (2 * Math.PI * k) / p.n;
        return { x: p.cx + p.radii[k]! * Math.cos(a), y: p.cy + p.radii[k]! * Math.sin(a) };
      });
      const d = `M${pts.map((q) => `${q.x} ${q.y}`).join(' L')} Z`;
      // a cut line 10 % further out (star-shaped about the centre, so it holds the seam line)
      const cut = `M${pts.map((q) => `${p.cx + (q.x - p.cx) * 1.1} ${p.cy + (q.y - p.cy) * 1.1}`).join(' L')} Z`;
      const g = { x: Math.cos(p.grain), y: Math.sin(p.grain) };
      return {
        name: `piece ${i}`,
        outlines: [{ size: '8', d, ...(p.seam ? { cut } : {}) }],
        lines: [{ role: 'grain', name: 'grain', d: `M${p.cx - g.x * 10} ${p.cy - g.y * 10} L${p.cx + g.x * 10} ${p.cy + g.y * 10}` }],
      };
    }),
  });
}

/** Least distance from any vertex of a to any edge of b (with the reverse, the polygons' distance when they do not cross). */
function polygonDistance(a: readonly { x: number; y: number }[], b: readonly { x: number; y: number }[]): number {
  let d = Infinity;
  for (const p of a)
    for (let k = 0; k < b.length; k++) {
      const u = b[k]!;
      const v = b[(k + 1) % b.length]!;
      const len2 = (v.x - u.x) ** 2 + (v.y - u.y) ** 2;
      const t = len2 > 0 ? Math.max(0, Math.min(1, ((p.x - u.x) * (v.x - u.x) + (p.y - u.y) * (v.y - u.y)) / len2)) : 0;
      d = Math.min(d, Math.hypot(p.x - (u.x + t * (v.x - u.x)), p.y - (u.y + t * (v.y - u.y))));
    }
  return d;
}

const flat = (d: string) => contourFlatten(pathFromSvg(d)[0]!, 0.05).map((f) => f.point);
const inRect = (p: { x: number; y: number }, r: Rect, eps = 1e-6) => p.x >= r.x - eps && p.x <= r.x + r.width + eps && p.y >= r.y - eps && p.y <= r.y + r.height + eps;

/** Every outline point of the pattern (seam and cut lines), placed in content coordinates. */
function placedOutlinePoints(pattern: Pattern, plan: TiledPlan) {
  return plan.layout.placements.flatMap((pl) => {
    const o = pattern.pieces[pl.index]!.outlines[0]!;
    return [o.d, ...(o.cut ? [o.cut] : [])].flatMap((d) => flat(d).map((p) => affineApply(pl.transform, p)));
  });
}

describe('shelf layout (property)', () => {
  it('pieces do not overlap (they keep the spacing apart), stay in the layout box, and keep their grainline vertical', () => {
    fc.assert(
      fc.property(fc.array(polygonArb, { minLength: 1, maxLength: 7 }), fc.boolean(), (polys, quarter) => {
        const pattern = piecesFrom(polys);
        const pieces = printPieces(pattern);
        const layout = shelfLayout(pieces, { width: 2000, spacing: 10, padding: 4, quarterTurn: pieces.map(() => quarter) });
        // pieces keep at least the spacing apart (exact distance between the placed flattened outer lines)
        const placed = layout.placements.map((pl) => {
          const o = pattern.pieces[pl.index]!.outlines[0]!;
          return flat(o.cut ?? o.d).map((p) => affineApply(pl.transform, p));
        });
        for (let i = 0; i < placed.length; i++)
          for (let j = i + 1; j < placed.length; j++) {
            const gap = Math.min(polygonDistance(placed[i]!, placed[j]!), polygonDistance(placed[j]!, placed[i]!));
            expect(gap, `pieces ${i} and ${j} are ${gap} mm apart`).toBeGreaterThanOrEqual(10 - 0.1);
            expect(pointInPolygon(placed[i]![0]!, placed[j]!) || pointInPolygon(placed[j]![0]!, placed[i]!), 'one piece inside another').toBe(false);
          }
        layout.placements.forEach((pl) => {
          const piece = pattern.pieces[pl.index]!;
          const o = piece.outlines[0]!;
          // the outer line lies inside its own box (so pieces, being inside disjoint boxes, cannot overlap)
          for (const p of flat(o.cut ?? o.d)) expect(inRect(affineApply(pl.transform, p), pl.box, 0.05)).toBe(true);
          expect(pl.box.x + pl.box.width).toBeLessThanOrEqual(layout.width + 1e-6);
          expect(pl.box.y + pl.box.height).toBeLessThanOrEqual(layout.height + 1e-6);
          // grain: vertical (0/180°), or horizontal only when quarter turns are allowed
          const g = affineApplyVector(pl.transform, pieceGrain(piece));
          if (pl.turn === 0 || pl.turn === 180) expectNear(Math.abs(g.y), 1, 1e-9, 'grain vertical');
          else {
            expect(quarter).toBe(true);
            expectNear(Math.abs(g.x), 1, 1e-9, 'grain horizontal');
          }
          // a rigid motion: lengths are kept (true scale). 1e-9 is float noise of composed turns
          // (a seeded run found 1.00009e-12 with a grain 1e-6 rad off vertical): 1 µm per km.
          expectNear(Math.hypot(pl.transform.a, pl.transform.b), 1, 1e-9);
          expectNear(pl.transform.a * pl.transform.d - pl.transform.b * pl.transform.c, 1, 1e-9);
        });
      }),
      { numRuns: 60 },
    );
  });
});

describe('pages (property)', () => {
  it('every outline point falls in some page’s printable area; the pages left out really are empty', () => {
    fc.assert(
      fc.property(
        fc.array(polygonArb, { minLength: 1, maxLength: 5 }),
        fc.constantFrom('letter' as const, 'a4' as const, 'legal' as const, 'a3' as const, 'tabloid' as const),
        fc.double({ min: 0, max: 15, noNaN: true }),
        fc.constantFrom(0, 12),
        (polys, paper, margin, overlap) => {
          const pattern = piecesFrom(polys);
          const plan = planPrint(pattern, { paper, margin, overlap });
          if (plan.format !== 'tiled') throw new Error('expected tiles');
          expect(plan.used.length + plan.empty.length).toBe(plan.grid.tiles.length);
          expect(plan.pageCount).toBe(plan.used.length + 1);
          const points = placedOutlinePoints(pattern, plan);
          for (const p of points) expect(plan.used.some((t) => inRect(p, t.area)), `(${p.x}, ${p.y}) is on no page`).toBe(true);
          // independent check of emptiness: dense samples along the outer lines (every 0.5 mm) and the page's middle
          for (const t of plan.empty) {
            for (const poly of plan.polygons) {
              for (let i = 0; i < poly.length; i++) {
                const a = poly[i]!;
                const b = poly[(i + 1) % poly.length]!;
                const n = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / 0.5));
                for (let k = 0; k <= n; k++) expect(inRect({ x: a.x + ((b.x - a.x) * k) / n, y: a.y + ((b.y - a.y) * k) / n }, t.area, -1e-6)).toBe(false);
              }
            }
          }
        },
      ),
      { numRuns: 25 },
    );
  });
});

describe('empty pages are found exactly, not by bounding boxes', () => {
  it('a page inside a triangle’s bounding box but off the triangle is empty; one wholly inside a piece is not', () => {
    const tri = [
      { x: 0, y: 0 },
      { x: 1000, y: 0 },
      { x: 0, y: 1000 },
    ];
    expect(polygonMeetsRect(tri, { x: 700, y: 700, width: 200, height: 200 })).toBe(false);
    expect(polygonMeetsRect(tri, { x: 100, y: 100, width: 100, height: 100 })).toBe(true); // inside, no edge crosses
    expect(polygonMeetsRect(tri, { x: 450, y: 450, width: 200, height: 200 })).toBe(true); // the hypotenuse crosses
    expect(segmentMeetsRect({ x: -10, y: 5 }, { x: 10, y: 5 }, { x: 0, y: 0, width: 1, height: 10 })).toBe(true);
    expect(segmentMeetsRect({ x: -10, y: 5 }, { x: -1, y: 5 }, { x: 0, y: 0, width: 1, height: 10 })).toBe(false);
  });

  it('a right-triangle piece larger than a page leaves the page beyond its hypotenuse out', () => {
    const pattern = parsePattern({ units: 'mm', pieces: [{ name: 'wedge', outlines: [{ size: '1', d: 'M0 0 L380 0 L0 540 Z' }] }] });
    const plan = planPrint(pattern, { paper: 'a4', orientation: 'portrait' });
    if (plan.format !== 'tiled') throw new Error('expected tiles');
    expect(plan.grid.rows * plan.grid.cols).toBe(4);
    expect(plan.empty.map((t) => t.label)).toEqual(['B2']);
  });
});

describe('the demo pattern (blended, seam allowance added)', () => {
  const blended = applyOps(demoPattern(), [BLEND, { op: 'seam-allowance', width: 15, edges: { hem: 40 } }]).pattern;

  it('on Letter and A4: every outline point on a page, pages in use fewer than the grid, sizes named on a blend', () => {
    for (const paper of ['letter', 'a4'] as const) {
      const plan = planPrint(blended, { paper });
      if (plan.format !== 'tiled') throw new Error('expected tiles');
      for (const p of placedOutlinePoints(blended, plan)) expect(plan.used.some((t) => inRect(p, t.area))).toBe(true);
      expect(plan.used.length).toBeLessThanOrEqual(plan.grid.tiles.length);
      expect(plan.pieces.every((p) => p.blended)).toBe(true);
    }
  });

  it('asks for a size when pieces still have several size lines, and names the sizes', () => {
    expect(() => planPrint(demoPattern(), { paper: 'letter' })).toThrow(/choose one size \(0, 2, 4/);
    expect(() => planPrint(demoPattern(), { paper: 'letter', size: '7' })).toThrow(PrintError);
    const plan = planPrint(demoPattern(), { paper: 'letter', size: '8' });
    expect(plan.pieces.map((p) => p.size)).toEqual(['8', '8', '8', '8', '8', '8']);
  });

  it('large format: A0 refuses what does not fit with a clear message; a 914 mm roll takes it all on one sheet', () => {
    expect(() => planPrint(blended, { paper: 'a0' })).toThrow(/A0/);
    const roll = planPrint(blended, { paper: 'roll-914' });
    expect(roll.format).toBe('single');
    if (roll.format === 'single') {
      expect(roll.sheet.width).toBe(914);
      for (const box of roll.layout.placements.map((p) => p.box)) expect(box.x + box.width).toBeLessThanOrEqual(914 - 2 * 6.35);
    }
  });
});
