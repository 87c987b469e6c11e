import type { CellStatus, ImportIssue, Station } from "../survey/survey.ts";

/** Counts describing one import; nothing is dropped without being counted here. */
export interface ImportSummary {
  /** Data rows read (blank lines and the header excluded). */
  rowsRead: number;
  /** Rows that became stations. */
  rowsAccepted: number;
  /** Rows left out; each has an ImportIssue and is counted in rejectedByReason. */
  rowsRejected: number;
  /** Rejected rows by reason (e.g. "missing station id": 3). */
  rejectedByReason: Record<string, number>;
  /** Value cells (salinity, temperature, pH, constituents) of all rows by status. */
  valuesByStatus: Record<CellStatus, number>;
  /** Value cells set aside by a QC flag (kept, not analysed). */
  valuesRejectedByFlag: number;
  /** Blank lines skipped. */
  blankLines: number;
}

/** A station as produced by the readers, with the extra context the import knows about it. */
export interface ImportedStation extends Station {
  /** Survey label from a survey column. */
  surveyLabel?: string;
  /** Layer from a depth-label column ("S"/"B" style) or from layer selection. */
  layer?: "surface" | "bottom" | "middle" | "shallowest" | "depthAveraged" | "depthRange";
  /** The station id as written in the file, when the reader normalised it ("36.0" read as "36"). */
  idText?: string;
  /** Along-channel distance given in the file [km]. */
  distanceKm?: number;
  /** Set by distancesFromMouth for a station on a side arm of the distance axis: km along the arm from the mouth. */
  sideArmKm?: number;
  /** River discharge given on the row [m³/s]. */
  dischargeM3s?: number;
  /** The row-level QC flag text, when present. */
  rowFlag?: string;
  /** Source rows combined into this station by layer selection. */
  contributingRows?: number[];
}

/** An empty summary. */
export function emptySummary(): ImportSummary {
  return {
    rowsRead: 0,
    rowsAccepted: 0,
    rowsRejected: 0,
    rejectedByReason: {},
    valuesByStatus: { measured: 0, belowDetection: 0, missing: 0, invalid: 0 },
    valuesRejectedByFlag: 0,
    blankLines: 0,
  };
}

/** Records a rejected row under its reason. */
export function countRejected(summary: ImportSummary, reason: string): void {
  summary.rowsRejected += 1;
  summary.rejectedByReason[reason] = (summary.rejectedByReason[reason] ?? 0) + 1;
}

/** Builds an ImportIssue (the value is clipped to 200 characters so hostile input stays readable). */
export function makeIssue(
  file: string,
  row: number,
  column: string,
  value: string,
  expected: string,
  severity: ImportIssue["severity"] = "error",
): ImportIssue {
  const v = value.length > 200 ? `${value.slice(0, 200)}…` : value;
  return { file, row, column, value: v, expected, severity };
}

/** Adds two summaries (for several files). */
export function mergeSummaries(a: ImportSummary, b: ImportSummary): ImportSummary {
  const out = emptySummary();
  for (const s of [a, b]) {
    out.rowsRead += s.rowsRead;
    out.rowsAccepted += s.rowsAccepted;
    out.rowsRejected += s.rowsRejected;
    out.valuesRejectedByFlag += s.valuesRejectedByFlag;
    out.blankLines += s.blankLines;
    for (const [k, n] of Object.entries(s.rejectedByReason))
      out.rejectedByReason[k] = (out.rejectedByReason[k] ?? 0) + n;
    for (const k of Object.keys(out.valuesByStatus) as CellStatus[]) out.valuesByStatus[k] += s.valuesByStatus[k];
  }
  return out;
}
