/**
 * The altered pattern, computed in the browser with the same engine as the server. While an
 * amount is dragged only the operations from the dragged one on are replayed: the result of
 * the ones before it is kept (`prefixFor`). Pure apart from the caller's caching.
 */
import {
  type AlterationEntry,
  AlterationError,
  AlterationListError,
  type AlterationOp,
  type AppliedCaution,
  type Pattern,
  applyOps,
  replayAlterations,
} from '../../../../geometry/index.ts';

export interface ReplayOutcome {
  readonly pattern: Pattern;
  readonly cautions: readonly AppliedCaution[];
  /** The first entry the engine refused (the pattern is then the result of the entries before it). */
  readonly error?: { readonly index: number; readonly id: string; readonly message: string };
}

/** Replay the list; a refusal keeps the result of the entries before the refused one. */
export function replaySafely(base: Pattern, entries: readonly AlterationEntry[]): ReplayOutcome {
  try {
    return replayAlterations(base, entries);
  } catch (e) {
    if (!(e instanceof AlterationListError)) throw e;
    const before = replayAlterations(base, entries.slice(0, e.index));
    return { ...before, error: { index: e.index, id: e.id, message: e.message } };
  }
}

/** The message when the list would be refused, else undefined. */
export function refusal(base: Pattern, entries: readonly AlterationEntry[]): string | undefined {
  try {
    replayAlterations(base, entries);
    return undefined;
  } catch (e) {
    if (e instanceof AlterationListError) return e.message;
    throw e;
  }
}

/** What a drag needs: the pattern before the dragged entry, and the switched-on entries after it. */
export interface DragPrefix {
  readonly id: string;
  readonly before: Pattern;
  readonly after: readonly AlterationOp[];
}

export function prefixFor(base: Pattern, entries: readonly AlterationEntry[], id: string): DragPrefix | undefined {
  const index = entries.findIndex((e) => e.id === id);
  if (index < 0) return undefined;
  const head = replaySafely(base, entries.slice(0, index));
  if (head.error) return undefined;
  return { id, before: head.pattern, after: entries.slice(index + 1).filter((e) => e.enabled !== false).map((e) => e.op) };
}

/** The preview with the dragged entry's operation replaced; undefined when the engine refuses it. */
export function previewWith(prefix: DragPrefix, op: AlterationOp): Pattern | undefined {
  try {
    return applyOps(prefix.before, [op, ...prefix.after]).pattern;
  } catch (e) {
    if (e instanceof AlterationError) return undefined;
    throw e;
  }
}
