import { describe, expect, it } from "vitest";
import { columnMappingSchema } from "../../analysis/io/columnMapping.ts";
import { checkSchema } from "../../analysis/io/validation.ts";
import { fileShapeSignature, findSavedMapping } from "../../analysis/io/fileShape.ts";
import { suggestMapping } from "../../analysis/io/suggestMapping.ts";

const roles = (headers: string[], rows: string[][] = []): Record<string, string> =>
  Object.fromEntries(suggestMapping(headers, rows).columns.map((c) => [c.header, c.role]));

describe("suggestMapping (automatic column recognition)", () => {
  it("suggestMapping() recognises the demo columns (survey, station, ISO date_time, lat/lon, depth, salinity, temperature, pH, constituents, flag)", () => {
    const headers = [
      "survey",
      "station",
      "date_time",
      "latitude",
      "longitude",
      "depth_m",
      "salinity",
      "temperature_C",
      "pH",
      "Fe (nmol/L)",
      "Si (µmol/L)",
      "Cu_flag",
      "Cu (nmol/L)",
    ];
    const m = suggestMapping(headers, [
      ["S", "A", "2025-03-18T07:30:00Z", "45", "-35", "1", "3", "11", "8", "5", "3", "1", "2"],
    ]);
    expect(m.columns.map((c) => c.role)).toEqual([
      "survey",
      "station",
      "dateTime",
      "latitude",
      "longitude",
      "depth",
      "salinity",
      "temperature",
      "pH",
      "constituent",
      "constituent",
      "flag",
      "constituent",
    ]);
    expect(m.columns[11].flagFor).toBe("Cu (nmol/L)");
    expect(checkSchema(columnMappingSchema, JSON.parse(JSON.stringify(m))).success).toBe(true);
  });

  it("suggestMapping() recognises separate date and time columns, station number, and reads the date order from the samples", () => {
    const m = suggestMapping(["Date", "Time", "Station_Number", "Depth"], [["1/21/16", "629", "36", "1"]]);
    expect(m.columns.map((c) => c.role)).toEqual(["date", "time", "station", "depth"]);
    expect(m.dateOrder).toBe("MDY");
  });

  it("suggestMapping() turns a Depth column of S/B labels into a layer-label column", () => {
    expect(
      roles(
        ["Station", "Depth"],
        [
          ["0", "S"],
          ["0", "B"],
        ],
      ).Depth,
    ).toBe("depthLabel");
  });

  it("suggestMapping() finds conductivity, discharge, distance, x/y and a row flag; ignores unknown columns", () => {
    const r = roles([
      "Cond (mS/cm)",
      "River discharge (m3/s)",
      "Distance from Sta. 36 (km)",
      "Easting",
      "Northing",
      "QC_flag",
      "Season",
      "DO_Sat",
    ]);
    expect(r).toEqual({
      "Cond (mS/cm)": "conductivity",
      "River discharge (m3/s)": "discharge",
      "Distance from Sta. 36 (km)": "distance",
      Easting: "x",
      Northing: "y",
      QC_flag: "rowFlag",
      Season: "ignore",
      DO_Sat: "ignore",
    });
  });

  it("suggestMapping() leaves the unit of a constituent without a header unit undefined, for the user to set", () => {
    const c = suggestMapping(["Silicate"], []).columns[0];
    expect(c).toMatchObject({ role: "constituent", name: "Si" });
    expect(c.unit).toBeUndefined();
  });

  it("fileShapeSignature() ignores header order, case, spaces and a BOM, and findSavedMapping() uses it", () => {
    const a = fileShapeSignature(["\uFEFFStation", "Salinity ", "Fe (nmol/L)"]);
    expect(fileShapeSignature(["fe (nmol/l)", "station", "salinity"])).toBe(a);
    expect(fileShapeSignature(["station", "salinity"])).not.toBe(a);
    expect(a).toMatch(/^shape-3-[0-9a-f]{8}$/);
    const saved = [{ shape: "other" }, { shape: a }];
    expect(findSavedMapping(["Fe (nmol/L)", "Station", "Salinity"], saved)).toBe(saved[1]);
  });
});
