/**
 * Damaged copies of a file, for the importers' property tests: a few cuts, one-character
 * replacements by pieces of the format's own syntax, and truncations, at random places.
 */
import fc from 'fast-check';

type Edit = { at: number; cut: number } | { at: number; put: string } | { at: number; end: true };

export function damagedCopies(file: string, syntax: readonly string[]): fc.Arbitrary<string> {
  const edit: fc.Arbitrary<Edit> = fc.oneof(
    fc.record({ at: fc.nat(), cut: fc.integer({ min: 1, max: 40 }) }),
    fc.record({ at: fc.nat(), put: fc.constantFrom(...syntax) }),
    fc.record({ at: fc.nat(), end: fc.constant(true as const) }),
  );
  return fc.array(edit, { minLength: 1, maxLength: 4 }).map((edits) => {
    let t = file;
    for (const e of edits) {
      const i = e.at % (t.length + 1);
      t = 'cut' in e ? t.slice(0, i) + t.slice(i + e.cut) : 'put' in e ? t.slice(0, i) + e.put + t.slice(i + 1) : t.slice(0, i);
    }
    return t;
  });
}
