/**
 * Km ticks of a centerline being drawn on the map, computed in the worker from the drawn GeoJSON by
 * the one centerline reader (readCenterline: the drawn file marks its mouth with a Point), exactly
 * as for a loaded file.
 */
import { kmTicks } from "../../../analysis/index.ts";
import { readChannel } from "./engine.ts";
import type { LonLat } from "./overlay.ts";
import type { TextFile } from "./protocol.ts";

/** A km tick of the drawn line, as drawn on the map. */
export interface DrawnTick {
  km: number;
  lonLat: LonLat;
  label: string;
  major: boolean;
}

/** The drawn line's ticks and length [km]. */
export interface DrawnPreview {
  ticks: DrawnTick[];
  lengthKm: number;
}

/** Tick spacing [km] giving about ten ticks along a line of the given length. */
export function tickSpacingKm(lengthKm: number): number {
  const steps = [0.1, 0.2, 0.5, 1, 2, 5, 10, 20, 50];
  return steps.find((s) => lengthKm / s <= 12) ?? 100;
}

/** Km ticks of a drawn centerline file from its mouth (analysis/geometry kmTicks); every tick labelled. */
export function previewCenterline(file: TextFile): DrawnPreview {
  const network = readChannel(file).channel?.network;
  if (!network) return { ticks: [], lengthKm: 0 };
  const spacing = tickSpacingKm(network.totalLengthKm);
  const ticks = kmTicks(network, spacing).features.map((f) => ({
    km: f.properties.km,
    lonLat: f.geometry.coordinates,
    label: f.properties.label,
    major: true,
  }));
  return { ticks, lengthKm: network.totalLengthKm };
}
