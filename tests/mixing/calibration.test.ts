import { describe, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { SHAPES } from "../../bench/calibration/forwardModel.ts";
import { scoreCell } from "../../bench/calibration/cell.ts";

// Regression guards from the calibration suite (`npm run calibrate`, issue 14): a few fixed-seed
// cells with bounds, not timings. Forward model: bench/calibration/forwardModel.ts (invented surveys).
const shape = (name: string) => SHAPES.find((s) => s.name === name)!;

describe("mixing calibration guards (seeded synthetic surveys; Boyle et al. 1974 tangent method)", () => {
  it("removal ending at S 5, 20 km-even stations, 2 % noise: % change unbiased within 3 pp against the river at S = 0, class right, break within ±2", () => {
    const s = scoreCell(shape("removal→S5"), { stations: 20, spacing: "km", noise: 0.02 }, 12, 150);
    expectWithin(s.percentBiasPp, 0, 3, "bias of % change [pp]");
    expectWithin(s.referenceSalinity, 0, 0, "river reference salinity");
    expectWithin(s.classAccuracy >= 0.9 ? 1 : 0, 1, 0, `class accuracy ${s.classAccuracy}`);
    expectWithin((s.breakWithin2 ?? 0) >= 0.75 ? 1 : 0, 1, 0, `break within ±2 in ${s.breakWithin2}`);
    expectWithin(s.outsideOwnInterval, 0, 0, "estimates outside their own interval");
  });

  it("conservative, 20 salinity-even stations: C*₀ within 2 % and the 95 % interval covers the truth in ≥ 10 of 12 surveys", () => {
    const s = scoreCell(shape("conservative"), { stations: 20, spacing: "salinity", noise: 0.02 }, 12, 150);
    expectWithin(s.effectiveBiasPct, 0, 2, "C*₀ bias [%]");
    expectWithin(s.effectiveCoverage >= 10 / 12 ? 1 : 0, 1, 0, `coverage ${s.effectiveCoverage}`);
  });

  it("exact data (no noise, 35 km-even stations): C*₀ within 1 %, rate integral within 5 % of Q·(C*₀ − C₀) (Boyle et al. 1974 integrated form, Eq. 5)", () => {
    for (const name of ["removal→S5", "desorption→S10"]) {
      const s = scoreCell(shape(name), { stations: 35, spacing: "km", noise: 0 }, 1, 0, 1, true);
      expectWithin(s.effectiveBiasPct, 0, 1, `${name} C*₀ error [%]`);
      expectWithin(s.rateIntegralError!, 0, 0.05, `${name} rate integral error`);
    }
  });
});
