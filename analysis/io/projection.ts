import proj4 from "proj4";

/**
 * proj4 definitions of national grids commonly met in coastal survey files (EPSG registry
 * parameters; from memory, checked by round-trip tests against published control points).
 */
export const EPSG_DEFINITIONS: Readonly<Record<number, string>> = {
  27700:
    "+proj=tmerc +lat_0=49 +lon_0=-2 +k=0.9996012717 +x_0=400000 +y_0=-100000 +ellps=airy +towgs84=446.448,-125.157,542.06,0.15,0.247,0.842,-20.489 +units=m +no_defs",
  2154: "+proj=lcc +lat_0=46.5 +lon_0=3 +lat_1=49 +lat_2=44 +x_0=700000 +y_0=6600000 +ellps=GRS80 +towgs84=0,0,0,0,0,0,0 +units=m +no_defs",
  3035: "+proj=laea +lat_0=52 +lon_0=10 +x_0=4321000 +y_0=3210000 +ellps=GRS80 +towgs84=0,0,0,0,0,0,0 +units=m +no_defs",
  3857: "+proj=merc +a=6378137 +b=6378137 +lat_ts=0 +lon_0=0 +x_0=0 +y_0=0 +k=1 +units=m +nadgrids=@null +no_defs",
  28992:
    "+proj=sterea +lat_0=52.15616055555555 +lon_0=5.38763888888889 +k=0.9999079 +x_0=155000 +y_0=463000 +ellps=bessel +towgs84=565.417,50.3319,465.552,-0.398957,0.343988,-1.8774,4.0725 +units=m +no_defs",
  2193: "+proj=tmerc +lat_0=0 +lon_0=173 +k=0.9996 +x_0=1600000 +y_0=10000000 +ellps=GRS80 +towgs84=0,0,0,0,0,0,0 +units=m +no_defs",
  3577: "+proj=aea +lat_0=0 +lon_0=132 +lat_1=-18 +lat_2=-36 +x_0=0 +y_0=0 +ellps=GRS80 +towgs84=0,0,0,0,0,0,0 +units=m +no_defs",
};

/**
 * The proj4 definition for an EPSG code: the national grids in {@link EPSG_DEFINITIONS}, WGS84
 * (4326), and computed UTM zones — WGS84 north 32601–32660 and south 32701–32760, ETRS89
 * 25828–25838 and NAD83 26901–26923 (north).
 *
 * @param epsg EPSG code
 * @returns the proj4 string, or undefined when the code is not supported
 */
export function projDefinition(epsg: number): string | undefined {
  if (!Number.isInteger(epsg)) return undefined;
  if (epsg === 4326) return "+proj=longlat +datum=WGS84 +no_defs";
  const fixed = EPSG_DEFINITIONS[epsg];
  if (fixed !== undefined) return fixed;
  const utm = (zone: number, south: boolean, datum: string): string =>
    `+proj=utm +zone=${zone}${south ? " +south" : ""} ${datum} +units=m +no_defs`;
  if (epsg >= 32601 && epsg <= 32660) return utm(epsg - 32600, false, "+datum=WGS84");
  if (epsg >= 32701 && epsg <= 32760) return utm(epsg - 32700, true, "+datum=WGS84");
  if (epsg >= 25828 && epsg <= 25838) return utm(epsg - 25800, false, "+ellps=GRS80 +towgs84=0,0,0,0,0,0,0");
  if (epsg >= 26901 && epsg <= 26923) return utm(epsg - 26900, false, "+datum=NAD83");
  return undefined;
}

/**
 * Converts projected coordinates to WGS84 longitude/latitude with proj4.
 *
 * @param xM easting [m]
 * @param yM northing [m]
 * @param epsg EPSG code of the projected system
 * @returns [lon, lat] in decimal degrees, or undefined when the code is unsupported or the result is not finite
 * @throws RangeError when xM or yM is not finite
 */
export function projectedToLonLat(xM: number, yM: number, epsg: number): [number, number] | undefined {
  if (!Number.isFinite(xM) || !Number.isFinite(yM)) {
    throw new RangeError(`projectedToLonLat(): xM and yM must be finite, got ${xM}, ${yM}`);
  }
  const def = projDefinition(epsg);
  if (def === undefined) return undefined;
  const [lon, lat] = proj4(def, "WGS84", [xM, yM]);
  if (!Number.isFinite(lon) || !Number.isFinite(lat) || Math.abs(lat) > 90 || Math.abs(lon) > 180) return undefined;
  return [lon, lat];
}
