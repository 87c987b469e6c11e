/**
 * What the speciation panel asks the worker for: the focus station's conditions and the stations'
 * measured pH, picked from the analysis snapshot (no science here; the worker computes).
 */
import type { FocusStation, MeasuredPh } from "../../worker/speciation.ts";
import type { SurveyAnalysisView } from "./types.ts";

const finite = (x: number | undefined): x is number => x !== undefined && Number.isFinite(x);

/** The station speciation is shown for: the first selected (or else hovered) station with a salinity. */
export function focusStation(
  analysis: SurveyAnalysisView,
  selectedIds: Iterable<string>,
  hoveredId: string | null,
): FocusStation | undefined {
  const byId = new Map(analysis.stations.map((s) => [s.id, s]));
  for (const id of [...selectedIds, ...(hoveredId ? [hoveredId] : [])]) {
    const s = byId.get(id);
    if (s && finite(s.salinity))
      return {
        id: s.id,
        salinity: s.salinity,
        ...(finite(s.temperatureC) ? { temperatureC: s.temperatureC } : {}),
        ...(finite(s.pH) ? { pH: s.pH } : {}),
      };
  }
  return undefined;
}

/** Stations with a measured pH and salinity. */
export function measuredPh(analysis: SurveyAnalysisView): MeasuredPh[] {
  return analysis.stations
    .filter((s) => finite(s.pH) && finite(s.salinity))
    .map((s) => ({ stationId: s.id, salinity: s.salinity as number, pH: s.pH as number }));
}
