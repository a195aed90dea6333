import { useQueryClient } from '@tanstack/react-query';
import { useCallback, useEffect, useMemo, useRef, useState, type ReactNode } from 'react';
import { flushSync } from 'react-dom';
import { type AlterationOp, formatLength, type LengthUnit, type Pattern, type Point } from '../../../../geometry/index.ts';
import { CalibrationPanel, type CanvasOverlay, type CanvasPick, type CanvasView, PatternCanvas, useCalibration } from '../../../components/pattern-canvas';
import { Button } from '../../../components/ui/button';
import { cx } from '../../../lib/cx';
import type { WorkspaceMake } from '../api/schemas';
import type { WorkspacePattern } from '../api/get-pattern';
import { useRevision } from '../api/get-revisions';
import { amountAt, amountHandle, handlePoint, hasAmountHandle } from '../model/handles';
import { describeOp, inUnits } from '../model/describe';
import { newEntryId } from '../model/intents';
import { previewWith, prefixFor, replaySafely } from '../model/replay';
import { workspaceKeys } from '../query-keys';
import { type SaveStatus, useMakeEditor } from '../use-make-editor';
import { AlterationList } from './alteration-list';
import { ConflictDialog } from './conflict-dialog';
import { FitNotePanel } from './fit-note-panel';
import { MeasurementsPanel } from './measurements-panel';
import { PlanPanel } from './plan-panel';
import { RevisionHistory } from './revision-history';
import { type ToolContext, ToolForm, type ToolId, ToolTabs, toolFor } from './tools';

function statusText(status: SaveStatus): string {
  switch (status.kind) {
    case 'saved':
      return `Saved · revision ${status.revision}`;
    case 'saving':
      return 'Saving…';
    case 'unsaved':
      return 'Unsaved changes…';
    case 'conflict':
      return 'Not saved: someone else saved first';
    case 'error':
      return `Not saved: ${status.message}`;
  }
}

/** Is the key press meant for a text field rather than the workspace? */
const typing = (target: EventTarget | null) => target instanceof HTMLElement && (target.isContentEditable || ['INPUT', 'TEXTAREA', 'SELECT'].includes(target.tagName));

/**
 * The make workspace: the pieces drawn at true scale with the original size lines faint and the
 * altered outline bold, the tools, the list of alterations with undo/redo, the measurements and
 * the paired-seam report, the revision history, and (from the route) printing.
 */
export function MakeWorkspace({
  make,
  pattern,
  unit,
  printPanel,
  onSaved: onSavedOutside,
}: {
  make: WorkspaceMake;
  pattern: WorkspacePattern;
  unit: LengthUnit;
  printPanel?: ReactNode;
  /** After each saved revision (the route refreshes what other screens show of the make). */
  onSaved?: () => void;
}) {
  const base = pattern.pattern;
  const queryClient = useQueryClient();
  const onSaved = useCallback(() => {
    void queryClient.invalidateQueries({ queryKey: workspaceKeys.revisions(make.id) });
    onSavedOutside?.();
  }, [queryClient, make.id, onSavedOutside]);
  const editor = useMakeEditor({ makeId: make.id, revision: make.latestRevision, alterations: make.revision.alterations, pattern: base, unit, onSaved });
  const { entries } = editor;

  const [selectedId, setSelectedId] = useState<string | null>(null);
  const selected = entries.find((e) => e.id === selectedId);
  const [tool, setTool] = useState<ToolId>('length');
  const select = useCallback((id: string | null) => {
    setSelectedId(id);
    const entry = entries.find((e) => e.id === id);
    if (entry) setTool(toolFor(entry.op));
  }, [entries]);

  const committed = useMemo(() => replaySafely(base, entries), [base, entries]);

  // Dragging an amount: only the operations from the dragged one on are replayed, in the
  // drag handler; a position the engine refuses keeps the last good preview.
  const [draft, setDraft] = useState<{ id: string; op: AlterationOp; pattern: Pattern } | null>(null);
  const dragPrefix = useMemo(
    () => (selected && hasAmountHandle(selected.op) ? prefixFor(base, entries, selected.id) : undefined),
    [base, entries, selected],
  );
  const handle = useMemo(() => (dragPrefix && selected ? amountHandle(dragPrefix.before, selected.op) : undefined), [dragPrefix, selected]);
  const preview = draft?.pattern ?? committed.pattern;

  // Looking at an earlier revision (read-only) from the history.
  const [historyOpen, setHistoryOpen] = useState(false);
  const [viewing, setViewing] = useState<number | null>(null);
  const viewed = useRevision(make.id, viewing);
  const viewedPattern = useMemo(() => (viewed.data ? replaySafely(base, viewed.data.alterations).pattern : undefined), [viewed.data, base]);
  const shown = viewing !== null && viewedPattern ? viewedPattern : preview;

  // The canvas reports clicks to whichever tool is listening.
  const pickHandler = useRef<((pick: CanvasPick) => void) | null>(null);
  const [hint, setHint] = useState<string | undefined>();
  const listen = useCallback((handler: ((pick: CanvasPick) => void) | null, text?: string) => {
    pickHandler.current = handler;
    setHint(handler ? text : undefined);
  }, []);

  const { change } = editor;
  const submit = useCallback(
    (op: AlterationOp): string | undefined => {
      if (selected && toolFor(selected.op) === toolFor(op)) return change({ kind: 'update', id: selected.id, op });
      const id = newEntryId(entries);
      const existingBlend = op.op === 'blend' ? entries.find((e) => e.op.op === 'blend') : undefined;
      if (existingBlend) return change({ kind: 'update', id: existingBlend.id, op });
      const refused = change({ kind: 'add', entry: { id, enabled: true, op }, index: op.op === 'blend' ? 0 : entries.length });
      if (!refused && hasAmountHandle(op)) setSelectedId(id);
      return refused;
    },
    [selected, entries, change],
  );
  const editing = selected && toolFor(selected.op) === tool ? selected : undefined;
  const ctx = useMemo<ToolContext>(() => ({ base, current: committed.pattern, unit, editing, submit, listen }), [base, committed.pattern, unit, editing, submit, listen]);

  const step = unit === 'in' ? 25.4 / 16 : 1;
  const amountOf = (op: AlterationOp | undefined) => (op && hasAmountHandle(op) ? op.amount : 0);
  const liveAmount = amountOf(draft?.op ?? selected?.op);
  const overlays = useMemo<CanvasOverlay[]>(
    () => (handle && viewing === null ? [{ kind: 'handle', id: 'amount', piece: handle.piece, at: handlePoint(handle, liveAmount), axis: handle.axis, label: `Amount ${formatLength(liveAmount, unit, { signed: true })}` }] : []),
    [handle, liveAmount, unit, viewing],
  );
  // Pointer moves come faster than frames: keep the newest and replay once per animation frame.
  const dragFrame = useRef<{ op: AlterationOp; id: string; raf: number } | null>(null);
  const onHandleDrag = useCallback(
    (_id: string, point: Point, phase: 'start' | 'move' | 'end') => {
      if (!handle || !selected || !dragPrefix || !hasAmountHandle(selected.op)) return;
      const op: AlterationOp = { ...selected.op, amount: amountAt(handle, point, step) };
      if (phase !== 'end') {
        if (dragFrame.current) {
          dragFrame.current.op = op;
          return;
        }
        const frame = { op: op as AlterationOp, id: selected.id, raf: 0 };
        frame.raf = requestAnimationFrame(() => {
          dragFrame.current = null;
          const pattern = previewWith(dragPrefix, frame.op);
          // Rendered at once, inside this animation frame, so the new outline is painted in it.
          if (pattern) flushSync(() => setDraft({ id: frame.id, op: frame.op, pattern }));
        });
        dragFrame.current = frame;
      } else {
        if (dragFrame.current) cancelAnimationFrame(dragFrame.current.raf);
        dragFrame.current = null;
        setDraft(null);
        if (op.amount !== amountOf(selected.op)) change({ kind: 'update', id: selected.id, op });
      }
    },
    [handle, selected, dragPrefix, step, change],
  );
  const onPick = useCallback((pick: CanvasPick) => pickHandler.current?.(pick), []);

  // Undo and redo from the keyboard, except while typing in a field.
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || typing(e.target)) return;
      const key = e.key.toLowerCase();
      if (key === 'z' && !e.shiftKey) {
        e.preventDefault();
        editor.undo();
      } else if ((key === 'z' && e.shiftKey) || key === 'y') {
        e.preventDefault();
        editor.redo();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [editor]);

  // The measurements compare with the pattern without the selected (else the newest) alteration.
  const compared = selected ?? entries.at(-1);
  const before = useMemo(() => {
    if (!compared || compared.op.op === 'blend' || compared.enabled === false) return undefined;
    const r = replaySafely(base, entries.filter((e) => e.id !== compared.id));
    return r.error ? undefined : r.pattern;
  }, [base, entries, compared]);

  const [calibration, setCalibration] = useCalibration();
  const [view, setView] = useState<CanvasView>({ mode: 'fit' });
  const zoom = view.mode === 'scale' ? Math.round((view.pxPerMm / calibration.pxPerMm) * 100) : null;
  const [printOpen, setPrintOpen] = useState(false);
  const [planOpen, setPlanOpen] = useState(false);
  const [noteOpen, setNoteOpen] = useState(false);

  return (
    <div className="flex flex-col gap-3">
      <div className="flex flex-wrap items-center gap-2">
        <p role="status" aria-label="Save status" className={cx('rounded-full px-3 py-1 text-sm', editor.status.kind === 'saved' ? 'bg-sage-50 text-sage-700' : editor.status.kind === 'error' || editor.status.kind === 'conflict' ? 'bg-madder-50 text-madder-700' : 'bg-tape-100 text-ink-900')}>
          {statusText(editor.status)}
        </p>
        {editor.status.kind === 'error' && (
          <Button variant="quiet" onClick={editor.flush}>
            Try again
          </Button>
        )}
        <Button variant="secondary" disabled={!editor.canUndo} onClick={editor.undo} title={editor.undoLabel ? `Undo: ${editor.undoLabel} (Ctrl+Z)` : 'Undo (Ctrl+Z)'}>
          Undo
        </Button>
        <Button variant="secondary" disabled={!editor.canRedo} onClick={editor.redo} title={editor.redoLabel ? `Redo: ${editor.redoLabel} (Ctrl+Shift+Z)` : 'Redo (Ctrl+Shift+Z)'}>
          Redo
        </Button>
        <span className="mx-1 h-6 w-px bg-calico-400" aria-hidden />
        <Button variant="secondary" onClick={() => setView({ mode: 'fit' })}>
          Fit
        </Button>
        <Button variant="secondary" onClick={() => setView({ mode: 'scale', pxPerMm: calibration.pxPerMm })}>
          True scale (100 %)
        </Button>
        {zoom !== null && <span className="text-sm tabular-nums text-ink-700">{zoom} %</span>}
        <details className="relative">
          <summary className="cursor-pointer rounded-md px-3 py-2 text-sm font-semibold text-denim-700 hover:bg-denim-50">Calibrate the screen</summary>
          <div className="absolute z-20 mt-1 w-96 rounded-lg border border-calico-400 bg-calico-50 p-3 shadow-lg">
            <CalibrationPanel unit={unit} onChange={(c) => { setCalibration(c); if (view.mode === 'scale') setView({ mode: 'scale', pxPerMm: c.pxPerMm }); }} />
          </div>
        </details>
        <span className="flex-1" />
        <Button variant="secondary" aria-expanded={planOpen} onClick={() => setPlanOpen((o) => !o)}>
          Plan the fit
        </Button>
        <Button variant="secondary" aria-expanded={noteOpen} onClick={() => setNoteOpen((o) => !o)}>
          How did it fit?
        </Button>
        <Button variant="secondary" aria-expanded={historyOpen} onClick={() => setHistoryOpen((o) => !o)}>
          History
        </Button>
        {printPanel && (
          <Button aria-expanded={printOpen} onClick={() => { editor.flush(); setPrintOpen((o) => !o); }}>
            Print
          </Button>
        )}
      </div>
      {!calibration.calibrated && view.mode === 'scale' && (
        <p role="note" className="rounded-md border border-tape-400 bg-tape-100 px-3 py-2 text-sm text-ink-900">
          The screen is not calibrated: 100 % assumes 96 pixels per inch, which few screens have. Calibrate against a card or a ruler before judging sizes on screen.
        </p>
      )}
      {viewing !== null && (
        <div role="region" aria-label="Earlier revision" className="flex flex-wrap items-center gap-2 rounded-md border border-denim-600 bg-denim-50 px-3 py-2 text-sm">
          <span className="font-semibold text-ink-900">Looking at revision {viewing}{viewed.data ? `: ${viewed.data.summary}` : ''}</span>
          <span className="flex-1" />
          <Button
            disabled={!viewed.data}
            onClick={() => {
              if (!viewed.data) return;
              const refused = change({ kind: 'replace', entries: viewed.data.alterations, restoredFrom: viewing });
              if (!refused) setViewing(null);
            }}
          >
            Restore revision {viewing}
          </Button>
          <Button variant="secondary" onClick={() => setViewing(null)}>
            Back to editing
          </Button>
        </div>
      )}
      <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_21rem]">
        <div className="flex min-w-0 flex-col gap-3">
          {hint && viewing === null && <p role="status" className="text-sm font-medium text-denim-700">{hint}</p>}
          <PatternCanvas
            pattern={shown}
            reference={base}
            view={view}
            onViewChange={setView}
            onPick={onPick}
            overlays={overlays}
            onHandleDrag={onHandleDrag}
            label={`Pieces of ${make.name}: the altered outline bold, the original size lines faint`}
            className="h-[62vh] min-h-96"
          />
          {committed.cautions.length > 0 && (
            <ul aria-label="Cautions" className="flex flex-col gap-1">
              {[...new Set(committed.cautions.map((c) => inUnits(c.message, unit)))].map((m) => (
                <li key={m} className="rounded-md border border-tape-400 bg-tape-100 px-3 py-1 text-sm text-ink-900">
                  {m}
                </li>
              ))}
            </ul>
          )}
          <section aria-label="Tools" className="flex flex-col gap-3 rounded-lg border border-calico-300 bg-calico-100 p-3">
            <ToolTabs tool={tool} onChange={(t) => { setTool(t); if (selected && toolFor(selected.op) !== t) setSelectedId(null); }} />
            {editing && <p className="text-xs font-semibold text-denim-700">Editing: {describeOp(editing.op, unit)}</p>}
            <div className="max-w-xl">
              <ToolForm tool={tool} ctx={ctx} />
            </div>
          </section>
        </div>
        <aside aria-label="Alterations and measurements" className="flex flex-col gap-4">
          {historyOpen ? (
            <section aria-labelledby="history-heading" className="flex flex-col gap-2">
              <h2 id="history-heading" className="font-display text-lg text-ink-900">History</h2>
              <RevisionHistory makeId={make.id} current={editor.base} viewing={viewing} onView={setViewing} />
            </section>
          ) : null}
          {printOpen && printPanel ? <section aria-label="Print">{printPanel}</section> : null}
          {planOpen && viewing === null ? <PlanPanel makeId={make.id} patternId={make.pattern.id} unit={unit} entries={entries} change={change} /> : null}
          {noteOpen ? <FitNotePanel makeId={make.id} unit={unit} /> : null}
          <section aria-labelledby="alterations-heading" className="flex flex-col gap-2">
            <h2 id="alterations-heading" className="font-display text-lg text-ink-900">Alterations</h2>
            <AlterationList entries={entries} unit={unit} selectedId={selectedId} onSelect={select} onChange={change} error={committed.error} cautions={committed.cautions} />
          </section>
          <MeasurementsPanel now={viewing !== null ? shown : committed.pattern} before={viewing === null ? before : undefined} beforeLabel={compared ? `what “${describeOp(compared.op, unit)}” changed` : undefined} unit={unit} />
        </aside>
      </div>
      {editor.status.kind === 'conflict' && <ConflictDialog message={editor.status.message} onReload={editor.reloadLatest} onApplyOnTop={editor.applyOnTop} />}
    </div>
  );
}
