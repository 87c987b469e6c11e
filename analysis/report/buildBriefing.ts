/**
 * Builds the stakeholder briefing document model from analysed surveys.
 */
import { compareSurveys } from "../compare/compareSurveys.ts";
import { formatSignificant } from "../output/formatNumber.ts";
import type { ComparableSurvey } from "../compare/types.ts";
import { SCREENING_CAUTION } from "../output/caution.ts";
import type { StationPlacement } from "../pipeline/surveyAnalysis.ts";
import type { ConstituentAnalysis } from "../mixing/result.ts";
import { readBasemap } from "./basemap.ts";
import type { BriefingDocument, BriefingInput, BriefingTable, ProvenanceFile } from "./briefingTypes.ts";
import { comparisonSection } from "./comparisonSection.ts";
import { briefingReferences, methodsParagraphs } from "./references.ts";
import { datePart } from "./resultsTable.ts";
import { surveySection } from "./surveySection.ts";
import { archiveName, archiveSection } from "../archive/archiveSection.ts";
import { ARCHIVE_KEYS } from "../archive/archiveReferences.ts";
import { referenceList } from "./referencesBibliography.ts";
import { summarizeArchive } from "../archive/summarizeArchive.ts";

/** Up to this many surveys get their own sections and the two-survey comparison; more are an archive. */
export const BRIEFING_LIST_MAX = 4;

/** The caution printed on every briefing: the one caution text (analysis/output/caution.ts). */
export const BRIEFING_CAUTION = SCREENING_CAUTION;

function keyConstituents(a: ComparableSurvey, max: number): string[] {
  return a.constituents
    .filter((c) => c.class !== "conservative" && c.class !== "insufficient-data" && c.percentChange)
    .sort((x, y) => Math.abs(y.percentChange!.value) - Math.abs(x.percentChange!.value) || x.name.localeCompare(y.name))
    .slice(0, max)
    .map((c) => c.name);
}

function dateRangeOf(analyses: BriefingInput["analyses"]): [string, string] | undefined {
  const d = analyses.flatMap((a) => (a.survey.startDate ? [a.survey.startDate.slice(0, 10)] : [])).sort();
  return d.length ? [d[0]!, d[d.length - 1]!] : undefined;
}

/** A provenance role in words. */
const ROLE_WORDS: Record<ProvenanceFile["role"], string> = {
  survey: "survey",
  stations: "station table",
  centerline: "centerline",
  basemap: "basemap",
  other: "other",
};

function provenance(input: BriefingInput): BriefingTable[] {
  const tables: BriefingTable[] = [];
  if (input.files?.length)
    tables.push({
      caption: "Input files",
      header: ["File", "Role", "Size (bytes)", "SHA-256"],
      rows: input.files.map((f) => [
        f.name,
        ROLE_WORDS[f.role],
        f.bytes !== undefined ? String(f.bytes) : "—",
        f.sha256 ?? "—",
      ]),
    });
  if (input.analyses.length > BRIEFING_LIST_MAX) {
    const placed = input.analyses.reduce(
      (n, a) => n + a.stations.filter((s) => s.alongChannelKm !== undefined).length,
      0,
    );
    const withQ = input.analyses.filter((a) => a.survey.riverDischargeM3s !== undefined).length;
    const fromTable = input.analyses.filter((a) => a.survey.dischargeSource?.origin === "table");
    const tableNote = fromTable.length
      ? ` (${fromTable.length} from a discharge table joined by date, ${fromTable.filter((a) => a.survey.dischargeSource?.daysBefore === 0).length} of them on the survey day)`
      : "";
    tables.push({
      caption: "Surveys",
      header: ["Surveys", "Samples", "Placed on channel", "River discharge given"],
      rows: [
        [
          archiveName({
            nSurveys: input.analyses.length,
            ...(dateRangeOf(input.analyses) ? { dateRange: dateRangeOf(input.analyses)! } : {}),
          }),
          String(input.analyses.reduce((n, a) => n + a.stations.length, 0)),
          String(placed),
          `${withQ} of ${input.analyses.length}${tableNote}`,
        ],
      ],
    });
  } else
    tables.push({
      caption: "Surveys",
      header: ["Survey", "Dates", "Samples", "Placed on channel", "Constituents", "River discharge (m³/s)"],
      rows: input.analyses.map((a) => [
        a.survey.name,
        [...new Set([datePart(a.survey.startDate), datePart(a.survey.endDate)].filter(Boolean))].join(" to ") || "—",
        String(a.stations.length),
        String(a.stations.filter((s) => s.alongChannelKm !== undefined).length),
        a.constituents.map((c) => `${c.name} (${c.unit})`).join(", "),
        a.survey.riverDischargeM3s !== undefined
          ? `${formatSignificant(a.survey.riverDischargeM3s, 3)}${a.survey.dischargeSource?.origin === "table" ? ` (table, ${a.survey.dischargeSource.tableDate})` : ""}`
          : "not given",
      ]),
    });
  const sw: string[][] = [["Software", input.software ?? "Brackline"]];
  if (input.bootstrap) sw.push(["Bootstrap", `${input.bootstrap.draws} draws, seed ${input.bootstrap.seed}`]);
  if (input.dateText) sw.push(["Briefing date", input.dateText]);
  tables.push({ caption: "Processing", header: ["Item", "Value"], rows: sw });
  return tables;
}

/**
 * Builds the briefing: summary, one section per survey (facts, findings, map, zone chart, key
 * mixing and channel plots, results table), the survey comparison when there are two or more,
 * data provenance, methods with citations, references and cautions. Deterministic: the same
 * input gives the same document (no clock is read; a date appears only when given).
 *
 * @param input analysed surveys, map data, files, notices (see {@link BriefingInput})
 * @returns the document model, to be rendered by renderBriefingHtml
 * @throws RangeError without any analysed survey
 * @see bibliography keys boyle1974, liss1976, loderReichard1981, officer1979 (methods text: references.ts).
 */
export function buildBriefing(input: BriefingInput): BriefingDocument {
  if (!input || !Array.isArray(input.analyses) || input.analyses.length === 0)
    throw new RangeError("buildBriefing: input.analyses must hold at least one survey analysis");
  const analyses: ReadonlyArray<ComparableSurvey & { caution?: string }> = input.analyses;
  const key = input.keyConstituents ?? keyConstituents(analyses[0]!, input.maxKeyConstituents ?? 4);
  const basemap = readBasemap(input.basemap);
  const isArchive = analyses.length > BRIEFING_LIST_MAX;
  const archiveSummary = input.archive ?? (analyses.length >= 3 ? summarizeArchive(analyses) : undefined);
  const arch = archiveSummary ? archiveSection(archiveSummary) : undefined;
  const surveys = (isArchive ? [] : analyses).map((a, i) =>
    surveySection(a, {
      ...(input.network ? { network: input.network } : {}),
      basemap,
      keyConstituents: key,
      idPrefix: `s${i}`,
    }),
  );
  const comparison = isArchive
    ? undefined
    : (input.comparison ?? (analyses.length >= 2 ? compareSurveys(analyses) : undefined));
  const maxKm =
    input.network?.branches[0]?.kmEnd ??
    Math.max(1, ...analyses.flatMap((a) => a.stations.map((s: StationPlacement) => s.alongChannelKm ?? 0)));
  const cmp = comparison ? comparisonSection(comparison, analyses, maxKm) : undefined;
  const summary: string[] = [];
  for (const s of surveys) {
    const a = analyses.find((x) => x.survey.name === s.name)!;
    const changes = a.constituents
      .filter((c: ConstituentAnalysis) => key.includes(c.name) && c.percentChange)
      .map((c: ConstituentAnalysis) => `${c.name} ${formatSignificant(c.percentChange!.value, 2, true)} %`)
      .join(", ");
    const intr =
      a.survey.saltIntrusionKm !== undefined
        ? `salt (S = ${a.survey.saltIntrusionSalinity}) reached ${formatSignificant(a.survey.saltIntrusionKm, 3)} km from the mouth`
        : "salt intrusion not located";
    const q =
      a.survey.riverDischargeM3s !== undefined ? ` at ${formatSignificant(a.survey.riverDischargeM3s, 3)} m³/s` : "";
    summary.push(`${s.name}${q}: ${intr}${changes ? `; net change river → sea: ${changes}` : ""}.`);
  }
  if (isArchive && arch) summary.push(`${arch.heading}.`, ...arch.findings.slice(0, 5));
  const firstClear = surveys[0]?.findings.find((f) => f.strength === "clear" && f.constituent);
  if (firstClear) summary.push(firstClear.text);
  if (cmp) summary.push(...cmp.findings.slice(0, 2));
  const fitMethod = analyses.flatMap((a) => a.constituents).find((c) => c.fit)?.fit?.method;
  const boot = input.bootstrap ?? analyses.flatMap((a) => a.constituents).find((c) => c.bootstrap)?.bootstrap;
  const cautions = [
    BRIEFING_CAUTION,
    "Each survey is a snapshot of one day; the intervals describe sampling and analytical scatter, not changes between days, tides or seasons.",
  ];
  if (input.dataNotice) cautions.unshift(input.dataNotice);
  return {
    title: input.title ?? "Estuarine mixing briefing",
    subtitle: isArchive
      ? `Surveys: ${archiveName(archiveSummary!)}`
      : `${analyses.length === 1 ? "Survey" : "Surveys"} ${analyses.map((a) => a.survey.name).join(", ")}`,
    ...(input.dateText ? { dateText: input.dateText } : {}),
    ...(input.dataNotice ? { dataNotice: input.dataNotice } : {}),
    summary,
    surveys,
    ...(cmp ? { comparison: cmp } : {}),
    ...(arch ? { archive: arch } : {}),
    provenance: provenance(input),
    methods: methodsParagraphs(fitMethod, boot ? { draws: boot.draws, seed: boot.seed } : undefined, !!cmp),
    references: [...new Set([...briefingReferences(!!cmp), ...(arch ? referenceList(ARCHIVE_KEYS) : [])])],
    cautions,
  };
}
