/**
 * Ordinary least-squares straight line with t intervals for the slope and for the fitted mean,
 * used for archive relations such as % change against log₁₀ discharge.
 */
import jStat from "jstat";

/** A straight-line fit y = intercept + slope·x with 95 % intervals. */
export interface LineFit {
  slope: number;
  intercept: number;
  /** 95 % t interval of the slope. */
  slopeLower: number;
  slopeUpper: number;
  /** Residual standard deviation s = √(RSS/(n − 2)). */
  residualSd: number;
  /** Coefficient of determination R². */
  rSquared: number;
  n: number;
  /** Mean and sum of squares of x, for the band. */
  meanX: number;
  sxx: number;
  /** t quantile t₀.₉₇₅,ₙ₋₂ used for every interval. */
  t975: number;
}

/**
 * Least-squares line through (x, y) with the 95 % t interval of the slope,
 * slope ± t₀.₉₇₅,ₙ₋₂ · s/√Sxx.
 *
 * @param x predictor values (finite)
 * @param y response values (finite), same length
 * @returns the fit, or undefined with fewer than 3 points or constant x
 * @throws RangeError for unequal lengths or non-finite values
 * @see Draper, N.R. & Smith, H. (1998) Applied Regression Analysis, 3rd ed., §1.4 (slope interval) and §1.4 Eq. 1.4.5 (mean band).
 */
export function fitLine(x: readonly number[], y: readonly number[]): LineFit | undefined {
  if (x.length !== y.length) throw new RangeError(`fitLine: x and y lengths differ (${x.length} vs ${y.length})`);
  x.forEach((v, i) => {
    if (!Number.isFinite(v) || !Number.isFinite(y[i]))
      throw new RangeError(`fitLine: point ${i} must be finite, got (${v}, ${y[i]})`);
  });
  const n = x.length;
  if (n < 3) return undefined;
  const mx = x.reduce((a, b) => a + b, 0) / n;
  const my = y.reduce((a, b) => a + b, 0) / n;
  let sxx = 0;
  let sxy = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sxx += (x[i]! - mx) ** 2;
    sxy += (x[i]! - mx) * (y[i]! - my);
    syy += (y[i]! - my) ** 2;
  }
  if (!(sxx > 1e-12 * Math.max(1, mx * mx))) return undefined;
  const slope = sxy / sxx;
  const intercept = my - slope * mx;
  const rss = Math.max(0, syy - slope * sxy);
  const s = Math.sqrt(rss / (n - 2));
  const t975 = jStat.studentt.inv(0.975, n - 2);
  const se = s / Math.sqrt(sxx);
  return {
    slope,
    intercept,
    slopeLower: slope - t975 * se,
    slopeUpper: slope + t975 * se,
    residualSd: s,
    rSquared: syy > 0 ? 1 - rss / syy : 1,
    n,
    meanX: mx,
    sxx,
    t975,
  };
}

/**
 * The fitted mean at x₀ with its 95 % confidence band,
 * ŷ ± t₀.₉₇₅,ₙ₋₂ · s · √(1/n + (x₀ − x̄)²/Sxx).
 *
 * @param fit a line from {@link fitLine}
 * @param x0 predictor value
 * @returns value, lower, upper
 * @see Draper & Smith (1998) §1.4.
 */
export function lineBandAt(fit: LineFit, x0: number): { value: number; lower: number; upper: number } {
  if (!Number.isFinite(x0)) throw new RangeError(`lineBandAt: x0 must be finite, got ${x0}`);
  const value = fit.intercept + fit.slope * x0;
  const h = fit.t975 * fit.residualSd * Math.sqrt(1 / fit.n + (x0 - fit.meanX) ** 2 / fit.sxx);
  return { value, lower: value - h, upper: value + h };
}
