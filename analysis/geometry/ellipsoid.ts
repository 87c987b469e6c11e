/**
 * WGS84 ellipsoid constants and the local radii of curvature used by every
 * along-channel distance in Brackline.
 *
 * @see National Imagery and Mapping Agency (2000) Department of Defense World Geodetic
 *   System 1984, NIMA TR8350.2, 3rd ed., defining parameters a = 6378137 m,
 *   1/f = 298.257223563 (table number from memory); the same values are the WGS84
 *   ellipsoid of Karney, C.F.F. (2013) Algorithms for geodesics, J. Geodesy 87:43–55.
 */

/** WGS84 semi-major axis a [m] (NIMA TR8350.2). */
export const WGS84_A_M = 6378137;
/** WGS84 flattening f (NIMA TR8350.2). */
export const WGS84_F = 1 / 298.257223563;
/** First eccentricity squared e² = f(2 − f). */
export const WGS84_E2 = WGS84_F * (2 - WGS84_F);

/** Degrees to radians. */
export const DEG_TO_RAD = Math.PI / 180;

/**
 * Meridional radius of curvature M(φ) = a(1 − e²)/(1 − e² sin²φ)^{3/2}.
 *
 * @param latRad geodetic latitude φ [rad]
 * @returns M [m]
 * @see Torge, W. & Müller, J. (2012) Geodesy, 4th ed., de Gruyter, ch. 4 (ellipsoidal radii of curvature; from memory).
 */
export function meridionalRadiusM(latRad: number): number {
  const s = Math.sin(latRad);
  const w2 = 1 - WGS84_E2 * s * s;
  return (WGS84_A_M * (1 - WGS84_E2)) / (w2 * Math.sqrt(w2));
}

/**
 * Prime-vertical radius of curvature N(φ) = a/(1 − e² sin²φ)^{1/2}.
 *
 * @param latRad geodetic latitude φ [rad]
 * @returns N [m]
 * @see Torge, W. & Müller, J. (2012) Geodesy, 4th ed., de Gruyter, ch. 4 (ellipsoidal radii of curvature; from memory).
 */
export function primeVerticalRadiusM(latRad: number): number {
  const s = Math.sin(latRad);
  return WGS84_A_M / Math.sqrt(1 - WGS84_E2 * s * s);
}

/**
 * Length of a short lon/lat-straight segment on the WGS84 ellipsoid, by the local
 * tangent plane at the mid-latitude φm:
 * L = √[(Δλ·N(φm)·cos φm)² + (Δφ·M(φm))²].
 *
 * Relative error is of order (L/R)², below 1e-8 for the ≤ 500 m pieces Brackline uses.
 *
 * @param lon1Deg longitude of the first point [deg]
 * @param lat1Deg latitude of the first point [deg]
 * @param lon2Deg longitude of the second point [deg] (same unwrapped frame as lon1Deg)
 * @param lat2Deg latitude of the second point [deg]
 * @returns length [m]
 * @see Torge, W. & Müller, J. (2012) Geodesy, 4th ed., ch. 4 (radii of curvature; mid-latitude method is common practice).
 */
export function localSegmentLengthM(lon1Deg: number, lat1Deg: number, lon2Deg: number, lat2Deg: number): number {
  const latM = 0.5 * (lat1Deg + lat2Deg) * DEG_TO_RAD;
  const dx = (lon2Deg - lon1Deg) * DEG_TO_RAD * primeVerticalRadiusM(latM) * Math.cos(latM);
  const dy = (lat2Deg - lat1Deg) * DEG_TO_RAD * meridionalRadiusM(latM);
  return Math.sqrt(dx * dx + dy * dy);
}

/**
 * Initial bearing of a short lon/lat-straight segment, clockwise from true north,
 * in the local tangent plane at the mid-latitude.
 *
 * @returns bearing [deg] in [0, 360)
 * @see Torge, W. & Müller, J. (2012) Geodesy, 4th ed., ch. 4 (from memory).
 */
export function localBearingDeg(lon1Deg: number, lat1Deg: number, lon2Deg: number, lat2Deg: number): number {
  const latM = 0.5 * (lat1Deg + lat2Deg) * DEG_TO_RAD;
  const dx = (lon2Deg - lon1Deg) * primeVerticalRadiusM(latM) * Math.cos(latM);
  const dy = (lat2Deg - lat1Deg) * meridionalRadiusM(latM);
  const deg = Math.atan2(dx, dy) / DEG_TO_RAD;
  return deg < 0 ? deg + 360 : deg;
}
