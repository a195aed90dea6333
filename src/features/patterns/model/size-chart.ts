/**
 * A pattern's printed size table, as the size-table screen edits it. Pure: no React, no requests.
 *
 * Two charts share the rows (one per size): the finished-garment measurements and, when the
 * pattern prints it, the body-measurement chart (ISO 8559-1 names). Everything is millimetres
 * inside; text in the person's unit (or with its own unit) at the edges, read by geometry's
 * `parseLength` (`30 1/2`, `30.5in`, `77.5 cm`, `775 mm`).
 */
import { asPatternSize } from '../../../../geometry/sizes.ts';
import { type LengthUnit, LengthParseError, formatLength, parseLength } from '../../../../geometry/units.ts';

/**
 * A finished girth within this of the measured one needs no attention (¼ in; common practice,
 * no source). A copy of geometry/fit/plan.ts FIT_GIRTH_TOLERANCE, so the pattern pages do not
 * load the planner; tests/client/size-chart-model.test.ts checks the two agree.
 */
export const FIT_GIRTH_TOLERANCE = 6.35;
/** The same for lengths (⅛ in; common practice, no source): geometry's FIT_LENGTH_TOLERANCE. */
export const FIT_LENGTH_TOLERANCE = 3.175;

export type MeasureKind = 'girth' | 'length';
export type ChartKind = 'garment' | 'body';

export interface ChartColumn<K extends string = string> {
  readonly key: K;
  /** The heading on screen. */
  readonly label: string;
  readonly kind: MeasureKind;
  /** Headings a pasted table may use for it (compared without case, spaces or punctuation). */
  readonly aliases: readonly string[];
}

/** Finished-garment measurements: geometry/fit/chart.ts GIRTH_LEVELS then LENGTH_MEASURES. */
export const GARMENT_COLUMNS = [
  { key: 'waist', label: 'Waist', kind: 'girth', aliases: ['waist', 'waist girth', 'finished waist', 'waistband'] },
  { key: 'hip', label: 'Hip', kind: 'girth', aliases: ['hip', 'hips', 'seat', 'hip girth', 'finished hip'] },
  { key: 'thigh', label: 'Thigh', kind: 'girth', aliases: ['thigh', 'thigh girth', 'thigh width'] },
  { key: 'knee', label: 'Knee', kind: 'girth', aliases: ['knee', 'knee girth', 'knee width'] },
  { key: 'calf', label: 'Calf', kind: 'girth', aliases: ['calf', 'calf girth', 'calf width'] },
  { key: 'hem', label: 'Hem', kind: 'girth', aliases: ['hem', 'hem width', 'hem girth', 'leg opening', 'leg hem'] },
  { key: 'frontRise', label: 'Front rise', kind: 'length', aliases: ['front rise', 'rise front'] },
  { key: 'backRise', label: 'Back rise', kind: 'length', aliases: ['back rise', 'rise back'] },
  { key: 'inseam', label: 'Inseam', kind: 'length', aliases: ['inseam', 'inside leg', 'inner leg'] },
  { key: 'crotchDepth', label: 'Crotch depth', kind: 'length', aliases: ['crotch depth', 'rise', 'seat depth'] },
] as const satisfies readonly ChartColumn[];
export type GarmentKey = (typeof GARMENT_COLUMNS)[number]['key'];

/** Body measurements by their ISO 8559-1 names: geometry/fit/body.ts BODY_MEASUREMENT_NAMES. */
export const BODY_COLUMNS = [
  { key: 'waistGirth', label: 'Waist girth', kind: 'girth', aliases: ['waist girth', 'waist', 'body waist'] },
  { key: 'hipGirth', label: 'Hip girth', kind: 'girth', aliases: ['hip girth', 'hip', 'hips', 'seat', 'body hip'] },
  { key: 'thighGirth', label: 'Thigh girth', kind: 'girth', aliases: ['thigh girth', 'thigh'] },
  { key: 'kneeGirth', label: 'Knee girth', kind: 'girth', aliases: ['knee girth', 'knee'] },
  { key: 'calfGirth', label: 'Calf girth', kind: 'girth', aliases: ['calf girth', 'calf'] },
  { key: 'ankleGirth', label: 'Ankle girth', kind: 'girth', aliases: ['ankle girth', 'ankle'] },
  { key: 'bodyRise', label: 'Body rise', kind: 'length', aliases: ['body rise', 'rise', 'crotch depth'] },
  { key: 'totalCrotchLength', label: 'Total crotch length', kind: 'length', aliases: ['total crotch length', 'crotch length'] },
  { key: 'insideLegLength', label: 'Inside leg length', kind: 'length', aliases: ['inside leg length', 'inside leg', 'inseam'] },
  { key: 'outsideLegLength', label: 'Outside leg length', kind: 'length', aliases: ['outside leg length', 'outside leg', 'outseam'] },
  { key: 'height', label: 'Height', kind: 'length', aliases: ['height', 'stature', 'body height'] },
] as const satisfies readonly ChartColumn[];
export type BodyKey = (typeof BODY_COLUMNS)[number]['key'];

export const columnsOf = (kind: ChartKind): readonly ChartColumn[] => (kind === 'garment' ? GARMENT_COLUMNS : BODY_COLUMNS);

/** The tolerance for a garment measurement (girth or length). */
export const toleranceFor = (kind: MeasureKind): number => (kind === 'girth' ? FIT_GIRTH_TOLERANCE : FIT_LENGTH_TOLERANCE);

export type Measures = Partial<Record<string, number>>;

/** One size of the table being edited (mm). */
export interface DraftSize {
  readonly size: string;
  readonly garment: Measures;
  readonly body: Measures;
}

export interface SizeChartDraft {
  readonly name?: string;
  readonly sizes: readonly DraftSize[];
}

/** The chart as the server sends it (geometry/fit/chart.ts SizeChart). */
export interface ChartLike {
  readonly name?: string | undefined;
  readonly source?: string;
  readonly sizes: readonly { readonly size: string; readonly garment: Measures; readonly body?: Measures | undefined }[];
  readonly notes?: readonly string[];
}

export const draftFromChart = (chart: ChartLike | null | undefined): SizeChartDraft => ({
  ...(chart?.name ? { name: chart.name } : {}),
  sizes: (chart?.sizes ?? []).map((s) => ({ size: s.size, garment: { ...s.garment }, body: { ...(s.body ?? {}) } })),
});

const defined = (m: Measures): Record<string, number> => Object.fromEntries(Object.entries(m).filter((e): e is [string, number] => typeof e[1] === 'number'));

/** The body of `PUT /api/patterns/:id/size-chart`: a printed chart; a size's body chart only when it has one. */
export function chartInputFromDraft(draft: SizeChartDraft) {
  return {
    ...(draft.name?.trim() ? { name: draft.name.trim() } : {}),
    source: 'printed' as const,
    sizes: draft.sizes.map((s) => {
      const body = defined(s.body);
      return { size: s.size.trim(), garment: defined(s.garment), ...(Object.keys(body).length > 0 ? { body } : {}) };
    }),
    notes: [] as string[],
  };
}

/** What is wrong with a draft before it is sent (the server checks the rest); empty when nothing. */
export function draftProblems(draft: SizeChartDraft): string[] {
  const problems: string[] = [];
  if (draft.sizes.length === 0) problems.push('The table needs at least one size.');
  const seen = new Set<string>();
  draft.sizes.forEach((s, i) => {
    const label = s.size.trim();
    if (label === '') problems.push(`Row ${i + 1} has no size name.`);
    else if (label.length > 40) problems.push(`Row ${i + 1}: keep the size name to 40 characters.`);
    else if (seen.has(label)) problems.push(`Size “${label}” appears twice.`);
    seen.add(label);
  });
  return problems;
}

// ---------------------------------------------------------------------------------------------
// Reading a cell and a pasted table

const VULGAR: Record<string, string> = { '¼': '1/4', '½': '1/2', '¾': '3/4', '⅛': '1/8', '⅜': '3/8', '⅝': '5/8', '⅞': '7/8', '⅓': '1/3', '⅔': '2/3', '⅙': '1/6', '⅚': '5/6', '⅕': '1/5' };

/** `30½` → `30 1/2`, the fraction slash ⁄ → /, so geometry's reader takes what charts print. */
export function normaliseLengthText(text: string): string {
  return text
    .replace(/(\d)?\s*([¼½¾⅛⅜⅝⅞⅓⅔⅙⅚⅕])/g, (_m, whole: string | undefined, f: string) => `${whole ?? ''}${whole ? ' ' : ''}${VULGAR[f]}`)
    .replace(/⁄/g, '/')
    .trim();
}

export type CellRead = { mm: number | undefined } | { error: string };

/** One cell: empty = no value; otherwise a positive length in `unit` unless it names its own. */
export function readCell(text: string, unit: LengthUnit | 'mm'): CellRead {
  const t = normaliseLengthText(text);
  if (t === '' || t === '-' || t === '–' || t === '—') return { mm: undefined };
  try {
    const mm = unit === 'mm' ? parseLength(/[a-z"″]\s*$/i.test(t) ? t : `${t} mm`, 'cm') : parseLength(t, unit);
    if (mm <= 0) return { error: `“${text.trim()}” must be more than 0` };
    if (mm > 3000) return { error: `“${text.trim()}” is over 3 m: check the number and its unit` };
    return { mm };
  } catch (e) {
    if (e instanceof LengthParseError) return { error: e.message };
    throw e;
  }
}

const squash = (text: string): string => text.toLowerCase().replace(/[^a-z0-9]/g, '');

/** A heading's unit in brackets or after a comma: `Hip (cm)`, `Waist [in]`, `Inseam, mm`. */
function headingUnit(heading: string): { name: string; unit?: LengthUnit | 'mm' } {
  const m = /^(.*?)(?:\s*[([]\s*(in|inch|inches|cm|mm)\s*[)\]]|\s*,\s*(in|inch|inches|cm|mm))\s*$/i.exec(heading.trim());
  if (!m) return { name: heading.trim() };
  const word = (m[2] ?? m[3] ?? '').toLowerCase();
  return { name: m[1]!.trim(), unit: word === 'cm' ? 'cm' : word === 'mm' ? 'mm' : 'in' };
}

/** The column a heading names, or undefined. */
export function columnForHeading(heading: string, kind: ChartKind): ChartColumn | undefined {
  const name = squash(headingUnit(heading).name);
  if (name === '') return undefined;
  const columns = columnsOf(kind);
  return columns.find((c) => squash(c.key) === name || squash(c.label) === name) ?? columns.find((c) => c.aliases.some((a) => squash(a) === name));
}

const SIZE_HEADINGS = new Set(['size', 'sizes', 'sizename', 'sizelabel', 'label', '']);

/** Split a pasted line: tabs (spreadsheets); without a tab anywhere, runs of two or more spaces. */
function splitRows(text: string): string[][] {
  const lines = text.replace(/\r\n?/g, '\n').split('\n').filter((l) => l.trim() !== '');
  const tabs = lines.some((l) => l.includes('\t'));
  return lines.map((l) => (tabs ? l.split('\t') : l.trim().split(/\s{2,}/)).map((c) => c.trim()));
}

export interface PastedRow {
  readonly size: string;
  readonly values: Record<string, number>;
}

export interface PasteResult {
  /** The columns the values were read into, in the pasted order. */
  readonly columns: readonly ChartColumn[];
  readonly rows: readonly PastedRow[];
  /** Whether the first row was read as headings. */
  readonly header: boolean;
  /** Anything that stops the paste (nothing is applied while there are any). */
  readonly errors: readonly string[];
  /** Things left out on purpose (an unknown heading's column). */
  readonly notes: readonly string[];
}

/**
 * Read cells pasted from a spreadsheet into rows of one chart (garment or body).
 *
 * - rows are lines, cells are separated by tabs (or by two or more spaces when there is no tab);
 * - the first cell of each row is the size, named as the pattern names it when `sizes` (the
 *   pattern's) has it written differently (`asPatternSize`; a note lists what was renamed);
 * - the first row is read as headings when none of its cells after the first is a length; each
 *   heading must name a column (`Hip`, `Front rise`, `Waist girth`, `Inseam (cm)`); a unit in the
 *   heading applies to the cells under it that have none; a column with an unknown heading is
 *   left out (and said so);
 * - without headings the cells fill `order` (the columns as the table shows them), left to right;
 * - a cell is a positive length in `unit` unless it names its own (`30 1/2`, `30½`, `77.5 cm`);
 *   an empty cell or a dash is no value.
 */
export function parsePastedTable(text: string, options: { kind: ChartKind; unit: LengthUnit; order?: readonly string[]; sizes?: readonly string[] }): PasteResult {
  const rows = splitRows(text);
  const errors: string[] = [];
  const notes: string[] = [];
  const all = columnsOf(options.kind);
  if (rows.length === 0) return { columns: [], rows: [], header: false, errors: ['Nothing to paste: copy the cells of the size table (with or without its headings) and paste them here.'], notes };

  const first = rows[0]!;
  const header = first.slice(1).every((c) => c === '' || 'error' in readCell(c, options.unit)) && first.slice(1).some((c) => c !== '');
  // Each pasted column: where it goes (undefined: left out) and its own unit.
  let targets: ({ column: ChartColumn; unit?: LengthUnit | 'mm' } | undefined)[];
  if (header) {
    if (!SIZE_HEADINGS.has(squash(first[0] ?? ''))) notes.push(`The first column (“${first[0]}”) is read as the size.`);
    const used = new Map<string, string>();
    targets = first.slice(1).map((heading) => {
      if (heading === '') return undefined;
      const column = columnForHeading(heading, options.kind);
      if (!column) {
        notes.push(`The column “${heading}” is not a ${options.kind === 'garment' ? 'finished-garment' : 'body'} measurement this table keeps: left out.`);
        return undefined;
      }
      const twice = used.get(column.key);
      if (twice !== undefined) errors.push(`“${twice}” and “${heading}” both name ${column.label}.`);
      used.set(column.key, heading);
      const unit = headingUnit(heading).unit;
      return unit ? { column, unit } : { column };
    });
  } else {
    const order = (options.order ?? all.map((c) => c.key)).map((k) => all.find((c) => c.key === k)).filter((c): c is ChartColumn => c !== undefined);
    const widest = Math.max(...rows.map((r) => r.length)) - 1;
    if (widest > order.length) errors.push(`The rows have ${widest} measurements but the table has ${order.length} columns: paste the headings too, or fewer columns.`);
    targets = order.slice(0, Math.max(0, widest)).map((column) => ({ column }));
  }

  const out: PastedRow[] = [];
  const seen = new Set<string>();
  const relabelled: string[] = [];
  rows.slice(header ? 1 : 0).forEach((cells, i) => {
    const line = i + (header ? 2 : 1);
    const typed = (cells[0] ?? '').trim();
    const size = asPatternSize(typed, options.sizes ?? []);
    if (size !== typed) relabelled.push(`${typed} → ${size}`);
    if (size === '') {
      errors.push(`Line ${line}: the first cell must be the size.`);
      return;
    }
    if (size.length > 40) errors.push(`Line ${line}: keep the size name to 40 characters.`);
    if (seen.has(size)) errors.push(`Line ${line}: size “${size}” appears twice.`);
    seen.add(size);
    if (header && cells.length - 1 > targets.length && cells.slice(targets.length + 1).some((c) => c !== '')) errors.push(`Line ${line} (size ${size}) has more cells than there are headings.`);
    const values: Record<string, number> = {};
    cells.slice(1).forEach((cell, j) => {
      const target = targets[j];
      if (!target) return;
      const read = readCell(cell, target.unit ?? options.unit);
      if ('error' in read) errors.push(`Line ${line} (size ${size}), ${target.column.label}: ${read.error}`);
      else if (read.mm !== undefined) values[target.column.key] = read.mm;
    });
    out.push({ size, values });
  });
  if (out.length === 0 && errors.length === 0) errors.push('Only headings were pasted: paste the rows of sizes too.');
  if (relabelled.length > 0) notes.push(`Sizes named as the pattern names them: ${relabelled.join(', ')}.`);
  return { columns: targets.filter((t) => t !== undefined).map((t) => t.column), rows: out, header, errors, notes };
}

/**
 * The draft with pasted rows put in: a pasted size's pasted columns take the new values (an empty
 * pasted cell clears the value), its other columns stay; a size not yet in the table is added
 * at the end.
 */
export function mergePasted(draft: SizeChartDraft, paste: PasteResult, kind: ChartKind): SizeChartDraft {
  const sizes = draft.sizes.map((s) => ({ ...s, garment: { ...s.garment }, body: { ...s.body } }));
  for (const row of paste.rows) {
    let target = sizes.find((s) => s.size === row.size);
    if (!target) {
      target = { size: row.size, garment: {}, body: {} };
      sizes.push(target);
    }
    const measures = kind === 'garment' ? target.garment : target.body;
    for (const column of paste.columns) {
      const v = row.values[column.key];
      if (v === undefined) delete measures[column.key];
      else measures[column.key] = v;
    }
  }
  return { ...draft, sizes };
}

// ---------------------------------------------------------------------------------------------
// Printed against measured

export interface CellDifference {
  readonly size: string;
  readonly key: GarmentKey;
  readonly printed: number;
  readonly measured: number;
  /** printed − measured (mm) */
  readonly difference: number;
  readonly tolerance: number;
  /** |difference| is over the tolerance */
  readonly over: boolean;
}

/** Rounding of the mm sent and read back must not tip a cell over the tolerance. */
const EPS = 1e-6;

/**
 * printed − measured for every cell that both charts have (sizes matched by name), with the
 * tolerance of its kind (girth: FIT_GIRTH_TOLERANCE, length: FIT_LENGTH_TOLERANCE).
 */
export function compareCharts(printed: ChartLike | SizeChartDraft, measured: ChartLike | null | undefined): Map<string, CellDifference> {
  const out = new Map<string, CellDifference>();
  if (!measured) return out;
  const bySize = new Map(measured.sizes.map((s) => [s.size.trim(), s.garment]));
  for (const s of printed.sizes) {
    const m = bySize.get(s.size.trim());
    if (!m) continue;
    for (const column of GARMENT_COLUMNS) {
      const p = s.garment[column.key];
      const q = m[column.key];
      if (p === undefined || q === undefined) continue;
      const difference = p - q;
      const tolerance = toleranceFor(column.kind);
      out.set(cellKey(s.size.trim(), column.key), { size: s.size.trim(), key: column.key, printed: p, measured: q, difference, tolerance, over: Math.abs(difference) > tolerance + EPS });
    }
  }
  return out;
}

export const cellKey = (size: string, key: string) => `${size}\u0000${key}`;

/** Sizes of the printed table that the pattern's pieces do not have (nothing to compare with). */
export function unmatchedSizes(printed: ChartLike | SizeChartDraft, measured: ChartLike | null | undefined): string[] {
  if (!measured) return [];
  const have = new Set(measured.sizes.map((s) => s.size.trim()));
  return printed.sizes.map((s) => s.size.trim()).filter((s) => s !== '' && !have.has(s));
}

/** A cell's value as shown: the number in the person's unit without the unit's name (the heading says it), or empty. */
export const showCell = (mm: number | undefined, unit: LengthUnit): string => (mm === undefined ? '' : formatLength(mm, unit).replace(/ (in|cm)$/, ''));

/** Whether any piece of a pattern (plain JSON as the server sends it) is drawn with its seam allowance. */
export function piecesIncludeSeamAllowance(pattern: unknown): boolean {
  const pieces = (pattern as { pieces?: unknown } | null)?.pieces;
  return Array.isArray(pieces) && pieces.some((p) => (p as { seamAllowanceIncluded?: unknown } | null)?.seamAllowanceIncluded === true);
}
