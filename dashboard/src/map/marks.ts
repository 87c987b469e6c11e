/**
 * The map's drawn marks that nobody picks — the channel, its km ticks, the reaction zone, a brushed
 * stretch, isohaline markers and the maximum ring — as MapLibre line and circle layers drawn beneath
 * the labels, reading the labels' GeoJSON source (one source: one tiling in MapLibre's worker and one
 * set of tile loads, so fewer frames, when an analysis changes both). MapLibre's line and circle programs are the ones the basemap
 * already uses (shoreline, place dots); a deck.gl layer type costs software WebGL (SwiftShader) one
 * large shader program to compile at the cold start (PathLayer alone ~1 s of CPU on the bench machine,
 * bench/profile/bareVariants.ts). The stations are MapLibre layers of the same source too (stations.ts).
 */
import type { Feature, FeatureCollection, LineString, Point } from "geojson";
import type { LayerSpecification } from "maplibre-gl";
import type { MapData } from "./mapData.ts";
import type { LonLat } from "../worker/overlay.ts";
import { ADDITION_CSS, ADDITION_DARK_CSS, REMOVAL_CSS, cssRgba, toRgba } from "./colour.ts";
import { LABEL_SOURCE } from "./labels.ts";

/** GeoJSON source of every mark: the overlay labels' (its label kinds and these kinds are distinct). */
export const MARK_SOURCE = LABEL_SOURCE;

export type MarkKind =
  "zone-removal" | "zone-addition" | "brush" | "channel" | "tick" | "isohaline-marker" | "maximum-ring";

/**
 * Layer ids, lowest first (the style order). Each layer's paint is constant (a layer per zone kind and
 * per tick size, not a colour or radius read from the feature): MapLibre builds one shader program per
 * set of feature-driven paint properties, so constant paint shares the programs the basemap's lines and
 * place dots already built instead of compiling variants of its own when the analysis comes in.
 */
export const MARK_LAYERS = {
  zone: "mark-zone",
  zoneAddition: "mark-zone-addition",
  brush: "mark-brush",
  channel: "mark-channel",
  ticks: "mark-ticks",
  ticksMajor: "mark-ticks-major",
  isohalines: "mark-isohalines",
  maximum: "mark-maximum",
} as const;

interface MarkProps {
  kind: MarkKind;
  /** Major km tick (drawn larger). */
  major?: boolean;
}

export const CHANNEL_CSS = cssRgba([52, 84, 102, 230]);
const REMOVAL_ZONE_CSS = cssRgba(toRgba(REMOVAL_CSS, 140));
const ADDITION_ZONE_CSS = cssRgba(toRgba(ADDITION_CSS, 140));
const MAXIMUM_CSS = cssRgba(toRgba(ADDITION_DARK_CSS, 255));
const HALO_CSS = cssRgba([250, 250, 247, 235]);
const ISOHALINE_CSS = cssRgba([20, 110, 140, 255]);
const BRUSH_CSS = cssRgba([40, 40, 40, 110]);

function line(kind: MarkKind, path: LonLat[]): Feature<LineString, MarkProps> {
  return { type: "Feature", geometry: { type: "LineString", coordinates: path }, properties: { kind } };
}

function point(kind: MarkKind, lonLat: LonLat, major?: boolean): Feature<Point, MarkProps> {
  return {
    type: "Feature",
    geometry: { type: "Point", coordinates: [lonLat[0], lonLat[1]] },
    properties: major === undefined ? { kind } : { kind, major },
  };
}

/** The channel's lines as marks (the bench's bare map page draws its channel with these too). */
export function channelMarks(paths: readonly LonLat[][]): Feature<LineString, MarkProps>[] {
  return paths.filter((p) => p.length >= 2).map((p) => line("channel", p));
}

/** Every mark of the map data, lowest first. */
export function markFeatures(data: MapData): FeatureCollection<LineString | Point, MarkProps> {
  const features: Feature<LineString | Point, MarkProps>[] = [];
  const zone = data.zone;
  const zoneKind: MarkKind = zone?.zoneKind === "addition" ? "zone-addition" : "zone-removal";
  for (const p of zone?.zonePaths ?? []) if (p.length >= 2) features.push(line(zoneKind, p));
  for (const p of data.brushPaths ?? []) if (p.length >= 2) features.push(line("brush", p));
  features.push(...channelMarks((data.channel?.paths ?? []).map((p) => p.path)));
  for (const t of data.channel?.ticks ?? []) features.push(point("tick", t.lonLat, t.major));
  for (const iso of data.overlay?.isohalines ?? []) features.push(point("isohaline-marker", iso.lonLat));
  for (const p of zone?.maximumPoints ?? []) features.push(point("maximum-ring", p));
  return { type: "FeatureCollection", features };
}

const isKind = (kind: MarkKind) => ["==", ["get", "kind"], kind] as ["==", ["get", string], string];

/** A line layer of one mark kind, with constant colour and width [px]. */
function lineLayer(id: string, kind: MarkKind, colour: string, widthPx: number, round: boolean): LayerSpecification {
  return {
    id,
    type: "line",
    source: MARK_SOURCE,
    filter: isKind(kind),
    layout: round ? { "line-cap": "round", "line-join": "round" } : { "line-join": "round" },
    paint: { "line-color": colour, "line-width": widthPx },
  };
}

/** A circle layer of the km ticks, minor or major, with constant radius [px]. */
function tickLayer(id: string, major: boolean, radiusPx: number): LayerSpecification {
  return {
    id,
    type: "circle",
    source: MARK_SOURCE,
    filter: ["all", isKind("tick"), [major ? "==" : "!=", ["get", "major"], true]],
    paint: { "circle-radius": radiusPx, "circle-color": CHANNEL_CSS },
  };
}

/** The mark layers, lowest first (append after the basemap's layers, before the labels). */
export function markLayers(): LayerSpecification[] {
  return [
    lineLayer(MARK_LAYERS.zone, "zone-removal", REMOVAL_ZONE_CSS, 14, true),
    lineLayer(MARK_LAYERS.zoneAddition, "zone-addition", ADDITION_ZONE_CSS, 14, true),
    lineLayer(MARK_LAYERS.brush, "brush", BRUSH_CSS, 22, true),
    lineLayer(MARK_LAYERS.channel, "channel", CHANNEL_CSS, 2.5, false),
    tickLayer(MARK_LAYERS.ticks, false, 2),
    tickLayer(MARK_LAYERS.ticksMajor, true, 3.5),
    {
      id: MARK_LAYERS.isohalines,
      type: "circle",
      source: MARK_SOURCE,
      filter: isKind("isohaline-marker"),
      paint: {
        "circle-radius": 4,
        "circle-color": HALO_CSS,
        "circle-stroke-color": ISOHALINE_CSS,
        "circle-stroke-width": 2,
      },
    },
    {
      id: MARK_LAYERS.maximum,
      type: "circle",
      source: MARK_SOURCE,
      filter: isKind("maximum-ring"),
      paint: {
        "circle-radius": 12.5,
        "circle-opacity": 0,
        "circle-stroke-color": MAXIMUM_CSS,
        "circle-stroke-width": 3,
      },
    },
  ];
}
