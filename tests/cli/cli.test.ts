/**
 * The `blockwright` command line, run as a real process through its bin file.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { contourLength, demoPattern, outlineContour, parsePattern } from '../../geometry/index.ts';
import { writeD6673 } from '../geometry/d6673-writer.ts';
import { projectRoot } from '../../server/config.ts';

const BIN = path.join(projectRoot, 'server/cli/blockwright.mjs');
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'blockwright-cli-'));
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

function cli(...args: string[]) {
  const res = spawnSync(process.execPath, [BIN, ...args], { cwd: dir, encoding: 'utf8' });
  return { status: res.status, stdout: res.stdout, stderr: res.stderr };
}

function write(name: string, value: unknown): string {
  const file = path.join(dir, name);
  fs.writeFileSync(file, typeof value === 'string' ? value : JSON.stringify(value));
  return file;
}

interface Measures {
  pieces: { piece: string; outlines: { size: string; edges: { role: string; length: number }[] }[] }[];
  pairedSeams: { size: string; role: string; difference: number; withinTolerance: boolean }[];
  crotchLength: { size: string; total: number }[];
}

const edge = (m: Measures, piece: string, size: string, role: string) =>
  m.pieces.find((p) => p.piece === piece)!.outlines.find((o) => o.size === size)!.edges.find((e) => e.role === role)!.length;

describe('npx blockwright', () => {
  it('when run through npx with --help, then it lists the commands and exits 0', () => {
    const res = spawnSync('npx', ['--no-install', 'blockwright', '--help'], { cwd: projectRoot, encoding: 'utf8' });
    expect(res.status).toBe(0);
    for (const name of ['import', 'alter', 'measure']) expect(res.stdout).toContain(name);
  });

  it('when the command is unknown, then exit 2 with one line on stderr', () => {
    const res = cli('frobnicate');
    expect(res.status).toBe(2);
    expect(res.stderr.trim().split('\n')).toHaveLength(1);
  });

  it('when the file is missing or not JSON, then a non-zero exit with one clear line', () => {
    const missing = cli('measure', path.join(dir, 'nope.json'));
    expect(missing.status).not.toBe(0);
    expect(missing.stderr).toMatch(/no such file/);
    expect(missing.stderr.trim().split('\n')).toHaveLength(1);
    const bad = cli('measure', write('bad.json', '{"units": "mm", '));
    expect(bad.status).not.toBe(0);
    expect(bad.stderr).toMatch(/not valid JSON/);
    const wrong = cli('measure', write('wrong.json', { units: 'mm', pieces: 'no' }));
    expect(wrong.status).not.toBe(0);
    expect(wrong.stderr).toMatch(/pieces/);
  });

  it('when an SVG in inches is imported, then the pattern is in millimetres (CSS: 1in = 25.4mm), one outline per size', () => {
    const svg = write(
      'two-sizes.svg',
      `<svg xmlns="http://www.w3.org/2000/svg" width="20in" height="45in" viewBox="0 0 20 45">
        <g data-piece="front">
          <path data-size="8" d="M 1 1 L 9 1 L 10 41 L 0 41 Z"/>
          <path data-size="10" d="M 0.5 1 L 9.5 1 L 10.5 41 L -0.5 41 Z"/>
          <path data-role="lengthen" data-name="lower leg" d="M -1 30 L 11 30"/>
        </g>
      </svg>`,
    );
    const out = path.join(dir, 'two-sizes.json');
    const res = cli('import', svg, '--out', out);
    expect(res.status, res.stderr).toBe(0);
    const pattern = parsePattern(JSON.parse(fs.readFileSync(out, 'utf8')));
    const front = pattern.pieces[0]!;
    expect(front.outlines.map((o) => o.size)).toEqual(['8', '10']);
    expect(contourLength(outlineContour(front.outlines[0]!))).toBeCloseTo((8 + 10 + 2 * Math.sqrt(1 + 1600)) * 25.4, 3);
    expect(front.lines.map((l) => `${l.role}:${l.name}`)).toEqual(['lengthen:lower leg']);
  });

  it('when an ASTM D6673 DXF is imported, then each block becomes a size of its piece', () => {
    const box = (w: number) => [{ x: 0, y: 0 }, { x: w, y: 0 }, { x: w, y: 1000 }, { x: 0, y: 1000 }];
    const dxf = write('nest.dxf', writeD6673([{ piece: 'back', size: '8', boundary: box(250) }, { piece: 'back', size: '10', boundary: box(260) }]));
    const res = cli('import', dxf);
    expect(res.status, res.stderr).toBe(0);
    const pattern = parsePattern(JSON.parse(res.stdout));
    expect(pattern.pieces.map((p) => [p.name, p.outlines.map((o) => o.size)])).toEqual([['back', ['8', '10']]]);
  });

  it('when the file type is unknown, then one line says which types work', () => {
    const res = cli('import', write('pattern.pdf', '%PDF-1.7'));
    expect(res.status).not.toBe(0);
    expect(res.stderr).toMatch(/\.svg or \.dxf/);
  });

  it('when the legs are shortened 3 in, then inseam and outseam are 76.2 mm shorter (common practice, no source)', () => {
    const pattern = write('demo.json', demoPattern());
    const ops = write('ops.json', { ops: [{ op: 'lengthen', line: 'lower leg', amount: -76.2 }] });
    const out = path.join(dir, 'short.json');
    const altered = cli('alter', pattern, '--ops', ops, '--out', out);
    expect(altered.status, altered.stderr).toBe(0);
    expect(altered.stdout).toBe('');

    const before = JSON.parse(cli('measure', pattern).stdout) as Measures;
    const after = JSON.parse(cli('measure', out).stdout) as Measures;
    // A seam leaning at a few degrees to the grain shortens by d·cos(lean), so within 0.5 mm:
    // far below the 1/16 in (1.6 mm) a tape measure reads.
    for (const piece of ['front', 'back']) {
      for (const role of ['inseam', 'side-seam']) {
        const change = edge(before, piece, '8', role) - edge(after, piece, '8', role);
        expect(Math.abs(change - 76.2), `${piece} ${role}`).toBeLessThan(0.5);
      }
    }
    // Above the line nothing changes: the crotch length stays.
    const crotch = (m: Measures) => m.crotchLength.find((c) => c.size === '8')!.total;
    expect(crotch(after)).toBeCloseTo(crotch(before), 1);
  });

  it('when an operation is refused, then exit non-zero naming the operation', () => {
    const pattern = write('demo2.json', demoPattern());
    const ops = write('bad-ops.json', { ops: [{ op: 'lengthen', line: 'no such line', amount: 10 }] });
    const res = cli('alter', pattern, '--ops', ops);
    expect(res.status).not.toBe(0);
    expect(res.stderr).toMatch(/operation 1/);
  });
});
