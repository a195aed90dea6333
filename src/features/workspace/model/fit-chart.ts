/**
 * The fit chart's data: per level, the body girth, the ease band (body → body + ease), the aim
 * (below the band with stretch), and the garment before and after the plan. Pure: the chart
 * component only draws what this shapes.
 */
import { FIT_GIRTH_TOLERANCE, FIT_LEVELS, type FitLevel, type LengthUnit, formatLength } from '../../../../geometry/index.ts';

export interface PlanLevelLike {
  readonly level: string;
  readonly body: number;
  readonly comfort?: number | undefined;
  readonly target: number;
  readonly size: string;
}

export interface GarmentSide {
  readonly label: string;
  readonly measures: Partial<Record<string, number>>;
}

export interface GarmentBeforeAfter {
  readonly before: GarmentSide | null;
  readonly after: GarmentSide | null;
}

/** Where a garment girth sits against the band [aim, body + ease], with FIT_GIRTH_TOLERANCE. */
export type GirthVerdict = 'tight' | 'fits' | 'loose';

export interface FitChartRow {
  readonly level: FitLevel;
  /** `Waist`, `Hip`, … */
  readonly label: string;
  /** Round the whole body (waist, hip) or one leg (thigh, knee, calf). */
  readonly round: 'body' | 'leg';
  readonly size: string;
  readonly body: number;
  /** body + ease */
  readonly comfort: number;
  readonly target: number;
  /** [low, high] of the ease band: body → comfort. */
  readonly band: readonly [number, number];
  /** The aim sits below the ease band (stretch cloth stands in for some of the ease). */
  readonly targetBelowComfort: boolean;
  readonly before?: number;
  readonly after?: number;
  readonly beforeVerdict?: GirthVerdict;
  readonly afterVerdict?: GirthVerdict;
}

export interface FitChartData {
  readonly rows: readonly FitChartRow[];
  /** Axis range (mm), on round numbers of the person's unit. */
  readonly domain: readonly [number, number];
  /** Axis ticks (mm), each a round number in the person's unit. */
  readonly ticks: readonly number[];
  readonly beforeLabel?: string;
  readonly afterLabel?: string;
  /** One sentence per level, for the caption and screen readers. */
  readonly summary: readonly string[];
}

const LABELS: Record<FitLevel, string> = { waist: 'Waist', hip: 'Hip', thigh: 'Thigh', knee: 'Knee', calf: 'Calf' };
const TRUNK = new Set<FitLevel>(['waist', 'hip']);

const isFitLevel = (l: string): l is FitLevel => (FIT_LEVELS as readonly string[]).includes(l);

/** Where `girth` sits against [low, high] (the aim and the comfort girth) with the girth tolerance. */
export function girthVerdict(girth: number, low: number, high: number): GirthVerdict {
  if (girth < Math.min(low, high) - FIT_GIRTH_TOLERANCE) return 'tight';
  if (girth > Math.max(low, high) + FIT_GIRTH_TOLERANCE) return 'loose';
  return 'fits';
}

/** Axis steps (in the unit) tried in turn until the axis has at most `maxTicks` ticks. */
const STEPS: Record<LengthUnit, readonly number[]> = { in: [1, 2, 4, 5, 10, 20], cm: [1, 2, 5, 10, 20, 50] };
const MM: Record<LengthUnit, number> = { in: 25.4, cm: 10 };

/** A range covering `values` with round ends and at most `maxTicks` ticks, in the unit's round numbers. */
export function niceAxis(values: readonly number[], unit: LengthUnit, maxTicks = 9): { domain: [number, number]; ticks: number[] } {
  const finite = values.filter((v) => Number.isFinite(v));
  if (finite.length === 0) return { domain: [0, MM[unit]], ticks: [0, MM[unit]] };
  const lo = Math.min(...finite) / MM[unit];
  const hi = Math.max(...finite) / MM[unit];
  for (const step of STEPS[unit]) {
    const start = Math.floor(lo / step) * step;
    let end = Math.ceil(hi / step) * step;
    if (end === start) end = start + step;
    const count = Math.round((end - start) / step) + 1;
    if (count <= maxTicks || step === STEPS[unit].at(-1)) {
      const ticks = Array.from({ length: count }, (_, i) => (start + i * step) * MM[unit]);
      return { domain: [start * MM[unit], end * MM[unit]], ticks };
    }
  }
  throw new Error('unreachable');
}

const verdictWords: Record<GirthVerdict, string> = { tight: 'tighter than the aim', fits: 'within the band', loose: 'looser than the band' };

/**
 * Rows waist → calf (top to bottom, like the body) for the levels the plan has, with the
 * garment girths of `garment` where it measures that level.
 */
export function fitChartData(levels: readonly PlanLevelLike[], garment: GarmentBeforeAfter | null | undefined, unit: LengthUnit): FitChartData {
  const byLevel = new Map(levels.filter((l) => isFitLevel(l.level)).map((l) => [l.level as FitLevel, l]));
  const rows: FitChartRow[] = [];
  for (const level of FIT_LEVELS) {
    const l = byLevel.get(level);
    if (!l) continue;
    const comfort = l.comfort ?? l.target;
    const before = garment?.before?.measures[level];
    const after = garment?.after?.measures[level];
    rows.push({
      level,
      label: LABELS[level],
      round: TRUNK.has(level) ? 'body' : 'leg',
      size: l.size,
      body: l.body,
      comfort,
      target: l.target,
      band: [Math.min(l.body, comfort), Math.max(l.body, comfort)],
      targetBelowComfort: l.target < comfort - 1e-6,
      ...(before !== undefined ? { before, beforeVerdict: girthVerdict(before, l.target, comfort) } : {}),
      ...(after !== undefined ? { after, afterVerdict: girthVerdict(after, l.target, comfort) } : {}),
    });
  }
  const all = rows.flatMap((r) => [r.body, r.comfort, r.target, r.before, r.after].filter((v): v is number => v !== undefined));
  const { domain, ticks } = niceAxis(all, unit);
  const f = (mm: number) => formatLength(mm, unit);
  const summary = rows.map((r) => {
    const parts = [`${r.label} (size ${r.size}): body ${f(r.body)}, ease band to ${f(r.comfort)}`];
    if (r.targetBelowComfort) parts.push(`aim ${f(r.target)} (stretch)`);
    if (r.before !== undefined) parts.push(`pattern before ${f(r.before)}, ${verdictWords[r.beforeVerdict!]}`);
    if (r.after !== undefined) parts.push(`after the plan ${f(r.after)}, ${verdictWords[r.afterVerdict!]}`);
    return `${parts.join('; ')}.`;
  });
  return {
    rows,
    domain,
    ticks,
    ...(garment?.before ? { beforeLabel: garment.before.label } : {}),
    ...(garment?.after ? { afterLabel: garment.after.label } : {}),
    summary,
  };
}
