/**
 * Coordinate checks and longitude unwrapping shared by the geometry functions.
 */

/** Latitudes beyond this are rejected: the local-plane formulas lose accuracy near the poles. */
export const MAX_ABS_LAT_DEG = 85;

/**
 * Check one [lon, lat] pair and throw a RangeError naming the function, argument and value.
 *
 * @param fn calling function name (for the message)
 * @param what argument description, e.g. "coordinates[3] of branch 'main'"
 * @throws RangeError when a value is not finite, |lat| > 85° or |lon| > 540°
 */
export function checkLonLat(fn: string, what: string, lon: number, lat: number): void {
  if (!Number.isFinite(lon) || !Number.isFinite(lat)) {
    throw new RangeError(`${fn}: ${what} must be finite numbers [lon, lat]; got [${lon}, ${lat}]`);
  }
  if (Math.abs(lat) > MAX_ABS_LAT_DEG) {
    throw new RangeError(
      `${fn}: ${what} has latitude ${lat}°, beyond ±${MAX_ABS_LAT_DEG}° (polar channels are not supported)`,
    );
  }
  if (Math.abs(lon) > 540) {
    throw new RangeError(`${fn}: ${what} has longitude ${lon}°, outside [−540°, 540°]`);
  }
}

/** Shift lon by a multiple of 360° so that it lies within ±180° of refLon. */
export function wrapNear(lon: number, refLon: number): number {
  const d = refLon - lon;
  return d > -180 && d <= 180 ? lon : lon + 360 * Math.round(d / 360);
}

/** Normalize a longitude to [−180, 180). */
export function normalizeLon(lon: number): number {
  if (lon >= -180 && lon < 180) return lon;
  const x = (((lon + 180) % 360) + 360) % 360;
  return x - 180;
}

/**
 * Unwrap a polyline's longitudes so consecutive vertices differ by at most 180°
 * (a line crossing the antimeridian becomes continuous, e.g. 179.9 → 180.1).
 *
 * @returns a new array of [lon, lat]; latitudes unchanged
 */
export function unwrapLine(coords: readonly [number, number][]): [number, number][] {
  const out: [number, number][] = [];
  let prev = Number.NaN;
  for (const [lon, lat] of coords) {
    const l = Number.isNaN(prev) ? lon : wrapNear(lon, prev);
    out.push([l, lat]);
    prev = l;
  }
  return out;
}
