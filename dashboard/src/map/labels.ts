/**
 * Map labels as MapLibre symbol layers, so MapLibre's collision index places them: a label that
 * would overlap a higher-priority label or a drawn marker is moved to another anchor beside its
 * point or left out. Priorities follow the layer order (MapLibre places the topmost symbol layer
 * first): station markers and selected station names > maximum > km ticks > isohalines > place
 * names. Km and isohaline labels sit beside the channel (km on the right looking upstream,
 * isohalines on the left), trying the other side only when their own side is taken.
 */
import type { Feature, FeatureCollection, Point } from "geojson";
import type {
  ExpressionSpecification,
  LayerSpecification,
  SymbolLayerSpecification,
  VariableAnchorOffsetCollectionSpecification,
} from "maplibre-gl";
import type { MapData, MapStation } from "./mapData.ts";
import type { LonLat } from "../worker/overlay.ts";
import { ADDITION_DARK_CSS } from "./colour.ts";

/** GeoJSON source of every overlay label and marker reservation. */
export const LABEL_SOURCE = "overlay-labels";
/** Transparent image whose boxes reserve the space of the station markers (circle layers take no part in label placement). */
export const RESERVE_IMAGE = "brackline-reserve";
export const RESERVE_IMAGE_PX = 16;

export type LabelKind = "station" | "reserve" | "maximum" | "km" | "isohaline";

/** Symbol layer ids, lowest priority first (the style order); place names are the basemap's. */
export const LABEL_LAYERS = {
  isohaline: "label-isohalines",
  km: "label-km",
  maximum: "label-maximum",
  station: "label-stations",
  reserve: "label-reserve",
} as const;

interface LabelProps {
  kind: LabelKind;
  text: string;
  /** Compass sector (0 = N … 7 = NW) the label should sit in, seen from its point. */
  sector: number;
  /** Marker diameter [px] reserved around the point (reserve features). */
  sizePx: number;
  /** Within a layer: lower is placed first. */
  sortKey: number;
}

/** Compass sector 0…7 (N, NE, E, SE, S, SW, W, NW) of a bearing [deg clockwise from north]. */
export function sectorOf(bearingDeg: number): number {
  return ((Math.round((((bearingDeg % 360) + 360) % 360) / 45) % 8) + 8) % 8;
}

type Anchor = "top" | "bottom" | "left" | "right" | "top-left" | "top-right" | "bottom-left" | "bottom-right";
/** Anchor of the text that puts it in a sector of its point (e.g. sector E → the text's left edge at the point). */
const SECTOR_ANCHOR: Anchor[] = [
  "bottom",
  "bottom-left",
  "left",
  "top-left",
  "top",
  "top-right",
  "right",
  "bottom-right",
];
/** Unit direction (x right, y down, in ems) of each sector. */
const SECTOR_DIR: Array<[number, number]> = [
  [0, -1],
  [0.71, -0.71],
  [1, 0],
  [0.71, 0.71],
  [0, 1],
  [-0.71, 0.71],
  [-1, 0],
  [-0.71, -0.71],
];

/** How much farther than `gapEm` the last two anchors put a label, clear of a row of markers on the channel. */
export const FAR_GAP_FACTOR = 4;

/**
 * Anchors tried for a label wanting `sector`, best first: the sector and its two neighbours at
 * `gapEm` from the point, the opposite side and its neighbours, then straight out on its own side
 * and on the opposite side `FAR_GAP_FACTOR` times as far (near a crowded mouth the stations fill
 * the channel, and a label beside its point would overlap them; out on the perpendicular it keeps
 * its place in line with its point). Each anchor appears once (MapLibre tries each anchor once), so
 * the far positions use the two anchors left over (those of the sectors at ±90°).
 */
export function anchorsFor(sector: number, gapEm: number): VariableAnchorOffsetCollectionSpecification {
  /** [sector step from the preferred one, distance in gaps, anchor step from the sector]. */
  const order: Array<[number, number, number]> = [
    [0, 1, 0],
    [1, 1, 0],
    [-1, 1, 0],
    [4, 1, 0],
    [3, 1, 0],
    [5, 1, 0],
    [0, FAR_GAP_FACTOR, 2],
    [4, FAR_GAP_FACTOR, 2],
  ];
  const out: Array<Anchor | [number, number]> = [];
  for (const [d, far, anchorStep] of order) {
    const s = (((sector + d) % 8) + 8) % 8;
    const [dx, dy] = SECTOR_DIR[s]!;
    const anchor = SECTOR_ANCHOR[(s + anchorStep) % 8]!;
    out.push(anchor, [Number((dx * gapEm * far).toFixed(2)), Number((dy * gapEm * far).toFixed(2))]);
  }
  return out as unknown as VariableAnchorOffsetCollectionSpecification;
}

/** `text-variable-anchor-offset` choosing the anchor list by the feature's sector. */
function anchorExpression(gapEm: number): ExpressionSpecification {
  const cases: unknown[] = [];
  for (let s = 0; s < 8; s++) cases.push(s, ["literal", anchorsFor(s, gapEm)]);
  return [
    "match",
    ["get", "sector"],
    ...cases,
    ["literal", anchorsFor(0, gapEm)],
  ] as unknown as ExpressionSpecification;
}

function point(lonLat: LonLat, props: LabelProps): Feature<Point, LabelProps> {
  return { type: "Feature", geometry: { type: "Point", coordinates: [lonLat[0], lonLat[1]] }, properties: props };
}

/** Outer radius [px] of a station marker, to the middle of its ring (stations.ts draws it; labels keep clear of it). */
export function stationRadiusPx(s: MapStation, selected: ReadonlySet<string>, hovered: string | null): number {
  return selected.has(s.id) ? 9 : s.id === hovered ? 8 : 6;
}

/**
 * Every overlay label and marker reservation of the map data, as one GeoJSON source.
 *
 * @param data what the map shows
 * @param stations the stations drawn (after thinning)
 * @param selected ids of the selected stations (their names are labelled)
 */
export function labelFeatures(
  data: MapData,
  stations: readonly MapStation[],
  selected: ReadonlySet<string>,
): FeatureCollection<Point, LabelProps> {
  const features: Feature<Point, LabelProps>[] = [];
  const base = { text: "", sector: 0, sizePx: 0, sortKey: 0 };
  for (const s of stations) {
    const r = stationRadiusPx(s, selected, null);
    features.push(
      point(s.lonLat, { ...base, kind: "reserve", sizePx: 2 * r + 2, sortKey: selected.has(s.id) ? 0 : 1 }),
    );
    if (selected.has(s.id)) features.push(point(s.lonLat, { ...base, kind: "station", text: s.id }));
  }
  for (const t of data.channel?.ticks ?? []) {
    if (!t.major) continue;
    features.push(point(t.lonLat, { ...base, kind: "reserve", sizePx: 8, sortKey: 2 }));
    if (t.km > 0)
      features.push(
        point(t.lonLat, { ...base, kind: "km", text: t.label, sector: sectorOf(t.bearingDeg + 90), sortKey: t.km }),
      );
  }
  for (const iso of data.overlay?.isohalines ?? []) {
    features.push(point(iso.lonLat, { ...base, kind: "reserve", sizePx: 12, sortKey: 2 }));
    features.push(
      point(iso.lonLat, {
        ...base,
        kind: "isohaline",
        text: `S = ${iso.salinity}`,
        sector: sectorOf(iso.bearingDeg - 90),
        // Round salinities first (S = 10 before S = 12.5), then seaward first.
        sortKey: (Number.isInteger(iso.salinity / 5) ? 0 : 1000) + iso.km,
      }),
    );
  }
  for (const p of data.zone?.maximumPoints ?? []) {
    features.push(point(p, { ...base, kind: "maximum", text: "maximum", sector: 4 }));
  }
  return { type: "FeatureCollection", features };
}

const TEXT_FONT = ["sans-serif"];
const HALO = "#fafaf7";

function textLayer(
  id: string,
  kind: LabelKind,
  colour: string,
  gapEm: number,
  extra: Partial<SymbolLayerSpecification["layout"]> = {},
): SymbolLayerSpecification {
  return {
    id,
    type: "symbol",
    source: LABEL_SOURCE,
    filter: ["==", ["get", "kind"], kind],
    layout: {
      "text-field": ["get", "text"],
      "text-font": TEXT_FONT,
      "text-size": 12,
      "text-variable-anchor-offset": anchorExpression(gapEm),
      "text-justify": "auto",
      "text-padding": 3,
      "symbol-sort-key": ["get", "sortKey"],
      ...extra,
    },
    paint: { "text-color": colour, "text-halo-color": HALO, "text-halo-width": 2 },
  };
}

/** The symbol layers of the overlay labels, lowest priority first (append after the basemap layers). */
export function labelLayers(): LayerSpecification[] {
  return [
    textLayer(LABEL_LAYERS.isohaline, "isohaline", "#146e8c", 0.7),
    textLayer(LABEL_LAYERS.km, "km", "#212930", 0.75),
    textLayer(LABEL_LAYERS.maximum, "maximum", ADDITION_DARK_CSS, 1.4),
    textLayer(LABEL_LAYERS.station, "station", "#212930", 1.1, { "text-size": 13, "text-allow-overlap": false }),
    {
      id: LABEL_LAYERS.reserve,
      type: "symbol",
      source: LABEL_SOURCE,
      filter: ["==", ["get", "kind"], "reserve"],
      layout: {
        "icon-image": RESERVE_IMAGE,
        "icon-size": ["/", ["get", "sizePx"], RESERVE_IMAGE_PX],
        "icon-allow-overlap": true,
        "icon-ignore-placement": false,
        "icon-padding": 0,
        "symbol-sort-key": ["get", "sortKey"],
      },
      // The image is transparent: its boxes only take part in placement. At opacity 0 MapLibre places
      // them but draws nothing, so the map never builds the icon shader (costly in software WebGL).
      paint: { "icon-opacity": 0 },
    },
  ];
}

/** RGBA pixels of the transparent reservation image. */
export function reserveImage(): { width: number; height: number; data: Uint8Array } {
  return {
    width: RESERVE_IMAGE_PX,
    height: RESERVE_IMAGE_PX,
    data: new Uint8Array(RESERVE_IMAGE_PX * RESERVE_IMAGE_PX * 4),
  };
}
