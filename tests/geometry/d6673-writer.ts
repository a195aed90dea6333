/**
 * A minimal writer of ASTM D6673 DXF for tests: R12-style ASCII DXF, one BLOCK per piece and
 * size, boundary as a closed POLYLINE on layer 1, turn points on layer 2, notches as short LINEs
 * on layer 4, grain line on layer 7, piece system text in the block and style system text in
 * ENTITIES (trade reference §1.2–1.5; the layer table from a secondary summary of D6673-10).
 * Coordinates are written in DXF's y-up convention.
 */
export interface DxfPieceSpec {
  piece: string;
  size: string;
  quantity?: number;
  boundary: { x: number; y: number }[];
  /** Write the boundary as separate LINE entities instead of one POLYLINE. */
  asLines?: boolean;
  /** Leave the POLYLINE open (flag 70 = 0). */
  open?: boolean;
  turnPoints?: { x: number; y: number }[];
  notches?: { at: { x: number; y: number }; inward: { x: number; y: number } }[];
  grain?: [{ x: number; y: number }, { x: number; y: number }];
}

const pair = (code: number, value: string | number) => `${code}\n${value}\n`;
const num = (n: number) => n.toFixed(6);

function text(layer: string, x: number, y: number, value: string): string {
  return pair(0, 'TEXT') + pair(8, layer) + pair(10, num(x)) + pair(20, num(y)) + pair(30, num(0)) + pair(40, num(3)) + pair(1, value);
}

function line(layer: string, a: { x: number; y: number }, b: { x: number; y: number }): string {
  return (
    pair(0, 'LINE') + pair(8, layer) +
    pair(10, num(a.x)) + pair(20, num(a.y)) + pair(30, num(0)) +
    pair(11, num(b.x)) + pair(21, num(b.y)) + pair(31, num(0))
  );
}

function block(spec: DxfPieceSpec): { name: string; body: string } {
  const name = `${spec.piece}-${spec.size}`.replace(/\s+/g, '_');
  let out = pair(0, 'BLOCK') + pair(8, '1') + pair(2, name) + pair(70, 0) + pair(10, num(0)) + pair(20, num(0)) + pair(30, num(0)) + pair(3, name);
  const b = spec.boundary;
  if (spec.asLines) {
    b.forEach((p, i) => (out += line('1', p, b[(i + 1) % b.length]!)));
  } else {
    out += pair(0, 'POLYLINE') + pair(8, '1') + pair(66, 1) + pair(70, spec.open ? 0 : 1) + pair(10, num(0)) + pair(20, num(0)) + pair(30, num(0));
    for (const p of b) out += pair(0, 'VERTEX') + pair(8, '1') + pair(10, num(p.x)) + pair(20, num(p.y)) + pair(30, num(0));
    out += pair(0, 'SEQEND') + pair(8, '1');
  }
  for (const p of spec.turnPoints ?? []) out += pair(0, 'POINT') + pair(8, '2') + pair(10, num(p.x)) + pair(20, num(p.y)) + pair(30, num(0));
  for (const n of spec.notches ?? []) out += line('4', n.at, { x: n.at.x + n.inward.x, y: n.at.y + n.inward.y });
  if (spec.grain) out += line('7', spec.grain[0], spec.grain[1]);
  out += text('1', 0, 0, `Piece Name: ${spec.piece}`);
  out += text('1', 0, -5, `Size: ${spec.size}`);
  if (spec.quantity !== undefined) out += text('1', 0, -10, `Quantity: ${spec.quantity}`);
  out += pair(0, 'ENDBLK') + pair(8, '1');
  return { name, body: out };
}

/** The whole file. `units` goes into the style system text. */
export function writeD6673(pieces: DxfPieceSpec[], units: 'METRIC' | 'ENGLISH' | null = 'METRIC', style = 'Test Style'): string {
  const blocks = pieces.map(block);
  let out = pair(0, 'SECTION') + pair(2, 'HEADER') + pair(9, '$ACADVER') + pair(1, 'AC1009') + pair(0, 'ENDSEC');
  out += pair(0, 'SECTION') + pair(2, 'BLOCKS');
  for (const b of blocks) out += b.body;
  out += pair(0, 'ENDSEC');
  out += pair(0, 'SECTION') + pair(2, 'ENTITIES');
  out += text('1', 0, 0, `Style Name: ${style}`);
  if (units) out += text('1', 0, -5, `Units: ${units}`);
  for (const b of blocks) out += pair(0, 'INSERT') + pair(8, '1') + pair(2, b.name) + pair(10, num(0)) + pair(20, num(0)) + pair(30, num(0));
  out += pair(0, 'ENDSEC') + pair(0, 'EOF');
  return out;
}
