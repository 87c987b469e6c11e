/**
 * What the map draws with deck.gl, as plain data: the dense layers (an underway log's aggregated
 * points, the archive's chosen reaction zones). deck.gl itself is loaded (deckOverlay.ts, a dynamic
 * import) only once one of them is to be shown, so the cold start has one WebGL canvas (MapLibre's)
 * and no deck.gl code or shaders; the stations and projection lines are MapLibre layers (stations.ts).
 */
import type { UnderwayPoints } from "../worker/underwayProtocol.ts";
import type { ChosenZonePath } from "../archive/chosenZones.ts";

export interface DenseLayers {
  /** An underway log's aggregated points (at most MAX_UNDERWAY_POINTS). */
  underway?: UnderwayPoints;
  /** The chosen surveys' reaction zones and how many surveys have one. */
  chosenZones?: { paths: readonly ChosenZonePath[]; nZoned: number };
}

/** Ids of the deck.gl layers the description makes (in drawing order, lowest first). */
export function denseLayerIds(dense: DenseLayers): string[] {
  const ids: string[] = [];
  if ((dense.chosenZones?.paths.length ?? 0) > 0) ids.push("archive-chosen-zones");
  if (dense.underway) ids.push("underway");
  return ids;
}
