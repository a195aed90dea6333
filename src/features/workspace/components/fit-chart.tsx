import { useId } from 'react';
import { Bar, CartesianGrid, ComposedChart, Line, ResponsiveContainer, Tooltip, XAxis, YAxis, type DotItemDotProps } from 'recharts';
import { FIT_GIRTH_TOLERANCE, formatLength, type LengthUnit } from '../../../../geometry/index.ts';
import type { FitChartData, FitChartRow, GirthVerdict } from '../model/fit-chart';

/** Colours from the palette (styles.css): sage ease band, ink body, tape aim, denim garment, madder off. */
const C = { band: '#9fbb98', bandEdge: '#3d6043', body: '#1e2428', aim: '#c08a14', before: '#646f77', after: '#2f4f75', off: '#9b2c24', grid: '#ddd1b9' };

const verdictText: Record<GirthVerdict, string> = { tight: 'tight', fits: 'fits', loose: 'loose' };

type Mark = 'body' | 'target' | 'before' | 'after';

/** A mark drawn at one level: the body a tall bar, the aim a diamond, the garment circles (hollow before, filled after). */
function markDot(mark: Mark) {
  return function MarkDot(props: DotItemDotProps) {
    const { cx, cy, payload, index } = props as DotItemDotProps & { cx?: number; cy?: number; payload: FitChartRow };
    const key = `${mark}-${index}`;
    if (cx === undefined || cy === undefined || !Number.isFinite(cx) || !Number.isFinite(cy)) return <g key={key} />;
    const level = payload.level;
    if (mark === 'body') return <rect key={key} data-mark="body" data-level={level} x={cx - 1.5} y={cy - 13} width={3} height={26} fill={C.body} />;
    if (mark === 'target') return <path key={key} data-mark="target" data-level={level} d={`M${cx} ${cy - 7}L${cx + 7} ${cy}L${cx} ${cy + 7}L${cx - 7} ${cy}Z`} fill={C.aim} stroke="#fcfaf5" strokeWidth={1} />;
    const verdict = mark === 'before' ? payload.beforeVerdict : payload.afterVerdict;
    const off = verdict !== undefined && verdict !== 'fits';
    const y = mark === 'before' ? cy - 6 : cy + 6;
    return mark === 'before' ? (
      <circle key={key} data-mark="before" data-level={level} cx={cx} cy={y} r={5} fill="#fcfaf5" stroke={off ? C.off : C.before} strokeWidth={2} />
    ) : (
      <circle key={key} data-mark="after" data-level={level} cx={cx} cy={y} r={5.5} fill={off ? C.off : C.after} stroke="#fcfaf5" strokeWidth={1} />
    );
  };
}

/** The level names down the side, with the planned size under each. */
function LevelTick(props: { x?: number; y?: number; payload?: { value?: string; index?: number }; rows: readonly FitChartRow[] }) {
  const { x = 0, y = 0, payload, rows } = props;
  const row = rows.find((r) => r.label === payload?.value);
  return (
    <g transform={`translate(${x},${y})`} data-level-tick={row?.level}>
      <text x={-6} y={-2} textAnchor="end" fontSize={13} fontWeight={600} fill={C.body}>
        {payload?.value}
      </text>
      {row && (
        <text x={-6} y={13} textAnchor="end" fontSize={11} fill="#646f77">
          size {row.size}
        </text>
      )}
    </g>
  );
}

/** A garment girth in the table, with its verdict under it (red when off the band). */
function Judged({ verdict, text }: { verdict: GirthVerdict; text: string }) {
  return (
    <>
      <span className="whitespace-nowrap">{text}</span>
      <span className={verdict === 'fits' ? 'block text-[10px] text-ink-500' : 'block text-[10px] font-semibold text-madder-700'}>{verdictText[verdict]}</span>
    </>
  );
}

function Swatch({ mark }: { mark: Mark | 'band' }) {
  return (
    <svg viewBox="0 0 20 14" className="h-3.5 w-5 shrink-0" aria-hidden>
      {mark === 'band' && <rect x={1} y={3} width={18} height={8} fill={C.band} stroke={C.bandEdge} strokeWidth={0.8} />}
      {mark === 'body' && <rect x={8.5} y={0} width={3} height={14} fill={C.body} />}
      {mark === 'target' && <path d="M10 1L16 7L10 13L4 7Z" fill={C.aim} />}
      {mark === 'before' && <circle cx={10} cy={7} r={4.5} fill="#fcfaf5" stroke={C.before} strokeWidth={2} />}
      {mark === 'after' && <circle cx={10} cy={7} r={5} fill={C.after} />}
    </svg>
  );
}

/**
 * Body against garment per level, drawn like a body: waist at the top, calf at the bottom,
 * girths along. The ease band runs from the body girth to body + ease; with stretch the aim can
 * sit below it. Garment girths before and after the plan are circles, red where they miss the band.
 * A caption says it in words and a table holds the same numbers.
 */
export function FitChart({ data, unit }: { data: FitChartData; unit: LengthUnit }) {
  const id = useId();
  const f = (mm: number) => formatLength(mm, unit);
  /** In the table the heading names the unit. */
  const n = (mm: number) => f(mm).replace(/ (in|cm)$/, '');
  const hasTarget = data.rows.some((r) => r.targetBelowComfort);
  const hasBefore = data.rows.some((r) => r.before !== undefined);
  const hasAfter = data.rows.some((r) => r.after !== undefined);
  const chartRows = data.rows.map((r) => ({ ...r, targetMark: r.targetBelowComfort ? r.target : undefined }));
  const height = 44 + data.rows.length * 58;
  if (data.rows.length === 0) return null;
  return (
    <figure aria-labelledby={`${id}-caption`} className="flex flex-col gap-2 rounded-md border border-calico-300 bg-calico-50 p-2">
      <figcaption id={`${id}-caption`} className="text-sm font-semibold text-ink-900">
        Body and garment by level
        <span className="block text-xs font-normal text-ink-500">Girths in {unit === 'in' ? 'inches' : 'centimetres'}; waist and hip round the body, thigh, knee and calf round one leg.</span>
      </figcaption>
      <div role="img" aria-label={`Fit chart. ${data.summary.join(' ')}`} data-testid="fit-chart" style={{ height }}>
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart layout="vertical" data={chartRows} margin={{ top: 8, right: 14, bottom: 4, left: 4 }} barCategoryGap={18}>
            <CartesianGrid horizontal={false} stroke={C.grid} />
            <XAxis
              type="number"
              domain={[data.domain[0], data.domain[1]]}
              ticks={[...data.ticks]}
              allowDataOverflow
              tickFormatter={(v: number) => formatLength(v, unit).replace(/ (in|cm)$/, '')}
              tick={{ fontSize: 11, fill: '#3a444b' }}
              stroke={C.grid}
            />
            <YAxis type="category" dataKey="label" width={62} tickLine={false} axisLine={false} tick={(p: object) => <LevelTick {...p} rows={data.rows} />} interval={0} />
            <Tooltip
              cursor={{ fill: 'rgba(226,177,68,0.12)' }}
              formatter={(value, name) => [Array.isArray(value) ? `${f(Number(value[0]))} → ${f(Number(value[1]))}` : f(Number(value)), name]}
              contentStyle={{ fontSize: 12, borderColor: C.grid }}
            />
            <Bar dataKey="band" name="Ease band" fill={C.band} stroke={C.bandEdge} strokeWidth={0.8} barSize={20} isAnimationActive={false} />
            <Line dataKey="body" name="Body" stroke="none" isAnimationActive={false} dot={markDot('body')} activeDot={false} />
            {hasTarget && <Line dataKey="targetMark" name="Aim with stretch" stroke="none" isAnimationActive={false} dot={markDot('target')} activeDot={false} />}
            {hasBefore && <Line dataKey="before" name={data.beforeLabel ?? 'Pattern before'} stroke="none" isAnimationActive={false} dot={markDot('before')} activeDot={false} />}
            {hasAfter && <Line dataKey="after" name={data.afterLabel ?? 'After the plan'} stroke="none" isAnimationActive={false} dot={markDot('after')} activeDot={false} />}
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <ul aria-label="Legend" className="flex flex-wrap gap-x-3 gap-y-1 text-xs text-ink-700">
        <li className="flex items-center gap-1">
          <Swatch mark="body" /> Body girth
        </li>
        <li className="flex items-center gap-1">
          <Swatch mark="band" /> Ease band (body to body + ease)
        </li>
        {hasTarget && (
          <li className="flex items-center gap-1">
            <Swatch mark="target" /> Aim with the cloth’s stretch
          </li>
        )}
        {hasBefore && (
          <li className="flex items-center gap-1">
            <Swatch mark="before" /> {data.beforeLabel ? `Before: ${data.beforeLabel}` : 'Pattern before the plan'}
          </li>
        )}
        {hasAfter && (
          <li className="flex items-center gap-1">
            <Swatch mark="after" /> {data.afterLabel ? `After: ${data.afterLabel}` : 'After the plan'}
          </li>
        )}
        {(hasBefore || hasAfter) && <li className="text-madder-700">Red: off the band by more than {f(FIT_GIRTH_TOLERANCE)}</li>}
      </ul>
      <details className="text-xs">
        <summary className="cursor-pointer font-semibold text-denim-700">The chart as a table</summary>
        <table aria-label="Fit chart numbers" className="mt-1 w-full text-right tabular-nums [&_td]:whitespace-nowrap [&_td]:pl-1.5 [&_td]:align-top [&_th]:pl-1.5 [&_th:first-child]:pl-0">
          <caption className="sr-only">Girths in {unit === 'in' ? 'inches' : 'centimetres'}</caption>
          <thead>
            <tr className="text-ink-500">
              <th scope="col" className="text-left font-normal">
                Level ({unit})
              </th>
              <th scope="col" className="font-normal">
                Body
              </th>
              <th scope="col" className="font-normal">
                + ease
              </th>
              {hasTarget && (
                <th scope="col" className="font-normal">
                  Aim
                </th>
              )}
              <th scope="col" className="font-normal">
                Before
              </th>
              <th scope="col" className="font-normal">
                After
              </th>
            </tr>
          </thead>
          <tbody>
            {data.rows.map((r) => (
              <tr key={r.level} aria-label={r.label}>
                <th scope="row" className="text-left font-semibold">
                  {r.label} <span className="font-normal text-ink-500">({r.size})</span>
                </th>
                <td data-mm={r.body.toFixed(2)}>{n(r.body)}</td>
                <td data-mm={r.comfort.toFixed(2)}>{n(r.comfort)}</td>
                {hasTarget && <td data-mm={r.target.toFixed(2)}>{n(r.target)}</td>}
                <td data-mm={r.before?.toFixed(2)}>{r.before !== undefined ? <Judged verdict={r.beforeVerdict!} text={n(r.before)} /> : '—'}</td>
                <td data-mm={r.after?.toFixed(2)}>{r.after !== undefined ? <Judged verdict={r.afterVerdict!} text={n(r.after)} /> : '—'}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </figure>
  );
}
