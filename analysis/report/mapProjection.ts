import { minOf, maxOf } from "../survey/arrayExtent.ts";
/**
 * A local equirectangular projection fitted to a map frame: x = (λ − λ₀)·cos φ₀,
 * y = φ₀ − φ (degrees, north up), scaled uniformly into the SVG box. Adequate for an
 * estuary-sized map (tens of km), not for continents.
 */

/** Map frame with its projection. */
export interface MapProjection {
  width: number;
  height: number;
  /** Project [lon, lat] → [x, y] in SVG units. */
  project(lonLat: readonly [number, number] | readonly number[]): [number, number];
  /** SVG units per km (east–west and north–south alike). */
  unitsPerKm: number;
}

/** Mean Earth radius [km] (IUGG), for the km scale. */
const EARTH_RADIUS_KM = 6371.0088;

/**
 * Fits a local equirectangular projection to the points: the bounding box padded by `padFraction`,
 * centred, aspect kept; the height follows the extent's aspect within [minHeight, maxHeight].
 *
 * @param points [lon, lat] in degrees (longitudes continuous, no ±180° jump)
 * @param width SVG width (units)
 * @param options padding fraction (default 0.08), height limits (default 260–560)
 * @returns the projection
 * @throws RangeError without any finite point
 * @see Snyder, J.P. (1987) Map Projections — A Working Manual, USGS PP 1395, §12 (equidistant cylindrical).
 */
export function fitProjection(
  points: ReadonlyArray<readonly number[]>,
  width: number,
  options: { padFraction?: number; minHeight?: number; maxHeight?: number } = {},
): MapProjection {
  const pts = points.filter((p) => Number.isFinite(p[0]) && Number.isFinite(p[1]));
  if (!pts.length) throw new RangeError("fitProjection: points must hold at least one finite [lon, lat]");
  const lons = pts.map((p) => p[0]!);
  const lats = pts.map((p) => p[1]!);
  const [w0, e, s, n0] = [minOf(lons), maxOf(lons), minOf(lats), maxOf(lats)];
  let w = w0;
  let n = n0;
  const lat0 = (s + n0) / 2;
  const k = Math.cos((lat0 * Math.PI) / 180);
  let dx = Math.max((e - w) * k, 1e-4);
  let dy = Math.max(n0 - s, 1e-4);
  const pad = options.padFraction ?? 0.08;
  const cx = (w0 + e) / 2;
  const cy = (s + n0) / 2;
  dx *= 1 + 2 * pad;
  dy *= 1 + 2 * pad;
  const minH = options.minHeight ?? 260;
  const maxH = options.maxHeight ?? 500;
  let height = (width * dy) / dx;
  if (height > maxH) {
    height = maxH;
    dx = (dy * width) / height;
  } else if (height < minH) {
    height = minH;
    dy = (dx * height) / width;
  }
  const scale = width / dx; // units per projected degree
  w = cx - dx / 2 / k;
  n = cy + dy / 2;
  return {
    width,
    height,
    project: (p) => [(p[0]! - w) * k * scale, (n - p[1]!) * scale],
    unitsPerKm: scale / ((EARTH_RADIUS_KM * Math.PI) / 180),
  };
}
