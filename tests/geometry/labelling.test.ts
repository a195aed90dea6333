import { Bezier } from 'bezier-js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  LABEL_SNAP_MM,
  LANDMARK_SNAP,
  LabellingError,
  contourBounds,
  contourLineIntersections,
  contourNearest,
  correspondingPoints,
  demoPattern,
  edgeLength,
  importSvg,
  outlineContour,
  parsePattern,
  pathFromSvg,
  pieceGrain,
  pieceLabels,
  renamePiece,
  renameSize,
  vecDot,
  vecNormalize,
  vecSub,
  withCrossLine,
  withEdge,
  withGrainline,
  withLandmark,
  type Pattern,
  type Piece,
  type Point,
} from '../../geometry/index.ts';
import { multiSizeSvg } from '../support/pattern-svg.ts';
import { expectNear, expectPointNear } from './helpers.ts';

/** A closed polygon as path data. */
const polygon = (pts: Point[]) => `M${pts.map((p) => `${p.x} ${p.y}`).join(' L')} Z`;
/** Rectangle drawn clockwise on screen (y down) from its top-left corner. */
const rectPts = (x: number, y: number, w: number, h: number): Point[] => [
  { x, y },
  { x: x + w, y },
  { x: x + w, y: y + h },
  { x, y: y + h },
];

function pieceOf(outlines: { size: string; d: string }[], extra: Partial<Piece> = {}): Piece {
  return parsePattern({ units: 'mm', pieces: [{ name: 'panel', outlines, ...extra }] }).pieces[0]!;
}

/** The piece must still be valid inside a pattern (what the API's PATCH checks). */
function valid(piece: Piece): Piece {
  return parsePattern({ units: 'mm', pieces: [piece] }).pieces[0]!;
}

/** The demo front with its own edges and landmarks taken away: what an importer without labels gives. */
function unlabelledDemoFront(): Piece {
  const front = demoPattern().pieces.find((p) => p.name === 'front')!;
  return { ...front, edges: [], outlines: front.outlines.map((o) => ({ ...o, points: [] })) };
}

describe('withEdge — closed-form cases on rectangles (exact lengths)', () => {
  // Two graded sizes: "S" 200 × 400, "M" 220 × 420 around it; both drawn clockwise from top-left.
  const piece = pieceOf([
    { size: 'S', d: polygon(rectPts(0, 0, 200, 400)) },
    { size: 'M', d: polygon(rectPts(-10, -10, 220, 420)) },
  ]);

  it('when both ends are clicked near corners of S, then every size takes its own corners and the edge is the side', () => {
    const labelled = valid(withEdge(piece, { name: 'side seam', role: 'side-seam' }, { x: 201, y: 2 }, { x: 198, y: 399 }));
    expectNear(edgeLength(labelled, 'S', 'side-seam')!, 400, 1e-9, 'S');
    expectNear(edgeLength(labelled, 'M', 'side-seam')!, 420, 1e-9, 'M');
    const start = labelled.outlines.map((o) => o.points.find((p) => p.name === 'side seam start')!);
    expectPointNear(start[0]!, { x: 200, y: 0 }, 1e-9, 'S start');
    expectPointNear(start[1]!, { x: 210, y: -10 }, 1e-9, 'M start');
    expect(start.every((p) => p.kind === 'corner')).toBe(true);
  });

  it('when the ends are clicked in the other order, then from/to are swapped so the edge is still the shorter way round', () => {
    const labelled = valid(withEdge(piece, { name: 'side seam', role: 'side-seam' }, { x: 198, y: 399 }, { x: 201, y: 2 }));
    // drawing direction runs (200,0) → (200,400): the edge starts at the top corner, now named "… end"
    const edge = labelled.edges[0]!;
    expect(edge.from).toBe('side seam end');
    expect(edge.to).toBe('side seam start');
    expectNear(edgeLength(labelled, 'S', 'side seam')!, 400, 1e-9);
  });

  it('when the ends are mid-side (no corner near), then other sizes take their nearest points', () => {
    const labelled = valid(withEdge(piece, { name: 'part', role: 'other' }, { x: 200, y: 100 }, { x: 200, y: 300 }));
    expectNear(edgeLength(labelled, 'S', 'part')!, 200, 1e-9, 'S');
    expectNear(edgeLength(labelled, 'M', 'part')!, 200, 1e-9, 'M');
    expect(labelled.outlines[1]!.points.map((p) => p.kind)).toEqual(['mark', 'mark']);
  });

  it('when an end lands on an existing landmark, then that landmark is reused instead of a new one', () => {
    const withNotch = withLandmark(piece, 'knee', 'notch', { x: 200, y: 250 });
    const labelled = valid(withEdge(withNotch, { name: 'lower side', role: 'side-seam' }, { x: 201, y: 251 }, { x: 200, y: 400 }));
    expect(labelled.edges[0]).toEqual({ name: 'lower side', role: 'side-seam', from: 'knee', to: 'lower side end' });
    expectNear(edgeLength(labelled, 'S', 'lower side')!, 150, 1e-9);
  });

  it('when both clicks fall on the same point, then it is refused with a reason', () => {
    expect(() => withEdge(piece, { name: 'x', role: 'other' }, { x: 200, y: 0 }, { x: 201, y: 1 })).toThrow(LabellingError);
    expect(() => withEdge(piece, { name: '  ', role: 'other' }, { x: 200, y: 0 }, { x: 200, y: 400 })).toThrow(/name/);
  });

  it('property: on a one-size rectangle drawn either way, the edge length is the shorter way round between the clicks', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 60_000, max: 500_000 }).map((n) => n / 1000),
        fc.integer({ min: 60_000, max: 1_000_000 }).map((n) => n / 1000),
        fc.integer({ min: 0, max: 999_999 }).map((n) => n / 1e6),
        fc.integer({ min: 0, max: 999_999 }).map((n) => n / 1e6),
        fc.boolean(),
        (w, h, u, v, reversed) => {
          const perimeter = 2 * (w + h);
          // a point at arc length s clockwise from the top-left corner
          const at = (s: number): Point =>
            s < w ? { x: s, y: 0 } : s < w + h ? { x: w, y: s - w } : s < 2 * w + h ? { x: w - (s - w - h), y: h } : { x: 0, y: h - (s - 2 * w - h) };
          const su = u * perimeter;
          const sv = v * perimeter;
          const nearCorner = (s: number) => [0, w, w + h, 2 * w + h, perimeter].some((c) => Math.abs(s - c) <= LABEL_SNAP_MM + 1);
          fc.pre(!nearCorner(su) && !nearCorner(sv));
          const gap = Math.abs(su - sv);
          fc.pre(gap > 5 && perimeter - gap > 5);
          const pts = rectPts(0, 0, w, h);
          const one = pieceOf([{ size: '1', d: polygon(reversed ? pts.reverse() : pts) }]);
          const labelled = valid(withEdge(one, { name: 'e', role: 'other' }, at(su), at(sv)));
          // points are stored to 0.001 mm
          expectNear(edgeLength(labelled, '1', 'e')!, Math.min(gap, perimeter - gap), 0.003);
        },
      ),
      { numRuns: 200 },
    );
  });
});

describe('correspondingPoints', () => {
  it('when sizes have different segment counts, then a clicked corner maps to the nearest corner of each size, a mid-side click to the nearest point', () => {
    // "B" has an extra vertex in the middle of its top side (a straight join, not a corner)
    const piece = pieceOf([
      { size: 'A', d: polygon(rectPts(0, 0, 200, 400)) },
      { size: 'B', d: polygon([{ x: -8, y: -6 }, { x: 100, y: -6 }, { x: 212, y: -6 }, { x: 212, y: 410 }, { x: -8, y: 410 }]) },
    ]);
    const corner = correspondingPoints(piece, { x: 199, y: 401 });
    expect(corner.map((c) => c.size)).toEqual(['A', 'B']);
    expectPointNear(corner[0]!.point, { x: 200, y: 400 }, 1e-9);
    expectPointNear(corner[1]!.point, { x: 212, y: 410 }, 1e-9);
    expect(corner.every((c) => c.corner)).toBe(true);
    const mid = correspondingPoints(piece, { x: 0, y: 150 });
    expectPointNear(mid[1]!.point, { x: -8, y: 150 }, 1e-9);
    expect(mid[1]!.vertex).toBe(false);
  });

  it('when the click is far from every outline, then it is refused', () => {
    const piece = pieceOf([{ size: 'A', d: polygon(rectPts(0, 0, 200, 400)) }]);
    expect(() => correspondingPoints(piece, { x: 100, y: 200 })).toThrow(LabellingError);
  });

  it('property: graded copies with the same segments map a clicked vertex to the same vertex in every size, all on their outlines', () => {
    const base = [
      { x: 0, y: 0 },
      { x: 180, y: 10 },
      { x: 200, y: 240 },
      { x: 260, y: 280 },
      { x: 150, y: 900 },
      { x: 10, y: 900 },
      { x: -20, y: 300 },
    ];
    fc.assert(
      fc.property(
        fc.array(fc.record({ k: fc.double({ min: 0.93, max: 1.07, noNaN: true }), dx: fc.double({ min: -8, max: 8, noNaN: true }), dy: fc.double({ min: -8, max: 8, noNaN: true }) }), { minLength: 1, maxLength: 5 }),
        fc.nat({ max: base.length - 1 }),
        fc.double({ min: -2.5, max: 2.5, noNaN: true }),
        fc.double({ min: -2.5, max: 2.5, noNaN: true }),
        (grades, index, jx, jy) => {
          const sizes = [{ k: 1, dx: 0, dy: 0 }, ...grades].map((g, i) => ({
            size: String(i),
            pts: base.map((p) => ({ x: 100 + (p.x - 100) * g.k + g.dx, y: 400 + (p.y - 400) * g.k + g.dy })),
          }));
          const piece = pieceOf(sizes.map((s) => ({ size: s.size, d: polygon(s.pts) })));
          const click = { x: base[index]!.x + jx, y: base[index]!.y + jy };
          const got = correspondingPoints(piece, click);
          // the clicked size is whichever outline is nearest; every size gets its vertex `index`
          got.forEach((g, i) => {
            expectPointNear(g.point, sizes[i]!.pts[index]!, 0.001, `size ${g.size}`);
            expect(contourNearest(outlineContour(piece.outlines[i]!), g.point).distance).toBeLessThan(LANDMARK_SNAP);
          });
        },
      ),
      { numRuns: 150 },
    );
  });
});

describe('withEdge on the demo pattern (the outlines carry the same landmarks by design)', () => {
  // Reference: the demo pattern's own labelled edges (geometry/demo-pattern.ts) — inside the
  // project, so a weak reference; the rectangles above and bezier-js below are the outside checks.
  const demoFront = demoPattern().pieces.find((p) => p.name === 'front')!;
  const size10 = demoFront.outlines.find((o) => o.size === '10')!;
  const lm = (name: string) => size10.points.find((p) => p.name === name)!;

  it('when the inseam is clicked on size 10 of the unlabelled front, then every one of the 11 sizes measures as the demo inseam', () => {
    const piece = unlabelledDemoFront();
    const hem = lm('hem-inseam');
    const crotch = lm('crotch-point');
    // clicked hem end first and a little off: the order is fixed by the outline's direction
    const labelled = valid(withEdge(piece, { name: 'inseam', role: 'inseam' }, { x: hem.x - 1.5, y: hem.y + 1 }, { x: crotch.x + 1, y: crotch.y - 1.2 }));
    expect(labelled.outlines.length).toBe(11);
    for (const o of labelled.outlines) expectNear(edgeLength(labelled, o.size, 'inseam')!, edgeLength(demoFront, o.size, 'inseam')!, 0.01, `size ${o.size}`);
    expect(labelled.edges[0]!.from).toBe('inseam end'); // the crotch end (clicked second) comes first in drawing order
  });

  it('when the front is imported from a multi-size SVG (pieces unnamed, no landmarks), then the clicked inseam matches the demo in sizes 8, 10 and 12', () => {
    const b0 = contourBounds(outlineContour(size10));
    const width = (b: { minX: number; maxX: number }) => b.maxX - b.minX;
    // The importer does not know which piece is the front: it is the one as wide as the demo front.
    const imported = importSvg(multiSizeSvg()).pattern.pieces.find((p) => Math.abs(width(contourBounds(outlineContour(p.outlines.find((o) => o.size === '10')!))) - width(b0)) < 0.01)!;
    expect(imported).toBeDefined();
    // The file moved the pieces; the shift is found from the size-10 outline's bounds.
    const b1 = contourBounds(outlineContour(imported.outlines.find((o) => o.size === '10')!));
    const shift = { x: b1.minX - b0.minX, y: b1.minY - b0.minY };
    const click = (p: Point) => ({ x: p.x + shift.x + 0.8, y: p.y + shift.y - 0.6 });
    const labelled = valid(withEdge(imported, { name: 'inseam', role: 'inseam' }, click(lm('crotch-point')), click(lm('hem-inseam'))));
    // the SVG stores 3 decimals, so lengths agree to about a hundredth of a millimetre
    for (const size of ['8', '10', '12']) expectNear(edgeLength(labelled, size, 'inseam')!, edgeLength(demoFront, size, 'inseam')!, 0.02, `size ${size}`);
  });

  it('when the crotch curve (one cubic) is clicked, then its length agrees with bezier-js 6.1.4 (npm, general-purpose curve library) within 1e-4 relative', () => {
    const piece = unlabelledDemoFront();
    const labelled = valid(withEdge(piece, { name: 'crotch curve', role: 'crotch-curve' }, lm('cf-curve'), lm('crotch-point')));
    const contour = outlineContour(size10);
    const seg = contour.segments.find((s) => s.kind === 'cubic' && Math.hypot(s.to.x - lm('crotch-point').x, s.to.y - lm('crotch-point').y) < 1e-9)!;
    if (seg.kind !== 'cubic') throw new Error('the demo crotch curve is a cubic');
    const reference = new Bezier(seg.from.x, seg.from.y, seg.c1.x, seg.c1.y, seg.c2.x, seg.c2.y, seg.to.x, seg.to.y).length();
    expectNear(edgeLength(labelled, '10', 'crotch curve')!, reference, reference * 1e-4);
  });
});

describe('withLandmark', () => {
  it('when a notch is placed twice under one name, then each size has it once, at the latest click', () => {
    const piece = unlabelledDemoFront();
    const knee = demoPattern().pieces[0]!.outlines.find((o) => o.size === '10')!.points.find((p) => p.name === 'knee-side')!;
    const once = withLandmark(piece, 'knee', 'notch', { x: knee.x, y: knee.y });
    const twice = valid(withLandmark(once, 'knee', 'notch', { x: knee.x + 0.3, y: knee.y - 20 }));
    for (const o of twice.outlines) expect(o.points.filter((p) => p.name === 'knee').length).toBe(1);
    expect(pieceLabels(twice).notches).toEqual(['knee']);
  });

  it('never changes its input', () => {
    const piece = unlabelledDemoFront();
    const before = structuredClone(piece);
    withLandmark(piece, 'n', 'notch', { x: -105, y: 615 });
    withEdge(piece, { name: 'hem', role: 'hem' }, { x: 93, y: 1065 }, { x: -93, y: 1065 });
    withCrossLine(piece, { role: 'level', name: 'hip' }, { x: 0, y: 195 }, { x: 0, y: 195 }, { squareToGrain: true });
    expect(piece).toEqual(before);
  });
});

describe('withCrossLine and withGrainline', () => {
  it('when a level is placed square to a vertical grain on a rectangle, then it is horizontal and runs 10 mm past each side of the largest size', () => {
    const piece = pieceOf([
      { size: 'S', d: polygon(rectPts(0, 0, 200, 400)) },
      { size: 'M', d: polygon(rectPts(-10, -10, 220, 420)) },
    ]);
    const labelled = valid(withCrossLine(piece, { role: 'level', name: 'hip' }, { x: 50, y: 120 }, { x: 140, y: 180 }, { squareToGrain: true }));
    const line = labelled.lines.find((l) => l.name === 'hip')!;
    expect(line.size).toBeUndefined();
    const seg = pathFromSvg(line.d)[0]!.segments[0]!;
    const ends = [seg.from, seg.to].sort((a, b) => a.x - b.x);
    expectPointNear(ends[0]!, { x: -20, y: 120 }, 1e-9);
    expectPointNear(ends[1]!, { x: 220, y: 120 }, 1e-9);
  });

  it('when not square to grain, then the line runs through both clicks', () => {
    const piece = pieceOf([{ size: 'S', d: polygon(rectPts(0, 0, 200, 400)) }]);
    const labelled = valid(withCrossLine(piece, { role: 'lengthen', name: 'rise' }, { x: 0, y: 100 }, { x: 200, y: 120 }, { squareToGrain: false }));
    const seg = pathFromSvg(labelled.lines[0]!.d)[0]!.segments[0]!;
    // through (0,100) with slope 0.1: at x = −10·cos… the ends lie on y = 100 + 0.1·x
    for (const p of [seg.from, seg.to]) expectNear(p.y, 100 + 0.1 * p.x, 0.002);
  });

  it('when a line misses the piece or the grainline is too short, then it is refused', () => {
    const piece = pieceOf([{ size: 'S', d: polygon(rectPts(0, 0, 200, 400)) }]);
    expect(() => withCrossLine(piece, { role: 'level', name: 'knee' }, { x: 0, y: 600 }, { x: 0, y: 600 }, { squareToGrain: true })).toThrow(LabellingError);
    expect(() => withGrainline(piece, { x: 100, y: 100 }, { x: 100, y: 110 })).toThrow(LabellingError);
  });

  it('property: square to a slanted grainline, the line is perpendicular to the grain and spares 10 mm beyond the outermost crossing on each side', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -0.5, max: 0.5, noNaN: true }),
        fc.double({ min: 20, max: 180, noNaN: true }),
        fc.double({ min: 20, max: 380, noNaN: true }),
        (angle, x, y) => {
          const piece = pieceOf([
            { size: 'S', d: polygon(rectPts(0, 0, 200, 400)) },
            { size: 'M', d: polygon(rectPts(-12, -8, 224, 416)) },
          ]);
          const grained = withGrainline(piece, { x: 100, y: 50 }, { x: 100 + 300 * Math.sin(angle), y: 50 + 300 * Math.cos(angle) });
          const labelled = valid(withCrossLine(grained, { role: 'lengthen', name: 'lower leg' }, { x, y }, { x, y }, { squareToGrain: true }));
          const seg = pathFromSvg(labelled.lines.find((l) => l.name === 'lower leg')!.d)[0]!.segments[0]!;
          const dir = vecNormalize(vecSub(seg.to, seg.from));
          expect(Math.abs(vecDot(dir, pieceGrain(labelled)))).toBeLessThan(1e-4);
          const hits = contourLineIntersections(outlineContour(labelled.outlines[1]!), seg.from, dir).map((h) => vecDot(vecSub(h.point, seg.from), dir));
          const length = vecDot(vecSub(seg.to, seg.from), dir);
          expectNear(Math.min(...hits), 10, 0.005, 'spare at the start');
          expectNear(length - Math.max(...hits), 10, 0.005, 'spare at the end');
        },
      ),
      { numRuns: 150 },
    );
  });
});

describe('renamePiece and renameSize', () => {
  const pattern: Pattern = importSvg(multiSizeSvg()).pattern;

  it('when pieces are renamed, then names stay unique and the pattern stays valid', () => {
    const named = renamePiece(renamePiece(pattern, pattern.pieces[0]!.name, ' front '), pattern.pieces[1]!.name, 'back');
    expect(parsePattern(named).pieces.map((p) => p.name)).toEqual(['front', 'back']);
    expect(() => renamePiece(named, 'back', 'front')).toThrow(/already called "front"/);
    expect(() => renamePiece(named, 'back', '')).toThrow(LabellingError);
  });

  it('when a size is renamed, then every piece and its per-size lines follow; a clash is refused', () => {
    const renamed = parsePattern(renameSize(pattern, '10', '10R'));
    for (const p of renamed.pieces) {
      expect(p.outlines.map((o) => o.size)).toEqual(['8', '10R', '12']);
      expect(p.lines.some((l) => l.size === '10')).toBe(false);
      expect(p.lines.filter((l) => l.size === '10R').length).toBeGreaterThan(0);
    }
    expect(() => renameSize(pattern, '10', '12')).toThrow(/already has a size "12"/);
    const onlyFront = renameSize(pattern, '8', 'small', { piece: pattern.pieces[0]!.name });
    expect(onlyFront.pieces[1]!.outlines[0]!.size).toBe('8');
  });
});
