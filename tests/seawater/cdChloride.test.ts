import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import ref from "../reference/cd-chloride.json";
import { cdChlorideSpeciation } from "../../analysis/seawater/cdChloride.ts";
import { CD_CHLORIDE_SETS, type CdChlorideSet } from "../../analysis/seawater/cdChlorideSets.ts";
import { cdSpeciationVsSalinity } from "../../analysis/seawater/cdSeries.ts";
import { cdFreeFractionByStation } from "../../analysis/seawater/cdStations.ts";
import { daviesActivityCoefficient } from "../../analysis/seawater/davies.ts";

const fixtureSet: CdChlorideSet = {
  id: "fixture",
  label: "sheet §4.2 fixture",
  source: ref.seawater.source,
  logBeta25: ref.seawater.inputs.logBeta,
};

describe("cdChlorideSpeciation() in seawater", () => {
  const r = cdChlorideSpeciation(fixtureSet, { salinity: 35, temperatureC: 25 }, { davies: { A: 0.5085 } });
  it(`uses I = 0.72263 and free Cl⁻ = 0.5657647 mol/kg-H2O from the mixing model at S = 35 (Millero et al. 2008)`, () => {
    expectWithin(r.ionicStrength, 0.72263, 1e-5, "I");
    expectWithin(r.chlorideMolKgH2O, 0.5657647, 1e-7, "Cl");
  });
  it(`gives log βc = 1.486, 1.860, 1.660, 0.976 (${ref.seawater.source})`, () => {
    r.logBetaConditional.forEach((x, i) =>
      expectWithin(x, ref.seawater.expected.logBetaConditional[i], ref.seawater.tol.logBetaConditional, `βc${i + 1}`),
    );
  });
  for (const [k, v] of Object.entries(ref.seawater.expected.percent)) {
    it(`gives ${k} = ${v} % (${ref.seawater.source})`, () => {
      expectWithin(100 * r.fractions[k], v, ref.seawater.tol.percent, k);
    });
  }
  it(`gives side-reaction coefficient 50.7 and free Cd²⁺ = 1/50.7 (${ref.seawater.source})`, () => {
    expectWithin(r.sideReactionCoefficient, 50.7, ref.seawater.tol.sideReactionCoefficient, "α");
    expectWithin(r.freeFraction * r.sideReactionCoefficient, 1, 1e-12, "free·α");
  });
  it("flags Davies beyond its validity at seawater ionic strength", () => {
    expect(r.warnings.join(" ")).toMatch(/validity/);
  });
  it("with the three-complex set (no CdCl₄²⁻) free Cd²⁺ is 2–3 % of inorganic Cd, as in Turner et al. 1981 / Byrne et al. 1988 (from memory, 2.5–3 %)", () => {
    const w = cdChlorideSpeciation(
      CD_CHLORIDE_SETS.cdCl3WithEnthalpy,
      { salinity: 35, temperatureC: 25 },
      { davies: { A: 0.5085 } },
    );
    expect(w.freeFraction).toBeGreaterThan(0.015);
    expect(w.freeFraction).toBeLessThan(0.035);
    expect(Object.keys(w.fractions)).toEqual(["Cd+2", "CdCl+", "CdCl2", "CdCl3-"]);
  });
});

describe("cdChlorideSpeciation() in a low-chloride river", () => {
  const base = { salinity: 0, temperatureC: 25, ionicStrength: ref.riverChlorideOnly.inputs.I };
  it(`gives Davies γ1 = 0.9523, γ2 = 0.8226 at I = 0.00195 (${ref.gammas.source})`, () => {
    expectWithin(daviesActivityCoefficient(1, 0.00195, { A: 0.5085 }), ref.gammas.expected[0], ref.gammas.tol, "γ1");
    expectWithin(daviesActivityCoefficient(2, 0.00195, { A: 0.5085 }), ref.gammas.expected[1], ref.gammas.tol, "γ2");
  });
  it(`gives Cd²⁺ 98.45 %, CdCl⁺ 1.55 % for chloride only (${ref.riverChlorideOnly.source})`, () => {
    const r = cdChlorideSpeciation(fixtureSet, base, {
      davies: { A: 0.5085 },
      chlorideMolKgH2O: ref.riverChlorideOnly.inputs.chlorideMolKgH2O,
    });
    expectWithin(100 * r.fractions["Cd+2"], 98.45, ref.riverChlorideOnly.tol, "Cd");
    expectWithin(100 * r.fractions["CdCl+"], 1.55, ref.riverChlorideOnly.tol, "CdCl");
  });
  it(`gives Cd²⁺ 94.5 %, CdHCO3⁺ 2.5 %, CdSO4 1.5 %, chloro 1.5 %, CdCO3 0.08 % with further ligands (${ref.riverWithLigands.source})`, () => {
    const i = ref.riverWithLigands.inputs;
    const co3 = i.bicarbonate * Math.pow(10, i.pH - 10.329);
    const r = cdChlorideSpeciation(fixtureSet, base, {
      davies: { A: 0.5085 },
      chlorideMolKgH2O: i.chlorideMolKgH2O,
      extraLigands: [
        { key: "CdSO4", ligandCharge: -2, logK0: 2.37, molKgH2O: i.sulfate },
        { key: "CdHCO3+", ligandCharge: -1, logK0: 1.5, molKgH2O: i.bicarbonate },
        { key: "CdCO3", ligandCharge: -2, logK0: 2.9, molKgH2O: co3 },
      ],
    });
    const e = ref.riverWithLigands.expected;
    const tol = ref.riverWithLigands.tol;
    expectWithin(100 * r.fractions["Cd+2"], e["Cd+2"], tol, "Cd");
    expectWithin(100 * r.fractions["CdHCO3+"], e["CdHCO3+"], tol, "CdHCO3");
    expectWithin(100 * r.fractions["CdSO4"], e.CdSO4, tol, "CdSO4");
    expectWithin(
      100 * (r.fractions["CdCl+"] + r.fractions["CdCl2"] + r.fractions["CdCl3-"] + r.fractions["CdCl4-2"]),
      e.chloro,
      tol,
      "Σ chloro",
    );
    expectWithin(100 * r.fractions["CdCO3"], e.CdCO3, 0.006, "CdCO3");
  });
  it("throws RangeError for negative chloride", () => {
    expect(() => cdChlorideSpeciation(fixtureSet, base, { chlorideMolKgH2O: -1 })).toThrow(/chlorideMolKgH2O/);
  });
});

describe("cdSpeciationVsSalinity()", () => {
  const r = cdSpeciationVsSalinity("cdCl3WithEnthalpy", [0, 1, 5, 10, 20, 35], 25, { davies: { A: 0.5085 } });
  it("free Cd²⁺ falls monotonically from river to sea while CdCl₂⁰ rises (chloro-complexation, Powell et al. 2011)", () => {
    const free = r.series.find((s) => s.key === "Cd+2")?.values ?? [];
    const cl2 = r.series.find((s) => s.key === "CdCl2")?.values ?? [];
    expect(free.length).toBe(6);
    for (let i = 1; i < free.length; i++) {
      expect(free[i]).toBeLessThan(free[i - 1]);
      expect(cl2[i]).toBeGreaterThan(cl2[i - 1]);
    }
    expect(free[0]).toBeGreaterThan(95);
  });
  it("sums to 100 % at every salinity and warns once about Davies above I = 0.5", () => {
    for (let i = 0; i < 6; i++) {
      expectWithin(
        r.series.filter((s) => s.unit === "%").reduce((a, s) => a + s.values[i], 0),
        100,
        1e-9,
        `Σ at ${r.x[i]}`,
      );
    }
    expect(r.warnings.filter((w) => /Davies/.test(w)).length).toBe(1);
  });
  it("throws RangeError for an unknown set id", () => {
    expect(() => cdSpeciationVsSalinity("noSuchSet", [0], 25)).toThrow(/"noSuchSet"/);
  });
});

describe("cdFreeFractionByStation()", () => {
  it("gives each station the free-Cd²⁺ fraction of cdChlorideSpeciation at its salinity and temperature", () => {
    const stations = [
      { id: "R1", salinity: 0.2, temperatureC: 18 },
      { id: "M5", salinity: 14, temperatureC: 16 },
    ];
    const r = cdFreeFractionByStation(stations, "cdCl3WithEnthalpy", { davies: { A: 0.5085 } });
    expect(r.map((x) => x.id)).toEqual(["R1", "M5"]);
    const direct = cdChlorideSpeciation(
      CD_CHLORIDE_SETS.cdCl3WithEnthalpy,
      { salinity: 14, temperatureC: 16 },
      { davies: { A: 0.5085 } },
    );
    expectWithin(r[1].freeFraction, direct.freeFraction, 1e-15, "M5");
    expect(r[0].freeFraction).toBeGreaterThan(r[1].freeFraction);
  });
  it("names the station in the error for an invalid salinity", () => {
    expect(() => cdFreeFractionByStation([{ id: "X9", salinity: -1, temperatureC: 10 }], "cdCl3WithEnthalpy")).toThrow(
      /station "X9"/,
    );
  });
});
