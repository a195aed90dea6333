/**
 * Printing the demo pattern on Letter (issue 4): our pdfkit writer against the route a team
 * would try first — the same tiles as HTML pages of inline SVG, printed to PDF by headless
 * Chromium (Debian's, through playwright-core). Time and file size side by side; target: at
 * least 5× faster than Chromium and no larger, and well under a second for the whole pattern.
 * Baseline: the JSON round trip of the alteration bench, a fixed workload of the same process.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { applyOps, demoPattern, planPrint, type TiledPlan } from '../../geometry/index.ts';
import { printPattern } from '../../server/modules/print/print.service.ts';
import { renderSvg } from '../../server/modules/print/svg.ts';
import { launchChromium } from '../support/browser.ts';
import { BLEND } from './alterations.ts';
import { bench, report } from './harness.ts';

/** One HTML page per pattern tile: the sheet's SVG, viewed through the tile's printable area. */
export function tilesAsHtml(plan: TiledPlan, sheetSvg: string): string {
  const inner = sheetSvg.replace(/^[\s\S]*?<svg[^>]*>/, '').replace(/<\/svg>\s*$/, '');
  const { sheet, margin } = plan.grid;
  const origin = /<g transform="translate\(([-\d.]+) ([-\d.]+)\)">/.exec(sheetSvg);
  const ox = Number(origin?.[1] ?? 0);
  const oy = Number(origin?.[2] ?? 0);
  const pages = plan.used.map((t) => {
    const a = t.area;
    return `<section><div class="label">${t.label}</div><svg xmlns="http://www.w3.org/2000/svg" width="${a.width}mm" height="${a.height}mm" viewBox="${ox + a.x} ${oy + a.y} ${a.width} ${a.height}">${inner}</svg></section>`;
  });
  return `<!doctype html><html><head><style>
    @page { size: ${sheet.width}mm ${sheet.height}mm; margin: 0 }
    body { margin: 0 }
    section { width: ${sheet.width}mm; height: ${sheet.height}mm; padding: ${margin}mm; box-sizing: border-box; position: relative; page-break-after: always; overflow: hidden }
    .label { position: absolute; top: ${margin}mm; left: ${margin}mm; font: 700 8mm sans-serif }
  </style></head><body>${pages.join('')}</body></html>`;
}

export async function printBench(): Promise<void> {
  const pattern = applyOps(demoPattern(), [BLEND, { op: 'seam-allowance', width: 15, edges: { hem: 40 } }]).pattern;
  const options = { format: 'pdf' as const, paper: 'letter' as const, date: '2026-12-01' };
  const ours = await printPattern(pattern, options);
  const plan = planPrint(pattern, { paper: 'letter' });
  if (plan.format !== 'tiled') throw new Error('expected a tiled plan');
  const html = tilesAsHtml(plan, renderSvg(plan, { title: 'Demo', date: '2026-12-01' }));

  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'blockwright-bench-'));
  const context = await launchChromium(profile);
  try {
    const page = await context.newPage();
    const viaChromium = async () => {
      await page.setContent(html, { waitUntil: 'load' });
      return page.pdf({ preferCSSPageSize: true, printBackground: true });
    };
    const chromiumPdf = await viaChromium();

    const baseline = await bench('JSON round trip of the demo pattern', () => JSON.parse(JSON.stringify(demoPattern())));
    const mine = await bench('pdfkit: plan + write the tiled PDF', () => printPattern(pattern, options), { minRuns: 10, minTimeMs: 3000 });
    const peer = await bench('Chromium: the same tiles as HTML/SVG → page.pdf (browser warm)', viaChromium, { minRuns: 5, minTimeMs: 3000, warmup: 1 });
    report(`Printing the blended demo on Letter (${plan.pageCount} pages, ${plan.used.length} tiles)`, baseline, [
      { ...mine, targetMs: 1000 },
      peer,
    ]);
    const speed = peer.medianMs / mine.medianMs;
    console.log(
      `pdfkit is ${speed.toFixed(1)}× faster than the Chromium route (target ≥ 5×: ${speed >= 5 ? 'met' : 'MISSED'}); ` +
        `file ${(ours.data.length / 1024).toFixed(0)} KiB against ${(chromiumPdf.length / 1024).toFixed(0)} KiB ` +
        `(target no larger: ${ours.data.length <= chromiumPdf.length ? 'met' : 'MISSED'}).`,
    );
  } finally {
    await context.close();
    fs.rmSync(profile, { recursive: true, force: true });
  }
}
