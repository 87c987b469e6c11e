/**
 * Aggregates dense points for drawing on a software-rendered map: grid cells in Web Mercator metres,
 * one representative point per occupied cell carrying the mean of its members.
 */

/** Web Mercator sphere radius [m] (EPSG:3857; common practice for web maps). */
const R_M = 6378137;
const MAX_MERC_LAT = 85.05112878;

/** Options of {@link decimatePoints}. */
export interface DecimateOptions {
  /** At most this many points are returned (≥ 1). */
  maxPoints: number;
  /** Smallest cell size [Web Mercator m], e.g. metres per screen pixel × a few pixels (default 0: start from the extent). */
  minCellM?: number;
  /** Only points inside [west, south, east, north] (degrees) are considered (default: all). */
  bounds?: [number, number, number, number];
}

/** Representative points: element i is the mean of `count[i]` input points in one grid cell. */
export interface DecimatedPoints {
  lonDeg: Float64Array;
  latDeg: Float64Array;
  /** Mean of each value array over the cell's points with a finite value (NaN when none). */
  values: Float64Array[];
  count: Uint32Array;
  /** Grid cell size used [Web Mercator m]. */
  cellM: number;
  /** Points considered (inside the bounds, finite position). */
  considered: number;
}

function mercX(lon: number): number {
  return (R_M * lon * Math.PI) / 180;
}
function mercY(lat: number): number {
  const l = Math.max(-MAX_MERC_LAT, Math.min(MAX_MERC_LAT, lat));
  return R_M * Math.log(Math.tan(Math.PI / 4 + (l * Math.PI) / 360));
}

/**
 * Grid aggregation for display: points are binned into square cells of size c in Web Mercator
 * metres (x = R·λ, y = R·ln tan(π/4 + φ/2)); each occupied cell gives one point at the mean
 * longitude/latitude of its members with the mean of each value array. The cell starts at
 * max(minCellM, √(extent area / maxPoints)) and grows by √(occupied / maxPoints) (at least 1.25×)
 * until at most maxPoints cells are occupied, then shrinks while fewer than half of maxPoints are
 * occupied (a ship's track fills few squares of its extent) as long as the result still fits.
 * Deterministic: cells are listed in the order their first point appears. Display only.
 *
 * @param lonDeg longitudes [deg]; NaN marks a point without position (skipped)
 * @param latDeg latitudes [deg]
 * @param values arrays of the same length to average per cell (e.g. salinity); NaN values are skipped
 * @param options maxPoints, minCellM [m], bounds [deg]
 * @returns at most maxPoints representative points
 * @throws RangeError when arrays differ in length or maxPoints < 1
 * @see Snyder, J. P. (1987) Map Projections — A Working Manual, USGS PP 1395, eq. 7-1, 7-2 (Mercator).
 */
export function decimatePoints(
  lonDeg: Float64Array,
  latDeg: Float64Array,
  values: readonly Float64Array[],
  options: DecimateOptions,
): DecimatedPoints {
  const n = lonDeg.length;
  if (latDeg.length !== n || values.some((v) => v.length !== n))
    throw new RangeError(`decimatePoints(): lonDeg, latDeg and values must have the same length (${n})`);
  if (!(options.maxPoints >= 1))
    throw new RangeError(`decimatePoints(): options.maxPoints must be ≥ 1, got ${options.maxPoints}`);
  const [w, s, e, nb] = options.bounds ?? [-Infinity, -Infinity, Infinity, Infinity];
  const pidx = new Int32Array(n);
  const px = new Float64Array(n);
  const py = new Float64Array(n);
  let m = 0;
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (let i = 0; i < n; i++) {
    const lon = lonDeg[i]!;
    const lat = latDeg[i]!;
    if (!(lon >= w && lon <= e && lat >= s && lat <= nb)) continue;
    const x = mercX(lon);
    const y = mercY(lat);
    pidx[m] = i;
    px[m] = x;
    py[m++] = y;
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (y < y0) y0 = y;
    if (y > y1) y1 = y;
  }
  const pts: Considered = { idx: pidx.subarray(0, m), x: px.subarray(0, m), y: py.subarray(0, m), x0, y0, x1 };
  const max = options.maxPoints;
  const floor = Math.max(options.minCellM ?? 0, 1e-3);
  // Start from the cell that tiles the extent with about maxPoints squares, grow until it fits...
  let cellM = Math.max(floor, Math.sqrt(Math.max(1, (x1 - x0) * (y1 - y0)) / max));
  let cells = assign(pts, cellM);
  while (cells.order.length > max) {
    cellM *= Math.max(1.25, Math.sqrt(cells.order.length / max));
    cells = assign(pts, cellM);
  }
  // ...then refine while far fewer cells than allowed are occupied (tracks fill few squares).
  for (let pass = 0; pass < 8 && cellM > floor && cells.order.length < 0.5 * max; pass++) {
    const next = Math.max(floor, cellM * Math.max(0.25, (1.1 * cells.order.length) / max));
    const tried = assign(pts, next);
    if (tried.order.length > max) break;
    cellM = next;
    cells = tried;
  }
  return summarise(pts.idx, cells, lonDeg, latDeg, values, cellM);
}

/** The points inside the bounds, in Web Mercator metres, and their extent. */
interface Considered {
  idx: Int32Array;
  x: Float64Array;
  y: Float64Array;
  x0: number;
  y0: number;
  x1: number;
}

interface Cells {
  /** Cell number of each considered point (parallel to idx). */
  of: Int32Array;
  /** Cell keys in order of first appearance. */
  order: number[];
}

function assign(p: Considered, cellM: number): Cells {
  const map = new Map<number, number>();
  const of = new Int32Array(p.idx.length);
  const order: number[] = [];
  const cols = Math.floor((p.x1 - p.x0) / cellM) + 1;
  for (let k = 0; k < p.idx.length; k++) {
    const key = Math.floor((p.y[k]! - p.y0) / cellM) * cols + Math.floor((p.x[k]! - p.x0) / cellM);
    let c = map.get(key);
    if (c === undefined) {
      c = order.length;
      map.set(key, c);
      order.push(key);
    }
    of[k] = c;
  }
  return { of, order };
}

function summarise(
  idx: Int32Array,
  cells: Cells,
  lonDeg: Float64Array,
  latDeg: Float64Array,
  values: readonly Float64Array[],
  cellM: number,
): DecimatedPoints {
  const m = cells.order.length;
  const count = new Uint32Array(m);
  const lon = new Float64Array(m);
  const lat = new Float64Array(m);
  const sums = values.map(() => new Float64Array(m));
  const ns = values.map(() => new Uint32Array(m));
  for (let k = 0; k < idx.length; k++) {
    const i = idx[k]!;
    const c = cells.of[k]!;
    count[c]!++;
    lon[c]! += lonDeg[i]!;
    lat[c]! += latDeg[i]!;
    for (let j = 0; j < values.length; j++) {
      const x = values[j]![i]!;
      if (!Number.isNaN(x)) {
        sums[j]![c]! += x;
        ns[j]![c]!++;
      }
    }
  }
  for (let c = 0; c < m; c++) {
    lon[c]! /= count[c]!;
    lat[c]! /= count[c]!;
    for (let j = 0; j < values.length; j++) sums[j]![c] = ns[j]![c]! > 0 ? sums[j]![c]! / ns[j]![c]! : Number.NaN;
  }
  return { lonDeg: lon, latDeg: lat, values: sums, count, cellM, considered: idx.length };
}
