import { describe, expect, it } from "vitest";
import { splitHeaderUnit } from "../../analysis/io/headerUnits.ts";
import { normaliseConstituentName } from "../../analysis/io/constituentNames.ts";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";
import { suggestMapping } from "../../analysis/io/suggestMapping.ts";
import {
  applyUnitOverrides,
  mergeMapping,
  missingUnits,
  parseUnitOverride,
  suggestMappingForText,
  unusedColumns,
} from "../../analysis/io/mappingChoices.ts";
import { classifyTable } from "../../analysis/io/tableKind.ts";
import { variableKind } from "../../analysis/io/variableKinds.ts";
import type { ImportedStation } from "../../analysis/io/importSummary.ts";
import { expectWithin } from "../helpers/tolerance.ts";

describe("units written as header tokens (common practice in lab exports)", () => {
  it.each([
    ["Fe_umol_L", "Fe", "µmol/L"],
    ["Fe umol/L", "Fe", "µmol/L"],
    ["dFe_nM", "Fe", "nmol/L"],
    ["Fe_ug_L", "Fe", "µg/L"],
    ["Mn mg L-1", "Mn", "mg/L"],
    ["NO3 umol kg-1", "NO3", "µmol/kg"],
    ["oxygen (mg/L)", "O2", "mg/L"],
    ["turbidity (NTU)", "Turbidity", "NTU"],
  ])("splitHeaderUnit(%j) → %s in %s", (header, symbol, unit) => {
    const p = splitHeaderUnit(header);
    expect(p.unit).toBe(unit);
    expect(normaliseConstituentName(p.name)).toBe(symbol);
  });

  it("non-unit tokens stay in the name (Distance from Sta. 36, Oxygen % Saturation, Flushing_Time_d)", () => {
    for (const h of ["Distance from Sta. 36", "Oxygen % Saturation", "Flushing_Time_d", "Station_Number"])
      expect(splitHeaderUnit(h).unit).toBeUndefined();
  });

  it("suggestMapping() keeps oxygen and turbidity as non-mixing variables with their units; pFe is particulate", () => {
    const m = suggestMapping(["station", "salinity", "oxygen (mg/L)", "turbidity (NTU)", "Si_uM", "pFe_nM"]);
    const by = (h: string) => m.columns.find((c) => c.header === h)!;
    expect(by("oxygen (mg/L)")).toMatchObject({ role: "constituent", name: "O2", unit: "mg/L", kind: "nonMixing" });
    expect(by("turbidity (NTU)")).toMatchObject({ role: "constituent", unit: "NTU", kind: "nonMixing" });
    expect(by("Si_uM")).toMatchObject({ name: "Si", kind: "tracer" });
    expect(by("pFe_nM")).toMatchObject({ name: "Fe (particulate)", kind: "nonMixing" });
    expect(variableKind("Chla (discrete)", "µg/L", true).kind).toBe("nonMixing");
    expect(variableKind("DOC", "µmol/L", true).kind).toBe("tracer");
  });
});

describe("unit overrides, missing units, unused columns and mapping files", () => {
  const text = "Station,Date,Salinity,Silicate,Nitrite,Extinction_Coefficient,Mystery\nA,2024-01-01,1,100,1,2.1,5\n";

  it("missingUnits() lists every recognised constituent without a unit with the exact --unit option", () => {
    const miss = missingUnits(suggestMappingForText(text));
    expect(miss.map((m) => m.option)).toEqual(['--unit "Silicate=µmol/L"', '--unit "Nitrite=µmol/L"']);
  });

  it("parseUnitOverride() + applyUnitOverrides() set the unit by header or symbol and report unmatched columns", () => {
    const o = parseUnitOverride("Si=umol/L");
    expect(o).toEqual({ column: "Si", unit: "umol/L" });
    expect("error" in parseUnitOverride("Silicate")).toBe(true);
    expect("error" in parseUnitOverride("Silicate=furlongs")).toBe(true);
    const r = applyUnitOverrides(suggestMappingForText(text), [
      { column: "Si", unit: "umol/L" },
      { column: "Nope", unit: "nM" },
    ]);
    expect(r.mapping.columns.find((c) => c.header === "Silicate")?.unit).toBe("µmol/L");
    expect(r.unmatched.map((u) => u.column)).toEqual(["Nope"]);
    expect(missingUnits(r.mapping).map((m) => m.header)).toEqual(["Nitrite"]);
  });

  it("unusedColumns() names every numeric column that is neither used nor an error, with the reason", () => {
    const m = suggestMappingForText(text);
    const u = unusedColumns(
      m,
      ["Station", "Date", "Salinity", "Silicate", "Nitrite", "Extinction_Coefficient", "Mystery"],
      [["A", "2024-01-01", "1", "100", "1", "2.1", "5"]],
    );
    expect(u.map((x) => x.header)).toEqual(["Extinction_Coefficient", "Mystery"]);
    expect(u[0]!.reason).toContain("not a recognised constituent");
  });

  it("mergeMapping() keeps the suggestion for columns a partial mapping leaves out, and reports a malformed one field by field", () => {
    const suggested = suggestMappingForText(text);
    const merged = mergeMapping({ columns: [{ header: "Silicate", unit: "µmol/L" }] }, suggested);
    expect("mapping" in merged).toBe(true);
    if (!("mapping" in merged)) return;
    expect(merged.mapping.columns.find((c) => c.header === "Silicate")).toMatchObject({
      role: "constituent",
      unit: "µmol/L",
    });
    expect(merged.mapping.columns.find((c) => c.header === "Salinity")?.role).toBe("salinity");
    const bad = mergeMapping({ columns: [{ header: "Silicate", role: "colour" }] }, suggested);
    expect("errors" in bad && bad.errors[0]).toContain("columns.0.role");
    expect("errors" in mergeMapping({ columns: "all" }, suggested)).toBe(true);
  });

  it("classifyTable() reads a station id + distance table (no coordinates) as a station table, not a survey", () => {
    expect(
      classifyTable(
        ["Station", "Distance (km)"],
        [
          ["0", "0"],
          ["20", "20"],
        ],
      ),
    ).toBe("stationTable");
    expect(classifyTable(["Station", "Latitude", "Longitude"], [["1", "38", "-122"]])).toBe("stationTable");
    expect(classifyTable(["Station", "Distance (km)", "Salinity"], [["0", "0", "1"]])).toBe("survey");
  });
});

describe("depth-resolved surveys: one value per station, paired with the salinity of its own sample", () => {
  // A CTD cast at 1 m steps with the bottle (nutrients) at 2 m, as in the San Francisco Bay exports (SOURCE.md).
  const cast = `Station,Date,Depth,Salinity,Si (umol/L),Chla (ug/L)
5,2024-01-01,1,10,,3
5,2024-01-01,2,12,100,
5,2024-01-01,3,14,,
6,2024-01-01,1,20,,2
6,2024-01-01,2,,80,
6,2024-01-01,4,26,,
`;
  it("by default takes Si from 2 m with the 2 m salinity, chlorophyll from 1 m, one station per id, and says so once", () => {
    const r = readSurveyText(cast, { fileName: "cast.csv" });
    const st = r.surveys[0]!.stations as ImportedStation[];
    expect(st.map((s) => s.id)).toEqual(["5", "6"]);
    expect(r.layer).toEqual({ kind: "shallowest" });
    expectWithin(st[0]!.values.Si!.sampleSalinity, 12, 0, "Si paired with the 2 m salinity");
    expectWithin(st[0]!.values.Si!.sampleDepthM, 2, 0, "Si sample depth");
    expectWithin(st[0]!.salinity.value, 10, 0, "station salinity from the shallowest sample");
    // station 6 has no salinity at 2 m: the nearest depth (1 m, 20) is used and stated
    expectWithin(st[1]!.values.Si!.sampleSalinity, 20, 0, "nearest-depth salinity");
    expectWithin(st[1]!.values.Si!.salinityDepthM, 1, 0, "depth the salinity came from");
    expect(r.issues.filter((i) => i.expected.includes("shallowest sample")).length).toBe(1);
  });

  it('"average" pairs the 2 m nutrients with the salinity of the depths that have them, not the column mean', () => {
    const r = readSurveyText(cast, { fileName: "cast.csv", layer: { kind: "depthAveraged" } });
    const s5 = r.surveys[0]!.stations[0]!;
    expectWithin(s5.values.Si!.sampleSalinity, 12, 0, "salinity of the 2 m sample");
    expectWithin(s5.salinity.value, 12, 1e-12, "column-mean salinity (10, 12, 14)");
  });

  it('"all" keeps every row and warns once per repeated station with the count', () => {
    const r = readSurveyText(cast, { fileName: "cast.csv", layer: { kind: "all" } });
    const dup = r.issues.filter((i) => i.expected.includes("one row per station"));
    expect(dup.map((i) => i.value)).toEqual(["5", "6"]);
    expect(dup[0]!.expected).toContain("3 rows");
  });
});
