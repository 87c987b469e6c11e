import type { ColumnRole } from "./columnMapping.ts";
import { normaliseConstituentName } from "./constituentNames.ts";

/** CF attribute and role tables used by the netCDF station reader. */

export interface NcAttr {
  name: string;
  value: string | number | number[];
}
export interface NcVar {
  name: string;
  dimensions: number[];
  attributes: NcAttr[];
  type: string;
}

/** netCDF default fill values (NetCDF Users Guide, "Fill Values"; from memory). */
export const DEFAULT_FILL: Record<string, number> = {
  byte: -127,
  short: -32767,
  int: -2147483647,
  float: 9.969209968386869e36,
  double: 9.969209968386869e36,
};

export const ROLE_BY_STANDARD_NAME: Record<string, ColumnRole> = {
  time: "dateTime",
  latitude: "latitude",
  longitude: "longitude",
  depth: "depth",
  sea_water_practical_salinity: "salinity",
  sea_water_salinity: "salinity",
  sea_water_temperature: "temperature",
  sea_water_ph_reported_on_total_scale: "pH",
  sea_water_electrical_conductivity: "conductivity",
  platform_name: "station",
  platform_id: "station",
};

export const attr = (v: NcVar, name: string): string | number | undefined => {
  const a = v.attributes.find((x) => x.name === name);
  return a === undefined || Array.isArray(a.value) ? undefined : a.value;
};

/** Constituent name of a CF variable: from its standard_name, variable name or long_name. */
export function constituentName(v: NcVar): string {
  const sn = String(attr(v, "standard_name") ?? "");
  const m = /concentration_of_(.+?)_in_sea_water/.exec(sn);
  const candidates = [m?.[1]?.replace(/^(dissolved_)/, ""), v.name, String(attr(v, "long_name") ?? "")];
  for (const c of candidates) {
    if (c === undefined || c === "") continue;
    const n = normaliseConstituentName(c.replace(/_/g, " ")) ?? normaliseConstituentName(c);
    if (n !== undefined) return n;
  }
  return v.name;
}
