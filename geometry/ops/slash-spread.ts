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
 * piece). Curves in the rigidly turned part stay exact; in the zone they are redrawn smoothly
 * through points 3 mm apart.
 *
 * Refused: |θ| above 60°; E and H closer than 10 mm; any part of the piece lying behind the
 * hinge (where the turn would have to be undone), which would fold the outline.
 */
import { z } from 'zod';
import type { Pattern, Piece } from '../model.ts';
import { outlineContour } from '../model.ts';
import { type Path, segmentLength, segmentPoint, segmentTransform, type Segment, contourFlattenShared } from '../path.ts';
import { TRUE_ZONE } from '../tolerance.ts';
import { type Point, affineRotate, vecAngleBetween, vecDistance, vecCross, vecRotateAbout, vecSub } from '../vec.ts';
import { AlterationError, type Caution, type OpResult, assertSimple, fmtMm, mapLine, mapOutline, pieceGrain, smoothThrough } from './common.ts';

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
}

function wedgeMap(hinge: Point, e: Point, side: 1 | -1, theta: number, zone: number): WedgeMap {
  const ray = vecSub(e, hinge);
  const w = Math.min(zone / vecDistance(e, hinge), Math.PI / 6);
  const lo = -w / 2;
  const hiOld = w / 2 + Math.max(0, -theta);
  const hiNew = w / 2 + Math.max(0, theta);
  // ψ: signed angle from the slash ray, positive toward the moving side
  const psi = (p: Point): number => side * vecAngleBetween(ray, vecSub(p, hinge));
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
  return {
    turn,
    map: (p) => vecRotateAbout(p, hinge, turn(p)),
    region: (p) => {
      const s = psi(p);
      return s <= lo ? 0 : s < hiOld ? 2 : 1;
    },
  };
}

function mapSegment(s: Segment, m: WedgeMap, rigid: ReturnType<typeof affineRotate>): Segment[] {
  const len = segmentLength(s, 1e-3);
  const k = Math.max(2, Math.ceil(len / 2));
  // probe until the regions differ (or one is the zone): then the segment is redrawn
  const first = m.region(segmentPoint(s, 0));
  let uniform = first !== 2;
  for (let i = 1; i <= k && uniform; i++) uniform = m.region(segmentPoint(s, i / k)) === first;
  if (uniform && first === 0) return [s];
  if (uniform && first === 1) return [segmentTransform(s, rigid)];
  const n = Math.max(2, Math.ceil(len / 3));
  return smoothThrough(Array.from({ length: n + 1 }, (_, i) => m.map(segmentPoint(s, i / n))));
}

export function performSlashSpread(pattern: Pattern, input: SlashSpreadOp): OpResult {
  const op = slashSpreadOpSchema.parse(input);
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
    const out = p.map((c) => ({
      closed: c.closed,
      segments: c.segments.flatMap((s) => {
        const r = mapSegment(s, m, rigid);
        if (r.length !== 1 || r[0] !== s) changed = true;
        return r;
      }),
    }));
    return changed ? out : p;
  };
  const piece: Piece = {
    ...target,
    outlines: target.outlines.map((o) => {
      // nothing of the piece may lie behind the hinge on the moving side's far boundary
      for (const f of contourFlattenShared(outlineContour(o), 0.1)) {
        const d = vecDistance(f.point, op.hinge);
        if (d < 1) continue;
        const s = side * vecAngleBetween(ray, vecSub(f.point, op.hinge));
        if (s + theta > Math.PI - 1e-9 || (theta < 0 && s > Math.PI + theta))
          throw new AlterationError('fold', `slash-spread on "${target.name}" size "${o.size}": part of the piece lies behind the hinge near (${f.point.x.toFixed(1)}, ${f.point.y.toFixed(1)}); the wedge would fold the outline — put the hinge on the far edge`, f.point);
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
