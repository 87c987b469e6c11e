/**
 * `brackline compare` with three or more surveys: analyse them on worker threads (cached, with
 * progress and cancel), join discharges, summarise the archive and write JSON or the long CSV.
 */
import type { CommandIo } from "../command.ts";
import type { DischargeTable, SurveyAnalysis, SurveyComparison, WorkspaceInputs } from "../../analysis/index.ts";
import { compareSurveys, summarizeArchive } from "../../analysis/index.ts";
import { analyzeArchive } from "./analyzeArchive.ts";
import { surveySetup } from "./surveyTask.ts";
import { cacheDirOption, reportDischargeTable, seasonsOption, threadsOption } from "./archiveOptions.ts";
import { archiveCsv, archiveJson } from "./archiveOutput.ts";
import { stopWorkers, type StartedWorkers } from "./workerPool.ts";
import { phaseMark } from "./phaseLog.ts";

/** Up to this many surveys the JSON also carries the two-survey comparison against the first. */
export const ARCHIVE_COMPARISON_MAX = 4;

/** Options of the archive path of `compare` (as typed on the command line). */
export interface ArchiveCompareValues {
  threads?: string;
  "cache-dir"?: string;
  "no-cache"?: boolean;
  seasons?: string;
}

/** Help lines of the archive options, for `compare --help`. */
export const ARCHIVE_HELP = `With three or more surveys (an archive): series per constituent and the salt intrusion against date,
river discharge, month and season, and year on year (README: series[], intrusion[]).
  --seasons <name=Mon-Mon,...>  seasons for summaries (default meteorological winter/spring/summer/autumn)
  --threads <n>                 threads, this one included (default: all cores; 0 or 1 = this thread only)
  --cache-dir <dir>             per-survey result cache (default ~/.cache/brackline/surveys)
  --no-cache                    analyse every survey again, store nothing
  Ctrl+C cancels; finished surveys stay cached.`;

/**
 * Runs the archive comparison and returns the output text.
 *
 * @throws CancelledError on Ctrl+C (finished surveys are cached)
 */
export async function compareArchive(
  inputs: WorkspaceInputs,
  settings: { bootstrapDraws: number; seed: number; dischargeTable?: DischargeTable },
  values: ArchiveCompareValues,
  format: "json" | "csv",
  io: CommandIo,
  started?: StartedWorkers,
): Promise<string> {
  try {
    const seasons = seasonsOption(values.seasons);
    const threads = threadsOption(values.threads);
    const cacheDir = cacheDirOption(values["cache-dir"], values["no-cache"]);
    const { analyses, stats } = await analyzeArchive(
      { surveys: inputs.surveys, ...surveySetup(inputs, settings) },
      { threads, ...(cacheDir ? { cacheDir } : {}), ...(started ? { started } : {}), io },
    );
    if (settings.dischargeTable) reportDischargeTable(settings.dischargeTable, analyses, io.err);
    io.err(
      `archive: ${stats.analysed} surveys analysed, ${stats.cached} from the cache, in ${stats.seconds.toFixed(1)} s`,
    );
    // Each analysis carries its discharge and where it came from (surveyDischarge, in analyzeInputs).
    const archive = summarizeArchive(analyses as SurveyAnalysis[], seasons ? { seasons } : {});
    phaseMark("archive summarised");
    if (format === "csv") return archiveCsv(archive);
    const comparison: SurveyComparison | undefined =
      analyses.length <= ARCHIVE_COMPARISON_MAX ? compareSurveys(analyses) : undefined;
    return archiveJson(archive, comparison);
  } finally {
    await stopWorkers(started);
  }
}
