/**
 * Percentile of a sample by linear interpolation between order statistics
 * (Hyndman & Fan 1996, definition 7, the default of most statistics packages).
 *
 * @param sorted values sorted ascending (not checked for speed; must be finite)
 * @param p probability in [0, 1]
 * @returns the p-quantile; undefined for an empty sample
 * @throws RangeError when p is outside [0, 1]
 * @see Hyndman, R.J. & Fan, Y. (1996) Sample quantiles in statistical packages. Am. Stat. 50, 361–365.
 */
export function percentileSorted(sorted: ArrayLike<number>, p: number): number | undefined {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`percentileSorted: p must be in [0, 1], got ${p}`);
  const n = sorted.length;
  if (n === 0) return undefined;
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(n - 1, lo + 1);
  return sorted[lo]! + (h - lo) * (sorted[hi]! - sorted[lo]!);
}

/**
 * 95 % percentile interval [2.5 %, 97.5 %] of a sample (sorted internally, finite values only).
 *
 * @param values bootstrap replicates (non-finite entries are ignored)
 * @returns [lower, upper], or undefined when fewer than 2 finite values remain
 * @see Efron, B. & Tibshirani, R.J. (1993) An Introduction to the Bootstrap, ch. 13 (percentile interval).
 */
export function interval95(values: ArrayLike<number>): [number, number] | undefined {
  const work = new Float64Array(values.length);
  let n = 0;
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i]!)) work[n++] = values[i]!;
  if (n < 2) return undefined;
  return [percentileSelect(work, n, 0.025)!, percentileSelect(work, n, 0.975)!];
}

/** Rearranges a[lo..hi] so that a[k] holds the value it would have if sorted (Hoare's selection). */
function selectInPlace(a: Float64Array, k: number, lo: number, hi: number): void {
  while (hi > lo) {
    const mid = (lo + hi) >> 1;
    // Median-of-three pivot.
    if (a[mid]! < a[lo]!) swap(a, mid, lo);
    if (a[hi]! < a[lo]!) swap(a, hi, lo);
    if (a[hi]! < a[mid]!) swap(a, hi, mid);
    const pivot = a[mid]!;
    let i = lo;
    let j = hi;
    while (i <= j) {
      while (a[i]! < pivot) i++;
      while (a[j]! > pivot) j--;
      if (i <= j) {
        swap(a, i, j);
        i++;
        j--;
      }
    }
    if (k <= j) hi = j;
    else if (k >= i) lo = i;
    else return;
  }
}

function swap(a: Float64Array, i: number, j: number): void {
  const t = a[i]!;
  a[i] = a[j]!;
  a[j] = t;
}

/**
 * Percentile (Hyndman & Fan 1996 definition 7) of the first `n` values of a work array,
 * by selection in O(n) instead of sorting; the array order is changed.
 *
 * @param a work array (finite values in a[0..n−1])
 * @param n number of values
 * @param p probability in [0, 1]
 * @returns the p-quantile, or undefined when n = 0
 */
export function percentileSelect(a: Float64Array, n: number, p: number): number | undefined {
  if (n === 0) return undefined;
  const h = (n - 1) * p;
  const lo = Math.floor(h);
  selectInPlace(a, lo, 0, n - 1);
  const vLo = a[lo]!;
  if (lo + 1 >= n || h === lo) return vLo;
  let vHi = Number.POSITIVE_INFINITY;
  for (let i = lo + 1; i < n; i++) if (a[i]! < vHi) vHi = a[i]!;
  return vLo + (h - lo) * (vHi - vLo);
}
