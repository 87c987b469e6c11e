import type { ImportIssue, ValueCell } from "../survey/survey.ts";
import type { ImportedStation } from "./importSummary.ts";
import { makeIssue } from "./importSummary.ts";
import { normaliseStationId } from "./stationIds.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";
import { combineCells, hasValue, missingCell, orderDepth, pairSalinity, withSample } from "./layerCells.ts";

export { combineCells } from "./layerCells.ts";

/**
 * Which part of the water column becomes the one station per station id and survey.
 * "shallowest": for each constituent the shallowest sample that has it, paired with that sample's
 * salinity (the default for depth-resolved surveys); "surface"/"bottom": the shallowest/deepest
 * sample of the station for every variable; "depthAveraged": per constituent the mean over the
 * depths that have it, paired with the mean salinity of those depths; "depthRange": the same within
 * minM…maxM; "all": every row (station ids may repeat).
 */
export type LayerChoice =
  | { kind: "all" }
  | { kind: "shallowest" }
  | { kind: "surface" }
  | { kind: "bottom" }
  | { kind: "depthAveraged" }
  | { kind: "depthRange"; minM: number; maxM: number };

/** Names of the layer kinds, as the CLI `--layer` and the dashboard layer control offer them. */
export const LAYER_KINDS = ["shallowest", "surface", "bottom", "depthAveraged", "depthRange", "all"] as const;

function pick(rows: ImportedStation[], choice: LayerChoice): ImportedStation[] {
  if (choice.kind === "depthAveraged" || choice.kind === "all" || choice.kind === "shallowest") return rows;
  if (choice.kind === "depthRange")
    return rows.filter((r) => r.depthM !== undefined && r.depthM >= choice.minM && r.depthM <= choice.maxM);
  const label = choice.kind;
  const labelled = rows.filter((r) => r.layer === label);
  if (labelled.length > 0) return labelled;
  const withDepth = rows.filter((r) => r.depthM !== undefined);
  if (withDepth.length === 0) return rows.length === 1 ? rows : [];
  const depths = withDepth.map((r) => r.depthM as number);
  const target = label === "surface" ? minOf(depths) : maxOf(depths);
  return withDepth.filter((r) => r.depthM === target);
}

/** The rows a value is taken from: the shallowest rows that have it ("shallowest"), else every chosen row that has it. */
function rowsFor(key: (r: ImportedStation) => ValueCell | undefined, rows: ImportedStation[], shallowest: boolean) {
  const having = rows.filter((r) => hasValue(key(r)));
  if (!shallowest || having.length === 0) return having;
  const top = minOf(having.map(orderDepth));
  return having.filter((r) => orderDepth(r) === top);
}

function mean(xs: number[]): number | undefined {
  return xs.length === 0 ? undefined : xs.reduce((a, b) => a + b, 0) / xs.length;
}

function merge(chosen: ImportedStation[], cast: ImportedStation[], choice: LayerChoice): ImportedStation {
  const shallowest = choice.kind === "shallowest";
  const keys = [...new Set(chosen.flatMap((r) => Object.keys(r.values)))];
  const values: Record<string, ValueCell> = {};
  for (const k of keys) {
    const from = rowsFor((r) => r.values[k], chosen, shallowest);
    if (from.length === 0) {
      values[k] = combineCells(chosen.map((r) => r.values[k] ?? missingCell));
      continue;
    }
    const cell = combineCells(from.map((r) => r.values[k] ?? missingCell));
    values[k] = withSample(
      cell,
      pairSalinity(from, shallowest ? cast : chosen),
      mean(from.map((r) => r.depthM ?? NaN).filter(Number.isFinite)),
    );
  }
  const salRows = rowsFor((r) => r.salinity, chosen, shallowest);
  const out: ImportedStation = {
    ...(salRows[0] ?? chosen[0]),
    values,
    salinity: combineCells((salRows.length > 0 ? salRows : chosen).map((r) => r.salinity)),
    contributingRows: chosen.map((r) => r.sourceRow),
  };
  out.layer = choice.kind === "all" ? undefined : choice.kind;
  if (out.layer === undefined) delete out.layer;
  const depthRows = salRows.length > 0 ? salRows : chosen;
  const depthM = mean(depthRows.map((r) => r.depthM).filter((d): d is number => d !== undefined));
  if (depthM !== undefined) out.depthM = depthM;
  else delete out.depthM;
  for (const f of ["temperatureC", "pH"] as const) {
    const from = rowsFor((r) => r[f], chosen, shallowest);
    if (from.length > 0) out[f] = combineCells(from.map((r) => r[f] ?? missingCell));
    else delete out[f];
  }
  out.lonLat = chosen.find((r) => r.lonLat !== undefined)?.lonLat;
  if (out.lonLat === undefined) delete out.lonLat;
  return out;
}

/** Survey, normalised station id: the identity of a station after layering. */
function groupKey(r: ImportedStation): string {
  return `${r.surveyLabel ?? ""}\u0000${normaliseStationId(r.id).id}`;
}

/**
 * Reduces several samples per station (depths, repeated casts) to one station per station id,
 * keeping the contributing rows. Call it on the rows of one survey (station ids are then unique in
 * the survey). See {@link LayerChoice} for the rules; with "shallowest" and "depthAveraged" every
 * value carries the salinity of its own sample(s) (`ValueCell.sampleSalinity`), or of the nearest
 * depth with a salinity (`salinityDepthM` says which).
 *
 * @param rows stations as read (one per row), of one survey
 * @param choice the layer to keep
 * @param file file name for issues
 * @returns one station per station id, a warning per station with no sample in the layer, and
 *   one warning per constituent that has values only outside a strict layer (surface, bottom, range)
 * @throws RangeError when a depth range has minM > maxM or non-finite bounds
 */
export function selectLayer(
  rows: readonly ImportedStation[],
  choice: LayerChoice,
  file: string,
): { stations: ImportedStation[]; issues: ImportIssue[] } {
  if (
    choice.kind === "depthRange" &&
    !(Number.isFinite(choice.minM) && Number.isFinite(choice.maxM) && choice.minM <= choice.maxM)
  ) {
    throw new RangeError(`selectLayer(): depth range needs finite minM ≤ maxM, got ${choice.minM}…${choice.maxM}`);
  }
  if (choice.kind === "all") return { stations: [...rows], issues: [] };
  const groups = new Map<string, ImportedStation[]>();
  for (const r of rows) {
    const key = groupKey(r);
    const g = groups.get(key);
    if (g) g.push(r);
    else groups.set(key, [r]);
  }
  const stations: ImportedStation[] = [];
  const issues: ImportIssue[] = [];
  const lostElsewhere = new Map<string, { n: number; depths: Set<number> }>();
  for (const g of groups.values()) {
    const chosen = pick(g, choice);
    if (chosen.length === 0) {
      issues.push(
        makeIssue(
          file,
          g[0].sourceRow,
          "",
          `station ${g[0].id} (${g.length} samples, rows ${g[0].sourceRow}–${g[g.length - 1].sourceRow})`,
          `a sample in the chosen layer (${choice.kind}); station left out`,
          "warning",
        ),
      );
      continue;
    }
    const st = merge(chosen, g, choice);
    for (const [k, cell] of Object.entries(st.values)) {
      if (hasValue(cell)) continue;
      const other = g.filter((r) => hasValue(r.values[k]));
      if (other.length === 0) continue;
      const e = lostElsewhere.get(k) ?? { n: 0, depths: new Set<number>() };
      e.n += 1;
      for (const r of other) if (r.depthM !== undefined) e.depths.add(r.depthM);
      lostElsewhere.set(k, e);
    }
    stations.push(st);
  }
  for (const [k, e] of lostElsewhere)
    issues.push(
      makeIssue(
        file,
        0,
        k,
        `${e.n} station(s)`,
        `a value of ${k} in the chosen layer (${choice.kind}); these stations have it only at ${[...e.depths].sort((a, b) => a - b).join(", ") || "other"} m — the "shallowest" layer (the default) takes the shallowest sample that has each value`,
        "warning",
      ),
    );
  return { stations, issues };
}

/** How depth-resolved a set of rows is. */
export interface DepthProfileInfo {
  /** Stations (survey label + id + day) sampled at more than one depth. */
  stationsWithSeveralDepths: number;
  /** Largest number of samples of one station on one day. */
  maxSamplesPerStation: number;
}

/**
 * Detects depth-resolved surveys: stations sampled at several depths (or several times) on one day.
 *
 * @param rows stations as read (one per row)
 * @returns counts; `stationsWithSeveralDepths > 0` means layering is needed for one value per station
 */
export function detectDepthProfiles(rows: readonly ImportedStation[]): DepthProfileInfo {
  const groups = new Map<string, ImportedStation[]>();
  for (const r of rows) {
    const k = `${groupKey(r)}\u0000${(r.time ?? "").slice(0, 10)}`;
    const g = groups.get(k) ?? [];
    g.push(r);
    groups.set(k, g);
  }
  let several = 0;
  let most = 0;
  for (const g of groups.values()) {
    most = Math.max(most, g.length);
    if (new Set(g.map((r) => (r.depthM !== undefined ? String(r.depthM) : (r.layer ?? "")))).size > 1) several += 1;
  }
  return { stationsWithSeveralDepths: several, maxSamplesPerStation: most };
}
