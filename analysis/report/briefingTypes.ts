/**
 * The briefing document model: everything the stakeholder briefing says, built from the
 * numbers by {@link buildBriefing} and turned into one self-contained HTML file by
 * {@link renderBriefingHtml}.
 */
import type { ChannelNetwork } from "../geometry/types.ts";
import type { SurveyComparison, ComparableSurvey } from "../compare/types.ts";
import type { SafeHtml } from "./html.ts";
import type { Finding } from "./findings.ts";
import type { BriefingArchive } from "../archive/archiveSection.ts";
import type { ArchiveSummary } from "../archive/types.ts";

/** A figure: inline SVG built by this module (every data text escaped) with title and caption. */
export interface BriefingFigure {
  id: string;
  title: string;
  caption: string;
  svg: SafeHtml;
  /** Colour key shown under the figure. */
  legend?: Array<{ label: string; color: string }>;
  /** "wide" spans the page; "half" sits beside another half figure. */
  size: "wide" | "half";
}

/** A table of text cells. */
export interface BriefingTable {
  caption: string;
  header: string[];
  rows: string[][];
  /** Optional note printed under the table. */
  note?: string;
}

/** One survey's section. */
export interface BriefingSurvey {
  name: string;
  heading: string;
  facts: Array<[string, string]>;
  findings: Finding[];
  figures: BriefingFigure[];
  table: BriefingTable;
  warnings: string[];
}

/** The comparison section (two or more surveys). */
export interface BriefingComparison {
  findings: string[];
  intrusionTable: BriefingTable;
  scalingNotes: string[];
  shiftTable: BriefingTable;
  figures: BriefingFigure[];
  intervalMethod: string;
}

/** The whole briefing. */
export interface BriefingDocument {
  title: string;
  subtitle: string;
  /** Only when the caller gave a date (output stays byte-identical otherwise). */
  dateText?: string;
  /** Statement shown prominently when the data are invented (demo) data. */
  dataNotice?: string;
  summary: string[];
  surveys: BriefingSurvey[];
  comparison?: BriefingComparison;
  /** Archive section (three or more surveys): series, strip, relations, findings. */
  archive?: BriefingArchive;
  provenance: BriefingTable[];
  methods: string[];
  references: string[];
  cautions: string[];
}

/** A survey file or map file that went into the briefing. */
export interface ProvenanceFile {
  name: string;
  role: "survey" | "stations" | "centerline" | "basemap" | "other";
  bytes?: number;
  sha256?: string;
}

/** Input of {@link buildBriefing}. */
export interface BriefingInput {
  /** Analysed surveys (the pipeline's SurveyAnalysis); the first is the reference for comparisons. */
  analyses: ReadonlyArray<ComparableSurvey & { caution?: string }>;
  /** Channel network for the map (from buildChannelNetwork). */
  network?: ChannelNetwork;
  /** Basemap GeoJSON FeatureCollection (polygons with properties.kind, named points). */
  basemap?: unknown;
  /** Archive summary; computed from the analyses when absent and there are three or more. */
  archive?: ArchiveSummary;
  /** Comparison; computed from the analyses when absent and there are two or more. */
  comparison?: SurveyComparison;
  files?: ProvenanceFile[];
  /** Invented-data statement or other notice about the data, shown at the top. */
  dataNotice?: string;
  title?: string;
  /** Date printed on the briefing (none by default, for byte-identical output). */
  dateText?: string;
  /** Constituents given plots (default: the non-conservative ones with the largest |% change|). */
  keyConstituents?: string[];
  /** Most constituents given plots (default 4). */
  maxKeyConstituents?: number;
  /** Software name and version, bootstrap draws and seed, for the provenance table. */
  software?: string;
  bootstrap?: { draws: number; seed: number };
}
