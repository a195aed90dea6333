import { useCallback, useEffect, useMemo, useRef, useState } from 'react';
import type { AlterationEntry, LengthUnit, Pattern } from '../../../geometry/index.ts';
import { isApiError } from '../../lib/api-client';
import { getWorkspaceMake } from './api/get-make';
import { getRevision } from './api/get-revisions';
import { saveRevision } from './api/save-revision';
import { describeIntent } from './model/describe';
import { type Intent, applyIntent, invertIntent } from './model/intents';
import { refusal } from './model/replay';

/** Autosave waits this long after the last change, so a burst of typing is one revision. */
export const AUTOSAVE_DELAY_MS = 500;

export type SaveStatus =
  | { kind: 'saved'; revision: number }
  | { kind: 'unsaved' }
  | { kind: 'saving' }
  | { kind: 'conflict'; message: string }
  | { kind: 'error'; message: string };

interface Step {
  intent: Intent;
  inverse: Intent;
  summary: string;
}

interface EditorState {
  entries: AlterationEntry[];
  /** The revision the entries were last saved as (or loaded from). */
  base: number;
  /** Changes not yet saved, in order: applied again on top of a newer revision after a conflict. */
  pending: { intent: Intent; summary: string; restoredFrom?: number }[];
  undo: Step[];
  redo: Step[];
}

export interface MakeEditor {
  entries: readonly AlterationEntry[];
  base: number;
  status: SaveStatus;
  canUndo: boolean;
  canRedo: boolean;
  undoLabel?: string;
  redoLabel?: string;
  /** Apply a change; returns the engine's refusal message instead when the list would not replay. */
  change: (intent: Intent) => string | undefined;
  undo: () => void;
  redo: () => void;
  /** After a conflict: drop the unsaved changes and load the newest revision. */
  reloadLatest: () => Promise<void>;
  /** After a conflict: apply the unsaved changes on top of the newest revision and save. */
  applyOnTop: () => Promise<void>;
  /** Save now (skips the autosave wait). */
  flush: () => void;
}

/**
 * The make's alteration list being edited: changes as intents with undo/redo, autosaved as
 * new revisions (append-only on the server). A save from a revision that is no longer the
 * newest gets a conflict; the person chooses to reload or to apply their change on top.
 */
export function useMakeEditor(options: {
  makeId: string;
  revision: number;
  alterations: readonly AlterationEntry[];
  pattern: Pattern;
  unit: LengthUnit;
  onSaved?: (revision: number) => void;
}): MakeEditor {
  const { makeId, pattern, unit, onSaved } = options;
  const [state, setState] = useState<EditorState>(() => ({ entries: [...options.alterations], base: options.revision, pending: [], undo: [], redo: [] }));
  const [status, setStatus] = useState<SaveStatus>({ kind: 'saved', revision: options.revision });
  // The newest state for async code; every update below sets it together with the React state.
  const stateRef = useRef(state);
  const saving = useRef(false);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const conflicted = useRef(false);

  const saveRef = useRef<() => Promise<void>>(async () => {});
  const save = useCallback(async () => {
    clearTimeout(timer.current);
    if (saving.current || conflicted.current) return;
    const snapshot = stateRef.current;
    if (snapshot.pending.length === 0) return;
    saving.current = true;
    setStatus({ kind: 'saving' });
    const sent = snapshot.pending.length;
    const last = snapshot.pending[sent - 1]!;
    const summary = sent === 1 ? last.summary : `${last.summary} (and ${sent - 1} earlier change${sent === 2 ? '' : 's'})`;
    try {
      const revision = await saveRevision({
        makeId,
        baseRevision: snapshot.base,
        alterations: snapshot.entries,
        summary: summary.slice(0, 300),
        ...(sent === 1 && last.restoredFrom !== undefined ? { restoredFrom: last.restoredFrom } : {}),
      });
      setState((s) => ({ ...s, base: revision.number, pending: s.pending.slice(sent) }));
      stateRef.current = { ...stateRef.current, base: revision.number, pending: stateRef.current.pending.slice(sent) };
      setStatus(stateRef.current.pending.length > 0 ? { kind: 'unsaved' } : { kind: 'saved', revision: revision.number });
      onSaved?.(revision.number);
    } catch (e) {
      if (isApiError(e, 'stale_revision')) {
        conflicted.current = true;
        setStatus({ kind: 'conflict', message: e.message });
      } else setStatus({ kind: 'error', message: e instanceof Error ? e.message : 'The change could not be saved.' });
    } finally {
      saving.current = false;
    }
    if (!conflicted.current && stateRef.current.pending.length > 0) timer.current = setTimeout(() => void saveRef.current(), AUTOSAVE_DELAY_MS);
  }, [makeId, onSaved]);
  useEffect(() => {
    saveRef.current = save;
  }, [save]);

  const schedule = useCallback(() => {
    clearTimeout(timer.current);
    setStatus((s) => (s.kind === 'conflict' ? s : { kind: 'unsaved' }));
    timer.current = setTimeout(() => void save(), AUTOSAVE_DELAY_MS);
  }, [save]);

  useEffect(() => () => clearTimeout(timer.current), []);

  const perform = useCallback(
    (intent: Intent, record: 'new' | 'undo' | 'redo', label?: string): string | undefined => {
      const current = stateRef.current;
      const next = applyIntent(current.entries, intent);
      const refused = refusal(pattern, next);
      if (refused) return refused;
      const summary = label ?? describeIntent(intent, current.entries, unit);
      const step: Step = { intent, inverse: invertIntent(current.entries, intent), summary };
      const pendingItem = { intent, summary, ...(intent.kind === 'replace' && intent.restoredFrom !== undefined ? { restoredFrom: intent.restoredFrom } : {}) };
      const updated: EditorState = {
        entries: next,
        base: current.base,
        pending: [...current.pending, pendingItem],
        undo: record === 'undo' ? current.undo.slice(0, -1) : [...current.undo, step],
        redo: record === 'new' ? [] : record === 'redo' ? current.redo.slice(0, -1) : current.redo,
      };
      stateRef.current = updated;
      setState(updated);
      schedule();
      return undefined;
    },
    [pattern, unit, schedule],
  );

  const change = useCallback((intent: Intent) => perform(intent, 'new'), [perform]);

  /**
   * Nothing to undo in this session (e.g. after a reload): undo the newest saved revision by
   * going back to the one before it, as a new revision; redo goes forward again.
   */
  const undoSavedRevision = useCallback(async () => {
    const { base, pending, entries } = stateRef.current;
    if (base <= 1 || pending.length > 0) return;
    const [previous, newest] = await Promise.all([getRevision(makeId, base - 1), getRevision(makeId, base)]);
    const label = `Undid: ${newest.summary}`;
    const error = perform({ kind: 'replace', entries: previous.alterations }, 'new', label);
    if (error) return;
    const redoStep: Step = { intent: { kind: 'replace', entries }, inverse: { kind: 'replace', entries: previous.alterations }, summary: newest.summary };
    stateRef.current = { ...stateRef.current, undo: [], redo: [redoStep] };
    setState(stateRef.current);
  }, [makeId, perform]);

  const undo = useCallback(() => {
    const step = stateRef.current.undo.at(-1);
    if (!step) {
      void undoSavedRevision();
      return;
    }
    const before = stateRef.current.entries;
    const error = perform(step.inverse, 'undo', `Undid: ${step.summary}`);
    if (error) return;
    // What redo does is the original intent again, taken from the list as it was before undoing.
    const redoStep: Step = { intent: step.intent, inverse: invertIntent(applyIntent(before, step.inverse), step.intent), summary: step.summary };
    stateRef.current = { ...stateRef.current, redo: [...stateRef.current.redo, redoStep] };
    setState(stateRef.current);
  }, [perform, undoSavedRevision]);

  const redo = useCallback(() => {
    const step = stateRef.current.redo.at(-1);
    if (!step) return;
    const error = perform(step.intent, 'redo', `Redid: ${step.summary}`);
    if (error) return;
    const undone = stateRef.current.undo;
    // perform() pushed a step for the redo; keep its summary the original one so undo reads well.
    stateRef.current = { ...stateRef.current, undo: [...undone.slice(0, -1), { ...undone.at(-1)!, summary: step.summary }] };
    setState(stateRef.current);
  }, [perform]);

  const reloadLatest = useCallback(async () => {
    const latest = await getWorkspaceMake(makeId);
    conflicted.current = false;
    const fresh: EditorState = { entries: [...latest.revision.alterations], base: latest.latestRevision, pending: [], undo: [], redo: [] };
    stateRef.current = fresh;
    setState(fresh);
    setStatus({ kind: 'saved', revision: latest.latestRevision });
  }, [makeId]);

  const applyOnTop = useCallback(async () => {
    const latest = await getWorkspaceMake(makeId);
    const mine = stateRef.current.pending;
    let entries: AlterationEntry[] = [...latest.revision.alterations];
    for (const p of mine) entries = applyIntent(entries, p.intent);
    const refused = refusal(pattern, entries);
    if (refused) {
      setStatus({ kind: 'conflict', message: `Your change cannot go on top of the newest revision: ${refused}. Reload to see it.` });
      return;
    }
    conflicted.current = false;
    const merged: EditorState = {
      entries,
      base: latest.latestRevision,
      pending: [{ intent: { kind: 'replace', entries }, summary: mine.map((p) => p.summary).join('; ').slice(0, 280) || 'Applied on top' }],
      undo: [],
      redo: [],
    };
    stateRef.current = merged;
    setState(merged);
    await save();
  }, [makeId, pattern, save]);

  const flush = useCallback(() => void save(), [save]);

  return useMemo(
    () => ({
      entries: state.entries,
      base: state.base,
      status,
      canUndo: state.undo.length > 0 || (state.base > 1 && state.pending.length === 0),
      canRedo: state.redo.length > 0,
      undoLabel: state.undo.at(-1)?.summary ?? (state.base > 1 ? `the change saved as revision ${state.base}` : undefined),
      redoLabel: state.redo.at(-1)?.summary,
      change,
      undo,
      redo,
      reloadLatest,
      applyOnTop,
      flush,
    }),
    [state, status, change, undo, redo, reloadLatest, applyOnTop, flush],
  );
}
