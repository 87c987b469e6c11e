import { describe, it, expect } from "vitest";
import { dischargeScaling, REFERENCE_SCALINGS } from "../../analysis/compare/dischargeScaling.ts";
import { expectWithin } from "../helpers/tolerance.ts";

/** x* = (K/U)·ln(S0/S*) with U = Q/A (steady 1-D advection–dispersion closed form, derived). */
const x2Km = (q: number, aM2: number, kM2s: number): number => ((kM2s / (q / aM2)) * Math.log(35 / 2)) / 1000;

describe("dischargeScaling", () => {
  it("dischargeScaling() recovers n = −1 for constant K (steady 1-D advection–dispersion closed form, derived: x₂ = 28.62 km at Q = 100 m³/s, A = 2000 m², K = 500 m²/s) within 1e-12", () => {
    expectWithin(x2Km(100, 2000, 500), 28.62, 0.005, "§5.1 check value x₂");
    const s = dischargeScaling(
      [100, 200, 400].map((q) => ({ dischargeM3s: q, lengthKm: x2Km(q, 2000, 500) })),
      "salt intrusion (S = 2)",
      2,
    )!;
    expectWithin(s.exponent, -1, 1e-12, "exponent");
    expectWithin(s.lower, -1, 1e-9, "interval collapses on an exact power law (lower)");
    expectWithin(s.upper, -1, 1e-9, "interval collapses on an exact power law (upper)");
    expect(s.note).toMatch(/Steeper|−1 and the gravitational/);
  });

  it("dischargeScaling() of two surveys with X2 ratio 0.9057 at doubled Q gives n = −1/7 (Monismith et al. 2002, exponent from memory) within 1e-4", () => {
    const s = dischargeScaling(
      [
        { dischargeM3s: 100, lengthKm: 60 },
        { dischargeM3s: 200, lengthKm: 60 * 0.9057 },
      ],
      "X2",
      2,
    )!;
    expectWithin(s.exponent, -1 / 7, 1e-4, "exponent");
    expect(s.lower).toBeUndefined();
    expect(s.note).toMatch(/Two surveys fix n exactly/);
  });

  it("dischargeScaling() of doubled Q with ratio 2^(−1/3) = 0.7937 gives n = −1/3 (Hansen & Rattray 1965 / Chatwin 1976 scaling, from memory) within 1e-4 and lists the three reference scalings", () => {
    const s = dischargeScaling(
      [
        { dischargeM3s: 50, lengthKm: 30 },
        { dischargeM3s: 100, lengthKm: 30 * 0.7937 },
      ],
      "L",
      2,
    )!;
    expectWithin(s.exponent, -1 / 3, 1e-4, "exponent");
    expect(REFERENCE_SCALINGS.map((r) => r.exponent)).toEqual([-1, -1 / 3, -1 / 7]);
    expect(s.references).toHaveLength(3);
  });

  it("dischargeScaling() returns undefined for one survey or one discharge, and throws RangeError for Q ≤ 0", () => {
    expect(dischargeScaling([{ dischargeM3s: 10, lengthKm: 5 }], "L", 2)).toBeUndefined();
    expect(
      dischargeScaling(
        [
          { dischargeM3s: 10, lengthKm: 5 },
          { dischargeM3s: 10, lengthKm: 6 },
        ],
        "L",
        2,
      ),
    ).toBeUndefined();
    expect(() => dischargeScaling([{ dischargeM3s: 0, lengthKm: 5 }], "L", 2)).toThrow(
      /dischargeScaling: dischargeM3s/,
    );
  });
});
