import { toCsv } from "../output/csv.ts";
import type { EstimateDifference, SurveyComparison } from "./types.ts";

/** Column headers of {@link comparisonToCsv}. */
export const COMPARISON_CSV_COLUMNS = [
  "section",
  "reference_survey",
  "survey",
  "constituent",
  "quantity",
  "unit",
  "reference_value",
  "survey_value",
  "difference",
  "difference_lower95",
  "difference_upper95",
  "exceeds_uncertainty",
  "note",
] as const;

const num = (x: number | undefined): string =>
  x === undefined || !Number.isFinite(x) ? "" : String(Number(x.toPrecision(8)));

/**
 * The comparison as one long CSV table (RFC 4180 quoting by papaparse): intrusion rows per
 * survey, scaling exponents, then one row per constituent quantity and survey pair. Numbers
 * carry 8 significant digits; empty cells mean "not available".
 *
 * @param c the comparison
 * @returns CSV text with a header row, lines ending in CRLF (RFC 4180, the one CSV writer in analysis/output/csv.ts)
 */
export function comparisonToCsv(c: SurveyComparison): string {
  const rows: string[][] = [];
  const push = (r: Partial<Record<(typeof COMPARISON_CSV_COLUMNS)[number], string>>): void => {
    rows.push(COMPARISON_CSV_COLUMNS.map((k) => r[k] ?? ""));
  };
  for (const r of c.intrusion) {
    push({
      section: "intrusion",
      reference_survey: c.referenceSurvey,
      survey: r.survey,
      quantity: "river_discharge",
      unit: "m3/s",
      survey_value: num(r.dischargeM3s),
    });
    push({
      section: "intrusion",
      reference_survey: c.referenceSurvey,
      survey: r.survey,
      quantity: `salt_intrusion_S${r.saltIntrusionSalinity}`,
      unit: "km",
      survey_value: num(r.saltIntrusionKm),
    });
    for (const h of r.isohalinesKm)
      push({
        section: "intrusion",
        reference_survey: c.referenceSurvey,
        survey: r.survey,
        quantity: `isohaline_S${h.salinity}`,
        unit: "km",
        survey_value: num(h.km),
      });
  }
  for (const s of c.scaling)
    push({
      section: "scaling",
      quantity: `exponent_n_${s.quantity}`,
      unit: "1",
      survey_value: num(s.exponent),
      difference_lower95: num(s.lower),
      difference_upper95: num(s.upper),
      note: s.note,
    });
  for (const s of c.shifts) {
    const d = (quantity: string, e: EstimateDifference | undefined): void => {
      if (!e) return;
      push({
        section: "constituent",
        reference_survey: s.referenceSurvey,
        survey: s.survey,
        constituent: s.name,
        quantity,
        unit: e.unit,
        reference_value: num(e.reference),
        survey_value: num(e.later),
        difference: num(e.value),
        difference_lower95: e.method === "no-interval" ? "" : num(e.lower),
        difference_upper95: e.method === "no-interval" ? "" : num(e.upper),
        exceeds_uncertainty: e.method === "no-interval" ? "" : String(e.exceedsUncertainty),
      });
    };
    push({
      section: "constituent",
      reference_survey: s.referenceSurvey,
      survey: s.survey,
      constituent: s.name,
      quantity: "class",
      reference_value: s.classReference,
      survey_value: s.classSurvey,
      note: s.classChanged ? "class changed" : "",
    });
    d("zone_salinity_from", s.zone?.salinityFrom);
    d("zone_salinity_to", s.zone?.salinityTo);
    d("zone_km_seaward", s.zone?.kmSeaward);
    d("zone_km_landward", s.zone?.kmLandward);
    d("maximum_salinity", s.maximum?.salinity);
    d("maximum_km", s.maximum?.km);
    d("maximum_excess", s.maximum?.excess);
    d("effective_endmember", s.effectiveEndmember);
    d("percent_change", s.percentChange);
    d("net_flux", s.netFlux);
    d("effective_export", s.effectiveExport);
  }
  return toCsv(COMPARISON_CSV_COLUMNS, rows);
}
