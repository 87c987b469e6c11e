/**
 * The CLI's options, declared once: each command picks the ones it takes by name, and the parsed
 * values become one `InputChoices` for readInputs and one `WorkspaceSettings` for analyzeInputs.
 * A wrong option value is a command-line mistake (exit 64) in every command.
 */
import { basename } from "node:path";
import { parseArgs } from "node:util";
import type { DischargeTable, InputChoices, LayerChoice, MouthOption, WorkspaceSettings } from "../analysis/index.ts";
import { checkSchema, readDischargeTable } from "../analysis/index.ts";
import { parseUnitOverride, partialMappingSchema } from "../analysis/io/mappingChoices.ts";
import { InputError, UsageError } from "./exitCodes.ts";
import { readBytes } from "./files.ts";

import { OPTIONS } from "./optionTable.ts";

export { OPTIONS };

export type OptionName = keyof typeof OPTIONS;
/** Parsed values: text for string options, true/false for boolean ones. */
export type OptionValues = {
  [K in OptionName]?: (typeof OPTIONS)[K] extends { multiple: true }
    ? string[]
    : (typeof OPTIONS)[K]["type"] extends "boolean"
      ? boolean
      : string;
};

/** Options of every command that reads surveys (analyze, compare, report). */
export const INPUT_OPTIONS: readonly OptionName[] = [
  "centerline",
  "mouth",
  "stations",
  "mapping",
  "layer",
  "discharge",
  "discharge-table",
  "draws",
  "seed",
  "unit",
  "off-channel-km",
  "keep-off-channel",
  "as-tracer",
];

/** Help lines of the discharge options (analyze, compare, report). */
export const DISCHARGE_HELP = `  --discharge <Q | name=Q,...> river discharge [m³/s] for all surveys or per survey name (for fluxes)
  --discharge-table <flows.csv> daily discharge (date, m³/s; ft³/s when the header says cfs): a survey
                               without a discharge of its own takes the row of its day, else of the
                               nearest earlier day (at most 31 days before; stated)
  Discharge precedence: --discharge, then the survey file's discharge column, then --discharge-table;
  each survey states the one used ("dischargeSource": origin, statement, tableDate, daysBefore).`;

/** Help lines of the issue-13 input options (analyze, compare, report). */
export const CHOICE_HELP = `  --unit "<column>=<unit>"     unit of a column whose header has none (repeatable), e.g.
                               --unit "Silicate=µmol/L"
  --off-channel-km <km>        stations farther from the centerline are left out of the fits and
                               listed (default 2)
  --keep-off-channel           keep off-channel stations in the fits (still listed)
  --as-tracer <name>           analyse a non-mixing variable (oxygen, chlorophyll, particles,
                               turbidity) against the dilution line all the same (repeatable)`;

/** Largest bootstrap draw count accepted (a larger one is a typo, not an analysis). */
export const MAX_DRAWS = 100_000;

/**
 * Parses a command line with the named options (from {@link OPTIONS}).
 *
 * @throws UsageError for an unknown option or a missing value
 */
export function parseCommandLine(
  args: string[],
  names: readonly OptionName[],
): { values: OptionValues; positionals: string[] } {
  const options = Object.fromEntries(names.map((n) => [n, OPTIONS[n]]));
  try {
    const { values, positionals } = parseArgs({ args, allowPositionals: true, options, strict: true });
    return { values: values as OptionValues, positionals };
  } catch (error) {
    throw new UsageError((error as Error).message);
  }
}

/** Parses a whole number option in [0, max]; a wrong value is a usage error. */
export function parseCount(name: string, text: string | undefined, fallback: number, max = 2 ** 31 - 1): number {
  if (text === undefined) return fallback;
  const n = Number(text);
  if (!/^\s*\d+\s*$/.test(text) || !Number.isSafeInteger(n))
    throw new UsageError(`--${name}: expected a whole number ≥ 0; got "${text}"`);
  if (n > max) throw new UsageError(`--${name}: at most ${max}; got ${text}`);
  return n;
}

/** `--layer shallowest|surface|bottom|average|all|<min>-<max>`. */
export function parseLayer(text: string | undefined): LayerChoice | undefined {
  if (text === undefined) return undefined;
  if (text === "surface" || text === "bottom" || text === "shallowest" || text === "all") return { kind: text };
  if (text === "average") return { kind: "depthAveraged" };
  const range = /^(\d+(?:\.\d+)?)-(\d+(?:\.\d+)?)$/.exec(text);
  if (range && Number(range[1]) <= Number(range[2]))
    return { kind: "depthRange", minM: Number(range[1]), maxM: Number(range[2]) };
  throw new UsageError(
    `--layer: expected shallowest, surface, bottom, average, all or a depth range from-to in m with from ≤ to (like 0-2); got "${text}"`,
  );
}

/** `--mouth start|end|lon,lat`. */
export function parseMouth(text: string | undefined): MouthOption | undefined {
  if (text === undefined) return undefined;
  if (text === "start" || text === "end") return text;
  const parts = text.split(",").map((p) => (p.trim() === "" ? NaN : Number(p)));
  if (parts.length !== 2 || parts.some((x) => !Number.isFinite(x)))
    throw new UsageError(`--mouth: expected "start", "end" or "lon,lat"; got "${text}"`);
  return [parts[0]!, parts[1]!];
}

/** `--discharge 450` or `--discharge "wet-2025-03=450,dry-2025-09=60"` [m³/s]. */
export function parseDischarge(text: string | undefined): number | Record<string, number> | undefined {
  if (text === undefined) return undefined;
  const single = Number(text);
  if (text.trim() !== "" && Number.isFinite(single)) {
    if (single <= 0) throw new UsageError(`--discharge: must be positive m³/s; got "${text}"`);
    return single;
  }
  const out: Record<string, number> = {};
  for (const part of text.split(",")) {
    const [name, q] = part.split("=");
    const value = Number(q);
    if (!name || q === undefined || !Number.isFinite(value) || value <= 0)
      throw new UsageError(`--discharge: expected a number or name=value pairs; got "${part}"`);
    out[name.trim()] = value;
  }
  return out;
}

/** `--format json|csv`. */
export function parseFormat(text: string | undefined): "json" | "csv" {
  if (text === undefined || text === "json" || text === "csv") return text ?? "json";
  throw new UsageError(`--format: expected json or csv; got "${text}"`);
}

/** Reads and checks `--mapping <file.json>`: a saved column mapping object. */
function readMapping(path: string): InputChoices["mapping"] {
  let doc: unknown;
  try {
    doc = JSON.parse(new TextDecoder().decode(readBytes(path, "mapping file")));
  } catch (error) {
    if (error instanceof InputError) throw error;
    throw new InputError(`${path}: row 1: not valid JSON (${(error as Error).message})`);
  }
  const parsed = checkSchema(partialMappingSchema, doc);
  if (!parsed.success) {
    const first = parsed.issues[0];
    const where = first?.path ? ` at ${first.path}` : "";
    throw new InputError(
      `${path}: expected a column mapping object as the dashboard saves it ({ "columns": [...] })${where}: ${first?.message ?? "invalid"}`,
    );
  }
  return { ...parsed.data, shape: parsed.data.shape ?? "", columns: parsed.data.columns } as InputChoices["mapping"];
}

/** The readInputs choices from parsed option values (command-line mistakes throw UsageError first). */
export function inputChoices(values: OptionValues): InputChoices {
  const layer = parseLayer(values.layer);
  const mouth = parseMouth(values.mouth);
  const discharge = parseDischarge(values.discharge);
  const mapping = values.mapping !== undefined ? readMapping(values.mapping) : undefined;
  const unitOverrides: Record<string, string> = {};
  for (const t of values.unit ?? []) {
    const o = parseUnitOverride(t);
    if ("error" in o) throw new UsageError(o.error);
    unitOverrides[o.column] = o.unit;
  }
  let offChannelM: number | undefined;
  if (values["off-channel-km"] !== undefined) {
    const km = Number(values["off-channel-km"]);
    if (!(km > 0) || !Number.isFinite(km))
      throw new UsageError(`--off-channel-km: expected a positive number of km; got "${values["off-channel-km"]}"`);
    offChannelM = km * 1000;
  }
  return {
    ...(mapping ? { mapping } : {}),
    ...(Object.keys(unitOverrides).length > 0 ? { unitOverrides } : {}),
    ...(offChannelM !== undefined ? { offChannelM } : {}),
    ...(values["keep-off-channel"] === true ? { keepOffChannel: true } : {}),
    ...((values["as-tracer"] ?? []).length > 0 ? { analyseAsTracers: values["as-tracer"] } : {}),
    useStationCenterline: true,
    ...(layer ? { layer } : {}),
    ...(mouth !== undefined ? { mouth } : {}),
    ...(discharge !== undefined ? { dischargeM3s: discharge } : {}),
  };
}

const tables = new Map<string, DischargeTable>();

/**
 * `--discharge-table flows.csv`: the table read once per path (readDischargeTable; its row problems
 * are reported with the analysis, cli/archive/archiveOptions.ts `reportDischargeTable`).
 *
 * @throws InputError when the file cannot be read or has no usable row
 */
export function dischargeTableOption(path: string): DischargeTable {
  const known = tables.get(path);
  if (known) return known;
  const table = readDischargeTable(new TextDecoder().decode(readBytes(path, "discharge table")), basename(path));
  if (table.rows.length === 0) {
    const first = table.issues[0];
    throw new InputError(
      `${path}: no usable row (expected a date column and a discharge column in m³/s)${first ? `; row ${first.row}, column "${first.column}", value "${first.value}": expected ${first.expected}` : ""}`,
    );
  }
  tables.set(path, table);
  return table;
}

/** The analyzeInputs settings from parsed option values (`--discharge-table` is read here). */
export function workspaceSettings(values: OptionValues): WorkspaceSettings & { bootstrapDraws: number; seed: number } {
  const table = values["discharge-table"] !== undefined ? dischargeTableOption(values["discharge-table"]) : undefined;
  return {
    bootstrapDraws: parseCount("draws", values.draws, 2000, MAX_DRAWS),
    seed: parseCount("seed", values.seed, 1),
    ...(table ? { dischargeTable: table } : {}),
  };
}
