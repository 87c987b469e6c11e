/**
 * The input choices shared by `analyze`, `compare` and `report` (layer, units, mapping file,
 * off-channel limit, non-mixing variables as tracers) and the reading of survey files with them:
 * station tables given among the survey files, partial mapping files merged with the suggestion,
 * constituents without a unit, numeric columns not used, mouth and centerline from the stations.
 */
import { readFileSync, statSync } from "node:fs";
import { basename } from "node:path";
import type {
  AnalyzeSurveyOptions,
  CenterlineGeoJson,
  ChannelNetwork,
  ColumnMapping,
  ImportIssue,
  ImportResult,
  LayerChoice,
  MissingUnit,
  MixingWarning,
  StationTable,
  UnitOverride,
  UnusedColumn,
} from "../analysis/index.ts";
import {
  applyUnitOverrides,
  centerlineFromStations,
  classifyTable,
  distancesFromMouth,
  headOfText,
  mergeMapping,
  mergeSummaries,
  missingUnits,
  networkWithMouth,
  parseUnitOverride,
  readStationTable,
  readSurveyText,
  suggestMapping,
  unusedColumns,
} from "../analysis/index.ts";
import { InputError, UsageError } from "./exitCodes.ts";
import type { LoadedSurveys } from "./loadInputs.ts";

/** Command-line options of the input choices (spread into a command's parseArgs options). */
export const CHOICE_OPTIONS = {
  layer: { type: "string" },
  unit: { type: "string", multiple: true },
  "off-channel-km": { type: "string" },
  "keep-off-channel": { type: "boolean" },
  "as-tracer": { type: "string", multiple: true },
} as const;

/** Help lines of the input choices. */
export const CHOICE_HELP = `  --layer shallowest|surface|bottom|average|<min>-<max>|all
                               one value per station and survey from several depths (default for
                               depth-resolved files: each constituent from the shallowest sample that
                               has it, with that sample's salinity; "average": mean over the depths
                               that have it; "all": every row)
  --unit "<column>=<unit>"     unit of a column whose header has none (repeatable), e.g.
                               --unit "Silicate=µmol/L"
  --mapping <mapping.json>     column mapping (brackline mapping <file> prints one to edit); a
                               partial mapping is merged with the suggestion
  --off-channel-km <km>        stations farther from the centerline are left out of the fits and
                               listed (default 2)
  --keep-off-channel           keep off-channel stations in the fits (still listed)
  --as-tracer <name>           analyse a non-mixing variable (oxygen, chlorophyll, particles,
                               turbidity) against the dilution line all the same (repeatable)`;

/** The parsed choices. */
export interface InputChoices {
  layer?: LayerChoice;
  units: UnitOverride[];
  offChannelKm?: number;
  keepOffChannel: boolean;
  asTracers: string[];
}

type ChoiceValues = {
  layer?: string | undefined;
  unit?: string[] | undefined;
  "off-channel-km"?: string | undefined;
  "keep-off-channel"?: boolean | undefined;
  "as-tracer"?: string[] | undefined;
};

/** Reads `--layer`. */
export function layerOf(text: string | undefined): LayerChoice | undefined {
  if (text === undefined) return undefined;
  if (text === "surface" || text === "bottom" || text === "shallowest" || text === "all") return { kind: text };
  if (text === "average") return { kind: "depthAveraged" };
  const range = /^(\d+(?:\.\d+)?)-(\d+(?:\.\d+)?)$/.exec(text);
  if (range) return { kind: "depthRange", minM: Number(range[1]), maxM: Number(range[2]) };
  throw new UsageError(
    `--layer: expected shallowest, surface, bottom, average, all or a depth range like 0-2 (m); got "${text}"`,
  );
}

/** Parses the choices from parseArgs values. */
export function parseInputChoices(values: ChoiceValues): InputChoices {
  const units = (values.unit ?? []).map((t) => {
    const o = parseUnitOverride(t);
    if ("error" in o) throw new UsageError(o.error);
    return o;
  });
  let offChannelKm: number | undefined;
  if (values["off-channel-km"] !== undefined) {
    offChannelKm = Number(values["off-channel-km"]);
    if (!(offChannelKm > 0) || !Number.isFinite(offChannelKm))
      throw new UsageError(`--off-channel-km: expected a positive number of km; got "${values["off-channel-km"]}"`);
  }
  const layer = layerOf(values.layer);
  return {
    ...(layer ? { layer } : {}),
    units,
    ...(offChannelKm !== undefined ? { offChannelKm } : {}),
    keepOffChannel: values["keep-off-channel"] === true,
    asTracers: values["as-tracer"] ?? [],
  };
}

/** The analysis options that follow from the choices. */
export function analysisChoices(c: InputChoices): Partial<AnalyzeSurveyOptions> {
  return {
    ...(c.offChannelKm !== undefined ? { offChannelThresholdM: c.offChannelKm * 1000 } : {}),
    ...(c.keepOffChannel ? { keepOffChannel: true } : {}),
    ...(c.asTracers.length > 0 ? { analyseAsTracers: c.asTracers } : {}),
  };
}

function readText(path: string, what: string): string {
  try {
    if (!statSync(path).isFile()) throw new InputError(`${path}: ${what} is not a file`);
    return readFileSync(path, "utf8");
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(
      `${path}: cannot read ${what} (${(error as NodeJS.ErrnoException).code ?? (error as Error).message})`,
    );
  }
}

/** Reads a mapping file as JSON (a clear input error when it is not JSON). */
export function readMappingFile(path: string): unknown {
  try {
    return JSON.parse(readText(path, "mapping file")) as unknown;
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(`${path}: row 1, column -: not valid JSON (${(error as Error).message})`);
  }
}

/** Surveys read with the choices, plus what was not used and the notices. */
export interface ChosenSurveys extends LoadedSurveys {
  notUsed: Array<UnusedColumn & { file: string }>;
  missingUnits: Array<MissingUnit & { file: string }>;
  notices: MixingWarning[];
  stationTable?: StationTable;
}

/**
 * Reads survey files with the choices. A file among them that is a station table (station id and
 * place, no measurements) is used as the station table, with a notice. Stops with an input error
 * (exit 2) listing every constituent column without a unit and the option to add when no dissolved
 * constituent could be read; otherwise such columns are listed as not used.
 */
export function loadSurveysWithChoices(
  paths: string[],
  choices: InputChoices,
  options: { stationsPath?: string; mappingPath?: string; dischargeM3s?: number | Record<string, number> },
): ChosenSurveys {
  if (paths.length === 0) throw new InputError("no survey file given");
  const notices: MixingWarning[] = [];
  const issues: ImportIssue[] = [];
  const texts = paths.map((p) => ({ path: p, text: readText(p, "survey file") }));
  let tablePath = options.stationsPath;
  let tableText = tablePath !== undefined ? readText(tablePath, "station table") : undefined;
  const surveysIn = texts.filter((t) => {
    const head = headOfText(t.text, 200);
    if (classifyTable(head.headers, head.sample) !== "stationTable") return true;
    if (tablePath !== undefined) return true;
    [tablePath, tableText] = [t.path, t.text];
    notices.push({
      code: "stationTableFile",
      message: `${basename(t.path)} has station ids and places but no measurements: it is used as the station table (as with --stations).`,
    });
    return false;
  });
  if (surveysIn.length === 0) throw new InputError(`${paths.join(", ")}: only a station table, no survey file`);
  let stationTable: StationTable | undefined;
  if (tablePath !== undefined && tableText !== undefined) {
    stationTable = readStationTable(tableText, { fileName: basename(tablePath) });
    issues.push(...stationTable.issues);
  }
  const userMapping = options.mappingPath ? readMappingFile(options.mappingPath) : undefined;
  const notUsed: ChosenSurveys["notUsed"] = [];
  const missing: ChosenSurveys["missingUnits"] = [];
  const unmatched = new Set(choices.units);
  const results: ImportResult[] = surveysIn.map(({ path, text }) => {
    const file = basename(path);
    const head = headOfText(text);
    let mapping: ColumnMapping = suggestMapping(head.headers, head.sample);
    if (userMapping !== undefined) {
      const merged = mergeMapping(userMapping, mapping);
      if ("errors" in merged)
        throw new InputError(
          `${options.mappingPath}: not a usable column mapping (see "Column mapping file" in the README):\n  ${merged.errors.join("\n  ")}`,
        );
      mapping = merged.mapping;
    }
    const applied = applyUnitOverrides(mapping, choices.units);
    mapping = applied.mapping;
    for (const o of choices.units) if (!applied.unmatched.includes(o)) unmatched.delete(o);
    missing.push(...missingUnits(mapping).map((m) => ({ ...m, file })));
    notUsed.push(...unusedColumns(mapping, head.headers, head.sample).map((u) => ({ ...u, file })));
    return readSurveyText(text, {
      fileName: file,
      mapping,
      ...(stationTable ? { stationTable } : {}),
      ...(choices.layer ? { layer: choices.layer } : {}),
      ...(options.dischargeM3s !== undefined ? { riverDischargeM3s: options.dischargeM3s } : {}),
    });
  });
  if (unmatched.size > 0)
    throw new InputError(
      `--unit: no column named ${[...unmatched].map((o) => `"${o.column}"`).join(", ")} in ${surveysIn.map((t) => basename(t.path)).join(", ")}`,
    );
  const surveys = results.flatMap((r) => r.surveys);
  const tracers = surveys.flatMap((s) => s.constituents).filter((c) => c.kind !== "nonMixing");
  const missingTracers = missing.filter((m) => m.kind === "tracer");
  if (tracers.length === 0 && missingTracers.length > 0) {
    const lines = missingTracers.map((m) => `  ${m.file}: column "${m.header}" (${m.name}) — add ${m.option}`);
    throw new InputError(
      `no dissolved constituent can be analysed: ${missingTracers.length} constituent column(s) have no unit in the header.\n${lines.join("\n")}\nCheck each unit in the data's documentation; the units shown are examples, not guesses applied for you.`,
    );
  }
  for (const r of results) issues.push(...r.issues);
  if (surveys.length === 0) {
    const first = issues.find((i) => i.severity === "error");
    throw new InputError(
      first
        ? `${first.file}: row ${first.row}, column "${first.column}", value "${first.value}": expected ${first.expected}`
        : `${paths.join(", ")}: no survey could be read`,
    );
  }
  for (const m of missing)
    notUsed.push({ file: m.file, header: m.header, reason: `no unit in the header; add ${m.option} to use it` });
  return {
    surveys,
    issues,
    summary: results.map((r) => r.summary).reduce((a, b) => mergeSummaries(a, b)),
    files: results.map((r, i) => ({ file: basename(surveysIn[i]!.path), summary: r.summary, mapping: r.mapping })),
    notUsed: dedupeNotUsed(notUsed),
    missingUnits: missing,
    notices,
    ...(stationTable ? { stationTable } : {}),
  };
}

function dedupeNotUsed(list: ChosenSurveys["notUsed"]): ChosenSurveys["notUsed"] {
  const seen = new Set<string>();
  return list.filter((u) => {
    const k = `${u.file}\u0000${u.header}`;
    if (seen.has(k)) return false;
    seen.add(k);
    return true;
  });
}

/** Reads `--mouth`. */
export function mouthOf(text: string | undefined): "start" | "end" | [number, number] | undefined {
  if (text === undefined) return undefined;
  if (text === "start" || text === "end") return text;
  const parts = text.split(",").map(Number);
  if (parts.length !== 2 || parts.some((x) => !Number.isFinite(x)))
    throw new UsageError(`--mouth: expected "start", "end" or "lon,lat"; got "${text}"`);
  return [parts[0]!, parts[1]!];
}

/** The channel for the analysis, and how it was obtained. */
export interface ChosenChannel {
  network?: ChannelNetwork;
  /** The centerline GeoJSON used (the file's, or the one built from the stations). */
  geojson?: unknown;
  notices: MixingWarning[];
}

/**
 * The channel network: from the centerline file (mouth as stated, else suggested from salinity);
 * without one, a centerline built from the station positions when at least 3 stations have
 * positions and salinity; otherwise none (stations placed by their distances, oriented by salinity).
 * Also rewrites the surveys' station distances to km from the mouth when no centerline is used.
 */
export function chooseChannel(
  loaded: ChosenSurveys,
  centerline: { path: string; geojson: unknown } | undefined,
  mouthText: string | undefined,
): ChosenChannel {
  const mouth = mouthOf(mouthText);
  const stations = loaded.surveys.flatMap((s) => s.stations);
  const evidence = stations.map((s) => ({
    lonLat: s.lonLat,
    salinity: s.salinity.status === "measured" && s.salinity.accepted ? s.salinity.value : undefined,
  }));
  const build = (geojson: unknown, path: string): ChosenChannel => {
    const lines = withoutPoints(geojson);
    try {
      const r = networkWithMouth(lines as CenterlineGeoJson, mouth ?? pointMouth(geojson), evidence);
      return { network: r.network, geojson, notices: r.notice ? [r.notice] : [] };
    } catch (error) {
      if (error instanceof RangeError || error instanceof TypeError) throw new InputError(`${path}: ${error.message}`);
      throw error;
    }
  };
  if (centerline) return build(centerline.geojson, centerline.path);
  const positioned = evidence.filter((e) => e.lonLat !== undefined && e.salinity !== undefined);
  if (positioned.length >= 3) {
    const line = centerlineFromStations(
      stations.map((s, i) => ({ id: s.id, lonLat: s.lonLat, salinity: evidence[i]!.salinity })),
    );
    if (line !== undefined) {
      const chosen = build(line, "centerline from stations");
      chosen.notices.unshift({
        code: "centerlineFromStations",
        message: `No centerline given: one was built from the station positions, ordered along the salinity gradient and smoothed (${line.properties.stationIds.length} stations on it${line.properties.leftOut.length > 0 ? `; ${line.properties.leftOut.join(", ")} left off it` : ""}). It follows the stations, not the deep channel: check it, save it with --centerline-out and pass an edited one with --centerline.`,
      });
      return chosen;
    }
  }
  const oriented = distancesFromMouth(loaded.surveys);
  loaded.surveys = oriented.surveys;
  return { notices: oriented.notice ? [oriented.notice] : [] };
}

function withoutPoints(geojson: unknown): unknown {
  const g = geojson as { type?: string; features?: Array<{ geometry?: { type?: string } }> };
  return g?.type === "FeatureCollection" && Array.isArray(g.features)
    ? { ...g, features: g.features.filter((f) => f?.geometry?.type !== "Point") }
    : geojson;
}

function pointMouth(geojson: unknown): [number, number] | undefined {
  const g = geojson as {
    features?: Array<{ geometry?: { type?: string; coordinates?: unknown }; properties?: { role?: unknown } | null }>;
  };
  const c = Array.isArray(g?.features)
    ? g.features.find((f) => f?.geometry?.type === "Point" && f.properties?.role === "mouth")?.geometry?.coordinates
    : undefined;
  return Array.isArray(c) && c.length >= 2 ? [Number(c[0]), Number(c[1])] : undefined;
}

/** Stderr lines for the notices and the columns not used. */
export function describeChoices(loaded: ChosenSurveys, channel: ChosenChannel): string {
  const lines: string[] = [];
  for (const n of [...loaded.notices, ...channel.notices]) lines.push(`notice: ${n.message}`);
  if (loaded.notUsed.length > 0) {
    lines.push("columns not used:");
    for (const u of loaded.notUsed) lines.push(`  ${u.file}: "${u.header}" — ${u.reason}`);
  }
  return lines.join("\n");
}

/** Reads a centerline GeoJSON file (a clear input error when it is not JSON). */
export function readCenterlineFile(path: string): { path: string; geojson: unknown } {
  const text = readText(path, "centerline");
  try {
    return { path, geojson: JSON.parse(text) as unknown };
  } catch (error) {
    throw new InputError(`${path}: not valid JSON (${(error as Error).message})`);
  }
}
