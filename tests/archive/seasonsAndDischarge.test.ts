import { describe, expect, it } from "vitest";
import { DEFAULT_SEASONS, parseSeasons, seasonOf } from "../../analysis/archive/seasons.ts";
import { CUBIC_FOOT_M3, dischargeOnDate, readDischargeTable } from "../../analysis/archive/dischargeTable.ts";
import { expectWithin } from "../helpers/tolerance.ts";

describe("parseSeasons()", () => {
  it("reads ranges that wrap over the new year and single months", () => {
    const s = parseSeasons("wet=Dec-Apr, transition=May+Jun+Jul; dry=Aug-Nov");
    expect(s.map((x) => x.name)).toEqual(["wet", "transition", "dry"]);
    expect(s[0]!.months).toEqual([12, 1, 2, 3, 4]);
    expect(s[2]!.months).toEqual([8, 9, 10, 11]);
    expect(seasonOf("2019-01-15", s)).toBe("wet");
    expect(seasonOf("2019-09-30T10:00Z", s)).toBe("dry");
  });

  it("accepts month numbers and leaves unassigned months out", () => {
    const s = parseSeasons("early=1-4,late=8-11");
    expect(seasonOf("2020-06-01", s)).toBeUndefined();
    expect(seasonOf("2020-04-30", s)).toBe("early");
  });

  it("default seasons are meteorological (common practice)", () => {
    expect(seasonOf("2020-02-29", DEFAULT_SEASONS)).toBe("winter");
    expect(seasonOf("2020-12-01", DEFAULT_SEASONS)).toBe("winter");
    expect(seasonOf("2020-09-01", DEFAULT_SEASONS)).toBe("autumn");
  });

  it("names the bad part", () => {
    expect(() => parseSeasons("wet=Dex-Apr")).toThrow(/"Dex"/);
    expect(() => parseSeasons("a=Jan-Mar,b=Mar-May")).toThrow(/Mar is in both "a" and "b"/);
    expect(() => parseSeasons("Jan-Mar")).toThrow(/name=months/);
  });
});

describe("discharge table", () => {
  const text = "date,discharge_m3s\n2019-07-01,120\n2019-07-03,150.5\n7/10/2019,90\n2019-07-12,abc\n2019-07-03,99\n";

  it("readDischargeTable() reads ISO and M/D/YYYY dates, keeps rows, reports bad ones with row, column and value", () => {
    const t = readDischargeTable(text, "flows.csv");
    expect(t.rows.map((r) => r.date)).toEqual(["2019-07-01", "2019-07-03", "2019-07-10"]);
    expect(t.rows[1]!.dischargeText).toBe("150.5");
    expect(t.issues).toEqual([
      expect.objectContaining({ row: 5, column: "discharge_m3s", value: "abc", severity: "error" }),
      expect.objectContaining({ row: 6, column: "date", value: "2019-07-03", severity: "warning" }),
    ]);
    expect(t.unitNote).toMatch(/read as m³\/s/);
  });

  it("dischargeOnDate() takes the same day, else the nearest earlier day, and states it", () => {
    const t = readDischargeTable(text, "flows.csv");
    expect(dischargeOnDate(t, "2019-07-03")).toMatchObject({ dischargeM3s: 150.5, daysBefore: 0 });
    const l = dischargeOnDate(t, "2019-07-09T08:00:00Z")!;
    expect(l).toMatchObject({ dischargeM3s: 150.5, tableDate: "2019-07-03", daysBefore: 6 });
    expect(l.statement).toBe("discharge of 2019-07-03 (6 days before the survey) from flows.csv, row 3");
    expect(dischargeOnDate(t, "2019-06-30")).toBeUndefined();
    expect(dischargeOnDate(t, "2019-09-30")).toBeUndefined();
    expect(() => dischargeOnDate(t, "July")).toThrow(RangeError);
  });

  it("converts ft³/s to m³/s with 1 ft = 0.3048 m exactly (international yard and pound agreement, 1959)", () => {
    const t = readDischargeTable("Date,Flow (cfs)\n2020-01-01,1000\n", "q.csv");
    expectWithin(t.rows[0]!.dischargeM3s, 28.316846592, 1e-9, "1000 cfs");
    expectWithin(CUBIC_FOOT_M3, 0.028316846592, 1e-15, "ft³");
  });

  it("a table without two columns is one file-level error", () => {
    const t = readDischargeTable("just one column\n1\n", "bad.csv");
    expect(t.rows).toEqual([]);
    expect(t.issues[0]).toMatchObject({ row: 1, severity: "error" });
  });
});
