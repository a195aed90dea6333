/** Size tables measured on the pattern's geometry (chartFromPattern). */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Bezier } from 'bezier-js';
import {
  DEMO_SIZES,
  FitInputError,
  type Piece,
  chartFromPattern,
  fillChartGaps,
  demoGrade,
  demoPattern,
  edgeLength,
  parsePattern,
  parseSizeChart,
  widthAtLevel,
} from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';

/**
 * A leg piece of straight lines only, so every measure has a closed form:
 * waist (−a,0)→(b,0), centre seam down to (b,D), crotch curve (a straight run) out to the
 * crotch point (b+e,D), inseam down to (b+e,H), hem back to (−a,H), side seam up.
 * Level lines: hip at y = D/2 (width a+b), thigh/knee/calf below D (width a+b+e).
 */
function boxLeg(name: 'front' | 'back', sizes: { size: string; a: number; b: number; e: number; D: number; H: number }[], sa = false): Piece {
  const centre = name === 'front' ? 'centre-front' : 'centre-back';
  return {
    name,
    outlines: sizes.map(({ size, a, b, e, D, H }) => ({
      size,
      d: `M${-a} 0 L${b} 0 L${b} ${D} L${b + e} ${D} L${b + e} ${H} L${-a} ${H} Z`,
      points: [
        { name: 'waist-side', kind: 'corner' as const, x: -a, y: 0 },
        { name: 'waist-centre', kind: 'corner' as const, x: b, y: 0 },
        { name: 'curve', kind: 'corner' as const, x: b, y: D },
        { name: 'crotch-point', kind: 'corner' as const, x: b + e, y: D },
        { name: 'hem-inseam', kind: 'corner' as const, x: b + e, y: H },
        { name: 'hem-side', kind: 'corner' as const, x: -a, y: H },
      ],
    })),
    lines: [
      ...sizes.flatMap(({ size, D, H }) => [
        { role: 'level' as const, name: 'hip', d: `M-900 ${D / 2} L900 ${D / 2}`, size },
        { role: 'level' as const, name: 'thigh', d: `M-900 ${D + 30} L900 ${D + 30}`, size },
        { role: 'level' as const, name: 'knee', d: `M-900 ${(D + H) / 2} L900 ${(D + H) / 2}`, size },
      ]),
      { role: 'grain', name: 'grain', d: 'M0 100 L0 600' },
    ],
    edges: [
      { name: 'waist', role: 'waist', from: 'waist-side', to: 'waist-centre' },
      { name: centre, role: centre, from: 'waist-centre', to: 'curve' },
      { name: 'crotch curve', role: 'crotch-curve', from: 'curve', to: 'crotch-point' },
      { name: 'inseam', role: 'inseam', from: 'crotch-point', to: 'hem-inseam' },
      { name: 'hem', role: 'hem', from: 'hem-inseam', to: 'hem-side' },
      { name: 'side seam', role: 'side-seam', from: 'hem-side', to: 'waist-side' },
    ],
    cut: { count: 2, onFold: false },
    seamAllowanceIncluded: sa,
  };
}

describe('chartFromPattern', () => {
  it('measures a pattern of straight lines to its closed form (two legs; hip round the garment, thigh and knee round one leg)', () => {
    const f = { a: 110, b: 120, e: 50, D: 260, H: 1050 };
    const k = { a: 130, b: 125, e: 95, D: 268, H: 1058 };
    const pattern = parsePattern({ units: 'mm', pieces: [boxLeg('front', [{ size: '10', ...f }]), boxLeg('back', [{ size: '10', ...k }])] });
    const g = chartFromPattern(pattern).sizes[0]!.garment;
    expectNear(g.waist!, 2 * (f.a + f.b + k.a + k.b), 1e-6, 'waist = 2 × (front + back waist edges)');
    expectNear(g.hip!, 2 * (f.a + f.b + k.a + k.b), 1e-6, 'hip = 2 × (front + back widths)');
    expectNear(g.thigh!, f.a + f.b + f.e + k.a + k.b + k.e, 1e-6, 'thigh = front + back (one leg)');
    expectNear(g.knee!, f.a + f.b + f.e + k.a + k.b + k.e, 1e-6, 'knee');
    expectNear(g.hem!, f.a + f.b + f.e + k.a + k.b + k.e, 1e-6, 'hem = front + back hem edges');
    expect(g.calf).toBeUndefined(); // no calf level line: no calf measurement
    expectNear(g.frontRise!, f.D + f.e, 1e-6, 'front rise = centre front + crotch curve');
    expectNear(g.backRise!, k.D + k.e, 1e-6, 'back rise');
    expectNear(g.inseam!, f.H - f.D, 1e-6, 'inseam of the front');
    expectNear(g.crotchDepth!, f.D, 1e-6, 'crotch depth along the grain');
  });

  it('takes the seam allowance off each side when the outline includes it', () => {
    const f = { a: 110, b: 120, e: 50, D: 260, H: 1050 };
    const pattern = parsePattern({ units: 'mm', pieces: [boxLeg('front', [{ size: '10', ...f }], true), boxLeg('back', [{ size: '10', ...f }], true)] });
    const without = chartFromPattern(pattern);
    const withSa = chartFromPattern(pattern, { seamAllowance: 15 });
    expectNear(without.sizes[0]!.garment.hip! - withSa.sizes[0]!.garment.hip!, 4 * 2 * 15, 1e-6, 'hip: 2 pieces × 2 cut × 2 sides × 15');
    expectNear(without.sizes[0]!.garment.thigh! - withSa.sizes[0]!.garment.thigh!, 2 * 2 * 15, 1e-6, 'thigh: one leg, 2 pieces × 2 sides × 15');
    expect(without.notes.join(' ')).toMatch(/include seam allowance, but no width was given/);
  });

  it('girths grow linearly with the box widths (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: 60, max: 200 }), fc.integer({ min: 60, max: 200 }), fc.integer({ min: 20, max: 120 }), (a, b, e) => {
        const s = { a, b, e, D: 260, H: 1000 };
        const pattern = parsePattern({ units: 'mm', pieces: [boxLeg('front', [{ size: '8', ...s }]), boxLeg('back', [{ size: '8', ...s }])] });
        const g = chartFromPattern(pattern).sizes[0]!.garment;
        return Math.abs(g.hip! - 4 * (a + b)) < 1e-6 && Math.abs(g.thigh! - 2 * (a + b + e)) < 1e-6;
      }),
      { numRuns: 25 },
    );
  });

  it('on the demo pattern: hip from the demo grade table in closed form, leg girths = widthAtLevel summed by hand, waist with bezier-js', () => {
    const pattern = parsePattern(demoPattern());
    const chart = chartFromPattern(pattern);
    expect(chart.sizes.map((s) => s.size)).toEqual([...DEMO_SIZES]);
    expect(chart.source).toBe('geometry');
    const front = pattern.pieces.find((p) => p.name === 'front')!;
    const back = pattern.pieces.find((p) => p.name === 'back')!;
    const yoke = pattern.pieces.find((p) => p.name === 'yoke')!;
    DEMO_SIZES.forEach((size, i) => {
      const g = chart.sizes[i]!.garment;
      const d = demoGrade(i);
      // The demo's leg pieces (geometry/demo-pattern.ts): side seam at x = −0.45·q at the hip,
      // centre seam a straight line leaning 3° (front) / 12° (back) reaching x = 0.55·q at the
      // curve start, half-way between hip and crotch levels. So at the hip a piece is
      // q − tan(lean)·(curve start − hip level) wide.
      const qf = d.hip / 4 - 12;
      const qb = d.hip / 4 + 12;
      const wf = qf - Math.tan((3 * Math.PI) / 180) * 0.5 * (d.rise - d.hipDepth);
      const wb = qb - Math.tan((12 * Math.PI) / 180) * 0.5 * (d.rise + 8 - d.hipDepth);
      expectNear(g.hip!, 2 * (wf + wb), 0.01, `hip size ${size}`);
      for (const level of ['thigh', 'knee', 'calf'] as const)
        expectNear(g[level]!, widthAtLevel(front, size, level) + widthAtLevel(back, size, level), 0.01, `${level} size ${size}`);
      // the knee of the demo is straight-sided: front + back = the grade table's knee (one leg)
      expectNear(g.knee!, d.knee, 0.01, `knee = grade table, size ${size}`);
      expectNear(g.crotchDepth!, d.rise, 0.01, `crotch depth = grade rise, size ${size}`);
      // waist: the front's straight waist edge + the yoke's cubic waist edge, × 2 (left and right)
      const fo = front.outlines[i]!;
      const ws = fo.points.find((p) => p.name === 'waist-side')!;
      const wc = fo.points.find((p) => p.name === 'waist-cf')!;
      const yokeWaist = /^M(\S+) (\S+) C(\S+) (\S+) (\S+) (\S+) (\S+) (\S+)/.exec(yoke.outlines[i]!.d)!.slice(1).map(Number);
      const bez = new Bezier(yokeWaist[0]!, yokeWaist[1]!, yokeWaist[2]!, yokeWaist[3]!, yokeWaist[4]!, yokeWaist[5]!, yokeWaist[6]!, yokeWaist[7]!);
      expectNear(g.waist!, 2 * (Math.hypot(wc.x - ws.x, wc.y - ws.y) + bez.length()), 0.05, `waist size ${size} (bezier-js length)`);
      expectNear(g.hem!, edgeLength(front, size, 'hem')! + edgeLength(back, size, 'hem')!, 0.01, `hem size ${size}`);
    });
  });

  it('refuses a pattern without leg pieces, and a size table with a size twice', () => {
    const pocket = parsePattern({ units: 'mm', pieces: [{ name: 'pocket', outlines: [{ size: '8', d: 'M0 0 L100 0 L100 100 Z' }] }] });
    expect(() => chartFromPattern(pocket)).toThrow(FitInputError);
    expect(() => chartFromPattern(pocket)).toThrow(/no leg pieces/);
    expect(() => parseSizeChart({ sizes: [{ size: '8', garment: { hip: 1000 } }, { size: '8', garment: { hip: 1040 } }] })).toThrow(/size "8" appears twice/);
    expect(() => parseSizeChart({ sizes: [{ size: '8', garment: { hip: -1 } }] })).toThrow(/sizes\[0\]\.garment\.hip/);
  });
});

describe('fillChartGaps', () => {
  it('fills only what the printed table leaves out, for sizes both tables have, and says so; printed numbers stay', () => {
    const printed = parseSizeChart({ sizes: [{ size: '8', garment: { hip: 1000 } }, { size: '9', garment: { hip: 1020 } }] });
    const measured = parseSizeChart({ source: 'geometry', sizes: [{ size: '8', garment: { hip: 990, thigh: 600, inseam: 800 } }] });
    const filled = fillChartGaps(printed, measured);
    expect(filled.sizes[0]!.garment).toEqual({ hip: 1000, thigh: 600, inseam: 800 });
    expect(filled.sizes[1]!.garment).toEqual({ hip: 1020 });
    expect(filled.notes.join(' ')).toMatch(/measured on the pieces: thigh \(size 8\); inseam \(size 8\)/);
    expect(fillChartGaps(measured, measured)).toBe(measured);
  });
});
