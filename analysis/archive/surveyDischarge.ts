/**
 * The one rule that decides a survey's river discharge and says where it came from: used by
 * analyzeInputs for every survey (CLI, dashboard worker, briefing), so the fluxes, the survey
 * facts and the archive series all use the same value.
 */
import type { DischargeProvenance } from "../pipeline/surveyAnalysis.ts";
import type { Survey } from "../survey/survey.ts";
import { isoDay } from "./buildSeries.ts";
import { DISCHARGE_JOIN_MAX_DAYS } from "./dischargeJoin.ts";
import { dischargeOnDate, type DischargeTable } from "./dischargeTable.ts";

/** The precedence in plain words (README, DEVELOPERS.md, `--help`, the dashboard's archive view). */
export const DISCHARGE_PRECEDENCE =
  "A survey's river discharge is the first of: the analysis setting for every survey (dashboard settings); " +
  "the value the user gave for it (CLI --discharge); the survey's own discharge (its file's discharge column); " +
  `a daily discharge table joined by date (its own day, else the nearest earlier day at most ${DISCHARGE_JOIN_MAX_DAYS} days before). ` +
  "Which one was used is stated with the survey (dischargeSource).";

/** The discharges available to a survey, besides its own. */
export interface DischargeGiven {
  /** The analysis setting for every survey [m³/s] (dashboard settings menu). */
  settingM3s?: number | undefined;
  /** Discharge the user gave with the inputs [m³/s]: one for all surveys, or by survey name (CLI `--discharge`). */
  chosenM3s?: number | Readonly<Record<string, number>> | undefined;
  /** A daily discharge table joined by date ({@link dischargeOnDate}). */
  table?: DischargeTable | undefined;
  /** Farthest a table day may lie before the survey day [days] (default {@link DISCHARGE_JOIN_MAX_DAYS}). */
  maxDaysBefore?: number;
}

/** A survey's discharge and where it came from. */
export interface SurveyDischarge extends DischargeProvenance {
  dischargeM3s: number;
}

const usable = (q: number | undefined): q is number => q !== undefined && Number.isFinite(q) && q >= 0;

/**
 * River discharge of one survey by {@link DISCHARGE_PRECEDENCE}: setting > user's value for the
 * survey > the survey's own (file) > table row of its day or the nearest earlier day. An explicit
 * choice beats data; a value given with the survey beats a gauge's daily value joined by date,
 * which may lie days before the survey.
 *
 * @param survey name, start date (ISO 8601) and own discharge [m³/s] (as read; the CLI's
 *   `--discharge` is already applied to it by the reader, and recognised here through `chosenM3s`)
 * @param given the setting, the user's values and the table
 * @returns discharge [m³/s] with its origin and statement, or undefined when none applies
 * @throws TypeError when `given.table` has no rows array
 */
export function surveyDischarge(
  survey: Pick<Survey, "name" | "startDate" | "riverDischargeM3s">,
  given: DischargeGiven = {},
): SurveyDischarge | undefined {
  if (given.table !== undefined && !Array.isArray(given.table?.rows))
    throw new TypeError(`surveyDischarge: given.table must be a DischargeTable`);
  if (usable(given.settingM3s))
    return {
      dischargeM3s: given.settingM3s,
      origin: "setting",
      statement: "the analysis setting for every survey",
    };
  const chosen = typeof given.chosenM3s === "number" ? given.chosenM3s : given.chosenM3s?.[survey.name];
  if (usable(chosen))
    return { dischargeM3s: chosen, origin: "option", statement: "given by the user for this survey (--discharge)" };
  if (survey.riverDischargeM3s !== undefined && Number.isFinite(survey.riverDischargeM3s))
    return {
      dischargeM3s: survey.riverDischargeM3s,
      origin: "file",
      statement: "the survey's own discharge (its file's discharge column)",
    };
  const day = isoDay(survey.startDate);
  if (!given.table || !day) return undefined;
  const hit = dischargeOnDate(given.table, day, given.maxDaysBefore ?? DISCHARGE_JOIN_MAX_DAYS);
  if (!hit) return undefined;
  return {
    dischargeM3s: hit.dischargeM3s,
    origin: "table",
    statement: hit.statement,
    tableDate: hit.tableDate,
    daysBefore: hit.daysBefore,
  };
}
