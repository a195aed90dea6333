/**
 * The true-scale SVG rendered with @resvg/resvg-js (a general-purpose SVG renderer from npm) at
 * 96 dpi: CSS Values and Units Level 3 — 1 in = 96 px, so 1 mm = 96/25.4 px. Also writes small
 * reference images of the pages to test-output/print/ for people to look at.
 */
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Resvg } from '@resvg/resvg-js';
import { describe, expect, it } from 'vitest';
import { applyOps, demoPattern } from '../../geometry/index.ts';
import { STYLE, planPrint } from '../../geometry/index.ts';
import { projectRoot } from '../../server/config.ts';
import { renderPdf } from '../../server/modules/print/pdf.ts';
import { renderSvg } from '../../server/modules/print/svg.ts';
import { BLEND } from '../bench/alterations.ts';
import { expectNear } from '../geometry/helpers.ts';

const WORDS = { title: 'Demo five-pocket trousers', date: '2026-12-01' };
const blended = applyOps(demoPattern(), [BLEND, { op: 'seam-allowance', width: 15, edges: { hem: 40 } }]).pattern;
const OUT = path.join(projectRoot, 'test-output', 'print');

const hex = (c: string) => [1, 3, 5].map((i) => parseInt(c.slice(i, i + 2), 16));

describe('true-scale SVG', () => {
  const plan = planPrint(blended, { paper: 'letter' });
  const svg = renderSvg(plan, WORDS);

  it('declares its size in mm with a viewBox in mm (1 user unit = 1 mm)', () => {
    const m = /<svg[^>]*width="([\d.]+)mm" height="([\d.]+)mm" viewBox="0 0 ([\d.]+) ([\d.]+)"/.exec(svg);
    expect(m).not.toBeNull();
    expect(Number(m![1])).toBe(Number(m![3]));
    expect(Number(m![2])).toBe(Number(m![4]));
    expect(svg).toContain('data-role="test-square"');
    expect(svg.match(/data-role="cut"/g)).toHaveLength(plan.pieces.length);
  });

  it('carries its text as filled Figtree outlines of the static weights, needing no font: bold labels in bold glyphs, the words kept in data-text', () => {
    expect(svg).not.toMatch(/<text|@font-face|font-family/);
    const group = (text: string) => new RegExp(`<g data-text="${text}" fill="#[0-9a-f]{6}">((?:<use [^>]*/>)+)</g>`).exec(svg)?.[1] ?? '';
    const glyphs = (text: string) => [...group(text).matchAll(/href="#([rb]\d+)"/g)].map((m) => m[1]!);
    // "1 in" has three glyphs with ink (the space has none)
    expect(glyphs('1 in')).toHaveLength(3);
    expect(glyphs('1 in').every((k) => k.startsWith('b'))).toBe(true);
    expect(glyphs('1 in × 1 in').every((k) => k.startsWith('r'))).toBe(true);
    expect(glyphs('1 in × 1 in')).toHaveLength(7);
    // each glyph used is defined once, as a filled path
    const used = new Set([...svg.matchAll(/href="#([rb]\d+)"/g)].map((m) => m[1]!));
    for (const k of used) expect(svg.match(new RegExp(`<path id="${k}" d="M`, 'g')), k).toHaveLength(1);
    expect(svg).not.toMatch(/<g data-text="[^"]*"[^>]*stroke/);
  });

  it('rendered at 96 dpi (resvg), the sheet has the expected pixel size and the 1 in square spans 96 px, the 5 cm one 188.98 px', () => {
    const widthMm = Number(/width="([\d.]+)mm"/.exec(svg)![1]);
    const heightMm = Number(/height="([\d.]+)mm"/.exec(svg)![1]);
    const image = new Resvg(svg, { dpi: 96, font: { loadSystemFonts: false } }).render();
    // CSS Values and Units Level 3 §5.2: 1in = 96px = 25.4mm
    expect(Math.abs(image.width - (widthMm / 25.4) * 96)).toBeLessThanOrEqual(1);
    expect(Math.abs(image.height - (heightMm / 25.4) * 96)).toBeLessThanOrEqual(1);
    // find the test squares: the only strokes in the test-square green. Each pixel's share of green
    // (anti-aliased against white) is read from how much greener than red it is.
    const [r, g] = hex(STYLE.testSquare.colour) as [number, number, number];
    const px = image.pixels;
    const cols = new Map<number, number>();
    const rows = new Map<number, number>();
    const headerRows = Math.ceil((100 / 25.4) * 96); // the squares sit in the sheet's header
    for (let y = 0; y < headerRows; y++)
      for (let x = 0; x < image.width; x++) {
        const i = (y * image.width + x) * 4;
        const share = (px[i + 1]! - px[i]!) / (g - r);
        if (share > 0.1) {
          cols.set(x, (cols.get(x) ?? 0) + share);
          rows.set(y, (rows.get(y) ?? 0) + share);
        }
      }
    // a square's side is a run of neighbouring columns (rows) holding much green: its weighted centre
    const edges = (counts: Map<number, number>, min: number) => {
      const xs = [...counts.entries()].filter(([, n]) => n >= min).map(([x]) => x).sort((p, q) => p - q);
      const groups: number[][] = [];
      for (const x of xs) {
        const last = groups[groups.length - 1];
        if (last && x - last[last.length - 1]! <= 1) last.push(x);
        else groups.push([x]);
      }
      return groups.map((gr) => gr.reduce((s, v) => s + v * counts.get(v)!, 0) / gr.reduce((s, v) => s + counts.get(v)!, 0));
    };
    const vertical = edges(cols, 30); // both squares' left and right sides
    expect(vertical).toHaveLength(4);
    expectNear(vertical[1]! - vertical[0]!, 96, 1, '1 in square, px');
    expectNear(vertical[3]! - vertical[2]!, (50 / 25.4) * 96, 1, '5 cm square, px');
    const horizontal = edges(rows, 30); // tops and bottoms: the 1 in square's bottom lies between the 5 cm one's top and bottom
    expect(horizontal).toHaveLength(3);
    expectNear(horizontal[1]! - horizontal[0]!, 96, 1, '1 in square height, px');
    expectNear(horizontal[2]! - horizontal[0]!, (50 / 25.4) * 96, 1, '5 cm square height, px');
  });

  it('writes small reference images (test-output/print/): the SVG sheet, PDF page 1 and two neighbouring tiles', async () => {
    fs.mkdirSync(OUT, { recursive: true });
    const small = new Resvg(svg, { fitTo: { mode: 'width', value: 500 }, font: { loadSystemFonts: false } }).render();
    fs.writeFileSync(path.join(OUT, 'svg-sheet-letter-layout.png'), small.asPng());
    expect(fs.statSync(path.join(OUT, 'svg-sheet-letter-layout.png')).size).toBeGreaterThan(5000);
    // PDF pages through poppler's pdftoppm (Debian poppler-utils), when installed
    let pdftoppm = true;
    try {
      execFileSync('pdftoppm', ['-v'], { stdio: 'ignore' });
    } catch {
      pdftoppm = false;
    }
    if (!pdftoppm) return;
    const tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'blockwright-print-'));
    const pdfFile = path.join(tmp, 'letter.pdf');
    fs.writeFileSync(pdfFile, await renderPdf(plan, WORDS));
    execFileSync('pdftoppm', ['-r', '60', '-png', '-f', '1', '-l', '3', pdfFile, path.join(OUT, 'letter-page')]);
    const written = fs.readdirSync(OUT).filter((f) => f.startsWith('letter-page'));
    expect(written.length).toBe(3);
    fs.rmSync(tmp, { recursive: true, force: true });
  });
});
