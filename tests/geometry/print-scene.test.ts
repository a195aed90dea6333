/**
 * What each printed page carries (the drawing data shared by the PDF and SVG writers): join marks
 * that meet across page edges, labels, test squares, the caution line.
 */
import { describe, expect, it } from 'vitest';
import { applyOps, demoPattern } from '../../geometry/index.ts';
import { type Mark, SCALE_INSTRUCTION, type TiledPlan, coverScene, planPrint, tileScene } from '../../geometry/index.ts';
import { BLEND } from '../bench/alterations.ts';
import { expectNear } from './helpers.ts';

const WORDS = { title: 'Demo five-pocket trousers', date: '2026-12-01' };
const blended = applyOps(demoPattern(), [BLEND, { op: 'seam-allowance', width: 15, edges: { hem: 40 } }]).pattern;

function tiled(options: Parameters<typeof planPrint>[1]): TiledPlan {
  const plan = planPrint(blended, options);
  if (plan.format !== 'tiled') throw new Error('expected tiles');
  return plan;
}

/** Centres of the join marks on a page (where their two arms cross), in sheet mm. */
function joinCentres(marks: readonly Mark[]) {
  const arms = marks.flatMap((m) => {
    if (m.kind !== 'path' || m.role !== 'join') return [];
    const r = /^M(-?[\d.]+) (-?[\d.]+) L(-?[\d.]+) (-?[\d.]+)$/.exec(m.d);
    return r ? [[Number(r[1]), Number(r[2]), Number(r[3]), Number(r[4])] as const] : [];
  });
  return arms.filter(([, y0, , y1]) => y0 === y1).map(([x0, y, x1]) => ({ x: (x0 + x1) / 2, y }));
}

const texts = (marks: readonly Mark[]) => marks.flatMap((m) => (m.kind === 'text' ? [m.text] : []));

describe.each([
  ['Letter, trim and butt', { paper: 'letter' as const }],
  ['A4, 12 mm overlap band', { paper: 'a4' as const, overlap: 12 }],
])('tile pages: %s', (_name, options) => {
  const plan = tiled(options);
  const m = plan.grid.margin;
  const scenes = new Map(plan.used.map((t, i) => [t.label, { tile: t, scene: tileScene(plan, t, i + 2, WORDS) }]));
  const toContent = (label: string, p: { x: number; y: number }) => {
    const t = scenes.get(label)!.tile;
    return { x: p.x - m + t.area.x, y: p.y - m + t.area.y };
  };

  it('join marks on both sides of every shared edge fall on the same spot of the pattern (two per edge)', () => {
    let edges = 0;
    for (const { tile } of scenes.values()) {
      for (const [dr, dc] of [
        [0, 1],
        [1, 0],
      ] as const) {
        const other = plan.used.find((t) => t.row === tile.row + dr && t.col === tile.col + dc);
        if (!other) continue;
        edges++;
        const mine = joinCentres(scenes.get(tile.label)!.scene.furniture).map((p) => toContent(tile.label, p));
        const theirs = joinCentres(scenes.get(other.label)!.scene.furniture).map((p) => toContent(other.label, p));
        // the shared edge's marks: those of mine that have a partner on the neighbour within 1e-6 mm
        const shared = mine.filter((p) => theirs.some((q) => Math.hypot(p.x - q.x, p.y - q.y) < 1e-6));
        expect(shared, `${tile.label} | ${other.label}`).toHaveLength(2);
        // and they lie in the band both pages print (its middle; the trim line when there is no overlap)
        for (const p of shared) {
          if (dc === 1) expectNear(p.x, other.area.x + plan.grid.overlap / 2, 1e-9);
          else expectNear(p.y, other.area.y + plan.grid.overlap / 2, 1e-9);
        }
      }
    }
    expect(edges).toBeGreaterThan(5);
  });

  it('each tile page names itself, its page number of the total, and each neighbour it joins', () => {
    for (const [label, { tile, scene }] of scenes) {
      const t = texts(scene.furniture);
      expect(t).toContain(label);
      expect(t.some((s) => /^page \d+ of \d+/.test(s) && s.endsWith(`of ${plan.pageCount} · ${WORDS.title}`))).toBe(true);
      const neighbours = plan.used.filter((o) => Math.abs(o.row - tile.row) + Math.abs(o.col - tile.col) === 1);
      for (const n of neighbours) expect(t, `${label} → ${n.label}`).toContain(`joins ${n.label}`);
      // scale bar on every page
      expect(t).toEqual(expect.arrayContaining(['5 cm', '2 in']));
    }
  });
});

describe('page 1', () => {
  const plan = tiled({ paper: 'letter' });
  const cover = coverScene(plan, WORDS);

  it('carries a 1 in and a 5 cm test square, each labelled, with the one-line caution to print at 100 % and measure', () => {
    const squares = cover.furniture.flatMap((f) => (f.kind === 'square' ? [f.side] : []));
    expect(squares.sort((a, b) => a - b)).toEqual([25.4, 50]); // 1 in = 25.4 mm exactly
    const t = texts(cover.furniture);
    expect(t).toEqual(expect.arrayContaining(['1 in', '5 cm', SCALE_INSTRUCTION]));
    expect(SCALE_INSTRUCTION).toMatch(/100 %/);
    expect(SCALE_INSTRUCTION).toMatch(/measure/);
  });

  it('the assembly map greys and lists the pages left out', () => {
    const grey = cover.furniture.filter((f) => f.kind === 'path' && f.role === 'map-empty');
    expect(grey).toHaveLength(plan.empty.length);
    const listed = texts(cover.furniture).find((s) => s.startsWith('Left out'));
    for (const t of plan.empty) expect(listed).toContain(t.label);
    expect(cover.furniture.filter((f) => f.kind === 'path' && f.role === 'map-tile')).toHaveLength(plan.used.length);
  });
});
