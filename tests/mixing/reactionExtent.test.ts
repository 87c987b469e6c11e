import { describe, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { SHAPES } from "../../bench/calibration/forwardModel.ts";
import { scoreCell } from "../../bench/calibration/cell.ts";
import type { TwoPhaseFit } from "../../analysis/mixing/twoPhase.ts";
import { EXTENT_K, reactionExtent } from "../../analysis/mixing/reactionExtent.ts";

// Landward extent of the evidence for a reaction (reactionExtent.ts): the break interval extended down to
// the lowest break the stations do not reject, and the river-extrapolation-coarse warning when the reaction
// is seen at < 3 stations (issue 14). Forward model: bench/calibration/forwardModel.ts (invented surveys).
const shape = (name: string) => SHAPES.find((s) => s.name === name)!;

/** A two-phase fit with the seaward line C = 100 − S and break at S_b (landward phase below the line). */
function fitWithBreak(b: number, sMin: number, sMax: number): TwoPhaseFit {
  const range = sMax - sMin;
  // α₀ + α₁·t is the line at S: α₀ = 100 − S_min, α₁ = −range; β₂ < 0 puts the landward phase below it.
  return {
    breakSalinity: b,
    linear: false,
    coef: [100 - sMin, -range, -50, 0],
    sMin,
    range,
    rss: 1,
    rssLinear: 100,
    params: 5,
    pCurvature: 0,
  };
}

describe("landward extent of a reaction (confidence set for a change point by test inversion, Hinkley 1970, from memory; per-station 2σ rule as the dilution line's deviations, common practice)", () => {
  it("the first station landward of the break beyond 2σ on the reaction's side bounds the break; stations on the line, or off it on the other side, do not", () => {
    const x = [0.5, 3, 6, 9, 12, 20, 30];
    const fit = fitWithBreak(10, 0.5, 30);
    const line = x.map((s) => 100 - s);
    // 9: on the line; 6: 3σ ABOVE the line (the other side: noise, not the reaction); 3: 2.5σ below; 0.5: far below.
    const y = line.map((v, i) => v + [-30, -2.5, 3, 0, 0, 0, 0][i]!);
    const e = reactionExtent(x, y, new Array<number>(x.length).fill(1), fit, 9.5)!;
    expectWithin(e.lowestBreak, 3, 0, "lowest break: the station at S 3 departs by 2.5σ > 2σ");
    expectWithin(e.reactionStations, 2, 0, "stations showing the reaction (S 0.5 and 3)");
    expectWithin(e.atLandwardLimit ? 1 : 0, 1, 0, "4 distinct stations below S 9.5: the search's landward limit");
    expectWithin(EXTENT_K, 2, 0, "k of the per-station rule");
  });

  it("a break interval reaching down past 5 stations is not at the landward limit; the straight line has no extent", () => {
    const x = [0.5, 1, 2, 3, 4, 6, 9, 12, 20, 30];
    const fit = fitWithBreak(10, 0.5, 30);
    const y = x.map((s) => 100 - s - (s < 2 ? 20 : 0));
    const e = reactionExtent(x, y, new Array<number>(x.length).fill(1), fit, 8)!;
    expectWithin(e.lowestBreak, 1, 0, "lowest break");
    expectWithin(e.atLandwardLimit ? 1 : 0, 0, 0, "6 distinct stations below S 8");
    expectWithin(reactionExtent(x, y, y, { ...fit, linear: true }, 8) === undefined ? 1 : 0, 1, 0, "line");
  });

  it("12 salinity-even stations (≈ 3 S apart) and a reaction ending at S 5: the break is not placed within ±2, but every survey says so (break-uncertain) and the extended interval covers the true break in ≥ 90 % of 20 surveys; C₀ carries river-extrapolation-coarse in all", () => {
    for (const name of ["desorption→S5", "removal→S5"]) {
      const s = scoreCell(shape(name), { stations: 12, spacing: "salinity", noise: 0.02 }, 20, 100);
      expectWithin(s.breakWithin2OrWarned ?? 0, 1, 0, `${name}: break within ±2 or warned`);
      expectWithin((s.breakCoverage ?? 0) >= 0.9 ? 1 : 0, 1, 0, `${name}: break coverage ${s.breakCoverage}`);
      expectWithin(s.biasWarned, 1, 0, `${name}: share warned that C₀ may be biased`);
      expectWithin(s.outsideOwnInterval, 0, 0, `${name}: estimates outside their own interval`);
    }
  });
});
