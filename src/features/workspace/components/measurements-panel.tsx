import { type ReactNode, memo } from 'react';
import { formatLength, type LengthUnit, PAIRED_SEAM_TOLERANCE, type Pattern } from '../../../../geometry/index.ts';
import { cx } from '../../../lib/cx';
import { EDGE_LABELS, crotchJoinShown, crotchJoinWords, measureRows, notchWords, pairedSeams } from '../model/measurements';

/** One check of front against back: quiet when it holds, an alert when the pieces need truing. */
function Verdict({ ok, children }: { ok: boolean; children: ReactNode }) {
  return (
    <p role={ok ? undefined : 'alert'} className={cx('rounded-md px-2 py-1 text-sm', ok ? 'bg-sage-50 text-sage-700' : 'bg-madder-50 font-semibold text-madder-700')}>
      {children}
    </p>
  );
}

/**
 * Seam lengths and crotch length of the altered pattern, with the change a chosen alteration
 * made (`before` is the pattern without it), and the paired-seam report with a warning when
 * front and back, or their notches, differ by more than the usual tolerance, or their crotch
 * curves do not join smoothly at the inseam.
 */
export const MeasurementsPanel = memo(function MeasurementsPanel({ now, before, beforeLabel, unit, size }: { now: Pattern; before?: Pattern; beforeLabel?: string; unit: LengthUnit; size?: string }) {
  const rows = measureRows(now, before, size);
  const pairs = pairedSeams(now, size);
  const join = crotchJoinShown(now, size);
  return (
    <section aria-labelledby="measure-heading" className="flex flex-col gap-3">
      <h2 id="measure-heading" className="font-display text-lg text-ink-900">
        Measurements
      </h2>
      {rows.length === 0 ? (
        <p className="text-sm text-ink-700">Name the seams on the pattern (inseam, side seam, crotch curve…) to measure them here.</p>
      ) : (
        <table className="w-full text-sm" aria-label="Seam lengths">
          <thead>
            <tr className="text-left text-xs text-ink-500">
              <th className="font-normal">Piece</th>
              <th className="font-normal">Seam</th>
              <th className="text-right font-normal">Length</th>
              {before && <th className="text-right font-normal" title={beforeLabel}>Change</th>}
            </tr>
          </thead>
          <tbody>
            {rows.map((r) => {
              const delta = r.before === undefined ? undefined : r.now - r.before;
              return (
                <tr key={r.key} aria-label={`${r.piece} ${r.label}`}>
                  <td className="pr-1 text-ink-700">{r.piece}</td>
                  <td className="pr-1 text-ink-900">{r.label}</td>
                  <td className="text-right tabular-nums text-ink-900" data-mm={r.now.toFixed(3)}>
                    {formatLength(r.now, unit)}
                  </td>
                  {before && (
                    <td className={cx('text-right tabular-nums', delta && Math.abs(delta) >= 0.5 ? 'font-semibold text-denim-700' : 'text-ink-500')} data-mm={delta?.toFixed(3)}>
                      {delta === undefined ? '—' : Math.abs(delta) < 0.05 ? '0' : formatLength(delta, unit, { signed: true })}
                    </td>
                  )}
                </tr>
              );
            })}
          </tbody>
        </table>
      )}
      {before && beforeLabel && <p className="text-xs text-ink-500">Change: {beforeLabel}</p>}
      {pairs.length > 0 && (
        <div className="flex flex-col gap-1" aria-label="Paired seams">
          <h3 className="text-sm font-semibold text-ink-900">Paired seams (front against back)</h3>
          {pairs.map((p) => {
            const notches = notchWords(p, unit);
            return (
              <Verdict key={`${p.size}:${p.role}`} ok={p.withinTolerance && p.notchesMatch}>
                {EDGE_LABELS[p.role]}: {p.first.piece} {formatLength(p.first.length, unit)}, {p.second.piece} {formatLength(p.second.length, unit)} —{' '}
                {p.withinTolerance
                  ? `within ${formatLength(PAIRED_SEAM_TOLERANCE, unit)}`
                  : `differ by ${formatLength(Math.abs(p.difference), unit)}: true the seams before cutting (more than ${formatLength(PAIRED_SEAM_TOLERANCE, unit)})`}
                {notches !== undefined && (
                  <span className="block text-xs font-normal">
                    {p.notchesMatch ? notches : `${notches}: move the notches to meet before cutting`}
                  </span>
                )}
              </Verdict>
            );
          })}
          {join && <Verdict ok={join.smooth}>{crotchJoinWords(join)}</Verdict>}
        </div>
      )}
    </section>
  );
});
