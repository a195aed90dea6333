/**
 * The fonts the print files use: the static Figtree 400/700 WOFF 1.0 files unpacked to TrueType
 * (server/modules/print/fonts.ts) against fontkit (pdfkit's font engine, a general-purpose font
 * library from npm) reading the WOFF files themselves.
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { FIGTREE_FILES, figtree, layoutText, printableText, woffToSfnt } from '../../server/modules/print/fonts.ts';

interface FkGlyph {
  id: number;
  advanceWidth: number;
  path: { toSVG(): string };
}
interface FkFont {
  postscriptName: string;
  unitsPerEm: number;
  numGlyphs: number;
  characterSet: number[];
  glyphForCodePoint(cp: number): FkGlyph;
  getGlyph(id: number): FkGlyph;
}
const require = createRequire(import.meta.url);
const fontkit = createRequire(require.resolve('pdfkit'))('fontkit') as { create(b: Buffer): FkFont & { type: string } };

describe.each([
  ['regular', 'Figtree-Regular'],
  ['bold', 'Figtree-Bold'],
] as const)('Figtree %s', (weight, postscriptName) => {
  const woff = fontkit.create(readFileSync(FIGTREE_FILES[weight]));
  const ttf = fontkit.create(figtree(weight));

  it('unpacks to a TrueType file fontkit reads as the same font: name, em, glyph count, characters', () => {
    expect(woff.type).toBe('WOFF');
    expect(ttf.type).toBe('TTF');
    expect(ttf.postscriptName).toBe(postscriptName);
    expect(ttf.unitsPerEm).toBe(woff.unitsPerEm);
    expect(ttf.numGlyphs).toBe(woff.numGlyphs);
    expect([...ttf.characterSet].sort((a, b) => a - b)).toEqual([...woff.characterSet].sort((a, b) => a - b));
    expect(ttf.characterSet.length).toBeGreaterThan(200);
  });

  it('every glyph has the same advance width and outline as in the WOFF file', () => {
    for (let id = 0; id < woff.numGlyphs; id++) {
      const a = woff.getGlyph(id);
      const b = ttf.getGlyph(id);
      expect(b.advanceWidth, `glyph ${id}`).toBe(a.advanceWidth);
      expect(b.path.toSVG(), `glyph ${id}`).toBe(a.path.toSVG());
    }
  });

  it('has every character the printed pages use but arrows (drawn as shapes instead)', () => {
    for (const c of 'Print at 100 % (actual size, no "fit to page") 1 in × 1 in · 5 cm × 5 cm ’ – Blend: A1 · p2 joins B3')
      expect(ttf.characterSet, c).toContain(c.codePointAt(0));
    for (const arrow of '←→') expect(ttf.characterSet).not.toContain(arrow.codePointAt(0));
  });
});

describe('print text helpers', () => {
  it('woffToSfnt refuses a file that is not WOFF 1.0, saying so', () => {
    expect(() => woffToSfnt(Buffer.from('wOF2 not a woff 1 file at all, long enough for a header......'))).toThrow(/not a WOFF 1.0 file/);
    expect(() => woffToSfnt(Buffer.alloc(10))).toThrow(/not a WOFF 1.0 file/);
  });

  it('labels print on one line: line breaks, tabs and control characters become spaces; text is NFC', () => {
    expect(printableText('Evening\nmake\t2\r\n')).toBe('Evening make 2  ');
    expect(printableText('Zoe\u0308')).toBe('Zoë');
  });

  it('bold text is laid out with the bold font (wider than regular), anchors placing the run around x', () => {
    const regular = layoutText('5 cm', 100, 50, 5, false, 'middle');
    const bold = layoutText('5 cm', 100, 50, 5, true, 'middle');
    expect(bold.width).toBeGreaterThan(regular.width);
    expect(bold.glyphs.every((g) => g.key.startsWith('b'))).toBe(true);
    expect(regular.glyphs.every((g) => g.key.startsWith('r'))).toBe(true);
    expect(regular.glyphs[0]!.x).toBeCloseTo(100 - regular.width / 2, 9);
    const end = layoutText('joins A2', 100, 50, 3.6, true, 'end');
    expect(end.glyphs[0]!.x).toBeCloseTo(100 - end.width, 9);
  });
});
