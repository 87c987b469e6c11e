/** Reading survey files, station tables and centerlines for the CLI (Node side of analysis/io). */
import { readFileSync, statSync } from "node:fs";
import { basename } from "node:path";
import type {
  ChannelNetwork,
  ColumnMapping,
  ImportResult,
  ImportIssue,
  ImportSummary,
  LayerChoice,
  StationTable,
  Survey,
} from "../analysis/index.ts";
import {
  buildChannelNetwork,
  centerlinePlausibility,
  centerlineVertices,
  mergeSummaries,
  readStationTable,
  readSurveyText,
} from "../analysis/index.ts";
import { InputError } from "./exitCodes.ts";
import { appendAll } from "../analysis/survey/arrayExtent.ts";

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

/** Options for {@link loadSurveys}. */
export interface LoadSurveyOptions {
  stationsPath?: string;
  mappingPath?: string;
  layer?: LayerChoice;
  dischargeM3s?: number | Record<string, number>;
}

/** The surveys of all files, with every import problem and the combined summary. */
export interface LoadedSurveys {
  surveys: Survey[];
  issues: ImportIssue[];
  summary: ImportSummary;
  files: Array<{ file: string; summary: ImportSummary; mapping: ColumnMapping }>;
}

/** Reads survey files (and an optional station table) with the same mapping rules as the dashboard. */
export function loadSurveys(paths: string[], options: LoadSurveyOptions = {}): LoadedSurveys {
  if (paths.length === 0) throw new InputError("no survey file given");
  let stationTable: StationTable | undefined;
  const issues: ImportIssue[] = [];
  if (options.stationsPath) {
    stationTable = readStationTable(readText(options.stationsPath, "station table"), {
      fileName: basename(options.stationsPath),
    });
    appendAll(issues, stationTable.issues);
  }
  let mapping: ColumnMapping | undefined;
  if (options.mappingPath) {
    try {
      mapping = JSON.parse(readText(options.mappingPath, "mapping file")) as ColumnMapping;
    } catch (error) {
      if (error instanceof InputError) throw error;
      throw new InputError(`${options.mappingPath}: row 1, column -: not valid JSON (${(error as Error).message})`);
    }
  }
  const results: ImportResult[] = paths.map((p) =>
    readSurveyText(readText(p, "survey file"), {
      fileName: basename(p),
      ...(mapping ? { mapping } : {}),
      ...(stationTable ? { stationTable } : {}),
      ...(options.layer ? { layer: options.layer } : {}),
      ...(options.dischargeM3s !== undefined ? { riverDischargeM3s: options.dischargeM3s } : {}),
    }),
  );
  const surveys = results.flatMap((r) => r.surveys);
  for (const r of results) appendAll(issues, r.issues);
  const summary = results.map((r) => r.summary).reduce((a, b) => mergeSummaries(a, b));
  if (surveys.length === 0) {
    const first = issues.find((i) => i.severity === "error") ?? issues[0];
    throw new InputError(
      first
        ? `${first.file}: row ${first.row}, column "${first.column}", value "${first.value}": expected ${first.expected}`
        : `${paths.join(", ")}: no survey could be read`,
    );
  }
  return {
    surveys,
    issues,
    summary,
    files: results.map((r, i) => ({ file: basename(paths[i]!), summary: r.summary, mapping: r.mapping })),
  };
}

/** Reads a centerline GeoJSON into a channel network; `mouth` as given on the command line. */
export function loadCenterline(path: string, mouth?: string): { network: ChannelNetwork; geojson: unknown } {
  const text = readText(path, "centerline");
  let geojson: unknown;
  try {
    geojson = JSON.parse(text);
  } catch (error) {
    throw new InputError(`${path}: not valid JSON (${(error as Error).message})`);
  }
  let mouthOption: "start" | "end" | [number, number] | undefined;
  if (mouth === "start" || mouth === "end") mouthOption = mouth;
  else if (mouth !== undefined) {
    const parts = mouth.split(",").map(Number);
    if (parts.length !== 2 || parts.some((x) => !Number.isFinite(x)))
      throw new InputError(`--mouth: expected "start", "end" or "lon,lat"; got "${mouth}"`);
    mouthOption = [parts[0]!, parts[1]!];
  }
  try {
    const network = buildChannelNetwork(
      geojson as Parameters<typeof buildChannelNetwork>[0],
      mouthOption ? { mouth: mouthOption } : {},
    );
    return { network, geojson };
  } catch (error) {
    if (error instanceof RangeError || error instanceof TypeError) throw new InputError(`${path}: ${error.message}`);
    throw error;
  }
}

/**
 * Stops with exit 2 when the centerline is written as [lat, lon] (stations far from it, near when
 * swapped); prints a warning when the stations are merely far from it.
 */
export function checkCenterlinePlacement(
  path: string,
  geojson: unknown,
  surveys: readonly Survey[],
  err: (text: string) => void,
): void {
  const lonLats = surveys.flatMap((s) => s.stations.flatMap((st) => (st.lonLat ? [st.lonLat] : [])));
  const p = centerlinePlausibility(centerlineVertices(geojson), lonLats);
  if (p?.severity === "error") throw new InputError(`${path}: ${p.message}`);
  if (p) err(`warning: ${path}: ${p.message}`);
}

/** Parses `--discharge 450` or `--discharge "wet-2025-03=450,dry-2025-09=60"`. */
export function parseDischarge(text: string | undefined): number | Record<string, number> | undefined {
  if (text === undefined) return undefined;
  const single = Number(text);
  if (Number.isFinite(single)) {
    if (single <= 0) throw new InputError(`--discharge: must be positive m³/s; got "${text}"`);
    return single;
  }
  const out: Record<string, number> = {};
  for (const part of text.split(",")) {
    const [name, q] = part.split("=");
    const value = Number(q);
    if (!name || !Number.isFinite(value) || value <= 0)
      throw new InputError(`--discharge: expected a number or name=value pairs; got "${part}"`);
    out[name.trim()] = value;
  }
  return out;
}

/** Parses a positive integer option. */
export function parseCount(name: string, text: string | undefined, fallback: number): number {
  if (text === undefined) return fallback;
  const n = Number(text);
  if (!Number.isInteger(n) || n < 0) throw new InputError(`--${name}: expected a whole number ≥ 0; got "${text}"`);
  return n;
}

/** One line per import problem class for stderr. */
export function describeImport(loaded: LoadedSurveys): string {
  const s = loaded.summary;
  const reasons = Object.entries(s.rejectedByReason).map(([r, n]) => `${n} ${r}`);
  const lines = [
    `import: ${s.rowsRead} rows read, ${s.rowsAccepted} accepted, ${s.rowsRejected} rejected${reasons.length ? ` (${reasons.join("; ")})` : ""}`,
  ];
  for (const i of loaded.issues.slice(0, 50))
    lines.push(
      `  ${i.severity}: ${i.file} row ${i.row}, column "${i.column}", value "${i.value}": expected ${i.expected}`,
    );
  if (loaded.issues.length > 50)
    lines.push(`  ... and ${loaded.issues.length - 50} more problems (all listed in the JSON output)`);
  return lines.join("\n");
}
