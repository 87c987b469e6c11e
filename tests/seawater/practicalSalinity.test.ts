import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import unesco from "../reference/pss78-unesco1983.json";
import gsw from "../reference/gsw-examples.json";
import fixtures from "../reference/pss78-fixture-table.json";
import {
  practicalSalinityFromConductivity,
  practicalSalinityFromRt,
  pss78ValidityNote,
} from "../../analysis/seawater/practicalSalinity.ts";
import { PSS78, C3515_MS_CM } from "../../analysis/seawater/pss78Coefficients.ts";
import { hillRatioAtSp2 } from "../../analysis/seawater/hillExtension.ts";
import { t68FromT90, t90FromT68 } from "../../analysis/seawater/temperatureScale.ts";

describe("PSS-78 coefficients", () => {
  it("Σa = 35 and Σb = 0 (coefficient-entry self-test)", () => {
    expectWithin(
      PSS78.a.reduce((s, x) => s + x, 0),
      35,
      1e-12,
      "Σa",
    );
    expectWithin(
      PSS78.b.reduce((s, x) => s + x, 0),
      0,
      1e-12,
      "Σb",
    );
  });
  it("C(35, t68 = 15, 0) = 42.914 mS/cm (Culkin & Smith 1980, GSW-C gsw_c3515)", () => {
    expect(C3515_MS_CM).toBe(42.914);
  });
  it("t68FromT90/t90FromT68 use t68 = 1.00024·t90 (Saunders 1990) and invert each other", () => {
    expectWithin(t68FromT90(25), 25.006, 1e-12, "t68(25)");
    expectWithin(t90FromT68(t68FromT90(-1.7)), -1.7, 1e-14, "round trip");
    expect(() => t68FromT90(Number.NaN)).toThrow(TypeError);
  });
});

describe("practicalSalinityFromConductivity()", () => {
  for (const c of unesco.forward) {
    it(`matches ${c.source}: R = ${c.inputs.R}, t68 = ${c.inputs.t68}, p = ${c.inputs.pDbar} → S = ${c.expected}`, () => {
      const t90 = c.inputs.t68 / 1.00024;
      expectWithin(
        practicalSalinityFromConductivity(c.inputs.R * C3515_MS_CM, t90, c.inputs.pDbar),
        c.expected,
        c.tol,
        c.source,
      );
    });
  }

  it("reproduces the UNESCO 1983 40/40/10000 case exactly with R = 1.888091155578768", () => {
    expectWithin(practicalSalinityFromConductivity(1.888091155578768 * 42.914, 40 / 1.00024, 10000), 40, 1e-9, "S");
  });

  for (const c of gsw.SP_from_C) {
    it(`matches ${c.source} for C = ${c.inputs.C} within 1e-10`, () => {
      expectWithin(
        practicalSalinityFromConductivity(c.inputs.C, c.inputs.t90, c.inputs.pDbar),
        c.expected,
        c.tol,
        c.source,
      );
    });
  }

  for (const c of fixtures.cases) {
    it(`matches ${c.source}: C = ${c.inputs.C}, t90 = ${c.inputs.t90}, p = ${c.inputs.pDbar}`, () => {
      expectWithin(
        practicalSalinityFromConductivity(c.inputs.C, c.inputs.t90, c.inputs.pDbar),
        c.expected,
        c.tol,
        c.source,
      );
    });
  }

  for (const c of fixtures.hill) {
    it(`Hill et al. 1986 extension with GSW ratio matches ${c.source}, C = ${c.inputs.C} mS/cm`, () => {
      expectWithin(
        practicalSalinityFromConductivity(c.inputs.C, c.inputs.t90, c.inputs.pDbar),
        c.expected,
        c.tol,
        c.source,
      );
    });
  }

  it("is continuous at S = 2 (GSW Hill continuity ratio, Hill et al. 1986): both branches agree within 1e-9", () => {
    for (const t90 of [0, 10, 25, 35]) {
      const t68 = t68FromT90(t90);
      // conductivity just below and just above the branch point
      let lo = 0;
      let hi = 10;
      for (let i = 0; i < 200; i++) {
        const mid = 0.5 * (lo + hi);
        if (practicalSalinityFromConductivity(mid, t90, 0) < 2) lo = mid;
        else hi = mid;
      }
      expectWithin(practicalSalinityFromConductivity(lo, t90, 0), 2, 1e-9, `below S = 2 at ${t90} °C`);
      expectWithin(practicalSalinityFromConductivity(hi, t90, 0), 2, 1e-9, `above S = 2 at ${t90} °C`);
      expectWithin(hillRatioAtSp2(t68), 1, 1e-3, `Hill ratio at ${t90} °C is a small correction`);
    }
  });

  it("returns 0 for zero conductivity and never a negative salinity for near-pure water (documented clamp; common practice)", () => {
    expectWithin(practicalSalinityFromConductivity(0, 10, 0), 0, 1e-15, "C = 0");
    for (const c of [1e-6, 1e-4, 1e-3, 2e-3])
      expect(practicalSalinityFromConductivity(c, 25, 0)).toBeGreaterThanOrEqual(0);
  });

  it("throws RangeError/TypeError naming the argument for negative conductivity, negative pressure or NaN", () => {
    expect(() => practicalSalinityFromConductivity(-1, 10, 0)).toThrow(/conductivityMsCm/);
    expect(() => practicalSalinityFromConductivity(30, 10, -5)).toThrow(/pressureDbar/);
    expect(() => practicalSalinityFromConductivity(30, Number.NaN, 0)).toThrow(TypeError);
  });
});

describe("practicalSalinityFromRt()", () => {
  for (const c of gsw.SP_salinometer) {
    it(`matches ${c.source} for Rt = ${c.inputs.Rt} within 1e-10`, () => {
      expectWithin(practicalSalinityFromRt(c.inputs.Rt, c.inputs.t90), c.expected, c.tol, c.source);
    });
  }
  it("throws RangeError for Rt < 0", () => {
    expect(() => practicalSalinityFromRt(-0.1, 15)).toThrow(RangeError);
  });
});

describe("pss78ValidityNote()", () => {
  it("flags S > 42 and t outside −2…35 °C (UNESCO 1983 ranges, from memory) and is silent inside", () => {
    expect(pss78ValidityNote(35, 10, 0)).toBeUndefined();
    expect(pss78ValidityNote(45, 10, 0)).toMatch(/S = 45/);
    expect(pss78ValidityNote(30, 38, 0)).toMatch(/38 °C/);
  });
});
