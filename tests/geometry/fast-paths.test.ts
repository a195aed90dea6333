/**
 * The engine's fast paths must give the results of the plain algorithms they replace: each
 * is checked here against a straightforward reference written out in the test (property
 * tests, fast-check). Tolerances are far below anything that matters (1e-12 of the value).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { type Contour, type Cubic, type Path, type Point, type Segment, applyOps, contourOf, curveSegment, lineSegment, pt, contourFlatCount, contourFlatInto, contourFlatPerimeter, contourIsSimple, contourSignedArea, pathToSvgNow, simplePolygonText, contourFlatPoints, contourFlatten, contourFlattenShared, contourFromPoints, contourNearest, contourSelfCrossings, contourStretch, cubicFlattenTimes, cubicLineIntersections, cubicNearestTime, cubicPoint, cubicSplit, demoPattern, hypotAbove, vecHypot, parsePattern, pathFromSvg, pathToSvg, performOp, POINT_EPSILON, round6, segmentLength, segmentSlice, smoothThrough, solveCubic } from '../../geometry/index.ts';
import { orderByKey } from '../../geometry/sweep.ts';
import { expectNear, expectPointNear } from './helpers.ts';

const coord = fc.double({ min: -2000, max: 2000, noNaN: true });
const point = fc.record({ x: coord, y: coord });
const cubic = fc.tuple(point, point, point, point) as fc.Arbitrary<Cubic>;

/** A contour of lines and cubics end to end from `start` (a cubic's second control point halfway to its end, level with the first). */
function chain(start: Point, parts: readonly (readonly [Point, Point, boolean])[], closed: boolean): Contour {
  let from = start;
  const segments = parts.map(([c, to, straight]): Segment => {
    const s: Segment = straight ? { kind: 'line', from, to } : { kind: 'cubic', from, c1: c, c2: { x: (c.x + to.x) / 2, y: c.y }, to };
    from = to;
    return s;
  });
  return { closed, segments };
}

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

  it('the shared (uncopied) flattening holds the very points a copy holds, asked before or after', () => {
    fc.assert(
      fc.property(cubic, fc.constantFrom(0.01, 0.02, 0.05), fc.boolean(), (c, tolerance, sharedFirst) => {
        const contour = { segments: [{ kind: 'cubic' as const, from: c[0], c1: c[1], c2: c[2], to: c[3] }], closed: false };
        const shared = sharedFirst ? contourFlattenShared(contour, tolerance) : undefined;
        const copy = contourFlatten(contour, tolerance);
        const again = shared ?? contourFlattenShared(contour, tolerance);
        expect(again).not.toBe(copy);
        expect(again.length).toBe(copy.length);
        again.forEach((f, i) => {
          expect(f.point).toBe(copy[i]!.point);
          expect(f.t).toBe(copy[i]!.t);
        });
      }),
      { numRuns: 100 },
    );
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

describe('pathToSvg numbers (fast decimal printing)', () => {
  it('prints what String() prints for the rounded value, and reads back to it', () => {
    const value = fc.oneof(
      fc.double({ min: -1e6, max: 1e6, noNaN: true }),
      fc.integer({ min: -1_000_000_000, max: 1_000_000_000 }).map((n) => n / 1e6 + 5e-7), // near the rounding boundary
      fc.double({ min: -1e-5, max: 1e-5, noNaN: true }),
    );
    fc.assert(
      fc.property(value, value, fc.constantFrom(0, 1, 2, 4, 6), (x, y, decimals) => {
        const d = pathToSvg([{ closed: false, segments: [{ kind: 'line', from: { x, y }, to: { x: y + 1000, y: x - 1000 } }] }], decimals);
        const k = 10 ** decimals;
        const plain = (v: number): string => {
          const r = Math.round(v * k) / k;
          return r === 0 ? '0' : String(r);
        };
        expect(d).toBe(`M${plain(x)} ${plain(y)} L${plain(y + 1000)} ${plain(x - 1000)}`);
        const back = pathFromSvg(d)[0];
        if (back) expectPointNear(back.segments[0]!.from, { x: Math.round(x * k) / k, y: Math.round(y * k) / k }, 1e-9);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('pathToSvg text (written as character codes)', () => {
  it('is the plain text: M, L, C and Z parts joined by spaces, each number as String() prints it rounded', () => {
    const value = fc.oneof(
      fc.double({ min: -2000, max: 2000, noNaN: true }),
      fc.double({ min: -1e12, max: 1e12, noNaN: true }), // past the fast form: String() itself
      fc.double({ min: -1e-5, max: 1e-5, noNaN: true }),
      fc.constantFrom(0, -0, 5e-7, -5e-7, 999999.99995, -999999.99995, 1e6),
    );
    const pt = fc.record({ x: value, y: value });
    const segment = fc.oneof(fc.record({ kind: fc.constant('line' as const), to: pt }), fc.record({ kind: fc.constant('cubic' as const), c1: pt, c2: pt, to: pt }));
    // up to 600 segments: the longest texts outgrow the writer's first 4096 codes
    const contour = fc.record({ closed: fc.boolean(), start: pt, segs: fc.array(segment, { maxLength: 600 }) });
    fc.assert(
      fc.property(fc.array(contour, { maxLength: 4 }), fc.constantFrom(0, 2, 4, 6), (contours, decimals) => {
        const path: Path = contours.map((c) => {
          let from = c.start;
          const segments: Segment[] = c.segs.map((s) => {
            const seg: Segment = s.kind === 'line' ? { kind: 'line', from, to: s.to } : { kind: 'cubic', from, c1: s.c1, c2: s.c2, to: s.to };
            from = s.to;
            return seg;
          });
          return { closed: c.closed, segments };
        });
        const k = 10 ** decimals;
        const plain = (v: number): string => {
          const r = Math.round(v * k) / k;
          return r === 0 ? '0' : String(r);
        };
        const p2 = (q: Point): string => `${plain(q.x)} ${plain(q.y)}`;
        const parts: string[] = [];
        for (const c of path) {
          if (c.segments.length === 0) continue;
          parts.push(`M${p2(c.segments[0]!.from)}`);
          c.segments.forEach((s, i) => {
            if (c.closed && i === c.segments.length - 1 && s.kind === 'line') return;
            parts.push(s.kind === 'line' ? `L${p2(s.to)}` : `C${p2(s.c1)} ${p2(s.c2)} ${p2(s.to)}`);
          });
          if (c.closed) parts.push('Z');
        }
        expect(pathToSvg(path, decimals)).toBe(parts.join(' '));
      }),
      { numRuns: 300 },
    );
  });
});

describe('simplePolygonText (a cut line written from its coordinates)', () => {
  it('gives the text of contourFromPoints(points, true) when that is simple with a positive area, else undefined (or null: the lean test cannot tell)', () => {
    // points on a rough circle (simple, either way round), with repeats, near-repeats and jumps (crossings)
    const polygon = fc
      .record({
        count: fc.integer({ min: 1, max: 40 }),
        radius: fc.double({ min: 1, max: 500, noNaN: true }),
        reverse: fc.boolean(),
        noise: fc.array(fc.tuple(fc.double({ min: -0.3, max: 0.3, noNaN: true }), fc.constantFrom(0, 0, 0, 1, 2, 3)), { minLength: 40, maxLength: 40 }),
      })
      .map(({ count, radius, reverse, noise }) => {
        const pts: Point[] = [];
        for (let i = 0; i < count; i++) {
          const [jitter, kind] = noise[i]!;
          const a = ((reverse ? -1 : 1) * 2 * Math.PI * i) / count + jitter / count;
          const p = { x: radius * Math.cos(a), y: radius * Math.sin(a) };
          if (kind === 1 && pts.length > 0) pts.push({ ...pts[pts.length - 1]! }); // a repeat
          else if (kind === 2 && pts.length > 0) pts.push({ x: pts[pts.length - 1]!.x + POINT_EPSILON / 3, y: pts[pts.length - 1]!.y }); // within POINT_EPSILON
          else if (kind === 3) pts.push({ x: -p.x, y: -p.y }); // across the middle: crossings
          else pts.push(p);
        }
        if (noise[0]![1] === 1 && pts.length > 1) pts.push({ ...pts[0]! }); // the start again at the end
        return pts;
      });
    const seen = { simple: 0, not: 0 };
    fc.assert(
      fc.property(polygon, fc.constantFrom(4, 6), (points, decimals) => {
        const xs = new Float64Array(points.map((p) => p.x));
        const ys = new Float64Array(points.map((p) => p.y));
        const text = simplePolygonText(xs, ys, points.length, decimals);
        const contour = contourFromPoints(points, true);
        const simple = contourIsSimple(contour) && contourSignedArea(contour) > 0;
        if (text === null) return; // the caller asks contourIsSimple itself
        seen[simple ? 'simple' : 'not']++;
        if (simple) expect(text).toBe(pathToSvgNow([contour], decimals));
        else expect(text).toBeUndefined();
      }),
      { numRuns: 3000 },
    );
    // both answers were checked, many times
    expect(seen.simple).toBeGreaterThan(100);
    expect(seen.not).toBeGreaterThan(100);
  });
});

describe('contourNearest (memo)', () => {
  it('gives the same location as a search over every segment, asked once or twice', () => {
    const segment = fc.tuple(point, point, fc.boolean());
    fc.assert(
      fc.property(point, fc.array(segment, { minLength: 1, maxLength: 6 }), point, (start, parts, p) => {
        const contour = chain(start, parts, false);
        // reference: the nearest point of every segment, no pruning
        let best = Infinity;
        for (const s of contour.segments) {
          if (s.kind === 'line') {
            const dx = s.to.x - s.from.x;
            const dy = s.to.y - s.from.y;
            const l2 = dx * dx + dy * dy;
            const t = l2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - s.from.x) * dx + (p.y - s.from.y) * dy) / l2));
            best = Math.min(best, Math.hypot(p.x - (s.from.x + dx * t), p.y - (s.from.y + dy * t)));
          } else {
            const c: Cubic = [s.from, s.c1, s.c2, s.to];
            const q = cubicPoint(c, cubicNearestTime(c, p));
            best = Math.min(best, Math.hypot(p.x - q.x, p.y - q.y));
          }
        }
        const once = contourNearest(contour, p);
        const twice = contourNearest(contour, { x: p.x, y: p.y });
        expectNear(once.distance, best, 1e-9 * Math.max(1, best));
        expect(twice.segmentIndex).toBe(once.segmentIndex);
        expectNear(twice.t, once.t, 0);
      }),
      { numRuns: 300 },
    );
  });

  it('keeps points apart that share one coordinate, and takes 0 and −0 as the same (as its text key did)', () => {
    const contour = contourFromPoints([{ x: 0, y: 0 }, { x: 10, y: 0 }, { x: 10, y: 10 }, { x: 0, y: 10 }], true);
    const a = contourNearest(contour, { x: 5, y: 1 });
    const b = contourNearest(contour, { x: 5, y: 9 });
    const c = contourNearest(contour, { x: 1, y: 8 });
    expect(a.point).toEqual({ x: 5, y: 0 });
    expect(b.point).toEqual({ x: 5, y: 10 });
    expect(c.point).toEqual({ x: 0, y: 8 });
    expect(contourNearest(contour, { x: -0, y: 3 })).toBe(contourNearest(contour, { x: 0, y: 3 }));
  });
});

describe('contourNearest (a point on the contour)', () => {
  it('gives the first segment that reaches the least distance, as the search over every segment does, also for points on its vertices', () => {
    const segment = fc.tuple(point, point, fc.boolean());
    fc.assert(
      fc.property(point, fc.array(segment, { minLength: 1, maxLength: 6 }), fc.nat(), fc.boolean(), (start, parts, pick, closed) => {
        const contour = chain(start, parts, closed);
        const segments = contour.segments;
        // a vertex (an end point of two segments), as landmarks are; asked with a fresh object each time
        const v = pick % 2 === 0 ? segments[pick % segments.length]!.from : segments[pick % segments.length]!.to;
        const p = { x: v.x, y: v.y };
        // reference: every segment, no pruning, the first strict least distance
        let best = Infinity;
        let index = 0;
        let time = 0;
        contour.segments.forEach((s, i) => {
          let t: number;
          let q: Point;
          if (s.kind === 'line') {
            const dx = s.to.x - s.from.x;
            const dy = s.to.y - s.from.y;
            const l2 = dx * dx + dy * dy;
            t = l2 === 0 ? 0 : Math.max(0, Math.min(1, ((p.x - s.from.x) * dx + (p.y - s.from.y) * dy) / l2));
            q = { x: s.from.x + dx * t, y: s.from.y + dy * t };
          } else {
            const c: Cubic = [s.from, s.c1, s.c2, s.to];
            t = cubicNearestTime(c, p);
            q = cubicPoint(c, t);
          }
          const d = Math.hypot(p.x - q.x, p.y - q.y);
          if (d < best) {
            best = d;
            index = i;
            time = t;
          }
        });
        const found = contourNearest(contour, p);
        expect(found.segmentIndex).toBe(index);
        expect(found.t).toBe(time);
        expectNear(found.distance, best, 1e-9 * Math.max(1, best));
      }),
      {
        numRuns: 300,
        // found by a run: a segment from x = −1.57e-162 to −1e-323 whose end is computed as 0,
        // outside its own box (the pruned search once skipped it)
        examples: [[{ x: 0, y: 5e-324 }, [[{ x: 0, y: 0 }, { x: -1.5717277847026288e-162, y: 0 }, false], [{ x: 0, y: 0 }, { x: -1e-323, y: 0 }, true], [{ x: 0, y: 0 }, { x: 0, y: 0 }, false]], 1697401127, false]],
      },
    );
  });
});

describe('contourFlatPerimeter', () => {
  it('is the sum of the chords of contourFlatPoints around the loop, in order, to the last digit', () => {
    const segment = fc.tuple(point, point, fc.boolean());
    fc.assert(
      fc.property(point, fc.array(segment, { minLength: 0, maxLength: 6 }), fc.boolean(), fc.constantFrom(0.01, 0.02, 0.05), (start, parts, closed, tolerance) => {
        const contour = chain(start, parts, closed);
        const flat = contourFlatPoints(contour, tolerance);
        let perimeter = 0;
        for (let i = 0; i < flat.length; i++) perimeter += Math.hypot(flat[i]!.x - flat[(i + 1) % flat.length]!.x, flat[i]!.y - flat[(i + 1) % flat.length]!.y);
        expect(contourFlatPerimeter(contour, tolerance)).toBe(perimeter);
      }),
      { numRuns: 300 },
    );
  });
});

describe('contourFlatInto / contourFlatCount (flattened points as coordinates)', () => {
  it('write the numbers of contourFlatPoints, as many, after any offset', () => {
    const segment = fc.tuple(point, point, fc.boolean());
    fc.assert(
      fc.property(point, fc.array(segment, { minLength: 0, maxLength: 6 }), fc.boolean(), fc.constantFrom(0.01, 0.02, 0.05), fc.nat(5), (start, parts, closed, tolerance, at) => {
        const contour = chain(start, parts, closed);
        const flat = contourFlatPoints(contour, tolerance);
        expect(contourFlatCount(contour, tolerance)).toBe(flat.length);
        const xs = new Float64Array(at + flat.length);
        const ys = new Float64Array(at + flat.length);
        expect(contourFlatInto(contour, tolerance, xs, ys, at)).toBe(at + flat.length);
        flat.forEach((p, i) => {
          expect(Object.is(xs[at + i], p.x)).toBe(true);
          expect(Object.is(ys[at + i], p.y)).toBe(true);
        });
      }),
      { numRuns: 300 },
    );
  });
});

describe('flattening of shared cubics (memo by segment)', () => {
  it('a contour reusing cubics other contours flattened first (same or other tolerances) flattens as the plain subdivision', () => {
    fc.assert(
      fc.property(fc.array(cubic, { minLength: 1, maxLength: 4 }), fc.array(fc.constantFrom(0.01, 0.02, 0.05, 0.1), { maxLength: 5 }), fc.constantFrom(0.01, 0.05), (cs, firsts, second) => {
        const segments = cs.map((c) => ({ kind: 'cubic' as const, from: c[0], c1: c[1], c2: c[2], to: c[3] }));
        // earlier contours (one per tolerance, more tolerances than the memo keeps) hold every
        // other cubic; the last one all of them, in reverse order
        for (const first of firsts) contourFlattenShared({ segments: segments.filter((_, i) => i % 2 === 0), closed: false }, first);
        const order = [...segments.keys()].reverse();
        const flat = contourFlatten({ segments: order.map((i) => segments[i]!), closed: false }, second);
        const expected: { point: Point; segmentIndex: number; t: number }[] = [{ point: cs[order[0]!]![0], segmentIndex: 0, t: 0 }];
        order.forEach((i, j) => {
          const ts = referenceFlattenTimes(cs[i]!, second);
          for (let k = 1; k < ts.length; k++) expected.push({ point: cubicPoint(cs[i]!, ts[k]!), segmentIndex: j, t: ts[k]! });
        });
        expect(flat.length).toBe(expected.length);
        flat.forEach((f, k) => {
          expect(f.segmentIndex).toBe(expected[k]!.segmentIndex);
          expectNear(f.t, expected[k]!.t, 1e-15, `t[${k}]`);
          expectPointNear(f.point, expected[k]!.point, 1e-9, `point ${k}`);
        });
      }),
      { numRuns: 200 },
    );
  });
});

describe('applyOps (path text printed once, at the end)', () => {
  const base = applyOps(demoPattern(), [{ op: 'blend', levels: [{ level: 'waist', size: '4' }, { level: 'knee', size: '10' }] }]).pattern;
  const op = fc.oneof(
    fc.record({ op: fc.constant('lengthen'), line: fc.constantFrom('upper leg', 'lower leg'), amount: fc.double({ min: -80, max: 80, noNaN: true }) }),
    fc.record({ op: fc.constant('rise'), line: fc.constant('rise'), amount: fc.double({ min: -30, max: 60, noNaN: true }) }),
    fc.record({ op: fc.constant('girth'), edge: fc.constantFrom('side-seam', 'inseam'), level: fc.constantFrom('hip', 'thigh', 'knee', 'waist'), amount: fc.double({ min: -30, max: 30, noNaN: true }) }),
    fc.record({ op: fc.constant('shrinkage'), lengthwise: fc.double({ min: -5, max: 10, noNaN: true }), crosswise: fc.double({ min: -5, max: 10, noNaN: true }) }),
    fc.record({ op: fc.constant('seam-allowance'), width: fc.double({ min: 0, max: 25, noNaN: true }) }),
  );

  it('gives exactly what performing the operations one by one gives, text and all, or the same refusal', () => {
    fc.assert(
      fc.property(fc.array(op, { minLength: 1, maxLength: 4 }), (ops) => {
        let stepwise: string;
        try {
          let current = base;
          const cautions: unknown[] = [];
          ops.forEach((o, index) => {
            const r = performOp(current, o);
            current = r.pattern;
            for (const c of r.cautions) cautions.push({ ...c, op: index });
          });
          stepwise = JSON.stringify({ pattern: current, cautions });
        } catch (error) {
          stepwise = `refused: ${(error as Error).message}`;
        }
        let replayed: string;
        try {
          replayed = JSON.stringify(applyOps(base, ops));
        } catch (error) {
          replayed = `refused: ${(error as Error).message}`;
        }
        if (stepwise.startsWith('refused')) expect(replayed.startsWith('refused')).toBe(true);
        else expect(replayed).toBe(stepwise);
        // every path in the result is real path data
        if (!replayed.startsWith('refused')) parsePattern(JSON.parse(replayed).pattern);
      }),
      { numRuns: 15 },
    );
  });

  it('refuses text that looks like its own placeholder as unreadable path data, as before', () => {
    const bad = { ...base, pieces: base.pieces.map((p, i) => (i === 0 ? { ...p, lines: p.lines.map((l) => (l.role === 'grain' ? { ...l, d: '\u0000path:1:0' } : l)) } : p)) };
    expect(() => applyOps(bad, [{ op: 'shrinkage', lengthwise: 3, crosswise: 2 }])).toThrow(/path data/);
  });
});

describe('contourSelfCrossings (lean sweep first)', () => {
  it('finds a crossing exactly when some two non-neighbouring edges meet (all pairs, by hand)', () => {
    const grid = fc.record({ x: fc.integer({ min: 0, max: 12 }), y: fc.integer({ min: 0, max: 12 }) });
    fc.assert(
      fc.property(fc.array(grid, { minLength: 3, maxLength: 14 }), fc.boolean(), (points, closed) => {
        const contour = contourFromPoints(points, closed);
        // the polyline as contourSelfCrossings sees it: lines only, so its vertices are the points
        const v = contour.segments.map((s) => s.from);
        if (!contour.closed && contour.segments.length > 0) v.push(contour.segments[contour.segments.length - 1]!.to);
        const edgeCount = contour.closed ? v.length : v.length - 1;
        const meet = (a: Point, b: Point, c: Point, d: Point): boolean => {
          const cross = (p: Point, q: Point, r: Point): number => (q.x - p.x) * (r.y - p.y) - (q.y - p.y) * (r.x - p.x);
          const on = (p: Point, q: Point, r: Point): boolean => Math.min(p.x, q.x) <= r.x && r.x <= Math.max(p.x, q.x) && Math.min(p.y, q.y) <= r.y && r.y <= Math.max(p.y, q.y);
          const d1 = cross(c, d, a);
          const d2 = cross(c, d, b);
          const d3 = cross(a, b, c);
          const d4 = cross(a, b, d);
          if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) return true;
          return (d1 === 0 && on(c, d, a)) || (d2 === 0 && on(c, d, b)) || (d3 === 0 && on(a, b, c)) || (d4 === 0 && on(a, b, d));
        };
        let expected = false;
        if (edgeCount >= 3)
          for (let i = 0; i < edgeCount && !expected; i++)
            for (let j = i + 2; j < edgeCount && !expected; j++) {
              if (contour.closed && j - i === edgeCount - 1) continue;
              expected = meet(v[i]!, v[(i + 1) % v.length]!, v[j]!, v[(j + 1) % v.length]!);
            }
        expect(contourSelfCrossings(contour).length > 0).toBe(expected);
      }),
      { numRuns: 2000 },
    );
  });
});

describe('orderByKey (natural runs, scratch arrays)', () => {
  it('gives the stable order by key that a comparator sort gives, on runs, ties and shuffles', () => {
    // keys as the sweeps see them: stretches that rise and fall (a polygon's edges in order),
    // with repeated values, or no order at all (the plain merge sort's case)
    const stretch = fc.record({ start: fc.integer({ min: -50, max: 50 }), steps: fc.array(fc.integer({ min: 0, max: 3 }), { maxLength: 40 }), down: fc.boolean() });
    const runs = fc.array(stretch, { maxLength: 12 }).map((parts) =>
      parts.flatMap(({ start, steps, down }) => {
        let v = start;
        return steps.map((d) => (v += down ? -d : d) / 4);
      }),
    );
    const shuffled = fc.array(fc.integer({ min: -20, max: 20 }).map((v) => v / 8), { maxLength: 300 });
    fc.assert(
      fc.property(fc.oneof(runs, shuffled), (values) => {
        const key = Float64Array.from(values);
        const expected = values.map((_, i) => i).sort((a, b) => key[a]! - key[b]!); // Array.prototype.sort is stable
        // a second call first, with other keys, so that stale scratch entries would show
        orderByKey(Float64Array.from(values, (v) => -v), values.length);
        expect(Array.from(orderByKey(key, values.length).subarray(0, values.length))).toEqual(expected);
      }),
      { numRuns: 3000 },
    );
  });
});

describe('distance tests on squares (hypotAbove)', () => {
  it('decides as Math.hypot(dx, dy) > limit does, near the limit too', () => {
    const limit = fc.constantFrom(0, 1e-6, 1e-5, 0.01, 1, 1e3, Infinity);
    const any = fc.oneof(fc.double({ noNaN: false }), fc.double({ min: -1e-5, max: 1e-5 }), fc.double({ min: -1e-160, max: 1e-160 }));
    // points at the limit's distance give the ties a squared test could get wrong
    const onCircle = fc.tuple(fc.double({ min: 0, max: 2 * Math.PI, noNaN: true }), fc.constantFrom(1 - 1e-15, 1, 1 + 1e-15, 1 - 1e-10, 1 + 1e-10));
    fc.assert(
      fc.property(limit, fc.oneof(fc.tuple(any, any), onCircle.map(([a, k]) => [Math.cos(a) * k, Math.sin(a) * k] as [number, number])), (l, [x, y]) => {
        const dx = Number.isFinite(l) && l > 0 && Math.abs(x) <= 1.1 && Math.abs(y) <= 1.1 ? x * l : x;
        const dy = Number.isFinite(l) && l > 0 && Math.abs(x) <= 1.1 && Math.abs(y) <= 1.1 ? y * l : y;
        expect(hypotAbove(dx, dy, l)).toBe(Math.hypot(dx, dy) > l);
      }),
      { numRuns: 20000 },
    );
  });
});

describe('vecHypot (two-number hypot without an argument array)', () => {
  // Reference: the engine's own Math.hypot (ECMAScript built-in). Node runs V8, whose algorithm
  // vecHypot follows, so the two must agree to the last bit, signs of zero, NaN and ∞ included.
  it('gives Math.hypot(dx, dy) exactly, for any two numbers', () => {
    const any = fc.oneof(
      fc.double({ noNaN: false }),
      fc.double({ min: -2000, max: 2000, noNaN: true }),
      fc.double({ min: -1e-300, max: 1e-300, noNaN: true }),
      fc.constantFrom(0, -0, Infinity, -Infinity, NaN, Number.MIN_VALUE, Number.MAX_VALUE, 3, 4),
    );
    fc.assert(
      fc.property(any, any, (dx, dy) => {
        expect(Object.is(vecHypot(dx, dy), Math.hypot(dx, dy))).toBe(true);
      }),
      { numRuns: 50000 },
    );
  });
});

describe('landmark rounding (round6)', () => {
  it('gives Number(v.toFixed(6)), sign of zero included', () => {
    const value = fc.oneof(
      fc.double({ noNaN: false }),
      fc.double({ min: -2000, max: 2000, noNaN: true }),
      fc.integer({ min: -2_000_000_000, max: 2_000_000_000 }).map((n) => n / 1e6 + 5e-7), // halves
      fc.integer({ min: -2_000_000_000, max: 2_000_000_000 }).map((n) => n / 1e6 - 5e-7),
      fc.double({ min: -1e-5, max: 1e-5, noNaN: true }),
      fc.double({ min: 9e8, max: 2e9, noNaN: true }),
    );
    fc.assert(
      fc.property(value, (v) => {
        expect(Object.is(round6(v), Number(v.toFixed(6)))).toBe(true);
      }),
      { numRuns: 20000 },
    );
  });
});

describe('cubicLineIntersections (one-side reject)', () => {
  /** The full search without the reject: the power-basis cubic of the signed distances, its roots clamped to [0, 1] within 1e-9, sorted, near repeats merged. */
  function referenceIntersections(c: Cubic, origin: Point, direction: Point): number[] {
    const dl = Math.hypot(direction.x, direction.y);
    if (dl < 1e-6) return [];
    const nx = -direction.y / dl;
    const ny = direction.x / dl;
    const [s0, s1, s2, s3] = c.map((p) => nx * (p.x - origin.x) + ny * (p.y - origin.y)) as [number, number, number, number];
    if (Math.max(Math.abs(s0), Math.abs(s1), Math.abs(s2), Math.abs(s3)) < 1e-6) return [];
    const roots = solveCubic(-s0 + 3 * s1 - 3 * s2 + s3, 3 * s0 - 6 * s1 + 3 * s2, -3 * s0 + 3 * s1, s0)
      .filter((t) => t >= -1e-9 && t <= 1 + 1e-9)
      .map((t) => Math.min(1, Math.max(0, t)))
      .sort((a, b) => a - b);
    const out: number[] = [];
    for (const t of roots) if (out.length === 0 || t - out[out.length - 1]! > 1e-8) out.push(t);
    return out;
  }
  const small = fc.oneof(fc.constant(0), fc.double({ min: -1e-3, max: 1e-3, noNaN: true }), fc.double({ min: -1e-9, max: 1e-9, noNaN: true }), coord);
  it('gives the full search’s parameters to the last digit, lines through or just beside the control points included', () => {
    fc.assert(
      fc.property(cubic, fc.integer({ min: 0, max: 3 }), point, small, (c, at, dir, off) => {
        // a line through one control point (or nearly): the curve touches it at an end, or all its control points lie barely on one side
        const dl = Math.hypot(dir.x, dir.y);
        const o = dl === 0 ? c[at]! : { x: c[at]!.x - (dir.y / dl) * off, y: c[at]!.y + (dir.x / dl) * off };
        expect(cubicLineIntersections(c, o, dir)).toEqual(referenceIntersections(c, o, dir));
      }),
      { numRuns: 2000 },
    );
  });
});

describe('contourStretch (a cubic taken whole is kept)', () => {
  it('gives the numbers of the stretch sliced with segmentSlice everywhere, with locations on vertices and inside segments', () => {
    const loc = (n: number) => fc.record({ segmentIndex: fc.integer({ min: 0, max: n - 1 }), t: fc.oneof(fc.constant(0), fc.constant(1), fc.double({ min: 0, max: 1, noNaN: true })) });
    fc.assert(
      fc.property(
        fc.array(fc.tuple(point, point, point, fc.boolean()), { minLength: 2, maxLength: 6 }),
        point,
        fc.boolean(),
        fc.nat(),
        fc.nat(),
        (parts, start, closed, i, j) => {
          // a contour of cubics and lines through random points
          let d = `M${start.x} ${start.y}`;
          for (const [c1, c2, to, line] of parts) d += line ? ` L${to.x} ${to.y}` : ` C${c1.x} ${c1.y} ${c2.x} ${c2.y} ${to.x} ${to.y}`;
          if (closed) d += ' Z';
          const c = pathFromSvg(d)[0];
          if (!c || c.segments.length === 0) return;
          const n = c.segments.length;
          const [a, b] = fc.sample(fc.tuple(loc(n), loc(n)), { numRuns: 1, seed: i * 7919 + j })[0]!;
          const got = contourStretch(c, a, b);
          // the reference: every end segment sliced (values compared, −0 told apart from 0)
          const sliced = (s: (typeof c.segments)[number], t0: number, t1: number) => segmentSlice(s, t0, t1);
          const ref = ((): typeof c.segments => {
            const segs = c.segments;
            // the same rule for dropping near-empty parts: a chord over ten POINT_EPSILON or an arc length over POINT_EPSILON
            const keep = (s: (typeof segs)[number]) => Math.hypot(s.from.x - s.to.x, s.from.y - s.to.y) > 10 * POINT_EPSILON || segmentLength(s, 1e-3) > POINT_EPSILON;
            const out: (typeof segs)[number][] = [];
            const cmp = a.segmentIndex - b.segmentIndex || a.t - b.t;
            if (cmp < 0 || (cmp === 0 && !c.closed)) {
              if (a.segmentIndex === b.segmentIndex) {
                if (cmp < 0) out.push(sliced(segs[a.segmentIndex]!, a.t, b.t));
              } else {
                out.push(sliced(segs[a.segmentIndex]!, a.t, 1));
                for (let k = a.segmentIndex + 1; k < b.segmentIndex; k++) out.push(segs[k]!);
                out.push(sliced(segs[b.segmentIndex]!, 0, b.t));
              }
            } else if (c.closed) {
              out.push(sliced(segs[a.segmentIndex]!, a.t, 1));
              for (let k = a.segmentIndex + 1; k < segs.length; k++) out.push(segs[k]!);
              for (let k = 0; k < b.segmentIndex; k++) out.push(segs[k]!);
              out.push(sliced(segs[b.segmentIndex]!, 0, b.t));
            }
            return out.filter(keep);
          })();
          expect(got.segments).toStrictEqual(ref);
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe('points, segments and contours made by constructors (engine-speed-7)', () => {
  // They are made by constructors instead of literals only for the garbage collector's sake;
  // to everything that reads them they must be the same plain data as the literals.
  it('have exactly the own enumerable fields of the literal, in the same order, and print the same JSON', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true }), fc.double({ noNaN: true }), (x, y) => {
        const p = pt(x, y);
        expect(Object.keys(p)).toEqual(['x', 'y']);
        expect(JSON.stringify(p)).toBe(JSON.stringify({ x, y }));
        expect({ ...p }).toStrictEqual({ x, y });
      }),
    );
    const [a, b, c, d] = [pt(0, 0), pt(1, 2), pt(3, 4), pt(5, 6)];
    expect(Object.keys(lineSegment(a, b))).toEqual(['kind', 'from', 'to']);
    expect(Object.keys(curveSegment(a, b, c, d))).toEqual(['kind', 'from', 'c1', 'c2', 'to']);
    expect(JSON.stringify(curveSegment(a, b, c, d))).toBe(JSON.stringify({ kind: 'cubic', from: a, c1: b, c2: c, to: d }));
    expect(Object.keys(contourOf([lineSegment(a, b)], false))).toEqual(['segments', 'closed']);
  });

  it('are what reading path data gives', () => {
    const [contour] = pathFromSvg('M 0 0 L 10 0 C 12 1 13 4 10 10 Z');
    expect(JSON.parse(JSON.stringify(contour))).toEqual({
      segments: [
        { kind: 'line', from: { x: 0, y: 0 }, to: { x: 10, y: 0 } },
        { kind: 'cubic', from: { x: 10, y: 0 }, c1: { x: 12, y: 1 }, c2: { x: 13, y: 4 }, to: { x: 10, y: 10 } },
        { kind: 'line', from: { x: 10, y: 10 }, to: { x: 0, y: 0 } },
      ],
      closed: true,
    });
  });
});
