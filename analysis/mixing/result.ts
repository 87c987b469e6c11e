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
