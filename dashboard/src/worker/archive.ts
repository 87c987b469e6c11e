/**
 * The archive of the analysed surveys for the dashboard's archive view: the series, relations and
 * statements of analysis/archive (`summarizeArchive`, the function the CLI's `compare` and the
 * briefing use), made here in the worker so the main thread only lays them out.
 */
import { DEFAULT_SEASONS, summarizeArchive, type ArchiveSummary, type Season } from "../../../analysis/index.ts";
import type { AnalysisResult } from "./engine.ts";

/** The fewest surveys the archive view is made for. */
export const ARCHIVE_MIN_SURVEYS = 3;

/** The archive summary of the held analyses, or why there is none. */
export interface ArchiveAnswer {
  summary?: ArchiveSummary;
  reason?: string;
}

/**
 * Summarises the analysed surveys as an archive (analysis/archive `summarizeArchive`).
 *
 * @param analyses the worker's latest analysis of each survey (undefined: not analysed)
 * @param seasons user-defined seasons (default: the analysis' meteorological seasons)
 * @returns the summary, or the reason it was not made (fewer than three analysed surveys, an error)
 */
export function archiveOf(
  analyses: ReadonlyArray<AnalysisResult | undefined>,
  seasons: readonly Season[] = DEFAULT_SEASONS,
): ArchiveAnswer {
  const done = analyses.filter((a): a is AnalysisResult => a !== undefined);
  if (done.length < ARCHIVE_MIN_SURVEYS)
    return {
      reason: `The archive view needs ${ARCHIVE_MIN_SURVEYS} or more analysed surveys; ${done.length} analysed so far.`,
    };
  try {
    return { summary: summarizeArchive(done, { seasons }) };
  } catch (error) {
    return { reason: `The archive could not be summarised: ${error instanceof Error ? error.message : String(error)}` };
  }
}
