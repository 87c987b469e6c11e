import { createHash } from "node:crypto";
import { basename } from "node:path";
import type { Command, CommandIo } from "../command.ts";
import type { ProvenanceFile, SurveyAnalysis, SurveyComparison, WorkspaceInputs } from "../../analysis/index.ts";
import { comparisonToCsv, provenanceRoleOf, SCREENING_CAUTION, workspaceComparison } from "../../analysis/index.ts";
import { InputError, UsageError } from "../exitCodes.ts";
import { checkOut, readBytes, writeOut } from "../files.ts";
import {
  INPUT_OPTIONS,
  parseCommandLine,
  parseFormat,
  workspaceSettings,
  type OptionValues,
  CHOICE_HELP,
  DISCHARGE_HELP,
} from "../options.ts";
import { loadWorkspace } from "../workspace.ts";
import { loadWorkspaceOnWorkers } from "../archive/parallelRead.ts";
import { ARCHIVE_HELP, compareArchive } from "../archive/compareArchive.ts";
import { CancelledError, stopWorkers, type StartedWorkers } from "../archive/workerPool.ts";
import { cacheDirOption, reportDischargeTable } from "../archive/archiveOptions.ts";
import { analyzeSurveysThroughPool, POOL_OPTION_NAMES, startWorkersEarly } from "../archive/poolAnalysis.ts";
import { phaseMark } from "../archive/phaseLog.ts";

/** Exit code after Ctrl+C (128 + SIGINT), as shells report it. */
export const EXIT_CANCELLED = 130;

/** Archive options of `compare` (three or more surveys). */
const ARCHIVE_OPTION_NAMES = [...POOL_OPTION_NAMES, "seasons"] as const;

/** Size and SHA-256 of a file, for the briefing's provenance. */
export function provenanceOf(path: string, role: ProvenanceFile["role"]): ProvenanceFile {
  const bytes = readBytes(path, role);
  return { name: basename(path), role, bytes: bytes.length, sha256: createHash("sha256").update(bytes).digest("hex") };
}

/**
 * Reads the files and analyses every survey through the worker pool (progress on stderr; cache only
 * with --cache-dir); with `compare`, compares them too. The results are those of analyzeInputs.
 *
 * @param started workers started before reading ({@link startWorkersEarly}); ended here
 * @throws CancelledError on Ctrl+C
 */
export async function analyzeFiles(
  paths: string[],
  values: OptionValues,
  io: CommandIo,
  compare = false,
  loaded?: WorkspaceInputs,
  started?: StartedWorkers,
): Promise<{
  inputs: WorkspaceInputs;
  analyses: SurveyAnalysis[];
  comparison?: SurveyComparison;
  files: ProvenanceFile[];
  draws: number;
  seed: number;
}> {
  const settings = workspaceSettings(values);
  let inputs: WorkspaceInputs;
  try {
    inputs = loaded ?? loadWorkspace(paths, values, io);
  } catch (error) {
    await stopWorkers(started);
    throw error;
  }
  if (compare && inputs.surveys.length < 2) {
    await stopWorkers(started);
    throw new InputError(
      `${paths.join(", ")}: ${inputs.surveys.length} survey found; compare needs at least 2 (one per file, or a survey column)`,
    );
  }
  for (const [i, s] of inputs.surveys.entries())
    io.err(`analysing survey ${i + 1}/${inputs.surveys.length}: ${s.name} (${s.stations.length} stations)`);
  const cacheDir =
    values["cache-dir"] !== undefined ? cacheDirOption(values["cache-dir"], values["no-cache"]) : undefined;
  const { analyses } = await analyzeSurveysThroughPool(inputs, settings, values, io, cacheDir, started);
  if (settings.dischargeTable) reportDischargeTable(settings.dischargeTable, analyses, io.err);
  const comparison = compare ? workspaceComparison(analyses, {}) : undefined;
  // Each file in the role readInputs recognised (a station table among the positionals is one), and
  // the --stations table, which is not among them.
  const kindOf = new Map(inputs.files.map((f) => [f.file, f.kind]));
  const files = [
    ...paths.map((p) => provenanceOf(p, provenanceRoleOf(kindOf.get(p) ?? kindOf.get(basename(p))))),
    ...(values.stations !== undefined ? [provenanceOf(values.stations, "stations")] : []),
  ];
  return {
    inputs,
    analyses,
    ...(comparison ? { comparison } : {}),
    files,
    draws: settings.bootstrapDraws,
    seed: settings.seed,
  };
}

const help = `brackline compare <survey files...> [--centerline <line.geojson>] [options]

Compares two or more surveys of the same estuary (the first survey read is the reference):
salt intrusion and isohaline positions against river discharge with the apparent exponent n of
L ∝ Q^n (beside the classical −1 and −1/3 and the observed −1/7), and per constituent the shift
of the reaction zone and maximum (km and salinity), the change in C*0, % change and fluxes, each
with an approximate 95 % interval, and class changes.

Options:
  --centerline <file.geojson>  channel centerline (default: one built from the station positions,
                               as in analyze; the choice is stated on stderr)
  --mouth start|end|lon,lat    which end of the main stem is the mouth (default: a "mouth" point in the file)
  --stations <table.csv>       station table joined by station id
  --mapping <mapping.json>     a saved column mapping
  --layer shallowest|surface|bottom|average|all|<min>-<max>  one value per station and survey
${CHOICE_HELP}
${DISCHARGE_HELP}
  --draws <n>                  bootstrap draws (default 2000, at most 100000)
  --seed <n>                   bootstrap seed (default 1); identical input and seed give identical output
  --format json|csv            output format (default json)
  --out <file>                 write to a file instead of standard output

${ARCHIVE_HELP}
${SCREENING_CAUTION}`;

export const compareCommand: Command = {
  name: "compare",
  summary: "compare surveys: salt intrusion vs discharge, shifts of reaction zones, maxima and C*0",
  help,
  async run(args, io) {
    const { values, positionals } = parseCommandLine(args, [
      ...INPUT_OPTIONS,
      ...ARCHIVE_OPTION_NAMES,
      "format",
      "out",
    ]);
    const format = parseFormat(values.format);
    workspaceSettings(values);
    if (positionals.length === 0) throw new UsageError("give the survey files to compare");
    if (values.out !== undefined) checkOut(values.out);
    // Worker threads start loading now, while the files are read.
    const started = startWorkersEarly(positionals, values);
    let inputs: WorkspaceInputs;
    try {
      // The survey files are parsed on those workers when there are several.
      inputs = await loadWorkspaceOnWorkers(positionals, values, io, started);
      phaseMark("inputs ready");
    } catch (error) {
      await stopWorkers(started);
      throw error;
    }
    if (inputs.surveys.length >= 3) {
      let text: string;
      try {
        text = await compareArchive(inputs, workspaceSettings(values), values, format, io, started);
      } catch (error) {
        if (!(error instanceof CancelledError)) throw error;
        io.err(`cancelled after ${error.done} surveys; they are cached: run the same command again to continue`);
        return EXIT_CANCELLED;
      }
      phaseMark("output made");
      if (values.out !== undefined) writeOut(values.out, text);
      else io.out(text);
      phaseMark("output written");
      return 0;
    }
    let analysed: Awaited<ReturnType<typeof analyzeFiles>>;
    try {
      analysed = await analyzeFiles(positionals, values, io, true, inputs, started);
    } catch (error) {
      if (!(error instanceof CancelledError)) throw error;
      io.err(`cancelled after ${error.done} surveys`);
      return EXIT_CANCELLED;
    }
    const { analyses } = analysed;
    io.err(`comparing ${analyses.length} surveys against ${analyses[0]!.survey.name}`);
    const comparison = analysed.comparison!;
    const text =
      format === "csv"
        ? comparisonToCsv(comparison)
        : `${JSON.stringify({ caution: SCREENING_CAUTION, comparison }, null, 2)}\n`;
    if (values.out !== undefined) writeOut(values.out, text);
    else io.out(text);
    return 0;
  },
};
