import { useEffect, useMemo, useState, type ReactNode } from 'react';
import {
  LabellingError,
  PatternError,
  edgeLength,
  formatLength,
  parsePattern,
  pieceLabels,
  renamePiece,
  renameSize,
  withCrossLine,
  withEdge,
  withGrainline,
  withLandmark,
  type LengthUnit,
  type Pattern,
  type Piece,
} from '../../../../geometry/index.ts';
import { PatternCanvas, layoutPieces, type CanvasOverlay, type CanvasPick, type CanvasView } from '../../../components/pattern-canvas';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { Panel } from '../../../components/ui/panel';
import { TextField } from '../../../components/ui/text-field';
import { isApiError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { useUpdatePattern } from '../api/update-pattern';
import type { PatternDetail } from '../types';
import { LabellingTools, edgeName, levelName, toolHint, type ActiveTool, type ToolOptions } from './labelling-tools';

const FIT: CanvasView = { mode: 'fit' };

const initialOptions: ToolOptions = {
  level: 'hip',
  levelOther: '',
  lengthen: 'lower leg',
  notch: 'notch 1',
  edgeRole: 'inseam',
  edgeOther: '',
  squareToGrain: true,
};

/** A piece alone, as a pattern the canvas can draw. */
function usePieceAlone(pattern: Pattern, piece: Piece): Pattern {
  return useMemo(() => ({ ...pattern, pieces: [piece] }), [pattern, piece]);
}

/** A text input that applies its value on Enter or when it loses focus (renames refuse clashes). */
function CommitField({ label, value, onCommit, className }: { label: string; value: string; onCommit: (value: string) => string | null; className?: string }) {
  const [text, setText] = useState(value);
  const [error, setError] = useState<string | undefined>();
  const [seen, setSeen] = useState(value);
  if (seen !== value) {
    setSeen(value);
    setText(value);
  }
  const commit = () => {
    if (text === value) return;
    const problem = onCommit(text);
    setError(problem ?? undefined);
  };
  return (
    <TextField
      label={label}
      value={text}
      maxLength={120}
      className={className}
      error={error}
      onChange={(e) => setText(e.target.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === 'Enter') {
          e.preventDefault();
          commit();
        }
      }}
    />
  );
}

function PiecePreview({ pattern, piece }: { pattern: Pattern; piece: Piece }) {
  const alone = usePieceAlone(pattern, piece);
  return <PatternCanvas pattern={alone} view={FIT} label={`Preview of ${piece.name}`} className="h-44" />;
}

/** What a piece has labelled, with edge lengths in the person's units (first size listed). */
function Checklist({ piece, units, onRemoveLine, onRemoveEdge }: { piece: Piece; units: LengthUnit; onRemoveLine?: (role: string, name: string) => void; onRemoveEdge?: (name: string) => void }) {
  const labels = pieceLabels(piece);
  const size = piece.outlines[0]?.size ?? '';
  const lengthOf = (name: string) => {
    try {
      const mm = edgeLength(piece, size, name);
      return mm === undefined ? '' : `${formatLength(mm, units)} in size ${size}`;
    } catch {
      return 'cannot be measured';
    }
  };
  const done = (yes: boolean) => (
    <span aria-hidden className={cx('mt-1 inline-block size-2.5 shrink-0 rounded-full', yes ? 'bg-sage-700' : 'border border-chalk-600')} />
  );
  const removable = (role: string, name: string) =>
    onRemoveLine && (
      <button type="button" className="ml-1 text-xs text-denim-700 underline" onClick={() => onRemoveLine(role, name)} aria-label={`Remove ${role === 'level' ? 'level line' : 'lengthen/shorten line'} ${name} from ${piece.name}`}>
        remove
      </button>
    );
  return (
    <ul className="flex flex-col gap-1 text-sm" aria-label={`Labels on ${piece.name}`}>
      <li className="flex gap-2">
        {done(labels.grainline)}
        <span>Grainline: {labels.grainline ? 'marked' : 'not marked yet'}</span>
      </li>
      <li className="flex gap-2">
        {done(labels.levels.length > 0)}
        <span>
          Levels:{' '}
          {labels.levels.length === 0
            ? 'none yet'
            : labels.levels.map((n, i) => (
                <span key={n}>
                  {i > 0 && ', '}
                  {n}
                  {removable('level', n)}
                </span>
              ))}
        </span>
      </li>
      <li className="flex gap-2">
        {done(labels.lengthenLines.length > 0)}
        <span>
          Lengthen/shorten lines:{' '}
          {labels.lengthenLines.length === 0
            ? 'none yet'
            : labels.lengthenLines.map((n, i) => (
                <span key={n}>
                  {i > 0 && ', '}
                  {n}
                  {removable('lengthen', n)}
                </span>
              ))}
        </span>
      </li>
      <li className="flex gap-2">
        {done(labels.edges.length > 0)}
        <span>
          Edges:{' '}
          {labels.edges.length === 0
            ? 'none yet'
            : labels.edges.map((e, i) => (
                <span key={e.name}>
                  {i > 0 && '; '}
                  {e.name} ({lengthOf(e.name)})
                  {onRemoveEdge && (
                    <button type="button" className="ml-1 text-xs text-denim-700 underline" onClick={() => onRemoveEdge(e.name)} aria-label={`Remove edge ${e.name} from ${piece.name}`}>
                      remove
                    </button>
                  )}
                </span>
              ))}
        </span>
      </li>
      <li className="flex gap-2">
        {done(labels.notches.length > 0)}
        <span>Notches: {labels.notches.length === 0 ? 'none yet' : labels.notches.join(', ')}</span>
      </li>
    </ul>
  );
}

/** "pattern.pieces.1.name" → "piece 2, name". */
function fieldLabel(key: string): string {
  return key
    .replace(/^pattern\./, '')
    .replace(/pieces\.(\d+)/, (_, n: string) => `piece ${Number(n) + 1}`)
    .replace(/outlines\.(\d+)/, (_, n: string) => `size line ${Number(n) + 1}`)
    .replace(/lines\.(\d+)/, (_, n: string) => `line ${Number(n) + 1}`)
    .replace(/points\.(\d+)/, (_, n: string) => `point ${Number(n) + 1}`)
    .replace(/\./g, ', ');
}

function nextNotchName(piece: Piece): string {
  const names = new Set(piece.outlines.flatMap((o) => o.points.map((p) => p.name)));
  let n = 1;
  while (names.has(`notch ${n}`)) n++;
  return `notch ${n}`;
}

/**
 * The review of an uploaded pattern: pieces and sizes with previews, import notes, renaming,
 * cut count, and labelling by clicking on the drawing of the selected piece; Save sends the
 * whole pattern. Read-only (no tools, no fields) when `detail.canEdit` is false.
 * paper.js comes with PatternCanvas: use only from lazily loaded routes.
 */
export function PatternReview({ detail, units, startMake }: { detail: PatternDetail; units: LengthUnit; startMake?: ReactNode }) {
  const initial = useMemo(() => {
    try {
      return { pattern: parsePattern(detail.pattern), error: null };
    } catch (error) {
      return { pattern: null, error: error instanceof PatternError ? error.message : 'The pattern cannot be read.' };
    }
  }, [detail.pattern]);
  if (!initial.pattern) return <FormAlert>{initial.error}</FormAlert>;
  return <ReviewBody key={detail.id} detail={detail} initial={initial.pattern} units={units} startMake={startMake} />;
}

function ReviewBody({ detail, initial, units, startMake }: { detail: PatternDetail; initial: Pattern; units: LengthUnit; startMake?: ReactNode }) {
  const editable = detail.canEdit;
  const [draft, setDraft] = useState<Pattern>(initial);
  const [name, setName] = useState(detail.name);
  const [dirty, setDirty] = useState(false);
  const [selected, setSelected] = useState(0);
  const [tool, setTool] = useState<ActiveTool | null>(null);
  const [options, setOptions] = useState<ToolOptions>(() => ({ ...initialOptions, notch: nextNotchName(initial.pieces[0]!) }));
  const [message, setMessage] = useState<{ tone: 'error' | 'note'; text: string } | null>(null);
  const [view, setView] = useState<CanvasView>(FIT);
  const save = useUpdatePattern({ onSuccess: () => setDirty(false) });

  const piece = draft.pieces[Math.min(selected, draft.pieces.length - 1)]!;
  const shown = usePieceAlone(draft, piece);
  const layout = useMemo(() => layoutPieces(shown), [shown]);
  const placement = layout.placements.get(piece.name);

  const change = (next: Pattern) => {
    setDraft(next);
    setDirty(true);
  };
  const changePiece = (index: number, next: Piece) => change({ ...draft, pieces: draft.pieces.map((p, i) => (i === index ? next : p)) });
  const attempt = (run: () => void): string | null => {
    try {
      run();
      return null;
    } catch (error) {
      if (error instanceof LabellingError) return error.message;
      throw error;
    }
  };

  const chooseTool = (next: ActiveTool | null) => {
    setTool(next);
    setMessage(null);
    if (next?.kind === 'notch') setOptions((o) => ({ ...o, notch: nextNotchName(piece) }));
  };

  // Unsaved labels are not lost to a closed tab or a reload without the browser asking first.
  useEffect(() => {
    if (!dirty) return;
    const onBeforeUnload = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', onBeforeUnload);
    return () => window.removeEventListener('beforeunload', onBeforeUnload);
  }, [dirty]);

  // Escape cancels the tool in use, wherever the focus is.
  useEffect(() => {
    if (!tool) return;
    const onKey = (e: KeyboardEvent) => {
      if (e.key === 'Escape') {
        setTool(null);
        setMessage({ tone: 'note', text: 'Tool cancelled.' });
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [tool]);

  const onPick = (pick: CanvasPick) => {
    if (!editable || !tool) return;
    if (pick.piece !== piece.name) {
      setMessage({ tone: 'error', text: `Click on the drawing of ${piece.name}.` });
      return;
    }
    const at = pick.point;
    const index = draft.pieces.indexOf(piece);
    const finish = (make: () => Piece, done: string) => {
      const problem = attempt(() => changePiece(index, make()));
      setTool(problem ? { kind: tool.kind } : null);
      setMessage(problem ? { tone: 'error', text: problem } : { tone: 'note', text: done });
    };
    switch (tool.kind) {
      case 'grain':
        if (!tool.first) setTool({ kind: 'grain', first: at });
        else finish(() => withGrainline(piece, tool.first!, at), `Grainline marked on ${piece.name}.`);
        return;
      case 'level':
      case 'lengthen': {
        const lineName = tool.kind === 'level' ? levelName(options) : options.lengthen.trim();
        if (!tool.first) setTool({ kind: tool.kind, first: at });
        else
          finish(
            () => withCrossLine(piece, { role: tool.kind === 'level' ? 'level' : 'lengthen', name: lineName }, tool.first!, at, { squareToGrain: options.squareToGrain }),
            `${tool.kind === 'level' ? 'Level line' : 'Lengthen/shorten line'} “${lineName}” marked on ${piece.name}.`,
          );
        return;
      }
      case 'notch':
        finish(() => withLandmark(piece, options.notch, 'notch', at), `Notch “${options.notch.trim()}” marked on ${piece.name} in every size.`);
        return;
      case 'edge': {
        const label = edgeName(options);
        if (!tool.first) setTool({ kind: 'edge', first: at });
        else finish(() => withEdge(piece, { name: label, role: options.edgeRole }, tool.first!, at), `Edge “${label}” marked on ${piece.name} in every size.`);
        return;
      }
    }
  };

  const overlays = useMemo<CanvasOverlay[]>(() => (tool?.first ? [{ kind: 'point', piece: piece.name, at: tool.first, label: 'first click', colour: 'chalk' }] : []), [tool, piece.name]);

  const sizes = useMemo(() => [...new Set(draft.pieces.flatMap((p) => p.outlines.map((o) => o.size)))], [draft]);
  const saveErrors = isApiError(save.error) ? Object.entries(save.error.fields) : [];

  return (
    <div className="flex flex-col gap-6">
      {detail.importNotes.length > 0 && (
        <Panel title="Import notes" description="What the importer did with the file. Check them before labelling.">
          <ul className="list-disc pl-5 text-sm text-ink-700">
            {detail.importNotes.map((note) => (
              <li key={note}>{note}</li>
            ))}
          </ul>
        </Panel>
      )}
      <p className="text-sm text-ink-700">
        <strong className="font-semibold text-ink-900">Check the scale:</strong> measure one seam on your paper pattern and compare it with the length shown here. If the file’s units were
        read wrongly, every alteration made from it will be wrong too.
      </p>

      {editable && (
        <Panel title="Pattern">
          <div className="flex flex-wrap items-end gap-4">
            <TextField
              label="Pattern name"
              value={name}
              maxLength={120}
              onChange={(e) => {
                setName(e.target.value);
                setDirty(true);
              }}
              error={save.error && isApiError(save.error) ? save.error.fields.name : undefined}
            />
            <div className="flex flex-col gap-1">
              <span className="text-sm font-semibold text-ink-900">Sizes</span>
              <div className="flex flex-wrap gap-2">
                {sizes.map((size, i) => (
                  <CommitField
                    key={i}
                    label={`Size label ${size}`}
                    value={size}
                    className="w-28"
                    onCommit={(to) => attempt(() => change(renameSize(draft, size, to)))}
                  />
                ))}
              </div>
            </div>
          </div>
        </Panel>
      )}

      <Panel title="Pieces" description={`${draft.pieces.length} piece${draft.pieces.length === 1 ? '' : 's'}; sizes ${sizes.join(', ')}.`}>
        <ul className="grid gap-4 md:grid-cols-2 xl:grid-cols-3">
          {draft.pieces.map((p, i) => (
            <li key={i} className={cx('flex flex-col gap-3 rounded-md border p-3', p === piece ? 'border-denim-600 ring-2 ring-tape-400' : 'border-calico-300')} aria-label={`Piece ${i + 1}: ${p.name}`}>
              <PiecePreview pattern={draft} piece={p} />
              {editable ? (
                <CommitField label={`Name of piece ${i + 1}`} value={p.name} onCommit={(to) => attempt(() => change(renamePiece(draft, p.name, to)))} />
              ) : (
                <h3 className="text-lg font-semibold">{p.name}</h3>
              )}
              <p className="text-sm text-ink-700">Sizes: {p.outlines.map((o) => o.size).join(', ')}</p>
              {editable ? (
                <div className="flex flex-wrap items-end gap-4 text-sm">
                  <label className="flex flex-col gap-1 font-semibold">
                    Cut count
                    <input
                      type="number"
                      min={1}
                      max={50}
                      value={p.cut.count}
                      aria-label={`Cut count for ${p.name}`}
                      onChange={(e) => {
                        const count = Math.round(Number(e.target.value));
                        if (count >= 1 && count <= 50) changePiece(i, { ...p, cut: { ...p.cut, count } });
                      }}
                      className="w-20 rounded-md border border-calico-400 bg-calico-50 px-2 py-1.5"
                    />
                  </label>
                  <label className="flex items-center gap-2 pb-1.5">
                    <input type="checkbox" className="size-4 accent-denim-600" checked={p.cut.onFold} aria-label={`Cut ${p.name} on the fold`} onChange={(e) => changePiece(i, { ...p, cut: { ...p.cut, onFold: e.target.checked } })} />
                    On the fold
                  </label>
                </div>
              ) : (
                <p className="text-sm text-ink-700">
                  Cut {p.cut.count}
                  {p.cut.onFold ? ' on the fold' : ''}
                </p>
              )}
              <Checklist
                piece={p}
                units={units}
                {...(editable
                  ? {
                      onRemoveLine: (role: string, n: string) => changePiece(i, { ...p, lines: p.lines.filter((l) => !(l.role === role && l.name === n)) }),
                      onRemoveEdge: (n: string) => changePiece(i, { ...p, edges: p.edges.filter((e) => e.name !== n) }),
                    }
                  : {})}
              />
              {editable && (
                <Button
                  variant={p === piece ? 'primary' : 'secondary'}
                  className="self-start px-3 py-1.5"
                  aria-pressed={p === piece}
                  onClick={() => {
                    setSelected(i);
                    setTool(null);
                    setView(FIT);
                    setMessage(null);
                  }}
                >
                  Label {p.name}
                </Button>
              )}
            </li>
          ))}
        </ul>
      </Panel>

      {editable ? (
        <Panel title={`Label ${piece.name}`} description="Choose a tool, then click on the drawing. Escape cancels the tool; drag to move the view, wheel or + and − to zoom, 0 to fit.">
          <div className="flex flex-col gap-4">
            <LabellingTools tool={tool} options={options} onTool={chooseTool} onOptions={setOptions} />
            <p role="status" aria-label="Tool hint" className="min-h-5 text-sm font-medium text-denim-700">
              {toolHint(tool, options, piece.name)}
            </p>
            <FormAlert tone={message?.tone === 'error' ? 'error' : 'note'}>{message?.text}</FormAlert>
            <div data-labelling-canvas data-piece={piece.name} data-layout-bounds={JSON.stringify(layout.bounds)} data-piece-offset={placement ? JSON.stringify({ dx: placement.dx, dy: placement.dy }) : undefined}>
              <PatternCanvas pattern={shown} view={view} onViewChange={setView} onPick={onPick} overlays={overlays} label={`Drawing of ${piece.name}`} className="h-[640px]" />
            </div>
          </div>
        </Panel>
      ) : (
        startMake && <Panel title="Use this pattern">{startMake}</Panel>
      )}

      {editable && (
        <div className="flex flex-wrap items-center gap-4 border-t border-calico-300 pt-4">
          <Button pending={save.isPending} pendingLabel="Saving…" onClick={() => save.mutate({ id: detail.id, name, pattern: draft })}>
            Save
          </Button>
          <span role="status" className="text-sm text-ink-700">
            {save.isPending ? '' : dirty ? 'Unsaved changes.' : save.isSuccess ? 'Saved.' : ''}
          </span>
          {startMake}
          <FormAlert className="w-full">
            {save.error && (
              <>
                {save.error.message}
                {saveErrors.length > 0 && (
                  <ul className="mt-1 list-disc pl-5">
                    {saveErrors.map(([key, text]) => (
                      <li key={key}>
                        {fieldLabel(key)}: {text}
                      </li>
                    ))}
                  </ul>
                )}
              </>
            )}
          </FormAlert>
        </div>
      )}
    </div>
  );
}
