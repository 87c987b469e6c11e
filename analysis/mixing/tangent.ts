import type { TangentLine } from "./result.ts";
import type { PreparedSample } from "./prepareSamples.ts";
import { polyFit } from "../stats/polyFit.ts";
import { chiSquareUpperP, fUpperP } from "../stats/distributions.ts";
import { ALPHA } from "./evidence.ts";

/** Fewest stations of a seaward linear segment (the F-test needs m − 3 ≥ 1). */
export const MIN_SEGMENT_STATIONS = 4;

/**
 * Finds the seaward linear segment and its tangent line (segmented regression with a
 * straight seaward segment and a free landward part).
 *
 * The break is the lowest station salinity S_b such that the stations with S ≥ S_b
 * (at least {@link MIN_SEGMENT_STATIONS}) are consistent with one straight line:
 * (1) χ² of the weighted line fit with σ_eff = σ·max(1, √χ²_ν of the smoother) has p ≥ 0.05, and
 * (2) the nested F-test quadratic vs linear on the segment has p ≥ 0.05 (residuals below
 *     1e-6·σ count as exactly linear). The longest passing segment wins.
 * When no segment passes, reactions continue to the mouth and the tangent at the seaward-most
 * station is taken from a weighted quadratic fitted to the seaward quarter of the stations (at
 * least 5): "curve-tangent", with [fromSalinity, toSalinity] the window of that local fit. A local
 * quadratic is used rather than the spline because a natural spline has zero curvature at its
 * ends, which biases the end slope.
 *
 * @param used prepared samples sorted by salinity
 * @param scatterFactor max(1, √χ²_ν) of the smoother residuals
 * @returns the tangent line (undefined only when even the local quadratic cannot be fitted)
 * @see Boyle et al. (1974) GCA 38, 1719–1728; mixing-methods.md §1.2 (recipe) and §1.6 item 5.
 */
export function seawardTangent(used: readonly PreparedSample[], scatterFactor: number): TangentLine | undefined {
  const n = used.length;
  const x = used.map((s) => s.salinity);
  const y = used.map((s) => s.conc);
  const w = used.map((s) => 1 / (s.sigma * scatterFactor) ** 2);
  let best: TangentLine | undefined;
  for (let j = n - MIN_SEGMENT_STATIONS; j >= 0; j--) {
    const xs = x.slice(j);
    const ys = y.slice(j);
    const ws = w.slice(j);
    const m = xs.length;
    const lin = polyFit(xs, ys, ws, 1);
    const quad = polyFit(xs, ys, ws, 2);
    if (!lin || !quad) continue;
    const exact = lin.rss < 1e-12 * m;
    const chiOk = exact || chiSquareUpperP(lin.rss, m - 2) >= ALPHA;
    const dq = Math.max(0, lin.rss - quad.rss);
    const F = quad.rss > 0 ? dq / (quad.rss / (m - 3)) : dq > 0 ? Number.POSITIVE_INFINITY : 0;
    const curvOk = exact || fUpperP(F, 1, m - 3) >= ALPHA;
    if (chiOk && curvOk) best = lineOf(lin.coef[0]!, lin.coef[1]!, xs[0]!, xs[m - 1]!, "segment", m);
  }
  if (best) return best;
  const m = Math.min(n, Math.max(END_FIT_MIN_STATIONS, Math.ceil(n / 4)));
  const t = endTangent(x.slice(n - m), y.slice(n - m), w.slice(n - m));
  return t ? lineOf(t[0], t[1], x[n - m]!, x[n - 1]!, "curve-tangent", m) : undefined;
}

/** Fewest stations of the local quadratic behind a "curve-tangent". */
export const END_FIT_MIN_STATIONS = 5;

/**
 * Tangent at the last abscissa of a weighted quadratic fit: [intercept, slope] of
 * C = (a + b·S_e + c·S_e²) + (b + 2c·S_e)·(S − S_e).
 *
 * @returns [intercept, slope], or undefined when the quadratic cannot be fitted
 */
export function endTangent(x: ArrayLike<number>, y: ArrayLike<number>, w: ArrayLike<number>): [number, number] | undefined {
  const q = polyFit(x, y, w, 2);
  if (!q) return undefined;
  let se = Number.NEGATIVE_INFINITY;
  for (let i = 0; i < x.length; i++) if (w[i]! > 0 && x[i]! > se) se = x[i]!;
  const [a, b, c] = q.coef as [number, number, number];
  const slope = b + 2 * c * se;
  return [a + b * se + c * se * se - slope * se, slope];
}

function lineOf(intercept: number, slope: number, from: number, to: number, method: TangentLine["method"], nStations: number): TangentLine {
  return { slope, intercept, fromSalinity: from, toSalinity: to, salinityRange: [from, to], method, nStations };
}

/**
 * Weighted straight line through the stations of a fixed salinity interval, with
 * bootstrap counts as extra weights (used inside the bootstrap loop).
 *
 * @returns [intercept, slope], or undefined when fewer than 2 distinct salinities carry weight
 */
export function lineInInterval(x: Float64Array, y: Float64Array, w: Float64Array, counts: Uint16Array, from: number, to: number): [number, number] | undefined {
  let sw = 0, sx = 0, sy = 0, sxx = 0, sxy = 0;
  for (let i = 0; i < x.length; i++) {
    const c = counts[i]!;
    if (c === 0 || x[i]! < from || x[i]! > to) continue;
    const wi = w[i]! * c;
    sw += wi;
    sx += wi * x[i]!;
    sy += wi * y[i]!;
    sxx += wi * x[i]! * x[i]!;
    sxy += wi * x[i]! * y[i]!;
  }
  if (sw === 0) return undefined;
  const mx = sx / sw;
  const vxx = sxx / sw - mx * mx;
  if (!(vxx > 1e-12 * (1 + mx * mx))) return undefined;
  const slope = (sxy / sw - mx * (sy / sw)) / vxx;
  return [sy / sw - slope * mx, slope];
}
