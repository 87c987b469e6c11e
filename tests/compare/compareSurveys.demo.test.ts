import { describe, it, expect, beforeAll } from "vitest";
import { compareSurveys } from "../../analysis/compare/compareSurveys.ts";
import { comparisonToCsv } from "../../analysis/compare/comparisonCsv.ts";
import type { SurveyComparison } from "../../analysis/compare/types.ts";
import { expectWithin } from "../helpers/tolerance.ts";
import { demoAnalyses, truth } from "./helpers/demoAnalyses.ts";

const W = truth.surveys["wet-2025-03"]!;
const D = truth.surveys["dry-2025-09"]!;
let c: SurveyComparison;

beforeAll(() => {
  c = compareSurveys(demoAnalyses(200, ["Fe", "Mn", "Cd", "Ba", "Si"]));
});

const shift = (name: string) => c.shifts.find((s) => s.name === name)!;

describe("compareSurveys() on the invented demo surveys (data-demo truth.json, generator's noise-free model)", () => {
  it("compareSurveys() places wet-season salt intrusion (Q = 450 m³/s) shorter than dry (60 m³/s), each within 1 km of truth.json saltIntrusionKm.S2", () => {
    const [wet, dry] = c.intrusion;
    expect(wet!.survey).toBe("wet-2025-03");
    expect(wet!.saltIntrusionKm!).toBeLessThan(dry!.saltIntrusionKm!);
    expectWithin(wet!.saltIntrusionKm, W.saltIntrusionKm.S2, 1, "wet S = 2 intrusion [km]");
    expectWithin(dry!.saltIntrusionKm, D.saltIntrusionKm.S2, 1, "dry S = 2 intrusion [km]");
  });

  it("compareSurveys() apparent exponent n of L ∝ Q^n matches ln(L_dry/L_wet)/ln(Q_dry/Q_wet) of truth.json within 0.03, beside the −1, −1/3, −1/7 scalings (steady 1-D advection–dispersion closed form, derived; Monismith et al. 2002, from memory)", () => {
    const s = c.scaling.find((x) => x.salinity === 2)!;
    const nTrue = Math.log(D.saltIntrusionKm.S2 / W.saltIntrusionKm.S2) / Math.log(D.dischargeM3s / W.dischargeM3s);
    expectWithin(s.exponent, nTrue, 0.03, "apparent exponent");
    expect(s.nSurveys).toBe(2);
    expect(s.note).toMatch(/−1\/3/);
    expect(s.dischargeRangeM3s).toEqual([60, 450]);
  });

  it("compareSurveys() C*₀ changes (dry − wet) have the sign of truth.json effectiveRiverEndmember differences and cover them in their intervals (Fe, Mn, Cd, Ba)", () => {
    for (const name of ["Fe", "Mn", "Cd", "Ba"]) {
      const d = shift(name).effectiveEndmember!;
      const want = D.constituents[name]!.effectiveRiverEndmember - W.constituents[name]!.effectiveRiverEndmember;
      expect(Math.sign(d.value), `${name} sign of C*₀ change`).toBe(Math.sign(want));
      expect(d.lower <= want && want <= d.upper, `${name}: true change ${want} inside [${d.lower}, ${d.upper}]`).toBe(
        true,
      );
    }
  });

  it("compareSurveys() finds the % change of Si (conservative in truth.json) unchanged within the uncertainty", () => {
    const s = shift("Si");
    expect(s.classReference).toBe("conservative");
    expect(s.percentChange!.exceedsUncertainty).toBe(false);
  });

  it("compareSurveys() moves the Mn removal zone and the Cd maximum landward in the dry survey (truth.json: same zone salinities, intrusion 19.7 → 44.8 km)", () => {
    expect(shift("Mn").zone!.kmSeaward!.value).toBeGreaterThan(0);
    const cd = shift("Cd").maximum!;
    expect(cd.km!.value).toBeGreaterThan(0);
    expect(cd.salinity.exceedsUncertainty).toBe(false);
  });

  it("compareSurveys() moves the Ba addition zone landward in the dry survey (truth.json: zone S 2–10 in both surveys)", () => {
    expect(shift("Ba").zone!.kmLandward!.value).toBeGreaterThan(0);
    expect(shift("Ba").zone!.kmSeaward!.value).toBeGreaterThan(0);
  });

  it("compareSurveys() moves the Fe removal zone landward in the dry survey (truth.json: zone S 0.2–15 in both surveys)", () => {
    const z = shift("Fe").zone!;
    expect(z.kmLandward!.value).toBeGreaterThan(0);
    expect(z.kmSeaward!.value).toBeGreaterThan(0);
  });

  it("compareSurveys() moves the Ba maximum landward in the dry survey (truth.json maximumSalinity 4.8 wet / 4.5 dry)", () => {
    expect(shift("Ba").maximum!.km!.value).toBeGreaterThan(0);
  });

  it("comparisonToCsv() writes one header and a row per intrusion quantity and constituent quantity", () => {
    const csv = comparisonToCsv(c);
    const lines = csv.trimEnd().split("\r\n");
    expect(lines[0]).toBe(
      "section,reference_survey,survey,constituent,quantity,unit,reference_value,survey_value,difference,difference_lower95,difference_upper95,exceeds_uncertainty,note",
    );
    expect(lines.filter((l) => l.startsWith("intrusion,")).length).toBe(2 * (2 + 5));
    expect(lines.some((l) => l.startsWith("constituent,wet-2025-03,dry-2025-09,Fe,effective_endmember,nmol/L,"))).toBe(
      true,
    );
  });
});
