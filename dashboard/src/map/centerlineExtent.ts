/**
 * Where the map's data will lie, as far as the main thread knows before the worker has read them:
 * the extent of the centerline file's lines. The map opens on it, so its first tiles, label layout
 * and frames are those of the estuary rather than of the whole world, which the framing on the
 * worker's channel and stations (mapData.ts `mapBounds`) would throw away. Only an extent of the
 * file's coordinates: the channel network is built by the worker's one centerline reader.
 */
import type { LonLat } from "../worker/overlay.ts";
import type { TextFile } from "../worker/protocol.ts";

/** Larger files are left to the worker (parsing them here would hold up the page's first frames). */
export const EXTENT_MAX_CHARS = 2_000_000;

/**
 * [[west, south], [east, north]] of the LineString and MultiLineString coordinates of a GeoJSON
 * centerline file, or undefined (no file, too large, not GeoJSON, no lines with finite [lon, lat]).
 */
export function centerlineExtent(file: TextFile | undefined): [LonLat, LonLat] | undefined {
  if (!file || file.text.length > EXTENT_MAX_CHARS) return undefined;
  let doc: unknown;
  try {
    doc = JSON.parse(file.text);
  } catch {
    return undefined;
  }
  let w = Infinity;
  let s = Infinity;
  let e = -Infinity;
  let n = -Infinity;
  const addLine = (coords: unknown) => {
    if (!Array.isArray(coords)) return;
    for (const p of coords) {
      if (!Array.isArray(p)) continue;
      const [lon, lat] = p as unknown[];
      if (typeof lon !== "number" || typeof lat !== "number" || !Number.isFinite(lon) || !Number.isFinite(lat))
        continue;
      if (Math.abs(lon) > 180 || Math.abs(lat) > 90) continue;
      w = Math.min(w, lon);
      e = Math.max(e, lon);
      s = Math.min(s, lat);
      n = Math.max(n, lat);
    }
  };
  const addGeometry = (g: unknown) => {
    const geom = g as { type?: unknown; coordinates?: unknown; geometries?: unknown } | null;
    if (!geom || typeof geom !== "object") return;
    if (geom.type === "LineString") addLine(geom.coordinates);
    else if (geom.type === "MultiLineString" && Array.isArray(geom.coordinates)) geom.coordinates.forEach(addLine);
    else if (geom.type === "GeometryCollection" && Array.isArray(geom.geometries)) geom.geometries.forEach(addGeometry);
  };
  const root = doc as { type?: unknown; features?: unknown; geometry?: unknown } | null;
  if (root?.type === "FeatureCollection" && Array.isArray(root.features))
    for (const f of root.features) addGeometry((f as { geometry?: unknown } | null)?.geometry);
  else if (root?.type === "Feature") addGeometry(root.geometry);
  else addGeometry(root);
  if (!Number.isFinite(w) || (w === e && s === n)) return undefined;
  return [
    [w, s],
    [e, n],
  ];
}
