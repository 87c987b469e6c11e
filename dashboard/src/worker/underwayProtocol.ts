/**
 * The underway import's request and result (WorkerApi.underway): a dropped or selected log is
 * streamed from the File in the worker (analysis/underway), projected and binned when a centerline
 * is given, and aggregated to at most `maxPoints` map points. Progress comes back as the share of
 * the file read.
 */
import type { ImportIssue, UnderwayBins, UnderwaySummary } from "../../../analysis/index.ts";
import type { TextFile } from "./protocol.ts";

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
  /** The log (File or Blob), or its text. */
  file: Blob | string;
  name: string;
  /** Most points the map draws (software WebGL budget). */
  maxPoints: number;
  /** The analysis' centerline file, read by the one centerline reader (worker/engine.ts readChannel). */
  centerline?: TextFile;
  bin: { by: "km" | "salinity"; width: number };
}

export interface UnderwayResult {
  name: string;
  summary: UnderwaySummary;
  issues: ImportIssue[];
  points: UnderwayPoints;
  bins: UnderwayBins;
  /** [west, south, east, north] of the accepted records [deg]. */
  bounds: [number, number, number, number] | undefined;
}

/** The map's view, for re-aggregating the last log read (WorkerApi.underwayView). */
export interface UnderwayView {
  /** [west, south, east, north] of the visible map [deg]. */
  bounds: [number, number, number, number];
  /** Smallest grid cell [Web Mercator m]: a few screen pixels at the view's zoom. */
  minCellM: number;
  /** Most points the map draws. */
  maxPoints: number;
}
