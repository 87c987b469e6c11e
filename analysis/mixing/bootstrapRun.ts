import { evaluateSplineGrid } from "../stats/naturalSpline.ts";
import { fitPreparedSpline, prepareSmoothingSpline } from "../stats/smoothingSpline.ts";
import { mergeKnotResponses, mergeKnots } from "../stats/knotData.ts";
import { evaluatePlannedGrid, planSplineGrid } from "../stats/splineGridPlan.ts";
import { interval95, percentileSelect } from "../stats/percentile.ts";
import { intervalBc95 } from "../stats/biasCorrectedInterval.ts";
import { NormalDeviates } from "../stats/seededNormal.ts";
import type { NaturalSpline } from "../stats/naturalSpline.ts";
import type { PreparedSmoothingSpline } from "../stats/smoothingSpline.ts";
import type { SplineGridPlan } from "../stats/splineGridPlan.ts";
import {
  fitTwoPhaseReplicate,
  newTwoPhaseFit,
  twoPhaseDesign,
  twoPhaseMaximum,
  twoPhaseValue,
  type TwoPhaseDesign,
  type TwoPhaseFit,
} from "./twoPhase.ts";
import { dominantZoneSign, zoneInto, type ReactionZoneBounds } from "./zoneAndMaximum.ts";
import { riverByQuarticExtension } from "./riverExtension.ts";
import { localRiverFromWeights, localRiverWeights, type LocalWindow } from "./riverLocalPolynomial.ts";
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
   * fitted), "cubic" = the replicate's two-phase curve, "local" = the local cubic through the freshest
   * stations of `localWindow` (riverLocalPolynomial.ts; the window fixed, as the spline's λ).
   */
  riverModel?: "quartic" | "cubic" | "local";
  /** Window of the "local" river model. */
  localWindow?: LocalWindow;
  /** A user-given river value ± sd (drawn from a normal); otherwise C₀ is re-estimated from each replicate. */
  riverOverride?: { conc: number; sd: number };
  /** Extra sd of the river value (a river history within the flushing time), added to each replicate. */
  riverExtraSd?: number;
  sea: { salinity: number; conc: number; sd: number };
  draws: number;
  seed: number;
  /**
   * Full-data point estimates: when given, C*₀, % change, C₀ and C*₀ − C₀ get bias-corrected
   * percentile intervals about them (Efron 1987) instead of plain percentile intervals. BC's z₀ measures
   * the estimator's median bias from replicates of the fit that gave the estimate; `effective` undefined:
   * a plain percentile interval for C*₀ (a kept line's C*₀ with the replicates drawn around its two-phase
   * alternative; analyzeShape.ts).
   */
  estimates?: { effective: number | undefined; percent: number; riverConc: number; netDelta: number };
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
 * model selection and the intervals carry its uncertainty (Efron 2014), and no C*₀ estimate (a plain
 * percentile interval: the replicates are then not drawn around the fit that gave it).
 *
 * @param b inputs
 * @returns intervals and the curve band on the grid
 * @see Efron, B. & Tibshirani, R.J. (1993) An Introduction to the Bootstrap, Chapman & Hall, ch. 6 (parametric
 *   bootstrap) and ch. 9 (regression models: resampling on a fixed design); Efron, B. (2014) Estimation
 *   and accuracy after model selection. JASA 109, 991–1007 (bootstrap from the larger model, selection
 *   re-run in each replicate; from memory).
 */
export function runBootstrap(b: BootstrapInput): BootstrapResult {
  const st = new BootstrapDraws(b);
  drawAll(st);
  return summarise(st, b.estimates);
}

/**
 * Every replicate of {@link runBootstrap}. (A function of its own: V8 compiles this loop while it runs
 * and enters that code again on every later run; inside runBootstrap the compiled loop ran on into
 * code it had never seen run and fell back to the interpreter at the end of every run.)
 */
function drawAll(st: BootstrapDraws): void {
  for (let d = 0; d < st.D; d++) drawReplicate(st, d);
}

/** A replicate's draws filled with NaN (NaN = no value in that replicate). */
function nanDraws(D: number): Float64Array {
  return new Float64Array(D).fill(Number.NaN);
}

/**
 * Everything one {@link runBootstrap} run shares between its replicates: the inputs, the fixed design,
 * spline and grid plan, the work arrays, the reusable fit and zone, and the replicates' results.
 * One object of one fixed layout (number properties created holding doubles) that the replicate
 * code reads, whatever the caller's input object looked like: V8 compiles {@link drawReplicate}
 * once per thread instead of discarding it at each new input layout. (Structure for speed only: the
 * draws and numbers are those of the single loop this replaced.)
 */
class BootstrapDraws {
  readonly n: number;
  readonly G: number;
  readonly D: number;
  readonly x: Float64Array;
  readonly yHat: Float64Array;
  readonly sigmaEff: Float64Array;
  readonly w: Float64Array;
  readonly grid: Float64Array;
  readonly z: NormalDeviates;
  readonly eff: Float64Array;
  readonly c0: Float64Array;
  readonly pct: Float64Array;
  readonly zLo: Float64Array;
  readonly zHi: Float64Array;
  readonly mS: Float64Array;
  readonly mX: Float64Array;
  readonly brk: Float64Array;
  /** Replicate curves column by column (curves[g·D + d]): the band's percentiles read one contiguous column. */
  readonly curves: Float64Array;
  readonly ys: Float64Array;
  readonly knotWork: { x: Float64Array; y: Float64Array; w: Float64Array };
  readonly splineWork: NaturalSpline;
  readonly f: Float64Array;
  readonly d2: Float64Array;
  readonly rhoWork: Float64Array;
  readonly design: TwoPhaseDesign | undefined;
  readonly knotOf: Int32Array;
  readonly prepared: PreparedSmoothingSpline | undefined;
  readonly plan: SplineGridPlan | undefined;
  /** The replicate's two-phase fit and reaction zone (overwritten by every replicate). */
  readonly fit: TwoPhaseFit;
  readonly zone: ReactionZoneBounds;
  readonly zoneSign: -1 | 1 | undefined;
  /** The river value's model, chosen once for all replicates ({@link riverOverridden} etc.). */
  readonly river: (st: BootstrapDraws, fit: TwoPhaseFit) => number;
  // Number properties start as NaN so that V8 stores them as doubles from the start.
  readonly sr: number = Number.NaN;
  readonly sMax: number = Number.NaN;
  readonly seaSalinity: number = Number.NaN;
  readonly seaConc: number = Number.NaN;
  readonly seaSd: number = Number.NaN;
  readonly overrideConc: number = Number.NaN;
  readonly overrideSd: number = Number.NaN;
  /** Extra sd of the river value (0 = none). */
  readonly extraSd: number = Number.NaN;
  /** C*₀ averaged over the seaward end models (when the input gives mouthS2), with that s². */
  readonly mouthAverage: boolean = false;
  readonly mouthS2: number = Number.NaN;
  /** Equivalent-kernel weights of the local river model (fixed design: computed once; empty: not used). */
  readonly localWeights: Float64Array = new Float64Array(0);
  usable = 0;

  constructor(b: BootstrapInput) {
    const n = b.x.length;
    const G = b.grid.length;
    const D = b.draws;
    this.n = n;
    this.G = G;
    this.D = D;
    this.x = b.x;
    this.yHat = b.yHat;
    this.sigmaEff = b.sigmaEff;
    this.w = b.w;
    this.grid = b.grid;
    this.z = new NormalDeviates(b.seed);
    this.eff = nanDraws(D);
    this.c0 = nanDraws(D);
    this.pct = nanDraws(D);
    this.zLo = nanDraws(D);
    this.zHi = nanDraws(D);
    this.mS = nanDraws(D);
    this.mX = nanDraws(D);
    this.brk = nanDraws(D);
    this.curves = new Float64Array(D * G).fill(Number.NaN);
    this.ys = new Float64Array(n);
    this.knotWork = { x: new Float64Array(n), y: new Float64Array(n), w: new Float64Array(n) };
    this.splineWork = {
      knots: new Float64Array(n),
      values: new Float64Array(n),
      secondDerivs: new Float64Array(n),
      count: 0,
    };
    this.f = new Float64Array(G);
    this.d2 = new Float64Array(G);
    this.rhoWork = new Float64Array(G);
    this.sr = b.referenceSalinity;
    this.sMax = b.x[n - 1]!;
    // The station design is fixed: its break-search sums are built once for all replicates.
    this.design = twoPhaseDesign(b.x, b.w);
    // So are the spline's merged knots, weights and λ: its band system is factored once.
    this.knotOf = new Int32Array(n);
    const knots0 = mergeKnots(b.x, b.yHat, b.w, b.tieTol, this.knotWork, this.knotOf);
    this.prepared = knots0.n >= 4 ? prepareSmoothingSpline(knots0, b.lambda) : undefined;
    // And the replicate curves' knots on the grid: interval and weights of every grid point.
    this.plan = this.prepared && planSplineGrid(this.prepared.x, this.prepared.n, b.grid);
    this.fit = newTwoPhaseFit();
    this.zone = { from: Number.NaN, to: Number.NaN, kind: "removal" };
    this.zoneSign = b.zoneSign;
    this.seaSalinity = b.sea.salinity;
    this.seaConc = b.sea.conc;
    this.seaSd = b.sea.sd;
    if (b.riverOverride) {
      this.overrideConc = b.riverOverride.conc;
      this.overrideSd = b.riverOverride.sd;
    }
    this.extraSd = b.riverExtraSd ?? 0;
    if (b.mouthS2 !== undefined) {
      this.mouthAverage = true;
      this.mouthS2 = b.mouthS2;
    }
    const lw =
      b.riverModel === "local" && b.localWindow
        ? localRiverWeights(b.x, b.w, b.localWindow, b.referenceSalinity)
        : undefined;
    if (lw) this.localWeights = lw;
    this.river = b.riverOverride
      ? riverOverridden
      : b.riverModel === "quartic"
        ? riverQuartic
        : lw
          ? riverLocal
          : riverCubic;
  }
}

/** River value of a replicate: the user's value ± sd, drawn from a normal. */
function riverOverridden(st: BootstrapDraws): number {
  return st.overrideConc + st.overrideSd * st.z.next();
}

/** River value of a replicate: the quartic extension of its landward phase, else its two-phase curve. */
function riverQuartic(st: BootstrapDraws, fit: TwoPhaseFit): number {
  return riverByQuarticExtension(st.x, st.ys, st.w, fit, st.sr) ?? twoPhaseValue(fit, st.sr);
}

/** River value of a replicate: the local cubic through its freshest stations, else its two-phase curve. */
function riverLocal(st: BootstrapDraws, fit: TwoPhaseFit): number {
  return localRiverFromWeights(st.localWeights, st.ys) ?? twoPhaseValue(fit, st.sr);
}

/** River value of a replicate: its two-phase curve at the reference salinity. */
function riverCubic(st: BootstrapDraws, fit: TwoPhaseFit): number {
  return twoPhaseValue(fit, st.sr);
}

/** Replicate d of {@link runBootstrap}: draws its concentrations, refits and stores its results. */
function drawReplicate(st: BootstrapDraws, d: number): void {
  const n = st.n;
  const ys = st.ys;
  const yHat = st.yHat;
  const sigmaEff = st.sigmaEff;
  const z = st.z;
  for (let i = 0; i < n; i++) ys[i] = yHat[i]! + sigmaEff[i]! * z.next();
  const cs = st.seaConc + st.seaSd * z.next();
  const design = st.design;
  if (!design) return;
  const fit = fitTwoPhaseReplicate(design, st.x, ys, st.w, st.fit);
  if (!fit) return;
  // The seaward line C = ic + sl·S (seawardLine, without its array).
  const sl = fit.coef[1] / fit.range;
  const ic = fit.coef[0] - sl * fit.sMin;
  const sr = st.sr;
  const cr = st.river(st, fit) + (st.extraSd ? st.extraSd * z.next() : 0);
  st.usable++;
  const eff = st.eff;
  eff[d] = ic + sl * sr;
  // Only a seaward line on < MIN_SEAWARD_STATIONS stations is averaged (the check saves the call).
  if (st.mouthAverage && !fit.linear && n > MIN_SEAWARD_STATIONS && st.x[n - MIN_SEAWARD_STATIONS]! < fit.breakSalinity)
    eff[d] = mouthAveragedEffective(st.x, ys, st.w, fit, sr, st.mouthS2).value;
  st.c0[d] = cr;
  if (cr > 0) st.pct[d] = (100 * (eff[d]! - cr)) / cr;
  if (!fit.linear) st.brk[d] = fit.breakAveraged ?? fit.breakSalinity;
  const m = twoPhaseMaximum(fit, st.sMax);
  if (m !== undefined) {
    st.mS[d] = m;
    st.mX[d] = twoPhaseValue(fit, m) - (cr + ((cs - cr) * (m - sr)) / (st.seaSalinity - sr));
  }
  const prepared = st.prepared;
  if (!prepared) return;
  const knotY = st.knotWork.y;
  mergeKnotResponses(st.knotOf, st.w, ys, prepared.w, prepared.n, knotY);
  const spline = fitPreparedSpline(prepared, knotY, st.splineWork);
  const f = st.f;
  const d2 = st.d2;
  if (st.plan) evaluatePlannedGrid(st.plan, spline.values, spline.secondDerivs, f, d2);
  else evaluateSplineGrid(spline, st.grid, f, undefined, d2);
  const G = st.G;
  const D = st.D;
  const curves = st.curves;
  for (let g = 0; g < G; g++) curves[g * D + d] = f[g]!;
  const zone = st.zone;
  const segmentStart = fit.linear ? undefined : fit.breakSalinity;
  const sign = st.zoneSign ?? dominantZoneSign(st.grid, d2, sr, segmentStart);
  if (zoneInto(st.grid, d2, sr, st.rhoWork, segmentStart, sign, zone)) {
    st.zLo[d] = zone.from;
    st.zHi[d] = zone.to;
  }
}

/**
 * 2.5 and 97.5 percentiles of the replicate curves at each grid point (curves[g·D + d]) into lower
 * and upper. (A function of its own: its loop runs long enough for V8 to compile it while it runs,
 * which leaves no uncompiled code around it.)
 */
function bandInto(
  curves: Float64Array,
  G: number,
  D: number,
  col: Float64Array,
  lower: number[],
  upper: number[],
): void {
  for (let g = 0; g < G; g++) {
    const k = finiteColumn(curves, g * D, D, col);
    lower[g] = percentileSelect(col, k, 0.025) ?? Number.NaN;
    upper[g] = percentileSelect(col, k, 0.975) ?? Number.NaN;
  }
}

/**
 * Copies the finite values of curves[o … o + D) into col and returns their count. (A function of its
 * own: V8 compiled this inner loop alone while it ran, and left that code at the end of every column,
 * once per grid point, back to the interpreter for the outer loop.)
 */
function finiteColumn(curves: Float64Array, o: number, D: number, col: Float64Array): number {
  let k = 0;
  for (let d = 0; d < D; d++) {
    const v = curves[o + d]!;
    if (Number.isFinite(v)) col[k++] = v;
  }
  return k;
}

/** Intervals and band of the finished replicates of {@link runBootstrap}. */
function summarise(st: BootstrapDraws, est: BootstrapInput["estimates"]): BootstrapResult {
  const G = st.G;
  const D = st.D;
  const eff = st.eff;
  const c0 = st.c0;
  const bandLower: number[] = new Array<number>(G);
  const bandUpper: number[] = new Array<number>(G);
  bandInto(st.curves, G, D, new Float64Array(D), bandLower, bandUpper);
  let s1 = 0,
    s2 = 0,
    k = 0;
  for (let d = 0; d < D; d++) {
    const v = c0[d]!;
    if (Number.isFinite(v)) {
      s1 += v;
      s2 += v * v;
      k++;
    }
  }
  const delta = new Float64Array(D);
  for (let d = 0; d < D; d++) delta[d] = eff[d]! - c0[d]!;
  return {
    usable: st.usable,
    effective: est?.effective !== undefined ? intervalBc95(eff, est.effective) : interval95(eff),
    percent: est ? intervalBc95(st.pct, est.percent) : interval95(st.pct),
    riverConc: est ? intervalBc95(c0, est.riverConc) : interval95(c0),
    riverSe: k >= 2 ? Math.sqrt(Math.max(0, (s2 - (s1 * s1) / k) / (k - 1))) : undefined,
    netDelta: est ? intervalBc95(delta, est.netDelta) : interval95(delta),
    zoneLower: interval95(st.zLo),
    zoneUpper: interval95(st.zHi),
    maxSalinity: interval95(st.mS),
    maxExcess: interval95(st.mX),
    breakSalinity: interval95(st.brk),
    bandLower,
    bandUpper,
    effectiveDraws: eff,
    riverDraws: c0,
  };
}
