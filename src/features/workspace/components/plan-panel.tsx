import { Suspense, lazy, useId, useMemo, useState } from 'react';
import { type AlterationEntry, formatLength, type LengthUnit } from '../../../../geometry/index.ts';
import { Button } from '../../../components/ui/button';
import { LengthField } from '../../../components/ui/length-field';
import { useFabricChoices } from '../api/get-fabrics';
import { usePatternCharts } from '../api/get-pattern-charts';
import { useMakeFit, useSetMakeFabric } from '../api/make-fit';
import { type ChartSource, type PreviousMake, usePlanFit } from '../api/plan-fit';
import { describeOp, inUnits } from '../model/describe';
import { fitChartData } from '../model/fit-chart';
import { describeFitNote, fromPreviousNote } from '../model/fit-note';
import { type Intent, newEntryId } from '../model/intents';
import { acceptPlan } from '../model/plan';

// recharts is loaded with the chart, when a plan is first shown, not with the workspace
const FitChart = lazy(() => import('./fit-chart').then((m) => ({ default: m.FitChart })));

const selectClasses = 'rounded-md border border-calico-400 bg-calico-50 px-2 py-1.5 font-normal';

/** The note of the make this one was sewn again from, as the plan read it. */
function PreviousNote({ previous, changed, unit }: { previous: PreviousMake; changed: readonly string[]; unit: LengthUnit }) {
  const note = previous.fitNote;
  return (
    <section aria-label="Last make's fit note" className="rounded-md border border-denim-600/40 bg-denim-50 p-2 text-sm">
      <p className="font-semibold text-ink-900">From the fit note of “{previous.makeName}”</p>
      {note ? (
        <>
          <ul className="mt-1 list-disc pl-5 text-ink-700">
            {describeFitNote(note, unit).map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
          {note.nextTime.trim() !== '' && <p className="mt-1 whitespace-pre-line text-ink-900">Next time: {note.nextTime}</p>}
        </>
      ) : (
        <p className="text-ink-700">That make has no fit note yet.</p>
      )}
      {changed.length > 0 && (
        <>
          <p className="mt-2 font-semibold text-ink-900">What it changed in this plan</p>
          <ul aria-label="Changed by the last make's note" className="list-disc pl-5 text-ink-700">
            {changed.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        </>
      )}
    </section>
  );
}

/**
 * The fit plan beside the drawing: the make's profile against the pattern's finished sizes,
 * a size per level with its reason, the chart of body against garment, and the alterations it
 * suggests, added to the list on request. The make's fabric and the size table are chosen here.
 */
export function PlanPanel({ makeId, patternId, unit, entries, change }: { makeId: string; patternId: string; unit: LengthUnit; entries: readonly AlterationEntry[]; change: (intent: Intent) => string | undefined }) {
  const id = useId();
  const [fit, setFit] = useState<'close' | 'regular' | 'relaxed'>('regular');
  const [waistOffset, setWaistOffset] = useState(0);
  const [stretch, setStretch] = useState('');
  const [source, setSource] = useState<ChartSource>('printed');
  const [refused, setRefused] = useState<string | null>(null);
  const plan = usePlanFit();
  const make = useMakeFit(makeId);
  const fabrics = useFabricChoices();
  const setFabric = useSetMakeFabric();
  const charts = usePatternCharts(patternId);
  const hasPrinted = charts.data?.hasPrinted === true;
  const stretchAcross = stretch.trim() === '' ? undefined : Number(stretch.replace(',', '.'));
  const fabricId = make.data?.fabricId ?? '';
  const chosenFabric = fabrics.data?.find((f) => f.id === fabricId);

  const result = plan.data;
  const chart = useMemo(() => (result ? fitChartData(result.plan.levels, result.plan.garment, unit) : null), [result, unit]);
  const hasBodyChart = result?.plan.levels.some((l) => l.bodyChartSize !== undefined) ?? false;

  return (
    <section aria-labelledby="plan-heading" className="flex flex-col gap-3">
      <h2 id="plan-heading" className="font-display text-lg text-ink-900">Fit plan</h2>
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-fabric`} className="text-sm font-semibold text-ink-900">
          Fabric
        </label>
        <select
          id={`${id}-fabric`}
          className={selectClasses}
          value={fabricId}
          disabled={make.isPending || setFabric.isPending}
          onChange={(e) => setFabric.mutate({ makeId, fabricId: e.target.value === '' ? null : e.target.value })}
        >
          <option value="">None chosen</option>
          {(fabrics.data ?? []).map((f) => (
            <option key={f.id} value={f.id}>
              {f.name}
            </option>
          ))}
        </select>
        {fabrics.data?.length === 0 && <p className="text-xs text-ink-500">No fabrics kept yet: add them under Fabrics, or type the stretch below.</p>}
        {setFabric.isError && (
          <p role="alert" className="text-xs font-medium text-madder-700">
            {setFabric.error.message}
          </p>
        )}
      </div>
      {hasPrinted && (
        <label className="flex flex-col gap-1 text-sm font-semibold text-ink-900">
          Size table
          <select className={selectClasses} value={source} onChange={(e) => setSource(e.target.value as ChartSource)}>
            <option value="printed">Printed with the pattern{charts.data?.printedName ? ` (${charts.data.printedName})` : ''}</option>
            <option value="measured">Measured on the pieces</option>
          </select>
        </label>
      )}
      <label className="flex flex-col gap-1 text-sm font-semibold text-ink-900">
        Fit
        <select className={selectClasses} value={fit} onChange={(e) => setFit(e.target.value as typeof fit)}>
          <option value="close">Close</option>
          <option value="regular">Regular</option>
          <option value="relaxed">Relaxed</option>
        </select>
      </label>
      <LengthField label="Waistband above the natural waist" unit={unit} valueMm={waistOffset} signed onCommit={setWaistOffset} hint="Negative for a waistband that sits lower." />
      <div className="flex flex-col gap-1">
        <label htmlFor={`${id}-stretch`} className="text-sm font-semibold text-ink-900">
          Stretch across the grain, %
        </label>
        <p className="text-xs text-ink-500">{chosenFabric ? `Leave empty to use “${chosenFabric.name}”.` : 'Leave empty for rigid cloth.'}</p>
        <input id={`${id}-stretch`} className={selectClasses} inputMode="decimal" value={stretch} placeholder={chosenFabric ? 'the fabric’s' : 'rigid'} onChange={(e) => setStretch(e.target.value)} />
      </div>
      <Button
        pending={plan.isPending}
        pendingLabel="Planning…"
        disabled={stretchAcross !== undefined && !Number.isFinite(stretchAcross)}
        onClick={() => {
          setRefused(null);
          plan.mutate({ makeId, fit, waistOffset, unit, ...(stretchAcross !== undefined ? { stretchAcross } : {}), ...(hasPrinted ? { chart: source } : {}) });
        }}
      >
        Make the plan
      </Button>
      {plan.isError && (
        <p role="alert" className="text-sm font-medium text-madder-700">
          {plan.error.message}
        </p>
      )}
      {result && (
        <div className="flex flex-col gap-2">
          {result.previous && <PreviousNote previous={result.previous} changed={result.plan.fromPrevious ?? []} unit={unit} />}
          {result.plan.chart && (
            <p className="text-xs text-ink-500">
              Sized against {result.plan.chart.source === 'printed' ? 'the printed size table' : 'the measurements taken from the pieces'}.
            </p>
          )}
          <table className="w-full text-sm" aria-label="Size per level">
            <thead>
              <tr className="text-left text-xs text-ink-500">
                <th className="font-normal">Level</th>
                <th className="text-right font-normal">Body</th>
                <th className="text-right font-normal">Aim</th>
                <th className="text-right font-normal">Size</th>
                {hasBodyChart && (
                  <th className="text-right font-normal" title="The size the pattern's printed body chart gives for this body">
                    Chart
                  </th>
                )}
              </tr>
            </thead>
            <tbody>
              {result.plan.levels.map((l) => (
                <tr key={l.level} aria-label={l.level} title={l.reason}>
                  <td className="capitalize text-ink-900">{l.level}</td>
                  <td className="text-right tabular-nums" data-mm={l.body.toFixed(2)}>{formatLength(l.body, unit)}</td>
                  <td className="text-right tabular-nums" data-mm={l.target.toFixed(2)}>{formatLength(l.target, unit)}</td>
                  <td className="text-right font-semibold tabular-nums">{l.size}</td>
                  {hasBodyChart && <td className="text-right tabular-nums text-ink-500">{l.bodyChartSize ?? '—'}</td>}
                </tr>
              ))}
            </tbody>
          </table>
          <details className="text-xs text-ink-700">
            <summary className="cursor-pointer font-semibold text-denim-700">Why these sizes</summary>
            <ul aria-label="Reasons per level" className="mt-1 flex flex-col gap-1">
              {result.plan.levels.map((l) => (
                <li key={l.level}>{l.reason}</li>
              ))}
            </ul>
          </details>
          {chart && (
            <Suspense fallback={<p className="text-sm text-ink-700">Drawing the fit chart…</p>}>
              <FitChart data={chart} unit={unit} />
            </Suspense>
          )}
          <ol aria-label="Suggested alterations" className="flex flex-col gap-1 text-sm">
            {result.plan.steps.map((s, i) => {
              const fromNote = fromPreviousNote(s);
              return (
                <li key={i} className={fromNote ? 'rounded-md border border-denim-600 bg-denim-50 p-2' : 'rounded-md border border-calico-300 bg-calico-50 p-2'}>
                  <p className="font-semibold text-ink-900">{describeOp(s.op, unit)}</p>
                  <p className="text-xs text-ink-700">{s.reason}</p>
                  {fromNote && <p className="mt-0.5 text-xs font-semibold text-denim-700">From the last make’s fit note</p>}
                </li>
              );
            })}
          </ol>
          {/* the planner's cautions end with "guidance, not a guarantee of fit"; lengths in the person's units */}
          {result.plan.cautions.map((c) => (
            <p key={c} className="rounded-md border border-tape-400 bg-tape-100 px-2 py-1 text-xs text-ink-900">
              {inUnits(c, unit)}
            </p>
          ))}
          <Button
            variant="secondary"
            disabled={result.plan.steps.length === 0}
            onClick={() => {
              const next = acceptPlan(entries, result.plan, (taken) => newEntryId(taken));
              setRefused(change({ kind: 'replace', entries: next }) ?? null);
            }}
          >
            Use these alterations
          </Button>
          {refused && (
            <p role="alert" className="text-sm font-medium text-madder-700">
              {refused}
            </p>
          )}
        </div>
      )}
    </section>
  );
}
