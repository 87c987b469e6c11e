import { describe, expect, it } from "vitest";
import reference from "../reference/demo-transport-model.json";
import { buildGrid } from "../../data-demo/generator/channel.ts";
import { isohalineKm, profileAt, solveSalinity } from "../../data-demo/generator/salinityModel.ts";
import { solveSteadyTransport } from "../../data-demo/generator/transport.ts";
import { expectWithin } from "../helpers/tolerance.ts";

interface ReferenceCase {
  name: string;
  source: string;
  inputs: Record<string, number>;
  expected: Record<string, number>;
  tol: Record<string, number>;
}
const [expCase, savenijeCase, quadCase] = reference.cases as unknown as ReferenceCase[];

describe("demo forward model against closed forms (steady 1-D advection–dispersion closed forms, derived; Savenije 1993)", () => {
  it("solveSalinity() with constant A and K reproduces S = S0·exp(−U·x/K) and x2 = 28.62 km (steady 1-D advection–dispersion closed form, derived)", () => {
    const { dischargeM3s: q, areaM2: a, dispersionM2s: k, seaSalinity: s0, riverSalinity: sr } = expCase.inputs;
    const grid = buildGrid(
      200,
      8000,
      () => a,
      () => k,
    );
    const field = solveSalinity(grid, q, s0, sr);
    const efoldKm = k / (q / a) / 1000;
    expectWithin(efoldKm, expCase.expected.efoldingKm, 1e-12, "K/U [km] (§5.1)");
    for (const xKm of [0, 5, 10, 20, 28.622, 40]) {
      expectWithin(
        profileAt(grid.xKm, field.salinity, xKm),
        s0 * Math.exp(-xKm / efoldKm),
        expCase.tol.salinity,
        `S(${xKm} km) vs §5.1 Eq. 6`,
      );
    }
    expectWithin(isohalineKm(field, 2), expCase.expected.x2Km, expCase.tol.x2Km, "x2 [km] (§5.1 check 28.62 km)");
  });

  it("solveSalinity() in a convergent channel gives S(10 km) = 25.305 (Savenije 1993 model with constant D, closed form derived)", () => {
    const c = savenijeCase.inputs;
    const grid = buildGrid(
      80,
      8000,
      (x) => c.mouthAreaM2 * Math.exp(-x / c.convergenceLengthKm),
      () => c.dispersionM2s,
    );
    const field = solveSalinity(grid, c.dischargeM3s, c.seaSalinity, 0);
    expectWithin(
      profileAt(grid.xKm, field.salinity, 10),
      savenijeCase.expected.salinityAt10Km,
      savenijeCase.tol.salinityAt10Km,
      "S(10 km) (§5.2)",
    );
  });

  it("solveSteadyTransport() with the §7.2 case C reaction reproduces C(S), C*0(35) = 88.75, Δ% = −40.83 and ∫A·R dx = −6125 mmol/s", () => {
    const c = quadCase.inputs;
    const grid = buildGrid(
      150,
      8000,
      () => c.areaM2,
      () => c.dispersionM2s,
    );
    const salt = solveSalinity(grid, c.dischargeM3s, c.seaSalinity, 0);
    const star = (s: number) => 150 - 0.05 * s * s;
    const n = grid.xKm.length - 1;
    const face = (i: number) => (salt.salinity[i] + salt.salinity[i + 1]) / 2;
    const production = new Array<number>(n + 1).fill(0);
    for (let i = 1; i < n; i++) production[i] = c.dischargeM3s * (star(face(i - 1)) - star(face(i)));
    const sol = solveSteadyTransport(grid, c.dischargeM3s, c.seaConc, c.riverConc, production);
    const x17 = isohalineKm(salt, 17.5);
    expectWithin(
      profileAt(grid.xKm, sol.conc, x17 ?? NaN),
      quadCase.expected.cAt17p5,
      quadCase.tol.cAt17p5,
      "C(S = 17.5) (§7.2 C)",
    );
    // faces sit at x = h/2, 3h/2: extrapolate the flux linearly to the mouth (x = 0)
    const cStar = (1.5 * sol.faceFlux[0] - 0.5 * sol.faceFlux[1]) / c.dischargeM3s;
    expectWithin(
      cStar,
      quadCase.expected.effectiveEndmember,
      quadCase.tol.effectiveEndmember,
      "mouth flux / Q = C*0(35) (§7.2 C)",
    );
    expectWithin(
      (100 * (cStar - c.riverConc)) / c.riverConc,
      quadCase.expected.percentChange,
      quadCase.tol.percentChange,
      "Δ% (§7.2 C)",
    );
    // interior control volumes plus the mouth half-cell [x = 0, h/2]
    const mouthHalfCell = c.dischargeM3s * (star(salt.salinity[0]) - star(face(0)));
    const integrated = production.reduce((a, b) => a + b, 0) + mouthHalfCell;
    expectWithin(
      integrated,
      quadCase.expected.integratedReactionMmolS,
      quadCase.tol.integratedReactionMmolS,
      "∫A·R dx [mmol/s] (§7.2 C, Eq. 5)",
    );
  });

  it("solveSteadyTransport() rejects a non-positive discharge with a RangeError naming the function", () => {
    const grid = buildGrid(
      10,
      10,
      () => 1000,
      () => 100,
    );
    expect(() => solveSteadyTransport(grid, 0, 1, 0)).toThrow(/solveSteadyTransport\(\).*dischargeM3s/);
  });
});
