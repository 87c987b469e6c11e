import type { OffChannelStation, StationPlacement } from "./surveyAnalysis.ts";

/**
 * The stations placed on the channel network but farther from the centerline than the limit
 * (`offChannel` set by the projection): they are listed and, unless the user keeps them, left out
 * of the mixing fits and end-members, since a station in a side basin samples other water than the
 * channel's mixing line. Stations without a position are not listed here (they are not placed).
 *
 * @param placements station placements of one survey
 * @returns one entry per off-channel station, with its distance from the centerline [km]
 */
export function offChannelStations(placements: readonly StationPlacement[]): OffChannelStation[] {
  return placements
    .filter((p) => p.offChannel && p.offsetM !== undefined)
    .map((p) => ({
      id: p.id,
      distanceKm: Math.abs(p.offsetM!) / 1000,
      ...(p.branchId !== undefined ? { branchId: p.branchId } : {}),
    }));
}
