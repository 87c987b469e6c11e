import { describe, expect, it } from "vitest";
import { readNetcdfStations } from "../../analysis/io/netcdfStations.ts";
import { cfTimeToIso, parseCfTimeUnits } from "../../analysis/io/cfTime.ts";
import { expectWithin } from "../helpers/tolerance.ts";
import { cfVariable, PRACTICAL_SALINITY, SILICATE_UMOL_L, writeCfStationFile } from "./helpers/cfStationFile.ts";

const FILL = -999;

/** Two stations × three depths, CF orthogonal multidimensional profile layout (CF 1.11 §9.3.1). */
function profileFile(): Uint8Array {
  const onProfile = ["station", "z"];
  return writeCfStationFile({
    featureType: "profile",
    stations: {
      names: ["ST01", "ST02"],
      timeDays: [20089.5, 20090.25],
      timeUnits: "days since 1970-01-01 00:00:00",
      latDeg: [45.1, 45.2],
      lonDeg: [-1.5, -1.4],
    },
    depthsM: [0.5, 5, 10],
    depthType: "float",
    vars: [
      cfVariable("PSAL", onProfile, "float", { ...PRACTICAL_SALINITY, fill: FILL }, [5.2, 12.5, 20.1, 15, FILL, 30.25]),
      cfVariable(
        "TEMP",
        onProfile,
        "float",
        { standardName: "sea_water_temperature", units: "degree_Celsius" },
        [14, 13.5, 13, 12, 11.5, 11],
      ),
      cfVariable("silicate", onProfile, "double", SILICATE_UMOL_L, [80, 60, 40, 30, 20, 5]),
      cfVariable(
        "Fe",
        onProfile,
        "double",
        { longName: "dissolved iron", units: "nmol/L", missing: -1 },
        [120, 90, -1, 50, 40, 10],
      ),
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
