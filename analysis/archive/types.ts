/**
 * Result types of the archive analysis: one series per constituent across many surveys of one
 * estuary, the salt-intrusion series, and their relations to discharge, season and year.
 * Field names are a public contract (CLI JSON, README): add fields, never rename.
 */
import type { BehaviourClass, Estimate, MixingWarning } from "../mixing/result.ts";
import type { DischargeScaling, EstimateDifference } from "../compare/types.ts";
import type { LineFit } from "./linearFit.ts";
import type { RankCorrelation } from "./rankCorrelation.ts";
import type { Season } from "./seasons.ts";

/** One survey's values of one constituent. */
export interface SeriesPoint {
  survey: string;
  /** ISO 8601 start date of the survey. */
  date?: string;
  dischargeM3s?: number;
  /** Where the discharge came from ("survey file", "--discharge", or the table lookup statement). */
  dischargeSource?: string;
  season?: string;
  class: BehaviourClass;
  confidence: "normal" | "low";
  /** % change 100·(C*₀ − C₀)/C₀ with its 95 % interval [%]. */
  percentChange?: Estimate;
  /** Effective river end-member C*₀ with its 95 % interval [series unit]. */
  effectiveEndmember?: Estimate;
  /** Reaction zone [seaward, landward] in km from the mouth (outer ends of all its channel intervals). */
  reactionZoneKm?: [number, number];
  /** Reaction zone [from, to] in salinity. */
  reactionZoneSalinity?: [number, number];
  reactionZoneKind?: "removal" | "addition";
  /** Mid-estuarine maximum: landward-most km from the mouth and salinity with interval. */
  maximumKm?: number;
  maximumSalinity?: Estimate;
}

/** Median and spread of one quantity in a group of surveys. */
export interface Spread {
  n: number;
  median: number;
  /** 25th and 75th percentiles (linear interpolation) and the extremes. */
  q25: number;
  q75: number;
  min: number;
  max: number;
}

/** Summary of a group of surveys (a calendar month or a season). */
export interface GroupRow {
  /** Month 1–12 (byMonth) or season name (bySeason). */
  key: string;
  month?: number;
  nSurveys: number;
  percentChange?: Spread;
  reactionZoneCentreKm?: Spread;
  saltIntrusionKm?: Spread;
}

/** Test of "no difference between seasons". */
export interface SeasonTest {
  method: "kruskal-wallis";
  statistic: number;
  degreesOfFreedom: number;
  pValue: number;
  n: number;
  exceedsUncertainty: boolean;
  statement: string;
}

/** A quantity against river discharge: line on log₁₀ Q with intervals, and rank correlations. */
export interface DischargeRelation {
  quantity: string;
  unit: string;
  /** Predictor: log₁₀ of discharge [m³/s]; the slope is per tenfold discharge. */
  predictor: "log10 discharge";
  n: number;
  dischargeRangeM3s: [number, number];
  fit?: LineFit;
  /** Fitted mean ± 95 % band at points across the discharge range (for plotting). */
  band: Array<{ dischargeM3s: number; value: number; lower: number; upper: number }>;
  spearman?: RankCorrelation;
  kendall?: RankCorrelation;
  /** True when the slope's 95 % interval excludes zero. */
  exceedsUncertainty: boolean;
  statement: string;
}

/** One year's mean seasonal anomaly and its difference from the previous year. */
export interface YearRow {
  year: number;
  nSurveys: number;
  /** Mean of (value − median of its season over all years), Bonferroni-adjusted t interval (simultaneous ≈ 95 % over the archive's year comparisons) [unit]. */
  meanAnomaly?: Estimate;
  /** This year − previous year of meanAnomaly, with the comparison's interval and words. */
  differenceFromPrevious?: EstimateDifference;
}

/** Relations of one quantity: to discharge, by month and season, year on year. */
export interface QuantityRelations {
  vsDischarge?: DischargeRelation;
  seasonTest?: SeasonTest;
  byYear: YearRow[];
}

/** The archive series of one constituent. */
export interface ConstituentSeries {
  name: string;
  unit: string;
  points: SeriesPoint[];
  byMonth: GroupRow[];
  bySeason: GroupRow[];
  /** % change and reaction-zone position against discharge. */
  vsDischarge: { percentChange?: DischargeRelation; reactionZoneCentreKm?: DischargeRelation };
  percentChangeRelations: QuantityRelations;
  /** Plain findings, only those that exceed their uncertainty. */
  statements: string[];
  warnings: ArchiveWarning[];
}

/** Salt intrusion of one survey. */
export interface IntrusionPoint {
  survey: string;
  date?: string;
  dischargeM3s?: number;
  season?: string;
  saltIntrusionKm?: number;
  saltIntrusionSalinity: number;
  /**
   * When the isohaline lies beyond the surveyed reach (salinity still above it at the landward-most
   * point), the intrusion is at least this far from the mouth [km]: a lower bound, not a value.
   */
  saltIntrusionAtLeastKm?: number;
  /** When salinity is below the isohaline everywhere surveyed, the intrusion is at most this far [km]. */
  saltIntrusionAtMostKm?: number;
}

/** Everything concluded from an archive of surveys. */
export interface ArchiveSummary {
  nSurveys: number;
  /** First and last survey date. */
  dateRange?: [string, string];
  seasons: Season[];
  series: ConstituentSeries[];
  intrusion: IntrusionPoint[];
  intrusionRelations: QuantityRelations & { byMonth: GroupRow[]; bySeason: GroupRow[]; scaling?: DischargeScaling };
  /** Plain findings across the archive, only those exceeding their uncertainty. */
  statements: string[];
  /** How intervals, fits and tests were obtained (each with its citation). */
  methods: string[];
  warnings: ArchiveWarning[];
}

/** Which front end shows a hint: the command line or the dashboard. */
export type FrontEnd = "cli" | "dashboard";

/**
 * An archive warning: a neutral message (no front end's controls named) and, where the remedy
 * differs by front end, a hint for each (e.g. the CLI's option, the dashboard's control).
 */
export interface ArchiveWarning extends MixingWarning {
  hint?: Readonly<Record<FrontEnd, string>>;
}
