/**
 * Bounds relating distances in the flatbush index space (x = lon·lonScale, y = lat,
 * degrees) to true distances on the WGS84 ellipsoid, so index searches never miss a
 * nearer segment.
 *
 * @see Torge, W. & Müller, J. (2012) Geodesy, 4th ed., ch. 4 (radii of curvature; from memory).
 */
import { DEG_TO_RAD, WGS84_A_M, WGS84_E2 } from "./ellipsoid.ts";

/** Anisotropy g = N cos φ / M of the local metric at |φ| [deg]. */
export function anisotropy(absLatDeg: number): number {
  const phi = absLatDeg * DEG_TO_RAD;
  const s = Math.sin(phi);
  return (Math.cos(phi) * (1 - WGS84_E2 * s * s)) / (1 - WGS84_E2);
}

/** Metres per degree of meridian at the equator (smallest M). */
export const M_MIN_DEG = WGS84_A_M * (1 - WGS84_E2) * DEG_TO_RAD; // metres per degree of meridian, equator
/** Metres per degree of meridian at the pole (largest M). */
export const M_MAX_DEG = (WGS84_A_M / Math.sqrt(1 - WGS84_E2)) * DEG_TO_RAD; // at the pole

/**
 * Index degrees per metre, an upper bound valid between latitudes up to maxAbsLatDeg:
 * a true distance D spans at most D·indexDegPerM(...) in index space.
 */
export function indexDegPerM(lonScale: number, maxAbsLatDeg: number): number {
  return (Math.max(1, lonScale / anisotropy(maxAbsLatDeg)) * 1.01) / M_MIN_DEG;
}
