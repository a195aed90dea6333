/**
 * The print PDF, written with pdfkit: pages at the paper's size in PDF points (1/72 in,
 * UserUnit 1, ISO 32000-1 user space), drawn in millimetres through one scale per page, and
 * ViewerPreferences /PrintScaling /None. Tiled paper: page 1 = test squares + assembly map, then
 * one page per tile in use (only the pieces that reach a tile are written on its page). Large
 * format: one sheet with everything. Text is real text in Figtree, regular and bold, embedded as
 * subset fonts (fonts.ts), so it can be selected and searched; middle and end anchors are placed
 * with the embedded font's own widths.
 */
import PDFDocument from 'pdfkit';
import {
  type Mark,
  type MarkGroup,
  type PageScene,
  type PrintPlan,
  type SceneText,
  PT_PER_MM,
  contentMarks,
  coverScene,
  rectsMeet,
  sheetScene,
  tileScene,
} from '../../../geometry/index.ts';
import { figtree, printableText } from './fonts.ts';

/** pdfkit internals used here: the catalog. */
interface PdfInternals {
  _root: { data: Record<string, unknown> };
}

/** Names the two Figtree weights are registered under in each document. */
const FONT = { regular: 'Figtree', bold: 'Figtree-Bold' } as const;

class Writer {
  constructor(readonly doc: PDFKit.PDFDocument) {}

  marks(marks: readonly Mark[]): void {
    const doc = this.doc;
    for (const m of marks) {
      switch (m.kind) {
        case 'path':
          if (!m.d) break;
          doc.path(m.d);
          if (m.fill && m.stroke) {
            this.stroke(m.stroke);
            doc.fillAndStroke(m.fill, m.stroke.colour);
          } else if (m.fill) doc.fillColor(m.fill).fill();
          else if (m.stroke) {
            this.stroke(m.stroke);
            doc.stroke();
          }
          break;
        case 'square':
          // a plain rectangle (PDF `re`), so a reader can measure it
          this.stroke(m.stroke);
          doc.rect(m.x, m.y, m.side, m.side).stroke();
          break;
        case 'clip':
          doc.save();
          doc.path(m.d).clip();
          this.marks(m.marks);
          doc.restore();
          break;
        case 'text': {
          const t = printableText(m.text);
          if (!t.trim()) break;
          // the size is the em in mm (the page is drawn in mm); the width comes from the same
          // embedded font, kerning included, so middle and end anchors land where the scene says
          doc.font(m.bold ? FONT.bold : FONT.regular).fontSize(m.size);
          const width = doc.widthOfString(t);
          const x = m.anchor === 'middle' ? m.at.x - width / 2 : m.anchor === 'end' ? m.at.x - width : m.at.x;
          doc.fillColor(m.colour).text(t, x, m.at.y, { lineBreak: false, baseline: 'alphabetic' });
          break;
        }
      }
    }
  }

  private stroke(s: { width: number; colour: string; dash?: readonly number[] }): void {
    this.doc.lineWidth(s.width).strokeColor(s.colour).lineJoin('round').lineCap('butt');
    // pdfkit takes a dash array at run time; its type declaration lists only a single length
    if (s.dash && s.dash.length) (this.doc.dash as unknown as (pattern: number[], options: object) => void).call(this.doc, [...s.dash], {});
    else this.doc.undash();
  }

  page(scene: PageScene, groups: readonly MarkGroup[]): void {
    const doc = this.doc;
    doc.addPage({ size: [scene.width * PT_PER_MM, scene.height * PT_PER_MM], margin: 0 });
    doc.save();
    doc.scale(PT_PER_MM);
    if (scene.clip) doc.rect(scene.clip.x, scene.clip.y, scene.clip.width, scene.clip.height).clip();
    if (scene.content) {
      doc.save();
      const c = scene.content;
      doc.transform(c.a, c.b, c.c, c.d, c.e, c.f);
      for (const g of groups) if (!scene.view || rectsMeet(g.box, scene.view)) this.marks(g.marks);
      doc.restore();
    }
    this.marks(scene.furniture);
    doc.restore();
  }
}

/** Render a plan to one PDF. `onPage(done, total)` is awaited after each page (a background job reports progress with it). */
export async function renderPdf(plan: PrintPlan, words: SceneText, onPage?: (done: number, total: number) => Promise<void> | void): Promise<Buffer> {
  const doc = new PDFDocument({
    autoFirstPage: false,
    margin: 0,
    compress: true,
    pdfVersion: '1.7',
    info: { Title: words.title, Creator: 'Blockwright', Producer: 'Blockwright (pdfkit)' },
  });
  // each embedded once at the end, subset to the glyphs the pages used
  doc.registerFont(FONT.regular, figtree('regular'));
  doc.registerFont(FONT.bold, figtree('bold'));
  // ViewerPreferences /PrintScaling /None (ISO 32000-1 Table 150): the print dialog starts at no scaling.
  (doc as unknown as PdfInternals)._root.data.ViewerPreferences = doc.ref({ PrintScaling: 'None' });
  const chunks: Buffer[] = [];
  doc.on('data', (c: Buffer) => chunks.push(c));
  const done = new Promise<void>((resolve, reject) => {
    doc.on('end', resolve);
    doc.on('error', reject);
  });
  const w = new Writer(doc);
  const groups = contentMarks(plan, words);
  if (plan.format === 'single') {
    w.page(sheetScene(plan, words), groups);
    await onPage?.(1, 1);
  } else {
    const total = plan.used.length + 1;
    w.page(coverScene(plan, words), groups);
    await onPage?.(1, total);
    for (const [i, tile] of plan.used.entries()) {
      w.page(tileScene(plan, tile, i + 2, words), groups);
      await onPage?.(i + 2, total);
    }
  }
  doc.end();
  await done;
  return Buffer.concat(chunks);
}
