import { useState } from 'react';
import { type AlterationEntry, formatLength, type LengthUnit } from '../../../../geometry/index.ts';
import { Button } from '../../../components/ui/button';
import { LengthField } from '../../../components/ui/length-field';
import { useMakePlan } from '../api/make-plan';
import { describeOp } from '../model/describe';
import { type Intent, newEntryId } from '../model/intents';
import { acceptPlan } from '../model/plan';

/**
 * The fit plan beside the drawing: the make's profile against the pattern's finished sizes,
 * a size per level with its reason, and the alterations it suggests, added to the list on request.
 */
export function PlanPanel({ makeId, unit, entries, change }: { makeId: string; unit: LengthUnit; entries: readonly AlterationEntry[]; change: (intent: Intent) => string | undefined }) {
  const [fit, setFit] = useState<'close' | 'regular' | 'relaxed'>('regular');
  const [waistOffset, setWaistOffset] = useState(0);
  const [stretch, setStretch] = useState('');
  const [refused, setRefused] = useState<string | null>(null);
  const plan = useMakePlan();
  const stretchAcross = stretch.trim() === '' ? undefined : Number(stretch.replace(',', '.'));
  return (
    <section aria-labelledby="plan-heading" className="flex flex-col gap-3">
      <h2 id="plan-heading" className="font-display text-lg text-ink-900">Fit plan</h2>
      <label className="flex flex-col gap-1 text-sm font-semibold text-ink-900">
        Fit
        <select className="rounded-md border border-calico-400 bg-calico-50 px-2 py-1.5 font-normal" value={fit} onChange={(e) => setFit(e.target.value as typeof fit)}>
          <option value="close">Close</option>
          <option value="regular">Regular</option>
          <option value="relaxed">Relaxed</option>
        </select>
      </label>
      <LengthField label="Waistband above the natural waist" unit={unit} valueMm={waistOffset} signed onCommit={setWaistOffset} hint="Negative for a waistband that sits lower." />
      <label className="flex flex-col gap-1 text-sm font-semibold text-ink-900">
        Stretch across the grain, %
        <input className="rounded-md border border-calico-400 bg-calico-50 px-2 py-1.5 font-normal" inputMode="decimal" value={stretch} placeholder="rigid" onChange={(e) => setStretch(e.target.value)} />
      </label>
      <Button
        pending={plan.isPending}
        pendingLabel="Planning…"
        disabled={stretchAcross !== undefined && !Number.isFinite(stretchAcross)}
        onClick={() => {
          setRefused(null);
          plan.mutate({ makeId, fit, waistOffset, ...(stretchAcross !== undefined ? { stretchAcross } : {}) });
        }}
      >
        Make the plan
      </Button>
      {plan.isError && (
        <p role="alert" className="text-sm font-medium text-madder-700">
          {plan.error.message}
        </p>
      )}
      {plan.data && (
        <div className="flex flex-col gap-2">
          <table className="w-full text-sm" aria-label="Size per level">
            <thead>
              <tr className="text-left text-xs text-ink-500">
                <th className="font-normal">Level</th>
                <th className="text-right font-normal">Body</th>
                <th className="text-right font-normal">Aim</th>
                <th className="text-right font-normal">Size</th>
              </tr>
            </thead>
            <tbody>
              {plan.data.levels.map((l) => (
                <tr key={l.level} aria-label={l.level} title={l.reason}>
                  <td className="capitalize text-ink-900">{l.level}</td>
                  <td className="text-right tabular-nums">{formatLength(l.body, unit)}</td>
                  <td className="text-right tabular-nums">{formatLength(l.target, unit)}</td>
                  <td className="text-right font-semibold tabular-nums">{l.size}</td>
                </tr>
              ))}
            </tbody>
          </table>
          <ol aria-label="Suggested alterations" className="flex flex-col gap-1 text-sm">
            {plan.data.steps.map((s, i) => (
              <li key={i} className="rounded-md border border-calico-300 bg-calico-50 p-2">
                <p className="font-semibold text-ink-900">{describeOp(s.op, unit)}</p>
                <p className="text-xs text-ink-700">{s.reason}</p>
              </li>
            ))}
          </ol>
          {plan.data.cautions.map((c) => (
            <p key={c} className="rounded-md border border-tape-400 bg-tape-100 px-2 py-1 text-xs text-ink-900">
              {c}
            </p>
          ))}
          <p className="text-xs text-ink-500">Sizing advice is guidance, not a guarantee of fit: sew a test garment first.</p>
          <Button
            variant="secondary"
            disabled={plan.data.steps.length === 0}
            onClick={() => {
              const next = acceptPlan(entries, plan.data, (taken) => newEntryId(taken));
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
