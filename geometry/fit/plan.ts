/**
 * The fit planner: body measurements, a size table, ease and the cloth give a size at each
 * level and the alterations that make the pattern fit (issue 6).
 *
 * At each girth level (waist, hip, thigh, knee, calf):
 * 1. body girth B: the profile's girth; at the waist, the girth where the waistband will sit
 *    (`waistOffset` mm above (+) or below (−) the natural waist, from `girthsAtHeights`) —
 *    never the natural waist when the waistband sits elsewhere;
 * 2. comfort girth C = B + ease E (defaults per fit in EASE_DEFAULTS, each with its source);
 * 3. with crosswise stretch s (fraction) and a share k of it the garment may use
 *    (`stretchShare`, default 0.5: trade reference §4.3 "about ½ to ⅔", common practice), the
 *    garment may be smaller than C by r = min(k·s / (1 + k·s), 20 %): target T = C × (1 − r).
 *    This is §4.3's r = 1 − 1/(1 + k·s) applied to the comfort girth: stretched by k·s the
 *    garment reaches C. Applied to C rather than B it gives §4.3's typical 0–5 % below the
 *    body at the hip for 10–25 % stretch denim. The 20 % cap is §4.3's upper end for
 *    high-stretch knits (common practice, no source). Rigid cloth: T = C;
 * 4. the size whose finished measurement equals T, linear in the size number between the two
 *    neighbouring sizes (the blend operation interpolates the same way); below the smallest or
 *    above the largest size, extrapolated from the nearest grade step, at most one step (an
 *    estimate, with a caution); beyond that the size stops there and a girth change takes the
 *    rest. Sizes are rounded to 0.1 of a size number. Tables whose labels are not all numbers
 *    can only take a printed size: the smallest that reaches T (else the largest);
 * 5. any garment girth outside the band [T, C] by more than FIT_GIRTH_TOLERANCE (a size the
 *    person chose in `sizes`, a printed-only table, a size stopped at the limit) becomes a
 *    `girth` change on the side seams at that level.
 *
 * Lengths: a `rise` change = body rise + rise ease + waistOffset − the pattern's crotch depth;
 * a `lengthen` change = inside leg length + `inseamOffset` − the pattern's inseam, split evenly
 * between the pattern's lengthen/shorten lines (§3.2). Both are measured on the blended pattern
 * when there is one; from a table alone they are read at the size chosen at the hip (rise;
 * §3.9: the crotch comes from the hip size) and at the thigh (inseam), an estimate. Shrinkage from the
 * fabric's wash test becomes a `shrinkage` change, last (§4.4: compensate after the other
 * changes, before seam allowance).
 *
 * Pure and deterministic: the same input gives the same plan.
 */
import { z } from 'zod';
import { type Pattern, type Piece, parsePattern, patternSizes } from '../model.ts';
import { sizeNumber } from '../sizes.ts';
import type { AlterationOp } from '../ops/apply.ts';
import { applyOps } from '../ops/apply.ts';
import { type LengthUnit, formatLength } from '../units.ts';
import { type BodyProfile, type FabricSummary, FitInputError, describeZodError, girthAtOffset, parseBodyProfile, parseFabric } from './body.ts';
import { type ChartSize, type GarmentMeasure, type SizeChart, alignChartSizes, chartFromPattern, orderedChartSizes, parseSizeChart } from './chart.ts';
import { noteCorrections, parseFitNote } from './notes.ts';

/** The levels the planner sizes, top to bottom. The hem is a style choice, not fitted to the body. */
export const FIT_LEVELS = ['waist', 'hip', 'thigh', 'knee', 'calf'] as const;
export type FitLevel = (typeof FIT_LEVELS)[number];
export const FITS = ['close', 'regular', 'relaxed'] as const;
export type Fit = (typeof FITS)[number];

const BODY_KEY: Record<FitLevel, 'waistGirth' | 'hipGirth' | 'thighGirth' | 'kneeGirth' | 'calfGirth'> = {
  waist: 'waistGirth',
  hip: 'hipGirth',
  thigh: 'thighGirth',
  knee: 'kneeGirth',
  calf: 'calfGirth',
};
const TRUNK: readonly FitLevel[] = ['waist', 'hip'];

export interface EaseDefault {
  /** mm added to the body measurement */
  readonly mm: number;
  /** where the number comes from */
  readonly source: string;
}

const EIC = 'EIC "Ease in Clothing" (trade reference §4.1) [confirmed there]';
const CP41 = 'common practice, no source (trade reference §4.1 working values)';
const MEMORY = 'from memory (no source at hand)';
const AASD = 'AASD §9.4.3 minimum seated-rise ease (trade reference §4.1) [confirmed there]';

/**
 * Default wearing ease (mm) for woven, non-stretch trousers, per fit and level, with the source
 * of each number. EIC: waist ¾–1 in, skirts and pants ½–¾ in at the waist, seat 1½–2 in, hips
 * 2–2¾ in for all garments, thigh at least 1 in. Working values (common practice): thigh 5–8 cm,
 * knee 5+ cm. AASD: seated rise 0–0.5 cm (women), 1–1.5 cm (men). Calf and the close/relaxed
 * knee are from memory.
 */
export const EASE_DEFAULTS: Record<Fit, Record<FitLevel | 'rise', EaseDefault>> = {
  close: {
    waist: { mm: 12.7, source: `${EIC}: ½ in, low end for pants` },
    hip: { mm: 38.1, source: `${EIC}: 1½ in, low end for the seat` },
    thigh: { mm: 25.4, source: `${EIC}: at least 1 in` },
    knee: { mm: 38, source: MEMORY },
    calf: { mm: 25, source: MEMORY },
    rise: { mm: 0, source: `${AASD}: 0 cm, low end` },
  },
  regular: {
    waist: { mm: 19.05, source: `${EIC}: ¾ in` },
    hip: { mm: 50.8, source: `${EIC}: 2 in, high end for the seat` },
    thigh: { mm: 50, source: `${CP41}: 5 cm, low end of 5–8 cm` },
    knee: { mm: 50, source: `${CP41}: 5 cm` },
    calf: { mm: 40, source: MEMORY },
    rise: { mm: 5, source: `${AASD}: 0.5 cm` },
  },
  relaxed: {
    waist: { mm: 25.4, source: `${EIC}: 1 in, high end` },
    hip: { mm: 69.85, source: `${EIC}: 2¾ in, high end for hips` },
    thigh: { mm: 80, source: `${CP41}: 8 cm, high end of 5–8 cm` },
    knee: { mm: 80, source: MEMORY },
    calf: { mm: 70, source: MEMORY },
    rise: { mm: 15, source: `${AASD}: 1.5 cm, high end` },
  },
};

/** A garment girth within this of the band [target, comfort] needs no change (¼ in; common practice, no source). */
export const FIT_GIRTH_TOLERANCE = 6.35;
/** Length changes smaller than this are not planned (⅛ in; common practice, no source). */
export const FIT_LENGTH_TOLERANCE = 3.175;
/** At most this many grade steps beyond the printed sizes are extrapolated. */
export const MAX_EXTRAPOLATION_STEPS = 1;
/** Largest share of the comfort girth stretch may stand in for (§4.3, upper end for high-stretch knits). */
export const MAX_STRETCH_REDUCTION = 0.2;
/** Sizes are rounded to this fraction of a size number. */
export const SIZE_RESOLUTION = 0.1;
/** Shrinkage below this (percent) is not compensated. */
export const MIN_SHRINKAGE = 0.5;
/** Above this shrinkage (percent) pre-washing is advised (§4.4: industry builds in up to about 7–8 %). */
export const PREWASH_ABOVE = 7;
/** Default share of the cloth's stretch the garment may use (§4.3 "about ½ to ⅔"; common practice). */
export const DEFAULT_STRETCH_SHARE = 0.5;

const levelRecord = <T extends z.ZodType>(t: T) => z.object(Object.fromEntries(FIT_LEVELS.map((l) => [l, t.optional()])) as Record<FitLevel, z.ZodOptional<T>>).strict();

export const planOptionsSchema = z
  .object({
    fit: z.enum(FITS).default('regular'),
    /** Ease (mm) per level, and `rise`, in place of the defaults. */
    ease: levelRecord(z.number().min(-200).max(400))
      .extend({ rise: z.number().min(-50).max(100).optional() })
      .strict()
      .default({}),
    /** Share (0–1) of the crosswise stretch the garment may use instead of ease. */
    stretchShare: z.number().min(0).max(1).default(DEFAULT_STRETCH_SHARE),
    /** Where the waist seam will sit: mm above (+) or below (−) the natural waist. */
    waistOffset: z.number().min(-300).max(300).default(0),
    /** Finished inseam = inside leg length + this (mm); negative for a shorter leg. */
    inseamOffset: z.number().min(-800).max(200).default(0),
    /** Sizes the person has chosen at some levels (the planner checks them instead of choosing). */
    sizes: levelRecord(z.union([z.string().trim().min(1), z.number()]).transform(String)).default({}),
    /** Unit of the lengths in the reasons. */
    unit: z.enum(['in', 'cm']).default('cm'),
    /** Seam allowance (mm) of pieces whose outline includes it, when the table is measured on the pattern. */
    seamAllowance: z.number().min(0).max(100).optional(),
  })
  .strict();
export type PlanOptions = z.input<typeof planOptionsSchema>;

export interface PlanInput extends PlanOptions {
  readonly profile: unknown;
  /** A size table; without one it is measured on `pattern`. */
  readonly chart?: unknown;
  readonly fabric?: unknown;
  readonly pattern?: unknown;
  /** The fit note of the make this one repeats ("sew it again"), and that make's name. */
  readonly previous?: { readonly note: unknown; readonly makeName?: string };
  /** The make's alterations now, to measure the garment before the plan (needs `pattern`). */
  readonly current?: readonly AlterationOp[];
}

/** Finished girths (mm) of one garment at the planned levels. */
export interface GarmentGirths {
  /** What was measured, e.g. "size 8" or "your alterations now". */
  readonly label: string;
  readonly measures: Partial<Record<FitLevel, number>>;
}

export type Confidence = 'high' | 'medium' | 'low';

export interface PlannedLevel {
  readonly level: FitLevel;
  /** Body girth used (mm); at the waist, at the waistband's height. */
  readonly body: number;
  /** How the body girth was found. */
  readonly bodyFrom: 'measured' | 'interpolated' | 'extrapolated';
  /** Height of that girth above the natural waist (mm); 0 except at a raised or lowered waist. */
  readonly offset: number;
  readonly ease: number;
  readonly easeSource: string;
  /** Share of the comfort girth the stretch stands in for (0 for rigid cloth). */
  readonly stretchReduction: number;
  /** Finished girth aimed at (mm). */
  readonly target: number;
  /** Body + ease: the girth that fits in rigid cloth (the top of the band). */
  readonly comfort: number;
  readonly size: string;
  readonly sizeFrom: 'planned' | 'chosen';
  /** Finished girth of the pattern at that size (mm). */
  readonly garmentAtSize: number;
  /** Girth change still needed after the size (mm round the garment or leg; 0 = none). */
  readonly change: number;
  readonly reason: string;
  readonly confidence: Confidence;
  /**
   * The size the table's printed body chart gives for this body at this level (the pattern's
   * own ease assumed), when the table has a body chart there: to compare with `size`.
   */
  readonly bodyChartSize?: string;
  /** Ease (mm, + more) the earlier make's fit note added here; absent when it added none. */
  readonly fromNote?: number;
}

export interface PlanStep {
  readonly op: AlterationOp;
  readonly reason: string;
  readonly confidence: Confidence;
  /** True when the earlier make's fit note changed this step. */
  readonly fromNote?: true;
}

const noteFlag = (changed: boolean): { fromNote?: true } => (changed ? { fromNote: true } : {});

export interface FitPlan {
  readonly units: 'mm';
  readonly fit: Fit;
  readonly levels: PlannedLevel[];
  /** The alterations, in the order to apply them (the same as steps[].op). */
  readonly ops: AlterationOp[];
  readonly steps: PlanStep[];
  readonly cautions: string[];
  /** The size table used (measured on the pattern when none was given). */
  readonly chart: SizeChart;
  readonly fabric?: FabricSummary;
  /**
   * The garment before the plan (the make's alterations now when they blend to one size, else
   * the printed size nearest the hip size) and after it (the plan's changes made on the
   * pattern, without the shrinkage allowance: the garment as worn), measured on the pieces.
   * Null when there is no pattern or it cannot be measured.
   */
  readonly garment: { readonly before: GarmentGirths | null; readonly after: GarmentGirths | null };
  /** What the earlier make's fit note changed in this plan, one line each. */
  readonly fromPrevious: string[];
}

interface Pt {
  readonly x: number;
  readonly y: number;
}

/** y at x on the polyline through pts (sorted by x), extended along the end steps. */
function valueAt(pts: readonly Pt[], x: number): number {
  if (pts.length === 1) return pts[0]!.y;
  let i = 0;
  while (i < pts.length - 2 && x > pts[i + 1]!.x) i++;
  const a = pts[i]!;
  const b = pts[i + 1]!;
  return a.y + ((x - a.x) * (b.y - a.y)) / (b.x - a.x);
}

/** x where the increasing polyline through pts reaches y, extended along the end steps. */
function sizeAt(pts: readonly Pt[], y: number): number {
  let i = 0;
  while (i < pts.length - 2 && y > pts[i + 1]!.y) i++;
  const a = pts[i]!;
  const b = pts[i + 1]!;
  return a.x + ((y - a.y) * (b.x - a.x)) / (b.y - a.y);
}

/** Grade steps beyond the printed range (0 inside). */
function stepsBeyond(pts: readonly Pt[], x: number): number {
  const n = pts.length;
  if (n < 2) return 0;
  if (x < pts[0]!.x) return (pts[0]!.x - x) / (pts[1]!.x - pts[0]!.x);
  if (x > pts[n - 1]!.x) return (x - pts[n - 1]!.x) / (pts[n - 1]!.x - pts[n - 2]!.x);
  return 0;
}

const round1 = (v: number): number => {
  const r = Math.round(v * 10) / 10;
  return r === 0 ? 0 : r;
};
const roundSize = (x: number): number => {
  const r = Math.round(x / SIZE_RESOLUTION) * SIZE_RESOLUTION;
  const t = Math.round(r * 1e6) / 1e6;
  return t === 0 ? 0 : t;
};
const round2 = (v: number): number => Math.round(v * 100) / 100;
const pct = (f: number): string => `${Math.round(f * 1000) / 10} %`;

interface SizeScale {
  readonly numeric: boolean;
  readonly sizes: readonly ChartSize[];
  /** size number (or position for printed-only labels) of each size */
  readonly values: readonly number[];
}

function scaleOf(chart: SizeChart): SizeScale {
  const sizes = orderedChartSizes(chart);
  const nums = sizes.map((s) => sizeNumber(s.size));
  const numeric = nums.every((n) => n !== undefined);
  return { numeric, sizes, values: numeric ? (nums as number[]) : sizes.map((_, i) => i) };
}

/** The label for a size value: the printed label when it is one, else the number. */
function labelOf(scale: SizeScale, x: number): string {
  const i = scale.values.findIndex((v) => Math.abs(v - x) < 1e-9);
  if (i >= 0) return scale.sizes[i]!.size;
  return String(x);
}

function pointsFor(scale: SizeScale, measure: GarmentMeasure): Pt[] {
  const out: Pt[] = [];
  scale.sizes.forEach((s, i) => {
    const y = s.garment[measure];
    if (y !== undefined) out.push({ x: scale.values[i]!, y });
  });
  return out;
}

/** Side-seam edges that one girth change at a level moves, counted round the measured girth. */
function sideEdges(level: FitLevel, pattern: Pattern | undefined): number {
  if (!pattern) return TRUNK.includes(level) ? 4 : 2;
  const m = (p: Piece) => p.cut.count * (p.cut.onFold ? 2 : 1);
  const side = (p: Piece) => p.edges.some((e) => e.role === 'side-seam');
  if (level === 'waist') return pattern.pieces.filter((p) => side(p) && p.edges.some((e) => e.role === 'waist')).reduce((s, p) => s + m(p), 0);
  const legs = pattern.pieces.filter((p) => side(p) && p.edges.some((e) => e.role === 'inseam') && p.lines.some((l) => l.role === 'level' && l.name === level));
  const n = legs.reduce((s, p) => s + m(p), 0);
  return TRUNK.includes(level) ? n : n / 2;
}

function parseOrThrow<T>(what: string, schema: z.ZodType<T>, input: unknown): T {
  const r = schema.safeParse(input);
  if (!r.success) throw new FitInputError(describeZodError(what, r.error));
  return r.data;
}

/**
 * Plan the fit (see the module comment). Throws FitInputError (one line) for input it cannot
 * use; everything it can still plan around becomes a caution.
 */
export function planFit(input: PlanInput): FitPlan {
  const { profile: profileInput, chart: chartInput, fabric: fabricInput, pattern: patternInput, previous: _previous, current: _current, ...rest } = input;
  const opts = parseOrThrow('plan options', planOptionsSchema, rest);
  const profile: BodyProfile = parseBodyProfile(profileInput);
  const fabric = fabricInput === undefined ? undefined : parseFabric(fabricInput);
  let pattern: Pattern | undefined;
  if (patternInput !== undefined) {
    try {
      pattern = parsePattern(patternInput);
    } catch (e) {
      throw new FitInputError(e instanceof Error ? e.message : String(e));
    }
  }
  if (chartInput === undefined && pattern === undefined) throw new FitInputError('give a size table or a pattern to measure');
  // a typed table's sizes take the pattern's labels ("Size 08" → "8"), so the blend names sizes the pattern has
  const chart = chartInput !== undefined ? (pattern ? alignChartSizes(parseSizeChart(chartInput), patternSizes(pattern)) : parseSizeChart(chartInput)) : chartFromPattern(pattern!, opts.seamAllowance !== undefined ? { seamAllowance: opts.seamAllowance } : {});
  const scale = scaleOf(chart);
  const unit: LengthUnit = opts.unit;
  const L = (v: number): string => formatLength(v, unit);
  const cautions: string[] = [];
  const caution = (c: string): void => {
    if (!cautions.includes(c)) cautions.push(c);
  };

  const note = input.previous === undefined ? undefined : parseFitNote(input.previous.note);
  const corrections = note ? noteCorrections(note) : undefined;
  const noteFrom = input.previous?.makeName ? `“${input.previous.makeName}”` : 'your last make';
  const fromPrevious: string[] = [];
  if (corrections)
    for (const u of corrections.unsized) caution(`The note on ${noteFrom} says the ${u} but not by how much: the plan could not allow for it. Add the amount to the note, or change the ease by hand.`);
  if (note && note.nextTime !== '') caution(`Your note on ${noteFrom}: “${note.nextTime}”`);

  const stretch = fabric ? fabric.stretchAcross / 100 : 0;
  const ks = opts.stretchShare * stretch;
  const reduction = Math.min(ks / (1 + ks), MAX_STRETCH_REDUCTION);

  const levels: PlannedLevel[] = [];
  const chosenX = new Map<FitLevel, number>();
  for (const level of FIT_LEVELS) {
    const pts = pointsFor(scale, level);
    // the body girth at this level
    let body: number | undefined;
    let bodyFrom: PlannedLevel['bodyFrom'] = 'measured';
    const offset = level === 'waist' ? opts.waistOffset : 0;
    if (level === 'waist' && offset !== 0) {
      const g = girthAtOffset(profile, offset);
      if (!g) {
        caution(
          `The waistband is to sit ${L(Math.abs(offset))} ${offset > 0 ? 'above' : 'below'} the natural waist, but the profile has no girths at heights to find the girth there: the waist size was not planned (it must not be taken at the natural waist). Measure the girth where the waistband will sit.`,
        );
        continue;
      }
      body = g.girth;
      bodyFrom = g.how;
    } else body = profile[BODY_KEY[level]];
    if (body === undefined) {
      if (pts.length > 0) caution(`The profile has no ${level} girth: the ${level} was not planned.`);
      continue;
    }
    if (pts.length === 0) {
      caution(`The size table has no finished ${level} measurement: the ${level} was not planned.`);
      continue;
    }
    const rising = pts.every((p, i) => i === 0 || p.y > pts[i - 1]!.y);
    if (!rising) {
      caution(`The size table's finished ${level} does not grow with the size: the ${level} was not planned. Check the table.`);
      continue;
    }
    const easeDefault = EASE_DEFAULTS[opts.fit][level];
    const fromNote = corrections?.girth[level] ?? 0;
    const ease = (opts.ease[level] ?? easeDefault.mm) + fromNote;
    let easeSource = opts.ease[level] !== undefined ? 'your setting' : easeDefault.source;
    if (fromNote !== 0) {
      const line = `${level[0]!.toUpperCase()}${level.slice(1)}: ${noteFrom} was ${L(Math.abs(fromNote))} too ${fromNote > 0 ? 'tight' : 'loose'} there, so the ease is ${L(Math.abs(fromNote))} ${fromNote > 0 ? 'more' : 'less'}.`;
      easeSource = `${easeSource}, ${fromNote > 0 ? '+' : '−'} ${L(Math.abs(fromNote))} from the note on ${noteFrom}`;
      fromPrevious.push(line);
    }
    const comfort = body + ease;
    const target = comfort * (1 - reduction);

    // the size
    let x: number;
    let sizeFrom: PlannedLevel['sizeFrom'] = 'planned';
    let stopped = false;
    const pinned = opts.sizes[level];
    if (pinned !== undefined) {
      sizeFrom = 'chosen';
      const i = scale.sizes.findIndex((s) => s.size === pinned);
      if (i >= 0) x = scale.values[i]!;
      else if (scale.numeric && sizeNumber(pinned) !== undefined) x = sizeNumber(pinned)!;
      else throw new FitInputError(`size "${pinned}" chosen at the ${level} is not in the size table (${scale.sizes.map((s) => s.size).join(', ')})`);
    } else if (pts.length === 1) {
      x = pts[0]!.x;
    } else if (scale.numeric) {
      const exact = sizeAt(pts, target);
      const lo = pts[0]!.x - MAX_EXTRAPOLATION_STEPS * (pts[1]!.x - pts[0]!.x);
      const hi = pts[pts.length - 1]!.x + MAX_EXTRAPOLATION_STEPS * (pts[pts.length - 1]!.x - pts[pts.length - 2]!.x);
      x = roundSize(Math.min(hi, Math.max(lo, exact)));
      stopped = exact < lo || exact > hi;
    } else {
      const reach = pts.find((p) => p.y >= target - FIT_GIRTH_TOLERANCE);
      x = (reach ?? pts[pts.length - 1]!).x;
    }
    const garment = valueAt(pts, x);
    const beyond = stepsBeyond(pts, x);
    const size = scale.numeric ? labelOf(scale, x) : scale.sizes[x]!.size;
    chosenX.set(level, x);
    // what the size still misses: outside the band [target, comfort]
    const miss = garment < target ? target - garment : garment > comfort ? comfort - garment : 0;
    const change = Math.abs(miss) > FIT_GIRTH_TOLERANCE ? round1(miss) : 0;

    let confidence: Confidence = 'high';
    if (beyond > 0 || bodyFrom === 'interpolated' || change !== 0 || pts.length === 1) confidence = 'medium';
    if (stopped || bodyFrom === 'extrapolated' || beyond > MAX_EXTRAPOLATION_STEPS) confidence = 'low';

    const where =
      level === 'waist' && offset !== 0
        ? `where the waistband sits, ${L(Math.abs(offset))} ${offset > 0 ? 'above' : 'below'} the natural waist, the body measures ${L(body)}${bodyFrom === 'measured' ? '' : ` (${bodyFrom} from the girths at heights)`}`
        : `body ${L(body)}`;
    const stretchWords = reduction > 0 ? `, less ${pct(reduction)} for the cloth's ${Math.round(stretch * 1000) / 10} % stretch (${pct(opts.stretchShare)} of it used) = ${L(target)}` : '';
    const sizeWords =
      change === 0
        ? `size ${size} measures ${L(garment)}${reduction > 0 && garment > target + FIT_GIRTH_TOLERANCE ? ', within what the stretch absorbs' : ''}`
        : `size ${size} measures ${L(garment)}, ${L(Math.abs(change))} too ${change > 0 ? 'small' : 'big'}: ${change > 0 ? 'let out' : 'take in'} ${L(Math.abs(change))}`;
    const easeWords = fromNote !== 0 ? `${L(ease)} ease (${fromNote > 0 ? 'with' : 'less'} ${L(Math.abs(fromNote))} for the note on ${noteFrom})` : `${L(ease)} ease`;
    const bodyChartSize = scale.numeric ? sizeByBodyChart(scale, BODY_KEY[level], body) : undefined;
    const chartWords = bodyChartSize !== undefined && bodyChartSize !== size ? ` (The printed body chart says size ${bodyChartSize} for this body.)` : '';
    const reason = `${level[0]!.toUpperCase()}${level.slice(1)}: ${where} + ${easeWords} = ${L(comfort)}${stretchWords}; ${sizeWords}.${chartWords}`;
    levels.push({
      level,
      body,
      bodyFrom,
      offset,
      ease,
      easeSource,
      stretchReduction: reduction,
      target,
      comfort,
      size,
      sizeFrom,
      garmentAtSize: garment,
      change,
      reason,
      confidence,
      ...(bodyChartSize !== undefined ? { bodyChartSize } : {}),
      ...(fromNote !== 0 ? { fromNote } : {}),
    });

    if (beyond > 0)
      caution(
        `Size ${size} at the ${level} is beyond the printed sizes (${scale.sizes[0]!.size}–${scale.sizes[scale.sizes.length - 1]!.size}): it is extrapolated, an estimate. Sew a test garment first.`,
      );
    if (stopped && change !== 0) caution(`At the ${level} even size ${size}, ${MAX_EXTRAPOLATION_STEPS} grade step beyond the table, misses by ${L(Math.abs(change))}: a girth change takes the rest. Large changes are estimates: sew a test garment first.`);
    if (change > 0 && stretch === 0)
      caution(`Size ${size} is ${L(change)} too small at the ${level} in a cloth without stretch: that is uncomfortable to wear. Let it out, choose a larger size there, or use a cloth with stretch.`);
  }

  const steps: PlanStep[] = [];
  // blend: the size at each planned level, in the pattern's level names
  const legLevels = pattern ? new Set(pattern.pieces.flatMap((p) => p.lines.filter((l) => l.role === 'level').map((l) => l.name))) : undefined;
  const blendLevels = levels.filter((l) => l.level === 'waist' || !legLevels || legLevels.has(l.level));
  for (const l of levels) if (!blendLevels.includes(l)) caution(`The pattern has no ${l.level} level line: size ${l.size} at the ${l.level} is not in the blend.`);
  if (blendLevels.length > 0 && scale.sizes.length > 1) {
    const words = blendLevels.map((l) => `${l.size} at the ${l.level}`).join(', ');
    const conf: Confidence = blendLevels.some((l) => l.confidence === 'low') ? 'low' : blendLevels.some((l) => l.confidence === 'medium') ? 'medium' : 'high';
    steps.push({ op: { op: 'blend', levels: blendLevels.map((l) => ({ level: l.level, size: l.size })) }, reason: `Blend sizes: ${words}.`, confidence: conf, ...noteFlag(blendLevels.some((l) => l.fromNote !== undefined)) });
  }

  // lengths, read at the size chosen at the hip (rise) and at the thigh (inseam)
  const sizeForLengths = (order: readonly FitLevel[]): number | undefined => order.map((l) => chosenX.get(l)).find((x) => x !== undefined);
  const legPieces = pattern?.pieces.filter((p) => p.edges.some((e) => e.role === 'inseam')) ?? [];
  const lengthenLines = pattern ? [...new Set(legPieces.flatMap((p) => p.lines.filter((l) => l.role === 'lengthen').map((l) => l.name)))] : [];
  const riseLine = pattern ? lengthenLines.find((n) => n === 'rise') : 'rise';
  const legLines = pattern ? lengthenLines.filter((n) => n !== 'rise') : ['lower leg'];

  // The pattern's crotch depth and inseam after the blend: measured on the blended pattern when
  // there is one (the blend decides where the crotch point lands), else read from the table at
  // the size chosen at the hip (rise; §3.9 takes the crotch from the hip size) and at the thigh
  // (inseam), an estimate.
  let measuredAfterBlend: { crotchDepth?: number; inseam?: number } | undefined;
  const blendStep = steps.find((st) => st.op.op === 'blend');
  if (pattern && blendStep) {
    try {
      const blended = applyOps(pattern, [blendStep.op]).pattern;
      measuredAfterBlend = chartFromPattern(blended).sizes[0]!.garment;
    } catch {
      caution('The blended pattern could not be measured: the rise and leg length are read from the size table at the hip and thigh sizes, an estimate.');
    }
  }
  const lengthAt = (measure: 'crotchDepth' | 'inseam', order: readonly FitLevel[]): { value: number; where: string } | undefined => {
    const m = measuredAfterBlend?.[measure];
    if (m !== undefined) return { value: m, where: 'after the blend' };
    const x = sizeForLengths(order);
    const pts = pointsFor(scale, measure);
    if (x === undefined || pts.length === 0) return undefined;
    return { value: valueAt(pts, x), where: `at size ${labelOf(scale, x)}` };
  };

  const depth = lengthAt('crotchDepth', ['hip', 'waist', 'thigh']);
  if (profile.bodyRise === undefined) {
    if (opts.waistOffset !== 0) caution(`The waistband is to sit ${L(Math.abs(opts.waistOffset))} ${opts.waistOffset > 0 ? 'above' : 'below'} the natural waist, but the profile has no body rise: the rise was not planned.`);
  } else if (depth === undefined) {
    caution('The size table has no crotch depth (or no size was planned at the hip): the rise was not planned.');
  } else {
    const riseEase = opts.ease.rise ?? EASE_DEFAULTS[opts.fit].rise.mm;
    const riseNote = corrections?.rise ?? 0;
    const want = profile.bodyRise + riseEase + opts.waistOffset + riseNote;
    if (riseNote !== 0) fromPrevious.push(`Rise: ${noteFrom} was ${L(Math.abs(riseNote))} too ${riseNote > 0 ? 'short' : 'long'} in the rise, so the rise aimed at is ${L(Math.abs(riseNote))} ${riseNote > 0 ? 'longer' : 'shorter'}.`);
    const amount = round1(want - depth.value);
    if (Math.abs(amount) >= FIT_LENGTH_TOLERANCE) {
      if (!riseLine) caution(`The rise should change by ${L(amount)}, but the pattern's leg pieces have no lengthen line named "rise".`);
      else
        steps.push({
          op: { op: 'rise', line: riseLine, amount },
          reason: `Rise: body rise ${L(profile.bodyRise)} + ${L(riseEase)} ease${opts.waistOffset !== 0 ? ` ${opts.waistOffset > 0 ? '+' : '−'} ${L(Math.abs(opts.waistOffset))} for the waistband's height` : ''}${riseNote !== 0 ? ` ${riseNote > 0 ? '+' : '−'} ${L(Math.abs(riseNote))} for the note on ${noteFrom}` : ''} = ${L(want)}; the pattern's crotch depth ${depth.where} is ${L(depth.value)}: ${amount > 0 ? 'raise' : 'lower'} by ${L(Math.abs(amount))}.`,
          confidence: 'medium',
          ...noteFlag(riseNote !== 0),
        });
    }
  }

  const inseam = lengthAt('inseam', ['thigh', 'hip', 'knee', 'waist']);
  if (profile.insideLegLength !== undefined && inseam !== undefined) {
    const lengthNote = corrections?.length ?? 0;
    const want = profile.insideLegLength + opts.inseamOffset + lengthNote;
    if (lengthNote !== 0) fromPrevious.push(`Leg length: ${noteFrom} was ${L(Math.abs(lengthNote))} too ${lengthNote > 0 ? 'short' : 'long'}, so the legs aimed at are ${L(Math.abs(lengthNote))} ${lengthNote > 0 ? 'longer' : 'shorter'}.`);
    const amount = round1(want - inseam.value);
    if (Math.abs(amount) >= FIT_LENGTH_TOLERANCE) {
      if (legLines.length === 0) caution(`The legs should change by ${L(amount)}, but the pattern's leg pieces have no lengthen/shorten line.`);
      else {
        const n = legLines.length;
        const each = round1(amount / n);
        legLines.forEach((line, i) => {
          const part = i === n - 1 ? round1(amount - each * (n - 1)) : each;
          steps.push({
            op: { op: 'lengthen', line, amount: part },
            reason: `Leg length: inside leg ${L(profile.insideLegLength!)}${opts.inseamOffset !== 0 ? ` ${opts.inseamOffset > 0 ? '+' : '−'} ${L(Math.abs(opts.inseamOffset))}` : ''}${lengthNote !== 0 ? ` ${lengthNote > 0 ? '+' : '−'} ${L(Math.abs(lengthNote))} for the note on ${noteFrom}` : ''} against the pattern's inseam of ${L(inseam.value)} ${inseam.where}: ${amount > 0 ? 'lengthen' : 'shorten'} by ${L(Math.abs(amount))}${n > 1 ? `, ${L(Math.abs(part))} of it at "${line}"` : ''}.`,
            confidence: 'medium',
            ...noteFlag(lengthNote !== 0),
          });
        });
      }
    }
  }

  if (!pattern && steps.some((st) => st.op.op === 'rise' || st.op.op === 'lengthen'))
    caution('No pattern was given: the rise and leg length changes name the lines "rise" and "lower leg"; rename them to your pattern\'s lines.');

  // girth changes where the size still misses: on the side seams (§3.10: side seams first)
  for (const l of levels) {
    if (l.change === 0) continue;
    const edges = sideEdges(l.level, pattern);
    if (edges <= 0) {
      caution(`The ${l.level} needs ${L(l.change)} more girth, but the pattern has no side seam at that level to change.`);
      continue;
    }
    const amount = round1(l.change / edges);
    steps.push({
      op: { op: 'girth', edge: 'side-seam', level: l.level, amount },
      reason: `${l.level[0]!.toUpperCase()}${l.level.slice(1)}: ${l.change > 0 ? 'let out' : 'take in'} ${L(Math.abs(l.change))} round the ${TRUNK.includes(l.level) ? 'garment' : 'leg'}, ${L(Math.abs(amount))} at each of ${edges} side-seam edges.`,
      confidence: l.confidence === 'high' ? 'medium' : l.confidence,
      ...noteFlag(l.fromNote !== undefined),
    });
  }

  // fabric
  if (fabric) {
    const warp = fabric.shrinkageWarp;
    const weft = fabric.shrinkageWeft;
    if (fabric.prewashed) {
      if (Math.max(Math.abs(warp), Math.abs(weft)) >= MIN_SHRINKAGE) caution('The cloth is marked pre-washed: its shrinkage is not compensated.');
    } else if (Math.max(Math.abs(warp), Math.abs(weft)) >= MIN_SHRINKAGE) {
      steps.push({
        op: { op: 'shrinkage', lengthwise: round2(warp), crosswise: round2(weft) },
        reason: `Shrinkage: the wash test shows ${round1(warp)} % along the warp and ${round1(weft)} % across; the pieces are enlarged by 1 / (1 − s) so they shrink to size. Add seam allowance after this.`,
        confidence: 'high',
      });
      if (Math.max(warp, weft) > PREWASH_ABOVE) caution(`The cloth shrinks more than ${PREWASH_ABOVE} %: pre-wash it the way the garment will be washed rather than rely on compensation.`);
    }
    if (stretch > 0 && fabric.recovery !== undefined && fabric.recovery < 90)
      caution(`The cloth recovers only ${fabric.recovery} % after stretching: the garment will grow as it is worn; use less of the stretch.`);
    if (fabric.stretchAlong >= 15) caution(`The cloth stretches ${Math.round(fabric.stretchAlong)} % along the grain too: stretching across pulls it shorter; lengths may need 0–5 % less (common practice).`);
  }

  // check the plan on the pattern itself, and measure the garment before and after it
  let after: GarmentGirths | null = null;
  if (pattern && steps.length > 0) {
    try {
      // the shrinkage allowance is planned last: the garment as worn is the pattern just before it
      const worn = steps.filter((st) => st.op.op !== 'shrinkage').map((st) => st.op);
      const asWorn = applyOps(pattern, worn);
      const shrink = steps.slice(worn.length).map((st) => st.op);
      const cautions = [...asWorn.cautions, ...(shrink.length > 0 ? applyOps(asWorn.pattern, shrink).cautions.map((c) => ({ ...c, op: c.op + worn.length })) : [])];
      // fractional sizes are the plan itself (each level says so); other notes are passed on
      for (const c of cautions) if (c.code !== 'fractional-size') caution(`Step ${c.op + 1}: ${c.message}`);
      after = measureGirths(asWorn.pattern, 'after the plan', opts.seamAllowance);
    } catch (e) {
      caution(`The planned changes could not all be made on this pattern: ${e instanceof Error ? e.message : String(e)}`);
    }
  }
  const before = pattern ? garmentBefore(pattern, input.current, levels, scale, opts.seamAllowance) : null;
  caution('Sizing advice is guidance, not a guarantee of fit: sew a test garment before cutting the good cloth.');

  return { units: 'mm', fit: opts.fit, levels, ops: steps.map((s) => s.op), steps, cautions, chart, ...(fabric ? { fabric } : {}), garment: { before, after }, fromPrevious };
}

/**
 * The size the printed body chart gives for a body girth: linear between the two neighbouring
 * sizes like the finished measurements, at most one grade step beyond the table; undefined when
 * the chart has fewer than two body values there or they do not grow with the size.
 */
function sizeByBodyChart(scale: SizeScale, key: (typeof BODY_KEY)[FitLevel], body: number): string | undefined {
  const pts: Pt[] = [];
  scale.sizes.forEach((s, i) => {
    const y = s.body?.[key];
    if (y !== undefined) pts.push({ x: scale.values[i]!, y });
  });
  if (pts.length < 2 || !pts.every((p, i) => i === 0 || p.y > pts[i - 1]!.y)) return undefined;
  const lo = pts[0]!.x - MAX_EXTRAPOLATION_STEPS * (pts[1]!.x - pts[0]!.x);
  const hi = pts[pts.length - 1]!.x + MAX_EXTRAPOLATION_STEPS * (pts[pts.length - 1]!.x - pts[pts.length - 2]!.x);
  return labelOf(scale, roundSize(Math.min(hi, Math.max(lo, sizeAt(pts, body)))));
}

/** The finished girths of a pattern that has one outline per piece (after a blend); null otherwise. */
function measureGirths(pattern: Pattern, label: string, seamAllowance: number | undefined): GarmentGirths | null {
  let chart: SizeChart;
  try {
    chart = chartFromPattern(pattern, seamAllowance !== undefined ? { seamAllowance } : {});
  } catch {
    return null;
  }
  if (chart.sizes.length !== 1) return null;
  const g = chart.sizes[0]!.garment;
  const measures: Partial<Record<FitLevel, number>> = {};
  for (const level of FIT_LEVELS) if (g[level] !== undefined) measures[level] = g[level];
  return { label, measures };
}

/**
 * The garment before the plan: the make's alterations now when they leave one outline per
 * piece (a blend), else the printed size nearest the size planned at the hip (or the first
 * planned level), straight.
 */
function garmentBefore(pattern: Pattern, current: readonly AlterationOp[] | undefined, levels: readonly PlannedLevel[], scale: SizeScale, seamAllowance: number | undefined): GarmentGirths | null {
  if (current && current.length > 0) {
    try {
      const r = applyOps(pattern, current);
      const now = measureGirths(r.pattern, 'your alterations now', seamAllowance);
      if (now) return now;
    } catch {
      // a list the pattern no longer takes: fall back to a straight size
    }
  }
  const anchor = levels.find((l) => l.level === 'hip') ?? levels[0];
  if (!anchor) return null;
  const at = scale.numeric ? (sizeNumber(anchor.size) ?? 0) : scale.sizes.findIndex((s) => s.size === anchor.size);
  let nearest = 0;
  scale.values.forEach((v, i) => {
    if (Math.abs(v - at) < Math.abs(scale.values[nearest]! - at)) nearest = i;
  });
  const label = scale.sizes[nearest]!.size;
  try {
    // every level at one size: the pattern's own outline of that size
    const straight = measureGirths(applyOps(pattern, [{ op: 'blend', levels: [{ level: 'waist', size: label }] }]).pattern, `size ${label}`, seamAllowance);
    if (straight) return straight;
  } catch {
    // the table's size is not one of the pattern's size lines: read the table instead
  }
  const g = scale.sizes[nearest]!.garment;
  const measures: Partial<Record<FitLevel, number>> = {};
  for (const level of FIT_LEVELS) if (g[level] !== undefined) measures[level] = g[level];
  return { label: `size ${label}`, measures };
}
