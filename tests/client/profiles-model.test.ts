/**
 * The profiles screen's pure parts (src/features/profiles): typed lengths, the measurement form
 * read into the API's dated set, and the history table with the change between sets.
 *
 * Outside references: 1 in = 25.4 mm exactly (international yard and pound agreement, 1959);
 * measurement names are ISO 8559-1's (trade reference §2.2), checked against geometry's list
 * and the server's profile schema. Body numbers here are invented for the tests.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BODY_MEASUREMENT_NAMES, bodyProfileSchema } from '../../geometry/fit/body.ts';
import { measurementHelp } from '../../src/features/profiles/measurement-help.ts';
import { MEASUREMENT_NAMES } from '../../src/types/measurement-names.ts';
import {
  changeText,
  draftFrom,
  fieldsForRows,
  formatTakenOn,
  heightLabel,
  historyTable,
  isIsoDate,
  readDraft,
  readLength,
  todayIso,
  type DatedSet,
  type MeasurementsDraft,
} from '../../src/features/profiles/model.ts';

const MM_PER_INCH = 25.4; // exact, 1959 international yard and pound agreement
const TODAY = '2026-03-10';

const draft = (over: Partial<MeasurementsDraft> = {}): MeasurementsDraft => ({ measurements: {}, girthRows: [], takenOn: TODAY, note: '', ...over });

describe('measurement names', () => {
  it('are geometry\'s ISO 8559-1 keys, each with a label and how-to-measure help', () => {
    expect([...MEASUREMENT_NAMES]).toEqual([...BODY_MEASUREMENT_NAMES]);
    for (const name of MEASUREMENT_NAMES) {
      expect(measurementHelp[name].label.length).toBeGreaterThan(0);
      expect(measurementHelp[name].howTo.length).toBeGreaterThan(40);
    }
    // §2.2: body rise is taken seated, the leg girths on the right side.
    expect(measurementHelp.bodyRise.howTo).toMatch(/sit/i);
    expect(measurementHelp.thighGirth.howTo).toMatch(/right leg/i);
  });
});

describe('readLength', () => {
  it('reads inches with fractions at 25.4 mm per inch, centimetres, and a blank as "not measured"', () => {
    expect(readLength('2 1/2', 'in')).toEqual({ mm: 2.5 * MM_PER_INCH });
    expect(readLength('32 1/2', 'in')).toEqual({ mm: 825.5 });
    expect(readLength('82.5', 'cm')).toEqual({ mm: 825 });
    expect(readLength('94 cm', 'in')).toEqual({ mm: 940 });
    expect(readLength('  ', 'in')).toEqual({ mm: undefined });
  });

  it('refuses what is not a length, zero or less, and over 3 m, with a sentence', () => {
    expect(readLength('thirty', 'in')).toMatchObject({ error: expect.stringMatching(/not a length/) });
    expect(readLength('0', 'in')).toEqual({ error: 'Give a length above 0.' });
    expect(readLength('-2', 'in')).toEqual({ error: 'Give a length above 0.' });
    expect(readLength('4 m', 'cm')).toMatchObject({ error: expect.any(String) });
    expect(readLength('301', 'cm')).toMatchObject({ error: expect.stringMatching(/over 300 cm/) });
  });

  it('keeps the exact millimetres when the text is how that value is shown (no creeping to 1/16 in)', () => {
    expect(readLength('37 in', 'in', { keepMm: 940 })).toEqual({ mm: 940 });
    expect(readLength('37', 'in', { keepMm: 940 })).toEqual({ mm: 37 * MM_PER_INCH });
  });
});

describe('dates', () => {
  it('today is the local calendar date; only real dates pass', () => {
    expect(todayIso(new Date(2026, 0, 5, 23, 30))).toBe('2026-01-05');
    expect(isIsoDate('2026-02-28')).toBe(true);
    expect(isIsoDate('2024-02-29')).toBe(true); // leap year
    expect(isIsoDate('2026-02-29')).toBe(false);
    expect(isIsoDate('2026-2-3')).toBe(false);
    expect(formatTakenOn('2026-03-10', 'en-GB')).toBe('10 Mar 2026');
  });
});

describe('readDraft', () => {
  it('turns the form into the API\'s dated set in millimetres; girths above the waist are +, below −', () => {
    const read = readDraft(
      draft({
        measurements: { waistGirth: '30', hipGirth: '40 1/4', bodyRise: '' },
        girthRows: [
          { side: 'below', distance: '2', girth: '33 1/2' },
          { side: 'above', distance: '', girth: '' },
          { side: 'above', distance: '1', girth: '29 1/2' },
        ],
        note: '  after the holidays ',
      }),
      'in',
      null,
      TODAY,
    );
    expect(read).toEqual({
      value: {
        measurements: { waistGirth: 762, hipGirth: expect.closeTo(40.25 * MM_PER_INCH, 9) },
        girthsAtHeights: [
          { offset: -50.8, girth: 850.9 },
          { offset: 25.4, girth: 749.3 },
        ],
        takenOn: TODAY,
        note: 'after the holidays',
      },
      rowOfSent: [0, 2],
    });
    // What the client sends is what geometry's profile schema (the planner's input) accepts.
    if (!('value' in read)) throw new Error('expected a value');
    expect(bodyProfileSchema.safeParse({ measurements: read.value.measurements, girthsAtHeights: read.value.girthsAtHeights }).success).toBe(true);
  });

  it('names each problem by the API\'s field key: bad lengths, half rows, a height twice, beyond 400 mm, future or bad dates', () => {
    const read = readDraft(
      draft({
        measurements: { waistGirth: 'thirty', kneeGirth: '0' },
        girthRows: [
          { side: 'below', distance: '2', girth: '' },
          { side: 'above', distance: '', girth: '30' },
          { side: 'above', distance: '1', girth: '30' },
          { side: 'above', distance: '1 in', girth: '31' },
          { side: 'below', distance: '41 cm', girth: '40' },
        ],
        takenOn: '2026-03-11',
      }),
      'in',
      null,
      TODAY,
    );
    expect(read).toEqual({
      errors: {
        'measurements.waistGirth': expect.stringMatching(/not a length/),
        'measurements.kneeGirth': 'Give a length above 0.',
        'girthsAtHeights.0.girth': 'Enter the girth at this height.',
        'girthsAtHeights.1.offset': 'How far above or below the waist?',
        'girthsAtHeights.3.offset': 'This height is given twice.',
        'girthsAtHeights.4.offset': 'Keep within 15 3/4 in of the waist.',
        takenOn: 'The date is in the future: enter the day you measured.',
      },
    });
    expect(readDraft(draft({ takenOn: '2026-02-30' }), 'cm', null, TODAY)).toEqual({ errors: { takenOn: 'Enter the date you measured.' } });
  });

  it('a form filled from a set and sent back unchanged gives that set exactly (property)', () => {
    const mm = fc.double({ min: 1, max: 3000, noNaN: true });
    const offset = fc.double({ min: 1, max: 400, noNaN: true }).chain((d) => fc.constantFrom(d, -d));
    for (const unit of ['in', 'cm'] as const) {
      fc.assert(
        fc.property(
          fc.dictionary(fc.constantFrom(...MEASUREMENT_NAMES), mm),
          // two heights shown alike in the unit would be one height given twice: keep them apart
          fc.uniqueArray(fc.record({ offset, girth: mm }), { maxLength: 6, selector: (g) => heightLabel(g.offset, unit) }),
          (measurements, girthsAtHeights) => {
            const origin = { measurements, girthsAtHeights };
            const read = readDraft(draftFrom(origin, unit, TODAY), unit, origin, TODAY);
            expect(read).toHaveProperty('value');
            if (!('value' in read)) return;
            expect(read.value.measurements).toEqual(measurements);
            expect(read.value.girthsAtHeights).toHaveLength(girthsAtHeights.length);
            for (const g of girthsAtHeights) expect(read.value.girthsAtHeights).toContainEqual(g);
          },
        ),
        { numRuns: 200 },
      );
    }
  });

  it('moves the server\'s girthsAtHeights.<sent index> messages to the form rows they came from', () => {
    expect(fieldsForRows({ 'girthsAtHeights.1.offset': 'twice', 'measurements.hipGirth': 'x', takenOn: 'y' }, [0, 2])).toEqual({
      'girthsAtHeights.2.offset': 'twice',
      'measurements.hipGirth': 'x',
      takenOn: 'y',
    });
  });
});

describe('history', () => {
  const set = (id: string, takenOn: string, measurements: DatedSet['measurements'], girthsAtHeights: DatedSet['girthsAtHeights'] = []): DatedSet => ({
    id,
    takenOn,
    measurements,
    girthsAtHeights,
    note: null,
    createdAt: `${takenOn}T10:00:00Z`,
  });

  it('shows each set newest first with the change from the set before; a measurement new in a set has no change', () => {
    const rows = historyTable([
      set('c', '2026-03-01', { waistGirth: 787.4, hipGirth: 1016, bodyRise: 280 }, [{ offset: -50.8, girth: 850 }]),
      set('b', '2026-01-15', { waistGirth: 774.7, hipGirth: 1016 }, [{ offset: -50.8, girth: 845 }, { offset: 25.4, girth: 740 }]),
      set('a', '2025-10-02', { waistGirth: 762 }),
    ]);
    expect(rows.map((r) => (r.kind === 'measurement' ? r.name : r.offset))).toEqual(['waistGirth', 'hipGirth', 'bodyRise', 25.4, -50.8]);
    const waist = rows[0]!.cells;
    expect(waist[0]!.value).toBe(787.4);
    expect(waist[0]!.change).toBeCloseTo(12.7, 9); // + 1/2 in
    expect(waist[1]!.change).toBeCloseTo(12.7, 9);
    expect(waist[2]).toEqual({ value: 762, change: undefined });
    expect(rows[1]!.cells.map((c) => c.change)).toEqual([0, undefined, undefined]);
    expect(rows[2]!.cells).toEqual([{ value: 280, change: undefined }, { value: undefined, change: undefined }, { value: undefined, change: undefined }]);
    expect(rows[3]!.cells.map((c) => c.value)).toEqual([undefined, 740, undefined]);
    expect(rows[4]!.cells[0]).toEqual({ value: 850, change: 5 });
  });

  it('changes along a history add up to newest − oldest when every set has the measurement (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 1, max: 3000, noNaN: true }), { minLength: 1, maxLength: 8 }), (values) => {
        const rows = historyTable(values.map((v, i) => set(`s${i}`, `2026-01-${String(28 - i).padStart(2, '0')}`, { hipGirth: v })));
        const cells = rows[0]!.cells;
        const sum = cells.slice(0, -1).reduce((total, c) => total + c.change!, 0);
        expect(Math.abs(sum - (values[0]! - values[values.length - 1]!))).toBeLessThan(1e-6);
        expect(cells[cells.length - 1]!.change).toBeUndefined();
      }),
    );
  });

  it('words changes and heights in the person\'s units', () => {
    expect(changeText(12.7, 'in')).toBe('+1/2 in');
    expect(changeText(-10, 'cm')).toBe('−1 cm');
    expect(changeText(0.2, 'in')).toBe('no change'); // under 1/32 in shows as 0 in
    expect(changeText(undefined, 'in')).toBeNull();
    expect(heightLabel(-50.8, 'in')).toBe('2 in below the waist');
    expect(heightLabel(50, 'cm')).toBe('5 cm above the waist');
  });
});
