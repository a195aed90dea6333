/**
 * Named tolerances for geometry/. Units: millimetres (mm), radians, mm² for areas.
 *
 * Every approximate function takes an optional tolerance that defaults to one of these.
 * Each value says why it is what it is. Change a value only with its reason.
 */

/**
 * Two points closer than this are the same point (mm).
 * Reason: pattern coordinates stay below 1e4 mm; doubles carry ~16 significant digits, so
 * round-off after a few hundred splits/transforms is ~1e-10 mm. 1e-6 mm leaves 4 orders of
 * margin and is still 4 orders below anything a printer (0.04 mm dot at 600 dpi) can show.
 */
export const POINT_EPSILON = 1e-6;

/**
 * Curve parameters t closer than this are the same parameter (dimensionless, t in [0, 1]).
 * Reason: root finders converge to ~1e-12; 1e-9 absorbs their error while a trouser curve of
 * 1 m moves at most ~1e-6 mm per 1e-9 of t.
 */
export const PARAM_EPSILON = 1e-9;

/**
 * Directions closer than this angle are parallel (radians).
 * Reason: below 1e-9 rad the sine and the angle agree to double precision; line–line
 * intersection over 1 m then moves by < 1e-6 mm.
 */
export const ANGLE_EPSILON = 1e-9;

/**
 * Areas smaller than this are zero (mm²).
 * Reason: a 1 m × 1e-6 mm sliver; anything smaller is round-off, not a piece.
 */
export const AREA_EPSILON = 1e-3;

/**
 * Default flattening tolerance: the greatest distance between a curve and the polyline that
 * replaces it (mm). Reason: 0.01 mm is a quarter of a 600-dpi printer dot and 1/100 of the
 * ±1 mm per 10 cm that a home print may be off by (trade reference §5.4), so a flattened
 * outline prints and measures the same as the curve.
 */
export const FLATNESS = 0.01;

/**
 * Default absolute error for arc length by adaptive quadrature (mm).
 * Reason: a thousand times below FLATNESS, so summed over the ~50 segments of an outline the
 * length error stays far below anything measurable with a tape (0.5 mm).
 */
export const LENGTH_TOLERANCE = 1e-5;

/**
 * A path whose last point lies within this distance of its first point is treated as closed
 * on import (mm). Reason: drawing programs often leave a rounding gap of ~1e-3 mm instead of
 * writing Z; 0.01 mm is below printing precision, so closing it changes nothing visible.
 */
export const CLOSE_GAP = 0.01;

/**
 * Default paired-seam tolerance (mm): two seams that will be sewn together are reported as
 * matching when their lengths differ by no more than this.
 * Reason: trade reference §3.11, notch-match tolerance "within about 2–3 mm"
 * (common practice, no source); we take the stricter end.
 */
export const PAIRED_SEAM_TOLERANCE = 2;

/**
 * How far (degrees) the front and back crotch curves, laid together at the inseam, may turn
 * where they meet and still count as one smooth curve (trade reference §3.11 shape checks).
 * Reason, our own threshold (no source): a turn of k° shows as a step of about sin(k) × the
 * seam allowance at the allowance's edge; 5° at 5/8 in (15.9 mm) is 1.4 mm, inside
 * PAIRED_SEAM_TOLERANCE.
 */
export const CROTCH_JOIN_TOLERANCE_DEG = 5;

/**
 * Default width of the truing zone of a parallel spread (mm, measured along the grain).
 * The jog that a lengthen/shorten or rise leaves in a slanted edge is blended over this
 * band, centred on the line. Reason: trade reference §3.1 asks for the step to be bridged
 * "from an unchanged point before the altered zone to one after it"; 30 mm (15 mm each side)
 * is a hand's-width blend used in home sewing instructions (common practice, no source),
 * short enough that level lines 5 cm away are untouched.
 */
export const TRUE_ZONE = 30;

/**
 * Default spacing of the correspondence samples used by blend (mm of arc length, on the
 * longest size). Reason: between samples the blended outline is a Catmull-Rom cubic; for the
 * tightest trouser curve (crotch, radius ≥ 30 mm) a 4 mm spacing keeps it within ~1e-3 mm of
 * the size line it follows.
 */
export const BLEND_SAMPLE_SPACING = 4;

/**
 * How far (mm) a merged cubic may pass from the points it replaces when a redrawn curve
 * (blend, girth, slash-spread) is simplified. Reason: a fifth of FLATNESS, so merging is
 * invisible next to flattening, yet a nearly straight 500 mm leg edge becomes one or two
 * cubics instead of a hundred.
 */
export const SMOOTH_MERGE_TOLERANCE = 0.002;

/**
 * How far (mm) a curve redrawn under a smooth but non-affine map (girth's displacement field,
 * the truing zone of slash-spread) may lie from the exact image of the original curve,
 * measured between points of the same curve parameter (which bounds the distance between the
 * two curves either way). Reason: a fifth of FLATNESS, like SMOOTH_MERGE_TOLERANCE, so the
 * redraw is invisible next to flattening. Checked at REDRAW_CHECKS evenly spaced parameters
 * inside each cubic (see redrawMapped in ops/common.ts); tests compare against thousands of
 * points of the exact image.
 */
export const REDRAW_TOLERANCE = 0.002;

/**
 * Interior parameters at which each redrawn cubic is compared with the exact image (see
 * REDRAW_TOLERANCE). Reason: the error of a Hermite cubic with the exact end derivatives is a
 * smooth bump vanishing to second order at both ends; 15 checks sample it at 1/16 steps, so
 * its largest value between two checks exceeds the largest checked value by far less than the
 * tolerance (the tests measure it: up to 1.2 % of REDRAW_TOLERANCE seen; they allow 5 %).
 */
export const REDRAW_CHECKS = 15;

/**
 * The smallest angle a lengthen or rise line may make with the grain line (radians, 30°).
 * Reason: moving a part "along the grain" across a line nearly parallel to the grain would
 * shear the piece instead of lengthening it; real lengthen lines are square to the grain.
 */
export const MIN_LINE_GRAIN_ANGLE = Math.PI / 6;

/**
 * Shrinkage (fraction, per direction) beyond which the compensation is refused.
 * Reason: trade reference §4.4 says industry builds in up to about 7–8 % and pre-shrinks
 * beyond that (common practice, no source); 30 % is far past any sensible cloth, so larger
 * values are taken as typing errors (e.g. 50 meant as 5.0 %).
 */
export const MAX_SHRINKAGE = 0.3;
