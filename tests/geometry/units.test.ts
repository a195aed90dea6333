import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  formatLength,
  formatLengthParts,
  INCH_DENOMINATOR,
  LengthParseError,
  MAX_TYPED_LENGTH_MM,
  MM_PER_INCH,
  parseLength,
} from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';

describe('the inch', () => {
  it('is 25.4 mm exactly', () => {
    // The international inch: international yard and pound agreement of 1959 (1 yd = 0.9144 m,
    // so 1 in = 0.9144 m / 36 = 25.4 mm); NIST SP 811 Appendix B lists 1 in = 2.54 cm "exactly"
    // (from memory).
    expect(MM_PER_INCH).toBe(25.4);
    expectNear(parseLength('36', 'in'), 914.4, 1e-9, '1 yd = 0.9144 m (1959 agreement)');
    expect(parseLength('1 in', 'cm')).toBe(25.4);
    expect(parseLength('2.54 cm', 'in')).toBe(25.4);
  });
});

describe('parseLength', () => {
  // Hand-worked: 2 1/2 in = 2.5 × 25.4 = 63.5 mm; 1/4 in = 6.35 mm; 1 1/2 in = 38.1 mm.
  const cases: [string, 'in' | 'cm', number][] = [
    ['2 1/2', 'in', 63.5],
    ['2-1/2', 'in', 63.5],
    ['2 - 1/2', 'in', 63.5],
    ['1/4', 'in', 6.35],
    ['2.5', 'in', 63.5],
    ['2.5in', 'cm', 63.5],
    ['2.5 in', 'cm', 63.5],
    ['2.5 inches', 'cm', 63.5],
    ['2.5"', 'cm', 63.5],
    ['2.5 IN', 'cm', 63.5],
    ['6.35 cm', 'in', 63.5],
    ['6,35 cm', 'in', 63.5],
    ['63.5mm', 'in', 63.5],
    ['2.5', 'cm', 25],
    ['.5', 'in', 12.7],
    ['-3', 'in', -76.2],
    ['- 1 1/2 in', 'cm', -38.1],
    ['−1/4', 'in', -6.35],
    ['+2', 'in', 50.8],
    ['  2 1/2  ', 'in', 63.5],
    ['0', 'in', 0],
    ['5/4', 'in', 31.75],
    ['3/16 in', 'cm', 4.7625],
  ];
  it.each(cases)('reads %j (%s) as %f mm', (text, unit, mm) => {
    expectNear(parseLength(text, unit), mm, 1e-9, text);
  });

  it('reads -0 as 0, not -0', () => {
    expect(Object.is(parseLength('-0', 'in'), 0)).toBe(true);
  });

  const bad: [string, RegExp][] = [
    ['', /no length given/],
    ['   ', /no length given/],
    ['1/0', /0 below the line/],
    ['2 1/0', /0 below the line/],
    ['abc', /is not a length/],
    ['2 in cm', /more than one unit/],
    ['2.5 ft', /unknown unit "ft"/],
    ['2 5/4', /fraction must be less than 1/],
    ['1e3', /is not a length/],
    ['Infinity', /is not a length/],
    ['NaN', /is not a length/],
    ['9'.repeat(400), /too large/],
    ['101 m', /unknown unit/],
    ['10001 cm', /over 100 m/],
    ['4000 in', /over 100 m/],
    ['1,000,000', /is not a length/],
    ['2.5.5', /is not a length/],
    ['--3', /is not a length/],
    ['1.5/2', /is not a length/],
  ];
  it.each(bad)('refuses %j with a clear message', (text, message) => {
    let caught: unknown;
    try {
      parseLength(text, 'in');
    } catch (error) {
      caught = error;
    }
    expect(caught).toBeInstanceOf(LengthParseError);
    expect((caught as LengthParseError).message).toMatch(message);
    expect((caught as LengthParseError).input).toBe(text);
  });

  it('accepts exactly 100 m and refuses just over', () => {
    expect(parseLength('10000 cm', 'in')).toBe(MAX_TYPED_LENGTH_MM);
    expect(() => parseLength('100000.1 mm', 'in')).toThrow(LengthParseError);
  });
});

describe('formatLength', () => {
  const inches: [number, string][] = [
    [63.5, '2 1/2 in'],
    [-76.2, '-3 in'],
    [25.4 / 16, '1/16 in'],
    [0, '0 in'],
    [-0.1, '0 in'],
    [25.4 * (3 / 8), '3/8 in'],
    [25.4 * (12 + 12 / 16), '12 3/4 in'],
    [25.4 * (1 + 15 / 16), '1 15/16 in'],
    [25.4 * 0.999, '1 in'],
    [-25.4 * (1 + 1 / 8), '-1 1/8 in'],
  ];
  it.each(inches)('shows %f mm as %j', (mm, text) => {
    expect(formatLength(mm, 'in')).toBe(text);
  });

  const cm: [number, string][] = [
    [63.5, '6.4 cm'],
    [50, '5 cm'],
    [-12.3, '-1.2 cm'],
    [0.4, '0 cm'],
    [1234, '123.4 cm'],
  ];
  it.each(cm)('shows %f mm as %j', (mm, text) => {
    expect(formatLength(mm, 'cm')).toBe(text);
  });

  it('signs amounts when asked, never zero', () => {
    expect(formatLength(50.8, 'in', { signed: true })).toBe('+2 in');
    expect(formatLength(-6.35, 'in', { signed: true })).toBe('-1/4 in');
    expect(formatLength(0, 'in', { signed: true })).toBe('0 in');
    expect(formatLength(15, 'cm', { signed: true })).toBe('+1.5 cm');
  });

  it('says when rounding hid a difference', () => {
    expect(formatLengthParts(63.5, 'in')).toEqual({ text: '2 1/2 in', exact: true, shownMm: 63.5 });
    const p = formatLengthParts(64, 'in');
    expect(p.text).toBe('2 1/2 in');
    expect(p.exact).toBe(false);
    expect(formatLengthParts(63.5, 'cm').exact).toBe(false);
    expect(formatLengthParts(64, 'cm').exact).toBe(true);
  });

  it('rounds halves away from zero, so a length and its negative read alike', () => {
    const half = 25.4 / 32; // exactly between 0 and 1/16 in
    expect(formatLength(half, 'in')).toBe('1/16 in');
    expect(formatLength(-half, 'in')).toBe('-1/16 in');
    expect(formatLength(0.5, 'cm')).toBe('0.1 cm');
    expect(formatLength(-0.5, 'cm')).toBe('-0.1 cm');
  });

  it('refuses non-finite lengths', () => {
    expect(() => formatLength(Number.NaN, 'in')).toThrow(RangeError);
    expect(() => formatLength(Number.POSITIVE_INFINITY, 'cm')).toThrow(RangeError);
  });
});

describe('properties', () => {
  const mm = fc.double({ min: -5000, max: 5000, noNaN: true });

  it('inches: reading back the shown text is within half a 1/16 in, and is the shown value', () => {
    fc.assert(
      fc.property(mm, (x) => {
        const shown = formatLengthParts(x, 'in');
        const back = parseLength(shown.text, 'in');
        expect(Math.abs(back - x)).toBeLessThanOrEqual(MM_PER_INCH / 32 + 1e-9);
        expectNear(back, shown.shownMm, 1e-9);
      }),
    );
  });

  it('centimetres: reading back is within 0.05 cm', () => {
    fc.assert(
      fc.property(mm, (x) => {
        const back = parseLength(formatLength(x, 'cm'), 'cm');
        expect(Math.abs(back - x)).toBeLessThanOrEqual(0.5 + 1e-9);
      }),
    );
  });

  it('formatting is deterministic and idempotent (the shown value shows as itself, exactly)', () => {
    fc.assert(
      fc.property(mm, fc.constantFrom('in' as const, 'cm' as const), fc.boolean(), (x, unit, signed) => {
        const a = formatLengthParts(x, unit, { signed });
        expect(formatLengthParts(x, unit, { signed })).toEqual(a);
        const again = formatLengthParts(parseLength(a.text, unit), unit, { signed });
        expect(again.text).toBe(a.text);
        expect(again.exact).toBe(true);
      }),
    );
  });

  it('inch fractions are in lowest terms with a denominator of 2, 4, 8 or 16', () => {
    fc.assert(
      fc.property(mm, (x) => {
        const m = / (\d+)\/(\d+) in$|^-?(\d+)\/(\d+) in$/.exec(formatLength(x, 'in'));
        if (!m) return;
        const n = Number(m[1] ?? m[3]);
        const d = Number(m[2] ?? m[4]);
        expect([2, 4, 8, 16]).toContain(d);
        expect(n % 2).toBe(1);
        expect(n).toBeLessThan(d);
      }),
    );
  });

  it('every sixteenth typed as a mixed number reads as k/16 in exactly and shows as typed', () => {
    fc.assert(
      fc.property(fc.integer({ min: -16 * 200, max: 16 * 200 }), (k) => {
        const text = formatLength((k * MM_PER_INCH) / INCH_DENOMINATOR, 'in');
        const back = parseLength(text, 'cm'); // the text carries its unit
        expectNear(back, (k * MM_PER_INCH) / INCH_DENOMINATOR, 1e-9);
        expect(formatLength(back, 'in')).toBe(text);
      }),
    );
  });
});
