/**
 * River discharge table: one row per day (date, discharge), joined to surveys by date.
 */
import Papa from "papaparse";
import type { ImportIssue } from "../survey/survey.ts";

/** One accepted row of a discharge table. */
export interface DischargeRow {
  /** ISO 8601 date YYYY-MM-DD. */
  date: string;
  dischargeM3s: number;
  /** 1-based row in the file (header = 1) and the original cell texts. */
  row: number;
  dateText: string;
  dischargeText: string;
}

/** A discharge table, sorted by date, with every problem found. */
export interface DischargeTable {
  fileName: string;
  rows: DischargeRow[];
  /** Header of the discharge column and the conversion applied to m³/s. */
  dischargeColumn: string;
  unitNote: string;
  issues: ImportIssue[];
}

/** Cubic foot in cubic metres (exact: 1 ft = 0.3048 m by the 1959 international yard and pound agreement). */
export const CUBIC_FOOT_M3 = 0.3048 ** 3;

function isoDate(text: string): string | undefined {
  const t = text.trim();
  let y: number, m: number, d: number;
  let hit = /^(\d{4})-(\d{1,2})-(\d{1,2})(?:[T ].*)?$/.exec(t);
  if (hit) [y, m, d] = [Number(hit[1]), Number(hit[2]), Number(hit[3])];
  else if ((hit = /^(\d{1,2})\/(\d{1,2})\/(\d{4})$/.exec(t)))
    [m, d, y] = [Number(hit[1]), Number(hit[2]), Number(hit[3])];
  else return undefined;
  const date = new Date(Date.UTC(y, m - 1, d));
  if (date.getUTCMonth() !== m - 1 || date.getUTCDate() !== d) return undefined;
  return date.toISOString().slice(0, 10);
}

/**
 * Reads a delimited discharge table: a date column (header containing "date" or "day"; ISO
 * YYYY-MM-DD or M/D/YYYY) and a discharge column (header containing "discharge", "flow" or "Q";
 * the first other column otherwise). Values in ft³/s ("cfs", "ft3/s" in the header) are converted
 * to m³/s; any other header unit is taken as m³/s and said so in `unitNote`. Bad rows become issues
 * naming file, row, column and value; they are never dropped silently. A date given twice keeps
 * the first row (warning).
 *
 * @param text file contents
 * @param fileName name for messages
 * @returns the table sorted by date
 * @throws TypeError when text is not a string
 */
export function readDischargeTable(text: string, fileName: string): DischargeTable {
  if (typeof text !== "string") throw new TypeError(`readDischargeTable: text must be a string, got ${typeof text}`);
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: true });
  const records = parsed.data;
  const issues: ImportIssue[] = [];
  const header = (records[0] ?? []).map((h) => h.trim());
  const fail = (row: number, column: string, value: string, expected: string, severity: ImportIssue["severity"]) =>
    issues.push({ file: fileName, row, column, value, expected, severity });
  let di = header.findIndex((h) => /date|day/i.test(h));
  if (di < 0) di = 0;
  let qi = header.findIndex((h, i) => i !== di && /discharge|flow|\bq\b/i.test(h));
  if (qi < 0) qi = header.findIndex((_, i) => i !== di);
  const out: DischargeTable = { fileName, rows: [], dischargeColumn: header[qi] ?? "", unitNote: "", issues };
  if (header.length < 2 || qi < 0) {
    fail(1, "", header.join(","), "a header with a date column and a discharge column [m³/s]", "error");
    return out;
  }
  const qHeader = header[qi]!;
  const cfs = /cfs|ft3\/s|ft³\/s|ft\^3\/s/i.test(qHeader);
  const factor = cfs ? CUBIC_FOOT_M3 : 1;
  out.unitNote = cfs
    ? `"${qHeader}" read as ft³/s and converted to m³/s (× ${CUBIC_FOOT_M3.toPrecision(8)})`
    : /m3\/s|m³\/s|cumec/i.test(qHeader)
      ? `"${qHeader}" read as m³/s`
      : `"${qHeader}" has no unit in its header: read as m³/s`;
  const seen = new Set<string>();
  records.slice(1).forEach((rec, k) => {
    const row = k + 2;
    const dateText = rec[di] ?? "";
    const qText = rec[qi] ?? "";
    const date = isoDate(dateText);
    if (!date) return fail(row, header[di]!, dateText, "a date YYYY-MM-DD or M/D/YYYY", "error");
    const q = Number(qText.trim());
    if (qText.trim() === "" || !Number.isFinite(q) || q < 0)
      return fail(row, qHeader, qText, "a discharge ≥ 0 (number)", "error");
    if (seen.has(date)) return fail(row, header[di]!, dateText, "each date once (the first row is kept)", "warning");
    seen.add(date);
    out.rows.push({ date, dischargeM3s: q * factor, row, dateText, dischargeText: qText });
  });
  out.rows.sort((a, b) => (a.date < b.date ? -1 : a.date > b.date ? 1 : 0));
  return out;
}

/** The discharge a survey was given from a table, and how it was chosen. */
export interface DischargeLookup {
  dischargeM3s: number;
  /** The table date used (on or before the survey date). */
  tableDate: string;
  /** Days between the table date and the survey date (0 = same day). */
  daysBefore: number;
  /** Plain statement, e.g. "discharge of 2019-07-14 (1 day before the survey) from flows.csv". */
  statement: string;
}

/**
 * Discharge for a survey date: the table row of the same day, else of the nearest earlier day
 * (discharge reaching the estuary precedes the survey; a later day is never used).
 *
 * @param table from {@link readDischargeTable}
 * @param surveyDate ISO 8601 date of the survey (YYYY-MM-DD…)
 * @param maxDaysBefore farthest gap accepted (default 31 days)
 * @returns the lookup, or undefined when no row lies within maxDaysBefore on or before the date
 * @throws RangeError when surveyDate is not an ISO date
 */
export function dischargeOnDate(
  table: DischargeTable,
  surveyDate: string,
  maxDaysBefore = 31,
): DischargeLookup | undefined {
  const day = isoDate(String(surveyDate).slice(0, 10));
  if (!day) throw new RangeError(`dischargeOnDate: surveyDate must be an ISO date, got "${surveyDate}"`);
  let lo = 0;
  let hi = table.rows.length - 1;
  let best = -1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (table.rows[mid]!.date <= day) {
      best = mid;
      lo = mid + 1;
    } else hi = mid - 1;
  }
  if (best < 0) return undefined;
  const r = table.rows[best]!;
  const days = Math.round((Date.parse(day) - Date.parse(r.date)) / 86_400_000);
  if (days > maxDaysBefore) return undefined;
  const when = days === 0 ? "the survey day" : `${days} day${days === 1 ? "" : "s"} before the survey`;
  return {
    dischargeM3s: r.dischargeM3s,
    tableDate: r.date,
    daysBefore: days,
    statement: `discharge of ${r.date} (${when}) from ${table.fileName}, row ${r.row}`,
  };
}
