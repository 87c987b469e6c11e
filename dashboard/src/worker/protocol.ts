/**
 * The typed protocol between the dashboard and its worker. The worker exposes one object
 * (`WorkerApi`, built by `createWorkerApi()` in api.ts) through Comlink; the main thread calls its
 * methods as async functions. Progress and partial results come back through callbacks passed
 * with `Comlink.proxy`. Every value crossing the boundary is plain, structured-clone-safe data.
 */
import type { ImportIssue, Survey, SurveyComparison } from "../../../analysis/index.ts";
import type { ChannelOverlay, SurveyOverlay } from "./overlay.ts";
import type { AnalysisResult } from "./engine.ts";

/** A text file as the analysis readers take it. */
export interface TextFile {
  name: string;
  text: string;
}

/** A user-given end-member (overrides the one found from the data). */
export interface EndmemberOverride {
  salinity: number;
  conc: number;
  concSd?: number;
}

/** End-member overrides for one constituent. */
export interface ConstituentOverrides {
  river?: EndmemberOverride;
  sea?: EndmemberOverride;
}

/** The settings of the analysis itself (sent to the worker). */
export interface AnalysisSettings {
  /** End-member overrides keyed by constituent name. */
  endmemberOverrides: Record<string, ConstituentOverrides>;
  /** Analytical precision per constituent [% of value], overriding the defaults. */
  precisionPercent: Record<string, number>;
  /** River discharge [m³/s] overriding the survey's own value, or undefined. */
  riverDischargeM3s: number | undefined;
  /**
   * The archive view's daily discharge table (date, m³/s): each survey without a discharge of its own
   * takes its day's row, else the nearest earlier day, in its own analysis (fluxes), by the analysis'
   * one rule (`surveyDischarge`, the CLI's `--discharge-table`).
   */
  dischargeTable?: TextFile;
  /** Name of the constant set used for speciation. */
  constantSet: string;
  /** Salinity of the isohaline that marks the salt intrusion (default 2). */
  saltIntrusionSalinity: number;
  /** Which end of an imported or drawn centerline is the mouth (absent: the one mouth rule decides). */
  mouth?: "start" | "end";
  /** Stations farther than this from the centerline are off-channel [m] (analysis default when absent). */
  offChannelM?: number;
  /** Keep off-channel stations in the fits and end-members (they are still listed). */
  keepOffChannel?: boolean;
}

/** A choice made for the user while reading (layer, centerline from stations, distances), to state. */
export interface InputNotice {
  code: string;
  message: string;
}

export type { WorkerApi } from "./api.ts";
export type { UnderwayRequest, UnderwayResult, UnderwayPoints } from "./underwayProtocol.ts";

/** A survey file as given to the worker: text, or bytes (netCDF). */
export type SourceFile = TextFile | { name: string; bytes: Uint8Array };

/**
 * Which survey a job analyses first. With `firstSurvey` (the survey on screen) the worker posts it,
 * then waits for `resumeBackground` (the first view drawn; at most 3 s) before the others;
 * without it the surveys are analysed in order without a pause.
 */
export interface JobOrder {
  firstSurvey?: number;
  /**
   * The first survey's constituents split into `count` parts to analyse side by side: this worker
   * analyses part 0 and takes the others from `receivePart(token, …)` (another worker's
   * `analysePart`), or analyses them itself when they do not come; the merged result is the same.
   */
  firstParts?: { count: number; token: number };
  /**
   * The constituent on screen (the selection's; the survey's first mixing constituent when it lacks it,
   * `shownConstituent`). The worker analyses it first in the first survey and posts its map marks (an
   * `overlay` event) before the survey's other constituents, so the map tiles them with its basemap.
   */
  firstConstituent?: string;
}

/** One analysis job. A newer job supersedes an older one (the worker stops between surveys). */
export type AnalysisJob = JobOrder &
  /** Read survey files and a centerline, then analyse every survey. */
  (
    | { kind: "load"; surveys: SourceFile[]; centerline?: TextFile; settings: AnalysisSettings }
    /** Re-analyse the surveys held with new settings. */
    | { kind: "analyze"; settings: AnalysisSettings }
    /** Replace the channel centerline (e.g. one drawn on the map) and re-analyse every survey. */
    | { kind: "centerline"; centerline: TextFile; settings: AnalysisSettings }
    /** Surveys already read (an import or a restored workspace): replace the held set and analyse. */
    | { kind: "setSurveys"; surveys: Survey[]; centerline?: TextFile; settings: AnalysisSettings }
  );

/** What an analysis job reports while it runs, in order: loaded, progress…, analysis…, done. */
export type AnalysisEvent =
  /**
   * The first survey's map marks for the constituent on screen (isohalines, its reaction zone and
   * maximum), before the survey's whole analysis; the `analysis` event's overlay has the same marks.
   */
  | { type: "overlay"; surveyIndex: number; overlay: SurveyOverlay }
  /** Work in progress: `done` of `total` steps of `stage`. */
  | { type: "progress"; stage: string; done: number; total: number }
  /** Files read: surveys, problems found, and the channel drawn on the map. */
  | {
      type: "loaded";
      surveys: Survey[];
      issues: ImportIssue[];
      channel: ChannelOverlay | undefined;
      /** Choices made for the user while reading, to state. */
      notices?: InputNotice[];
      /** Without a centerline: one built from the station positions (GeoJSON LineString feature), offered to the user. */
      offeredCenterline?: object;
    }
  /** One survey analysed, with its map overlay (zones and maxima placed on the channel). */
  | { type: "analysis"; surveyIndex: number; analysis: AnalysisResult; overlay: SurveyOverlay }
  /**
   * Every survey analysed: the comparison of the later surveys with the first (the workspace API's
   * `comparison`), or why there is none. Sent only when two or more surveys are held.
   */
  | { type: "comparison"; comparison?: SurveyComparison; reason?: string }
  /** All requested work finished. */
  | { type: "done" }
  | { type: "error"; message: string };

/** Reports progress of a long call: the fraction done (0…1) and what is being done. */
export type ProgressCallback = (fraction: number, stage: string) => void;
