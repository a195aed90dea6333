/**
 * An invented jeans-style trouser pattern for the demo scenario: front, back, yoke,
 * waistband, front pocket bag and back pocket, nested size lines 0–20 (11 sizes), with
 * lengthen/shorten lines, a rise line and level lines. Every number comes from the small grade
 * table below, which is our own invention (not taken from any published chart or pattern).
 *
 * Layout of each leg piece: grain line (= crease) on x = 0 pointing down (y grows downward),
 * side seam on the left (x < 0), centre front/back and crotch on the right (x > 0).
 */
import { type Edge, type Landmark, type Outline, type Pattern, type PatternLine, type Piece, BODY_LEVELS, PATTERN_VERSION } from './model.ts';
import { type Cubic, cubicLength } from './bezier.ts';
import type { Point } from './vec.ts';

/** The demo sizes, smallest to largest. */
export const DEMO_SIZES = ['0', '2', '4', '6', '8', '10', '12', '14', '16', '18', '20'] as const;

/**
 * Invented finished-garment grade table (mm), per size step i = 0…10 (size = 2·i).
 * Girths are whole-garment; each leg piece takes a share.
 */
export interface DemoGrade {
  readonly waist: number;
  readonly hip: number;
  readonly knee: number;
  readonly hem: number;
  /** waist (side) to crotch level */
  readonly rise: number;
  /** waist (side) to hip level */
  readonly hipDepth: number;
  /** crotch level to hem, along the grain */
  readonly inseam: number;
}

export function demoGrade(i: number): DemoGrade {
  return {
    waist: 660 + 40 * i,
    hip: 900 + 40 * i,
    knee: 2 * (205 + 6 * i),
    hem: 2 * (185 + 5 * i),
    rise: 250 + 5 * i,
    hipDepth: 180 + 3 * i,
    inseam: 790,
  };
}

const r2 = (v: number): number => Math.round(v * 1000) / 1000;
const P = (p: Point): string => `${r2(p.x)} ${r2(p.y)}`;
const lm = (name: string, kind: Landmark['kind'], p: Point): Landmark => ({ name, kind, x: r2(p.x), y: r2(p.y) });
const lerp = (a: Point, b: Point, k: number): Point => ({ x: a.x + (b.x - a.x) * k, y: a.y + (b.y - a.y) * k });
const hline = (y: number, x0: number, x1: number): string => `M${r2(x0)} ${r2(y)} L${r2(x1)} ${r2(y)}`;

interface LegSpec {
  readonly back: boolean;
  /** How far the crotch point sits below the grade table's crotch level (mm). */
  readonly crotchDrop: number;
}

/** The points of one size of a leg piece that its inseam depends on. */
function inseamFrame(i: number, spec: LegSpec) {
  const g = demoGrade(i);
  const quarterHip = g.hip / 4 + (spec.back ? 12 : -12);
  const kneeHalf = g.knee / 4 + (spec.back ? 12 : -12);
  const hemHalf = g.hem / 4 + (spec.back ? 12 : -12);
  const ext = spec.back ? g.hip / 9 : g.hip / 16; // crotch extension
  const yHip = g.hipDepth;
  const yCrotch = g.rise + spec.crotchDrop;
  const yKnee = g.rise + 340;
  const yHem = g.rise + g.inseam;
  // the centre seam turns into the crotch curve halfway from the hip to the crotch level (the
  // back's 8 mm lower), wherever the crotch point itself is dropped: the yoke meets it there
  const curveStartY = yHip + 0.5 * (g.rise + (spec.back ? 8 : 0) - yHip);
  const centreCurveStart: Point = { x: 0.55 * quarterHip, y: curveStartY };
  const crotch: Point = { x: centreCurveStart.x + ext, y: yCrotch };
  const kneeIn: Point = { x: kneeHalf, y: yKnee };
  const hemIn: Point = { x: hemHalf, y: yHem };
  // inseam: concave curve from the crotch point to the knee, then straight to the hem
  const inseamCurve: Cubic = [crotch, { x: crotch.x - 0.35 * (crotch.x - kneeIn.x), y: crotch.y + 0.12 * (yKnee - yCrotch) }, lerp(kneeIn, hemIn, (-0.35 * (yKnee - yCrotch)) / (yHem - yKnee)), kneeIn];
  return { g, quarterHip, kneeHalf, hemHalf, ext, yHip, yCrotch, yKnee, yHem, curveStartY, centreCurveStart, crotch, kneeIn, hemIn, inseamCurve };
}

/** Inseam length (crotch point to hem) of one size of a leg piece. */
const inseamLength = (i: number, spec: LegSpec): number => {
  const f = inseamFrame(i, spec);
  return cubicLength(f.inseamCurve) + Math.hypot(f.hemIn.x - f.kneeIn.x, f.hemIn.y - f.kneeIn.y);
};

/**
 * The back crotch point's drop below the front's: whatever makes the back inseam as long as the
 * front's (trade reference §3.11: front and back inseams, crotch point to hem, must be equal;
 * lowering the back crotch point to true them: common practice, no source). Found by
 * bisection: the back inseam shortens as the drop grows. 12–30 mm over the demo sizes.
 */
function backCrotchDrop(i: number): number {
  const target = inseamLength(i, { back: false, crotchDrop: 0 });
  let lo = 0;
  let hi = 80;
  for (let k = 0; k < 40; k++) {
    const mid = (lo + hi) / 2;
    if (inseamLength(i, { back: true, crotchDrop: mid }) > target) lo = mid;
    else hi = mid;
  }
  return (lo + hi) / 2;
}

/** One size of a front or back leg piece. */
function legOutline(i: number, spec: LegSpec): { outline: Outline; levels: Record<string, number>; halfWidth: number } {
  const { g, quarterHip, kneeHalf, hemHalf, ext, yHip, yCrotch, yKnee, yHem, curveStartY, centreCurveStart, crotch, kneeIn, hemIn, inseamCurve } = inseamFrame(i, spec);
  const quarterWaist = g.waist / 4 + (spec.back ? 8 : -8);
  // The top edge: front = waist; back = yoke seam (35 mm below the waist at the side, 45 mm at CB).
  const topSide = spec.back ? 35 : 0;
  const topCentre = spec.back ? 45 : 8;
  const centreLean = spec.back ? Math.tan((12 * Math.PI) / 180) : Math.tan((3 * Math.PI) / 180); // CB leans 12°, CF 3°
  const sideHip: Point = { x: -0.45 * quarterHip, y: yHip };
  const sideWaist: Point = { x: -0.45 * quarterWaist, y: 0 };
  const sideTop = spec.back ? lerp(sideWaist, sideHip, topSide / yHip) : sideWaist;
  const centreTop: Point = { x: centreCurveStart.x - centreLean * (curveStartY - topCentre), y: topCentre };
  const hemSide: Point = { x: -hemHalf, y: yHem };
  const kneeSide: Point = { x: -kneeHalf, y: yKnee };
  const curveDepth = yCrotch - curveStartY;
  // the direction square to the inseam's start, pointing out of the piece's crotch point
  const inseamStart = { x: inseamCurve[1].x - crotch.x, y: inseamCurve[1].y - crotch.y };
  const inseamStartLength = Math.hypot(inseamStart.x, inseamStart.y);
  const square: Point = { x: inseamStart.y / inseamStartLength, y: -inseamStart.x / inseamStartLength };
  // side seam above the hip is straight; below it continues tangentially into the thigh curve
  const sideDir = { x: (sideHip.x - sideTop.x) / (yHip - topSide), y: 1 };
  const d = [
    `M${P(sideTop)}`,
    `L${P(centreTop)}`,
    `L${P(centreCurveStart)}`,
    // crotch curve: leaves the centre seam along its lean, arrives at the crotch point square to
    // the inseam, so front and back laid together at the inseam make one smooth curve (trade
    // reference §3.11 shape checks)
    `C${P({ x: centreCurveStart.x + centreLean * 0.55 * curveDepth, y: centreCurveStart.y + 0.55 * curveDepth })} ${P({ x: crotch.x - 0.55 * ext * square.x, y: crotch.y - 0.55 * ext * square.y })} ${P(crotch)}`,
    `C${P(inseamCurve[1])} ${P(inseamCurve[2])} ${P(kneeIn)}`,
    `L${P(hemIn)}`,
    `L${P(hemSide)}`,
    `L${P(kneeSide)}`,
    `C${P(lerp(kneeSide, hemSide, (-0.4 * (yKnee - yHip)) / (yHem - yKnee)))} ${P({ x: sideHip.x + sideDir.x * 0.35 * (yKnee - yHip), y: sideHip.y + 0.35 * (yKnee - yHip) })} ${P(sideHip)}`,
    'Z',
  ].join(' ');
  const centre = spec.back ? 'cb' : 'cf';
  const points: Landmark[] = [
    lm(spec.back ? 'top-side' : 'waist-side', 'corner', sideTop),
    lm(spec.back ? 'top-cb' : 'waist-cf', 'corner', centreTop),
    lm(`${centre}-curve`, 'mark', centreCurveStart),
    lm('crotch-point', 'corner', crotch),
    lm('knee-inseam', 'notch', kneeIn),
    lm('hem-inseam', 'corner', hemIn),
    lm('hem-side', 'corner', hemSide),
    lm('knee-side', 'notch', kneeSide),
    lm('hip-side', 'notch', sideHip),
  ];
  return {
    outline: { size: DEMO_SIZES[i]!, d, points },
    levels: { hip: yHip, crotch: yCrotch, thigh: yCrotch + 30, knee: yKnee, calf: yKnee + 150, hem: yHem },
    halfWidth: Math.max(quarterHip, crotch.x) + 20,
  };
}

function legPiece(back: boolean): Piece {
  const outlines: Outline[] = [];
  const lines: PatternLine[] = [];
  for (let i = 0; i < DEMO_SIZES.length; i++) {
    const { outline, levels, halfWidth } = legOutline(i, { back, crotchDrop: back ? backCrotchDrop(i) : 0 });
    outlines.push(outline);
    const size = DEMO_SIZES[i]!;
    const x0 = -halfWidth;
    const x1 = halfWidth + 20;
    for (const name of BODY_LEVELS) lines.push({ role: 'level', name, d: hline(levels[name]!, x0, x1), size });
    // the rise line: between the hip and crotch levels, a quarter of the way down, on the straight
    // part of the centre seam (trade reference §3.3)
    lines.push({ role: 'lengthen', name: 'rise', d: hline(levels.hip! + 0.25 * (levels.crotch! - levels.hip!), x0, x1), size });
    lines.push({ role: 'lengthen', name: 'upper leg', d: hline((levels.crotch! + levels.knee!) / 2, x0, x1), size });
    lines.push({ role: 'lengthen', name: 'lower leg', d: hline((levels.knee! + levels.hem!) / 2, x0, x1), size });
  }
  const first = legOutline(0, { back, crotchDrop: 0 });
  const last = legOutline(DEMO_SIZES.length - 1, { back, crotchDrop: 0 });
  lines.push({ role: 'grain', name: 'grain', d: `M0 ${r2(first.levels.hip! - 60)} L0 ${r2(last.levels.hem! - 60)}` });
  const c = back ? 'cb' : 'cf';
  const edges: Edge[] = [
    back
      ? { name: 'yoke seam', role: 'other', from: 'top-side', to: 'top-cb' }
      : { name: 'waist', role: 'waist', from: 'waist-side', to: 'waist-cf' },
    back
      ? { name: 'centre back', role: 'centre-back', from: 'top-cb', to: `${c}-curve` }
      : { name: 'centre front', role: 'centre-front', from: 'waist-cf', to: `${c}-curve` },
    { name: 'crotch curve', role: 'crotch-curve', from: `${c}-curve`, to: 'crotch-point' },
    { name: 'inseam', role: 'inseam', from: 'crotch-point', to: 'hem-inseam' },
    { name: 'hem', role: 'hem', from: 'hem-inseam', to: 'hem-side' },
    { name: 'side seam', role: 'side-seam', from: 'hem-side', to: back ? 'top-side' : 'waist-side' },
  ];
  return { name: back ? 'back' : 'front', outlines, lines, edges, cut: { count: 2, onFold: false }, seamAllowanceIncluded: false };
}

/** The back yoke: waist on top, yoke seam below, centre back on the right. */
function yokePiece(): Piece {
  const outlines: Outline[] = DEMO_SIZES.map((size, i) => {
    const g = demoGrade(i);
    const quarterWaist = g.waist / 4 + 8;
    const quarterHip = g.hip / 4 + 12;
    const sideW: Point = { x: -0.45 * quarterWaist, y: 0 };
    const sideH: Point = { x: -0.45 * quarterHip, y: g.hipDepth };
    const sideBottom = lerp(sideW, sideH, 35 / g.hipDepth);
    const lean = Math.tan((12 * Math.PI) / 180);
    const curveStartY = g.hipDepth + 0.5 * (g.rise + 8 - g.hipDepth);
    const cbAt = (y: number): Point => ({ x: 0.55 * quarterHip - lean * (curveStartY - y), y });
    const cbTop = cbAt(-25);
    const cbBottom = cbAt(45);
    const d = `M${P(sideW)} C${P(lerp(sideW, cbTop, 0.35))} ${P({ x: lerp(sideW, cbTop, 0.7).x, y: cbTop.y + 2 })} ${P(cbTop)} L${P(cbBottom)} L${P(sideBottom)} Z`;
    return {
      size,
      d,
      points: [lm('waist-side', 'corner', sideW), lm('waist-cb', 'corner', cbTop), lm('seam-cb', 'corner', cbBottom), lm('seam-side', 'corner', sideBottom)],
    };
  });
  return {
    name: 'yoke',
    outlines,
    lines: [{ role: 'grain', name: 'grain', d: 'M0 5 L0 30' }],
    edges: [
      { name: 'waist', role: 'waist', from: 'waist-side', to: 'waist-cb' },
      { name: 'centre back', role: 'centre-back', from: 'waist-cb', to: 'seam-cb' },
      { name: 'yoke seam', role: 'other', from: 'seam-cb', to: 'seam-side' },
      { name: 'side seam', role: 'side-seam', from: 'seam-side', to: 'waist-side' },
    ],
    cut: { count: 2, onFold: false },
    seamAllowanceIncluded: false,
  };
}

/** A straight waistband, the full waist plus a 35 mm underlap, 40 mm finished width, cut on the fold. */
function waistbandPiece(): Piece {
  const outlines: Outline[] = DEMO_SIZES.map((size, i) => {
    const len = demoGrade(i).waist + 35;
    const d = `M0 0 L${r2(len)} 0 L${r2(len)} 80 L0 80 Z`;
    return {
      size,
      d,
      points: [lm('top-left', 'corner', { x: 0, y: 0 }), lm('top-right', 'corner', { x: len, y: 0 }), lm('bottom-right', 'corner', { x: len, y: 80 }), lm('bottom-left', 'corner', { x: 0, y: 80 })],
    };
  });
  return {
    name: 'waistband',
    outlines,
    lines: [
      { role: 'grain', name: 'grain', d: 'M20 60 L420 60' },
      { role: 'fold', name: 'fold', d: 'M0 40 L1200 40' },
    ],
    edges: [{ name: 'waist seam', role: 'waist', from: 'top-left', to: 'top-right' }],
    cut: { count: 1, onFold: false },
    seamAllowanceIncluded: false,
  };
}

/** Front pocket bag: a rounded bag graded 5 mm a size step in width. */
function pocketBagPiece(): Piece {
  const outlines: Outline[] = DEMO_SIZES.map((size, i) => {
    const w = 160 + 5 * i;
    const h = 230 + 4 * i;
    const d = `M0 0 L${w} 0 L${w} ${h - 60} C${w} ${h - 20} ${w - 30} ${h} ${w - 70} ${h} L60 ${h} C20 ${h} 0 ${h - 30} 0 ${h - 70} Z`;
    return { size, d, points: [lm('top-left', 'corner', { x: 0, y: 0 }), lm('top-right', 'corner', { x: w, y: 0 })] };
  });
  return { name: 'front pocket bag', outlines, lines: [{ role: 'grain', name: 'grain', d: 'M80 20 L80 180' }], edges: [], cut: { count: 2, onFold: false }, seamAllowanceIncluded: false };
}

/** Back patch pocket: a pentagon graded 4 mm a size step. */
function backPocketPiece(): Piece {
  const outlines: Outline[] = DEMO_SIZES.map((size, i) => {
    const w = 130 + 4 * i;
    const h = 140 + 4 * i;
    const d = `M0 0 L${w} 0 L${w} ${h - 20} L${w / 2} ${h} L0 ${h - 20} Z`;
    return { size, d, points: [lm('top-left', 'corner', { x: 0, y: 0 }), lm('top-right', 'corner', { x: w, y: 0 }), lm('point', 'corner', { x: w / 2, y: h })] };
  });
  return { name: 'back pocket', outlines, lines: [{ role: 'grain', name: 'grain', d: 'M20 20 L20 100' }], edges: [], cut: { count: 2, onFold: false }, seamAllowanceIncluded: false };
}

/** The demo pattern, built fresh on each call (plain data, safe to mutate by the caller). */
export function demoPattern(): Pattern {
  return {
    version: PATTERN_VERSION,
    units: 'mm',
    name: 'Demo five-pocket trousers',
    pieces: [legPiece(false), legPiece(true), yokePiece(), waistbandPiece(), pocketBagPiece(), backPocketPiece()],
  };
}
