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
import { INK, colourValue, stationRingPx } from "./stations.ts";

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
  const fade = (c: number[], off: boolean | undefined): [number, number, number, number] => [
    c[0] ?? 0,
    c[1] ?? 0,
    c[2] ?? 0,
    off ? 70 : (c[3] ?? 255),
  ];
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
      // Off-channel stations (left out of the fits): faded fill in a dark ring, so they read as set apart.
      getFillColor: (s) => fade(scale.rgba(colourValue(data, s)), s.offChannel),
      getLineColor: (s) => (selected.has(s.id) || s.id === hovered || s.offChannel ? INK : [255, 255, 255, 220]),
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
