import type { KnotData } from "./smoothingSpline.ts";
import { symmetricEigen } from "./symmetricEigen.ts";

/** Smoothing parameter chosen by generalised cross-validation. */
export interface GcvChoice {
  lambda: number;
  /** Effective degrees of freedom tr(H) at λ (2 = straight line, n = interpolation). */
  edf: number;
  /** GCV score at λ. */
  gcv: number;
  /** Weighted residual sum of squares at λ. */
  rss: number;
}

/** Penalty matrix K = Q R⁻¹ Qᵀ of the natural cubic spline (Green & Silverman 1994, §2.1.2). */
function penaltyMatrix(x: number[]): number[][] {
  const n = x.length;
  const m = n - 2;
  const h = x.slice(1).map((v, i) => v - x[i]!);
  const q = (row: number, col: number): number => {
    if (row === col) return 1 / h[col]!;
    if (row === col + 1) return -1 / h[col]! - 1 / h[col + 1]!;
    if (row === col + 2) return 1 / h[col + 1]!;
    return 0;
  };
  // X = R⁻¹ Qᵀ by the Thomas algorithm for each of the n right-hand sides.
  const diag = Array.from({ length: m }, (_, j) => (h[j]! + h[j + 1]!) / 3);
  const off = Array.from({ length: m - 1 }, (_, j) => h[j + 1]! / 6);
  const cp = new Array<number>(m).fill(0);
  const dp = new Array<number>(m).fill(0);
  cp[0] = diag[0]!;
  for (let j = 1; j < m; j++) cp[j] = diag[j]! - (off[j - 1]! * off[j - 1]!) / cp[j - 1]!;
  const X: number[][] = Array.from({ length: m }, () => new Array<number>(n).fill(0));
  for (let col = 0; col < n; col++) {
    for (let j = 0; j < m; j++) dp[j] = q(col, j) - (j > 0 ? (off[j - 1]! * dp[j - 1]!) / cp[j - 1]! : 0);
    for (let j = m - 1; j >= 0; j--) X[j]![col] = (dp[j]! - (j < m - 1 ? off[j]! * X[j + 1]![col]! : 0)) / cp[j]!;
  }
  return Array.from({ length: n }, (_, r) => Array.from({ length: n }, (_, c) => {
    let s = 0;
    for (let j = Math.max(0, r - 2); j <= Math.min(m - 1, r); j++) s += q(r, j) * X[j]![c]!;
    return s;
  }));
}

/** Inflation of tr H in the GCV denominator against undersmoothing small samples (Kim & Gu 2004; from memory). */
export const GCV_ALPHA = 1.4;

/** Demmler–Reinsch form of a weighted smoothing-spline problem: every λ costs O(n). */
export interface SplinePath {
  n: number;
  /** Score of log λ: GCV with inflation α, RSS_w and tr H. */
  at(logLambda: number, alpha: number): GcvChoice;
  /** Weighted residuals √w·(y − f) at λ, in knot order. */
  residuals(lambda: number): number[];
  /** log λ search range. */
  range: [number, number];
}

/**
 * Sets up the Demmler–Reinsch eigenbasis of W^{-1/2} K W^{-1/2} for a weighted cubic
 * smoothing spline, so that RSS_w = Σ_k (λd_k/(1+λd_k))²·ẑ_k², tr H = Σ_k 1/(1+λd_k),
 * ẑ = Uᵀ W^{1/2} y, and GCV_α(λ) = n·RSS_w/(n − α·tr H)².
 *
 * @param k merged knot data (≥ 4 knots)
 * @returns the path
 * @throws RangeError for fewer than 4 knots
 * @see Craven, P. & Wahba, G. (1979) Numer. Math. 31, 377–403; Green & Silverman (1994) §3.2–3.3.
 */
export function splinePath(k: KnotData): SplinePath {
  const n = k.x.length;
  if (n < 4) throw new RangeError(`splinePath: need ≥ 4 knots, got ${n}`);
  const K = penaltyMatrix(k.x);
  const sw = k.w.map(Math.sqrt);
  const M = K.map((row, i) => row.map((v, j) => v / (sw[i]! * sw[j]!)));
  const { values, vectors } = symmetricEigen(M);
  const z = k.y.map((v, i) => v * sw[i]!);
  const zh = vectors.map((u) => u.reduce((s, ui, i) => s + ui * z[i]!, 0));
  const dmax = Math.max(...values);
  const d = values.map((v) => (v < 1e-12 * dmax ? 0 : v));
  const dPos = d.filter((v) => v > 0);
  return {
    n,
    range: [Math.log(1e-6 / dmax), Math.log(1e6 / Math.min(...dPos))],
    at(logL, alpha) {
      const lambda = Math.exp(logL);
      let rss = 0;
      let tr = 0;
      for (let i = 0; i < n; i++) {
        const s = 1 / (1 + lambda * d[i]!);
        tr += s;
        rss += (1 - s) ** 2 * zh[i]! ** 2;
      }
      const denom = n - alpha * tr;
      const gcv = denom > 1e-9 * n ? (n * rss) / (denom * denom) : Number.POSITIVE_INFINITY;
      return { lambda, edf: tr, gcv, rss };
    },
    residuals(lambda) {
      const coef = zh.map((v, i) => (v * lambda * d[i]!) / (1 + lambda * d[i]!));
      return Array.from({ length: n }, (_, r) => vectors.reduce((s, u, c) => s + u[r]! * coef[c]!, 0));
    },
  };
}

/**
 * Minimises GCV_α over log λ: a 61-point grid refined by golden-section search.
 *
 * @param path the spline path
 * @param alpha inflation α (1 = plain GCV)
 * @returns the chosen λ with edf, score and RSS
 */
export function minimiseGcv(path: SplinePath, alpha: number): GcvChoice {
  const [lo, hi] = path.range;
  const N = 61;
  let best = path.at(lo, alpha);
  let bestI = 0;
  for (let i = 1; i < N; i++) {
    const c = path.at(lo + ((hi - lo) * i) / (N - 1), alpha);
    if (c.gcv < best.gcv) {
      best = c;
      bestI = i;
    }
  }
  let a = lo + ((hi - lo) * Math.max(0, bestI - 1)) / (N - 1);
  let b = lo + ((hi - lo) * Math.min(N - 1, bestI + 1)) / (N - 1);
  const phi = (Math.sqrt(5) - 1) / 2;
  for (let it = 0; it < 40; it++) {
    const c1 = b - phi * (b - a);
    const c2 = a + phi * (b - a);
    if (path.at(c1, alpha).gcv < path.at(c2, alpha).gcv) b = c2;
    else a = c1;
  }
  const refined = path.at((a + b) / 2, alpha);
  return refined.gcv <= best.gcv ? refined : best;
}

/**
 * Largest λ whose residuals are still within analytical precision, RSS_w/(n − tr H) ≤ 1
 * (weights 1/σ²): smoothing at least this much never chases differences smaller than
 * the precision. Bisection on log λ; returns 0 when even interpolation-level fits exceed it.
 *
 * @param path the spline path (weights must be 1/σ²)
 * @returns λ_floor
 */
export function precisionFloorLambda(path: SplinePath): number {
  const ok = (logL: number): boolean => {
    const c = path.at(logL, 1);
    return c.rss / Math.max(path.n - c.edf, 1e-9) <= 1;
  };
  let [lo, hi] = path.range;
  if (ok(hi)) return Math.exp(hi);
  if (!ok(lo)) return 0;
  for (let it = 0; it < 60; it++) {
    const mid = 0.5 * (lo + hi);
    if (ok(mid)) lo = mid;
    else hi = mid;
  }
  return Math.exp(lo);
}
