import { describe, expect, it } from "vitest";
import { summarizeArchive } from "../../analysis/archive/summarizeArchive.ts";
import { parseSeasons } from "../../analysis/archive/seasons.ts";
import { yearOnYear } from "../../analysis/archive/yearOnYear.ts";
import { syntheticArchive } from "./helpers/syntheticArchive.ts";

const STRONG = { pctAt1000: -30, pctPerDecade: 20, pctNoiseSd: 5, l1000Km: 60, exponent: -0.3, lNoiseSd: 0.05 };
const NULL = { pctAt1000: -30, pctPerDecade: 0, pctNoiseSd: 5, l1000Km: 60, exponent: -0.3, lNoiseSd: 0.05 };

describe("summarizeArchive() on seeded synthetic archives (invented data)", () => {
  it("has one point per survey in date order with date, discharge, class, intervals and zone", () => {
    const surveys = syntheticArchive(STRONG).reverse();
    const a = summarizeArchive(surveys);
    expect(a.nSurveys).toBe(84);
    expect(a.dateRange).toEqual(["2016-01-15", "2022-12-15"]);
    const si = a.series.find((s) => s.name === "Si")!;
    expect(si.unit).toBe("µmol/L");
    expect(si.points).toHaveLength(84);
    expect(si.points[0]!.date).toBe("2016-01-15");
    expect(si.points[0]).toMatchObject({
      class: expect.any(String),
      season: "winter",
      dischargeSource: expect.any(String),
    });
    expect(si.points[0]!.percentChange!.lower).toBeLessThan(si.points[0]!.percentChange!.value);
    expect(si.points[0]!.reactionZoneKm![1]).toBeGreaterThan(si.points[0]!.reactionZoneKm![0]);
    expect(si.byMonth.map((r) => r.month)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    expect(si.byMonth[0]!.nSurveys).toBe(7);
    expect(a.intrusion).toHaveLength(84);
  });

  it("the 95 % slope interval covers the true % change per tenfold discharge and the finding is stated", () => {
    const a = summarizeArchive(syntheticArchive(STRONG));
    const rel = a.series[0]!.vsDischarge.percentChange!;
    expect(rel.fit!.slopeLower).toBeLessThan(20);
    expect(rel.fit!.slopeUpper).toBeGreaterThan(20);
    expect(rel.exceedsUncertainty).toBe(true);
    expect(rel.spearman!.pValue).toBeLessThan(0.001);
    expect(a.statements.some((s) => s.startsWith("silicate (Si) % change rises with river discharge"))).toBe(true);
    expect(rel.band).toHaveLength(20);
  });

  it("the slope interval covers the truth in about 95 % of 100 seeded archives (nominal t coverage, Draper & Smith 1998 §1.4)", () => {
    let covered = 0;
    for (let seed = 1; seed <= 100; seed++) {
      const f = summarizeArchive(syntheticArchive(STRONG, seed)).series[0]!.vsDischarge.percentChange!.fit!;
      if (f.slopeLower < 20 && f.slopeUpper > 20) covered++;
    }
    // Binomial(100, 0.95): ≥ 0.88 holds with probability > 0.99.
    expect(covered / 100).toBeGreaterThanOrEqual(0.88);
  });

  it("states nothing about discharge when % change does not depend on it (null truth)", () => {
    const a = summarizeArchive(syntheticArchive(NULL, 11));
    const rel = a.series[0]!.vsDischarge.percentChange!;
    expect(rel.exceedsUncertainty).toBe(false);
    expect(rel.statement).toMatch(/within the uncertainty/);
    expect(a.statements.some((s) => s.includes("% change rises") || s.includes("% change falls"))).toBe(false);
  });

  it("salt intrusion: apparent exponent interval covers the truth −0.3 and the dry season has the longer intrusion", () => {
    const seasons = parseSeasons("wet=Jan-Apr,dry=Aug-Nov");
    const a = summarizeArchive(syntheticArchive(STRONG), { seasons });
    const sc = a.intrusionRelations.scaling!;
    expect(sc.lower!).toBeLessThan(-0.3);
    expect(sc.upper!).toBeGreaterThan(-0.3);
    const [wet, dry] = a.intrusionRelations.bySeason;
    expect(dry!.saltIntrusionKm!.median).toBeGreaterThan(wet!.saltIntrusionKm!.median);
    expect(a.intrusionRelations.seasonTest!.exceedsUncertainty).toBe(true);
    expect(a.statements.some((s) => s.startsWith("Salt intrusion (S = 2) differs between seasons"))).toBe(true);
  });

  it("finds a year that differs (+25 percentage points in 2019) and states it with the comparison's words", () => {
    const a = summarizeArchive(syntheticArchive({ ...NULL, yearShift: { year: 2019, pct: 25 } }, 3));
    const rows = a.series[0]!.percentChangeRelations.byYear;
    const y2019 = rows.find((r) => r.year === 2019)!;
    expect(y2019.differenceFromPrevious!.exceedsUncertainty).toBe(true);
    expect(
      a.statements.some((s) => /% change in 2019 was .* higher than in 2018 .*larger than the uncertainty/.test(s)),
    ).toBe(true);
    expect(a.statements.some((s) => /% change in 2020 was .* lower than in 2019/.test(s))).toBe(true);
    const quiet = rows.filter((r) => r.year < 2019 && r.differenceFromPrevious?.exceedsUncertainty);
    expect(quiet).toEqual([]);
  });

  it("leaves surveys without discharge out of the relations with a warning", () => {
    const surveys = syntheticArchive(STRONG).map((s) => ({
      ...s,
      survey: { ...s.survey, riverDischargeM3s: undefined as unknown as number },
    }));
    for (const s of surveys) delete (s.survey as { riverDischargeM3s?: number }).riverDischargeM3s;
    const a = summarizeArchive(surveys);
    expect(a.series[0]!.vsDischarge.percentChange).toBeUndefined();
    expect(a.warnings.map((w) => w.code)).toContain("no-discharge");
  });

  it("each point carries the discharge the survey's analysis used and where it came from (dischargeSource)", () => {
    const surveys = syntheticArchive(STRONG).slice(0, 3);
    const statement = "discharge of 2016-01-14 (1 day before the survey) from q.csv, row 2";
    surveys[0] = {
      ...surveys[0]!,
      survey: {
        ...surveys[0]!.survey,
        riverDischargeM3s: 42,
        dischargeSource: { origin: "table", statement, tableDate: "2016-01-14", daysBefore: 1 },
      },
    };
    const a = summarizeArchive(surveys);
    expect(a.series[0]!.points[0]).toMatchObject({ dischargeM3s: 42, dischargeSource: statement });
    expect(a.intrusion[0]!.dischargeM3s).toBe(42);
  });

  it("throws a RangeError for an empty archive", () => {
    expect(() => summarizeArchive([])).toThrow(RangeError);
  });
});

describe("yearOnYear()", () => {
  it("removes the season median before averaging, so a year sampled only in one season is not flagged for that reason", () => {
    const vals = [
      ...[2018, 2019, 2020].flatMap((year) => [
        { year, season: "wet", value: 10 + (year % 2) * 0.1 },
        { year, season: "wet", value: 10.2 },
        { year, season: "dry", value: 50 + (year % 2) * 0.1 },
        { year, season: "dry", value: 50.2 },
      ]),
      { year: 2021, season: "dry", value: 50.1 },
      { year: 2021, season: "dry", value: 50.2 },
    ];
    const rows = yearOnYear(vals, "km");
    expect(rows.map((r) => r.year)).toEqual([2018, 2019, 2020, 2021]);
    expect(Math.abs(rows[3]!.meanAnomaly!.value)).toBeLessThan(0.2);
    expect(rows[3]!.differenceFromPrevious!.exceedsUncertainty).toBe(false);
  });
});

describe("salt intrusion beyond the surveyed reach", () => {
  it("is carried as a bound (at least the landward-most km), never as a value", () => {
    const [s] = syntheticArchive(STRONG).slice(0, 1);
    const beyond = {
      ...s!,
      survey: { ...s!.survey, name: "central bay only" },
      salinityProfile: { km: [5, 20, 38], salinity: [30, 27, 24] } as never,
    };
    delete (beyond.survey as { saltIntrusionKm?: number }).saltIntrusionKm;
    const fresh = {
      ...beyond,
      survey: { ...beyond.survey, name: "all fresh" },
      salinityProfile: { km: [60, 80], salinity: [1.5, 0.1] } as never,
    };
    const a = summarizeArchive([s!, beyond, fresh]);
    const p = a.intrusion.find((x) => x.survey === "central bay only")!;
    expect(p.saltIntrusionKm).toBeUndefined();
    expect(p.saltIntrusionAtLeastKm).toBe(38);
    expect(a.intrusion.find((x) => x.survey === "all fresh")!.saltIntrusionAtMostKm).toBe(60);
  });
});
