/**
 * Changes to a make's alteration list, as data. Every change the person makes is one intent;
 * undo applies its inverse, and after a conflicting save the unsaved intents are applied again
 * on top of the newest revision ("apply my change on top"). Pure: no React, no I/O.
 */
import type { AlterationEntry, AlterationOp } from '../../../../geometry/index.ts';

export type Intent =
  | { kind: 'add'; entry: AlterationEntry; index: number }
  | { kind: 'remove'; id: string }
  | { kind: 'update'; id: string; op: AlterationOp }
  | { kind: 'toggle'; id: string; enabled: boolean }
  | { kind: 'move'; id: string; to: number }
  | { kind: 'replace'; entries: readonly AlterationEntry[]; restoredFrom?: number };

/** Apply one intent. An intent about an entry that is not there (removed by someone else) changes nothing. */
export function applyIntent(entries: readonly AlterationEntry[], intent: Intent): AlterationEntry[] {
  const at = (id: string) => entries.findIndex((e) => e.id === id);
  switch (intent.kind) {
    case 'add': {
      if (at(intent.entry.id) >= 0) return [...entries];
      const i = Math.max(0, Math.min(intent.index, entries.length));
      return [...entries.slice(0, i), intent.entry, ...entries.slice(i)];
    }
    case 'remove':
      return entries.filter((e) => e.id !== intent.id);
    case 'update':
      return entries.map((e) => (e.id === intent.id ? { ...e, op: intent.op } : e));
    case 'toggle':
      return entries.map((e) => (e.id === intent.id ? { ...e, enabled: intent.enabled } : e));
    case 'move': {
      const from = at(intent.id);
      if (from < 0) return [...entries];
      const rest = entries.filter((e) => e.id !== intent.id);
      const to = Math.max(0, Math.min(intent.to, rest.length));
      return [...rest.slice(0, to), entries[from]!, ...rest.slice(to)];
    }
    case 'replace':
      return [...intent.entries];
  }
}

/** The intent that undoes `intent`, given the list it was applied to. */
export function invertIntent(before: readonly AlterationEntry[], intent: Intent): Intent {
  const index = before.findIndex((e) => 'id' in intent && e.id === intent.id);
  const entry = before[index];
  switch (intent.kind) {
    case 'add':
      return { kind: 'remove', id: intent.entry.id };
    case 'remove':
      return entry ? { kind: 'add', entry, index } : { kind: 'replace', entries: before };
    case 'update':
      return entry ? { kind: 'update', id: intent.id, op: entry.op } : { kind: 'replace', entries: before };
    case 'toggle':
      return { kind: 'toggle', id: intent.id, enabled: entry ? entry.enabled !== false : !intent.enabled };
    case 'move':
      return { kind: 'move', id: intent.id, to: index };
    case 'replace':
      return { kind: 'replace', entries: before };
  }
}

/** A new id for an entry: random where the browser gives one, unique in the list either way. */
export function newEntryId(existing: readonly AlterationEntry[], random: () => string = () => crypto.randomUUID()): string {
  let id = random();
  while (existing.some((e) => e.id === id)) id = random();
  return id;
}
