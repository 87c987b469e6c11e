/**
 * The station-identity variables every CF discrete-sampling-geometry test file needs: the
 * station name (cf_role), time, latitude and longitude on the `station` dimension
 * (CF Conventions 1.11 §9, H.2–H.3). Test files add their own data variables.
 */
import type { NcVar } from "./netcdf3Writer.ts";

export interface CfStations {
  names: string[];
  /** `profile_id` for profile files, `timeseries_id` for time-series files (CF 1.11 Table 9.1). */
  role: "profile_id" | "timeseries_id";
  timeDays: number[];
  timeUnits: string;
  latDeg: number[];
  lonDeg: number[];
}

/** The four identity variables for `stations` (needs dimensions `station` and `name_strlen`). */
export function cfStationVariables(stations: CfStations): NcVar[] {
  const onStation = (name: string, standardName: string, units: string, data: number[]): NcVar => ({
    name,
    dims: ["station"],
    type: "double",
    attrs: [
      { name: "standard_name", value: standardName },
      { name: "units", value: units },
    ],
    data,
  });
  return [
    {
      name: "station_name",
      dims: ["station", "name_strlen"],
      type: "char",
      attrs: [{ name: "cf_role", value: stations.role }],
      data: stations.names,
    },
    onStation("time", "time", stations.timeUnits, stations.timeDays),
    onStation("lat", "latitude", "degrees_north", stations.latDeg),
    onStation("lon", "longitude", "degrees_east", stations.lonDeg),
  ];
}
