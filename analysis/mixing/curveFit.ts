import type { PreparedSample } from "./prepareSamples.ts";
import type { NaturalSpline } from "../stats/naturalSpline.ts";
import { evaluateSplineGrid } from "../stats/naturalSpline.ts";
import { fitSmoothingSpline } from "../stats/smoothingSpline.ts";
import { mergeKnots } from "../stats/knotData.ts";
import { GCV_ALPHA, minimiseGcv, minimiseUbre, splinePath } from "../stats/splineGcv.ts";
import { chiSquareUpperP } from "../stats/distributions.ts";
import { runsTest } from "../stats/runsTest.ts";

/** The fitted C–S curve on the full data. */
export interface CurveFitResult {
  spline: NaturalSpline;
  lambda: number;
  edf: number;
  /** max(1, √(RSS_w/(n − edf))): how much the scatter exceeds analytical precision. */
  scatterFactor: number;
  method: string;
}

/** Salinities closer than this fraction of the range share one knot. */
export const TIE_FRACTION = 1e-6;

/**
 * Fits the C–S curve: a cubic smoothing spline weighted by 1/σ² with λ chosen by
 * generalised cross-validation. Rule (documented choice): λ_GCV minimises GCV with
 * α = 1.4 (against undersmoothing); if its residuals show lack of fit (χ² vs precision
 * p < 0.01 AND runs test p < 0.05) plain GCV (α = 1) is used instead; finally
 * λ = max(λ_GCV, λ_UBRE), λ_UBRE minimising the unbiased risk with the analytical
 * precision as known σ, so the curve never chases differences smaller than the precision
 * warrants (noise-free input) while GCV guards against scatter beyond the stated precision.
 * Chosen over a fixed polynomial because it
 * follows a steep low-salinity removal curve or a mid-salinity maximum, and over
 * interpolation because the GCV penalty keeps it from inventing wiggles; it also gives
 * continuous first and second derivatives for the tangent and the rate (Eq. 4).
 *
 * @param used prepared samples sorted by salinity (≥ 4 distinct salinities)
 * @returns the fit, or undefined with fewer than 4 distinct salinities
 * @see Craven & Wahba (1979) Numer. Math. 31, 377–403; Green & Silverman (1994) ch. 2–3.
 */
export function fitCurve(used: readonly PreparedSample[]): CurveFitResult | undefined {
  const x = used.map((s) => s.salinity);
  const range = x[x.length - 1]! - x[0]!;
  const knots = mergeKnots(
    x,
    used.map((s) => s.conc),
    used.map((s) => 1 / (s.sigma * s.sigma)),
    TIE_FRACTION * range,
  );
  if (knots.n < 4) return undefined;
  const path = splinePath(knots);
  let g = minimiseGcv(path, GCV_ALPHA);
  let alpha = GCV_ALPHA;
  const r = path.residuals(g.lambda);
  // Degenerate inputs (many ties or zeros) can give a non-finite edf or rss: then no lack-of-fit switch.
  const dofG = path.n - g.edf;
  const lackOfFit =
    Number.isFinite(g.rss) &&
    Number.isFinite(dofG) &&
    chiSquareUpperP(g.rss, Math.max(1, dofG)) < 0.01 &&
    runsTest(r).pTooFew < 0.05;
  if (lackOfFit) {
    g = minimiseGcv(path, 1);
    alpha = 1;
  }
  const floor = minimiseUbre(path).lambda;
  const lambda = Math.max(g.lambda, floor);
  if (!Number.isFinite(lambda)) return undefined;
  const edf = path.at(Math.log(lambda), 1).edf;
  const spline = fitSmoothingSpline(knots, lambda);
  let rss = 0;
  const vals = new Float64Array(used.length);
  evaluateSplineGrid(spline, x, vals);
  used.forEach((s, i) => (rss += ((s.conc - vals[i]!) / s.sigma) ** 2));
  const dof = Math.max(1, used.length - edf);
  return {
    spline,
    lambda,
    edf,
    scatterFactor: Math.max(1, Math.sqrt(rss / dof)),
    method: `cubic smoothing spline weighted by 1/σ², λ by generalised cross-validation (α = ${alpha})${lambda > g.lambda ? ", raised to the analytical-precision (UBRE) choice" : ""}`,
  };
}

/** An evenly spaced grid of `points` salinities from `from` to `to`. */
export function salinityGrid(from: number, to: number, points: number): Float64Array {
  const g = new Float64Array(points);
  for (let i = 0; i < points; i++) g[i] = from + ((to - from) * i) / (points - 1);
  return g;
}
