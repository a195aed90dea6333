/**
 * The fabrics screen's pure logic: the form read into the properties the API keeps
 * (geometry/fit/body.ts fabricSchema: percent or a hand test for stretch, a wash test for
 * shrinkage, lengths in millimetres), weight in both units, and what a fit plan will do about
 * the cloth's shrinkage. No React here, so tests/client/fabrics-model.test.ts checks it directly.
 *
 * The constants are copies of geometry's (a light page does not load the engine); the test
 * checks that they are equal.
 */
import { formatLength, type LengthUnit } from '../../../geometry/units';
import { MAX_LENGTH_MM, readLength } from '../../lib/read-length';

/** 1 international avoirdupois ounce = 28.349 523 125 g exactly (1 lb = 0.453 592 37 kg, 16 oz). */
export const GRAMS_PER_OUNCE = 28.349523125;
/** 1 international square yard = 0.836 127 36 m² exactly (1 yd = 0.9144 m). */
export const SQUARE_METRES_PER_SQUARE_YARD = 0.83612736;
/** 1 oz/yd² in g/m²: 33.906 (33.905 747 5…). */
export const GSM_PER_OZ_PER_SQ_YD = GRAMS_PER_OUNCE / SQUARE_METRES_PER_SQUARE_YARD;

export const ozPerSqYdToGsm = (oz: number): number => oz * GSM_PER_OZ_PER_SQ_YD;
export const gsmToOzPerSqYd = (gsm: number): number => gsm / GSM_PER_OZ_PER_SQ_YD;

/** Shrinkage below this (percent) is not compensated by a plan (geometry/fit/plan.ts). */
export const MIN_SHRINKAGE = 0.5;
/** Above this shrinkage (percent) a plan advises pre-washing (geometry/fit/plan.ts). */
export const PREWASH_ABOVE = 7;
/** Shrinkage the API accepts, percent either way (geometry/tolerance.ts MAX_SHRINKAGE = 0.3). */
export const MAX_SHRINKAGE_PERCENT = 30;
/** Other limits of geometry/fit/body.ts fabricSchema. */
export const MAX_STRETCH_PERCENT = 300;
export const MAX_GSM = 2000;
export const MAX_OZ_PER_SQ_YD = 60;
export { MAX_LENGTH_MM };

/** Stretch percent from a hand test: 100 × (stretched − relaxed) / relaxed (trade reference §4.2). */
export function stretchPercent(relaxed: number, stretched: number): number {
  return (100 * (stretched - relaxed)) / relaxed;
}

/** Shrinkage percent from a wash test, + = the cloth got shorter: −100 × (after − before) / before (§4.4). */
export function shrinkagePercent(before: number, after: number): number {
  return (100 * (before - after)) / before;
}

// ---------------------------------------------------------------------------------------------
// The properties as the API keeps them

export type StretchValue = number | { relaxed: number; stretched: number };
export type ShrinkageValue = number | { before: number; after: number };

export type FabricProperties = {
  stretchAcross?: StretchValue;
  stretchAlong?: StretchValue;
  recovery?: number;
  weightGsm?: number;
  weightOzPerSqYd?: number;
  width?: number;
  shrinkage?: { warp?: ShrinkageValue; weft?: ShrinkageValue };
  prewashed?: boolean;
};

export const stretchOf = (s: StretchValue | undefined): number | undefined =>
  s === undefined ? undefined : typeof s === 'number' ? s : stretchPercent(s.relaxed, s.stretched);
export const shrinkageOf = (s: ShrinkageValue | undefined): number | undefined =>
  s === undefined ? undefined : typeof s === 'number' ? s : shrinkagePercent(s.before, s.after);

/** Both weights of a cloth from whichever was given (g/m² wins when both are). */
export function weightsOf(p: Pick<FabricProperties, 'weightGsm' | 'weightOzPerSqYd'>): { gsm: number; oz: number } | undefined {
  if (p.weightGsm !== undefined) return { gsm: p.weightGsm, oz: p.weightOzPerSqYd ?? gsmToOzPerSqYd(p.weightGsm) };
  if (p.weightOzPerSqYd !== undefined) return { gsm: ozPerSqYdToGsm(p.weightOzPerSqYd), oz: p.weightOzPerSqYd };
  return undefined;
}

// ---------------------------------------------------------------------------------------------
// What a plan does about shrinkage

export type ShrinkageAdvice = {
  kind: 'none' | 'below-threshold' | 'compensate' | 'prewash' | 'prewashed';
  text: string;
};

const one = (n: number) => `${Math.round(n * 10) / 10}`.replace('-', '−');

/**
 * What a fit plan will do with this shrinkage (geometry/fit/plan.ts): nothing below
 * MIN_SHRINKAGE in both directions; otherwise enlarge the pieces by 1 / (1 − s) along each
 * grain, and above PREWASH_ABOVE also advise pre-washing. A cloth marked pre-washed is not
 * compensated at all.
 */
export function shrinkageAdvice(warp: number | undefined, weft: number | undefined, prewashed: boolean): ShrinkageAdvice {
  if (warp === undefined && weft === undefined) return { kind: 'none', text: 'No wash test recorded: plans assume the cloth does not shrink.' };
  const w = warp ?? 0;
  const f = weft ?? 0;
  const largest = Math.max(Math.abs(w), Math.abs(f));
  if (largest < MIN_SHRINKAGE) return { kind: 'below-threshold', text: `Under ${MIN_SHRINKAGE} % each way: plans leave the pieces as they are.` };
  if (prewashed)
    return { kind: 'prewashed', text: 'Marked as washed already: plans do not enlarge the pieces for this shrinkage.' };
  const each = [warp === undefined ? 'nothing recorded along the warp' : `${one(w)} % along the warp`, weft === undefined ? 'nothing recorded across' : `${one(f)} % across`];
  const compensate = `Plans will enlarge the pieces by 1 / (1 − s): ${each.join(', ')}.`;
  if (Math.max(w, f) > PREWASH_ABOVE)
    return { kind: 'prewash', text: `${compensate} Over ${PREWASH_ABOVE} %: plans will also advise pre-washing the cloth the way the garment will be washed, rather than relying on the enlargement.` };
  return { kind: 'compensate', text: compensate };
}

// ---------------------------------------------------------------------------------------------
// The form

export type FieldErrors = Record<string, string>;

export type StretchDraft = { how: 'percent' | 'test'; percent: string; relaxed: string; stretched: string };
export type ShrinkageDraft = { how: 'percent' | 'test'; percent: string; before: string; after: string };

export type FabricDraft = {
  name: string;
  stretchAcross: StretchDraft;
  stretchAlong: StretchDraft;
  recovery: string;
  weightUnit: 'gsm' | 'oz';
  weight: string;
  width: string;
  warp: ShrinkageDraft;
  weft: ShrinkageDraft;
  prewashed: boolean;
};

const emptyStretch = (): StretchDraft => ({ how: 'test', percent: '', relaxed: '', stretched: '' });
const emptyShrinkage = (): ShrinkageDraft => ({ how: 'test', percent: '', before: '', after: '' });

const numberText = (n: number, digits: number) => `${Math.round(n * 10 ** digits) / 10 ** digits}`;

/** A form for a new fabric, or one filled from a fabric's properties in `unit`. */
export function fabricDraft(name = '', p: FabricProperties = {}, unit: LengthUnit = 'cm'): FabricDraft {
  const stretch = (s: StretchValue | undefined): StretchDraft =>
    s === undefined
      ? emptyStretch()
      : typeof s === 'number'
        ? { ...emptyStretch(), how: 'percent', percent: numberText(s, 2) }
        : { how: 'test', percent: '', relaxed: formatLength(s.relaxed, unit), stretched: formatLength(s.stretched, unit) };
  const shrink = (s: ShrinkageValue | undefined): ShrinkageDraft =>
    s === undefined
      ? emptyShrinkage()
      : typeof s === 'number'
        ? { ...emptyShrinkage(), how: 'percent', percent: numberText(s, 2) }
        : { how: 'test', percent: '', before: formatLength(s.before, unit), after: formatLength(s.after, unit) };
  const weightUnit = p.weightGsm === undefined && p.weightOzPerSqYd !== undefined ? 'oz' : 'gsm';
  const weight = weightUnit === 'oz' ? p.weightOzPerSqYd : p.weightGsm;
  return {
    name,
    stretchAcross: stretch(p.stretchAcross),
    stretchAlong: stretch(p.stretchAlong),
    recovery: p.recovery === undefined ? '' : numberText(p.recovery, 2),
    weightUnit,
    weight: weight === undefined ? '' : numberText(weight, 3),
    width: p.width === undefined ? '' : formatLength(p.width, unit),
    warp: shrink(p.shrinkage?.warp),
    weft: shrink(p.shrinkage?.weft),
    prewashed: p.prewashed ?? false,
  };
}

/** A typed number, optionally with `%` after it; a comma may be the decimal separator. */
export function readNumber(text: string): { value: number | undefined } | { error: string } {
  const trimmed = text.trim().replace(/\s*%$/, '');
  if (trimmed === '') return { value: undefined };
  if (!/^[-+−]?(\d+([.,]\d*)?|[.,]\d+)$/.test(trimmed)) return { error: `“${text.trim()}” is not a number.` };
  return { value: Number(trimmed.replace('−', '-').replace(',', '.')) };
}

export { readLength };

/** What the form shows beside a test: the stretch it gives, when both lengths read. */
export function stretchFromDraft(d: StretchDraft, unit: LengthUnit): number | undefined {
  if (d.how === 'percent') {
    const r = readNumber(d.percent);
    return 'value' in r ? r.value : undefined;
  }
  const a = readLength(d.relaxed, unit);
  const b = readLength(d.stretched, unit);
  return 'mm' in a && 'mm' in b && a.mm !== undefined && b.mm !== undefined ? stretchPercent(a.mm, b.mm) : undefined;
}

/** The shrinkage a wash test (or a typed percent) gives, + = shrinks. */
export function shrinkageFromDraft(d: ShrinkageDraft, unit: LengthUnit): number | undefined {
  if (d.how === 'percent') {
    const r = readNumber(d.percent);
    return 'value' in r ? r.value : undefined;
  }
  const a = readLength(d.before, unit);
  const b = readLength(d.after, unit);
  return 'mm' in a && 'mm' in b && a.mm !== undefined && b.mm !== undefined ? shrinkagePercent(a.mm, b.mm) : undefined;
}

/** The other weight unit, converted, for the line under the weight field. */
export function convertedWeight(draft: Pick<FabricDraft, 'weight' | 'weightUnit'>): string | null {
  const r = readNumber(draft.weight);
  if (!('value' in r) || r.value === undefined || r.value <= 0) return null;
  return draft.weightUnit === 'gsm' ? `${gsmToOzPerSqYd(r.value).toFixed(2)} oz/yd²` : `${ozPerSqYdToGsm(r.value).toFixed(1)} g/m²`;
}

/**
 * Read the form into `{ name, properties }`, or the problems keyed as the API names the fields
 * (`name`, `properties.stretchAcross.relaxed`, `properties.weightOzPerSqYd`, …). `origin` is the
 * fabric the form was filled from: lengths whose text was not changed keep their exact value.
 */
export function readFabricDraft(
  draft: FabricDraft,
  unit: LengthUnit,
  origin: FabricProperties = {},
): { value: { name: string; properties: FabricProperties } } | { errors: FieldErrors } {
  const errors: FieldErrors = {};
  const properties: FabricProperties = {};
  const name = draft.name.trim();
  if (name === '') errors.name = 'Enter a name for the fabric.';
  else if (name.length > 120) errors.name = 'Keep the name to 120 characters.';

  const percentIn = (key: string, text: string, min: number, max: number): number | undefined => {
    const r = readNumber(text);
    if ('error' in r) errors[key] = r.error;
    else if (r.value !== undefined && (r.value < min || r.value > max)) errors[key] = `Give a percent from ${min} to ${max}.`;
    else return r.value;
    return undefined;
  };
  const lengthIn = (key: string, text: string, keep?: number): number | undefined => {
    const r = readLength(text, unit, { keepMm: keep });
    if ('error' in r) errors[key] = r.error;
    else return r.mm;
    return undefined;
  };

  for (const side of ['stretchAcross', 'stretchAlong'] as const) {
    const d = draft[side];
    const key = `properties.${side}`;
    if (d.how === 'percent') {
      const v = percentIn(key, d.percent, 0, MAX_STRETCH_PERCENT);
      if (v !== undefined) properties[side] = v;
      continue;
    }
    const was = typeof origin[side] === 'object' ? origin[side] : undefined;
    const relaxed = lengthIn(`${key}.relaxed`, d.relaxed, was?.relaxed);
    const stretched = lengthIn(`${key}.stretched`, d.stretched, was?.stretched);
    if (relaxed === undefined && stretched === undefined) continue;
    if (relaxed === undefined && !errors[`${key}.relaxed`]) errors[`${key}.relaxed`] = 'Enter the length before stretching.';
    if (stretched === undefined && !errors[`${key}.stretched`]) errors[`${key}.stretched`] = 'Enter the length when stretched.';
    if (relaxed === undefined || stretched === undefined) continue;
    if (stretched < relaxed) errors[`${key}.stretched`] = 'The stretched length is shorter than the relaxed one: check the two.';
    else if (stretchPercent(relaxed, stretched) > MAX_STRETCH_PERCENT) errors[`${key}.stretched`] = `That is over ${MAX_STRETCH_PERCENT} % stretch: check the two lengths.`;
    else properties[side] = { relaxed, stretched };
  }

  const recovery = percentIn('properties.recovery', draft.recovery, 0, 100);
  if (recovery !== undefined) properties.recovery = recovery;

  const weightKey = draft.weightUnit === 'gsm' ? 'properties.weightGsm' : 'properties.weightOzPerSqYd';
  const weight = readNumber(draft.weight);
  const weightMax = draft.weightUnit === 'gsm' ? MAX_GSM : MAX_OZ_PER_SQ_YD;
  if ('error' in weight) errors[weightKey] = weight.error;
  else if (weight.value !== undefined) {
    if (weight.value <= 0 || weight.value > weightMax)
      errors[weightKey] = `Give a weight above 0 and up to ${weightMax} ${draft.weightUnit === 'gsm' ? 'g/m²' : 'oz/yd²'}.`;
    else if (draft.weightUnit === 'gsm') properties.weightGsm = weight.value;
    else properties.weightOzPerSqYd = weight.value;
  }

  const width = lengthIn('properties.width', draft.width, origin.width);
  if (width !== undefined) properties.width = width;

  const shrinkage: NonNullable<FabricProperties['shrinkage']> = {};
  for (const grain of ['warp', 'weft'] as const) {
    const d = draft[grain];
    const key = `properties.shrinkage.${grain}`;
    if (d.how === 'percent') {
      const v = percentIn(key, d.percent, -MAX_SHRINKAGE_PERCENT, MAX_SHRINKAGE_PERCENT);
      if (v !== undefined) shrinkage[grain] = v;
      continue;
    }
    const was = origin.shrinkage?.[grain];
    const old = typeof was === 'object' ? was : undefined;
    const before = lengthIn(`${key}.before`, d.before, old?.before);
    const after = lengthIn(`${key}.after`, d.after, old?.after);
    if (before === undefined && after === undefined) continue;
    if (before === undefined && !errors[`${key}.before`]) errors[`${key}.before`] = 'Enter the length before washing.';
    if (after === undefined && !errors[`${key}.after`]) errors[`${key}.after`] = 'Enter the length after washing.';
    if (before === undefined || after === undefined) continue;
    if (Math.abs(shrinkagePercent(before, after)) > MAX_SHRINKAGE_PERCENT)
      errors[`${key}.after`] = `That is more than ${MAX_SHRINKAGE_PERCENT} % change: check the two lengths.`;
    else shrinkage[grain] = { before, after };
  }
  if (shrinkage.warp !== undefined || shrinkage.weft !== undefined) properties.shrinkage = shrinkage;
  if (draft.prewashed) properties.prewashed = true;

  if (Object.keys(errors).length > 0) return { errors };
  return { value: { name, properties } };
}

/** The form's places for a message; a server key is shown at the nearest one. */
export const FABRIC_FIELD_SLOTS = [
  'name',
  'properties.stretchAcross',
  'properties.stretchAcross.relaxed',
  'properties.stretchAcross.stretched',
  'properties.stretchAlong',
  'properties.stretchAlong.relaxed',
  'properties.stretchAlong.stretched',
  'properties.recovery',
  'properties.weight',
  'properties.width',
  'properties.shrinkage',
  'properties.shrinkage.warp',
  'properties.shrinkage.warp.before',
  'properties.shrinkage.warp.after',
  'properties.shrinkage.weft',
  'properties.shrinkage.weft.before',
  'properties.shrinkage.weft.after',
  'properties.prewashed',
] as const;
export type FabricFieldSlot = (typeof FABRIC_FIELD_SLOTS)[number];

/**
 * Server messages (and the form's own) moved to the field they belong beside: both weight keys
 * go to the weight field; a key deeper than any field goes to the nearest field above it; a key
 * that fits no field (or `properties` itself) goes to `_`, the form's alert.
 */
export function fabricFieldErrors(fields: FieldErrors): Partial<Record<FabricFieldSlot | '_', string>> {
  const slots = new Set<string>(FABRIC_FIELD_SLOTS);
  const out: Partial<Record<FabricFieldSlot | '_', string>> = {};
  for (const [key, message] of Object.entries(fields)) {
    let slot = key.replace(/^properties\.(weightGsm|weightOzPerSqYd)$/, 'properties.weight');
    while (slot !== '' && !slots.has(slot)) slot = slot.includes('.') ? slot.slice(0, slot.lastIndexOf('.')) : '';
    const target = (slot === '' ? '_' : slot) as FabricFieldSlot | '_';
    out[target] ??= message;
  }
  return out;
}
