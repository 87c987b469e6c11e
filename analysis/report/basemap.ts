/**
 * Reading an offline basemap GeoJSON (RFC 7946) for the briefing map: polygons with a `kind`
 * (land, water, marsh, ...) and named points. Anything else is skipped, never thrown.
 */

/** One basemap polygon (outer ring first, holes after) or named point, [lon, lat]. */
export interface BasemapShape {
  kind: string;
  name?: string;
  polygons?: number[][][][];
  point?: [number, number];
}

const isPos = (p: unknown): p is number[] =>
  Array.isArray(p) && p.length >= 2 && Number.isFinite(p[0]) && Number.isFinite(p[1]);
const isRing = (r: unknown): r is number[][] => Array.isArray(r) && r.length >= 3 && r.every(isPos);

/**
 * Shapes of a basemap FeatureCollection: Polygon/MultiPolygon features (properties.kind, default
 * "land") and Point features with a name (properties.name). Malformed features are skipped.
 *
 * @param geojson parsed GeoJSON (any value)
 * @returns the shapes in input order
 */
export function readBasemap(geojson: unknown): BasemapShape[] {
  const fc = geojson as { type?: unknown; features?: unknown };
  if (!fc || fc.type !== "FeatureCollection" || !Array.isArray(fc.features)) return [];
  const out: BasemapShape[] = [];
  for (const f of fc.features as Array<{
    geometry?: { type?: unknown; coordinates?: unknown };
    properties?: Record<string, unknown> | null;
  }>) {
    const g = f?.geometry;
    const props = f?.properties ?? {};
    const kind = typeof props.kind === "string" ? props.kind : "land";
    const name = typeof props.name === "string" ? props.name : undefined;
    if (!g) continue;
    if (g.type === "Polygon" && Array.isArray(g.coordinates) && g.coordinates.every(isRing))
      out.push({ kind, ...(name ? { name } : {}), polygons: [g.coordinates as number[][][]] });
    else if (
      g.type === "MultiPolygon" &&
      Array.isArray(g.coordinates) &&
      g.coordinates.every((p) => Array.isArray(p) && p.every(isRing))
    )
      out.push({ kind, ...(name ? { name } : {}), polygons: g.coordinates as number[][][][] });
    else if (g.type === "Point" && isPos(g.coordinates) && name)
      out.push({ kind, name, point: [g.coordinates[0]!, g.coordinates[1]!] });
  }
  return out;
}

/** Fill colours of basemap kinds (own choice). */
export const BASEMAP_FILL: Readonly<Record<string, string>> = {
  land: "#ece8dc",
  water: "#d6e8f2",
  marsh: "#dbe8cf",
  urban: "#e2dcd6",
};
