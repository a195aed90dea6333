/** Size labels written one way and another: sizeKey, matchSizeLabel, alignChartSizes, and the planner using them. */
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  alignChartSizes,
  applyOps,
  chartFromPattern,
  demoPattern,
  fillChartGaps,
  matchSizeLabel,
  parsePattern,
  parseSizeChart,
  patternSizes,
  planFit,
  sizeKey,
  sizeNumber,
} from '../../geometry/index.ts';

/** Ways a person may write a pattern's size label in a table they type or paste. */
const decorated = (label: string): fc.Arbitrary<string> =>
  fc
    .record({
      prefix: fc.constantFrom('', 'Size ', 'size', 'SIZE: ', 'Sz. ', 'size #', 'Size-'),
      upper: fc.boolean(),
      zeros: fc.integer({ min: 0, max: 2 }),
      pad: fc.constantFrom('', ' ', '  '),
    })
    .map(({ prefix, upper, zeros, pad }) => {
      const body = sizeNumber(label) !== undefined && !label.startsWith('-') ? `${'0'.repeat(zeros)}${label}` : label;
      return `${pad}${prefix}${upper ? body.toUpperCase() : body.toLowerCase()}${pad}`;
    });

/** A pattern's own labels: numbers, letters or both, no two naming the same size. */
const patternLabels = fc
  .uniqueArray(fc.oneof(fc.integer({ min: 0, max: 60 }).map(String), fc.constantFrom('XS', 'S', 'M', 'L', 'XL', '2XL', '10.5', '28/30', 'Petite 8')), { minLength: 1, maxLength: 12, selector: sizeKey })
  .filter((ls) => new Set(ls.map(sizeKey)).size === ls.length);

describe('sizeKey and matchSizeLabel', () => {
  it('reads the usual ways of writing one size alike, and different sizes apart', () => {
    expect(['8', '08', ' 8 ', '8.0', 'Size 8', 'size8', 'SIZE: 08', 'Sz. 8', 'size #8'].map(sizeKey)).toEqual(Array(9).fill('8'));
    expect(sizeKey('10,5')).toBe(sizeKey('10.5'));
    expect(sizeKey('XL')).toBe(sizeKey('size xl'));
    expect(sizeKey('2XL')).not.toBe(sizeKey('XL'));
    expect(sizeKey('8')).not.toBe(sizeKey('18'));
    expect(sizeKey('28/30')).toBe(sizeKey('28 / 30'));
    // a label that is only the word stays itself
    expect(sizeKey('Size')).toBe('size');
  });

  it('a label the pattern has is itself; a loose one is the only size it can be; two candidates or none give nothing', () => {
    const sizes = ['0', '2', '4', 'XL'];
    expect(matchSizeLabel('2', sizes)).toBe('2');
    expect(matchSizeLabel('Size 02', sizes)).toBe('2');
    expect(matchSizeLabel('xl', sizes)).toBe('XL');
    expect(matchSizeLabel('6', sizes)).toBeUndefined();
    // the pattern writes one size two ways: only the exact label is certain
    expect(matchSizeLabel('8', ['8', '08'])).toBe('8');
    expect(matchSizeLabel('Size 8', ['8', '08'])).toBeUndefined();
  });

  it('any decorated form of a pattern label finds that label, and only it (property)', () => {
    fc.assert(
      fc.property(
        patternLabels.chain((labels) => fc.tuple(fc.constant(labels), fc.nat(labels.length - 1)).chain(([ls, i]) => fc.tuple(fc.constant(ls), fc.constant(ls[i]!), decorated(ls[i]!)))),
        ([labels, label, written]) => {
          expect(matchSizeLabel(written, labels)).toBe(label);
          // without it in the list, the written form matches nothing else
          expect(matchSizeLabel(written, labels.filter((l) => l !== label))).toBeUndefined();
        },
      ),
      { numRuns: 500 },
    );
  });
});

describe('alignChartSizes', () => {
  const chart = (sizes: string[]) => parseSizeChart({ sizes: sizes.map((size, i) => ({ size, garment: { hip: 1000 + 50 * i } })) });

  it('takes the pattern labels, keeps the measurements, leaves unknown sizes and never makes two rows one size', () => {
    const aligned = alignChartSizes(chart(['Size 00', 'size 2', 'XXL', '4']), ['0', '2', '4', '6']);
    expect(aligned.sizes.map((s) => s.size)).toEqual(['0', '2', 'XXL', '4']);
    expect(aligned.sizes.map((s) => s.garment.hip)).toEqual([1000, 1050, 1100, 1150]);
    // "04" would be 4, but a row already says 4: it stays as typed (and the table still parses)
    const clash = alignChartSizes(chart(['04', '4']), ['4']);
    expect(clash.sizes.map((s) => s.size)).toEqual(['04', '4']);
    expect(() => parseSizeChart(clash)).not.toThrow();
    const same = chart(['0', '2']);
    expect(alignChartSizes(same, ['0', '2'])).toBe(same);
  });

  it('fillChartGaps meets a printed "Size 8" with the measured 8', () => {
    const printed = parseSizeChart({ sizes: [{ size: 'Size 8', garment: { hip: 1000 } }] });
    const measured = parseSizeChart({ source: 'geometry', sizes: [{ size: '8', garment: { hip: 990, inseam: 800 } }] });
    const filled = fillChartGaps(printed, measured);
    expect(filled.sizes).toEqual([{ size: '8', garment: { hip: 1000, inseam: 800 } }]);
  });
});

describe('the planner with a table whose sizes are written differently from the pattern', () => {
  it('plans on the demo pattern exactly as with the pattern labels, and its blend applies', () => {
    const pattern = parsePattern(demoPattern());
    const measured = chartFromPattern(pattern);
    const typed = { ...measured, source: 'printed' as const, sizes: measured.sizes.map((s, i) => ({ ...s, size: i % 2 === 0 ? `Size ${s.size.padStart(2, '0')}` : `SIZE: ${s.size}` })) };
    const profile = { waistGirth: 760, hipGirth: 1010, thighGirth: 610, kneeGirth: 400, calfGirth: 360 };
    const plain = planFit({ profile, pattern, chart: { ...measured, source: 'printed' } });
    const loose = planFit({ profile, pattern, chart: typed });
    expect(loose.ops).toEqual(plain.ops);
    const blend = loose.ops.find((o) => o.op === 'blend') as { levels: { size: string }[] } | undefined;
    expect(blend).toBeDefined();
    // the demo's sizes are numbers, so the plan may name a size between two lines (5.7)
    for (const l of blend!.levels) expect(patternSizes(pattern).includes(l.size) || sizeNumber(l.size) !== undefined).toBe(true);
    expect(() => applyOps(pattern, loose.ops)).not.toThrow();
    // the labels as typed would not apply: the blend names a size the pattern does not have
    const typedBlend = { op: 'blend', levels: blend!.levels.map((l) => ({ ...l, size: `Size ${l.size}` })) };
    expect(() => applyOps(pattern, [typedBlend])).toThrow(/has no size "Size/);
  });
});
