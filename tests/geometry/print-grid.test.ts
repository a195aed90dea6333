/**
 * Print geometry: paper sizes, tile counts, labels, grid coverage (closed-form and property tests).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { PAPERS, PAPER_IDS, PT_PER_MM, PX_PER_MM, PrintError, paperSheet, rowLetters, tileCount, tileGrid, tileLabel } from '../../geometry/index.ts';
import { expectNear } from './helpers.ts';

describe('paper sizes', () => {
  it('ISO 216: A4 = 210 × 297 mm, A3 = 297 × 420 mm, A0 = 841 × 1189 mm', () => {
    expect([PAPERS.a4.width, PAPERS.a4.height]).toEqual([210, 297]);
    expect([PAPERS.a3.width, PAPERS.a3.height]).toEqual([297, 420]);
    expect([PAPERS.a0.width, PAPERS.a0.height]).toEqual([841, 1189]);
  });

  it('US sizes are whole inches (1 in = 25.4 mm exactly): Letter 8.5 × 11, Legal 8.5 × 14, Tabloid 11 × 17', () => {
    expectNear(PAPERS.letter.width / 25.4, 8.5, 1e-12);
    expectNear(PAPERS.letter.height! / 25.4, 11, 1e-12);
    expectNear(PAPERS.legal.height! / 25.4, 14, 1e-12);
    expectNear(PAPERS.tabloid.width / 25.4, 11, 1e-12);
    expectNear(PAPERS.tabloid.height! / 25.4, 17, 1e-12);
  });

  it('in PDF points (ISO 32000-1 user space, 72 per inch): A4 = 595.276 × 841.890, Letter = 612 × 792 (trade reference §5.2, calc)', () => {
    expectNear(PAPERS.a4.width * PT_PER_MM, 595.276, 5e-4);
    expectNear(PAPERS.a4.height! * PT_PER_MM, 841.89, 5e-4);
    expectNear(PAPERS.letter.width * PT_PER_MM, 612, 1e-9);
    expectNear(PAPERS.letter.height! * PT_PER_MM, 792, 1e-9);
    // CSS Values and Units: 96 px per inch; 10 cm = 377.953 px (trade reference §6.9)
    expectNear(100 * PX_PER_MM, 377.953, 5e-4);
  });

  it('rolls are 914 and 1118 mm wide (36 and 44 in, common practice, no source) with no fixed length; landscape swaps sides', () => {
    expect(PAPERS['roll-914'].height).toBeUndefined();
    expect(PAPERS['roll-1118'].width).toBe(1118);
    expect(paperSheet(PAPERS.a4, 'landscape')).toEqual({ width: 297, height: 210 });
    for (const id of PAPER_IDS) expect(PAPERS[id].source.length).toBeGreaterThan(3);
  });
});

describe('tile count and labels', () => {
  it('worked example (trade reference §6.10, calc): 600 × 1100 mm on A4 portrait, 10 mm margins, 15 mm overlap → 4 columns × 5 rows', () => {
    const grid = tileGrid({ width: 600, height: 1100 }, PAPERS.a4, 'portrait', 10, 15);
    expect(grid.sheet).toEqual({ width: 210, height: 297 });
    expect(grid.cols).toBe(4);
    expect(grid.rows).toBe(5);
    expect(grid.tiles).toHaveLength(20);
    expect(tileCount(600, 190, 15)).toBe(4);
    expect(tileCount(1100, 277, 15)).toBe(5);
  });

  it('an exact fit needs no extra tile; content no larger than a tile needs one', () => {
    expect(tileCount(2 * 190, 190, 0)).toBe(2);
    expect(tileCount(2 * 190 + 0.01, 190, 0)).toBe(3);
    expect(tileCount(0, 190, 0)).toBe(1);
    expect(tileCount(190, 190, 15)).toBe(1);
  });

  it('rows are letters (A … Z, AA, AB …), columns numbers from 1', () => {
    expect([0, 1, 25, 26, 27, 51, 52].map(rowLetters)).toEqual(['A', 'B', 'Z', 'AA', 'AB', 'AZ', 'BA']);
    expect(tileLabel(0, 0)).toBe('A1');
    expect(tileLabel(1, 2)).toBe('B3');
    const grid = tileGrid({ width: 500, height: 500 }, PAPERS.letter, 'portrait', 6.35, 0);
    expect(grid.tiles.map((t) => t.label).slice(0, 4)).toEqual(['A1', 'A2', 'A3', 'B1']);
  });

  it('refuses a margin or overlap that leaves no usable tile, with a PrintError', () => {
    expect(() => tileGrid({ width: 100, height: 100 }, PAPERS.letter, 'portrait', 90, 0)).toThrow(PrintError);
    expect(() => tileGrid({ width: 100, height: 100 }, PAPERS.letter, 'portrait', 6.35, 150)).toThrow(/overlap/);
    expect(() => tileGrid({ width: 100, height: 100 }, PAPERS['roll-914'], 'portrait', 6.35, 0)).toThrow(/roll/);
  });
});

describe('tile grid (property)', () => {
  const tiledPapers = PAPER_IDS.filter((id) => PAPERS[id].format === 'tiled');
  const arb = fc.record({
    width: fc.double({ min: 1, max: 3000, noNaN: true }),
    height: fc.double({ min: 1, max: 3000, noNaN: true }),
    paper: fc.constantFrom(...tiledPapers),
    orientation: fc.constantFrom('portrait' as const, 'landscape' as const),
    margin: fc.double({ min: 0, max: 20, noNaN: true }),
    overlap: fc.double({ min: 0, max: 30, noNaN: true }),
    u: fc.double({ min: 0, max: 1, noNaN: true }),
    v: fc.double({ min: 0, max: 1, noNaN: true }),
  });

  it('the tiles cover the whole content box without a gap: every point lies in some printable area; neighbours share exactly the overlap', () => {
    fc.assert(
      fc.property(arb, (c) => {
        const g = tileGrid({ width: c.width, height: c.height }, PAPERS[c.paper], c.orientation, c.margin, c.overlap);
        const p = { x: c.u * c.width, y: c.v * c.height };
        const inside = g.tiles.some((t) => p.x >= t.area.x && p.x <= t.area.x + t.area.width && p.y >= t.area.y && p.y <= t.area.y + t.area.height);
        expect(inside).toBe(true);
        // the far corner is covered too
        const last = g.tiles[g.tiles.length - 1]!;
        expect(last.area.x + last.area.width).toBeGreaterThanOrEqual(c.width - 1e-9);
        expect(last.area.y + last.area.height).toBeGreaterThanOrEqual(c.height - 1e-9);
        // no extra column or row: without the last one the box would not be covered
        if (g.cols > 1) expect((g.cols - 1) * g.step.x + g.overlap).toBeLessThan(c.width + 1e-6);
        if (g.rows > 1) expect((g.rows - 1) * g.step.y + g.overlap).toBeLessThan(c.height + 1e-6);
        for (const t of g.tiles) {
          const right = g.tiles[t.row * g.cols + t.col + 1];
          if (t.col + 1 < g.cols && right) expectNear(t.area.x + t.area.width - right.area.x, g.overlap, 1e-9, 'overlap');
          expectNear(t.area.width, g.sheet.width - 2 * g.margin, 1e-9);
        }
      }),
      { numRuns: 300 },
    );
  });
});
