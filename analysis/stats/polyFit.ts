/** Result of a weighted least-squares polynomial fit y = Σ coef[k]·x^k. */
export interface PolyFit {
  /** Coefficients, constant term first. */
  coef: number[];
  /** Weighted residual sum of squares Σ w·(y − ŷ)². */
  rss: number;
  /** Number of points with positive weight. */
  n: number;
  /** (XᵀWX)⁻¹: multiply by the residual variance factor to get the coefficient covariance. */
  covUnscaled: number[][];
}

/**
 * Weighted least-squares polynomial fit of degree 1 or 2 by the normal equations,
 * centred on the weighted mean of x for numerical stability.
 *
 * ŷ = Σ_k coef[k]·x^k minimising Σ w_i·(y_i − ŷ_i)².
 *
 * @param x abscissae (e.g. salinity)
 * @param y ordinates (e.g. concentration)
 * @param w weights (e.g. 1/σ²; 1 for ordinary least squares); zero weights drop a point
 * @param degree 1 (straight line) or 2 (quadratic)
 * @returns the fit, or undefined when fewer than degree+1 distinct x carry weight
 * @throws RangeError when the arrays differ in length or a weight is negative
 * @see Draper, N.R. & Smith, H. (1998) Applied Regression Analysis, 3rd ed., ch. 9 (weighted least squares).
 */
export function polyFit(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  degree: 1 | 2,
): PolyFit | undefined {
  const n = x.length;
  if (y.length !== n || w.length !== n)
    throw new RangeError(`polyFit: x, y and w must have equal lengths (${n}, ${y.length}, ${w.length})`);
  let sw = 0;
  let swx = 0;
  let used = 0;
  for (let i = 0; i < n; i++) {
    if (w[i]! < 0) throw new RangeError(`polyFit: weight ${i} is negative (${w[i]})`);
    if (w[i]! > 0) {
      sw += w[i]!;
      swx += w[i]! * x[i]!;
      used++;
    }
  }
  if (used < degree + 1 || sw === 0) return undefined;
  const xm = swx / sw;
  const m = degree + 1;
  const a: number[][] = Array.from({ length: m }, () => new Array<number>(m).fill(0));
  const b = new Array<number>(m).fill(0);
  const seen = new Set<number>();
  for (let i = 0; i < n; i++) {
    const wi = w[i]!;
    if (wi <= 0) continue;
    seen.add(x[i]!);
    const u = x[i]! - xm;
    const p = [1, u, u * u];
    for (let r = 0; r < m; r++) {
      b[r]! += wi * p[r]! * y[i]!;
      for (let c = 0; c < m; c++) a[r]![c]! += wi * p[r]! * p[c]!;
    }
  }
  if (seen.size < m) return undefined;
  const inv = invertSmall(a);
  if (!inv) return undefined;
  const cc = inv.map((row) => row.reduce((s, v, k) => s + v * b[k]!, 0));
  let rss = 0;
  for (let i = 0; i < n; i++) {
    if (w[i]! <= 0) continue;
    const u = x[i]! - xm;
    const e = y[i]! - (cc[0]! + cc[1]! * u + (m === 3 ? cc[2]! * u * u : 0));
    rss += w[i]! * e * e;
  }
  // Un-centre: y = c0 + c1(x−xm) + c2(x−xm)².
  const T =
    m === 3
      ? [
          [1, -xm, xm * xm],
          [0, 1, -2 * xm],
          [0, 0, 1],
        ]
      : [
          [1, -xm],
          [0, 1],
        ];
  const coef = T.map((row) => row.reduce((s, v, k) => s + v * cc[k]!, 0));
  const cov = T.map((row) =>
    T.map((col) => row.reduce((s, v, i) => s + v * inv[i]!.reduce((t, q, j) => t + q * col[j]!, 0), 0)),
  );
  return { coef, rss: Math.max(0, rss), n: used, covUnscaled: cov };
}

/** Gauss–Jordan inverse of a small symmetric positive-definite matrix; undefined when singular. */
function invertSmall(a: number[][]): number[][] | undefined {
  const m = a.length;
  const aug = a.map((row, i) => [...row, ...Array.from({ length: m }, (_, j) => (i === j ? 1 : 0))]);
  for (let c = 0; c < m; c++) {
    let piv = c;
    for (let r = c + 1; r < m; r++) if (Math.abs(aug[r]![c]!) > Math.abs(aug[piv]![c]!)) piv = r;
    [aug[c], aug[piv]] = [aug[piv]!, aug[c]!];
    const d = aug[c]![c]!;
    if (!(Math.abs(d) > 1e-300)) return undefined;
    for (let k = 0; k < 2 * m; k++) aug[c]![k]! /= d;
    for (let r = 0; r < m; r++) {
      if (r === c) continue;
      const f = aug[r]![c]!;
      if (f !== 0) for (let k = 0; k < 2 * m; k++) aug[r]![k]! -= f * aug[c]![k]!;
    }
  }
  return aug.map((row) => row.slice(m));
}
