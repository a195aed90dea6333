import { useEffect, useState, type ReactNode } from 'react';
import {
  type AlterationEntry,
  type AlterationOp,
  formatLength,
  type LengthUnit,
  type Pattern,
  type Point,
  vecDistance,
  widthAtLevel,
  MeasureError,
  BODY_LEVELS,
  patternSizes,
} from '../../../../geometry/index.ts';
import type { CanvasPick } from '../../../components/pattern-canvas';
import { Button } from '../../../components/ui/button';
import { LengthField } from '../../../components/ui/length-field';
import { cx } from '../../../lib/cx';
import { inUnits } from '../model/describe';

export const TOOLS = [
  { id: 'length', label: 'Lengthen / shorten' },
  { id: 'rise', label: 'Rise' },
  { id: 'blend', label: 'Blend sizes' },
  { id: 'mark', label: 'Mark a line' },
  { id: 'slash', label: 'Slash and spread' },
  { id: 'girth', label: 'Girth' },
  { id: 'seam', label: 'Seam allowance' },
  { id: 'shrink', label: 'Shrinkage' },
  { id: 'measure', label: 'Measure' },
] as const;
export type ToolId = (typeof TOOLS)[number]['id'];

/** The tool that edits an alteration of this kind. */
export function toolFor(op: AlterationOp): ToolId {
  switch (op.op) {
    case 'lengthen':
      return 'length';
    case 'rise':
      return 'rise';
    case 'blend':
      return 'blend';
    case 'mark-line':
      return 'mark';
    case 'slash-spread':
      return 'slash';
    case 'girth':
      return 'girth';
    case 'seam-allowance':
      return 'seam';
    case 'shrinkage':
      return 'shrink';
  }
}

export interface ToolContext {
  /** The pattern as uploaded (every size line). */
  base: Pattern;
  /** The pattern with the list applied. */
  current: Pattern;
  unit: LengthUnit;
  /** The selected alteration when it is one this tool edits. */
  editing?: AlterationEntry;
  /** Add an alteration (at the end; a blend goes first) or change the one being edited. Returns the refusal, if any. */
  submit: (op: AlterationOp) => string | undefined;
  /** Ask for clicks on the drawing; `null` stops listening. */
  listen: (handler: ((pick: CanvasPick) => void) | null, hint?: string) => void;
}

function Field({ label, children }: { label: string; children: ReactNode }) {
  return (
    <label className="flex flex-col gap-1 text-sm font-semibold text-ink-900">
      {label}
      {children}
    </label>
  );
}

const selectClass = 'rounded-md border border-calico-400 bg-calico-50 px-2 py-1.5 text-base font-normal text-ink-900 focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400';

function Submit({ ctx, op, addLabel }: { ctx: ToolContext; op: AlterationOp | undefined; addLabel: string }) {
  // The refusal belongs to the operation it was for: a changed amount clears it.
  const key = JSON.stringify(op ?? null);
  const [refused, setRefused] = useState<{ key: string; message: string } | null>(null);
  const error = refused?.key === key ? refused.message : null;
  return (
    <div className="flex flex-col gap-2">
      <Button
        disabled={!op}
        onClick={() => {
          if (!op) return;
          const message = ctx.submit(op);
          setRefused(message ? { key, message: inUnits(message, ctx.unit) } : null);
        }}
      >
        {ctx.editing ? 'Update the alteration' : addLabel}
      </Button>
      {error && (
        <p role="alert" className="text-sm font-medium text-madder-700">
          {error}
        </p>
      )}
    </div>
  );
}

/** Names of lines with a role, across pieces, in the order first met. */
function lineNames(pattern: Pattern, role: 'lengthen' | 'level'): string[] {
  const names: string[] = [];
  for (const piece of pattern.pieces) for (const l of piece.lines) if (l.role === role && !names.includes(l.name)) names.push(l.name);
  return names;
}

function LengthTool({ ctx, rise }: { ctx: ToolContext; rise: boolean }) {
  const names = lineNames(ctx.current, 'lengthen');
  const editing = ctx.editing?.op.op === (rise ? 'rise' : 'lengthen') ? (ctx.editing.op as { line: string; amount: number }) : undefined;
  const preferred = rise ? (names.find((n) => /rise/i.test(n)) ?? names[0]) : (names.find((n) => !/rise/i.test(n)) ?? names[0]);
  const [line, setLine] = useState(editing?.line ?? preferred ?? '');
  const [amount, setAmount] = useState(editing?.amount ?? 0);
  if (names.length === 0)
    return <p className="text-sm text-ink-700">This pattern has no lengthen/shorten lines yet: mark one with “Mark a line”.</p>;
  const op: AlterationOp | undefined = line && amount !== 0 ? { op: rise ? 'rise' : 'lengthen', line, amount } : undefined;
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-700">
        {rise
          ? 'Raise (+) or lower (−) the waist at the rise line; front and back move together, the leg stays.'
          : 'Cut at the line and move the hem side along the grain: + lengthens, − shortens. Every piece with this line changes.'}
      </p>
      <Field label={rise ? 'Rise line' : 'Lengthen/shorten line'}>
        <select className={selectClass} value={line} onChange={(e) => setLine(e.target.value)}>
          {names.map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </select>
      </Field>
      <LengthField label="Amount" unit={ctx.unit} valueMm={amount} signed onCommit={setAmount} hint="Type −3, +2 1/2, 6.35 cm… or drag the handle on the drawing." />
      <Submit ctx={ctx} op={op} addLabel={rise ? 'Change the rise' : amount < 0 ? 'Shorten' : 'Lengthen'} />
    </div>
  );
}

/** Levels in body order: waist, the pattern's level lines from top to bottom, hem. */
function levelsOf(pattern: Pattern): string[] {
  const names = lineNames(pattern, 'level');
  const order: readonly string[] = BODY_LEVELS;
  names.sort((a, b) => (order.indexOf(a) + 1 || 99) - (order.indexOf(b) + 1 || 99));
  return ['waist', ...names, 'hem'];
}

function BlendTool({ ctx }: { ctx: ToolContext }) {
  const levels = levelsOf(ctx.base);
  const sizes = patternSizes(ctx.base);
  const editing = ctx.editing?.op.op === 'blend' ? ctx.editing.op : undefined;
  const initial = () => Object.fromEntries(levels.map((l) => [l, editing?.levels.find((x) => x.level === l)?.size.toString() ?? '']));
  const [chosen, setChosen] = useState<Record<string, string>>(initial);
  const picked = levels.filter((l) => chosen[l]).map((l) => ({ level: l, size: chosen[l]! }));
  const numeric = sizes.every((s) => Number.isFinite(Number(s)));
  const beyond = numeric && picked.some((p) => Number(p.size) < Math.min(...sizes.map(Number)) || Number(p.size) > Math.max(...sizes.map(Number)));
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-700">Choose a size at each body level; the outline follows each size there and blends smoothly between. Leave a level empty to let it blend.</p>
      <div className="grid grid-cols-[auto_1fr] items-center gap-x-3 gap-y-2">
        {levels.map((level) => (
          <label key={level} className="contents text-sm">
            <span className="font-semibold capitalize text-ink-900">{level}</span>
            <input
              list="blend-sizes"
              aria-label={`Size at ${level}`}
              className={selectClass}
              value={chosen[level] ?? ''}
              placeholder="blend"
              onChange={(e) => setChosen((c) => ({ ...c, [level]: e.target.value.trim() }))}
            />
          </label>
        ))}
      </div>
      <datalist id="blend-sizes">
        {sizes.map((s) => (
          <option key={s} value={s} />
        ))}
      </datalist>
      <p className="text-xs text-ink-500">Sizes: {sizes.join(', ')}{numeric ? '. Between or beyond them (e.g. 9 or 22) is allowed as an estimate.' : ''}</p>
      {beyond && (
        <p role="note" className="rounded-md border border-tape-400 bg-tape-100 p-2 text-sm text-ink-900">
          A size beyond the printed range is extrapolated from the grade: it is an estimate. Sew a test garment first.
        </p>
      )}
      <Submit ctx={ctx} op={picked.length > 0 ? { op: 'blend', levels: picked } : undefined} addLabel="Blend" />
    </div>
  );
}

function MarkTool({ ctx }: { ctx: ToolContext }) {
  const [role, setRole] = useState<'lengthen' | 'level'>('lengthen');
  const [name, setName] = useState('');
  const [message, setMessage] = useState<string | null>(null);
  const { listen, submit, unit } = ctx;
  useEffect(() => {
    if (!name.trim()) {
      listen(null);
      return;
    }
    listen((pick) => {
      if (!pick.piece) {
        setMessage('Click inside a piece.');
        return;
      }
      const refused = submit({ op: 'mark-line', piece: pick.piece, role, name: name.trim(), at: pick.point });
      setMessage(refused ? inUnits(refused, unit) : `Marked “${name.trim()}” on ${pick.piece}. Click another piece to mark it there too.`);
    }, `Click a piece where “${name.trim()}” goes: the line is drawn square to the grainline.`);
    return () => listen(null);
  }, [listen, submit, name, role, unit]);
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-700">Mark a line the printed pattern lacks. It is drawn square to the grainline across the piece; mark the same name on front and back to alter them together.</p>
      <Field label="Kind of line">
        <select className={selectClass} value={role} onChange={(e) => setRole(e.target.value as 'lengthen' | 'level')}>
          <option value="lengthen">Lengthen/shorten line</option>
          <option value="level">Body level (hip, knee…)</option>
        </select>
      </Field>
      <Field label="Line name">
        <input className={selectClass} value={name} onChange={(e) => setName(e.target.value)} placeholder={role === 'lengthen' ? 'e.g. lower leg' : 'e.g. knee'} />
      </Field>
      {message && <p role="status" className="text-sm text-ink-700">{message}</p>}
    </div>
  );
}

function SlashTool({ ctx }: { ctx: ToolContext }) {
  const editing = ctx.editing?.op.op === 'slash-spread' ? ctx.editing.op : undefined;
  const [piece, setPiece] = useState<string | undefined>(editing?.piece);
  const [from, setFrom] = useState<Point | undefined>(editing?.from);
  const [hinge, setHinge] = useState<Point | undefined>(editing?.hinge);
  const [amount, setAmount] = useState(editing?.amount ?? 10);
  const [move, setMove] = useState<'waist' | 'hem'>(editing && typeof editing.move === 'string' ? editing.move : 'waist');
  const { listen } = ctx;
  useEffect(() => {
    if (from && hinge) {
      listen(null);
      return;
    }
    listen(
      (pick) => {
        if (!pick.piece) return;
        if (!from) {
          setPiece(pick.piece);
          setFrom(pick.nearest?.kind === 'outline' ? pick.nearest.point : pick.point);
        } else if (pick.piece === piece) setHinge(pick.point);
      },
      !from ? 'Click where the slash starts, on the edge of a piece.' : 'Click the hinge: the point the slash turns about.',
    );
    return () => listen(null);
  }, [listen, from, hinge, piece]);
  const op: AlterationOp | undefined = piece && from && hinge && amount !== 0 ? { op: 'slash-spread', piece, from, hinge, amount, move } : undefined;
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-700">Draw the slash from an edge to a hinge point, then open (+) or close (−) it by an amount at the edge — typed here, or by dragging the handle at the slash once it is in the list.</p>
      <p className="text-sm text-ink-900">{!from ? 'Slash start: not placed' : !hinge ? `Slash on ${piece}: place the hinge` : `Slash on ${piece}: placed`}</p>
      <LengthField label="Opening at the edge" unit={ctx.unit} valueMm={amount} signed onCommit={setAmount} />
      <Field label="Part that turns">
        <select className={selectClass} value={move} onChange={(e) => setMove(e.target.value as 'waist' | 'hem')}>
          <option value="waist">The waist side</option>
          <option value="hem">The hem side</option>
        </select>
      </Field>
      <div className="flex gap-2">
        <Button variant="secondary" onClick={() => { setFrom(undefined); setHinge(undefined); }}>
          Place again
        </Button>
      </div>
      <Submit ctx={ctx} op={op} addLabel="Slash and spread" />
    </div>
  );
}

function edgeNames(pattern: Pattern): string[] {
  const names: string[] = [];
  for (const piece of pattern.pieces) for (const e of piece.edges) if (e.role !== 'other' && !names.includes(e.name)) names.push(e.name);
  return names;
}

function GirthTool({ ctx }: { ctx: ToolContext }) {
  const edges = edgeNames(ctx.current);
  const levels = levelsOf(ctx.current).filter((l) => l !== 'waist' && l !== 'hem');
  const editing = ctx.editing?.op.op === 'girth' ? ctx.editing.op : undefined;
  const [edge, setEdge] = useState(editing?.edge ?? edges.find((e) => /side/.test(e)) ?? edges[0] ?? '');
  const [level, setLevel] = useState(editing?.level ?? levels[0] ?? '');
  const [amount, setAmount] = useState(editing?.amount ?? 0);
  const [taper, setTaper] = useState(editing?.above ?? 100);
  if (edges.length === 0 || levels.length === 0) return <p className="text-sm text-ink-700">Girth changes need named seams and level lines: label them on the pattern first.</p>;
  const op: AlterationOp | undefined = edge && level && amount !== 0 ? { op: 'girth', edge, level, amount, above: taper, below: taper } : undefined;
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-700">Let out (+) or take in (−) a seam at a level, tapering to nothing along the seam above and below. The change is per seam edge: a side seam on front and back changes the girth by four times the amount.</p>
      <Field label="Seam">
        <select className={selectClass} value={edge} onChange={(e) => setEdge(e.target.value)}>
          {edges.map((n) => <option key={n}>{n}</option>)}
        </select>
      </Field>
      <Field label="At level">
        <select className={selectClass} value={level} onChange={(e) => setLevel(e.target.value)}>
          {levels.map((n) => <option key={n}>{n}</option>)}
        </select>
      </Field>
      <LengthField label="Amount at the seam" unit={ctx.unit} valueMm={amount} signed onCommit={setAmount} />
      <LengthField label="Taper over (above and below)" unit={ctx.unit} valueMm={taper} onCommit={(mm) => setTaper(Math.max(1, mm))} />
      <Submit ctx={ctx} op={op} addLabel="Change the girth" />
    </div>
  );
}

function SeamTool({ ctx }: { ctx: ToolContext }) {
  const editing = ctx.editing?.op.op === 'seam-allowance' ? ctx.editing.op : undefined;
  // 5/8 in (15.875 mm) is the usual home-sewing allowance (common practice, no source); 1 1/2 in hem.
  const [width, setWidth] = useState(editing?.width ?? (ctx.unit === 'in' ? 15.875 : 15));
  const [hem, setHem] = useState(editing?.edges?.hem ?? (ctx.unit === 'in' ? 38.1 : 40));
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-700">Draw the cut line beside the seam line. Add it last, after every other change.</p>
      <LengthField label="Seam allowance" unit={ctx.unit} valueMm={width} onCommit={setWidth} />
      <LengthField label="Hem allowance" unit={ctx.unit} valueMm={hem} onCommit={setHem} />
      <Submit ctx={ctx} op={{ op: 'seam-allowance', width, edges: { hem } }} addLabel="Add seam allowance" />
    </div>
  );
}

function ShrinkTool({ ctx }: { ctx: ToolContext }) {
  const editing = ctx.editing?.op.op === 'shrinkage' ? ctx.editing.op : undefined;
  const [along, setAlong] = useState(String(editing?.lengthwise ?? 3));
  const [across, setAcross] = useState(String(editing?.crosswise ?? 2));
  const a = Number(along.replace(',', '.'));
  const c = Number(across.replace(',', '.'));
  const ok = Number.isFinite(a) && Number.isFinite(c) && along.trim() !== '' && across.trim() !== '';
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-700">Enlarge the pieces so they have their drafted size after the cloth shrinks. Enter the shrinkage a wash test showed.</p>
      <Field label="Along the grain (warp), %">
        <input className={selectClass} inputMode="decimal" value={along} onChange={(e) => setAlong(e.target.value)} />
      </Field>
      <Field label="Across the grain (weft), %">
        <input className={selectClass} inputMode="decimal" value={across} onChange={(e) => setAcross(e.target.value)} />
      </Field>
      <Submit ctx={ctx} op={ok ? { op: 'shrinkage', lengthwise: a, crosswise: c } : undefined} addLabel="Allow for shrinkage" />
    </div>
  );
}

function MeasureTool({ ctx }: { ctx: ToolContext }) {
  const [points, setPoints] = useState<{ piece: string; at: Point }[]>([]);
  const { listen } = ctx;
  useEffect(() => {
    listen((pick) => {
      if (!pick.piece) return;
      const at = pick.nearest && pick.nearest.distanceMm < 3 ? pick.nearest.point : pick.point;
      setPoints((p) => (p.length >= 2 ? [{ piece: pick.piece!, at }] : [...p, { piece: pick.piece!, at }]));
    }, 'Click two points on one piece to measure the distance between them.');
    return () => listen(null);
  }, [listen]);
  const levels = levelsOf(ctx.current).filter((l) => l !== 'waist' && l !== 'hem');
  const widths: { piece: string; level: string; width: number }[] = [];
  for (const piece of ctx.current.pieces)
    for (const level of levels) {
      const size = piece.outlines[Math.floor((piece.outlines.length - 1) / 2)]!.size;
      try {
        widths.push({ piece: piece.name, level, width: widthAtLevel(piece, size, level) });
      } catch (e) {
        if (!(e instanceof MeasureError)) throw e;
      }
    }
  const [a, b] = points;
  return (
    <div className="flex flex-col gap-3">
      <p className="text-sm text-ink-700">Click two points on a piece. Widths at each level are listed below; seam lengths are beside the drawing.</p>
      <p role="status" className="text-sm text-ink-900">
        {a && b ? (a.piece === b.piece ? `Distance: ${formatLength(vecDistance(a.at, b.at), ctx.unit)}` : 'The two points are on different pieces.') : a ? 'Click the second point.' : 'Click the first point.'}
      </p>
      {widths.length > 0 && (
        <table className="text-sm">
          <caption className="text-left font-semibold text-ink-900">Width at each level</caption>
          <tbody>
            {widths.map((w) => (
              <tr key={`${w.piece}:${w.level}`}>
                <td className="pr-2 text-ink-700">{w.piece}</td>
                <td className="pr-2 text-ink-700">{w.level}</td>
                <td className="tabular-nums text-ink-900">{formatLength(w.width, ctx.unit)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}

/** The chosen tool's form. */
export function ToolForm({ tool, ctx }: { tool: ToolId; ctx: ToolContext }) {
  const key = ctx.editing?.id ?? 'new';
  switch (tool) {
    case 'length':
      return <LengthTool key={key} ctx={ctx} rise={false} />;
    case 'rise':
      return <LengthTool key={`rise-${key}`} ctx={ctx} rise />;
    case 'blend':
      return <BlendTool key={key} ctx={ctx} />;
    case 'mark':
      return <MarkTool ctx={ctx} />;
    case 'slash':
      return <SlashTool key={key} ctx={ctx} />;
    case 'girth':
      return <GirthTool key={key} ctx={ctx} />;
    case 'seam':
      return <SeamTool key={key} ctx={ctx} />;
    case 'shrink':
      return <ShrinkTool key={key} ctx={ctx} />;
    case 'measure':
      return <MeasureTool ctx={ctx} />;
  }
}

export function ToolTabs({ tool, onChange }: { tool: ToolId; onChange: (t: ToolId) => void }) {
  return (
    <div role="tablist" aria-label="Tools" className="flex flex-wrap gap-1">
      {TOOLS.map((t) => (
        <button
          key={t.id}
          role="tab"
          type="button"
          aria-selected={tool === t.id}
          onClick={() => onChange(t.id)}
          className={cx(
            'rounded-md px-2 py-1 text-sm font-semibold',
            tool === t.id ? 'bg-denim-600 text-calico-50' : 'text-denim-700 hover:bg-denim-50',
          )}
        >
          {t.label}
        </button>
      ))}
    </div>
  );
}
