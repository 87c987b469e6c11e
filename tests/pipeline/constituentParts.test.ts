import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { analyzeSurvey, buildChannelNetwork, constituentPartOf, readSurveyText } from "../../analysis/index.ts";
import type { CenterlineGeoJson } from "../../analysis/index.ts";

describe("constituentPartOf(): constituents in parts of about equal work", () => {
  it("equal costs alternate between the parts (LPT rule, Graham 1969)", () => {
    expect(constituentPartOf([30, 30, 30, 30, 30], 2)).toEqual([0, 1, 0, 1, 0]);
  });

  it("the costliest go first, each to the least loaded part (Graham 1969 LPT worked example: 7,6,5,4,3 on 2)", () => {
    // 7 → p0, 6 → p1, 5 → p1 (6 < 7), 4 → p0 (7 < 11), 3 → p0 (11 = 11, lower part): loads 14 and 11
    expect(constituentPartOf([3, 7, 4, 6, 5], 2)).toEqual([0, 0, 0, 1, 1]);
  });

  it("one part takes everything; an empty list gives no parts", () => {
    expect(constituentPartOf([5, 1, 2], 1)).toEqual([0, 0, 0]);
    expect(constituentPartOf([], 3)).toEqual([]);
  });

  it("a count below 1 or a negative cost is a caller mistake (RangeError naming the argument)", () => {
    expect(() => constituentPartOf([1], 0)).toThrow(/count/);
    expect(() => constituentPartOf([1, -2], 2)).toThrow(/costs\[1\]/);
  });
});

describe("analyzeSurvey() with a part by names (invented demo estuary)", () => {
  const network = buildChannelNetwork(
    JSON.parse(readFileSync("data-demo/centerline.geojson", "utf8")) as CenterlineGeoJson,
  );
  const survey = readSurveyText(readFileSync("data-demo/surveys/both-surveys.csv", "utf8"), {
    fileName: "both-surveys.csv",
  }).surveys[0]!;
  const options = { network, bootstrapDraws: 200, seed: 5 };
  const whole = analyzeSurvey(survey, options);

  it("analyses only the constituents named, in survey order, each as in the whole analysis (common practice: a constituent's analysis depends on its own samples only)", () => {
    const part = analyzeSurvey(survey, { ...options, part: { names: ["Si", "Fe"] } });
    expect(part.constituents.map((c) => c.name)).toEqual(["Fe", "Si"]);
    for (const c of part.constituents) expect(c).toEqual(whole.constituents.find((w) => w.name === c.name));
    // The survey-wide results are the whole analysis's.
    expect(part.stations).toEqual(whole.stations);
    expect(part.survey).toEqual(whole.survey);
  });

  it("leaves out names the survey does not analyse", () => {
    const part = analyzeSurvey(survey, { ...options, part: { names: ["no such constituent"] } });
    expect(part.constituents).toEqual([]);
  });
});
