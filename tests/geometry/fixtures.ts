// Shared test fixtures for the geometry tests: channels built along WGS84 geodesics
// with geographiclib (Karney 2013), the outside reference for distances.
import geodesic from "geographiclib-geodesic";

export const geod = geodesic.Geodesic.WGS84;

/** Point at distance sM along the geodesic from [lon, lat] at azimuth aziDeg, with the azimuth there. */
export function direct(
  lonLat: [number, number],
  aziDeg: number,
  sM: number,
): { lonLat: [number, number]; azi: number } {
  const r = geod.Direct(lonLat[1], lonLat[0], aziDeg, sM);
  return { lonLat: [r.lon2!, r.lat2!], azi: r.azi2! };
}

/** Geodesic distance between two [lon, lat] points [m]. */
export function inverseM(a: [number, number], b: [number, number]): number {
  return geod.Inverse(a[1], a[0], b[1], b[0]).s12!;
}

/** Geodesic azimuth from a to b [deg]. */
export function azimuthDeg(a: [number, number], b: [number, number]): number {
  return geod.Inverse(a[1], a[0], b[1], b[0]).azi1!;
}

/** Vertices every stepM along a geodesic from start, for lengthM. */
export function geodesicLine(
  start: [number, number],
  aziDeg: number,
  lengthM: number,
  stepM: number,
): [number, number][] {
  const n = Math.round(lengthM / stepM);
  return Array.from({ length: n + 1 }, (_, i) => direct(start, aziDeg, (lengthM * i) / n).lonLat);
}

/** Sum of geodesic distances between consecutive vertices [m]. */
export function geodesicLengthM(coords: [number, number][]): number {
  let s = 0;
  for (let i = 1; i < coords.length; i++) s += inverseM(coords[i - 1]!, coords[i]!);
  return s;
}

/** A seeded meandering centerline (sine-generated curve, common practice) of n vertices, stepM apart. */
export function meanderLine(rng: () => number, start: [number, number], n: number, stepM: number): [number, number][] {
  const out: [number, number][] = [start];
  let p = start;
  for (let i = 1; i < n; i++) {
    const heading = 60 + 55 * Math.sin((2 * Math.PI * i * stepM) / 3000) + (rng() - 0.5) * 6;
    p = direct(p, heading, stepM).lonLat;
    out.push(p);
  }
  return out;
}
