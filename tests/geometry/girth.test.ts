import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  AlterationError,
  type Pattern,
  contourIsSimple,
  demoPattern,
  edgeLength,
  outlineContour,
  parsePattern,
  performGirth,
  widthAtLevel,
} from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';

const demo = parsePattern(demoPattern());
const piece = (p: Pattern, name: string) => p.pieces.find((x) => x.name === name)!;

describe('girth — let out or take in at a level, tapered along the seam', () => {
  it('hip +4 cm as +10 mm on each side edge of front and back: hip width +10 mm per piece, 2 × (10 + 10) = 40 mm in all (trade reference §6 example 5, common practice)', () => {
    const out = performGirth(demo, { op: 'girth', edge: 'side-seam', level: 'hip', amount: 10, above: 120, below: 150 }).pattern;
    let total = 0;
    for (const name of ['front', 'back'])
      for (const size of ['0', '10', '20']) {
        const d = widthAtLevel(piece(out, name), size, 'hip') - widthAtLevel(piece(demo, name), size, 'hip');
        expectNear(d, 10, 0.05, `${name} ${size}`);
        if (size === '10') total += 2 * d;
        // beyond the taper the piece is unchanged: knee width and the inseam
        expectNear(widthAtLevel(piece(out, name), size, 'knee'), widthAtLevel(piece(demo, name), size, 'knee'), 1e-6);
        expectNear(edgeLength(piece(out, name), size, 'inseam')!, edgeLength(piece(demo, name), size, 'inseam')!, 1e-6);
      }
    expectNear(total, 40, 0.2);
  });

  it('a corner moved out at the waist trues the waist edge with it: the front waist grows by about the amount', () => {
    const out = performGirth(demo, { op: 'girth', edge: 'side-seam', level: 'waist', amount: 5, below: 120, pieces: ['front'] }).pattern;
    const d = edgeLength(piece(out, 'front'), '10', 'waist')! - edgeLength(piece(demo, 'front'), '10', 'waist')!;
    expectNear(d, 5, 0.1);
    // centre front untouched
    expectNear(edgeLength(piece(out, 'front'), '10', 'centre-front')!, edgeLength(piece(demo, 'front'), '10', 'centre-front')!, 1e-6);
  });

  it('outlines stay closed and simple for changes from −40 to +40 mm (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -40, max: 40, noNaN: true }), fc.constantFrom('hip', 'thigh', 'knee', 'calf'), (amount, level) => {
        const out = performGirth(demo, { op: 'girth', edge: 'side-seam', level, amount, pieces: ['front'] }).pattern;
        for (const o of piece(out, 'front').outlines) expect(contourIsSimple(outlineContour(o))).toBe(true);
        parsePattern(out);
      }),
      { numRuns: 6 },
    );
  });

  it('taking in more than the piece has between grain line and edge is refused as a fold', () => {
    expect(() => performGirth(demo, { op: 'girth', edge: 'side-seam', level: 'knee', amount: -150 })).toThrow(AlterationError);
    expect(() => performGirth(demo, { op: 'girth', edge: 'side-seam', level: 'knee', amount: -150 })).toThrow(/would fold/);
    expect(() => performGirth(demo, { op: 'girth', edge: 'pocket edge', level: 'knee', amount: 5 })).toThrow(/no piece has an edge "pocket edge"/);
  });
});
