/**
 * Distribution functions used by the mixing statistics, delegated to jStat
 * (a general-purpose open-source statistics library) behind small typed wrappers
 * that never return NaN.
 */
import jStat from "jstat";

function checkFinite(fn: string, name: string, value: number): void {
  if (!Number.isFinite(value)) throw new RangeError(`${fn}: ${name} must be finite, got ${value}`);
}

/**
 * Upper-tail probability P(F ≥ f) of Fisher's F distribution with (d1, d2) degrees of freedom.
 *
 * @param f observed F statistic (≥ 0; +Infinity gives 0)
 * @param d1 numerator degrees of freedom (> 0)
 * @param d2 denominator degrees of freedom (> 0)
 * @returns probability in [0, 1]
 * @throws RangeError when d1 or d2 is not positive
 * @see Fisher, R.A. (1924); any statistics handbook table of F critical values.
 */
export function fUpperP(f: number, d1: number, d2: number): number {
  if (!(d1 > 0) || !(d2 > 0)) throw new RangeError(`fUpperP: degrees of freedom must be > 0, got ${d1}, ${d2}`);
  if (Number.isNaN(f)) throw new RangeError("fUpperP: f is NaN");
  if (f === Number.POSITIVE_INFINITY) return 0;
  if (f <= 0) return 1;
  return clamp01(1 - jStat.centralF.cdf(f, d1, d2));
}

/**
 * Upper-tail probability P(X² ≥ x) of the chi-squared distribution.
 *
 * @param x observed statistic (≥ 0)
 * @param dof degrees of freedom (> 0)
 * @returns probability in [0, 1]
 * @throws RangeError when dof is not positive
 * @see Pearson, K. (1900); handbook tables of χ² critical values.
 */
export function chiSquareUpperP(x: number, dof: number): number {
  if (!(dof > 0)) throw new RangeError(`chiSquareUpperP: dof must be > 0, got ${dof}`);
  if (Number.isNaN(x)) throw new RangeError("chiSquareUpperP: x is NaN");
  if (x === Number.POSITIVE_INFINITY) return 0;
  if (x <= 0) return 1;
  return clamp01(1 - jStat.chisquare.cdf(x, dof));
}

/**
 * Standard normal cumulative distribution Φ(z).
 *
 * @param z standard score
 * @returns probability in [0, 1]
 */
export function normalCdf(z: number): number {
  checkFinite("normalCdf", "z", z);
  return clamp01(jStat.normal.cdf(z, 0, 1));
}

/** Natural log of the gamma function, for exact combinatorial probabilities. */
export function logGamma(x: number): number {
  if (!(x > 0)) throw new RangeError(`logGamma: x must be > 0, got ${x}`);
  return jStat.gammaln(x);
}

function clamp01(p: number): number {
  if (Number.isNaN(p)) return 1;
  return Math.min(1, Math.max(0, p));
}
