import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { stationSpeciation, SPECIATION_CAUTION } from "../../analysis/seawater/stationSpeciation.ts";
import { feSpeciation } from "../../analysis/seawater/feHydrolysis.ts";
import { FE_CONSTANT_SETS } from "../../analysis/seawater/feConstantSets.ts";
import { linearGrid } from "../../analysis/seawater/grid.ts";

describe("stationSpeciation()", () => {
  it("combines ionic strength from the mixing model, Fe(III) and Cd speciation consistently with the single functions", () => {
    const r = stationSpeciation({ pH: 7.8, salinity: 12, temperatureC: 18 }, { davies: { A: 0.5085 } });
    const fe = feSpeciation(
      7.8,
      FE_CONSTANT_SETS.baesMesmer1976,
      { salinity: 12, temperatureC: 18 },
      { davies: { A: 0.5085 } },
    );
    expectWithin(r.fe.fractions["Fe(OH)3"], fe.fractions["Fe(OH)3"], 1e-14, "Fe(OH)3");
    expectWithin(r.ionicStrength, r.majorIons?.ionicStrength ?? -1, 1e-15, "I");
    expectWithin(r.freeCdFraction, r.cd.fractions["Cd+2"], 1e-15, "free Cd");
    expect(r.caution).toBe(SPECIATION_CAUTION);
    expect(r.caution).toMatch(/not a compliance/);
  });
  it("warns about the pH scale with I = 0 constants unless the pH is on the NBS scale", () => {
    expect(
      stationSpeciation({ pH: 8, salinity: 30, temperatureC: 15 }, { pHScale: "total" }).warnings.join(" "),
    ).toMatch(/total scale/);
    expect(
      stationSpeciation({ pH: 8, salinity: 5, temperatureC: 15 }, { pHScale: "nbs" }).warnings.join(" "),
    ).not.toMatch(/scale/);
  });
  it("handles salinity above the sea end-member with a warning", () => {
    const r = stationSpeciation({ pH: 8.1, salinity: 37, temperatureC: 25 });
    expect(r.majorIons).toBeUndefined();
    expect(r.warnings.join(" ")).toMatch(/above the sea end-member/);
  });
  it("throws naming pH, salinity or the set when invalid", () => {
    expect(() => stationSpeciation({ pH: Number.NaN, salinity: 5, temperatureC: 10 })).toThrow(/pH/);
    expect(() => stationSpeciation({ pH: 7, salinity: -3, temperatureC: 10 })).toThrow(/salinity/);
    expect(() => stationSpeciation({ pH: 7, salinity: 3, temperatureC: 10 }, { feConstantSet: "x" })).toThrow(/"x"/);
  });
});

describe("linearGrid()", () => {
  it("returns n values from start to end inclusive and rejects n < 2", () => {
    expect(linearGrid(0, 35, 8)).toEqual([0, 5, 10, 15, 20, 25, 30, 35]);
    expect(() => linearGrid(0, 1, 1)).toThrow(/n must be/);
  });
});
