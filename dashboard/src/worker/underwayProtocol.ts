/**
 * Worker messages of the underway import: a dropped or selected log is streamed from the File in
 * the worker (analysis/underway), projected and binned when a centerline is given, and aggregated
 * to at most `maxPoints` map points. Progress comes back as the share of the file read.
 */
import type { ImportIssue, UnderwayBins, UnderwaySummary } from "../../../analysis/index.ts";

/** Aggregated points for the map (typed arrays, transferred): mean position and salinity per grid cell. */
export interface UnderwayPoints {
  lonDeg: Float64Array;
  latDeg: Float64Array;
  /** Mean salinity per point (NaN where the cell has none). */
  salinity: Float64Array;
  /** Records behind each point. */
  count: Uint32Array;
  /** Grid cell size [Web Mercator m]. */
  cellM: number;
}

export interface UnderwayRequest {
  type: "underway";
  id: number;
  /** The log (File or Blob), or its text. */
  file: Blob | string;
  name: string;
  /** Most points the map draws (software WebGL budget). */
  maxPoints: number;
  /** Channel centerline GeoJSON (mouth at the first vertex of the main stem) for km binning. */
  centerline?: unknown;
  bin: { by: "km" | "salinity"; width: number };
}

export type UnderwayResponse =
  | { type: "underwayProgress"; id: number; fraction: number; stage: string }
  | {
      type: "underwayLoaded";
      id: number;
      name: string;
      summary: UnderwaySummary;
      issues: ImportIssue[];
      points: UnderwayPoints;
      bins: UnderwayBins;
      /** [west, south, east, north] of the accepted records [deg]. */
      bounds: [number, number, number, number] | undefined;
    };

/** True for the underway request (dispatched before the analysis requests). */
export function isUnderwayRequest(r: { type: string }): r is UnderwayRequest {
  return r.type === "underway";
}
