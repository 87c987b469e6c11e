/**
 * The observations a panel draws for one constituent, and look-ups between
 * constituents, stations and the shared selection. Data handling only.
 */
import type { Survey } from "../../../../analysis/survey/survey.ts";
import type { ConstituentAnalysisView, ObservationPoint, StationPlacement, SurveyAnalysisView } from "./types.ts";

/** The constituent result by name, or undefined. */
export function constituentByName(analysis: SurveyAnalysisView, name: string): ConstituentAnalysisView | undefined {
  return analysis.constituents.find((c) => c.name === name);
}

/**
 * Observations to draw: the result's `observations` when present (they include
 * QC-rejected values), otherwise the stations the analysis used (deviations),
 * with censored values drawn at their substitute.
 */
export function observationsOf(c: ConstituentAnalysisView | undefined): ObservationPoint[] {
  if (!c) return [];
  if (c.observations) return c.observations.filter((o) => Number.isFinite(o.salinity) && Number.isFinite(o.value));
  return c.deviations
    .filter((d) => Number.isFinite(d.salinity) && Number.isFinite(d.observed))
    .map((d) => ({
      stationId: d.stationId,
      salinity: d.salinity,
      value: d.observed,
      kind: d.censored ? ("belowDetection" as const) : ("measured" as const),
    }));
}

/** Station placements by id. */
export function placementsById(analysis: SurveyAnalysisView): Map<string, StationPlacement> {
  return new Map(analysis.stations.map((s) => [s.id, s]));
}

/** Ids of observations whose salinity lies in [lo, hi] (inclusive). */
export function idsInSalinityRange(points: readonly ObservationPoint[], range: readonly [number, number]): string[] {
  const lo = Math.min(range[0], range[1]);
  const hi = Math.max(range[0], range[1]);
  return [...new Set(points.filter((p) => p.salinity >= lo && p.salinity <= hi).map((p) => p.stationId))];
}

/** Human label for an observation kind. */
export const observationKindLabel: Record<ObservationPoint["kind"], string> = {
  measured: "measured",
  belowDetection: "below detection limit (drawn at the limit)",
  rejected: "rejected by quality control (not analysed)",
};

/**
 * Observations of constituent `name` read straight from the survey, including
 * QC-rejected values (drawn as crosses) and below-detection values at their
 * limit. Values without a readable salinity are left out.
 */
export function surveyObservations(survey: Survey, name: string): ObservationPoint[] {
  const out: ObservationPoint[] = [];
  for (const st of survey.stations) {
    const cell = st.values[name];
    const s = st.salinity.value;
    if (!cell || s === undefined || !Number.isFinite(s)) continue;
    if (cell.status === "measured" && cell.value !== undefined) {
      out.push({
        stationId: st.id,
        salinity: s,
        value: cell.value,
        kind: cell.accepted ? "measured" : "rejected",
        original: cell.original,
      });
    } else if (cell.status === "belowDetection" && cell.detectionLimit !== undefined) {
      out.push({
        stationId: st.id,
        salinity: s,
        value: cell.detectionLimit,
        kind: cell.accepted ? "belowDetection" : "rejected",
        original: cell.original,
      });
    }
  }
  return out;
}

/**
 * The analysis with each constituent's `observations` filled from the survey (for drawing rejected values).
 * Stations left out of the fits as off-channel (unless the user kept them) are not drawn as observations:
 * the plots show what was analysed, as the CLI's deviations do; the map and the notices list them.
 */
export function withObservations(analysis: SurveyAnalysisView, survey: Survey): SurveyAnalysisView {
  const left = new Set(analysis.offChannel?.kept ? [] : (analysis.offChannelStations ?? []).map((o) => o.id));
  return {
    ...analysis,
    constituents: analysis.constituents.map((c) => ({
      ...c,
      observations: surveyObservations(survey, c.name).filter((o) => !left.has(o.stationId)),
    })),
  };
}
