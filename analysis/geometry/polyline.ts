/**
 * Densify a lon/lat polyline into pieces of bounded length and measure it on the
 * WGS84 ellipsoid.
 *
 * A GeoJSON segment is the straight line in lon/lat between its positions
 * (RFC 7946 §3.1.1); splitting it into pieces of at most `maxPieceM` metres keeps each
 * piece short enough for the local-plane formulas (relative length error ~ (L/R)² < 1e-8).
 *
 * @see Butler, H. et al. (2016) The GeoJSON Format, IETF RFC 7946, §3.1.1.
 */
import { localSegmentLengthM } from "./ellipsoid.ts";

/** A densified polyline with cumulative length. */
export interface DensePolyline {
  lon: number[];
  lat: number[];
  /** Cumulative length from the first vertex [m]. */
  cumM: number[];
  /** Position of each original vertex in the dense arrays. */
  vertexPos: number[];
}

/**
 * Densify and measure a polyline.
 *
 * @param coords vertices [lon, lat] (unwrapped longitudes) [deg]
 * @param maxPieceM largest piece length [m]
 * @returns dense vertices with cumulative length [m]
 */
export function densifyPolyline(coords: readonly [number, number][], maxPieceM: number): DensePolyline {
  const first = coords[0];
  if (!first) return { lon: [], lat: [], cumM: [], vertexPos: [] };
  const out: DensePolyline = { lon: [first[0]], lat: [first[1]], cumM: [0], vertexPos: [0] };
  for (let i = 1; i < coords.length; i++) {
    const [lonA, latA] = coords[i - 1]!;
    const [lonB, latB] = coords[i]!;
    const approx = localSegmentLengthM(lonA, latA, lonB, latB);
    const n = Math.max(1, Math.ceil(approx / maxPieceM));
    let pLon = lonA;
    let pLat = latA;
    for (let k = 1; k <= n; k++) {
      const lon = k === n ? lonB : lonA + ((lonB - lonA) * k) / n;
      const lat = k === n ? latB : latA + ((latB - latA) * k) / n;
      out.lon.push(lon);
      out.lat.push(lat);
      out.cumM.push(out.cumM[out.cumM.length - 1]! + localSegmentLengthM(pLon, pLat, lon, lat));
      pLon = lon;
      pLat = lat;
    }
    out.vertexPos.push(out.lon.length - 1);
  }
  return out;
}

/** Length of a polyline on the WGS84 ellipsoid [m] (densified to ≤ maxPieceM pieces). */
export function polylineLengthM(coords: readonly [number, number][], maxPieceM: number): number {
  const d = densifyPolyline(coords, maxPieceM);
  return d.cumM[d.cumM.length - 1] ?? 0;
}
