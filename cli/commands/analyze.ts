import { parseArgs } from "node:util";
import { writeFileSync } from "node:fs";
import type { Command } from "../command.ts";
import type { SurveyAnalysis } from "../../analysis/index.ts";
import { analyzeSurvey, SCREENING_CAUTION } from "../../analysis/index.ts";
import { describeImport, parseCount, parseDischarge } from "../loadInputs.ts";
import {
  analysisChoices,
  CHOICE_HELP,
  CHOICE_OPTIONS,
  chooseChannel,
  describeChoices,
  loadSurveysWithChoices,
  parseInputChoices,
  readCenterlineFile,
} from "../inputChoices.ts";
import { surveyJson, resultsCsv } from "../formatResults.ts";
import { UsageError } from "../exitCodes.ts";

const help = `brackline analyze <survey files...> [options]

Analyses every survey in the files: places stations on the channel (km from the mouth,
cross-channel offset), locates isohalines, and runs the mixing analysis of every constituent
(class, effective river end-member C*0, % change, reaction zone, maximum, fluxes, warnings).

Options:
  --centerline <file.geojson>  channel centerline (LineString, MultiLineString or FeatureCollection);
                               without one, a centerline is built from the station positions (with a
                               notice), or stations are placed by a station table's distances
  --centerline-out <file>      write the centerline used (e.g. the one built from the stations)
  --mouth start|end|lon,lat    which end of the main stem is the mouth (default: from the file,
                               else suggested from salinity and stated in a notice)
  --stations <table.csv>       station table (id + coordinates and/or along-channel distance)
                               joined to the measurements by station id
${CHOICE_HELP}
  --discharge <Q | name=Q,...> river discharge [m³/s] for all surveys or per survey name
  --draws <n>                  bootstrap draws (default 2000)
  --seed <n>                   bootstrap seed (default 1); identical input and seed give identical output
  --format json|csv            output format (default json)
  --out <file>                 write to a file instead of standard output

JSON output: { caution, import, surveys: [ { name, date, stations: [...], constituents: [...] } ] };
for a single survey, "stations" and "constituents" are also given at the top level.
Field names are documented in the README. Exit codes: 0 ok, 2 bad input, 64 usage, 70 internal error.
${SCREENING_CAUTION}`;

export const analyzeCommand: Command = {
  name: "analyze",
  summary: "analyse surveys: stations along the channel and mixing behaviour of every constituent",
  help,
  async run(args, io) {
    const { values, positionals } = parseArgs({
      args,
      allowPositionals: true,
      options: {
        centerline: { type: "string" },
        mouth: { type: "string" },
        stations: { type: "string" },
        mapping: { type: "string" },
        "centerline-out": { type: "string" },
        ...CHOICE_OPTIONS,
        discharge: { type: "string" },
        draws: { type: "string" },
        seed: { type: "string" },
        format: { type: "string", default: "json" },
        out: { type: "string" },
      },
    });
    if (values.format !== "json" && values.format !== "csv")
      throw new UsageError(`--format: expected json or csv; got "${values.format}"`);
    if (positionals.length === 0) throw new UsageError("give at least one survey file");
    const choices = parseInputChoices(values);
    const discharge = parseDischarge(values.discharge);
    const loaded = loadSurveysWithChoices(positionals, choices, {
      ...(values.stations ? { stationsPath: values.stations } : {}),
      ...(values.mapping ? { mappingPath: values.mapping } : {}),
      ...(discharge !== undefined ? { dischargeM3s: discharge } : {}),
    });
    io.err(describeImport(loaded));
    const channel = chooseChannel(
      loaded,
      values.centerline ? readCenterlineFile(values.centerline) : undefined,
      values.mouth,
    );
    const said = describeChoices(loaded, channel);
    if (said) io.err(said);
    if (values["centerline-out"] && channel.geojson !== undefined)
      writeFileSync(values["centerline-out"], `${JSON.stringify(channel.geojson, null, 2)}\n`);
    const network = channel.network;
    const draws = parseCount("draws", values.draws, 2000);
    const seed = parseCount("seed", values.seed, 1);
    const analyses: SurveyAnalysis[] = loaded.surveys.map((survey, i) => {
      io.err(`analysing survey ${i + 1}/${loaded.surveys.length}: ${survey.name} (${survey.stations.length} stations)`);
      return analyzeSurvey(survey, {
        ...(network ? { network } : {}),
        ...analysisChoices(choices),
        bootstrapDraws: draws,
        seed,
      });
    });
    let text: string;
    if (values.format === "csv") text = resultsCsv(analyses);
    else {
      const surveys = analyses.map(surveyJson);
      const doc = {
        caution: SCREENING_CAUTION,
        import: {
          summary: loaded.summary,
          files: loaded.files.map((f) => ({ file: f.file, summary: f.summary })),
          issues: loaded.issues,
          notUsed: loaded.notUsed,
          notices: [...loaded.notices, ...channel.notices],
        },
        ...(surveys.length === 1 ? { stations: surveys[0]!.stations, constituents: surveys[0]!.constituents } : {}),
        surveys,
      };
      text = `${JSON.stringify(doc, null, 2)}\n`;
    }
    if (values.out) writeFileSync(values.out, text);
    else io.out(text);
    return 0;
  },
};
