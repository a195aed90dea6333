import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  PathDataError,
  affineRotate,
  affineScale,
  contourArea,
  contourExtremePoints,
  contourFlatten,
  contourFromPoints,
  contourIsSimple,
  contourLength,
  contourLineIntersections,
  contourLocationAtOffset,
  contourNearest,
  contourOffsetOf,
  contourReverse,
  contourSelfCrossings,
  contourSignedArea,
  contourStretch,
  contourTransform,
  pathFromSvg,
  pathLength,
  pathToSvg,
} from '../../geometry/index.ts';
import { expectNear, expectPointNear } from './helpers.ts';

const first = (d: string) => {
  const p = pathFromSvg(d);
  expect(p.length).toBeGreaterThan(0);
  return p[0]!;
};

describe('SVG path data — reading every command', () => {
  it('absolute and relative lines, H/V, Z: a 100 × 50 rectangle', () => {
    for (const d of ['M0 0 L100 0 L100 50 L0 50 Z', 'm0 0 h100 v50 h-100 z', 'M0,0H100V50H0Z', 'M0 0 100 0 100 50 0 50z']) {
      const c = first(d);
      expect(c.closed).toBe(true);
      expectNear(contourArea(c), 5000, 1e-9, d);
      expectNear(contourLength(c), 300, 1e-9, d);
    }
  });

  it('a circle from two arcs has circumference 2πr and area πr² (within the 45° cubic approximation error)', () => {
    const r = 80;
    const c = first(`M ${-r} 0 A ${r} ${r} 0 0 1 ${r} 0 A ${r} ${r} 0 0 1 ${-r} 0 Z`);
    expectNear(contourLength(c), 2 * Math.PI * r, 2 * Math.PI * r * 1e-5);
    expectNear(contourArea(c), Math.PI * r * r, Math.PI * r * r * 1e-5);
  });

  it('an elliptical arc with rotation and radii too small is scaled up per SVG 1.1 F.6.6 (half ellipse through the end points)', () => {
    // radii 1 are too small for a 200 mm chord: scaled to a semicircle of radius 100
    const c = first('M0 0 A1 1 0 0 1 200 0');
    expectNear(contourLength(c), Math.PI * 100, 1e-3);
  });

  it('quadratic and smooth commands (Q, T, S) match their explicit cubic equivalents', () => {
    const a = first('M0 0 Q50 100 100 0 T200 0');
    const b = first('M0 0 C33.333333333 66.666666667 66.666666667 66.666666667 100 0 C133.333333333 -66.666666667 166.666666667 -66.666666667 200 0');
    expectNear(contourLength(a), contourLength(b), 1e-6);
    const s = first('M0 0 C0 50 50 100 100 100 S 200 150 200 200');
    const e = first('M0 0 C0 50 50 100 100 100 C150 100 200 150 200 200');
    expectNear(contourLength(s), contourLength(e), 1e-9);
  });

  it('several contours; an end within CLOSE_GAP of the start counts as closed', () => {
    const p = pathFromSvg('M0 0 L10 0 L10 10 L0.001 0.001 M20 0 L30 0');
    expect(p).toHaveLength(2);
    expect(p[0]!.closed).toBe(true);
    expect(p[1]!.closed).toBe(false);
  });

  it('unreadable data is refused with a clear PathDataError', () => {
    expect(() => pathFromSvg('M 10 10 L x')).toThrow(PathDataError);
    expect(() => pathFromSvg('M 10 10 L x')).toThrow(/unreadable path data/);
  });

  it('write → read round trip keeps the geometry (4 decimals)', () => {
    const d = 'M0 0 C10 20 30 40 50 50 L60 0 Q 40 -20 20 -10 Z';
    const c1 = pathFromSvg(d);
    const c2 = pathFromSvg(pathToSvg(c1));
    expectNear(pathLength(c2), pathLength(c1), 1e-3);
    expectNear(contourSignedArea(c2[0]!), contourSignedArea(c1[0]!), 1e-2);
  });
});

describe('contour measures', () => {
  it('signed area: clockwise on screen (y down) is positive; reversing flips the sign', () => {
    const cw = contourFromPoints([{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 10 }, { x: 0, y: 10 }], true);
    expectNear(contourSignedArea(cw), 100, 1e-12);
    expectNear(contourSignedArea(contourReverse(cw)), -100, 1e-12);
  });

  it('area scales by the determinant and is unchanged by rotation (property)', () => {
    const c = first('M0 0 C40 -10 80 30 100 0 L110 200 C60 210 20 190 0 200 Z');
    fc.assert(
      fc.property(fc.double({ min: 0.1, max: 5, noNaN: true }), fc.double({ min: 0.1, max: 5, noNaN: true }), fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), (sx, sy, a) => {
        const scaled = contourTransform(c, affineScale(sx, sy));
        expectNear(contourArea(scaled), contourArea(c) * sx * sy, contourArea(c) * sx * sy * 1e-9);
        expectNear(contourArea(contourTransform(c, affineRotate(a))), contourArea(c), contourArea(c) * 1e-9);
        expectNear(contourLength(contourTransform(c, affineRotate(a, { x: 50, y: 50 }))), contourLength(c), 1e-4);
      }),
      { numRuns: 50 },
    );
  });

  it('offset ↔ location round trip (property)', () => {
    const c = first('M0 0 C40 -10 80 30 100 0 L110 200 C60 210 20 190 0 200 Z');
    const total = contourLength(c);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 1, noNaN: true }), (k) => {
        const loc = contourLocationAtOffset(c, k * total);
        expectNear(contourOffsetOf(c, loc), k * total, 1e-3);
        const near = contourNearest(c, loc.point);
        expect(near.distance).toBeLessThan(1e-4);
      }),
      { numRuns: 50 },
    );
  });

  it('line intersections of a rectangle with a horizontal line: two, at the sides', () => {
    const c = first('M0 0 H100 V50 H0 Z');
    const hits = contourLineIntersections(c, { x: 0, y: 20 }, { x: 1, y: 0 });
    expect(hits).toHaveLength(2);
    expectPointNear(hits[0]!.point, { x: 100, y: 20 }, 1e-9);
    expectPointNear(hits[1]!.point, { x: 0, y: 20 }, 1e-9);
  });

  it('a stretch between two locations, and its wrap-around complement, add up to the whole loop', () => {
    const c = first('M0 0 H100 V50 H0 Z');
    const a = contourNearest(c, { x: 30, y: 0 });
    const b = contourNearest(c, { x: 100, y: 30 });
    const ab = contourStretch(c, a, b);
    const ba = contourStretch(c, b, a);
    expectNear(contourLength(ab), 100, 1e-9);
    expectNear(contourLength(ab) + contourLength(ba), 300, 1e-9);
  });
});

describe('closed and simple checks, with the place of a crossing', () => {
  it('a figure eight is not simple and the crossing is reported where it is', () => {
    const c = first('M0 0 L100 100 L100 0 L0 100 Z');
    expect(contourIsSimple(c)).toBe(false);
    const x = contourSelfCrossings(c);
    expect(x.length).toBeGreaterThan(0);
    expectPointNear(x[0]!.point, { x: 50, y: 50 }, 1e-9);
    expect(x[0]!.segments).toEqual([0, 2]);
  });

  it('a curved self-crossing (a loop in a cubic) is found', () => {
    const c = first('M0 0 C 150 100 -50 100 100 0 L 100 -50 L 0 -50 Z');
    expect(contourIsSimple(c)).toBe(false);
  });

  it('an open contour is never simple-closed; a convex closed one is', () => {
    expect(contourIsSimple(first('M0 0 L10 0 L10 10'))).toBe(false);
    expect(contourIsSimple(first('M0 0 L10 0 L10 10 Z'))).toBe(true);
  });

  it('random star-shaped polygons (vertices in angular order about a centre) are simple (property)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.record({ jitter: fc.double({ min: -0.4, max: 0.4, noNaN: true }), r: fc.double({ min: 10, max: 100, noNaN: true }) }), { minLength: 4, maxLength: 40 }),
        (pts) => {
          const n = pts.length;
          const c = contourFromPoints(
            pts.map((p, i) => {
              const a = ((i + p.jitter) * 2 * Math.PI) / n;
              return { x: p.r * Math.cos(a), y: p.r * Math.sin(a) };
            }),
            true,
          );
          expect(contourSelfCrossings(c)).toEqual([]);
        },
      ),
      { numRuns: 100 },
    );
  });
});

describe('units — outside references', () => {
  it('1 in = 25.4 mm exactly and CSS px = 1/96 in (CSS Values and Units Level 3 §5.2): a 96 px square scaled to mm is 25.4 mm', () => {
    const px = first('M0 0 H96 V96 H0 Z');
    const mm = contourTransform(px, affineScale(25.4 / 96));
    expectNear(contourLength(mm), 4 * 25.4, 1e-12);
  });
});

describe('contourExtremePoints (exact extent along a direction)', () => {
  it('gives the range of a fine flattening (whose vertices lie on the curve), never narrower, at most the flattening tolerance wider (property)', () => {
    const coord = fc.double({ min: -1000, max: 1000, noNaN: true });
    const point = fc.record({ x: coord, y: coord });
    fc.assert(
      fc.property(fc.array(fc.tuple(point, point, point, fc.boolean()), { minLength: 1, maxLength: 5 }), point, fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), (parts, start, angle) => {
        let from = start;
        const segments = parts.map(([c1, c2, to, straight]) => {
          const s = straight ? { kind: 'line' as const, from, to } : { kind: 'cubic' as const, from, c1, c2, to };
          from = to;
          return s;
        });
        const contour = { segments, closed: false };
        const u = { x: Math.cos(angle), y: Math.sin(angle) };
        const range = (pts: readonly { x: number; y: number }[]) => {
          let min = Infinity;
          let max = -Infinity;
          for (const p of pts) {
            const v = p.x * u.x + p.y * u.y;
            min = Math.min(min, v);
            max = Math.max(max, v);
          }
          return { min, max };
        };
        const exact = range(contourExtremePoints(contour, u));
        const fine = range(contourFlatten(contour, 1e-4).map((f) => f.point));
        expect(exact.max).toBeGreaterThanOrEqual(fine.max - 1e-9);
        expect(exact.min).toBeLessThanOrEqual(fine.min + 1e-9);
        expect(exact.max).toBeLessThanOrEqual(fine.max + 1e-4 + 1e-9);
        expect(exact.min).toBeGreaterThanOrEqual(fine.min - 1e-4 - 1e-9);
      }),
      { numRuns: 300 },
    );
  });
});
