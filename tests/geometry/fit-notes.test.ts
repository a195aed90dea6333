/**
 * Notes between makes, and the garment measured before and after a plan.
 * Bodies and tables are invented for the tests (no real person or pattern).
 */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { FitInputError, MM_PER_INCH, chartFromPattern, demoPattern, noteCorrections, parseFitNote, parsePattern, planFit, sizeNumber, type SizeChartInput } from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';

const IN = MM_PER_INCH;

/** An invented size table: sizes 0–12, linear grade (mm, finished garment). */
const chart = (): SizeChartInput => ({
  sizes: [0, 2, 4, 6, 8, 10, 12].map((s) => ({
    size: String(s),
    garment: { waist: 700 + 20 * s, hip: 950 + 20 * s, thigh: 560 + 10 * s, knee: 420 + 6 * s, calf: 360 + 5 * s, crotchDepth: 250 + 2.5 * s, inseam: 790 },
  })),
});
const body = { waistGirth: 720, hipGirth: 960, thighGirth: 560, calfGirth: 350, bodyRise: 255, insideLegLength: 760 };

describe('fit notes', () => {
  it('read the verdicts as signed corrections; "right" and verdicts without an amount change nothing', () => {
    const note = parseFitNote({ levels: { hip: { verdict: 'tight', amount: 12.7 }, calf: { verdict: 'loose', amount: 20 }, waist: { verdict: 'right' }, thigh: { verdict: 'tight' }, rise: { verdict: 'short', amount: 10 }, length: { verdict: 'long', amount: 25.4 } }, nextTime: 'more room in the seat' });
    expect(noteCorrections(note)).toEqual({ girth: { hip: 12.7, calf: -20 }, rise: 10, length: -25.4, unsized: ['thigh too tight'] });
  });

  it('refuse what a note cannot mean, naming the field', () => {
    expect(() => parseFitNote({ levels: { hip: { verdict: 'snug' } } })).toThrow(/levels\.hip\.verdict/);
    expect(() => parseFitNote({ levels: { hip: { verdict: 'tight', amount: -5 } } })).toThrow(FitInputError);
    expect(() => parseFitNote({ levels: { rise: { verdict: 'tight', amount: 5 } } })).toThrow(/levels\.rise\.verdict/);
    expect(() => parseFitNote({ levels: { elbow: { verdict: 'right' } } })).toThrow(FitInputError);
  });

  it('a make that was ½ in too tight at the hip gets ½ in more ease there next time, and the reason says so', () => {
    const plain = planFit({ profile: body, chart: chart() });
    const again = planFit({ profile: body, chart: chart(), previous: { makeName: 'First jeans', note: { levels: { hip: { verdict: 'tight', amount: IN / 2 } }, nextTime: '' } } });
    const h0 = plain.levels.find((l) => l.level === 'hip')!;
    const h1 = again.levels.find((l) => l.level === 'hip')!;
    expectNear(h1.ease - h0.ease, IN / 2, 1e-9, 'ease added at the hip');
    expectNear(h1.target - h0.target, IN / 2, 1e-9, 'target girth at the hip');
    // the size grows by the extra girth over the grade (20 mm per size number), to 0.1 of a size
    expectNear(sizeNumber(h1.size)! - sizeNumber(h0.size)!, IN / 2 / 20, 0.1, 'size change at the hip');
    expect(h1.reason).toMatch(/First jeans/);
    expect(h1.fromNote).toBeCloseTo(IN / 2, 9);
    expect(h0.fromNote).toBeUndefined();
    expect(again.steps.find((st) => st.op.op === 'blend')?.fromNote).toBe(true);
    expect(again.fromPrevious.join('\n')).toMatch(/Hip: “First jeans” was 1.3 cm too tight/);
    // the other levels are untouched
    for (const l of ['waist', 'thigh', 'calf'] as const) expect(again.levels.find((x) => x.level === l)!.ease).toBe(plain.levels.find((x) => x.level === l)!.ease);
  });

  it('a rise too short and legs too long move the rise and length changes by those amounts', () => {
    const pattern = parsePattern(demoPattern());
    // a body whose rise and legs both need changing on the demo pattern (well over ⅛ in), so
    // the note's amounts add to changes that are planned either way
    const long = { ...body, bodyRise: 300, insideLegLength: 700 };
    const plain = planFit({ profile: long, pattern });
    expect(plain.ops.map((o) => o.op)).toEqual(expect.arrayContaining(['rise', 'lengthen']));
    const again = planFit({ profile: long, pattern, previous: { note: { levels: { rise: { verdict: 'short', amount: 15 }, length: { verdict: 'long', amount: 20 } } } } });
    const sum = (p: typeof plain, op: 'rise' | 'lengthen') => p.ops.filter((o) => o.op === op).reduce((s, o) => s + (o as { amount: number }).amount, 0);
    expectNear(sum(again, 'rise') - sum(plain, 'rise'), 15, 0.11, 'rise change'); // amounts are rounded to 0.1 mm
    expectNear(sum(again, 'lengthen') - sum(plain, 'lengthen'), -20, 0.21, 'length change');
    expect(again.fromPrevious).toHaveLength(2);
    // the steps the note changed say so; the blend (no girth note) does not
    expect(again.steps.filter((st) => st.fromNote).map((st) => st.op.op)).toEqual(['rise', 'lengthen', 'lengthen']);
    expect(plain.steps.some((st) => st.fromNote)).toBe(false);
  });

  it('an unsized verdict and the "next time" words reach the cautions', () => {
    const plan = planFit({ profile: body, chart: chart(), previous: { makeName: 'Linen pair', note: { levels: { knee: { verdict: 'loose' } }, nextTime: 'Use a firmer linen.' } } });
    const all = plan.cautions.join('\n');
    expect(all).toMatch(/knee too loose but not by how much/);
    expect(all).toMatch(/Use a firmer linen\./);
    expect(plan.fromPrevious).toEqual([]);
  });

  it('property: more tightness noted never gives a smaller size at that level', () => {
    fc.assert(
      fc.property(fc.constantFrom('waist', 'hip', 'thigh', 'calf'), fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), (level, a, b) => {
        const [lo, hi] = a <= b ? [a, b] : [b, a];
        const size = (amount: number) => sizeNumber(planFit({ profile: body, chart: chart(), previous: { note: { levels: { [level]: { verdict: 'tight', amount } } } } }).levels.find((l) => l.level === level)!.size)!;
        expect(size(hi)).toBeGreaterThanOrEqual(size(lo));
      }),
      { numRuns: 60 },
    );
  });
});

describe('the garment before and after a plan, measured on the pieces', () => {
  const pattern = parsePattern(demoPattern());
  const profile = { waistGirth: 700, hipGirth: 980, thighGirth: 600, kneeGirth: 400, calfGirth: 360, bodyRise: 262 };

  it('after = the plan made on the pattern and measured again; each planned level lands within the band [target, comfort] or a girth tolerance of it', () => {
    const plan = planFit({ profile, pattern });
    // a five-level blend's label is long ("waist 2.5 · hip 7.7 · …"): it is still measured
    expect(plan.levels).toHaveLength(5);
    expect(plan.cautions.join('\n')).not.toMatch(/could not be measured/);
    expect(plan.garment.after).not.toBeNull();
    for (const l of plan.levels) {
      const got = plan.garment.after!.measures[l.level]!;
      // the blend follows each chosen size exactly at its level (issue 3), so the measured girth
      // is the table's girth at that (possibly fractional) size: within 1 mm of garmentAtSize
      expectNear(got, l.garmentAtSize + l.change, 1, `${l.level} after the plan`);
    }
  });

  it('before = the printed size nearest the hip size when the make has no blend, or the make\'s own blend', () => {
    const plan = planFit({ profile, pattern });
    const hip = plan.levels.find((l) => l.level === 'hip')!;
    const sizes = chartFromPattern(pattern).sizes;
    const nearest = sizes.reduce((a, b) => (Math.abs(sizeNumber(b.size)! - sizeNumber(hip.size)!) < Math.abs(sizeNumber(a.size)! - sizeNumber(hip.size)!) ? b : a));
    expect(plan.garment.before!.label).toBe(`size ${nearest.size}`);
    expectNear(plan.garment.before!.measures.hip!, nearest.garment.hip!, 1e-6, 'hip of the straight size');

    const current = [{ op: 'blend' as const, levels: [{ level: 'waist', size: '2' }, { level: 'hip', size: '6' }] }];
    const withList = planFit({ profile, pattern, current });
    expect(withList.garment.before!.label).toBe('your alterations now');
    expectNear(withList.garment.before!.measures.hip!, sizes.find((s) => s.size === '6')!.garment.hip!, 1, 'hip of the make\'s own blend (size 6 there)');
  });

  it('without a pattern there is nothing to measure', () => {
    const plan = planFit({ profile, chart: chart() });
    expect(plan.garment).toEqual({ before: null, after: null });
  });
});

describe('the printed body chart beside the plan', () => {
  it('gives the size the body chart names for this body, to compare with the planned size (and the reason says so when they differ)', () => {
    // an invented table whose body chart assumes 60 mm of ease at the hip (more than regular ease)
    const table = {
      sizes: [0, 2, 4, 6, 8].map((s) => ({ size: String(s), garment: { hip: 950 + 20 * s }, body: { hipGirth: 890 + 20 * s } })),
    };
    const plan = planFit({ profile: { hipGirth: 930 }, chart: table });
    const hip = plan.levels.find((l) => l.level === 'hip')!;
    // body chart: 930 = 890 + 20 × 2 → size 2
    expect(hip.bodyChartSize).toBe('2');
    // finished measurements: 930 + 50.8 regular ease = 980.8 = 950 + 20 × 1.54 → size 1.5
    expect(hip.size).toBe('1.5');
    expect(hip.reason).toMatch(/printed body chart says size 2/);
    // between printed sizes it interpolates like the finished measurements; no body chart, no field
    expect(planFit({ profile: { hipGirth: 940 }, chart: table }).levels[0]!.bodyChartSize).toBe('2.5');
    expect(planFit({ profile: { hipGirth: 940 }, chart: { sizes: table.sizes.map(({ size, garment }) => ({ size, garment })) } }).levels[0]!.bodyChartSize).toBeUndefined();
  });
});
