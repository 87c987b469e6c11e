import { describe, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { molarFactor, toMolPerM3 } from "../../analysis/mixing/units.ts";
import { defaultPrecision, sigmaOf } from "../../analysis/mixing/precision.ts";

describe("concentration units for fluxes (common practice: per-kg vs per-L differ by the density, ≈ 2.5 % at S ≈ 35)", () => {
  it("toMolPerM3() makes 1 µmol/L = 1 mmol/m³ and 1 nmol/L = 1 µmol/m³ (SI prefixes, common practice)", () => {
    expectWithin(toMolPerM3("µmol/L", 1000)!, 1e-3, 1e-18, "µmol/L");
    expectWithin(toMolPerM3("umol/L", 1000)!, 1e-3, 1e-18, "umol/L spelling");
    expectWithin(toMolPerM3("nmol L-1", 1000)!, 1e-6, 1e-21, "nmol L-1");
    expectWithin(toMolPerM3("µM", 1000)!, 1e-3, 1e-18, "µM");
  });

  it("toMolPerM3() converts per-kg with the density: 1 µmol/kg × 1025 kg/m³ = 1.025 mmol/m³ (common practice: per-kg vs per-L differ by the density, ≈ 2.5 % at S ≈ 35)", () => {
    expectWithin(toMolPerM3("µmol/kg", 1025)!, 1.025e-3, 1e-18, "µmol/kg at 1025 kg/m³");
  });

  it("molarFactor() refuses mass units such as µg/L (no molar mass in the mixing module)", () => {
    expectWithin(molarFactor("µg/L") === undefined ? 1 : 0, 1, 0, "µg/L is not molar");
  });

  it("defaultPrecision() converts the tabulated absolute floor between units: Fe 0.2 nmol/L = 0.0002 µmol/L (common practice table)", () => {
    const p = defaultPrecision("Fe", "µmol/L");
    expectWithin(p.precision.absolute, 2e-4, 1e-15, "absolute floor");
    expectWithin(p.precision.relative, 0.05, 0, "relative");
    expectWithin(sigmaOf(p.precision, 0), 2e-4, 1e-15, "σ at zero concentration is the floor");
    expectWithin(defaultPrecision("Xx", "nmol/L").fromTable ? 1 : 0, 0, 0, "unknown constituent falls back");
  });

  it("defaultPrecision() gives a second column of the same constituent in a mass unit the same precision: DOC 5 µmol/L = 0.0601 mg C/L (atomic weight of C 12.011, CIAAW 2021)", () => {
    const molar = defaultPrecision("DOC", "µmol/L");
    const mass = defaultPrecision("DOC (DOC_mgL)", "mg/L");
    expectWithin(mass.fromTable ? 1 : 0, 1, 0, "suffixed name found in the table");
    expectWithin(mass.precision.relative, molar.precision.relative, 0, "relative");
    expectWithin(mass.precision.absolute, (5e-6 * 12.011) / 1e-3, 1e-12, "absolute floor in mg/L");
    expectWithin(
      defaultPrecision("Fe", "µg/L").precision.absolute,
      0.2e-9 * 55.845 * 1e6,
      1e-12,
      "Fe 0.2 nmol/L in µg/L",
    );
  });
});
