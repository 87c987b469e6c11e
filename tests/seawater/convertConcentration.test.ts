import { describe, expect, it } from "vitest";
import { expectWithin, expectWithinRel } from "../helpers/tolerance.ts";
import ref from "../reference/atomic-weights.json";
import { convertConcentration } from "../../analysis/seawater/convertConcentration.ts";
import { atomicWeight, ATOMIC_WEIGHTS } from "../../analysis/seawater/atomicWeights.ts";
import { densityEos80 } from "../../analysis/seawater/densityEos80.ts";

describe("convertConcentration() mass ↔ amount", () => {
  for (const c of ref.cases) {
    it(`converts 1 µg/L ${c.inputs.element} to ${c.expected} nmol/L (${c.source})`, () => {
      expectWithin(
        convertConcentration(1, c.inputs.from, c.inputs.to, { element: c.inputs.element }),
        c.expected,
        c.tol,
        c.source,
      );
    });
    it(`converts 1 nmol/L ${c.inputs.element} back to µg/L = M/1000 (${c.source})`, () => {
      expectWithinRel(
        convertConcentration(1, "nmol/L", "µg/L", { element: c.inputs.element }),
        atomicWeight(c.inputs.element) / 1000,
        1e-12,
        c.source,
      );
    });
  }

  it("uses the CIAAW 2021 standard/conventional values (ciaaw.org table) for Fe, Cd, Si, P", () => {
    expect(ATOMIC_WEIGHTS.Fe.gPerMol).toBe(55.845);
    expect(ATOMIC_WEIGHTS.Cd.gPerMol).toBe(112.414);
    expect(ATOMIC_WEIGHTS.Si.gPerMol).toBe(28.085);
    expect(ATOMIC_WEIGHTS.P.gPerMol).toBe(30.973761998);
    expect(ATOMIC_WEIGHTS.Fe.status).toBe("sheet");
  });

  it("converts nutrients per atom: 1 mg N/L = 71.39 µmol N/L, 1 mg P/L = 32.29 µmol P/L (CIAAW 2021; per-atom convention)", () => {
    expectWithin(convertConcentration(1, "mg N/L", "µmol N/L"), 71.3929, 1e-4, "N");
    expectWithin(convertConcentration(1, "mg/L as P", "µM P"), 32.2854, 1e-4, "P");
    expectWithin(convertConcentration(10, "µmol/L", "µmol Si/L", { element: "Si" }), 10, 1e-12, "label only");
  });

  it("throws RangeError when the element is missing, unknown, or disagrees with the unit's atom label", () => {
    expect(() => convertConcentration(1, "µg/L", "nmol/L")).toThrow(/element/);
    expect(() => convertConcentration(1, "µg/L", "nmol/L", { element: "Xx" })).toThrow(/"Xx"/);
    expect(() => convertConcentration(1, "µmol N/L", "µmol P/L")).toThrow(/different atoms/);
    expect(() => convertConcentration(1, "mg N/L", "µmol/L", { element: "P" })).toThrow(/disagrees/);
    expect(() => convertConcentration(1, "mg/L", "mg N/L")).toThrow(/context.element/);
  });

  it("throws RangeError naming the unit text for unknown or ambiguous units, TypeError for a non-finite value", () => {
    expect(() => convertConcentration(1, "ppb", "nmol/L", { element: "Cd" })).toThrow(/"ppb"/);
    expect(() => convertConcentration(1, "nmol/L", "bananas", { element: "Cd" })).toThrow(/"bananas"/);
    expect(() => convertConcentration(Number.NaN, "nmol/L", "nmol/L")).toThrow(TypeError);
  });
});

describe("convertConcentration() per litre ↔ per kilogram", () => {
  for (const c of ref.perKg) {
    it(`converts 1 µg/L Cd at S = 35, 20 °C to ${c.expected} nmol/kg (${c.source})`, () => {
      const { element, salinity, temperatureC } = c.inputs;
      expectWithin(
        convertConcentration(1, c.inputs.from, c.inputs.to, { element, salinity, temperatureC }),
        c.expected,
        c.tol,
        c.source,
      );
    });
  }

  it("uses EOS-80 1000/ρ factors within 7e-6 (EOS-80 − TEOS-10 ≤ 0.005 kg/m³) of the TEOS-10 reference library (python3-gsw) table", () => {
    const table: Array<[number, number, number]> = [
      [0, 20, 1.001796],
      [5, 20, 0.997994],
      [10, 20, 0.994239],
      [20, 20, 0.986812],
      [30, 20, 0.979472],
      [35, 20, 0.975833],
      [0, 25, 1.002961],
      [5, 25, 0.999191],
      [10, 25, 0.995466],
      [20, 25, 0.988094],
      [30, 25, 0.980805],
      [35, 25, 0.977189],
    ];
    for (const [s, t, f] of table) {
      expectWithin(
        convertConcentration(1, "nmol/L", "nmol/kg", { salinity: s, temperatureC: t }),
        f,
        7e-6,
        `S=${s}, t=${t}`,
      );
    }
  });

  it("round-trips nmol/L → nmol/kg → nmol/L to 1e-12 and matches 1000/densityEos80", () => {
    const ctx = { salinity: 12, temperatureC: 18 };
    const kg = convertConcentration(3.7, "nmol/L", "nmol/kg", ctx);
    expectWithinRel(kg, (3.7 * 1000) / densityEos80(12, 18, 0), 1e-12, "factor");
    expectWithinRel(convertConcentration(kg, "nmol/kg", "nmol/L", ctx), 3.7, 1e-12, "round trip");
  });

  it("throws RangeError when salinity or temperature is missing for L ↔ kg", () => {
    expect(() => convertConcentration(1, "nmol/L", "nmol/kg", { salinity: 30 })).toThrow(/temperatureC/);
    expect(() => convertConcentration(1, "nmol/L", "nmol/kg", { temperatureC: 20 })).toThrow(/salinity/);
  });
});
