/** Fit planner inputs: body profile and fabric schemas, unit conversions, girths at heights. */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  BODY_MEASUREMENT_NAMES,
  FitInputError,
  GRAMS_PER_OUNCE,
  GSM_PER_OZ_PER_SQ_YD,
  MM_PER_INCH,
  SQUARE_METRES_PER_SQUARE_YARD,
  girthAtOffset,
  gsmToOzPerSqYd,
  ozPerSqYdToGsm,
  parseBodyProfile,
  parseFabric,
  shrinkagePercent,
  stretchPercent,
} from '../../geometry/index.ts';
import { MEASUREMENT_NAMES } from '../../server/modules/profiles/profiles.schemas.ts';
import { MEASUREMENT_NAMES as CLIENT_MEASUREMENT_NAMES } from '../../src/types/measurement-names.ts';
import { expectNear } from './helpers.ts';

describe('units', () => {
  it('1 oz/yd² = 33.906 g/m² (trade reference §4.5 [calc], from the exact avoirdupois ounce and international yard)', () => {
    // International yard and pound (1959): 1 yd = 0.9144 m, 1 lb = 0.453 592 37 kg, 1 lb = 16 oz.
    expectNear(GRAMS_PER_OUNCE, 453.59237 / 16, 1e-12, 'grams per ounce');
    expectNear(SQUARE_METRES_PER_SQUARE_YARD, 0.9144 * 0.9144, 1e-15, 'm² per yd²');
    expect(GSM_PER_OZ_PER_SQ_YD.toFixed(3)).toBe('33.906');
    // NIST SP 811 B.8 lists oz/yd² → kg/m² as 3.390 575 × 10⁻² (trade reference §4.5; from memory there)
    expectNear(GSM_PER_OZ_PER_SQ_YD / 1000, 3.390575e-2, 5e-9, 'NIST factor (from memory)');
  });

  it('worked fabric weights of trade reference §6 example 8 [calc]: 12 oz = 406.9 g/m², 8 oz = 271.2 g/m², 300 g/m² = 8.85 oz', () => {
    expect(ozPerSqYdToGsm(12).toFixed(1)).toBe('406.9');
    expect(ozPerSqYdToGsm(8).toFixed(1)).toBe('271.2');
    expect(gsmToOzPerSqYd(300).toFixed(2)).toBe('8.85');
    expect(gsmToOzPerSqYd(1).toFixed(6)).toBe('0.029494'); // §4.5 inverse
  });

  it('25.4 mm per inch (international inch, 1959; PRODUCT.md)', () => {
    expect(MM_PER_INCH).toBe(25.4);
  });

  it('weight conversion round-trips (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 2000, noNaN: true }), (g) => Math.abs(ozPerSqYdToGsm(gsmToOzPerSqYd(g)) - g) < 1e-9 * g));
  });
});

describe('body profile', () => {
  it('keeps the same ISO 8559-1 keys as the server profile schema and the client\'s profile form', () => {
    expect([...BODY_MEASUREMENT_NAMES]).toEqual([...MEASUREMENT_NAMES]);
    // The client keeps its own copy so the makes page does not load the engine.
    expect([...BODY_MEASUREMENT_NAMES]).toEqual([...CLIENT_MEASUREMENT_NAMES]);
  });

  it('reads the flat form and the stored { measurements } form alike', () => {
    const flat = parseBodyProfile({ waistGirth: 720, hipGirth: 990, girthsAtHeights: [{ offset: 50, girth: 700 }] });
    const stored = parseBodyProfile({ name: 'Ada (invented)', measurements: { waistGirth: 720, hipGirth: 990 }, girthsAtHeights: [{ offset: 50, girth: 700 }] });
    expect(stored.waistGirth).toBe(flat.waistGirth);
    expect(stored.hipGirth).toBe(flat.hipGirth);
    expect(stored.girthsAtHeights).toEqual(flat.girthsAtHeights);
  });

  it('refuses bad input with one line naming the field', () => {
    const cases: [unknown, RegExp][] = [
      [{ waistGirth: -3 }, /waistGirth: must be more than 0 mm/],
      [{ hipGirth: 'wide' }, /hipGirth: must be a number of millimetres/],
      [{ girthsAtHeights: [{ offset: 0, girth: 700 }] }, /offset 0 is the natural waist/],
      [{ girthsAtHeights: [{ offset: 50, girth: 700 }, { offset: 50, girth: 710 }] }, /given twice/],
      [{ waistGirth: 700, shoeSize: 9 }, /shoeSize|Unrecognized/i],
    ];
    for (const [input, message] of cases) {
      expect(() => parseBodyProfile(input)).toThrow(FitInputError);
      expect(() => parseBodyProfile(input)).toThrow(message);
    }
  });

  it('gives the girth at a height between measured heights, and says when it extrapolates', () => {
    const p = parseBodyProfile({ waistGirth: 700, girthsAtHeights: [{ offset: 100, girth: 660 }, { offset: -100, girth: 820 }] });
    expect(girthAtOffset(p, 0)).toEqual({ girth: 700, how: 'measured' });
    const up = girthAtOffset(p, 50.8)!;
    expectNear(up.girth, 700 - 40 * 0.508, 1e-9, 'halfway up');
    expect(up.how).toBe('interpolated');
    const down = girthAtOffset(p, -25)!;
    expectNear(down.girth, 730, 1e-9, 'a quarter down');
    expect(girthAtOffset(p, 150)!.how).toBe('extrapolated');
    expect(girthAtOffset(parseBodyProfile({ waistGirth: 700 }), 50)).toBeUndefined();
  });
});

describe('fabric', () => {
  it('stretch from a hand test: 10 cm → 14 cm = 40 % (trade reference §4.2 and §6 example 7; common practice, no source)', () => {
    expect(stretchPercent(100, 140)).toBeCloseTo(40, 12);
    expect(parseFabric({ stretchAcross: { relaxed: 100, stretched: 140 } }).stretchAcross).toBeCloseTo(40, 12);
  });

  it('shrinkage from a wash test: DC = 100 (B − A) / A, shrinkage = −DC (trade reference §4.4, ISO 5077 / AATCC 135 formula)', () => {
    expect(shrinkagePercent(500, 485)).toBeCloseTo(3, 12);
    const f = parseFabric({ shrinkage: { warp: { before: 500, after: 485 }, weft: 2 } });
    expect(f.shrinkageWarp).toBeCloseTo(3, 12);
    expect(f.shrinkageWeft).toBe(2);
  });

  it('gives the weight in both units, and refuses two weights that disagree', () => {
    const f = parseFabric({ weightOzPerSqYd: 12 });
    expect(f.weightGsm!.toFixed(1)).toBe('406.9');
    expect(parseFabric({ weightGsm: 406.9, weightOzPerSqYd: 12 }).weightGsm).toBe(406.9);
    expect(() => parseFabric({ weightGsm: 300, weightOzPerSqYd: 12 })).toThrow(/does not match 300 g\/m²/);
  });

  it('refuses impossible values with one line', () => {
    expect(() => parseFabric({ stretchAcross: -5 })).toThrow(/stretchAcross/);
    expect(() => parseFabric({ recovery: 120 })).toThrow(/recovery: must be 100 % or less/);
    expect(() => parseFabric({ shrinkage: { warp: { before: 500, after: 300 } } })).toThrow(/more than 30 %/);
    expect(() => parseFabric({ stretchAcross: { relaxed: 100, stretched: 90 } })).toThrow(/stretched length/);
  });
});
