import type { Constituent, ImportIssue, Survey } from "../survey/survey.ts";
import type { ImportedStation } from "./importSummary.ts";
import { makeIssue } from "./importSummary.ts";

/** How rows are split into surveys. */
export type SurveyGrouping =
  { by: "column" } | { by: "dateGap"; gapDays?: number } | { by: "date" } | { by: "file"; name?: string };

/** Default gap between sampling days that starts a new survey [days] (common practice for cruise data). */
export const DEFAULT_SURVEY_GAP_DAYS = 3;

const dayMs = 86_400_000;
const dayOf = (time: string): string => time.slice(0, 10);

function dates(stations: readonly ImportedStation[]): string[] {
  return stations
    .map((s) => s.time)
    .filter((t): t is string => t !== undefined)
    .sort();
}

/**
 * Splits stations into surveys: by the survey column, by gaps between sampling dates longer than
 * `gapDays` (default {@link DEFAULT_SURVEY_GAP_DAYS}), one survey per calendar date, or one per
 * file. Stations without the needed label or date form their own survey with a warning, never dropped.
 * Discharge comes from `riverDischargeM3s` (a number for all surveys or a record by survey name) or,
 * failing that, the mean of the rows' discharge column (a warning when rows differ by > 1 %).
 *
 * @param stations stations in file order
 * @param grouping grouping rule
 * @param constituents constituents of the file
 * @param file file name (survey name for "file" and for issues)
 * @param riverDischargeM3s optional discharge [m³/s]
 * @returns the surveys in time order and the issues
 * @throws RangeError when gapDays is negative or not finite
 */
export function groupSurveys(
  stations: readonly ImportedStation[],
  grouping: SurveyGrouping,
  constituents: readonly Constituent[],
  file: string,
  riverDischargeM3s?: number | Readonly<Record<string, number>>,
): { surveys: Survey[]; issues: ImportIssue[] } {
  const issues: ImportIssue[] = [];
  const groups = new Map<string, ImportedStation[]>();
  const add = (name: string, s: ImportedStation): void => {
    const g = groups.get(name) ?? [];
    g.push(s);
    groups.set(name, g);
  };
  const undated = stations.filter((s) => s.time === undefined);
  if (grouping.by === "file") for (const s of stations) add(grouping.name ?? file, s);
  else if (grouping.by === "column") {
    for (const s of stations) add(s.surveyLabel ?? "(no survey label)", s);
    const unl = stations.filter((s) => s.surveyLabel === undefined);
    if (unl.length > 0)
      issues.push(
        makeIssue(
          file,
          unl[0].sourceRow,
          "survey",
          "",
          `a survey label (${unl.length} rows grouped as "(no survey label)")`,
          "warning",
        ),
      );
  } else {
    const gap = grouping.by === "date" ? 0 : (grouping.gapDays ?? DEFAULT_SURVEY_GAP_DAYS);
    if (!Number.isFinite(gap) || gap < 0)
      throw new RangeError(`groupSurveys(): gapDays must be a finite number ≥ 0, got ${gap}`);
    const dated = stations
      .filter((s) => s.time !== undefined)
      .sort((a, b) => ((a.time as string) < (b.time as string) ? -1 : 1));
    let name = "";
    let lastDay = Number.NEGATIVE_INFINITY;
    for (const s of dated) {
      const day = Date.parse(`${dayOf(s.time as string)}T00:00:00Z`);
      if (name === "" || (grouping.by === "date" ? day !== lastDay : day - lastDay > gap * dayMs))
        name = dayOf(s.time as string);
      lastDay = day;
      add(name, s);
    }
    for (const s of undated) add("(undated)", s);
    if (undated.length > 0)
      issues.push(
        makeIssue(
          file,
          undated[0].sourceRow,
          "date",
          "",
          `a sampling date (${undated.length} rows grouped as "(undated)")`,
          "warning",
        ),
      );
  }
  const surveys: Survey[] = [];
  for (const [name, members] of groups) {
    const ds = dates(members);
    const survey: Survey = { name, stations: members, constituents: constituents.map((c) => ({ ...c })) };
    if (ds.length > 0) {
      survey.startDate = ds[0];
      survey.endDate = ds[ds.length - 1];
    }
    const q = typeof riverDischargeM3s === "number" ? riverDischargeM3s : riverDischargeM3s?.[name];
    const rowsQ = members.map((m) => m.dischargeM3s).filter((x): x is number => x !== undefined);
    if (q !== undefined) survey.riverDischargeM3s = q;
    else if (rowsQ.length > 0) {
      const mean = rowsQ.reduce((a, b) => a + b, 0) / rowsQ.length;
      if (rowsQ.some((x) => Math.abs(x - mean) > 0.01 * Math.abs(mean))) {
        issues.push(
          makeIssue(
            file,
            members[0].sourceRow,
            "discharge",
            rowsQ.join(", ").slice(0, 200),
            `one river discharge per survey; survey "${name}" uses the mean ${mean}`,
            "warning",
          ),
        );
      }
      survey.riverDischargeM3s = mean;
    }
    surveys.push(survey);
  }
  surveys.sort((a, b) =>
    (a.startDate ?? "\uffff") < (b.startDate ?? "\uffff")
      ? -1
      : (a.startDate ?? "\uffff") > (b.startDate ?? "\uffff")
        ? 1
        : 0,
  );
  return { surveys, issues };
}
