import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import ref from "../reference/carbonate.json";
import { carbonateConstantsAt } from "../../analysis/seawater/carbonateConstantsAt.ts";
import { millero2010PkSws } from "../../analysis/seawater/carbonateConstants.ts";
import { carbonatePhFromTaDic } from "../../analysis/seawater/carbonatePh.ts";
import { carbonatePhAlongMixingLine } from "../../analysis/seawater/carbonateMixing.ts";
import { linearGrid } from "../../analysis/seawater/grid.ts";

describe("carbonateConstantsAt() check values at S = 35, 25 °C (from memory of Dickson, Sabine & Christian 2007 ch. 5, except where a source says otherwise)", () => {
  const lu = carbonateConstantsAt(35, 25, "lueker2000");
  const value: Record<string, number> = {
    "log10 K1 (Lueker)": Math.log10(lu.k1Total),
    "log10 K2 (Lueker)": Math.log10(lu.k2Total),
    "ln KB": Math.log(lu.kbTotal),
    "ln KW": Math.log(lu.kwTotal),
    "ln KS": Math.log(lu.ksFree),
    "ln KF": Math.log(lu.kfFree),
    "ln K0": Math.log(lu.k0),
    B_T: lu.borateTotalMolKg,
    S_T: lu.sulfateTotalMolKg,
    F_T: lu.fluorideTotalMolKg,
    "pH_F - pH_T": -Math.log10(lu.totalToFree),
    "pH_T - pH_SWS": -Math.log10(lu.swsToTotal),
  };
  for (const c of ref.constants) {
    it(`gives ${c.inputs.name} = ${c.expected} (${c.source})`, () => {
      expectWithin(value[c.inputs.name], c.expected, c.tol, c.source);
    });
  }
  for (const c of ref.millero2010Sws) {
    it(`Millero 2010 SWS pK1, pK2 at S = ${c.inputs.S}, 25 °C = ${c.expected.join(", ")} (${c.source})`, () => {
      const [pk1, pk2] = millero2010PkSws(c.inputs.S, 298.15);
      expectWithin(pk1, c.expected[0], c.tol, "pK1");
      expectWithin(pk2, c.expected[1], c.tol, "pK2");
    });
  }
  it("Millero 2010 at S = 0 equals Harned & Davis 1943 pK1 = 6.352 and Harned & Scholes 1941 pK2 = 10.329 (from memory)", () => {
    const [pk1, pk2] = millero2010PkSws(0, 298.15);
    expectWithin(pk1, 6.352, 0.001, "pK1");
    expectWithin(pk2, 10.329, 0.001, "pK2");
  });
  it("throws RangeError naming salinity, temperature or set", () => {
    expect(() => carbonateConstantsAt(60, 25)).toThrow(/salinity/);
    expect(() => carbonateConstantsAt(30, 50)).toThrow(/temperatureC/);
    expect(() => carbonateConstantsAt(30, 20, "cai" as "lueker2000")).toThrow(/k1k2Set/);
  });
});

describe("carbonatePhFromTaDic()", () => {
  for (const c of ref.singlePoint) {
    it(`gives pH_T = ${c.expected} for TA 2300, DIC 2000 µmol/kg with ${c.inputs.set} (${c.source})`, () => {
      const r = carbonatePhFromTaDic(
        c.inputs.S,
        c.inputs.temperatureC,
        c.inputs.TA,
        c.inputs.DIC,
        c.inputs.set as "lueker2000" | "millero2010",
      );
      expectWithin(r?.pHTotal, c.expected, c.tol, c.source);
    });
  }
  it("returns species summing to DIC and the alkalinity it was solved from (mass balance, common practice)", () => {
    const r = carbonatePhFromTaDic(20, 15, 1800, 1700);
    expect(r).toBeDefined();
    if (!r) return;
    expectWithin(r.co2UmolKg + r.hco3UmolKg + r.co3UmolKg, 1700, 1e-9, "Σ DIC");
    expectWithin(r.pHFree - r.pHTotal, -Math.log10(r.constants.totalToFree), 1e-12, "free vs total");
  });
  it("warns when Lueker 2000 is used below S ≈ 19 (Lueker et al. 2000 fitted S ≈ 19–43; from memory)", () => {
    expect(carbonatePhFromTaDic(5, 25, 1200, 1200, "lueker2000")?.warnings.join(" ")).toMatch(/outside their range/);
  });
  it("returns undefined when no pH in 2…12 fits, and throws RangeError for negative TA", () => {
    expect(carbonatePhFromTaDic(35, 25, 100000, 10)).toBeUndefined();
    expect(() => carbonatePhFromTaDic(35, 25, -1, 2000)).toThrow(/taUmolKg/);
  });
});

describe("carbonatePhAlongMixingLine()", () => {
  const m = ref.mixingLine;
  const grid = m.expected.map((r) => r.S);
  const mill = carbonatePhAlongMixingLine({
    river: m.inputs.river,
    sea: m.inputs.sea,
    salinityGrid: grid,
    temperatureC: 25,
  });
  const luek = carbonatePhAlongMixingLine({
    river: m.inputs.river,
    sea: m.inputs.sea,
    salinityGrid: grid.filter((s) => s >= 20),
    temperatureC: 25,
    k1k2Set: "lueker2000",
  });
  const series = (key: string) => mill.series.find((s) => s.key === key)?.values ?? [];
  m.expected.forEach((row, i) => {
    it(`at S = ${row.S}: TA ${row.TA}, DIC ${row.DIC}, pK1 ${row.pK1}, pK2 ${row.pK2}, pH_T ${row.pH_millero2010} (Millero 2010) (${m.source})`, () => {
      expectWithin(series("TA")[i], row.TA, m.tol.TA, "TA");
      expectWithin(series("DIC")[i], row.DIC, m.tol.DIC, "DIC");
      expectWithin(series("pK1_T")[i], row.pK1, m.tol.pK, "pK1");
      expectWithin(series("pK2_T")[i], row.pK2, m.tol.pK, "pK2");
      expectWithin(series("pH_T")[i], row.pH_millero2010, m.tol.pH, "pH_T");
    });
    if (row.pH_lueker2000 !== null) {
      it(`at S = ${row.S}: pH_T ${row.pH_lueker2000} with Lueker 2000 (${m.source})`, () => {
        const j = luek.x.indexOf(row.S);
        expectWithin(luek.series[0].values[j], row.pH_lueker2000 as number, m.tol.pH, "pH_T Lueker");
      });
    }
  });
  it("shows the pH minimum at low salinity (S < 2, pH_T < 7.5735) on a fine grid (derived)", () => {
    const fine = carbonatePhAlongMixingLine({
      river: m.inputs.river,
      sea: m.inputs.sea,
      salinityGrid: linearGrid(0, 35, 71),
      temperatureC: 25,
    });
    expect(fine.minimum).toBeDefined();
    expect(fine.minimum?.salinity ?? 99).toBeLessThan(2);
    expect(fine.minimum?.salinity ?? 0).toBeGreaterThan(0);
    expect(fine.minimum?.pHTotal ?? 99).toBeLessThan(7.5735);
  });
  it("mixes temperature linearly when both end-members carry one", () => {
    const r = carbonatePhAlongMixingLine({
      river: { ...m.inputs.river, temperatureC: 20 },
      sea: { ...m.inputs.sea, temperatureC: 20 },
      salinityGrid: [10],
    });
    expectWithin(
      r.series[0].values[0],
      carbonatePhFromTaDic(10, 20, 1371.4285714285713, 1335.7142857142858)?.pHTotal ?? 0,
      1e-9,
      "pH at 20 °C",
    );
  });
  it("throws RangeError without temperature, with reversed end-members, or a grid value outside them", () => {
    expect(() => carbonatePhAlongMixingLine({ river: m.inputs.river, sea: m.inputs.sea, salinityGrid: [5] })).toThrow(
      /temperatureC/,
    );
    expect(() =>
      carbonatePhAlongMixingLine({ river: m.inputs.sea, sea: m.inputs.river, salinityGrid: [5], temperatureC: 25 }),
    ).toThrow(/sea.salinity/);
    expect(() =>
      carbonatePhAlongMixingLine({ river: m.inputs.river, sea: m.inputs.sea, salinityGrid: [40], temperatureC: 25 }),
    ).toThrow(/salinityGrid\[0\]/);
  });
});
