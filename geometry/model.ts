/**
 * The Blockwright pattern format: versioned, serialisable plain data, validated with zod.
 * Units are millimetres, y grows downward; every `d` is SVG path data in millimetres.
 *
 * Contract (issue 3): `{ units: "mm", pieces: [{ name, outlines: [{ size, d }], lines: [{ role, name, d }] }] }`.
 * Everything else is optional with defaults, so a file with only the contract fields parses.
 */
import { z } from 'zod';
import { type Contour, type Path, PathDataError, contourNearest, pathFromSvg } from './path.ts';
import { sizeNumber } from './sizes.ts';
import { POINT_EPSILON } from './tolerance.ts';
import { type Point, vecHypot } from './vec.ts';

/** The current format version. A file without `version` is read as version 1. */
export const PATTERN_VERSION = 1;

/** How far (mm) a landmark may lie from its outline and still count as on it. */
export const LANDMARK_SNAP = 0.5;

const label = z.string().trim().min(1, 'must not be empty').max(120, 'is longer than 120 characters');

/** Roles of internal lines. `lengthen` covers lengthen/shorten and rise lines. */
export const LINE_ROLES = ['lengthen', 'level', 'grain', 'fold', 'internal'] as const;
export type LineRole = (typeof LINE_ROLES)[number];

/** Named stretches of the outline that the trade measures and sews. */
export const EDGE_ROLES = ['waist', 'centre-front', 'centre-back', 'crotch-curve', 'inseam', 'side-seam', 'hem', 'other'] as const;
export type EdgeRole = (typeof EDGE_ROLES)[number];

export const LANDMARK_KINDS = ['corner', 'notch', 'mark'] as const;
export type LandmarkKind = (typeof LANDMARK_KINDS)[number];

export const landmarkSchema = z.object({
  /** Same name in every size of a piece: that is how sizes are matched point for point. */
  name: label,
  /** corner: the outline turns sharply here; notch: a matching mark on the seam; mark: any other point. */
  kind: z.enum(LANDMARK_KINDS),
  x: z.number(),
  y: z.number(),
});
export type Landmark = z.infer<typeof landmarkSchema>;

export const outlineSchema = z.object({
  /** Size label as printed, e.g. "8". Numeric labels allow fractional and extrapolated blends. */
  size: label,
  /** The seam line (or the cut line when seam allowance is included): one closed contour. */
  d: z.string().min(1).max(500_000),
  /** Landmarks on this size's outline, in any order. */
  points: z.array(landmarkSchema).max(500).default([]),
  /** The cut line, when seam allowance has been added by Blockwright. */
  cut: z.string().max(500_000).optional(),
});
export type Outline = z.infer<typeof outlineSchema>;

export const lineSchema = z.object({
  role: z.enum(LINE_ROLES),
  /** e.g. "lower leg" (lengthen), "hip" (level), "rise" (lengthen line used for rise). */
  name: label,
  d: z.string().min(1).max(100_000),
  /** When present the line belongs to one size only (level lines usually move with the grade). */
  size: label.optional(),
});
export type PatternLine = z.infer<typeof lineSchema>;

export const edgeSchema = z.object({
  name: label,
  role: z.enum(EDGE_ROLES),
  /** Landmark names: the edge runs from `from` to `to` following the outline's drawing direction. */
  from: label,
  to: label,
});
export type Edge = z.infer<typeof edgeSchema>;

export const pieceSchema = z.object({
  name: label,
  outlines: z.array(outlineSchema).min(1, 'a piece needs at least one outline').max(60),
  lines: z.array(lineSchema).max(500).default([]),
  edges: z.array(edgeSchema).max(100).default([]),
  /** How many to cut, and whether on the fold (the fold is a line with role "fold"). */
  cut: z.object({ count: z.number().int().min(1).max(50), onFold: z.boolean() }).default({ count: 2, onFold: false }),
  /** True when the outline already includes seam allowance (it is the cut line). */
  seamAllowanceIncluded: z.boolean().default(false),
});
export type Piece = z.infer<typeof pieceSchema>;

export const patternSchema = z
  .object({
    version: z.literal(PATTERN_VERSION).default(PATTERN_VERSION),
    units: z.literal('mm'),
    name: label.optional(),
    pieces: z.array(pieceSchema).min(1, 'a pattern needs at least one piece').max(100),
  })
  .superRefine((pattern, ctx) => {
    const names = new Set<string>();
    pattern.pieces.forEach((piece, pi) => {
      if (names.has(piece.name)) ctx.addIssue({ code: 'custom', path: ['pieces', pi, 'name'], message: `piece name "${piece.name}" is used twice` });
      names.add(piece.name);
      const sizes = new Set<string>();
      piece.outlines.forEach((outline, oi) => {
        const at = ['pieces', pi, 'outlines', oi];
        if (sizes.has(outline.size)) ctx.addIssue({ code: 'custom', path: [...at, 'size'], message: `size "${outline.size}" appears twice in piece "${piece.name}"` });
        sizes.add(outline.size);
        let path: Path;
        try {
          path = pathFromSvg(outline.d);
        } catch (error) {
          ctx.addIssue({ code: 'custom', path: [...at, 'd'], message: (error as Error).message });
          return;
        }
        if (path.length !== 1 || !path[0]!.closed) {
          ctx.addIssue({ code: 'custom', path: [...at, 'd'], message: `the outline of "${piece.name}" size "${outline.size}" must be one closed contour (found ${path.length} contour(s)${path[0] && !path[0].closed ? ', not closed' : ''})` });
          return;
        }
        const seen = new Set<string>();
        outline.points.forEach((lm, li) => {
          if (seen.has(lm.name)) ctx.addIssue({ code: 'custom', path: [...at, 'points', li, 'name'], message: `landmark "${lm.name}" appears twice` });
          seen.add(lm.name);
          const near = contourNearest(path[0]!, lm);
          if (near.distance > LANDMARK_SNAP)
            ctx.addIssue({ code: 'custom', path: [...at, 'points', li], message: `landmark "${lm.name}" lies ${near.distance.toFixed(2)} mm from the outline of size "${outline.size}"` });
        });
        for (const edge of piece.edges)
          for (const end of [edge.from, edge.to])
            if (!seen.has(end)) ctx.addIssue({ code: 'custom', path: [...at, 'points'], message: `edge "${edge.name}" needs landmark "${end}", missing in size "${outline.size}"` });
      });
      piece.lines.forEach((line, li) => {
        try {
          const p = pathFromSvg(line.d);
          if (p.length === 0) ctx.addIssue({ code: 'custom', path: ['pieces', pi, 'lines', li, 'd'], message: `line "${line.name}" has no segments` });
        } catch (error) {
          ctx.addIssue({ code: 'custom', path: ['pieces', pi, 'lines', li, 'd'], message: (error as Error).message });
        }
        if (line.size !== undefined && !sizes.has(line.size))
          ctx.addIssue({ code: 'custom', path: ['pieces', pi, 'lines', li, 'size'], message: `line "${line.name}" names size "${line.size}", which piece "${piece.name}" does not have` });
      });
    });
  });
export type Pattern = z.infer<typeof patternSchema>;
/** The input shape (before defaults): what a file may contain. */
export type PatternInput = z.input<typeof patternSchema>;

/** Thrown for a pattern that does not match the format. `issues` lists each problem with where it is. */
export class PatternError extends Error {
  override readonly name = 'PatternError';
  constructor(
    message: string,
    readonly issues: readonly { path: string; message: string }[] = [],
  ) {
    super(message);
  }
}

function formatPath(path: readonly PropertyKey[]): string {
  return path.map((p) => (typeof p === 'number' ? `[${p}]` : `.${String(p)}`)).join('').replace(/^\./, '') || '(root)';
}

/** Validate and fill defaults. Throws PatternError listing every problem; the input is not changed. */
export function parsePattern(input: unknown): Pattern {
  const result = patternSchema.safeParse(input);
  if (result.success) return result.data;
  const issues = result.error.issues.map((i) => ({ path: formatPath(i.path), message: i.message }));
  const first = issues[0]!;
  throw new PatternError(`invalid pattern: ${first.path}: ${first.message}${issues.length > 1 ? ` (and ${issues.length - 1} more)` : ''}`, issues);
}

/** The single closed contour of an outline. Throws PathDataError if it is not one closed contour. */
export function outlineContour(outline: Pick<Outline, 'd' | 'size'>): Contour {
  const p = pathFromSvg(outline.d);
  if (p.length !== 1 || !p[0]!.closed) throw new PathDataError(`the outline of size "${outline.size}" is not one closed contour`);
  return p[0]!;
}


/** Every size label of the pattern, smallest first when they are all numbers, else in the order met. */
export function patternSizes(pattern: Pattern): string[] {
  const seen: string[] = [];
  for (const piece of pattern.pieces) for (const o of piece.outlines) if (!seen.includes(o.size)) seen.push(o.size);
  return seen.every((s) => sizeNumber(s) !== undefined) ? seen.sort((a, b) => sizeNumber(a)! - sizeNumber(b)!) : seen;
}

/** The body levels a trouser pattern marks, from the waist down (level lines with these names). */
export const BODY_LEVELS = ['hip', 'crotch', 'thigh', 'knee', 'calf'] as const;

/**
 * The outlines of a piece ordered smallest to largest: by numeric value when every label is a
 * number, else in the order they are listed.
 */
export function orderedOutlines(piece: Piece): Outline[] {
  const nums = piece.outlines.map((o) => sizeNumber(o.size));
  if (nums.every((n) => n !== undefined)) return [...piece.outlines].sort((a, b) => sizeNumber(a.size)! - sizeNumber(b.size)!);
  return [...piece.outlines];
}

/** Lines of a piece that apply to a given size: those without a size and those for that size. */
export function linesForSize(piece: Piece, size: string): PatternLine[] {
  return piece.lines.filter((l) => l.size === undefined || l.size === size);
}

/** Find a landmark by name in an outline. */
export function landmarkOf(outline: Outline, name: string): Landmark | undefined {
  return outline.points.find((p) => p.name === name);
}

/** Same point within POINT_EPSILON; for tests and callers comparing landmarks. */
export function samePoint(a: Point, b: Point): boolean {
  return vecHypot(a.x - b.x, a.y - b.y) <= POINT_EPSILON;
}
