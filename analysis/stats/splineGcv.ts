import type { KnotData } from "./knotData.ts";
import { reinschFit } from "./smoothingSpline.ts";

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

/** Inflation of tr H in the GCV denominator against undersmoothing small samples (Kim & Gu 2004; from memory). */
export const GCV_ALPHA = 1.4;

/** GCV path of a weighted smoothing-spline problem: every λ costs O(n). */
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
 * Scores a weighted cubic smoothing spline along log λ: each λ is one O(n) Reinsch fit
 * with tr H from the band of the inverse (Hutchinson & de Hoog 1985), and
 * GCV_α(λ) = n·RSS_w/(n − α·tr H)².
 *
 * @param k merged knot data (≥ 4 knots)
 * @returns the path
 * @throws RangeError for fewer than 4 knots
 * @see Craven, P. & Wahba, G. (1979) Numer. Math. 31, 377–403; Green & Silverman (1994) §3.2–3.3.
 */
export function splinePath(k: KnotData): SplinePath {
  const n = k.n ?? k.x.length;
  if (n < 4) throw new RangeError(`splinePath: need ≥ 4 knots, got ${n}`);
  let wMean = 0;
  for (let i = 0; i < n; i++) wMean += k.w[i]! / n;
  const hMean = (k.x[n - 1]! - k.x[0]!) / (n - 1);
  const l0 = Math.log(hMean ** 3 * wMean);
  return {
    n,
    range: [l0 - 10 * Math.LN10, l0 + 12 * Math.LN10],
    at(logL, alpha) {
      const lambda = Math.exp(logL);
      const fit = reinschFit(k, lambda, true);
      const denom = n - alpha * fit.edf;
      const gcv = denom > 1e-9 * n ? (n * fit.rss) / (denom * denom) : Number.POSITIVE_INFINITY;
      return { lambda, edf: fit.edf, gcv, rss: fit.rss };
    },
    residuals(lambda) {
      const fit = reinschFit(k, lambda, false);
      return Array.from(fit.spline.values.subarray(0, n), (v, i) => Math.sqrt(k.w[i]!) * (k.y[i]! - v));
    },
  };
}

/**
 * Minimises GCV_α over log λ: a 45-point grid refined by golden-section search.
 *
 * @param path the spline path
 * @param alpha inflation α (1 = plain GCV)
 * @returns the chosen λ with edf, score and RSS
 */
export function minimiseGcv(path: SplinePath, alpha: number): GcvChoice {
  return minimiseScore(path.range, (logL) => path.at(logL, alpha));
}

/** Grid-then-golden-section minimisation of a score over log λ (score in the gcv field). */
function minimiseScore(range: [number, number], score: (logL: number) => GcvChoice): GcvChoice {
  const [lo, hi] = range;
  const N = 45;
  let best = score(lo);
  let bestI = 0;
  for (let i = 1; i < N; i++) {
    const c = score(lo + ((hi - lo) * i) / (N - 1));
    if (c.gcv < best.gcv) {
      best = c;
      bestI = i;
    }
  }
  // Golden-section refinement inside the bracketing grid cells, one new score per step.
  let a = lo + ((hi - lo) * Math.max(0, bestI - 1)) / (N - 1);
  let b = lo + ((hi - lo) * Math.min(N - 1, bestI + 1)) / (N - 1);
  const phi = (Math.sqrt(5) - 1) / 2;
  let c1 = b - phi * (b - a);
  let c2 = a + phi * (b - a);
  let f1 = score(c1);
  let f2 = score(c2);
  for (let it = 0; it < 30; it++) {
    if (f1.gcv < f2.gcv) {
      b = c2;
      c2 = c1;
      f2 = f1;
      c1 = b - phi * (b - a);
      f1 = score(c1);
    } else {
      a = c1;
      c1 = c2;
      f1 = f2;
      c2 = a + phi * (b - a);
      f2 = score(c2);
    }
  }
  const refined = f1.gcv < f2.gcv ? f1 : f2;
  return refined.gcv <= best.gcv ? refined : best;
}

/**
 * Minimises the unbiased risk estimate with known unit variance (weights 1/σ²),
 * UBRE(λ) = RSS_w/n − 1 + 2·tr H/n (Mallows' C_p form): the λ that fits the data as
 * closely as, but not closer than, their analytical precision warrants.
 *
 * @param path the spline path (weights must be 1/σ²)
 * @returns the chosen λ (gcv field holds the UBRE score)
 * @see Craven, P. & Wahba, G. (1979) Numer. Math. 31, 377–403 (§ on known variance); Mallows, C.L. (1973) Technometrics 15, 661–675.
 */
export function minimiseUbre(path: SplinePath): GcvChoice {
  const ubre = (logL: number): GcvChoice => {
    const c = path.at(logL, 1);
    return { ...c, gcv: c.rss / path.n - 1 + (2 * c.edf) / path.n };
  };
  return minimiseScore(path.range, ubre);
}
