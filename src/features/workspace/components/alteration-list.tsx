import { memo } from 'react';
import type { AlterationEntry, AppliedCaution, LengthUnit } from '../../../../geometry/index.ts';
import { cx } from '../../../lib/cx';
import { describeOp, inUnits } from '../model/describe';
import type { Intent } from '../model/intents';

/**
 * The make's alterations in order, beside the drawing: switch each on or off, move it up or
 * down, edit (select) or delete it. An entry the engine refuses is marked with the reason.
 */
export const AlterationList = memo(function AlterationList({
  entries,
  unit,
  selectedId,
  onSelect,
  onChange,
  error,
  cautions,
}: {
  entries: readonly AlterationEntry[];
  unit: LengthUnit;
  selectedId: string | null;
  onSelect: (id: string | null) => void;
  onChange: (intent: Intent) => string | undefined;
  error?: { id: string; message: string };
  cautions: readonly AppliedCaution[];
}) {
  if (entries.length === 0)
    return <p className="text-sm text-ink-700">No alterations yet. Choose a tool, set an amount and add it: every change is saved as you go.</p>;
  return (
    <ol aria-label="Alterations" className="flex flex-col gap-2">
      {entries.map((entry, index) => {
        const title = describeOp(entry.op, unit);
        const on = entry.enabled !== false;
        const own = cautions.filter((c) => c.op === index);
        return (
          <li
            key={entry.id}
            aria-label={title}
            aria-current={selectedId === entry.id ? 'true' : undefined}
            className={cx(
              'rounded-md border bg-calico-50 p-2',
              selectedId === entry.id ? 'border-denim-600 ring-2 ring-denim-100' : 'border-calico-300',
              !on && 'opacity-60',
            )}
          >
            <div className="flex items-start gap-2">
              <input
                type="checkbox"
                className="mt-1 size-4 accent-denim-600"
                checked={on}
                aria-label={`${on ? 'Switch off' : 'Switch on'}: ${title}`}
                onChange={() => onChange({ kind: 'toggle', id: entry.id, enabled: !on })}
              />
              <button type="button" className="flex-1 text-left text-sm font-semibold text-ink-900 hover:text-denim-700" onClick={() => onSelect(selectedId === entry.id ? null : entry.id)}>
                <span className="mr-1 tabular-nums text-ink-500">{index + 1}.</span>
                {title}
              </button>
            </div>
            {error?.id === entry.id && (
              <p role="alert" className="mt-1 text-sm font-medium text-madder-700">
                {inUnits(error.message, unit)}
              </p>
            )}
            {own.map((c, i) => (
              <p key={i} className="mt-1 text-xs text-chalk-700">
                {inUnits(c.message, unit)}
              </p>
            ))}
            <div className="mt-1 flex flex-wrap gap-1 text-xs">
              <button type="button" className="rounded px-1.5 py-0.5 text-denim-700 hover:bg-denim-50 disabled:opacity-40" disabled={index === 0} aria-label={`Move up: ${title}`} onClick={() => onChange({ kind: 'move', id: entry.id, to: index - 1 })}>
                ↑ Up
              </button>
              <button type="button" className="rounded px-1.5 py-0.5 text-denim-700 hover:bg-denim-50 disabled:opacity-40" disabled={index === entries.length - 1} aria-label={`Move down: ${title}`} onClick={() => onChange({ kind: 'move', id: entry.id, to: index + 1 })}>
                ↓ Down
              </button>
              <button type="button" className="rounded px-1.5 py-0.5 text-denim-700 hover:bg-denim-50" aria-label={`Edit: ${title}`} onClick={() => onSelect(entry.id)}>
                Edit
              </button>
              <button type="button" className="rounded px-1.5 py-0.5 text-madder-700 hover:bg-madder-50" aria-label={`Delete: ${title}`} onClick={() => { onChange({ kind: 'remove', id: entry.id }); if (selectedId === entry.id) onSelect(null); }}>
                Delete
              </button>
            </div>
          </li>
        );
      })}
    </ol>
  );
});
