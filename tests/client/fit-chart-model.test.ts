/**
 * The fit chart's data shaping (src/features/workspace/model/fit-chart.ts) and the fit note's
 * form ↔ note (src/features/workspace/model/fit-note.ts).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FIT_GIRTH_TOLERANCE, FIT_LEVELS, NOTE_GIRTH_LEVELS, NOTE_LENGTHS, fitNoteSchema, planFit } from '../../geometry/index.ts';
import { demoPattern } from '../../geometry/index.ts';
import { fitChartData, girthVerdict, niceAxis } from '../../src/features/workspace/model/fit-chart.ts';
import { GIRTH_NOTE_LEVELS, LENGTH_NOTE_LEVELS, describeFitNote, draftFromNote, fromPreviousNote, noteFromDraft, type FitNoteDraft } from '../../src/features/workspace/model/fit-note.ts';

// 1 in = 25.4 mm exactly (international yard and pound agreement, 1959).
const IN = 25.4;

const level = (name: string, body: number, comfort: number, target: number, size = '8') => ({ level: name, body, comfort, target, size });

describe('the fit chart data', () => {
  it('when the plan has levels in any order, then the rows run waist, hip, thigh, knee, calf (top to bottom, like the body), skipping missing ones', () => {
    const data = fitChartData([level('calf', 370, 410, 410), level('waist', 660, 679, 679), level('hip', 1000, 1051, 1051), level('hem', 400, 400, 400)], null, 'cm');
    expect(data.rows.map((r) => r.level)).toEqual(['waist', 'hip', 'calf']);
    expect(data.rows.map((r) => r.round)).toEqual(['body', 'body', 'leg']);
    expect(data.rows[0]!.band).toEqual([660, 679]);
    expect(data.rows[0]!.targetBelowComfort).toBe(false);
  });

  it('when the cloth stretches, then the aim sits below the band and the summary says so', () => {
    const data = fitChartData([level('hip', 1000, 1050.8, 980)], null, 'in');
    expect(data.rows[0]!.targetBelowComfort).toBe(true);
    // 1000 mm = 39.37 in → 39 3/8 in; 1050.8 mm = 41.37 in → 41 3/8 in; 980 mm = 38.58 in → 38 9/16 in (nearest 1/16).
    expect(data.summary[0]).toBe('Hip (size 8): body 39 3/8 in, ease band to 41 3/8 in; aim 38 9/16 in (stretch).');
  });

  it('when the garment before and after is given, then each girth gets its verdict against [aim, comfort] ± ¼ in', () => {
    const garment = { before: { label: 'size 10', measures: { waist: 720, hip: 1040 } }, after: { label: 'the plan', measures: { waist: 680, hip: 1050, thigh: 600 } } };
    const data = fitChartData([level('waist', 660, 679, 679), level('hip', 1000, 1051, 1051), level('thigh', 620, 670, 670)], garment, 'cm');
    const [waist, hip, thigh] = data.rows;
    expect(waist).toMatchObject({ before: 720, beforeVerdict: 'loose', after: 680, afterVerdict: 'fits' });
    expect(hip).toMatchObject({ before: 1040, beforeVerdict: 'tight', after: 1050, afterVerdict: 'fits' });
    expect(thigh).toMatchObject({ after: 600, afterVerdict: 'tight' });
    expect(thigh!.before).toBeUndefined();
    expect(data.beforeLabel).toBe('size 10');
    expect(data.summary[0]).toBe('Waist (size 8): body 66 cm, ease band to 67.9 cm; pattern before 72 cm, looser than the band; after the plan 68 cm, within the band.');
  });

  it('the verdict uses FIT_GIRTH_TOLERANCE (¼ in; common practice, no source) at both ends of the band', () => {
    expect(FIT_GIRTH_TOLERANCE).toBeCloseTo(IN / 4, 12);
    expect(girthVerdict(1000 - 6, 1000, 1050)).toBe('fits');
    expect(girthVerdict(1000 - 6.4, 1000, 1050)).toBe('tight');
    expect(girthVerdict(1050 + 6.3, 1000, 1050)).toBe('fits');
    expect(girthVerdict(1050 + 6.4, 1000, 1050)).toBe('loose');
  });

  it('the axis covers every value on round numbers of the person\'s unit, with at most 9 ticks (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 100, max: 2000, noNaN: true }), { minLength: 1, maxLength: 20 }), fc.constantFrom('in' as const, 'cm' as const), (values, unit) => {
        const { domain, ticks } = niceAxis(values, unit);
        const per = unit === 'in' ? IN : 10;
        expect(domain[0]).toBeLessThanOrEqual(Math.min(...values) + 1e-9);
        expect(domain[1]).toBeGreaterThanOrEqual(Math.max(...values) - 1e-9);
        expect(ticks.length).toBeLessThanOrEqual(9);
        expect(ticks[0]).toBeCloseTo(domain[0], 9);
        expect(ticks.at(-1)).toBeCloseTo(domain[1], 9);
        for (const t of ticks) expect(Math.abs(t / per - Math.round(t / per))).toBeLessThan(1e-9);
      }),
    );
  });

  it('when shaped from a real plan of the demo pattern, then every planned level has a row with the plan\'s numbers', () => {
    const plan = planFit({ profile: { waistGirth: 660, hipGirth: 1000, thighGirth: 620, kneeGirth: 390, calfGirth: 370, bodyRise: 255, insideLegLength: 700 }, pattern: demoPattern() });
    const data = fitChartData(plan.levels, null, 'in');
    expect(data.rows.map((r) => r.level)).toEqual(FIT_LEVELS.filter((l) => plan.levels.some((p) => p.level === l)));
    for (const r of data.rows) {
      const p = plan.levels.find((l) => l.level === r.level)!;
      expect(r.body).toBe(p.body);
      expect(r.comfort).toBe(p.comfort);
      expect(r.size).toBe(p.size);
      expect(r.band[1] - r.band[0]).toBeCloseTo(Math.abs(p.ease), 6);
    }
  });
});

describe('the fit note form', () => {
  const empty = draftFromNote(null, 'in');
  const withLevel = (d: FitNoteDraft, level: keyof FitNoteDraft['levels'], verdict: FitNoteDraft['levels']['waist']['verdict'], amount = ''): FitNoteDraft => ({ ...d, levels: { ...d.levels, [level]: { verdict, amount } } });

  it('when levels are marked with amounts in the person\'s unit, then the note holds millimetres', () => {
    let d = withLevel(empty, 'waist', 'tight', '1/2');
    d = withLevel(d, 'hip', 'right', '3');
    d = withLevel(d, 'length', 'long', '2 cm');
    d = { ...d, nextTime: '  Take ½ in off the back rise. ' };
    const read = noteFromDraft(d, 'in');
    expect(read).toEqual({ note: { levels: { waist: { verdict: 'tight', amount: 12.7 }, hip: { verdict: 'right' }, length: { verdict: 'long', amount: 20 } }, nextTime: 'Take ½ in off the back rise.' } });
    // What the form sends is a note geometry's planner accepts as it is.
    if ('note' in read) expect(fitNoteSchema.safeParse(read.note).success).toBe(true);
  });

  it('the levels are geometry/fit/notes.ts NOTE_GIRTH_LEVELS and NOTE_LENGTHS, and more than its MAX_NOTE_AMOUNT is refused', () => {
    expect([...GIRTH_NOTE_LEVELS]).toEqual([...NOTE_GIRTH_LEVELS]);
    expect([...LENGTH_NOTE_LEVELS]).toEqual([...NOTE_LENGTHS]);
    const read = noteFromDraft(withLevel(empty, 'hip', 'loose', '21 cm'), 'cm');
    expect(read).toEqual({ errors: { hip: 'At most 20 cm: more than that is a different garment, not a fit note.' } });
  });

  it('when an amount is not a length, negative, or given without a verdict, or the text is too long, then nothing is sent and each field says why', () => {
    let d = withLevel(empty, 'waist', 'tight', 'lots');
    d = withLevel(d, 'calf', 'loose', '-1');
    d = withLevel(d, 'rise', '', '1');
    d = { ...d, nextTime: 'x'.repeat(2001) };
    const read = noteFromDraft(d, 'cm');
    expect('errors' in read).toBe(true);
    if (!('errors' in read)) return;
    expect(Object.keys(read.errors).sort()).toEqual(['calf', 'nextTime', 'rise', 'waist']);
    expect(read.errors.calf).toMatch(/without a sign/);
    expect(read.errors.rise).toMatch(/too short or too long/);
  });

  it('a note read back into the form and sent again is the same note (property)', () => {
    // Amounts up to 7 in: inside geometry/fit/notes.ts MAX_NOTE_AMOUNT (200 mm).
    const girth = fc.record({ verdict: fc.constantFrom('tight' as const, 'loose' as const), amount: fc.integer({ min: 1, max: 7 * 16 }).map((s) => (s / 16) * IN) });
    const length = fc.record({ verdict: fc.constantFrom('short' as const, 'long' as const), amount: fc.integer({ min: 1, max: 7 * 16 }).map((s) => (s / 16) * IN) });
    fc.assert(
      fc.property(fc.record({ waist: girth, knee: girth, rise: length }, { requiredKeys: [] }), fc.string({ maxLength: 50 }), (levels, nextTime) => {
        const note = { levels, nextTime: nextTime.trim() };
        const back = noteFromDraft(draftFromNote(note, 'in'), 'in');
        expect('note' in back).toBe(true);
        if (!('note' in back)) return;
        expect(Object.keys(back.note.levels).sort()).toEqual(Object.keys(levels).sort());
        for (const [k, v] of Object.entries(levels)) {
          const got = back.note.levels[k as keyof typeof back.note.levels]!;
          expect(got.verdict).toBe(v.verdict);
          expect(got.amount).toBeCloseTo(v.amount, 9);
        }
        expect(back.note.nextTime).toBe(note.nextTime);
      }),
    );
  });

  it('a note reads as one line per level in the person\'s unit', () => {
    expect(describeFitNote({ levels: { hip: { verdict: 'loose', amount: 25.4 }, waist: { verdict: 'right' }, rise: { verdict: 'short', amount: 10 } }, nextTime: '' }, 'in')).toEqual(['Waist: right', 'Hip: too loose by 1 in', 'Rise: too short by 3/8 in']);
    expect(describeFitNote({ levels: { rise: { verdict: 'short', amount: 10 } }, nextTime: '' }, 'cm')).toEqual(['Rise: too short by 1 cm']);
  });

  it('a plan step or level counts as coming from the last note when the planner flags it', () => {
    // the planner flags what the note changed (geometry/fit/plan.ts PlanStep.fromNote, PlannedLevel.fromNote)
    expect(fromPreviousNote({ fromNote: true })).toBe(true);
    expect(fromPreviousNote({ fromNote: 12.7 })).toBe(true);
    expect(fromPreviousNote({})).toBe(false);
  });
});
