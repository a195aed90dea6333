import { useId } from 'react';
import { BODY_LEVELS, type EdgeRole, type Point } from '../../../../geometry/index.ts';
import { Button } from '../../../components/ui/button';
import { cx } from '../../../lib/cx';

export type ToolKind = 'grain' | 'level' | 'lengthen' | 'notch' | 'edge';

/** The tool in use and the click it has so far (two-click tools). */
export type ActiveTool = { kind: ToolKind; first?: Point };

export interface ToolOptions {
  level: string;
  levelOther: string;
  lengthen: string;
  notch: string;
  edgeRole: EdgeRole;
  edgeOther: string;
  squareToGrain: boolean;
}

export const LEVEL_CHOICES = BODY_LEVELS;
export const LENGTHEN_SUGGESTIONS = ['lower leg', 'upper leg', 'rise'] as const;

/** Edge roles in the trade's words; the edge is named after its role unless it is "other". */
export const EDGE_CHOICES: readonly { role: EdgeRole; label: string }[] = [
  { role: 'waist', label: 'waist' },
  { role: 'centre-front', label: 'centre front' },
  { role: 'centre-back', label: 'centre back' },
  { role: 'crotch-curve', label: 'crotch curve' },
  { role: 'inseam', label: 'inseam' },
  { role: 'side-seam', label: 'side seam' },
  { role: 'hem', label: 'hem' },
  { role: 'other', label: 'other (name it)' },
];

const TOOL_LABELS: Record<ToolKind, string> = {
  grain: 'Grainline',
  level: 'Level line',
  lengthen: 'Lengthen/shorten line',
  notch: 'Notch',
  edge: 'Edge',
};

export const levelName = (o: ToolOptions) => (o.level === 'other' ? o.levelOther.trim() : o.level);
export const edgeName = (o: ToolOptions) => (o.edgeRole === 'other' ? o.edgeOther.trim() : (EDGE_CHOICES.find((c) => c.role === o.edgeRole)?.label ?? o.edgeRole));

/** What to click next, in one line. */
export function toolHint(tool: ActiveTool | null, o: ToolOptions, pieceName: string): string {
  if (!tool) return `Choose a tool, then click on the drawing of ${pieceName}.`;
  const line = o.squareToGrain ? 'square to the grainline through your first click' : 'through both clicks';
  switch (tool.kind) {
    case 'grain':
      return tool.first ? 'Grainline: now click its other end.' : 'Grainline: click one end of the grainline.';
    case 'level':
      return tool.first
        ? `Level line “${levelName(o) || '…'}”: now click the other side of the piece; the line is drawn ${line}.`
        : `Level line “${levelName(o) || '…'}”: click where the level meets one side of the piece.`;
    case 'lengthen':
      return tool.first
        ? `Lengthen/shorten line “${o.lengthen.trim() || '…'}”: now click the other side of the piece; the line is drawn ${line}.`
        : `Lengthen/shorten line “${o.lengthen.trim() || '…'}”: click where the line meets one side of the piece.`;
    case 'notch':
      return `Notch “${o.notch.trim() || '…'}”: click the outline where the notch goes.`;
    case 'edge':
      return tool.first ? `Edge “${edgeName(o) || '…'}”: now click where it ends.` : `Edge “${edgeName(o) || '…'}”: click where it starts on the outline.`;
  }
}

const selectClasses =
  'rounded-md border border-calico-400 bg-calico-50 px-2.5 py-1.5 text-sm focus:border-denim-600 focus:outline-none focus:ring-2 focus:ring-tape-400';
const inputClasses = cx(selectClasses, 'w-40');

/** The labelling toolbar and the chosen tool's options. */
export function LabellingTools({
  tool,
  options,
  onTool,
  onOptions,
}: {
  tool: ActiveTool | null;
  options: ToolOptions;
  onTool: (tool: ActiveTool | null) => void;
  onOptions: (options: ToolOptions) => void;
}) {
  const id = useId();
  const set = (patch: Partial<ToolOptions>) => onOptions({ ...options, ...patch });
  const kind = tool?.kind;
  return (
    <div className="flex flex-col gap-3">
      <div role="toolbar" aria-label="Labelling tools" className="flex flex-wrap gap-2">
        {(Object.keys(TOOL_LABELS) as ToolKind[]).map((k) => (
          <Button key={k} variant={kind === k ? 'primary' : 'secondary'} className="px-3 py-1.5" aria-pressed={kind === k} onClick={() => onTool(kind === k ? null : { kind: k })}>
            {TOOL_LABELS[k]}
          </Button>
        ))}
        {tool && (
          <Button variant="quiet" className="px-3 py-1.5" onClick={() => onTool(null)} aria-keyshortcuts="Escape">
            Cancel tool
          </Button>
        )}
      </div>
      {(kind === 'level' || kind === 'lengthen' || kind === 'notch' || kind === 'edge') && (
        <div className="flex flex-wrap items-end gap-3 text-sm">
          {kind === 'level' && (
            <>
              <label className="flex flex-col gap-1 font-semibold">
                Level
                <select className={selectClasses} value={options.level} onChange={(e) => set({ level: e.target.value })}>
                  {LEVEL_CHOICES.map((l) => (
                    <option key={l} value={l}>
                      {l}
                    </option>
                  ))}
                  <option value="other">another level…</option>
                </select>
              </label>
              {options.level === 'other' && (
                <label className="flex flex-col gap-1 font-semibold">
                  Level name
                  <input className={inputClasses} value={options.levelOther} onChange={(e) => set({ levelOther: e.target.value })} maxLength={120} />
                </label>
              )}
            </>
          )}
          {kind === 'lengthen' && (
            <label className="flex flex-col gap-1 font-semibold">
              Line name
              <input className={inputClasses} list={`${id}-lengthen`} value={options.lengthen} onChange={(e) => set({ lengthen: e.target.value })} maxLength={120} />
              <datalist id={`${id}-lengthen`}>
                {LENGTHEN_SUGGESTIONS.map((s) => (
                  <option key={s} value={s} />
                ))}
              </datalist>
            </label>
          )}
          {(kind === 'level' || kind === 'lengthen') && (
            <label className="flex items-center gap-2 pb-1.5">
              <input type="checkbox" checked={options.squareToGrain} onChange={(e) => set({ squareToGrain: e.target.checked })} className="size-4 accent-denim-600" />
              Square to the grainline
            </label>
          )}
          {kind === 'notch' && (
            <label className="flex flex-col gap-1 font-semibold">
              Notch name
              <input className={inputClasses} value={options.notch} onChange={(e) => set({ notch: e.target.value })} maxLength={120} />
            </label>
          )}
          {kind === 'edge' && (
            <>
              <label className="flex flex-col gap-1 font-semibold">
                Seam or edge
                <select className={selectClasses} value={options.edgeRole} onChange={(e) => set({ edgeRole: e.target.value as EdgeRole })}>
                  {EDGE_CHOICES.map((c) => (
                    <option key={c.role} value={c.role}>
                      {c.label}
                    </option>
                  ))}
                </select>
              </label>
              {options.edgeRole === 'other' && (
                <label className="flex flex-col gap-1 font-semibold">
                  Edge name
                  <input className={inputClasses} value={options.edgeOther} onChange={(e) => set({ edgeOther: e.target.value })} maxLength={120} />
                </label>
              )}
            </>
          )}
        </div>
      )}
    </div>
  );
}
