/**
 * Alterations in words, in the person's units: the list's labels and the one-line summary
 * saved with each revision ("Shortened lower leg by 3 in").
 */
import { type AlterationEntry, type AlterationOp, formatLength, type LengthUnit } from '../../../../geometry/index.ts';
import type { Intent } from './intents.ts';

const len = (mm: number, unit: LengthUnit) => formatLength(Math.abs(mm), unit);

/** Short title of one alteration. */
export function describeOp(op: AlterationOp, unit: LengthUnit): string {
  switch (op.op) {
    case 'lengthen':
      return op.amount < 0 ? `Shorten at “${op.line}” by ${len(op.amount, unit)}` : op.amount > 0 ? `Lengthen at “${op.line}” by ${len(op.amount, unit)}` : `Lengthen at “${op.line}” (no change)`;
    case 'rise':
      return op.amount < 0 ? `Lower the rise by ${len(op.amount, unit)}` : `Raise the rise by ${len(op.amount, unit)}`;
    case 'blend':
      return `Blend sizes: ${op.levels.map((l) => `${l.size} at ${l.level}`).join(', ')}`;
    case 'shrinkage':
      return `Shrinkage: ${op.lengthwise} % along, ${op.crosswise} % across the grain`;
    case 'seam-allowance': {
      const extra = Object.entries(op.edges ?? {}).map(([edge, w]) => `${edge} ${len(w, unit)}`);
      return `Seam allowance ${len(op.width, unit)}${extra.length > 0 ? ` (${extra.join(', ')})` : ''}`;
    }
    case 'girth':
      return `${op.amount < 0 ? 'Take in' : 'Let out'} the ${op.edge} at ${op.level} by ${len(op.amount, unit)}`;
    case 'slash-spread':
      return op.amount !== undefined
        ? `${op.amount < 0 ? 'Close' : 'Spread'} ${op.piece} by ${len(op.amount, unit)} at the slash`
        : `${(op.angle ?? 0) < 0 ? 'Close' : 'Spread'} ${op.piece} by ${(Math.abs(op.angle ?? 0) * 180 / Math.PI).toFixed(1)}° at the slash`;
    case 'mark-line':
      return `Mark ${op.role === 'level' ? 'level' : 'lengthen/shorten'} line “${op.name}” on ${op.piece}`;
  }
}

/** The one-line summary of a change, saved with the revision. */
export function describeIntent(intent: Intent, before: readonly AlterationEntry[], unit: LengthUnit): string {
  const find = (id: string) => before.find((e) => e.id === id);
  const title = (id: string) => {
    const e = find(id);
    return e ? describeOp(e.op, unit) : 'an alteration';
  };
  switch (intent.kind) {
    case 'add':
      return `Added: ${describeOp(intent.entry.op, unit)}`;
    case 'remove':
      return `Removed: ${title(intent.id)}`;
    case 'update':
      return `Changed to: ${describeOp(intent.op, unit)}`;
    case 'toggle':
      return `${intent.enabled ? 'Switched on' : 'Switched off'}: ${title(intent.id)}`;
    case 'move':
      return `Moved: ${title(intent.id)}`;
    case 'replace':
      return intent.restoredFrom !== undefined ? `Restored revision ${intent.restoredFrom}` : 'Replaced the alteration list';
  }
}

/**
 * The engine's messages speak millimetres ("a lengthen of -76.2 mm is a large change"); show
 * each length in the person's units instead. Only "<number> mm" is touched.
 */
export function inUnits(message: string, unit: LengthUnit): string {
  return message.replace(/(-?\d+(?:\.\d+)?) mm\b/g, (_, n: string) => formatLength(Number(n), unit));
}
