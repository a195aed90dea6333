/**
 * The pattern canvas's pure parts: piece layout, view maths, picking and calibration.
 * (The paper.js drawing itself is checked in a browser; see the component's header.)
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { demoPattern, parsePattern, performLengthen, type Pattern } from '../../geometry/index.ts';
import {
  barPxFor,
  CARD_WIDTH_MM,
  clearCalibration,
  DEFAULT_PX_PER_MM,
  PX_PER_MM_STORAGE_KEY,
  pxPerMmFromBar,
  pxPerInch,
  readCalibration,
  saveCalibration,
  type CalibrationStorage,
} from '../../src/components/pattern-canvas/calibration.ts';
import { layoutPieces, PIECE_GAP_MM, pieceOffsets } from '../../src/components/pattern-canvas/layout.ts';
import { pickAt } from '../../src/components/pattern-canvas/pick.ts';
import {
  centredTransform,
  constrainAlong,
  fitTransform,
  labelLines,
  panBy,
  pieceToWorld,
  screenToWorld,
  wheelZoomFactor,
  worldToPiece,
  worldToScreen,
  zoomAbout,
} from '../../src/components/pattern-canvas/view-math.ts';
import { expectNear, expectPointNear } from '../geometry/helpers.ts';

/** An axis-aligned rectangle piece from (x, y), w × h, with optional landmarks and lines. */
function rect(name: string, x: number, y: number, w: number, h: number, extra: Record<string, unknown> = {}) {
  return { name, outlines: [{ size: '8', d: `M${x} ${y} L${x + w} ${y} L${x + w} ${y + h} L${x} ${y + h} Z` }], ...extra };
}

const pattern = (...pieces: object[]): Pattern => parsePattern({ units: 'mm', pieces });

describe('layoutPieces', () => {
  it('places pieces left to right, tops at 0, 40 mm apart, from their own bounds', () => {
    const p = pattern(rect('front', 50, -20, 100, 200), rect('back', -30, 10, 120, 250));
    const { placements, bounds } = layoutPieces(p);
    expect([...placements.keys()]).toEqual(['front', 'back']);
    expect(placements.get('front')).toMatchObject({ dx: -50, dy: 20 });
    // back starts at 100 + 40 = 140 in canvas mm: dx = 140 - (-30)
    expect(placements.get('back')).toMatchObject({ dx: 170, dy: -10 });
    expect(bounds).toEqual({ minX: 0, minY: 0, maxX: 100 + PIECE_GAP_MM + 120, maxY: 250 });
    expect(pieceOffsets(p).get('back')).toEqual({ dx: 170, dy: -10 });
  });

  it("counts the cut line and internal lines in a piece's size", () => {
    const p = pattern({
      name: 'front',
      outlines: [{ size: '8', d: 'M0 0 L100 0 L100 100 L0 100 Z', cut: 'M-10 -10 L110 -10 L110 110 L-10 110 Z' }],
      lines: [{ role: 'grain', name: 'grain', d: 'M50 -30 L50 90' }],
    });
    expect(layoutPieces(p).placements.get('front')).toMatchObject({ dx: 10, dy: 30, bounds: { minX: -10, minY: -30, maxX: 110, maxY: 110 } });
  });

  it('keeps pieces still while the altered outline changes when a reference is given', () => {
    const reference = demoPattern();
    const lengthened = performLengthen(reference, { op: 'lengthen', line: 'lower leg', amount: 60 }).pattern;
    const still = pieceOffsets(lengthened, reference);
    expect(still).toEqual(pieceOffsets(reference, reference));
    // without the reference the layout follows the longer pieces (the check can fail)
    const moved = layoutPieces(lengthened);
    expect(moved.bounds.maxY).toBeGreaterThan(layoutPieces(reference).bounds.maxY + 50);
  });

  it('places pieces missing from the reference after the others', () => {
    const reference = pattern(rect('front', 0, 0, 100, 100));
    const p = pattern(rect('yoke', 0, 0, 50, 30), rect('front', 0, 0, 110, 100));
    const { placements } = layoutPieces(p, reference);
    expect([...placements.keys()]).toEqual(['front', 'yoke']);
    expect(placements.get('yoke')!.dx).toBe(100 + PIECE_GAP_MM);
  });

  it('never overlaps pieces, keeps at least the gap between them, and fills shelves left to right (property)', () => {
    const box = fc.record({
      x: fc.double({ min: -500, max: 500, noNaN: true }),
      y: fc.double({ min: -500, max: 500, noNaN: true }),
      w: fc.double({ min: 1, max: 800, noNaN: true }),
      h: fc.double({ min: 1, max: 1500, noNaN: true }),
    });
    fc.assert(
      fc.property(fc.array(box, { minLength: 1, maxLength: 6 }), (boxes) => {
        const p = pattern(...boxes.map((b, i) => rect(`p${i}`, b.x, b.y, b.w, b.h)));
        const { placements } = layoutPieces(p);
        const placed = boxes.map((b, i) => {
          const at = placements.get(`p${i}`)!;
          return { left: b.x + at.dx, top: b.y + at.dy, right: b.x + b.w + at.dx, bottom: b.y + b.h + at.dy };
        });
        expectNear(placed[0]!.left, 0, 1e-6, 'first left');
        expectNear(placed[0]!.top, 0, 1e-6, 'first top');
        for (let i = 0; i < placed.length; i++)
          for (let j = i + 1; j < placed.length; j++) {
            const a = placed[i]!;
            const b = placed[j]!;
            const apart = Math.max(b.left - a.right, a.left - b.right, b.top - a.bottom, a.top - b.bottom);
            expect(apart).toBeGreaterThanOrEqual(PIECE_GAP_MM - 1e-6);
          }
        for (let i = 1; i < placed.length; i++) {
          const a = placed[i - 1]!;
          const b = placed[i]!;
          // the next piece is either beside the last on its shelf (same top, exactly the gap) or starts a new shelf at the left
          if (Math.abs(b.top - a.top) < 1e-6) expectNear(b.left - a.right, PIECE_GAP_MM, 1e-6, 'gap');
          else {
            expectNear(b.left, 0, 1e-6, 'new shelf left');
            expect(b.top).toBeGreaterThan(a.top);
          }
        }
        // deterministic
        expect(layoutPieces(p)).toEqual(layoutPieces(p));
      }),
    );
  });

  it('lays out the demo pattern without overlaps, on more than one shelf (the waistband is long)', () => {
    const demo = demoPattern();
    const { placements } = layoutPieces(demo);
    const boxes = demo.pieces.map((piece) => {
      const at = placements.get(piece.name)!;
      return { left: at.bounds.minX + at.dx, right: at.bounds.maxX + at.dx, top: at.bounds.minY + at.dy, bottom: at.bounds.maxY + at.dy };
    });
    for (let i = 0; i < boxes.length; i++)
      for (let j = i + 1; j < boxes.length; j++) {
        const a = boxes[i]!;
        const b = boxes[j]!;
        expect(Math.max(b.left - a.right, a.left - b.right, b.top - a.bottom, a.top - b.bottom)).toBeGreaterThanOrEqual(PIECE_GAP_MM - 1e-6);
      }
    expect(new Set(boxes.map((b) => Math.round(b.top))).size).toBeGreaterThan(1);
  });
});

describe('view maths', () => {
  const size = { width: 1048, height: 548 };

  it('fits bounds inside the padding, centred', () => {
    const t = fitTransform({ minX: 0, minY: 0, maxX: 1000, maxY: 250 }, size, 24);
    expect(t.scale).toBe(1); // 1000 mm across 1000 px of room; the height (250 mm in 500 px) has room to spare
    expectPointNear(worldToScreen(t, { x: 500, y: 125 }), { x: 524, y: 274 }, 1e-9);
    expectPointNear(worldToScreen(t, { x: 0, y: 0 }), { x: 24, y: 149 }, 1e-9);
  });

  it('at the default scale, 1 in shows as 96 CSS px (CSS Values and Units: 1in = 96px)', () => {
    const t = centredTransform(DEFAULT_PX_PER_MM, { x: 0, y: 0 }, size);
    const a = worldToScreen(t, { x: 0, y: 0 });
    const b = worldToScreen(t, { x: 25.4, y: 0 });
    expectNear(b.x - a.x, 96, 1e-9);
  });

  it('maps screen → world → screen and piece → world → piece back to the same point (property)', () => {
    const n = fc.double({ min: -1e4, max: 1e4, noNaN: true });
    fc.assert(
      fc.property(fc.double({ min: 0.02, max: 60, noNaN: true }), n, n, n, n, (scale, tx, ty, x, y) => {
        const t = { scale, tx, ty };
        expectPointNear(screenToWorld(t, worldToScreen(t, { x, y })), { x, y }, 1e-6);
        const off = { dx: tx, dy: ty };
        expectPointNear(worldToPiece(off, pieceToWorld(off, { x, y })), { x, y }, 1e-9);
      }),
    );
  });

  it('zooms about the pointer: the world point under it stays put (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 10, noNaN: true }),
        fc.double({ min: 0.5, max: 2, noNaN: true }),
        fc.double({ min: 0, max: 1000, noNaN: true }),
        fc.double({ min: 0, max: 600, noNaN: true }),
        (scale, factor, ax, ay) => {
          const t = { scale, tx: 37, ty: -12 };
          const anchor = { x: ax, y: ay };
          const z = zoomAbout(t, factor, anchor);
          expectNear(z.scale, scale * factor, 1e-12);
          expectPointNear(screenToWorld(z, anchor), screenToWorld(t, anchor), 1e-6);
        },
      ),
    );
  });

  it('clamps zoom and undoes a wheel step with the opposite one', () => {
    expect(zoomAbout({ scale: 50, tx: 0, ty: 0 }, 10, { x: 0, y: 0 }).scale).toBe(60);
    expectNear(wheelZoomFactor(120) * wheelZoomFactor(-120), 1, 1e-12);
    expect(wheelZoomFactor(100)).toBeLessThan(1); // wheel down (positive delta) zooms out
    expect(panBy({ scale: 2, tx: 1, ty: 1 }, 10, -5)).toEqual({ scale: 2, tx: 11, ty: -4 });
  });

  it('constrains a handle drag to its axis (normalising it) and leaves it free without one', () => {
    const origin = { x: 10, y: 20 };
    expectPointNear(constrainAlong(origin, { x: 0, y: 2 }, { x: 17, y: 55 }), { x: 10, y: 55 }, 1e-12);
    expectPointNear(constrainAlong(origin, { x: 1, y: 1 }, { x: 20, y: 20 }), { x: 15, y: 25 }, 1e-12);
    expect(constrainAlong(origin, undefined, { x: 3, y: 4 })).toEqual({ x: 3, y: 4 });
    expect(constrainAlong(origin, { x: 0, y: 0 }, { x: 3, y: 4 })).toEqual({ x: 3, y: 4 });
  });
});

describe('pickAt', () => {
  const p = pattern(
    rect('front', 0, 0, 100, 200, {
      outlines: [
        {
          size: '8',
          d: 'M0 0 L100 0 L100 200 L0 200 Z',
          points: [
            { name: 'waist-side', kind: 'corner', x: 100, y: 0 },
            { name: 'knee', kind: 'notch', x: 100, y: 120 },
          ],
        },
      ],
      lines: [{ role: 'grain', name: 'grain', d: 'M50 20 L50 180' }],
    }),
    rect('back', 0, 0, 120, 220),
  );
  const layout = layoutPieces(p);
  const back = layout.placements.get('back')!; // dx = 140

  it("reports a click in the piece's own millimetres with the nearest outline", () => {
    const pick = pickAt(p, layout, { x: back.dx + 121, y: 50 }, 2);
    expect(pick.piece).toBe('back');
    expectPointNear(pick.point, { x: 121, y: 50 }, 1e-9);
    expect(pick.nearest).toMatchObject({ kind: 'outline', pieceName: 'back', size: '8' });
    expectPointNear(pick.nearest!.point, { x: 120, y: 50 }, 1e-6);
    expectNear(pick.nearest!.distanceMm, 1, 1e-6); // closed form: 1 mm right of the edge x = 120
  });

  it('prefers a landmark within the tolerance over the outline it sits on', () => {
    const pick = pickAt(p, layout, { x: 100.5, y: 119.2 }, 2);
    expect(pick.nearest).toMatchObject({ kind: 'landmark', landmarkName: 'knee', pieceName: 'front' });
    expectNear(pick.nearest!.distanceMm, Math.hypot(0.5, 0.8), 1e-9);
  });

  it('finds internal lines by name', () => {
    const pick = pickAt(p, layout, { x: 51.5, y: 100 }, 2);
    expect(pick.nearest).toMatchObject({ kind: 'line', lineName: 'grain', pieceName: 'front' });
    expectPointNear(pick.nearest!.point, { x: 50, y: 100 }, 1e-6);
  });

  it('reports only the piece inside it, and nothing in the empty space between pieces', () => {
    const inside = pickAt(p, layout, { x: 20, y: 100 }, 2);
    expect(inside.piece).toBe('front');
    expect(inside.nearest).toBeUndefined();
    const between = pickAt(p, layout, { x: 120, y: 100 }, 2);
    expect(between.piece).toBeUndefined();
    expect(between.nearest).toBeUndefined();
    expect(between.point).toEqual({ x: 120, y: 100 });
  });

  it('agrees with the closed-form distance to the rectangle outline (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -5, max: 125, noNaN: true }), fc.double({ min: -5, max: 225, noNaN: true }), (x, y) => {
        const pick = pickAt(p, layout, { x: x + back.dx, y: y + back.dy }, 3);
        const inside = x >= 0 && x <= 120 && y >= 0 && y <= 220;
        const d = inside ? Math.min(x, 120 - x, y, 220 - y) : Math.hypot(Math.max(0, -x, x - 120), Math.max(0, -y, y - 220));
        if (d <= 3 - 1e-6) {
          expect(pick.nearest?.kind).toBe('outline');
          expectNear(pick.nearest!.distanceMm, d, 1e-6);
        } else if (d > 3 + 1e-6) expect(pick.nearest).toBeUndefined();
      }),
    );
  });
});

describe('calibration', () => {
  function memoryStorage(initial: Record<string, string> = {}): CalibrationStorage & { map: Map<string, string> } {
    const map = new Map(Object.entries(initial));
    return { map, getItem: (k) => map.get(k) ?? null, setItem: (k, v) => void map.set(k, v), removeItem: (k) => void map.delete(k) };
  }

  it('uses the ISO/IEC 7810 ID-1 card width and the CSS 96 px per inch default', () => {
    expect(CARD_WIDTH_MM).toBe(85.6); // ISO/IEC 7810 ID-1: 85.60 mm × 53.98 mm
    expectNear(pxPerInch(DEFAULT_PX_PER_MM), 96, 1e-12); // CSS Values and Units Level 3 §5.2: 1in = 96px
    // a card at the default scale: 85.6 / 25.4 × 96 = 323.53 px (worked by hand)
    expectNear(barPxFor(CARD_WIDTH_MM, DEFAULT_PX_PER_MM), 323.5276, 1e-4);
  });

  it('turns a matched bar into px per mm, and refuses implausible matches', () => {
    expectNear(pxPerMmFromBar(428, CARD_WIDTH_MM), 5, 1e-12); // a 127 px/in screen: 428 px for the card
    expectNear(pxPerMmFromBar(barPxFor(100, 4.2), 100), 4.2, 1e-12);
    expect(() => pxPerMmFromBar(10, CARD_WIDTH_MM)).toThrow(/outside 1–20/);
    expect(() => pxPerMmFromBar(5000, CARD_WIDTH_MM)).toThrow(RangeError);
    expect(() => pxPerMmFromBar(300, 0)).toThrow(/positive/);
  });

  it('stores under blockwright.pxPerMm and reads it back', () => {
    const storage = memoryStorage();
    expect(readCalibration(storage)).toEqual({ pxPerMm: DEFAULT_PX_PER_MM, calibrated: false });
    expect(saveCalibration(storage, 4.5)).toEqual({ pxPerMm: 4.5, calibrated: true });
    expect(storage.map.get(PX_PER_MM_STORAGE_KEY)).toBe('4.5');
    expect(PX_PER_MM_STORAGE_KEY).toBe('blockwright.pxPerMm');
    expect(readCalibration(storage)).toEqual({ pxPerMm: 4.5, calibrated: true });
    expect(clearCalibration(storage)).toEqual({ pxPerMm: DEFAULT_PX_PER_MM, calibrated: false });
    expect(storage.map.has(PX_PER_MM_STORAGE_KEY)).toBe(false);
  });

  it.each(['abc', '', '0', '-3', '1e9', 'NaN', 'Infinity'])('treats a stored %j as uncalibrated', (raw) => {
    expect(readCalibration(memoryStorage({ [PX_PER_MM_STORAGE_KEY]: raw }))).toEqual({ pxPerMm: DEFAULT_PX_PER_MM, calibrated: false });
  });

  it('behaves as uncalibrated when storage is blocked, and stores nothing implausible', () => {
    const blocked: CalibrationStorage = {
      getItem: () => {
        throw new Error('blocked');
      },
      setItem: () => undefined,
      removeItem: () => undefined,
    };
    expect(readCalibration(blocked).calibrated).toBe(false);
    expect(readCalibration(undefined).calibrated).toBe(false);
    const storage = memoryStorage();
    expect(() => saveCalibration(storage, 0.2)).toThrow(RangeError);
    expect(storage.map.size).toBe(0);
  });
});

describe('a piece label on two lines', () => {
  it('splits at the space nearest the middle, and not at all without a space', () => {
    expect(labelLines('front pocket bag')).toEqual(['front', 'pocket bag']);
    expect(labelLines('back pocket')).toEqual(['back', 'pocket']);
    expect(labelLines('waistband')).toBeUndefined();
  });

  it('keeps every word in order and shortens the longest line to no more than the whole (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.stringMatching(/^[a-z]{1,9}$/), { minLength: 2, maxLength: 6 }), (words) => {
        const text = words.join(' ');
        const [a, b] = labelLines(text)!;
        expect(`${a} ${b}`).toBe(text);
        expect(Math.max(a.length, b.length)).toBeLessThan(text.length);
        // no other space gives a shorter longest line
        for (let i = text.indexOf(' '); i !== -1; i = text.indexOf(' ', i + 1)) expect(Math.max(a.length, b.length)).toBeLessThanOrEqual(Math.max(i, text.length - i - 1));
      }),
    );
  });
});
