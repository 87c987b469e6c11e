import { requireOptions, requireString } from "./argChecks.ts";
import type { ImportIssue } from "../survey/survey.ts";
import type { ColumnMapping } from "./columnMapping.ts";
import { compileMapping } from "./compileMapping.ts";
import type { CellContext } from "./cellReaders.ts";
import { readNumberCell } from "./cellReaders.ts";
import { detectDialect } from "./dialect.ts";
import { parseDelimitedText } from "./delimitedRecords.ts";
import type { ImportedStation } from "./importSummary.ts";
import { makeIssue } from "./importSummary.ts";
import { DEFAULT_FLAG_MAP } from "./qcFlags.ts";
import { readRowPlace } from "./rowPlace.ts";
import { normaliseStationId } from "./stationIds.ts";
import { suggestMapping } from "./suggestMapping.ts";

/** One row of a station table. */
export interface StationRecord {
  id: string;
  name?: string;
  lonLat?: [number, number];
  distanceKm?: number;
  sourceRow: number;
}

/** A station table read from a file. */
export interface StationTable {
  file: string;
  stations: StationRecord[];
  issues: ImportIssue[];
  headers: string[];
  mapping: ColumnMapping;
}

/**
 * Reads a station table (id, optional name, latitude/longitude or projected x/y, optional
 * along-channel distance) from delimited text. Bad rows become issues; duplicate ids are reported.
 *
 * @param text file content (UTF-8 text, BOM allowed)
 * @param options file name and optional confirmed mapping
 * @returns the table, never throws on bad data
 * @throws TypeError when text is not a string or options.fileName is missing
 */
export function readStationTable(text: string, options: { fileName: string; mapping?: ColumnMapping }): StationTable {
  requireString("readStationTable", "text", text);
  requireOptions("readStationTable", options);
  const file = options.fileName;
  const dialect = detectDialect(text.slice(0, 65536));
  const records: { fields: string[]; row: number }[] = [];
  parseDelimitedText(text, dialect, (r) => records.push(r));
  const headers = records.length > 0 ? records[0].fields.map((h) => h.trim()) : [];
  const mapping =
    options.mapping ??
    suggestMapping(
      headers,
      records.slice(1, 30).map((r) => r.fields),
    );
  const { compiled } = compileMapping(headers, mapping, file);
  const issues: ImportIssue[] = [];
  const nameIdx = headers.findIndex((h) => /^(name|station name|site name|location)$/i.test(h));
  const stations: StationRecord[] = [];
  const seen = new Map<string, number>();
  const decimalComma = mapping.decimalComma ?? dialect.decimalComma;
  for (const rec of records.slice(1)) {
    const ctx: CellContext = { file, row: rec.row, decimalComma, flagMap: DEFAULT_FLAG_MAP, issues };
    const idIdx = compiled.single.station;
    const id = (idIdx === undefined ? "" : (rec.fields[idIdx] ?? "")).trim();
    if (id === "") {
      issues.push(makeIssue(file, rec.row, idIdx === undefined ? "" : headers[idIdx], "", "a station id"));
      continue;
    }
    const place = readRowPlace(ctx, compiled, mapping, rec.fields);
    const st: StationRecord = { id, sourceRow: rec.row };
    if (place.lonLat !== undefined) st.lonLat = place.lonLat;
    if (nameIdx >= 0 && (rec.fields[nameIdx] ?? "").trim() !== "") st.name = (rec.fields[nameIdx] ?? "").trim();
    if (compiled.single.distance !== undefined) {
      const d = readNumberCell(ctx, headers[compiled.single.distance], rec.fields[compiled.single.distance] ?? "");
      if (d !== undefined) st.distanceKm = d;
    }
    const key = normaliseStationId(id).id;
    const prev = seen.get(key);
    if (prev !== undefined)
      issues.push(
        makeIssue(
          file,
          rec.row,
          headers[idIdx ?? 0],
          id,
          `a station id not already used (row ${prev}); first row kept`,
          "warning",
        ),
      );
    else {
      seen.set(key, rec.row);
      stations.push(st);
    }
  }
  return { file, stations, issues, headers, mapping };
}

/**
 * Joins measurement rows to a station table by normalised station id (trimmed, case-insensitive,
 * numeric ids compared as numbers so "007", "7" and "7.0" match). Positions (and distances) from
 * the table fill rows that have none. Each id whose match needed normalisation is reported once;
 * each id missing from the table is reported once.
 *
 * @param rows stations as read
 * @param table the station table
 * @param file measurement file name for issues
 * @param column header of the station column (for issues)
 * @returns new station objects with positions filled, plus issues
 */
export function joinStationTable(
  rows: readonly ImportedStation[],
  table: StationTable,
  file: string,
  column = "station",
): { stations: ImportedStation[]; issues: ImportIssue[] } {
  const byId = new Map(table.stations.map((s) => [normaliseStationId(s.id).id, s]));
  const issues: ImportIssue[] = [];
  const reported = new Set<string>();
  const stations = rows.map((r) => {
    const norm = normaliseStationId(r.id);
    const rec = byId.get(norm.id);
    const once = (key: string, issue: ImportIssue): void => {
      if (!reported.has(key)) issues.push(issue);
      reported.add(key);
    };
    if (rec === undefined) {
      once(
        `missing ${norm.id}`,
        makeIssue(file, r.sourceRow, column, r.id, `a station id listed in ${table.file}`, "warning"),
      );
      return r;
    }
    if (rec.id.trim() !== r.id.trim()) {
      const how = [...new Set([...norm.changes, ...normaliseStationId(rec.id).changes])].join(", ") || "case";
      once(
        `norm ${r.id}`,
        makeIssue(
          file,
          r.sourceRow,
          column,
          r.id,
          `matched station "${rec.id}" of ${table.file} after normalising (${how})`,
          "warning",
        ),
      );
    }
    const out: ImportedStation = { ...r };
    if (out.lonLat === undefined && rec.lonLat !== undefined) out.lonLat = rec.lonLat;
    if (out.distanceKm === undefined && rec.distanceKm !== undefined) out.distanceKm = rec.distanceKm;
    return out;
  });
  return { stations, issues };
}
