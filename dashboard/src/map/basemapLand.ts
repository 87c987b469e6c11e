/**
 * World land polygons for the offline basemap, decoded from the Natural Earth land topology that the
 * `world-atlas` npm package ships (TopoJSON, quantized, longitude/latitude in degrees). Pure: runs in
 * the basemap worker and in tests.
 *
 * The land object is one MultiPolygon of every land mass; it is split into one Polygon feature per
 * land mass so MapLibre's tiler can skip those outside a tile by their extent, and each coordinate is
 * rounded to `decimals` places (4 ≈ 11 m, well under the data's quantization step of about 0.002°,
 * ≈ 200–400 m) to halve the GeoJSON text MapLibre parses.
 */
import type { Feature, FeatureCollection, Polygon, Position } from "geojson";
import { feature } from "topojson-client";

/** A TopoJSON Topology, as topojson-client types it. */
type Topology = Parameters<typeof feature>[0];

/** Feature properties of a land polygon (`kind` is what the style filters on). */
export interface LandProperties {
  kind: "land";
}

/** What was decoded, for the basemap's status line and the tests. */
export interface LandCollection extends FeatureCollection<Polygon, LandProperties> {
  /** Number of vertices over every ring. */
  vertexCount: number;
}

/** Rounds a coordinate to `decimals` places, keeping [lon, lat] order. */
export function roundPosition(position: Position, decimals: number): Position {
  const f = 10 ** decimals;
  return [Math.round(position[0]! * f) / f, Math.round(position[1]! * f) / f];
}

/** Rounds every vertex of a ring and drops vertices that rounding made equal to the one before. */
export function roundRing(ring: Position[], decimals: number): Position[] {
  const out: Position[] = [];
  for (const p of ring) {
    const q = roundPosition(p, decimals);
    const last = out[out.length - 1];
    if (last && last[0] === q[0] && last[1] === q[1]) continue;
    out.push(q);
  }
  return out;
}

function isTopology(value: unknown): value is Topology {
  const v = value as Partial<Topology> | null;
  return typeof v === "object" && v !== null && v.type === "Topology" && Array.isArray(v.arcs);
}

/**
 * Decodes the land polygons of a Natural Earth land topology.
 *
 * @param topology the parsed TopoJSON (`world-atlas/land-50m.json`, `land-10m.json`, …)
 * @param objectName the geometry collection holding the land (`land` in world-atlas)
 * @param decimals decimal places kept per coordinate [degrees], 0–10
 * @returns one Polygon feature per land mass; rings that rounding shrank below a triangle are dropped
 * @throws TypeError when `topology` is not a TopoJSON Topology or has no object `objectName`
 * @throws RangeError when `decimals` is not an integer in 0–10
 */
export function landFeatures(topology: unknown, objectName = "land", decimals = 4): LandCollection {
  if (!isTopology(topology)) throw new TypeError(`topology: expected a TopoJSON Topology, got ${typeof topology}`);
  const object = topology.objects[objectName];
  if (!object) {
    const names = Object.keys(topology.objects).join(", ");
    throw new TypeError(`objectName: the topology has no object "${objectName}" (it has: ${names || "none"})`);
  }
  if (!Number.isInteger(decimals) || decimals < 0 || decimals > 10) {
    throw new RangeError(`decimals: expected an integer from 0 to 10, got ${decimals}`);
  }
  const decoded = feature(topology, object);
  const sources = decoded.type === "FeatureCollection" ? decoded.features : [decoded];
  const features: Feature<Polygon, LandProperties>[] = [];
  let vertexCount = 0;
  const add = (rings: Position[][]) => {
    const kept: Position[][] = [];
    for (const [i, ring] of rings.entries()) {
      const r = roundRing(ring, decimals);
      // A closed ring needs 4 positions (a triangle and its closing vertex); a lost outer ring drops the polygon.
      if (r.length < 4) {
        if (i === 0) return;
        continue;
      }
      kept.push(r);
      vertexCount += r.length;
    }
    features.push({ type: "Feature", properties: { kind: "land" }, geometry: { type: "Polygon", coordinates: kept } });
  };
  for (const f of sources) {
    const g = f.geometry;
    if (g?.type === "Polygon") add(g.coordinates);
    else if (g?.type === "MultiPolygon") for (const p of g.coordinates) add(p);
  }
  return { type: "FeatureCollection", features, vertexCount };
}
