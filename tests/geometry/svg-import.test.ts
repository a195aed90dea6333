import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  MM_PER_UNIT,
  SvgImportError,
  XmlError,
  contourArea,
  contourBounds,
  contourLength,
  importSvg,
  lengthToMm,
  outlineContour,
  parseTransform,
  affineApply,
  demoPattern,
  parsePattern,
  pathFromSvg,
} from '../../geometry/index.ts';
import { damagedCopies } from '../support/damage.ts';
import { multiSizeSvg } from '../support/pattern-svg.ts';
import { expectNear, expectPointNear } from './helpers.ts';

const svg = (attrs: string, body: string) => `<?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg" ${attrs}>${body}</svg>`;
const firstOutline = (text: string) => outlineContour(importSvg(text).pattern.pieces[0]!.outlines[0]!);

describe('SVG import — units (outside reference: CSS Values and Units Level 3 §5.2; 1 in = 25.4 mm exactly)', () => {
  it('the unit table: 1in = 2.54cm = 96px = 72pt = 6pc, 1Q = 0.25 mm', () => {
    expectNear(MM_PER_UNIT.in!, 25.4, 0);
    expectNear(96 * MM_PER_UNIT.px!, 25.4, 1e-12);
    expectNear(72 * MM_PER_UNIT.pt!, 25.4, 1e-12);
    expectNear(6 * MM_PER_UNIT.pc!, 25.4, 1e-12);
    expectNear(lengthToMm('2.54cm')!, 25.4, 1e-12);
    expectNear(lengthToMm('4Q')!, 1, 1e-12);
    expect(lengthToMm('50%')).toBeUndefined();
  });

  it('width/height in mm with a matching viewBox: user units are mm', () => {
    const c = firstOutline(svg('width="600mm" height="1100mm" viewBox="0 0 600 1100"', '<rect x="10" y="20" width="100" height="50"/>'));
    expectNear(contourArea(c), 5000, 1e-6);
  });

  it('width in inches with a px viewBox (Letter at 96 px/in): 96 user units = 25.4 mm', () => {
    const c = firstOutline(svg('width="8.5in" height="11in" viewBox="0 0 816 1056"', '<rect x="0" y="0" width="96" height="96"/>'));
    expectNear(contourLength(c), 4 * 25.4, 1e-9);
  });

  it('no width, height or viewBox: user units are px, and a note says so', () => {
    const r = importSvg(svg('', '<rect width="96" height="192"/>'));
    expectNear(contourArea(outlineContour(r.pattern.pieces[0]!.outlines[0]!)), 25.4 * 50.8, 1e-9);
    expect(r.notes.join(' ')).toMatch(/px/);
  });
});

describe('SVG import — transforms and shapes', () => {
  it('nested transforms compose outer-first (SVG 1.1 §7.5)', () => {
    const m = parseTransform('translate(10 20) rotate(90) scale(2, 3)');
    expectPointNear(affineApply(m, { x: 1, y: 1 }), { x: 10 - 3, y: 20 + 2 }, 1e-12);
    const c = firstOutline(svg('width="100mm" height="100mm" viewBox="0 0 100 100"', '<g transform="translate(10,0)"><g transform="scale(2)"><rect x="1" y="1" width="10" height="5"/></g></g>'));
    const b = contourBounds(c);
    expectNear(b.minX, 12, 1e-9);
    expectNear(b.maxX, 32, 1e-9);
    expectNear(b.maxY, 12, 1e-9);
  });

  it('circle, ellipse, polygon and rounded rect become closed outlines of the right size', () => {
    const text = svg(
      'width="500mm" height="500mm" viewBox="0 0 500 500"',
      '<circle data-piece="a" cx="50" cy="50" r="40"/><ellipse data-piece="b" cx="200" cy="50" rx="40" ry="20"/><polygon data-piece="c" points="0,200 100,200 100,300"/><rect data-piece="d" x="300" y="300" width="100" height="60" rx="10"/>',
    );
    const p = importSvg(text).pattern;
    const area = (name: string) => contourArea(outlineContour(p.pieces.find((x) => x.name === name)!.outlines[0]!));
    expectNear(area('a'), Math.PI * 1600, 0.05);
    expectNear(area('b'), Math.PI * 800, 0.05);
    expectNear(area('c'), 5000, 1e-9);
    expectNear(area('d'), 6000 - (4 - Math.PI) * 100, 0.05);
  });
});

describe('SVG import — pieces, sizes and lines', () => {
  it('data-piece / data-size / data-role / data-name on elements and groups', () => {
    const text = svg(
      'width="1000mm" height="1000mm" viewBox="0 0 1000 1000"',
      `<g data-piece="front">
         <path data-size="8" d="M0 0 h200 v800 h-200 z"/>
         <path data-size="10" d="m-5 0 h210 v800 h-210 z"/>
         <g data-role="level"><line data-name="knee" x1="-20" y1="500" x2="220" y2="500"/></g>
         <line data-role="lengthen" data-name="lower leg" x1="-20" y1="650" x2="220" y2="650"/>
       </g>
       <g id="back"><rect width="240" height="820" x="400" y="0"/></g>`,
    );
    const p = importSvg(text).pattern;
    const front = p.pieces.find((x) => x.name === 'front')!;
    expect(front.outlines.map((o) => o.size)).toEqual(['8', '10']);
    expect(front.lines.map((l) => `${l.role}:${l.name}`).sort()).toEqual(['lengthen:lower leg', 'level:knee']);
    expect(p.pieces.find((x) => x.name === 'back')!.outlines).toHaveLength(1);
  });

  it('without names, nested outlines become one piece with sizes from smallest to largest', () => {
    const text = svg(
      'width="1000mm" height="1000mm" viewBox="0 0 1000 1000"',
      '<path d="M10 10 h100 v100 h-100 z"/><path d="M0 0 h120 v120 h-120 z"/><path d="M5 5 h110 v110 h-110 z"/><path d="M500 0 h50 v50 h-50 z"/>',
    );
    const r = importSvg(text);
    expect(r.pattern.pieces).toHaveLength(2);
    const nest = r.pattern.pieces.find((x) => x.outlines.length === 3)!;
    expect(nest.outlines.map((o) => Math.round(contourArea(outlineContour(o))))).toEqual([10000, 12100, 14400]);
    expect(r.notes.join(' ')).toMatch(/grouped/);
  });
});

describe('SVG import — refuses safely', () => {
  it('a DOCTYPE with entity declarations is refused (no entity expansion)', () => {
    const bomb = '<?xml version="1.0"?><!DOCTYPE svg [<!ENTITY a "aaaaaaaaaa"><!ENTITY b "&a;&a;&a;&a;">]><svg xmlns="http://www.w3.org/2000/svg"><text>&b;</text></svg>';
    expect(() => importSvg(bomb)).toThrow(XmlError);
    expect(() => importSvg(bomb)).toThrow(/DOCTYPE/);
  });

  it('scripts, images and references are skipped, never run or fetched, and listed', () => {
    const r = importSvg(svg('width="100mm" height="100mm" viewBox="0 0 100 100"', '<script>throw new Error("ran")</script><image href="http://example.invalid/x.png"/><use href="other.svg#p"/><rect width="10" height="10"/>'));
    expect([...r.skipped].sort()).toEqual(['image', 'script', 'use']);
    expect(r.pattern.pieces).toHaveLength(1);
  });

  it('an unclosed outline is reported with where it ends', () => {
    expect(() => importSvg(svg('width="100mm" height="100mm" viewBox="0 0 100 100"', '<path id="leg" d="M0 0 L50 0 L50 80 L2 80"/>'))).toThrow(/path#leg: the outline is not closed — it starts at \(0\.0, 0\.0\) mm and ends 80\.0 mm away at \(2\.0, 80\.0\)/);
  });

  it('a self-crossing outline is reported with where it crosses', () => {
    expect(() => importSvg(svg('width="100mm" height="100mm" viewBox="0 0 100 100"', '<path d="M0 0 L40 40 L40 0 L0 40 Z"/>'))).toThrow(/crosses itself at \(20\.0, 20\.0\) mm/);
  });

  it('malformed XML and non-SVG roots get clear errors; an attribute named __proto__ is harmless', () => {
    expect(() => importSvg('<svg><rect></svg>')).toThrow(/does not match/);
    expect(() => importSvg('<html></html>')).toThrow(SvgImportError);
    const r = importSvg(svg('width="10mm" height="10mm" viewBox="0 0 10 10"', '<rect __proto__="x" width="5" height="5"/>'));
    expect(r.pattern.pieces).toHaveLength(1);
    expect(({} as Record<string, unknown>).x).toBeUndefined();
  });
});

describe('SVG import — the demo pattern written as true-scale SVG reads back the same', () => {
  it('every piece, size line and line survives (areas equal within 1e-6 relative)', () => {
    const demo = parsePattern(demoPattern());
    const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;');
    const body = demo.pieces
      .map(
        (p) =>
          `<g data-piece="${esc(p.name)}">` +
          p.outlines.map((o) => `<path data-size="${esc(o.size)}" d="${o.d}"/>`).join('') +
          p.lines.map((l) => `<path data-role="${l.role}" data-name="${esc(l.name)}"${l.size ? ` data-size="${esc(l.size)}"` : ''} d="${l.d}"/>`).join('') +
          '</g>',
      )
      .join('');
    // robust true scale (trade reference §5.3): width/height in mm with a matching viewBox
    const text = svg('width="3000mm" height="1500mm" viewBox="0 0 3000 1500"', body);
    const back = importSvg(text).pattern;
    expect(back.pieces.map((p) => p.name)).toEqual(demo.pieces.map((p) => p.name));
    back.pieces.forEach((p, i) => {
      const orig = demo.pieces[i]!;
      expect(p.outlines.map((o) => o.size)).toEqual(orig.outlines.map((o) => o.size));
      expect(p.lines).toHaveLength(orig.lines.length);
      p.outlines.forEach((o, k) => {
        const a = contourArea(outlineContour(o));
        const b = contourArea(outlineContour(orig.outlines[k]!));
        expectNear(a, b, b * 1e-6);
      });
    });
  });
});

describe('SVG import — unnamed pieces of a graded pattern', () => {
  it('when graded size lines cross at the crotch and lines name no piece, then each piece keeps its sizes and its own lines', () => {
    const r = importSvg(multiSizeSvg());
    expect(r.pattern.pieces.map((p) => p.outlines.map((o) => o.size))).toEqual([
      ['8', '10', '12'],
      ['8', '10', '12'],
    ]);
    for (const piece of r.pattern.pieces) {
      // 6 named lines (hip, crotch, thigh, knee, calf, rise) in each of 3 sizes.
      expect(piece.lines).toHaveLength(18);
      // every line's middle lies inside its own piece's largest outline
      const outer = outlineContour(piece.outlines[2]!);
      const b = contourBounds(outer);
      for (const line of piece.lines) {
        const lb = contourBounds(pathFromSvg(line.d)[0]!);
        expect((lb.minX + lb.maxX) / 2).toBeGreaterThan(b.minX);
        expect((lb.minX + lb.maxX) / 2).toBeLessThan(b.maxX);
      }
    }
  });

  it('when a line lies outside every piece, then it is left out with a note', () => {
    const r = importSvg(
      svg('width="400mm" height="100mm" viewBox="0 0 400 100"', '<rect x="0" y="0" width="100" height="100"/><rect x="200" y="0" width="100" height="100"/><path data-role="level" data-name="hip" d="M 120 50 L 180 50"/>'),
    );
    expect(r.pattern.pieces.every((p) => p.lines.length === 0)).toBe(true);
    expect(r.notes.join(' ')).toMatch(/line "hip" lies outside every piece/);
  });
});

describe('SVG import of damaged files', () => {
  it('any damage to a multi-size SVG gives a pattern or an SvgImportError / XmlError, never anything else (property)', () => {
    const file = multiSizeSvg({ sizes: ['8', '10'] });
    const syntax = ['<', '>', '"', '=', ' ', '-', '.', 'e', '9', 'M', 'Z', 'A', '&', '&#x0;', '<!ENTITY a "b">', 'transform="', 'NaN', '1e400'];
    let refused = 0;
    fc.assert(
      fc.property(damagedCopies(file, syntax), (t) => {
        try {
          importSvg(t);
        } catch (error) {
          expect(error instanceof SvgImportError || error instanceof XmlError, String(error)).toBe(true);
          refused++;
        }
      }),
      { numRuns: 150 },
    );
    // not vacuous: many damaged files are refused, and some still import
    expect(refused).toBeGreaterThan(30);
    expect(refused).toBeLessThan(150);
  });
});
