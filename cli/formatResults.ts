/** JSON and CSV renderings of survey analyses for the CLI (field names are a documented contract). */
import Papa from "papaparse";
import type { SurveyAnalysis } from "../analysis/index.ts";

type ConstituentAnalysis = SurveyAnalysis["constituents"][number];

/** The JSON object of one survey: name, date, survey facts, stations and constituents. */
export function surveyJson(
  a: SurveyAnalysis,
): Record<string, unknown> & { stations: unknown[]; constituents: ConstituentAnalysis[] } {
  const { name, ...facts } = a.survey;
  return {
    name,
    date: a.survey.startDate?.slice(0, 10) ?? null,
    ...facts,
    stations: a.stations,
    constituents: a.constituents,
    variables: a.variables ?? [],
    offChannelStations: a.offChannelStations ?? [],
    offChannel: a.offChannel ?? null,
    warnings: a.warnings,
  };
}

const round = (x: number | undefined): string => (x === undefined || !Number.isFinite(x) ? "" : String(x));

/** One CSV row per survey and constituent with the headline results and their 95 % intervals. */
export function resultsCsv(analyses: SurveyAnalysis[]): string {
  const rows = analyses.flatMap((a) =>
    a.constituents.map((c) => ({
      survey: a.survey.name,
      constituent: c.name,
      unit: c.unit,
      class: c.class,
      effective_endmember: round(c.effectiveEndmember?.value),
      effective_endmember_lower: round(c.effectiveEndmember?.lower),
      effective_endmember_upper: round(c.effectiveEndmember?.upper),
      percent_change: round(c.percentChange?.value),
      percent_change_lower: round(c.percentChange?.lower),
      percent_change_upper: round(c.percentChange?.upper),
      river_endmember: round(c.endmembers?.river.conc),
      sea_endmember: round(c.endmembers?.sea.conc),
      zone_salinity_from: round(c.reactionZone?.salinity[0]),
      zone_salinity_to: round(c.reactionZone?.salinity[1]),
      zone_km: c.reactionZone?.km.map(([a0, b0]) => `${a0.toFixed(2)}-${b0.toFixed(2)}`).join(" ") ?? "",
      maximum_salinity: round(c.maximum?.salinity.value),
      maximum_km: c.maximum?.km.map((k) => k.toFixed(2)).join(" ") ?? "",
      maximum_excess: round(c.maximum?.excess.value),
      warnings: c.warnings.map((w) => w.message).join(" | "),
    })),
  );
  return Papa.unparse(rows, { newline: "\n" }) + "\n";
}
