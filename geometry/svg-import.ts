/**
 * Import trouser pattern pieces from SVG.
 *
 * Units: the root `width`/`height` (mm, cm, in, pt, pc, px, Q; unitless = px = 1/96 in per
 * CSS Values and Units §5.2) and `viewBox` give the size of a user unit; without a viewBox a
 * user unit is a px. Nested `transform`s (matrix, translate, scale, rotate, skewX, skewY) are
 * applied. Shapes: path (every command), rect (with rx/ry), circle, ellipse, line, polyline,
 * polygon.
 *
 * Pieces and sizes: `data-piece`, `data-size`, `data-role` and `data-name` on the element or an
 * enclosing group; else a group's `id` or `inkscape:label` names the piece; else closed
 * outlines are grouped automatically (outlines nested inside one another = one piece, sizes
 * numbered smallest to largest) for the user to name later. `data-role`: `outline` (default
 * for closed shapes) or a line role (`lengthen`, `level`, `grain`, `fold`, `internal`).
 *
 * Safety: scripts, styles, images, `use` references and anything external are never executed
 * or fetched (they are skipped and listed in `skipped`); a DOCTYPE (entity declarations) is
 * refused; size and point-count limits apply. An unclosed or self-crossing outline is refused
 * with where it is. Nothing is half-imported: the result is a whole valid pattern or an error.
 */
import { type Outline, type Pattern, type PatternLine, type Piece, LINE_ROLES, PATTERN_VERSION, parsePattern } from './model.ts';
import { type Contour, type Path, contourArea, contourFlatten, contourSelfCrossings, pathFromSvg, pathToSvg, pathTransform } from './path.ts';
import { CLOSE_GAP } from './tolerance.ts';
import { type Affine, AFFINE_IDENTITY, affineMultiply, affineRotate, affineScale, affineTranslate, pointInPolygon, polygonDistance, vecDistance } from './vec.ts';
import { type XmlElement, xmlParse } from './xml.ts';

export class SvgImportError extends Error {
  override readonly name = 'SvgImportError';
}

export interface SvgImportResult {
  readonly pattern: Pattern;
  /** Elements that were not imported (scripts, images, references, …), by tag name. */
  readonly skipped: readonly string[];
  /** Plain-language notes about guesses made (automatic grouping, assumed units). */
  readonly notes: readonly string[];
}

/** Millimetres per unit (CSS Values and Units Level 3 §5.2: 1in = 2.54cm = 96px = 72pt = 6pc; 1Q = ¼ mm). */
export const MM_PER_UNIT: Readonly<Record<string, number>> = {
  mm: 1,
  cm: 10,
  q: 0.25,
  in: 25.4,
  pt: 25.4 / 72,
  pc: 25.4 / 6,
  px: 25.4 / 96,
  '': 25.4 / 96,
};

const MAX_POINTS = 1_000_000;

/** A length with an optional unit, in mm. Percentages and unknown units give undefined. */
export function lengthToMm(value: string | undefined): number | undefined {
  if (value === undefined) return undefined;
  const m = /^\s*([-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?)\s*([a-zA-Z%]*)\s*$/.exec(value);
  if (!m) return undefined;
  const unit = m[2]!.toLowerCase();
  const k = MM_PER_UNIT[unit];
  return k === undefined ? undefined : Number(m[1]) * k;
}

function numbers(s: string): number[] {
  return (s.match(/[-+]?(?:\d+\.?\d*|\.\d+)(?:[eE][-+]?\d+)?/g) ?? []).map(Number);
}

/** Parse an SVG `transform` attribute into one affine map. Throws SvgImportError on bad syntax. */
export function parseTransform(s: string | undefined): Affine {
  if (!s || s.trim() === '') return AFFINE_IDENTITY;
  let m = AFFINE_IDENTITY;
  const re = /\s*(matrix|translate|scale|rotate|skewX|skewY)\s*\(([^)]*)\)\s*,?/gy;
  let last = 0;
  let r: RegExpExecArray | null;
  while ((r = re.exec(s)) !== null) {
    last = re.lastIndex;
    const a = numbers(r[2]!);
    let t: Affine;
    switch (r[1]) {
      case 'matrix':
        if (a.length !== 6) throw new SvgImportError(`transform matrix() needs 6 numbers: "${s}"`);
        t = { a: a[0]!, b: a[1]!, c: a[2]!, d: a[3]!, e: a[4]!, f: a[5]! };
        break;
      case 'translate':
        t = affineTranslate(a[0] ?? 0, a[1] ?? 0);
        break;
      case 'scale':
        t = affineScale(a[0] ?? 1, a[1] ?? a[0] ?? 1);
        break;
      case 'rotate':
        t = affineRotate((((a[0] ?? 0) * Math.PI) / 180), { x: a[1] ?? 0, y: a[2] ?? 0 });
        break;
      case 'skewX':
        t = { a: 1, b: 0, c: Math.tan(((a[0] ?? 0) * Math.PI) / 180), d: 1, e: 0, f: 0 };
        break;
      default:
        t = { a: 1, b: Math.tan(((a[0] ?? 0) * Math.PI) / 180), c: 0, d: 1, e: 0, f: 0 };
    }
    m = affineMultiply(m, t);
  }
  if (s.slice(last).trim() !== '') throw new SvgImportError(`unreadable transform "${s}"`);
  return m;
}

/** Path data for a basic shape, or undefined when the element is not a shape. */
function shapeToD(el: XmlElement): string | undefined {
  const at = (k: string): number => {
    const v = Number.parseFloat(el.attributes[k] ?? '0');
    return Number.isFinite(v) ? v : 0;
  };
  switch (el.name) {
    case 'path':
      return el.attributes.d ?? '';
    case 'rect': {
      const [x, y, w, h] = [at('x'), at('y'), at('width'), at('height')];
      if (w <= 0 || h <= 0) return '';
      let rx = el.attributes.rx !== undefined ? at('rx') : at('ry');
      let ry = el.attributes.ry !== undefined ? at('ry') : rx;
      rx = Math.min(Math.max(0, rx), w / 2);
      ry = Math.min(Math.max(0, ry), h / 2);
      if (rx === 0 || ry === 0) return `M${x} ${y} H${x + w} V${y + h} H${x} Z`;
      return `M${x + rx} ${y} H${x + w - rx} A${rx} ${ry} 0 0 1 ${x + w} ${y + ry} V${y + h - ry} A${rx} ${ry} 0 0 1 ${x + w - rx} ${y + h} H${x + rx} A${rx} ${ry} 0 0 1 ${x} ${y + h - ry} V${y + ry} A${rx} ${ry} 0 0 1 ${x + rx} ${y} Z`;
    }
    case 'circle':
    case 'ellipse': {
      const [cx, cy] = [at('cx'), at('cy')];
      const rx = el.name === 'circle' ? at('r') : at('rx');
      const ry = el.name === 'circle' ? at('r') : at('ry');
      if (rx <= 0 || ry <= 0) return '';
      return `M${cx - rx} ${cy} A${rx} ${ry} 0 0 1 ${cx + rx} ${cy} A${rx} ${ry} 0 0 1 ${cx - rx} ${cy} Z`;
    }
    case 'line':
      return `M${at('x1')} ${at('y1')} L${at('x2')} ${at('y2')}`;
    case 'polyline':
    case 'polygon': {
      const p = numbers(el.attributes.points ?? '');
      if (p.length < 4) return '';
      let d = `M${p[0]} ${p[1]}`;
      for (let i = 2; i + 1 < p.length; i += 2) d += ` L${p[i]} ${p[i + 1]}`;
      return el.name === 'polygon' ? d + ' Z' : d;
    }
    default:
      return undefined;
  }
}

interface Found {
  readonly path: Path;
  readonly piece?: string;
  readonly size?: string;
  readonly role?: string;
  readonly name?: string;
  readonly where: string;
}

const SKIP = new Set(['script', 'style', 'image', 'use', 'foreignObject', 'defs', 'symbol', 'pattern', 'mask', 'clipPath', 'marker', 'title', 'desc', 'metadata', 'a', 'switch']);

function rootScale(svg: XmlElement, notes: string[]): Affine {
  const w = lengthToMm(svg.attributes.width);
  const h = lengthToMm(svg.attributes.height);
  const vb = svg.attributes.viewBox ? numbers(svg.attributes.viewBox) : undefined;
  if (vb && vb.length === 4 && vb[2]! > 0 && vb[3]! > 0) {
    if (w === undefined && h === undefined) {
      notes.push('the file gives no width or height: one viewBox unit is taken as 1 px = 1/96 in');
      return affineMultiply(affineScale(MM_PER_UNIT.px!), affineTranslate(-vb[0]!, -vb[1]!));
    }
    const sx = w !== undefined ? w / vb[2]! : h! / vb[3]!;
    const sy = h !== undefined ? h / vb[3]! : sx;
    const s = Math.min(sx, sy); // preserveAspectRatio xMidYMid meet
    const tx = w !== undefined ? (w - vb[2]! * s) / 2 : 0;
    const ty = h !== undefined ? (h - vb[3]! * s) / 2 : 0;
    if (Math.abs(sx - sy) > 1e-9 * Math.max(sx, sy)) notes.push('width/height and viewBox have different proportions: the drawing was scaled uniformly and centred, as a browser does');
    return affineMultiply(affineTranslate(tx, ty), affineMultiply(affineScale(s), affineTranslate(-vb[0]!, -vb[1]!)));
  }
  if (w === undefined && h === undefined) notes.push('the file gives no width, height or viewBox: user units are taken as px (1/96 in)');
  return affineScale(MM_PER_UNIT.px!);
}

function collect(el: XmlElement, m: Affine, inherited: { piece?: string; size?: string; role?: string; name?: string }, out: Found[], skipped: string[], depth: number, path: string): void {
  const local = el.name.includes(':') ? el.name.slice(el.name.indexOf(':') + 1) : el.name;
  if (SKIP.has(local)) {
    skipped.push(local);
    return;
  }
  const a = el.attributes;
  const here = affineMultiply(m, parseTransform(a.transform));
  const label = a['inkscape:label'] ?? a.id;
  const ctx = {
    piece: a['data-piece'] ?? (local === 'g' && label && depth === 1 && !inherited.piece ? label : inherited.piece),
    size: a['data-size'] ?? inherited.size,
    role: a['data-role'] ?? inherited.role,
    name: a['data-name'] ?? inherited.name,
  };
  const d = shapeToD({ ...el, name: local });
  const where = `${path}/${local}${a.id ? `#${a.id}` : ''}`;
  if (d !== undefined) {
    if (d.trim() === '') return;
    let p: Path;
    try {
      p = pathFromSvg(d);
    } catch (error) {
      throw new SvgImportError(`${where}: ${(error as Error).message}`);
    }
    out.push({ path: pathTransform(p, here), ...ctx, where });
    return;
  }
  if (local !== 'g' && local !== 'svg') {
    skipped.push(local);
    return;
  }
  for (const c of el.children) collect(c, here, ctx, out, skipped, depth + 1, where);
}

function polygonOf(c: Contour): { x: number; y: number }[] {
  return contourFlatten(c, 0.1).map((f) => f.point);
}

/**
 * Does `inner` nest inside `outer`? Graded size lines often share a stretch of outline (a centre
 * front that does not grade) and cross where a length grades (a deeper crotch), so "inside" means
 * at least 70 % of its points are inside the outer line or on it (within NEST_TOUCH).
 */
const NEST_TOUCH = 1;
function nestsInside(inner: readonly { x: number; y: number }[], outer: readonly { x: number; y: number }[]): boolean {
  let hits = 0;
  for (const p of inner) if (pointInPolygon(p, outer) || polygonDistance(p, outer) <= NEST_TOUCH) hits++;
  return hits >= 0.7 * inner.length;
}

/** Import an SVG document (text). Throws SvgImportError (or XmlError) with a clear message. */
export function importSvg(text: string): SvgImportResult {
  const root = xmlParse(text);
  const rootName = root.name.includes(':') ? root.name.slice(root.name.indexOf(':') + 1) : root.name;
  if (rootName !== 'svg') throw new SvgImportError(`the file is not an SVG (its root element is <${root.name}>)`);
  const notes: string[] = [];
  const skipped: string[] = [];
  const found: Found[] = [];
  const base = rootScale(root, notes);
  for (const c of root.children) collect(c, affineMultiply(base, parseTransform(root.attributes.transform)), {}, found, skipped, 1, 'svg');
  const points = found.reduce((n, f) => n + f.path.reduce((k, c) => k + c.segments.length, 0), 0);
  if (points > MAX_POINTS) throw new SvgImportError(`the drawing has more than ${MAX_POINTS} segments`);

  const outlines: { piece?: string; size?: string; contour: Contour; where: string }[] = [];
  const lines: { piece?: string; line: PatternLine; where: string }[] = [];
  for (const f of found) {
    const role = f.role ?? 'outline';
    if (role === 'outline') {
      for (const c of f.path) {
        if (!c.closed) {
          const a = c.segments[0]!.from;
          const b = c.segments[c.segments.length - 1]!.to;
          throw new SvgImportError(`${f.where}: the outline is not closed — it starts at (${a.x.toFixed(1)}, ${a.y.toFixed(1)}) mm and ends ${vecDistance(a, b).toFixed(1)} mm away at (${b.x.toFixed(1)}, ${b.y.toFixed(1)}) mm (more than ${CLOSE_GAP} mm)`);
        }
        const x = contourSelfCrossings(c);
        if (x.length > 0) throw new SvgImportError(`${f.where}: the outline crosses itself at (${x[0]!.point.x.toFixed(1)}, ${x[0]!.point.y.toFixed(1)}) mm`);
        outlines.push({ piece: f.piece, size: f.size, contour: c, where: f.where });
      }
    } else if ((LINE_ROLES as readonly string[]).includes(role)) {
      lines.push({ piece: f.piece, line: { role: role as PatternLine['role'], name: f.name ?? role, d: pathToSvg(f.path, 4), ...(f.size ? { size: f.size } : {}) }, where: f.where });
    } else throw new SvgImportError(`${f.where}: unknown data-role "${role}" (use outline, ${LINE_ROLES.join(', ')})`);
  }
  if (outlines.length === 0) throw new SvgImportError('the file has no closed outlines to import');

  // group outlines into pieces: by name, else by nesting
  const groups = new Map<string, typeof outlines>();
  const unnamed = outlines.filter((o) => !o.piece);
  for (const o of outlines) if (o.piece) groups.set(o.piece, [...(groups.get(o.piece) ?? []), o]);
  if (unnamed.length > 0) {
    notes.push('some outlines had no piece name: outlines nested inside one another were grouped as one piece (sizes the file does not name are numbered from the smallest)');
    const sorted = [...unnamed].sort((a, b) => contourArea(b.contour) - contourArea(a.contour));
    const roots: { polygon: { x: number; y: number }[]; list: typeof outlines }[] = [];
    for (const o of sorted) {
      const polygon = polygonOf(o.contour);
      const home = roots.find((r) => nestsInside(polygon, r.polygon));
      if (home) home.list.push(o);
      else roots.push({ polygon, list: [o] });
    }
    let k = 1;
    for (const r of roots) {
      while (groups.has(`piece ${k}`)) k++;
      groups.set(`piece ${k}`, r.list);
    }
  }
  // A line without a piece name belongs to the piece whose largest outline holds its middle.
  const largest = [...groups].map(([name, list]) => ({ name, polygon: polygonOf(list.reduce((a, b) => (contourArea(b.contour) > contourArea(a.contour) ? b : a)).contour) }));
  const homeOf = (line: PatternLine): string | undefined => {
    if (groups.size === 1) return largest[0]!.name;
    const pts = pathFromSvg(line.d).flatMap((c) => contourFlatten(c, 0.5).map((f) => f.point));
    const a = pts[Math.floor((pts.length - 1) / 2)];
    const b = pts[Math.ceil((pts.length - 1) / 2)];
    const mid = a && b ? { x: (a.x + b.x) / 2, y: (a.y + b.y) / 2 } : undefined;
    const home = mid && largest.find((g) => pointInPolygon(mid, g.polygon));
    if (!home) notes.push(`line "${line.name}" lies outside every piece and was not imported`);
    return home?.name;
  };
  const homes = new Map(lines.map((l) => [l, l.piece ?? homeOf(l.line)]));
  const pieces: Piece[] = [];
  for (const [name, list] of groups) {
    const bySize = [...list].sort((a, b) => contourArea(a.contour) - contourArea(b.contour));
    const outs: Outline[] = bySize.map((o, i) => ({ size: o.size ?? String(i + 1), d: pathToSvg([o.contour], 4), points: [] }));
    const own = lines.filter((l) => homes.get(l) === name).map((l) => l.line);
    pieces.push({ name, outlines: outs, lines: own, edges: [], cut: { count: 2, onFold: false }, seamAllowanceIncluded: false });
  }
  for (const l of lines) if (l.piece && !groups.has(l.piece)) throw new SvgImportError(`${l.where}: line "${l.line.name}" belongs to piece "${l.piece}", which has no outline`);
  let pattern: Pattern;
  try {
    pattern = parsePattern({ version: PATTERN_VERSION, units: 'mm', pieces });
  } catch (error) {
    throw new SvgImportError(`the imported pattern is not valid: ${(error as Error).message}`);
  }
  return { pattern, skipped: [...new Set(skipped)], notes };
}
