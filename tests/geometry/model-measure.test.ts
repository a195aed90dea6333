import { describe, expect, it } from 'vitest';
import {
  DEMO_SIZES,
  PatternError,
  type Piece,
  contourArea,
  contourIsSimple,
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
    }
    const c = crotchLength(demo).find((x) => x.size === '10')!;
    expectNear(c.front, edgeLength(front, '10', 'centre-front')! + edgeLength(front, '10', 'crotch-curve')!, 1e-9);
    expectNear(c.total, c.front + c.back, 1e-9);
    expect(c.back).toBeGreaterThan(c.front);
  });
});
