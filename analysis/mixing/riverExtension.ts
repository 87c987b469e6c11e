import { twoPhaseValue, type TwoPhaseFit } from "./twoPhase.ts";
import { solveAugmented } from "../stats/gaussJordan.ts";

/**
 * Fewest distinct stations landward of the break before the river value is extrapolated with the
 * quartic landward phase (three landward terms h², h³, h⁴ need at least three; two more keep the
 * extrapolation from resting on an exact fit; documented choice).
 */
export const MIN_LANDWARD_FOR_QUARTIC = 6;

/** Unknowns of the extended fit: α₀, α₁, β₂, β₃, β₄. */
const K = 5;
/** Augmented normal equations (K rows, K + 1 columns), reused (single-threaded). */
const A = new Float64Array(K * (K + 1));

/**
 * River value at the reference salinity from the two-phase fit's landward phase extended by a
 * quartic term: at the fit's own break S_b the weighted least-squares fit
 * C = α₀ + α₁·t + β₂·u² + β₃·u³ + β₄·u⁴ (t as in {@link TwoPhaseFit}, u = max(0, S_b − S)/(S_b − S_min)) is evaluated at S_ref.
 *
 * Why: C₀ is an extrapolation beyond the freshest station, where a reaction's curvature is largest.
 * A cubic landward phase (chosen for a stable break) bends too little there when the curvature does
 * not follow a low-order polynomial, so its extrapolated C₀ is biased by a model error that does not
 * shrink with the noise (on exact calibration surveys: −0.2 to −0.9 % of C₀ with the cubic, |error|
 * ≤ 0.1 % with the quartic). The higher-order term lowers that bias at some cost in variance
 * (bias–variance trade of extrapolation: the break, and so the seaward line and C*₀, still come from
 * the cubic fit). The bootstrap recomputes this value in every replicate, so its standard error and
 * interval include the extra variance.
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ² (0 drops a point)
 * @param fit the two-phase fit of the same data (its break and scaling)
 * @param sRef reference salinity (normally 0)
 * @returns the extrapolated value, or undefined when the fit is the straight line, fewer than
 *   {@link MIN_LANDWARD_FOR_QUARTIC} distinct stations lie landward of the break, or the system is singular
 * @see Hudson, D.J. (1966) JASA 61, 1097–1129 (segmented regression at a given join point);
 *   Hastie, T., Tibshirani, R. & Friedman, J. (2009) The Elements of Statistical Learning, 2nd ed.,
 *   §7.3 (bias–variance decomposition; from memory).
 */
export function riverByQuarticExtension(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  fit: TwoPhaseFit,
  sRef: number,
): number | undefined {
  const coef = fitQuarticExtension(x, y, w, fit);
  if (!coef) return undefined;
  const v = quarticExtensionAt(coef, fit, sRef);
  return Number.isFinite(v) ? v : undefined;
}

/**
 * Between-model term of C₀ for the choice quartic extension vs cubic landward phase:
 * √w_cubic·|C₀,quartic − C₀,cubic|, with w_cubic the Akaike weight of the cubic,
 * 1/(1 + exp(ΔAIC/2)), ΔAIC = AIC_cubic − AIC_quartic = (RSS_cubic − RSS_quartic)/s² − 2 (one parameter more).
 * Added in quadrature to the bootstrap spread of the reported (quartic) C₀, it is the model-selection
 * part of the model-averaged variance of Buckland et al. (1997).
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ²
 * @param fit the (cubic) two-phase fit of the same data
 * @param sRef reference salinity
 * @param s2 residual variance factor (max(1, χ²_ν) of the fit)
 * @returns the term, or undefined when the quartic extension cannot be fitted
 * @see Buckland, S.T., Burnham, K.P. & Augustin, N.H. (1997) Model selection: an integral part of
 *   inference. Biometrics 53, 603–618 (Akaike weights, unconditional variance; from memory);
 *   Akaike, H. (1974) IEEE Trans. Automatic Control 19, 716–723.
 */
export function riverModelSpread(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  fit: TwoPhaseFit,
  sRef: number,
  s2: number,
): number | undefined {
  const q = fitQuarticExtension(x, y, w, fit);
  if (!q) return undefined;
  const coef = Float64Array.from(q);
  let rssQ = 0;
  let rssC = 0;
  for (let i = 0; i < x.length; i++) {
    if (!(w[i]! > 0)) continue;
    rssQ += w[i]! * (y[i]! - quarticExtensionAt(coef, fit, x[i]!)) ** 2;
    rssC += w[i]! * (y[i]! - twoPhaseValue(fit, x[i]!)) ** 2;
  }
  const dAic = (rssC - rssQ) / s2 - 2;
  const wCubic = 1 / (1 + Math.exp(dAic / 2));
  const d = Math.sqrt(wCubic) * Math.abs(quarticExtensionAt(coef, fit, sRef) - twoPhaseValue(fit, sRef));
  return Number.isFinite(d) ? d : undefined;
}

/** Value at S of the quartic extension with coefficients `coef` ({@link fitQuarticExtension}) of `fit`. */
export function quarticExtensionAt(coef: ArrayLike<number>, fit: TwoPhaseFit, s: number): number {
  const b = fit.breakSalinity;
  const h = Math.max(0, b - s) / (b - fit.sMin);
  const h2 = h * h;
  return coef[0]! + (coef[1]! * (s - fit.sMin)) / fit.range + coef[2]! * h2 + coef[3]! * h2 * h + coef[4]! * h2 * h2;
}

/**
 * Coefficients [α₀, α₁, β₂, β₃, β₄] of the quartic extension of the two-phase fit at its break
 * (see {@link riverByQuarticExtension}); a shared work array, valid until the next call.
 *
 * @returns the coefficients, or undefined (straight line, too few landward stations, singular system)
 */
export function fitQuarticExtension(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  fit: TwoPhaseFit,
): Float64Array | undefined {
  // A reaction reaching the mouth (break at the seaward-most station) has no landward phase to extend.
  if (fit.linear || !(fit.breakSalinity < fit.sMin + fit.range)) return undefined;
  const b = fit.breakSalinity;
  const inv = 1 / fit.range;
  const sMin = fit.sMin;
  // h scaled to [0, 1] over the landward stations (well-conditioned powers; same model space).
  const hInv = 1 / (b - sMin);
  let distinct = 0;
  let prev = Number.NEGATIVE_INFINITY;
  // Upper triangle and right-hand side of the normal equations in locals (aRC += (wᵢ·rowᵣ)·row_c over the
  // stations in order; the constant first row entry 1 multiplies exactly, so it is left out).
  let a00 = 0,
    a01 = 0,
    a02 = 0,
    a03 = 0,
    a04 = 0,
    a11 = 0,
    a12 = 0,
    a13 = 0,
    a14 = 0,
    a22 = 0,
    a23 = 0,
    a24 = 0,
    a33 = 0,
    a34 = 0,
    a44 = 0;
  let r0 = 0,
    r1 = 0,
    r2 = 0,
    r3 = 0,
    r4 = 0;
  const n = x.length;
  for (let i = 0; i < n; i++) {
    const wi = w[i]!;
    if (!(wi > 0)) continue;
    const xi = x[i]!;
    const h = b > xi ? (b - xi) * hInv : 0;
    const t = (xi - sMin) * inv;
    const yi = y[i]!;
    const w1 = wi * t;
    a00 += wi;
    a01 += wi * t;
    r0 += wi * yi;
    a11 += w1 * t;
    r1 += w1 * yi;
    if (!(h > 0)) continue;
    if (xi > prev) {
      distinct++;
      prev = xi;
    }
    const h2 = h * h;
    const h3 = h2 * h;
    const h4 = h2 * h2;
    a02 += wi * h2;
    a03 += wi * h3;
    a04 += wi * h4;
    a12 += w1 * h2;
    a13 += w1 * h3;
    a14 += w1 * h4;
    const w2 = wi * h2;
    a22 += w2 * h2;
    a23 += w2 * h3;
    a24 += w2 * h4;
    r2 += w2 * yi;
    const w3 = wi * h3;
    a33 += w3 * h3;
    a34 += w3 * h4;
    r3 += w3 * yi;
    const w4 = wi * h4;
    a44 += w4 * h4;
    r4 += w4 * yi;
  }
  if (distinct < MIN_LANDWARD_FOR_QUARTIC) return undefined;
  const W = K + 1;
  A[0] = a00;
  A[1] = A[W] = a01;
  A[2] = A[2 * W] = a02;
  A[3] = A[3 * W] = a03;
  A[4] = A[4 * W] = a04;
  A[W + 1] = a11;
  A[W + 2] = A[2 * W + 1] = a12;
  A[W + 3] = A[3 * W + 1] = a13;
  A[W + 4] = A[4 * W + 1] = a14;
  A[2 * W + 2] = a22;
  A[2 * W + 3] = A[3 * W + 2] = a23;
  A[2 * W + 4] = A[4 * W + 2] = a24;
  A[3 * W + 3] = a33;
  A[3 * W + 4] = A[4 * W + 3] = a34;
  A[4 * W + 4] = a44;
  A[K] = r0;
  A[W + K] = r1;
  A[2 * W + K] = r2;
  A[3 * W + K] = r3;
  A[4 * W + K] = r4;
  return solveAugmented(A, K, OUT) ? OUT : undefined;
}

const OUT = new Float64Array(K);
