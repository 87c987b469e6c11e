/**
 * The offline map style: built from our own basemap GeoJSON (water, land,
 * marsh polygons, place labels). No remote tiles, glyphs or sprites; labels
 * are drawn with local fonts. An optional user raster tile URL is added only
 * when the user turns it on; it is drawn over the optional Natural Earth world land.
 */
import type { FeatureCollection } from "geojson";
import type { ExpressionSpecification, StyleSpecification } from "maplibre-gl";
import { LABEL_SOURCE, labelLayers } from "./labels.ts";
import { markLayers } from "./marks.ts";
import { STATION_ID_PROPERTY, stationLayers } from "./stations.ts";
import { worldLandStyle, type WorldLandSource } from "./basemapStyle.ts";

export const PALETTE = {
  background: "#e3e1da",
  land: "#eceae3",
  water: "#c6d8e0",
  marsh: "#d3ddc4",
  shore: "#9fb3bc",
  label: "#3d444b",
  halo: "#f7f6f2",
} as const;

/** The feature's kind, read from whichever property the basemap uses. */
const KIND: ExpressionSpecification = [
  "downcase",
  ["to-string", ["coalesce", ["get", "kind"], ["get", "class"], ["get", "type"], ""]],
];

const POLYGON: ExpressionSpecification = ["in", ["geometry-type"], ["literal", ["Polygon", "MultiPolygon"]]];
const POINT: ExpressionSpecification = ["in", ["geometry-type"], ["literal", ["Point", "MultiPoint"]]];

const EMPTY: FeatureCollection = { type: "FeatureCollection", features: [] };

/** GeoJSON source of the basemap (water, land, marsh, place labels). */
export const BASEMAP_SOURCE = "basemap";

export interface StyleOptions {
  basemap: FeatureCollection | undefined;
  /** Raster tile URL template; used only when non-empty. */
  tileUrl?: string;
  /** The overlay labels (labels.ts labelFeatures); empty when omitted. */
  labels?: FeatureCollection;
  /** The channel, km ticks, reaction zone, brushed stretch, isohalines, maximum (marks.ts markFeatures); empty when omitted. */
  marks?: FeatureCollection;
  /** The stations and projection lines (stations.ts stationFeatures); none when omitted. */
  stations?: FeatureCollection["features"];
  /** Natural Earth world land (basemapStyle.ts), drawn beneath user tiles and our own basemap. */
  worldLand?: WorldLandSource;
}

/** The marks, the labels, then the stations, as the one overlay source's data. */
export function overlayFeatures(
  marks: FeatureCollection | undefined,
  labels: FeatureCollection | undefined,
  stations: FeatureCollection["features"] = [],
): FeatureCollection {
  if (!marks?.features.length && stations.length === 0) return labels ?? EMPTY;
  return {
    type: "FeatureCollection",
    features: [...(marks?.features ?? []), ...(labels?.features ?? []), ...stations],
  };
}

export function buildStyle({ basemap, tileUrl, labels, marks, stations, worldLand }: StyleOptions): StyleSpecification {
  const world = worldLand ? worldLandStyle(worldLand, PALETTE) : undefined;
  const style: StyleSpecification = {
    version: 8,
    name: "Brackline offline",
    sources: {
      [BASEMAP_SOURCE]: { type: "geojson", data: basemap ?? EMPTY },
      // One source for the marks, the labels and the stations (marks.ts, stations.ts): tiled together
      // when an analysis changes them; station features carry their id for the hover feature state.
      [LABEL_SOURCE]: {
        type: "geojson",
        data: overlayFeatures(marks, labels, stations),
        promoteId: STATION_ID_PROPERTY,
      },
      ...world?.sources,
    },
    layers: [
      { id: "background", type: "background", paint: { "background-color": PALETTE.background } },
      ...(world?.layers ?? []),
      {
        id: "land",
        type: "fill",
        source: BASEMAP_SOURCE,
        filter: ["all", POLYGON, ["==", KIND, "land"]],
        paint: { "fill-color": PALETTE.land },
      },
      {
        id: "water",
        type: "fill",
        source: BASEMAP_SOURCE,
        filter: ["all", POLYGON, ["in", KIND, ["literal", ["water", "sea", "river"]]]],
        paint: { "fill-color": PALETTE.water, "fill-outline-color": PALETTE.shore },
      },
      {
        id: "marsh",
        type: "fill",
        source: BASEMAP_SOURCE,
        filter: ["all", POLYGON, ["in", KIND, ["literal", ["marsh", "wetland"]]]],
        paint: { "fill-color": PALETTE.marsh },
      },
      {
        id: "shoreline",
        type: "line",
        source: BASEMAP_SOURCE,
        filter: ["all", POLYGON, ["in", KIND, ["literal", ["water", "sea", "river"]]]],
        paint: { "line-color": PALETTE.shore, "line-width": 0.8 },
      },
      {
        id: "place-labels",
        type: "symbol",
        source: BASEMAP_SOURCE,
        filter: ["all", POINT, ["has", "name"]],
        layout: {
          "text-field": ["get", "name"],
          "text-font": ["sans-serif"],
          "text-size": 13,
          "text-variable-anchor-offset": ["left", [0.6, 0], "right", [-0.6, 0], "top", [0, 0.5], "bottom", [0, -0.5]],
          "text-padding": 3,
        },
        paint: { "text-color": PALETTE.label, "text-halo-color": PALETTE.halo, "text-halo-width": 1.4 },
      },
      {
        id: "place-dots",
        type: "circle",
        source: BASEMAP_SOURCE,
        filter: ["all", POINT, ["has", "name"]],
        paint: { "circle-radius": 2.5, "circle-color": PALETTE.label },
      },
      // The channel and its marks above the basemap, under every label.
      ...markLayers(),
      // Overlay labels above the place names: MapLibre places the topmost layers first.
      ...labelLayers(),
      // The stations on top (their room is kept free of labels by the labels' reserve boxes).
      ...stationLayers(),
    ],
  };
  if (tileUrl && tileUrl.trim() !== "") {
    style.sources.userTiles = { type: "raster", tiles: [tileUrl.trim()], tileSize: 256 };
    style.layers.splice(1 + (world?.layers.length ?? 0), 0, {
      id: "user-tiles",
      type: "raster",
      source: "userTiles",
      paint: { "raster-opacity": 0.85 },
    });
  }
  return style;
}
