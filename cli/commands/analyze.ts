import type { Command } from "../command.ts";
import type { SurveyAnalysis } from "../../analysis/index.ts";
import { resultRows, tableCsv, RESULT_COLUMNS, SCREENING_CAUTION } from "../../analysis/index.ts";
import { UsageError } from "../exitCodes.ts";
import { checkOut, writeOut } from "../files.ts";
import {
  CHOICE_HELP,
  DISCHARGE_HELP,
  INPUT_OPTIONS,
  parseCommandLine,
  parseFormat,
  workspaceSettings,
} from "../options.ts";
import { loadWorkspaceOnWorkers } from "../archive/parallelRead.ts";
import { POOL_HELP, POOL_OPTION_NAMES, startWorkersEarly } from "../archive/poolAnalysis.ts";
import { CancelledError, stopWorkers } from "../archive/workerPool.ts";
import { analyzeFiles, EXIT_CANCELLED } from "./compare.ts";

const help = `brackline analyze <survey files...> [options]

Analyses every survey in the files: places stations on the channel (km from the mouth,
cross-channel offset), locates isohalines, and runs the mixing analysis of every constituent
(class, effective river end-member C*0, % change, reaction zone, maximum, fluxes, warnings).
Survey files may be delimited text (CSV, TSV, semicolon), GeoJSON points or CF-netCDF; a GeoJSON
centerline or a station table among them is recognised by its content.

Options:
  --centerline <file.geojson>  channel centerline (LineString, MultiLineString or FeatureCollection)
  --mouth start|end|lon,lat    which end of the main stem is the mouth (default: a mouth Point in the
                               file, else the main line's properties.mouth, else suggested from
                               station salinity; the choice is stated on stderr and in the warnings)
  --stations <table.csv>       station table joined to the measurements by station id
  --mapping <mapping.json>     a saved column mapping (as exported by the dashboard)
  --layer shallowest|surface|bottom|average|all|<min>-<max>
                               one value per station and survey from several depths (default for
                               depth-resolved files: each constituent from the shallowest sample
                               that has it, with that sample's salinity)
  --centerline-out <file>      without --centerline: write the centerline built from the stations
${CHOICE_HELP}
${DISCHARGE_HELP}
  --draws <n>                  bootstrap draws (default 2000, at most 100000)
  --seed <n>                   bootstrap seed (default 1); identical input and seed give identical output
${POOL_HELP}
  --format json|csv            output format (default json); csv is the results table
  --out <file>                 write to a file instead of standard output

JSON output: { caution, mouth, import, surveys: [ { name, date, stations: [...], constituents: [...] } ] };
for a single survey, "stations" and "constituents" are also given at the top level.
Field names are documented in the README. Exit codes: 0 ok, 2 bad input, 64 usage, 70 internal error.
${SCREENING_CAUTION}`;

/** The JSON object of one survey: name, date, survey facts, stations and constituents. */
export function surveyJson(
  a: SurveyAnalysis,
): Record<string, unknown> & { stations: unknown[]; constituents: unknown[] } {
  const { name, ...facts } = a.survey;
  return {
    name,
    date: a.survey.startDate?.slice(0, 10) ?? null,
    ...facts,
    stations: a.stations,
    constituents: a.constituents,
    variables: a.variables ?? [],
    offChannelStations: a.offChannelStations ?? [],
    offChannel: a.offChannel ?? null,
    warnings: a.warnings,
  };
}

export const analyzeCommand: Command = {
  name: "analyze",
  summary: "analyse surveys: stations along the channel and mixing behaviour of every constituent",
  help,
  async run(args, io) {
    const { values, positionals } = parseCommandLine(args, [
      ...INPUT_OPTIONS,
      ...POOL_OPTION_NAMES,
      "format",
      "out",
      "centerline-out",
    ]);
    const format = parseFormat(values.format);
    workspaceSettings(values);
    if (positionals.length === 0) throw new UsageError("give at least one survey file");
    if (values.out !== undefined) checkOut(values.out);
    // Several surveys go through the worker pool; its threads start loading while the files are read.
    const started = startWorkersEarly(positionals, values);
    let inputs;
    try {
      // The survey files are parsed on those workers when there are several.
      inputs = await loadWorkspaceOnWorkers(positionals, values, io, started);
    } catch (error) {
      await stopWorkers(started);
      throw error;
    }
    let analyses: SurveyAnalysis[];
    try {
      ({ analyses } = await analyzeFiles(positionals, values, io, false, inputs, started));
    } catch (error) {
      if (!(error instanceof CancelledError)) throw error;
      io.err(`cancelled after ${error.done} surveys`);
      return EXIT_CANCELLED;
    }
    if (values["centerline-out"] !== undefined && inputs.offeredCenterline && values.centerline === undefined)
      writeOut(values["centerline-out"], `${JSON.stringify(inputs.offeredCenterline, null, 2)}\n`);
    let text: string;
    if (format === "csv") text = tableCsv(RESULT_COLUMNS, resultRows(analyses));
    else {
      const surveys = analyses.map(surveyJson);
      const doc = {
        caution: SCREENING_CAUTION,
        ...(inputs.channel ? { mouth: inputs.channel.mouth } : {}),
        import: {
          summary: inputs.summary,
          files: inputs.files.map((f) => ({
            file: f.file,
            kind: f.kind,
            ...(f.summary ? { summary: f.summary } : {}),
          })),
          issues: inputs.issues,
          notUsed: inputs.files.flatMap((f) => (f.notUsed ?? []).map((u) => ({ file: f.file, ...u }))),
          notices: inputs.notices,
        },
        ...(surveys.length === 1 ? { stations: surveys[0]!.stations, constituents: surveys[0]!.constituents } : {}),
        surveys,
      };
      text = `${JSON.stringify(doc, null, 2)}\n`;
    }
    if (values.out !== undefined) writeOut(values.out, text);
    else io.out(text);
    return 0;
  },
};
