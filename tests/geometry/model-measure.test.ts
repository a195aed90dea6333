import { describe, expect, it } from 'vitest';
import {
  DEMO_SIZES,
  PatternError,
  type Piece,
  contourArea,
  contourIsSimple,
  crotchJoin,
  crotchLength,
  demoPattern,
  edgeLength,
  measurePattern,
  outlineContour,
  pairedSeamReport,
  parsePattern,
  performLengthen,
  widthAtLevel,
} from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';
import { patternOf } from './builders.ts';

describe('pattern model — the issue 3 contract', () => {
  it('the contract shape alone parses, gets version 1 and defaults, and survives a JSON round trip', () => {
    const p = parsePattern({
      units: 'mm',
      pieces: [{ name: 'front', outlines: [{ size: '8', d: 'M0 0 L100 0 L100 200 L0 200 Z' }], lines: [{ role: 'lengthen', name: 'lower leg', d: 'M-10 150 L110 150' }] }],
    });
    expect(p.version).toBe(1);
    expect(p.pieces[0]!.cut).toEqual({ count: 2, onFold: false });
    expect(p.pieces[0]!.seamAllowanceIncluded).toBe(false);
    expect(parsePattern(JSON.parse(JSON.stringify(p)))).toEqual(p);
  });

  it('bad input gets a clear error naming where, and every problem is listed', () => {
    const bad = {
      units: 'mm',
      pieces: [
        {
          name: 'front',
          outlines: [
            { size: '8', d: 'M0 0 L100 0 L100 200' },
            { size: '8', d: 'M0 0 L100 0 L100 200 L0 200 Z', points: [{ name: 'x', kind: 'corner', x: 50, y: 50 }] },
          ],
          edges: [{ name: 'hem', role: 'hem', from: 'a', to: 'b' }],
        },
      ],
    };
    try {
      parsePattern(bad);
      expect.fail('should have thrown');
    } catch (error) {
      expect(error).toBeInstanceOf(PatternError);
      const issues = (error as PatternError).issues.map((i) => `${i.path}: ${i.message}`).join('\n');
      expect(issues).toMatch(/pieces\[0\]\.outlines\[0\]\.d: .*must be one closed contour/);
      expect(issues).toMatch(/size "8" appears twice/);
      expect(issues).toMatch(/landmark "x" lies 50\.00 mm from the outline/);
      expect(issues).toMatch(/edge "hem" needs landmark "a"/);
    }
    expect(() => parsePattern({ units: 'in', pieces: [] })).toThrow(PatternError);
    expect(() => parsePattern({ units: 'mm', pieces: [{ name: 'p', outlines: [{ size: '1', d: 'M0 0 L1 x' }] }] })).toThrow(/unreadable path data/);
  });
});

describe('demo pattern — invented, generated from our own grade table', () => {
  const demo = parsePattern(demoPattern());
  it('front, back, yoke, waistband and pockets, each with sizes 0 to 20 (11 sizes), nested and simple', () => {
    expect(demo.pieces.map((p) => p.name)).toEqual(['front', 'back', 'yoke', 'waistband', 'front pocket bag', 'back pocket']);
    for (const piece of demo.pieces) {
      expect(piece.outlines.map((o) => o.size)).toEqual([...DEMO_SIZES]);
      const areas = piece.outlines.map((o) => contourArea(outlineContour(o)));
      for (let i = 1; i < areas.length; i++) expect(areas[i]!, piece.name).toBeGreaterThan(areas[i - 1]!);
      for (const o of piece.outlines) expect(contourIsSimple(outlineContour(o)), `${piece.name} ${o.size}`).toBe(true);
    }
    const front = demo.pieces[0]!;
    for (const name of ['upper leg', 'lower leg', 'rise']) expect(front.lines.some((l) => l.role === 'lengthen' && l.name === name)).toBe(true);
    for (const name of ['hip', 'crotch', 'thigh', 'knee', 'calf']) expect(front.lines.some((l) => l.role === 'level' && l.name === name)).toBe(true);
  });

  it('is generated fresh and deterministically', () => {
    expect(JSON.stringify(demoPattern())).toBe(JSON.stringify(demoPattern()));
    const a = demoPattern();
    a.pieces.pop();
    expect(demoPattern().pieces).toHaveLength(6);
  });
});

describe('measurements', () => {
  const rect = patternOf({
    name: 'front',
    outlines: [
      {
        size: '10',
        d: 'M0 0 L200 0 L200 800 L0 800 Z',
        points: [
          { name: 'ws', kind: 'corner', x: 0, y: 0 },
          { name: 'wc', kind: 'corner', x: 200, y: 0 },
          { name: 'hc', kind: 'corner', x: 200, y: 800 },
          { name: 'hs', kind: 'corner', x: 0, y: 800 },
        ],
      },
    ],
    lines: [{ role: 'level', name: 'knee', d: 'M-50 500 L250 500' }],
    edges: [
      { name: 'waist', role: 'waist', from: 'ws', to: 'wc' },
      { name: 'inseam', role: 'inseam', from: 'wc', to: 'hc' },
      { name: 'hem', role: 'hem', from: 'hc', to: 'hs' },
      { name: 'side seam', role: 'side-seam', from: 'hs', to: 'ws' },
    ],
    cut: { count: 2, onFold: false },
    seamAllowanceIncluded: false,
  });

  it('edge lengths, area, perimeter and width at a level of a rectangle (closed form)', () => {
    const m = measurePattern(rect)[0]!.outlines[0]!;
    expect(Object.fromEntries(m.edges.map((e) => [e.name, Math.round(e.length * 1e6) / 1e6]))).toEqual({ waist: 200, inseam: 800, hem: 200, 'side seam': 800 });
    expectNear(m.area, 160000, 1e-9);
    expectNear(m.perimeter, 2000, 1e-9);
    expectNear(widthAtLevel(rect.pieces[0]!, '10', 'knee'), 200, 1e-9);
  });

  it('paired-seam report: a piece on the same side as the back (by its centre-back edge) adds its side seam; others do not', () => {
    const leg = rect.pieces[0]!;
    const withCentre = (p: Piece, name: string, role: 'centre-front' | 'centre-back'): Piece => ({ ...p, name, edges: [...p.edges, { name: role, role, from: p.edges[0]!.from, to: p.edges[0]!.to }] });
    const front = withCentre(leg, 'front', 'centre-front');
    const back = withCentre(leg, 'back', 'centre-back');
    const yoke = withCentre(leg, 'yoke', 'centre-back');
    const sideless = { ...leg, name: 'facing' };
    const r = pairedSeamReport(patternOf(front, back, yoke, sideless)).find((x) => x.role === 'side-seam')!;
    expect(r.first.pieces).toEqual(['front']);
    expect(r.second.pieces).toEqual(['back', 'yoke']);
    expectNear(r.difference, -800, 1e-9);
    expect(r.withinTolerance).toBe(false);
    // a front piece (centre front) joins the front's side instead, and then they match again
    const frontYoke = withCentre(leg, 'front yoke', 'centre-front');
    const even = pairedSeamReport(patternOf(front, back, yoke, frontYoke)).find((x) => x.role === 'side-seam')!;
    expect(even.first.pieces).toEqual(['front', 'front yoke']);
    expectNear(even.difference, 0, 1e-9);
    // two pieces of the same side compared with each other: each alone
    const same = pairedSeamReport(patternOf(back, yoke, withCentre(leg, 'back 2', 'centre-back')), { first: 'back', second: 'back 2' }).find((x) => x.role === 'side-seam')!;
    expect([same.first.pieces, same.second.pieces]).toEqual([['back'], ['back 2']]);
  });

  it('paired-seam report walks the notches from the hem: a 3 mm shift is outside the 2 mm tolerance, 1 mm within; a yoke\'s notch counts after the back (closed form)', () => {
    const leg = rect.pieces[0]!;
    const notched = (name: string, role: 'centre-front' | 'centre-back', notches: [number, number][]): Piece => ({
      ...leg,
      name,
      outlines: leg.outlines.map((o) => ({ ...o, points: [...o.points, ...notches.map(([x, y], i) => ({ name: `n${i}`, kind: 'notch' as const, x, y }))] })),
      edges: [...leg.edges, { name: role, role, from: 'ws', to: 'wc' }],
    });
    // side seam x = 0 from the hem (y = 800) up; inseam x = 200, drawn from the waist down to the hem
    const front = notched('front', 'centre-front', [[0, 300], [200, 500]]);
    const back = notched('back', 'centre-back', [[0, 303], [200, 501]]);
    const report = pairedSeamReport(patternOf(front, back));
    const side = report.find((r) => r.role === 'side-seam')!;
    const inseam = report.find((r) => r.role === 'inseam')!;
    expect(side.notches.map((n) => [n.first.fromHem, n.second.fromHem])).toEqual([[500, 497]]);
    expectNear(side.notches[0]!.difference, 3, 1e-9);
    expect(side.notchesMatch).toBe(false);
    expect(inseam.notches.map((n) => [n.first.fromHem, n.second.fromHem])).toEqual([[300, 299]]);
    expect(inseam.notchesMatch).toBe(true);
    // a yoke on the back: its side seam continues the back's from its end away from its waist (y = 800)
    const yoke = notched('yoke', 'centre-back', [[0, 790]]);
    const withYoke = pairedSeamReport(patternOf(front, back, yoke)).find((r) => r.role === 'side-seam')!;
    expect(withYoke.second.notches!.map((n) => [n.piece, n.fromHem])).toEqual([['back', 497], ['yoke', 810]]);
    // one notch more on one side: they do not match, whatever the pairs say
    expect(withYoke.notches).toHaveLength(1);
    expect(withYoke.notchesMatch).toBe(false);
    // a back without a hem edge has nothing to measure its notches from: no pairs, nothing flagged, and no count said
    const hemless = { ...back, edges: back.edges.filter((e) => e.role !== 'hem') };
    const unmeasured = pairedSeamReport(patternOf(front, hemless)).find((r) => r.role === 'side-seam')!;
    expect([unmeasured.second.notches, unmeasured.notches, unmeasured.notchesMatch]).toEqual([undefined, [], true]);
    expect(unmeasured.first.notches).toHaveLength(1);
  });

  it('crotch join: the angle between crotch curve and inseam on each piece, and the turn where they meet laid together (closed form)', () => {
    // a square corner at the crotch point B (100, 0); the back's crotch curve comes up from it at 30° above the line
    const quad = (name: string, role: 'centre-front' | 'centre-back', top: { x: number; y: number }): Piece => ({
      name,
      outlines: [
        {
          size: '10',
          d: `M${top.x} ${top.y} L100 0 L100 500 L0 500 Z`,
          points: [
            { name: 'a', kind: 'corner', x: top.x, y: top.y },
            { name: 'b', kind: 'corner', x: 100, y: 0 },
            { name: 'c', kind: 'corner', x: 100, y: 500 },
            { name: 'd', kind: 'corner', x: 0, y: 500 },
          ],
        },
      ],
      lines: [],
      edges: [
        { name: 'crotch curve', role: 'crotch-curve', from: 'a', to: 'b' },
        { name: 'inseam', role: 'inseam', from: 'b', to: 'c' },
        { name: 'hem', role: 'hem', from: 'c', to: 'd' },
        { name: role, role, from: 'd', to: 'a' },
      ],
      cut: { count: 2, onFold: false },
      seamAllowanceIncluded: false,
    });
    const front = quad('front', 'centre-front', { x: 0, y: 0 });
    const square = crotchJoin(patternOf(front, quad('back', 'centre-back', { x: 0, y: 0 })))[0]!;
    expectNear(square.first.angle, 90, 1e-9);
    expectNear(square.turn, 0, 1e-9);
    expect(square.smooth).toBe(true);
    const slanted = crotchJoin(patternOf(front, quad('back', 'centre-back', { x: 0, y: -100 * Math.tan(Math.PI / 6) })))[0]!;
    // away from B along the back's curve: (−cos 30°, −sin 30°); along the inseam: (0, 1) → 120°
    expectNear(slanted.second.angle, 120, 1e-9);
    expectNear(slanted.turn, 30, 1e-9);
    expect(slanted.smooth).toBe(false);
    // within the 5° tolerance: 3° is smooth
    expect(crotchJoin(patternOf(front, quad('back', 'centre-back', { x: 0, y: -100 * Math.tan((3 * Math.PI) / 180) })))[0]!.smooth).toBe(true);
  });

  it('paired-seam report: equal seams match; a 5 mm difference is outside the 2 mm tolerance (trade reference §3.11, common practice)', () => {
    const back = { ...rect.pieces[0]!, name: 'back' };
    const p = patternOf(rect.pieces[0]!, back);
    expect(pairedSeamReport(p).every((r) => r.withinTolerance && Math.abs(r.difference) < 1e-9)).toBe(true);
    const withLine = patternOf({ ...rect.pieces[0]!, lines: [...rect.pieces[0]!.lines, { role: 'lengthen', name: 'cut', d: 'M-50 600 L250 600' }] }, back);
    for (const [amount, ok] of [[5, false], [1.5, true]] as const) {
      const longer = performLengthen(withLine, { op: 'lengthen', line: 'cut', amount }).pattern;
      const r = pairedSeamReport(longer);
      for (const role of ['inseam', 'side-seam'] as const) {
        const row = r.find((x) => x.role === role)!;
        expectNear(row.difference, amount, 1e-6);
        expect(row.withinTolerance).toBe(ok);
      }
    }
  });

  it('the demo front and back: inseams and whole side seams (back + yoke) compared per size, all trued; crotch length = front + back', () => {
    const demo = parsePattern(demoPattern());
    const [front, back, yoke] = demo.pieces as [Piece, Piece, Piece];
    const report = pairedSeamReport(demo);
    expect(report).toHaveLength(22);
    for (const r of report) {
      const f = edgeLength(front, r.size, r.role)!;
      const b = edgeLength(back, r.size, r.role)! + (r.role === 'side-seam' ? edgeLength(yoke, r.size, r.role)! : 0);
      expect(r.second.pieces).toEqual(r.role === 'side-seam' ? ['back', 'yoke'] : ['back']);
      expect(r.second.piece).toBe(r.second.pieces.join(' + '));
      expectNear(r.difference, f - b, 1e-9);
      // front and back outseams (waist to hem) and inseams must be equal (trade reference §3.11): the demo is trued
      expect(r.withinTolerance, `${r.size} ${r.role}`).toBe(true);
      // and its knee (and, on the side seam, hip) notches meet: within about 2–3 mm (§3.11)
      expect(r.notches.map((n) => n.first.name)).toEqual(r.role === 'side-seam' ? ['knee-side', 'hip-side'] : ['knee-inseam']);
      expect(r.notchesMatch, `${r.size} ${r.role} notches`).toBe(true);
    }
    // and front and back crotch curves, laid together at the inseam, make one smooth curve (§3.11 shape checks)
    // asked for one size, the same rows for that size alone
    expect(pairedSeamReport(demo, { sizes: ['4'] })).toEqual(report.filter((r) => r.size === '4'));
    const joins = crotchJoin(demo);
    expect(crotchJoin(demo, { sizes: ['4'] })).toEqual(joins.filter((j) => j.size === '4'));
    expect(crotchLength(demo, { sizes: ['4'] })).toEqual(crotchLength(demo).filter((c) => c.size === '4'));
    expect(joins).toHaveLength(11);
    for (const j of joins) expect(j.turn, j.size).toBeLessThan(0.01);
    const c = crotchLength(demo).find((x) => x.size === '10')!;
    expectNear(c.front, edgeLength(front, '10', 'centre-front')! + edgeLength(front, '10', 'crotch-curve')!, 1e-9);
    expectNear(c.total, c.front + c.back, 1e-9);
    expect(c.back).toBeGreaterThan(c.front);
  });
});
