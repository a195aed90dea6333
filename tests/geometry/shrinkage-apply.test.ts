import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  AlterationError,
  applyOps,
  contourArea,
  contourIsSimple,
  demoPattern,
  extentAlong,
  outlineContour,
  parsePattern,
  performBlend,
  performLengthen,
  performShrinkage,
  shrinkageFactor,
} from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';
import { patternOf } from './builders.ts';

/** A 200 × 1000 mm rectangle whose grain runs along `angle` (radians from +y). */
function strip(angle = 0) {
  const c = Math.cos(angle);
  const s = Math.sin(angle);
  const rot = (x: number, y: number) => `${x * c - y * s} ${x * s + y * c}`;
  return patternOf({
    name: 'strip',
    outlines: [{ size: '10', d: `M${rot(0, 0)} L${rot(200, 0)} L${rot(200, 1000)} L${rot(0, 1000)} Z`, points: [] }],
    lines: [{ role: 'grain', name: 'grain', d: `M${rot(100, 100)} L${rot(100, 900)}` }],
    edges: [],
    cut: { count: 2, onFold: false },
    seamAllowanceIncluded: false,
  });
}

describe('shrinkage — exact compensation P = F / (1 − s) (trade reference §4.4)', () => {
  it('−3 % lengthwise: 100 cm finished needs 103.09 cm of pattern (trade reference §6 example 6, calc)', () => {
    const out = performShrinkage(strip(), { op: 'shrinkage', lengthwise: 3, crosswise: 0 }).pattern;
    expectNear(extentAlong(out.pieces[0]!.outlines[0]!, { x: 0, y: 1 }), 1030.93, 0.005);
    expectNear(extentAlong(out.pieces[0]!.outlines[0]!, { x: 1, y: 0 }), 200, 1e-9);
  });

  it('−5 % lengthwise: 105.26 cm, not the approximate 105.00 cm (trade reference §6 example 6, calc)', () => {
    const out = performShrinkage(strip(), { op: 'shrinkage', lengthwise: 5, crosswise: 2 }).pattern;
    expectNear(extentAlong(out.pieces[0]!.outlines[0]!, { x: 0, y: 1 }), 1052.63, 0.005);
    expectNear(extentAlong(out.pieces[0]!.outlines[0]!, { x: 1, y: 0 }), 200 / 0.98, 1e-6);
  });

  it('scales in the grain frame: a piece whose grain is turned scales along its own grain (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -Math.PI, max: Math.PI, noNaN: true }), fc.double({ min: -10, max: 10, noNaN: true }), fc.double({ min: -10, max: 10, noNaN: true }), (angle, warp, weft) => {
        const p = strip(angle);
        const out = performShrinkage(p, { op: 'shrinkage', lengthwise: warp, crosswise: weft }).pattern;
        const grain = { x: -Math.sin(angle), y: Math.cos(angle) };
        const across = { x: Math.cos(angle), y: Math.sin(angle) };
        expectNear(extentAlong(out.pieces[0]!.outlines[0]!, grain), 1000 / (1 - warp / 100), 1e-6);
        expectNear(extentAlong(out.pieces[0]!.outlines[0]!, across), 200 / (1 - weft / 100), 1e-6);
        // area scales by the determinant of the map
        const a0 = contourArea(outlineContour(p.pieces[0]!.outlines[0]!));
        const a1 = contourArea(outlineContour(out.pieces[0]!.outlines[0]!));
        // outlines are written with 6 decimals (1e-6 mm), hence the bound
        expectNear(a1, a0 / ((1 - warp / 100) * (1 - weft / 100)), 0.01);
      }),
      { numRuns: 40 },
    );
  });

  it('refuses implausible shrinkage with a hint', () => {
    expect(() => shrinkageFactor(50)).toThrow(/was a decimal point left out/);
    expect(() => performShrinkage(strip(), { op: 'shrinkage', lengthwise: 50, crosswise: 0 })).toThrow(AlterationError);
  });
});

describe('applyOps — a replayable list', () => {
  const demo = parsePattern(demoPattern());
  const ops = [
    { op: 'blend', levels: [ { level: 'waist', size: '6' }, { level: 'hip', size: '8' }, { level: 'knee', size: '8' } ] },
    { op: 'rise', line: 'rise', amount: 15 },
    { op: 'lengthen', line: 'lower leg', amount: -40 },
    { op: 'lengthen', line: 'upper leg', amount: 10 },
    { op: 'shrinkage', lengthwise: 3, crosswise: 1.5 },
  ];

  it('replaying gives the same result as performing one by one, and the same every time', () => {
    const r = applyOps(demo, ops);
    let p = performBlend(demo, ops[0] as never).pattern;
    p = applyOps(p, ops.slice(1)).pattern;
    expect(JSON.stringify(r.pattern)).toBe(JSON.stringify(p));
    expect(JSON.stringify(applyOps(demo, ops))).toBe(JSON.stringify(r));
    for (const piece of r.pattern.pieces) for (const o of piece.outlines) expect(contourIsSimple(outlineContour(o))).toBe(true);
    parsePattern(r.pattern);
  });

  it('a refused operation names its position and leaves the input untouched', () => {
    const before = JSON.stringify(demo);
    expect(() => applyOps(demo, [ops[0], { op: 'lengthen', line: 'lower leg', amount: -900 }])).toThrow(/operation 2 \(lengthen\)/);
    expect(() => applyOps(demo, [{ op: 'lengthen', line: 'lower leg', amount: 'far' }])).toThrow(/operation 1 \(lengthen\): amount/);
    expect(() => applyOps(demo, [{ op: 'twist' }])).toThrow(/operation 1 \(twist\)/);
    // the first operation refused is the one reported, whether it is refused by the schema or by the geometry
    expect(() => applyOps(demo, [ops[0], { op: 'lengthen', line: 'lower leg', amount: -900 }, { op: 'twist' }])).toThrow(/operation 2 \(lengthen\)/);
    expect(() => applyOps(demo, [ops[0], { op: 'twist' }, { op: 'lengthen', line: 'lower leg', amount: -900 }])).toThrow(/operation 2 \(twist\)/);
    expect(JSON.stringify(demo)).toBe(before);
  });

  it('a lengthen after a blend acts on the one blended line', () => {
    const blended = applyOps(demo, [ops[0]]).pattern;
    const longer = performLengthen(blended, { op: 'lengthen', line: 'lower leg', amount: 20 }).pattern;
    const front = (p: typeof demo) => p.pieces.find((x) => x.name === 'front')!.outlines;
    expect(front(longer)).toHaveLength(1);
    expectNear(extentAlong(front(longer)[0]!, { x: 0, y: 1 }) - extentAlong(front(blended)[0]!, { x: 0, y: 1 }), 20, 1e-6);
  });
});
