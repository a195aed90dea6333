import { formatLength, type LengthUnit } from '../../../../geometry/units';
import { cx } from '../../../lib/cx';
import type { MeasurementSet } from '../api/schemas';
import { measurementHelp } from '../measurement-help';
import { changeText, formatTakenOn, heightLabel, historyTable, type DatedSet } from '../model';

export const asDatedSet = (set: MeasurementSet): DatedSet => ({
  id: set.id,
  takenOn: set.takenOn,
  measurements: set.measurements,
  girthsAtHeights: set.girthsAtHeights,
  note: set.note,
  createdAt: set.createdAt,
});

/**
 * Every dated set of a profile side by side, newest first, one row per measurement; under each
 * value, its change from the set before (the column to its right). History is only read here.
 */
export function HistoryTable({ history, unit }: { history: readonly MeasurementSet[]; unit: LengthUnit }) {
  const sets = history.map(asDatedSet);
  const rows = historyTable(sets);
  if (rows.length === 0) return <p className="text-sm text-ink-700">No measurements in any set yet.</p>;
  return (
    <div className="overflow-x-auto">
      <table className="min-w-full border-collapse text-sm">
        <caption className="sr-only">Measurement history, newest set first, with the change from the set before</caption>
        <thead>
          <tr className="border-b border-calico-300 text-left align-bottom">
            <th scope="col" className="py-2 pr-4 font-semibold text-ink-500">
              Measurement
            </th>
            {sets.map((set, i) => (
              <th key={set.id} scope="col" className="min-w-32 py-2 pr-4 font-semibold text-ink-900">
                <time dateTime={set.takenOn}>{formatTakenOn(set.takenOn)}</time>
                {i === 0 && <span className="ml-1.5 rounded bg-tape-100 px-1.5 py-0.5 text-xs font-semibold text-ink-700">current</span>}
                {set.note && <span className="block text-xs font-normal text-ink-500">{set.note}</span>}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.kind === 'measurement' ? row.name : `h${row.offset}`} className="border-b border-calico-200">
              <th scope="row" className="py-2 pr-4 text-left font-medium text-ink-700">
                {row.kind === 'measurement' ? measurementHelp[row.name].label : `Girth ${heightLabel(row.offset, unit)}`}
              </th>
              {row.cells.map((cell, i) => {
                const change = changeText(cell.change, unit);
                return (
                  <td key={sets[i]!.id} className="py-2 pr-4 align-top tabular-nums">
                    {cell.value === undefined ? (
                      <span className="text-ink-500">—</span>
                    ) : (
                      <>
                        <span className="font-medium text-ink-900">{formatLength(cell.value, unit)}</span>
                        {change && (
                          <span
                            className={cx(
                              'block text-xs',
                              change === 'no change' ? 'text-ink-500' : 'font-semibold text-chalk-700',
                            )}
                          >
                            {change}
                          </span>
                        )}
                      </>
                    )}
                  </td>
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
