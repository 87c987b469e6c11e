import jStat from "jstat";
import { runsCritical } from "../stats/runsTest.ts";

/** Critical values of the seaward-segment tests for each segment size m. */
export interface SegmentCriticals {
  /** F(1, m − 3) upper-α critical value, indexed by m. */
  f: Float64Array;
  /** χ²(m − 2) upper-α critical value, indexed by m. */
  chi2: Float64Array;
  alpha: number;
}

/** Runs test of the residual signs of stations [start, n−1] about a line (duplicates extend a run). */
function tooFewRuns(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  counts: ArrayLike<number> | undefined,
  start: number,
  intercept: number,
  slope: number,
  alpha: number,
): boolean {
  let n1 = 0,
    n2 = 0,
    runs = 0,
    last = 0;
  for (let i = start; i < x.length; i++) {
    const c = counts ? counts[i]! : 1;
    if (c === 0) continue;
    const r = y[i]! - (intercept + slope * x[i]!);
    const sgn = r > 0 ? 1 : r < 0 ? -1 : 0;
    if (sgn === 0) continue;
    if (sgn > 0) n1 += c;
    else n2 += c;
    if (sgn !== last) runs++;
    last = sgn;
  }
  return n1 > 0 && n2 > 0 && runs <= runsCritical(n1, n2, alpha);
}

/**
 * Critical values for segments of up to `maxM` stations at significance α.
 *
 * @param maxM largest segment size
 * @param alpha significance level
 * @returns tables indexed by m (entries below 4 are unused)
 * @see handbook tables of F and χ² quantiles (computed with jStat).
 */
export function segmentCriticals(maxM: number, alpha: number): SegmentCriticals {
  const f = new Float64Array(maxM + 1).fill(Number.POSITIVE_INFINITY);
  const chi2 = new Float64Array(maxM + 1).fill(Number.POSITIVE_INFINITY);
  for (let m = 4; m <= maxM; m++) {
    f[m] = jStat.centralF.inv(1 - alpha, 1, m - 3);
    chi2[m] = jStat.chisquare.inv(1 - alpha, m - 2);
  }
  return { f, chi2, alpha };
}

let PASS_I = new Int32Array(64);
let PASS_A = new Float64Array(64);
let PASS_B = new Float64Array(64);
let PASS_M = new Int32Array(64);
/** Grows the module-level candidate buffers (single-threaded reuse inside bootstrap loops). */
function growPass(n: number): void {
  PASS_I = new Int32Array(n);
  PASS_A = new Float64Array(n);
  PASS_B = new Float64Array(n);
  PASS_M = new Int32Array(n);
}

/** Result of a segment scan: start index and the segment's weighted line. */
export interface SegmentScan {
  /** Index of the first (most landward) station of the longest passing segment; −1 when none. */
  start: number;
  intercept: number;
  slope: number;
  /** Stations (with multiplicity) in the segment. */
  m: number;
}

/**
 * Scans seaward segments [i, n−1] from the mouth landward with running weighted sums
 * (O(1) per candidate) and returns the longest one that is consistent with a straight
 * line: χ² of the line fit below its critical value AND the nested F-test quadratic vs
 * linear below its critical value AND no Wald–Wolfowitz "too few runs" in the residual signs
 * (which catches curvature confined to part of the segment); residuals below 1e-10 of the
 * segment's variance count as exactly linear. Salinity is centred on the seaward-most station for stability.
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ_eff²
 * @param counts multiplicities (bootstrap) or undefined for 1 each
 * @param minStations fewest stations of a segment (≥ 4)
 * @param crit critical values from {@link segmentCriticals}
 * @returns the scan result
 * @see common practice (nested F-test; segmented regression).
 */
export function scanSegments(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
  counts: ArrayLike<number> | undefined,
  minStations: number,
  crit: SegmentCriticals,
): SegmentScan {
  const n = x.length;
  const x0 = x[n - 1]!;
  let s0 = 0,
    s1 = 0,
    s2 = 0,
    s3 = 0,
    s4 = 0,
    sy = 0,
    sxy = 0,
    sx2y = 0,
    syy = 0;
  let m = 0;
  let distinct = 0;
  const best: SegmentScan = { start: -1, intercept: Number.NaN, slope: Number.NaN, m: 0 };
  if (PASS_I.length < n) growPass(n);
  let nPass = 0;
  for (let i = n - 1; i >= 0; i--) {
    const c = counts ? counts[i]! : 1;
    if (c === 0) continue;
    const wi = w[i]! * c;
    const u = x[i]! - x0;
    const u2 = u * u;
    const yi = y[i]!;
    s0 += wi;
    s1 += wi * u;
    s2 += wi * u2;
    s3 += wi * u2 * u;
    s4 += wi * u2 * u2;
    sy += wi * yi;
    sxy += wi * u * yi;
    sx2y += wi * u2 * yi;
    syy += wi * yi * yi;
    m += c;
    distinct++;
    if (distinct < minStations || m >= crit.f.length) continue;
    const det2 = s0 * s2 - s1 * s1;
    if (!(det2 > 0)) continue;
    const b = (s0 * sxy - s1 * sy) / det2;
    const a = (sy - b * s1) / s0;
    const syyC = Math.max(0, syy - (sy * sy) / s0);
    const rssLin = Math.max(0, syy - a * sy - b * sxy);
    let pass: boolean;
    if (rssLin <= 1e-10 * syyC || rssLin < 1e-24) pass = true;
    else {
      // Quadratic by Cramer's rule on the 3×3 normal equations.
      const d = s0 * (s2 * s4 - s3 * s3) - s1 * (s1 * s4 - s3 * s2) + s2 * (s1 * s3 - s2 * s2);
      let rssQuad = 0;
      if (Math.abs(d) > 0) {
        const q0 = (sy * (s2 * s4 - s3 * s3) - s1 * (sxy * s4 - s3 * sx2y) + s2 * (sxy * s3 - s2 * sx2y)) / d;
        const q1 = (s0 * (sxy * s4 - sx2y * s3) - sy * (s1 * s4 - s3 * s2) + s2 * (s1 * sx2y - sxy * s2)) / d;
        const q2 = (s0 * (s2 * sx2y - s3 * sxy) - s1 * (s1 * sx2y - sxy * s2) + sy * (s1 * s3 - s2 * s2)) / d;
        rssQuad = Math.max(0, syy - q0 * sy - q1 * sxy - q2 * sx2y);
      }
      const dq = Math.max(0, rssLin - rssQuad);
      const F = rssQuad > 0 ? dq / (rssQuad / (m - 3)) : dq > 0 ? Number.POSITIVE_INFINITY : 0;
      pass = rssLin <= crit.chi2[m]! && F <= crit.f[m]!;
    }
    if (pass) {
      PASS_I[nPass] = i;
      PASS_A[nPass] = a - b * x0;
      PASS_B[nPass] = b;
      PASS_M[nPass] = m;
      nPass++;
    }
  }
  // The runs test (O(m)) only for the longest candidates, until one passes.
  for (let k = nPass - 1; k >= 0; k--) {
    if (tooFewRuns(x, y, counts, PASS_I[k]!, PASS_A[k]!, PASS_B[k]!, crit.alpha)) continue;
    best.start = PASS_I[k]!;
    best.intercept = PASS_A[k]!;
    best.slope = PASS_B[k]!;
    best.m = PASS_M[k]!;
    break;
  }
  return best;
}
