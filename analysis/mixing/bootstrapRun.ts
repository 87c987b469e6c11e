import { randomLcg, randomNormal } from "d3-random";
import { evaluateSplineGrid } from "../stats/naturalSpline.ts";
import { fitSmoothingSpline } from "../stats/smoothingSpline.ts";
import { mergeKnots } from "../stats/knotData.ts";
import { interval95, percentileSelect } from "../stats/percentile.ts";
import type { TangentLine } from "./result.ts";
import { endFitStations, endTangent, MIN_SEGMENT_STATIONS, SEGMENT_ALPHA } from "./tangent.ts";
import { scanSegments, segmentCriticals } from "./segmentScan.ts";
import { interiorMaximum, zoneFromCurve } from "./zoneAndMaximum.ts";

/** What the bootstrap needs from the full-data analysis. */
export interface BootstrapInput {
  x: Float64Array;
  y: Float64Array;
  /** 1/σ² weights of the curve fit. */
  w: Float64Array;
  /** 1/σ_eff² weights of the tangent segment. */
  wTangent: Float64Array;
  lambda: number;
  tieTol: number;
  /** Salinity grid of the replicate curves (coarser than the plotted grid to save time). */
  grid: Float64Array;
  tangent: TangentLine;
  river: { salinity: number; conc: number; sd: number };
  sea: { salinity: number; conc: number; sd: number };
  draws: number;
  seed: number;
}

/** 95 % percentile intervals of the bootstrap replicates (undefined when too few usable draws). */
export interface BootstrapResult {
  usable: number;
  effective?: [number, number];
  percent?: [number, number];
  riverConc?: [number, number];
  netDelta?: [number, number];
  zoneLower?: [number, number];
  zoneUpper?: [number, number];
  maxSalinity?: [number, number];
  maxExcess?: [number, number];
  bandLower: number[];
  bandUpper: number[];
  /** Replicates of C*₀ − C₀ and C₀ (for fluxes). */
  effectiveDraws: Float64Array;
  riverDraws: Float64Array;
}

/**
 * Seeded bootstrap over stations (resampling with replacement, as multinomial counts on
 * the salinity-ordered stations) and over the end-member standard deviations (normal draws).
 * Each replicate refits the smoothing spline at the full-data λ, re-selects the seaward linear
 * segment (so the intervals include the uncertainty of the break) or falls back to the local
 * end quadratic, and recomputes C*₀, % change, zone limits and the
 * maximum. Intervals are percentile intervals; random numbers come from d3-random's
 * randomLcg(seed), so equal seeds give equal results.
 *
 * @param b inputs
 * @returns intervals and the curve band on the grid
 * @see Efron, B. & Tibshirani, R.J. (1993) An Introduction to the Bootstrap, Chapman & Hall, ch. 6 and 13.
 */
export function runBootstrap(b: BootstrapInput): BootstrapResult {
  const n = b.x.length;
  const G = b.grid.length;
  const D = b.draws;
  const rand = randomLcg(b.seed);
  const normal = randomNormal.source(rand);
  const z = normal(0, 1);
  const eff = new Float64Array(D).fill(Number.NaN);
  const c0 = new Float64Array(D).fill(Number.NaN);
  const pct = new Float64Array(D).fill(Number.NaN);
  const zLo = new Float64Array(D).fill(Number.NaN);
  const zHi = new Float64Array(D).fill(Number.NaN);
  const mS = new Float64Array(D).fill(Number.NaN);
  const mX = new Float64Array(D).fill(Number.NaN);
  const curves = new Float64Array(D * G).fill(Number.NaN);
  const counts = new Uint16Array(n);
  const wc = new Float64Array(n);
  const wEnd = new Float64Array(n);
  const crit = segmentCriticals(n, SEGMENT_ALPHA);
  const mEnd = endFitStations(n);
  const ws = { x: new Float64Array(n), y: new Float64Array(n), w: new Float64Array(n) };
  const splineWs = {
    knots: new Float64Array(n),
    values: new Float64Array(n),
    secondDerivs: new Float64Array(n),
    count: 0,
  };
  const f = new Float64Array(G);
  const d2 = new Float64Array(G);
  const rhoWork = new Float64Array(G);
  let usable = 0;
  for (let d = 0; d < D; d++) {
    counts.fill(0);
    for (let i = 0; i < n; i++) counts[Math.min(n - 1, Math.floor(rand() * n))]!++;
    const cr = b.river.conc + b.river.sd * z();
    const cs = b.sea.conc + b.sea.sd * z();
    for (let i = 0; i < n; i++) wc[i] = b.w[i]! * counts[i]!;
    const knots = mergeKnots(b.x, b.y, wc, b.tieTol, ws);
    if (knots.n < 4) continue;
    const spline = fitSmoothingSpline(knots, b.lambda, splineWs);
    evaluateSplineGrid(spline, b.grid, f, undefined, d2);
    let line: [number, number] | undefined;
    const scan = scanSegments(b.x, b.y, b.wTangent, counts, MIN_SEGMENT_STATIONS, crit);
    const segStart = scan.start >= 0 ? b.x[scan.start]! : undefined;
    if (scan.start >= 0) line = [scan.intercept, scan.slope];
    else {
      for (let i = 0; i < n; i++) wEnd[i] = i >= n - mEnd ? b.wTangent[i]! * counts[i]! : 0;
      line = endTangent(b.x, b.y, wEnd);
    }
    if (!line) continue;
    usable++;
    curves.set(f, d * G);
    eff[d] = line[0] + line[1] * b.river.salinity;
    c0[d] = cr;
    if (cr > 0) pct[d] = (100 * (eff[d]! - cr)) / cr;
    const zone = zoneFromCurve(b.grid, d2, b.river.salinity, rhoWork, segStart);
    if (zone) {
      zLo[d] = zone.from;
      zHi[d] = zone.to;
    }
    const im = interiorMaximum(b.grid, f);
    if (im >= 0) {
      const s = b.grid[im]!;
      mS[d] = s;
      mX[d] = f[im]! - (cr + ((cs - cr) * (s - b.river.salinity)) / (b.sea.salinity - b.river.salinity));
    }
  }
  const bandLower: number[] = new Array<number>(G);
  const bandUpper: number[] = new Array<number>(G);
  const col = new Float64Array(D);
  for (let g = 0; g < G; g++) {
    let k = 0;
    for (let d = 0; d < D; d++) {
      const v = curves[d * G + g]!;
      if (Number.isFinite(v)) col[k++] = v;
    }
    bandLower[g] = percentileSelect(col, k, 0.025) ?? Number.NaN;
    bandUpper[g] = percentileSelect(col, k, 0.975) ?? Number.NaN;
  }
  const delta = eff.map((v, i) => v - c0[i]!);
  return {
    usable,
    effective: interval95(eff),
    percent: interval95(pct),
    riverConc: interval95(c0),
    netDelta: interval95(delta),
    zoneLower: interval95(zLo),
    zoneUpper: interval95(zHi),
    maxSalinity: interval95(mS),
    maxExcess: interval95(mX),
    bandLower,
    bandUpper,
    effectiveDraws: eff,
    riverDraws: c0,
  };
}
