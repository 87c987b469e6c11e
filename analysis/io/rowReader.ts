import type { ImportIssue, ValueCell } from "../survey/survey.ts";
import type { ColumnMapping } from "./columnMapping.ts";
import type { CompiledMapping } from "./compileMapping.ts";
import type { CellContext } from "./cellReaders.ts";
import { readNumberCell, readValueCell, VALUE_LIMITS } from "./cellReaders.ts";
import type { DelimitedRecord } from "./delimitedRecords.ts";
import type { ImportedStation, ImportSummary } from "./importSummary.ts";
import { countRejected, emptySummary, makeIssue } from "./importSummary.ts";
import type { FlagDecision } from "./qcFlags.ts";
import { DEFAULT_FLAG_MAP, readQcFlag } from "./qcFlags.ts";
import { readRowPlace } from "./rowPlace.ts";
import type { SalinityFromConductivity } from "./conductivitySalinity.ts";
import { salinityFromConductivityCell } from "./conductivitySalinity.ts";
import { integralStationId } from "./stationIds.ts";

export type { SalinityFromConductivity };

/** Options for reading rows. */
export interface RowReaderOptions {
  file: string;
  decimalComma: boolean;
  flagMap?: Readonly<Record<string, FlagDecision>>;
  salinityFromConductivity?: SalinityFromConductivity;
}

/** Reads data records into stations, counting every row. */
export interface RowReader {
  read(record: DelimitedRecord): void;
  stations: ImportedStation[];
  issues: ImportIssue[];
  summary: ImportSummary;
}

/** Longest station id accepted; a longer one rejects its row (it is not cut silently). */
export const MAX_STATION_ID_CHARS = 200;

/**
 * Upper end of the Practical Salinity Scale 1978's validity range.
 * @see UNESCO (1981) Background papers and supporting data on the Practical Salinity Scale 1978,
 *   UNESCO Tech. Pap. Mar. Sci. 37; UNESCO (1983) Tech. Pap. Mar. Sci. 44 (range 2–42).
 */
export const PSS78_MAX_SALINITY = 42;

/** Largest river discharge read [m³/s]: ten times the largest river's mean flow (common practice: a plausibility bound). */
export const MAX_DISCHARGE_M3S = 2_000_000;

const VALUE_ROLES = ["salinity", "temperature", "pH", "conductivity"] as const;

/**
 * Creates a reader that turns data records into {@link ImportedStation}s following a compiled mapping.
 * A bad cell becomes an invalid ValueCell plus an issue; a row is rejected (counted by reason, with
 * an issue naming file, row and column) only when it has no station id or its row QC flag rejects it.
 *
 * @param compiled mapping resolved against the header row
 * @param mapping the mapping (date order, time zone, EPSG, depth labels)
 * @param options file name, decimal comma, flag map, conductivity conversion
 * @returns the reader; read() never throws on bad data
 */
export function createRowReader(
  compiled: CompiledMapping,
  mapping: ColumnMapping,
  options: RowReaderOptions,
): RowReader {
  return new CompiledRowReader(compiled, mapping, options);
}

/**
 * The row reader: one class, so every file of a run is read by the same functions (no closures made
 * per file, whose compiled code V8 would otherwise build again for each file).
 */
class CompiledRowReader implements RowReader {
  readonly issues: ImportIssue[] = [];
  readonly stations: ImportedStation[] = [];
  readonly summary = emptySummary();
  private readonly integralIds = new Set<string>();
  private integralIssue: ImportIssue | undefined = undefined;
  private readonly flagMap: Readonly<Record<string, FlagDecision>>;
  private readonly width: number;

  constructor(
    private readonly compiled: CompiledMapping,
    private readonly mapping: ColumnMapping,
    private readonly options: RowReaderOptions,
  ) {
    this.flagMap = options.flagMap ?? DEFAULT_FLAG_MAP;
    this.width = compiled.headers.length;
  }

  private header(i: number): string {
    return this.compiled.headers[i] ?? `column ${i + 1}`;
  }

  private count(c: ValueCell): void {
    this.summary.valuesByStatus[c.status] += 1;
    if (!c.accepted && c.status !== "invalid") this.summary.valuesRejectedByFlag += 1;
  }

  read(record: DelimitedRecord): void {
    const { compiled, mapping, options, summary, issues, flagMap } = this;
    const s = compiled.single;
    const width = this.width;
    const header = (i: number): string => this.header(i);
    const count = (c: ValueCell): void => this.count(c);
    const { fields, row } = record;
    summary.rowsRead += 1;
    const ctx: CellContext = { file: options.file, row, decimalComma: options.decimalComma, flagMap, issues };
    const unclosed = record.parseErrors.find((e) => e.startsWith("UnclosedQuote"));
    if (unclosed !== undefined) {
      countRejected(summary, "unclosed quote");
      const col = Number(/field (\d+)/.exec(unclosed)?.[1] ?? "1") - 1;
      issues.push(makeIssue(options.file, row, header(col), fields.join(","), unclosed.slice(15)));
      return;
    }
    for (const e of record.parseErrors)
      issues.push(
        makeIssue(
          options.file,
          row,
          "",
          fields.join(",").slice(0, 120),
          `well-formed delimited text (${e})`,
          "warning",
        ),
      );
    if (fields.length !== width) {
      issues.push(
        makeIssue(options.file, row, "", String(fields.length), `${width} fields as in the header row`, "warning"),
      );
    }
    const cellText = (i: number | undefined): string => (i === undefined ? "" : (fields[i] ?? ""));
    const flagged = (i: number): { text: string; header: string } | undefined => {
      const f = compiled.flagOf.get(i);
      return f === undefined ? undefined : { text: cellText(f), header: header(f) };
    };
    // station id
    const idWritten = s.station === undefined ? `row ${row}` : cellText(s.station).trim();
    const { id, changed: idChanged } = integralStationId(idWritten);
    if (idChanged) {
      this.integralIds.add(idWritten);
      let integralIssue = this.integralIssue;
      if (integralIssue === undefined) {
        integralIssue = makeIssue(options.file, row, header(s.station ?? 0), idWritten, "", "warning");
        this.integralIssue = integralIssue;
        issues.push(integralIssue);
      }
      integralIssue.expected = `station ids written as whole numbers with a trailing ".0" are read without it ("${integralIssue.value}" as "${integralStationId(integralIssue.value).id}"; ${this.integralIds.size} such id(s) in this column); the text as written is kept with each station (idText)`;
    }
    if (id.length === 0) {
      countRejected(summary, "missing station id");
      issues.push(makeIssue(options.file, row, header(s.station ?? 0), cellText(s.station), "a station id"));
      return;
    }
    if (id.length > MAX_STATION_ID_CHARS) {
      countRejected(summary, "station id too long");
      issues.push(
        makeIssue(
          options.file,
          row,
          header(s.station ?? 0),
          id,
          `a station id of at most ${MAX_STATION_ID_CHARS} characters (this one has ${id.length}); row not imported`,
        ),
      );
      return;
    }
    // row flag
    let rowFlag: string | undefined;
    if (s.rowFlag !== undefined) {
      rowFlag = cellText(s.rowFlag);
      const d = readQcFlag(rowFlag, flagMap);
      if (d !== "accept") {
        const reason = d === undefined ? "unknown row QC flag" : "row QC flag rejects";
        countRejected(summary, reason);
        issues.push(
          makeIssue(options.file, row, header(s.rowFlag), rowFlag, "a row QC flag that accepts the row", "warning"),
        );
        return;
      }
    }
    const place = readRowPlace(ctx, compiled, mapping, fields);
    const cells: Partial<Record<(typeof VALUE_ROLES)[number], ValueCell>> = {};
    for (const role of VALUE_ROLES) {
      const i = s[role];
      if (i === undefined) continue;
      const c = readValueCell(ctx, header(i), cellText(i), flagged(i), VALUE_LIMITS[role]);
      if (role !== "conductivity") count(c);
      cells[role] = c;
    }
    if (cells.salinity?.status === "measured" && (cells.salinity.value ?? 0) > PSS78_MAX_SALINITY)
      issues.push(
        makeIssue(
          options.file,
          row,
          header(s.salinity ?? 0),
          cells.salinity.original,
          `a practical salinity within the PSS-78 range 2–${PSS78_MAX_SALINITY} (UNESCO 1981, 1983); value kept — check the column and its unit`,
          "warning",
        ),
      );
    let salinity = cells.salinity;
    if (salinity === undefined)
      salinity = salinityFromConductivityCell(ctx, cells, compiled, options.salinityFromConductivity, place.depthM);
    const values: Record<string, ValueCell> = {};
    for (const c of compiled.constituents) {
      const cell = readValueCell(ctx, header(c.index), cellText(c.index), flagged(c.index));
      if (cell.status === "measured" && (cell.value ?? 0) < 0)
        issues.push(
          makeIssue(
            options.file,
            row,
            header(c.index),
            cell.original,
            "a concentration ≥ 0; the negative value is kept as written (blank-corrected?) — check it",
            "warning",
          ),
        );
      count(cell);
      values[c.key] = cell;
    }
    const st: ImportedStation = { id, salinity, values, sourceRow: row, sourceFile: options.file, ...place };
    if (idChanged) st.idText = idWritten;
    if (cells.temperature !== undefined) st.temperatureC = cells.temperature;
    if (cells.pH !== undefined) st.pH = cells.pH;
    if (s.survey !== undefined && cellText(s.survey).trim() !== "") st.surveyLabel = cellText(s.survey).trim();
    if (s.distance !== undefined) {
      const d = readNumberCell(ctx, header(s.distance), cellText(s.distance));
      if (d !== undefined) st.distanceKm = d;
    }
    if (s.discharge !== undefined) {
      const q = readNumberCell(ctx, header(s.discharge), cellText(s.discharge), 0);
      if (q !== undefined && q > 0 && q <= MAX_DISCHARGE_M3S) st.dischargeM3s = q;
      else if (q !== undefined)
        issues.push(
          makeIssue(
            options.file,
            row,
            header(s.discharge),
            cellText(s.discharge),
            `a river discharge above 0 and at most ${MAX_DISCHARGE_M3S} m³/s; not used`,
            "warning",
          ),
        );
    }
    if (rowFlag !== undefined && rowFlag.trim() !== "") st.rowFlag = rowFlag;
    this.stations.push(st);
    summary.rowsAccepted += 1;
  }
}
