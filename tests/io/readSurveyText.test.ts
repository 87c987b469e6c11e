import { describe, expect, it } from "vitest";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";
import { suggestMapping } from "../../analysis/io/suggestMapping.ts";
import { expectWithin } from "../helpers/tolerance.ts";

describe("readSurveyText (delimited survey files and their quirks)", () => {
  it("readSurveyText() reads a semicolon file with decimal commas and a UTF-8 BOM", () => {
    const text =
      "\uFEFFStation;Date;Lat;Lon;Salinity;Fe (nmol/L)\nA1;21.03.2024;45,5;-1,25;12,5;<0,05\nA2;22.03.2024;45,6;-1,30;30,1;3,2\n";
    const r = readSurveyText(text, { fileName: "semi.csv" });
    expect(r.dialect).toMatchObject({ delimiter: ";", decimalComma: true });
    expect(r.headers[0]).toBe("Station");
    const [a1, a2] = r.surveys.flatMap((s) => s.stations);
    expectWithin(a1.salinity.value, 12.5, 0, "decimal comma salinity");
    expectWithin(a1.lonLat?.[0], -1.25, 1e-12, "decimal comma longitude");
    expect(a1.values.Fe.status).toBe("belowDetection");
    expectWithin(a1.values.Fe.detectionLimit, 0.05, 1e-15, "censored with decimal comma");
    expect(a1.time).toBe("2024-03-21");
    expectWithin(a2.values.Fe.value, 3.2, 1e-12, "Fe A2");
    expect(r.issues.filter((i) => i.severity === "error")).toEqual([]);
  });

  it("readSurveyText() reads a tab-separated file with quoted fields holding delimiters, quotes and newlines", () => {
    const text =
      'station\tsalinity\tnote\tSi (µmol/L)\n"S 1"\t5.0\t"has\ttab and ""quotes""\nand a newline"\t40\nS2\t10\tplain\t30\n';
    const r = readSurveyText(text, { fileName: "tabs.tsv" });
    const st = r.surveys.flatMap((s) => s.stations);
    expect(st.map((s) => s.id)).toEqual(["S 1", "S2"]);
    expect(st[1].sourceRow).toBe(3);
    expectWithin(st[0].values.Si.value, 40, 0, "Si after a multi-line quoted field");
  });

  it("readSurveyText() keeps a bad cell as invalid with an issue naming file, row, column and value, and does not reject the row", () => {
    const text = "station,salinity,Fe (nmol/L)\nA,12.5,abc\nB,-3,4\n";
    const r = readSurveyText(text, { fileName: "bad.csv" });
    expect(r.summary.rowsAccepted).toBe(2);
    expect(r.issues).toContainEqual({
      file: "bad.csv",
      row: 2,
      column: "Fe (nmol/L)",
      value: "abc",
      expected: expect.any(String),
      severity: "error",
    });
    expect(r.issues).toContainEqual({
      file: "bad.csv",
      row: 3,
      column: "salinity",
      value: "-3",
      expected: "a value between 0 and 70",
      severity: "error",
    });
    const a = r.surveys[0].stations[0];
    expect(a.values.Fe).toEqual({ value: undefined, original: "abc", status: "invalid", accepted: false });
    expect(r.summary.valuesByStatus.invalid).toBe(2);
  });

  it("readSurveyText() rejects a row without station id, and a row whose row flag rejects it, each counted by reason with an issue", () => {
    const text = "station,salinity,flag\nA,1,1\n,2,1\nC,3,4\nD,4,Z\n";
    const r = readSurveyText(text, { fileName: "rows.csv" });
    expect(r.summary).toMatchObject({ rowsRead: 4, rowsAccepted: 1, rowsRejected: 3 });
    expect(r.summary.rejectedByReason).toEqual({
      "missing station id": 1,
      "row QC flag rejects": 1,
      "unknown row QC flag": 1,
    });
    for (const row of [3, 4, 5])
      expect(r.issues.some((i) => i.row === row && i.file === "rows.csv" && i.column !== "")).toBe(true);
  });

  it("readSurveyText() maps <name>_flag, <name>_qc and flag_<name> columns onto their values and keeps the original flag", () => {
    const text =
      "station,salinity,Fe (nmol/L),Fe_flag,Si_uM,Si_qc,flag_Mn,Mn (nmol/L)\nA,1,5,1,30,3,A,7\nB,2,6,4,31,2,R,8\n";
    const r = readSurveyText(text, { fileName: "flags.csv" });
    const [a, b] = r.surveys[0].stations;
    expect([a.values.Fe.accepted, b.values.Fe.accepted]).toEqual([true, false]);
    expect([a.values.Si.accepted, b.values.Si.accepted]).toEqual([false, true]);
    expect([a.values.Mn.accepted, b.values.Mn.accepted]).toEqual([true, false]);
    expect(b.values.Fe.qcFlag).toBe("4");
    expect(r.summary.valuesRejectedByFlag).toBe(3);
  });

  it("readSurveyText() reports a constituent whose header unit is unknown as an error and does not import it (never a guess)", () => {
    const r = readSurveyText("station,salinity,Cu (ppb),Zn (nmol/L)\nA,1,3,4\n", { fileName: "units.csv" });
    expect(r.issues).toContainEqual(
      expect.objectContaining({ file: "units.csv", row: 0, column: "Cu (ppb)", value: "ppb", severity: "error" }),
    );
    expect(Object.keys(r.surveys[0].stations[0].values)).toEqual(["Zn"]);
  });

  it("readSurveyText() computes salinity from conductivity with PSS-78 when there is no salinity column (C(35, 15 °C, 0) = 42.914 mS/cm, UNESCO 1983)", () => {
    const r = readSurveyText("station,conductivity (mS/cm),temperature\nA,42.914,14.99640\n", { fileName: "cond.csv" });
    expectWithin(r.surveys[0].stations[0].salinity.value, 35, 1e-3, "S from C at t90 = 15/1.00024");
    expect(r.surveys[0].stations[0].salinity.original).toBe("42.914");
  });

  it("readSurveyText() reads projected x/y with an EPSG code from the header and degrees-minutes positions", () => {
    const r = readSurveyText("station,x (EPSG:32633),y (EPSG:32633),salinity\nA,500000,0,1\n", { fileName: "utm.csv" });
    expect(r.mapping.epsg).toBe(32633);
    expectWithin(r.surveys[0].stations[0].lonLat?.[0], 15, 1e-9, "UTM 33 central meridian");
    const d = readSurveyText("station,lat,lon,salinity\nA,45 12.50 N,1 03.20 W,1\n", { fileName: "dm.csv" });
    expectWithin(d.surveys[0].stations[0].lonLat?.[1], 45 + 12.5 / 60, 1e-12, "DM latitude");
  });

  it("readSurveyText() reports x/y without an EPSG code as a file-level error", () => {
    const r = readSurveyText("station,easting,northing,salinity\nA,500000,0,1\n", { fileName: "xy.csv" });
    expect(r.issues.some((i) => i.row === 0 && i.severity === "error" && i.expected.includes("EPSG"))).toBe(true);
    expect(r.surveys[0].stations[0].lonLat).toBeUndefined();
  });

  it("readSurveyText() handles an empty file and a header-only file without throwing", () => {
    const e = readSurveyText("", { fileName: "empty.csv" });
    expect(e.summary.rowsRead).toBe(0);
    expect(e.issues.some((i) => i.severity === "error")).toBe(true);
    const h = readSurveyText("station,salinity\n", { fileName: "head.csv" });
    expect(h.summary.rowsRead).toBe(0);
    expect(h.issues.some((i) => i.expected.includes("data rows"))).toBe(true);
  });

  it("readSurveyText() reuses a saved mapping for a file of the same shape (headers in another order)", () => {
    const m = suggestMapping(["stn", "salinity", "iron"], []);
    const fixed = {
      ...m,
      columns: m.columns.map((c) =>
        c.header === "iron" ? { ...c, role: "constituent" as const, name: "Fe", unit: "nmol/L" } : c,
      ),
    };
    const r = readSurveyText("iron,stn,salinity\n5,A,1\n", { fileName: "again.csv", savedMappings: [fixed] });
    expectWithin(r.surveys[0].stations[0].values.Fe.value, 5, 0, "Fe through the saved mapping");
  });
});

describe("readSurveyText (units of depth, temperature, distance and discharge columns)", () => {
  it("readSurveyText() reports a depth in feet or a temperature in °F as an error and does not use the column (never a guess)", () => {
    const r = readSurveyText("station,depth (ft),temperature (degF),salinity,discharge (m3/s)\nA,3,50,1,10\n", {
      fileName: "u.csv",
    });
    expect(r.issues.filter((i) => i.severity === "error").map((i) => `${i.column}|${i.value}`)).toEqual([
      "depth (ft)|ft",
      "temperature (degF)|degF",
    ]);
    const a = r.surveys[0].stations[0];
    expect(a.depthM).toBeUndefined();
    expect(a.temperatureC).toBeUndefined();
    expect(r.surveys[0].riverDischargeM3s).toBe(10);
  });
});
