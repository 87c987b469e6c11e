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
 * max(minCellM, √(extent area) / maxPoints) and grows by √(occupied / maxPoints) (at least 1.25×)
 * until at most maxPoints cells are occupied.
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
export function decimatePoints(lonDeg: Float64Array, latDeg: Float64Array, values: readonly Float64Array[], options: DecimateOptions): DecimatedPoints {
  const n = lonDeg.length;
  if (latDeg.length !== n || values.some((v) => v.length !== n))
    throw new RangeError(`decimatePoints(): lonDeg, latDeg and values must have the same length (${n})`);
  if (!(options.maxPoints >= 1)) throw new RangeError(`decimatePoints(): options.maxPoints must be ≥ 1, got ${options.maxPoints}`);
  const [w, s, e, nb] = options.bounds ?? [-Infinity, -Infinity, Infinity, Infinity];
  const xs = new Float64Array(n);
  const ys = new Float64Array(n);
  const idx: number[] = [];
  let [x0, y0, x1, y1] = [Infinity, Infinity, -Infinity, -Infinity];
  for (let i = 0; i < n; i++) {
    const lon = lonDeg[i]!;
    const lat = latDeg[i]!;
    if (!(lon >= w && lon <= e && lat >= s && lat <= nb)) continue;
    const x = (xs[i] = mercX(lon));
    const y = (ys[i] = mercY(lat));
    idx.push(i);
    if (x < x0) x0 = x;
    if (x > x1) x1 = x;
    if (y < y0) y0 = y;
    if (y > y1) y1 = y;
  }
  const area = Math.max(1, (x1 - x0) * (y1 - y0));
  // Start from the cell a track crossing the extent would need (√area / maxPoints), then grow.
  let cellM = Math.max(options.minCellM ?? 0, Math.sqrt(area) / options.maxPoints, 1e-3);
  let cells = assign(idx, xs, ys, x0, y0, cellM);
  while (cells.order.length > options.maxPoints) {
    // grow by √(occupied / wanted), at least 1.25×: a few passes for tracks (1-D) and areas (2-D) alike
    cellM *= Math.max(1.25, Math.sqrt(cells.order.length / options.maxPoints));
    cells = assign(idx, xs, ys, x0, y0, cellM);
  }
  return summarise(idx, cells, lonDeg, latDeg, values, cellM);
}

interface Cells {
  /** Cell number of each considered point (parallel to idx). */
  of: Int32Array;
  /** Cell keys in order of first appearance. */
  order: number[];
}

function assign(idx: number[], xs: Float64Array, ys: Float64Array, x0: number, y0: number, cellM: number): Cells {
  const map = new Map<number, number>();
  const of = new Int32Array(idx.length);
  const order: number[] = [];
  let maxX = 0;
  for (const i of idx) maxX = Math.max(maxX, xs[i]! - x0);
  const cols = Math.floor(maxX / cellM) + 1;
  for (let k = 0; k < idx.length; k++) {
    const i = idx[k]!;
    const key = Math.floor((ys[i]! - y0) / cellM) * cols + Math.floor((xs[i]! - x0) / cellM);
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

function summarise(idx: number[], cells: Cells, lonDeg: Float64Array, latDeg: Float64Array, values: readonly Float64Array[], cellM: number): DecimatedPoints {
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
    values.forEach((v, j) => {
      const x = v[i]!;
      if (!Number.isNaN(x)) {
        sums[j]![c]! += x;
        ns[j]![c]!++;
      }
    });
  }
  for (let c = 0; c < m; c++) {
    lon[c]! /= count[c]!;
    lat[c]! /= count[c]!;
    for (let j = 0; j < values.length; j++) sums[j]![c] = ns[j]![c]! > 0 ? sums[j]![c]! / ns[j]![c]! : Number.NaN;
  }
  return { lonDeg: lon, latDeg: lat, values: sums, count, cellM, considered: idx.length };
}
