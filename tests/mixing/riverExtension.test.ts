import { describe, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { SHAPES, survey } from "../../bench/calibration/forwardModel.ts";
import { analyzeSynthetic, scoreCell, BIAS_WARNINGS } from "../../bench/calibration/cell.ts";
import { fitTwoPhase, twoPhaseValue } from "../../analysis/mixing/twoPhase.ts";
import {
  MIN_LANDWARD_FOR_QUARTIC,
  riverByQuarticExtension,
  riverModelSpread,
} from "../../analysis/mixing/riverExtension.ts";

// River end-member at S = 0 from the landward phase extended by a quartic term (riverExtension.ts) and
// the warnings where C₀ or C*₀ may be biased (issue 14). Forward model: bench/calibration/forwardModel.ts
// (invented surveys; curvature taper (1 − S/S_b)^1.5 that no polynomial hinge contains).
const shape = (name: string) => SHAPES.find((s) => s.name === name)!;

describe("river value at S = 0 by the quartic extension of the landward phase (segmented fit at a given join point, Hudson 1966; bias–variance trade of extrapolation, Hastie et al. 2009 §7.3, from memory)", () => {
  it("on exact removal surveys (20 km-even stations) the quartic extension is within 0.15 % of the true river value at S = 0, where the cubic landward phase misses by more (its model error does not shrink with the noise)", () => {
    for (const name of ["removal→S5", "removal→S12", "removal→S20", "desorption→S10"]) {
      const st = survey(shape(name), { stations: 20, spacing: "km", noise: 0 }, 5);
      const x = st.map((s) => s.salinity);
      const y = st.map((s) => s.conc);
      const w = y.map((c) => 1 / (0.01 * c) ** 2);
      const fit = fitTwoPhase(x, y, w)!;
      const c0 = shape(name).riverConc;
      const quartic = riverByQuarticExtension(x, y, w, fit, 0);
      expectWithin(quartic, c0, 0.0015 * c0, `${name}: quartic extension C₀ at S = 0`);
      expectWithin(
        Math.abs(twoPhaseValue(fit, 0) - c0) > Math.abs(quartic! - c0) ? 1 : 0,
        1,
        0,
        `${name}: cubic misses more`,
      );
    }
  });

  it(`needs ${MIN_LANDWARD_FOR_QUARTIC} distinct stations landward of the break and a landward phase: none for the straight line or a reaction reaching the mouth`, () => {
    const x = [0.2, 1, 2, 3, 4, 5, 8, 12, 20, 30];
    const y = x.map((s) => 100 - 2 * s);
    const w = x.map(() => 1);
    const line = fitTwoPhase(x, y, w)!;
    expectWithin(riverByQuarticExtension(x, y, w, line, 0) === undefined ? 1 : 0, 1, 0, "straight line: undefined");
    const mouth = { ...line, linear: false, breakSalinity: 30 };
    expectWithin(
      riverByQuarticExtension(x, y, w, mouth, 0) === undefined ? 1 : 0,
      1,
      0,
      "break at the mouth: undefined",
    );
    const few = { ...line, linear: false, breakSalinity: 3.5 };
    expectWithin(
      riverByQuarticExtension(x, y, w, few, 0) === undefined ? 1 : 0,
      1,
      0,
      "4 landward stations: undefined",
    );
    const enough = { ...line, linear: false, breakSalinity: 10 };
    expectWithin(
      riverByQuarticExtension(x, y, w, enough, 0),
      100,
      1e-6,
      "7 landward stations on a line: its value at S = 0",
    );
  });

  it("removal ending at S 5, 20 km-even stations, 1 % noise: the 95 % BC interval of % change (Efron 1987) covers the truth at S = 0 in ≥ 85 % of 40 surveys and its bias is within 1 pp (before the extension: 82 % of 100, +0.5 pp)", () => {
    const s = scoreCell(shape("removal→S5"), { stations: 20, spacing: "km", noise: 0.01 }, 40, 150);
    expectWithin(s.percentCoverage >= 0.85 ? 1 : 0, 1, 0, `coverage of % change ${s.percentCoverage}`);
    expectWithin(s.percentBiasPp, 0, 1, "bias of % change [pp]");
    expectWithin(s.outsideOwnInterval, 0, 0, "estimates outside their own interval");
  });

  it("desorption ending at S 5 with 20 salinity-even stations (3 stations below the break): most surveys carry a warning that C₀ rests on an assumed curve shape (river-extrapolation-coarse; the issue allows a warning where the stations cannot remove a bias)", () => {
    let warned = 0;
    const n = 20;
    for (let k = 0; k < n; k++) {
      const seed = 3 + 7919 * k;
      const st = survey(shape("desorption→S5"), { stations: 20, spacing: "salinity", noise: 0.02 }, seed);
      const r = analyzeSynthetic(st, 0.02, { bootstrapDraws: 100, seed });
      if (r.warnings.some((w) => BIAS_WARNINGS.has(w.code))) warned++;
    }
    expectWithin(warned >= 0.7 * n ? 1 : 0, 1, 0, `surveys warned: ${warned} of ${n}`);
  });

  it("between-model term of C₀ (Akaike-weighted quartic vs cubic, Buckland et al. 1997, from memory): 0 where the cubic landward phase is exact, and at most the full difference of the two C₀ otherwise", () => {
    const x = Array.from({ length: 20 }, (_, i) => 0.3 + (32.7 * i) / 19);
    const w = x.map(() => 1);
    const cubic = x.map((s) => 60 - 1.5 * s + 40 * Math.max(0, 1 - s / 12) ** 3);
    const fitC = fitTwoPhase(x, cubic, w)!;
    expectWithin(riverModelSpread(x, cubic, w, fitC, 0, 1), 0, 1e-6, "exact cubic hinge: no model spread");
    const st = survey(shape("removal→S12"), { stations: 20, spacing: "km", noise: 0 }, 5);
    const xs = st.map((s) => s.salinity);
    const ys = st.map((s) => s.conc);
    const ws = ys.map((c) => 1 / (0.01 * c) ** 2);
    const fit = fitTwoPhase(xs, ys, ws)!;
    const spread = riverModelSpread(xs, ys, ws, fit, 0, 1)!;
    const full = Math.abs(riverByQuarticExtension(xs, ys, ws, fit, 0)! - twoPhaseValue(fit, 0));
    expectWithin(spread >= 0 && spread <= full + 1e-12 ? 1 : 0, 1, 0, `spread ${spread} within [0, ${full}]`);
  });
});
