/**
 * surveyDischarge(): the one precedence of a survey's river discharge (setting > the user's value
 * > the survey's own > a table joined by date), and the CLI cache key following it. Invented
 * surveys and an invented flows table (not measurements).
 */
import { describe, expect, it } from "vitest";
import {
  DISCHARGE_PRECEDENCE,
  readDischargeTable,
  surveyDischarge,
  type Survey,
  type WorkspaceInputs,
} from "../../analysis/index.ts";
import { cacheKeys } from "../../cli/archive/analyzeArchive.ts";
import { surveySetup } from "../../cli/archive/surveyTask.ts";

/** INVENTED flows. */
const table = readDischargeTable("date,Q (m3/s)\n2019-07-01,120\n2019-07-03,150\n", "invented.csv");
const own = { name: "a", startDate: "2019-07-05T10:00:00Z", riverDischargeM3s: 80 };
const bare = { name: "b", startDate: "2019-07-05T10:00:00Z" };

describe("surveyDischarge() precedence (common practice: an explicit choice over data, data given with the survey over a gauge joined by date)", () => {
  it("the setting for every survey wins over everything", () => {
    expect(surveyDischarge(own, { settingM3s: 5, chosenM3s: 7, table })).toMatchObject({
      dischargeM3s: 5,
      origin: "setting",
    });
  });

  it("the user's value for the survey (a number, or by name) wins over the file and the table", () => {
    expect(surveyDischarge(own, { chosenM3s: 7, table })).toMatchObject({ dischargeM3s: 7, origin: "option" });
    expect(surveyDischarge(own, { chosenM3s: { a: 9 }, table })).toMatchObject({ dischargeM3s: 9, origin: "option" });
    // A value for another survey does not apply.
    expect(surveyDischarge(own, { chosenM3s: { z: 9 }, table })).toMatchObject({ dischargeM3s: 80, origin: "file" });
  });

  it("the survey's own discharge wins over the table", () => {
    expect(surveyDischarge(own, { table })).toMatchObject({ dischargeM3s: 80, origin: "file" });
  });

  it("a survey without one takes the table row of its day, else the nearest earlier day, with tableDate and daysBefore", () => {
    expect(surveyDischarge(bare, { table })).toEqual({
      dischargeM3s: 150,
      origin: "table",
      statement: "discharge of 2019-07-03 (2 days before the survey) from invented.csv, row 3",
      tableDate: "2019-07-03",
      daysBefore: 2,
    });
    expect(surveyDischarge({ name: "c", startDate: "2019-06-30" }, { table })).toBeUndefined();
    expect(surveyDischarge({ name: "d" }, { table })).toBeUndefined();
    expect(surveyDischarge(bare)).toBeUndefined();
  });

  it("the stated precedence names every level in order", () => {
    const at = ["analysis setting", "--discharge", "discharge column", "discharge table"].map((w) =>
      DISCHARGE_PRECEDENCE.indexOf(w),
    );
    expect(at.every((i) => i >= 0)).toBe(true);
    expect([...at].sort((x, y) => x - y)).toEqual(at);
  });

  it("a bad table is a caller mistake (TypeError)", () => {
    expect(() => surveyDischarge(bare, { table: {} as never })).toThrow(TypeError);
  });
});

describe("CLI cache key follows the resolved discharge", () => {
  const survey = { ...bare, stations: [], constituents: [] } as unknown as Survey;
  const inputs = {
    surveys: [survey],
    files: [],
    issues: [],
    notices: [],
    summary: {},
    choices: {},
  } as unknown as WorkspaceInputs;
  const key = (settings: Parameters<typeof surveySetup>[1]) => cacheKeys([survey], surveySetup(inputs, settings))[0];

  it("changes when the table gives the survey another discharge, not when an unrelated row changes", () => {
    const other = readDischargeTable("date,Q (m3/s)\n2019-07-01,120\n2019-07-03,151\n", "invented.csv");
    const unrelated = readDischargeTable("date,Q (m3/s)\n2019-07-01,999\n2019-07-03,150\n", "invented.csv");
    const base = key({ bootstrapDraws: 10 });
    const withTable = key({ bootstrapDraws: 10, dischargeTable: table });
    expect(withTable).not.toBe(base);
    expect(key({ bootstrapDraws: 10, dischargeTable: other })).not.toBe(withTable);
    expect(key({ bootstrapDraws: 10, dischargeTable: unrelated })).toBe(withTable);
  });
});
