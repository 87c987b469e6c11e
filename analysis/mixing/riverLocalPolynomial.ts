import { breakProfile, type BreakProfile } from "./breakGrid.ts";
import type { TwoPhaseFit } from "./twoPhase.ts";
import { solveAugmented } from "../stats/gaussJordan.ts";

/** Largest number of unknowns (the local quartic of {@link localRiverModelSpread}). */
const KMAX = 5;
/** Fewest distinct stations inside the window: the four coefficients and three degrees of freedom (documented choice). */
export const MIN_LOCAL_STATIONS = 7;
/**
 * Widest window (salinity units) of the local cubic: beyond it the reaction curves of the calibration
 * depart from a cubic by more than the noise at 1–5 % hides (exact surveys, reaction ending at S 5:
 * C₀ error +0.2 % at 5, +0.4 % at 6, +1.3 % at 8; documented choice).
 */
export const LOCAL_WINDOW_MAX_S = 5;
/** χ²₁ 0.95 quantile: the profile-likelihood 95 % confidence set of the break (3.841). */
const CHI2_1_95 = 3.841458820694124;

/** Augmented normal equations (K rows, K + 1 columns), reused (single-threaded). */
const A = new Float64Array(KMAX * (KMAX + 1));
/** Powers 1, u, … u⁴ of one station (reused). */
const P = new Float64Array(KMAX);
/** Kernel-weighted residual sum of squares of the last {@link localPolyAt} fit. */
const RSS_OUT = new Float64Array(1);

/** The window of the local river estimate: its stations (the first `count`) and half-width `h`. */
export interface LocalWindow {
  /** Stations (from the freshest, x ascending) inside the window. */
  count: number;
  /** Kernel half-width h (salinity units): stations at S < h carry weight w·(1 − (S/h)²). */
  h: number;
}

/**
 * Window of the local river estimate: h = min(upper end of the break's profile-likelihood 95 % confidence
 * set, max({@link LOCAL_WINDOW_MAX_S}, its lower end)). The set is the breaks b of the grid (3rd distinct station to
 * S_max) with (RSS_b − RSS_min)/s² ≤ χ²₁,0.95 (test inversion; Hinkley 1969, from memory), s² = max(1, χ²_ν):
 * every break the data do not reject lies below h's upper limit, so the window never reaches far past
 * the reaction's end, where the curve turns straight and no cubic follows it; below that limit the window
 * does not depend on where in the set the break lies. Fixed for the bootstrap replicates (a smoothing
 * parameter, as the spline's λ).
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ²
 * @param fit the two-phase fit of the same data (not the straight line)
 * @param profile the refits at the candidate breaks ({@link breakProfile}), when already computed
 * @returns the window, or undefined when the fit is the straight line or fewer than
 *   {@link MIN_LOCAL_STATIONS} distinct stations lie inside it
 * @see Hinkley, D.V. (1969) Biometrika 56, 495–504 (likelihood-ratio confidence set of the join point).
 */
export function localRiverWindow(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  fit: TwoPhaseFit,
  profile: BreakProfile | undefined = fit.linear ? undefined : breakProfile(x, y, w),
): LocalWindow | undefined {
  if (fit.linear || !profile) return undefined;
  const n = x.length;
  const s2 = Math.max(1, fit.rss / Math.max(1, n - fit.params));
  let lower = fit.breakSalinity;
  let upper = fit.breakSalinity;
  for (let g = 0; g < profile.breaks.length; g++) {
    const b = profile.breaks[g]!;
    if (b >= lower && b <= upper) continue;
    const f = profile.fits[g];
    if (!f || !((f.rss - fit.rss) / s2 <= CHI2_1_95)) continue;
    if (b < lower) lower = b;
    else upper = b;
  }
  const h = Math.min(upper, Math.max(LOCAL_WINDOW_MAX_S, lower));
  let count = 0;
  let distinct = 0;
  for (let i = 0, prev = Number.NEGATIVE_INFINITY; i < n && x[i]! < h; i++) {
    count++;
    if (x[i]! > prev) {
      distinct++;
      prev = x[i]!;
    }
  }
  return distinct >= MIN_LOCAL_STATIONS ? { count, h } : undefined;
}

/**
 * River value at the reference salinity from a local cubic regression through the freshest stations:
 * the weighted least-squares fit C = β₀ + β₁u + β₂u² + β₃u³, u = S − S_ref, over the stations of the
 * window with weights wᵢ·K(Sᵢ/h), K(t) = 1 − t² (Epanechnikov), so C₀ = β₀. It does not depend on the
 * two-phase fit's break (only the window's upper limit does, through the break's confidence set): where
 * the data cannot locate the end of the reaction, the landward phase of the two-phase model ends at a
 * misplaced break and its extrapolation to S_ref follows it (calibration, desorption ending at S 5, 20
 * km-even stations, 5 % noise, 400 surveys: C₀ +1.5 %, sd 9.6 % from the model-averaged quartic
 * extension; +0.0 %, sd 6.3 % from this local cubic).
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ² (0 drops a point)
 * @param win the window ({@link localRiverWindow})
 * @param sRef reference salinity (normally 0)
 * @returns the extrapolated value, or undefined when the system is singular
 * @see Fan, J. & Gijbels, I. (1996) Local Polynomial Modelling and Its Applications, Chapman & Hall,
 *   §3.2 (local polynomial estimator at a boundary point; odd degree), §2.2 (Epanechnikov kernel;
 *   from memory).
 */
export function riverByLocalCubic(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  win: LocalWindow,
  sRef: number,
): number | undefined {
  const l = localRiverWeights(x, w, win, sRef);
  return l && localRiverFromWeights(l, y);
}

/**
 * Equivalent-kernel weights ℓ of the local cubic's value at the reference salinity: C₀ = Σ ℓᵢ·yᵢ over the
 * window's stations, ℓᵢ = eᵀ(XᵀWX)⁻¹xᵢ·Wᵢ (e = (1, 0, 0, 0), xᵢ = (1, u, u², u³), Wᵢ = wᵢ·K(Sᵢ/h)). The
 * design is fixed, so the bootstrap computes them once and each replicate's C₀ is one dot product.
 *
 * @param x ascending salinities; w weights 1/σ²
 * @param win the window ({@link localRiverWindow})
 * @param sRef reference salinity
 * @returns the weights (length `win.count`), or undefined when the system is singular
 * @see Fan, J. & Gijbels, I. (1996) Local Polynomial Modelling and Its Applications, §3.2.2 (equivalent
 *   kernel; from memory).
 */
export function localRiverWeights(
  x: ArrayLike<number>,
  w: ArrayLike<number>,
  win: LocalWindow,
  sRef: number,
): Float64Array | undefined {
  const k = 4;
  const W = k + 1;
  const hInv = 1 / win.h;
  A.fill(0);
  for (let i = 0; i < win.count; i++) {
    const t = x[i]! * hInv;
    const wi = w[i]! * (1 - t * t);
    if (!(wi > 0)) continue;
    const u = (x[i]! - sRef) * hInv;
    P[0] = 1;
    for (let r = 1; r < k; r++) P[r] = P[r - 1]! * u;
    for (let r = 0; r < k; r++) for (let c = r; c < k; c++) A[r * W + c] = A[r * W + c]! + wi * P[r]! * P[c]!;
  }
  for (let r = 1; r < k; r++) for (let c = 0; c < r; c++) A[r * W + c] = A[c * W + r]!;
  A[k] = 1; // right-hand side e: the first row of the inverse (symmetric)
  if (!solveAugmented(A, k, COEF)) return undefined;
  const l = new Float64Array(win.count);
  for (let i = 0; i < win.count; i++) {
    const t = x[i]! * hInv;
    const wi = w[i]! * (1 - t * t);
    if (!(wi > 0)) continue;
    const u = (x[i]! - sRef) * hInv;
    l[i] = wi * (COEF[0]! + u * (COEF[1]! + u * (COEF[2]! + u * COEF[3]!)));
  }
  return l;
}

/** C₀ = Σ ℓᵢ·yᵢ from the equivalent-kernel weights of {@link localRiverWeights}. */
export function localRiverFromWeights(l: Float64Array, y: ArrayLike<number>): number | undefined {
  let v = 0;
  for (let i = 0; i < l.length; i++) v += l[i]! * y[i]!;
  return Number.isFinite(v) ? v : undefined;
}

/**
 * Between-model term of the local C₀ for the choice cubic vs quartic local polynomial (same window and
 * kernel): √w_quartic·|C₀,quartic − C₀,cubic|, w_quartic = 1/(1 + exp(−ΔAIC/2)), ΔAIC = (RSS₃ − RSS₄)/s² − 2
 * (kernel-weighted RSS, one parameter more). Added in quadrature to the bootstrap spread, it is the
 * model-selection part of Buckland et al.'s (1997) unconditional variance: the part of the cubic's
 * extrapolation error (its model error, which the bootstrap around the fitted curve does not see) that
 * the stations can show.
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ²
 * @param win the window ({@link localRiverWindow})
 * @param sRef reference salinity
 * @param s2 residual variance factor (max(1, χ²_ν) of the two-phase fit)
 * @returns the term (concentration units), or undefined when either fit is singular
 * @see Buckland, S.T., Burnham, K.P. & Augustin, N.H. (1997) Biometrics 53, 603–618 (from memory);
 *   Fan, J. & Gijbels, I. (1996) Local Polynomial Modelling and Its Applications, §3.2 (from memory).
 */
export function localRiverModelSpread(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  win: LocalWindow,
  sRef: number,
  s2: number,
): number | undefined {
  const c3 = localPolyAt(x, y, w, win, sRef, 4, true);
  const rss3 = RSS_OUT[0]!;
  const c4 = localPolyAt(x, y, w, win, sRef, 5, true);
  const rss4 = RSS_OUT[0]!;
  if (c3 === undefined || c4 === undefined) return undefined;
  const dAic = (rss3 - rss4) / s2 - 2;
  const wQuartic = 1 / (1 + Math.exp(-dAic / 2));
  const d = Math.sqrt(wQuartic) * Math.abs(c4 - c3);
  return Number.isFinite(d) ? d : undefined;
}

/**
 * Value at sRef of the kernel-weighted local polynomial with k unknowns (4: cubic, 5: quartic) over the
 * window; with `rss`, its kernel-weighted residual sum of squares goes to {@link RSS_OUT}.
 */
function localPolyAt(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  win: LocalWindow,
  sRef: number,
  k: number,
  rss: boolean,
): number | undefined {
  const W = k + 1;
  A.fill(0);
  const hInv = 1 / win.h;
  // u scaled by h (well-conditioned powers; same estimate of β₀).
  for (let i = 0; i < win.count; i++) {
    const t = x[i]! * hInv;
    const wi = w[i]! * (1 - t * t);
    if (!(wi > 0)) continue;
    const u = (x[i]! - sRef) * hInv;
    const yi = y[i]!;
    P[0] = 1;
    for (let r = 1; r < k; r++) P[r] = P[r - 1]! * u;
    for (let r = 0; r < k; r++) {
      const wr = wi * P[r]!;
      for (let c = r; c < k; c++) A[r * W + c] = A[r * W + c]! + wr * P[c]!;
      A[r * W + k] = A[r * W + k]! + wr * yi;
    }
  }
  for (let r = 1; r < k; r++) for (let c = 0; c < r; c++) A[r * W + c] = A[c * W + r]!;
  if (!solveAugmented(A, k, COEF)) return undefined;
  if (rss) {
    let s = 0;
    for (let i = 0; i < win.count; i++) {
      const t = x[i]! * hInv;
      const wi = w[i]! * (1 - t * t);
      if (!(wi > 0)) continue;
      const u = (x[i]! - sRef) * hInv;
      let v = 0;
      for (let r = k - 1; r >= 0; r--) v = v * u + COEF[r]!;
      s += wi * (y[i]! - v) ** 2;
    }
    RSS_OUT[0] = s;
  }
  return COEF[0];
}

/** Coefficients of the last solve. */
const COEF = new Float64Array(KMAX);
