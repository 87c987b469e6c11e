import jStat from "jstat";
import { fUpperP } from "../stats/distributions.ts";
import {
  breakRssIn,
  BREAK_IN,
  fitLine,
  gridTerms,
  termsRssInto,
  RSS_OUT,
  TERMS,
  loadResponse,
  putNormal,
  solveNormal,
  twoPhaseDesign,
  type TwoPhaseDesign,
} from "./twoPhaseSearch.ts";

export { twoPhaseDesign, type TwoPhaseDesign } from "./twoPhaseSearch.ts";

/**
 * A continuous two-phase fit of C on S: a straight seaward phase C = a + c·S for S ≥ S_b and a
 * curved landward phase that joins it smoothly (value and slope continuous at S_b):
 * C(S) = α₀ + α₁·t + β₂·h² + β₃·h³, t = (S − S_min)/R, h = max(0, S_b − S)/R, R = S_max − S_min.
 * `linear` = the straight line through all stations was kept (no significant curvature).
 */
export interface TwoPhaseFit {
  /** Break salinity S_b (S_min when linear; S_max when the reaction reaches the mouth). */
  breakSalinity: number;
  linear: boolean;
  /** Scaled coefficients [α₀, α₁, β₂, β₃]. */
  coef: [number, number, number, number];
  sMin: number;
  range: number;
  /** Weighted residual sum of squares of the chosen model and of the straight line. */
  rss: number;
  rssLinear: number;
  /** Parameters of the chosen model (2 for the line; 3–4 plus the break otherwise). */
  params: number;
  /** p of the F-test two-phase vs straight line (1 when it could not be made). */
  pCurvature: number;
  /**
   * When the straight line was kept: the best two-phase fit it was tested against (break and
   * coefficients). The bootstrap draws around it so that each replicate can re-run the model
   * selection (Efron 2014), instead of drawing around the selected line only.
   */
  alternative?: { breakSalinity: number; coef: [number, number, number, number] } | undefined;
  /**
   * Break averaged over the profile likelihood: the grid breaks and the chosen break weighted by
   * exp(−(RSS(S_b) − RSS_min)/(2·s²)), s² = max(1, χ²_ν) (Akaike weights of the breaks, Buckland et
   * al. 1997). Where the curvature fades gradually the profile is flat seaward of the best break and the
   * averaged break moves toward the true end of the reaction; for a sharp break it equals S_b.
   * Undefined for the straight line.
   */
  breakAveraged?: number | undefined;
}

/**
 * A new fit with every property of {@link TwoPhaseFit} in one order (those without a value
 * undefined): every fit then has the same object layout, so V8 compiles the code reading fits once
 * instead of discarding it at each new layout. Internal; the numbers are set by the fitting code.
 */
export function newTwoPhaseFit(): TwoPhaseFit {
  return {
    breakSalinity: Number.NaN,
    linear: false,
    coef: coefficients(Number.NaN, Number.NaN, Number.NaN, Number.NaN),
    sMin: Number.NaN,
    range: Number.NaN,
    rss: Number.NaN,
    rssLinear: Number.NaN,
    params: 0,
    pCurvature: Number.NaN,
    alternative: undefined,
    breakAveraged: undefined,
  };
}

/** [α₀, α₁, β₂, β₃] as a new array that always holds doubles (one element layout for every fit's coefficients). */
function coefficients(a0: number, a1: number, b2: number, b3: number): [number, number, number, number] {
  const c: [number, number, number, number] = [Number.NaN, Number.NaN, Number.NaN, Number.NaN];
  c[0] = a0;
  c[1] = a1;
  c[2] = b2;
  c[3] = b3;
  return c;
}

// The fits' layout is settled once here, before any fitting code runs hot: the number properties
// are created holding doubles (NaN), and the two optional ones are given a value of each kind they
// take, so that no later fit changes the layout (which would make V8 discard the compiled code).
{
  const primer = newTwoPhaseFit();
  primer.breakAveraged = Number.NaN;
  primer.alternative = {
    breakSalinity: Number.NaN,
    coef: coefficients(Number.NaN, Number.NaN, Number.NaN, Number.NaN),
  };
  primer.breakAveraged = undefined;
  primer.alternative = undefined;
}

/**
 * Significance of the two-phase vs straight-line F-test: half of 0.05 (Bonferroni), shared with
 * the quadratic F-test of the class decision (evidence.ts CURVATURE_ALPHA; documented choice).
 */
export const TWO_PHASE_ALPHA = 0.025;
/** Break candidates on the grid before refinement. */
const GRID = 24;
/** Golden-section refinement steps around the best grid break. */
const REFINE = 12;
/** Profile RSS of the grid breaks of the last search (single-threaded reuse). */
const PROFILE = new Float64Array(GRID + 1);
/** Coefficient work array of the fits (single-threaded reuse). */
const COEF = new Float64Array(4);

/** F critical value at TWO_PHASE_ALPHA cached by degrees of freedom (the bootstrap refits thousands of times). */
const CRIT = new Map<number, number>();
/** 0 when F is above the cached critical value at TWO_PHASE_ALPHA, else 1. */
function fPCached(F: number, d1: number, d2: number): number {
  const key = d1 * 100000 + d2;
  let c = CRIT.get(key);
  if (c === undefined) {
    c = jStat.centralF.inv(1 - TWO_PHASE_ALPHA, d1, d2);
    CRIT.set(key, c);
  }
  return F > c ? 0 : 1;
}

/**
 * The fit `f` with the break and coefficients of its two-phase alternative (`{ ...f, ...alternative,
 * linear: false }` with the layout of every other fit): the curve the bootstrap draws around when
 * the straight line was kept.
 */
export function alternativeFit(f: TwoPhaseFit, alternative: NonNullable<TwoPhaseFit["alternative"]>): TwoPhaseFit {
  const a = newTwoPhaseFit();
  a.breakSalinity = alternative.breakSalinity;
  a.linear = false;
  // The alternative's coefficients copied into the fit's own array: a fit's coef array is never
  // replaced (replacing it once made V8 discard the compiled code of everything that reads fits).
  const c = a.coef;
  c[0] = alternative.coef[0];
  c[1] = alternative.coef[1];
  c[2] = alternative.coef[2];
  c[3] = alternative.coef[3];
  a.sMin = f.sMin;
  a.range = f.range;
  a.rss = f.rss;
  a.rssLinear = f.rssLinear;
  a.params = f.params;
  a.pCurvature = f.pCurvature;
  a.alternative = alternative;
  a.breakAveraged = f.breakAveraged;
  return a;
}

/** The fit that keeps the straight line C = α₀ + α₁·t through all stations, written to `out`. */
function lineResult(out: TwoPhaseFit, a0: number, a1: number, sMin: number, range: number, rss: number): TwoPhaseFit {
  const f = out;
  f.breakSalinity = sMin;
  f.linear = true;
  const c = f.coef;
  c[0] = a0;
  c[1] = a1;
  c[2] = 0;
  c[3] = 0;
  f.sMin = sMin;
  f.range = range;
  f.rss = rss;
  f.rssLinear = rss;
  f.params = 2;
  f.pCurvature = 1;
  f.alternative = undefined;
  f.breakAveraged = undefined;
  return f;
}

/**
 * The fit with a break written to `out`: break, the four coefficients of `c`, scaling, RSS of the
 * curve and of the straight line, parameter count and the curvature test's p (the optional
 * `alternative` and `breakAveraged` are the caller's).
 */
function curveResult(
  out: TwoPhaseFit,
  breakSalinity: number,
  c: ArrayLike<number>,
  sMin: number,
  range: number,
  rss: number,
  rssLinear: number,
  params: number,
  pCurvature: number,
): TwoPhaseFit {
  const f = out;
  f.breakSalinity = breakSalinity;
  f.linear = false;
  const coef = f.coef;
  coef[0] = c[0]!;
  coef[1] = c[1]!;
  coef[2] = c[2]!;
  coef[3] = c[3]!;
  f.sMin = sMin;
  f.range = range;
  f.rss = rss;
  f.rssLinear = rssLinear;
  f.params = params;
  f.pCurvature = pCurvature;
  return f;
}

/** Weighted fit at a fixed break (k = 2 line, 3 with h², 4 with h² and h³) by direct sums; RSS or NaN. */
function fitAt(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  sMin: number,
  range: number,
  b: number,
  k: number,
  coef: Float64Array,
): number {
  let a00 = 0,
    a01 = 0,
    a02 = 0,
    a03 = 0,
    a11 = 0,
    a12 = 0,
    a13 = 0,
    a22 = 0,
    a23 = 0,
    a33 = 0;
  let r0 = 0,
    r1 = 0,
    r2 = 0,
    r3 = 0;
  const inv = 1 / range;
  const n = x.length;
  for (let i = 0; i < n; i++) {
    const wi = w[i]!;
    if (!(wi > 0)) continue;
    const t = (x[i]! - sMin) * inv;
    const yi = y[i]!;
    const wt = wi * t;
    a00 += wi;
    a01 += wt;
    a11 += wt * t;
    r0 += wi * yi;
    r1 += wt * yi;
    const d = b - x[i]!;
    if (d > 0) {
      const h = d * inv;
      const h2 = h * h;
      const h3 = h2 * h;
      const w2 = wi * h2;
      a02 += w2;
      a12 += w2 * t;
      a22 += w2 * h2;
      r2 += w2 * yi;
      const w3 = wi * h3;
      a03 += w3;
      a13 += w3 * t;
      a23 += w3 * h2;
      a33 += w3 * h3;
      r3 += w3 * yi;
    }
  }
  putNormal(k, a00, a01, a11, a02, a12, a22, a03, a13, a23, a33, r0, r1, r2, r3);
  coef[0] = coef[1] = coef[2] = coef[3] = 0;
  if (!solveNormal(k, coef)) return Number.NaN;
  const c0 = coef[0]!,
    c1 = coef[1]! * inv,
    c2 = coef[2]!,
    c3 = coef[3]!;
  let rss = 0;
  for (let i = 0; i < n; i++) {
    const wi = w[i]!;
    if (!(wi > 0)) continue;
    const d = b - x[i]!;
    let e = y[i]! - c0 - c1 * (x[i]! - sMin);
    if (d > 0) {
      const h = d * inv;
      e -= (c2 + c3 * h) * h * h;
    }
    rss += wi * e * e;
  }
  return rss;
}

/**
 * Continuous two-phase (segmented) regression of C on S with the break S_b chosen by profile
 * likelihood (minimum weighted RSS over a grid of breaks, refined by golden-section search),
 * compared with the straight line by an F-test counting the break as one parameter; the line is
 * kept when p ≥ {@link TWO_PHASE_ALPHA} or its residuals are at rounding level (< 1e-18 of Σw·y²).
 * The landward phase has at least 2 stations below S_b (3 for the cubic term); S_b = S_max means
 * the reaction reaches the mouth and the seaward "line" is the tangent there. The break search
 * evaluates each candidate in O(log n) from prefix sums ({@link breakRss}); the chosen break is
 * refitted with direct sums.
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ² (0 drops a point)
 * @param exactP false inside the bootstrap: pCurvature is then only 0 (significant) or 1
 * @param design the design of x and w from {@link twoPhaseDesign} (the bootstrap builds it once)
 * @param out a fit from {@link newTwoPhaseFit} to overwrite and return instead of a new one (the
 *   bootstrap reuses one for all its replicates)
 * @returns the fit, or undefined with fewer than 2 distinct salinities
 * @throws RangeError when the salinities are not ascending
 * @see Hudson, D.J. (1966) JASA 61, 1097–1129 (fitting segmented curves with unknown join points);
 *   Hinkley, D.V. (1969) Biometrika 56, 495–504 (two-phase regression, from memory);
 *   Boyle et al. (1974) GCA 38, 1719–1728 (the seaward tangent).
 */
export function fitTwoPhase(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  exactP = true,
  design?: TwoPhaseDesign,
  out?: TwoPhaseFit,
): TwoPhaseFit | undefined {
  const ds = design ?? twoPhaseDesign(x, w);
  if (!ds) return undefined;
  const s = searchTwoPhase(ds, x, y, w);
  if (s === SEARCH_FAILED) return undefined;
  // The fit object is made here, not on the shared path below (which the bootstrap enters with its own).
  const f = out ?? newTwoPhaseFit();
  if (s === SEARCH_LINE) return lineResult(f, S.lc0, S.lc1, ds.sMin, ds.range, S.rssLin);
  const F = S.F;
  const p = F === P_ZERO ? 0 : F === P_ONE ? 1 : exactP ? fUpperP(F, S.extra, S.dfRes) : fPCached(F, S.extra, S.dfRes);
  settleTwoPhase(ds, p, f);
  // The alternative is for the full-data fit's bootstrap; replicates (exactP false) never use it.
  if (exactP && f.linear)
    f.alternative = { breakSalinity: S.bestB, coef: coefficients(COEF[0]!, COEF[1]!, COEF[2]!, COEF[3]!) };
  return f;
}

/**
 * {@link fitTwoPhase} of a bootstrap replicate (exactP false) on the fixed design, written to `out`:
 * the same numbers, by a path that never takes the full-data fit's branches (so V8's code for the
 * replicates is not discarded when a full-data fit comes next).
 */
export function fitTwoPhaseReplicate(
  ds: TwoPhaseDesign,
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  out: TwoPhaseFit,
): TwoPhaseFit | undefined {
  const s = searchTwoPhase(ds, x, y, w);
  if (s === SEARCH_FAILED) return undefined;
  if (s === SEARCH_LINE) return lineResult(out, S.lc0, S.lc1, ds.sMin, ds.range, S.rssLin);
  const F = S.F;
  const p = F === P_ZERO ? 0 : F === P_ONE ? 1 : fPCached(F, S.extra, S.dfRes);
  return settleTwoPhase(ds, p, out);
}

/** Outcomes of {@link searchTwoPhase}. */
const SEARCH_FAILED = 0,
  SEARCH_LINE = 1,
  SEARCH_TESTED = 2;
/** Values of S.F that stand for p = 0 and p = 1 without an F-test (an F statistic is never negative). */
const P_ZERO = -1,
  P_ONE = -2;

/**
 * What {@link searchTwoPhase} leaves for its caller (one object, reused: single-threaded; number
 * properties created holding doubles).
 */
const S = {
  /** The straight line's coefficients and RSS. */
  lc0: Number.NaN,
  lc1: Number.NaN,
  rssLin: Number.NaN,
  /** The best break, its RSS (coefficients in COEF), parameters k and the lowest grid break. */
  bestB: Number.NaN,
  best: Number.NaN,
  k: 0,
  lo: Number.NaN,
  /** F statistic of the two-phase model vs the line (or P_ZERO, P_ONE), its degrees of freedom. */
  F: Number.NaN,
  extra: 0,
  dfRes: 0,
};

/**
 * The straight line and the break search of {@link fitTwoPhase}: SEARCH_FAILED (no line), SEARCH_LINE
 * (the line is kept without a test) or SEARCH_TESTED (the best break is in S with its coefficients in
 * COEF and the F statistic of the test).
 */
function searchTwoPhase(ds: TwoPhaseDesign, x: ArrayLike<number>, y: ArrayLike<number>, w: ArrayLike<number>): number {
  const { n, xs, sMin, sMax, range } = ds;
  const c = COEF;
  const rssLin = fitLine(ds, y, c);
  if (!Number.isFinite(rssLin)) return SEARCH_FAILED;
  // The straight-line result is built only when it is returned (the bootstrap refits thousands of times).
  S.lc0 = c[0]!;
  S.lc1 = c[1]!;
  S.rssLin = rssLin;
  const syy = ds.syy;
  if (n < 5 || rssLin <= 1e-18 * syy) return SEARCH_LINE;
  // Candidate breaks: above the 3rd distinct station (≥ 3 distinct salinities landward, so the
  // landward curvature is never set by one station or by two near-tied ones), up to S_max.
  // The cubic term needs a 4th distinct station landward of the break.
  let third = Number.NaN;
  let fourth = Number.NaN;
  for (let i = 1, distinct = 1, prev = xs[0]!; i < n; i++) {
    if (!(xs[i]! > prev)) continue;
    prev = xs[i]!;
    distinct++;
    if (distinct === 3) third = prev;
    else if (distinct === 4) {
      fourth = prev;
      break;
    }
  }
  if (!(third < sMax)) return SEARCH_LINE;
  const lo = third + 1e-9 * range;
  if (!(fourth < sMax)) fourth = sMax;
  loadResponse(ds, y, ds.swy);
  let bestB = sMax;
  let best = Number.POSITIVE_INFINITY;
  let bestI = 0;
  const tg = gridTerms(ds, lo, GRID, fourth);
  for (let g = 0; g <= GRID; g++) {
    const b = lo + ((sMax - lo) * g) / GRID;
    termsRssInto(ds, tg, g * TERMS, c);
    const r = RSS_OUT[0]!;
    PROFILE[g] = r;
    if (r < best) {
      best = r;
      bestB = b;
      bestI = g;
    }
  }
  // Golden-section refinement on the neighbouring grid interval.
  let a = lo + ((sMax - lo) * Math.max(0, bestI - 1)) / GRID;
  let z = lo + ((sMax - lo) * Math.min(GRID, bestI + 1)) / GRID;
  const gr = (Math.sqrt(5) - 1) / 2;
  // Golden-section search: one new evaluation per step.
  let m1 = z - gr * (z - a);
  let m2 = a + gr * (z - a);
  BREAK_IN[0] = m1;
  breakRssIn(ds, fourth < m1 ? 4 : 3, c);
  let r1 = RSS_OUT[0]!;
  BREAK_IN[0] = m2;
  breakRssIn(ds, fourth < m2 ? 4 : 3, c);
  let r2 = RSS_OUT[0]!;
  for (let it = 0; it < REFINE; it++) {
    if (r1 < best) {
      best = r1;
      bestB = m1;
    }
    if (r2 < best) {
      best = r2;
      bestB = m2;
    }
    if (r1 < r2) {
      z = m2;
      m2 = m1;
      r2 = r1;
      m1 = z - gr * (z - a);
      BREAK_IN[0] = m1;
      breakRssIn(ds, fourth < m1 ? 4 : 3, c);
      r1 = RSS_OUT[0]!;
    } else {
      a = m1;
      m1 = m2;
      r1 = r2;
      m2 = a + gr * (z - a);
      BREAK_IN[0] = m2;
      breakRssIn(ds, fourth < m2 ? 4 : 3, c);
      r2 = RSS_OUT[0]!;
    }
  }
  if (r1 < best) {
    best = r1;
    bestB = m1;
  }
  if (r2 < best) {
    best = r2;
    bestB = m2;
  }
  // A station inside the final bracket: the RSS has a kink there, and on exact data its minimum
  // sits on it (the golden section would stop a hair to one side).
  const tol = z - a;
  for (let i = 0; i < n; i++) {
    const xi = xs[i]!;
    if (xi < bestB - tol || xi <= lo) continue;
    if (xi > bestB + tol) break;
    BREAK_IN[0] = xi;
    breakRssIn(ds, fourth < xi ? 4 : 3, c);
    const r = RSS_OUT[0]!;
    if (r <= best) {
      best = r;
      bestB = xi;
    }
  }
  if (!Number.isFinite(best)) return SEARCH_LINE;
  const k = fourth < bestB ? 4 : 3;
  best = fitAt(x, y, w, sMin, range, bestB, k, c);
  if (!Number.isFinite(best)) return SEARCH_LINE;
  const extra = k - 2 + 1;
  const dfRes = n - k - 1;
  let F = P_ONE;
  if (dfRes >= 1) {
    const gain = Math.max(0, rssLin - best);
    if (best <= 1e-18 * syy) F = gain > 1e-18 * syy ? P_ZERO : P_ONE;
    else F = gain / extra / (best / dfRes);
  }
  S.bestB = bestB;
  S.best = best;
  S.k = k;
  S.lo = lo;
  S.F = F;
  S.extra = extra;
  S.dfRes = dfRes;
  return SEARCH_TESTED;
}

/**
 * The fit after the F-test of {@link searchTwoPhase} (p its p value), written to `out`: the straight
 * line when p ≥ {@link TWO_PHASE_ALPHA} (its tested two-phase alternative is added by
 * {@link fitTwoPhase}), else the two-phase model at the best break with its profile-averaged break.
 */
function settleTwoPhase(ds: TwoPhaseDesign, p: number, out: TwoPhaseFit): TwoPhaseFit {
  const { sMin, sMax, range } = ds;
  const c = COEF;
  const bestB = S.bestB;
  const best = S.best;
  const k = S.k;
  const lo = S.lo;
  const dfRes = S.dfRes;
  if (!(p < TWO_PHASE_ALPHA)) {
    const line = lineResult(out, S.lc0, S.lc1, sMin, range, S.rssLin);
    line.pCurvature = p;
    return line;
  }
  // Profile-averaged break (Akaike weights over the grid breaks and the chosen one).
  const s2 = dfRes >= 1 ? Math.max(1, best / dfRes) : 1;
  let sw = 1,
    swb = bestB;
  for (let g = 0; g <= GRID; g++) {
    const r = PROFILE[g]!;
    if (!Number.isFinite(r)) continue;
    const e = Math.max(0, r - best) / (2 * s2);
    if (!(e < 36)) continue; // weight < 1e-15: no effect on the average
    const wg = Math.exp(-e);
    sw += wg;
    swb += wg * (lo + ((sMax - lo) * g) / GRID);
  }
  const f = curveResult(out, bestB, c, sMin, range, best, S.rssLin, k + 1, p);
  f.alternative = undefined;
  f.breakAveraged = swb / sw;
  return f;
}

/**
 * The two-phase model at a given break (no search, no test): weighted least squares with the cubic
 * landward term when ≥ 4 distinct stations lie landward of it (else the quadratic). Used for the
 * "reaction reaches the mouth" alternative (break at the seaward-most station) of a short seaward line.
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ²
 * @param breakSalinity the break S_b
 * @returns the fit, or undefined (fewer than 3 distinct landward stations, singular system)
 * @see Hudson, D.J. (1966) JASA 61, 1097–1129 (segmented regression at a given join point).
 */
export function fitTwoPhaseAtBreak(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  breakSalinity: number,
): TwoPhaseFit | undefined {
  const n = x.length;
  if (n < 2) return undefined;
  const sMin = x[0]!;
  const range = x[n - 1]! - sMin;
  if (!(range > 0)) return undefined;
  let distinct = 0;
  for (let i = 0, prev = Number.NEGATIVE_INFINITY; i < n; i++)
    if (w[i]! > 0 && x[i]! < breakSalinity && x[i]! > prev) {
      distinct++;
      prev = x[i]!;
    }
  if (distinct < 3) return undefined;
  const k = distinct >= 4 ? 4 : 3;
  const c = COEF;
  const rss = fitAt(x, y, w, sMin, range, breakSalinity, k, c);
  if (!Number.isFinite(rss)) return undefined;
  return curveResult(newTwoPhaseFit(), breakSalinity, c, sMin, range, rss, Number.NaN, k + 1, Number.NaN);
}

/** Value, dC/dS and d²C/dS² of the two-phase fit at salinity s. */
export function twoPhaseAt(f: TwoPhaseFit, s: number): [number, number, number] {
  // Indexed reads (not destructuring, which iterates and allocates outside optimised code).
  const a1 = f.coef[1],
    b2 = f.coef[2],
    b3 = f.coef[3];
  const R = f.range;
  const h = Math.max(0, f.breakSalinity - s) / R;
  const d1 = (a1 - 2 * b2 * h - 3 * b3 * h * h) / R;
  return [twoPhaseValue(f, s), d1, twoPhaseCurvature(f, s)];
}

/** Value of the two-phase fit at salinity s (the first entry of {@link twoPhaseAt}, without an array). */
export function twoPhaseValue(f: TwoPhaseFit, s: number): number {
  const c = f.coef;
  const R = f.range;
  const h = Math.max(0, f.breakSalinity - s) / R;
  return c[0] + (c[1] * (s - f.sMin)) / R + c[2] * h * h + c[3] * h * h * h;
}

/** d²C/dS² of the two-phase fit at salinity s (the third entry of {@link twoPhaseAt}). */
function twoPhaseCurvature(f: TwoPhaseFit, s: number): number {
  const c = f.coef;
  const R = f.range;
  const h = Math.max(0, f.breakSalinity - s) / R;
  return ((2 * c[2] + 6 * c[3] * h) / (R * R)) * (h > 0 ? 1 : 0);
}

/** The seaward line [intercept, slope] in C = intercept + slope·S (the tangent at S_b). */
export function seawardLine(f: TwoPhaseFit): [number, number] {
  const slope = f.coef[1] / f.range;
  return [f.coef[0] - slope * f.sMin, slope];
}

/**
 * Interior maximum of the landward phase: root of dC/dS = 0 with d²C/dS² < 0 strictly inside
 * (S_min, S_b), solved in closed form (3β₃h² + 2β₂h − α₁ = 0), above both end values.
 *
 * @returns the salinity of the maximum, or undefined
 */
export function twoPhaseMaximum(f: TwoPhaseFit, sMax: number): number | undefined {
  if (f.linear) return undefined;
  const a1 = f.coef[1],
    b2 = f.coef[2],
    b3 = f.coef[3];
  const hMax = (f.breakSalinity - f.sMin) / f.range;
  // Roots h of the derivative (scaled distance below S_b), at most two, in that order.
  let roots = 0,
    h0 = 0,
    h1 = 0;
  if (Math.abs(b3) > 1e-14 * (Math.abs(b2) + Math.abs(a1))) {
    const disc = 4 * b2 * b2 + 12 * b3 * a1;
    if (disc >= 0) {
      const sq = Math.sqrt(disc);
      h0 = (-2 * b2 + sq) / (6 * b3);
      h1 = (-2 * b2 - sq) / (6 * b3);
      roots = 2;
    }
  } else if (b2 !== 0) {
    h0 = a1 / (2 * b2);
    roots = 1;
  }
  let best: number | undefined;
  let bestV = Number.NEGATIVE_INFINITY;
  for (let r = 0; r < roots; r++) {
    const h = r === 0 ? h0 : h1;
    if (!(h > 0 && h < hMax)) continue;
    const s = f.breakSalinity - h * f.range;
    const v = twoPhaseValue(f, s);
    if (twoPhaseCurvature(f, s) < 0 && v > bestV) {
      best = s;
      bestV = v;
    }
  }
  if (best === undefined) return undefined;
  const ends = Math.max(twoPhaseValue(f, f.sMin), twoPhaseValue(f, sMax));
  return bestV > ends ? best : undefined;
}
