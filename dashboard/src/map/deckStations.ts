/**
 * The stations and a selection's projection lines as deck.gl layers, drawn on deck.gl's canvas only
 * while a dense layer is shown there (deckOverlay.ts): deck.gl's canvas lies over MapLibre's, so the
 * stations MapLibre draws (stations.ts) would be under an underway log's points; this copy keeps them
 * on top, looking the same. Picking stays with MapLibre's station layer beneath (same positions).
 * Loaded with deck.gl, never at the cold start.
 */
import type { Layer } from "@deck.gl/core";
import { LineLayer, ScatterplotLayer } from "@deck.gl/layers";
import type { MapData, MapStation } from "./mapData.ts";
import type { ColourScale } from "./colour.ts";
import { stationRadiusPx } from "./labels.ts";
import { INK, stationFillRgba, stationRingPx, stationRingRgba } from "./stations.ts";

/** What the station layers are drawn from (as MapView holds it). */
export interface StationLayerState {
  data: MapData;
  stations: MapStation[];
  scale: ColourScale;
  selected: ReadonlySet<string>;
  hovered: string | null;
}

export function deckStationLayers({ data, stations, scale, selected, hovered }: StationLayerState): Layer[] {
  const layers: Layer[] = [];
  const selectedStations = stations.filter((s) => selected.has(s.id));
  const projected = selectedStations.filter((s) => s.nearestLonLat !== undefined);
  // Only with a selection: an empty layer still builds its shader program (software WebGL at the cold start).
  if (projected.length > 0)
    layers.push(
      new LineLayer<MapStation>({
        id: "station-projections",
        data: projected,
        getSourcePosition: (s) => s.lonLat,
        getTargetPosition: (s) => s.nearestLonLat ?? s.lonLat,
        getColor: INK,
        getWidth: 1.5,
        widthUnits: "pixels",
      }),
    );
  layers.push(
    new ScatterplotLayer<MapStation>({
      id: "stations",
      data: stations,
      getPosition: (s) => s.lonLat,
      getRadius: (s) => stationRadiusPx(s, selected, hovered),
      radiusUnits: "pixels",
      stroked: true,
      // The same fill and ring as MapLibre's station layer (stations.ts).
      getFillColor: (s) => stationFillRgba(data, s, scale),
      getLineColor: (s) => stationRingRgba(s, selected, hovered),
      getLineWidth: (s) => stationRingPx(s, selected, hovered),
      lineWidthUnits: "pixels",
      updateTriggers: {
        getFillColor: [data.colouring, data.constituent, scale.domain[0], scale.domain[1]],
        getRadius: [selected, hovered],
        getLineColor: [selected, hovered],
        getLineWidth: [selected, hovered],
      },
    }),
  );
  return layers;
}
