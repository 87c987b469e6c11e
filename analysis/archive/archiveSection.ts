/**
 * The briefing's archive section: series figure, channel × time strip, relation to discharge,
 * season and relations tables, and the plain findings that exceed their uncertainty. Surveys are
 * named by their date range and count, never listed.
 */
import { formatSignificant } from "../output/formatNumber.ts";
import type { BriefingFigure, BriefingTable } from "../report/briefingTypes.ts";
import { constituentWords } from "../report/wording.ts";
import { pWords } from "./dischargeRelation.ts";
import { channelTimeStripSvg, dischargeScatterSvg, percentChangeSeriesSvg, seasonColor } from "./archiveFigures.ts";
import { zoneCentreKm } from "./buildSeries.ts";
import type { ArchiveSummary, DischargeRelation, Spread } from "./types.ts";
import { dayMs } from "./timeTicks.ts";

/** The archive section of the briefing. */
export interface BriefingArchive {
  heading: string;
  facts: Array<[string, string]>;
  findings: string[];
  figures: BriefingFigure[];
  tables: BriefingTable[];
  methods: string[];
}

/** "26 surveys, 2016-01-21 to 2021-12-14" — how an archive is named. */
export function archiveName(a: Pick<ArchiveSummary, "nSurveys" | "dateRange">): string {
  const n = `${a.nSurveys} survey${a.nSurveys === 1 ? "" : "s"}`;
  return a.dateRange ? `${n}, ${a.dateRange[0]} to ${a.dateRange[1]}` : n;
}

const spreadText = (s: Spread | undefined): string =>
  s
    ? `${formatSignificant(s.median, 3)} [${formatSignificant(s.q25, 3)} to ${formatSignificant(s.q75, 3)}] (n = ${s.n})`
    : "—";

function relationRow(r: DischargeRelation | undefined): string[] | undefined {
  if (!r?.fit) return undefined;
  const u = r.unit === "%" ? "pp" : r.unit;
  return [
    r.quantity,
    String(r.n),
    `${formatSignificant(r.fit.slope, 2, true)} ${u} (${formatSignificant(r.fit.slopeLower, 2, true)} to ${formatSignificant(r.fit.slopeUpper, 2, true)})`,
    r.spearman ? `${formatSignificant(r.spearman.statistic, 2)} (${pWords(r.spearman.pValue)})` : "—",
    r.exceedsUncertainty ? "larger than the uncertainty" : "within the uncertainty",
  ];
}

/**
 * Builds the archive section from an archive summary.
 *
 * @param a the archive summary
 * @param maxConstituents most constituents given a series panel (default 4; those with most % change values first)
 * @returns heading, facts, findings, figures, tables and methods
 */
export function archiveSection(a: ArchiveSummary, maxConstituents = 4): BriefingArchive {
  const seasons = a.seasons.map((s) => s.name);
  const key = [...a.series]
    .sort((x, y) => y.points.filter((p) => p.percentChange).length - x.points.filter((p) => p.percentChange).length)
    .slice(0, maxConstituents);
  const legend = a.seasons.map((s) => ({ label: s.name, color: seasonColor(s.name, seasons) }));
  // Small multiples share one date axis: every survey of the archive (common practice).
  const surveyDays = a.intrusion.flatMap((p) => {
    const t = dayMs(p.date);
    return t === undefined ? [] : [t];
  });
  const figures: BriefingFigure[] = key.map((s, i) => ({
    id: `arch-pc-${i}`,
    title: `${constituentWords(s.name)}: % change by survey`,
    caption:
      "Net change from river to sea, 100·(C*₀ − C₀)/C₀, of each survey with its 95 % bootstrap interval; below the dashed line = removal. Colour = season.",
    svg: percentChangeSeriesSvg(s, seasons, `arch-pc-${i}`, surveyDays),
    legend,
    size: "half",
  }));
  const stripOf = [...a.series].sort(
    (x, y) =>
      y.points.filter((p) => zoneCentreKm(p) !== undefined).length -
      x.points.filter((p) => zoneCentreKm(p) !== undefined).length,
  )[0];
  figures.push({
    id: "arch-strip",
    title: "Along the channel over time",
    caption: `Salt intrusion of every survey (line)${stripOf ? ` and the reaction zones of ${constituentWords(stripOf.name)} (bars; diamonds = maxima)` : ""}, in km from the mouth.`,
    svg: channelTimeStripSvg(stripOf, a.intrusion, "arch-strip"),
    size: "wide",
  });
  const rel = key[0]?.vsDischarge.percentChange;
  if (rel?.fit && key[0]) {
    const pts = key[0].points.flatMap((p) =>
      p.percentChange && p.dischargeM3s !== undefined && p.dischargeM3s > 0
        ? [{ dischargeM3s: p.dischargeM3s, value: p.percentChange.value, ...(p.season ? { season: p.season } : {}) }]
        : [],
    );
    figures.push({
      id: "arch-q",
      title: `${constituentWords(key[0].name)} % change against river discharge`,
      caption: "Least-squares line on log₁₀ discharge with its 95 % band; colour = season.",
      svg: dischargeScatterSvg(rel, pts, seasons, "arch-q"),
      legend,
      size: "half",
    });
  }
  const seasonTable: BriefingTable = {
    caption: "By season: median [25th to 75th percentile] (number of surveys)",
    header: ["Season", "Months", "Salt intrusion (km)", ...key.map((s) => `${s.name} % change`)],
    rows: a.seasons.map((s, i) => [
      s.name,
      s.months.join(", "),
      spreadText(a.intrusionRelations.bySeason[i]?.saltIntrusionKm),
      ...key.map((k) => spreadText(k.bySeason[i]?.percentChange)),
    ]),
  };
  const relRows = [
    relationRow(a.intrusionRelations.vsDischarge),
    ...a.series.flatMap((s) => [
      relationRow(s.vsDischarge.percentChange),
      relationRow(s.vsDischarge.reactionZoneCentreKm),
    ]),
  ].filter((r): r is string[] => r !== undefined);
  const tables: BriefingTable[] = [seasonTable];
  if (relRows.length)
    tables.push({
      caption: "Against river discharge (slope per tenfold discharge, 95 % interval)",
      header: ["Quantity", "Surveys", "Slope", "Spearman ρ", "Slope against its uncertainty"],
      rows: relRows,
    });
  const withQ = a.intrusion.filter((p) => p.dischargeM3s !== undefined).length;
  return {
    heading: `Survey archive: ${archiveName(a)}`,
    facts: [
      ["Surveys", archiveName(a)],
      ["Seasons", a.seasons.map((s) => `${s.name} (${s.months.join(", ")})`).join("; ")],
      ["River discharge known", `${withQ} of ${a.intrusion.length} surveys`],
      ["Constituents", a.series.map((s) => `${s.name} (${s.unit})`).join(", ")],
    ],
    findings: a.statements.length ? a.statements : ["No relation, season or year difference exceeds its uncertainty."],
    figures,
    tables,
    methods: a.methods,
  };
}
