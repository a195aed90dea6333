/**
 * Reading our PDFs back with pdfjs-dist (Mozilla's PDF reader, a general-purpose reference
 * implementation of ISO 32000): page boxes, every painted path in PDF user space (points,
 * y up) with its line width, colours and paint operator, found by replaying the operator list's
 * save/restore/transform (and form XObject) state, and the page's text as pdfjs extracts it
 * (getTextContent) with the fonts it is set in.
 */
import { OPS, getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';

type Matrix = [number, number, number, number, number, number];
const mul = (m: Matrix, n: Matrix): Matrix => [
  m[0] * n[0] + m[2] * n[1],
  m[1] * n[0] + m[3] * n[1],
  m[0] * n[2] + m[2] * n[3],
  m[1] * n[2] + m[3] * n[3],
  m[0] * n[4] + m[2] * n[5] + m[4],
  m[1] * n[4] + m[3] * n[5] + m[5],
];
const apply = (m: Matrix, x: number, y: number) => ({ x: m[0] * x + m[2] * y + m[4], y: m[1] * x + m[3] * y + m[5] });

export interface Pt {
  x: number;
  y: number;
}

/** One path segment in user space: a line or a cubic (4 points). */
export type DrawnSegment = readonly Pt[];

export interface PaintedPath {
  /** The paint operator (OPS.stroke, OPS.fill, …, or OPS.endPath for a clip). */
  paint: number;
  stroked: boolean;
  clip: boolean;
  /** Line width in user space (points): the width times the CTM's scale. */
  lineWidth: number;
  strokeColour: string;
  fillColour: string;
  /** Segments in user space (points, y up). */
  segments: DrawnSegment[];
  /** Whether the path came from a rectangle (`re`): pdfjs records it as moveTo + 3 lineTo + close. */
  corners: Pt[];
}

/** A font a page sets text in (a Tf operator), as pdfjs loaded it. */
export interface ReadFont {
  /** The font's name in the file (BaseFont, with a subset tag "ABCDEF+" when subset). */
  name: string;
  /** Whether the file carries the font program (pdfjs: not missingFile). */
  embedded: boolean;
}

/** One run of text as pdfjs extracts it. */
export interface ReadText {
  str: string;
  /** Start of the baseline in user space (points, y up). */
  x: number;
  y: number;
  /** Advance width of the run and its font size, in user space (points), from the embedded font's metrics. */
  width: number;
  size: number;
  font: ReadFont;
}

export interface ReadPage {
  view: number[];
  userUnit: number;
  paths: PaintedPath[];
  /** Fonts selected on the page (each once). */
  fonts: ReadFont[];
  /** Text runs with any text in them. */
  text: ReadText[];
}

interface PdfjsFont {
  name?: string;
  missingFile?: boolean;
}

const STROKES = new Set<number>([OPS.stroke, OPS.closeStroke, OPS.fillStroke, OPS.eoFillStroke, OPS.closeFillStroke, OPS.closeEOFillStroke]);

export async function readPdf(data: Buffer): Promise<{ numPages: number; viewerPreferences: Record<string, unknown> | null; pages: ReadPage[] }> {
  const pdf = await getDocument({ data: new Uint8Array(data), verbosity: 0, isEvalSupported: false }).promise;
  const pages: ReadPage[] = [];
  for (let i = 1; i <= pdf.numPages; i++) {
    const page = await pdf.getPage(i);
    const ol = await page.getOperatorList();
    let ctm: Matrix = [1, 0, 0, 1, 0, 0];
    let lw = 1;
    let stroke = '#000000';
    let fill = '#000000';
    let clipNext = false;
    const stack: { ctm: Matrix; lw: number; stroke: string; fill: string }[] = [];
    const paths: PaintedPath[] = [];
    const fontIds = new Set<string>();
    ol.fnArray.forEach((fn, k) => {
      const args = ol.argsArray[k] as unknown[];
      switch (fn) {
        case OPS.setFont:
          fontIds.add(String(args[0]));
          break;
        case OPS.save:
          stack.push({ ctm, lw, stroke, fill });
          break;
        case OPS.restore: {
          const s = stack.pop();
          if (s) ({ ctm, lw, stroke, fill } = s);
          break;
        }
        case OPS.transform:
          ctm = mul(ctm, args as Matrix);
          break;
        case OPS.paintFormXObjectBegin:
          stack.push({ ctm, lw, stroke, fill });
          if (Array.isArray(args[0])) ctm = mul(ctm, args[0] as Matrix);
          break;
        case OPS.paintFormXObjectEnd: {
          const s = stack.pop();
          if (s) ({ ctm, lw, stroke, fill } = s);
          break;
        }
        case OPS.setLineWidth:
          lw = args[0] as number;
          break;
        case OPS.setStrokeRGBColor:
          stroke = String(args[0]);
          break;
        case OPS.setFillRGBColor:
          fill = String(args[0]);
          break;
        case OPS.clip:
        case OPS.eoClip:
          clipNext = true;
          break;
        case OPS.constructPath: {
          const paint = args[0] as number;
          const buf = (args[1] as (Float32Array | null)[])[0];
          const segments: DrawnSegment[] = [];
          const corners: Pt[] = [];
          if (buf) {
            let cur: Pt = { x: 0, y: 0 };
            let start: Pt = cur;
            for (let j = 0; j < buf.length; ) {
              const op = buf[j++]!;
              if (op === 0) {
                cur = start = apply(ctm, buf[j]!, buf[j + 1]!);
                corners.push(cur);
                j += 2;
              } else if (op === 1) {
                const p = apply(ctm, buf[j]!, buf[j + 1]!);
                segments.push([cur, p]);
                corners.push(p);
                cur = p;
                j += 2;
              } else if (op === 2) {
                const c1 = apply(ctm, buf[j]!, buf[j + 1]!);
                const c2 = apply(ctm, buf[j + 2]!, buf[j + 3]!);
                const p = apply(ctm, buf[j + 4]!, buf[j + 5]!);
                segments.push([cur, c1, c2, p]);
                cur = p;
                j += 6;
              } else if (op === 3) {
                const q = apply(ctm, buf[j]!, buf[j + 1]!);
                const p = apply(ctm, buf[j + 2]!, buf[j + 3]!);
                segments.push([cur, { x: cur.x + (2 / 3) * (q.x - cur.x), y: cur.y + (2 / 3) * (q.y - cur.y) }, { x: p.x + (2 / 3) * (q.x - p.x), y: p.y + (2 / 3) * (q.y - p.y) }, p]);
                cur = p;
                j += 4;
              } else {
                if (cur.x !== start.x || cur.y !== start.y) segments.push([cur, start]);
                cur = start;
              }
            }
          }
          const scale = Math.sqrt(Math.abs(ctm[0] * ctm[3] - ctm[1] * ctm[2]));
          paths.push({ paint, stroked: STROKES.has(paint), clip: clipNext, lineWidth: lw * scale, strokeColour: stroke, fillColour: fill, segments, corners });
          clipNext = false;
          break;
        }
      }
    });
    // fonts are in the document's common objects once the operator list has been built
    const font = (id: string): ReadFont => {
      const f = page.commonObjs.get(id) as PdfjsFont;
      return { name: f.name ?? '', embedded: f.missingFile === false };
    };
    const content = await page.getTextContent();
    const text: ReadText[] = content.items.flatMap((item) => {
      if (!('str' in item) || !item.str) return [];
      const t = item.transform as Matrix;
      return [{ str: item.str, x: t[4], y: t[5], width: item.width, size: Math.hypot(t[0], t[1]), font: font(item.fontName) }];
    });
    pages.push({ view: [...page.view], userUnit: page.userUnit, paths, fonts: [...fontIds].map(font), text });
  }
  const viewerPreferences = (await pdf.getViewerPreferences()) as Record<string, unknown> | null;
  await pdf.destroy();
  return { numPages: pdf.numPages, viewerPreferences, pages };
}

/** Points along a drawn segment, about every `step` units. */
export function sampleSegment(s: DrawnSegment, step: number): Pt[] {
  if (s.length === 2) {
    const [a, b] = s as [Pt, Pt];
    const n = Math.max(1, Math.ceil(Math.hypot(b.x - a.x, b.y - a.y) / step));
    return Array.from({ length: n + 1 }, (_, k) => ({ x: a.x + ((b.x - a.x) * k) / n, y: a.y + ((b.y - a.y) * k) / n }));
  }
  const [p0, p1, p2, p3] = s as [Pt, Pt, Pt, Pt];
  const len = Math.hypot(p1.x - p0.x, p1.y - p0.y) + Math.hypot(p2.x - p1.x, p2.y - p1.y) + Math.hypot(p3.x - p2.x, p3.y - p2.y);
  const n = Math.max(2, Math.ceil(len / step));
  return Array.from({ length: n + 1 }, (_, k) => {
    const t = k / n;
    const u = 1 - t;
    return {
      x: u * u * u * p0.x + 3 * u * u * t * p1.x + 3 * u * t * t * p2.x + t * t * t * p3.x,
      y: u * u * u * p0.y + 3 * u * u * t * p1.y + 3 * u * t * t * p2.y + t * t * t * p3.y,
    };
  });
}
