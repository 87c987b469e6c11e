/**
 * Joining a river discharge table to surveys by date: the one rule the CLI's `--discharge-table`
 * and the dashboard's archive view both use.
 */
import type { DischargeSource } from "./buildSeries.ts";
import { isoDay } from "./buildSeries.ts";
import { dischargeOnDate, type DischargeTable } from "./dischargeTable.ts";

/** Farthest a table day may lie before a survey day and still be used [days]. */
export const DISCHARGE_JOIN_MAX_DAYS = 31;

/** The join rule in plain words (shown wherever a table is joined). */
export const DISCHARGE_JOIN_RULE =
  `Each survey takes the table's discharge of its own day, else of the nearest earlier day ` +
  `(at most ${DISCHARGE_JOIN_MAX_DAYS} days before; a later day is never used), overriding the discharge in its file.`;

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
