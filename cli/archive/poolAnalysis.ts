/**
 * The one way every CLI command that analyses surveys (analyze, compare, report) runs them: through
 * the archive's worker pool (cli/archive/workerPool.ts) with its per-survey cache, progress and
 * cancel. Workers are started before the files are read when the inputs look big enough to need
 * them, and ended unused otherwise.
 */
import type { CommandIo } from "../command.ts";
import type { Survey, SurveyAnalysis, WorkspaceInputs } from "../../analysis/index.ts";
import { analyzeArchive, surveyCost, type ArchiveRunStats } from "./analyzeArchive.ts";
import { threadsOption } from "./archiveOptions.ts";
import { startWorkersIfWorthIt, takePrestarted } from "./earlyStart.ts";
import { surveySetup, type SurveySetup } from "./surveyTask.ts";
import { stopWorkers, type StartedWorkers } from "./workerPool.ts";

/** Pool options of the commands that analyse surveys (as typed on the command line). */
export interface PoolValues {
  threads?: string;
  "cache-dir"?: string;
  "no-cache"?: boolean;
}

/** Names of the pool options, for parseCommandLine. */
export const POOL_OPTION_NAMES = ["threads", "cache-dir", "no-cache"] as const;

/** Help lines of the pool options (analyze, report; compare has them in its archive help). */
export const POOL_HELP = `  --threads <n>                threads analysing several surveys, this one included (default: all
                               cores when the work pays for a worker; 0 or 1 = this thread only)
  --cache-dir <dir>            keep each survey's result there and reuse it when nothing changed
  --no-cache                   analyse every survey again, store nothing`;

/**
 * Work (Σ survey cost × draws, {@link surveyCost}; 1e8 ≈ 1 s of analysis on one core here) below
 * which the default is this thread: each worker thread first loads the code and warms up its
 * compiler (≈ 0.3–0.5 s of CPU), which two small surveys (the demo's two, ≈ 1.1e8) do not repay on
 * a shared 2-core machine. An explicit `--threads` is always honoured.
 */
export const POOL_MIN_WORK = 2e8;
/**
 * Workers for a run, started before the files are read when they will likely be used: those the
 * CLI's entry already started for this command line (cli/archive/earlyStart.ts), else started now
 * by the same rule (explicit `--threads n > 0`, or default threads and two or more survey files of
 * at least 256 KiB together). Pass the result to {@link analyzeSurveysThroughPool}.
 */
export function startWorkersEarly(paths: readonly string[], values: PoolValues): StartedWorkers | undefined {
  return takePrestarted() ?? startWorkersIfWorthIt(paths, values);
}

/**
 * Threads for a run: the explicit `--threads`, else all cores when there are at least two surveys
 * and enough work ({@link POOL_MIN_WORK}), else this thread.
 */
export function poolThreads(surveys: readonly Survey[], draws: number, values: PoolValues): number {
  const threads = threadsOption(values.threads);
  if (values.threads !== undefined || surveys.length < 2) return surveys.length < 2 ? 0 : threads;
  let work = 0;
  for (const s of surveys) work += surveyCost(s) * Math.max(1, draws);
  return work >= POOL_MIN_WORK ? threads : 0;
}

/**
 * Analyses every survey of the inputs through the pool; analyses in survey order, each identical
 * to what analyzeInputs gives for that survey.
 *
 * @param cacheDir the cache directory (undefined: no cache)
 * @param started workers started early ({@link startWorkersEarly}); ended here in every case
 * @throws CancelledError on Ctrl+C (finished surveys are cached)
 */
export async function analyzeSurveysThroughPool(
  inputs: WorkspaceInputs,
  settings: SurveySetup["settings"],
  values: PoolValues,
  io: CommandIo,
  cacheDir: string | undefined,
  started?: StartedWorkers,
): Promise<{ analyses: SurveyAnalysis[]; stats: ArchiveRunStats }> {
  const threads = poolThreads(inputs.surveys, settings.bootstrapDraws ?? 0, values);
  try {
    return await analyzeArchive(
      { surveys: inputs.surveys, ...surveySetup(inputs, settings) },
      {
        threads,
        ...(cacheDir ? { cacheDir } : {}),
        ...(started && threads > 0 ? { started } : {}),
        io,
      },
    );
  } finally {
    await stopWorkers(started);
  }
}
