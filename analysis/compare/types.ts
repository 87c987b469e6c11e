/**
 * Result types of the survey comparison: how salt intrusion, isohalines and each
 * constituent's mixing behaviour differ between surveys of the same estuary.
 */
import type { BehaviourClass, ConstituentAnalysis, MixingWarning } from "../mixing/result.ts";
import type { SalinityProfile } from "../geometry/salinityTypes.ts";
import type { StationPlacement, SurveyFacts } from "../pipeline/surveyAnalysis.ts";

/**
 * The parts of one survey's analysis the comparison reads (a structural subset of the
 * pipeline's `SurveyAnalysis`, so either can be passed).
 */
export interface ComparableSurvey {
  survey: SurveyFacts;
  stations: StationPlacement[];
  constituents: ConstituentAnalysis[];
  /** S(x) along the channel, when the pipeline fitted one. */
  salinityProfile?: SalinityProfile;
  warnings?: MixingWarning[];
}

/**
 * A difference later − reference with an approximate 95 % interval.
 *
 * The interval combines the two surveys' 95 % intervals as if independent and
 * roughly normal: lower half-width = sqrt(h⁻_later² + h⁺_ref²), upper half-width =
 * sqrt(h⁺_later² + h⁻_ref²) (see {@link differenceOfEstimates}). An approximation,
 * not a bootstrap of the difference.
 */
export interface EstimateDifference {
  /** later − reference, in `unit`. */
  value: number;
  lower: number;
  upper: number;
  unit: string;
  /** Reference and later values (point estimates) in `unit`. */
  reference: number;
  later: number;
  /** True when the 95 % interval of the difference excludes zero. */
  exceedsUncertainty: boolean;
  /** How the interval was obtained. */
  method: "quadrature-of-half-widths" | "no-interval";
  /** Plain statement, e.g. "larger than the uncertainty" / "within the uncertainty". */
  statement: string;
  /** Caveat about the inputs, when there is one. */
  note?: string;
}

/** Salt intrusion and isohaline positions of one survey, with its discharge. */
export interface IntrusionRow {
  survey: string;
  startDate?: string;
  dischargeM3s?: number;
  /** Distance of the intrusion isohaline from the mouth [km]. */
  saltIntrusionKm?: number;
  saltIntrusionSalinity: number;
  /** Isohaline positions [km from the mouth]: the landward-most crossing of each. */
  isohalinesKm: Array<{ salinity: number; km?: number }>;
}

/** A published discharge scaling of the intrusion length, for comparison with the apparent exponent. */
export interface ReferenceScaling {
  exponent: number;
  label: string;
  source: string;
}

/** Apparent exponent n of L ∝ Q^n, fitted by least squares on ln L vs ln Q. */
export interface DischargeScaling {
  /** What L is: "salt intrusion (S = 2)" or "isohaline S = 10", ... */
  quantity: string;
  salinity: number;
  exponent: number;
  /** 95 % t interval of the slope (only with ≥ 3 surveys). */
  lower?: number;
  upper?: number;
  nSurveys: number;
  /** Discharge range used [m³/s]. */
  dischargeRangeM3s: [number, number];
  /** The classical and observed scalings (see REFERENCE_SCALINGS). */
  references: ReferenceScaling[];
  /** Plain-language note: what n means next to the references, and its limits. */
  note: string;
}

/** Shift of one constituent between the reference survey and a later survey. */
export interface ConstituentShift {
  name: string;
  unit: string;
  referenceSurvey: string;
  survey: string;
  classReference: BehaviourClass;
  classSurvey: BehaviourClass;
  classChanged: boolean;
  /** Reaction zone bounds: salinity (from the bootstrap Estimates) and km (salinity interval mapped through each survey's S(x)). */
  zone?: {
    kind: "removal" | "addition" | "changed";
    salinityFrom: EstimateDifference;
    salinityTo: EstimateDifference;
    kmSeaward?: EstimateDifference;
    kmLandward?: EstimateDifference;
  };
  /** Mid-estuarine maximum: salinity, km and excess above the dilution line. */
  maximum?: { salinity: EstimateDifference; km?: EstimateDifference; excess: EstimateDifference };
  /** Change in C*₀ [unit]. */
  effectiveEndmember?: EstimateDifference;
  /** Change in % change [percentage points]. */
  percentChange?: EstimateDifference;
  /** Change in the net estuarine source (+) / sink (−) Q·(C*₀ − C₀) [mol/s]. */
  netFlux?: EstimateDifference;
  /** Change in the effective export Q·C*₀ [mol/s]. */
  effectiveExport?: EstimateDifference;
  /** Plain sentences summarising the shift. */
  statements: string[];
  warnings: MixingWarning[];
}

/** Comparison of two or more surveys of one estuary. */
export interface SurveyComparison {
  /** Survey names in input order; the first is the reference. */
  surveys: string[];
  referenceSurvey: string;
  intrusion: IntrusionRow[];
  /** Apparent discharge exponents (salt intrusion and each isohaline shared by all surveys); empty without ≥ 2 discharges. */
  scaling: DischargeScaling[];
  /** Shifts of every constituent present in the reference and a later survey. */
  shifts: ConstituentShift[];
  /** Constituents whose class differs between the reference and a later survey. */
  classChanges: Array<{ name: string; survey: string; from: BehaviourClass; to: BehaviourClass }>;
  /** The interval approximation used, stated for the reader. */
  intervalMethod: string;
  warnings: MixingWarning[];
}
