/**
 * First look at a dropped file (runs in the analysis worker): recognises the
 * kind from the content — netCDF by its magic bytes, GeoJSON with line
 * features as a centerline and with point features as a survey, delimited text
 * as a survey or, without any measured column, as a station table — and for
 * delimited text reads the header and the first rows and suggests a mapping.
 */
import Papa from "papaparse";
import { detectDialect, stripBom, suggestMapping } from "../../../analysis/index.ts";
import type { FileInspection, FileKind, ImportSource } from "./importTypes.ts";

/** Bytes read for the preview of a delimited file. */
const HEAD_BYTES = 65536;
/** Data rows shown in the mapping dialog and used for the suggestion. */
export const PREVIEW_ROWS = 8;

/** True when the first bytes are a netCDF classic ("CDF\x01/\x02") or netCDF-4/HDF5 signature. */
export function isNetcdfMagic(bytes: Uint8Array): boolean {
  const cdf = bytes[0] === 0x43 && bytes[1] === 0x44 && bytes[2] === 0x46;
  const hdf = bytes[0] === 0x89 && bytes[1] === 0x48 && bytes[2] === 0x44 && bytes[3] === 0x46;
  return cdf || hdf;
}

type Geometry = { type?: string; geometries?: Geometry[] } | null | undefined;

function geometryTypes(doc: unknown): string[] {
  const d = doc as { type?: string; features?: Array<{ geometry?: Geometry }>; geometry?: Geometry };
  const geoms: Geometry[] =
    d.type === "FeatureCollection" && Array.isArray(d.features)
      ? d.features.map((f) => f.geometry)
      : d.type === "Feature"
        ? [d.geometry]
        : [d as Geometry];
  return geoms
    .flatMap((g) => (g?.type === "GeometryCollection" ? (g.geometries ?? []) : [g]))
    .map((g) => g?.type ?? "");
}

/** Kind of a GeoJSON document: any LineString/MultiLineString makes it a centerline. */
export function geoJsonKind(doc: unknown): FileKind {
  const types = geometryTypes(doc);
  if (types.some((t) => t === "LineString" || t === "MultiLineString")) return "centerline";
  if (types.some((t) => t === "Point" || t === "MultiPoint")) return "surveyGeoJson";
  return "unknown";
}

/** Parses the header and first rows of delimited text and suggests how to read them. */
export function inspectDelimited(head: string, fileName: string, sizeBytes: number): FileInspection {
  const text = stripBom(head);
  const dialect = detectDialect(text);
  const parsed = Papa.parse<string[]>(text, {
    delimiter: dialect.delimiter,
    preview: PREVIEW_ROWS + 1,
    skipEmptyLines: "greedy",
  });
  const [headerRow = [], ...rows] = parsed.data;
  const headers = headerRow.map((h) => h.trim());
  const suggested = suggestMapping(headers, rows);
  suggested.delimiter = dialect.delimiter;
  suggested.decimalComma = dialect.decimalComma;
  const roles = new Set(suggested.columns.map((c) => c.role));
  const measured = ["salinity", "conductivity", "constituent", "temperature", "pH"].some((r) => roles.has(r as never));
  const placed = roles.has("station") && ((roles.has("latitude") && roles.has("longitude")) || roles.has("x"));
  const kind: FileKind = !measured && placed ? "stationTable" : "surveyText";
  return { fileName, sizeBytes, kind, headers, previewRows: rows, suggested, dialect };
}

/**
 * Recognises a file and, for delimited text, previews it.
 *
 * @param file the dropped file
 * @returns the inspection; never throws on bad content (kind "unknown" with a message)
 */
export async function inspectFile(file: ImportSource): Promise<FileInspection> {
  const base = { fileName: file.name, sizeBytes: file.size, headers: [], previewRows: [] };
  const first = new Uint8Array(await file.slice(0, 4).arrayBuffer());
  if (isNetcdfMagic(first)) return { ...base, kind: "surveyNetcdf" };
  const head = await file.slice(0, HEAD_BYTES).text();
  const start = stripBom(head).trimStart();
  if (start.startsWith("{")) {
    try {
      const kind = geoJsonKind(JSON.parse(stripBom(await file.text())) as unknown);
      return kind === "unknown"
        ? { ...base, kind, message: "GeoJSON without point or line features" }
        : { ...base, kind };
    } catch (error) {
      return { ...base, kind: "unknown", message: `not valid JSON (${String(error)})` };
    }
  }
  if (start.length === 0) return { ...base, kind: "unknown", message: "the file is empty" };
  return inspectDelimited(head, file.name, file.size);
}
