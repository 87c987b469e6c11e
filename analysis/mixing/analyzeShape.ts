import type {
  BehaviourClass,
  Estimate,
  MixingEvidence,
  ConstituentAnalysis,
  DilutionLine,
  Endmember,
  FitCurve,
  MixingWarning,
  TangentLine,
} from "./result.ts";
import type { AnalyzeOptions, Precision } from "./options.ts";
import type { PreparedSample } from "./prepareSamples.ts";
import type { CurveFitResult } from "./curveFit.ts";
import { salinityGrid, TIE_FRACTION } from "./curveFit.ts";
import { evaluateSplineGrid } from "../stats/naturalSpline.ts";
import { runBootstrap } from "./bootstrapRun.ts";
import { zoneFromCurve } from "./zoneAndMaximum.ts";
import { alternativeFit, twoPhaseAt, twoPhaseMaximum, type TwoPhaseFit } from "./twoPhase.ts";
import { verdictOf } from "./verdict.ts";
import { classify } from "./classify.ts";
import { dilutionAt } from "./dilutionLine.ts";
import { fluxSummary } from "./flux.ts";
import { rateProfile } from "./rateProfile.ts";
import { estimateOf, finiteEstimate } from "./estimate.ts";
import { bootstrapBiasCorrected } from "../stats/bootstrapBias.ts";
import { fitQuarticExtension, riverModelSpread } from "./riverExtension.ts";
import { coarseExtrapolationWarning } from "./riverReference.ts";
import { MIN_SEAWARD_STATIONS, mouthAveragedEffective, mouthModelWeight } from "./twoPhaseMouth.ts";
import { reactionExtent } from "./reactionExtent.ts";
import { breakModelSpread } from "./breakModelSpread.ts";
import { breakProfile, type BreakProfile } from "./breakGrid.ts";
import { localRiverModelSpread, localRiverWindow, riverByLocalCubic } from "./riverLocalPolynomial.ts";

/** Inputs of {@link analyzeShape}: the full-data pieces computed by analyzeConstituent. */
export interface ShapeInput {
  used: PreparedSample[];
  options: AnalyzeOptions;
  precision: Precision;
  river: Endmember;
  sea: Endmember;
  line: DilutionLine;
  curve: CurveFitResult;
  twoPhase: TwoPhaseFit;
  tangent: TangentLine;
  /** Extra river sd from a river history within the flushing time (Loder & Reichard 1981). */
  riverExtraSd?: number;
  /** The freshest stations' group (mean, sd, salinity): the river when extrapolation is not possible. */
  riverGroup: Endmember;
  evidence: MixingEvidence;
  nonConservative: boolean;
  quadCoef: number;
  warnings: MixingWarning[];
}

/** Grid points of the bootstrap replicate curves (band, zone and maximum intervals). */
export const BOOTSTRAP_GRID_POINTS = 41;

/** Linear interpolation of ys given on ascending xs at x. */
function interpolate(xs: Float64Array, ys: number[], x: number): number {
  let i = 0;
  while (i < xs.length - 2 && x > xs[i + 1]!) i++;
  const t = (x - xs[i]!) / (xs[i + 1]! - xs[i]!);
  return ys[i]! + t * (ys[i + 1]! - ys[i]!);
}

/** Half-width (salinity units) of a break interval the tool calls located; wider intervals get a warning. */
export const BREAK_GOAL_S = 2;

/**
 * Largest bootstrap standard error of the extrapolated river value, as a fraction of it, before the
 * extrapolation to the reference salinity is called unstable and the freshest stations' mean is used
 * at their own salinity instead: one third, where the 95 % interval of C₀ reaches down to about a third
 * of C₀ (1 − 1.96/3 ≈ 0.35) and the % change's upper limit is no longer bounded in practice. Below it
 * the quartic extension is kept with its wide interval rather than swapped for the cubic landward phase
 * or the freshest stations' mean, whose smaller spread hides a model error (documented choice;
 * calibration, desorption ending at S 5, 20 km-even stations, 5 % noise: with a limit of 0.2 those swaps
 * gave a % change bias of −6.8 pp and 81 % coverage, with one third −1.3 pp and 96 %; a river history
 * within the flushing time, Loder & Reichard 1981, still sends C₀ to the freshest stations' mean).
 */
export const RIVER_SE_LIMIT = 1 / 3;

/** Smallest χ²_ν of the two-phase fit at which C₀ and C*₀ are bootstrap bias-corrected (documented choice). */
export const BIAS_CORRECTION_MIN_CHI2 = 0.25;

/** Fewest stations on the straight seaward line before a `short-seaward-line` warning (twoPhaseMouth.ts). */
export { MIN_SEAWARD_STATIONS };

/**
 * Akaike weight of "the reaction reaches the mouth" (twoPhaseMouth.ts mouthModelWeight) from which a
 * seaward line of ≥ 4 stations gets a `seaward-line-untested` warning (documented choice: that model is
 * then within ΔAIC ≈ 5.9 of the fit, not excluded by the data).
 */
export const MOUTH_WEIGHT_WARN = 0.05;

/** −1 for a net removal, +1 for a net addition (the quadratic coefficient decides a zero change, as in classify). */
function netSign(netDelta: number, quadCoef: number): -1 | 1 {
  if (netDelta !== 0 && Number.isFinite(netDelta)) return netDelta < 0 ? -1 : 1;
  return quadCoef > 0 ? -1 : 1;
}

/** Fewest stations inside a reaction zone before a warning. */
export const MIN_ZONE_STATIONS = 3;

/**
 * Second half of analyzeConstituent: curve on a grid, C₀ and C*₀ at the reference salinity and
 * % change from the two-phase fit, parametric-bootstrap intervals on the fixed design, class and
 * verdict, reaction zone, maximum (root of dC/dS of the two-phase curve), fluxes and rate profile
 * (curvature of the two-phase curve, checked against Q·(C*₀ − C₀)).
 *
 * @param p full-data pieces
 * @returns the shape-dependent parts of {@link ConstituentAnalysis}
 */
export function analyzeShape(p: ShapeInput): {
  cls: BehaviourClass;
  river: Endmember;
  /** The river end-member was replaced by the freshest stations' mean (the dilution line must follow). */
  riverReplaced: boolean;
  fit: FitCurve;
  effective: ConstituentAnalysis["effectiveEndmember"];
  percent?: ConstituentAnalysis["percentChange"];
  flux?: ConstituentAnalysis["flux"];
  zone?: ConstituentAnalysis["reactionZone"];
  maximum?: ConstituentAnalysis["maximum"];
  rate?: ConstituentAnalysis["rateProfile"];
  bootstrap: NonNullable<ConstituentAnalysis["bootstrap"]>;
  breakSalinity?: Estimate;
  verdict?: string;
  warnings: MixingWarning[];
} {
  const { used, options: o, sea, line, curve, tangent, twoPhase: tp } = p;
  let river = p.river;
  const warnings: MixingWarning[] = [];
  const unit = o.unit;
  const n = used.length;
  const sMin = used[0]!.salinity;
  const sMax = used[n - 1]!.salinity;
  const G = o.gridPoints ?? 81;
  const grid = salinityGrid(sMin, sMax, G);
  const f = new Float64Array(G);
  const d1 = new Float64Array(G);
  const d2 = new Float64Array(G);
  evaluateSplineGrid(curve.spline, grid, f, d1, d2);

  const draws = o.bootstrapDraws ?? 2000;
  const bGrid = salinityGrid(sMin, sMax, Math.min(G, BOOTSTRAP_GRID_POINTS));
  const seed = o.seed ?? 1;
  const x = Float64Array.from(used, (s) => s.salinity);
  // Replicates are drawn around the two-phase fit; when the straight line was kept, around the best
  // two-phase alternative it was tested against, so each replicate re-runs the selection (Efron 2014).
  // The C*₀ interval is then a plain percentile interval, not bias-corrected (BC, Efron 1987) about the
  // kept line's C*₀: BC's z₀ = Φ⁻¹(share of replicates below θ̂) measures the median bias of θ̂ only when
  // the replicates come from the fit that gave θ̂. Here they are a mixture: replicates that keep the line
  // scatter about θ̂, those that select the two-phase model lie on the alternative's side; z₀ then
  // measures that lopsidedness, and BC moves the interval away from the side an undetected reaction lies
  // on while lengthening the other (calibration, bench/calibration, 2,000 draws, 400 surveys per cell:
  // conservative C*₀ coverage 97–99 % with BC, 97–98 % without; 200 draws, 100 surveys: weak reactions the
  // line test often misses (`--weak`), C*₀ coverage 77–99 % with BC, 80–99 % without, mean over 24 cells 91 → 93 %).
  // The % change keeps BC: a percentile interval there gained for salinity-even weak reactions (+4 to
  // +10 pp) but lost at 5 % noise (−3 to −8 pp) and widened the conservative intervals.
  // Tried and dropped: drawing the replicates around the kept line (weak reactions' C*₀ coverage −5 to
  // −15 pp); Efron's (2014) smoothed-bootstrap sd about the kept line (conservative C*₀ still 98–100 %).
  const centre: TwoPhaseFit = tp.linear && tp.alternative ? alternativeFit(tp, tp.alternative) : tp;
  // Typed arrays, as everywhere the fits run (one array kind keeps V8's compiled fitting code).
  const conc = Float64Array.from(used, (s) => s.conc);
  const wts = Float64Array.from(used, (s) => 1 / s.sigma ** 2);
  // River value at S_ref from the quartic extension of the landward phase (riverExtension.ts) when the
  // stations allow, recomputed in every replicate. The replicates stay drawn around the cubic two-phase
  // fit: drawing them around the quartic curve made the C*₀ intervals cover less (calibration).
  const quarticRiver =
    !tp.linear && p.river.source !== "override" && fitQuarticExtension(x, conc, wts, tp) !== undefined;
  const yHat = Float64Array.from(used, (s) => twoPhaseAt(centre, s.salinity)[0]);
  let riverModel: "quartic" | "cubic" | "local" = quarticRiver ? "quartic" : "cubic";
  // Where ≥ 7 stations lie in the window (S < h, h = min(upper end of the break's likelihood confidence
  // set, max(S 5, its lower end)); localRiverWindow), C₀ comes from a local cubic through them instead (riverLocalPolynomial.ts; Fan &
  // Gijbels 1996), recomputed in every replicate with the same window: it does not end at the two-phase
  // fit's break, which the data often do not locate, and whose misplacement biased C₀ and the % change
  // (calibration, desorption ending at S 5, 20 km-even stations, 5 % noise, 400 surveys, 2,000 draws: % change bias
  // −3.0 pp with the model-averaged quartic extension; see README).
  // The refits at the candidate breaks, computed once for the local window and the between-break spreads.
  let profile: BreakProfile | undefined | null = null;
  const profileOnce = (): BreakProfile | undefined =>
    profile === null ? (profile = breakProfile(x, conc, wts)) : profile;
  const localWin =
    !tp.linear && p.river.source !== "override" && tangent.method === "segment"
      ? localRiverWindow(x, conc, wts, tp, profileOnce())
      : undefined;
  const localC0 = localWin && riverByLocalCubic(x, conc, wts, localWin, river.salinity);
  if (localWin && localC0 !== undefined && localC0 > 0) {
    riverModel = "local";
    river = {
      ...river,
      conc: localC0,
      method: `local cubic at S = ${river.salinity} through the ${localWin.count} freshest stations (S ${sMin.toFixed(2)}–${x[localWin.count - 1]!.toFixed(2)}, window S < ${localWin.h.toFixed(1)})`,
    };
  }
  const dof = Math.max(1, n - tp.params);
  const scatter = Math.max(1, Math.sqrt(tp.rss / dof));
  const boot = (sRef: number, rv: Endmember, override: boolean, effectiveAt: number) =>
    runBootstrap({
      x,
      yHat,
      riverModel,
      localWindow: localWin,
      sigmaEff: Float64Array.from(used, (s) => s.sigma * scatter),
      w: Float64Array.from(used, (s) => 1 / s.sigma ** 2),
      lambda: curve.lambda,
      tieTol: TIE_FRACTION * (sMax - sMin),
      grid: bGrid,
      referenceSalinity: sRef,
      riverOverride: override ? { conc: rv.conc, sd: rv.concSd } : undefined,
      riverExtraSd: p.riverExtraSd,
      sea: { salinity: sea.salinity, conc: sea.conc, sd: sea.concSd / Math.sqrt(Math.max(1, sea.n)) },
      draws,
      seed,
      estimates: {
        // A kept line's C*₀: plain percentile interval (replicates drawn around its alternative, see above).
        effective: centre === tp ? effectiveAt : undefined,
        percent: rv.conc > 0 ? (100 * (effectiveAt - rv.conc)) / rv.conc : Number.NaN,
        riverConc: rv.conc,
        netDelta: effectiveAt - rv.conc,
      },
      zoneSign: netSign(effectiveAt - rv.conc, p.quadCoef),
      mouthS2: scatter * scatter,
    });
  let override = river.source === "override";
  // The straight line through all stations is rejected yet kept (no seaward phase separates): its
  // value at S = 0 is no estimate of the river, so the freshest stations' mean is used.
  const lineRejected = tp.linear && (p.nonConservative || p.evidence.chiSquaredP < 0.01);
  let riverReplaced = false;
  const useGroup = (why: string): void => {
    const g = p.riverGroup;
    river = {
      ...g,
      concSd: g.n >= 2 ? g.concSd / Math.sqrt(g.n) : g.concSd,
      method: `mean of the freshest stations at S = ${g.salinity.toFixed(2)} (${why})`,
    };
    override = true;
    riverReplaced = true;
  };
  if (!override && lineRejected) useGroup("no curve to extrapolate along");
  let sr = river.salinity;
  // C*₀ averaged over the seaward end models where the seaward line is short (twoPhaseMouth.ts).
  const mouthAverageAt = (s: number) => mouthAveragedEffective(x, conc, wts, tp, s, scatter * scatter);
  let mouthAverage = mouthAverageAt(sr);
  let cStar = mouthAverage.value;
  let bs = boot(sr, river, override, cStar);
  if (
    !override &&
    riverModel !== "cubic" &&
    draws > 0 &&
    (!(river.conc > 0) || (bs.riverSe !== undefined && bs.riverSe > RIVER_SE_LIMIT * Math.abs(river.conc)))
  ) {
    // The quartic extension's (or local cubic's) interval reaches zero with this noise: the cubic landward phase instead.
    river = { ...river, conc: twoPhaseAt(tp, sr)[0] };
    riverModel = "cubic";
    bs = boot(sr, river, override, cStar);
  }
  if (
    !override &&
    draws > 0 &&
    (!(river.conc > 0) || (bs.riverSe !== undefined && bs.riverSe > RIVER_SE_LIMIT * Math.abs(river.conc)))
  ) {
    const extrapolated = river.conc;
    const se = bs.riverSe;
    useGroup("extrapolation to S = 0 unstable");
    warnings.push({
      code: "river-extrapolation-unstable",
      message: `Extrapolating the fitted curve from the freshest stations to S = ${sr} gives C₀ = ${extrapolated.toPrecision(3)} ${unit}${se !== undefined ? ` ± ${se.toPrecision(2)} (bootstrap standard error)` : ""}, too uncertain to use: the freshest stations disagree more than a mixing curve explains (river variability or a steep change at the lowest salinities). C₀ and C*₀ are given at the freshest stations' salinity S = ${river.salinity.toFixed(2)} instead. A river sample upstream of the salt intrusion would settle it.`,
    });
    sr = river.salinity;
    mouthAverage = mouthAverageAt(sr);
    cStar = mouthAverage.value;
    bs = boot(sr, river, override, cStar);
  }
  if (draws > 0 && bs.usable < 0.9 * draws)
    warnings.push({
      code: "bootstrap-degenerate",
      message: `Only ${bs.usable} of ${draws} bootstrap draws were usable; intervals are rough.`,
    });
  if (!override && bs.riverSe !== undefined && Number.isFinite(bs.riverSe)) river = { ...river, concSd: bs.riverSe };
  // Bootstrap bias correction of C₀ (extrapolated along the cubic curve) and C*₀ (break selection): both
  // are nonlinear in the data and biased by the noise (Efron & Tibshirani 1993). Only for a two-phase
  // fit (the kept line gives C*₀ = C₀ by construction) and only where the residuals show noise of
  // the stated precision (χ²_ν ≥ {@link BIAS_CORRECTION_MIN_CHI2}): on data far smoother than that
  // the replicates' noise is not the data's. The tangent drawn stays the fitted line.
  if (draws > 0 && !tp.linear && tp.rss / dof >= BIAS_CORRECTION_MIN_CHI2) {
    // A correction that leaves the bootstrap interval is not credible (skewed, unstable replicates).
    const within = (v: number, iv: [number, number] | undefined, fallback: number): number =>
      iv && v >= iv[0] && v <= iv[1] ? v : fallback;
    // C₀ from the quartic extension is not corrected: its bias is small and the correction's extra
    // variance (not in the bootstrap distribution) would make the interval cover less (calibration).
    if (!override && riverModel === "cubic")
      river = { ...river, conc: within(bootstrapBiasCorrected(bs.riverDraws, river.conc), bs.riverConc, river.conc) };
    cStar = within(bootstrapBiasCorrected(bs.effectiveDraws, cStar), bs.effective, cStar);
  }
  // The profile over breaks with the quartic river model, computed once: C₀'s average below and the
  // between-break spread further down use the same refits.
  let quarticSpread: ReturnType<typeof breakModelSpread> | null = null;
  const quarticBreakSpread = () => (quarticSpread ??= breakModelSpread(x, conc, wts, tp, sr, "quartic", profileOnce()));
  // C₀ from the quartic extension ends its landward model at the fit's break, which the data may not locate
  // (flat profile): the profile-likelihood (Akaike-weighted) average of C₀ over the candidate breaks,
  // the model-averaged estimator of Buckland et al. (1997), in place of the best break's C₀
  // (breakModelSpread.ts). The replicates keep the best break's C₀ (averaging in each of them costs 25
  // refits): the intervals are those of the best-break estimator, widened to contain the point estimate
  // (estimateOf). Calibration (desorption ending at S 5, 20 km-even stations, 5 % noise, 400 surveys, 200
  // draws): % change bias −4.2 → −3.1 pp, RMSE 19.4 → 16.5 pp; moving the interval with the estimate
  // instead raised the coverage of cells already at 94–98 % by up to 4 pp.
  // As the bias correction, only where the residuals show noise of the stated precision (χ²_ν ≥
  // BIAS_CORRECTION_MIN_CHI2): on data far smoother than that, the weights, set by the stated precision,
  // would spread over breaks the data reject (exact data: C₀ off by 0.3 %).
  if (
    !override &&
    riverModel === "quartic" &&
    tangent.method === "segment" &&
    river.conc > 0 &&
    tp.rss / dof >= BIAS_CORRECTION_MIN_CHI2
  ) {
    const averaged = quarticBreakSpread()?.river;
    if (averaged !== undefined && Number.isFinite(averaged) && averaged > 0) river = { ...river, conc: averaged };
  }
  // How far landward the stations show the reaction (lack-of-fit of the extended seaward line, reactionExtent.ts).
  const extent =
    tangent.method === "segment"
      ? reactionExtent(
          x,
          conc,
          used.map((s) => s.sigma * scatter),
          tp,
          Math.min(tp.breakAveraged ?? tp.breakSalinity, bs.breakSalinity?.[0] ?? Number.POSITIVE_INFINITY),
        )
      : undefined;
  if (!override)
    warnings.push(...coarseExtrapolationWarning(used, tp, river, riverModel, unit, extent?.reactionStations));
  let effective: ConstituentAnalysis["effectiveEndmember"] = estimateOf(cStar, bs.effective, unit);
  let percent: ConstituentAnalysis["percentChange"];
  if (river.conc > 0) percent = finiteEstimate((100 * (cStar - river.conc)) / river.conc, bs.percent, "%");
  else
    warnings.push({
      code: "river-nonpositive",
      message: `River end-member ${river.conc} ${unit} is not positive: no % change.`,
    });
  // Model-selection uncertainty of C₀ (quartic vs cubic landward phase, or local quartic vs cubic): the Akaike-weighted
  // between-model term widens the % change interval (Buckland et al. 1997).
  // The local cubic's C₀: the Akaike-weighted difference from the local quartic in the same window.
  const c0Spread = !percent
    ? undefined
    : riverModel === "quartic"
      ? riverModelSpread(x, conc, wts, tp, sr, Math.max(1, tp.rss / dof))
      : riverModel === "local" && localWin
        ? localRiverModelSpread(x, conc, wts, localWin, sr, Math.max(1, tp.rss / dof))
        : undefined;
  if (percent && c0Spread !== undefined && river.conc > 0) {
    const dPct = (100 * Math.abs(cStar) * c0Spread) / river.conc ** 2;
    if (Number.isFinite(dPct))
      percent = {
        ...percent,
        lower: percent.value - Math.hypot(percent.value - percent.lower, dPct),
        upper: percent.value + Math.hypot(percent.upper - percent.value, dPct),
      };
  }
  // Model-selection uncertainty of the break as the data's profile over breaks sees it (breakModelSpread.ts);
  // not for a seaward line on < 4 stations, whose C*₀ is averaged with a curved end in every replicate
  // (twoPhaseMouth.ts), which already carries the end model (adding both counted it twice):
  // the replicates, drawn around a curve whose curvature stops at its break, place the break more surely
  // than data whose curvature fades (Buckland et al. 1997 between-model term, in quadrature).
  const shortLine = tangent.method === "segment" && !tp.linear && tangent.nStations < MIN_SEAWARD_STATIONS;
  const spread =
    tangent.method === "segment" && !tp.linear && !shortLine
      ? percent && !override && riverModel === "quartic"
        ? quarticBreakSpread()
        : breakModelSpread(
            x,
            conc,
            wts,
            tp,
            sr,
            // The local cubic's C₀ does not depend on the break: held fixed, as a river override.
            percent && (override || riverModel === "local" ? river.conc : riverModel),
            profileOnce(),
          )
      : undefined;
  if (spread) {
    const widen = (e: Estimate, d: number): Estimate =>
      Number.isFinite(d) && d > 0
        ? { ...e, lower: e.value - Math.hypot(e.value - e.lower, d), upper: e.value + Math.hypot(e.upper - e.value, d) }
        : e;
    effective = widen(effective, spread.effective);
    if (percent && spread.percent !== undefined) percent = widen(percent, spread.percent);
  }
  if (tangent.method === "curve-tangent" || (shortLine && tangent.nStations < 3)) {
    // No straight seaward phase, or one resting on < 3 stations: C*₀ is a slope at the end of
    // the data that depends on the curve model. The smoothing spline's tangent there is a second model;
    // their difference widens the intervals (between-model term of Buckland et al. 1997). A line on 3
    // stations is not widened: its average with the curved end (in every replicate) carries that.
    const cSpline = f[G - 1]! - (sMax - sr) * d1[G - 1]!;
    // A short seaward line is already averaged with a curved end (mouthAveragedEffective, in every
    // bootstrap replicate too), so its intervals carry that model's uncertainty.
    const delta = Math.abs(cSpline - cStar);
    const widen = (e: Estimate, d: number): Estimate => ({
      ...e,
      lower: e.value - Math.hypot(e.value - e.lower, d),
      upper: e.value + Math.hypot(e.upper - e.value, d),
    });
    if (Number.isFinite(delta)) {
      effective = widen(effective, delta);
      if (percent) percent = widen(percent, (100 * delta) / river.conc);
    }
    if (!shortLine)
      warnings.push({
        code: "reaction-reaches-mouth",
        message: `No straight seaward line: the reaction continues to the seaward-most station (S = ${sMax.toFixed(1)}), so C*₀ is the tangent of the fitted curve there, an end-of-data slope (two curve models differ by ${delta.toPrecision(2)} ${unit}; the intervals include it, but C*₀ and the % change can still be biased by a few percentage points because the curvature there is poorly resolved). It is the effective end-member for that section only; stations farther seaward would fix it.`,
      });
  }
  const segStart = tangent.method === "segment" && !tp.linear ? tangent.fromSalinity : undefined;
  const mouthWeight = mouthAverage.weight;
  if (segStart !== undefined && tangent.nStations < MIN_SEAWARD_STATIONS)
    warnings.push({
      code: "short-seaward-line",
      message: `The straight seaward line rests on only ${tangent.nStations} station(s) (S ${tangent.fromSalinity.toFixed(1)}–${sMax.toFixed(1)}): C*₀ extrapolates from them, and whether mixing is conservative beyond S ${tp.breakSalinity.toFixed(1)} ${tangent.nStations < 3 ? 'cannot be tested, so the class does not say "then conservative"' : "is tested with one degree of freedom only (a curve passes through any 3 points)"}. If the reaction in fact continues seaward, a line through these stations is a chord of the curve, not its tangent, and C*₀ is biased toward C₀. C*₀ and its interval are therefore averaged with the tangent of a local quadratic through these stations and the next one landward, in proportion to how well the data support a curved end (Akaike weight ${(100 * mouthWeight).toFixed(0)} %); a bias of a few percentage points remains possible. Stations between there and the sea end-member would settle it.`,
    });
  // A seaward line of ≥ 4 stations that the data cannot tell from a reaction reaching the mouth
  // (Akaike weight of the break at S_max ≥ MOUTH_WEIGHT_WARN): the chord bias is not bounded.
  const wReach =
    segStart !== undefined && tangent.nStations >= MIN_SEAWARD_STATIONS
      ? mouthModelWeight(x, conc, wts, tp, scatter * scatter)
      : undefined;
  if (wReach !== undefined && wReach >= MOUTH_WEIGHT_WARN)
    warnings.push({
      code: "seaward-line-untested",
      message: `The straight seaward line (${tangent.nStations} stations, S ${tangent.fromSalinity.toFixed(1)}–${sMax.toFixed(1)}) cannot be told from a reaction that continues to the seaward-most station: a curve with no straight seaward phase fits nearly as well (Akaike weight ${(100 * wReach).toFixed(0)} %). If the reaction does continue, the line is a chord of the curve: C*₀ is biased toward C₀ (the % change understated, by several percentage points in calibration with synthetic surveys) beyond its interval, and "then conservative" is not established. More stations, or more precise ones, in the outer estuary would settle it.`,
    });
  const mS = twoPhaseMaximum(tp, sMax);
  // Coherence: never "conservative" when the straight line is rejected (χ² p < 0.01) or the
  // % change interval excludes zero.
  const excludesZero = percent !== undefined && (percent.lower > 0 || percent.upper < 0);
  const nonCons = p.nonConservative || p.evidence.chiSquaredP < 0.01 || excludesZero;
  const cls = classify(nonCons, cStar - river.conc, p.quadCoef, tangent, sMin, sMax, mS !== undefined, n);
  if (tp.linear && cls !== "conservative") {
    // The stations depart from conservative mixing, yet no straight seaward phase could be told apart
    // from the curve: the line kept is the one through all stations, so C*₀ = C₀ by construction and
    // a "0 %" with a zero-width interval would be a false precision.
    effective = undefined;
    percent = undefined;
    warnings.push({
      code: "percent-not-determined",
      message: `The stations depart from conservative mixing (${cls}), but no straight seaward line could be separated from the curve with ${n} stations: the effective river end-member and the % change are not determined. More stations between the reaction and the sea end-member would resolve them.`,
    });
  }
  const toKm = (a: number, b: number): Array<[number, number]> => o.salinityToKm?.(a, b) ?? [];
  let zone: ConstituentAnalysis["reactionZone"];
  // The zone has the sign of the class (the net change), so a "removal" never comes with an
  // "addition zone"; when the curve's strongest reaction has the other sign, both are said.
  const classSign = cls === "conservative" ? undefined : netSign(cStar - river.conc, p.quadCoef);
  const z = classSign === undefined ? undefined : zoneFromCurve(grid, d2, sr, undefined, segStart, classSign);
  const strongest = classSign === undefined ? undefined : zoneFromCurve(grid, d2, sr, undefined, segStart);
  if (strongest && (!z || strongest.kind !== z.kind))
    warnings.push({
      code: "opposing-reactions",
      message: `The net change is ${classSign! < 0 ? "a removal (C*₀ below C₀)" : "an addition (C*₀ above C₀)"}, but the fitted curve's strongest reaction is ${strongest.kind} over S = ${strongest.from.toFixed(1)}–${strongest.to.toFixed(1)}: both act along this estuary and the % change is their balance${z ? `; the ${z.kind} zone shown is S = ${z.from.toFixed(1)}–${z.to.toFixed(1)}` : ""}.`,
    });
  if (z) {
    zone = {
      salinity: [z.from, z.to],
      km: toKm(z.from, z.to),
      kind: z.kind,
      salinityLower: estimateOf(z.from, bs.zoneLower, "salinity"),
      salinityUpper: estimateOf(z.to, bs.zoneUpper, "salinity"),
    };
    const inZone = used.filter((s) => s.salinity >= z.from && s.salinity <= z.to).length;
    if (inZone < MIN_ZONE_STATIONS)
      warnings.push({
        code: "few-stations-in-zone",
        message: `Only ${inZone} station(s) lie inside the reaction zone S = ${z.from.toFixed(1)}–${z.to.toFixed(1)}; its position and the rate are poorly resolved. Sample the low-salinity region more densely.`,
      });
  }
  let maximum: ConstituentAnalysis["maximum"];
  const q = o.riverDischargeM3s;
  const fl =
    q !== undefined && percent !== undefined && effective !== undefined
      ? fluxSummary(q, unit, estimateOf(river.conc, bs.riverConc, unit), effective, bs.netDelta, sr, o.densityKgM3)
      : undefined;
  if (fl) warnings.push(...fl.warnings);
  if (mS !== undefined && (cls === "addition" || cls === "maximum-then-conservative")) {
    maximum = {
      salinity: estimateOf(mS, bs.maxSalinity, "salinity"),
      km: o.salinityToKmPoint?.(mS) ?? [],
      excess: estimateOf(twoPhaseAt(tp, mS)[0] - dilutionAt(line, mS), bs.maxExcess, unit),
      conservativeBeyondSalinity: segStart,
      addedFlux: fl?.flux?.netChange,
    };
  }
  // Rates from the curvature of the two-phase curve, from the river reference salinity seaward.
  const rGrid = salinityGrid(Math.min(sr, sMin), sMax, G);
  const rD2 = Float64Array.from(rGrid, (s) => twoPhaseAt(tp, s)[2]);
  const rp = rateProfile(rGrid, rD2, sr, o, cStar, river.conc);
  warnings.push(...rp.warnings);
  let breakEst =
    segStart !== undefined ? estimateOf(tp.breakAveraged ?? tp.breakSalinity, bs.breakSalinity, "salinity") : undefined;
  // The break search needs 4 stations landward of a break: where the interval reaches that limit, the
  // replicates cannot place the break farther landward, and the interval is extended down to the lowest
  // break the stations do not reject (reactionExtent.ts).
  const censored = !!breakEst && !!extent?.atLandwardLimit && extent.lowestBreak < breakEst.lower;
  if (breakEst && censored) breakEst = { ...breakEst, lower: extent!.lowestBreak };
  // Below the search's landward limit the maximum's place is the fitted curve's, not the stations': its
  // interval reaches down to the station landward of the highest one (where a single peak must begin).
  if (censored && maximum) {
    let top = 0;
    for (let i = 1; i < n; i++) if (used[i]!.conc > used[top]!.conc) top = i;
    const floor = used[Math.max(0, top - 1)]!.salinity;
    if (maximum.salinity.lower > floor) maximum = { ...maximum, salinity: { ...maximum.salinity, lower: floor } };
  }
  if (breakEst && breakEst.upper - breakEst.lower > 2 * BREAK_GOAL_S)
    warnings.push({
      code: "break-uncertain",
      message: censored
        ? `The end of the reaction (start of the straight seaward line) is located only to S ${breakEst.lower.toFixed(1)}–${breakEst.upper.toFixed(1)}: every station between S ${extent!.lowestBreak.toFixed(1)} (the first one landward of the break that lies more than 2σ off the seaward line) and the fitted break is within 2σ of that line, and with so few stations at low salinity the curve fit cannot place the break landward of S ${breakEst.value.toFixed(1)}. The reaction may end anywhere in that range; the break, the reaction zone and the maximum are not located more precisely, and C₀ (extrapolated along the fitted curve) may be biased. Stations at low salinity would settle it.`
        : `The end of the reaction (start of the straight seaward line) is located only to S ${breakEst.lower.toFixed(1)}–${breakEst.upper.toFixed(1)} (95 %), wider than ±${BREAK_GOAL_S}: the curvature fades below the analytical precision there. C*₀ and its interval include this uncertainty; the "conservative beyond" salinity does not have that precision.`,
    });
  const verdict = verdictOf(cls, percent, effective, unit, warnings);
  const band = (arr: number[]): number[] =>
    Array.from(grid, (s, i) => {
      const v = interpolate(bGrid, arr, s);
      return Number.isFinite(v) ? v : f[i]!;
    });
  return {
    cls,
    river,
    riverReplaced,
    fit: {
      method: curve.method,
      salinity: Array.from(grid),
      conc: Array.from(f),
      lower: band(bs.bandLower).map((v, i) => Math.min(v, f[i]!)),
      upper: band(bs.bandUpper).map((v, i) => Math.max(v, f[i]!)),
      derivative: Array.from(d1),
      secondDerivative: Array.from(d2),
      lambda: curve.lambda,
      edf: curve.edf,
    },
    effective,
    percent,
    flux: fl?.flux,
    zone,
    maximum,
    rate: rp.profile,
    bootstrap: { draws, usable: bs.usable, seed },
    breakSalinity: breakEst,
    verdict,
    warnings,
  };
}
