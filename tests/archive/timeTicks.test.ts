/**
 * The archive's date axis (analysis/archive/timeTicks.ts), shared by the dashboard's archive view and
 * the briefing: calendar ticks whose labels name what changes (common practice for time axes).
 */
import { describe, expect, it } from "vitest";
import { dayMs, paddedTimeDomain, timeTicks } from "../../analysis/index.ts";
import { percentChangeSeriesSvg } from "../../analysis/archive/archiveFigures.ts";
import type { ConstituentSeries } from "../../analysis/index.ts";

const DAY = 86_400_000;

describe("dayMs(), paddedTimeDomain(), timeTicks()", () => {
  it("reads the day of an ISO 8601 date or date-time and refuses other text", () => {
    expect(dayMs("2018-03-09")).toBe(Date.UTC(2018, 2, 9));
    expect(dayMs("2018-03-09T14:30:00-08:00")).toBe(Date.UTC(2018, 2, 9));
    expect(dayMs("9 March 2018")).toBeUndefined();
    expect(dayMs(undefined)).toBeUndefined();
  });

  it("pads the domain by 3 % of the span, at least 15 days", () => {
    const [a, b] = paddedTimeDomain([Date.UTC(2018, 0, 10), Date.UTC(2018, 0, 20)]);
    expect(a).toBe(Date.UTC(2018, 0, 10) - 15 * DAY);
    expect(b).toBe(Date.UTC(2018, 0, 20) + 15 * DAY);
    const long = paddedTimeDomain([Date.UTC(2016, 0, 1), Date.UTC(2022, 11, 31)]);
    expect(Date.UTC(2016, 0, 1) - long[0]).toBeCloseTo(0.03 * (Date.UTC(2022, 11, 31) - Date.UTC(2016, 0, 1)), -3);
  });

  it("labels one year by months (the year at January), several years by years, never the same label twice", () => {
    const oneYear = timeTicks(paddedTimeDomain([Date.UTC(2018, 0, 10), Date.UTC(2018, 11, 14)]), 8).map((t) => t.label);
    expect(oneYear).toContain("2018");
    expect(oneYear).toContain("April");
    expect(new Set(oneYear).size).toBe(oneYear.length);
    const sevenYears = timeTicks(paddedTimeDomain([Date.UTC(2016, 0, 13), Date.UTC(2022, 11, 6)]), 6).map(
      (t) => t.label,
    );
    expect(sevenYears.every((l) => /^20\d\d$/.test(l))).toBe(true);
    expect(new Set(sevenYears).size).toBe(sevenYears.length);
  });
});

describe("percentChangeSeriesSvg()", () => {
  const series = (points: ConstituentSeries["points"]): ConstituentSeries =>
    ({ name: "NH4", unit: "µmol/L", points }) as unknown as ConstituentSeries;

  it("says so in words when no survey has a determined % change, instead of an empty frame", () => {
    const svg = String(percentChangeSeriesSvg(series([]), ["winter"], "t"));
    expect(svg).toMatch(/No survey has a determined % change of NH4/);
    expect(svg).not.toMatch(/2000/);
  });
});
