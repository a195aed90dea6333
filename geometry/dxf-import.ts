/**
 * Import of ASTM D6673 pattern files (the "ASTM/AAMA DXF" exchange format), read with the
 * general-purpose `dxf-parser` package.
 *
 * What is read (layers per ASTM D6673-10 as summarised in the trade reference, §1.3):
 * - each BLOCK is one piece in one size; `Piece Name:`, `Size:` and `Quantity:` TEXT in the
 *   block name it (piece system text, §1.5);
 * - layer 1: the boundary (closed POLYLINE/LWPOLYLINE, or LINEs chained end to end);
 * - layer 2: turn points (corners) and layer 3: curve points, on the boundary;
 * - layer 4: notches, a short LINE from the boundary inward;
 * - layer 6: mirror (fold) line; layer 7: grain line; layer 8: internal lines;
 * - layer 13: drill holes (kept as marks when they lie on the boundary, else reported);
 * - `Units: ENGLISH` (inches) or `Units: METRIC` (millimetres) in the style system text.
 * DXF's y axis points up, ours down: y is flipped on import.
 *
 * Sizes exported "exploded" (one block per size, a graded nest) become one piece with one
 * outline per size. Turn points and notches are named by their order along the boundary
 * (`turn 1`, `notch 1`, …), so that the sizes of a graded nest correspond point for point.
 * A RUL grade-rule file is not read: a base-size-only file imports as one size.
 */
import DxfParser from 'dxf-parser';
import { type Landmark, type Outline, type PatternLine, type Piece, type Pattern, PATTERN_VERSION, parsePattern } from './model.ts';
import { type Contour, contourArea, contourFromPoints, contourNearest, contourSelfCrossings, pathToSvg, contourLength } from './path.ts';
import { CLOSE_GAP } from './tolerance.ts';
import { type Point, vecDistance } from './vec.ts';

export class DxfImportError extends Error {
  override readonly name = 'DxfImportError';
}

export interface DxfImportResult {
  readonly pattern: Pattern;
  readonly notes: readonly string[];
}

/** Limits that keep a hostile or broken file from taking the server down. */
export const DXF_MAX_BYTES = 20 * 1024 * 1024;
export const DXF_MAX_ENTITIES = 200_000;

/** Layer numbers of ASTM D6673 (trade reference §1.3, from a secondary summary of D6673-10). */
export const D6673_LAYERS = {
  boundary: '1',
  turnPoints: '2',
  curvePoints: '3',
  notches: '4',
  gradeReference: '5',
  mirror: '6',
  grain: '7',
  internal: '8',
  drillHoles: '13',
  annotation: '15',
} as const;

/** How far (mm) a turn point or notch may sit from the boundary and still belong to it. */
const ON_BOUNDARY = 0.5;

// The structural shape of dxf-parser's output that we read.
interface DxfVertex {
  x: number;
  y: number;
  bulge?: number;
}
interface DxfEntity {
  type: string;
  layer?: string;
  vertices?: DxfVertex[];
  shape?: boolean;
  position?: DxfVertex;
  startPoint?: DxfVertex;
  text?: string;
  name?: string;
}
interface DxfBlock {
  name?: string;
  entities?: DxfEntity[];
}
interface DxfDocument {
  blocks?: Record<string, DxfBlock>;
  entities?: DxfEntity[];
}

const finite = (p: DxfVertex | undefined): p is DxfVertex => !!p && Number.isFinite(p.x) && Number.isFinite(p.y);

/** `Key: value` system text → lower-cased key and value. */
function systemText(entities: readonly DxfEntity[]): Map<string, string> {
  const out = new Map<string, string>();
  for (const e of entities) {
    if ((e.type !== 'TEXT' && e.type !== 'MTEXT') || typeof e.text !== 'string') continue;
    const m = /^\s*([A-Za-z][A-Za-z ]*?)\s*:\s*(.*?)\s*$/.exec(e.text);
    if (m) out.set(m[1]!.toLowerCase(), m[2]!);
  }
  return out;
}

/** Chain LINE entities end to end into one closed ring (last point = first), or undefined. */
function chainLines(lines: readonly DxfEntity[], scale: (p: DxfVertex) => Point): Point[] | undefined {
  const segs = lines.map((l) => l.vertices ?? []).filter((v) => v.length >= 2 && finite(v[0]) && finite(v[1])).map((v) => [scale(v[0]!), scale(v[1]!)] as const);
  if (segs.length < 3) return undefined;
  const used = new Array<boolean>(segs.length).fill(false);
  const ring: Point[] = [segs[0]![0], segs[0]![1]];
  used[0] = true;
  for (let n = 1; n < segs.length; n++) {
    const end = ring[ring.length - 1]!;
    let found = false;
    for (let i = 0; i < segs.length && !found; i++) {
      if (used[i]) continue;
      const [a, b] = segs[i]!;
      if (vecDistance(a, end) <= CLOSE_GAP) {
        ring.push(b);
        used[i] = found = true;
      } else if (vecDistance(b, end) <= CLOSE_GAP) {
        ring.push(a);
        used[i] = found = true;
      }
    }
    if (!found) return undefined;
  }
  return vecDistance(ring[0]!, ring[ring.length - 1]!) <= CLOSE_GAP ? ring : undefined;
}

interface BlockPiece {
  piece: string;
  size: string | undefined;
  quantity: number | undefined;
  contour: Contour;
  points: Landmark[];
  lines: PatternLine[];
  onFold: boolean;
  block: string;
}

function readBlock(name: string, block: DxfBlock, toMm: (p: DxfVertex) => Point, notes: string[]): BlockPiece | undefined {
  const entities = block.entities ?? [];
  const onLayer = (layer: string) => entities.filter((e) => String(e.layer ?? '') === layer);
  const boundaryEntities = onLayer(D6673_LAYERS.boundary);
  const polys = boundaryEntities.filter((e) => e.type === 'POLYLINE' || e.type === 'LWPOLYLINE');
  const text = systemText(entities);
  if (polys.length === 0 && boundaryEntities.every((e) => e.type !== 'LINE')) return undefined;

  let ring: Point[] | undefined;
  let closed: boolean;
  if (polys.length > 0) {
    const poly = polys.reduce((a, b) => ((b.vertices?.length ?? 0) > (a.vertices?.length ?? 0) ? b : a));
    const vertices = (poly.vertices ?? []).filter(finite);
    if (vertices.some((v) => v.bulge !== undefined && Math.abs(v.bulge) > 1e-9))
      notes.push(`block "${name}": arc segments (bulges) in the boundary were read as straight lines between vertices`);
    ring = vertices.map(toMm);
    closed = poly.shape === true;
  } else {
    ring = chainLines(boundaryEntities.filter((e) => e.type === 'LINE'), toMm);
    if (!ring) throw new DxfImportError(`block "${name}": the boundary lines on layer 1 do not join into one closed outline`);
    closed = true;
  }
  if (ring.length < 3) throw new DxfImportError(`block "${name}": the boundary has fewer than 3 points`);
  const first = ring[0]!;
  const last = ring[ring.length - 1]!;
  if (vecDistance(first, last) <= CLOSE_GAP) ring = ring.slice(0, -1);
  else if (!closed)
    throw new DxfImportError(`block "${name}": the boundary is not closed — it starts at (${first.x.toFixed(1)}, ${first.y.toFixed(1)}) mm and ends ${vecDistance(first, last).toFixed(1)} mm away`);
  const contour = contourFromPoints(ring, true);
  const crossings = contourSelfCrossings(contour);
  if (crossings.length > 0)
    throw new DxfImportError(`block "${name}": the boundary crosses itself at (${crossings[0]!.point.x.toFixed(1)}, ${crossings[0]!.point.y.toFixed(1)}) mm`);

  // Landmarks, named by their order along the boundary so that sizes correspond.
  const along = (p: Point) => {
    const near = contourNearest(contour, p);
    return { near, key: near.segmentIndex + near.t };
  };
  const points: Landmark[] = [];
  const place = (kind: Landmark['kind'], prefix: string, raw: Point[]) => {
    const located = raw
      .map((p) => ({ p, ...along(p) }))
      .filter((x) => {
        if (x.near.distance <= ON_BOUNDARY) return true;
        notes.push(`block "${name}": a ${prefix} point ${x.near.distance.toFixed(1)} mm off the boundary was left out`);
        return false;
      })
      .sort((a, b) => a.key - b.key);
    located.forEach((x, i) => points.push({ name: `${prefix} ${i + 1}`, kind, x: x.near.point.x, y: x.near.point.y }));
  };
  const pointsOn = (layer: string) => onLayer(layer).filter((e) => e.type === 'POINT' && finite(e.position)).map((e) => toMm(e.position!));
  place('corner', 'turn', pointsOn(D6673_LAYERS.turnPoints));
  // A notch is a short line from the boundary inward: its boundary end marks the spot.
  const notchEnds = onLayer(D6673_LAYERS.notches)
    .filter((e) => e.type === 'LINE' && (e.vertices?.length ?? 0) >= 2 && finite(e.vertices![0]) && finite(e.vertices![1]))
    .map((e) => {
      const a = toMm(e.vertices![0]!);
      const b = toMm(e.vertices![1]!);
      return contourNearest(contour, a).distance <= contourNearest(contour, b).distance ? a : b;
    });
  place('notch', 'notch', notchEnds);
  const drill = pointsOn(D6673_LAYERS.drillHoles);
  if (drill.length > 0) notes.push(`block "${name}": ${drill.length} drill hole(s) are not kept yet`);

  const lines: PatternLine[] = [];
  const lineOf = (e: DxfEntity): Point[] | undefined => {
    const v = (e.vertices ?? []).filter(finite);
    return (e.type === 'LINE' || e.type === 'POLYLINE' || e.type === 'LWPOLYLINE') && v.length >= 2 ? v.map(toMm) : undefined;
  };
  const addLines = (layer: string, role: PatternLine['role'], baseName: string) => {
    const found = onLayer(layer).map(lineOf).filter((p): p is Point[] => p !== undefined);
    found.forEach((p, i) => lines.push({ role, name: found.length === 1 ? baseName : `${baseName} ${i + 1}`, d: pathToSvg([contourFromPoints(p, false)], 4) }));
    return found.length;
  };
  addLines(D6673_LAYERS.grain, 'grain', 'grain');
  const folds = addLines(D6673_LAYERS.mirror, 'fold', 'fold');
  addLines(D6673_LAYERS.internal, 'internal', 'internal line');

  const quantity = Number.parseInt(text.get('quantity') ?? '', 10);
  return {
    piece: text.get('piece name') || name,
    size: text.get('size') || undefined,
    quantity: Number.isFinite(quantity) && quantity > 0 ? quantity : undefined,
    contour,
    points,
    lines,
    onFold: folds > 0,
    block: name,
  };
}

/**
 * Check the group structure before the parser sees it, up to the EOF group. The parser
 * (dxf-parser 1.1) loops for ever on some broken files — a POLYLINE whose vertices are followed
 * by anything but another VERTEX or SEQEND, which a group code that is not a number also leads
 * to — and makes as many vertices as an LWPOLYLINE's count says, listed or not. Such files are
 * refused here with the line where the problem is, as are files with too many entities.
 */
function checkDxfGroups(text: string): void {
  const lines = text.split(/\r\n|\r|\n/);
  let entities = 0;
  let inPolyline = false;
  let lw: { line: number; count: number | undefined; listed: number } | undefined;
  for (let i = 0; i + 1 < lines.length; i += 2) {
    const codeText = lines[i]!.trim();
    if (!/^-?\d{1,4}$/.test(codeText)) throw new DxfImportError(`line ${i + 1}: "${codeText.slice(0, 20)}" is not a group code (a number): the file is damaged`);
    const code = Number(codeText);
    const value = lines[i + 1]!.trim();
    if (lw) {
      if (code === 90) lw.count = Number.parseInt(value, 10);
      else if (code === 10) lw.listed++;
    }
    if (code !== 0) continue;
    if (lw && lw.count !== undefined && lw.count > lw.listed)
      throw new DxfImportError(`line ${lw.line}: the LWPOLYLINE says it has ${lw.count} vertices but lists ${lw.listed}: the file is damaged`);
    lw = undefined;
    if (value === 'EOF') return;
    if (++entities > DXF_MAX_ENTITIES) throw new DxfImportError(`the file has more than ${DXF_MAX_ENTITIES} entities`);
    if (inPolyline) {
      if (value === 'SEQEND') inPolyline = false;
      else if (value !== 'VERTEX') throw new DxfImportError(`line ${i + 2}: a POLYLINE's vertices are followed by ${value.slice(0, 20) || 'nothing'} instead of SEQEND: the file is damaged`);
    } else if (value === 'POLYLINE') inPolyline = true;
    else if (value === 'LWPOLYLINE') lw = { line: i + 2, count: undefined, listed: 0 };
  }
}

/** Read an ASTM D6673 DXF file. Throws DxfImportError with where the problem is; imports nothing half-way. */
export function importDxf(text: string): DxfImportResult {
  if (text.length > DXF_MAX_BYTES) throw new DxfImportError(`the file is larger than ${DXF_MAX_BYTES / 1024 / 1024} MB`);
  checkDxfGroups(text);
  let doc: DxfDocument | null;
  try {
    doc = new DxfParser().parseSync(text) as DxfDocument | null;
  } catch (error) {
    throw new DxfImportError(`the file is not a readable DXF: ${(error as Error).message}`);
  }
  if (!doc) throw new DxfImportError('the file is not a readable DXF');
  const blocks = Object.entries(doc.blocks ?? {}).filter(([name]) => !name.startsWith('*'));
  const count = blocks.reduce((n, [, b]) => n + (b.entities?.length ?? 0), 0) + (doc.entities?.length ?? 0);
  if (count > DXF_MAX_ENTITIES) throw new DxfImportError(`the file has more than ${DXF_MAX_ENTITIES} entities`);

  const notes: string[] = [];
  const style = systemText(doc.entities ?? []);
  for (const [, b] of blocks) for (const [k, v] of systemText(b.entities ?? [])) if (!style.has(k)) style.set(k, v);
  const units = (style.get('units') ?? '').toUpperCase();
  let scale = 1;
  if (units === 'ENGLISH') scale = 25.4;
  else if (units !== 'METRIC') notes.push('the file names no units (Units: METRIC or ENGLISH): read as millimetres — check the size of a piece');
  const toMm = (p: DxfVertex): Point => ({ x: p.x * scale, y: -p.y * scale });

  const read = blocks.map(([name, b]) => readBlock(name, b, toMm, notes)).filter((b): b is BlockPiece => b !== undefined);
  if (read.length === 0) throw new DxfImportError('the file has no pattern pieces: no block with a boundary on layer 1');

  const byPiece = new Map<string, BlockPiece[]>();
  for (const b of read) byPiece.set(b.piece, [...(byPiece.get(b.piece) ?? []), b]);
  const pieces: Piece[] = [];
  for (const [name, list] of byPiece) {
    const sorted = [...list].sort((a, b) => contourArea(a.contour) - contourArea(b.contour));
    const outlines: Outline[] = sorted.map((b, i) => ({ size: b.size ?? (sorted.length === 1 ? 'base' : String(i + 1)), d: pathToSvg([b.contour], 4), points: b.points }));
    const sizes = new Set(outlines.map((o) => o.size));
    if (sizes.size !== outlines.length) throw new DxfImportError(`piece "${name}" has two blocks with the same size`);
    // Landmarks correspond across sizes only when every size has the same ones.
    const signature = (o: Outline) => o.points.map((p) => p.name).join('|');
    if (outlines.some((o) => signature(o) !== signature(outlines[0]!))) {
      notes.push(`piece "${name}": the sizes have different turn points or notches, so they were dropped; mark the corners in the review`);
      for (const o of outlines) o.points = [];
    }
    const lines = sorted.flatMap((b, i) => b.lines.map((l) => (sorted.length > 1 ? { ...l, size: outlines[i]!.size } : l)));
    const quantity = sorted.find((b) => b.quantity !== undefined)?.quantity;
    pieces.push({
      name,
      outlines,
      lines,
      edges: [],
      cut: { count: quantity ?? 2, onFold: sorted.some((b) => b.onFold) },
      seamAllowanceIncluded: false,
    });
  }
  const longest = Math.max(...read.map((b) => contourLength(b.contour)));
  if (longest < 300) notes.push(`the largest piece measures only ${longest.toFixed(0)} mm around: check the units (a trouser leg is about 1 m long)`);
  let pattern: Pattern;
  try {
    pattern = parsePattern({ version: PATTERN_VERSION, units: 'mm', ...(style.get('style name') ? { name: style.get('style name') } : {}), pieces });
  } catch (error) {
    throw new DxfImportError(`the imported pattern is not valid: ${(error as Error).message}`);
  }
  return { pattern, notes };
}
