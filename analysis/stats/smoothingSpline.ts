import type { NaturalSpline } from "./naturalSpline.ts";

/** Knots with merged ties: weighted means of y, summed weights. */
export interface KnotData {
  x: number[];
  y: number[];
  w: number[];
}

/**
 * Merges (near-)tied abscissae into one knot (weighted mean of y, summed weight)
 * and drops zero-weight points, which leaves the penalised least-squares
 * solution unchanged. Input must be sorted by x.
 *
 * @param x ascending abscissae
 * @param y ordinates
 * @param w non-negative weights
 * @param tieTol abscissae closer than this are merged (same unit as x)
 * @returns merged knot data
 */
export function mergeKnots(x: ArrayLike<number>, y: ArrayLike<number>, w: ArrayLike<number>, tieTol: number): KnotData {
  const out: KnotData = { x: [], y: [], w: [] };
  let sx = 0, sy = 0, sw = 0, anchor = Number.NaN;
  const flush = (): void => {
    if (sw > 0) {
      out.x.push(sx / sw);
      out.y.push(sy / sw);
      out.w.push(sw);
    }
    sx = sy = sw = 0;
  };
  for (let i = 0; i < x.length; i++) {
    const wi = w[i]!;
    if (!(wi > 0)) continue;
    if (!(Math.abs(x[i]! - anchor) <= tieTol)) {
      flush();
      anchor = x[i]!;
    }
    sx += wi * x[i]!;
    sy += wi * y[i]!;
    sw += wi;
  }
  flush();
  return out;
}

/**
 * Penalised cubic smoothing spline for a given smoothing parameter λ by the
 * Reinsch algorithm: minimises Σ w_i·(y_i − f(x_i))² + λ·∫ f''(x)² dx. Solves
 * (R + λ·Qᵀ W⁻¹ Q)·γ = Qᵀ y (pentadiagonal) and sets f = y − λ·W⁻¹ Q γ.
 * O(n) per fit, so it runs inside bootstrap loops.
 *
 * @param k knot data (strictly increasing x, positive weights), at least 3 knots
 * @param lambda smoothing parameter ≥ 0 (units of w·y²·x³/y² — scale with the data)
 * @returns the natural cubic spline
 * @throws RangeError for fewer than 3 knots, non-increasing knots or negative λ
 * @see Reinsch, C.H. (1967) Smoothing by spline functions. Numer. Math. 10, 177–183;
 *      Green, P.J. & Silverman, B.W. (1994) Nonparametric Regression and Generalized Linear Models, §2.3.3.
 */
export function fitSmoothingSpline(k: KnotData, lambda: number): NaturalSpline {
  const n = k.x.length;
  if (n < 3) throw new RangeError(`fitSmoothingSpline: need ≥ 3 knots, got ${n}`);
  if (!(lambda >= 0)) throw new RangeError(`fitSmoothingSpline: lambda must be ≥ 0, got ${lambda}`);
  const h = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) {
    h[i] = k.x[i + 1]! - k.x[i]!;
    if (!(h[i]! > 0)) throw new RangeError(`fitSmoothingSpline: knots must increase (index ${i})`);
  }
  const m = n - 2;
  const d = k.w.map((v) => 1 / v);
  // Column j (0-based, interior knot j+1) of Q has rows j, j+1, j+2.
  const qa = (j: number): number => 1 / h[j]!; // row j
  const qb = (j: number): number => -1 / h[j]! - 1 / h[j + 1]!; // row j+1
  const qc = (j: number): number => 1 / h[j + 1]!; // row j+2
  const b0 = new Float64Array(m);
  const b1 = new Float64Array(m);
  const b2 = new Float64Array(m);
  const rhs = new Float64Array(m);
  for (let j = 0; j < m; j++) {
    b0[j] = (h[j]! + h[j + 1]!) / 3 + lambda * (qa(j) ** 2 * d[j]! + qb(j) ** 2 * d[j + 1]! + qc(j) ** 2 * d[j + 2]!);
    if (j + 1 < m) b1[j] = h[j + 1]! / 6 + lambda * (qb(j) * qa(j + 1) * d[j + 1]! + qc(j) * qb(j + 1) * d[j + 2]!);
    if (j + 2 < m) b2[j] = lambda * qc(j) * qa(j + 2) * d[j + 2]!;
    rhs[j] = k.y[j]! * qa(j) + k.y[j + 1]! * qb(j) + k.y[j + 2]! * qc(j);
  }
  const g = solvePentadiagonal(b0, b1, b2, rhs);
  const gamma = new Array<number>(n).fill(0);
  for (let j = 0; j < m; j++) gamma[j + 1] = g[j]!;
  const values = new Array<number>(n);
  for (let i = 0; i < n; i++) {
    let qg = 0;
    if (i > 0) qg += (gamma[i - 1]! - gamma[i]!) / h[i - 1]!;
    if (i < n - 1) qg += (gamma[i + 1]! - gamma[i]!) / h[i]!;
    values[i] = k.y[i]! - lambda * d[i]! * qg;
  }
  return { knots: [...k.x], values, secondDerivs: gamma };
}

/** Solves a symmetric positive-definite pentadiagonal system by banded LDLᵀ. */
function solvePentadiagonal(b0: Float64Array, b1: Float64Array, b2: Float64Array, rhs: Float64Array): Float64Array {
  const m = b0.length;
  const dd = new Float64Array(m);
  const e = new Float64Array(m); // L[i][i-1]
  const f = new Float64Array(m); // L[i][i-2]
  for (let i = 0; i < m; i++) {
    f[i] = i >= 2 ? b2[i - 2]! / dd[i - 2]! : 0;
    e[i] = i >= 1 ? (b1[i - 1]! - (i >= 2 ? f[i]! * e[i - 1]! * dd[i - 2]! : 0)) / dd[i - 1]! : 0;
    dd[i] = b0[i]! - (i >= 2 ? f[i]! ** 2 * dd[i - 2]! : 0) - (i >= 1 ? e[i]! ** 2 * dd[i - 1]! : 0);
  }
  const z = new Float64Array(m);
  for (let i = 0; i < m; i++) z[i] = rhs[i]! - (i >= 1 ? e[i]! * z[i - 1]! : 0) - (i >= 2 ? f[i]! * z[i - 2]! : 0);
  for (let i = 0; i < m; i++) z[i]! /= dd[i]!;
  for (let i = m - 1; i >= 0; i--) z[i] = z[i]! - (i + 1 < m ? e[i + 1]! * z[i + 1]! : 0) - (i + 2 < m ? f[i + 2]! * z[i + 2]! : 0);
  return z;
}
