import { describe, expect, it } from 'vitest';
import {
  AlterationError,
  type Pattern,
  contourIsSimple,
  contourLineIntersections,
  demoPattern,
  edgeLength,
  outlineContour,
  parsePattern,
  performBlend,
  performSlashSpread,
  wedgeAngle,
} from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';
import { outlineDistance } from './builders.ts';

const base = performBlend(parsePattern(demoPattern()), { op: 'blend', levels: [{ level: 'waist', size: '10' }] }).pattern;
const front = (p: Pattern) => p.pieces.find((x) => x.name === 'front')!;
const size = front(base).outlines[0]!.size;

/** The slash: from the centre front to the side seam, halfway between waist and hip. */
function slash() {
  const c = outlineContour(front(base).outlines[0]!);
  const hits = contourLineIntersections(c, { x: 0, y: 95 }, { x: 1, y: 0 }).map((h) => h.point).sort((a, b) => a.x - b.x);
  return { side: hits[0]!, centre: hits[hits.length - 1]! };
}

describe('slash and spread about a hinge', () => {
  it('full-seat wedge: 20 mm opened 240 mm from the hinge is θ = 2·asin(1/24) = 4.776° (trade reference §6 example 3, calc)', () => {
    expectNear((wedgeAngle(20, 240) * 180) / Math.PI, 4.776, 5e-4);
  });

  it('protruding abdomen (§3.6): a wedge opened 20 mm at CF lengthens the CF by about 20 mm and keeps the side seam', () => {
    const { side, centre } = slash();
    const out = performSlashSpread(base, { op: 'slash-spread', piece: 'front', from: centre, hinge: side, amount: 20, move: 'waist' }).pattern;
    const cf = (p: Pattern) => edgeLength(front(p), size, 'centre-front')!;
    expectNear(cf(out) - cf(base), 20, 1);
    expectNear(edgeLength(front(out), size, 'side-seam')!, edgeLength(front(base), size, 'side-seam')!, 0.05);
    // the leg below the slash is untouched
    expectNear(edgeLength(front(out), size, 'inseam')!, edgeLength(front(base), size, 'inseam')!, 1e-6);
    expect(contourIsSimple(outlineContour(front(out).outlines[0]!))).toBe(true);
    parsePattern(out);
  });

  it('opening then closing by the same angle restores the piece (within the redraw tolerance of the zone)', () => {
    const { side, centre } = slash();
    const theta = wedgeAngle(20, Math.hypot(centre.x - side.x, centre.y - side.y));
    const open = performSlashSpread(base, { op: 'slash-spread', piece: 'front', from: centre, hinge: side, angle: theta }).pattern;
    const back = performSlashSpread(open, { op: 'slash-spread', piece: 'front', from: centre, hinge: side, angle: -theta }).pattern;
    expect(outlineDistance(front(back).outlines[0]!, front(base).outlines[0]!)).toBeLessThan(0.05);
  });

  it('refuses a wedge over 60° and an unknown piece', () => {
    const { side, centre } = slash();
    expect(() => performSlashSpread(base, { op: 'slash-spread', piece: 'front', from: centre, hinge: side, angle: 1.5 })).toThrow();
    expect(() => performSlashSpread(base, { op: 'slash-spread', piece: 'sleeve', from: centre, hinge: side, angle: 0.1 })).toThrow(AlterationError);
  });

  it('refuses a hinge inside the piece: the part behind it would fold over (common practice, no source: the hinge goes on the far edge)', () => {
    const { side, centre } = slash();
    const middle = { x: (side.x + centre.x) / 2, y: side.y };
    for (const move of ['waist', 'hem'] as const) expect(() => performSlashSpread(base, { op: 'slash-spread', piece: 'front', from: centre, hinge: middle, angle: 0.9, move })).toThrow(/behind the hinge/);
    // a smaller wedge there still folds the outline: refused by the self-crossing check
    expect(() => performSlashSpread(base, { op: 'slash-spread', piece: 'front', from: centre, hinge: middle, angle: 0.3, move: 'waist' })).toThrow(/fold over itself/);
    // the same slash hinged on the far edge is made
    expect(() => performSlashSpread(base, { op: 'slash-spread', piece: 'front', from: centre, hinge: side, angle: 0.3, move: 'waist' })).not.toThrow();
  });
});
