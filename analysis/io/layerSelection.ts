import type { ImportIssue, ValueCell } from "../survey/survey.ts";
import type { ImportedStation } from "./importSummary.ts";
import { makeIssue } from "./importSummary.ts";
import { normaliseStationId } from "./stationIds.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

/** Which part of the water column becomes the one station per station and time. */
export type LayerChoice =
  | { kind: "all" }
  | { kind: "surface" }
  | { kind: "bottom" }
  | { kind: "depthAveraged" }
  | { kind: "depthRange"; minM: number; maxM: number };

/**
 * Combines cells of several depths: the arithmetic mean of the accepted measured values (an
 * unweighted mean of the sampled depths; common practice for discrete bottle samples). With no
 * accepted measured value, a below-detection cell (largest limit) or the first cell is kept.
 * The original text lists every contributing original, separated by " | ".
 */
export function combineCells(cells: readonly ValueCell[]): ValueCell {
  const original = cells.map((c) => c.original).join(" | ");
  const good = cells.filter((c) => c.status === "measured" && c.accepted && c.value !== undefined);
  if (good.length > 0) {
    const mean = good.reduce((a, c) => a + (c.value ?? 0), 0) / good.length;
    return { value: mean, original, status: "measured", accepted: true };
  }
  const bdl = cells.filter((c) => c.status === "belowDetection" && c.accepted);
  if (bdl.length > 0) {
    const limits = bdl.map((c) => c.detectionLimit).filter((x): x is number => x !== undefined);
    const cell: ValueCell = { value: undefined, original, status: "belowDetection", accepted: true };
    if (limits.length > 0) cell.detectionLimit = maxOf(limits);
    return cell;
  }
  const first = cells.find((c) => c.status !== "missing") ?? cells[0];
  return first === undefined
    ? { value: undefined, original, status: "missing", accepted: true }
    : { ...first, original };
}

function pick(rows: ImportedStation[], choice: LayerChoice): ImportedStation[] {
  if (choice.kind === "depthAveraged" || choice.kind === "all") return rows;
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

function merge(rows: ImportedStation[], layer: ImportedStation["layer"]): ImportedStation {
  const first = rows[0];
  const keys = [...new Set(rows.flatMap((r) => Object.keys(r.values)))];
  const values: Record<string, ValueCell> = {};
  for (const k of keys)
    values[k] = combineCells(
      rows.map((r) => r.values[k] ?? { value: undefined, original: "", status: "missing", accepted: true }),
    );
  const depths = rows.map((r) => r.depthM).filter((d): d is number => d !== undefined);
  const out: ImportedStation = {
    ...first,
    values,
    salinity: combineCells(rows.map((r) => r.salinity)),
    contributingRows: rows.map((r) => r.sourceRow),
  };
  if (layer !== undefined) out.layer = layer;
  if (depths.length > 0) out.depthM = depths.reduce((a, b) => a + b, 0) / depths.length;
  else delete out.depthM;
  const temps = rows.map((r) => r.temperatureC).filter((c): c is ValueCell => c !== undefined);
  if (temps.length > 0) out.temperatureC = combineCells(temps);
  const phs = rows.map((r) => r.pH).filter((c): c is ValueCell => c !== undefined);
  if (phs.length > 0) out.pH = combineCells(phs);
  out.lonLat = rows.find((r) => r.lonLat !== undefined)?.lonLat;
  if (out.lonLat === undefined) delete out.lonLat;
  return out;
}

/**
 * Reduces several depths per station and time to one station, keeping the contributing rows.
 * Rows are grouped by survey label, normalised station id and sampling time. "surface"/"bottom"
 * take rows labelled so, else the shallowest/deepest depth; "depthRange" averages rows with
 * minM ≤ depth ≤ maxM; "depthAveraged" averages all rows; "all" keeps every row.
 *
 * @param rows stations as read (one per row)
 * @param choice the layer to keep
 * @param file file name for issues
 * @returns one station per group and a warning for each group with no row in the layer
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
    const key = `${r.surveyLabel ?? ""}\u0000${normaliseStationId(r.id).id}\u0000${r.time ?? ""}`;
    const g = groups.get(key) ?? [];
    g.push(r);
    groups.set(key, g);
  }
  const stations: ImportedStation[] = [];
  const issues: ImportIssue[] = [];
  const layerName =
    choice.kind === "depthAveraged" ? "depthAveraged" : choice.kind === "depthRange" ? "depthRange" : choice.kind;
  for (const g of groups.values()) {
    const chosen = pick(g, choice);
    if (chosen.length === 0) {
      const rowsText = g.map((r) => r.sourceRow).join(", ");
      issues.push(
        makeIssue(
          file,
          g[0].sourceRow,
          "",
          `station ${g[0].id} at ${g[0].time ?? "unknown time"} (rows ${rowsText})`,
          `a sample in the chosen layer (${layerName})`,
          "warning",
        ),
      );
      continue;
    }
    stations.push(merge(chosen, layerName));
  }
  return { stations, issues };
}
