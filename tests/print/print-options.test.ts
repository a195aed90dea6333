/**
 * Print options (zod) and the print service: bad input gets a clear error naming the field.
 */
import { describe, expect, it } from 'vitest';
import { applyOps, demoPattern } from '../../geometry/index.ts';
import { PrintError } from '../../geometry/index.ts';
import { PrintOptionsError, parsePrintOptions, printPattern } from '../../server/modules/print/print.service.ts';
import { BLEND } from '../bench/alterations.ts';

describe('print options', () => {
  it('defaults: PDF on Letter, orientation chosen, ¼ in (6.35 mm) margin, no overlap, grain kept vertical', () => {
    expect(parsePrintOptions({})).toMatchObject({ format: 'pdf', paper: 'letter', orientation: 'auto', margin: 6.35, overlap: 0, allowRotate90: false });
  });

  it.each([
    [{ paper: 'b5' }, /paper/],
    [{ orientation: 'sideways' }, /orientation/],
    [{ margin: -3 }, /margin: must be 0 mm or more/],
    [{ overlap: 500 }, /overlap: must be 60 mm or less/],
    [{ format: 'png' }, /format/],
    [{ date: '1 Dec' }, /date: must be YYYY-MM-DD/],
    [{ colour: 'red' }, /Unrecognized key|colour/],
  ])('%o is refused naming the field', (input, message) => {
    expect(() => parsePrintOptions(input)).toThrow(PrintOptionsError);
    expect(() => parsePrintOptions(input)).toThrow(message);
  });

  it('an overlap wider than half the printable page is a PrintError saying so', async () => {
    const pattern = applyOps(demoPattern(), [BLEND]).pattern;
    // Letter with 50 mm margins prints 115.9 mm across: at most 57 mm may overlap
    await expect(printPattern(pattern, { paper: 'letter', margin: 50, overlap: 58 })).rejects.toThrow(PrintError);
    await expect(printPattern(pattern, { paper: 'letter', margin: 50, overlap: 58 })).rejects.toThrow(/overlap must be between 0 and 57 mm/);
  });

  it('prints the title and today’s date unless given; reports the pages left out', async () => {
    const pattern = applyOps(demoPattern(), [BLEND]).pattern;
    const r = await printPattern(pattern, { format: 'svg', paper: 'a4', title: 'Evening make' }, new Date('2026-03-04T10:00:00Z'));
    const svg = r.data.toString('utf8');
    expect(svg).toContain('data-text="Evening make"');
    expect(svg).toContain('data-text="2026-03-04"');
    expect(r.emptyPages).toEqual(r.plan.format === 'tiled' ? r.plan.empty.map((t) => t.label) : []);
  });
});
