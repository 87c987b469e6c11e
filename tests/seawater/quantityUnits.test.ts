import { describe, expect, it } from "vitest";
import { quantityKindsOf, quantityUnit, toWorkingUnit } from "../../analysis/index.ts";
import { expectWithin } from "../helpers/tolerance.ts";

describe("quantityUnit(): one units table keyed by quantity kind", () => {
  it("conductivity: 1 S/m = 10 mS/cm, 1 µS/cm = 0.001 mS/cm (BIPM 2019, SI prefixes)", () => {
    expectWithin(toWorkingUnit(quantityUnit("conductivity", "S/m")!, 4.2914), 42.914, 1e-12, "S/m → mS/cm");
    expectWithin(toWorkingUnit(quantityUnit("conductivity", "µS/cm")!, 500), 0.5, 1e-12, "µS/cm → mS/cm");
    expect(quantityUnit("conductivity", "mS cm⁻¹")?.symbol).toBe("mS/cm");
  });

  it("temperature: K − 273.15 = °C (BIPM 2019); t90 = t68/1.00024 (Saunders 1990)", () => {
    expectWithin(toWorkingUnit(quantityUnit("temperature", "K")!, 288.15), 15, 1e-12, "K → °C");
    expectWithin(toWorkingUnit(quantityUnit("temperature", "IPTS-68")!, 15.0036), 15, 1e-9, "t68 → t90");
    expect(quantityUnit("temperature", "degC")?.symbol).toBe("°C");
  });

  it("pressure, discharge and length: 1 bar = 10 dbar, 1 ft³/s = 0.028316846592 m³/s, 1 km = 1000 m (BIPM 2019; international foot 0.3048 m)", () => {
    expectWithin(toWorkingUnit(quantityUnit("pressure", "bar")!, 1), 10, 1e-12, "bar → dbar");
    expectWithin(toWorkingUnit(quantityUnit("discharge", "cfs")!, 1), 0.028316846592, 1e-15, "cfs → m³/s");
    expectWithin(toWorkingUnit(quantityUnit("length", "km")!, 1.5), 1500, 1e-12, "km → m");
  });

  it("concentration goes through the concentration table; a unit names its kinds", () => {
    expect(quantityUnit("concentration", "nmol/L")?.symbol).toBe("nmol/L");
    expect(quantityUnit("concentration", "ppm")).toBeUndefined();
    expect(quantityKindsOf("dbar")).toEqual(["pressure"]);
    expect(quantityKindsOf("mS/cm")).toEqual(["conductivity"]);
  });
});
