/**
 * deck.gl layers drawn over the map, built from plain map data and the
 * selection: the stations (picked by hover and click) and, for a selection, their
 * projection lines. Pure: the map component hands the result to the overlay. Text is
 * not drawn here: labels are MapLibre symbol layers with collision handling (labels.ts);
 * the channel, km ticks, reaction zone, brushed stretch, isohalines and maximum are
 * MapLibre line and circle layers (marks.ts), which cost software WebGL no shader of their own.
 */
import type { Layer } from "@deck.gl/core";
import { LineLayer, ScatterplotLayer } from "@deck.gl/layers";
import type { MapData, MapStation } from "./mapData.ts";
import type { ColourScale, RGBA } from "./colour.ts";
import { stationRadiusPx } from "./labels.ts";

export const INK: RGBA = [33, 41, 48, 255];

export interface LayerState {
  data: MapData;
  stations: MapStation[];
  scale: ColourScale;
  selected: ReadonlySet<string>;
  hovered: string | null;
}

function colourValue(data: MapData, s: MapStation): number | undefined {
  return data.colouring === "deviation" ? s.deviation : s.salinity;
}

export function buildLayers({ data, stations, scale, selected, hovered }: LayerState): Layer[] {
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
        id: "projection-lines",
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
      pickable: true,
      getPosition: (s) => s.lonLat,
      getRadius: (s) => stationRadiusPx(s, selected, hovered),
      radiusUnits: "pixels",
      stroked: true,
      // Off-channel stations (left out of the fits): faded fill in a dark ring, so they read as set apart.
      getFillColor: (s) => fade(scale.rgba(colourValue(data, s)), s.offChannel),
      getLineColor: (s) => (selected.has(s.id) || s.id === hovered || s.offChannel ? INK : [255, 255, 255, 220]),
      getLineWidth: (s) => (selected.has(s.id) ? 3 : s.id === hovered || s.offChannel ? 2 : 1),
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
