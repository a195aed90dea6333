/**
 * Alterations as data: a zod discriminated union on `op`, one pure `perform` per operation,
 * and `applyOps` to replay an ordered list. Inputs are never changed; a refused operation
 * throws AlterationError naming the operation's position, and nothing is half-applied.
 */
import { z } from 'zod';
import type { Pattern } from '../model.ts';
import { pathTextDeferred } from '../path.ts';
import { blendOpSchema, performBlend } from './blend.ts';
import { AlterationError, type Caution, type OpResult } from './common.ts';
import { girthOpSchema, performGirthParsed } from './girth.ts';
import { markLineOpSchema, performMarkLine } from './mark-line.ts';
import { lengthenOpSchema, performLengthen, performRise, riseOpSchema } from './lengthen.ts';
import { performSeamAllowance, seamAllowanceOpSchema } from './seam-allowance.ts';
import { performSlashSpreadParsed, slashSpreadOpSchema } from './slash-spread.ts';
import { performShrinkage, shrinkageOpSchema } from './shrinkage.ts';

export const alterationOpSchema = z.discriminatedUnion('op', [lengthenOpSchema, riseOpSchema, blendOpSchema, shrinkageOpSchema, seamAllowanceOpSchema, girthOpSchema, slashSpreadOpSchema, markLineOpSchema]);
export type AlterationOp = z.input<typeof alterationOpSchema>;

/** The ops file of the command line: `{ "ops": [ … ] }`. */
export const alterationListSchema = z.object({ ops: z.array(alterationOpSchema).max(500) });

/** Perform one operation (already validated or not: it is parsed here). */
export function performOp(pattern: Pattern, input: AlterationOp): OpResult {
  return performParsed(pattern, alterationOpSchema.parse(input));
}

/** performOp for an operation the schema has already parsed (replay parses each one once). */
function performParsed(pattern: Pattern, op: z.output<typeof alterationOpSchema>): OpResult {
  switch (op.op) {
    case 'lengthen':
      return performLengthen(pattern, op);
    case 'rise':
      return performRise(pattern, op);
    case 'blend':
      return performBlend(pattern, op);
    case 'shrinkage':
      return performShrinkage(pattern, op);
    case 'slash-spread':
      return performSlashSpreadParsed(pattern, op);
    case 'girth':
      return performGirthParsed(pattern, op);
    case 'seam-allowance':
      return performSeamAllowance(pattern, op);
    case 'mark-line':
      return performMarkLine(pattern, op);
  }
}

export interface AppliedCaution extends Caution {
  /** Position of the operation in the list (0-based). */
  readonly op: number;
}

/**
 * Replay operations in order. Throws AlterationError (with the operation's position and kind
 * in the message) for the first operation that is refused or malformed.
 */
export function applyOps(pattern: Pattern, ops: readonly unknown[]): { pattern: Pattern; cautions: AppliedCaution[] } {
  // Path text is printed once, at the end, not between operations (see pathTextDeferred).
  return pathTextDeferred(patternTexts(pattern), (resolve, retain) => {
    // between operations only the current pattern's texts can be read again
    const r = replay(pattern, ops, (current) => retain(patternTexts(current)));
    return { pattern: resolveTexts(r.pattern, resolve), cautions: r.cautions };
  });
}

function patternTexts(pattern: Pattern): string[] {
  const out: string[] = [];
  for (const piece of pattern.pieces) {
    for (const o of piece.outlines) {
      out.push(o.d);
      if (o.cut !== undefined) out.push(o.cut);
    }
    for (const l of piece.lines) out.push(l.d);
  }
  return out;
}

/** Replace every placeholder of deferred path text by its text; untouched parts stay the same objects. */
function resolveTexts(pattern: Pattern, resolve: (d: string) => string): Pattern {
  let piecesChanged = false;
  const pieces = pattern.pieces.map((piece) => {
    let changed = false;
    const outlines = piece.outlines.map((o) => {
      const d = resolve(o.d);
      const cut = o.cut === undefined ? undefined : resolve(o.cut);
      if (d === o.d && cut === o.cut) return o;
      changed = true;
      return { ...o, d, ...(cut !== undefined ? { cut } : {}) };
    });
    const lines = piece.lines.map((l) => {
      const d = resolve(l.d);
      if (d === l.d) return l;
      changed = true;
      return { ...l, d };
    });
    if (!changed) return piece;
    piecesChanged = true;
    return { ...piece, outlines, lines };
  });
  return piecesChanged ? { ...pattern, pieces } : pattern;
}

function replay(pattern: Pattern, ops: readonly unknown[], performed: (current: Pattern) => void): { pattern: Pattern; cautions: AppliedCaution[] } {
  let current = pattern;
  const cautions: AppliedCaution[] = [];
  // Every operation is checked before the first is performed, one after the other: schema
  // checks interleaved with the geometry ran several times slower (each found its code and
  // caches cold). A bad operation is still reported when the replay reaches it, so an earlier
  // refusal comes first, as before.
  const checked = ops.map((raw) => alterationOpSchema.safeParse(raw));
  ops.forEach((raw, index) => {
    const parsed = checked[index]!;
    const kind = typeof raw === 'object' && raw !== null && 'op' in raw ? String((raw as { op: unknown }).op) : 'unknown';
    if (!parsed.success) {
      const issue = parsed.error.issues[0]!;
      throw new AlterationError('bad-amount', `operation ${index + 1} (${kind}): ${issue.path.join('.') || 'op'}: ${issue.message}`);
    }
    try {
      const r = performParsed(current, parsed.data);
      current = r.pattern;
      performed(current);
      for (const c of r.cautions) cautions.push({ ...c, op: index });
    } catch (error) {
      if (error instanceof AlterationError) throw new AlterationError(error.code, `operation ${index + 1} (${kind}): ${error.message}`, error.where);
      throw error;
    }
  });
  return { pattern: current, cautions };
}
