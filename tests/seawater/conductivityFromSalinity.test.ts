import { describe, expect, it } from "vitest";
import { randomLcg, randomUniform } from "d3-random";
import { expectWithin } from "../helpers/tolerance.ts";
import unesco from "../reference/pss78-unesco1983.json";
import gsw from "../reference/gsw-examples.json";
import { conductivityFromPracticalSalinity } from "../../analysis/seawater/conductivityFromSalinity.ts";
import { practicalSalinityFromConductivity } from "../../analysis/seawater/practicalSalinity.ts";

describe("conductivityFromPracticalSalinity()", () => {
  for (const c of unesco.inverse) {
    it(`matches ${c.source}: S = ${c.inputs.S}, t68 = ${c.inputs.t68}, p = ${c.inputs.pDbar} → R = ${c.expected}`, () => {
      const r = conductivityFromPracticalSalinity(c.inputs.S, c.inputs.t68 / 1.00024, c.inputs.pDbar) / 42.914;
      expectWithin(r, c.expected, c.tol, c.source);
    });
  }

  it("does not reproduce the printed typo R = 0.498088 for S = 25, t68 = 0 (UNESCO 1983 CNDR table transcription)", () => {
    const r = conductivityFromPracticalSalinity(25, 0, 0) / 42.914;
    expect(Math.abs(r - 0.498088)).toBeGreaterThan(7e-5);
    expectWithin(r, 0.49800825, 1e-8, "R(25, 0, 0)");
  });

  for (const c of gsw.C_from_SP) {
    it(`matches ${c.source} for SP = ${c.inputs.SP} within 1e-9 mS/cm`, () => {
      expectWithin(
        conductivityFromPracticalSalinity(c.inputs.SP, c.inputs.t90, c.inputs.pDbar),
        c.expected,
        c.tol,
        c.source,
      );
    });
  }

  it("C(35, t90 = 15, 0) = 42.917540 and C(35, t68 = 15, 0) = 42.914000 mS/cm (temperature-scale trap)", () => {
    expectWithin(conductivityFromPracticalSalinity(35, 15, 0), 42.91754, 1e-6, "t90 = 15");
    expectWithin(conductivityFromPracticalSalinity(35, 15 / 1.00024, 0), 42.914, 1e-6, "t68 = 15");
  });

  it("inverts practicalSalinityFromConductivity() to 1e-10 on 500 seeded random points, Hill branch included (common practice)", () => {
    const u = randomUniform.source(randomLcg(20261202));
    const s = u(0.01, 42);
    const t = u(-2, 35);
    const p = u(0, 5000);
    for (let i = 0; i < 500; i++) {
      const sp = s();
      const tt = t();
      const pp = p();
      const c = conductivityFromPracticalSalinity(sp, tt, pp);
      expectWithin(practicalSalinityFromConductivity(c, tt, pp), sp, 1e-10, `point ${i}: S=${sp}, t=${tt}, p=${pp}`);
    }
  });

  it("returns 0 for S = 0 and throws RangeError naming salinity outside 0…50", () => {
    expect(conductivityFromPracticalSalinity(0, 10, 0)).toBe(0);
    expect(() => conductivityFromPracticalSalinity(-1, 10, 0)).toThrow(/salinity/);
    expect(() => conductivityFromPracticalSalinity(60, 10, 0)).toThrow(RangeError);
  });
});
