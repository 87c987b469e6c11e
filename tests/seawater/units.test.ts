import { describe, expect, it } from "vitest";
import { UNITS, parseUnit, parseUnitOrThrow } from "../../analysis/seawater/units.ts";

describe("parseUnit()", () => {
  const cases: Array<[string, string]> = [
    ["nmol/L", "nmol/L"],
    ["umol/L", "µmol/L"],
    ["µM", "µmol/L"],
    ["μM", "µmol/L"], // Greek mu
    ["uM", "µmol/L"],
    ["nM", "nmol/L"],
    ["pM", "pmol/L"],
    ["mM", "mmol/L"],
    ["ug/L", "µg/L"],
    ["mg/l", "mg/L"],
    ["MG/L", "mg/L"],
    ["ng/L", "ng/L"],
    ["nmol kg-1", "nmol/kg"],
    ["µmol/kg", "µmol/kg"],
    ["µmol kg⁻¹", "µmol/kg"],
    ["µmol·kg⁻¹", "µmol/kg"],
    ["nmol kg^-1", "nmol/kg"],
    ["pmol/L", "pmol/L"],
    ["µg L-1", "µg/L"],
    ["(µg/L)", "µg/L"],
    ["[nmol/L]", "nmol/L"],
    ["Micromolar", "µmol/L"],
    ["micrograms/L", "µg/L"],
    ["micrograms per liter", "µg/L"],
    ["mmol m-3", "µmol/L"],
    ["mmol/m3", "µmol/L"],
    ["µmol N/L", "µmol N/L"],
    ["umol-N/L", "µmol N/L"],
    ["µM N", "µmol N/L"],
    ["µmol/L as Si", "µmol Si/L"],
    ["mg/L as P", "mg P/L"],
    ["mg N/L", "mg N/L"],
    ["µmol P L-1", "µmol P/L"],
  ];
  for (const [text, symbol] of cases) {
    it(`recognises "${text}" as ${symbol} (common practice)`, () => {
      expect(parseUnit(text)?.symbol).toBe(symbol);
    });
  }

  it("round-trips every canonical symbol of the units table", () => {
    const symbols = Object.keys(UNITS);
    expect(symbols.length).toBeGreaterThanOrEqual(80);
    for (const s of symbols) expect(parseUnit(s)?.symbol, s).toBe(s);
  });

  it("treats 'µM' as molar per litre: 1 µM = 1e-6 mol/L (IUPAC Green Book, common practice)", () => {
    const u = parseUnit("µM");
    expect(u?.quantity).toBe("amount");
    expect(u?.basis).toBe("perLitre");
    expect(u?.toBase).toBe(1e-6);
  });

  for (const bad of ["ppb", "ppm", "ppt", "‰", "psu", "%"]) {
    it(`rejects the ambiguous "${bad}" (per mass or per volume in brackish water; documented decision)`, () => {
      expect(parseUnit(bad)).toBeUndefined();
      expect(() => parseUnitOrThrow(bad)).toThrow(new RegExp(`ambiguous.*"${bad}"`));
    });
  }

  for (const bad of ["nm", "furlongs", "", "mol", "g", "µmol N/P/L", "µmol n/L as P"]) {
    it(`rejects "${bad}" as unknown or ambiguous and names it in the RangeError`, () => {
      expect(parseUnit(bad)).toBeUndefined();
      expect(() => parseUnitOrThrow(bad)).toThrow(RangeError);
    });
  }
});
