/**
 * A whole CF discrete-sampling-geometry station file for tests: the dimensions, the global
 * `Conventions`/`featureType` attributes, the station identity variables (cfStationVariables), for
 * profile files the `depth` coordinate on `z`, and the test's data variables (CF Conventions 1.11
 * §9, H.2–H.3). One builder for the netCDF fixtures of the reader and parity tests.
 */
import { cfStationVariables, type CfStations } from "./cfStationVariables.ts";
import { writeNetcdf3, type NcAttr, type NcType, type NcVar } from "./netcdf3Writer.ts";

export interface CfStationFile {
  /** `profile` (orthogonal multidimensional profiles on `station` × `z`) or `timeSeries` (one value per station). */
  featureType: "profile" | "timeSeries";
  stations: Omit<CfStations, "role">;
  /** Depths of the `z` coordinate [m, positive down]; profile files only. */
  depthsM?: number[];
  /** NetCDF type of the depth coordinate (default double). */
  depthType?: NcType;
  /** Length of the station-name character dimension (default 8). */
  nameLength?: number;
  /** The data variables. */
  vars: NcVar[];
}

/** Writes the file as netCDF-3 classic bytes. */
export function writeCfStationFile(f: CfStationFile): Uint8Array {
  const profile = f.featureType === "profile";
  const depthsM = f.depthsM ?? [];
  return writeNetcdf3({
    dims: [
      { name: "station", size: f.stations.names.length },
      ...(profile ? [{ name: "z", size: depthsM.length }] : []),
      { name: "name_strlen", size: f.nameLength ?? 8 },
    ],
    attrs: [
      { name: "Conventions", value: "CF-1.11" },
      { name: "featureType", value: f.featureType },
    ],
    vars: [
      ...cfStationVariables({ ...f.stations, role: profile ? "profile_id" : "timeseries_id" }),
      ...(profile
        ? [
            {
              name: "depth",
              dims: ["z"],
              type: f.depthType ?? "double",
              attrs: [
                { name: "standard_name", value: "depth" },
                { name: "units", value: "m" },
                { name: "positive", value: "down" },
              ],
              data: depthsM,
            },
          ]
        : []),
      ...f.vars,
    ],
  });
}

/** What a data variable says about itself. */
export interface CfVariableMeta {
  standardName?: string;
  longName?: string;
  units: string;
  /** `_FillValue` (of the variable's type). */
  fill?: number;
  /** `missing_value`. */
  missing?: number;
}

/** A data variable with its standard_name/long_name, units and missing-value attributes. */
export function cfVariable(name: string, dims: string[], type: NcType, meta: CfVariableMeta, data: number[]): NcVar {
  const attrs: NcAttr[] = [
    ...(meta.standardName !== undefined ? [{ name: "standard_name", value: meta.standardName }] : []),
    ...(meta.longName !== undefined ? [{ name: "long_name", value: meta.longName }] : []),
    { name: "units", value: meta.units },
    ...(meta.fill !== undefined ? [{ name: "_FillValue", type, value: meta.fill }] : []),
    ...(meta.missing !== undefined ? [{ name: "missing_value", value: meta.missing }] : []),
  ];
  return { name, dims, type, attrs, data };
}

/** Practical salinity (PSS-78), CF standard name and unit "1". */
export const PRACTICAL_SALINITY = { standardName: "sea_water_practical_salinity", units: "1" } as const;
/** Dissolved silicate in µmol/L, CF standard name. */
export const SILICATE_UMOL_L = {
  standardName: "mole_concentration_of_silicate_in_sea_water",
  units: "umol/L",
} as const;
