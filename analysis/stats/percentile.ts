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
  const finite: number[] = [];
  for (let i = 0; i < values.length; i++) if (Number.isFinite(values[i]!)) finite.push(values[i]!);
  if (finite.length < 2) return undefined;
  const sorted = Float64Array.from(finite).sort();
  return [percentileSorted(sorted, 0.025)!, percentileSorted(sorted, 0.975)!];
}
