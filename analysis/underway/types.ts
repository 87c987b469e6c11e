/**
 * Data types of an underway (flow-through) log held column by column: one typed array per
 * variable and one status byte per cell, never one object per row.
 */
import type { ImportIssue } from "../survey/survey.ts";
import type { TextDialect } from "../io/dialect.ts";

/** Cell status codes of {@link UnderwayColumn.status}. */
export const CELL_MEASURED = 0;
/** Blank, "NA", "-999" and the other missing-value markers of analysis/io. */
export const CELL_MISSING = 1;
/** Text that is not a value of the expected kind; the original text is in the issue list. */
export const CELL_INVALID = 2;
/** Computed from other cells of the row (salinity from conductivity and temperature). */
export const CELL_DERIVED = 3;

/** Status of one cell: {@link CELL_MEASURED}, {@link CELL_MISSING}, {@link CELL_INVALID} or {@link CELL_DERIVED}. */
export type UnderwayCellStatus = 0 | 1 | 2 | 3;

/** Which quantity a column of an underway log holds. */
export type UnderwayRole =
  | "time"
  | "date"
  | "timeOfDay"
  | "latitude"
  | "longitude"
  | "salinity"
  | "conductivity"
  | "temperature"
  | "fluorescence"
  | "turbidity";

/** One numeric column: values as parsed (NaN unless the status is measured or derived) and a status per row. */
export interface UnderwayColumn {
  /** Variable name ("salinity", "temperatureC", "fluorescence", "turbidity"). */
  name: string;
  /** Header text the values came from (for salinity from conductivity: the conductivity header). */
  header: string;
  /** Unit text ("PSU", "°C", "mS/cm", "RFU", "NTU"; "" when the header has none). */
  unit: string;
  /** Values in `unit`, exactly as parsed from the text (no rounding); NaN where not measured. */
  values: Float64Array;
  /** One status code per row (see CELL_* constants). */
  status: Uint8Array;
}

/** An underway log in columns. Row i of every array belongs to data record i of the file. */
export interface UnderwayData {
  /** File name used in issues. */
  file: string;
  /** Number of data records stored (every non-blank record after the header, accepted or not). */
  n: number;
  /** Source record number of each row (header = 1). */
  sourceRow: Uint32Array;
  /** Sampling time [ms since 1970-01-01 UTC]; NaN where missing or unreadable. */
  timeMs: Float64Array;
  /** Position [decimal degrees, WGS84]; NaN where missing or unreadable (row rejected). */
  lonDeg: Float64Array;
  latDeg: Float64Array;
  /** 1 where the row was accepted (readable position), 0 where rejected. */
  accepted: Uint8Array;
  /** Practical salinity (from the file or from conductivity with PSS-78), temperature and optional variables. */
  columns: UnderwayColumn[];
  /**
   * The original text of every problem cell (unreadable or out of range), by header and then by row
   * index: nothing the user wrote is lost, even beyond the issue cap. Accepted numbers are stored as
   * parsed (`Number` of the text, e.g. "12.50" → 12.5), so they are not repeated here.
   */
  originalText: Record<string, Map<number, string>>;
}

/** Counts of one underway import: every data record is read, accepted or rejected with a reason. */
export interface UnderwaySummary {
  rowsRead: number;
  rowsAccepted: number;
  rowsRejected: number;
  /** Rejected records by reason ("no position", "unreadable latitude", ...). */
  rejectedByReason: Record<string, number>;
  /** Problem cells by reason; counted for every cell even beyond the stored issue cap. */
  issuesByReason: Record<string, number>;
  /** Issues found; `issues` holds at most `issueCap` of them. */
  issueCount: number;
  issueCap: number;
  blankLines: number;
  /** True when times carried no zone and were read as UTC. */
  timesAssumedUtc: boolean;
}

/** Everything {@link readUnderwayStream} produces. */
export interface UnderwayImport {
  data: UnderwayData;
  /** The first `summary.issueCap` problems (file, row, column, original text, what was expected). */
  issues: ImportIssue[];
  summary: UnderwaySummary;
  headers: string[];
  dialect: TextDialect;
  /** Role given to each header ("ignored" for the others). */
  roles: Array<UnderwayRole | "ignored">;
}
