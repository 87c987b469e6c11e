// One cell of the calibration table: many seeded surveys of one shape and design, analysed
// with analyzeConstituent, scored against the forward model's true answers.
import { analyzeConstituent } from "../../analysis/mixing/analyzeConstituent.ts";
import type { ConstituentAnalysis, Estimate } from "../../analysis/mixing/result.ts";
import type { AnalyzeOptions } from "../../analysis/mixing/options.ts";
import { curveOf, gradientPerM, survey, type Shape, type SurveyDesign, type SyntheticStation } from "./forwardModel.ts";

export interface CellScore {
  shape: string;
  design: SurveyDesign;
  surveys: number;
  /** Surveys scored for coverage and bias (those with a C*₀ and a % change): the coverage's Monte Carlo n. */
  scored: number;
  /** Surveys where analyzeConstituent threw or gave no C*₀ (class accuracy still counts the latter). */
  failures: number;
  effectiveBiasPct: number;
  effectiveRmsePct: number;
  percentBiasPp: number;
  /** Bias of % change over the surveys without a warning that C₀ or C*₀ may be biased ({@link BIAS_WARNINGS}); undefined when all carry one. */
  percentBiasUnwarnedPp?: number;
  /** Share of surveys carrying a warning that C₀ or C*₀ may be biased. */
  biasWarned: number;
  percentRmsePp: number;
  effectiveCoverage: number;
  percentCoverage: number;
  /** Mean half-width of the C*₀ 95 % interval, % of the true C*₀ (compare with 1.96 × RMSE). */
  effectiveHalfWidthPct: number;
  /** Mean half-width of the % change 95 % interval [pp]. */
  percentHalfWidthPp: number;
  /** Point estimate outside its own interval (C*₀ or % change). */
  outsideOwnInterval: number;
  classAccuracy: number;
  /** Share of surveys with the right class or a warning that the stations cannot establish it. */
  classOrWarned: number;
  /** Removal vs addition right (conservative shapes: "conservative" given). */
  directionAccuracy: number;
  /** Share of surveys with the break within ±2 salinity units (undefined without a true break). */
  breakWithin2?: number;
  /** Share of surveys with the break within ±2 or a `break-uncertain` warning saying it is not (the tool says so). */
  breakWithin2OrWarned?: number;
  breakMedianError?: number;
  /** Share of surveys whose break interval covers the true break (a missing break counts as a miss). */
  breakCoverage?: number;
  maximumMedianError?: number;
  maximumCoverage?: number;
  /** Median |∫A·R dx − Q·(C*₀ − C₀)|/|Q·(C*₀ − C₀)| over surveys. */
  rateIntegralError?: number;
  /** Mean reported river reference salinity. */
  referenceSalinity: number;
}

/** Warnings by which the tool says the stations cannot establish the class. */
const CLASS_LIMIT_WARNINGS = new Set([
  "short-seaward-line",
  "reaction-reaches-mouth",
  "few-stations-in-zone",
  "seaward-line-untested",
]);

/** Warnings by which the tool says C₀ or C*₀ may be biased beyond their intervals (model error of an extrapolation). */
export const BIAS_WARNINGS = new Set([
  "river-extrapolation-coarse",
  "reaction-reaches-mouth",
  "short-seaward-line",
  "seaward-line-untested",
]);

const covers = (e: Estimate | undefined, truth: number): boolean => !!e && e.lower <= truth && truth <= e.upper;
const inside = (e: Estimate | undefined): boolean => !e || (e.lower <= e.value && e.value <= e.upper);
const median = (a: number[]): number | undefined => {
  if (a.length === 0) return undefined;
  const s = [...a].sort((p, q) => p - q);
  const m = s.length >> 1;
  return s.length % 2 ? s[m]! : 0.5 * (s[m - 1]! + s[m]!);
};

/**
 * The mixing engine's analysis of one synthetic survey as the calibration scores it: every station
 * accepted and uncensored, the stated precision the survey's relative noise (absolute 1e-9), constituent
 * "X" in µmol/L; `options` adds the draws, seed and anything else.
 */
export function analyzeSynthetic(
  stations: readonly SyntheticStation[],
  noise: number,
  options: Partial<AnalyzeOptions>,
): ConstituentAnalysis {
  return analyzeConstituent(
    stations.map((s) => ({
      stationId: s.stationId,
      salinity: s.salinity,
      conc: s.conc,
      censored: false,
      accepted: true,
    })),
    { name: "X", unit: "µmol/L", precision: { relative: Math.max(noise, 1e-6), absolute: 1e-9 }, ...options },
  );
}

/** Break salinity the analysis reports: start of the seaward linear segment, when it found one. */
export function reportedBreak(r: ConstituentAnalysis): number | undefined {
  if (r.breakSalinity) return r.breakSalinity.value;
  return r.tangent?.method === "segment" && r.tangent.fromSalinity > (r.fit?.salinity[0] ?? 0)
    ? r.tangent.fromSalinity
    : undefined;
}

export function scoreCell(
  shape: Shape,
  design: SurveyDesign,
  surveys: number,
  draws: number,
  seed0 = 1,
  withRates = false,
): CellScore {
  const truth = curveOf(shape);
  const c0 = shape.riverConc;
  const eErr: number[] = [];
  const pErr: number[] = [];
  const pErrUnwarned: number[] = [];
  let biasWarned = 0;
  let eCov = 0,
    pCov = 0,
    outside = 0,
    cls = 0,
    clsHonest = 0,
    analysed = 0,
    dir = 0,
    failures = 0,
    brk = 0,
    brkHonest = 0,
    bCov = 0,
    mCov = 0,
    mN = 0,
    refSum = 0;
  const bErr: number[] = [];
  const mErr: number[] = [];
  const rErr: number[] = [];
  let eHalf = 0,
    pHalf = 0;
  for (let k = 0; k < surveys; k++) {
    const seed = seed0 + 7919 * k + Math.round(design.noise * 1e4) + 131 * design.stations;
    const st = survey(shape, design, seed);
    let r: ConstituentAnalysis;
    try {
      r = analyzeSynthetic(st, design.noise, {
        bootstrapDraws: draws,
        seed: seed + 1,
        ...(withRates ? { riverDischargeM3s: 100, crossSectionM2: 5000, salinityGradientPerM: gradientPerM } : {}),
      });
    } catch {
      failures++;
      continue;
    }
    // Class and direction over every analysed survey (also those whose % change is not determined).
    analysed++;
    if (r.class === shape.expectedClass) cls++;
    if (r.class === shape.expectedClass || r.warnings.some((w) => CLASS_LIMIT_WARNINGS.has(w.code))) clsHonest++;
    const removal = r.class === "removal" || r.class === "removal-then-conservative";
    const addition = r.class === "addition" || r.class === "maximum-then-conservative";
    if (shape.percent === 0 ? r.class === "conservative" : shape.percent < 0 ? removal : addition) dir++;
    const e = r.effectiveEndmember;
    const p = r.percentChange;
    if (!e || !p) {
      failures++;
      continue;
    }
    refSum += r.endmembers?.river.salinity ?? Number.NaN;
    eErr.push((100 * (e.value - truth.effective)) / truth.effective);
    pErr.push(p.value - truth.percent);
    if (r.warnings.some((w) => BIAS_WARNINGS.has(w.code))) biasWarned++;
    else pErrUnwarned.push(p.value - truth.percent);
    eHalf += (50 * (e.upper - e.lower)) / Math.abs(truth.effective);
    pHalf += 0.5 * (p.upper - p.lower);
    if (covers(e, truth.effective)) eCov++;
    if (covers(p, truth.percent)) pCov++;
    if (!inside(e) || !inside(p)) outside++;
    if (truth.breakSalinity !== undefined) {
      const b = reportedBreak(r);
      const err = b === undefined ? Number.POSITIVE_INFINITY : Math.abs(b - truth.breakSalinity);
      bErr.push(err);
      if (err <= 2) brk++;
      if (err <= 2 || r.warnings.some((w) => w.code === "break-uncertain")) brkHonest++;
      if (covers(r.breakSalinity, truth.breakSalinity)) bCov++;
    }
    if (truth.maximumSalinity !== undefined) {
      mN++;
      const m = r.maximum?.salinity;
      mErr.push(m ? Math.abs(m.value - truth.maximumSalinity) : Number.POSITIVE_INFINITY);
      if (covers(m, truth.maximumSalinity)) mCov++;
    }
    if (withRates && r.rateProfile) {
      const expected = 100 * (truth.effective - c0) * 1e-3; // Q·ΔC in mol/s (µmol/L = mmol/m³)
      rErr.push(Math.abs(r.rateProfile.integratedMolS - expected) / Math.abs(expected));
    }
  }
  const ok = eErr.length;
  const mean = (a: number[]): number => a.reduce((s, v) => s + v, 0) / Math.max(1, a.length);
  const rms = (a: number[]): number => Math.sqrt(mean(a.map((v) => v * v)));
  return {
    shape: shape.name,
    design,
    surveys,
    scored: ok,
    failures,
    effectiveBiasPct: mean(eErr),
    effectiveRmsePct: rms(eErr),
    percentBiasPp: mean(pErr),
    percentRmsePp: rms(pErr),
    percentBiasUnwarnedPp: pErrUnwarned.length > 0 ? mean(pErrUnwarned) : undefined,
    biasWarned: biasWarned / Math.max(1, ok),
    effectiveCoverage: eCov / Math.max(1, ok),
    percentCoverage: pCov / Math.max(1, ok),
    effectiveHalfWidthPct: eHalf / Math.max(1, ok),
    percentHalfWidthPp: pHalf / Math.max(1, ok),
    outsideOwnInterval: outside,
    classAccuracy: cls / Math.max(1, analysed),
    classOrWarned: clsHonest / Math.max(1, analysed),
    directionAccuracy: dir / Math.max(1, analysed),
    breakWithin2: truth.breakSalinity !== undefined ? brk / Math.max(1, ok) : undefined,
    breakWithin2OrWarned: truth.breakSalinity !== undefined ? brkHonest / Math.max(1, ok) : undefined,
    breakMedianError: median(bErr),
    breakCoverage: truth.breakSalinity !== undefined ? bCov / Math.max(1, ok) : undefined,
    maximumMedianError: median(mErr),
    maximumCoverage: mN > 0 ? mCov / mN : undefined,
    rateIntegralError: median(rErr),
    referenceSalinity: refSum / Math.max(1, ok),
  };
}
