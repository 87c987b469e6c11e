/**
 * What a file holds, recognised from its content (never from its name alone): CF-netCDF by its magic
 * bytes, GeoJSON with lines as a centerline and with points as a survey, delimited text as a survey or,
 * without any measured column, as a station table. The one file-kind dispatch of readInputs.
 */
import Papa from "papaparse";
import { detectDialect, stripBom } from "../io/dialect.ts";
import { suggestMapping } from "../io/suggestMapping.ts";

import { FILE_KIND_LABELS, type InputFileKind } from "./fileKindLabels.ts";

export { FILE_KIND_LABELS, type InputFileKind };

/** What readInputs expects a file to be, for messages about unrecognised content. */
export const EXPECTED_FILE =
  "delimited text with a header row (CSV, TSV, semicolon), GeoJSON points or lines, or a CF-netCDF file";

/** Bytes looked at to recognise delimited text. */
const HEAD_CHARS = 65536;

/** True when the first bytes are a netCDF classic ("CDF\x01/\x02") or netCDF-4/HDF5 signature. */
export function isNetcdfMagic(bytes: Uint8Array): boolean {
  const cdf = bytes[0] === 0x43 && bytes[1] === 0x44 && bytes[2] === 0x46;
  const hdf = bytes[0] === 0x89 && bytes[1] === 0x48 && bytes[2] === 0x44 && bytes[3] === 0x46;
  return cdf || hdf;
}

/** UTF-8 text of a file given as text or bytes, without a byte-order mark. */
export function decodeText(content: string | Uint8Array): string {
  return stripBom(typeof content === "string" ? content : new TextDecoder("utf-8").decode(content));
}

type Geometry = { type?: string; geometries?: Geometry[] } | null | undefined;

/** Kind of a parsed GeoJSON document: any LineString/MultiLineString makes it a centerline. */
export function geoJsonKind(doc: unknown): InputFileKind {
  if (doc === null || typeof doc !== "object") return "unknown";
  const d = doc as { type?: string; features?: Array<{ geometry?: Geometry } | null>; geometry?: Geometry };
  const geoms: Geometry[] =
    d.type === "FeatureCollection" && Array.isArray(d.features)
      ? d.features.map((f) => f?.geometry)
      : d.type === "Feature"
        ? [d.geometry]
        : [d as Geometry];
  const types = geoms
    .flatMap((g) => (g?.type === "GeometryCollection" ? (g.geometries ?? []) : [g]))
    .map((g) => g?.type ?? "");
  if (types.some((t) => t === "LineString" || t === "MultiLineString")) return "centerline";
  if (types.some((t) => t === "Point" || t === "MultiPoint")) return "surveyGeoJson";
  return "unknown";
}

/** Kind of delimited text from its header and first rows: a station table has places but nothing measured. */
export function delimitedKind(text: string): InputFileKind {
  const head = stripBom(text.slice(0, HEAD_CHARS));
  const dialect = detectDialect(head);
  const parsed = Papa.parse<string[]>(head, { delimiter: dialect.delimiter, preview: 9, skipEmptyLines: "greedy" });
  const [headerRow = [], ...rows] = parsed.data;
  if (headerRow.length < 2) return "unknown";
  const roles = new Set<string>(
    suggestMapping(
      headerRow.map((h) => h.trim()),
      rows,
    ).columns.map((c) => c.role),
  );
  const measured = ["salinity", "conductivity", "constituent", "temperature", "pH"].some((r) => roles.has(r));
  const placed = roles.has("station") && ((roles.has("latitude") && roles.has("longitude")) || roles.has("x"));
  return !measured && placed ? "stationTable" : "surveyText";
}

/** A NUL, or more than 5 % control characters or undecodable bytes: not text (a Latin-1 "°" alone is still text). */
function looksBinary(sample: string): boolean {
  // eslint-disable-next-line no-control-regex
  const odd = sample.match(/[\u0000-\u0008\u000e-\u001a\ufffd]/g)?.length ?? 0;
  return sample.includes("\u0000") || odd > 0.05 * sample.length;
}

/**
 * Recognises a file from its content.
 *
 * @param content the file as bytes or text
 * @returns the kind, with a reason when it is "unknown"
 */
export function detectFileKind(content: string | Uint8Array): { kind: InputFileKind; reason?: string } {
  if (typeof content !== "string" && isNetcdfMagic(content)) return { kind: "surveyNetcdf" };
  // The first HEAD_CHARS characters (a UTF-8 character has at most 4 bytes), the same sample the
  // survey reader detects the dialect on, so that detection is done once per file (detectDialect).
  const head = decodeText(
    typeof content === "string" ? content.slice(0, HEAD_CHARS + 1) : content.subarray(0, 4 * HEAD_CHARS),
  ).slice(0, HEAD_CHARS);
  const start = head.trimStart();
  if (start.length === 0) return { kind: "unknown", reason: "the file is empty" };
  if (looksBinary(head.slice(0, 4096))) return { kind: "unknown", reason: "binary content that is not netCDF" };
  if (start.startsWith("{") || start.startsWith("[")) {
    try {
      const kind = geoJsonKind(JSON.parse(decodeText(content)) as unknown);
      return kind === "unknown" ? { kind, reason: "JSON without GeoJSON point or line features" } : { kind };
    } catch (error) {
      return { kind: "unknown", reason: `not valid JSON (${(error as Error).message})` };
    }
  }
  const kind = delimitedKind(head);
  return kind === "unknown" ? { kind, reason: "text without a delimited header row" } : { kind };
}
