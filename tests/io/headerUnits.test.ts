import { describe, expect, it } from "vitest";
import { splitHeaderUnit } from "../../analysis/io/headerUnits.ts";
import { normaliseConstituentName } from "../../analysis/io/constituentNames.ts";
import { canonicalUnitText, concentrationUnitText } from "../../analysis/io/unitText.ts";

describe("splitHeaderUnit + normaliseConstituentName (header → symbol and unit)", () => {
  it.each([
    ["Fe (nmol/L)", "Fe", "nmol/L", "Fe"],
    ["Silicate_uM", "Silicate", "µmol/L", "Si"],
    ["NO3 [µmol/l]", "NO3", "µmol/L", "NO3"],
    ["Cd_ngL", "Cd", "ng/L", "Cd"],
    ["Ba, nmol kg-1", "Ba", "nmol/kg", "Ba"],
    ["Si (µmol/L)", "Si", "µmol/L", "Si"],
    ["NO2 (Micromolar)", "NO2", "µmol/L", "NO2"],
    ["Discrete Chlorophyll-a (micrograms/L)", "Discrete Chlorophyll-a", "µg/L", "Chla (discrete)"],
    ["Phosphate {umol/kg}", "Phosphate", "µmol/kg", "PO4"],
    ["Iron (nM)", "Iron", "nmol/L", "Fe"],
  ])("splitHeaderUnit(%j) → name %j, unit %j, symbol %j", (header, name, unit, symbol) => {
    const p = splitHeaderUnit(header);
    expect(p.name).toBe(name);
    expect(p.unit).toBe(unit);
    expect(normaliseConstituentName(p.name)).toBe(symbol);
  });

  it("splitHeaderUnit() keeps a non-unit underscore suffix in the name (DO_Sat, a254_DOM)", () => {
    expect(splitHeaderUnit("DO_Sat")).toEqual({ name: "DO_Sat" });
    expect(splitHeaderUnit("a254_DOM")).toEqual({ name: "a254_DOM" });
  });

  it("splitHeaderUnit() returns unknown unit text without a canonical unit (never a guess)", () => {
    expect(splitHeaderUnit("Cu (ppb)")).toEqual({ name: "Cu", unitText: "ppb" });
    expect(splitHeaderUnit("Zn (furlongs)")).toEqual({ name: "Zn", unitText: "furlongs" });
  });

  it("concentrationUnitText() rejects salinity-like and ambiguous units that canonicalUnitText accepts as labels", () => {
    expect(canonicalUnitText("ppt")).toBe("ppt");
    expect(concentrationUnitText("ppt")).toBeUndefined();
    expect(canonicalUnitText("Degrees Celsius")).toBe("°C");
    expect(concentrationUnitText("mgL")).toBe("mg/L");
  });

  it("normaliseConstituentName() maps words and symbols from the synonym table and rejects unknown names", () => {
    expect(normaliseConstituentName("Nitrate")).toBe("NO3");
    expect(normaliseConstituentName("Nitrate_+_Nitrite")).toBe("NO3+NO2");
    expect(normaliseConstituentName("Ammonium")).toBe("NH4");
    expect(normaliseConstituentName("FE")).toBe("Fe");
    expect(normaliseConstituentName("dissolved iron")).toBe("Fe (dissolved)");
    expect(normaliseConstituentName("Season")).toBeUndefined();
    expect(normaliseConstituentName("Depth")).toBeUndefined();
  });
});
