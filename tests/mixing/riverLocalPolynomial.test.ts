import { describe, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { SHAPES, survey, type Shape } from "../../bench/calibration/forwardModel.ts";
import { fitTwoPhase } from "../../analysis/mixing/twoPhase.ts";
import {
  LOCAL_WINDOW_MAX_S,
  MIN_LOCAL_STATIONS,
  localRiverWeights,
  localRiverWindow,
  riverByLocalCubic,
} from "../../analysis/mixing/riverLocalPolynomial.ts";
import { analyzeSynthetic } from "../../bench/calibration/cell.ts";

// River end-member at S = 0 from a local cubic regression through the freshest stations
// (riverLocalPolynomial.ts; Fan & Gijbels 1996, local polynomial estimator at a boundary point, from
// memory). Forward model: bench/calibration/forwardModel.ts (invented surveys; curvature taper
// (1 − S/S_b)^1.5 that no polynomial contains).
const shape = (name: string): Shape => SHAPES.find((s) => s.name === name)!;
/** A reaction ending at S_b (not in the calibration table), river 100, as the table's shapes. */
const endingAt = (sb: number, percent: number): Shape => ({
  name: `${percent < 0 ? "removal" : "desorption"}→S${sb}`,
  breakSalinity: sb,
  percent,
  riverConc: 100,
  seaConc: percent < 0 ? 10 : 40,
  expectedClass: "",
});

describe("river value at S = 0 by a local cubic through the freshest stations (Fan & Gijbels 1996 §3.2, from memory)", () => {
  it("reproduces a cubic exactly, and its equivalent-kernel weights satisfy the moment conditions Σℓ = 1, Σℓ·S^j = 0 for j = 1…3 (Fan & Gijbels 1996 §3.2.2, from memory)", () => {
    const x = [0.2, 0.5, 0.9, 1.4, 2, 2.7, 3.5, 4.4, 6, 9, 14, 20, 27, 33];
    const y = x.map((s) => 100 + 30 * s - 8 * s * s + 0.7 * s ** 3);
    const w = y.map((c) => 1 / (0.02 * c) ** 2);
    const win = { count: 8, h: 5 };
    expectWithin(riverByLocalCubic(x, y, w, win, 0), 100, 1e-9, "cubic reproduced at S = 0");
    const l = localRiverWeights(x, w, win, 0)!;
    for (let j = 0; j <= 3; j++) {
      const m = l.reduce((s, v, i) => s + v * x[i]! ** j, 0);
      expectWithin(m, j === 0 ? 1 : 0, 1e-9, `moment ${j} of the equivalent kernel`);
    }
  });

  it(`on exact surveys (35 km-even stations) C₀ is within 0.3 % of the true river value, including reactions ending at S 2–3 where the window (≤ the break's likelihood confidence set's upper end; Hinkley 1969, from memory) shrinks below S ${LOCAL_WINDOW_MAX_S} (derived: forward model's own C₀)`, () => {
    const shapes = [
      ...["removal→S5", "removal→S12", "removal→S20", "desorption→S5", "desorption→S10", "desorption→S15"].map(shape),
      endingAt(2, 60),
      endingAt(2, -40),
      endingAt(3, 60),
    ];
    for (const sh of shapes)
      for (const seed of [1, 2, 3]) {
        const st = survey(sh, { stations: 35, spacing: "km", noise: 0 }, seed);
        const x = st.map((s) => s.salinity);
        const y = st.map((s) => s.conc);
        const w = y.map((c) => 1 / (0.01 * c) ** 2);
        const win = localRiverWindow(x, y, w, fitTwoPhase(x, y, w)!);
        expectWithin(win === undefined ? 0 : 1, 1, 0, `${sh.name} seed ${seed}: a window`);
        expectWithin(
          riverByLocalCubic(x, y, w, win!, 0),
          sh.riverConc,
          0.003 * sh.riverConc,
          `${sh.name} seed ${seed}`,
        );
        if (sh.breakSalinity < LOCAL_WINDOW_MAX_S)
          expectWithin(
            win!.h <= sh.breakSalinity + 0.5 ? 1 : 0,
            1,
            0,
            `${sh.name}: window h = ${win!.h} near the break`,
          );
      }
  });

  it(`needs ${MIN_LOCAL_STATIONS} distinct stations in the window: none with 20 salinity-even stations (≈ 1.7 S apart) for a reaction ending at S 5`, () => {
    const st = survey(shape("desorption→S5"), { stations: 20, spacing: "salinity", noise: 0 }, 3);
    const x = st.map((s) => s.salinity);
    const y = st.map((s) => s.conc);
    const w = y.map((c) => 1 / (0.01 * c) ** 2);
    expectWithin(localRiverWindow(x, y, w, fitTwoPhase(x, y, w)!) === undefined ? 1 : 0, 1, 0, "no window");
  });

  it("calibration guard: desorption ending at S 5, 20 km-even stations, 5 % noise, 40 surveys: C₀ bias within 2.5 % and RMSE ≤ 10.5 % of the true river value (before, the quartic extension averaged over breaks: +3.2 %, RMSE 13.5 %; the break the two-phase fit ends its landward model at is not located there)", () => {
    const sh = shape("desorption→S5");
    const errs: number[] = [];
    for (let k = 0; k < 40; k++) {
      const seed = 1 + 7919 * k + 500 + 131 * 20; // the calibration cell's seeds (bench/calibration/cell.ts)
      const st = survey(sh, { stations: 20, spacing: "km", noise: 0.05 }, seed);
      const r = analyzeSynthetic(st, 0.05, { bootstrapDraws: 200, seed: seed + 1 });
      errs.push((100 * (r.endmembers!.river.conc - sh.riverConc)) / sh.riverConc);
    }
    const mean = errs.reduce((a, b) => a + b, 0) / errs.length;
    const rmse = Math.sqrt(errs.reduce((a, b) => a + b * b, 0) / errs.length);
    expectWithin(mean, 0, 2.5, "C₀ bias, % of C₀");
    expectWithin(rmse, 0, 10.5, "C₀ RMSE, % of C₀");
  });
});
