/**
 * deck.gl layers drawn over the map, built from plain map data and the
 * selection. Pure: the map component hands the result to the overlay. Text is
 * not drawn here: labels are MapLibre symbol layers with collision handling (labels.ts).
 */
import type { Layer } from "@deck.gl/core";
import { LineLayer, PathLayer, ScatterplotLayer } from "@deck.gl/layers";
import type { MapData, MapStation } from "./mapData.ts";
import { ADDITION_CSS, ADDITION_DARK_CSS, REMOVAL_CSS, toRgba, type ColourScale, type RGBA } from "./colour.ts";
import type { LonLat } from "../worker/overlay.ts";
import { stationRadiusPx } from "./labels.ts";

export const INK: RGBA = [33, 41, 48, 255];
const CHANNEL: RGBA = [52, 84, 102, 230];
const REMOVAL: RGBA = toRgba(REMOVAL_CSS, 140);
const ADDITION: RGBA = toRgba(ADDITION_CSS, 140);
const MAXIMUM: RGBA = toRgba(ADDITION_DARK_CSS, 255);
const HALO: RGBA = [250, 250, 247, 235];
const ISOHALINE: RGBA = [20, 110, 140, 255];

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
  const zone = data.zone;
  if (zone && zone.zonePaths.length > 0) {
    layers.push(
      new PathLayer<LonLat[]>({
        id: "reaction-zone",
        data: zone.zonePaths,
        getPath: (p) => p,
        getColor: zone.zoneKind === "addition" ? ADDITION : REMOVAL,
        getWidth: 14,
        widthUnits: "pixels",
        capRounded: true,
      }),
    );
  }
  if (data.brushPaths && data.brushPaths.length > 0) {
    layers.push(
      new PathLayer<LonLat[]>({
        id: "salinity-brush",
        data: data.brushPaths,
        getPath: (p) => p,
        getColor: [40, 40, 40, 110],
        getWidth: 22,
        widthUnits: "pixels",
        capRounded: true,
      }),
    );
  }
  if (data.channel) {
    layers.push(
      new PathLayer({
        id: "centerline",
        data: data.channel.paths,
        getPath: (p) => p.path,
        getColor: CHANNEL,
        getWidth: 2.5,
        widthUnits: "pixels",
        jointRounded: true,
      }),
      new ScatterplotLayer({
        id: "km-ticks",
        data: data.channel.ticks,
        getPosition: (t) => t.lonLat,
        getRadius: (t) => (t.major ? 3.5 : 2),
        radiusUnits: "pixels",
        getFillColor: CHANNEL,
      }),
    );
  }
  const isohalines = data.overlay?.isohalines ?? [];
  if (isohalines.length > 0) {
    layers.push(
      new ScatterplotLayer({
        id: "isohalines",
        data: isohalines,
        getPosition: (d) => d.lonLat,
        getRadius: 5,
        radiusUnits: "pixels",
        stroked: true,
        filled: true,
        getFillColor: HALO,
        getLineColor: ISOHALINE,
        getLineWidth: 2,
        lineWidthUnits: "pixels",
      }),
    );
  }
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
  if (zone && zone.maximumPoints.length > 0) {
    layers.push(
      new ScatterplotLayer<LonLat>({
        id: "maximum",
        data: zone.maximumPoints,
        getPosition: (p) => p,
        getRadius: 14,
        radiusUnits: "pixels",
        stroked: true,
        filled: false,
        getLineColor: MAXIMUM,
        getLineWidth: 3,
        lineWidthUnits: "pixels",
      }),
    );
  }
  return layers;
}
