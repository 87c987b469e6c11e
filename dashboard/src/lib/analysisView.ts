/**
 * Reads the parts of a survey analysis the shell and the map show. Keeps the
 * shape of the analysis result in one place on the dashboard side.
 */
import type { StationDeviation, StationPlacement } from "../../../analysis/index.ts";
import type { AnalysisResult } from "../worker/engine.ts";

/** Stations as placed on the channel, by id. */
export function placementsById(analysis: AnalysisResult | undefined): Map<string, StationPlacement> {
  return new Map((analysis?.stations ?? []).map((p) => [p.id, p]));
}

/** Deviations from the dilution line of one constituent, by station id. */
export function deviationsById(
  analysis: AnalysisResult | undefined,
  constituent: string,
): Map<string, StationDeviation> {
  const c = analysis?.constituents.find((x) => x.name === constituent);
  return new Map((c?.deviations ?? []).map((d) => [d.stationId, d]));
}
