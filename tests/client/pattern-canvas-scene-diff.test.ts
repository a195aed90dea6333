/**
 * What the pattern canvas compares to decide what to redraw between updates (scene-diff.ts).
 * A piece reported unchanged is not redrawn, so a wrong "unchanged" would leave a stale outline
 * on screen: the checks compare with an independent rule, the drawn fields serialised as JSON.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { demoPattern, performLengthen, type Piece } from '../../geometry/index.ts';
import { layoutPieces } from '../../src/components/pattern-canvas/layout.ts';
import { overlayStructure, pieceShapeChanged, sameLayout } from '../../src/components/pattern-canvas/scene-diff.ts';

/** Everything the canvas draws from a piece's shape: outlines, cut lines, landmark positions, lines. */
const drawn = (p: Piece) =>
  JSON.stringify([p.outlines.map((o) => [o.d, o.cut ?? null, o.points.map((lm) => [lm.x, lm.y])]), p.lines.map((l) => l.d)]);

const lengthened = (amount: number) => performLengthen(demoPattern(), { op: 'lengthen', line: 'lower leg', amount }).pattern;

describe('pieceShapeChanged', () => {
  it('is false for the same piece and for a copy of it', () => {
    for (const piece of demoPattern().pieces) {
      expect(pieceShapeChanged(piece, piece)).toBe(false);
      expect(pieceShapeChanged(piece, structuredClone(piece))).toBe(false);
    }
  });

  it('agrees with comparing the drawn fields, piece by piece, between two lengthen amounts (property)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -60, max: 80 }), fc.integer({ min: -60, max: 80 }), (a, b) => {
        const before = lengthened(a);
        const after = lengthened(b);
        before.pieces.forEach((piece, i) => {
          const next = after.pieces[i]!;
          expect(pieceShapeChanged(piece, next)).toBe(drawn(piece) !== drawn(next));
        });
      }),
      { numRuns: 25 },
    );
  });

  it('sees a changed amount in the legs and no change in pieces without a lower leg line', () => {
    const before = lengthened(10);
    const after = lengthened(12);
    const changed = before.pieces.filter((piece, i) => pieceShapeChanged(piece, after.pieces[i]!)).map((p) => p.name);
    const withLine = before.pieces.filter((p) => p.lines.some((l) => l.name === 'lower leg')).map((p) => p.name);
    expect(changed.length).toBeGreaterThan(0);
    expect(changed).toEqual(withLine);
  });

  it('sees a moved landmark, a changed cut line and a changed internal line', () => {
    const piece = demoPattern().pieces.find((p) => p.outlines[0]!.points.length > 0 && p.lines.length > 0)!;
    const outline = piece.outlines[0]!;
    const lm = outline.points[0]!;
    const movedPoint: Piece = { ...piece, outlines: [{ ...outline, points: [{ ...lm, x: lm.x + 0.001 }, ...outline.points.slice(1)] }, ...piece.outlines.slice(1)] };
    expect(pieceShapeChanged(piece, movedPoint)).toBe(true);
    const cut: Piece = { ...piece, outlines: [{ ...outline, cut: 'M0 0 L1 0 L1 1 Z' }, ...piece.outlines.slice(1)] };
    expect(pieceShapeChanged(piece, cut)).toBe(true);
    const line: Piece = { ...piece, lines: [{ ...piece.lines[0]!, d: `${piece.lines[0]!.d} ` }, ...piece.lines.slice(1)] };
    expect(pieceShapeChanged(piece, line)).toBe(true);
  });
});

describe('sameLayout', () => {
  it('is true for layouts computed from copies and false when a piece moves', () => {
    const p = demoPattern();
    expect(sameLayout(layoutPieces(p), layoutPieces(structuredClone(p)))).toBe(true);
    // without a reference the layout follows the longer legs
    expect(sameLayout(layoutPieces(p), layoutPieces(lengthened(60)))).toBe(false);
    // with the reference it stays put however the legs change
    expect(sameLayout(layoutPieces(p, p), layoutPieces(lengthened(60), p))).toBe(true);
  });
});

describe('overlayStructure', () => {
  it('ignores positions and label words, not kinds, pieces or whether there is a label', () => {
    const handle = (y: number, label?: string) => ({ kind: 'handle' as const, id: 'amount', piece: 'front', at: { x: 0, y }, ...(label !== undefined ? { label } : {}) });
    expect(overlayStructure([handle(1, 'Amount +1 in')])).toBe(overlayStructure([handle(5, 'Amount +2 in')]));
    expect(overlayStructure([handle(1, 'Amount +1 in')])).not.toBe(overlayStructure([handle(1)]));
    expect(overlayStructure([handle(1)])).not.toBe(overlayStructure([{ ...handle(1), piece: 'back' }]));
    expect(overlayStructure([handle(1)])).not.toBe(overlayStructure([{ kind: 'point', piece: 'front' }]));
  });
});
