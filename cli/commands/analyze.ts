import { parseArgs } from "node:util";
import { writeFileSync } from "node:fs";
import type { Command } from "../command.ts";
import type { LayerChoice, SurveyAnalysis } from "../../analysis/index.ts";
import { analyzeSurvey, SCREENING_CAUTION } from "../../analysis/index.ts";
import {
  checkCenterlinePlacement,
  describeImport,
  loadCenterline,
  loadSurveys,
  parseCount,
  parseDischarge,
} from "../loadInputs.ts";
import { surveyJson, resultsCsv } from "../formatResults.ts";
import { UsageError } from "../exitCodes.ts";

const help = `brackline analyze <survey files...> [options]

Analyses every survey in the files: places stations on the channel (km from the mouth,
cross-channel offset), locates isohalines, and runs the mixing analysis of every constituent
(class, effective river end-member C*0, % change, reaction zone, maximum, fluxes, warnings).

Options:
  --centerline <file.geojson>  channel centerline (LineString, MultiLineString or FeatureCollection)
  --mouth start|end|lon,lat    which end of the main stem is the mouth (default: from the file,
                               else suggested from salinity and stated in the warnings)
  --stations <table.csv>       station table joined to the measurements by station id
  --mapping <mapping.json>     a saved column mapping (as exported by the dashboard)
  --layer surface|bottom|average|<min>-<max>  depth layer per station (default: every row)
  --discharge <Q | name=Q,...> river discharge [m³/s] for all surveys or per survey name
  --draws <n>                  bootstrap draws (default 2000)
  --seed <n>                   bootstrap seed (default 1); identical input and seed give identical output
  --format json|csv            output format (default json)
  --out <file>                 write to a file instead of standard output

JSON output: { caution, import, surveys: [ { name, date, stations: [...], constituents: [...] } ] };
for a single survey, "stations" and "constituents" are also given at the top level.
Field names are documented in the README. Exit codes: 0 ok, 2 bad input, 64 usage, 70 internal error.
${SCREENING_CAUTION}`;

function layerOf(text: string | undefined): LayerChoice | undefined {
  if (text === undefined) return undefined;
  if (text === "surface" || text === "bottom") return { kind: text };
  if (text === "average") return { kind: "depthAveraged" };
  const range = /^(\d+(?:\.\d+)?)-(\d+(?:\.\d+)?)$/.exec(text);
  if (range) return { kind: "depthRange", minM: Number(range[1]), maxM: Number(range[2]) };
  throw new UsageError(`--layer: expected surface, bottom, average or a depth range like 0-2 (m); got "${text}"`);
}

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
        layer: { type: "string" },
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
    const layer = layerOf(values.layer);
    const discharge = parseDischarge(values.discharge);
    const loaded = loadSurveys(positionals, {
      ...(values.stations ? { stationsPath: values.stations } : {}),
      ...(values.mapping ? { mappingPath: values.mapping } : {}),
      ...(layer ? { layer } : {}),
      ...(discharge !== undefined ? { dischargeM3s: discharge } : {}),
    });
    io.err(describeImport(loaded));
    const centerline = values.centerline ? loadCenterline(values.centerline, values.mouth) : undefined;
    if (centerline) checkCenterlinePlacement(values.centerline!, centerline.geojson, loaded.surveys, io.err);
    const network = centerline?.network;
    const draws = parseCount("draws", values.draws, 2000);
    const seed = parseCount("seed", values.seed, 1);
    const analyses: SurveyAnalysis[] = loaded.surveys.map((survey, i) => {
      io.err(`analysing survey ${i + 1}/${loaded.surveys.length}: ${survey.name} (${survey.stations.length} stations)`);
      return analyzeSurvey(survey, { ...(network ? { network } : {}), bootstrapDraws: draws, seed });
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
