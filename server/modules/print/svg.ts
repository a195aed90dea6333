/**
 * True-scale SVG of the print on one sheet: `width`/`height` in mm and a viewBox in mm, so one
 * user unit is one millimetre whatever px-per-inch a program assumes (trade reference §5.3).
 * The same drawing data as the PDF's single sheet.
 *
 * Text is drawn as Figtree glyph outlines (<use> of one filled <path> per glyph and weight) taken
 * from the same static 400/700 font files the PDF embeds, with the words kept in each group's
 * data-text. Outlines rather than <text> with an embedded @font-face (base64 WOFF): not every
 * program an SVG is opened or printed from reads @font-face inside an SVG (resvg, which the tests
 * render with, draws no text at all from one), and a program that falls back to an installed font
 * gets other widths, so centred labels shift; outlines draw the same in every renderer and need
 * no font where the file is printed.
 */
import { type Mark, type PrintPlan, type SceneText, contentMarks, sheetScene } from '../../../geometry/index.ts';
import { glyphSvgPath, layoutText } from './fonts.ts';

const f = (v: number): string => String(Math.round(v * 1000) / 1000);
const esc = (s: string): string => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');

export function renderSvg(plan: PrintPlan, words: SceneText): string {
  const scene = sheetScene(plan, words);
  const glyphs = new Set<string>();
  let clipId = 0;
  const defs: string[] = [];

  const stroke = (s: { width: number; colour: string; dash?: readonly number[] }): string =>
    `stroke="${s.colour}" stroke-width="${f(s.width)}" stroke-linejoin="round"${s.dash && s.dash.length ? ` stroke-dasharray="${s.dash.map(f).join(' ')}"` : ''}`;

  const draw = (marks: readonly Mark[]): string[] =>
    marks.flatMap((m): string[] => {
      switch (m.kind) {
        case 'path':
          if (!m.d) return [];
          return [`<path data-role="${esc(m.role)}" d="${m.d}" fill="${m.fill ?? 'none'}"${m.stroke ? ` ${stroke(m.stroke)}` : ''}/>`];
        case 'square':
          return [`<rect data-role="test-square" x="${f(m.x)}" y="${f(m.y)}" width="${f(m.side)}" height="${f(m.side)}" fill="none" ${stroke(m.stroke)}/>`];
        case 'clip': {
          const id = `clip${++clipId}`;
          defs.push(`<clipPath id="${id}"><path d="${m.d}"/></clipPath>`);
          return [`<g clip-path="url(#${id})">`, ...draw(m.marks), '</g>'];
        }
        case 'text': {
          const run = layoutText(m.text, m.at.x, m.at.y, m.size, m.bold, m.anchor);
          if (!run.glyphs.length) return [];
          const k = f(run.scale);
          const uses = run.glyphs.map((g) => {
            glyphs.add(g.key);
            return `<use href="#${g.key}" transform="matrix(${k} 0 0 -${k} ${f(g.x)} ${f(g.y)})"/>`;
          });
          return [`<g data-text="${esc(m.text)}" fill="${m.colour}">${uses.join('')}</g>`];
        }
      }
    });

  const c = scene.content!;
  const body = [
    `<rect width="${f(scene.width)}" height="${f(scene.height)}" fill="#ffffff"/>`,
    ...draw(scene.furniture),
    `<g transform="translate(${f(c.e)} ${f(c.f)})">`,
    ...contentMarks(plan, words).flatMap((g) => draw(g.marks)),
    '</g>',
  ];
  for (const key of glyphs) defs.push(`<path id="${key}" d="${glyphSvgPath(key)}"/>`);
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" width="${f(scene.width)}mm" height="${f(scene.height)}mm" viewBox="0 0 ${f(scene.width)} ${f(scene.height)}">`,
    `<title>${esc(words.title)}: true scale, 1 unit = 1 mm</title>`,
    `<defs>${defs.join('')}</defs>`,
    ...body,
    '</svg>',
    '',
  ].join('\n');
}
