/**
 * Figtree for the print files: the static regular (400) and bold (700) latin fonts of the
 * installed @fontsource/figtree, in their WOFF 1.0 files. The PDF embeds them as real text
 * (pdfkit subsets each into a CID TrueType font with a ToUnicode map, so labels can be selected,
 * searched and read aloud); the SVG draws glyph outlines taken from the same two files (see
 * svg.ts for why). The package's WOFF2 files are not used: pdfkit's font engine (fontkit) fails
 * on them.
 *
 * Each WOFF file is unpacked once per process into a plain TrueType file (woffToSfnt) that both
 * writers use: fontkit reads WOFF 1.0 but inflates a table again on every access (the whole glyf
 * table for each glyph), which made every PDF cost about 0.15 s more.
 *
 * The latin files have every character the printed pages use except arrows (← →); the pages draw
 * arrows as shapes (geometry/print/scene.ts), not as text.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { inflateSync } from 'node:zlib';

const require = createRequire(import.meta.url);

/** The two font files, resolved from the installed package. */
export const FIGTREE_FILES = {
  regular: require.resolve('@fontsource/figtree/files/figtree-latin-400-normal.woff'),
  bold: require.resolve('@fontsource/figtree/files/figtree-latin-700-normal.woff'),
} as const;

export type Weight = keyof typeof FIGTREE_FILES;

/**
 * A WOFF 1.0 file unpacked to the TrueType/OpenType (sfnt) file it was made from (W3C WOFF 1.0,
 * §3–5: a 44-byte header, then 20-byte table entries; a table is zlib-compressed when its
 * compLength is less than its origLength). Tables keep their data and checksums, 4-byte aligned.
 */
export function woffToSfnt(woff: Buffer): Buffer {
  if (woff.length < 44 || woff.readUInt32BE(0) !== 0x774f4646) throw new Error('not a WOFF 1.0 file (no "wOFF" signature)');
  const flavor = woff.readUInt32BE(4);
  const numTables = woff.readUInt16BE(12);
  const tables: { tag: number; checksum: number; data: Buffer }[] = [];
  for (let i = 0; i < numTables; i++) {
    const e = 44 + 20 * i;
    const [tag, offset, compLength, origLength, checksum] = [0, 4, 8, 12, 16].map((k) => woff.readUInt32BE(e + k)) as [number, number, number, number, number];
    if (offset + compLength > woff.length) throw new Error(`WOFF table ${i} lies outside the file`);
    const raw = woff.subarray(offset, offset + compLength);
    const data = compLength < origLength ? inflateSync(raw) : raw;
    if (data.length !== origLength) throw new Error(`WOFF table ${i} unpacks to ${data.length} bytes, not ${origLength}`);
    tables.push({ tag, checksum, data });
  }
  tables.sort((a, b) => a.tag - b.tag); // the sfnt table directory is sorted by tag
  const pad = (v: number) => (v + 3) & ~3;
  let size = 12 + 16 * numTables;
  for (const t of tables) size += pad(t.data.length);
  const out = Buffer.alloc(size);
  const power = 2 ** Math.floor(Math.log2(Math.max(1, numTables)));
  out.writeUInt32BE(flavor, 0);
  out.writeUInt16BE(numTables, 4);
  out.writeUInt16BE(power * 16, 6); // searchRange
  out.writeUInt16BE(Math.log2(power), 8); // entrySelector
  out.writeUInt16BE(numTables * 16 - power * 16, 10); // rangeShift
  let at = 12 + 16 * numTables;
  tables.forEach((t, i) => {
    const e = 12 + 16 * i;
    out.writeUInt32BE(t.tag, e);
    out.writeUInt32BE(t.checksum, e + 4);
    out.writeUInt32BE(at, e + 8);
    out.writeUInt32BE(t.data.length, e + 12);
    t.data.copy(out, at);
    at += pad(t.data.length);
  });
  return out;
}

const sfnt: Partial<Record<Weight, Buffer>> = {};
/** Figtree 400 or 700 as a TrueType file (unpacked once). */
export function figtree(weight: Weight): Buffer {
  return (sfnt[weight] ??= woffToSfnt(readFileSync(FIGTREE_FILES[weight])));
}

/**
 * Text as it is printed: Unicode NFC, and line breaks, tabs and other control characters as
 * spaces (every label is one line; pdfkit would otherwise start a new line at a line break).
 */
export function printableText(text: string): string {
  // eslint-disable-next-line no-control-regex
  return text.normalize('NFC').replace(/[\u0000-\u001f\u007f-\u009f\u2028\u2029]/g, ' ');
}

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

const fonts: Partial<Record<Weight, FontkitFont>> = {};
function loadFont(bold: boolean): FontkitFont {
  const weight: Weight = bold ? 'bold' : 'regular';
  // fontkit is pdfkit's font engine: resolve it from pdfkit's own folder, so the SVG's outlines
  // and widths come from the same engine and file as the PDF's embedded text
  return (fonts[weight] ??= (createRequire(require.resolve('pdfkit'))('fontkit') as Fontkit).create(figtree(weight)));
}

const n = (v: number): string => String(Math.round(v * 1000) / 1000);

export interface PlacedGlyph {
  /** The glyph of one weight: "r" or "b" and the glyph id ("r42"); a valid XML id. */
  readonly key: string;
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
}

const glyphData = new Map<string, FontkitPathCommand[]>();

/** Lay out `text` in Figtree (400, or 700 when bold) at `size` mm (em size), anchored at (x, y) on the baseline. */
export function layoutText(text: string, x: number, y: number, size: number, bold: boolean, anchor: 'start' | 'middle' | 'end'): TextRun {
  const f = loadFont(bold);
  const run = f.layout(printableText(text));
  const k = size / f.unitsPerEm;
  const width = run.positions.reduce((s, p) => s + p.xAdvance, 0) * k;
  let pen = anchor === 'middle' ? x - width / 2 : anchor === 'end' ? x - width : x;
  const glyphs: PlacedGlyph[] = [];
  run.glyphs.forEach((g, i) => {
    const pos = run.positions[i]!;
    const key = `${bold ? 'b' : 'r'}${g.id}`;
    if (!glyphData.has(key)) glyphData.set(key, g.path.commands.map((c) => ({ command: c.command, args: [...c.args] })));
    if (g.path.commands.length > 0) glyphs.push({ key, x: pen + pos.xOffset * k, y: y - pos.yOffset * k });
    pen += pos.xAdvance * k;
  });
  return { glyphs, scale: k, width };
}

/** A glyph's outline as SVG path data in font units (y up). Call after layoutText placed it. */
export function glyphSvgPath(key: string): string {
  return (glyphData.get(key) ?? [])
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
