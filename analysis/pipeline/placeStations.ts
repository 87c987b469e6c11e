import type { ChannelNetwork } from "../geometry/types.ts";
import { projectStations } from "../geometry/projectStations.ts";
import type { Station } from "../survey/survey.ts";
import type { MixingWarning, StationPlacement } from "./surveyAnalysis.ts";
import { acceptedValue } from "./mixingSamples.ts";

/**
 * Places survey stations on the channel: along-channel distance from the mouth [km], signed
 * cross-channel offset [m], branch and nearest channel point, through the geometry core. Without a
 * network, a distance given in the file (`distanceKm` on imported stations) is used as the chainage,
 * and a station on a side arm of that distance axis (`sideArmKm`, see distancesFromMouth) is off the channel.
 *
 * @param stations survey stations
 * @param network channel network, when a centerline was given
 * @param offChannelThresholdM stations farther off the channel are flagged [m]
 * @returns one placement per station (none dropped) and the geometry warnings
 */
export function placeStations(
  stations: readonly Station[],
  network: ChannelNetwork | undefined,
  offChannelThresholdM: number | undefined,
): { placements: StationPlacement[]; warnings: MixingWarning[] } {
  const base = stations.map((st): StationPlacement => {
    const { distanceKm: given, sideArmKm } = st as Station & { distanceKm?: number; sideArmKm?: number };
    const onArm = sideArmKm !== undefined && !network;
    const salinity = acceptedValue(st.salinity);
    const temperatureC = acceptedValue(st.temperatureC);
    const pH = acceptedValue(st.pH);
    return {
      id: st.id,
      ...(st.lonLat ? { lonLat: st.lonLat } : {}),
      ...(given !== undefined && !network ? { alongChannelKm: given } : {}),
      offChannel: onArm,
      ...(onArm ? { sideArmKm } : {}),
      ...(salinity !== undefined ? { salinity } : {}),
      ...(temperatureC !== undefined ? { temperatureC } : {}),
      ...(pH !== undefined ? { pH } : {}),
      ...(st.time !== undefined ? { time: st.time } : {}),
      ...(st.depthM !== undefined ? { depthM: st.depthM } : {}),
    };
  });
  if (!network) return { placements: base, warnings: [] };
  const options = offChannelThresholdM !== undefined ? { offChannelThresholdM } : {};
  const { projections, warnings } = projectStations(
    network,
    stations.map((s) => ({ id: s.id, lonLat: s.lonLat })),
    options,
  );
  const placements = base.map((p, i): StationPlacement => {
    const pr = projections[i]!;
    return {
      ...p,
      ...(pr.alongChannelKm !== undefined ? { alongChannelKm: pr.alongChannelKm } : {}),
      ...(pr.offsetM !== undefined ? { offsetM: pr.offsetM } : {}),
      ...(pr.branchId !== undefined ? { branchId: pr.branchId } : {}),
      ...(pr.nearestLonLat !== undefined ? { nearestLonLat: pr.nearestLonLat } : {}),
      offChannel: pr.offChannel,
    };
  });
  return { placements, warnings };
}
