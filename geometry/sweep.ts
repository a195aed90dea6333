/**
 * Ordering for the sweeps over x or y (self-crossing check, seam allowance): indices sorted by a
 * key without a comparator callback, stably (equal keys keep their index order, as a stable
 * comparator sort leaves them; a stable order is unique, so any stable method gives the same).
 * The keys of a polygon's edges taken in order rise and fall in long stretches, so the sort
 * merges those natural runs (a strictly falling run is reversed, which keeps it stable); keys
 * without such runs go to a plain merge sort (insertion-sorted runs of 16, merged bottom-up).
 * The order is in the first `count` entries of a scratch array (see scratchF64): read it before
 * the next call.
 */
export function orderByKey(key: Float64Array, count: number): Int32Array {
  const src = scratchI32(ORDER_A, count);
  const starts = scratchI32(ORDER_RUNS, count + 1);
  let runs = 0;
  for (let i = 0; i < count; ) {
    let j = i + 1;
    if (j < count && key[j]! < key[i]!) {
      while (j < count && key[j]! < key[j - 1]!) j++;
      for (let k = i; k < j; k++) src[k] = i + j - 1 - k;
    } else {
      while (j < count && key[j]! >= key[j - 1]!) j++;
      for (let k = i; k < j; k++) src[k] = k;
    }
    starts[runs++] = i;
    i = j;
  }
  if (runs * 8 > count) return orderByMerge(key, count);
  starts[runs] = count;
  return mergeRuns(key, src, scratchI32(ORDER_B, count), starts, runs);
}

/** Merge the sorted runs src[starts[r] .. starts[r + 1]) pairwise until one is left (stable: the left run wins ties). */
function mergeRuns(key: Float64Array, first: Int32Array, second: Int32Array, starts: Int32Array, runCount: number): Int32Array {
  let src = first;
  let dst = second;
  let runs = runCount;
  while (runs > 1) {
    let w = 0;
    for (let r = 0; r < runs; r += 2) {
      const lo = starts[r]!;
      const mid = starts[r + 1]!;
      const hi = r + 2 <= runs ? starts[r + 2]! : mid;
      let i = lo;
      let j = mid;
      let k = lo;
      while (i < mid && j < hi) dst[k++] = key[src[j]!]! < key[src[i]!]! ? src[j++]! : src[i++]!;
      while (i < mid) dst[k++] = src[i++]!;
      while (j < hi) dst[k++] = src[j++]!;
      starts[w++] = lo;
    }
    starts[w] = starts[runs]!;
    runs = w;
    const t = src;
    src = dst;
    dst = t;
  }
  return src;
}

/** orderByKey without natural runs: insertion-sorted runs of 16, merged bottom-up. */
function orderByMerge(key: Float64Array, count: number): Int32Array {
  let src = scratchI32(ORDER_A, count);
  for (let i = 0; i < count; i++) src[i] = i;
  const RUN = 16;
  for (let lo = 0; lo < count; lo += RUN) {
    const hi = Math.min(count, lo + RUN);
    for (let i = lo + 1; i < hi; i++) {
      const v = src[i]!;
      const kv = key[v]!;
      let j = i - 1;
      while (j >= lo && key[src[j]!]! > kv) {
        src[j + 1] = src[j]!;
        j--;
      }
      src[j + 1] = v;
    }
  }
  if (count <= RUN) return src;
  let dst = scratchI32(ORDER_B, count);
  for (let width = RUN; width < count; width *= 2) {
    for (let lo = 0; lo < count; lo += 2 * width) {
      const mid = Math.min(count, lo + width);
      const hi = Math.min(count, lo + 2 * width);
      let i = lo;
      let j = mid;
      let k = lo;
      while (i < mid && j < hi) dst[k++] = key[src[j]!]! < key[src[i]!]! ? src[j++]! : src[i++]!;
      while (i < mid) dst[k++] = src[i++]!;
      while (j < hi) dst[k++] = src[j++]!;
    }
    const t = src;
    src = dst;
    dst = t;
  }
  return src;
}

/**
 * Scratch typed arrays, reused from call to call. Making a typed array of a few hundred entries
 * costs a backing store outside the heap and garbage-collector work; the sweeps and the direct
 * cut line made about twenty per outline. Each slot belongs to one function (the slot numbers
 * below); a caller writes every entry it reads before reading it, reads only the first `n`
 * (the array may be longer) and hands nothing out past its own return, so no result depends on
 * what an earlier call left there. Arrays over SCRATCH_MAX entries are made fresh and not kept.
 */
const SCRATCH_MAX = 1 << 16;
const F64_SCRATCH: (Float64Array | undefined)[] = [];
const I32_SCRATCH: (Int32Array | undefined)[] = [];

export function scratchF64(slot: number, n: number): Float64Array {
  if (n > SCRATCH_MAX) return new Float64Array(n);
  let a = F64_SCRATCH[slot];
  if (!a || a.length < n) {
    a = new Float64Array(Math.min(SCRATCH_MAX, Math.max(n, 2 * (a?.length ?? 128))));
    F64_SCRATCH[slot] = a;
  }
  return a;
}

export function scratchI32(slot: number, n: number): Int32Array {
  if (n > SCRATCH_MAX) return new Int32Array(n);
  let a = I32_SCRATCH[slot];
  if (!a || a.length < n) {
    a = new Int32Array(Math.min(SCRATCH_MAX, Math.max(n, 2 * (a?.length ?? 128))));
    I32_SCRATCH[slot] = a;
  }
  return a;
}

/** Int32 slots: orderByKey's two, the self-crossing sweep's active list, the direct cut line's links and active lists. */
const ORDER_A = 0;
const ORDER_B = 1;
const ORDER_RUNS = 8;
export const I32_SLOT = { crossActive: 2, cutRun: 3, cutNext: 4, cutPrev: 5, halvesEdges: 6, halvesProbes: 7, runStart: 9 } as const;
/** Float64 slots: the self-crossing sweep's vertices and boxes, the direct cut line's chords, joins and half-band sides. */
export const F64_SLOT = {
  crossXs: 0,
  crossYs: 1,
  crossMinX: 2,
  crossMaxX: 3,
  crossMinY: 4,
  crossMaxY: 5,
  cutPx: 6,
  cutPy: 7,
  cutDx: 8,
  cutDy: 9,
  cutLen: 10,
  cutWd: 11,
  cutFrom: 12,
  cutTo: 13,
  cutJx: 14,
  cutJy: 15,
  halvesAx: 16,
  halvesAy: 17,
  halvesBx: 18,
  halvesBy: 19,
  halvesLo: 20,
  halvesHi: 21,
  cutOutX: 22,
  cutOutY: 23,
  polygonXs: 24,
  polygonYs: 25,
  runXs: 26,
  runYs: 27,
  halvesVLo: 28,
  halvesVHi: 29,
} as const;
