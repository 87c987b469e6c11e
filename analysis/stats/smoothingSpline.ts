import type { NaturalSpline } from "./naturalSpline.ts";
import type { KnotData } from "./knotData.ts";

/** Result of one Reinsch fit. */
export interface ReinschFit {
  spline: NaturalSpline;
  /** tr H, the effective degrees of freedom (only when requested). */
  edf: number;
  /** Σ w·(y − f)². */
  rss: number;
}

/**
 * Penalised cubic smoothing spline for a given smoothing parameter λ by the
 * Reinsch algorithm: minimises Σ w_i·(y_i − f(x_i))² + λ·∫ f''(x)² dx. Solves
 * (R + λ·Qᵀ W⁻¹ Q)·γ = Qᵀ y (pentadiagonal, banded LDLᵀ) and sets f = y − λ·W⁻¹ Q γ.
 * Optionally returns tr H = n − λ·Σ_i w_i⁻¹ (Q B⁻¹ Qᵀ)_ii from the central band of B⁻¹
 * (Hutchinson & de Hoog 1985). O(n) per fit, so it runs inside bootstrap loops.
 *
 * @param k knot data (strictly increasing x, positive weights), at least 3 knots
 * @param lambda smoothing parameter ≥ 0
 * @param withTrace also compute tr H
 * @param out optional spline to overwrite (reused in loops)
 * @returns spline, edf (NaN unless withTrace) and weighted RSS
 * @throws RangeError for fewer than 3 knots, non-increasing knots or negative λ
 * @see Reinsch, C.H. (1967) Numer. Math. 10, 177–183; Green, P.J. & Silverman, B.W. (1994)
 *      Nonparametric Regression and Generalized Linear Models, §2.3.3; Hutchinson, M.F. &
 *      de Hoog, F.R. (1985) Numer. Math. 47, 99–106.
 */
export function reinschFit(k: KnotData, lambda: number, withTrace = false, out?: NaturalSpline): ReinschFit {
  const n = k.n ?? k.x.length;
  if (n < 3) throw new RangeError(`reinschFit: need ≥ 3 knots, got ${n}`);
  if (!(lambda >= 0)) throw new RangeError(`reinschFit: lambda must be ≥ 0, got ${lambda}`);
  const S = scratch(n);
  factorBand(k.x, k.w, n, lambda, S);
  const { spline, rss } = solveBand(S, n, lambda, k.x, k.y, k.w, out);
  const { e, f, dd, qa, qb, qc } = S;
  const w = k.w;
  const m = n - 2;
  if (!withTrace) return { spline, edf: Number.NaN, rss };
  // Central band of Σ = B⁻¹ from B = L·D·Lᵀ, bottom-up: s0 = Σ[j][j], s1 = Σ[j][j+1], s2 = Σ[j][j+2].
  const { s0, s1, s2 } = S;
  for (let j = m - 1; j >= 0; j--) {
    const l1 = j + 1 < m ? e[j + 1]! : 0;
    const l2 = j + 2 < m ? f[j + 2]! : 0;
    const S11 = j + 1 < m ? s0[j + 1]! : 0,
      S12 = j + 1 < m ? s1[j + 1]! : 0,
      S22 = j + 2 < m ? s0[j + 2]! : 0;
    s1[j] = -l1 * S11 - l2 * S12;
    s2[j] = -l1 * S12 - l2 * S22;
    s0[j] = 1 / dd[j]! - l1 * s1[j]! - l2 * s2[j]!;
  }
  let tr = 0;
  for (let i = 0; i < n; i++) {
    // Row i of Q has columns i−2 (qc), i−1 (qb), i (qa); (Q Σ Qᵀ)_ii over that 3×3 block.
    const a = i - 2;
    const c2 = a >= 0 && a < m ? qc[a]! : 0;
    const c1 = i - 1 >= 0 && i - 1 < m ? qb[i - 1]! : 0;
    const c0 = i < m ? qa[i]! : 0;
    let q = 0;
    if (c2 !== 0) q += c2 * c2 * s0[a]! + (c1 !== 0 ? 2 * c2 * c1 * s1[a]! : 0) + (c0 !== 0 ? 2 * c2 * c0 * s2[a]! : 0);
    if (c1 !== 0) q += c1 * c1 * s0[i - 1]! + (c0 !== 0 ? 2 * c1 * c0 * s1[i - 1]! : 0);
    if (c0 !== 0) q += c0 * c0 * s0[i]!;
    tr += q / w[i]!;
  }
  return { spline, edf: n - lambda * tr, rss };
}

/** A smoothing-spline fit prepared for one set of knots, weights and λ: only y changes between fits. */
export interface PreparedSmoothingSpline {
  n: number;
  lambda: number;
  x: Float64Array;
  w: Float64Array;
  scratch: Scratch;
}

/**
 * Factors the penalised band system of {@link reinschFit} once for fixed knots, weights and λ
 * (a bootstrap on a fixed design refits many responses at the same λ).
 *
 * @param k knot data (≥ 3 strictly increasing knots, positive weights); only x, w and n are used
 * @param lambda smoothing parameter ≥ 0
 * @returns the prepared fit for {@link fitPreparedSpline}
 * @throws RangeError as {@link reinschFit}
 * @see Reinsch, C.H. (1967) Numer. Math. 10, 177–183.
 */
export function prepareSmoothingSpline(k: KnotData, lambda: number): PreparedSmoothingSpline {
  const n = k.n ?? k.x.length;
  if (n < 3) throw new RangeError(`prepareSmoothingSpline: need ≥ 3 knots, got ${n}`);
  if (!(lambda >= 0)) throw new RangeError(`prepareSmoothingSpline: lambda must be ≥ 0, got ${lambda}`);
  const S = newScratch(n);
  factorBand(k.x, k.w, n, lambda, S);
  return {
    n,
    lambda,
    x: Float64Array.from({ length: n }, (_, i) => k.x[i]!),
    w: Float64Array.from({ length: n }, (_, i) => k.w[i]!),
    scratch: S,
  };
}

/**
 * Smoothing spline of the responses y at the knots, weights and λ of a prepared fit: the same
 * numbers as {@link fitSmoothingSpline} on those knots, in two O(n) band substitutions.
 *
 * @param p prepared fit; y responses at its knots (length ≥ p.n); out optional spline to overwrite
 * @returns the natural cubic spline
 */
export function fitPreparedSpline(
  p: PreparedSmoothingSpline,
  y: ArrayLike<number>,
  out?: NaturalSpline,
): NaturalSpline {
  const n = p.n;
  if (n < 5) return solveBand(p.scratch, n, p.lambda, p.x, y, p.w, out, false).spline;
  const spline =
    out && out.knots.length >= n
      ? out
      : { knots: new Float64Array(n), values: new Float64Array(n), secondDerivs: new Float64Array(n), count: n };
  spline.count = n;
  solvePrepared(p.scratch, n, p.lambda, p.x, y, spline);
  return spline;
}

/**
 * {@link solveBand} without the RSS for n ≥ 5 knots, its bounds tests moved out of the loops and
 * the back substitution written straight into γ: the same operations in the same order (a
 * subtracted 0 is left out, which changes no number, −0 included).
 */
function solvePrepared(
  S: Scratch,
  n: number,
  lambda: number,
  x: Float64Array,
  y: ArrayLike<number>,
  spline: NaturalSpline,
): void {
  const m = n - 2;
  const { ih, qa, qb, qc, e, f, z, idd, iw } = S;
  // Forward substitution L·u = Qᵀy (u unscaled in the recurrence), z = D⁻¹·u.
  let u2 = y[0]! * qa[0]! + y[1]! * qb[0]! + y[2]! * qc[0]!;
  z[0] = u2 * idd[0]!;
  let u1 = y[1]! * qa[1]! + y[2]! * qb[1]! + y[3]! * qc[1]! - e[1]! * u2;
  z[1] = u1 * idd[1]!;
  for (let j = 2; j < m; j++) {
    const u = y[j]! * qa[j]! + y[j + 1]! * qb[j]! + y[j + 2]! * qc[j]! - e[j]! * u1 - f[j]! * u2;
    z[j] = u * idd[j]!;
    u2 = u1;
    u1 = u;
  }
  // Back substitution Lᵀ·γ = z into γ at the interior knots.
  const gamma = spline.secondDerivs;
  gamma[0] = 0;
  gamma[n - 1] = 0;
  let g2 = z[m - 1]!;
  gamma[m] = g2;
  let g1 = z[m - 2]! - e[m - 1]! * g2;
  gamma[m - 1] = g1;
  for (let j = m - 3; j >= 0; j--) {
    const g = z[j]! - e[j + 1]! * g1 - f[j + 2]! * g2;
    gamma[j + 1] = g;
    g2 = g1;
    g1 = g;
  }
  const values = spline.values,
    knots = spline.knots;
  values[0] = y[0]! - lambda * (0 + (gamma[1]! - gamma[0]!) * ih[0]!) * iw[0]!;
  knots[0] = x[0]!;
  for (let i = 1; i < n - 1; i++) {
    let qg = 0 + (gamma[i - 1]! - gamma[i]!) * ih[i - 1]!;
    qg += (gamma[i + 1]! - gamma[i]!) * ih[i]!;
    values[i] = y[i]! - lambda * qg * iw[i]!;
    knots[i] = x[i]!;
  }
  values[n - 1] = y[n - 1]! - lambda * (0 + (gamma[n - 2]! - gamma[n - 1]!) * ih[n - 2]!) * iw[n - 1]!;
  knots[n - 1] = x[n - 1]!;
}

/** Band LDLᵀ factors of R + λ·Qᵀ W⁻¹ Q (they depend on the knots, weights and λ only, not on y). */
function factorBand(x: ArrayLike<number>, w: ArrayLike<number>, n: number, lambda: number, S: Scratch): void {
  const m = n - 2;
  const { h, ih, qa, qb, qc, dd, e, f, iw } = S;
  for (let i = 0; i < n - 1; i++) {
    h[i] = x[i + 1]! - x[i]!;
    if (!(h[i]! > 0)) throw new RangeError(`reinschFit: knots must increase (index ${i})`);
    ih[i] = 1 / h[i]!;
  }
  // Column j of Q (interior knot j+1) has rows j, j+1, j+2: qa, qb, qc.
  for (let j = 0; j < m; j++) {
    qa[j] = ih[j]!;
    qc[j] = ih[j + 1]!;
    qb[j] = -qa[j]! - qc[j]!;
  }
  for (let i = 0; i < n; i++) iw[i] = 1 / w[i]!;
  const idd = S.idd;
  for (let j = 0; j < m; j++) {
    const d0 = iw[j]!,
      d1 = iw[j + 1]!,
      d2 = iw[j + 2]!;
    const b0 = (h[j]! + h[j + 1]!) / 3 + lambda * (qa[j]! * qa[j]! * d0 + qb[j]! * qb[j]! * d1 + qc[j]! * qc[j]! * d2);
    // Band entries B[j][j-1] and B[j][j-2] (from columns j-1 and j-2).
    const b1 = j >= 1 ? h[j]! / 6 + lambda * (qb[j - 1]! * qa[j]! * d0 + qc[j - 1]! * qb[j]! * d1) : 0;
    const b2 = j >= 2 ? lambda * qc[j - 2]! * qa[j]! * d0 : 0;
    f[j] = j >= 2 ? b2 * idd[j - 2]! : 0;
    e[j] = j >= 1 ? (b1 - (j >= 2 ? f[j]! * e[j - 1]! * dd[j - 2]! : 0)) * idd[j - 1]! : 0;
    dd[j] = b0 - (j >= 2 ? f[j]! * f[j]! * dd[j - 2]! : 0) - (j >= 1 ? e[j]! * e[j]! * dd[j - 1]! : 0);
    idd[j] = 1 / dd[j]!;
  }
}

/** Solves the factored band system for y and sets the knot values f = y − λ·W⁻¹ Q γ; returns the spline and Σw(y − f)². */
function solveBand(
  S: Scratch,
  n: number,
  lambda: number,
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  out?: NaturalSpline,
  withRss = true,
): { spline: NaturalSpline; rss: number } {
  const m = n - 2;
  const { ih, qa, qb, qc, e, f, z, idd, iw } = S;
  for (let j = 0; j < m; j++) {
    const rhs = y[j]! * qa[j]! + y[j + 1]! * qb[j]! + y[j + 2]! * qc[j]!;
    z[j] = rhs - (j >= 1 ? e[j]! * z[j - 1]! : 0) - (j >= 2 ? f[j]! * z[j - 2]! : 0);
  }
  for (let j = 0; j < m; j++) z[j] = z[j]! * idd[j]!;
  for (let j = m - 1; j >= 0; j--)
    z[j] = z[j]! - (j + 1 < m ? e[j + 1]! * z[j + 1]! : 0) - (j + 2 < m ? f[j + 2]! * z[j + 2]! : 0);
  const spline =
    out && out.knots.length >= n
      ? out
      : { knots: new Float64Array(n), values: new Float64Array(n), secondDerivs: new Float64Array(n), count: n };
  spline.count = n;
  const gamma = spline.secondDerivs;
  gamma[0] = 0;
  gamma[n - 1] = 0;
  for (let j = 0; j < m; j++) gamma[j + 1] = z[j]!;
  let rss = 0;
  for (let i = 0; i < n; i++) {
    let qg = 0;
    if (i > 0) qg += (gamma[i - 1]! - gamma[i]!) * ih[i - 1]!;
    if (i < n - 1) qg += (gamma[i + 1]! - gamma[i]!) * ih[i]!;
    const v = y[i]! - lambda * qg * iw[i]!;
    spline.values[i] = v;
    spline.knots[i] = x[i]!;
    if (withRss) rss += w[i]! * (y[i]! - v) ** 2;
  }
  return { spline, rss };
}

interface Scratch {
  size: number;
  h: Float64Array;
  qa: Float64Array;
  qb: Float64Array;
  qc: Float64Array;
  dd: Float64Array;
  e: Float64Array;
  f: Float64Array;
  z: Float64Array;
  s0: Float64Array;
  s1: Float64Array;
  s2: Float64Array;
  ih: Float64Array;
  iw: Float64Array;
  idd: Float64Array;
}
let SCRATCH: Scratch | undefined;

/** Module-level work arrays (single-threaded reuse keeps bootstrap loops free of garbage). */
function scratch(n: number): Scratch {
  if (!SCRATCH || SCRATCH.size < n) SCRATCH = newScratch(n);
  return SCRATCH;
}

function newScratch(n: number): Scratch {
  const a = (): Float64Array => new Float64Array(n);
  return {
    size: n,
    h: a(),
    qa: a(),
    qb: a(),
    qc: a(),
    dd: a(),
    e: a(),
    f: a(),
    z: a(),
    s0: a(),
    s1: a(),
    s2: a(),
    ih: a(),
    iw: a(),
    idd: a(),
  };
}

/**
 * Smoothing spline for a given λ (see {@link reinschFit}).
 *
 * @param k knot data (≥ 3 knots); lambda ≥ 0
 * @param out optional spline to overwrite
 * @returns the natural cubic spline
 */
export function fitSmoothingSpline(k: KnotData, lambda: number, out?: NaturalSpline): NaturalSpline {
  return reinschFit(k, lambda, false, out).spline;
}
