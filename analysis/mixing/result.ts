/**
 * The per-constituent result of the mixing analysis: the public contract read
 * by the dashboard, the CLI JSON output and the briefing. Fields may be added;
 * existing fields keep their names and meaning (documented in the README).
 */

/** A point estimate with its 95 % interval, in `unit`. */
export interface Estimate {
  value: number;
  /** Lower and upper limits of the 95 % interval (bootstrap percentile unless stated). */
  lower: number;
  upper: number;
  unit: string;
}

/** An end-member: the water mass at one end of the mixing line. */
export interface Endmember {
  /** Practical salinity of the end-member. */
  salinity: number;
  /** Concentration in the constituent's unit. */
  conc: number;
  /** Standard deviation of the concentration (between samples or as given by the user). */
  concSd: number;
  /** Number of samples averaged (0 for a user override). */
  n: number;
  /** "data" = from the lowest/highest-salinity group of stations; "override" = given by the user. */
  source: "data" | "override";
  /** Station ids that formed the group. */
  stationIds: string[];
  /** How the value was obtained when not a plain group mean (e.g. extrapolated along the fitted curve to S = 0). */
  method?: string;
}

/** Straight line C = intercept + slope·S between the two end-members. */
export interface DilutionLine {
  slope: number;
  intercept: number;
  river: Endmember;
  sea: Endmember;
  unit: string;
}

/** Deviation of one station from the theoretical dilution line. */
export interface StationDeviation {
  stationId: string;
  salinity: number;
  observed: number;
  /** Concentration predicted by the dilution line at this salinity. */
  expected: number;
  /** observed − expected, in the constituent's unit. */
  deviation: number;
  /** 100·(observed − expected)/expected. */
  deviationPercent: number;
  /** |deviation| > k·precision (k = 2 unless set). */
  significant: boolean;
  /** True when the observation was below detection (value is the substitute used). */
  censored: boolean;
}

/** A warning the data cannot fully support the answer; shown beside results. */
export interface MixingWarning {
  /** Stable machine code, e.g. "few-stations-in-zone", "endmember-variability". */
  code: string;
  /** Plain-language message with numbers and units. */
  message: string;
}

/** Behaviour class of a constituent along the salinity gradient. */
export type BehaviourClass =
  | "conservative"
  | "removal"
  | "addition"
  | "removal-then-conservative"
  | "maximum-then-conservative"
  | "insufficient-data";

export interface ReactionZone {
  /** Salinity interval [from, to] where the constituent departs significantly from conservative mixing. */
  salinity: [number, number];
  /** Channel intervals [from, to] in km from the mouth (several when S(x) is not monotonic). */
  km: Array<[number, number]>;
  /** "removal" or "addition", from the curvature sign. */
  kind: "removal" | "addition";
}

export interface MidEstuarineMaximum {
  salinity: Estimate;
  /** Along-channel distance(s) from the mouth of the maximum [km]. */
  km: number[];
  /** Concentration excess above the dilution line at the maximum. */
  excess: Estimate;
  /** Salinity beyond which the constituent is conservative again. */
  conservativeBeyondSalinity?: number;
}

/** Fitted C–S curve sampled on a salinity grid, with its 95 % bootstrap band. */
export interface FitCurve {
  /** How the curve was fitted, e.g. "cubic smoothing spline, λ by GCV (α = 1.4)". */
  method: string;
  salinity: number[];
  conc: number[];
  /** 2.5 % and 97.5 % bootstrap percentiles of the curve at each grid salinity. */
  lower: number[];
  upper: number[];
  /** dC/dS of the fitted curve [unit per salinity unit]. */
  derivative: number[];
  /** d²C/dS² of the fitted curve [unit per salinity unit²]. */
  secondDerivative: number[];
  /** Smoothing parameter λ and effective degrees of freedom (2 = straight line). */
  lambda: number;
  edf: number;
}

/** Straight seaward segment (tangent) C = intercept + slope·S used for the effective end-member. */
export interface TangentLine {
  slope: number;
  intercept: number;
  /** Salinity interval of the seaward segment the line was fitted to. */
  fromSalinity: number;
  toSalinity: number;
  /** Same interval as [fromSalinity, toSalinity] (as the dashboard reads it). */
  salinityRange: [number, number];
  /** "segment" = least-squares line through the seaward linear stations; "curve-tangent" = tangent of the fitted curve at the seaward-most station. */
  method: "segment" | "curve-tangent";
  /** Stations in the seaward segment. */
  nStations: number;
}

/** Statistical evidence behind the behaviour class. */
export interface MixingEvidence {
  /** Σ(e_i/σ_i)²/(n − 2) of the straight-line fit of C on S, σ = analytical precision (≫ 1: scatter beyond precision). */
  chiSquaredPerDof: number;
  /** Upper-tail p of that χ² with n − 2 degrees of freedom. */
  chiSquaredP: number;
  /** p of the nested F-test quadratic vs linear, F ~ F(1, n − 3). */
  fTestCurvatureP: number;
  /** Coefficient c of C = a + b·S + c·S² (> 0 removal, < 0 addition) [unit per salinity²]. */
  quadraticCoefficient: number;
  /** Reduction of χ² by the quadratic term, in precision units (> 3.84 = curvature larger than precision). */
  curvatureDeltaChiSquared: number;
  /** Exact one-sided Wald–Wolfowitz p (too few runs) of the straight-line residual signs ordered by salinity. */
  runsTestP: number;
  runs: number;
  nStations: number;
  /** Stations whose deviation from the dilution line exceeds k·precision. */
  nSignificantDeviations: number;
  nCensored: number;
  /** Significance factor k used for deviations. */
  k: number;
}

/** Fluxes through the estuary when the river discharge is known (Boyle et al. 1974). */
export interface FluxSummary {
  /** Q·C₀, the gross river input [mol/s]. */
  grossRiver: Estimate;
  /** Q·C*₀, the effective export past the reaction zone [mol/s]. */
  effectiveExport: Estimate;
  /** Q·(C*₀ − C₀): negative = estuarine sink (removal), positive = source (addition) [mol/s]. */
  netChange: Estimate;
  dischargeM3s: number;
  /** How the concentration unit was converted to mol/m³ (and any density assumption). */
  unitNote: string;
}

/** Reaction-rate profile R(S) from the curvature (Eq. 4) and its integrated check (Eq. 5). */
export interface RateProfile {
  salinity: number[];
  /** Volumetric rate R, positive = production (addition), negative = removal [unit/s, e.g. µmol L⁻¹ s⁻¹ = mmol m⁻³ s⁻¹]. */
  rate: number[];
  unit: string;
  /** Which physical inputs were used: "Q,A,dS/dx", "K,dS/dx" or "Q,A,K". */
  formula: string;
  /** ∫A·R dx over the profile [mol/s], from the rates. */
  integratedMolS: number;
  /** Q·[C*₀ (tangent method) − C*₀(S₁) (curve at the landward end)] [mol/s] (Eq. 5). */
  expectedMolS: number;
  /** |integrated − expected|/max(|expected|, tiny). */
  relativeDifference: number;
}

/** The full mixing analysis of one constituent: what the dashboard, CLI JSON and briefing show. */
export interface ConstituentAnalysis {
  name: string;
  unit: string;
  class: BehaviourClass;
  /** "low" when a warning undermines the interpretation (end-member variability, too few stations, partial salinity range). */
  confidence: "normal" | "low";
  endmembers?: { river: Endmember; sea: Endmember };
  dilutionLine?: DilutionLine;
  deviations: StationDeviation[];
  fit?: FitCurve;
  tangent?: TangentLine;
  evidence?: MixingEvidence;
  /** C*₀ = tangent value at the river reference salinity `endmembers.river.salinity` (S = 0 unless stated; Boyle et al. 1974). */
  effectiveEndmember?: Estimate;
  /** 100·(C*₀ − C₀)/C₀; NEGATIVE = net removal, POSITIVE = net addition [%]. */
  percentChange?: Estimate;
  flux?: FluxSummary;
  reactionZone?: ReactionZone & { salinityLower?: Estimate; salinityUpper?: Estimate };
  maximum?: MidEstuarineMaximum & { addedFlux?: Estimate };
  rateProfile?: RateProfile;
  /** Bootstrap draws requested and usable, and the seed. */
  bootstrap?: { draws: number; usable: number; seed: number };
  /** Salinity where the reaction ends and the straight seaward phase begins (two-phase regression), with its interval; absent when the line is straight throughout or the reaction reaches the mouth. */
  breakSalinity?: Estimate;
  /** Plain-language verdict that never contradicts the numbers (e.g. "% change not determined"). */
  verdict?: string;
  warnings: MixingWarning[];
}
