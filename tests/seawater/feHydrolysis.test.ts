import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import ref from "../reference/fe-hydrolysis.json";
import { FE_CONSTANT_SETS, feConstantSet } from "../../analysis/seawater/feConstantSets.ts";
import { FE_SPECIES, feConditionalConstants, feSpeciation } from "../../analysis/seawater/feHydrolysis.ts";
import { feSpeciationVsPh } from "../../analysis/seawater/feSeries.ts";
import { stepwiseCrossovers } from "../../analysis/seawater/predominance.ts";
import {
  feSolubilityLiuMillero2002NmolKg,
  ionicStrengthLiuMillero2002,
} from "../../analysis/seawater/feSolubilityLiuMillero.ts";

const at = (set: string, I: number | undefined) => ({
  salinity: 35,
  temperatureC: 25,
  ...(I === undefined || set === "liuMillero2002" ? {} : { ionicStrength: I }),
});

describe("feSpeciation() predominance boundaries", () => {
  for (const c of ref.boundaries) {
    it(`gives crossover pH ${c.expected.join(", ")} (${c.source})`, () => {
      const r = feSpeciation(7, feConstantSet(c.inputs.set), at(c.inputs.set, c.inputs.I));
      expect(r.boundaries.length).toBe(c.expected.length);
      r.boundaries.forEach((b, i) => expectWithin(b.pH, c.expected[i], c.tol, `${c.source} boundary ${i}`));
    });
  }
  it(`stepwise pH_n = log*β(n−1) − log*β(n) with Stefánsson 2007 gives 8.54 and 7.41, so Fe(OH)3⁰ never dominates (${ref.stepwise[0].source})`, () => {
    const c = ref.stepwise[0];
    const k = feConditionalConstants(FE_CONSTANT_SETS.stefansson2007, at("stefansson2007", 0));
    stepwiseCrossovers(k.logBeta).forEach((x, i) =>
      expectWithin(x, (c.expected as number[])[i], c.tol, `step ${i + 1}`),
    );
    const r = feSpeciation(8.2, FE_CONSTANT_SETS.stefansson2007, at("stefansson2007", 0));
    expect(r.boundaries.map((b) => b.above)).not.toContain(3);
  });
  it(`Baes & Mesmer direct Fe(OH)2⁺/Fe(OH)4⁻ boundary (log β2 − log β4)/2 = 7.97 (${ref.stepwise[1].source})`, () => {
    const k = feConditionalConstants(FE_CONSTANT_SETS.baesMesmer1976, at("baesMesmer1976", 0));
    expectWithin(
      ((k.logBeta[2] as number) - (k.logBeta[4] as number)) / 2,
      ref.stepwise[1].expected as number,
      ref.stepwise[1].tol,
      "direct",
    );
  });
});

describe("feSpeciation() fractions", () => {
  for (const c of ref.fractions) {
    it(`matches ${c.source} at pH ${c.inputs.pH}`, () => {
      const r = feSpeciation(c.inputs.pH, feConstantSet(c.inputs.set), at(c.inputs.set, c.inputs.I));
      c.expected.forEach((e, n) => {
        if (e === null) return;
        expectWithin(100 * r.fractions[FE_SPECIES[n]], e, c.tol, `${FE_SPECIES[n]} at pH ${c.inputs.pH}`);
      });
      expectWithin(
        Object.values(r.fractions).reduce((a, b) => a + b, 0),
        1,
        1e-12,
        "Σ fractions",
      );
    });
  }
});

describe("Liu & Millero 2002 seawater constants (Mar. Chem. 77, 43–54)", () => {
  it(`give log*β1..3 = −2.500, −6.518, −13.152 and log*Ks0 = 4.223 at 25 °C (${ref.liuMillero2002Constants[0].source})`, () => {
    const set = FE_CONSTANT_SETS.liuMillero2002;
    set
      .logBeta(25)
      .slice(0, 3)
      .forEach((x, i) => expectWithin(x, (ref.liuMillero2002Constants[0].expected as number[])[i], 6e-4, `β${i + 1}`));
    expectWithin(set.logKs0(25), ref.liuMillero2002Constants[1].expected as number, 6e-4, "Ks0");
    expect(set.logBeta(25)[3]).toBeUndefined();
  });
  it("warn when applied in brackish water and about the pH scale", () => {
    const r = feSpeciation(7.5, FE_CONSTANT_SETS.liuMillero2002, { salinity: 10, temperatureC: 20 });
    expect(r.constants.warnings.join(" ")).toMatch(/S = 10/);
    expect(r.constants.warnings.join(" ")).toMatch(/free/);
  });
});

describe("feSpeciation() with Davies and temperature", () => {
  it("lowers log*β1 by log γ(Fe³⁺) − log γ(FeOH²⁺) = −5A(√I/(1+√I) − 0.3I) (Davies 1962) and flags I > 0.5", () => {
    const k = feConditionalConstants(
      FE_CONSTANT_SETS.baesMesmer1976,
      { salinity: 35, temperatureC: 25, ionicStrength: 0.7 },
      { davies: { A: 0.5085 } },
    );
    const s = Math.sqrt(0.7);
    expectWithin(k.logBeta[1] as number, -2.19 - 0.5085 * 5 * (s / (1 + s) - 0.21), 1e-12, "β1c");
    expect(k.warnings.join(" ")).toMatch(/validity/);
  });
  it("shifts B&M constants with the van 't Hoff equation (ΔH 10.4 kcal/mol for *β1): log*β1(5 °C) = −2.19 − 10.4·4184/(R ln10)(1/278.15 − 1/298.15)", () => {
    const lb = FE_CONSTANT_SETS.baesMesmer1976.logBeta(5)[0];
    expectWithin(
      lb,
      -2.19 - ((10.4 * 4184) / (8.314462618 * Math.LN10)) * (1 / 278.15 - 1 / 298.15),
      1e-12,
      "β1(5 °C)",
    );
  });
  it("warns that Stefánsson 2007 is for 25 °C only", () => {
    expect(
      feSpeciation(8, FE_CONSTANT_SETS.stefansson2007, { salinity: 0, temperatureC: 10 }).constants.warnings.join(" "),
    ).toMatch(/25 °C only/);
  });
  it("gives Fe(OH)3(a) solubility log[Fe]_T = 4.891 − 3pH + log Σβn h⁻ⁿ at I = 0 (Ks0 of Fe(OH)3(a) as adopted by Nordstrom et al. 1990)", () => {
    const r = feSpeciation(8, FE_CONSTANT_SETS.baesMesmer1976, { salinity: 0, temperatureC: 25, ionicStrength: 0 });
    const sum = [0, -2.19, -5.67, -12.56, -21.6].reduce((a, lb, n) => a + Math.pow(10, lb + 8 * n), 0);
    expectWithin(r.logSolubilityMolKg, 4.891 - 24 + Math.log10(sum), 1e-12, "log solubility");
  });
  it("throws RangeError for pH outside 0…14 and an unknown set id", () => {
    expect(() => feSpeciation(15, FE_CONSTANT_SETS.baesMesmer1976, { salinity: 0, temperatureC: 25 })).toThrow(/pH/);
    expect(() => feConstantSet("nope")).toThrow(/"nope"/);
  });
});

describe("feSpeciationVsPh()", () => {
  it("returns one % series per species of the set, aligned with the pH grid, summing to 100", () => {
    const grid = [4, 6, 8, 10];
    const r = feSpeciationVsPh("liuMillero2002", { salinity: 35, temperatureC: 25 }, grid);
    expect(r.series.map((s) => s.key)).toEqual(["Fe+3", "FeOH+2", "Fe(OH)2+", "Fe(OH)3"]);
    grid.forEach((_, i) =>
      expectWithin(
        r.series.reduce((a, s) => a + s.values[i], 0),
        100,
        1e-9,
        `Σ at ${grid[i]}`,
      ),
    );
    expect(r.logSolubilityMolKg.length).toBe(4);
    expect(r.source).toMatch(/Liu, X., Millero, F.J., 2002/);
  });
  it("throws RangeError naming the bad grid value", () => {
    expect(() => feSpeciationVsPh("baesMesmer1976", { salinity: 0, temperatureC: 25 }, [7, Number.NaN])).toThrow(
      /pHGrid\[1\]/,
    );
  });
});

describe("feSolubilityLiuMillero2002NmolKg()", () => {
  it("gives 0.33 nM at S = 35, 25 °C (Liu & Millero 2002 fit as printed in the abstract; abstract: 0.3–0.5 nM)", () => {
    expectWithin(feSolubilityLiuMillero2002NmolKg(35, 25), 0.33, 0.005, "Fe(III) solubility");
  });
  it("uses I = 19.9225·S/(1000 − 1.005·S) (Liu & Millero 2002 abstract): 0.7227088 at S = 35 (the sheet's §2.2 prints 0.722711, 2e-6 off)", () => {
    expectWithin(ionicStrengthLiuMillero2002(35), (19.9225 * 35) / (1000 - 1.005 * 35), 1e-15, "I exact");
    expectWithin(ionicStrengthLiuMillero2002(35), 0.722711, 3e-6, "I vs sheet");
    expect(() => ionicStrengthLiuMillero2002(-2)).toThrow(/salinity/);
  });
});
