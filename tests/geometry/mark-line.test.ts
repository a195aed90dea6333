import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { AlterationError, applyOps, contourBounds, demoPattern, edgeLength, outlineContour, pathFromSvg, pieceGrain, vecDot, vecNormalize, vecSub } from '../../geometry/index.ts';
import { BLEND } from '../bench/alterations.ts';

const blended = applyOps(demoPattern(), [BLEND]).pattern;
const piece = (p: typeof blended, name: string) => p.pieces.find((x) => x.name === name)!;

describe('mark-line', () => {
  it('when a lengthen/shorten line is marked on front and back and the legs are shortened 3 in there, then both inseams are 3 in (76.2 mm) shorter', () => {
    // Trade fact (common practice, no source): shortening the legs 3 in shortens inseam and outseam by 3 in.
    const ops = [
      { op: 'mark-line' as const, piece: 'front', role: 'lengthen' as const, name: 'knee adjust', at: { x: 40, y: 820 } },
      { op: 'mark-line' as const, piece: 'back', role: 'lengthen' as const, name: 'knee adjust', at: { x: 40, y: 820 } },
      { op: 'lengthen' as const, line: 'knee adjust', amount: -76.2 },
    ];
    const out = applyOps(blended, ops).pattern;
    for (const name of ['front', 'back']) {
      const before = edgeLength(piece(blended, name), piece(blended, name).outlines[0]!.size, 'inseam')!;
      const after = edgeLength(piece(out, name), piece(out, name).outlines[0]!.size, 'inseam')!;
      // The leg is nearly parallel to the grain there: 76.2 mm within 0.3 mm, as for the printed lower-leg line (lengthen.test.ts).
      expect(Math.abs(after - before + 76.2)).toBeLessThan(0.3);
    }
  });

  it('the marked line is square to the grain and runs across the piece (property)', () => {
    const front = piece(blended, 'front');
    const b = contourBounds(outlineContour(front.outlines[0]!));
    fc.assert(
      fc.property(fc.double({ min: 200, max: b.maxY - 100, noNaN: true }), (y) => {
        const r = applyOps(blended, [{ op: 'mark-line', piece: 'front', role: 'level', name: 'probe', at: { x: (b.minX + b.maxX) / 2, y } }]).pattern;
        const line = piece(r, 'front').lines.find((l) => l.name === 'probe')!;
        const seg = pathFromSvg(line.d)[0]!.segments;
        const dir = vecNormalize(vecSub(seg[seg.length - 1]!.to, seg[0]!.from));
        expect(Math.abs(vecDot(dir, pieceGrain(front)))).toBeLessThan(1e-9);
        const xs = [seg[0]!.from.x, seg[seg.length - 1]!.to.x].sort((p, q) => p - q);
        // It reaches past the outline on both sides (the outline is narrower than its bounds at most heights).
        expect(xs[0]).toBeLessThan(b.maxX);
        expect(xs[1]).toBeGreaterThan(b.minX);
        expect(line.size).toBeUndefined();
      }),
      { numRuns: 30 },
    );
  });

  it('when the point is outside the piece or the name is taken, then it is refused with a message', () => {
    expect(() => applyOps(blended, [{ op: 'mark-line', piece: 'front', role: 'lengthen', name: 'x', at: { x: 5000, y: 5000 } }])).toThrow(AlterationError);
    expect(() => applyOps(blended, [{ op: 'mark-line', piece: 'front', role: 'lengthen', name: 'lower leg', at: { x: 40, y: 800 } }])).toThrow(/already/);
    expect(() => applyOps(blended, [{ op: 'mark-line', piece: 'nope', role: 'lengthen', name: 'x', at: { x: 40, y: 800 } }])).toThrow(/no piece/);
    expect(() => applyOps(blended, [{ op: 'mark-line', piece: 'front', role: 'lengthen', name: 'x', at: { x: 40, y: 800 }, square: false }])).toThrow(/toward/);
  });
});
