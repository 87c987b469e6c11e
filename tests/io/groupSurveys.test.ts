import { describe, expect, it } from "vitest";
import { readSurveyText } from "../../analysis/io/readSurvey.ts";
import { expectWithin } from "../helpers/tolerance.ts";

const dated = `station,date,salinity,discharge (m3/s)
A,2024-05-01,1,100
B,2024-05-02,2,104
C,2024-05-04,3,101
D,2024-05-09,4,50
E,,5,50
`;

describe("survey grouping", () => {
  it("readSurveyText() splits by date gaps longer than 3 days (default) and keeps undated rows in their own survey with a warning", () => {
    const r = readSurveyText(dated, { fileName: "g.csv" });
    expect(r.surveys.map((s) => `${s.name}:${s.stations.map((x) => x.id).join("")}`)).toEqual([
      "2024-05-01:ABC",
      "2024-05-09:D",
      "(undated):E",
    ]);
    expect(r.surveys[0].endDate).toBe("2024-05-04");
    expect(r.issues.some((i) => i.expected.includes("(undated)"))).toBe(true);
  });

  it("readSurveyText() with gapDays 1 splits 2024-05-02 → 05-04 into two surveys; 'date' makes one per calendar day", () => {
    expect(readSurveyText(dated, { fileName: "g.csv", grouping: { by: "dateGap", gapDays: 1 } }).surveys.length).toBe(
      4,
    );
    expect(readSurveyText(dated, { fileName: "g.csv", grouping: { by: "date" } }).surveys.length).toBe(5);
  });

  it("readSurveyText() takes survey discharge as the mean of the rows' discharge column and warns when rows differ by more than 1 %", () => {
    const r = readSurveyText(dated, { fileName: "g.csv" });
    expectWithin(r.surveys[0].riverDischargeM3s, 305 / 3, 1e-12, "mean of 100, 104, 101");
    expect(r.issues.some((i) => i.column === "discharge" && i.expected.includes("2024-05-01"))).toBe(true);
    expectWithin(r.surveys[1].riverDischargeM3s, 50, 0, "single row");
  });

  it("readSurveyText() takes discharge from the option (number or by survey name) and groups by the survey column or by file", () => {
    const text = "survey,station,salinity\nwet,A,1\ndry,B,2\nwet,C,3\n";
    const r = readSurveyText(text, { fileName: "s.csv", riverDischargeM3s: { wet: 450 } });
    expect(r.surveys.map((s) => `${s.name}:${s.stations.length}:${s.riverDischargeM3s}`)).toEqual([
      "wet:2:450",
      "dry:1:undefined",
    ]);
    const f = readSurveyText(text, { fileName: "s.csv", grouping: { by: "file", name: "All" }, riverDischargeM3s: 60 });
    expect(f.surveys.map((s) => `${s.name}:${s.stations.length}:${s.riverDischargeM3s}`)).toEqual(["All:3:60"]);
    expect(() => readSurveyText(text, { fileName: "s.csv", grouping: { by: "dateGap", gapDays: -1 } })).toThrow(
      RangeError,
    );
  });
});
