/**
 * The deck.gl layer of the chosen surveys' reaction zones (chosenZones.ts makes the paths). Imported
 * only by the lazily loaded deck.gl overlay (map/deckOverlay.ts), so deck.gl is not in the first load.
 */
import { PathLayer } from "@deck.gl/layers";
import { ADDITION_CSS, REMOVAL_CSS, toRgba } from "../map/colour.ts";
import { zoneAlpha, type ChosenZonePath } from "./chosenZones.ts";

export { chosenZonePaths, MIN_ZONE_ALPHA, zoneAlpha, type ChosenZonePath } from "./chosenZones.ts";

/** The deck.gl layer of the chosen surveys' zones (empty list: no layer). */
export function chosenZonesLayer(paths: readonly ChosenZonePath[], nZoned: number): PathLayer<ChosenZonePath>[] {
  if (paths.length === 0) return [];
  const alpha = zoneAlpha(nZoned);
  const removal = toRgba(REMOVAL_CSS, alpha);
  const addition = toRgba(ADDITION_CSS, alpha);
  return [
    new PathLayer<ChosenZonePath>({
      id: "archive-chosen-zones",
      data: paths as ChosenZonePath[],
      getPath: (p) => p.path,
      getColor: (p) => (p.kind === "addition" ? addition : removal),
      getWidth: 10,
      widthUnits: "pixels",
      capRounded: true,
    }),
  ];
}
