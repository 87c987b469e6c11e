import { describe, expect, it } from "vitest";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";
import { combineCells, selectLayer } from "../../analysis/io/layerSelection.ts";
import { normaliseStationId } from "../../analysis/io/stationIds.ts";
import { readStationTable } from "../../analysis/io/stationTable.ts";
import type { ImportedStation } from "../../analysis/io/importSummary.ts";
import { expectWithin } from "../helpers/tolerance.ts";

const table = readStationTable(
  "Station,Name,Latitude,Longitude\n007,Pier,45.1,-1.5\nB2,Buoy,45.2,-1.4\n12,Far,45.3,-1.3\n",
  { fileName: "stations.csv" },
);

const profiles = `station,date,depth_m,salinity,Fe (nmol/L)
7,2024-05-01,0.5,10,100
7,2024-05-01,5,20,<2
7,2024-05-01,10,30,60
b2 ,2024-05-01,1,15,80
b2 ,2024-05-01,3,25,70
99,2024-05-01,1,5,90
`;

describe("station table join and layer selection", () => {
  it("normaliseStationId() trims, ignores case, reads numeric ids as numbers and reports what it changed", () => {
    expect(normaliseStationId(" 007 ")).toEqual({ id: "7", changes: ["white space", "leading zeros"] });
    expect(normaliseStationId("2.0")).toEqual({ id: "2", changes: ["decimal form"] });
    expect(normaliseStationId("b2")).toEqual({ id: "B2", changes: ["case"] });
  });

  it("readSurveyText() with a station table joins by normalised id, reports leading zeros and case once per id, and unknown ids once", () => {
    const r = readSurveyText(profiles, { fileName: "profiles.csv", stationTable: table, layer: { kind: "all" } });
    const st = r.surveys.flatMap((s) => s.stations);
    expectWithin(st[0].lonLat?.[1], 45.1, 1e-12, "station 7 ← table 007");
    expectWithin(st[3].lonLat?.[0], -1.4, 1e-12, "station 'b2 ' ← table B2");
    const join = r.issues.filter((i) => i.expected.includes("stations.csv"));
    expect(join.map((i) => `${i.row}:${i.column}:${i.value}`)).toEqual(["2:station:7", "5:station:b2", "7:station:99"]);
    expect(join[0].expected).toContain("leading zeros");
    expect(r.issues.some((i) => i.value === "99" && i.expected.includes("position"))).toBe(true);
  });

  it("selectLayer('surface') keeps the shallowest sample per station and time; 'bottom' the deepest; both keep the contributing rows", () => {
    const r = readSurveyText(profiles, { fileName: "p.csv", stationTable: table, layer: { kind: "surface" } });
    const s = r.surveys[0].stations as ImportedStation[];
    expect(s.map((x) => `${x.id}@${x.depthM}`)).toEqual(["7@0.5", "b2@1", "99@1"]);
    expect(s[0].contributingRows).toEqual([2]);
    expect(s[0].layer).toBe("surface");
    const b = readSurveyText(profiles, { fileName: "p.csv", layer: { kind: "bottom" } }).surveys[0]
      .stations as ImportedStation[];
    expect(b.map((x) => `${x.id}@${x.depthM}`)).toEqual(["7@10", "b2@3", "99@1"]);
  });

  it("selectLayer('depthAveraged') averages accepted measured values (censored <2 left out of the mean) and keeps every original", () => {
    const r = readSurveyText(profiles, { fileName: "p.csv", layer: { kind: "depthAveraged" } });
    const s7 = r.surveys[0].stations[0] as ImportedStation;
    expectWithin(s7.salinity.value, 20, 1e-12, "mean salinity of 10, 20, 30");
    expectWithin(s7.values.Fe.value, 80, 1e-12, "mean Fe of 100 and 60");
    expect(s7.values.Fe.original).toBe("100 | <2 | 60");
    expect(s7.contributingRows).toEqual([2, 3, 4]);
  });

  it("selectLayer('depthRange') averages the rows inside the range and reports station-times with no sample in it", () => {
    const r = readSurveyText(profiles, { fileName: "p.csv", layer: { kind: "depthRange", minM: 2, maxM: 6 } });
    const s = r.surveys[0].stations;
    expect(s.map((x) => x.id)).toEqual(["7", "b2"]);
    expect(r.issues.some((i) => i.row === 7 && i.expected.includes("depthRange"))).toBe(true);
    expect(() => selectLayer([], { kind: "depthRange", minM: 5, maxM: 1 }, "x")).toThrow(RangeError);
  });

  it("selectLayer('surface') uses S/B layer labels when there is no numeric depth (labels as in NRE_Stats.csv)", () => {
    const r = readSurveyText("Station,Date,Depth,Sal_ppt\n0,7/20/2015,S,0.07\n0,7/20/2015,B,0.09\n", {
      fileName: "sb.csv",
      layer: { kind: "surface" },
    });
    expect(r.surveys[0].stations.map((s) => s.salinity.original)).toEqual(["0.07"]);
  });

  it("combineCells() of only censored cells keeps the largest detection limit", () => {
    const c = combineCells([
      { value: undefined, original: "<0.05", status: "belowDetection", detectionLimit: 0.05, accepted: true },
      { value: undefined, original: "<0.1", status: "belowDetection", detectionLimit: 0.1, accepted: true },
    ]);
    expect(c.status).toBe("belowDetection");
    expectWithin(c.detectionLimit, 0.1, 0, "largest limit");
  });
});
