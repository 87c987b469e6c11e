/**
 * The join rule of a river discharge table (applied to each survey's analysis by `surveyDischarge`,
 * which ranks the table below the user's and the file's own discharge; the CLI's
 * `--discharge-table` and the dashboard's archive view alike), and the report of what a table gave
 * the analysed surveys.
 */
import type { ImportIssue } from "../survey/survey.ts";
import type { DischargeProvenance } from "../pipeline/surveyAnalysis.ts";
import type { DischargeTable } from "./dischargeTable.ts";

/** Farthest a table day may lie before a survey day and still be used [days]. */
export const DISCHARGE_JOIN_MAX_DAYS = 31;

/** The join rule in plain words (shown wherever a table is joined). */
export const DISCHARGE_JOIN_RULE =
  `Each survey without a discharge of its own (in its file, or given for it) takes the table's discharge of its own day, ` +
  `else of the nearest earlier day (at most ${DISCHARGE_JOIN_MAX_DAYS} days before; a later day is never used); ` +
  `its fluxes use that discharge.`;

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
