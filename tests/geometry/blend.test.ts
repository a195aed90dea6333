import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  AlterationError,
  DEMO_SIZES,
  type Pattern,
  contourIsSimple,
  contourLineIntersections,
  demoPattern,
  edgeLength,
  outlineContour,
  pairedSeamReport,
  parsePattern,
  pathFromSvg,
  performBlend,
  widthAtLevel,
  widthAlongLine,
} from '../../geometry/index.ts';
import { expectNear, expectPointNear } from './helpers.ts';
import { outlineDistance } from './builders.ts';

const demo = parsePattern(demoPattern());
const piece = (p: Pattern, name: string) => p.pieces.find((x) => x.name === name)!;
const levelLine = (p: Pattern, pieceName: string, level: string, size: string) => {
  const line = piece(p, pieceName).lines.find((l) => l.role === 'level' && l.name === level && l.size === size)!;
  const segs = pathFromSvg(line.d)[0]!.segments;
  return { origin: segs[0]!.from, direction: { x: segs[0]!.to.x - segs[0]!.from.x, y: segs[0]!.to.y - segs[0]!.from.y } };
};

describe('blend — a blend where every level names size S returns size S (issue 3)', () => {
  it('front, back and yoke, every size, various level sets (property)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...DEMO_SIZES),
        fc.subarray(['waist', 'hip', 'crotch', 'thigh', 'knee', 'calf', 'hem'], { minLength: 1 }),
        (size, names) => {
          const out = performBlend(demo, { op: 'blend', levels: names.map((level) => ({ level, size })) }).pattern;
          for (const name of ['front', 'back', 'yoke', 'back pocket']) {
            const blended = piece(out, name).outlines;
            expect(blended).toHaveLength(1);
            const original = piece(demo, name).outlines.find((o) => o.size === size)!;
            expect(outlineDistance(blended[0]!, original)).toBeLessThanOrEqual(0.02);
          }
        },
      ),
      { numRuns: 8 },
    );
  });
});

describe('blend — follows each chosen size at its level', () => {
  const op = { op: 'blend' as const, levels: [ { level: 'waist', size: '0' }, { level: 'hip', size: '4' }, { level: 'thigh', size: '8' }, { level: 'calf', size: '10' } ] };
  const result = performBlend(demo, op);
  const out = result.pattern;

  it('blend of 0 at the waist, 4 at the hip, 8 at the thigh and 10 at the calf follows each size at its level (common practice, no source; issue 3)', () => {
    for (const name of ['front', 'back']) {
      const blended = piece(out, name).outlines[0]!;
      for (const [level, size] of [ ['hip', '4'], ['thigh', '8'], ['calf', '10'] ] as const) {
        const { origin, direction } = levelLine(demo, name, level, size);
        const sizeOutline = piece(demo, name).outlines.find((o) => o.size === size)!;
        const a = contourLineIntersections(outlineContour(blended), origin, direction).map((h) => h.point).sort((p, q) => p.x - q.x);
        const b = contourLineIntersections(outlineContour(sizeOutline), origin, direction).map((h) => h.point).sort((p, q) => p.x - q.x);
        expect(a.length).toBe(b.length);
        a.forEach((p, i) => expectPointNear(p, b[i]!, 0.05, `${name} ${level} size ${size} crossing ${i}`));
      }
      // the level lines of the blended piece are those of the chosen sizes
      expectNear(widthAtLevel(piece(out, name), blended.size, 'hip'), widthAtLevel(piece(demo, name), '4', 'hip'), 0.05);
    }
    // waist: the front waist edge is size 0's
    expectNear(edgeLength(piece(out, 'front'), piece(out, 'front').outlines[0]!.size, 'waist')!, edgeLength(piece(demo, 'front'), '0', 'waist')!, 0.02);
    expectNear(edgeLength(piece(out, 'yoke'), piece(out, 'yoke').outlines[0]!.size, 'waist')!, edgeLength(piece(demo, 'yoke'), '0', 'waist')!, 0.02);
  });

  it('between levels the size changes smoothly: the blended width at the knee lies between sizes 8 and 10', () => {
    for (const name of ['front', 'back']) {
      const blended = piece(out, name).outlines[0]!;
      const { origin, direction } = levelLine(demo, name, 'knee', '8');
      const w = widthAlongLine(blended, origin, direction);
      const w8 = widthAlongLine(piece(demo, name).outlines.find((o) => o.size === '8')!, origin, direction);
      const w10 = widthAlongLine(piece(demo, name).outlines.find((o) => o.size === '10')!, origin, direction);
      expect(w).toBeGreaterThan(Math.min(w8, w10) - 0.5);
      expect(w).toBeLessThan(Math.max(w8, w10) + 0.5);
    }
  });

  it('outlines stay closed and simple; the waistband follows the waist size; pieces without levels take the first size with a caution; same input, same output', () => {
    for (const p of out.pieces) for (const o of p.outlines) expect(contourIsSimple(outlineContour(o)), `${p.name}`).toBe(true);
    expect(outlineDistance(piece(out, 'waistband').outlines[0]!, piece(demo, 'waistband').outlines.find((o) => o.size === '0')!)).toBeLessThanOrEqual(0.02);
    // a pocket has no level lines: its top counts as the waist level, so it takes size 0
    expect(outlineDistance(piece(out, 'front pocket bag').outlines[0]!, piece(demo, 'front pocket bag').outlines.find((o) => o.size === '0')!)).toBeLessThanOrEqual(0.02);
    // with only a knee level, pieces without a knee line take the named size and say so
    const kneeOnly = performBlend(demo, { op: 'blend', levels: [{ level: 'knee', size: '12' }] });
    expect(kneeOnly.cautions.some((c) => c.code === 'missing-level' && c.piece === 'front pocket bag')).toBe(true);
    expect(outlineDistance(piece(kneeOnly.pattern, 'yoke').outlines[0]!, piece(demo, 'yoke').outlines.find((o) => o.size === '12')!)).toBeLessThanOrEqual(0.02);
    expect(JSON.stringify(performBlend(demo, op))).toBe(JSON.stringify(result));
    parsePattern(out);
  });

  it('front and back blended with the same levels still have matching seams, as the sizes did (trade reference §3.9)', () => {
    const size = piece(out, 'front').outlines[0]!.size;
    const d = (p: Pattern, s: string, role: string) => edgeLength(piece(p, 'front'), s, role)! - edgeLength(piece(p, 'back'), s, role)!;
    // the demo's sizes are trued (equal inseams in every size), and so is the blend, within 1.5 mm
    for (const s of DEMO_SIZES) expectNear(d(demo, s, 'inseam'), 0, 0.01, `size ${s}`);
    expectNear(d(out, size, 'inseam'), 0, 1.5);
    // the side seam measured whole (the back's with the yoke's) matches within the tolerance
    const side = pairedSeamReport(out).find((r) => r.role === 'side-seam')!;
    expect(side.second.pieces).toEqual(['back', 'yoke']);
    expect(side.withinTolerance).toBe(true);
  });
});

describe('blend — fractional and extrapolated sizes carry a caution', () => {
  it('size 5 everywhere lies midway between sizes 4 and 6 (the demo grade is linear), with a caution', () => {
    const r = performBlend(demo, { op: 'blend', levels: [ { level: 'waist', size: 5 }, { level: 'hem', size: '5' } ] });
    // one caution for the whole blend, not one per piece and level
    expect(r.cautions.filter((c) => c.code === 'fractional-size').map((c) => c.message)).toEqual(['size 5 is between the printed sizes: it is interpolated between the neighbouring sizes']);
    const front = piece(r.pattern, 'front');
    const { origin, direction } = levelLine(demo, 'front', 'knee', '4');
    const w = widthAlongLine(front.outlines[0]!, origin, direction);
    const w4 = widthAlongLine(piece(demo, 'front').outlines.find((o) => o.size === '4')!, origin, direction);
    const w6 = widthAlongLine(piece(demo, 'front').outlines.find((o) => o.size === '6')!, origin, direction);
    // knee width grades 6 mm per step for the whole leg = 3 mm on the front; the knee line moves 5 mm per step so compare loosely
    expectNear(w, (w4 + w6) / 2, 0.5);
  });

  it('size 22 is extrapolated from the 18→20 grade and says so', () => {
    const r = performBlend(demo, { op: 'blend', levels: [ { level: 'waist', size: '22' } ] });
    const c = r.cautions.find((x) => x.code === 'extrapolated-size');
    expect(c?.message).toMatch(/outside the printed sizes 0–20/);
    expect(c?.message).toMatch(/estimate/);
    expect(r.cautions.filter((x) => x.code === 'extrapolated-size')).toHaveLength(1); // every piece: said once
    const many = performBlend(demo, { op: 'blend', levels: [ { level: 'waist', size: '2.5' }, { level: 'hip', size: '7.5' }, { level: 'knee', size: '-1' } ] });
    expect(many.cautions.map((x) => x.message)).toEqual([
      'sizes 2.5 and 7.5 are between the printed sizes: each is interpolated between the neighbouring sizes',
      'size -1 is outside the printed sizes 0–20 of "front", "back": it is extrapolated from the grade between the nearest sizes, an estimate — sew a test garment first',
    ]);
    const wb = (p: Pattern, size?: string) => {
      const o = size ? piece(p, 'waistband').outlines.find((x) => x.size === size)! : piece(p, 'waistband').outlines[0]!;
      return widthAlongLine(o, { x: -10, y: 40 }, { x: 1, y: 0 });
    };
    // waistband length grades 40 mm per step: 18 → 20 → 22 extrapolated
    expectNear(wb(r.pattern) - wb(demo, '20'), wb(demo, '20') - wb(demo, '18'), 1e-3);
  });

  it('an unknown size label is refused', () => {
    const p = { ...demo, pieces: [{ ...piece(demo, 'back pocket'), outlines: piece(demo, 'back pocket').outlines.map((o, i) => ({ ...o, size: ['XS', 'S', 'M', 'L', 'XL', '2XL', '3XL', '4XL', '5XL', '6XL', '7XL'][i]! })) }] };
    expect(() => performBlend(p, { op: 'blend', levels: [ { level: 'waist', size: '8' } ] })).toThrow(AlterationError);
    expect(() => performBlend(p, { op: 'blend', levels: [ { level: 'waist', size: '8' } ] })).toThrow(/has no size "8"/);
  });
});

describe('blend — refuses a fold', () => {
  it('an extrapolation so far below the range that the crotch turns inside out is refused with where it folds', () => {
    expect(() => performBlend(demo, { op: 'blend', levels: [{ level: 'waist', size: '-40' }] })).toThrow(/would fold over itself near \(/);
  });
});

describe('blend — any choice of sizes per level (property)', () => {
  it('follows each chosen size at its level line and stays closed and simple', () => {
    const levelNames = ['hip', 'thigh', 'knee', 'calf'] as const;
    fc.assert(
      fc.property(fc.tuple(...levelNames.map(() => fc.constantFrom(...DEMO_SIZES))), fc.constantFrom(...DEMO_SIZES), (sizes, waist) => {
        const levels = [{ level: 'waist', size: waist }, ...levelNames.map((level, i) => ({ level, size: sizes[i]! }))];
        const out = performBlend(demo, { op: 'blend', levels }).pattern;
        for (const name of ['front', 'back']) {
          const blended = piece(out, name).outlines[0]!;
          expect(contourIsSimple(outlineContour(blended))).toBe(true);
          levelNames.forEach((level, i) => {
            const size = sizes[i]!;
            const { origin, direction } = levelLine(demo, name, level, size);
            const w = widthAlongLine(blended, origin, direction);
            const ref = widthAlongLine(piece(demo, name).outlines.find((o) => o.size === size)!, origin, direction);
            expectNear(w, ref, 0.1, `${name} ${level} size ${size}`);
          });
        }
      }),
      { numRuns: 10 },
    );
  });
});
