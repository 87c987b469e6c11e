/**
 * The plain-language verdict never claims more than the interval (analysis/mixing/verdict.ts).
 * Common practice: a 95 % interval that includes zero does not establish the sign of a net change.
 */
import { describe, expect, it } from "vitest";
import { verdictOf } from "../../analysis/mixing/verdict.ts";
import type { Estimate, MixingWarning } from "../../analysis/mixing/result.ts";

const est = (value: number, lower: number, upper: number): Estimate => ({ value, lower, upper, unit: "%" });

describe("verdictOf()", () => {
  it("states the net change when the interval excludes zero", () => {
    expect(verdictOf("removal", est(-40, -55, -22), est(60, 45, 78), "µmol/L", [])).toBe(
      "removal: net removal of 40 % (95 % interval -55 to -22 %)",
    );
  });

  it("does not state a sign when the interval crosses zero or ends at exactly 0 % (draws that kept the straight line)", () => {
    const crossing = verdictOf("addition", est(422, -71, 677), est(5, 1, 7), "µmol/L", []);
    expect(crossing).toMatch(/not determined in sign/);
    const touching = verdictOf("addition", est(241, 0, 396), est(28, 8, 40), "µmol/L", []);
    expect(touching).toMatch(/not determined in sign/);
    expect(touching).not.toMatch(/net addition/);
  });

  it("calls an interval wider than ±1000 % not determined and flags a negative C*₀", () => {
    const warnings: MixingWarning[] = [];
    const v = verdictOf("removal", est(-470, -2344, 2021), est(-0.85, -2, 1), "µmol/L", warnings);
    expect(v).toMatch(/% change not determined/);
    expect(warnings.map((w) => w.code)).toEqual(["effective-negative", "percent-not-determined"]);
  });

  it("leaves the net change undetermined in words when C*₀ is negative (real case: Neuse DON 2016-03-07, -173 % [-424, -78])", () => {
    // Common practice: C*₀ < 0 is not physical, so a removal of more than 100 % is an extrapolation artefact.
    const warnings: MixingWarning[] = [];
    const v = verdictOf("removal", est(-173, -424, -78), est(-252, -1122, 71), "µg/L", warnings);
    expect(v).toMatch(/net % change is not determined/);
    expect(v).not.toMatch(/net removal of/);
    expect(warnings.map((w) => w.code)).toEqual(["effective-negative"]);
  });
});
