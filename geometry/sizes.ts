/**
 * Size labels: their numeric value, and matching a label written one way ("Size 08", "size: xl")
 * with the label a pattern uses ("8", "XL"). Pure, no imports: the pattern pages use it without
 * loading the rest of the engine.
 */

/** Numeric value of a size label ("8" → 8, "10.5" → 10.5), or undefined when not a plain number. */
export function sizeNumber(size: string): number | undefined {
  const t = size.trim();
  if (!/^[-+]?\d+(\.\d+)?$/.test(t)) return undefined;
  return Number(t);
}

/**
 * A size label as it is compared with another: without case, spaces or a leading "size" / "sz"
 * (with its colon, dot, hash or dash), a number by its value ("08", "8.0" and "8" alike; a
 * decimal comma read as a point). Two labels with the same key name the same size.
 */
export function sizeKey(label: string): string {
  let t = label.normalize('NFKC').trim().toLowerCase().replace(/\s+/g, '');
  const bare = t.replace(/^(?:size|sz)[.:#-]*/, '');
  if (bare !== '') t = bare;
  const n = /^[-+]?\d+([.,]\d+)?$/.test(t) ? Number(t.replace(',', '.')) : NaN;
  return Number.isFinite(n) ? String(n) : t;
}

/**
 * The one label of `sizes` that names the same size as `label`: the label itself when `sizes`
 * has it, else the only one with the same `sizeKey`; undefined when none or several do.
 */
export function matchSizeLabel(label: string, sizes: readonly string[]): string | undefined {
  const t = label.trim();
  const exact = sizes.find((s) => s.trim() === t);
  if (exact !== undefined) return exact;
  const key = sizeKey(t);
  const same = sizes.filter((s) => sizeKey(s) === key);
  return same.length === 1 ? same[0] : undefined;
}

/**
 * A typed size as the pattern labels it when it is written differently ("Size 08" → "8",
 * "xl" → "XL"; `matchSizeLabel`), unless one of `others` (the table's other rows) already has
 * that label; otherwise as typed.
 */
export function asPatternSize(size: string, patternSizes: readonly string[], others: Iterable<string> = []): string {
  const to = matchSizeLabel(size, patternSizes);
  return to !== undefined && ![...others].includes(to) ? to : size;
}
