/**
 * The print PDF read back with pdfjs-dist (Mozilla's PDF reader, used as the reference reader):
 * page sizes against ISO 216 / US paper in ISO 32000-1 user space (72 pt per inch), the test
 * squares' measured size, true size on a large-format sheet, that the tile pages together
 * carry every point of every cut line inside their printable areas, and that the words are real
 * text in embedded Figtree (pdfjs getTextContent) standing where the scene puts them.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { applyOps, contourBounds, contourFlatten, demoPattern, parsePattern, pathFromSvg, type Pattern } from '../../geometry/index.ts';
import { PT_PER_MM, type PrintPlan, SCALE_INSTRUCTION, STYLE, planPrint } from '../../geometry/index.ts';
import { renderPdf } from '../../server/modules/print/pdf.ts';
import { BLEND } from '../bench/alterations.ts';
import { expectNear } from '../geometry/helpers.ts';
import { type PaintedPath, type Pt, type ReadPage, readPdf, sampleSegment } from './pdf-reader.ts';

const WORDS = { title: 'Demo five-pocket trousers', date: '2026-12-01' };
const blended: Pattern = applyOps(demoPattern(), [BLEND, { op: 'seam-allowance', width: 15, edges: { hem: 40 } }]).pattern;

const CUT_PT = STYLE.cut.width * PT_PER_MM;
const isCut = (p: PaintedPath) => p.stroked && Math.abs(p.lineWidth - CUT_PT) < 1e-3 && p.strokeColour === STYLE.cut.colour;

interface Printed {
  plan: PrintPlan;
  pdf: Buffer;
  read: Awaited<ReturnType<typeof readPdf>>;
}
async function print(pattern: Pattern, options: Parameters<typeof planPrint>[1]): Promise<Printed> {
  const plan = planPrint(pattern, options);
  const pdf = await renderPdf(plan, WORDS);
  return { plan, pdf, read: await readPdf(pdf) };
}

function bounds(points: readonly Pt[]) {
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  return { minX: Math.min(...xs), maxX: Math.max(...xs), minY: Math.min(...ys), maxY: Math.max(...ys) };
}

/** The two test squares on a page: rectangles stroked in the test-square colour. */
function testSquares(page: ReadPage) {
  return page.paths.filter((p) => p.stroked && p.strokeColour === STYLE.testSquare.colour && p.corners.length === 4);
}

let letter: Printed;
let a4: Printed;
beforeAll(async () => {
  letter = await print(blended, { paper: 'letter' });
  a4 = await print(blended, { paper: 'a4', overlap: 12 });
});

describe('home-printer PDF (read back with pdfjs-dist)', () => {
  it('every Letter page is 612 × 792 pt (US Letter 8.5 × 11 in at 72 pt per inch, ISO 32000-1 user space), UserUnit 1', () => {
    expect(letter.read.numPages).toBe(letter.plan.pageCount);
    for (const page of letter.read.pages) {
      expect(page.userUnit).toBe(1);
      const [x0, y0, x1, y1] = page.view as [number, number, number, number];
      expectNear(x0, 0, 1e-9);
      expectNear(y0, 0, 1e-9);
      const landscape = letter.plan.format === 'tiled' && letter.plan.grid.orientation === 'landscape';
      expectNear(x1, landscape ? 792 : 612, 1e-3, 'width');
      expectNear(y1, landscape ? 612 : 792, 1e-3, 'height');
    }
  });

  it('every A4 page is 595.276 × 841.890 pt (ISO 216 A4 = 210 × 297 mm; 1 in = 25.4 mm, 72 pt)', () => {
    for (const page of a4.read.pages) {
      const [, , w, h] = page.view as [number, number, number, number];
      expectNear(Math.min(w, h), 595.276, 1e-3);
      expectNear(Math.max(w, h), 841.89, 1e-3);
    }
  });

  it('asks viewers not to scale when printing: ViewerPreferences /PrintScaling /None (ISO 32000-1 Table 150)', () => {
    expect(letter.read.viewerPreferences).toMatchObject({ PrintScaling: 'None' });
  });

  it('page 1 has a 1 in test square measuring 72 pt and a 5 cm one measuring 141.73 pt, within 0.1 pt', () => {
    for (const doc of [letter, a4]) {
      const squares = testSquares(doc.read.pages[0]!);
      expect(squares).toHaveLength(2);
      const sides = squares
        .map((sq) => {
          const [a, b, , d] = sq.corners as [Pt, Pt, Pt, Pt];
          return [Math.hypot(b.x - a.x, b.y - a.y), Math.hypot(d.x - a.x, d.y - a.y)] as const;
        })
        .sort((p, q) => p[0] - q[0]);
      // 1 in = 72 pt (ISO 32000-1 default user space); 5 cm = 50 / 25.4 × 72 = 141.732 pt (calc)
      for (const s of sides[0]!) expectNear(s, 72, 0.1, '1 in square');
      for (const s of sides[1]!) expectNear(s, 141.732, 0.1, '5 cm square');
      // and only on page 1
      for (const page of doc.read.pages.slice(1)) expect(testSquares(page)).toHaveLength(0);
    }
  });

  it('each tile page clips to its printable area: the sheet less 6.35 mm (¼ in) on every side', () => {
    const m = 6.35 * PT_PER_MM;
    for (const page of letter.read.pages.slice(1)) {
      const clip = page.paths.find((p) => p.clip)!;
      const b = bounds(clip.corners);
      const [, , w, h] = page.view as [number, number, number, number];
      expectNear(b.minX, m, 1e-3);
      expectNear(b.minY, m, 1e-3);
      expectNear(b.maxX, w - m, 1e-3);
      expectNear(b.maxY, h - m, 1e-3);
    }
  });

  it('the tile pages together carry every point of every cut line inside a printable area (none in a margin or between pages)', () => {
    for (const doc of [letter, a4]) {
      const plan = doc.plan;
      if (plan.format !== 'tiled') throw new Error('expected tiles');
      const H = plan.grid.sheet.height * PT_PER_MM;
      const m = plan.grid.margin;
      // drawn cut-line points inside each page's clip, mapped back to layout millimetres
      const cells = new Map<string, Pt[]>();
      const key = (x: number, y: number) => `${Math.floor(x / 4)},${Math.floor(y / 4)}`;
      doc.read.pages.slice(1).forEach((page, i) => {
        const tile = plan.used[i]!;
        const clip = bounds(page.paths.find((p) => p.clip)!.corners);
        for (const path of page.paths.filter(isCut))
          for (const s of path.segments)
            for (const p of sampleSegment(s, 0.5)) {
              if (p.x < clip.minX || p.x > clip.maxX || p.y < clip.minY || p.y > clip.maxY) continue;
              const q = { x: p.x / PT_PER_MM - m + tile.area.x, y: (H - p.y) / PT_PER_MM - m + tile.area.y };
              const k = key(q.x, q.y);
              (cells.get(k) ?? cells.set(k, []).get(k)!).push(q);
            }
      });
      const near = (q: Pt) => {
        const cx = Math.floor(q.x / 4);
        const cy = Math.floor(q.y / 4);
        for (let dx = -1; dx <= 1; dx++)
          for (let dy = -1; dy <= 1; dy++) for (const p of cells.get(`${cx + dx},${cy + dy}`) ?? []) if (Math.hypot(p.x - q.x, p.y - q.y) < 0.5) return true;
        return false;
      };
      let checked = 0;
      for (const pl of plan.layout.placements) {
        const outline = blended.pieces[pl.index]!.outlines[0]!;
        const cut = pathFromSvg(outline.cut!)[0]!;
        for (const f of contourFlatten(cut, 0.05)) {
          const q = { x: pl.transform.a * f.point.x + pl.transform.c * f.point.y + pl.transform.e, y: pl.transform.b * f.point.x + pl.transform.d * f.point.y + pl.transform.f };
          expect(near(q), `${blended.pieces[pl.index]!.name}: cut-line point (${q.x.toFixed(1)}, ${q.y.toFixed(1)}) is on no page`).toBe(true);
          checked++;
        }
      }
      expect(checked).toBeGreaterThan(500);
    }
  });
});

describe('text in the PDF is real text (read back with pdfjs-dist getTextContent)', () => {
  const strings = (page: ReadPage) => page.text.map((t) => t.str);

  it('page 1 carries the test-square labels "1 in" and "5 cm", their captions, the title and the instruction to print at 100 % as extractable text', () => {
    for (const doc of [letter, a4]) {
      const s = strings(doc.read.pages[0]!);
      expect(s).toEqual(expect.arrayContaining(['1 in', '5 cm', '1 in × 1 in', '5 cm × 5 cm', WORDS.title, SCALE_INSTRUCTION]));
      expect(s.some((t) => t.includes('Print at 100 %'))).toBe(true);
    }
  });

  it('all text is set in embedded, subset Figtree Regular and Bold and nothing else; bold labels in the bold font', () => {
    // a subset font's name is six capital letters and "+" before the font's own name (ISO 32000-1
    // §9.6.4, from memory); pdfjs reports a font whose program the file lacks as missingFile
    const subsetFigtree = /^[A-Z]{6}\+Figtree-(Regular|Bold)$/;
    for (const doc of [letter, a4]) {
      const names = new Set<string>();
      for (const page of doc.read.pages) {
        expect(page.fonts.length).toBeGreaterThan(0);
        for (const f of [...page.fonts, ...page.text.map((t) => t.font)]) {
          expect(f.name).toMatch(subsetFigtree);
          expect(f.embedded, f.name).toBe(true);
          names.add(f.name.slice(7));
        }
      }
      expect([...names].sort()).toEqual(['Figtree-Bold', 'Figtree-Regular']);
      const run = (str: string) => doc.read.pages[0]!.text.find((t) => t.str === str)!;
      for (const bold of ['1 in', '5 cm', WORDS.title, SCALE_INSTRUCTION]) expect(run(bold).font.name, bold).toMatch(/\+Figtree-Bold$/);
      for (const regular of ['1 in × 1 in', '5 cm × 5 cm']) expect(run(regular).font.name, regular).toMatch(/\+Figtree-Regular$/);
    }
  });

  it('the square labels stand where the scene puts them: centred on their squares (within 0.3 pt, by pdfjs’s own widths), baselines 14.2 and 27 mm below the squares’ top, 4 and 5 mm tall', () => {
    for (const doc of [letter, a4]) {
      const page = doc.read.pages[0]!;
      const [inch, cm] = testSquares(page)
        .map((sq) => bounds(sq.corners))
        .sort((p, q) => p.maxX - p.minX - (q.maxX - q.minX)) as [ReturnType<typeof bounds>, ReturnType<typeof bounds>];
      const label = (str: string) => page.text.find((t) => t.str === str)!;
      // scene.ts testSquares: "1 in" (4 mm) at the 1 in square's middle, baseline 12.7 + 1.5 mm
      // below its top; "5 cm" (5 mm) at the 5 cm square's middle, baseline 27 mm below its top
      for (const [sq, str, below, size] of [
        [inch, '1 in', 25.4 / 2 + 1.5, 4],
        [cm, '5 cm', 27, 5],
      ] as const) {
        const t = label(str);
        expectNear(t.x + t.width / 2, (sq.minX + sq.maxX) / 2, 0.3, `${str} centre`);
        expectNear(t.y, sq.maxY - below * PT_PER_MM, 0.1, `${str} baseline`);
        expectNear(t.size, size * PT_PER_MM, 1e-3, `${str} size`);
      }
    }
  });

  it('each tile page names itself and its page number in text; the caption to the right-hand neighbour ends 12 mm inside the frame (end anchor)', () => {
    const plan = letter.plan;
    if (plan.format !== 'tiled') throw new Error('expected tiles');
    const m = plan.grid.margin;
    let rightCaptions = 0;
    plan.used.forEach((tile, i) => {
      const page = letter.read.pages[i + 1]!;
      const s = strings(page);
      expect(s).toContain(tile.label);
      expect(s).toContain(`page ${i + 2} of ${plan.pageCount} · ${WORDS.title}`);
      const right = plan.used.find((t) => t.row === tile.row && t.col === tile.col + 1);
      if (!right) return;
      const caption = page.text.find((t) => t.str === `joins ${right.label}`);
      expect(caption, `${tile.label} → ${right.label}`).toBeDefined();
      // scene.ts tileScene: anchored at its end, m + width − overlap − 12 mm from the sheet's left
      expectNear(caption!.x + caption!.width, (m + tile.area.width - plan.grid.overlap - 12) * PT_PER_MM, 0.3, `${tile.label} caption end`);
      rightCaptions++;
    });
    expect(rightCaptions).toBeGreaterThan(5);
  });
});

describe('large-format PDF', () => {
  const small: Pattern = parsePattern({ ...demoPattern(), pieces: demoPattern().pieces.filter((p) => ['yoke', 'front pocket bag', 'back pocket'].includes(p.name)) });

  it('A0 is one page of 2383.937 × 3370.394 pt (ISO 216 A0 = 841 × 1189 mm at 72 pt per inch)', async () => {
    const a0 = await print(small, { paper: 'a0', size: '8' });
    expect(a0.read.numPages).toBe(1);
    const [, , w, h] = a0.read.pages[0]!.view as [number, number, number, number];
    expectNear(w, (841 / 25.4) * 72, 1e-3);
    expectNear(h, (1189 / 25.4) * 72, 1e-3);
    expect(testSquares(a0.read.pages[0]!)).toHaveLength(2);
  });

  it('each piece’s outline is drawn at its true size within 0.5 pt (914 mm roll, blended demo)', async () => {
    const roll = await print(blended, { paper: 'roll-914' });
    expect(roll.read.numPages).toBe(1);
    const page = roll.read.pages[0]!;
    expectNear(page.view[2]!, (914 / 25.4) * 72, 1e-3, 'roll width');
    const cuts = page.paths.filter(isCut).map((p) => bounds(p.segments.flatMap((s) => sampleSegment(s, 0.25))));
    let checked = 0;
    for (const [i, piece] of blended.pieces.entries()) {
      // pieces drawn with their grain along y, upright or turned 180°, keep the size of their
      // pattern-space bounds (the waistband is drawn with its grain along x, so it lies turned a quarter)
      const turn = roll.plan.layout.placements[i]!.turn;
      if (roll.plan.pieces[i]!.grainTurn !== 0 || (turn !== 0 && turn !== 180)) continue;
      checked++;
      const b = contourBounds(pathFromSvg(piece.outlines[0]!.cut!)[0]!);
      const w = (b.maxX - b.minX) * PT_PER_MM;
      const h = (b.maxY - b.minY) * PT_PER_MM;
      const match = cuts.find((c) => Math.abs(c.maxX - c.minX - w) < 0.5 && Math.abs(c.maxY - c.minY - h) < 0.5);
      expect(match, `${piece.name}: no cut line of ${w.toFixed(2)} × ${h.toFixed(2)} pt`).toBeDefined();
    }
    expect(checked).toBe(5);
  });
});

describe('progress while writing', () => {
  it('when a background job follows the writing, then it hears once per page, in order, ending at the page count', async () => {
    const pattern = applyOps(demoPattern(), [BLEND]).pattern;
    const plan = planPrint(pattern, { paper: 'letter' });
    const heard: [number, number][] = [];
    const pdf = await renderPdf(plan, { title: 'Progress', date: '2026-12-02' }, (done, total) => {
      heard.push([done, total]);
    });
    expect(heard.length).toBe(plan.pageCount);
    expect(heard.map(([d]) => d)).toEqual(Array.from({ length: plan.pageCount }, (_, i) => i + 1));
    expect(new Set(heard.map(([, t]) => t))).toEqual(new Set([plan.pageCount]));
    expect((await readPdf(pdf)).numPages).toBe(plan.pageCount);
  });
});
