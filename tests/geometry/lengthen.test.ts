import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  AlterationError,
  contourArea,
  contourIsSimple,
  crotchJoin,
  crotchLength,
  demoPattern,
  edgeLength,
  extentAlong,
  outlineContour,
  pairedSeamReport,
  parsePattern,
  performLengthen,
  performRise,
  widthAlongLine,
  widthAtLevel,
} from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';
import { anyLeg, legPiece, nearParallelLeg, outlineDistance, patternOf } from './builders.ts';

const amount = fc.double({ min: -60, max: 60, noNaN: true });

describe('lengthen — properties (issue 3)', () => {
  it('lengthen by +d then −d restores the outline within 0.01 mm', () => {
    fc.assert(
      fc.property(anyLeg, fc.double({ min: 0, max: 60, noNaN: true }), fc.boolean(), (leg, d, shortenFirst) => {
        const pattern = patternOf(legPiece(leg));
        const s = shortenFirst ? -1 : 1;
        fc.pre(leg.height * (1 - leg.lineAt) > d + 40);
        const once = performLengthen(pattern, { op: 'lengthen', line: 'cut', amount: s * d }).pattern;
        const back = performLengthen(once, { op: 'lengthen', line: 'cut', amount: -s * d }).pattern;
        expect(outlineDistance(back.pieces[0]!.outlines[0]!, pattern.pieces[0]!.outlines[0]!)).toBeLessThanOrEqual(0.01);
        back.pieces[0]!.outlines[0]!.points.forEach((p, i) => {
          const q = pattern.pieces[0]!.outlines[0]!.points[i]!;
          expectNear(Math.hypot(p.x - q.x, p.y - q.y), 0, 0.01, p.name);
        });
      }),
      { numRuns: 40 },
    );
  });

  it('amount 0 is the identity', () => {
    fc.assert(
      fc.property(anyLeg, (leg) => {
        const pattern = patternOf(legPiece(leg));
        const out = performLengthen(pattern, { op: 'lengthen', line: 'cut', amount: 0 }).pattern;
        expect(outlineDistance(out.pieces[0]!.outlines[0]!, pattern.pieces[0]!.outlines[0]!)).toBeLessThanOrEqual(1e-6);
      }),
      { numRuns: 20 },
    );
  });

  it('the length along the grain changes by exactly the amount', () => {
    fc.assert(
      fc.property(anyLeg, amount, (leg, a) => {
        fc.pre(leg.height * (1 - leg.lineAt) > Math.abs(a) + 40);
        const pattern = patternOf(legPiece(leg));
        const out = performLengthen(pattern, { op: 'lengthen', line: 'cut', amount: a }).pattern;
        const grain = { x: 0, y: 1 };
        expectNear(extentAlong(out.pieces[0]!.outlines[0]!, grain) - extentAlong(pattern.pieces[0]!.outlines[0]!, grain), a, 1e-6);
      }),
      { numRuns: 40 },
    );
  });

  it('the area changes by amount × width at the line, within 1 % for near-parallel edges', () => {
    fc.assert(
      fc.property(nearParallelLeg, amount, (leg, a) => {
        fc.pre(Math.abs(a) > 1 && leg.height * (1 - leg.lineAt) > Math.abs(a) + 40);
        const pattern = patternOf(legPiece(leg));
        const o = pattern.pieces[0]!.outlines[0]!;
        const width = widthAlongLine(o, { x: 0, y: leg.lineAt * leg.height }, { x: 1, y: 0 });
        const out = performLengthen(pattern, { op: 'lengthen', line: 'cut', amount: a }).pattern;
        const dA = contourArea(outlineContour(out.pieces[0]!.outlines[0]!)) - contourArea(outlineContour(o));
        expectNear(dA, a * width, Math.abs(a * width) * 0.01);
      }),
      { numRuns: 40 },
    );
  });

  it('outlines stay closed and simple, and the same input gives the same output', () => {
    fc.assert(
      fc.property(anyLeg, amount, (leg, a) => {
        fc.pre(leg.height * (1 - leg.lineAt) > Math.abs(a) + 40);
        const pattern = patternOf(legPiece(leg));
        const before = JSON.stringify(pattern);
        const r1 = performLengthen(pattern, { op: 'lengthen', line: 'cut', amount: a });
        const r2 = performLengthen(pattern, { op: 'lengthen', line: 'cut', amount: a });
        expect(JSON.stringify(r1)).toBe(JSON.stringify(r2));
        expect(JSON.stringify(pattern)).toBe(before); // input untouched
        expect(contourIsSimple(outlineContour(r1.pattern.pieces[0]!.outlines[0]!))).toBe(true);
        parsePattern(r1.pattern); // still a valid pattern (landmarks on the outline)
      }),
      { numRuns: 30 },
    );
  });
});

describe('lengthen — refusals with clear messages', () => {
  const leg = legPiece({ topHalf: 150, bottomHalf: 100, height: 800, lineAt: 0.5, bow: 5 });
  it('shortening by more than the piece has below the line is refused as a fold', () => {
    const p = patternOf(leg);
    expect(() => performLengthen(p, { op: 'lengthen', line: 'cut', amount: -420 })).toThrow(AlterationError);
    expect(() => performLengthen(p, { op: 'lengthen', line: 'cut', amount: -420 })).toThrow(/would fold the piece over itself/);
  });
  it('a missing line is named', () => {
    expect(() => performLengthen(patternOf(leg), { op: 'lengthen', line: 'knee', amount: 10 })).toThrow(/no piece has a lengthen line named "knee"/);
  });
  it('a piece named in `pieces` that lacks the line, or does not exist, is refused', () => {
    const other = { ...leg, name: 'yoke', lines: [] };
    expect(() => performLengthen(patternOf(leg, other), { op: 'lengthen', line: 'cut', amount: 10, pieces: ['leg', 'yoke'] })).toThrow(/piece "yoke" has no lengthen line named "cut"/);
    expect(() => performLengthen(patternOf(leg), { op: 'lengthen', line: 'cut', amount: 10, pieces: ['sleeve'] })).toThrow(/there is no piece named "sleeve"/);
  });
  it('a line that does not cross the piece is refused', () => {
    const off = { ...leg, lines: [...leg.lines.filter((l) => l.role !== 'lengthen'), { role: 'lengthen' as const, name: 'cut', d: 'M-300 900 L300 900' }] };
    expect(() => performLengthen(patternOf(off), { op: 'lengthen', line: 'cut', amount: 10 })).toThrow(/does not cross the piece/);
  });
  it('a line along the grain is refused', () => {
    const along = { ...leg, lines: [...leg.lines.filter((l) => l.role !== 'lengthen'), { role: 'lengthen' as const, name: 'cut', d: 'M0 100 L10 700' }] };
    expect(() => performLengthen(patternOf(along), { op: 'lengthen', line: 'cut', amount: 10 })).toThrow(/within 30° of the grain/);
  });
});

describe('lengthen and rise on the demo pattern — trade facts', () => {
  const demo = parsePattern(demoPattern());
  const front = (p: typeof demo) => p.pieces.find((x) => x.name === 'front')!;
  const back = (p: typeof demo) => p.pieces.find((x) => x.name === 'back')!;

  it('shortening the legs 3 in (76.2 mm) at the lower-leg line shortens inseam and outseam by 76.2 mm (common practice, no source; issue 3)', () => {
    const out = performLengthen(demo, { op: 'lengthen', line: 'lower leg', amount: -76.2 }).pattern;
    for (const piece of [front, back])
      for (const size of ['0', '10', '20']) {
        for (const role of ['inseam', 'side-seam']) {
          const before = edgeLength(piece(demo), size, role)!;
          const after = edgeLength(piece(out), size, role)!;
          // the lower leg is nearly parallel to the grain there, so the change is 76.2 mm within 0.3 mm
          expectNear(before - after, 76.2, 0.3, `${piece(demo).name} ${size} ${role}`);
        }
        // crotch seam and waist unchanged (trade reference §3.2 invariants)
        expectNear(edgeLength(piece(out), size, 'crotch-curve')!, edgeLength(piece(demo), size, 'crotch-curve')!, 1e-6);
      }
    // front and back still match each other as well as before (§3.2: each changes by exactly d)
    const before = pairedSeamReport(demo);
    const after = pairedSeamReport(out);
    after.forEach((r, i) => expectNear(r.difference, before[i]!.difference, 0.3, `${r.size} ${r.role}`));
    // the notches still meet: measured from the hem, a notch below the line keeps its distance and one above it moves by the amount, on both sides alike
    // the crotch point is above the line: its angles stay as they were
    crotchJoin(out).forEach((j, i) => expectNear(j.turn, crotchJoin(demo)[i]!.turn, 1e-6, `crotch join ${j.size}`));
    after.forEach((r, i) => {
      expect(r.notches.map((n) => n.first.name)).toEqual(before[i]!.notches.map((n) => n.first.name));
      r.notches.forEach((n, k) => expectNear(n.difference, before[i]!.notches[k]!.difference, 0.3, `${r.size} ${r.role} ${n.first.name}`));
    });
  });

  it('lengthening 25 mm at the upper-leg line moves the knee line 25 mm lower (trade reference §6 example 1, common practice)', () => {
    const out = performLengthen(demo, { op: 'lengthen', line: 'upper leg', amount: 25 }).pattern;
    const kneeY = (p: typeof demo) => Number(front(p).lines.find((l) => l.role === 'level' && l.name === 'knee' && l.size === '10')!.d.split(/[ ML]+/).filter(Boolean)[1]);
    expectNear(kneeY(out) - kneeY(demo), 25, 1e-6);
    // widths at the hip and crotch levels (girths above the line) stay the same
    expectNear(widthAtLevel(front(out), '10', 'hip'), widthAtLevel(front(demo), '10', 'hip'), 1e-6);
  });

  it('adding 2 in (50.8 mm) of rise lengthens CF and CB seams by about 50.8 mm and leaves the leg unchanged (common practice, no source; issue 3)', () => {
    const out = performRise(demo, { op: 'rise', line: 'rise', amount: 50.8 }).pattern;
    for (const size of ['0', '10', '20']) {
      const cf = (p: typeof demo) => edgeLength(front(p), size, 'centre-front')! + edgeLength(front(p), size, 'crotch-curve')!;
      const cb = (p: typeof demo) => edgeLength(back(p), size, 'centre-back')! + edgeLength(back(p), size, 'crotch-curve')!;
      // "about": the seams cross the rise line at a slant, so the change is a little under 50.8 mm
      expectNear(cf(out) - cf(demo), 50.8, 1.5, `CF ${size}`);
      expectNear(cb(out) - cb(demo), 50.8, 1.5, `CB ${size}`);
      // the leg is unchanged: inseam exactly, hem width exactly
      expectNear(edgeLength(front(out), size, 'inseam')!, edgeLength(front(demo), size, 'inseam')!, 1e-6);
      expectNear(edgeLength(back(out), size, 'hem')!, edgeLength(back(demo), size, 'hem')!, 1e-6);
      // outseam +d (trade reference §3.3)
      expectNear(edgeLength(front(out), size, 'side-seam')! - edgeLength(front(demo), size, 'side-seam')!, 50.8, 1);
    }
    // total crotch length grows by about 2d (§3.3); the yoke is not cut so only front + back legs grow
    const before = crotchLength(demo).find((c) => c.size === '10')!;
    const after = crotchLength(out).find((c) => c.size === '10')!;
    expectNear(after.total - before.total, 2 * 50.8, 3);
    // the crotch point is below the rise line and stays square: front and back still join smoothly
    for (const j of crotchJoin(out)) expect(j.turn, j.size).toBeLessThan(0.01);
  });
});

describe('rise — properties (the waist side moves, the leg stays)', () => {
  it('+d then −d restores; the extent along the grain changes by exactly d; everything below the truing zone stays put', () => {
    fc.assert(
      fc.property(anyLeg, fc.double({ min: -40, max: 60, noNaN: true }), (leg, d) => {
        fc.pre(leg.height * leg.lineAt > Math.abs(d) + 40);
        const pattern = patternOf(legPiece(leg));
        const up = performRise(pattern, { op: 'rise', line: 'cut', amount: d }).pattern;
        const o0 = pattern.pieces[0]!.outlines[0]!;
        const o1 = up.pieces[0]!.outlines[0]!;
        expectNear(extentAlong(o1, { x: 0, y: 1 }) - extentAlong(o0, { x: 0, y: 1 }), d, 1e-6);
        // the hem corners do not move
        for (const name of ['hem-in', 'hem-side']) {
          const a = o0.points.find((p) => p.name === name)!;
          const b = o1.points.find((p) => p.name === name)!;
          expectNear(Math.hypot(a.x - b.x, a.y - b.y), 0, 1e-6, name);
        }
        // the waist corners move up by d
        const w0 = o0.points.find((p) => p.name === 'waist-in')!;
        const w1 = o1.points.find((p) => p.name === 'waist-in')!;
        expectNear(w0.y - w1.y, d, 1e-6);
        const back = performRise(up, { op: 'rise', line: 'cut', amount: -d }).pattern;
        expect(outlineDistance(back.pieces[0]!.outlines[0]!, o0)).toBeLessThanOrEqual(0.01);
      }),
      { numRuns: 30 },
    );
  });
});
