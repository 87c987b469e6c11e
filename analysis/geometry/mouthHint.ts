/**
 * Which end of the main stem a centerline file itself says is the mouth.
 */
import type { CenterlineGeoJson, LineFeature } from "./geojsonInput.ts";
import type { MouthOption } from "./types.ts";

/**
 * The mouth as stated in the file: a Point feature with `properties.role === "mouth"` (its
 * position), else the main line's `properties.mouth` of "start" or "end". Undefined when the file
 * says nothing; the caller then assumes or suggests the mouth (see suggestMouth).
 *
 * @param input a centerline GeoJSON (RFC 7946)
 * @returns the mouth option, or undefined
 */
export function centerlineMouthHint(input: CenterlineGeoJson): MouthOption | undefined {
  if (input === null || typeof input !== "object") return undefined;
  const features: LineFeature[] =
    input.type === "FeatureCollection" ? input.features : input.type === "Feature" ? [input] : [];
  if (!Array.isArray(features)) return undefined;
  for (const f of features) {
    if (f?.geometry?.type === "Point" && f.properties?.["role"] === "mouth") {
      const [lon, lat] = f.geometry.coordinates as number[];
      if (Number.isFinite(lon) && Number.isFinite(lat)) return [Number(lon), Number(lat)];
    }
  }
  const lines = features.filter((f) => f?.geometry?.type === "LineString" || f?.geometry?.type === "MultiLineString");
  const main = lines.find((f) => f.properties?.["role"] === "main") ?? (lines.length === 1 ? lines[0] : undefined);
  const stated = main?.properties?.["mouth"];
  return stated === "start" || stated === "end" ? stated : undefined;
}
