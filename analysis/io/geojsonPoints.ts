import { requireOptions } from "./argChecks.ts";
import type { ImportResult, ReadSurveyOptions } from "./importPipeline.ts";
import { makeIssue } from "./importSummary.ts";
import { RecordRouter } from "./recordRouter.ts";

type Json = string | number | boolean | null | Json[] | { [key: string]: Json };

function cellText(v: Json | undefined): string {
  if (v === undefined || v === null) return "";
  if (typeof v === "string") return v;
  if (typeof v === "number" || typeof v === "boolean") return String(v);
  return JSON.stringify(v);
}

function isObject(v: unknown): v is Record<string, Json> {
  return typeof v === "object" && v !== null && !Array.isArray(v);
}

/**
 * Reads GeoJSON point features (RFC 7946) as survey rows: each feature's properties become columns
 * and its Point geometry becomes "longitude"/"latitude" columns (WGS84 decimal degrees, [lon, lat]
 * order as RFC 7946 §3.1.1 prescribes). Then the rows go through the same mapping, value, QC and
 * grouping rules as delimited text. Row numbers count features from 2 (feature 1 is row 2, as if
 * the property names were a header row 1). A feature without a Point geometry is kept without a
 * position and reported; invalid JSON or a non-FeatureCollection is a file-level error, never a throw.
 *
 * @param input GeoJSON text or an already parsed object
 * @param options as for readSurveyText
 * @returns surveys, issues, summary, mapping and headers
 * @throws TypeError when options.fileName is missing
 */
export function readGeoJsonPoints(input: string | object, options: ReadSurveyOptions): ImportResult {
  requireOptions("readGeoJsonPoints", options);
  const file = options.fileName;
  let doc: unknown = input;
  const early: ReturnType<typeof makeIssue>[] = [];
  if (typeof input === "string") {
    try {
      doc = JSON.parse(input.replace(/^\uFEFF/, "")) as unknown;
    } catch (err) {
      doc = undefined;
      early.push(
        makeIssue(
          file,
          0,
          "",
          input.slice(0, 80),
          `valid JSON (${err instanceof Error ? err.message : "parse error"})`,
        ),
      );
    }
  }
  let features: unknown[] = [];
  if (isObject(doc) && doc.type === "FeatureCollection" && Array.isArray(doc.features)) features = doc.features;
  else if (isObject(doc) && doc.type === "Feature") features = [doc];
  else if (doc !== undefined)
    early.push(
      makeIssue(
        file,
        0,
        "",
        cellText(isObject(doc) ? (doc.type ?? "") : ""),
        "a GeoJSON FeatureCollection of Point features",
      ),
    );
  const propNames: string[] = [];
  const seen = new Set<string>();
  for (const f of features) {
    if (!isObject(f) || !isObject(f.properties)) continue;
    for (const k of Object.keys(f.properties)) {
      if (seen.has(k)) continue;
      seen.add(k);
      propNames.push(k);
    }
  }
  const lonName = seen.has("longitude") ? "geometry longitude" : "longitude";
  const latName = seen.has("latitude") ? "geometry latitude" : "latitude";
  const headers = [...propNames, lonName, latName];
  const router = new RecordRouter({ delimiter: ",", decimalComma: false }, options);
  router.push({ fields: headers, row: 1, parseErrors: [] });
  features.forEach((f, i) => {
    const row = i + 2;
    const props = isObject(f) && isObject(f.properties) ? f.properties : {};
    const geom = isObject(f) ? f.geometry : undefined;
    let lon = "";
    let lat = "";
    if (isObject(geom) && geom.type === "Point" && Array.isArray(geom.coordinates) && geom.coordinates.length >= 2) {
      lon = cellText(geom.coordinates[0]);
      lat = cellText(geom.coordinates[1]);
    } else
      early.push(
        makeIssue(
          file,
          row,
          "geometry",
          cellText(isObject(geom) ? (geom.type ?? "") : ""),
          "a Point geometry with [lon, lat]",
          "warning",
        ),
      );
    router.push({ fields: [...propNames.map((k) => cellText(props[k])), lon, lat], row, parseErrors: [] });
  });
  const result = router.finish(0);
  if (features.length === 0 && early.length === 0)
    early.push(makeIssue(file, 0, "", "", "at least one feature", "warning"));
  result.issues.unshift(...early);
  return result;
}
