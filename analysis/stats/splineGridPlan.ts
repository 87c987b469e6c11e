/**
 * The response-free part of evaluating natural cubic splines with fixed knots on a fixed grid:
 * each grid point's knot interval i and its weights a, b, a³ − a, b³ − b and h² (Green & Silverman
 * 1994, §2.1), so that a bootstrap whose replicates share knots and grid pays only the products
 * with the values and second derivatives. The numbers are those of evaluateSplineGrid, operation
 * for operation.
 */
export interface SplineGridPlan {
  size: number;
  interval: Int32Array;
  a: Float64Array;
  b: Float64Array;
  a3: Float64Array;
  b3: Float64Array;
  hh: Float64Array;
}

/**
 * Plans the evaluation of splines with knots t[0 … count−1] on an ascending grid.
 *
 * @param knots strictly increasing knots; count knots in use
 * @param grid ascending abscissae
 * @returns the plan, or undefined when a grid point lies outside the knots (or fewer than 2
 *   knots): the caller then evaluates with evaluateSplineGrid, which continues the spline linearly
 * @see Green, P.J. & Silverman, B.W. (1994) Nonparametric Regression and Generalized Linear Models, §2.1.
 */
export function planSplineGrid(
  knots: ArrayLike<number>,
  count: number,
  grid: ArrayLike<number>,
): SplineGridPlan | undefined {
  const G = grid.length;
  if (count < 2) return undefined;
  const plan: SplineGridPlan = {
    size: G,
    interval: new Int32Array(G),
    a: new Float64Array(G),
    b: new Float64Array(G),
    a3: new Float64Array(G),
    b3: new Float64Array(G),
    hh: new Float64Array(G),
  };
  const t = knots;
  let i = 0;
  for (let g = 0; g < G; g++) {
    const x = grid[g]!;
    if (!(x >= t[0]! && x <= t[count - 1]!)) return undefined;
    // The same interval search and weights as evaluateSplineGrid.
    while (i < count - 2 && x > t[i + 1]!) i++;
    const t0 = t[i]!;
    const h = t[i + 1]! - t0;
    const a = (t[i + 1]! - x) / h;
    const b = (x - t0) / h;
    plan.interval[g] = i;
    plan.a[g] = a;
    plan.b[g] = b;
    plan.a3[g] = a * a * a - a;
    plan.b3[g] = b * b * b - b;
    plan.hh[g] = h * h;
  }
  return plan;
}

/**
 * Values and second derivatives on the planned grid of a spline with the planned knots:
 * f = a·f_i + b·f_{i+1} + [(a³ − a)·γ_i + (b³ − b)·γ_{i+1}]·h²/6, f'' = a·γ_i + b·γ_{i+1}.
 *
 * @param plan from {@link planSplineGrid} for these knots and grid
 * @param values spline values at the knots; secondDerivs its second derivatives γ
 * @param value output values (length ≥ plan.size); d2 output second derivatives
 */
export function evaluatePlannedGrid(
  plan: SplineGridPlan,
  values: Float64Array,
  secondDerivs: Float64Array,
  value: Float64Array,
  d2: Float64Array,
): void {
  const { interval, a, b, a3, b3, hh } = plan;
  for (let g = 0; g < plan.size; g++) {
    const i = interval[g]!;
    const ag = a[g]!,
      bg = b[g]!;
    const g0 = secondDerivs[i]!,
      g1 = secondDerivs[i + 1]!;
    value[g] = ag * values[i]! + bg * values[i + 1]! + ((a3[g]! * g0 + b3[g]! * g1) * hh[g]!) / 6;
    d2[g] = ag * g0 + bg * g1;
  }
}
