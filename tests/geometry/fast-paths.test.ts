/**
 * The engine's fast paths must give the results of the plain algorithms they replace: each
 * is checked here against a straightforward reference written out in the test (property
 * tests, fast-check). Tolerances are far below anything that matters (1e-12 of the value).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { type Cubic, type Point, contourFlatten, cubicFlattenTimes, cubicPoint, cubicSplit, smoothThrough } from '../../geometry/index.ts';
import { expectNear, expectPointNear } from './helpers.ts';

const coord = fc.double({ min: -2000, max: 2000, noNaN: true });
const point = fc.record({ x: coord, y: coord });
const cubic = fc.tuple(point, point, point, point) as fc.Arbitrary<Cubic>;

/** The plain recursion: split at ½ until the control points lie within `tolerance` of the chord. */
function referenceFlattenTimes(c: Cubic, tolerance: number): number[] {
  const dist = (p: Point, a: Point, b: Point): number => {
    const ab = { x: b.x - a.x, y: b.y - a.y };
    const l2 = ab.x * ab.x + ab.y * ab.y;
    if (l2 < 1e-12) return Math.hypot(p.x - a.x, p.y - a.y);
    const k = Math.max(0, Math.min(1, ((p.x - a.x) * ab.x + (p.y - a.y) * ab.y) / l2));
    return Math.hypot(p.x - (a.x + ab.x * k), p.y - (a.y + ab.y * k));
  };
  const out = [0];
  const recurse = (part: Cubic, t0: number, t1: number, depth: number): void => {
    if (depth >= 20 || Math.max(dist(part[1], part[0], part[3]), dist(part[2], part[0], part[3])) <= tolerance) {
      out.push(t1);
      return;
    }
    const [l, r] = cubicSplit(part, 0.5);
    recurse(l, t0, (t0 + t1) / 2, depth + 1);
    recurse(r, (t0 + t1) / 2, t1, depth + 1);
  };
  recurse(c, 0, 1, 0);
  return out;
}

describe('flattening (fast path)', () => {
  it('gives the parameters of the plain subdivision, and the points of cubicPoint', () => {
    fc.assert(
      fc.property(cubic, fc.constantFrom(0.002, 0.01, 0.02, 0.05, 0.1, 1), (c, tolerance) => {
        const fast = cubicFlattenTimes(c, tolerance);
        const ref = referenceFlattenTimes(c, tolerance);
        expect(fast.length).toBe(ref.length);
        fast.forEach((t, i) => expectNear(t, ref[i]!, 1e-15, `t[${i}]`));
        const flat = contourFlatten({ segments: [{ kind: 'cubic', from: c[0], c1: c[1], c2: c[2], to: c[3] }], closed: false }, tolerance);
        expect(flat.length).toBe(ref.length);
        flat.forEach((f, i) => expectPointNear(f.point, cubicPoint(c, ref[i]!), 1e-9, `point ${i}`));
      }),
      { numRuns: 300 },
    );
  });

  it('hands out a fresh array each time, so a caller changing it changes nothing else', () => {
    const contour = { segments: [{ kind: 'cubic' as const, from: { x: 0, y: 0 }, c1: { x: 0, y: 100 }, c2: { x: 100, y: 100 }, to: { x: 100, y: 0 } }], closed: false };
    const a = contourFlatten(contour, 0.01);
    const n = a.length;
    a.pop();
    expect(contourFlatten(contour, 0.01).length).toBe(n);
  });
});

describe('smoothThrough (fast merge test)', () => {
  it('every merged cubic passes within the merge tolerance of the points it spans', () => {
    // points on a wavy curve; the merge may span many of them
    fc.assert(
      fc.property(fc.double({ min: 5, max: 200, noNaN: true }), fc.double({ min: 0, max: 30, noNaN: true }), fc.integer({ min: 3, max: 300 }), (radius, wave, n) => {
        const q = Array.from({ length: n }, (_, k) => {
          const a = (k / (n - 1)) * Math.PI;
          const r = radius + wave * Math.sin(5 * a);
          return { x: r * Math.cos(a), y: r * Math.sin(a) };
        });
        const segs = smoothThrough(q, 0.002);
        expectPointNear(segs[0]!.from, q[0]!, 1e-12);
        expectPointNear(segs[segs.length - 1]!.to, q[n - 1]!, 1e-12);
        // each input point lies on the result within the tolerance (checked at its nearest flattening vertex, fine flattening)
        const flat = segs.flatMap((s) => contourFlatten({ segments: [s], closed: false }, 1e-4).map((f) => f.point));
        for (const p of q) {
          let best = Infinity;
          for (let i = 1; i < flat.length; i++) {
            const a = flat[i - 1]!;
            const b = flat[i]!;
            const dx = b.x - a.x;
            const dy = b.y - a.y;
            const l2 = dx * dx + dy * dy;
            const k = l2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - a.x) * dx + (p.y - a.y) * dy) / l2));
            best = Math.min(best, Math.hypot(p.x - (a.x + dx * k), p.y - (a.y + dy * k)));
          }
          expect(best).toBeLessThanOrEqual(0.002 + 1e-4 + 1e-9);
        }
      }),
      { numRuns: 60 },
    );
  });
});
