/**
 * The world land layers of the offline map style (the hook `buildStyle` calls): sea colour beneath,
 * Natural Earth land polygons and their coastline, from one GeoJSON source whose data URL the
 * basemap loader fills in (basemapWorld.svelte.ts). Which resolution a view needs is decided here too.
 */
import type { LayerSpecification, SourceSpecification } from "maplibre-gl";

/** Natural Earth land scales shipped by `world-atlas`: 1:50 million (coarse) and 1:10 million (fine). */
export type LandResolution = "50m" | "10m";

/** From this zoom on the 1:10m land is fetched (about 1:15 million on screen and larger scales). */
export const FINE_MIN_ZOOM = 5;

/** The loaded land: a URL of its GeoJSON (a blob URL made by the loader) and its resolution. */
export interface WorldLandSource {
  url: string;
  resolution: LandResolution;
}

export const WORLD_LAND_SOURCE = "world-land";
/** Layer ids, lowest first. */
export const WORLD_LAND_LAYERS = ["world-sea", "world-land", "world-coast"] as const;

/** The attribution shown on the map (Natural Earth data are in the public domain). */
export function worldLandAttribution(resolution: LandResolution): string {
  return `Land: Natural Earth 1:${resolution === "10m" ? "10" : "50"} million (public domain)`;
}

/**
 * The land resolution to fetch for a view at `zoom`, or undefined when nothing more is needed: the
 * 1:10m land from FINE_MIN_ZOOM on (it then serves every zoom), else the 1:50m land once.
 *
 * @param zoom MapLibre zoom level
 * @param requested resolutions already fetched or being fetched
 * @throws RangeError when `zoom` is not a finite number
 */
export function resolutionForZoom(zoom: number, requested: ReadonlySet<LandResolution>): LandResolution | undefined {
  if (!Number.isFinite(zoom)) throw new RangeError(`zoom: expected a finite number, got ${zoom}`);
  if (requested.has("10m")) return undefined;
  if (zoom >= FINE_MIN_ZOOM) return "10m";
  return requested.has("50m") ? undefined : "50m";
}

/** Colours the world land takes from the style's palette. */
export interface LandPalette {
  land: string;
  water: string;
  shore: string;
}

/** Sources and layers to put right above the style's background (beneath user tiles and our own basemap). */
export function worldLandStyle(
  source: WorldLandSource,
  palette: LandPalette,
): { sources: Record<string, SourceSpecification>; layers: LayerSpecification[] } {
  return {
    sources: {
      [WORLD_LAND_SOURCE]: {
        type: "geojson",
        data: source.url,
        // Natural Earth 1:10m vertices lie ≥ 0.0017° (≈ 200 m) apart: tiles past zoom 12 add nothing, MapLibre overzooms.
        maxzoom: 12,
        attribution: worldLandAttribution(source.resolution),
      },
    },
    layers: [
      { id: WORLD_LAND_LAYERS[0], type: "background", paint: { "background-color": palette.water } },
      {
        id: WORLD_LAND_LAYERS[1],
        type: "fill",
        source: WORLD_LAND_SOURCE,
        paint: { "fill-color": palette.land, "fill-antialias": true },
      },
      {
        id: WORLD_LAND_LAYERS[2],
        type: "line",
        source: WORLD_LAND_SOURCE,
        paint: { "line-color": palette.shore, "line-width": ["interpolate", ["linear"], ["zoom"], 3, 0.4, 10, 1.1] },
      },
    ],
  };
}
