import { evaluateSplineGrid } from "../stats/naturalSpline.ts";
import { fitPreparedSpline, prepareSmoothingSpline } from "../stats/smoothingSpline.ts";
import { mergeKnotResponses, mergeKnots } from "../stats/knotData.ts";
import { evaluatePlannedGrid, planSplineGrid } from "../stats/splineGridPlan.ts";
import { interval95, percentileSelect } from "../stats/percentile.ts";
import { intervalBc95 } from "../stats/biasCorrectedInterval.ts";
import { seededNormal } from "../stats/seededNormal.ts";
import { fitTwoPhase, seawardLine, twoPhaseDesign, twoPhaseMaximum, twoPhaseValue } from "./twoPhase.ts";
import { zoneFromCurve } from "./zoneAndMaximum.ts";
import { riverByQuarticExtension } from "./riverExtension.ts";
import { MIN_SEAWARD_STATIONS, mouthAveragedEffective } from "./twoPhaseMouth.ts";

/** What the bootstrap needs from the full-data analysis. */
export interface BootstrapInput {
  x: Float64Array;
  /** Fitted mean at each station (the two-phase model): the replicates are drawn around it. */
  yHat: Float64Array;
  /** σ_eff at each station: analytical σ times max(1, √χ²_ν of the two-phase fit). */
  sigmaEff: Float64Array;
  /** 1/σ² weights of the curve fit. */
  w: Float64Array;
  lambda: number;
  tieTol: number;
  /** Salinity grid of the replicate curves (coarser than the plotted grid to save time). */
  grid: Float64Array;
  /** Reference salinity of the river end-member (0 unless stated). */
  referenceSalinity: number;
  /**
   * Model of the river value at the reference salinity in each replicate: "quartic" = the quartic
   * extension of the replicate's landward phase (riverExtension.ts; the cubic phase where it cannot be
   * fitted), "cubic" = the replicate's two-phase curve.
   */
  riverModel?: "quartic" | "cubic";
  /** A user-given river value ± sd (drawn from a normal); otherwise C₀ is re-estimated from each replicate. */
  riverOverride?: { conc: number; sd: number };
  /** Extra sd of the river value (a river history within the flushing time), added to each replicate. */
  riverExtraSd?: number;
  sea: { salinity: number; conc: number; sd: number };
  draws: number;
  seed: number;
  /**
   * Full-data point estimates: when given, C*₀, % change, C₀ and C*₀ − C₀ get bias-corrected
   * percentile intervals about them (Efron 1987) instead of plain percentile intervals.
   */
  estimates?: { effective: number; percent: number; riverConc: number; netDelta: number };
  /** Sign of the reaction zone to locate in each replicate (that of the point estimate's net change). */
  zoneSign?: -1 | 1;
  /**
   * When given (the full-data max(1, χ²_ν)), each replicate's C*₀ is averaged over the seaward end
   * models as the point estimate is (twoPhaseMouth.ts, Buckland et al. 1997).
   */
  mouthS2?: number;
}

/** 95 % percentile intervals of the bootstrap replicates (undefined when too few usable draws). */
export interface BootstrapResult {
  usable: number;
  effective?: [number, number];
  percent?: [number, number];
  riverConc?: [number, number];
  /** Standard deviation of the replicate C₀ (the river end-member's standard error). */
  riverSe?: number;
  netDelta?: [number, number];
  zoneLower?: [number, number];
  zoneUpper?: [number, number];
  maxSalinity?: [number, number];
  maxExcess?: [number, number];
  breakSalinity?: [number, number];
  bandLower: number[];
  bandUpper: number[];
  effectiveDraws: Float64Array;
  riverDraws: Float64Array;
}

/**
 * Seeded parametric bootstrap on the fixed station design: each replicate keeps the stations'
 * salinities and draws C*ᵢ = Ĉ(Sᵢ) + σ_eff,ᵢ·z (z standard normal) around the fitted two-phase
 * curve, then refits everything — the two-phase model with its break (so C*₀ carries the break
 * uncertainty), the river value at the reference salinity from the same fit, the smoothing spline
 * at the full-data λ (band, zone) and the maximum. No station is duplicated or dropped, so the
 * linearity tests see the design the survey had. Intervals are percentile intervals, bias-corrected
 * (BC, Efron 1987) about the full-data estimates when those are given. When the full-data fit kept
 * the straight line, the caller passes the best two-phase fit as Ĉ so that every replicate re-runs the
 * model selection and the intervals carry its uncertainty (Efron 2014).
 *
 * @param b inputs
 * @returns intervals and the curve band on the grid
 * @see Efron, B. & Tibshirani, R.J. (1993) An Introduction to the Bootstrap, Chapman & Hall, ch. 6 (parametric
 *   bootstrap) and ch. 9 (regression models: resampling on a fixed design); Efron, B. (2014) Estimation
 *   and accuracy after model selection. JASA 109, 991–1007 (bootstrap from the larger model, selection
 *   re-run in each replicate; from memory).
 */
export function runBootstrap(b: BootstrapInput): BootstrapResult {
  const n = b.x.length;
  const G = b.grid.length;
  const D = b.draws;
  const z = seededNormal(b.seed);
  const nan = (): Float64Array => new Float64Array(D).fill(Number.NaN);
  const eff = nan();
  const c0 = nan();
  const pct = nan();
  const zLo = nan();
  const zHi = nan();
  const mS = nan();
  const mX = nan();
  const brk = nan();
  // Replicate curves column by column (curves[g·D + d]): the band's percentiles read one contiguous column.
  const curves = new Float64Array(D * G).fill(Number.NaN);
  const ys = new Float64Array(n);
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
  const sr = b.referenceSalinity;
  const sMax = b.x[n - 1]!;
  // The station design is fixed: its break-search sums are built once for all replicates.
  const design = twoPhaseDesign(b.x, b.w);
  // So are the spline's merged knots, weights and λ: its band system is factored once.
  const knotOf = new Int32Array(n);
  const knots0 = mergeKnots(b.x, b.yHat, b.w, b.tieTol, ws, knotOf);
  const prepared = knots0.n >= 4 ? prepareSmoothingSpline(knots0, b.lambda) : undefined;
  // And the replicate curves' knots on the grid: interval and weights of every grid point.
  const plan = prepared && planSplineGrid(prepared.x, prepared.n, b.grid);
  let usable = 0;
  for (let d = 0; d < D; d++) {
    for (let i = 0; i < n; i++) ys[i] = b.yHat[i]! + b.sigmaEff[i]! * z();
    const cs = b.sea.conc + b.sea.sd * z();
    const fit = design && fitTwoPhase(b.x, ys, b.w, false, design);
    if (!fit) continue;
    const [ic, sl] = seawardLine(fit);
    const cr =
      (b.riverOverride
        ? b.riverOverride.conc + b.riverOverride.sd * z()
        : b.riverModel === "quartic"
          ? (riverByQuarticExtension(b.x, ys, b.w, fit, sr) ?? twoPhaseValue(fit, sr))
          : twoPhaseValue(fit, sr)) + (b.riverExtraSd ? b.riverExtraSd * z() : 0);
    usable++;
    eff[d] = ic + sl * sr;
    // Only a seaward line on < MIN_SEAWARD_STATIONS stations is averaged (the check saves the call).
    if (
      b.mouthS2 !== undefined &&
      !fit.linear &&
      n > MIN_SEAWARD_STATIONS &&
      b.x[n - MIN_SEAWARD_STATIONS]! < fit.breakSalinity
    )
      eff[d] = mouthAveragedEffective(b.x, ys, b.w, fit, sr, b.mouthS2).value;
    c0[d] = cr;
    if (cr > 0) pct[d] = (100 * (eff[d]! - cr)) / cr;
    if (!fit.linear) brk[d] = fit.breakAveraged ?? fit.breakSalinity;
    const m = twoPhaseMaximum(fit, sMax);
    if (m !== undefined) {
      mS[d] = m;
      mX[d] = twoPhaseValue(fit, m) - (cr + ((cs - cr) * (m - sr)) / (b.sea.salinity - sr));
    }
    if (!prepared) continue;
    mergeKnotResponses(knotOf, b.w, ys, prepared.w, prepared.n, ws.y);
    const spline = fitPreparedSpline(prepared, ws.y, splineWs);
    if (plan) evaluatePlannedGrid(plan, spline.values, spline.secondDerivs, f, d2);
    else evaluateSplineGrid(spline, b.grid, f, undefined, d2);
    for (let g = 0; g < G; g++) curves[g * D + d] = f[g]!;
    const zone = zoneFromCurve(b.grid, d2, sr, rhoWork, fit.linear ? undefined : fit.breakSalinity, b.zoneSign);
    if (zone) {
      zLo[d] = zone.from;
      zHi[d] = zone.to;
    }
  }
  const bandLower: number[] = new Array<number>(G);
  const bandUpper: number[] = new Array<number>(G);
  const col = new Float64Array(D);
  for (let g = 0; g < G; g++) {
    let k = 0;
    for (let d = 0, o = g * D; d < D; d++) {
      const v = curves[o + d]!;
      if (Number.isFinite(v)) col[k++] = v;
    }
    bandLower[g] = percentileSelect(col, k, 0.025) ?? Number.NaN;
    bandUpper[g] = percentileSelect(col, k, 0.975) ?? Number.NaN;
  }
  let s1 = 0,
    s2 = 0,
    k = 0;
  for (const v of c0)
    if (Number.isFinite(v)) {
      s1 += v;
      s2 += v * v;
      k++;
    }
  const delta = eff.map((v, i) => v - c0[i]!);
  const est = b.estimates;
  return {
    usable,
    effective: est ? intervalBc95(eff, est.effective) : interval95(eff),
    percent: est ? intervalBc95(pct, est.percent) : interval95(pct),
    riverConc: est ? intervalBc95(c0, est.riverConc) : interval95(c0),
    riverSe: k >= 2 ? Math.sqrt(Math.max(0, (s2 - (s1 * s1) / k) / (k - 1))) : undefined,
    netDelta: est ? intervalBc95(delta, est.netDelta) : interval95(delta),
    zoneLower: interval95(zLo),
    zoneUpper: interval95(zHi),
    maxSalinity: interval95(mS),
    maxExcess: interval95(mX),
    breakSalinity: interval95(brk),
    bandLower,
    bandUpper,
    effectiveDraws: eff,
    riverDraws: c0,
  };
}
