/**
 * Text as Figtree outlines. The font is the installed @fontsource-variable/figtree (latin,
 * variable weight). pdfkit cannot embed it: its subsetter (fontkit) fails on the WOFF2 file's
 * composite glyphs ("i", accented letters, quotes), and fontkit cannot instance the WOFF2 file at
 * another weight either (it fails on the same composite glyphs). So labels are drawn as glyph
 * outlines of the font's default instance (weight 300) taken from fontkit (pdfkit's own font
 * engine), filled and stroked a little to read as regular (400) or much more as bold. The same
 * outlines go into the SVG, so both files look alike and need no font where they are printed.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';

interface FontkitPathCommand {
  command: 'moveTo' | 'lineTo' | 'quadraticCurveTo' | 'bezierCurveTo' | 'closePath';
  args: number[];
}
interface FontkitGlyph {
  id: number;
  path: { commands: FontkitPathCommand[] };
}
interface FontkitFont {
  unitsPerEm: number;
  layout(text: string): { glyphs: FontkitGlyph[]; positions: { xAdvance: number; xOffset: number; yOffset: number }[] };
}
interface Fontkit {
  create(buffer: Buffer): FontkitFont;
}

const require = createRequire(import.meta.url);

let font: FontkitFont | undefined;
function loadFont(): FontkitFont {
  if (!font) {
    // fontkit is pdfkit's font engine: resolve it from pdfkit's own folder
    const fontkit = createRequire(require.resolve('pdfkit'))('fontkit') as Fontkit;
    font = fontkit.create(readFileSync(require.resolve('@fontsource-variable/figtree/files/figtree-latin-wght-normal.woff2')));
  }
  return font;
}

/** Outline stroke (as a share of the em) that makes the weight-300 outlines read as 400 or bold. */
export const REGULAR_STROKE = 0.022;
export const BOLD_STROKE = 0.07;

const n = (v: number): string => String(Math.round(v * 1000) / 1000);

export interface PlacedGlyph {
  readonly id: number;
  /** Where the glyph's origin lies, mm (baseline, y down). */
  readonly x: number;
  readonly y: number;
}

export interface TextRun {
  readonly glyphs: readonly PlacedGlyph[];
  /** mm per font unit: glyph outlines (font units, y up) are drawn through [k 0 0 −k x y]. */
  readonly scale: number;
  /** Advance width in mm. */
  readonly width: number;
  /** Stroke round the filled outline, in font units (the same look at every size). */
  readonly strokeUnits: number;
}

const glyphData = new Map<number, FontkitPathCommand[]>();

/** Lay out `text` in Figtree at `size` mm (em size), anchored at (x, y) on the baseline. */
export function layoutText(text: string, x: number, y: number, size: number, bold: boolean, anchor: 'start' | 'middle' | 'end'): TextRun {
  const f = loadFont();
  const run = f.layout(text.normalize('NFC'));
  const k = size / f.unitsPerEm;
  const width = run.positions.reduce((s, p) => s + p.xAdvance, 0) * k;
  let pen = anchor === 'middle' ? x - width / 2 : anchor === 'end' ? x - width : x;
  const glyphs: PlacedGlyph[] = [];
  run.glyphs.forEach((g, i) => {
    const pos = run.positions[i]!;
    if (!glyphData.has(g.id)) glyphData.set(g.id, g.path.commands.map((c) => ({ command: c.command, args: [...c.args] })));
    if (g.path.commands.length > 0) glyphs.push({ id: g.id, x: pen + pos.xOffset * k, y: y - pos.yOffset * k });
    pen += pos.xAdvance * k;
  });
  return { glyphs, scale: k, width, strokeUnits: f.unitsPerEm * (bold ? BOLD_STROKE : REGULAR_STROKE) };
}

/** A glyph's outline as SVG path data in font units (y up). Call after layoutText placed it. */
export function glyphSvgPath(id: number): string {
  return (glyphData.get(id) ?? [])
    .map((c) => {
      const a = c.args.map(n);
      if (c.command === 'moveTo') return `M${a[0]} ${a[1]}`;
      if (c.command === 'lineTo') return `L${a[0]} ${a[1]}`;
      if (c.command === 'quadraticCurveTo') return `Q${a[0]} ${a[1]} ${a[2]} ${a[3]}`;
      if (c.command === 'bezierCurveTo') return `C${a[0]} ${a[1]} ${a[2]} ${a[3]} ${a[4]} ${a[5]}`;
      return 'Z';
    })
    .join('');
}

/** A glyph's outline as PDF path operators in font units (quadratics raised to cubics), no paint. */
export function glyphPdfPath(id: number): string {
  const out: string[] = [];
  let cx = 0;
  let cy = 0;
  for (const c of glyphData.get(id) ?? []) {
    const a = c.args;
    if (c.command === 'moveTo' || c.command === 'lineTo') {
      out.push(`${n(a[0]!)} ${n(a[1]!)} ${c.command === 'moveTo' ? 'm' : 'l'}`);
      [cx, cy] = [a[0]!, a[1]!];
    } else if (c.command === 'quadraticCurveTo') {
      const [qx, qy, x, y] = [a[0]!, a[1]!, a[2]!, a[3]!];
      out.push(`${n(cx + (2 / 3) * (qx - cx))} ${n(cy + (2 / 3) * (qy - cy))} ${n(x + (2 / 3) * (qx - x))} ${n(y + (2 / 3) * (qy - y))} ${n(x)} ${n(y)} c`);
      [cx, cy] = [x, y];
    } else if (c.command === 'bezierCurveTo') {
      out.push(`${a.map(n).join(' ')} c`);
      [cx, cy] = [a[4]!, a[5]!];
    } else out.push('h');
  }
  return out.join('\n');
}

/** Bounds of a glyph's control points in font units: [minX, minY, maxX, maxY]. */
export function glyphBounds(id: number): [number, number, number, number] {
  const b: [number, number, number, number] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const c of glyphData.get(id) ?? [])
    for (let i = 0; i + 1 < c.args.length; i += 2) {
      b[0] = Math.min(b[0], c.args[i]!);
      b[1] = Math.min(b[1], c.args[i + 1]!);
      b[2] = Math.max(b[2], c.args[i]!);
      b[3] = Math.max(b[3], c.args[i + 1]!);
    }
  return Number.isFinite(b[0]) ? b : [0, 0, 0, 0];
}
