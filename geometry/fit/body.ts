/**
 * Fit planner inputs about the wearer and the cloth: a body-measurement profile and a fabric.
 * Everything is in millimetres (lengths, girths) and percent (stretch, recovery, shrinkage);
 * conversions to inches or ounces happen at the edges.
 *
 * Measurement names follow ISO 8559-1 (trade reference §2.2) and are the very keys of the
 * server's profile schema, so a stored profile reads as it is. `girthsAtHeights` adds the
 * girth at chosen heights above (+) or below (−) the natural waist, for a waistband that will
 * sit higher or lower than the waist.
 */
import { z } from 'zod';
import { MAX_SHRINKAGE } from '../tolerance.ts';

/** ISO 8559-1 body measurements a profile may hold (the same keys as the server's profiles). */
export const BODY_MEASUREMENT_NAMES = [
  'waistGirth',
  'hipGirth',
  'thighGirth',
  'kneeGirth',
  'calfGirth',
  'ankleGirth',
  'bodyRise',
  'totalCrotchLength',
  'insideLegLength',
  'outsideLegLength',
  'height',
] as const;
export type BodyMeasurementName = (typeof BODY_MEASUREMENT_NAMES)[number];

const mm = z.number({ error: 'must be a number of millimetres' }).positive('must be more than 0 mm').max(3000, 'must be 3 m or less');

/** The girth of the body at a height measured from the natural waist: + above, − below. */
export const girthAtHeightSchema = z.object({
  offset: z
    .number({ error: 'must be a number of millimetres' })
    .min(-400, 'must be within 400 mm of the waist')
    .max(400, 'must be within 400 mm of the waist')
    .refine((v) => v !== 0, 'offset 0 is the natural waist: give it as waistGirth'),
  girth: mm,
});
export type GirthAtHeight = z.infer<typeof girthAtHeightSchema>;

/** Girths at heights: at most 40, each height once (the server's profiles use the same rule). */
export const girthsAtHeightsSchema = z
  .array(girthAtHeightSchema, { error: 'girthsAtHeights must be a list of { offset, girth }' })
  .max(40, 'keep to 40 girths at heights')
  .superRefine((rows, ctx) => {
    const seen = new Set<number>();
    rows.forEach((g, i) => {
      if (seen.has(g.offset)) ctx.addIssue({ code: 'custom', path: [i, 'offset'], message: `the height ${g.offset} mm is given twice` });
      seen.add(g.offset);
    });
  });

const profileShape = z
  .object({
    name: z.string().trim().min(1).max(80).optional(),
    ...Object.fromEntries(BODY_MEASUREMENT_NAMES.map((n) => [n, mm.optional()])),
    girthsAtHeights: girthsAtHeightsSchema.default([]),
  })
  .strict();

/**
 * A measurement profile. Accepts the flat form `{ waistGirth, …, girthsAtHeights }` or the
 * server's stored form `{ name, measurements: { waistGirth, … }, girthsAtHeights }`.
 */
export const bodyProfileSchema = z.preprocess((input) => {
  if (input && typeof input === 'object' && !Array.isArray(input) && 'measurements' in input) {
    const { measurements, ...rest } = input as { measurements: unknown } & Record<string, unknown>;
    // only the fields the planner reads; the server's id and dates are left behind
    const keep = Object.fromEntries(Object.entries(rest).filter(([k]) => k === 'name' || k === 'girthsAtHeights'));
    return measurements && typeof measurements === 'object' ? { ...keep, ...(measurements as object) } : input;
  }
  return input;
}, profileShape);
export type BodyProfile = { name?: string; girthsAtHeights: GirthAtHeight[] } & Partial<Record<BodyMeasurementName, number>>;

// ---------------------------------------------------------------------------------------------
// Fabric

/** 1 international avoirdupois ounce = 28.349 523 125 g exactly (1 lb = 0.453 592 37 kg, 16 oz). */
export const GRAMS_PER_OUNCE = 28.349523125;
/** 1 international square yard = 0.836 127 36 m² exactly (1 yd = 0.9144 m). */
export const SQUARE_METRES_PER_SQUARE_YARD = 0.83612736;
/** 1 oz/yd² in g/m²: 33.906 (33.905 747 5…), trade reference §4.5. */
export const GSM_PER_OZ_PER_SQ_YD = GRAMS_PER_OUNCE / SQUARE_METRES_PER_SQUARE_YARD;

export const ozPerSqYdToGsm = (oz: number): number => oz * GSM_PER_OZ_PER_SQ_YD;
export const gsmToOzPerSqYd = (gsm: number): number => gsm / GSM_PER_OZ_PER_SQ_YD;

/** Two weights of the same cloth (g/m² and oz/yd²) must agree within this fraction. */
export const WEIGHT_AGREEMENT = 0.01;

const percent = (max: number) => z.number({ error: 'must be a number (percent)' }).min(0, 'must be 0 % or more').max(max, `must be ${max} % or less`);

/** Stretch as a percent, or as a hand test: `relaxed` length and `stretched` length (§4.2). */
const stretchSchema = z.union([
  percent(300),
  z
    .object({ relaxed: mm, stretched: mm })
    .strict()
    .refine((t) => t.stretched >= t.relaxed, 'the stretched length must be at least the relaxed length'),
]);

/** Shrinkage as a percent (+ = the cloth gets shorter), or a wash test's `before`/`after` lengths (§4.4). */
const shrinkageSchema = z.union([
  z.number({ error: 'must be a number (percent)' }).min(-100 * MAX_SHRINKAGE).max(100 * MAX_SHRINKAGE),
  z
    .object({ before: mm, after: mm })
    .strict()
    .refine((t) => Math.abs(t.before - t.after) <= MAX_SHRINKAGE * t.before, `the wash test shows more than ${MAX_SHRINKAGE * 100} % change; check the numbers`),
]);

export const fabricSchema = z
  .object({
    name: z.string().trim().min(1).max(120).optional(),
    /** Stretch across the grain (weft), percent: what girths can borrow. */
    stretchAcross: stretchSchema.optional(),
    /** Stretch along the grain (warp), percent. */
    stretchAlong: stretchSchema.optional(),
    /** Recovery after stretching, percent (100 = springs fully back). */
    recovery: percent(100).optional(),
    /** Weight in g/m². */
    weightGsm: z.number().positive().max(2000).optional(),
    /** Weight in oz/yd². */
    weightOzPerSqYd: z.number().positive().max(60).optional(),
    /** Usable width of the cloth (mm). */
    width: mm.optional(),
    /** Shrinkage along the warp (lengthwise) and weft (crosswise). */
    shrinkage: z.object({ warp: shrinkageSchema.optional(), weft: shrinkageSchema.optional() }).strict().optional(),
    /** Already washed the way the garment will be: no shrinkage compensation is planned. */
    prewashed: z.boolean().default(false),
  })
  .strict()
  .superRefine((f, ctx) => {
    if (f.weightGsm !== undefined && f.weightOzPerSqYd !== undefined) {
      const fromOz = ozPerSqYdToGsm(f.weightOzPerSqYd);
      if (Math.abs(fromOz - f.weightGsm) > WEIGHT_AGREEMENT * f.weightGsm)
        ctx.addIssue({ code: 'custom', path: ['weightOzPerSqYd'], message: `${f.weightOzPerSqYd} oz/yd² is ${fromOz.toFixed(1)} g/m², which does not match ${f.weightGsm} g/m²` });
    }
  });
export type FabricInput = z.input<typeof fabricSchema>;
export type Fabric = z.output<typeof fabricSchema>;

/** Stretch percent from a hand test: 100 × (stretched − relaxed) / relaxed (§4.2). */
export function stretchPercent(relaxed: number, stretched: number): number {
  return (100 * (stretched - relaxed)) / relaxed;
}

/** Shrinkage percent from a wash test: −DC, DC = 100 × (after − before) / before (§4.4). */
export function shrinkagePercent(before: number, after: number): number {
  return (100 * (before - after)) / before;
}

/** A fabric with every value in one unit: stretch and shrinkage in percent, weight in both units. */
export interface FabricSummary {
  readonly stretchAcross: number;
  readonly stretchAlong: number;
  readonly recovery?: number;
  readonly weightGsm?: number;
  readonly weightOzPerSqYd?: number;
  readonly width?: number;
  /** Percent, + = the cloth gets shorter in that direction. */
  readonly shrinkageWarp: number;
  readonly shrinkageWeft: number;
  readonly prewashed: boolean;
}

const stretchValue = (s: z.infer<typeof stretchSchema> | undefined): number => (s === undefined ? 0 : typeof s === 'number' ? s : stretchPercent(s.relaxed, s.stretched));
const shrinkValue = (s: z.infer<typeof shrinkageSchema> | undefined): number => (s === undefined ? 0 : typeof s === 'number' ? s : shrinkagePercent(s.before, s.after));

/** Validate a fabric (throws ZodError) and bring every value to percent / both weight units. */
export function summarizeFabric(input: unknown): FabricSummary {
  const f = fabricSchema.parse(input);
  const gsm = f.weightGsm ?? (f.weightOzPerSqYd !== undefined ? ozPerSqYdToGsm(f.weightOzPerSqYd) : undefined);
  return {
    stretchAcross: stretchValue(f.stretchAcross),
    stretchAlong: stretchValue(f.stretchAlong),
    ...(f.recovery !== undefined ? { recovery: f.recovery } : {}),
    ...(gsm !== undefined ? { weightGsm: gsm, weightOzPerSqYd: f.weightOzPerSqYd ?? gsmToOzPerSqYd(gsm) } : {}),
    ...(f.width !== undefined ? { width: f.width } : {}),
    shrinkageWarp: shrinkValue(f.shrinkage?.warp),
    shrinkageWeft: shrinkValue(f.shrinkage?.weft),
    prewashed: f.prewashed,
  };
}

/**
 * The body girth at `offset` mm from the natural waist (+ above), from waistGirth (offset 0)
 * and girthsAtHeights, linearly between the two nearest measured heights. Outside the measured
 * heights it extrapolates from the two nearest (when there are two) and says so; undefined when
 * nothing measured can give it.
 */
export function girthAtOffset(profile: BodyProfile, offset: number): { girth: number; how: 'measured' | 'interpolated' | 'extrapolated' } | undefined {
  const pts = [...(profile.waistGirth !== undefined ? [{ offset: 0, girth: profile.waistGirth }] : []), ...profile.girthsAtHeights].sort((a, b) => a.offset - b.offset);
  const exact = pts.find((p) => p.offset === offset);
  if (exact) return { girth: exact.girth, how: 'measured' };
  if (pts.length < 2) return undefined;
  let i = pts.findIndex((p) => p.offset > offset) - 1;
  let how: 'interpolated' | 'extrapolated' = 'interpolated';
  if (i < 0) {
    how = 'extrapolated';
    i = offset < pts[0]!.offset ? 0 : pts.length - 2;
  }
  const a = pts[i]!;
  const b = pts[i + 1]!;
  return { girth: a.girth + ((offset - a.offset) * (b.girth - a.girth)) / (b.offset - a.offset), how };
}

/** Thrown for input the planner cannot use; `message` is one line saying what and where. */
export class FitInputError extends Error {
  override readonly name = 'FitInputError';
}

/** Format the first zod issue as `where: what` (and how many more). */
export function describeZodError(what: string, error: z.ZodError): string {
  const issues = error.issues;
  const first = issues[0]!;
  const where = first.path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '') || '(root)';
  return `invalid ${what}: ${where}: ${first.message}${issues.length > 1 ? ` (and ${issues.length - 1} more)` : ''}`;
}

/** Validate a profile; throws FitInputError with one line naming the field. */
export function parseBodyProfile(input: unknown): BodyProfile {
  const r = bodyProfileSchema.safeParse(input);
  if (!r.success) throw new FitInputError(describeZodError('profile', r.error));
  return r.data as BodyProfile;
}

/** Validate a fabric; throws FitInputError with one line naming the field. */
export function parseFabric(input: unknown): FabricSummary {
  const r = fabricSchema.safeParse(input);
  if (!r.success) throw new FitInputError(describeZodError('fabric', r.error));
  return summarizeFabric(r.data);
}
