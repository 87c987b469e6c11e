/**
 * Props contract of the dashboard panels: the survey analysis as the panels
 * read it. Every number here comes from `analysis/`; panels only lay it out.
 */
import type { StationPlacement, SurveyFacts } from "../../../../analysis/pipeline/surveyAnalysis.ts";
import type {
  BehaviourClass,
  DilutionLine,
  Endmember,
  Estimate,
  MidEstuarineMaximum,
  MixingWarning,
  ReactionZone,
  StationDeviation,
} from "../../../../analysis/mixing/result.ts";
import type { Selection } from "../../state/selection.svelte.ts";

export type {
  BehaviourClass,
  DilutionLine,
  Endmember,
  Estimate,
  MidEstuarineMaximum,
  MixingWarning,
  ReactionZone,
  StationDeviation,
  StationPlacement,
  SurveyFacts,
};

/** Fitted curve with its 95 % confidence band, sampled on a salinity grid. */
export interface FitCurve {
  salinity: number[];
  conc: number[];
  lower: number[];
  upper: number[];
}

/** Straight tangent C = intercept + slope·S drawn from the seaward segment to the river salinity. */
export interface TangentLine {
  slope: number;
  intercept: number;
  /** Salinity interval of the seaward segment the tangent was fitted to. */
  salinityRange: [number, number];
}

/** One observation as drawn, including values the analysis set aside. */
export interface ObservationPoint {
  stationId: string;
  salinity: number;
  /** Measured value, or the detection limit when below detection [constituent unit]. */
  value: number;
  kind: "measured" | "belowDetection" | "rejected";
  /** The text as it stood in the file. */
  original?: string;
}

/** Per-constituent mixing result, as the panels read it. */
export interface ConstituentAnalysisView {
  name: string;
  unit: string;
  endmembers?: { river: Endmember; sea: Endmember };
  dilutionLine?: DilutionLine;
  deviations: StationDeviation[];
  fit?: FitCurve;
  tangent?: TangentLine;
  class: BehaviourClass;
  effectiveEndmember?: Estimate;
  percentChange?: Estimate;
  reactionZone?: ReactionZone;
  maximum?: MidEstuarineMaximum;
  warnings: MixingWarning[];
  /** Every observation including QC-rejected ones; when absent the plot draws the deviations. */
  observations?: ObservationPoint[];
}

/** The survey analysis result the panels take as `analysis`. */
export interface SurveyAnalysisView {
  survey: SurveyFacts;
  stations: StationPlacement[];
  constituents: ConstituentAnalysisView[];
}

/** Props every panel takes. */
export interface PanelProps {
  analysis: SurveyAnalysisView;
  selection: Selection;
}
