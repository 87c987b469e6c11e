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
import { deckStationLayers, type StationLayerState } from "./deckStations.ts";

export interface DeckOverlay {
  /**
   * Draws these dense layers (an empty description draws nothing) and, over them, the stations: deck.gl's
   * canvas lies over MapLibre's, whose stations would otherwise be under the dense points.
   */
  setLayers(dense: DenseLayers, stations: StationLayerState): void;
  remove(): void;
}

/** The deck.gl layers of a description, lowest first, with the stations over them (none without a dense layer). */
export function deckLayers(dense: DenseLayers, stations: StationLayerState): Layer[] {
  const layers: Layer[] = [
    ...(dense.chosenZones ? chosenZonesLayer(dense.chosenZones.paths, dense.chosenZones.nZoned) : []),
    ...(dense.underway ? [underwayLayer(dense.underway)] : []),
  ];
  return layers.length > 0 ? [...layers, ...deckStationLayers(stations)] : [];
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
  /**
   * deck.gl's canvas only draws: no tab stop, hidden from assistive technology. deck.gl gives its canvas
   * `tabindex="0"` again after creating it, so an observer puts it back; looked for after each frame
   * until found.
   */
  let hidden = false;
  const keepOut = (c: HTMLCanvasElement) => {
    if (c.tabIndex !== -1) c.tabIndex = -1;
    if (c.getAttribute("aria-hidden") !== "true") c.setAttribute("aria-hidden", "true");
  };
  const observer = new MutationObserver((records) => {
    for (const r of records) keepOut(r.target as HTMLCanvasElement);
  });
  const hideCanvas = () => {
    for (const c of map.getContainer().querySelectorAll("canvas")) {
      if (before.has(c)) continue;
      keepOut(c);
      observer.observe(c, { attributes: true, attributeFilter: ["tabindex", "aria-hidden"] });
      hidden = true;
    }
  };
  let layers: Layer[] = [];
  const overlay = new MapboxOverlay({
    interleaved: false,
    deviceProps: { webgl: { antialias: options.antialias } },
    layers,
    onAfterRender: () => {
      if (!hidden) hideCanvas();
      options.onDrawn?.(layers.filter((l) => l.isLoaded).map((l) => l.id));
    },
  });
  map.addControl(overlay);
  hideCanvas();
  return {
    setLayers: (dense, stations) => {
      layers = deckLayers(dense, stations);
      overlay.setProps({ layers });
    },
    remove: () => {
      observer.disconnect();
      overlay.finalize();
    },
  };
}
