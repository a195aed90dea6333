import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { AlterationError, applyOps, contourIsSimple, demoPattern, outlineContour, parsePattern, pathFromSvg, performBlend } from '../../geometry/index.ts';

const base = performBlend(parsePattern(demoPattern()), { op: 'blend', levels: [{ level: 'waist', size: '8' }, { level: 'hip', size: '10' }, { level: 'knee', size: '10' }] }).pattern;

const op = fc.oneof(
  fc.record({ op: fc.constant('lengthen'), line: fc.constantFrom('upper leg', 'lower leg'), amount: fc.double({ min: -80, max: 80, noNaN: true }) }),
  fc.record({ op: fc.constant('rise'), line: fc.constant('rise'), amount: fc.double({ min: -30, max: 60, noNaN: true }) }),
  fc.record({ op: fc.constant('girth'), edge: fc.constantFrom('side-seam', 'inseam'), level: fc.constantFrom('hip', 'thigh', 'knee', 'calf', 'waist', 'hem'), amount: fc.double({ min: -30, max: 30, noNaN: true }) }),
  fc.record({ op: fc.constant('shrinkage'), lengthwise: fc.double({ min: -5, max: 10, noNaN: true }), crosswise: fc.double({ min: -5, max: 10, noNaN: true }) }),
  fc.record({ op: fc.constant('seam-allowance'), width: fc.double({ min: 0, max: 25, noNaN: true }), edges: fc.constant({ hem: 40 }) }),
);

describe('any stack of operations (property)', () => {
  it('never changes its input, gives the same output twice, keeps outlines closed and simple, or refuses with an AlterationError', () => {
    const before = JSON.stringify(base);
    fc.assert(
      fc.property(fc.array(op, { minLength: 1, maxLength: 4 }), (ops) => {
        let first;
        try {
          first = applyOps(base, ops);
        } catch (error) {
          expect(error).toBeInstanceOf(AlterationError);
          return;
        }
        expect(JSON.stringify(applyOps(base, ops))).toBe(JSON.stringify(first));
        for (const piece of first.pattern.pieces)
          for (const o of piece.outlines) {
            expect(contourIsSimple(outlineContour(o)), `${piece.name}`).toBe(true);
            if (o.cut) expect(contourIsSimple(pathFromSvg(o.cut)[0]!)).toBe(true);
          }
        parsePattern(first.pattern);
      }),
      { numRuns: 12 },
    );
    expect(JSON.stringify(base)).toBe(before);
  });
});
