/**
 * Everything the map draws, as plain data. Built by the app state from the
 * survey, its analysis and the worker's overlay; the map computes nothing.
 */
import type { FeatureCollection } from "geojson";
import type { ChannelOverlay, ConstituentOverlay, LonLat, SurveyOverlay } from "../worker/overlay.ts";
import type { StationColouring } from "../state/settings.svelte.ts";

/** One station as the map shows it. */
export interface MapStation {
  id: string;
  lonLat: LonLat;
  /** Practical salinity (PSS-78), when measured and accepted. */
  salinity?: number;
  /** Selected constituent's value, in `MapData.unit`. */
  value?: number;
  /** Observed − dilution line, in `MapData.unit`. */
  deviation?: number;
  deviationPercent?: number;
  significant?: boolean;
  /** Nearest point on the channel; drawn as the projection line when selected. */
  nearestLonLat?: LonLat;
  alongChannelKm?: number;
  offsetM?: number;
  offChannel?: boolean;
}

export interface MapData {
  basemap: FeatureCollection | undefined;
  channel: ChannelOverlay | undefined;
  overlay: SurveyOverlay | undefined;
  /** Overlay of the selected constituent (reaction zone, maximum). */
  zone: ConstituentOverlay | undefined;
  /** Channel stretch of the salinity range brushed in a plot. */
  brushPaths?: LonLat[][];
  stations: MapStation[];
  constituent: string;
  unit: string;
  colouring: StationColouring;
}

/** [[west, south], [east, north]] of everything the map shows, or undefined. */
export function mapBounds(data: MapData): [LonLat, LonLat] | undefined {
  let w = Infinity;
  let s = Infinity;
  let e = -Infinity;
  let n = -Infinity;
  const add = ([lon, lat]: LonLat) => {
    if (lon < w) w = lon;
    if (lon > e) e = lon;
    if (lat < s) s = lat;
    if (lat > n) n = lat;
  };
  for (const p of data.channel?.paths ?? []) p.path.forEach(add);
  for (const st of data.stations) add(st.lonLat);
  if (!Number.isFinite(w)) return undefined;
  return [
    [w, s],
    [e, n],
  ];
}
