/**
 * The fit planner: sizes per level, the alteration list, cautions.
 * Bodies and size tables here are invented for the tests (no real person or pattern).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  EASE_DEFAULTS,
  FitInputError,
  MM_PER_INCH,
  applyOps,
  chartFromPattern,
  demoPattern,
  extentAlong,
  parsePattern,
  planFit,
  sizeNumber,
  type SizeChartInput,
} from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';

const IN = MM_PER_INCH;

/** An invented size table: sizes 0–12, linear grade (mm, finished garment). */
function chart(): SizeChartInput {
  return {
    name: 'invented table',
    sizes: [0, 2, 4, 6, 8, 10, 12].map((s) => ({
      size: String(s),
      garment: { waist: 700 + 20 * s, hip: 950 + 20 * s, thigh: 560 + 10 * s, knee: 420 + 6 * s, calf: 360 + 5 * s, crotchDepth: 250 + 2.5 * s, inseam: 790 },
    })),
  };
}
const garmentAt = (level: 'waist' | 'hip' | 'thigh' | 'knee' | 'calf', s: number): number => ({ waist: 700 + 20 * s, hip: 950 + 20 * s, thigh: 560 + 10 * s, knee: 420 + 6 * s, calf: 360 + 5 * s })[level];
const ease = EASE_DEFAULTS.regular;

describe('planFit: the practitioner\'s blend', () => {
  it('a body measured at several levels gives size 0 at the waist, 4 at the hip, 8 at the thigh and 10 at the calf — exactly that blend (issue 6 trade fact; common practice, no source)', () => {
    // Each body girth is the table's finished girth at that size less the regular ease, so the
    // plan must land on exactly those printed sizes.
    const profile = {
      waistGirth: garmentAt('waist', 0) - ease.waist.mm,
      hipGirth: garmentAt('hip', 4) - ease.hip.mm,
      thighGirth: garmentAt('thigh', 8) - ease.thigh.mm,
      calfGirth: garmentAt('calf', 10) - ease.calf.mm,
    };
    const plan = planFit({ profile, chart: chart(), fit: 'regular' });
    const blend = plan.ops.filter((o) => o.op === 'blend');
    expect(blend).toEqual([
      {
        op: 'blend',
        levels: [
          { level: 'waist', size: '0' },
          { level: 'hip', size: '4' },
          { level: 'thigh', size: '8' },
          { level: 'calf', size: '10' },
        ],
      },
    ]);
    expect(plan.ops.filter((o) => o.op === 'girth')).toEqual([]); // every level lands on a size
    expect(plan.levels.every((l) => l.confidence === 'high')).toBe(true);
    expect(plan.cautions.join('\n')).toMatch(/no knee girth/);
    expect(plan.cautions.join('\n')).not.toMatch(/No pattern was given/); // no rise or length change to name
  });
});

describe('planFit: a raised waistband (issue 6 trade fact; common practice, no source)', () => {
  const base = { waistGirth: 740, hipGirth: 990, bodyRise: 262, girthsAtHeights: [{ offset: 2 * IN, girth: 700 }] };

  it('raising the rise 2 in chooses the waist size from the girth 2 in above the natural waist, and the rise grows by 2 in', () => {
    const natural = planFit({ profile: base, chart: chart() });
    const raised = planFit({ profile: base, chart: chart(), waistOffset: 2 * IN });
    const w0 = natural.levels.find((l) => l.level === 'waist')!;
    const w2 = raised.levels.find((l) => l.level === 'waist')!;
    expect(w0.body).toBe(740);
    expect(w2.body).toBe(700); // the girth where the waistband now sits …
    expect(w2.offset).toBe(2 * IN);
    // … so the size: (700 + ease − 700) / 20 per size number
    expect(sizeNumber(w2.size)).toBeCloseTo(Math.round(((700 + ease.waist.mm - 700) / 20) * 10) / 10, 9);
    expect(w2.size).not.toBe(w0.size); // not the size at the natural waist
    expect(sizeNumber(w0.size)).toBeCloseTo(Math.round(((740 + ease.waist.mm - 700) / 20) * 10) / 10, 9);
    const blend = raised.ops.find((o) => o.op === 'blend') as { levels: { level: string; size: string }[] };
    expect(blend.levels[0]).toEqual({ level: 'waist', size: w2.size });
    // rise: body rise + ease + 2 in − crotch depth at the hip size (§3.9: crotch from the hip size)
    const rise0 = natural.ops.find((o) => o.op === 'rise') as { amount: number };
    const rise2 = raised.ops.find((o) => o.op === 'rise') as { amount: number };
    expectNear(rise2.amount - rise0.amount, 2 * IN, 0.1, 'rise raised by 2 in');
    const hipSize = sizeNumber(raised.levels.find((l) => l.level === 'hip')!.size)!;
    expectNear(rise2.amount, 262 + ease.rise.mm + 2 * IN - (250 + 2.5 * hipSize), 0.06, 'rise amount');
    expect(raised.cautions.join('\n')).toMatch(/No pattern was given: the rise and leg length changes name the lines "rise"/);
  });

  it('between measured heights the girth is interpolated (lower confidence); with none there the waist is left unplanned, never taken at the natural waist', () => {
    const between = planFit({ profile: { ...base, girthsAtHeights: [{ offset: 4 * IN, girth: 680 }] }, chart: chart(), waistOffset: 2 * IN });
    const w = between.levels.find((l) => l.level === 'waist')!;
    expectNear(w.body, 710, 1e-9, 'halfway between 740 at the waist and 680 4 in above');
    expect(w.bodyFrom).toBe('interpolated');
    expect(w.confidence).toBe('medium');

    const none = planFit({ profile: { waistGirth: 740, hipGirth: 990 }, chart: chart(), waistOffset: 2 * IN });
    expect(none.levels.map((l) => l.level)).toEqual(['hip']);
    expect(none.cautions.join('\n')).toMatch(/waist size was not planned \(it must not be taken at the natural waist\)/);
    const blend = none.ops.find((o) => o.op === 'blend') as { levels: { level: string }[] };
    expect(blend.levels.map((l) => l.level)).toEqual(['hip']);
  });
});

describe('planFit: a waist about 1 in too small (issue 6 trade fact; common practice, no source)', () => {
  // The sewist has chosen size 0 at the waist; its finished waist (700 mm) is 1 in less than
  // body + regular ease.
  const profile = { waistGirth: 700 + IN - ease.waist.mm, hipGirth: 990 };
  const denim = (stretchAcross: number) => ({ name: 'invented 12 oz denim', weightOzPerSqYd: 12, stretchAcross });

  it('in rigid denim it is 1 in too small: a caution and a girth change of 1 in, ¼ in on each of the 4 side-seam edges', () => {
    const plan = planFit({ profile, chart: chart(), fabric: denim(0), sizes: { waist: '0' } });
    const w = plan.levels.find((l) => l.level === 'waist')!;
    expect(w.size).toBe('0');
    expect(w.sizeFrom).toBe('chosen');
    expectNear(w.change, IN, 0.05, 'change round the garment');
    expect(plan.ops.filter((o) => o.op === 'girth')).toEqual([{ op: 'girth', edge: 'side-seam', level: 'waist', amount: 6.4 }]);
    expect(plan.cautions.join('\n')).toMatch(/too small at the waist in a cloth without stretch: that is uncomfortable/);
  });

  it.each([15, 20])('in stretch denim with %s percent stretch across the stretch absorbs it: no change needed', (stretch) => {
    const plan = planFit({ profile, chart: chart(), fabric: denim(stretch), sizes: { waist: '0' } });
    const w = plan.levels.find((l) => l.level === 'waist')!;
    expect(w.change).toBe(0);
    expect(w.target).toBeLessThan(700);
    expect(w.comfort).toBeGreaterThan(700);
    expect(w.reason).toMatch(/within what the stretch absorbs/);
    expect(plan.ops.filter((o) => o.op === 'girth')).toEqual([]);
    expect(plan.cautions.join('\n')).not.toMatch(/uncomfortable/);
  });

  it('the stretch stands in for ease as §4.3 says: target = (body + ease) / (1 + k·s) (common practice, no source)', () => {
    const plan = planFit({ profile: { hipGirth: 1000 }, chart: chart(), fabric: { stretchAcross: 20 }, stretchShare: 0.5 });
    const hip = plan.levels[0]!;
    expectNear(hip.target, (1000 + ease.hip.mm) / 1.1, 1e-9, 'target');
    // §4.3: typical 0–5 % below the body at the hip for 10–25 % stretch denim
    expect(1 - hip.target / 1000).toBeGreaterThan(0);
    expect(1 - hip.target / 1000).toBeLessThan(0.05);
  });
});

describe('planFit: properties', () => {
  const levels = ['waist', 'hip', 'thigh', 'knee', 'calf'] as const;
  /** A random table with strictly growing girths at every level, numeric sizes 0, 2, 4, … */
  const arbChart = fc
    .record({
      n: fc.integer({ min: 2, max: 8 }),
      starts: fc.tuple(...levels.map(() => fc.integer({ min: 300, max: 1100 }))),
      steps: fc.array(fc.tuple(...levels.map(() => fc.integer({ min: 2, max: 60 }))), { minLength: 8, maxLength: 8 }),
    })
    .map(({ n, starts, steps }) => ({
      sizes: Array.from({ length: n }, (_, i) => ({
        size: String(2 * i),
        garment: Object.fromEntries(levels.map((l, li) => [l, starts[li]! + steps.slice(0, i).reduce((s, st) => s + st[li]!, 0)])),
      })),
    }));
  const arbBody = fc.tuple(...levels.map(() => fc.double({ min: 250, max: 1300, noNaN: true })));
  const profileOf = (b: number[]) => ({ waistGirth: b[0]!, hipGirth: b[1]!, thighGirth: b[2]!, kneeGirth: b[3]!, calfGirth: b[4]! });

  it('a larger body never gets a smaller size, at any level, rigid or stretch', () => {
    fc.assert(
      fc.property(arbChart, arbBody, arbBody, fc.constantFrom(0, 18), fc.constantFrom('close', 'regular', 'relaxed'), (c, b1, b2, stretch, fit) => {
        const lo = b1.map((v, i) => Math.min(v, b2[i]!));
        const hi = b1.map((v, i) => Math.max(v, b2[i]!));
        const p1 = planFit({ profile: profileOf(lo), chart: c, fabric: { stretchAcross: stretch }, fit: fit as 'regular' });
        const p2 = planFit({ profile: profileOf(hi), chart: c, fabric: { stretchAcross: stretch }, fit: fit as 'regular' });
        return p1.levels.every((l, i) => sizeNumber(l.size)! <= sizeNumber(p2.levels[i]!.size)!);
      }),
      { numRuns: 80 },
    );
  });

  it('the same input gives the same plan', () => {
    fc.assert(
      fc.property(arbChart, arbBody, (c, b) => {
        const input = { profile: { ...profileOf(b), bodyRise: 260 }, chart: c, fabric: { stretchAcross: 12, shrinkage: { warp: 3 } } };
        expect(planFit(input)).toEqual(planFit(input));
      }),
      { numRuns: 30 },
    );
  });

  it('a body exactly at a size\'s target gets that size', () => {
    fc.assert(
      fc.property(arbChart, fc.nat(), fc.constantFrom('close', 'regular', 'relaxed'), (c, k, fit) => {
        const i = k % c.sizes.length;
        const g = c.sizes[i]!.garment as Record<string, number>;
        const e = EASE_DEFAULTS[fit as 'regular'];
        const profile = profileOf(levels.map((l) => g[l]! - e[l].mm));
        const plan = planFit({ profile, chart: c, fit: fit as 'regular' });
        return plan.levels.length === 5 && plan.levels.every((l) => l.size === c.sizes[i]!.size && l.change === 0);
      }),
      { numRuns: 60 },
    );
  });
});

describe('planFit: beyond the table, lengths, fabric, bad input', () => {
  it('a size beyond the printed range is extrapolated with a caution; far beyond it stops one step out and a girth change takes the rest', () => {
    const near = planFit({ profile: { hipGirth: 950 + 20 * 13 - ease.hip.mm }, chart: chart() });
    expect(near.levels[0]!.size).toBe('13');
    expect(near.levels[0]!.confidence).toBe('medium');
    expect(near.cautions.join('\n')).toMatch(/Size 13 at the hip is beyond the printed sizes \(0–12\): it is extrapolated, an estimate/);
    const far = planFit({ profile: { hipGirth: 950 + 20 * 20 - ease.hip.mm }, chart: chart() });
    expect(far.levels[0]!.size).toBe('14');
    expect(far.levels[0]!.confidence).toBe('low');
    expectNear(far.levels[0]!.change, 20 * 6, 0.05, 'the rest: 6 size numbers × 20 mm');
    expect(far.ops.find((o) => o.op === 'girth')).toEqual({ op: 'girth', edge: 'side-seam', level: 'hip', amount: 30 });
  });

  it('leg length from the inside leg against the inseam, split between two lines on the demo pattern (trade reference §3.2)', () => {
    const plan = planFit({ profile: { hipGirth: 1000, thighGirth: 600, insideLegLength: 760 }, pattern: demoPattern() });
    const lengthen = plan.ops.filter((o) => o.op === 'lengthen') as { line: string; amount: number }[];
    expect(lengthen.map((o) => o.line)).toEqual(['upper leg', 'lower leg']);
    const chartInseam = plan.chart.sizes.map((s) => s.garment.inseam!);
    const total = lengthen.reduce((s, o) => s + o.amount, 0);
    // the demo's inseam is 802.6–818 mm over its sizes, so a 760 mm inside leg shortens by 42–58 mm
    expect(total).toBeLessThan(760 - Math.min(...chartInseam) + 0.1);
    expect(total).toBeGreaterThan(760 - Math.max(...chartInseam) - 0.1);
    expect(plan.cautions.join('\n')).not.toMatch(/could not all be made/);
  });

  it('on the demo pattern the planned ops apply, and the altered crotch depth is body rise + ease (within 1 mm)', () => {
    const pattern = parsePattern(demoPattern());
    const plan = planFit({ profile: { waistGirth: 760, hipGirth: 1010, thighGirth: 610, bodyRise: 272 }, pattern });
    expect(plan.ops.map((o) => o.op)).toEqual(['blend', 'rise']);
    const altered = applyOps(pattern, plan.ops).pattern;
    const front = altered.pieces.find((p) => p.name === 'front')!;
    expect(front.outlines).toHaveLength(1);
    // The altered front's crotch depth: waist-side corner to crotch point along the grain (+y).
    const measured = chartFromPattern(altered).sizes[0]!.garment.crotchDepth!;
    expectNear(measured, 272 + ease.rise.mm, 1, 'crotch depth after the plan');
    expect(extentAlong(front.outlines[0]!, { x: 0, y: 1 })).toBeGreaterThan(1000);
  });

  it('shrinkage from the wash test becomes the last op; a pre-washed cloth gets none; a large one advises pre-washing', () => {
    const fabric = { shrinkage: { warp: { before: 500, after: 485 }, weft: { before: 500, after: 490 } } };
    const plan = planFit({ profile: { hipGirth: 1000, bodyRise: 270 }, chart: chart(), fabric });
    expect(plan.ops[plan.ops.length - 1]).toEqual({ op: 'shrinkage', lengthwise: 3, crosswise: 2 });
    expect(planFit({ profile: { hipGirth: 1000 }, chart: chart(), fabric: { ...fabric, prewashed: true } }).ops.some((o) => o.op === 'shrinkage')).toBe(false);
    const big = planFit({ profile: { hipGirth: 1000 }, chart: chart(), fabric: { shrinkage: { warp: 9 } } });
    expect(big.cautions.join('\n')).toMatch(/pre-wash it/);
  });

  it('bad input is refused with one line naming it', () => {
    expect(() => planFit({ profile: { hipGirth: 1000 } })).toThrow(/give a size table or a pattern/);
    expect(() => planFit({ profile: { hipGirth: 1000 }, chart: chart(), fit: 'snug' as 'close' })).toThrow(FitInputError);
    expect(() => planFit({ profile: { hipGirth: 1000 }, chart: chart(), stretchShare: 2 })).toThrow(/stretchShare/);
    expect(() => planFit({ profile: { hipGirth: 1000 }, chart: chart(), sizes: { hip: 'XL' } })).toThrow(/size "XL" chosen at the hip is not in the size table/);
    expect(() => planFit({ profile: { hipGirth: 1000 }, chart: { sizes: [] } })).toThrow(/invalid size table: sizes/);
  });

  it('a table of printed labels only takes printed sizes, and the rest becomes a girth change', () => {
    const labels = { sizes: ['S', 'M', 'L'].map((size, i) => ({ size, garment: { hip: 960 + 60 * i } })) };
    const plan = planFit({ profile: { hipGirth: 1030 - ease.hip.mm }, chart: labels });
    expect(plan.levels[0]!.size).toBe('L');
    expectNear(plan.levels[0]!.change, -50, 0.05, 'M (1020) misses 1030 by more than the tolerance, L (1080) is 50 mm bigger: take in');
    expect(plan.ops).toContainEqual({ op: 'blend', levels: [{ level: 'hip', size: 'L' }] });
  });
});

describe('ease defaults', () => {
  it('match the inch values of EIC "Ease in Clothing" (trade reference §4.1 [C]) and AASD §9.4.3 seated-rise ease (§4.1 [C]); the rest are marked common practice or from memory', () => {
    // EIC: skirts and pants ½–¾ in at the waist, waist ¾–1 in; seat 1½–2 in; hips 2–2¾ in for all garments; thigh at least 1 in.
    expectNear(EASE_DEFAULTS.close.waist.mm, 0.5 * IN, 1e-9, 'EASE_DEFAULTS.close.waist.mm');
    expectNear(EASE_DEFAULTS.regular.waist.mm, 0.75 * IN, 1e-9, 'EASE_DEFAULTS.regular.waist.mm');
    expectNear(EASE_DEFAULTS.relaxed.waist.mm, 1 * IN, 1e-9, 'EASE_DEFAULTS.relaxed.waist.mm');
    expectNear(EASE_DEFAULTS.close.hip.mm, 1.5 * IN, 1e-9, 'EASE_DEFAULTS.close.hip.mm');
    expectNear(EASE_DEFAULTS.regular.hip.mm, 2 * IN, 1e-9, 'EASE_DEFAULTS.regular.hip.mm');
    expectNear(EASE_DEFAULTS.relaxed.hip.mm, 2.75 * IN, 1e-9, 'EASE_DEFAULTS.relaxed.hip.mm');
    expectNear(EASE_DEFAULTS.close.thigh.mm, 1 * IN, 1e-9, 'EASE_DEFAULTS.close.thigh.mm');
    // AASD: 0–0.5 cm for women, 1–1.5 cm for men
    expect([EASE_DEFAULTS.close.rise.mm, EASE_DEFAULTS.regular.rise.mm, EASE_DEFAULTS.relaxed.rise.mm]).toEqual([0, 5, 15]);
    for (const fit of ['close', 'regular', 'relaxed'] as const)
      for (const [level, e] of Object.entries(EASE_DEFAULTS[fit])) {
        expect(e.source, `${fit} ${level}`).toMatch(/EIC|AASD|common practice, no source|from memory/);
        // every fit is at least as loose as the one before it
        if (fit !== 'close') expect(e.mm, `${fit} ${level}`).toBeGreaterThanOrEqual(EASE_DEFAULTS[fit === 'regular' ? 'close' : 'regular'][level as 'hip'].mm);
      }
  });
});
