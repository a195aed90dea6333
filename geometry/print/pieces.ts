/**
 * The pieces as printed: one outline per piece (the only one after a blend, or the chosen size),
 * turned so that its grainline is vertical (pointing down the page), with everything drawn on
 * it. Pure: takes a parsed pattern, returns plain data in millimetres.
 */
import { type Contour, contourFlatten, contourNearest, pathFromSvg, segmentTangent } from '../path.ts';
import { type Outline, type Piece, type Pattern, linesForSize, outlineContour } from '../model.ts';
import { pieceGrain } from '../ops/common.ts';
import { type Point, pointInPolygon, vecNormalize, vecPerp } from '../vec.ts';
import { PrintError } from './errors.ts';

export interface PrintPiece {
  readonly name: string;
  /** Size label of the printed outline ("8", or a blend's "waist 0 · hip 4 …"). */
  readonly size: string;
  readonly blended: boolean;
  /** The seam line (or the cut line when the pattern's seam allowance is included). */
  readonly seam: Contour;
  /** The cut line when Blockwright added seam allowance, else undefined. */
  readonly cut: Contour | undefined;
  /** The outermost line: cut when present, else seam. Emptiness and layout use this. */
  readonly outer: Contour;
  /** Internal lines that apply to this size. */
  readonly lines: readonly { readonly role: string; readonly name: string; readonly path: readonly Contour[] }[];
  /** Notches on the seam line: position and outward unit normal. */
  readonly notches: readonly { readonly name: string; readonly at: Point; readonly normal: Point }[];
  readonly cutCount: number;
  readonly onFold: boolean;
  /** Angle (rad, clockwise on screen) that turns the piece's grain to point down the page (+y). */
  readonly grainTurn: number;
}

/**
 * Choose the outline to print: the one a piece has, or `size`. Throws PrintError naming the sizes
 * when a piece has several outlines and no size was chosen, or lacks the chosen size.
 */
export function printOutline(piece: Piece, size: string | undefined): Outline {
  if (size !== undefined) {
    const o = piece.outlines.find((x) => x.size === size);
    if (o) return o;
    if (piece.outlines.length === 1) return piece.outlines[0]!;
    throw new PrintError('bad-size', `piece "${piece.name}" has no size "${size}" (it has ${piece.outlines.map((x) => x.size).join(', ')})`);
  }
  if (piece.outlines.length === 1) return piece.outlines[0]!;
  throw new PrintError('bad-size', `piece "${piece.name}" has ${piece.outlines.length} size lines: choose one size (${piece.outlines.map((x) => x.size).join(', ')}) or blend first`);
}

function notchesOf(outline: Outline, seam: Contour): PrintPiece['notches'] {
  const poly = contourFlatten(seam).map((f) => f.point);
  return outline.points
    .filter((p) => p.kind === 'notch')
    .map((p) => {
      const near = contourNearest(seam, p);
      const seg = seam.segments[near.segmentIndex]!;
      let n = vecNormalize(vecPerp(segmentTangent(seg, near.t)));
      const probe = { x: near.point.x + n.x * 0.5, y: near.point.y + n.y * 0.5 };
      if (pointInPolygon(probe, poly)) n = { x: -n.x, y: -n.y };
      return { name: p.name, at: near.point, normal: n };
    });
}

/** The printable pieces of a pattern, in pattern order. */
export function printPieces(pattern: Pattern, size?: string): PrintPiece[] {
  return pattern.pieces.map((piece) => {
    const outline = printOutline(piece, size);
    const seam = outlineContour(outline);
    let cut: Contour | undefined;
    if (outline.cut) {
      const p = pathFromSvg(outline.cut);
      if (p.length >= 1 && p[0]!.closed) cut = p[0];
    }
    const g = pieceGrain(piece);
    return {
      name: piece.name,
      size: outline.size,
      blended: outline.size.includes('·'),
      seam,
      cut,
      outer: cut ?? seam,
      lines: linesForSize(piece, outline.size).map((l) => ({ role: l.role, name: l.name, path: pathFromSvg(l.d) })),
      notches: notchesOf(outline, seam),
      cutCount: piece.cut.count,
      onFold: piece.cut.onFold,
      grainTurn: Math.atan2(g.x, g.y),
    };
  });
}
