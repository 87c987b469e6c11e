import quickselect from "quickselect";

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
  // Floyd–Rivest selection (the quickselect package) on the finite values; the order statistics it
  // leaves at lo (and lo + 1) are unique, whatever the order of the rest.
  const values = a as unknown as number[];
  if (lo + 1 >= n || h === lo) {
    quickselect(values, lo, 0, n - 1);
    return a[lo]!;
  }
  let vLo = Number.NEGATIVE_INFINITY,
    vHi = Number.POSITIVE_INFINITY;
  if (2 * lo < n) {
    // Lower tail: select order statistic lo + 1; order statistic lo is the largest before it.
    quickselect(values, lo + 1, 0, n - 1);
    vHi = a[lo + 1]!;
    for (let i = 0; i <= lo; i++) if (a[i]! > vLo) vLo = a[i]!;
  } else {
    // Upper tail: select order statistic lo; order statistic lo + 1 is the smallest after it.
    quickselect(values, lo, 0, n - 1);
    vLo = a[lo]!;
    for (let i = lo + 1; i < n; i++) if (a[i]! < vHi) vHi = a[i]!;
  }
  return vLo + (h - lo) * (vHi - vLo);
}
