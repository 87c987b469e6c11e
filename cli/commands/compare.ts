import { createHash } from "node:crypto";
import { readFileSync, writeFileSync } from "node:fs";
import { basename } from "node:path";
import { parseArgs } from "node:util";
import type { Command, CommandIo } from "../command.ts";
import type { CenterlineGeoJson, ChannelNetwork, ProvenanceFile, SurveyAnalysis } from "../../analysis/index.ts";
import {
  analyzeSurvey,
  buildChannelNetwork,
  compareSurveys,
  comparisonToCsv,
  SCREENING_CAUTION,
} from "../../analysis/index.ts";
import { describeImport, loadSurveys, parseCount, parseDischarge } from "../loadInputs.ts";
import { InputError, UsageError } from "../exitCodes.ts";
import { ARCHIVE_HELP, ARCHIVE_OPTIONS, compareArchive } from "../archive/compareArchive.ts";
import { CancelledError } from "../archive/workerPool.ts";

/** A map file read for the comparison or briefing, with its provenance. */
export interface MapFile {
  geojson: { type?: unknown; features?: unknown; disclaimer?: unknown };
  file: ProvenanceFile;
}

/** Reads a GeoJSON file with its size and SHA-256 for provenance. */
export function readGeoJsonFile(path: string, role: ProvenanceFile["role"]): MapFile {
  let bytes: Buffer;
  try {
    bytes = readFileSync(path);
  } catch (error) {
    throw new InputError(
      `${path}: cannot read ${role} (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`,
    );
  }
  let geojson: MapFile["geojson"];
  try {
    geojson = JSON.parse(bytes.toString("utf8")) as MapFile["geojson"];
  } catch (error) {
    throw new InputError(`${path}: row 1, column -: not valid JSON (${(error as Error).message})`);
  }
  return {
    geojson,
    file: { name: basename(path), role, bytes: bytes.length, sha256: createHash("sha256").update(bytes).digest("hex") },
  };
}

/**
 * Channel network from a centerline file: Point features (mouth/head markers) are set aside; a
 * Point with properties.role "mouth" gives the mouth unless --mouth says otherwise.
 */
export function channelFromFile(map: MapFile, path: string, mouth?: string): ChannelNetwork {
  const features = Array.isArray(map.geojson.features)
    ? (map.geojson.features as Array<{
        geometry?: { type?: string; coordinates?: unknown };
        properties?: { role?: unknown } | null;
      }>)
    : undefined;
  let mouthOption: "start" | "end" | [number, number] | undefined;
  if (mouth === "start" || mouth === "end") mouthOption = mouth;
  else if (mouth !== undefined) {
    const parts = mouth.split(",").map(Number);
    if (parts.length !== 2 || parts.some((x) => !Number.isFinite(x)))
      throw new UsageError(`--mouth: expected "start", "end" or "lon,lat"; got "${mouth}"`);
    mouthOption = [parts[0]!, parts[1]!];
  }
  const mouthPoint = features?.find((f) => f.geometry?.type === "Point" && f.properties?.role === "mouth")?.geometry
    ?.coordinates;
  if (!mouthOption && Array.isArray(mouthPoint) && mouthPoint.length >= 2)
    mouthOption = [Number(mouthPoint[0]), Number(mouthPoint[1])];
  const lines = features
    ? { ...map.geojson, features: features.filter((f) => f.geometry?.type !== "Point") }
    : map.geojson;
  try {
    return buildChannelNetwork(lines as unknown as CenterlineGeoJson, mouthOption ? { mouth: mouthOption } : {});
  } catch (error) {
    if (error instanceof RangeError || error instanceof TypeError) throw new InputError(`${path}: ${error.message}`);
    throw error;
  }
}

/** Options shared by `compare` and `report`. */
export const SURVEY_OPTIONS = {
  centerline: { type: "string" },
  mouth: { type: "string" },
  stations: { type: "string" },
  mapping: { type: "string" },
  discharge: { type: "string" },
  draws: { type: "string" },
  seed: { type: "string" },
} as const;

/** Reads the survey files and analyses every survey (progress on stderr). */
export function analyzeFiles(
  paths: string[],
  values: { stations?: string; mapping?: string; discharge?: string; draws?: string; seed?: string },
  network: ChannelNetwork | undefined,
  io: CommandIo,
): { analyses: SurveyAnalysis[]; files: ProvenanceFile[]; draws: number; seed: number } {
  const discharge = parseDischarge(values.discharge);
  const loaded = loadSurveys(paths, {
    ...(values.stations ? { stationsPath: values.stations } : {}),
    ...(values.mapping ? { mappingPath: values.mapping } : {}),
    ...(discharge !== undefined ? { dischargeM3s: discharge } : {}),
  });
  io.err(describeImport(loaded));
  const draws = parseCount("draws", values.draws, 2000);
  const seed = parseCount("seed", values.seed, 1);
  const analyses = loaded.surveys.map((survey, i) => {
    io.err(`analysing survey ${i + 1}/${loaded.surveys.length}: ${survey.name} (${survey.stations.length} stations)`);
    return analyzeSurvey(survey, { ...(network ? { network } : {}), bootstrapDraws: draws, seed });
  });
  const files = paths.map((p): ProvenanceFile => {
    const bytes = readFileSync(p);
    return {
      name: basename(p),
      role: "survey",
      bytes: bytes.length,
      sha256: createHash("sha256").update(bytes).digest("hex"),
    };
  });
  return { analyses, files, draws, seed };
}

let cancelled = false;

/** With three or more surveys: the archive output text; undefined for two surveys (or when cancelled). */
async function archivePath(
  paths: string[],
  values: Parameters<typeof analyzeFiles>[1] & Parameters<typeof compareArchive>[3],
  network: ChannelNetwork,
  format: string,
  io: CommandIo,
): Promise<string | undefined> {
  const discharge = parseDischarge(values.discharge);
  const loaded = loadSurveys(paths, {
    ...(values.stations ? { stationsPath: values.stations } : {}),
    ...(values.mapping ? { mappingPath: values.mapping } : {}),
    ...(discharge !== undefined ? { dischargeM3s: discharge } : {}),
  });
  if (loaded.surveys.length < 3) return undefined;
  io.err(describeImport(loaded));
  try {
    return await compareArchive(
      loaded.surveys,
      network,
      { bootstrapDraws: parseCount("draws", values.draws, 2000), seed: parseCount("seed", values.seed, 1) },
      values,
      format === "csv" ? "csv" : "json",
      io,
    );
  } catch (error) {
    if (!(error instanceof CancelledError)) throw error;
    io.err(`cancelled after ${error.done} surveys; they are cached, run the same command again to continue`);
    cancelled = true;
    return undefined;
  }
}

const help = `brackline compare <survey files...> --centerline <line.geojson> [options]

Compares two or more surveys of the same estuary (the first survey read is the reference):
salt intrusion and isohaline positions against river discharge with the apparent exponent n of
L ∝ Q^n (beside the classical −1 and −1/3 and the observed −1/7), and per constituent the shift
of the reaction zone and maximum (km and salinity), the change in C*0, % change and fluxes, each
with an approximate 95 % interval, and class changes.

Options:
  --centerline <file.geojson>  channel centerline (required for km positions)
  --mouth start|end|lon,lat    which end of the main stem is the mouth (default: a "mouth" point in the file)
  --stations <table.csv>       station table joined by station id
  --mapping <mapping.json>     a saved column mapping
  --discharge <Q | name=Q,...> river discharge [m³/s] per survey name (needed for the exponent and fluxes)
  --draws <n>                  bootstrap draws (default 2000)
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
    const { values, positionals } = parseArgs({
      args,
      allowPositionals: true,
      options: {
        ...SURVEY_OPTIONS,
        ...ARCHIVE_OPTIONS,
        format: { type: "string", default: "json" },
        out: { type: "string" },
      },
    });
    if (values.format !== "json" && values.format !== "csv")
      throw new UsageError(`--format: expected json or csv; got "${values.format}"`);
    if (positionals.length === 0) throw new UsageError("give the survey files to compare");
    if (!values.centerline) throw new UsageError("missing --centerline <line.geojson>");
    const network = channelFromFile(readGeoJsonFile(values.centerline, "centerline"), values.centerline, values.mouth);
    const archive = await archivePath(positionals, values, network, values.format, io);
    if (archive !== undefined) {
      if (values.out) writeFileSync(values.out, archive);
      else io.out(archive);
      return 0;
    }
    if (archive === undefined && cancelled) return 130;
    const { analyses } = analyzeFiles(positionals, values, network, io);
    if (analyses.length < 2)
      throw new InputError(
        `${positionals.join(", ")}: ${analyses.length} survey found; compare needs at least 2 (one per file, or a survey column)`,
      );
    io.err(`comparing ${analyses.length} surveys against ${analyses[0]!.survey.name}`);
    const comparison = compareSurveys(analyses);
    const text =
      values.format === "csv"
        ? comparisonToCsv(comparison)
        : `${JSON.stringify({ caution: SCREENING_CAUTION, comparison }, null, 2)}\n`;
    if (values.out) writeFileSync(values.out, text);
    else io.out(text);
    return 0;
  },
};
