/**
 * A local flat frame (east, north in km) around the invented estuary's mouth, and
 * great-circle lengths. Over the ~100 km the scenario spans, the equirectangular frame is
 * only used to DRAW shapes; all along-channel distances are measured on the final [lon, lat]
 * coordinates with the haversine formula on a sphere of radius 6 371 008.8 m (the mean
 * Earth radius, IUGG; common practice), so they match what a reader of the GeoJSON measures.
 */

/** Position of the invented mouth in the open North Atlantic, [lon, lat] (no real land here). */
export const MOUTH_LON_LAT: [number, number] = [-35.3, 45.05];

const EARTH_RADIUS_M = 6_371_008.8;
const DEG = Math.PI / 180;
const LAT0 = MOUTH_LON_LAT[1] * DEG;
/** Metres per degree of latitude and longitude at the mouth (WGS84 series, common practice). */
const M_PER_DEG_LAT = 111_132.954 - 559.822 * Math.cos(2 * LAT0) + 1.175 * Math.cos(4 * LAT0);
const M_PER_DEG_LON = 111_412.84 * Math.cos(LAT0) - 93.5 * Math.cos(3 * LAT0);

/** Local km (east, north) → [lon, lat] in degrees. */
export function toLonLat(eastKm: number, northKm: number): [number, number] {
  return [MOUTH_LON_LAT[0] + (eastKm * 1000) / M_PER_DEG_LON, MOUTH_LON_LAT[1] + (northKm * 1000) / M_PER_DEG_LAT];
}

/** [lon, lat] → local km (east, north). */
export function toLocalKm(lonLat: [number, number]): [number, number] {
  return [
    ((lonLat[0] - MOUTH_LON_LAT[0]) * M_PER_DEG_LON) / 1000,
    ((lonLat[1] - MOUTH_LON_LAT[1]) * M_PER_DEG_LAT) / 1000,
  ];
}

/** Rounds a coordinate pair to `decimals` decimal degrees (6 ≈ 0.1 m). */
export function roundLonLat(p: [number, number], decimals = 6): [number, number] {
  const f = 10 ** decimals;
  return [Math.round(p[0] * f) / f, Math.round(p[1] * f) / f];
}

/** Haversine great-circle distance [km] between two [lon, lat] points. */
export function haversineKm(a: [number, number], b: [number, number]): number {
  const dLat = (b[1] - a[1]) * DEG;
  const dLon = (b[0] - a[0]) * DEG;
  const h = Math.sin(dLat / 2) ** 2 + Math.cos(a[1] * DEG) * Math.cos(b[1] * DEG) * Math.sin(dLon / 2) ** 2;
  return (2 * EARTH_RADIUS_M * Math.asin(Math.min(1, Math.sqrt(h)))) / 1000;
}

/** Cumulative haversine distance [km] along a polyline, first entry 0. */
export function cumulativeKm(line: [number, number][]): number[] {
  const out = [0];
  for (let i = 1; i < line.length; i++) out.push(out[i - 1] + haversineKm(line[i - 1], line[i]));
  return out;
}
