import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import ref from "../reference/davies.json";
import {
  conditionalLogK,
  daviesActivityCoefficient,
  daviesValidityWarning,
  debyeHuckelA,
} from "../../analysis/seawater/davies.ts";

describe("daviesActivityCoefficient() (Davies 1962, 0.3 I)", () => {
  for (const c of ref.gamma) {
    it(`gives γ(z = ${c.inputs.z}, I = ${c.inputs.I}) = ${c.expected} with A pinned to 0.5085 (${c.source})`, () => {
      expectWithin(daviesActivityCoefficient(c.inputs.z, c.inputs.I, { A: c.inputs.A }), c.expected, c.tol, c.source);
    });
  }
  it("gives γ = 1 for neutral species and at I = 0", () => {
    expect(daviesActivityCoefficient(0, 0.7)).toBe(1);
    expect(daviesActivityCoefficient(2, 0)).toBe(1);
  });
  it("throws RangeError for negative ionic strength or a non-integer charge", () => {
    expect(() => daviesActivityCoefficient(1, -0.1)).toThrow(/ionicStrength/);
    expect(() => daviesActivityCoefficient(1.5, 0.1)).toThrow(/charge/);
  });
});

describe("debyeHuckelA()", () => {
  for (const c of ref.A) {
    it(`gives A(${c.inputs.temperatureC} °C) = ${c.expected} (${c.source})`, () => {
      expectWithin(debyeHuckelA(c.inputs.temperatureC), c.expected, c.tol, c.source);
    });
  }
  it("differs from the classical 0.5085 (from memory) at 25 °C only through the dielectric constant (derived: A ∝ (ε_r T)^-3/2)", () => {
    expectWithin(debyeHuckelA(25), 0.5085, 0.003, "A(25) vs 0.5085");
  });
});

describe("daviesValidityWarning()", () => {
  it("flags I above 0.5 mol/kg (Stumm & Morgan 1996 validity limit, from memory) and is silent below", () => {
    expect(daviesValidityWarning(0.4)).toBeUndefined();
    expect(daviesValidityWarning(0.72)).toMatch(/validity/);
  });
});

describe("conditionalLogK()", () => {
  it("log βc(CdCl⁺) = 1.98 + log γ2 + log γ1 − log γ1 = 1.486 at I = 0.72263, A = 0.5085 (derived; recomputed independently in independentChecks.test.ts)", () => {
    expectWithin(conditionalLogK(1.98, [2, -1], [1], 0.72263, { A: 0.5085 }), 1.486, 6e-4, "log βc1");
  });
});
