/** A problem found by {@link centerlinePlausibility}. */
export interface CenterlinePlausibility {
  /** "error" when the centerline is almost certainly written as [lat, lon]; "warning" when merely far. */
  severity: "error" | "warning";
  message: string;
  /** Median distance of the stations to the line as written [km]. */
  medianDistanceKm: number;
}

/** Stations further than this from the line (median) make it implausible [km] (common practice: an estuary's stations lie within a few km of its channel). */
export const CENTERLINE_FAR_KM = 50;

const KM_PER_DEG = 111.195;

/** Every [x, y] vertex of a GeoJSON centerline (Feature, FeatureCollection, geometry; Point markers skipped). */
export function centerlineVertices(geojson: unknown): [number, number][] {
  const out: [number, number][] = [];
  const walk = (coords: unknown, depth: number): void => {
    if (!Array.isArray(coords) || depth > 4) return;
    if (coords.length >= 2 && typeof coords[0] === "number" && typeof coords[1] === "number") {
      out.push([coords[0], coords[1]]);
      return;
    }
    for (const c of coords) walk(c, depth + 1);
  };
  const visit = (g: unknown): void => {
    if (g === null || typeof g !== "object") return;
    const o = g as { type?: unknown; geometry?: unknown; features?: unknown; coordinates?: unknown };
    if (o.type === "FeatureCollection" && Array.isArray(o.features)) for (const f of o.features) visit(f);
    else if (o.type === "Feature") visit(o.geometry);
    else if (o.type === "LineString" || o.type === "MultiLineString") walk(o.coordinates, 0);
  };
  visit(geojson);
  return out;
}

function every<T>(xs: readonly T[], max: number): T[] {
  if (xs.length <= max) return [...xs];
  const step = xs.length / max;
  return Array.from({ length: max }, (_, i) => xs[Math.floor(i * step)] as T);
}

function medianNearestKm(line: readonly [number, number][], stations: readonly [number, number][]): number {
  const d = stations.map(([lon, lat]) => {
    const k = Math.cos((lat * Math.PI) / 180);
    let best = Infinity;
    for (const [vx, vy] of line) {
      const dx = (vx - lon) * k;
      const dy = vy - lat;
      const dd = dx * dx + dy * dy;
      if (dd < best) best = dd;
    }
    return Math.sqrt(best) * KM_PER_DEG;
  });
  d.sort((a, b) => a - b);
  return d[Math.floor(d.length / 2)] ?? 0;
}

/**
 * Checks that a centerline and the stations lie in the same place: the median distance from each
 * station to the nearest line vertex (equirectangular approximation; up to 5,000 vertices and 500
 * stations sampled evenly). When the stations are more than {@link CENTERLINE_FAR_KM} km away and
 * ten times nearer to the line with each vertex's two numbers swapped, the file is written as
 * [lat, lon] (GeoJSON, RFC 7946 §3.1.1, writes [lon, lat]): an error. Far without that: a warning.
 *
 * @param vertices the line's vertices as written (see {@link centerlineVertices})
 * @param stationLonLats station positions [lon, lat]
 * @returns the problem, or undefined when the line is plausible or there is too little to compare
 * @see Butler, H. et al. (2016) The GeoJSON Format, IETF RFC 7946, §3.1.1 (position order lon, lat)
 */
export function centerlinePlausibility(
  vertices: readonly [number, number][],
  stationLonLats: readonly [number, number][],
): CenterlinePlausibility | undefined {
  const line = every(
    vertices.filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y)),
    5000,
  );
  const stations = every(
    stationLonLats.filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y)),
    500,
  );
  if (line.length === 0 || stations.length === 0) return undefined;
  const asIs = medianNearestKm(line, stations);
  if (asIs <= CENTERLINE_FAR_KM) return undefined;
  const swapped = medianNearestKm(
    line.map(([x, y]) => [y, x]),
    stations,
  );
  const km = (v: number): string => v.toFixed(v < 10 ? 1 : 0);
  if (swapped < asIs / 10)
    return {
      severity: "error",
      medianDistanceKm: asIs,
      message: `the centerline looks written as [lat, lon]: the stations are a median ${km(asIs)} km from it, ${km(swapped)} km with its coordinates swapped; GeoJSON writes each position as [lon, lat] (RFC 7946 §3.1.1)`,
    };
  return {
    severity: "warning",
    medianDistanceKm: asIs,
    message: `the stations are a median ${km(asIs)} km from the centerline: is it the right channel, and are both in WGS84 longitude/latitude?`,
  };
}
