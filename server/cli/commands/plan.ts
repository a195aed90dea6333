import { FITS, FIT_LEVELS, LengthParseError, parseLength, planFit, type Fit, type FitLevel } from '../../../geometry/index.ts';
import { CliError, parseOptions, readJson, writeJson } from '../io.ts';
import type { Command } from '../command.ts';

/** A length option: a plain number is millimetres; with a unit (`2in`, `5 cm`, `50.8mm`) it is converted. */
function lengthOption(name: string, text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const t = text.trim();
  if (/^[-+−]?\d+(\.\d+)?$/.test(t)) return Number(t.replace('−', '-'));
  if (!/(in|inch|inches|cm|mm|"|″)$/i.test(t)) throw new CliError(`--${name} must be millimetres or a length with its unit (2in, 5 cm, 50.8mm); got "${text}"`);
  try {
    return parseLength(t, 'cm');
  } catch (e) {
    throw new CliError(`--${name}: ${e instanceof LengthParseError ? e.message : String(e)}`);
  }
}

function numberOption(name: string, text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  const v = Number(text);
  if (text.trim() === '' || !Number.isFinite(v)) throw new CliError(`--${name} must be a number; got "${text}"`);
  return v;
}

/** `--size hip=8` (repeatable): a size the person has chosen at a level; the plan checks it. */
function sizeOptions(texts: string[] | undefined): Partial<Record<FitLevel, string>> | undefined {
  if (!texts || texts.length === 0) return undefined;
  const out: Partial<Record<FitLevel, string>> = {};
  for (const t of texts) {
    const m = /^([a-z]+)=(.+)$/.exec(t.trim());
    if (!m || !(FIT_LEVELS as readonly string[]).includes(m[1]!)) throw new CliError(`--size must be LEVEL=SIZE with LEVEL one of ${FIT_LEVELS.join(', ')}; got "${t}"`);
    out[m[1] as FitLevel] = m[2]!.trim();
  }
  return out;
}

export const planCommand: Command = {
  name: 'plan',
  summary: 'plan the fit: a size per level and the alterations, from a profile and a pattern',
  usage: [
    'Usage: npx blockwright plan --profile p.json (--pattern pattern.json | --chart chart.json)',
    '         [--pattern pattern.json] [--fabric f.json] [--fit close|regular|relaxed]',
    '         [--waist-offset 2in] [--inseam-offset -3cm] [--stretch-share 0.5]',
    '         [--seam-allowance 15] [--size waist=0 …] [--notes note.json]',
    '         [--unit cm|in] [--out plan.json]',
    '',
    'Compares the body (profile, ISO 8559-1 names, mm) plus ease with the finished-garment',
    'measurements of each size (the size table, or measured on the pattern when none is given)',
    'and prints the plan as JSON: the size at each level with its reason and confidence, the',
    'alterations (blend, rise, lengthen, girth, shrinkage) ready for `npx blockwright alter`,',
    'and cautions. --waist-offset: where the waistband will sit above (+) or below (−) the',
    'natural waist. --size LEVEL=SIZE (repeatable): a size you have chosen at a level; the',
    'plan checks it and suggests a girth change if it misses. --notes: how the last make',
    'fit ({ "levels": { "hip": { "verdict": "tight", "amount": 10 }, … }, "nextTime": "…" });',
    'its amounts become more or less ease, rise and leg length. Lengths in options are',
    'millimetres unless a unit is written.',
    'Sizing advice is guidance, not a guarantee of fit: sew a test garment first.',
  ].join('\n'),
  async run(args, io) {
    const { values, positionals } = parseOptions(args, {
      profile: { type: 'string' },
      pattern: { type: 'string' },
      chart: { type: 'string' },
      fabric: { type: 'string' },
      fit: { type: 'string' },
      'waist-offset': { type: 'string' },
      'inseam-offset': { type: 'string' },
      'stretch-share': { type: 'string' },
      'seam-allowance': { type: 'string' },
      size: { type: 'string', multiple: true },
      notes: { type: 'string' },
      unit: { type: 'string' },
      out: { type: 'string' },
    });
    if (positionals.length > 0) throw new CliError(`unexpected argument "${positionals[0]}"; give files with --profile, --pattern, --chart, --fabric`);
    if (!values.profile) throw new CliError('--profile FILE is required');
    if (!values.pattern && !values.chart) throw new CliError('give --pattern FILE or --chart FILE (or both)');
    if (values.fit !== undefined && !(FITS as readonly string[]).includes(values.fit)) throw new CliError(`--fit must be one of ${FITS.join(', ')}; got "${values.fit}"`);
    if (values.unit !== undefined && values.unit !== 'cm' && values.unit !== 'in') throw new CliError(`--unit must be cm or in; got "${values.unit}"`);
    const waistOffset = lengthOption('waist-offset', values['waist-offset']);
    const inseamOffset = lengthOption('inseam-offset', values['inseam-offset']);
    const seamAllowance = lengthOption('seam-allowance', values['seam-allowance']);
    const stretchShare = numberOption('stretch-share', values['stretch-share']);
    const sizes = sizeOptions(values.size);
    // read every file before any work, so a missing one is reported first
    const profile = readJson(values.profile);
    const pattern = values.pattern ? readJson(values.pattern) : undefined;
    const chart = values.chart ? readJson(values.chart) : undefined;
    const fabric = values.fabric ? readJson(values.fabric) : undefined;
    const note = values.notes ? readJson(values.notes) : undefined;
    const plan = planFit({
      profile,
      ...(pattern !== undefined ? { pattern } : {}),
      ...(chart !== undefined ? { chart } : {}),
      ...(fabric !== undefined ? { fabric } : {}),
      ...(values.fit !== undefined ? { fit: values.fit as Fit } : {}),
      ...(waistOffset !== undefined ? { waistOffset } : {}),
      ...(inseamOffset !== undefined ? { inseamOffset } : {}),
      ...(seamAllowance !== undefined ? { seamAllowance } : {}),
      ...(stretchShare !== undefined ? { stretchShare } : {}),
      ...(sizes !== undefined ? { sizes } : {}),
      ...(note !== undefined ? { previous: { note } } : {}),
      ...(values.unit !== undefined ? { unit: values.unit as 'cm' | 'in' } : {}),
    });
    writeJson(plan, values.out, io.stdout);
    return 0;
  },
};
