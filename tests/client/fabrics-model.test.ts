/**
 * The fabrics screen's pure parts (src/features/fabrics/model.ts): weight units, stretch from a
 * hand test, shrinkage from a wash test, the form read into the properties the API keeps, and
 * what a fit plan will do about shrinkage.
 *
 * Outside references: 1 oz/yd² = 33.906 g/m², 12 oz/yd² = 406.9 g/m², 8 oz/yd² = 271.2 g/m²,
 * 300 g/m² = 8.85 oz/yd² (trade reference §4.5 and §6.8 [calc], from the exact avoirdupois ounce
 * 28.349 523 125 g and international yard 0.9144 m, 1959 agreement); 1 in = 25.4 mm exactly;
 * stretch % = 100 × (stretched − relaxed) / relaxed, 10 → 14 cm = 40 % (§4.2 and §6.7, common
 * practice, no source); dimensional change DC = 100 × (B − A) / A, negative = shrinkage
 * (ISO 5077 via a secondary summary, trade reference §4.4). Every property the client sends is
 * also checked by geometry's own fabric schema (the one the server uses) and the planner.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { demoPattern, parsePattern } from '../../geometry/index.ts';
import {
  GRAMS_PER_OUNCE as GEOMETRY_GRAMS_PER_OUNCE,
  SQUARE_METRES_PER_SQUARE_YARD as GEOMETRY_SQ_M_PER_SQ_YD,
  fabricSchema,
  shrinkagePercent as geometryShrinkagePercent,
  stretchPercent as geometryStretchPercent,
  summarizeFabric,
} from '../../geometry/fit/body.ts';
import { MIN_SHRINKAGE as GEOMETRY_MIN_SHRINKAGE, PREWASH_ABOVE as GEOMETRY_PREWASH_ABOVE, planFit } from '../../geometry/fit/plan.ts';
import { MAX_SHRINKAGE } from '../../geometry/tolerance.ts';
import {
  GRAMS_PER_OUNCE,
  GSM_PER_OZ_PER_SQ_YD,
  MAX_SHRINKAGE_PERCENT,
  MIN_SHRINKAGE,
  PREWASH_ABOVE,
  SQUARE_METRES_PER_SQUARE_YARD,
  convertedWeight,
  fabricDraft,
  fabricFieldErrors,
  gsmToOzPerSqYd,
  ozPerSqYdToGsm,
  readFabricDraft,
  readNumber,
  shrinkageAdvice,
  shrinkagePercent,
  stretchFromDraft,
  stretchPercent,
  weightsOf,
  type FabricDraft,
} from '../../src/features/fabrics/model.ts';

const MM_PER_INCH = 25.4; // exact

const base = (over: Partial<FabricDraft> = {}): FabricDraft => ({ ...fabricDraft('Test cloth'), ...over });

describe('constants', () => {
  it('are geometry\'s: the exact ounce and square yard, the plan\'s shrinkage thresholds and the API\'s shrinkage limit', () => {
    expect(GRAMS_PER_OUNCE).toBe(GEOMETRY_GRAMS_PER_OUNCE);
    expect(SQUARE_METRES_PER_SQUARE_YARD).toBe(GEOMETRY_SQ_M_PER_SQ_YD);
    expect(MIN_SHRINKAGE).toBe(GEOMETRY_MIN_SHRINKAGE);
    expect(PREWASH_ABOVE).toBe(GEOMETRY_PREWASH_ABOVE);
    expect(MAX_SHRINKAGE_PERCENT).toBeCloseTo(100 * MAX_SHRINKAGE, 12);
  });

  it('1 oz/yd² = 33.906 g/m² (trade reference §4.5), from 1 lb = 453.592 37 g and 1 yd = 0.9144 m (1959 agreement)', () => {
    expect(GRAMS_PER_OUNCE).toBeCloseTo(453.59237 / 16, 12);
    expect(SQUARE_METRES_PER_SQUARE_YARD).toBeCloseTo(0.9144 * 0.9144, 14);
    expect(GSM_PER_OZ_PER_SQ_YD.toFixed(3)).toBe('33.906');
    // trade reference §6.8 worked examples
    expect(ozPerSqYdToGsm(12).toFixed(1)).toBe('406.9');
    expect(ozPerSqYdToGsm(8).toFixed(1)).toBe('271.2');
    expect(gsmToOzPerSqYd(300).toFixed(2)).toBe('8.85');
    // NIST SP 811 B.8 lists oz/yd² → kg/m² as 3.390 575 E−02 (trade reference §4.5, from memory there)
    expect(GSM_PER_OZ_PER_SQ_YD / 1000).toBeCloseTo(3.390575e-2, 8);
  });

  it('converting one way and back gives the weight again (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1, max: 2000, noNaN: true }), (gsm) => Math.abs(ozPerSqYdToGsm(gsmToOzPerSqYd(gsm)) - gsm) < 1e-9 * gsm));
  });
});

describe('tests of the cloth', () => {
  it('stretch from a hand test: 10 → 14 cm is 40 % (trade reference §6.7, common practice); 4 → 5 1/2 in is 37.5 %', () => {
    expect(stretchPercent(100, 140)).toBeCloseTo(40, 12);
    expect(stretchPercent(4 * MM_PER_INCH, 5.5 * MM_PER_INCH)).toBeCloseTo(37.5, 12);
  });

  it('shrinkage from a wash test is −DC with DC = 100 (B − A) / A (ISO 5077): 500 → 485 mm is 3 % shrinkage, 500 → 505 is −1 %', () => {
    expect(shrinkagePercent(500, 485)).toBeCloseTo(3, 12);
    expect(shrinkagePercent(500, 505)).toBeCloseTo(-1, 12);
  });

  it('agree with geometry\'s formulas (property)', () => {
    const mm = fc.double({ min: 1, max: 3000, noNaN: true });
    fc.assert(fc.property(mm, mm, (a, b) => {
      expect(stretchPercent(a, b)).toBeCloseTo(geometryStretchPercent(a, b), 9);
      expect(shrinkagePercent(a, b)).toBeCloseTo(geometryShrinkagePercent(a, b), 9);
    }));
  });
});

describe('readFabricDraft', () => {
  it('reads a hand test in inches and a weight in oz/yd² into the API\'s properties; geometry reads them as the same %', () => {
    const draft = base({
      stretchAcross: { how: 'test', percent: '', relaxed: '4', stretched: '5 1/2' },
      stretchAlong: { how: 'percent', percent: '2,5 %', relaxed: '', stretched: '' },
      recovery: '92',
      weightUnit: 'oz',
      weight: '12',
      width: '58',
      warp: { how: 'test', percent: '', before: '20', after: '19 1/4' },
      weft: { how: 'percent', percent: '1.5', before: '', after: '' },
    });
    const read = readFabricDraft(draft, 'in');
    expect(read).toEqual({
      value: {
        name: 'Test cloth',
        properties: {
          stretchAcross: { relaxed: 101.6, stretched: 139.7 },
          stretchAlong: 2.5,
          recovery: 92,
          weightOzPerSqYd: 12,
          width: 58 * MM_PER_INCH,
          shrinkage: { warp: { before: 508, after: 488.95 }, weft: 1.5 },
        },
      },
    });
    if (!('value' in read)) throw new Error('expected a value');
    const summary = summarizeFabric(read.value.properties);
    expect(summary.stretchAcross).toBeCloseTo(37.5, 9);
    expect(summary.weightGsm!.toFixed(1)).toBe('406.9');
    expect(summary.shrinkageWarp).toBeCloseTo(3.75, 9); // 3/4 in of 20 in
    expect(stretchFromDraft(draft.stretchAcross, 'in')).toBeCloseTo(37.5, 9);
    expect(convertedWeight(draft)).toBe('406.9 g/m²');
    expect(convertedWeight({ weightUnit: 'gsm', weight: '300' })).toBe('8.85 oz/yd²');
  });

  it('names each problem by the API\'s key: half a test, stretched shorter than relaxed, out-of-range numbers', () => {
    const read = readFabricDraft(
      base({
        name: ' ',
        stretchAcross: { how: 'test', percent: '', relaxed: '10', stretched: '9' },
        stretchAlong: { how: 'test', percent: '', relaxed: '10', stretched: '' },
        recovery: '120',
        weight: 'heavy',
        warp: { how: 'test', percent: '', before: '50', after: '30' },
        weft: { how: 'percent', percent: '-31', before: '', after: '' },
      }),
      'cm',
    );
    expect(read).toEqual({
      errors: {
        name: 'Enter a name for the fabric.',
        'properties.stretchAcross.stretched': 'The stretched length is shorter than the relaxed one: check the two.',
        'properties.stretchAlong.stretched': 'Enter the length when stretched.',
        'properties.recovery': 'Give a percent from 0 to 100.',
        'properties.weightGsm': '“heavy” is not a number.',
        'properties.shrinkage.warp.after': 'That is more than 30 % change: check the two lengths.',
        'properties.shrinkage.weft': 'Give a percent from -30 to 30.',
      },
    });
  });

  it('whatever the form accepts, geometry\'s fabric schema (the server\'s check) accepts too (property)', () => {
    // Each field mostly in its range (so most drafts are accepted and the property has many
    // cases), sometimes just past either end of it (so the bounds and the refusals are reached too).
    const mostly = <T,>(inRange: fc.Arbitrary<T>, outside: fc.Arbitrary<T>) => fc.oneof({ weight: 9, arbitrary: inRange }, { weight: 1, arbitrary: outside });
    const num = (min: number, max: number) => fc.double({ min, max, noNaN: true }).map((v) => `${Math.round(v * 100) / 100}`);
    const pct = (min: number, max: number) => mostly(num(min, max), fc.oneof(num(min - 0.2 * (max - min), min), num(max, max + 0.2 * (max - min))));
    const mm = fc.double({ min: 1, max: 2000, noNaN: true }).map((v) => Math.round(v));
    const cm = (v: number) => `${v / 10} cm`;
    // a pair of lengths: the second the first times a factor, mostly between lo and hi, else anything
    const pair = (lo: number, hi: number) =>
      fc.tuple(mm, mostly(fc.double({ min: lo, max: hi, noNaN: true }), fc.double({ min: 0, max: 5, noNaN: true }))).map(([a, k]) => [cm(a), cm(Math.max(1, Math.round(a * k)))] as const);
    const stretch = fc.record({ how: fc.constantFrom('test' as const, 'percent' as const), percent: pct(0, 300), lengths: pair(1, 4) }).map(({ how, percent, lengths: [relaxed, stretched] }) => ({ how, percent, relaxed, stretched }));
    const shrink = fc.record({ how: fc.constantFrom('test' as const, 'percent' as const), percent: pct(-30, 30), lengths: pair(0.7, 1.3) }).map(({ how, percent, lengths: [before, after] }) => ({ how, percent, before, after }));
    const draft = fc.record({
      name: mostly(fc.constant('Cloth'), fc.constant('')),
      stretchAcross: stretch,
      stretchAlong: stretch,
      recovery: fc.oneof(fc.constant(''), pct(0, 100)),
      weightUnit: fc.constantFrom('gsm' as const, 'oz' as const),
      weight: fc.oneof(fc.constant(''), pct(0, 60), pct(0, 2000)),
      width: fc.oneof(fc.constant(''), mm.map(cm)),
      warp: shrink,
      weft: shrink,
      prewashed: fc.boolean(),
    });
    let accepted = 0;
    fc.assert(
      fc.property(draft, (d) => {
        const read = readFabricDraft(d, 'cm');
        if ('value' in read) {
          accepted++;
          const r = fabricSchema.safeParse(read.value.properties);
          expect(r.success, JSON.stringify(r.error?.issues)).toBe(true);
        }
      }),
      { numRuns: 2000 },
    );
    // not vacuous: 398–446 of the 2000 drafts were accepted in five runs (the bound is six standard deviations below)
    expect(accepted).toBeGreaterThan(300);
  });

  it('a fabric shown in the form and saved unchanged keeps its properties exactly', () => {
    const properties = {
      stretchAcross: { relaxed: 100, stretched: 133.3 },
      stretchAlong: 4,
      weightGsm: 340,
      width: 1473.2,
      shrinkage: { warp: { before: 500, after: 483.7 }, weft: -0.4 },
      prewashed: true,
    };
    for (const unit of ['in', 'cm'] as const) {
      expect(readFabricDraft(fabricDraft('Kept', properties, unit), unit, properties)).toEqual({ value: { name: 'Kept', properties } });
    }
  });

  it('reads numbers with a decimal comma and a % sign, and refuses words', () => {
    expect(readNumber('12,5 %')).toEqual({ value: 12.5 });
    expect(readNumber('−3')).toEqual({ value: -3 });
    expect(readNumber('')).toEqual({ value: undefined });
    expect(readNumber('12 oz')).toEqual({ error: '“12 oz” is not a number.' });
  });
});

describe('weights and field errors', () => {
  it('either weight gives both', () => {
    expect(weightsOf({ weightOzPerSqYd: 12 })!.gsm.toFixed(1)).toBe('406.9');
    expect(weightsOf({ weightGsm: 300 })!.oz.toFixed(2)).toBe('8.85');
    expect(weightsOf({})).toBeUndefined();
  });

  it('puts the server\'s messages beside the nearest field; both weight keys go to the weight field', () => {
    expect(
      fabricFieldErrors({
        'properties.weightOzPerSqYd': 'does not match',
        'properties.stretchAcross': 'Invalid input',
        'properties.shrinkage.warp.before': 'must be more than 0 mm',
        'properties.shrinkage.weft.something.deep': 'odd',
        'properties.colour': 'unknown key',
        properties: 'must be an object',
        name: 'Enter a name for the fabric.',
      }),
    ).toEqual({
      'properties.weight': 'does not match',
      'properties.stretchAcross': 'Invalid input',
      'properties.shrinkage.warp.before': 'must be more than 0 mm',
      'properties.shrinkage.weft': 'odd',
      _: 'unknown key',
      name: 'Enter a name for the fabric.',
    });
  });
});

describe('shrinkage advice', () => {
  it('follows the plan\'s rules: nothing under 0.5 %, enlarge above, pre-wash over 7 %, none when washed already', () => {
    expect(shrinkageAdvice(undefined, undefined, false).kind).toBe('none');
    expect(shrinkageAdvice(0.4, -0.3, false).kind).toBe('below-threshold');
    expect(shrinkageAdvice(3, 1, false).kind).toBe('compensate');
    expect(shrinkageAdvice(7, 2, false).kind).toBe('compensate');
    expect(shrinkageAdvice(7.5, 2, false).kind).toBe('prewash');
    expect(shrinkageAdvice(7.5, 2, true).kind).toBe('prewashed');
    expect(shrinkageAdvice(3.75, undefined, false).text).toBe('Plans will enlarge the pieces by 1 / (1 − s): 3.8 % along the warp, nothing recorded across.');
    expect(shrinkageAdvice(-1, 8, false).text).toMatch(/−1 % along the warp, 8 % across\. Over 7 %: plans will also advise pre-washing/);
  });

  it('says what geometry\'s planner does with the same cloth on the demo pattern (boundaries, then random cloths)', () => {
    const pattern = parsePattern(demoPattern());
    const body = { waistGirth: 760, hipGirth: 1000, thighGirth: 600, bodyRise: 270, insideLegLength: 780 }; // invented
    const agrees = (warp: number, weft: number, prewashed: boolean) => {
      const advice = shrinkageAdvice(warp, weft, prewashed);
      const plan = planFit({ profile: body, pattern, fabric: { shrinkage: { warp, weft }, prewashed } });
      const compensates = plan.ops.some((op) => op.op === 'shrinkage');
      const advisesPrewash = plan.cautions.some((c) => /pre-wash it/.test(c));
      expect(compensates, `${warp}/${weft}/${prewashed}`).toBe(advice.kind === 'compensate' || advice.kind === 'prewash');
      expect(advisesPrewash, `${warp}/${weft}/${prewashed}`).toBe(advice.kind === 'prewash');
    };
    for (const [warp, weft, prewashed] of [
      [0.49, -0.49, false],
      [0.5, 0, false],
      [0, -0.5, false],
      [7, 7, false],
      [7.01, 0, false],
      [-8, 0, false],
      [12, 3, true],
    ] as const)
      agrees(warp, weft, prewashed);
    fc.assert(
      fc.property(fc.double({ min: -29, max: 29, noNaN: true }), fc.double({ min: -29, max: 29, noNaN: true }), fc.boolean(), agrees),
      { numRuns: 12 },
    );
  });
});
