/**
 * The observations a panel draws for one constituent, and look-ups between
 * constituents, stations and the shared selection. Data handling only.
 */
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
 * The analysis with each constituent's `observations` taken from the analysis result's plotted
 * observations (analysis/workspace plottedObservations: rejected and below-detection values included,
 * off-channel stations left out unless kept). The analysis decides what is plotted; panels render it.
 */
export function withObservations(analysis: SurveyAnalysisView): SurveyAnalysisView {
  const plotted = analysis.observations;
  if (!plotted) return analysis;
  return {
    ...analysis,
    constituents: analysis.constituents.map((c) => {
      const observations = plotted[c.name];
      return observations ? { ...c, observations } : c;
    }),
  };
}
