import { describe, it, expect } from "vitest";
import { differenceOfEstimates, differenceWithoutInterval } from "../../analysis/compare/differenceOfEstimates.ts";
import { expectWithin } from "../helpers/tolerance.ts";

const z = 1.959963984540054; // 97.5 % normal quantile (Abramowitz & Stegun 1964, Table 26.1, from memory)

describe("differenceOfEstimates", () => {
  it("differenceOfEstimates() of independent normal estimates matches σ_d = sqrt(σa² + σb²) (Taylor 1997, §3.5, sums and differences in quadrature) within 1e-12", () => {
    const a = { value: 10, lower: 10 - z * 1, upper: 10 + z * 1, unit: "nmol/L" };
    const b = { value: 13, lower: 13 - z * 2, upper: 13 + z * 2, unit: "nmol/L" };
    const d = differenceOfEstimates(a, b);
    expectWithin(d.value, 3, 1e-12, "difference b − a");
    expectWithin(d.lower, 3 - z * Math.sqrt(5), 1e-12, "lower 95 % limit");
    expectWithin(d.upper, 3 + z * Math.sqrt(5), 1e-12, "upper 95 % limit");
    expect(d.exceedsUncertainty).toBe(false);
    expect(d.statement).toMatch(/within the uncertainty/);
  });

  it("differenceOfEstimates() of skewed intervals pairs the later's lower half-width with the reference's upper one (common practice, asymmetric quadrature)", () => {
    const a = { value: 0, lower: -1, upper: 3, unit: "%" };
    const b = { value: 10, lower: 6, upper: 11, unit: "%" };
    const d = differenceOfEstimates(a, b, "percentage points");
    expectWithin(d.lower, 10 - Math.hypot(4, 3), 1e-12, "lower = d − sqrt(b⁻² + a⁺²)");
    expectWithin(d.upper, 10 + Math.hypot(1, 1), 1e-12, "upper = d + sqrt(b⁺² + a⁻²)");
    expect(d.unit).toBe("percentage points");
    expect(d.exceedsUncertainty).toBe(true);
  });

  it("differenceOfEstimates() widens an interval that misses its estimate and says so (common practice)", () => {
    const d = differenceOfEstimates(
      { value: 5, lower: 1, upper: 2, unit: "salinity" },
      { value: 5, lower: 4, upper: 6, unit: "salinity" },
    );
    expectWithin(d.upper, Math.hypot(1, 4), 1e-12, "upper uses the widened reference lower half-width 4");
    expect(d.note).toMatch(/widened/);
  });

  it("differenceOfEstimates() rejects mixed units and non-finite values with RangeError naming the function", () => {
    expect(() =>
      differenceOfEstimates(
        { value: 1, lower: 0, upper: 2, unit: "nmol/L" },
        { value: 1, lower: 0, upper: 2, unit: "µmol/L" },
      ),
    ).toThrow(/differenceOfEstimates: units differ/);
    expect(() =>
      differenceOfEstimates(
        { value: Number.NaN, lower: 0, upper: 2, unit: "x" },
        { value: 1, lower: 0, upper: 2, unit: "x" },
      ),
    ).toThrow(RangeError);
  });

  it("differenceWithoutInterval() never claims to exceed an unknown uncertainty", () => {
    const d = differenceWithoutInterval(2, 7, "km");
    expectWithin(d.value, 5, 0, "difference");
    expect(d.exceedsUncertainty).toBe(false);
    expect(d.method).toBe("no-interval");
  });
});
