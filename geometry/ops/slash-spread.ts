/**
 * Slash and spread about a hinge (trade reference §3.1 wedge spread; §3.5–3.8 uses).
 *
 * The slash runs from `from` (a point on an edge, E) to `hinge` (a point on another seam
 * line, H). The part on the moving side of the slash turns about H by `angle` (radians,
 * positive opens a wedge at E, negative closes one), or by the angle that opens the chord
 * `amount` mm at E: θ = 2·asin(amount / (2·|HE|)) (§3.1). Which part moves: `move` = "waist"
 * (the side toward the waist, default), "hem", or a point on the moving side.
 *
 * Truing: the wedge is spread over an angular zone about the slash that is `trueZone` mm wide
 * at E, so the edge through E is blended, not stepped; the edge through H only bends at H and
 * keeps its length. A closing wedge folds out on the moving side (+θ then −θ restores the
 * piece). Segments are cut where they cross the zone's boundary rays (the lines through the
 * hinge at the zone's two angles): parts outside the zone stay exact (unchanged, or turned
 * rigidly); parts inside it are redrawn within REDRAW_TOLERANCE of their exact image
 * (redrawMapped, with the wedge map's derivative).
 *
 * Refused: |θ| above 60°; E and H closer than 10 mm; any part of the piece lying behind the
 * hinge (where the turn would have to be undone), which would fold the outline.
 */
import { z } from 'zod';
import type { Pattern, Piece } from '../model.ts';
import { outlineContour } from '../model.ts';
import { type Path, contourOf, segmentSlice, segmentTransform, type Segment, contourFlatPoints } from '../path.ts';
import { REDRAW_CHECKS, TRUE_ZONE } from '../tolerance.ts';
import { type Point, affineRotate, vecAngleBetween, vecDistance, vecCross, vecDot, vecHypot, vecRotate, vecRotateAbout, vecSub } from '../vec.ts';
import { AlterationError, type Caution, type OpResult, type SmoothPlaneMap, assertSimple, fmtMm, mapLine, mapOutline, pieceGrain, redrawMapped, segmentCutTimes, segmentPointThen } from './common.ts';

const point = z.object({ x: z.number(), y: z.number() });

export const slashSpreadOpSchema = z
  .object({
    op: z.literal('slash-spread'),
    piece: z.string().min(1),
    from: point,
    hinge: point,
    angle: z.number().min(-Math.PI / 3).max(Math.PI / 3).optional(),
    amount: z.number().min(-300).max(300).optional(),
    move: z.union([z.enum(['waist', 'hem']), point]).default('waist'),
    trueZone: z.number().positive().max(200).optional(),
  })
  .refine((o) => (o.angle === undefined) !== (o.amount === undefined), { message: 'give either angle or amount, not both' });
export type SlashSpreadOp = z.input<typeof slashSpreadOpSchema>;

/** θ that opens a chord `amount` at distance `radius` from the hinge: 2·asin(a / 2r). */
export function wedgeAngle(amount: number, radius: number): number {
  const k = amount / (2 * radius);
  if (Math.abs(k) >= 1) throw new AlterationError('bad-amount', `an opening of ${fmtMm(amount)} is more than the slash (${fmtMm(radius)}) can open`);
  return 2 * Math.asin(k);
}

interface WedgeMap {
  /** rotation (radians) applied at angular position psi */
  readonly turn: (p: Point) => number;
  readonly map: (p: Point) => Point;
  /** 0 = fixed, 1 = turned rigidly, 2 = in the zone */
  readonly region: (p: Point) => 0 | 1 | 2;
  /** The same as region, for a point given by its coordinates. */
  readonly regionXY: (x: number, y: number) => 0 | 1 | 2;
  /** The lines through the hinge along the zone's boundary rays. */
  readonly cuts: readonly { readonly origin: Point; readonly direction: Point }[];
  /** map with its derivative (redrawMapped) */
  readonly smooth: SmoothPlaneMap;
}

function wedgeMap(hinge: Point, e: Point, side: 1 | -1, theta: number, zone: number): WedgeMap {
  const ray = vecSub(e, hinge);
  const w = Math.min(zone / vecDistance(e, hinge), Math.PI / 6);
  const lo = -w / 2;
  const hiOld = w / 2 + Math.max(0, -theta);
  const hiNew = w / 2 + Math.max(0, theta);
  // ψ: signed angle from the slash ray, positive toward the moving side
  // (vecAngleBetween(ray, vecSub(p, hinge)) written out on numbers, so no point objects are made)
  const psiXY = (x: number, y: number): number => {
    const vx = x - hinge.x;
    const vy = y - hinge.y;
    return side * Math.atan2(ray.x * vy - ray.y * vx, ray.x * vx + ray.y * vy);
  };
  const psi = (p: Point): number => psiXY(p.x, p.y);
  const f = (s: number): number => {
    if (s <= lo) return s;
    if (s < hiOld) return lo + ((s - lo) * (hiNew - lo)) / (hiOld - lo);
    return s + theta;
  };
  const turn = (p: Point): number => {
    if (vecDistance(p, hinge) < 1e-9) return 0;
    const s = psi(p);
    return side * (f(s) - s);
  };
  const regionXY = (x: number, y: number): 0 | 1 | 2 => {
    const s = psiXY(x, y);
    return s <= lo ? 0 : s < hiOld ? 2 : 1;
  };
  // inside the zone the turn is side·(f(s) − s) = side·(r − 1)·(s − lo), s = side·angle(ray, p − H),
  // so its gradient is (r − 1)·∇angle = (r − 1)·perp(v)/|v|², v = p − H
  const r = (hiNew - lo) / (hiOld - lo);
  const smooth: SmoothPlaneMap = (x, y, out) => {
    // turn(p) and region(p) below, with the distance to the hinge and the angle ψ found once;
    // the rotation about the hinge is vecRotateAbout's arithmetic on numbers
    const vx = x - hinge.x;
    const vy = y - hinge.y;
    const near = vecHypot(vx, vy) < 1e-9;
    const s = near ? 0 : psiXY(x, y);
    const a = near ? 0 : side * (f(s) - s);
    const c = Math.cos(a);
    const sn = Math.sin(a);
    out[0] = hinge.x + (vx * c - vy * sn);
    out[1] = hinge.y + (vx * sn + vy * c);
    out[2] = c;
    out[3] = -sn;
    out[4] = sn;
    out[5] = c;
    const v2 = vx * vx + vy * vy;
    if (near || s <= lo || !(s < hiOld)) return; // not in the zone (region(p) !== 2)
    // J = R + (R·perp(v)) ⊗ ∇turn
    const wx = c * -vy - sn * vx;
    const wy = sn * -vy + c * vx;
    const gx = ((r - 1) * -vy) / v2;
    const gy = ((r - 1) * vx) / v2;
    out[2] = c + wx * gx;
    out[3] = -sn + wx * gy;
    out[4] = sn + wy * gx;
    out[5] = c + wy * gy;
  };
  return {
    turn,
    map: (p) => vecRotateAbout(p, hinge, turn(p)),
    region: (p) => regionXY(p.x, p.y),
    regionXY,
    cuts: [
      { origin: hinge, direction: vecRotate(ray, side * lo) },
      { origin: hinge, direction: vecRotate(ray, side * hiOld) },
    ],
    smooth,
  };
}

/** Push the image of a segment onto `out`; false when it is the segment itself (it lies wholly where nothing moves). */
function mapSegmentInto(s: Segment, m: WedgeMap, rigid: ReturnType<typeof affineRotate>, out: Segment[]): boolean {
  // parts between the zone's boundary lines lie wholly in one region; its middle decides, and
  // the redraw checks are probed too (a tangent touch whose root round-off lost, or a segment
  // running behind the hinge, where the angle wraps round)
  const cuts = segmentCutTimes(s, m.cuts);
  const ts = [0];
  for (let i = 0; i < cuts.length; i++) ts.push(cuts[i]!);
  ts.push(1);
  const regions: (0 | 1 | 2)[] = [];
  for (let i = 1; i < ts.length; i++) {
    const [t0, t1] = [ts[i - 1]!, ts[i]!];
    let region = segmentPointThen(s, (t0 + t1) / 2, m.regionXY);
    for (let k = 1; k <= REDRAW_CHECKS && region !== 2; k++) if (segmentPointThen(s, t0 + ((t1 - t0) * k) / (REDRAW_CHECKS + 1), m.regionXY) !== region) region = 2;
    regions.push(region);
  }
  if (regions.length === 1 && regions[0] === 0) {
    out.push(s);
    return false;
  }
  if (regions.length === 1 && regions[0] === 1) {
    out.push(segmentTransform(s, rigid));
    return true;
  }
  for (let i = 1; i < ts.length; i++) {
    const [t0, t1] = [ts[i - 1]!, ts[i]!];
    const region = regions[i - 1]!;
    if (region === 2) {
      const redrawn = redrawMapped(s, t0, t1, m.smooth);
      for (let k = 0; k < redrawn.length; k++) out.push(redrawn[k]!);
    }
    else {
      const part = segmentSlice(s, t0, t1);
      out.push(region === 0 ? part : segmentTransform(part, rigid));
    }
  }
  return true;
}

export function performSlashSpread(pattern: Pattern, input: SlashSpreadOp): OpResult {
  return performSlashSpreadParsed(pattern, slashSpreadOpSchema.parse(input));
}

/** performSlashSpread for an operation slashSpreadOpSchema has already parsed (applyOps parses each once). */
export function performSlashSpreadParsed(pattern: Pattern, op: z.output<typeof slashSpreadOpSchema>): OpResult {
  const target = pattern.pieces.find((p) => p.name === op.piece);
  if (!target) throw new AlterationError('missing-piece', `there is no piece named "${op.piece}"`);
  const radius = vecDistance(op.from, op.hinge);
  if (radius < 10) throw new AlterationError('bad-amount', `the slash from ${JSON.stringify(op.from)} to the hinge is shorter than 10 mm`);
  const theta = op.angle ?? wedgeAngle(op.amount!, radius);
  if (Math.abs(theta) > Math.PI / 3) throw new AlterationError('bad-amount', `a wedge of ${((theta * 180) / Math.PI).toFixed(1)}° is more than 60°`);
  const ray = vecSub(op.from, op.hinge);
  let side: 1 | -1;
  if (typeof op.move === 'object') side = vecCross(ray, vecSub(op.move, op.hinge)) >= 0 ? 1 : -1;
  else {
    const g = pieceGrain(target);
    const toward = op.move === 'waist' ? { x: -g.x, y: -g.y } : g;
    side = vecCross(ray, toward) >= 0 ? 1 : -1;
  }
  const m = wedgeMap(op.hinge, op.from, side, theta, op.trueZone ?? TRUE_ZONE);
  const rigid = affineRotate(side * theta, op.hinge);
  const mapPath = (p: Path): Path => {
    let changed = false;
    const out = p.map((c) => {
      const segments = new Array<Segment>();
      for (let i = 0; i < c.segments.length; i++) if (mapSegmentInto(c.segments[i]!, m, rigid, segments)) changed = true;
      return contourOf(segments, c.closed);
    });
    return changed ? out : p;
  };
  const piece: Piece = {
    ...target,
    outlines: target.outlines.map((o) => {
      // nothing of the piece may lie behind the hinge on the moving side's far boundary
      for (const p of contourFlatPoints(outlineContour(o), 0.1)) {
        const d = vecDistance(p, op.hinge);
        if (d < 1) continue;
        const v = vecSub(p, op.hinge);
        // within 90° of the slash (atan2 of a non-negative x is within ±π/2) a point cannot turn
        // past the far boundary: that takes more than π − |θ| ≥ 120°
        if (vecDot(ray, v) >= 0) continue;
        const s = side * vecAngleBetween(ray, v);
        if (s + theta > Math.PI - 1e-9 || (theta < 0 && s > Math.PI + theta))
          throw new AlterationError('fold', `slash-spread on "${target.name}" size "${o.size}": part of the piece lies behind the hinge near (${p.x.toFixed(1)}, ${p.y.toFixed(1)}); the wedge would fold the outline — put the hinge on the far edge`, p);
      }
      const mapped = mapOutline(o, mapPath, m.map);
      assertSimple(outlineContour(mapped), `slash-spread on "${target.name}" size "${o.size}"`);
      return mapped;
    }),
    lines: target.lines.map((l) => mapLine(l, mapPath)),
  };
  const cautions: Caution[] = [];
  if (Math.abs(theta) > (15 * Math.PI) / 180) cautions.push({ code: 'large-change', piece: target.name, message: `a wedge of ${((theta * 180) / Math.PI).toFixed(1)}° is a large change: sew a test garment first` });
  return { pattern: { ...pattern, pieces: pattern.pieces.map((p) => (p === target ? piece : p)) }, cautions };
}
