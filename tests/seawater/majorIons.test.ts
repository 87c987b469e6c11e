import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { majorIonsAtSalinity } from "../../analysis/seawater/majorIons.ts";
import { majorIonsVsSalinity } from "../../analysis/seawater/majorIonSeries.ts";
import { WORLD_AVERAGE_RIVER, riverCompositionFromMgL } from "../../analysis/seawater/riverComposition.ts";
import { ionicStrengthFromSalinity } from "../../analysis/seawater/ionicStrength.ts";

describe("majorIonsAtSalinity()", () => {
  it("at S = 35 reproduces Millero et al. 2008 Table 4 and the GSW ionic strength 0.722630", () => {
    const r = majorIonsAtSalinity(35);
    expectWithin(r.molKg["Cl-"], 0.5458696, 1e-12, "Cl");
    expectWithin(r.molKg["Ca+2"], 0.0102821, 1e-12, "Ca");
    expectWithin(r.molalityKgH2O["Cl-"], 0.5657647, 1e-7, "Cl molality");
    expectWithin(r.ionicStrength, 0.72263, 1e-6, "I");
    expectWithin(r.chargeBalanceMolKg, 0, 1e-12, "charge");
  });

  it("with a pure-water river equals the TEOS-10 diluted-seawater ionic strength at every S (TEOS-10 Manual Table L.1) within 1e-6", () => {
    const river = riverCompositionFromMgL("pure", "test", {});
    for (const s of [0.5, 2, 10, 25]) {
      expectWithin(majorIonsAtSalinity(s, { river }).ionicStrength, ionicStrengthFromSalinity(s), 1e-6, `S=${s}`);
    }
  });

  it("at S = 0 equals the river end-member; the default world-average river is nearly charge balanced (Livingstone 1963, from memory)", () => {
    const r = majorIonsAtSalinity(0);
    expectWithin(r.molKg["Ca+2"], WORLD_AVERAGE_RIVER.molKg["Ca+2"], 1e-15, "Ca");
    expectWithin(r.molKg["Ca+2"] * 1000, 15 / 40.078 / 0.9982, 1e-9, "Ca mmol/kg");
    expectWithin(r.chargeBalanceMolKg * 1000, 0, 0.02, "river charge balance [meq/kg]");
    expectWithin(r.ionicStrength, 0.00209, 5e-5, "river I");
  });

  it("is linear in salinity for every ion (conservative mixing, common practice)", () => {
    const a = majorIonsAtSalinity(5).molKg["Mg+2"];
    const b = majorIonsAtSalinity(15).molKg["Mg+2"];
    const c = majorIonsAtSalinity(25).molKg["Mg+2"];
    expectWithin(b, (a + c) / 2, 1e-15, "Mg midpoint");
  });

  it("throws RangeError for salinity outside the end-members or reversed end-members", () => {
    expect(() => majorIonsAtSalinity(36)).toThrow(/salinity/);
    expect(() => majorIonsAtSalinity(5, { riverSalinity: 10, seaSalinity: 5 })).toThrow(RangeError);
    expect(() => riverCompositionFromMgL("x", "y", { "Fe+3": 1 })).toThrow(/"Fe\+3"/);
  });
});

describe("majorIonsVsSalinity()", () => {
  it("returns Na, Mg, Ca, Cl, SO4 in mmol/kg and I aligned with the grid, and warns that the river is from memory", () => {
    const r = majorIonsVsSalinity([0, 17.5, 35]);
    expect(r.series.map((s) => s.key)).toEqual(["Na+", "Mg+2", "Ca+2", "Cl-", "SO4-2", "ionicStrength"]);
    expectWithin(r.series[3].values[2], 545.8696, 1e-9, "Cl at 35 [mmol/kg]");
    expect(r.series.every((s) => s.values.length === 3)).toBe(true);
    expect(r.warnings.join(" ")).toMatch(/from memory/);
  });
  it("throws RangeError naming the grid index for a value outside the end-members", () => {
    expect(() => majorIonsVsSalinity([1, 40])).toThrow(/salinityGrid\[1\]/);
  });
});
