/**
 * Column specifications of the tables Brackline writes (results, deviations): one list per table,
 * rendered as CSV by the CLI and the dashboard export and as rows by the briefing. Column names are a
 * public contract (README): add columns, never rename.
 */
import type { ConstituentAnalysis, StationDeviation } from "../mixing/result.ts";
import type { SurveyAnalysis } from "../pipeline/surveyAnalysis.ts";
import { toCsv, type CsvValue } from "./csv.ts";
import { BEHAVIOUR_STYLE } from "./symbols.ts";

/** One column: its name (CSV header and JSON key) and how a row gives its value. */
export interface ColumnSpec<Row> {
  name: string;
  /** Unit or meaning, for documentation and table headers. */
  description: string;
  value: (row: Row) => CsvValue;
}

/** A row of the results table: one survey and one constituent. */
export interface ResultRow {
  survey: string;
  c: ConstituentAnalysis;
}

/** A row of the deviations table: one constituent at one station. */
export interface DeviationRow {
  survey: string;
  c: ConstituentAnalysis;
  d: StationDeviation;
  alongChannelKm: number | undefined;
}

const kmList = (ranges: ReadonlyArray<readonly [number, number]> | undefined): string =>
  ranges?.map(([a, b]) => `${a}-${b}`).join(";") ?? "";

/** Results table: class, estimates with 95 % limits, end-members, zone, maximum, warnings. */
export const RESULT_COLUMNS: ReadonlyArray<ColumnSpec<ResultRow>> = [
  { name: "survey", description: "survey name", value: (r) => r.survey },
  { name: "constituent", description: "constituent name", value: (r) => r.c.name },
  { name: "unit", description: "concentration unit", value: (r) => r.c.unit },
  { name: "class", description: "behaviour class code", value: (r) => r.c.class },
  { name: "behaviour", description: "behaviour in plain words", value: (r) => BEHAVIOUR_STYLE[r.c.class].label },
  { name: "confidence", description: "normal or low", value: (r) => r.c.confidence },
  { name: "percent_change", description: "%", value: (r) => r.c.percentChange?.value },
  { name: "percent_change_lower", description: "% (95 % limit)", value: (r) => r.c.percentChange?.lower },
  { name: "percent_change_upper", description: "% (95 % limit)", value: (r) => r.c.percentChange?.upper },
  {
    name: "verdict",
    description: "plain-language verdict that agrees with the numbers (e.g. % change not determined)",
    value: (r) => r.c.verdict,
  },
  { name: "effective_river_endmember", description: "C*0, unit", value: (r) => r.c.effectiveEndmember?.value },
  {
    name: "effective_river_endmember_lower",
    description: "C*0 95 % limit",
    value: (r) => r.c.effectiveEndmember?.lower,
  },
  {
    name: "effective_river_endmember_upper",
    description: "C*0 95 % limit",
    value: (r) => r.c.effectiveEndmember?.upper,
  },
  { name: "river_salinity", description: "PSS-78", value: (r) => r.c.dilutionLine?.river.salinity },
  { name: "river_conc", description: "unit", value: (r) => r.c.dilutionLine?.river.conc },
  { name: "sea_salinity", description: "PSS-78", value: (r) => r.c.dilutionLine?.sea.salinity },
  { name: "sea_conc", description: "unit", value: (r) => r.c.dilutionLine?.sea.conc },
  { name: "zone_kind", description: "reaction zone kind", value: (r) => r.c.reactionZone?.kind },
  { name: "zone_salinity_from", description: "PSS-78", value: (r) => r.c.reactionZone?.salinity[0] },
  { name: "zone_salinity_to", description: "PSS-78", value: (r) => r.c.reactionZone?.salinity[1] },
  { name: "zone_km", description: "km from the mouth, from-to;...", value: (r) => kmList(r.c.reactionZone?.km) },
  { name: "maximum_salinity", description: "PSS-78", value: (r) => r.c.maximum?.salinity.value },
  { name: "maximum_salinity_lower", description: "PSS-78", value: (r) => r.c.maximum?.salinity.lower },
  { name: "maximum_salinity_upper", description: "PSS-78", value: (r) => r.c.maximum?.salinity.upper },
  { name: "maximum_km", description: "km from the mouth;...", value: (r) => r.c.maximum?.km.join(";") },
  { name: "maximum_excess", description: "unit", value: (r) => r.c.maximum?.excess.value },
  { name: "maximum_excess_lower", description: "unit", value: (r) => r.c.maximum?.excess.lower },
  { name: "maximum_excess_upper", description: "unit", value: (r) => r.c.maximum?.excess.upper },
  { name: "warning_count", description: "count", value: (r) => r.c.warnings.length },
  { name: "warning_codes", description: "codes;...", value: (r) => r.c.warnings.map((w) => w.code).join(";") },
  { name: "warnings", description: "messages | ...", value: (r) => r.c.warnings.map((w) => w.message).join(" | ") },
];

/** Deviations table: observed, expected on the dilution line and the deviation at each station. */
export const DEVIATION_COLUMNS: ReadonlyArray<ColumnSpec<DeviationRow>> = [
  { name: "survey", description: "survey name", value: (r) => r.survey },
  { name: "constituent", description: "constituent name", value: (r) => r.c.name },
  { name: "unit", description: "concentration unit", value: (r) => r.c.unit },
  { name: "station", description: "station id", value: (r) => r.d.stationId },
  { name: "salinity", description: "PSS-78", value: (r) => r.d.salinity },
  { name: "along_channel_km", description: "km from the mouth", value: (r) => r.alongChannelKm },
  { name: "observed", description: "unit", value: (r) => r.d.observed },
  { name: "expected_on_dilution_line", description: "unit", value: (r) => r.d.expected },
  { name: "deviation", description: "unit", value: (r) => r.d.deviation },
  { name: "deviation_percent", description: "%", value: (r) => r.d.deviationPercent },
  { name: "significant", description: "true/false", value: (r) => r.d.significant },
  { name: "below_detection", description: "true/false", value: (r) => r.d.censored },
];

/** Rows of the results table for some survey analyses. */
export function resultRows(analyses: readonly SurveyAnalysis[]): ResultRow[] {
  return analyses.flatMap((a) => a.constituents.map((c) => ({ survey: a.survey.name, c })));
}

/** Rows of the deviations table, with each station's along-channel km. */
export function deviationRows(analyses: readonly SurveyAnalysis[]): DeviationRow[] {
  return analyses.flatMap((a) => {
    const km = new Map(a.stations.map((s) => [s.id, s.alongChannelKm]));
    return a.constituents.flatMap((c) =>
      c.deviations.map((d) => ({ survey: a.survey.name, c, d, alongChannelKm: km.get(d.stationId) })),
    );
  });
}

/** A table rendered from its column spec as CSV (header row, then one line per row). */
export function tableCsv<Row>(columns: ReadonlyArray<ColumnSpec<Row>>, rows: readonly Row[]): string {
  return toCsv(
    columns.map((c) => c.name),
    rows.map((r) => columns.map((c) => c.value(r))),
  );
}

/** A table rendered from its column spec as plain objects (for JSON); missing values are null. */
export function tableObjects<Row>(
  columns: ReadonlyArray<ColumnSpec<Row>>,
  rows: readonly Row[],
): Array<Record<string, string | number | boolean | null>> {
  return rows.map((r) =>
    Object.fromEntries(
      columns.map((c) => {
        const v = c.value(r);
        return [c.name, v === undefined || (typeof v === "number" && !Number.isFinite(v)) ? null : v];
      }),
    ),
  );
}
