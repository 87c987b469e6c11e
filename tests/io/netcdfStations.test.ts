import { describe, expect, it } from "vitest";
import { readNetcdfStations } from "../../analysis/io/netcdfStations.ts";
import { cfTimeToIso, parseCfTimeUnits } from "../../analysis/io/cfTime.ts";
import { expectWithin } from "../helpers/tolerance.ts";
import { writeNetcdf3 } from "./helpers/netcdf3Writer.ts";
import { cfStationVariables } from "./helpers/cfStationVariables.ts";

const FILL = -999;

/** Two stations × three depths, CF orthogonal multidimensional profile layout (CF 1.11 §9.3.1). */
function profileFile(): Uint8Array {
  return writeNetcdf3({
    dims: [
      { name: "station", size: 2 },
      { name: "z", size: 3 },
      { name: "name_strlen", size: 8 },
    ],
    attrs: [
      { name: "Conventions", value: "CF-1.11" },
      { name: "featureType", value: "profile" },
    ],
    vars: [
      ...cfStationVariables({
        names: ["ST01", "ST02"],
        role: "profile_id",
        timeDays: [20089.5, 20090.25],
        timeUnits: "days since 1970-01-01 00:00:00",
        latDeg: [45.1, 45.2],
        lonDeg: [-1.5, -1.4],
      }),
      {
        name: "depth",
        dims: ["z"],
        type: "float",
        attrs: [
          { name: "standard_name", value: "depth" },
          { name: "units", value: "m" },
          { name: "positive", value: "down" },
        ],
        data: [0.5, 5, 10],
      },
      {
        name: "PSAL",
        dims: ["station", "z"],
        type: "float",
        attrs: [
          { name: "standard_name", value: "sea_water_practical_salinity" },
          { name: "units", value: "1" },
          { name: "_FillValue", type: "float", value: FILL },
        ],
        data: [5.2, 12.5, 20.1, 15, FILL, 30.25],
      },
      {
        name: "TEMP",
        dims: ["station", "z"],
        type: "float",
        attrs: [
          { name: "standard_name", value: "sea_water_temperature" },
          { name: "units", value: "degree_Celsius" },
        ],
        data: [14, 13.5, 13, 12, 11.5, 11],
      },
      {
        name: "silicate",
        dims: ["station", "z"],
        type: "double",
        attrs: [
          { name: "standard_name", value: "mole_concentration_of_silicate_in_sea_water" },
          { name: "units", value: "umol/L" },
        ],
        data: [80, 60, 40, 30, 20, 5],
      },
      {
        name: "Fe",
        dims: ["station", "z"],
        type: "double",
        attrs: [
          { name: "long_name", value: "dissolved iron" },
          { name: "units", value: "nmol/L" },
          { name: "missing_value", value: -1 },
        ],
        data: [120, 90, -1, 50, 40, 10],
      },
    ],
  });
}

describe("readNetcdfStations (CF-netCDF, fixture written by a netCDF-3 classic writer)", () => {
  it("readNetcdfStations() reads a CF profile file: standard_name roles, CF time, fill values as missing, constituents with units", () => {
    const r = readNetcdfStations(profileFile(), { fileName: "profiles.nc", layer: { kind: "all" } });
    expect(r.summary.rowsRead).toBe(6);
    expect(r.summary.rowsAccepted).toBe(6);
    const st = r.surveys.flatMap((s) => s.stations);
    expect(st.map((s) => s.id)).toEqual(["ST01", "ST01", "ST01", "ST02", "ST02", "ST02"]);
    // 20089.5 days after 1970-01-01 = 2025-01-01T12:00Z (CF Conventions 1.11 §4.4 time units)
    expect(st[0].time).toBe("2025-01-01T12:00:00Z");
    expect(st[3].time).toBe("2025-01-02T06:00:00Z");
    expectWithin(st[1].salinity.value, 12.5, 1e-6, "PSAL float32 at station 1, z 2");
    expect(st[4].salinity.status).toBe("missing");
    expectWithin(st[5].depthM, 10, 1e-9, "depth from the z coordinate");
    expectWithin(st[3].lonLat?.[1], 45.2, 1e-12, "latitude per station");
    expectWithin(st[3].lonLat?.[0], -1.4, 1e-12, "longitude per station");
    expectWithin(st[0].values.Si.value, 80, 1e-12, "silicate from standard_name");
    expect(st[2].values.Fe.status).toBe("missing");
    expect(r.surveys[0].constituents.map((c) => `${c.name} ${c.unit}`).sort()).toEqual(["Fe nmol/L", "Si µmol/L"]);
    expect(r.issues.filter((i) => i.severity === "error")).toEqual([]);
  });

  it("readNetcdfStations() reports a non-netCDF buffer as a file-level error instead of throwing", () => {
    const r = readNetcdfStations(new TextEncoder().encode("<html><script>alert(1)</script></html>"), {
      fileName: "fake.nc",
    });
    expect(r.surveys.flatMap((s) => s.stations)).toEqual([]);
    expect(r.issues.some((i) => i.severity === "error" && i.file === "fake.nc" && i.row === 0)).toBe(true);
  });

  it("parseCfTimeUnits() reads hours since a reference with an offset (CF Conventions 1.11 §4.4)", () => {
    const u = parseCfTimeUnits("hours since 2016-01-21 06:00:00 +02:00");
    expect(u).toBeDefined();
    expect(cfTimeToIso(2, u!)).toBe("2016-01-21T06:00:00Z");
    expect(parseCfTimeUnits("months since 2016-01-01")).toBeUndefined();
    expect(parseCfTimeUnits("days since 2016-01-01", "360_day")).toBeUndefined();
  });
});
