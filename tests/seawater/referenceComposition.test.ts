import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { REFERENCE_COMPOSITION, referenceCompositionSummary } from "../../analysis/seawater/referenceComposition.ts";
import {
  SEA_SALT_MOLAR_MASS_G_MOL,
  SEA_SALT_VALENCE_FACTOR,
  ionicStrengthDoe,
  ionicStrengthFromSalinity,
} from "../../analysis/seawater/ionicStrength.ts";
import {
  chlorinityFromSalinity,
  practicalSalinityFromKnudsen,
  referenceSalinityFromPractical,
  salinityFromChlorinity,
} from "../../analysis/seawater/salinityScales.ts";

describe("referenceCompositionSummary() (Millero et al. 2008, Deep-Sea Res. I 55, Table 4)", () => {
  const s = referenceCompositionSummary();
  it("is charge balanced: Σ z·m = 0 within 1e-12 mol/kg4⁻ = 0.0001008, §0.5)", () => {
    expectWithin(s.chargeBalanceMolKg, 0, 1e-12, "Σ z m");
  });
  it("sums to SR = 35.16504 g/kg within 2e-5 g/kg and 1.1197696 mol/kg", () => {
    expectWithin(s.totalGKg, 35.16504, 2e-5, "Σ mass");
    expectWithin(s.totalMolKg, 1.1197696, 1e-9, "Σ m");
  });
  it("has mean molar mass 31.4038218 g/mol (GSW-C gsw_atomic_weight) within 1e-5", () => {
    expectWithin(s.meanMolarMassGMol, SEA_SALT_MOLAR_MASS_G_MOL, 1e-5, "M_S");
  });
  it("has valence factor Σ x z² = 1.2452898 (GSW-C gsw_valence_factor) within 1e-6", () => {
    expectWithin(s.valenceFactor, SEA_SALT_VALENCE_FACTOR, 1e-6, "Z²");
  });
  it("gives I = Σ ½ z² m/(1 − SR/1000) = 0.722630 mol/kg-H2O", () => {
    const i = REFERENCE_COMPOSITION.reduce((a, sp) => a + 0.5 * sp.charge * sp.charge * sp.molKg, 0) / 0.96483496;
    expectWithin(i, 0.72263, 1e-6, "I");
  });
  it("total boron B(OH)3 + B(OH)4⁻ = 0.0004151 mol/kg", () => {
    const b = REFERENCE_COMPOSITION.filter((x) => x.species.startsWith("B(OH)")).reduce((a, x) => a + x.molKg, 0);
    expectWithin(b, 0.0004151, 1e-9, "B_T");
  });
});

describe("ionicStrengthFromSalinity() (TEOS-10 Manual Table L.1; GSW gsw_ionic_strength_from_SA)", () => {
  it("reproduces the GSW published example SA = 34.7118 → I = 0.712981183609951 within 1e-12", () => {
    expectWithin(ionicStrengthFromSalinity((34.7118 * 35) / 35.16504), 0.712981183609951, 1e-12, "GSW example");
  });
  const table: Array<[number, number, number]> = [
    [1, 0.019941, 0.019944],
    [5, 0.100106, 0.100123],
    [10, 0.201227, 0.201263],
    [20, 0.406581, 0.406654],
    [35, 0.72263, 0.722763],
    [40, 0.830185, 0.83034],
  ];
  for (const [sp, gsw, doe] of table) {
    it(`gives I(${sp}) = ${gsw} (GSW form) and ${doe} (DOE 1994 form)`, () => {
      expectWithin(ionicStrengthFromSalinity(sp), gsw, 6e-7, "GSW form");
      expectWithin(ionicStrengthDoe(sp), doe, 6e-7, "DOE form");
    });
  }
  it("equals 19.92054·SP/(1000 − 1.004715·SP) (exact algebra) within 1e-6", () => {
    for (const sp of [0.5, 7, 18, 33])
      expectWithin(ionicStrengthFromSalinity(sp), (19.92054 * sp) / (1000 - 1.004715 * sp), 1e-6, `SP=${sp}`);
  });
  it("throws RangeError for salinity outside 0…50", () => {
    expect(() => ionicStrengthFromSalinity(-1)).toThrow(/salinity/);
  });
});

describe("salinity scales", () => {
  it("salinityFromChlorinity/chlorinityFromSalinity use S = 1.80655·Cl (GSW-C gsw_soncl): Cl(35) = 19.37394 g/kg", () => {
    expectWithin(chlorinityFromSalinity(35), 19.37394, 1e-5, "Cl(35)");
    expectWithin(salinityFromChlorinity(19.37394), 35, 1e-4, "S(Cl)");
  });
  it("referenceSalinityFromPractical(35) = 35.16504 g/kg (Millero et al. 2008; GSW gsw_SR_from_SP example 34.5487 → 34.711611927085727)", () => {
    expectWithin(referenceSalinityFromPractical(35), 35.16504, 1e-12, "SR(35)");
    expectWithin(referenceSalinityFromPractical(34.5487), 34.711611927085727, 1e-12, "GSW example");
  });
  it("practicalSalinityFromKnudsen() inverts SK = 0.030 + 1.805·Cl (GSW-Matlab gsw_SP_from_SK)", () => {
    const cl = 19.37394;
    expectWithin(practicalSalinityFromKnudsen(0.03 + 1.805 * cl), 1.80655 * cl, 1e-12, "SP");
  });
});
