/**
 * The order in which a survey's stations are listed to the user: along the channel from the mouth,
 * then the stations the analysis put off the channel, so a list of a real cruise (whose file may
 * start with a side basin) reads as the channel does.
 */
import type { StationPlacement } from "../pipeline/surveyAnalysis.ts";

/** Where a station falls in the list; lower groups come first. */
function group(p: StationPlacement): number {
  if (p.offChannel) return p.sideArmKm !== undefined ? 1 : 2;
  return p.alongChannelKm !== undefined ? 0 : 3;
}

/** The key a station is ordered by within its group (km, distance off the channel, or none). */
function key(p: StationPlacement): number {
  if (p.offChannel) return p.sideArmKm ?? (p.offsetM === undefined ? Infinity : Math.abs(p.offsetM));
  return p.alongChannelKm ?? Infinity;
}

/**
 * Station ids in list order: on-channel stations by along-channel distance from the mouth
 * (ascending km), then side-arm stations by their km along the arm, then other off-channel
 * stations by their distance from the centerline, then stations without a position. Ties keep
 * the file's order (a stable sort), and so does a survey with no placements.
 *
 * Common practice: a station list follows the transect, not the row order of the export.
 *
 * @param placements the survey's station placements (as `SurveyAnalysis.stations`)
 * @returns every id once, in list order
 */
export function stationListOrder(placements: readonly StationPlacement[]): string[] {
  return placements
    .map((p, i) => ({ id: p.id, g: group(p), k: key(p), i }))
    .sort((a, b) => a.g - b.g || a.k - b.k || a.i - b.i)
    .map((x) => x.id);
}
