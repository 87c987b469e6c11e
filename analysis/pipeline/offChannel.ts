import type { OffChannelStation, StationPlacement } from "./surveyAnalysis.ts";

/**
 * The stations placed on the channel network but farther from the centerline than the limit
 * (`offChannel` set by the projection): they are listed and, unless the user keeps them, left out
 * of the mixing fits and end-members, since a station in a side basin samples other water than the
 * channel's mixing line. Without a centerline, the stations on a side arm of a distance axis are
 * listed too (distance along the arm from the mouth). Stations without a position are not listed.
 *
 * @param placements station placements of one survey
 * @returns one entry per off-channel station, with its distance from the centerline [km]
 */
export function offChannelStations(placements: readonly StationPlacement[]): OffChannelStation[] {
  const arm = placements
    .filter((p) => p.offChannel && p.sideArmKm !== undefined)
    .map((p): OffChannelStation => ({ id: p.id, distanceKm: p.sideArmKm!, sideArm: true }));
  return placements
    .filter((p) => p.offChannel && p.offsetM !== undefined)
    .map((p): OffChannelStation => ({
      id: p.id,
      distanceKm: Math.abs(p.offsetM!) / 1000,
      ...(p.branchId !== undefined ? { branchId: p.branchId } : {}),
    }))
    .concat(arm);
}
