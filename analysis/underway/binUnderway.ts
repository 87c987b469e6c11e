/**
 * Bins an underway log along the channel (fixed km width) or in salinity classes (fixed width),
 * with count, mean, standard deviation, minimum and maximum of every variable per bin.
 */
import { CELL_DERIVED, CELL_MEASURED, type UnderwayData } from "./types.ts";
import type { UnderwayProjection } from "./projectUnderway.ts";
import { RunningStats, type BinStats } from "./runningStats.ts";

/** How to bin. */
export interface UnderwayBinOptions {
  /** "km": along-channel distance bins (needs a projection); "salinity": salinity classes. */
  by: "km" | "salinity";
  /** Bin width [km] or [salinity]; > 0. */
  width: number;
  /** Records farther from the channel are left out [m] (default: none left out). */
  maxOffsetM?: number;
  /** Only records placed on this branch id (default: every branch). */
  branchId?: string;
}

/** One non-empty bin. */
export interface UnderwayBin {
  /** Bin number: lower edge = index × width. */
  index: number;
  /** Edges [km or salinity]: lower ≤ x < upper. */
  lower: number;
  upper: number;
  /** Records in the bin. */
  n: number;
  /** Mean position of the records [lon, lat] in degrees (arithmetic mean; bins span kilometres, not degrees). */
  meanLonLat: [number, number];
  /** Mean along-channel distance [km] of the records (when projected). */
  meanKm: number | undefined;
  /** First and last record time [ms since 1970 UTC]; undefined without times. */
  startMs: number | undefined;
  endMs: number | undefined;
  /** Statistics by variable name ("salinity", "temperatureC", ...); absent when the bin has no value of it. */
  stats: Record<string, BinStats>;
  /** Source record number (header = 1) of the first record in the bin. */
  firstRow: number;
}

/** Result of {@link binUnderway}. */
export interface UnderwayBins {
  by: "km" | "salinity";
  width: number;
  /** Units of each variable, by name. */
  units: Record<string, string>;
  bins: UnderwayBin[];
  /** Accepted records that fell in no bin (no km or salinity, too far off the channel, other branch). */
  recordsOutside: number;
}

const FN = "binUnderway";

/**
 * Bins the accepted records: bin = ⌊x / width⌋ with x the along-channel distance [km] or the
 * salinity; per bin and variable: n, mean, sample standard deviation (n − 1), min, max (Welford's
 * running update, one pass), plus the mean position, mean km and time span.
 *
 * @param data columns from the underway reader
 * @param projection from projectUnderway (required for by "km"; gives meanKm for by "salinity")
 * @param options by, width [km or salinity], maxOffsetM [m], branchId
 * @returns the non-empty bins in ascending order
 * @throws RangeError for width ≤ 0 or not finite, more than 1e6 bins, a projection of another length,
 *   or an unknown branch id; TypeError when by is "km" without a projection
 * @see Welford, B. P. (1962) Technometrics 4(3), 419–420 (running mean and variance).
 */
export function binUnderway(
  data: UnderwayData,
  projection: UnderwayProjection | undefined,
  options: UnderwayBinOptions,
): UnderwayBins {
  const { by, width } = options;
  if (by !== "km" && by !== "salinity")
    throw new RangeError(`${FN}(): options.by must be "km" or "salinity", got ${String(by)}`);
  if (!(width > 0) || !Number.isFinite(width))
    throw new RangeError(`${FN}(): options.width must be a finite number > 0, got ${width}`);
  if (by === "km" && projection === undefined)
    throw new TypeError(`${FN}(): binning by "km" needs a projection (projectUnderway)`);
  if (projection !== undefined && projection.alongChannelKm.length !== data.n)
    throw new RangeError(`${FN}(): projection has ${projection.alongChannelKm.length} records but data has ${data.n}`);
  let branch = -1;
  if (options.branchId !== undefined) {
    branch = projection?.branchIds.indexOf(options.branchId) ?? -1;
    if (branch < 0)
      throw new RangeError(`${FN}(): options.branchId '${options.branchId}' is not a branch of the projection`);
  }
  const maxOff = options.maxOffsetM ?? Number.POSITIVE_INFINITY;
  const sal = data.columns.find((c) => c.name === "salinity");
  const key = new Float64Array(data.n).fill(Number.NaN);
  let lo = Number.POSITIVE_INFINITY;
  let hi = Number.NEGATIVE_INFINITY;
  let outside = 0;
  for (let i = 0; i < data.n; i++) {
    if (data.accepted[i] !== 1) continue;
    let x = Number.NaN;
    const placed = projection !== undefined && projection.branchIndex[i]! >= 0;
    const onBranch = branch < 0 || (placed && projection!.branchIndex[i] === branch);
    const near = !placed || Math.abs(projection!.offsetM[i]!) <= maxOff;
    if (by === "km") x = placed ? projection!.alongChannelKm[i]! : Number.NaN;
    else if (sal !== undefined && (sal.status[i] === CELL_MEASURED || sal.status[i] === CELL_DERIVED))
      x = sal.values[i]!;
    if (Number.isNaN(x) || !onBranch || !near) {
      outside++;
      continue;
    }
    const b = Math.floor(x / width);
    key[i] = b;
    if (b < lo) lo = b;
    if (b > hi) hi = b;
  }
  const units: Record<string, string> = Object.fromEntries(data.columns.map((c) => [c.name, c.unit]));
  if (lo > hi) return { by, width, units, bins: [], recordsOutside: outside };
  const size = hi - lo + 1;
  if (size > 1e6) throw new RangeError(`${FN}(): width ${width} gives ${size} bins (more than 1e6); use a wider bin`);
  return { by, width, units, bins: accumulate(data, projection, key, lo, size, width), recordsOutside: outside };
}

/** Bin edge i × width, rounded to 12 significant digits so 3 × 0.1 reads 0.3. */
function edge(i: number, width: number): number {
  return Number((i * width).toPrecision(12));
}

function accumulate(
  data: UnderwayData,
  projection: UnderwayProjection | undefined,
  key: Float64Array,
  lo: number,
  size: number,
  width: number,
): UnderwayBin[] {
  const count = new Float64Array(size);
  const lon = new RunningStats(size);
  const lat = new RunningStats(size);
  const km = new RunningStats(size);
  const time = new RunningStats(size);
  const first = new Float64Array(size).fill(Number.POSITIVE_INFINITY);
  const vars = data.columns.map((c) => ({ c, s: new RunningStats(size) }));
  for (let i = 0; i < data.n; i++) {
    const k = key[i]!;
    if (Number.isNaN(k)) continue;
    const b = k - lo;
    count[b]!++;
    if (data.sourceRow[i]! < first[b]!) first[b] = data.sourceRow[i]!;
    lon.add(b, data.lonDeg[i]!);
    lat.add(b, data.latDeg[i]!);
    if (projection !== undefined && projection.branchIndex[i]! >= 0) km.add(b, projection.alongChannelKm[i]!);
    if (!Number.isNaN(data.timeMs[i]!)) time.add(b, data.timeMs[i]!);
    for (const { c, s } of vars)
      if (c.status[i] === CELL_MEASURED || c.status[i] === CELL_DERIVED) s.add(b, c.values[i]!);
  }
  const out: UnderwayBin[] = [];
  for (let b = 0; b < size; b++) {
    if (count[b] === 0) continue;
    const stats: Record<string, BinStats> = {};
    for (const { c, s } of vars) {
      const st = s.get(b);
      if (st !== undefined) stats[c.name] = st;
    }
    const t = time.get(b);
    const index = b + lo;
    out.push({
      index,
      lower: edge(index, width),
      upper: edge(index + 1, width),
      n: count[b]!,
      meanLonLat: [lon.mean[b]!, lat.mean[b]!],
      meanKm: km.get(b)?.mean,
      startMs: t?.min,
      endMs: t?.max,
      stats,
      firstRow: first[b]!,
    });
  }
  return out;
}
