/**
 * Ordering for the sweeps over x (self-crossing check, seam allowance): indices sorted by a key
 * without a comparator callback. A stable merge sort (insertion-sorted runs of 16, then merged
 * bottom-up), so equal keys keep their index order, as a stable comparator sort leaves them.
 */
export function orderByKey(key: Float64Array, count: number): Int32Array {
  let src = new Int32Array(count);
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
  let dst = new Int32Array(count);
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
