import { fitTwoPhaseAtBreak, seawardLine, type TwoPhaseFit } from "./twoPhase.ts";

/**
 * Fewest stations on the straight seaward line before its linearity counts as established: a
 * quadratic passes exactly through any 3 points, so a line on ≤ 3 stations cannot be told from the
 * chord of a curve that keeps bending to the mouth (the class rule also asks ≥ 4 stations for
 * "then conservative", classify.ts; documented choice).
 */
export const MIN_SEAWARD_STATIONS = 4;

/** The seaward end models of C*₀ and their Akaike weight (see {@link mouthAveragedEffective}). */
export interface MouthAverage {
  /** Model-averaged C*₀ at the reference salinity [unit of C]. */
  value: number;
  /** C*₀ of the fitted seaward line (the two-phase fit's own tangent). */
  segment: number;
  /** C*₀ of the local quadratic's tangent at S_max (undefined: not fitted). */
  curved?: number;
  /** Akaike weight of the curved end model (0 when it was not fitted). */
  weight: number;
}

/**
 * Effective river end-member C*₀ averaged over two models of the seaward end when the straight
 * seaward line rests on fewer than {@link MIN_SEAWARD_STATIONS} stations: (a) the two-phase fit's
 * straight line beyond its break and (b) a local quadratic C = c₀ + c₁·S + c₂·S² through the line's
 * stations and the next station landward (3–4 stations), whose tangent at the seaward-most station
 * S_max gives C*₀,b = C(S_max) − (S_max − S_ref)·C′(S_max). Where the reaction continues to the mouth,
 * a short "line" is a chord of the curve and (a) is biased toward C₀ (the % change understated by
 * 2–7 pp in calibration); the local quadratic's end derivative is nearly unbiased there (its error is
 * of order C‴·h², h the window) but noisier. Akaike weights of line vs quadratic on the same window
 * (Akaike 1974; Buckland et al. 1997): ΔAIC = (RSS_quad − RSS_line)/s² + 2, w = 1/(1 + exp(ΔAIC/2)),
 * C*₀ = (1 − w)·C*₀,a + w·C*₀,b. A local end model, not a global curve with its break at S_max: a global
 * cubic carries the landward curvature to the mouth and is off by tens of percent where the reaction
 * ends well inside the estuary (removal ending at S 20: +15 pp bias in calibration). The bootstrap
 * repeats the average in every replicate, so the intervals carry the model uncertainty.
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ²
 * @param fit the two-phase fit of the same data (a straight line kept or a break at S_max: no averaging)
 * @param sRef reference salinity of the river end-member
 * @param s2 residual variance factor max(1, χ²_ν) of the full-data fit
 * @returns averaged C*₀ with its parts and the weight of the curved end model
 * @see Buckland, S.T., Burnham, K.P. & Augustin, N.H. (1997) Model selection: an integral part of
 *   inference. Biometrics 53, 603–618 (Akaike weights, model-averaged estimate; from memory);
 *   Akaike, H. (1974) IEEE Trans. Automatic Control 19, 716–723; Fan, J. & Gijbels, I. (1996) Local
 *   Polynomial Modelling and Its Applications, Chapman & Hall, §3.2 (derivative at a boundary by a
 *   local polynomial of order ν + 1; from memory); Boyle et al. (1974) GCA 38, 1719–1728
 *   (bibliography key boyle1974).
 */
export function mouthAveragedEffective(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  fit: TwoPhaseFit,
  sRef: number,
  s2: number,
): MouthAverage {
  const [ic, sl] = seawardLine(fit);
  const segment = ic + sl * sRef;
  const none: MouthAverage = { value: segment, segment, weight: 0 };
  const n = x.length;
  const sMax = x[n - 1]!;
  if (fit.linear || !(fit.breakSalinity < sMax)) return none;
  let nSeg = 0;
  while (nSeg < n && x[n - 1 - nSeg]! >= fit.breakSalinity) nSeg++;
  if (nSeg >= MIN_SEAWARD_STATIONS) return none;
  const win = Math.max(3, nSeg + 1);
  // The window must leave the landward phase its own stations (≥ 2 more).
  if (n < win + 2) return none;
  const fitWin = endFits(x, y, w, n - win, n, sMax);
  if (!fitWin) return none;
  const { line: l, quad: q } = fitWin;
  // Tangent at S_max of the quadratic in u = S − S_max: value q.c0, slope q.c1.
  const curved = q.c0 - (sMax - sRef) * q.c1;
  const dAic = (q.rss - l.rss) / s2 + 2;
  const weight = 1 / (1 + Math.exp(Math.min(700, dAic / 2)));
  if (!Number.isFinite(curved) || !Number.isFinite(weight)) return none;
  return { value: segment + weight * (curved - segment), segment, curved, weight };
}

/**
 * Akaike weight of "the reaction reaches the mouth" against a fitted seaward line: the two-phase model
 * with its break at the seaward-most station S_max (no straight seaward phase; the landward curve
 * continues to the last station) vs the fit with its break S_b, one parameter fewer (the break):
 * ΔAIC = (RSS_mouth − RSS_b)/s² − 2, w = 1/(1 + exp(ΔAIC/2)) (Akaike 1974; Buckland et al. 1997).
 * Used as a test only, never as an estimate: that global curve's tangent at S_max carries the
 * landward curvature to the mouth and is far off where the reaction ends inside the estuary.
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ²
 * @param fit the two-phase fit of the same data
 * @param s2 residual variance factor max(1, χ²_ν)
 * @returns the weight, or undefined (straight line kept, break already at S_max, model not fitted)
 * @see Buckland, S.T., Burnham, K.P. & Augustin, N.H. (1997) Biometrics 53, 603–618 (from memory);
 *   Akaike, H. (1974) IEEE Trans. Automatic Control 19, 716–723.
 */
export function mouthModelWeight(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  fit: TwoPhaseFit,
  s2: number,
): number | undefined {
  const sMax = x[x.length - 1]!;
  if (fit.linear || !(fit.breakSalinity < sMax)) return undefined;
  const m = fitTwoPhaseAtBreak(x, y, w, sMax);
  if (!m) return undefined;
  const dAic = (m.rss - fit.rss) / s2 - 2;
  const weight = 1 / (1 + Math.exp(Math.min(700, dAic / 2)));
  return Number.isFinite(weight) ? weight : undefined;
}

/**
 * Weighted least-squares line and quadratic in u = S − S_max through stations [from, to): value and
 * slope at S_max and the weighted RSS of each (closed-form normal equations; Draper & Smith 1998, ch. 9).
 */
function endFits(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  from: number,
  to: number,
  sMax: number,
): { line: { c0: number; c1: number; rss: number }; quad: { c0: number; c1: number; rss: number } } | undefined {
  let s0 = 0,
    s1 = 0,
    s2 = 0,
    s3 = 0,
    s4 = 0,
    r0 = 0,
    r1 = 0,
    r2 = 0;
  for (let i = from; i < to; i++) {
    const wi = w[i]!;
    if (!(wi > 0)) continue;
    const u = x[i]! - sMax;
    const u2 = u * u;
    s0 += wi;
    s1 += wi * u;
    s2 += wi * u2;
    s3 += wi * u2 * u;
    s4 += wi * u2 * u2;
    r0 += wi * y[i]!;
    r1 += wi * u * y[i]!;
    r2 += wi * u2 * y[i]!;
  }
  const dl = s0 * s2 - s1 * s1;
  // 3 × 3 determinant of [[s0, s1, s2], [s1, s2, s3], [s2, s3, s4]] and Cramer's rule.
  const det3 = (a: number, b: number, c: number, d: number, e: number, f: number, g: number, h: number, k: number) =>
    a * (e * k - f * h) - b * (d * k - f * g) + c * (d * h - e * g);
  const dq = det3(s0, s1, s2, s1, s2, s3, s2, s3, s4);
  const scale = s0 * s4 + s2 * s2;
  if (!(Math.abs(dl) > 1e-12 * s0 * s2) || !(Math.abs(dq) > 1e-12 * scale * s2)) return undefined;
  const l0 = (r0 * s2 - s1 * r1) / dl;
  const l1 = (s0 * r1 - s1 * r0) / dl;
  const q0 = det3(r0, s1, s2, r1, s2, s3, r2, s3, s4) / dq;
  const q1 = det3(s0, r0, s2, s1, r1, s3, s2, r2, s4) / dq;
  const q2 = det3(s0, s1, r0, s1, s2, r1, s2, s3, r2) / dq;
  let rl = 0,
    rq = 0;
  for (let i = from; i < to; i++) {
    const wi = w[i]!;
    if (!(wi > 0)) continue;
    const u = x[i]! - sMax;
    const el = y[i]! - l0 - l1 * u;
    const eq = y[i]! - q0 - (q1 + q2 * u) * u;
    rl += wi * el * el;
    rq += wi * eq * eq;
  }
  return { line: { c0: l0, c1: l1, rss: rl }, quad: { c0: q0, c1: q1, rss: rq } };
}
