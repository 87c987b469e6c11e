/**
 * Joining a river discharge table to surveys by date: the one rule the CLI's `--discharge-table`
 * and the dashboard's archive view both use (applied to each survey's analysis by
 * `surveyDischarge`, which ranks the table below the user's and the file's own discharge), and
 * the report of what a table gave.
 */
import type { ImportIssue } from "../survey/survey.ts";
import type { DischargeProvenance } from "../pipeline/surveyAnalysis.ts";
import type { DischargeSource } from "./buildSeries.ts";
import { isoDay } from "./buildSeries.ts";
import { dischargeOnDate, type DischargeTable } from "./dischargeTable.ts";

/** Farthest a table day may lie before a survey day and still be used [days]. */
export const DISCHARGE_JOIN_MAX_DAYS = 31;

/** The join rule in plain words (shown wherever a table is joined). */
export const DISCHARGE_JOIN_RULE =
  `Each survey without a discharge of its own (in its file, or given for it) takes the table's discharge of its own day, ` +
  `else of the nearest earlier day (at most ${DISCHARGE_JOIN_MAX_DAYS} days before; a later day is never used); ` +
  `its fluxes use that discharge.`;

/** The discharges a table gives a set of surveys. */
export interface DischargeJoin {
  /** Discharge and its source by survey name (for summarizeArchive's `discharge`). */
  discharge: Record<string, DischargeSource>;
  /** Surveys without a date, or without a table row on or up to the maximum gap before it. */
  missing: string[];
  /** How many surveys took the row of their own day. */
  sameDay: number;
}

/**
 * Joins a discharge table to surveys: each survey gets the row of its start day, else of the
 * nearest earlier day within `maxDaysBefore` ({@link dischargeOnDate}); the others are named in
 * `missing` (their own discharge, if any, stays).
 *
 * @param table from readDischargeTable
 * @param surveys name and start date (ISO 8601) of each survey
 * @param maxDaysBefore farthest gap accepted [days] (default {@link DISCHARGE_JOIN_MAX_DAYS})
 * @returns discharges by survey name with their statements, and the surveys left without one
 * @throws TypeError when table has no rows array
 */
export function joinDischargeTable(
  table: DischargeTable,
  surveys: ReadonlyArray<{ name: string; startDate?: string | undefined }>,
  maxDaysBefore = DISCHARGE_JOIN_MAX_DAYS,
): DischargeJoin {
  if (!table || !Array.isArray(table.rows)) throw new TypeError(`joinDischargeTable: table must be a DischargeTable`);
  const out: DischargeJoin = { discharge: {}, missing: [], sameDay: 0 };
  for (const s of surveys) {
    const day = isoDay(s.startDate);
    const hit = day ? dischargeOnDate(table, day, maxDaysBefore) : undefined;
    if (!hit) {
      out.missing.push(s.name);
      continue;
    }
    out.discharge[s.name] = { dischargeM3s: hit.dischargeM3s, source: hit.statement };
    if (hit.daysBefore === 0) out.sameDay += 1;
  }
  return out;
}

/** What a discharge table gave the analysed surveys (CLI stderr, the dashboard's archive view). */
export interface DischargeTableReport {
  fileName: string;
  /** Accepted days in the table. */
  days: number;
  /** How the discharge column was read (unit). */
  unitNote: string;
  /** The join rule in plain words ({@link DISCHARGE_JOIN_RULE}). */
  rule: string;
  /** Surveys whose analysis took its discharge from the table, and of those how many from their own day. */
  joined: number;
  sameDay: number;
  /** Surveys that kept a discharge of their own (setting, the user's value, their file). */
  ownDischarge: number;
  /** Surveys left without any discharge (no date, or no table row within the gap, and none of their own). */
  missing: string[];
  /** Problems in the table (file, row, column, value). */
  issues: ImportIssue[];
}

/**
 * Reports what a table gave surveys already analysed with it, from each survey's stated discharge
 * source (never joining again).
 *
 * @param table the table the analyses were given
 * @param surveys survey facts (name and dischargeSource) of the analyses
 * @returns counts by origin and the surveys left without discharge
 */
export function dischargeTableReport(
  table: DischargeTable,
  surveys: ReadonlyArray<{ name: string; dischargeSource?: DischargeProvenance | undefined }>,
): DischargeTableReport {
  const fromTable = surveys.filter((s) => s.dischargeSource?.origin === "table");
  return {
    fileName: table.fileName,
    days: table.rows.length,
    unitNote: table.unitNote,
    rule: DISCHARGE_JOIN_RULE,
    joined: fromTable.length,
    sameDay: fromTable.filter((s) => s.dischargeSource?.daysBefore === 0).length,
    ownDischarge: surveys.filter((s) => s.dischargeSource !== undefined && s.dischargeSource.origin !== "table").length,
    missing: surveys.filter((s) => s.dischargeSource === undefined).map((s) => s.name),
    issues: table.issues,
  };
}
