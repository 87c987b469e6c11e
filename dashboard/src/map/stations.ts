/**
 * The survey stations and a selection's projection lines as MapLibre circle and line layers, in the
 * one overlay GeoJSON source of the marks and labels (style.ts). Drawn by MapLibre, the cold start has
 * one WebGL canvas and no deck.gl shader: in software WebGL (SwiftShader) a deck.gl layer type costs a
 * large shader program and each frame of a second canvas a pixel read-back, while MapLibre's circle
 * and line programs are the ones the basemap and the marks already build (marks.ts).
 *
 * Look (as the stations had as deck.gl points): fill by the colour scale (colour.ts); a white 1 px
 * ring; off-channel stations (left out of the fits) faded in a dark 2 px ring; a hovered station dark
 * ring 2 px, a selected one dark ring 3 px, each a little larger. A station's drawn outer radius is its
 * `stationRadiusPx` (labels.ts, which reserves that room from labels) plus half its ring.
 *
 * Hover is feature state (`STATION_HOVER_STATE`, keyed by the station id through the source's
 * `promoteId`): hovering changes paint only and never re-tiles the source. Selection changes the
 * labels (selected names, reserved room) and so the source's data anyway; it is a feature property.
 */
import type { Feature, LineString, Point } from "geojson";
import type { ExpressionSpecification, LayerSpecification } from "maplibre-gl";
import type { MapData, MapStation } from "./mapData.ts";
import { cssRgba, type ColourScale, type RGBA } from "./colour.ts";
import { LABEL_SOURCE, stationRadiusPx } from "./labels.ts";

/** Dark ink of the selected, hovered and off-channel rings and of the projection lines. */
export const INK: RGBA = [33, 41, 48, 255];

/** The property the overlay source promotes to feature id (station features only). */
export const STATION_ID_PROPERTY = "sid";
/** Feature-state key of the hovered station. */
export const STATION_HOVER_STATE = "hover";

/** Layer ids, lowest first (drawn above the labels, as the stations were over the map before). */
export const STATION_LAYERS = {
  projection: "station-projections",
  stations: "stations",
} as const;

/** Properties of a station feature. */
export interface StationProps {
  kind: "station-mark";
  sid: string;
  /** CSS fill colour with its alpha (faded when off channel). */
  fill: string;
  off: boolean;
  selected: boolean;
}

interface ProjectionProps {
  kind: "projection";
}

/** Alpha (0–255) of an off-channel station's fill. */
const OFF_CHANNEL_ALPHA = 70;
const WHITE_RING: RGBA = [255, 255, 255, 220];

/** The value a station is coloured by (salinity or deviation from the dilution line). */
export function colourValue(data: MapData, s: MapStation): number | undefined {
  return data.colouring === "deviation" ? s.deviation : s.salinity;
}

/** A station's fill: the colour scale's colour of its value, faded when the station is off the channel. */
export function stationFillRgba(data: MapData, s: MapStation, scale: ColourScale): RGBA {
  const [r, g, b, a] = scale.rgba(colourValue(data, s));
  return [r, g, b, s.offChannel ? OFF_CHANNEL_ALPHA : a];
}

/** A station's ring colour: dark when selected, hovered or off the channel, otherwise white. */
export function stationRingRgba(s: MapStation, selected: ReadonlySet<string>, hovered: string | null): RGBA {
  return selected.has(s.id) || s.id === hovered || s.offChannel ? INK : WHITE_RING;
}

/**
 * The station points (fill colour precomputed) and, for the selected stations with a nearest channel
 * point, their projection lines, as features of the overlay source.
 *
 * @param data what the map shows (colouring)
 * @param stations the stations drawn (after thinning)
 * @param scale the colour scale of the legend
 * @param selected ids of the selected stations
 */
export function stationFeatures(
  data: MapData,
  stations: readonly MapStation[],
  scale: ColourScale,
  selected: ReadonlySet<string>,
): Array<Feature<Point, StationProps> | Feature<LineString, ProjectionProps>> {
  const lines: Feature<LineString, ProjectionProps>[] = [];
  const points: Feature<Point, StationProps>[] = [];
  for (const s of stations) {
    const isSelected = selected.has(s.id);
    if (isSelected && s.nearestLonLat)
      lines.push({
        type: "Feature",
        geometry: { type: "LineString", coordinates: [[...s.lonLat], [...s.nearestLonLat]] },
        properties: { kind: "projection" },
      });
    points.push({
      type: "Feature",
      geometry: { type: "Point", coordinates: [s.lonLat[0], s.lonLat[1]] },
      properties: {
        kind: "station-mark",
        sid: s.id,
        fill: cssRgba(stationFillRgba(data, s, scale)),
        off: Boolean(s.offChannel),
        selected: isSelected,
      },
    });
  }
  return [...lines, ...points];
}

const SELECTED: ExpressionSpecification = ["==", ["get", "selected"], true];
const HOVERED: ExpressionSpecification = ["boolean", ["feature-state", STATION_HOVER_STATE], false];
const OFF: ExpressionSpecification = ["==", ["get", "off"], true];

/** Ring width [px] of a station: selected 3, hovered or off channel 2, otherwise 1. */
export function stationRingPx(s: MapStation, selected: ReadonlySet<string>, hovered: string | null): number {
  return selected.has(s.id) ? 3 : s.id === hovered || s.offChannel ? 2 : 1;
}

/**
 * MapLibre draws a circle's ring outside its radius; the stations are drawn with the ring centred on
 * `stationRadiusPx` (outer edge radius + ring/2), so the fill's radius is radius − ring/2.
 */
function fillRadius(s: { selected: boolean; hovered: boolean; off: boolean }): number {
  const probe: MapStation = { id: "x", lonLat: [0, 0], offChannel: s.off };
  const sel = new Set(s.selected ? ["x"] : []);
  const hov = s.hovered ? "x" : null;
  return stationRadiusPx(probe, sel, hov) - stationRingPx(probe, sel, hov) / 2;
}

/** The projection-line and station layers (append after the label layers). */
export function stationLayers(): LayerSpecification[] {
  const isStation: ExpressionSpecification = ["==", ["get", "kind"], "station-mark"];
  return [
    {
      id: STATION_LAYERS.projection,
      type: "line",
      source: LABEL_SOURCE,
      filter: ["==", ["get", "kind"], "projection"],
      paint: { "line-color": cssRgba(INK), "line-width": 1.5 },
    },
    {
      id: STATION_LAYERS.stations,
      type: "circle",
      source: LABEL_SOURCE,
      filter: isStation,
      paint: {
        "circle-color": ["get", "fill"],
        "circle-radius": [
          "case",
          SELECTED,
          fillRadius({ selected: true, hovered: false, off: false }),
          HOVERED,
          fillRadius({ selected: false, hovered: true, off: false }),
          OFF,
          fillRadius({ selected: false, hovered: false, off: true }),
          fillRadius({ selected: false, hovered: false, off: false }),
        ],
        "circle-stroke-width": ["case", SELECTED, 3, HOVERED, 2, OFF, 2, 1],
        "circle-stroke-color": ["case", ["any", SELECTED, HOVERED, OFF], cssRgba(INK), cssRgba(WHITE_RING)],
      },
    },
  ];
}
