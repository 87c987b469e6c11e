import { describe, expect, it } from "vitest";
import { readFileSync } from "node:fs";
import { analyzeSurvey, buildChannelNetwork, constituentSamples, readSurveyText } from "../../analysis/index.ts";
import type { CenterlineGeoJson, Station, Survey, ValueCell } from "../../analysis/index.ts";
import { expectWithin } from "../helpers/tolerance.ts";

interface TruthConstituent {
  effectiveRiverEndmember: number;
  behaviour: string;
}
interface TruthSurvey {
  dischargeM3s: number;
  saltIntrusionKm: { S2: number };
  stationCount: number;
  constituents: Record<string, TruthConstituent>;
}
const truth = JSON.parse(readFileSync("data-demo/truth.json", "utf8")) as { surveys: Record<string, TruthSurvey> };
const network = buildChannelNetwork(
  JSON.parse(readFileSync("data-demo/centerline.geojson", "utf8")) as CenterlineGeoJson,
);
const surveys = readSurveyText(readFileSync("data-demo/surveys/both-surveys.csv", "utf8"), {
  fileName: "both-surveys.csv",
}).surveys;

describe("analyzeSurvey() on the invented demo estuary (generator truth, data-demo/truth.json)", () => {
  for (const survey of surveys) {
    const t = truth.surveys[survey.name]!;
    const a = analyzeSurvey(survey, { network, bootstrapDraws: 400, seed: 3 });

    it(`${survey.name}: places every station, reads the discharge from the file and finds the S = 2 intrusion within 1.5 km of the model's`, () => {
      expect(a.stations).toHaveLength(t.stationCount);
      expect(a.stations.every((s) => s.alongChannelKm !== undefined && s.offsetM !== undefined)).toBe(true);
      expect(a.survey.riverDischargeM3s).toBe(t.dischargeM3s);
      expectWithin(a.survey.saltIntrusionKm, t.saltIntrusionKm.S2, 1.5, `${survey.name} salt intrusion (S = 2) [km]`);
      expect(a.caution).toMatch(/screening/i);
    });

    it(`${survey.name}: the generator's effective river end-members lie within 3 bootstrap half-widths for every constituent, with zones placed on the channel`, () => {
      for (const [name, tc] of Object.entries(t.constituents)) {
        const c = a.constituents.find((x) => x.name === name)!;
        const e = c.effectiveEndmember!;
        const half = Math.max(e.upper - e.value, e.value - e.lower);
        expectWithin(e.value, tc.effectiveRiverEndmember, 3 * half + 1e-9, `${survey.name} ${name} C*0 [${c.unit}]`);
        if (c.reactionZone) expect(c.reactionZone.km.length).toBeGreaterThan(0);
      }
    });
  }

  it("analyzeSurvey() reports the stations S(x) leaves out (an off-channel station) instead of calling S(x) non-monotonic", () => {
    const dry = analyzeSurvey(surveys[1]!, { network, bootstrapDraws: 50 });
    expect(dry.warnings.map((w) => w.code)).toContain("offChannel");
    expect(dry.warnings.map((w) => w.code)).toContain("profile-main-stem");
    expect(dry.salinityProfile?.monotone).toBe(true);
  });
});

describe("constituentSamples() (censored values are never zero; common practice)", () => {
  const cell = (over: Partial<ValueCell>): ValueCell => ({
    value: undefined,
    original: "",
    status: "missing",
    accepted: true,
    ...over,
  });
  const station = (id: string, s: number, v: ValueCell): Station => ({
    id,
    salinity: cell({ value: s, original: String(s), status: "measured" }),
    values: { Fe: v },
    sourceRow: 2,
    sourceFile: "x.csv",
  });
  it("keeps below-detection values with their limit, leaves out 'ND' without a limit and counts every station left out by reason", () => {
    const stations = [
      station("A", 0.1, cell({ value: 800, original: "800", status: "measured" })),
      station("B", 20, cell({ original: "<4", status: "belowDetection", detectionLimit: 4 })),
      station("C", 30, cell({ original: "ND", status: "belowDetection" })),
      station("D", 10, cell({ original: "", status: "missing" })),
      station("E", 12, cell({ original: "abc", status: "invalid" })),
      station("F", 14, cell({ value: 99, original: "99", status: "measured", accepted: false, qcFlag: "4" })),
    ];
    const { samples, leftOut } = constituentSamples(stations, "Fe");
    expect(samples.map((s) => s.stationId)).toEqual(["A", "B", "F"]);
    expect(samples[1]).toMatchObject({ censored: true, detectionLimit: 4 });
    expect(samples[2]).toMatchObject({ accepted: false });
    expect(leftOut).toEqual({ "below detection without a stated limit": 1, "value missing": 1, "value unreadable": 1 });
  });

  it("analyzeSurvey() without a centerline still analyses mixing and says which constituents it did not know", () => {
    const s: Survey = { ...surveys[0]!, stations: surveys[0]!.stations.map((st) => ({ ...st })) };
    const a = analyzeSurvey(s, { bootstrapDraws: 20, constituents: ["Si", "Zz"] });
    expect(a.constituents.map((c) => c.name)).toEqual(["Si"]);
    expect(a.warnings.map((w) => w.code)).toContain("unknown-constituent");
    expect(a.survey.isohalines).toEqual([]);
  });
});
