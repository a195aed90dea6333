import { createColumnHelper, tableFeatures, useTable } from '@tanstack/react-table';
import { useCallback, useId, useMemo, useState } from 'react';
import { useBeforeUnload, useBlocker } from 'react-router-dom';
import { asPatternSize } from '../../../../geometry/sizes.ts';
import { formatLength, type LengthUnit } from '../../../../geometry/units.ts';
import { Button } from '../../../components/ui/button';
import { FormAlert } from '../../../components/ui/form-alert';
import { LengthField } from '../../../components/ui/length-field';
import { isApiError } from '../../../lib/api-client';
import { cx } from '../../../lib/cx';
import { type SizeChart, useSizeCharts } from '../api/get-size-chart';
import { useDeleteSizeChart, useSaveSizeChart } from '../api/save-size-chart';
import {
  type CellDifference,
  type ChartColumn,
  type ChartKind,
  type DraftSize,
  type PasteResult,
  type SizeChartDraft,
  FIT_GIRTH_TOLERANCE,
  FIT_LENGTH_TOLERANCE,
  GARMENT_COLUMNS,
  cellKey,
  chartInputFromDraft,
  columnsOf,
  compareCharts,
  draftFromChart,
  draftProblems,
  mergePasted,
  parsePastedTable,
  readCell,
  showCell,
  unmatchedSizes,
} from '../model/size-chart';

const features = tableFeatures({});
type Row = DraftSize & { readonly index: number };
const helper = createColumnHelper<typeof features, Row>();
type MeasuredRow = SizeChart['sizes'][number];
const measuredHelper = createColumnHelper<typeof features, MeasuredRow>();

const inputClasses = (invalid: boolean) =>
  cx(
    'w-full min-w-[4.75rem] rounded border bg-calico-50 px-1.5 py-1 text-right tabular-nums text-ink-900 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400',
    invalid ? 'border-madder-700' : 'border-calico-400',
  );

/** A cell typed in the person's unit; read on Enter or when it loses focus. */
function CellInput({ label, valueMm, unit, onCommit, onProblem }: { label: string; valueMm: number | undefined; unit: LengthUnit; onCommit: (mm: number | undefined) => void; onProblem: (message: string | null) => void }) {
  const shown = showCell(valueMm, unit);
  const [draft, setDraft] = useState<string | null>(null);
  const [invalid, setInvalid] = useState(false);
  const commit = () => {
    if (draft === null || draft.trim() === shown) {
      setDraft(null);
      return;
    }
    const read = readCell(draft, unit);
    if ('error' in read) {
      setInvalid(true);
      onProblem(`${label}: ${read.error}`);
      return;
    }
    setInvalid(false);
    onProblem(null);
    setDraft(null);
    onCommit(read.mm);
  };
  return (
    <input
      aria-label={label}
      aria-invalid={invalid || undefined}
      className={inputClasses(invalid)}
      value={draft ?? shown}
      onChange={(e) => setDraft(e.target.value)}
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

function SizeInput({ label, value, onCommit }: { label: string; value: string; onCommit: (size: string) => void }) {
  const [draft, setDraft] = useState<string | null>(null);
  return (
    <input
      aria-label={label}
      maxLength={40}
      className="w-16 rounded border border-calico-400 bg-calico-50 px-1.5 py-1 font-semibold text-ink-900 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400"
      value={draft ?? value}
      onChange={(e) => setDraft(e.target.value)}
      onBlur={() => {
        if (draft !== null && draft !== value) onCommit(draft);
        setDraft(null);
      }}
    />
  );
}

/** printed − measured under a cell; marked when over the tolerance. */
function Difference({ d, unit }: { d: CellDifference; unit: LengthUnit }) {
  const text = formatLength(d.difference, unit, { signed: true });
  return (
    <span
      data-over={d.over ? 'true' : 'false'}
      data-mm={d.difference.toFixed(2)}
      title={`Printed ${formatLength(d.printed, unit)}, measured on the pieces ${formatLength(d.measured, unit)}`}
      className={cx('mt-0.5 block whitespace-nowrap text-right text-xs tabular-nums', d.over ? 'rounded bg-madder-50 px-1 font-semibold text-madder-700' : 'text-ink-500')}
    >
      <span className="sr-only">printed minus measured: </span>
      {d.over && (
        <span aria-hidden className="mr-1">
          ▲
        </span>
      )}
      {text}
      {d.over && <span className="sr-only"> (more than {formatLength(d.tolerance, unit)})</span>}
    </span>
  );
}

const emptyDraft: SizeChartDraft = { sizes: [] };

/**
 * A pattern's printed size table (rows = sizes; finished-garment measurements, and the body chart
 * behind a switch), editable by the pattern's owner and pasted from a spreadsheet; beside it, the
 * finished measurements computed from the pieces and printed − measured in each cell.
 */
export function SizeTable({ patternId, units, canEdit, includesSeamAllowance }: { patternId: string; units: LengthUnit; canEdit: boolean; includesSeamAllowance: boolean }) {
  const id = useId();
  const [seamAllowance, setSeamAllowance] = useState<number | undefined>(undefined);
  const charts = useSizeCharts(patternId, includesSeamAllowance ? seamAllowance : undefined);
  const save = useSaveSizeChart();
  const remove = useDeleteSizeChart();
  const [kind, setKind] = useState<ChartKind>('garment');
  const [edited, setEdited] = useState<SizeChartDraft | null>(null);
  const [cellProblems, setCellProblems] = useState<Record<string, string>>({});
  const [pasteOpen, setPasteOpen] = useState(false);
  const [pasteText, setPasteText] = useState('');
  const [paste, setPaste] = useState<PasteResult | null>(null);
  const [checked, setChecked] = useState<string[]>([]);

  const printed = charts.data?.printed ?? null;
  const measured = charts.data?.measured ?? null;
  // typed and pasted sizes take the pattern's labels ("Size 08" → "8") so they meet its pieces
  const patternSizes = useMemo(() => measured?.sizes.map((s) => s.size) ?? [], [measured]);
  const draft = edited ?? (printed ? draftFromChart(printed) : emptyDraft);
  const differences = useMemo(() => compareCharts(draft, measured), [draft, measured]);
  const unmatched = useMemo(() => unmatchedSizes(draft, measured), [draft, measured]);
  const overCount = [...differences.values()].filter((d) => d.over).length;
  const columns = columnsOf(kind);

  const change = (next: (d: SizeChartDraft) => SizeChartDraft) => {
    setEdited(next(draft));
    setChecked([]);
  };
  const setCell = (row: number, key: string, mm: number | undefined) =>
    change((d) => ({
      ...d,
      sizes: d.sizes.map((s, i) => {
        if (i !== row) return s;
        const measures = { ...(kind === 'garment' ? s.garment : s.body) };
        if (mm === undefined) delete measures[key];
        else measures[key] = mm;
        return kind === 'garment' ? { ...s, garment: measures } : { ...s, body: measures };
      }),
    }));
  const problem = (key: string) => (message: string | null) =>
    setCellProblems((all) => {
      const next = { ...all };
      if (message === null) delete next[key];
      else next[key] = message;
      return next;
    });

  const tableColumns = useMemo(
    () => helper.columns([
      helper.accessor('size', {
        header: 'Size',
        cell: (info) =>
          canEdit ? (
            <SizeInput
              label={`Size name, row ${info.row.original.index + 1}`}
              value={info.getValue()}
              onCommit={(typed) =>
                change((d) => {
                  const others = d.sizes.filter((_, i) => i !== info.row.original.index).map((s) => s.size);
                  const size = asPatternSize(typed, patternSizes, others);
                  return { ...d, sizes: d.sizes.map((s, i) => (i === info.row.original.index ? { ...s, size } : s)) };
                })
              }
            />
          ) : (
            <span className="font-semibold">{info.getValue()}</span>
          ),
      }),
      ...columns.map((column: ChartColumn) =>
        helper.accessor((row) => (kind === 'garment' ? row.garment : row.body)[column.key], {
          id: column.key,
          header: () => (
            <>
              {column.label} <span className="font-normal text-ink-500">{units}</span>
            </>
          ),
          cell: (info) => {
            const row = info.row.original;
            const value = info.getValue();
            const label = `Size ${row.size} ${column.label.toLowerCase()}`;
            const d = kind === 'garment' ? differences.get(cellKey(row.size.trim(), column.key)) : undefined;
            return (
              <>
                {canEdit ? (
                  <CellInput label={label} valueMm={value} unit={units} onCommit={(mm) => setCell(row.index, column.key, mm)} onProblem={problem(`${row.index}/${column.key}`)} />
                ) : (
                  <span className="block whitespace-nowrap text-right tabular-nums" data-mm={value?.toFixed(2)}>
                    {showCell(value, units) || '—'}
                  </span>
                )}
                {d && <Difference d={d} unit={units} />}
              </>
            );
          },
        }),
      ),
      ...(canEdit
        ? [
            helper.display({
              id: 'remove',
              header: () => <span className="sr-only">Remove</span>,
              cell: (info) => (
                <Button variant="quiet" className="px-2 py-1" aria-label={`Remove size ${info.row.original.size || `row ${info.row.original.index + 1}`}`} onClick={() => change((d) => ({ ...d, sizes: d.sizes.filter((_, i) => i !== info.row.original.index) }))}>
                  ✕
                </Button>
              ),
            }),
          ]
        : []),
    ]),
    // change and setCell read only draft and kind, which are here.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [columns, kind, canEdit, units, differences, draft, patternSizes],
  );
  const data = useMemo<Row[]>(() => draft.sizes.map((s, index) => ({ ...s, index })), [draft]);
  const table = useTable({ features, columns: tableColumns, data, getRowId: (row) => String(row.index) });

  const measuredColumns = useMemo(
    () => measuredHelper.columns([
      measuredHelper.accessor('size', { header: 'Size', cell: (info) => <span className="font-semibold">{info.getValue()}</span> }),
      ...GARMENT_COLUMNS.filter((c) => measured?.sizes.some((s) => s.garment[c.key] !== undefined)).map((column) =>
        measuredHelper.accessor((row) => row.garment[column.key], {
          id: column.key,
          header: () => (
            <>
              {column.label} <span className="font-normal text-ink-500">{units}</span>
            </>
          ),
          cell: (info) => (
            <span className="block whitespace-nowrap text-right tabular-nums" data-mm={info.getValue()?.toFixed(2)}>
              {showCell(info.getValue(), units) || '—'}
            </span>
          ),
        }),
      ),
    ]),
    [measured, units],
  );
  const measuredData = useMemo(() => measured?.sizes ?? [], [measured]);
  const measuredTable = useTable({ features, columns: measuredColumns, data: measuredData });

  const readPaste = () => {
    const r = parsePastedTable(pasteText, { kind, unit: units, order: columns.map((c) => c.key), sizes: patternSizes });
    setPaste(r);
    if (r.errors.length === 0) {
      change((d) => mergePasted(d, r, kind));
      setPasteText('');
    }
  };

  const serverFields = isApiError(save.error) ? Object.entries(save.error.fields) : [];
  const dirty = edited !== null;
  const problems = Object.values(cellProblems);
  // Unsaved cells are not lost by leaving: the browser asks on closing the tab, the app on leaving the page.
  const leaving = useBlocker(({ currentLocation, nextLocation }) => dirty && currentLocation.pathname !== nextLocation.pathname);
  useBeforeUnload(
    useCallback(
      (event: BeforeUnloadEvent) => {
        if (dirty) event.preventDefault();
      },
      [dirty],
    ),
  );

  if (charts.isPending) return <p className="text-sm text-ink-500">Loading the size table…</p>;
  if (charts.isError) return <FormAlert>{charts.error.message}</FormAlert>;

  return (
    <section aria-labelledby={`${id}-heading`} className="flex flex-col gap-4 rounded-lg border border-calico-300 bg-calico-50 p-6">
      <header className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h2 id={`${id}-heading`} className="text-xl font-semibold">
            Size table
          </h2>
          <p className="mt-1 max-w-3xl text-sm text-ink-500">
            {canEdit
              ? 'Type or paste the size chart printed with the pattern. Beside it, the same measurements taken from the pieces; a marked cell differs by more than the planner allows.'
              : 'The size chart printed with the pattern, and the same measurements taken from its pieces.'}
          </p>
        </div>
        <div role="radiogroup" aria-label="Which chart" className="flex rounded-md border border-calico-400 p-0.5 text-sm">
          {(['garment', 'body'] as const).map((k) => (
            <button key={k} type="button" role="radio" aria-checked={kind === k} onClick={() => setKind(k)} className={cx('rounded px-3 py-1 font-semibold', kind === k ? 'bg-denim-600 text-calico-50' : 'text-ink-700 hover:text-denim-700')}>
              {k === 'garment' ? 'Finished garment' : 'Body chart'}
            </button>
          ))}
        </div>
      </header>

      <div className="flex flex-col gap-8">
        <div className="flex min-w-0 flex-col gap-3">
          <h3 className="font-semibold text-ink-900">Printed {kind === 'garment' ? 'finished measurements' : 'body chart (ISO 8559-1 names)'}</h3>
          {draft.sizes.length === 0 ? (
            <p className="text-sm text-ink-700">{canEdit ? 'No printed table yet: add sizes or paste the chart from a spreadsheet.' : 'The owner has not typed in the printed table.'}</p>
          ) : (
            <div className="overflow-x-auto">
              <table aria-label={kind === 'garment' ? 'Printed finished measurements' : 'Printed body chart'} className="w-full border-collapse text-sm">
                <thead>
                  {table.getHeaderGroups().map((group) => (
                    <tr key={group.id}>
                      {group.headers.map((header) => (
                        <th key={header.id} scope="col" className="whitespace-nowrap border-b border-calico-400 px-1.5 py-1 text-right text-xs font-semibold text-ink-700 first:text-left">
                          {header.isPlaceholder ? null : <table.FlexRender header={header} />}
                        </th>
                      ))}
                    </tr>
                  ))}
                </thead>
                <tbody>
                  {table.getRowModel().rows.map((row) => (
                    <tr key={row.id} aria-label={`Size ${row.original.size}`} className="align-top odd:bg-calico-100/60">
                      {row.getAllCells().map((cell) => (
                        <td key={cell.id} className="px-1.5 py-1">
                          <table.FlexRender cell={cell} />
                        </td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          )}
          {problems.length > 0 && (
            <ul role="alert" className="text-sm font-medium text-madder-700">
              {problems.map((p) => (
                <li key={p}>{p}</li>
              ))}
            </ul>
          )}
          {kind === 'garment' && differences.size > 0 && (
            <p role="status" className="text-sm text-ink-700">
              Under each printed number: printed − measured on the pieces.{' '}
              {overCount === 0
                ? `Every cell agrees within ${formatLength(FIT_GIRTH_TOLERANCE, units)} (girths) and ${formatLength(FIT_LENGTH_TOLERANCE, units)} (lengths).`
                : `${overCount} ${overCount === 1 ? 'cell differs' : 'cells differ'} by more than ${formatLength(FIT_GIRTH_TOLERANCE, units)} (girths) or ${formatLength(FIT_LENGTH_TOLERANCE, units)} (lengths): check the printed chart and how it was measured before trusting either.`}
            </p>
          )}
          {kind === 'garment' && unmatched.length > 0 && measured && <p className="text-xs text-ink-500">No pieces for size {unmatched.join(', ')}: nothing to compare with.</p>}

          {canEdit && (
            <div className="flex flex-col gap-3">
              <div className="flex flex-wrap gap-2">
                <Button variant="secondary" onClick={() => change((d) => ({ ...d, sizes: [...d.sizes, { size: '', garment: {}, body: {} }] }))}>
                  Add a size
                </Button>
                <Button variant="secondary" aria-expanded={pasteOpen} onClick={() => setPasteOpen((o) => !o)}>
                  Paste from a spreadsheet
                </Button>
                <span className="flex-1" />
                {dirty && (
                  <Button variant="quiet" onClick={() => { setEdited(null); setCellProblems({}); setChecked([]); }}>
                    Discard changes
                  </Button>
                )}
                <Button
                  disabled={!dirty || problems.length > 0}
                  pending={save.isPending}
                  pendingLabel="Saving…"
                  onClick={() => {
                    const found = draftProblems(draft);
                    setChecked(found);
                    if (found.length > 0) return;
                    save.mutate({ patternId, chart: chartInputFromDraft(draft) }, { onSuccess: () => setEdited(null) });
                  }}
                >
                  Save the table
                </Button>
              </div>
              {dirty && <p className="text-xs font-medium text-ink-700">Not saved yet.</p>}
              {leaving.state === 'blocked' && (
                <div role="alertdialog" aria-label="Leave without saving the size table?" className="fixed inset-x-4 bottom-4 z-50 mx-auto flex max-w-xl flex-wrap items-center gap-3 rounded-md border border-madder-700/40 bg-madder-50 p-4 shadow-lg">
                  <p className="flex-1 font-semibold text-madder-700">The size table has changes that are not saved. Leave without saving them?</p>
                  <Button variant="secondary" autoFocus onClick={() => leaving.reset()}>
                    Stay and save
                  </Button>
                  <Button variant="quiet" onClick={() => leaving.proceed()}>
                    Leave without saving
                  </Button>
                </div>
              )}
              {checked.length > 0 && (
                <ul role="alert" className="text-sm font-medium text-madder-700">
                  {checked.map((p) => (
                    <li key={p}>{p}</li>
                  ))}
                </ul>
              )}
              {save.isError && (
                <FormAlert>
                  {save.error.message}
                  {serverFields.length > 0 && (
                    <ul className="mt-1 list-disc pl-5">
                      {serverFields.map(([field, message]) => (
                        <li key={field}>
                          {field}: {message}
                        </li>
                      ))}
                    </ul>
                  )}
                </FormAlert>
              )}
              {pasteOpen && (
                <div className="flex flex-col gap-2 rounded-md border border-dashed border-calico-400 p-3">
                  <label htmlFor={`${id}-paste`} className="text-sm font-semibold text-ink-900">
                    Cells from a spreadsheet ({kind === 'garment' ? 'finished garment' : 'body chart'})
                  </label>
                  <p id={`${id}-paste-hint`} className="text-xs text-ink-500">
                    One size per line, the size first. With a heading row the columns are found by name (Waist, Hip, Front rise, Inseam…; a unit in brackets applies to the column); without one they fill the table’s columns in order. Numbers in {units === 'in' ? 'inches' : 'centimetres'} unless they say in, cm or mm; fractions like 30 1/2 or 30½ are fine.
                  </p>
                  <textarea id={`${id}-paste`} aria-describedby={`${id}-paste-hint`} rows={6} value={pasteText} onChange={(e) => setPasteText(e.target.value)} className="rounded-md border border-calico-400 bg-calico-50 px-2 py-1 font-mono text-sm" />
                  <div>
                    <Button variant="secondary" disabled={pasteText.trim() === ''} onClick={readPaste}>
                      Read the pasted cells
                    </Button>
                  </div>
                  {paste && paste.errors.length > 0 && (
                    <div role="alert" className="text-sm text-madder-700">
                      <p className="font-semibold">Nothing was changed: fix these and read the cells again.</p>
                      <ul className="list-disc pl-5">
                        {paste.errors.map((e) => (
                          <li key={e}>{e}</li>
                        ))}
                      </ul>
                    </div>
                  )}
                  {paste && paste.errors.length === 0 && (
                    <p role="status" className="text-sm text-sage-700">
                      Read {paste.rows.length} {paste.rows.length === 1 ? 'size' : 'sizes'} into {paste.columns.map((c) => c.label).join(', ') || 'no columns'}. Check them, then save the table.
                    </p>
                  )}
                  {paste && paste.notes.length > 0 && (
                    <ul className="text-xs text-ink-500">
                      {paste.notes.map((n) => (
                        <li key={n}>{n}</li>
                      ))}
                    </ul>
                  )}
                </div>
              )}
              {printed && !dirty && (
                <div>
                  <Button variant="quiet" pending={remove.isPending} onClick={() => { if (window.confirm('Remove the printed size table? Plans will use the measurements taken from the pieces.')) remove.mutate({ patternId }); }}>
                    Remove the printed table
                  </Button>
                </div>
              )}
            </div>
          )}
        </div>

        <div className="flex min-w-0 flex-col gap-3">
          <h3 className="font-semibold text-ink-900">Measured on the pieces</h3>
          <p className="text-xs text-ink-700">
            How: a girth is the sum of the leg pieces’ widths along the level line, less a seam allowance at each side, times two for the waist and hip (left and right halves); thigh, knee, calf and hem are round one leg. Rises run along the centre seams and the crotch curve, the inseam along the front inseam.
          </p>
          {includesSeamAllowance && (
            <LengthField
              label="Seam allowance included in the pieces"
              unit={units}
              valueMm={seamAllowance ?? 0}
              onCommit={(mm) => setSeamAllowance(mm > 0 ? Math.min(mm, 100) : undefined)}
              hint="Taken off each side of every piece drawn with its seam allowance; lengths still include it at their ends."
            />
          )}
          {charts.data?.measuredError ? (
            <FormAlert>The pieces could not be measured: {charts.data.measuredError}</FormAlert>
          ) : measured ? (
            <div className="overflow-x-auto">
              <table aria-label="Finished measurements from the pieces" className="w-full border-collapse text-sm">
                <thead>
                  {measuredTable.getHeaderGroups().map((group) => (
                    <tr key={group.id}>
                      {group.headers.map((header) => (
                        <th key={header.id} scope="col" className="whitespace-nowrap border-b border-calico-400 px-1.5 py-1 text-right text-xs font-semibold text-ink-700 first:text-left">
                          {header.isPlaceholder ? null : <measuredTable.FlexRender header={header} />}
                        </th>
                      ))}
                    </tr>
                  ))}
                </thead>
                <tbody>
                  {measuredTable.getRowModel().rows.map((row) => (
                    <tr key={row.id} aria-label={`Size ${row.original.size}`} className="odd:bg-calico-100/60">
                      {row.getAllCells().map((cell) => (
                        <td key={cell.id} className="px-1.5 py-1">
                          <measuredTable.FlexRender cell={cell} />
                        </td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          ) : (
            <p className="text-sm text-ink-700">Nothing measured yet.</p>
          )}
          {measured?.notes.map((n) => (
            <p key={n} className="text-xs text-ink-500">
              {n}
            </p>
          ))}
        </div>
      </div>
      <p className="text-xs text-ink-500">Printed charts and measured pieces both carry rounding; sizing advice is guidance, not a guarantee of fit.</p>
    </section>
  );
}
