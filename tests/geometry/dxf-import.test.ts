import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  D6673_LAYERS,
  DxfImportError,
  contourFlatten,
  contourLength,
  demoPattern,
  importDxf,
  outlineContour,
  pathFromSvg,
} from '../../geometry/index.ts';
import { damagedCopies } from '../support/damage.ts';
import { writeD6673, type DxfPieceSpec } from './d6673-writer.ts';

/** A simple leg-like piece in inches, y up (DXF), with its corners as turn points. */
function legInches(grow: number): DxfPieceSpec['boundary'] {
  return [
    { x: 0, y: 0 },
    { x: 8 + grow, y: 0 },
    { x: 9 + grow, y: 40 },
    { x: -1 - grow, y: 40 },
  ];
}

/** The front in sizes 8 and 10 (grown ½ in), with turn points, a notch on the waist and a grain line. */
function gradedFront(): DxfPieceSpec[] {
  return [0, 0.5].map((grow, i) => ({
    piece: 'front',
    size: i === 0 ? '8' : '10',
    quantity: 2,
    boundary: legInches(grow),
    turnPoints: legInches(grow),
    notches: [{ at: { x: (8 + grow) / 2, y: 0 }, inward: { x: 0, y: 0.25 } }],
    grain: [{ x: 4, y: 5 }, { x: 4, y: 35 }],
  }));
}

describe('ASTM D6673 DXF import', () => {
  it('uses the layer numbers of D6673 (trade reference §1.3, secondary summary of D6673-10)', () => {
    expect(D6673_LAYERS).toMatchObject({ boundary: '1', turnPoints: '2', curvePoints: '3', notches: '4', mirror: '6', grain: '7', internal: '8', drillHoles: '13' });
  });

  it('reads a graded nest in inches: 25.4 mm per inch exactly, y flipped, one piece with a size per block', () => {
    const { pattern, notes } = importDxf(writeD6673(gradedFront(), 'ENGLISH'));
    expect(notes).toEqual([]);
    expect(pattern.pieces).toHaveLength(1);
    const piece = pattern.pieces[0]!;
    expect(piece.name).toBe('front');
    expect(piece.cut).toEqual({ count: 2, onFold: false });
    expect(piece.outlines.map((o) => o.size)).toEqual(['8', '10']);
    // The 8 in × 40 in trapezoid of size 8: perimeter 8 + 10 + 2·√(1 + 1600) in.
    const perimeterIn = 8 + 10 + 2 * Math.sqrt(1 + 40 * 40);
    expect(contourLength(outlineContour(piece.outlines[0]!))).toBeCloseTo(perimeterIn * 25.4, 6);
    // y up in DXF becomes y down: the 40 in top edge lies at y = −1016 mm.
    const ys = contourFlatten(outlineContour(piece.outlines[0]!)).map((p) => p.point.y);
    expect(Math.min(...ys)).toBeCloseTo(-40 * 25.4, 6);
    expect(Math.max(...ys)).toBeCloseTo(0, 6);
    // Turn points and the notch are named by order along the boundary, the same in both sizes.
    const names = piece.outlines.map((o) => o.points.map((p) => `${p.kind}:${p.name}`).sort());
    expect(names[0]).toEqual(names[1]);
    expect(names[0]).toContain('notch:notch 1');
    expect(names[0]!.filter((n) => n.startsWith('corner:'))).toHaveLength(4);
    const grain = piece.lines.filter((l) => l.role === 'grain');
    expect(grain.map((l) => l.size).sort()).toEqual(['10', '8']);
  });

  it('chains a boundary drawn as separate LINEs', () => {
    const { pattern } = importDxf(writeD6673([{ piece: 'yoke', size: '8', boundary: legInches(0), asLines: true }], 'METRIC'));
    const o = pattern.pieces[0]!.outlines[0]!;
    expect(contourLength(outlineContour(o))).toBeCloseTo(8 + 10 + 2 * Math.sqrt(1 + 1600), 6);
    expect(o.size).toBe('8');
  });

  it('round-trips the demo front piece, all 11 sizes, within the flattening tolerance', () => {
    const front = demoPattern().pieces.find((p) => p.name === 'front')!;
    const specs = front.outlines.map((o) => ({
      piece: 'front',
      size: o.size,
      boundary: contourFlatten(pathFromSvg(o.d)[0]!, 0.01).map((f) => ({ x: f.point.x, y: -f.point.y })),
    }));
    const { pattern } = importDxf(writeD6673(specs, 'METRIC'));
    const imported = pattern.pieces[0]!;
    expect(imported.outlines.map((o) => o.size)).toEqual(front.outlines.map((o) => o.size));
    for (const [i, o] of front.outlines.entries()) {
      const a = contourLength(outlineContour(o));
      const b = contourLength(outlineContour(imported.outlines[i]!));
      // A chord is shorter than its arc: flattening at 0.01 mm loses well under 1 mm on a 2.5 m outline.
      expect(a - b).toBeGreaterThanOrEqual(-1e-6);
      expect(a - b).toBeLessThan(1);
    }
  });

  it('notes a file without units and reads it as millimetres', () => {
    const { pattern, notes } = importDxf(writeD6673([{ piece: 'back', size: '8', boundary: legInches(0).map((p) => ({ x: p.x * 25.4, y: p.y * 25.4 })) }], null));
    expect(notes.join(' ')).toMatch(/no units/);
    expect(contourLength(outlineContour(pattern.pieces[0]!.outlines[0]!))).toBeCloseTo((8 + 10 + 2 * Math.sqrt(1601)) * 25.4, 6);
  });

  it('refuses an open boundary, saying where it starts and ends', () => {
    const dxf = writeD6673([{ piece: 'front', size: '8', boundary: legInches(0).map((p) => ({ x: p.x * 25.4, y: p.y * 25.4 })), open: true }]);
    expect(() => importDxf(dxf)).toThrowError(DxfImportError);
    expect(() => importDxf(dxf)).toThrowError(/not closed — it starts at \(0\.0, -?0\.0\) mm/);
  });

  it('refuses boundary LINEs that do not close into one ring', () => {
    const threeSides = legInches(0).map((p) => ({ x: p.x * 25.4, y: p.y * 25.4 }));
    const dxf = writeD6673([{ piece: 'front', size: '8', boundary: threeSides, asLines: true }]).replace(
      // drop the closing LINE (the last one written in the block)
      /0\nLINE\n8\n1\n(?:(?!0\nLINE)[\s\S])*?(?=0\nTEXT)/,
      '',
    );
    expect(() => importDxf(dxf)).toThrowError(/do not join into one closed outline/);
  });

  it('refuses a boundary that crosses itself, saying where', () => {
    const bowtie = [{ x: 0, y: 0 }, { x: 100, y: 100 }, { x: 100, y: 0 }, { x: 0, y: 100 }];
    expect(() => importDxf(writeD6673([{ piece: 'front', size: '8', boundary: bowtie }]))).toThrowError(/crosses itself at \(50\.0, -50\.0\) mm/);
  });

  it('refuses a file that is not DXF, or has no pieces', () => {
    expect(() => importDxf('<svg xmlns="http://www.w3.org/2000/svg"/>')).toThrowError(DxfImportError);
    expect(() => importDxf(writeD6673([]))).toThrowError(/no pattern pieces/);
  });
});

describe('DXF import of damaged files (the parser never sees what would make it loop for ever)', () => {
  const graded = writeD6673(gradedFront(), 'ENGLISH');
  const groups = (...pairs: (string | number)[]) => ['0', 'SECTION', '2', 'ENTITIES', ...pairs.map(String), '0', 'ENDSEC', '0', 'EOF', ''].join('\n');

  it('refuses, naming the line, a POLYLINE not ended by SEQEND, a group code that is not a number, and an LWPOLYLINE listing fewer vertices than it says', () => {
    // each of these made dxf-parser 1.1 loop without end (found by mutating a D6673 file)
    const polyline = groups(0, 'POLYLINE', 8, 1, 66, 1, 0, 'VERTEX', 8, 1, 10, 0, 20, 0, 0, 'LINE', 8, 1, 10, 0, 20, 0, 11, 1, 21, 1);
    expect(() => importDxf(polyline)).toThrow(new DxfImportError("line 20: a POLYLINE's vertices are followed by LINE instead of SEQEND: the file is damaged"));
    const shifted = graded.replace('\n0\nVERTEX\n', '\nRTEX\n');
    expect(() => importDxf(shifted)).toThrow(/^line \d+: "RTEX" is not a group code \(a number\): the file is damaged$/);
    const lw = groups(0, 'LWPOLYLINE', 8, 1, 90, 200000000, 10, 0, 20, 0);
    expect(() => importDxf(lw)).toThrow(new DxfImportError('line 6: the LWPOLYLINE says it has 200000000 vertices but lists 1: the file is damaged'));
    // what follows the EOF group is not read
    expect(importDxf(`${graded}0\nPOLYLINE\n`).pattern.pieces).toHaveLength(1);
  });

  it('any damage to a D6673 file gives a pattern or a DxfImportError, never anything else (property)', () => {
    const syntax = ['0', '\n', ' ', '-', '.', 'e', '9', 'VERTEX', 'SEQEND', 'POLYLINE', 'LWPOLYLINE', '90', 'EOF', 'NaN', '1e400'];
    let refused = 0;
    fc.assert(
      fc.property(damagedCopies(graded, syntax), (t) => {
        try {
          importDxf(t);
        } catch (error) {
          expect(error).toBeInstanceOf(DxfImportError);
          refused++;
        }
      }),
      { numRuns: 300 },
    );
    // not vacuous: most damaged files are refused
    expect(refused).toBeGreaterThan(150);
  });
});
