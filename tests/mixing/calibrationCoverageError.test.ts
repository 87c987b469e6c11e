import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { bandVerdict, coverageMcse, wilson95 } from "../../bench/calibration/coverageError.ts";

// Monte Carlo error of the calibration table's coverages (bench/calibration/coverageError.ts).
describe("calibration coverage Monte Carlo error", () => {
  it("MCSE of coverage = √(p(1 − p)/n_sim) (Morris, White & Crowther 2019, Stat Med 38:2074, Table 6; from memory): 95 % over 100 surveys → 2.18 %", () => {
    expectWithin(coverageMcse(0.95, 100), Math.sqrt(0.0475 / 100), 1e-15, "MCSE");
    expectWithin(coverageMcse(0.95, 100), 0.0218, 1e-4, "MCSE 95 %, 100 surveys");
    expect(() => coverageMcse(1.2, 100)).toThrow(RangeError);
  });

  it("Wilson score interval (Wilson 1927; Agresti & Coull 1998, from memory): 99/100 → 94.55–99.82 %, 100/100 → 96.30–100 %, hand-computed", () => {
    const [a, b] = wilson95(0.99, 100);
    expectWithin(a, 0.94548, 2e-4, "lower, 99/100");
    expectWithin(b, 0.99823, 2e-4, "upper, 99/100");
    const [c, d] = wilson95(1, 100);
    expectWithin(c, 0.96301, 2e-4, "lower, 100/100");
    expectWithin(d, 1, 0, "upper, 100/100");
  });

  it("a miss of the 90–98 % band is significant only when the whole Wilson interval lies outside it", () => {
    expect(bandVerdict(0.95, 100, 0.9, 0.98)).toBe("in");
    expect(bandVerdict(0.99, 100, 0.9, 0.98)).toBe("mc");
    expect(bandVerdict(1, 100, 0.9, 0.98)).toBe("mc");
    expect(bandVerdict(1, 400, 0.9, 0.98)).toBe("sig");
    expect(bandVerdict(0.85, 400, 0.9, 0.98)).toBe("sig");
  });
});
