import { useId, useState } from 'react';
import { Button } from '../../../components/ui/button';
import { ConfirmDelete } from '../../../components/ui/confirm-delete';
import { formatLength, type LengthUnit } from '../../../../geometry/units';
import { useDeleteFabric } from '../api/delete-fabric';
import type { Fabric } from '../api/schemas';
import { useUpdateFabric } from '../api/update-fabric';
import { fabricDraft, shrinkageAdvice, shrinkageOf, stretchOf, weightsOf, type StretchValue, type ShrinkageValue } from '../model';
import { FabricForm } from './fabric-form';

const pct = (n: number) => `${Math.round(n * 10) / 10}`.replace('-', '−') + ' %';

function stretchText(s: StretchValue | undefined, unit: LengthUnit): string {
  const value = stretchOf(s);
  if (s === undefined || value === undefined) return 'Not recorded';
  return typeof s === 'number' ? pct(value) : `${pct(value)} (hand test: ${formatLength(s.relaxed, unit)} → ${formatLength(s.stretched, unit)})`;
}

function shrinkageText(s: ShrinkageValue | undefined, unit: LengthUnit): string {
  const value = shrinkageOf(s);
  if (s === undefined || value === undefined) return 'Not recorded';
  return typeof s === 'number' ? pct(value) : `${pct(value)} (wash test: ${formatLength(s.before, unit)} → ${formatLength(s.after, unit)})`;
}

/** One fabric: its properties in the person's units, with edit and delete (after a confirm). */
export function FabricCard({ fabric, unit }: { fabric: Fabric; unit: LengthUnit }) {
  const headingId = useId();
  const [mode, setMode] = useState<'view' | 'edit' | 'delete'>('view');
  const update = useUpdateFabric();
  const remove = useDeleteFabric();
  const p = fabric.properties;
  const weights = weightsOf(p);
  const advice = shrinkageAdvice(shrinkageOf(p.shrinkage?.warp), shrinkageOf(p.shrinkage?.weft), p.prewashed ?? false);

  if (mode === 'edit')
    return (
      <li className="md:col-span-2">
        <article aria-label={`Edit ${fabric.name}`} className="rounded-lg border border-denim-600 bg-calico-50 p-5">
          <h3 className="mb-4 font-display text-xl font-semibold">Edit “{fabric.name}”</h3>
          <FabricForm
            unit={unit}
            initialDraft={fabricDraft(fabric.name, p, unit)}
            origin={p}
            save={(value, { onError }) => update.mutate({ id: fabric.id, ...value }, { onError, onSuccess: () => setMode('view') })}
            pending={update.isPending}
            serverError={update.error}
            submitLabel="Save the fabric"
            onCancel={() => {
              update.reset();
              setMode('view');
            }}
          />
        </article>
      </li>
    );

  return (
    <li>
      <article
        aria-labelledby={headingId}
        className="rounded-lg border border-calico-300 bg-calico-50 p-5 shadow-[0_1px_0_rgb(197_182_151/0.6)]"
      >
        <h3 id={headingId} className="font-display text-xl font-semibold text-ink-900">
          {fabric.name}
        </h3>
        <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-sm">
          <dt className="text-ink-500">Stretch across</dt>
          <dd className="font-medium">{stretchText(p.stretchAcross, unit)}</dd>
          <dt className="text-ink-500">Stretch along</dt>
          <dd className="font-medium">{stretchText(p.stretchAlong, unit)}</dd>
          <dt className="text-ink-500">Recovery</dt>
          <dd className="font-medium">{p.recovery === undefined ? 'Not recorded' : pct(p.recovery)}</dd>
          <dt className="text-ink-500">Weight</dt>
          <dd className="font-medium">
            {weights ? `${weights.gsm.toFixed(1)} g/m² · ${weights.oz.toFixed(2)} oz/yd²` : 'Not recorded'}
          </dd>
          <dt className="text-ink-500">Width</dt>
          <dd className="font-medium">{p.width === undefined ? 'Not recorded' : formatLength(p.width, unit)}</dd>
          <dt className="text-ink-500">Shrinkage, warp</dt>
          <dd className="font-medium">{shrinkageText(p.shrinkage?.warp, unit)}</dd>
          <dt className="text-ink-500">Shrinkage, weft</dt>
          <dd className="font-medium">{shrinkageText(p.shrinkage?.weft, unit)}</dd>
          <dt className="text-ink-500">Washed already</dt>
          <dd className="font-medium">{p.prewashed ? 'Yes' : 'No'}</dd>
        </dl>
        <p className="mt-3 text-sm text-ink-700">{advice.text}</p>
        {mode === 'delete' ? (
          <ConfirmDelete
            className="mt-4 p-3"
            question={`Delete “${fabric.name}”? This cannot be undone.`}
            pending={remove.isPending}
            error={remove.error}
            onConfirm={() => remove.mutate(fabric.id)}
            onCancel={() => setMode('view')}
          />
        ) : (
          <div role="group" aria-label={`Actions for ${fabric.name}`} className="mt-4 flex flex-wrap gap-2">
            <Button variant="secondary" className="px-3 py-1.5" aria-label={`Edit ${fabric.name}`} onClick={() => setMode('edit')}>
              Edit
            </Button>
            <Button variant="quiet" className="px-3 py-1.5" aria-label={`Delete ${fabric.name}`} onClick={() => setMode('delete')}>
              Delete
            </Button>
          </div>
        )}
      </article>
    </li>
  );
}
