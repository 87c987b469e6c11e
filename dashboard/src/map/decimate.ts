/**
 * Thins dense station sets to what a software-rendered map can draw: one
 * station per grid cell, always keeping the selected and hovered stations.
 * Display only; analysis always uses every station.
 */
import type { MapStation } from "./mapData.ts";

/** Largest number of stations drawn before thinning (software WebGL budget). */
export const MAX_DRAWN_STATIONS = 5000;

export function decimateStations(
  stations: MapStation[],
  keep: ReadonlySet<string>,
  maxPoints = MAX_DRAWN_STATIONS,
): MapStation[] {
  if (stations.length <= maxPoints) return stations;
  let w = Infinity;
  let s = Infinity;
  let e = -Infinity;
  let n = -Infinity;
  for (const { lonLat } of stations) {
    w = Math.min(w, lonLat[0]);
    e = Math.max(e, lonLat[0]);
    s = Math.min(s, lonLat[1]);
    n = Math.max(n, lonLat[1]);
  }
  const cells = Math.max(1, Math.floor(Math.sqrt(maxPoints)));
  const dx = (e - w) / cells || 1;
  const dy = (n - s) / cells || 1;
  const taken = new Set<number>();
  const out: MapStation[] = [];
  for (const st of stations) {
    const cx = Math.min(cells - 1, Math.floor((st.lonLat[0] - w) / dx));
    const cy = Math.min(cells - 1, Math.floor((st.lonLat[1] - s) / dy));
    const cell = cy * cells + cx;
    if (keep.has(st.id) || !taken.has(cell)) {
      taken.add(cell);
      out.push(st);
    }
  }
  return out;
}
