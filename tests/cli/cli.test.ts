/**
 * The `blockwright` command line, run as a real process through its bin file.
 */
import { spawnSync } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { applyOps, contourLength, demoPattern, outlineContour, parsePattern } from '../../geometry/index.ts';
import { readPdf } from '../print/pdf-reader.ts';
import { PassThrough } from 'node:stream';
import { exportCommand } from '../../server/cli/commands/export.ts';
import { BLEND } from '../bench/alterations.ts';
import { writeD6673 } from '../geometry/d6673-writer.ts';
import { projectRoot } from '../../server/config.ts';
import { BIN, cliScratch } from '../support/cli.ts';

const { dir, cli, write } = cliScratch('blockwright-cli-');

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
    for (const name of ['import', 'alter', 'measure', 'export']) expect(res.stdout).toContain(name);
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

describe('npx blockwright export', () => {
  const blended = applyOps(demoPattern(), [BLEND, { op: 'seam-allowance', width: 15, edges: { hem: 40 } }]).pattern;

  it('when a blended pattern is exported to PDF on A4, then the file has the pages it reports, each A4 (ISO 216, read with pdfjs-dist), and the left-out pages are listed', async () => {
    const file = write('blended.json', blended);
    const out = path.join(dir, 'out', 'blended-a4.pdf');
    const res = cli('export', file, '--format', 'pdf', '--paper', 'a4', '--out', out);
    expect(res.status, res.stderr).toBe(0);
    expect(res.stdout).toBe('');
    const pages = Number(/^(\d+) pages \(A4/m.exec(res.stderr)?.[1]);
    expect(res.stderr).toMatch(/left out, no pattern on them: [A-Z]+\d+|no page left out/);
    expect(res.stderr).toMatch(/100 %/);
    const read = await readPdf(fs.readFileSync(out));
    expect(read.numPages).toBe(pages);
    for (const page of read.pages) expect([Math.round(Math.min(page.view[2]!, page.view[3]!) * 1000) / 1000, Math.round(Math.max(page.view[2]!, page.view[3]!) * 1000) / 1000]).toEqual([595.276, 841.89]);
  });

  it('when standard output is a terminal and no --out is given, then a PDF is refused (binary), before any work', async () => {
    const file = write('blended-tty.json', blended);
    const stdout = Object.assign(new PassThrough(), { isTTY: true });
    const stderr = new PassThrough();
    await expect(exportCommand.run([file, '--format', 'pdf'], { stdout, stderr })).rejects.toThrow(/give --out FILE/);
    expect(stdout.read()).toBeNull();
  });

  it('when standard output is not a terminal, then the PDF (or SVG) goes there', () => {
    const file = write('blended2.json', blended);
    const pdf = spawnSync(process.execPath, [BIN, 'export', file, '--paper', 'roll-914'], { cwd: dir });
    expect(pdf.status, pdf.stderr.toString()).toBe(0);
    expect(pdf.stdout.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    expect(pdf.stderr.toString()).toMatch(/1 sheet 914 × \d+ mm/);
    const svg = cli('export', file, '--format', 'svg', '--paper', 'letter');
    expect(svg.status, svg.stderr).toBe(0);
    expect(svg.stdout).toMatch(/<svg [^>]*width="[\d.]+mm" height="[\d.]+mm" viewBox="0 0 /);
  });

  it('when a size is chosen for an unblended pattern with an overlap band, then it prints; without a size it names the sizes', () => {
    const file = write('demo-sizes.json', demoPattern());
    const ok = cli('export', file, '--size', '8', '--overlap', '15', '--margin', '10', '--out', path.join(dir, 'size8.pdf'));
    expect(ok.status, ok.stderr).toBe(0);
    const missing = cli('export', file, '--out', path.join(dir, 'none.pdf'));
    expect(missing.status).not.toBe(0);
    expect(missing.stderr.trim().split('\n')).toHaveLength(1);
    expect(missing.stderr).toMatch(/choose one size \(0, 2, 4/);
    expect(fs.existsSync(path.join(dir, 'none.pdf'))).toBe(false);
  });

  it('when an option is wrong, then exit non-zero with one line naming it, and no file is written (more cases in tests/print/print-options.test.ts)', () => {
    const file = write('blended3.json', blended);
    const cases: [string[], RegExp][] = [
      [['--paper', 'b5'], /paper/],
      [['--overlap', 'wide'], /--overlap must be a number/],
      [['--paper', 'a0'], /do not fit on one A0/],
    ];
    for (const [args, message] of cases) {
      const out = path.join(dir, 'bad.pdf');
      const res = cli('export', file, ...args, '--out', out);
      expect(res.status, args.join(' ')).not.toBe(0);
      expect(res.stderr.trim().split('\n'), args.join(' ')).toHaveLength(1);
      expect(res.stderr, args.join(' ')).toMatch(message);
      expect(fs.existsSync(out)).toBe(false);
    }
  });
});
