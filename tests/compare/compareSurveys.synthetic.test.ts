import { describe, it, expect } from "vitest";
import { compareSurveys } from "../../analysis/compare/compareSurveys.ts";
import type { ComparableSurvey } from "../../analysis/compare/types.ts";
import type { ConstituentAnalysis } from "../../analysis/mixing/result.ts";
import { expectWithin } from "../helpers/tolerance.ts";

const est = (value: number, half: number, unit: string) => ({ value, lower: value - half, upper: value + half, unit });

/** A survey whose stations follow S(x) = s0 − slope·x (km from the mouth), with one removal constituent. */
function survey(
  name: string,
  q: number | undefined,
  s0: number,
  slope: number,
  unit = "nmol/L",
  cStar = 70,
): ComparableSurvey {
  const stations = Array.from({ length: 21 }, (_, i) => ({
    id: `${name}-${i}`,
    alongChannelKm: i * 4,
    salinity: Math.max(0, s0 - slope * i * 4),
    offChannel: false,
  }));
  const fe: ConstituentAnalysis = {
    name: "Fe",
    unit,
    class: "removal-then-conservative",
    confidence: "normal",
    deviations: [],
    warnings: [],
    effectiveEndmember: est(cStar, 2, unit),
    percentChange: est(-92, 1, "%"),
    reactionZone: {
      salinity: [5, 15],
      km: [],
      kind: "removal",
      salinityLower: est(5, 0.5, "salinity"),
      salinityUpper: est(15, 1, "salinity"),
    },
  };
  const intrusion = (s0 - 2) / slope;
  return {
    survey: {
      name,
      ...(q !== undefined ? { riverDischargeM3s: q } : {}),
      saltIntrusionKm: intrusion,
      saltIntrusionSalinity: 2,
      isohalines: [{ salinity: 2, km: [intrusion] }],
      nStations: stations.length,
    },
    stations,
    constituents: [fe],
  };
}

describe("compareSurveys() on synthetic linear salinity profiles (linear interpolation of S(x), common practice)", () => {
  it("compareSurveys() maps the zone bounds through each S(x): S = 30 − x vs S = 35 − x/2 puts S = 15 at km 15 vs 40 and S = 5 at km 25 vs 60 (within 1e-9 km)", () => {
    const c = compareSurveys([survey("ref", 200, 30, 1), survey("later", 50, 35, 0.5)]);
    const z = c.shifts[0]!.zone!;
    expectWithin(z.kmSeaward!.reference, 15, 1e-9, "ref seaward end");
    expectWithin(z.kmSeaward!.later, 40, 1e-9, "later seaward end");
    expectWithin(z.kmLandward!.value, 35, 1e-9, "landward shift");
    expect(z.kmSeaward!.exceedsUncertainty).toBe(true);
    expect(z.salinityTo.exceedsUncertainty).toBe(false);
    expectWithin(c.shifts[0]!.effectiveEndmember!.value, 0, 1e-12, "no C*₀ change");
  });

  it("compareSurveys() warns instead of comparing when units differ, and leaves surveys without discharge out of the exponent", () => {
    const c = compareSurveys([survey("a", undefined, 30, 1), survey("b", 50, 35, 0.5, "µmol/L")]);
    expect(c.shifts[0]!.warnings.map((w) => w.code)).toEqual(["unit-mismatch"]);
    expect(c.shifts[0]!.effectiveEndmember).toBeUndefined();
    expect(c.warnings.map((w) => w.code)).toContain("no-discharge");
    expect(c.scaling).toEqual([]);
  });

  it("compareSurveys() throws RangeError naming the function for fewer than two surveys or a bad reference index", () => {
    expect(() => compareSurveys([survey("a", 1, 30, 1)])).toThrow(/compareSurveys: analyses must hold at least 2/);
    expect(() => compareSurveys([survey("a", 1, 30, 1), survey("b", 2, 30, 1)], { referenceIndex: 2 })).toThrow(
      /referenceIndex/,
    );
  });

  it("compareSurveys({ referenceIndex: 1 }) compares against the second survey", () => {
    const c = compareSurveys([survey("a", 100, 30, 1), survey("b", 50, 35, 0.5)], { referenceIndex: 1 });
    expect(c.referenceSurvey).toBe("b");
    expect(c.shifts[0]!.survey).toBe("a");
    expect(c.shifts[0]!.zone!.kmSeaward!.value).toBeLessThan(0);
  });
});
