/**
 * A multi-size SVG pattern file, as a sewist might export one from a drawing program: the demo
 * pattern's front and back at three sizes, nested, in millimetres, sizes named on the outlines
 * (`data-size`), level and rise lines named (`data-role`, `data-name`), but the pieces NOT
 * named: the person names them in the review.
 */
import { demoPattern, pathFromSvg, pathToSvg, pathTransform } from '../../geometry/index.ts';

export function multiSizeSvg(options: { pieces?: string[]; sizes?: string[]; lines?: string[] } = {}): string {
  const pieces = options.pieces ?? ['front', 'back'];
  const sizes = options.sizes ?? ['8', '10', '12'];
  const lines = options.lines ?? ['hip', 'crotch', 'thigh', 'knee', 'calf', 'rise'];
  const pattern = demoPattern();
  let x = 0;
  const groups: string[] = [];
  let height = 0;
  for (const name of pieces) {
    const piece = pattern.pieces.find((p) => p.name === name);
    if (!piece) throw new Error(`no demo piece ${name}`);
    const outlines = piece.outlines.filter((o) => sizes.includes(o.size));
    const paths = outlines.map((o) => pathFromSvg(o.d));
    let minX = Infinity;
    let minY = Infinity;
    let maxX = -Infinity;
    let maxY = -Infinity;
    for (const p of paths)
      for (const c of p)
        for (const s of c.segments)
          for (const q of [s.from, s.to]) {
            minX = Math.min(minX, q.x);
            minY = Math.min(minY, q.y);
            maxX = Math.max(maxX, q.x);
            maxY = Math.max(maxY, q.y);
          }
    const shift = { a: 1, b: 0, c: 0, d: 1, e: x - minX + 20, f: -minY + 20 };
    const body: string[] = [];
    for (const o of outlines) body.push(`<path data-size="${o.size}" fill="none" stroke="black" d="${pathToSvg(pathTransform(pathFromSvg(o.d), shift), 3)}"/>`);
    for (const l of piece.lines)
      if (lines.includes(l.name) && (l.size === undefined || sizes.includes(l.size)))
        body.push(`<path data-role="${l.role}" data-name="${l.name}"${l.size ? ` data-size="${l.size}"` : ''} fill="none" stroke="grey" d="${pathToSvg(pathTransform(pathFromSvg(l.d), shift), 3)}"/>`);
    groups.push(`<g>${body.join('\n')}</g>`);
    x += maxX - minX + 40;
    height = Math.max(height, maxY - minY + 40);
  }
  const width = Math.ceil(x);
  const h = Math.ceil(height);
  return `<?xml version="1.0" encoding="UTF-8"?>\n<svg xmlns="http://www.w3.org/2000/svg" width="${width}mm" height="${h}mm" viewBox="0 0 ${width} ${h}">\n${groups.join('\n')}\n</svg>\n`;
}
