import type { ComparableSurvey } from "../compare/types.ts";
import { dischargeScaling } from "../compare/dischargeScaling.ts";
import { classWords, constituentWords } from "../report/wording.ts";
import { buildSeriesPoints, groupRows, zoneCentreKm } from "./buildSeries.ts";
import { dischargeRelation } from "./dischargeRelation.ts";
import { quantityRelations, type QuantityPoint } from "./quantityRelations.ts";
import { DEFAULT_SEASONS, type Season } from "./seasons.ts";
import type { ArchiveSummary, ArchiveWarning, ConstituentSeries, FrontEnd, SeriesPoint } from "./types.ts";

/** How each front end supplies missing river discharges (the "no-discharge" warning's hint). */
export const NO_DISCHARGE_HINT: Readonly<Record<FrontEnd, string>> = {
  cli: "give --discharge or --discharge-table",
  dashboard: "add a discharge table (date, m³/s) in the archive view, or give the survey's discharge",
};

/** Options of {@link summarizeArchive}. */
export interface ArchiveOptions {
  /** Seasons for summaries and the season test (default: meteorological seasons). */
  seasons?: readonly Season[];
}

/** How the archive's intervals, fits and tests are obtained, shown with every archive result. */
export const ARCHIVE_METHODS: readonly string[] = [
  "Per-survey % change, C*₀, reaction zone and maximum come from each survey's own analysis (bootstrap 95 % intervals; Boyle et al. 1974).",
  "Relations to river discharge: least-squares line on log₁₀ discharge with the 95 % t interval of the slope (Draper & Smith 1998, §1.4); Spearman's ρ (Spearman 1904; t approximation) and Kendall's τ-b (Kendall 1938, 1970; normal approximation, tie-corrected). Surveys are weighted equally; each survey's own interval is not propagated into the fit.",
  "Seasons: median and quartiles per season (Hyndman & Fan 1996, type 7); differences between seasons by the Kruskal–Wallis test (Kruskal & Wallis 1952).",
  "Year on year: per year the mean of (value − median of its season over all years) with a t interval made simultaneous over the archive's consecutive-year comparisons (Bonferroni; Dunn 1961); consecutive years differ when the approximate interval of their difference (half-widths in quadrature, Taylor 1997 §3.5) excludes zero.",
  "A finding is stated only when it exceeds its uncertainty: a slope interval excluding zero, p < 0.05 across seasons, or a year difference interval excluding zero.",
];

const toQuantity = (p: { date?: string; season?: string; dischargeM3s?: number }, value: number): QuantityPoint => ({
  ...(p.date !== undefined ? { date: p.date } : {}),
  ...(p.season !== undefined ? { season: p.season } : {}),
  ...(p.dischargeM3s !== undefined ? { dischargeM3s: p.dischargeM3s } : {}),
  value,
});

function constituentSeries(
  name: string,
  unit: string,
  points: SeriesPoint[],
  seasons: readonly Season[],
): ConstituentSeries {
  const label = constituentWords(name);
  const pct = points.flatMap((p) => (p.percentChange ? [toQuantity(p, p.percentChange.value)] : []));
  const { relations, statements } = quantityRelations(pct, seasons, `${label} % change`, "%");
  const zone = points.flatMap((p) => {
    const km = zoneCentreKm(p);
    return km !== undefined && p.dischargeM3s !== undefined && p.dischargeM3s > 0
      ? [{ dischargeM3s: p.dischargeM3s, value: km }]
      : [];
  });
  const zoneRel = zone.length ? dischargeRelation(zone, `${label} reaction-zone centre`, "km") : undefined;
  if (zoneRel?.exceedsUncertainty) statements.push(zoneRel.statement);
  const counts = new Map<string, number>();
  for (const p of points) counts.set(p.class, (counts.get(p.class) ?? 0) + 1);
  const classText = [...counts.entries()]
    .sort((a, b) => b[1] - a[1])
    .map(([c, n]) => `${classWords(c as SeriesPoint["class"])} in ${n}`)
    .join(", ");
  statements.unshift(`${label}: ${classText} of ${points.length} surveys.`);
  const { byMonth, bySeason } = groupRows(
    points,
    { percentChange: (p) => p.percentChange?.value, reactionZoneCentreKm: zoneCentreKm },
    seasons,
  );
  return {
    name,
    unit,
    points,
    byMonth,
    bySeason,
    vsDischarge: {
      ...(relations.vsDischarge ? { percentChange: relations.vsDischarge } : {}),
      ...(zoneRel ? { reactionZoneCentreKm: zoneRel } : {}),
    },
    percentChangeRelations: relations,
    statements,
    warnings: [],
  };
}

/**
 * Summarises an archive of surveys of one estuary: for each constituent a series over the
 * surveys (date, discharge, class, % change and C*₀ with intervals, reaction zone and maximum in
 * km and salinity), month and season summaries, relations of % change and zone position to
 * discharge, the season test and year-on-year differences; the same for the salt-intrusion
 * length (with the apparent exponent of L ∝ Qⁿ); and plain statements only where a finding
 * exceeds its uncertainty.
 *
 * @param analyses analysed surveys (any number ≥ 1), e.g. the pipeline's SurveyAnalysis objects
 * @param options seasons and discharges from outside the survey files
 * @returns the archive summary
 * @throws RangeError for an empty list
 * @see ARCHIVE_METHODS for every method and its citation.
 */
export function summarizeArchive(analyses: readonly ComparableSurvey[], options: ArchiveOptions = {}): ArchiveSummary {
  if (!Array.isArray(analyses) || analyses.length === 0)
    throw new RangeError(`summarizeArchive: analyses must hold at least 1 survey, got ${analyses?.length}`);
  const seasons = options.seasons ?? DEFAULT_SEASONS;
  const { byConstituent, intrusion, warnings } = buildSeriesPoints(analyses, seasons);
  const series = [...byConstituent.entries()].map(([name, e]) => constituentSeries(name, e.unit, e.points, seasons));
  const s0 = intrusion[0]?.saltIntrusionSalinity ?? 2;
  const withL = intrusion.filter((p) => p.saltIntrusionKm !== undefined);
  const intr = quantityRelations(
    withL.map((p) => toQuantity(p, p.saltIntrusionKm!)),
    seasons,
    `Salt intrusion (S = ${s0})`,
    "km",
  );
  const { byMonth, bySeason } = groupRows(intrusion, { saltIntrusionKm: (p) => p.saltIntrusionKm }, seasons);
  const scalingPts = withL.filter((p) => p.dischargeM3s !== undefined && p.dischargeM3s > 0 && p.saltIntrusionKm! > 0);
  const scaling = dischargeScaling(
    scalingPts.map((p) => ({ dischargeM3s: p.dischargeM3s!, lengthKm: p.saltIntrusionKm! })),
    `salt intrusion (S = ${s0})`,
    s0,
  );
  const noQ = intrusion.filter((p) => p.dischargeM3s === undefined).length;
  const allWarnings: ArchiveWarning[] = [...warnings];
  if (noQ)
    allWarnings.push({
      code: "no-discharge",
      message: `River discharge not known for ${noQ} of ${intrusion.length} surveys: they are left out of the relations to discharge.`,
      hint: NO_DISCHARGE_HINT,
    });
  const dates = intrusion.flatMap((p) => (p.date ? [p.date] : [])).sort();
  return {
    nSurveys: analyses.length,
    ...(dates.length ? { dateRange: [dates[0]!, dates[dates.length - 1]!] as [string, string] } : {}),
    seasons: seasons.map((s) => ({ name: s.name, months: [...s.months] })),
    series,
    intrusion,
    intrusionRelations: { ...intr.relations, byMonth, bySeason, ...(scaling ? { scaling } : {}) },
    statements: [...intr.statements, ...series.flatMap((s) => s.statements)],
    methods: [...ARCHIVE_METHODS],
    warnings: allWarnings,
  };
}
