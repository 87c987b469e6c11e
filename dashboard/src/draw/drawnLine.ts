/**
 * A centerline drawn on the map: the GeoJSON it exports (RFC 7946, [lon, lat]).
 * Its km ticks come from the worker (worker/drawnPreview.ts), which reads the
 * drawn file with the one centerline reader.
 */
import type { LonLat } from "../worker/overlay.ts";

export type { DrawnTick } from "../worker/drawnPreview.ts";

/** Which vertex of the drawn line is the estuary mouth. */
export type MouthEnd = "start" | "end";

/** File name of the exported centerline. */
export const DRAWN_FILE_NAME = "drawn-centerline.geojson";

/** An RFC 7946 FeatureCollection of the drawn main stem and a Point marking its mouth. */
export interface DrawnCenterline {
  type: "FeatureCollection";
  features: Array<
    | {
        type: "Feature";
        geometry: { type: "LineString"; coordinates: LonLat[] };
        properties: { role: "main"; name: string; mouth: MouthEnd; source: string };
      }
    | {
        type: "Feature";
        geometry: { type: "Point"; coordinates: LonLat };
        properties: { role: "mouth"; name: string };
      }
  >;
}

/** Rounds to 7 decimals (≈ 1 cm), as RFC 7946 §11.2 suggests keeping precision modest. */
function round7(v: number): number {
  return Math.round(v * 1e7) / 1e7;
}

/** Drops consecutive vertices that coincide (a double-click adds the same point twice). */
export function dedupeVertices(vertices: readonly LonLat[], toleranceDeg = 1e-7): LonLat[] {
  const out: LonLat[] = [];
  for (const v of vertices) {
    const last = out[out.length - 1];
    if (last && Math.abs(last[0] - v[0]) <= toleranceDeg && Math.abs(last[1] - v[1]) <= toleranceDeg) continue;
    out.push([v[0], v[1]]);
  }
  return out;
}

/** The drawn line as an RFC 7946 FeatureCollection: the main stem LineString and a "mouth" Point. */
export function drawnCenterlineGeoJson(vertices: readonly LonLat[], mouth: MouthEnd): DrawnCenterline {
  const coords = dedupeVertices(vertices).map(([lon, lat]) => [round7(lon), round7(lat)] as LonLat);
  if (coords.length < 2)
    throw new RangeError(`drawnCenterlineGeoJson: needs at least 2 distinct vertices, got ${coords.length}`);
  const mouthPoint = mouth === "start" ? coords[0] : coords[coords.length - 1];
  return {
    type: "FeatureCollection",
    features: [
      {
        type: "Feature",
        geometry: { type: "LineString", coordinates: coords },
        properties: { role: "main", name: "Drawn channel", mouth, source: "drawn on the Brackline map" },
      },
      {
        type: "Feature",
        geometry: { type: "Point", coordinates: mouthPoint },
        properties: { role: "mouth", name: "Mouth" },
      },
    ],
  };
}
