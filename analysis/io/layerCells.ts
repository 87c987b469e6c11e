import type { ValueCell } from "../survey/survey.ts";
import type { ImportedStation } from "./importSummary.ts";
import { maxOf } from "../survey/arrayExtent.ts";

/**
 * Cell-level helpers of layer selection: combining the cells of several samples and pairing each
 * value with the salinity of the sample(s) it came from.
 */

const MISSING: ValueCell = { value: undefined, original: "", status: "missing", accepted: true };

/** The accepted measured value of a cell, else undefined. */
function accepted(cell: ValueCell | undefined): number | undefined {
  return cell && cell.status === "measured" && cell.accepted && cell.value !== undefined ? cell.value : undefined;
}

/**
 * Combines cells of several depths: the arithmetic mean of the accepted measured values (an
 * unweighted mean of the sampled depths; common practice for discrete bottle samples). With no
 * accepted measured value, a below-detection cell (largest limit) or the first cell is kept.
 * The original text lists every contributing original, separated by " | ".
 *
 * @param cells the cells to combine (any number, also none)
 * @returns one cell keeping every original text
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
  return first === undefined ? { ...MISSING, original } : { ...first, original };
}

/** True when the cell holds something (a value, a censored value, or unreadable text to report). */
export function hasValue(cell: ValueCell | undefined): boolean {
  return cell !== undefined && cell.status !== "missing";
}

/** Depth used to order samples: the numeric depth, else 0 for a surface label and +∞ for a bottom label. */
export function orderDepth(r: ImportedStation): number {
  if (r.depthM !== undefined) return r.depthM;
  if (r.layer === "bottom") return Number.POSITIVE_INFINITY;
  if (r.layer === "middle") return 1e6;
  return 0;
}

/** Result of pairing a value with a salinity. */
export interface PairedSalinity {
  /** Mean accepted salinity of the samples, or of the nearest depth that has one. */
  salinity?: number;
  /** Depth of the salinity used when it came from another depth than the value [m]. */
  fromDepthM?: number;
}

/**
 * The salinity that belongs to a value taken from `rows`: the mean accepted salinity of those
 * rows; when none has one, the accepted salinity of the row of the cast nearest in depth.
 *
 * @param rows the samples the value came from
 * @param cast every sample of the station
 * @returns the salinity and, when taken from another depth, that depth
 */
export function pairSalinity(rows: readonly ImportedStation[], cast: readonly ImportedStation[]): PairedSalinity {
  const own = rows.map((r) => accepted(r.salinity)).filter((s): s is number => s !== undefined);
  if (own.length > 0) return { salinity: own.reduce((a, b) => a + b, 0) / own.length };
  const target = rows.reduce((a, r) => a + orderDepth(r), 0) / Math.max(1, rows.length);
  let best: ImportedStation | undefined;
  for (const r of cast) {
    if (accepted(r.salinity) === undefined) continue;
    if (best === undefined || Math.abs(orderDepth(r) - target) < Math.abs(orderDepth(best) - target)) best = r;
  }
  if (best === undefined) return {};
  return { salinity: accepted(best.salinity), fromDepthM: orderDepth(best) };
}

/** A cell with the salinity (and depth) of the sample it came from. */
export function withSample(cell: ValueCell, paired: PairedSalinity, depthM: number | undefined): ValueCell {
  const out: ValueCell = { ...cell };
  if (paired.salinity !== undefined) out.sampleSalinity = paired.salinity;
  if (depthM !== undefined && Number.isFinite(depthM)) out.sampleDepthM = depthM;
  if (paired.fromDepthM !== undefined && Number.isFinite(paired.fromDepthM)) out.salinityDepthM = paired.fromDepthM;
  return out;
}

export { MISSING as missingCell };
