/**
 * The observations a plot draws for each constituent of one analysed survey: every value read
 * (QC-rejected ones and below-detection ones at their limit included, each with its original text),
 * minus the stations the analysis left out as off-channel (unless the user kept them). The analysis
 * decides what is plotted; the dashboard and the briefing only render it.
 */
import type { ObservationPoint, SurveyAnalysis } from "../pipeline/surveyAnalysis.ts";
import type { Survey } from "../survey/survey.ts";

export type { ObservationPoint };

/**
 * Observations of constituent `name` read straight from the survey, QC-rejected values and
 * below-detection values (at their limit) included. Values without a readable salinity are left out.
 *
 * @param survey the survey read
 * @param name the constituent name (a key of the stations' values)
 * @returns one point per station that has the constituent and a salinity
 */
export function surveyObservations(survey: Survey, name: string): ObservationPoint[] {
  const out: ObservationPoint[] = [];
  for (const st of survey.stations) {
    const cell = st.values[name];
    const s = st.salinity.value;
    if (!cell || s === undefined || !Number.isFinite(s)) continue;
    const at =
      cell.status === "measured" ? cell.value : cell.status === "belowDetection" ? cell.detectionLimit : undefined;
    if (at === undefined || !Number.isFinite(at)) continue;
    const kind = !cell.accepted ? "rejected" : cell.status === "measured" ? "measured" : "belowDetection";
    out.push({ stationId: st.id, salinity: s, value: at, kind, original: cell.original });
  }
  return out;
}

/**
 * The plotted observations of every constituent of an analysed survey: the survey's observations
 * without the stations the analysis left out of the fits as off-channel (kept when the user keeps
 * them), as the CLI's deviations leave them out (common practice: a second basin is not on the
 * mixing line of this channel).
 *
 * @param survey the survey read
 * @param analysis its analysis (off-channel stations and whether they were kept)
 * @returns observations by constituent name
 */
export function plottedObservations(
  survey: Survey,
  analysis: Pick<SurveyAnalysis, "constituents" | "offChannel" | "offChannelStations">,
): Record<string, ObservationPoint[]> {
  const left = new Set(analysis.offChannel?.kept ? [] : (analysis.offChannelStations ?? []).map((o) => o.id));
  const out: Record<string, ObservationPoint[]> = {};
  for (const c of analysis.constituents)
    out[c.name] = surveyObservations(survey, c.name).filter((o) => !left.has(o.stationId));
  return out;
}
