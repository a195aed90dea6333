/**
 * Size tables: the finished-garment measurements of each size at each level (and, when the
 * pattern prints it, the body chart), either typed from the printed table or computed from the
 * pattern's own geometry (`chartFromPattern`).
 *
 * Girths are what a tape reads round the finished garment at that level:
 * - `waist`, `hip`: round the whole garment (both legs' pieces: left and right);
 * - `thigh`, `knee`, `calf`, `hem`: round one leg, like the body's thigh, knee and calf girths,
 *   which ISO 8559-1 takes on one (the right) leg (trade reference §2.2).
 * Lengths: `frontRise`, `backRise` along the centre front/back seams and crotch curve (waist
 * to crotch point); `inseam` along the inseam (crotch point to hem); `crotchDepth` along the
 * grain from the waist at the side seam down to the crotch point (the garment's rise as the
 * body's seated rise is measured).
 */
import { z } from 'zod';
import { type Pattern, type Piece, landmarkOf, orderedOutlines } from '../model.ts';
import { asPatternSize, sizeNumber } from '../sizes.ts';
import { crotchLength, edgeLength, widthAtLevel } from '../measure.ts';
import { pieceGrain } from '../ops/common.ts';
import { BODY_MEASUREMENT_NAMES, FitInputError, describeZodError } from './body.ts';

/** Girth levels a size table may give. */
export const GIRTH_LEVELS = ['waist', 'hip', 'thigh', 'knee', 'calf', 'hem'] as const;
export type GirthLevel = (typeof GIRTH_LEVELS)[number];
/** Girths taken round the whole garment (both halves); the rest are round one leg. */
export const TRUNK_LEVELS: readonly GirthLevel[] = ['waist', 'hip'];
/** Lengths a size table may give. */
export const LENGTH_MEASURES = ['frontRise', 'backRise', 'inseam', 'crotchDepth'] as const;
export type LengthMeasure = (typeof LENGTH_MEASURES)[number];
export type GarmentMeasure = GirthLevel | LengthMeasure;

const mm = z.number({ error: 'must be a number of millimetres' }).positive('must be more than 0 mm').max(3000, 'must be 3 m or less');
// a blended outline's label names each level's size ("waist 2.5 · hip 7.7 · …"), so allow room for five
const label = z.string().trim().min(1, 'must not be empty').max(200);

export const garmentMeasuresSchema = z.object(Object.fromEntries([...GIRTH_LEVELS, ...LENGTH_MEASURES].map((k) => [k, mm.optional()])) as Record<GarmentMeasure, z.ZodOptional<typeof mm>>).strict();
export const chartBodySchema = z.object(Object.fromEntries(BODY_MEASUREMENT_NAMES.map((k) => [k, mm.optional()])) as Record<(typeof BODY_MEASUREMENT_NAMES)[number], z.ZodOptional<typeof mm>>).strict();

export const sizeChartSchema = z
  .object({
    name: z.string().trim().min(1).max(120).optional(),
    /** `printed`: typed from the pattern's table; `geometry`: measured on the pieces. */
    source: z.enum(['printed', 'geometry']).default('printed'),
    sizes: z
      .array(
        z
          .object({
            size: label,
            /** Finished-garment measurements (mm). */
            garment: garmentMeasuresSchema,
            /** The body measurements the pattern says this size is for (mm), when printed. */
            body: chartBodySchema.optional(),
          })
          .strict(),
      )
      .min(1, 'a size table needs at least one size')
      .max(60),
    /** What the numbers assume (how they were measured). */
    notes: z.array(z.string()).default([]),
  })
  .strict()
  .superRefine((c, ctx) => {
    const seen = new Set<string>();
    c.sizes.forEach((s, i) => {
      if (seen.has(s.size)) ctx.addIssue({ code: 'custom', path: ['sizes', i, 'size'], message: `size "${s.size}" appears twice` });
      seen.add(s.size);
    });
  });
export type SizeChartInput = z.input<typeof sizeChartSchema>;
export type SizeChart = z.output<typeof sizeChartSchema>;
export type ChartSize = SizeChart['sizes'][number];

/** Validate a size table; throws FitInputError with one line naming the field. */
export function parseSizeChart(input: unknown): SizeChart {
  const r = sizeChartSchema.safeParse(input);
  if (!r.success) throw new FitInputError(describeZodError('size table', r.error));
  return r.data;
}

/** The sizes smallest to largest: by number when every label is a number, else as listed. */
export function orderedChartSizes(chart: SizeChart): ChartSize[] {
  const nums = chart.sizes.map((s) => sizeNumber(s.size));
  if (nums.every((n) => n !== undefined)) return [...chart.sizes].sort((a, b) => sizeNumber(a.size)! - sizeNumber(b.size)!);
  return [...chart.sizes];
}

const round2 = (v: number): number => Math.round(v * 100) / 100;

/** How many of this piece a garment has (cut count, doubled when cut on the fold). */
const multiplicity = (p: Piece): number => p.cut.count * (p.cut.onFold ? 2 : 1);

/** The landmark name two edges of a piece share (e.g. the waist/side-seam corner). */
function sharedEnd(piece: Piece, roleA: string, roleB: string): string | undefined {
  const a = piece.edges.find((e) => e.role === roleA);
  const b = piece.edges.find((e) => e.role === roleB);
  if (!a || !b) return undefined;
  return [a.from, a.to].find((n) => n === b.from || n === b.to);
}

export interface ChartFromPatternOptions {
  /** Seam allowance (mm) that pieces marked `seamAllowanceIncluded` carry on each seam. */
  readonly seamAllowance?: number;
}

/**
 * Finished-garment measurements per size computed from the pattern's pieces.
 *
 * - Leg pieces are those with an `inseam` edge (front and back).
 * - Girth at a level line (hip, thigh, knee, calf) = Σ over leg pieces of the piece's width
 *   along that line (`widthAtLevel`), less 2 × seam allowance when the outline includes it,
 *   × the piece's cut count (2: left and right) for the hip (round the whole garment), × cut
 *   count / 2 for thigh, knee and calf (round one leg).
 * - Hem = Σ over leg pieces of the hem edge (less 2 × seam allowance) × cut count / 2.
 * - Waist = Σ over the pieces that have both a `waist` edge and a `side-seam` edge (the front
 *   legs, a yoke or the back legs) of the waist edge (less 2 × seam allowance) × cut count.
 *   Assumed: no darts or pleats are drawn open in the waist edge (their intake would have to be
 *   taken off; the format has no darts) and a separate waistband (a waist edge but no side
 *   seam) is left out: it is sewn onto that seam and its length includes the underlap.
 * - Front and back rise = the centre-front / centre-back and crotch-curve edges (`crotchLength`,
 *   a yoke's centre back included). Inseam = the inseam edge of the front leg piece.
 * - Crotch depth = along the grain from the waist/side-seam corner to the crotch point (the end
 *   the inseam and crotch curve share), on the leg piece that has a waist edge.
 * Lengths are along the outline as drawn; when it includes seam allowance they include the
 * allowance at their ends (said in `notes`).
 */
export function chartFromPattern(pattern: Pattern, options: ChartFromPatternOptions = {}): SizeChart {
  const legs = pattern.pieces.filter((p) => p.edges.some((e) => e.role === 'inseam'));
  if (legs.length === 0) throw new FitInputError('the pattern has no leg pieces: no piece has an edge with role "inseam"');
  const notes: string[] = [
    'Measured on the pattern pieces: hip round the whole garment, thigh, knee, calf and hem round one leg; waist from the waist edges of the pieces with a side seam (no darts or waistband).',
  ];
  const sa = (p: Piece): number => {
    if (!p.seamAllowanceIncluded) return 0;
    return options.seamAllowance ?? 0;
  };
  const withSa = pattern.pieces.filter((p) => p.seamAllowanceIncluded);
  if (withSa.length > 0) {
    if (options.seamAllowance === undefined)
      notes.push(`Pieces ${withSa.map((p) => `"${p.name}"`).join(', ')} include seam allowance, but no width was given: the girths include it.`);
    else notes.push(`Seam allowance of ${options.seamAllowance} mm taken off each side of ${withSa.map((p) => `"${p.name}"`).join(', ')}; lengths still include it at their ends.`);
  }
  const sizes = orderedOutlines(legs[0]!)
    .map((o) => o.size)
    .filter((s) => legs.every((p) => p.outlines.some((o) => o.size === s)));
  if (sizes.length === 0) throw new FitInputError('the leg pieces share no size');
  const waistPieces = pattern.pieces.filter((p) => p.edges.some((e) => e.role === 'waist') && p.edges.some((e) => e.role === 'side-seam'));
  const front = legs.find((p) => p.edges.some((e) => e.role === 'centre-front')) ?? legs[0]!;
  const depthPiece = legs.find((p) => p.edges.some((e) => e.role === 'waist'));
  const crotch = new Map(crotchLength(pattern).map((c) => [c.size, c]));
  const has = (p: Piece, size: string) => p.outlines.some((o) => o.size === size);

  const chartSizes = sizes.map((size) => {
    const g: Partial<Record<GarmentMeasure, number>> = {};
    const levelSum = (level: string): number | undefined => {
      let total = 0;
      for (const p of legs) {
        let w: number;
        try {
          w = widthAtLevel(p, size, level);
        } catch {
          return undefined; // a leg piece without that level: no measurement at it
        }
        if (w <= 0) return undefined;
        total += (w - 2 * sa(p)) * multiplicity(p);
      }
      return total;
    };
    const hip = levelSum('hip');
    if (hip !== undefined) g.hip = round2(hip);
    for (const level of ['thigh', 'knee', 'calf'] as const) {
      const v = levelSum(level);
      if (v !== undefined) g[level] = round2(v / 2);
    }
    if (legs.every((p) => p.edges.some((e) => e.role === 'hem'))) g.hem = round2(legs.reduce((s, p) => s + (edgeLength(p, size, 'hem')! - 2 * sa(p)) * multiplicity(p), 0) / 2);
    if (waistPieces.length > 0 && waistPieces.every((p) => has(p, size))) g.waist = round2(waistPieces.reduce((s, p) => s + (edgeLength(p, size, 'waist')! - 2 * sa(p)) * multiplicity(p), 0));
    const c = crotch.get(size);
    if (c && c.front > 0) g.frontRise = round2(c.front);
    if (c && c.back > 0) g.backRise = round2(c.back);
    const inseam = edgeLength(front, size, 'inseam');
    if (inseam !== undefined) g.inseam = round2(inseam);
    if (depthPiece) {
      const top = sharedEnd(depthPiece, 'waist', 'side-seam');
      const fork = sharedEnd(depthPiece, 'inseam', 'crotch-curve');
      const outline = depthPiece.outlines.find((o) => o.size === size)!;
      const a = top ? landmarkOf(outline, top) : undefined;
      const b = fork ? landmarkOf(outline, fork) : undefined;
      if (a && b) {
        const grain = pieceGrain(depthPiece);
        const depth = (b.x - a.x) * grain.x + (b.y - a.y) * grain.y;
        if (depth > 0) g.crotchDepth = round2(depth);
      }
    }
    return { size, garment: g };
  });
  return parseSizeChart({ name: pattern.name ? `${pattern.name} (measured)` : undefined, source: 'geometry', sizes: chartSizes, notes });
}

/**
 * The table with each size labelled as the pattern labels it when the two are written
 * differently ("Size 08" → "8", "xl" → "XL"; see `matchSizeLabel`). A label the pattern has
 * exactly, or matches no size or several, stays; so does one whose pattern label another row
 * already uses. The measurements are never changed. The same object when nothing is relabelled.
 */
export function alignChartSizes(chart: SizeChart, sizes: readonly string[]): SizeChart {
  const taken = new Set(chart.sizes.filter((s) => sizes.includes(s.size)).map((s) => s.size));
  let changed = false;
  const out = chart.sizes.map((s) => {
    const to = asPatternSize(s.size, sizes, taken);
    if (to === s.size) return s;
    taken.add(to);
    changed = true;
    return { ...s, size: to };
  });
  return changed ? { ...chart, sizes: out } : chart;
}

/**
 * A printed table with its gaps filled from another (the one measured on the pieces): for each
 * size both tables have, a finished measurement the printed table leaves out is taken from the
 * other, and `notes` says which. The sizes are matched as `alignChartSizes` matches them (and
 * take the measured table's labels); the printed numbers themselves are never changed.
 */
export function fillChartGaps(printedAsTyped: SizeChart, measured: SizeChart): SizeChart {
  const printed = alignChartSizes(printedAsTyped, measured.sizes.map((m) => m.size));
  const filled = new Map<string, string[]>();
  const sizes = printed.sizes.map((s) => {
    const other = measured.sizes.find((m) => m.size === s.size);
    if (!other) return s;
    const garment = { ...s.garment };
    for (const k of [...GIRTH_LEVELS, ...LENGTH_MEASURES]) {
      if (garment[k] === undefined && other.garment[k] !== undefined) {
        garment[k] = other.garment[k];
        filled.set(k, [...(filled.get(k) ?? []), s.size]);
      }
    }
    return { ...s, garment };
  });
  if (filled.size === 0) return printed;
  const words = [...filled].map(([k, on]) => `${k} (size${on.length > 1 ? 's' : ''} ${on.join(', ')})`).join('; ');
  return { ...printed, sizes, notes: [...printed.notes, `Not in the printed table, measured on the pieces: ${words}.`] };
}
