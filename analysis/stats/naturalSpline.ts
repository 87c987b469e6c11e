/**
 * A natural cubic spline in value–second-derivative form (Green & Silverman 1994, §2.1.2):
 * knot values f_i and second derivatives γ_i, with γ = 0 at both end knots.
 */
export interface NaturalSpline {
  /** Strictly increasing knots. */
  knots: Float64Array;
  /** Spline values at the knots. */
  values: Float64Array;
  /** Second derivatives at the knots (first and last are 0). */
  secondDerivs: Float64Array;
  /** Knots in use (the arrays may be longer, reusable buffers). */
  count: number;
}

/** Value and first and second derivatives of a spline at one abscissa. */
export interface SplinePoint {
  value: number;
  d1: number;
  d2: number;
}

/**
 * Evaluates a natural cubic spline and its first two derivatives. Outside the knot
 * range the natural spline continues as a straight line.
 *
 * With a = (t_{i+1} − x)/h, b = (x − t_i)/h:
 * f = a·f_i + b·f_{i+1} + [(a³ − a)·γ_i + (b³ − b)·γ_{i+1}]·h²/6.
 *
 * @param s the spline
 * @param x abscissa (same unit as the knots)
 * @param hint optional interval index to start the search from (for sweeps)
 * @returns value, dy/dx and d²y/dx² at x
 * @see Green, P.J. & Silverman, B.W. (1994) Nonparametric Regression and Generalized Linear Models, Chapman & Hall, §2.1.
 */
export function evaluateSpline(s: NaturalSpline, x: number, hint = 0): SplinePoint {
  const t = s.knots;
  const n = s.count;
  if (n === 1) return { value: s.values[0]!, d1: 0, d2: 0 };
  if (x <= t[0]!) {
    const d1 = evaluateInterval(s, 0, t[0]!).d1;
    return { value: s.values[0]! + d1 * (x - t[0]!), d1, d2: 0 };
  }
  if (x >= t[n - 1]!) {
    const d1 = evaluateInterval(s, n - 2, t[n - 1]!).d1;
    return { value: s.values[n - 1]! + d1 * (x - t[n - 1]!), d1, d2: 0 };
  }
  let i = Math.min(Math.max(0, hint), n - 2);
  while (i > 0 && x < t[i]!) i--;
  while (i < n - 2 && x > t[i + 1]!) i++;
  return evaluateInterval(s, i, x);
}

/** Evaluation inside interval [t_i, t_{i+1}] (also used at the end knots). */
export function evaluateInterval(s: NaturalSpline, i: number, x: number): SplinePoint {
  const t0 = s.knots[i]!;
  const h = s.knots[i + 1]! - t0;
  const a = (s.knots[i + 1]! - x) / h;
  const b = (x - t0) / h;
  const f0 = s.values[i]!;
  const f1 = s.values[i + 1]!;
  const g0 = s.secondDerivs[i]!;
  const g1 = s.secondDerivs[i + 1]!;
  return {
    value: a * f0 + b * f1 + (((a * a * a - a) * g0 + (b * b * b - b) * g1) * (h * h)) / 6,
    d1: (f1 - f0) / h - ((3 * a * a - 1) * h * g0) / 6 + ((3 * b * b - 1) * h * g1) / 6,
    d2: a * g0 + b * g1,
  };
}

/**
 * Evaluates a spline on an ascending grid in one sweep.
 *
 * @param s the spline
 * @param grid ascending abscissae
 * @param value output values (length ≥ grid.length)
 * @param d1 output first derivatives, or undefined
 * @param d2 output second derivatives, or undefined
 */
export function evaluateSplineGrid(
  s: NaturalSpline,
  grid: ArrayLike<number>,
  value: Float64Array,
  d1?: Float64Array,
  d2?: Float64Array,
): void {
  const t = s.knots;
  const n = s.count;
  let i = 0;
  for (let g = 0; g < grid.length; g++) {
    const x = grid[g]!;
    if (n < 2 || x < t[0]! || x > t[n - 1]!) {
      const p = evaluateSpline(s, x, i);
      value[g] = p.value;
      if (d1) d1[g] = p.d1;
      if (d2) d2[g] = p.d2;
      continue;
    }
    while (i < n - 2 && x > t[i + 1]!) i++;
    const t0 = t[i]!;
    const h = t[i + 1]! - t0;
    const a = (t[i + 1]! - x) / h;
    const b = (x - t0) / h;
    const f0 = s.values[i]!,
      f1 = s.values[i + 1]!,
      g0 = s.secondDerivs[i]!,
      g1 = s.secondDerivs[i + 1]!;
    value[g] = a * f0 + b * f1 + (((a * a * a - a) * g0 + (b * b * b - b) * g1) * (h * h)) / 6;
    if (d1) d1[g] = (f1 - f0) / h - ((3 * a * a - 1) * h * g0) / 6 + ((3 * b * b - 1) * h * g1) / 6;
    if (d2) d2[g] = a * g0 + b * g1;
  }
}
