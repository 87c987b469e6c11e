import type { Survey } from "../survey/survey.ts";
import { acceptedValue } from "./mixingSamples.ts";
import type { AlongChannelSeries, StationPlacement } from "./surveyAnalysis.ts";

/**
 * A variable that is not a dissolved mixing tracer (oxygen, chlorophyll, particles, turbidity), as
 * points along the channel and against salinity, for plotting. No end-members are computed.
 *
 * @param survey the survey
 * @param name constituent name (key of Station.values)
 * @param placements the survey's station placements (same order as survey.stations)
 * @returns the series with one point per station that has an accepted measured value
 */
export function alongChannelSeries(
  survey: Survey,
  name: string,
  placements: readonly StationPlacement[],
): AlongChannelSeries {
  const info = survey.constituents.find((c) => c.name === name);
  const points: AlongChannelSeries["points"] = [];
  survey.stations.forEach((st, i) => {
    const cell = st.values[name];
    const value = acceptedValue(cell);
    if (value === undefined) return;
    const p = placements[i];
    const salinity = cell?.sampleSalinity ?? acceptedValue(st.salinity);
    points.push({
      stationId: st.id,
      value,
      ...(salinity !== undefined ? { salinity } : {}),
      ...(p?.alongChannelKm !== undefined ? { alongChannelKm: p.alongChannelKm } : {}),
      ...(p?.offChannel === true ? { offChannel: true } : {}),
    });
  });
  return {
    name,
    unit: info?.unit ?? "",
    kind: "nonMixing",
    reason: info?.kindReason ?? "not a dissolved mixing tracer",
    points,
  };
}
