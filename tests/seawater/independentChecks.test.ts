// Second, independent routes to the speciation and carbonate check values: published numbers and
// formulas evaluated inline here (not through the code under test), each naming its source.
import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import cdRef from "../reference/cd-chloride.json";
import daviesRef from "../reference/davies.json";
import feRef from "../reference/fe-hydrolysis.json";
import { conditionalLogK, daviesLogGamma, debyeHuckelA } from "../../analysis/seawater/davies.ts";
import { densityEos80 } from "../../analysis/seawater/densityEos80.ts";
import { cdChlorideSpeciation } from "../../analysis/seawater/cdChloride.ts";
import { CD_CHLORIDE_SETS } from "../../analysis/seawater/cdChlorideSets.ts";
import { FE_CONSTANT_SETS } from "../../analysis/seawater/feConstantSets.ts";
import { feSpeciation } from "../../analysis/seawater/feHydrolysis.ts";
import { carbonateConstantsAt } from "../../analysis/seawater/carbonateConstantsAt.ts";

/** Debye–Hückel limiting law, log γ = −A z² √I (Debye & Hückel 1923; from memory). */
const limitingLaw = (z: number, I: number, A: number) => -A * z * z * Math.sqrt(I);

describe("Davies against the Debye–Hückel limiting law (second route as I → 0)", () => {
  for (const z of [1, 2, 3]) {
    it(`log γ(z = ${z}) agrees within 0.5 % at I = 1e-5 and 5 % at I = 1e-3 (Debye & Hückel 1923 limiting law; from memory)`, () => {
      for (const [I, rel] of [
        [1e-5, 0.005],
        [1e-3, 0.05],
      ]) {
        const d = daviesLogGamma(z, I, { A: 0.5085 });
        expect(Math.abs(d / limitingLaw(z, I, 0.5085) - 1), `I = ${I}`).toBeLessThan(rel);
      }
    });
  }
  it("the derived Davies fixture at I = 0.001 lies within 5 % in log γ of the limiting law (fixture second route)", () => {
    for (const c of daviesRef.gamma.filter((g) => g.inputs.I === 0.001)) {
      const ll = limitingLaw(c.inputs.z, c.inputs.I, c.inputs.A);
      expect(Math.abs(Math.log10(c.expected) / ll - 1), c.source).toBeLessThan(0.05);
    }
  });
});

describe("Debye–Hückel A from fundamental constants (second route to the 1.82483e6 prefactor)", () => {
  // CODATA 2018 exact/recommended values (from memory): e, ε0, k_B, N_A.
  const e = 1.602176634e-19;
  const eps0 = 8.8541878128e-12;
  const kB = 1.380649e-23;
  const NA = 6.02214076e23;
  for (const t of [0, 25, 40]) {
    it(`A(${t} °C) = (2π N_A ρ_w)^½ (e²/(4π ε0 ε_r k_B T))^{3/2}/ln 10 agrees within 2e-4 (Malmberg & Maryott 1956 ε_r, from memory)`, () => {
      const T = t + 273.15;
      const epsR = 87.74 - 0.40008 * t + 9.398e-4 * t * t - 1.41e-6 * t ** 3;
      const rho = densityEos80(0, t, 0);
      const a =
        (Math.sqrt(2 * Math.PI * NA * rho) * Math.pow((e * e) / (4 * Math.PI * eps0 * epsR * kB * T), 1.5)) / Math.LN10;
      expectWithin(debyeHuckelA(t), a, 2e-4, `A(${t})`);
    });
  }
});

describe("Fe(III): Davies-corrected I = 0 constant against a constant measured at I = 0.7", () => {
  it("Baes & Mesmer 1976 log*β1 = −2.19 corrected to I = 0.7 (concentration scale) is −2.69, within 0.05 of −2.71 ± 0.03 measured in 0.7 molal NaClO4 (Byrne, Luo & Young 2000, abstract as confirmed in the project's reference notes)", () => {
    // Fe³⁺ + H2O ⇌ FeOH²⁺ + H⁺: reactant charge 3, product charges 2 and 1.
    const c = conditionalLogK(-2.19, [3], [2, 1], 0.7, { A: 0.5085 });
    expectWithin(c, -2.71, 0.05, "log*β1 at I = 0.7");
  });
  it("crossover pH of the Stefánsson 2007 set recomputed by subtraction from the constants printed in the abstract (−2.19, −5.76, −14.30, −21.71): 2.19, 3.57 and the direct Fe(OH)2⁺/Fe(OH)4⁻ boundary 7.975 (fixture second route)", () => {
    const b = [-2.19, -5.76, -14.3, -21.71];
    const direct = (b[1] - b[3]) / 2;
    const fixture = feRef.boundaries.find((x) => x.inputs.set === "stefansson2007")!;
    expectWithin(-b[0], fixture.expected[0], fixture.tol, "pH1");
    expectWithin(b[0] - b[1], fixture.expected[1], fixture.tol, "pH2");
    expectWithin(direct, fixture.expected[2], fixture.tol, "direct");
  });
  it("at each Baes & Mesmer crossover pH (I = 0) the two neighbouring species are equal (property of α_n; second route for the fraction fixture)", () => {
    const fixture = feRef.boundaries.find((x) => x.inputs.set === "baesMesmer1976")!;
    const b = [-2.19, -5.67, -12.56, -21.6];
    const exact = [-b[0], b[0] - b[1], b[1] - b[2], b[2] - b[3]];
    exact.forEach((pH, i) => {
      expectWithin(pH, fixture.expected[i], fixture.tol, `boundary ${i}`);
      const r = feSpeciation(pH, FE_CONSTANT_SETS.baesMesmer1976, { salinity: 0, temperatureC: 25, ionicStrength: 0 });
      const f = Object.values(r.fractions) as number[];
      expectWithin(f[i] / f[i + 1], 1, 1e-9, `α${i}/α${i + 1} at pH ${pH}`);
    });
  });
});

describe("Cd chloro-complexes: second routes to the derived seawater fixture", () => {
  it("conditional constants recomputed here from the Davies formula: log βc_n = log β°_n + log γ(Cd²⁺) + n log γ(Cl⁻) − log γ(CdCl_n) (derived)", () => {
    const I = 0.72263;
    const A = 0.5085;
    const lg = (z: number) => {
      const s = Math.sqrt(I);
      return -A * z * z * (s / (1 + s) - 0.3 * I);
    };
    cdRef.seawater.inputs.logBeta.forEach((lb, i) => {
      const n = i + 1;
      const c = lb + lg(2) + n * lg(-1) - lg(2 - n);
      expectWithin(c, cdRef.seawater.expected.logBetaConditional[i], cdRef.seawater.tol.logBetaConditional, `βc${n}`);
    });
  });
  it("free Cd²⁺ in S = 35 seawater is within a factor 3 of the published ≈ 1 % of dissolved Cd (Environ. Technol. Lett. 10, 1057–1070, 1989, abstract) for both built-in sets", () => {
    for (const set of Object.values(CD_CHLORIDE_SETS)) {
      const r = cdChlorideSpeciation(set, { salinity: 35, temperatureC: 25 }, {});
      expect(r.freeFraction, set.id).toBeGreaterThan(0.01 / 3);
      expect(r.freeFraction, set.id).toBeLessThan(0.01 * 3);
    }
  });
});

describe("carbonate: Lueker et al. 2000 equations as printed in the abstract (second route to the implementation)", () => {
  // pK1 = 3633.86/T − 61.2172 + 9.67770 ln T − 0.011555 S + 0.0001152 S²
  // pK2 = 471.78/T + 25.9290 − 3.16967 ln T − 0.01781 S + 0.0001122 S² (total scale; Mar. Chem. 70, 105–119)
  const pk1 = (S: number, T: number) => 3633.86 / T - 61.2172 + 9.6777 * Math.log(T) - 0.011555 * S + 0.0001152 * S * S;
  const pk2 = (S: number, T: number) => 471.78 / T + 25.929 - 3.16967 * Math.log(T) - 0.01781 * S + 0.0001122 * S * S;
  for (const [S, t] of [
    [35, 25],
    [20, 10],
    [40, 30],
  ]) {
    it(`pK1 and pK2 at S = ${S}, ${t} °C match the printed equations within 1e-10`, () => {
      const c = carbonateConstantsAt(S, t, "lueker2000");
      expectWithin(-Math.log10(c.k1Total), pk1(S, t + 273.15), 1e-10, "pK1");
      expectWithin(-Math.log10(c.k2Total), pk2(S, t + 273.15), 1e-10, "pK2");
    });
  }
});
