/**
 * Accepting a fit plan into a make's list. Pure.
 */
import type { AlterationEntry, AlterationOp } from '../../../../geometry/index.ts';

/** Operations the plan decides; the rest of the list (marked lines, slashes, seam allowance) stays. */
const PLANNED = new Set(['blend', 'rise', 'lengthen', 'girth', 'shrinkage']);

/**
 * The plan's alterations in place of the list's own sizes and lengths: marked lines first (the
 * plan's length changes may use them), then the plan, then the rest in their order.
 */
export function acceptPlan(entries: readonly AlterationEntry[], plan: { readonly steps: readonly { readonly op: AlterationOp }[] }, newId: (taken: readonly AlterationEntry[]) => string): AlterationEntry[] {
  const marks = entries.filter((e) => e.op.op === 'mark-line');
  const rest = entries.filter((e) => e.op.op !== 'mark-line' && !PLANNED.has(e.op.op));
  const planned: AlterationEntry[] = [];
  for (const step of plan.steps) planned.push({ id: newId([...entries, ...planned]), enabled: true, op: step.op });
  return [...marks, ...planned, ...rest];
}

