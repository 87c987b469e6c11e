/**
 * The archive of the analysed surveys for the dashboard's archive view: the series, relations and
 * statements of analysis/archive (`summarizeArchive`, the function the CLI's `compare` and the
 * briefing use), made here in the worker so the main thread only lays them out. A discharge table
 * is joined to each survey inside its analysis (AnalysisSettings.dischargeTable, the CLI's
 * `--discharge-table` rule); here it is only reported, from each survey's stated discharge source.
 */
import {
  DEFAULT_SEASONS,
  dischargeTableReport,
  summarizeArchive,
  type ArchiveSummary,
  type DischargeTableReport,
  type Season,
} from "../../../analysis/index.ts";
import { dischargeTableOf, type AnalysisResult } from "./engine.ts";
import type { TextFile } from "./protocol.ts";

/** The fewest surveys the archive view is made for. */
export const ARCHIVE_MIN_SURVEYS = 3;

/** What a discharge table gave the archive (analysis/archive `dischargeTableReport`). */
export type { DischargeTableReport };

/** The archive summary of the held analyses, or why there is none. */
export interface ArchiveAnswer {
  summary?: ArchiveSummary;
  reason?: string;
  /** Present when a discharge table was given. */
  discharge?: DischargeTableReport;
}

/**
 * Summarises the analysed surveys as an archive (analysis/archive `summarizeArchive`).
 *
 * @param analyses the worker's latest analysis of each survey (undefined: not analysed)
 * @param seasons user-defined seasons (default: the analysis' meteorological seasons)
 * @param dischargeTable the daily discharge table (date, m³/s) the analyses were run with (reported only)
 * @returns the summary, or the reason it was not made (fewer than three analysed surveys, an error)
 */
export function archiveOf(
  analyses: ReadonlyArray<AnalysisResult | undefined>,
  seasons: readonly Season[] = DEFAULT_SEASONS,
  dischargeTable?: TextFile,
): ArchiveAnswer {
  const done = analyses.filter((a): a is AnalysisResult => a !== undefined);
  if (done.length < ARCHIVE_MIN_SURVEYS)
    return {
      reason: `The archive view needs ${ARCHIVE_MIN_SURVEYS} or more analysed surveys; ${done.length} analysed so far.`,
    };
  try {
    const discharge = dischargeTable
      ? dischargeTableReport(
          dischargeTableOf(dischargeTable),
          done.map((a) => a.survey),
        )
      : undefined;
    // Each analysis carries its discharge and where it came from (surveyDischarge in analyzeInputs).
    const summary = summarizeArchive(done, { seasons });
    return { summary, ...(discharge ? { discharge } : {}) };
  } catch (error) {
    return { reason: `The archive could not be summarised: ${error instanceof Error ? error.message : String(error)}` };
  }
}
