/**
 * Props contract of the dashboard panels: the survey analysis as the panels
 * read it. Every number here comes from `analysis/`; panels only lay it out.
 */
import type { StationPlacement, SurveyAnalysis, SurveyFacts } from "../../../../analysis/pipeline/surveyAnalysis.ts";
import type {
  BehaviourClass,
  ConstituentAnalysis,
  FitCurve,
  TangentLine,
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
  ConstituentAnalysis,
  FitCurve,
  TangentLine,
  DilutionLine,
  Endmember,
  Estimate,
  MidEstuarineMaximum,
  MixingWarning,
  ReactionZone,
  StationDeviation,
  StationPlacement,
  SurveyAnalysis,
  SurveyFacts,
};

import type { ObservationPoint } from "../../../../analysis/index.ts";

export type { ObservationPoint };

/**
 * Per-constituent mixing result as the panels read it: the analysis contract
 * plus, optionally, every observation including QC-rejected ones (see
 * {@link withObservations}); without them the plots draw the analysed stations.
 */
export type ConstituentAnalysisView = ConstituentAnalysis & { observations?: ObservationPoint[] };

/**
 * The survey analysis result the panels take as `analysis`: a
 * {@link SurveyAnalysis} (from analyzeSurvey) is one as it stands; the shell
 * may add observations per constituent to draw QC-rejected values.
 */
export type SurveyAnalysisView = Omit<SurveyAnalysis, "constituents"> & { constituents: ConstituentAnalysisView[] };

/** Props every panel takes. */
export interface PanelProps {
  analysis: SurveyAnalysisView;
  selection: Selection;
  /**
   * The panel's content width [CSS px] when the page knows it before the panel is drawn (the panels
   * column, measured while its placeholders show): charts are drawn at that width at once instead of
   * at their default width and again once they have measured themselves.
   */
  widthHint?: number;
}
