import type { TangentLine } from "./result.ts";
import type { PreparedSample } from "./prepareSamples.ts";
import { polyFit } from "../stats/polyFit.ts";
import { scanSegments, segmentCriticals } from "./segmentScan.ts";

/**
 * Significance level of the segment linearity tests. Deliberately lenient towards rejection
 * (0.2, not 0.05): accepting a slightly curved segment biases C*₀, which the bootstrap cannot see,
 * while rejecting a straight one only shortens the segment (documented choice).
 */
export const SEGMENT_ALPHA = 0.2;

/** Fewest stations of a seaward linear segment (the F-test needs m − 3 ≥ 1). */
export const MIN_SEGMENT_STATIONS = 4;

/**
 * Finds the seaward linear segment and its tangent line (segmented regression with a
 * straight seaward segment and a free landward part), scanned by {@link scanSegments}.
 *
 * The break is the lowest station salinity S_b such that the stations with S ≥ S_b
 * (at least {@link MIN_SEGMENT_STATIONS}) are consistent with one straight line:
 * (1) χ² of the weighted line fit with σ_eff = σ·max(1, √χ²_ν of the smoother) has p ≥ 0.2, and
 * (2) the nested F-test quadratic vs linear on the segment has p ≥ 0.2 (residuals below
 *     1e-10 of the segment variance count as exactly linear), and (3) the runs test of the
 *     residual signs is not significant at 0.2. The longest passing segment wins.
 * When no segment passes, reactions continue to the mouth and the tangent at the seaward-most
 * station is taken from a weighted quadratic fitted to the seaward quarter of the stations (at
 * least 5): "curve-tangent", with [fromSalinity, toSalinity] the window of that local fit. A local
 * quadratic is used rather than the spline because a natural spline has zero curvature at its
 * ends, which biases the end slope.
 *
 * @param used prepared samples sorted by salinity
 * @param scatterFactor max(1, √χ²_ν) of the smoother residuals
 * @returns the tangent line (undefined only when even the local quadratic cannot be fitted)
 * @see bibliography key boyle1974.
 */
export function seawardTangent(used: readonly PreparedSample[], scatterFactor: number): TangentLine | undefined {
  const n = used.length;
  const x = used.map((s) => s.salinity);
  const y = used.map((s) => s.conc);
  const w = used.map((s) => 1 / (s.sigma * scatterFactor) ** 2);
  const scan = scanSegments(x, y, w, undefined, MIN_SEGMENT_STATIONS, segmentCriticals(n, SEGMENT_ALPHA));
  if (scan.start >= 0) {
    const j = scan.start;
    const lin = polyFit(x.slice(j), y.slice(j), w.slice(j), 1);
    if (lin) return lineOf(lin.coef[0]!, lin.coef[1]!, x[j]!, x[n - 1]!, "segment", n - j);
  }
  const m = endFitStations(n);
  const t = endTangent(x.slice(n - m), y.slice(n - m), w.slice(n - m));
  return t ? lineOf(t[0], t[1], x[n - m]!, x[n - 1]!, "curve-tangent", m) : undefined;
}

/** Stations of the local end quadratic: the seaward quarter, at least {@link END_FIT_MIN_STATIONS}. */
export function endFitStations(n: number): number {
  return Math.min(n, Math.max(END_FIT_MIN_STATIONS, Math.ceil(n / 4)));
}

/** Fewest stations of the local quadratic behind a "curve-tangent". */
export const END_FIT_MIN_STATIONS = 5;

/**
 * Tangent at the last abscissa S_e of a weighted quadratic fit C = q0 + q1·u + q2·u²,
 * u = S − S_e: [intercept, slope] of C = q0 + q1·(S − S_e). Stations with x sorted
 * ascending (the distinct-salinity count assumes it).
 *
 * @returns [intercept, slope], or undefined when the quadratic cannot be fitted
 */
export function endTangent(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
): [number, number] | undefined {
  let se = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < x.length; i++) if (w[i]! > 0 && x[i]! > se) se = x[i]!;
  // Weighted normal equations in u = S − S_e, solved by Cramer's rule (no allocation: runs in the bootstrap).
  let s0 = 0,
    s1 = 0,
    s2 = 0,
    s3 = 0,
    s4 = 0,
    sy = 0,
    suy = 0,
    su2y = 0,
    distinct = 0,
    last = Number.NaN;
  for (let i = 0; i < x.length; i++) {
    const wi = w[i]!;
    if (!(wi > 0)) continue;
    if (x[i] !== last) distinct++;
    last = x[i]!;
    const u = x[i]! - se;
    const u2 = u * u;
    s0 += wi;
    s1 += wi * u;
    s2 += wi * u2;
    s3 += wi * u2 * u;
    s4 += wi * u2 * u2;
    sy += wi * y[i]!;
    suy += wi * u * y[i]!;
    su2y += wi * u2 * y[i]!;
  }
  if (distinct < 3) return undefined;
  const d = s0 * (s2 * s4 - s3 * s3) - s1 * (s1 * s4 - s3 * s2) + s2 * (s1 * s3 - s2 * s2);
  if (!(Math.abs(d) > 0)) return undefined;
  const q0 = (sy * (s2 * s4 - s3 * s3) - s1 * (suy * s4 - s3 * su2y) + s2 * (suy * s3 - s2 * su2y)) / d;
  const q1 = (s0 * (suy * s4 - su2y * s3) - sy * (s1 * s4 - s3 * s2) + s2 * (s1 * su2y - suy * s2)) / d;
  // At u = 0 the value is q0 and the slope q1.
  return [q0 - q1 * se, q1];
}

function lineOf(
  intercept: number,
  slope: number,
  from: number,
  to: number,
  method: TangentLine["method"],
  nStations: number,
): TangentLine {
  return { slope, intercept, fromSalinity: from, toSalinity: to, salinityRange: [from, to], method, nStations };
}
