/**
 * Print a pattern: validate the options (zod), plan the pages (geometry/print), write PDF or SVG.
 * Bad options throw PrintOptionsError naming each field; a pattern that cannot be printed as asked
 * throws PrintError (geometry/print) saying what to change. Callers report them.
 */
import type { Pattern } from '../../../geometry/index.ts';
import { type PrintPlan, planPrint } from '../../../geometry/index.ts';
import { renderPdf } from './pdf.ts';
import { type PrintRequestInput, printOptionsSchema } from './print.schemas.ts';
import { renderSvg } from './svg.ts';

export class PrintOptionsError extends Error {
  override readonly name = 'PrintOptionsError';
}

export interface PrintResult {
  readonly format: 'pdf' | 'svg';
  readonly data: Buffer;
  readonly plan: PrintPlan;
  /** Labels of pages left out because no piece reaches them. */
  readonly emptyPages: readonly string[];
}

/** Validate print options; the message names each wrong field. */
export function parsePrintOptions(input: unknown) {
  const r = printOptionsSchema.safeParse(input);
  if (!r.success) throw new PrintOptionsError(r.error.issues.map((i) => `${i.path.join('.') || 'options'}: ${i.message}`).join('; '));
  return r.data;
}

export async function printPattern(
  pattern: Pattern,
  input: PrintRequestInput,
  today: Date = new Date(),
  onPage?: (done: number, total: number) => Promise<void> | void,
): Promise<PrintResult> {
  const o = parsePrintOptions(input);
  const plan = planPrint(pattern, {
    paper: o.paper,
    orientation: o.orientation,
    margin: o.margin,
    overlap: o.overlap,
    allowRotate90: o.allowRotate90,
    size: o.size,
    spacing: o.spacing,
  });
  const words = { title: o.title ?? pattern.name ?? 'Blockwright pattern', date: o.date ?? today.toISOString().slice(0, 10) };
  const data = o.format === 'pdf' ? await renderPdf(plan, words, onPage) : Buffer.from(renderSvg(plan, words), 'utf8');
  return { format: o.format, data, plan, emptyPages: plan.format === 'tiled' ? plan.empty.map((t) => t.label) : [] };
}
