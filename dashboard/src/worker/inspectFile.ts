/**
 * First look at a dropped file (runs in the worker): the kind is recognised by the workspace API's one
 * file-kind dispatch (`detectFileKind`, analysis/workspace: netCDF by its magic bytes, GeoJSON with
 * lines as a centerline and points as a survey, delimited text as a survey or, without any measured
 * column, as a station table); for delimited text this reads the header and the first rows and
 * suggests a mapping.
 */
import Papa from "papaparse";
import { decodeText, detectDialect, detectFileKind, stripBom, suggestMapping } from "../../../analysis/index.ts";
import type { FileInspection, FileKind, ImportSource } from "./importTypes.ts";

export { geoJsonKind, isNetcdfMagic } from "../../../analysis/index.ts";

/** Bytes read for the preview of a delimited file. */
const HEAD_BYTES = 65536;
/** Data rows shown in the mapping dialog and used for the suggestion. */
export const PREVIEW_ROWS = 8;

/** Parses the header and first rows of delimited text and suggests how to read them. */
export function inspectDelimited(
  head: string,
  fileName: string,
  sizeBytes: number,
  kind: FileKind = "surveyText",
): FileInspection {
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
  const headBytes = new Uint8Array(await file.slice(0, HEAD_BYTES).arrayBuffer());
  const head = decodeText(headBytes);
  const start = head.trimStart();
  // JSON is recognised from the whole document; everything else from its first bytes.
  const json = start.startsWith("{") || start.startsWith("[");
  const { kind, reason } = detectFileKind(json ? new Uint8Array(await file.arrayBuffer()) : headBytes);
  if (kind === "surveyText" || kind === "stationTable") return inspectDelimited(head, file.name, file.size, kind);
  return { ...base, kind, ...(reason ? { message: reason } : {}) };
}
