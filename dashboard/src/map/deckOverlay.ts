/**
 * The deck.gl overlay of the dense map layers (denseLayers.ts), loaded by a dynamic import only
 * when one is shown: deck.gl stays out of the first page load and the cold start's frames. Its
 * canvas only draws (nothing on it is picked: stations are MapLibre layers), takes no tab stop and
 * is hidden from assistive technology; MapLibre's canvas is the map's one keyboard stop.
 */
import { MapboxOverlay } from "@deck.gl/mapbox";
import type { Layer } from "@deck.gl/core";
import type { Map as MapLibreMap } from "maplibre-gl";
import type { DenseLayers } from "./denseLayers.ts";
import { underwayLayer } from "./underwayLayer.ts";
import { chosenZonesLayer } from "../archive/chosenZonesLayer.ts";

export interface DeckOverlay {
  /** Draws these dense layers (an empty description draws nothing). */
  setLayers(dense: DenseLayers): void;
  remove(): void;
}

/** The deck.gl layers of a description, lowest first. */
export function deckLayers(dense: DenseLayers): Layer[] {
  return [
    ...(dense.chosenZones ? chosenZonesLayer(dense.chosenZones.paths, dense.chosenZones.nZoned) : []),
    ...(dense.underway ? [underwayLayer(dense.underway)] : []),
  ];
}

/**
 * Adds a deck.gl overlay (its own canvas over the map, `interleaved: false`) to a map.
 *
 * @param map the MapLibre map
 * @param options `antialias`: multisampling (off in software WebGL, where it costs most of each
 *   overlay frame); `onDrawn(ids)`: after each deck.gl frame, the ids of the layers it drew loaded
 */
export function addDeckOverlay(
  map: MapLibreMap,
  options: { antialias: boolean; onDrawn?: (ids: string[]) => void },
): DeckOverlay {
  const before = new Set(map.getContainer().querySelectorAll("canvas"));
  let layers: Layer[] = [];
  const overlay = new MapboxOverlay({
    interleaved: false,
    deviceProps: { webgl: { antialias: options.antialias } },
    layers,
    onAfterRender: () => options.onDrawn?.(layers.filter((l) => l.isLoaded).map((l) => l.id)),
  });
  map.addControl(overlay);
  for (const c of map.getContainer().querySelectorAll("canvas")) {
    if (before.has(c)) continue;
    c.tabIndex = -1;
    c.setAttribute("aria-hidden", "true");
  }
  return {
    setLayers: (dense) => {
      layers = deckLayers(dense);
      overlay.setProps({ layers });
    },
    remove: () => overlay.finalize(),
  };
}
