/**
 * The result of analysing one survey end to end (geometry + mixing), as the
 * dashboard, the CLI JSON output and the briefing read it. Field names are a
 * public contract (documented in the README): add fields, never rename.
 */
import type { ConstituentAnalysis, MixingWarning } from "../mixing/result.ts";
import type { SalinityProfile } from "../geometry/salinityTypes.ts";

/** One station as placed on the channel. */
export interface StationPlacement {
  id: string;
  /** [lon, lat] of the sample, when known. */
  lonLat?: [number, number];
  /** Along-channel distance from the mouth [km]; undefined when the station has no position. */
  alongChannelKm?: number;
  /** Signed cross-channel offset [m]; positive = right bank looking seaward. */
  offsetM?: number;
  /** Branch of the channel network the station projects onto. */
  branchId?: string;
  /** Nearest point on the centerline [lon, lat]. */
  nearestLonLat?: [number, number];
  /** True when farther off the channel than the threshold, or on a side arm of a distance axis. */
  offChannel: boolean;
  /**
   * Without a centerline, a station on the far side of the salinity maximum of a distance axis (a
   * separate arm, not on the river's mixing path): its distance from the mouth along that arm [km].
   */
  sideArmKm?: number;
  /** Practical salinity, when measured and accepted. */
  salinity?: number;
  temperatureC?: number;
  pH?: number;
  time?: string;
  depthM?: number;
}

/** An isohaline's position(s) along the channel. */
export interface IsohalineAtKm {
  salinity: number;
  /** Every crossing [km from the mouth]; several when S(x) is not monotonic. */
  km: number[];
}

/**
 * Where a survey's river discharge came from (decided once by `surveyDischarge`, analysis/archive):
 * `setting` = the analysis setting for every survey, `option` = given by the user for this survey
 * (CLI `--discharge`), `file` = the survey file's discharge column, `table` = a daily discharge
 * table joined by date (then `tableDate` and `daysBefore` say which row).
 */
export interface DischargeProvenance {
  origin: "setting" | "option" | "file" | "table";
  /** Plain statement, e.g. "discharge of 2019-07-14 (1 day before the survey) from flows.csv, row 22". */
  statement: string;
  /** Table date used (origin `table`), ISO 8601 YYYY-MM-DD. */
  tableDate?: string;
  /** Days between the table date and the survey date (origin `table`; 0 = same day). */
  daysBefore?: number;
}

/** Survey-level facts. */
export interface SurveyFacts {
  name: string;
  startDate?: string;
  endDate?: string;
  riverDischargeM3s?: number;
  /** Where riverDischargeM3s came from (present whenever it is). */
  dischargeSource?: DischargeProvenance;
  /** Distance from the mouth of the salt-intrusion isohaline [km]. */
  saltIntrusionKm?: number;
  /** The isohaline used for the intrusion length (default 2). */
  saltIntrusionSalinity: number;
  isohalines: IsohalineAtKm[];
  /** Salinity range covered by the stations [min, max]. */
  salinityRange?: [number, number];
  /** Number of stations (samples) in the survey. */
  nStations: number;
}

/** A variable shown along the channel but not analysed for mixing (oxygen, chlorophyll, particles...). */
export interface AlongChannelSeries {
  name: string;
  unit: string;
  kind: "nonMixing";
  /** Why it is not given end-members. */
  reason: string;
  points: Array<{ stationId: string; value: number; salinity?: number; alongChannelKm?: number; offChannel?: true }>;
}

/** A station left out of the fits and end-members because it lies off the channel. */
export interface OffChannelStation {
  id: string;
  /** Distance from the centerline [km]; for a side-arm station, its distance along the arm from the mouth. */
  distanceKm: number;
  branchId?: string;
  /** Set for a station on a side arm of a distance axis (see StationPlacement.sideArmKm). */
  sideArm?: true;
}

/** One observation as a plot draws it, including values the analysis set aside. */
export interface ObservationPoint {
  stationId: string;
  /** Practical salinity of the sample (PSS-78). */
  salinity: number;
  /** Measured value, or the detection limit when below detection [constituent unit]. */
  value: number;
  /** measured; below the detection limit (drawn at the limit); rejected by quality control (not analysed). */
  kind: "measured" | "belowDetection" | "rejected";
  /** The text as it stood in the file. */
  original?: string;
}

/** Everything Brackline concludes about one survey. */
export interface SurveyAnalysis {
  survey: SurveyFacts;
  stations: StationPlacement[];
  /** S(x) along the channel, when stations could be placed on it. */
  salinityProfile?: SalinityProfile;
  constituents: ConstituentAnalysis[];
  /** Variables that are not dissolved mixing tracers, as points along the channel (no end-members). */
  variables?: AlongChannelSeries[];
  /** Stations farther off the channel than the limit, left out of the fits (unless kept); empty without a centerline. */
  offChannelStations?: OffChannelStation[];
  /** The off-channel limit used [km], and whether off-channel stations were kept in the fits. */
  offChannel?: { limitKm: number; kept: boolean };
  /**
   * What the plots draw per constituent name (analysis/workspace plottedObservations: every value
   * read, rejected and below-detection ones included, off-channel stations left out unless kept);
   * filled by analyzeInputs.
   */
  observations?: Record<string, ObservationPoint[]>;
  /** Survey-level warnings and notices (geometry, import, pipeline). */
  warnings: MixingWarning[];
  /** The caution to show beside every result. */
  caution: string;
}

export type { MixingWarning };
