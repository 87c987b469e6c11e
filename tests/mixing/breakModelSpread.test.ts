import { describe, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { SHAPES, survey } from "../../bench/calibration/forwardModel.ts";
import { scoreCell } from "../../bench/calibration/cell.ts";
import { fitTwoPhase } from "../../analysis/mixing/twoPhase.ts";
import { breakModelSpread } from "../../analysis/mixing/breakModelSpread.ts";

// Between-break spread of C*₀ and % change (breakModelSpread.ts) and the river limit C₀/3 of analyzeShape
// (issue 14). Forward model: bench/calibration/forwardModel.ts (invented surveys; curvature taper
// (1 − S/S_b)^1.5 that no polynomial hinge contains).
const shape = (name: string) => SHAPES.find((s) => s.name === name)!;

describe("between-break spread (Akaike-weighted profile over breaks, model-averaging variance of Buckland et al. 1997, from memory; segmented regression at a given join point, Hudson 1966)", () => {
  it("is 0 for C*₀ where every admissible break gives the same seaward line (an exact straight line beyond a sharp cubic hinge, profile concentrated at its break), undefined for the straight line", () => {
    const x = Array.from({ length: 25 }, (_, i) => 0.3 + (32.7 * i) / 24);
    const w = x.map(() => 1e4);
    // Cubic hinge ending at S 8, with a large amplitude: breaks other than 8 leave large residuals.
    const y = x.map((s) => 60 - 1.5 * s + 200 * Math.max(0, 1 - s / 8) ** 3);
    const fit = fitTwoPhase(x, y, w)!;
    const s = breakModelSpread(x, y, w, fit, 0, "cubic")!;
    expectWithin(s.effective, 0, 1e-6, "C*₀ spread on an exact cubic hinge");
    expectWithin(s.percent, 0, 1e-6, "% change spread on an exact cubic hinge");
    expectWithin(breakModelSpread(x, y, w, { ...fit, linear: true }, 0) === undefined ? 1 : 0, 1, 0, "line: undefined");
  });

  it("grows where the curvature fades over a long range (removal ending at S 20, 2 % noise: a flat profile over breaks) and is smaller for a sharp end at S 5", () => {
    const spread = (name: string): number => {
      let sum = 0;
      for (let k = 0; k < 10; k++) {
        const st = survey(shape(name), { stations: 35, spacing: "km", noise: 0.02 }, 11 + 7919 * k);
        const x = st.map((s) => s.salinity);
        const y = st.map((s) => s.conc);
        const w = y.map((c) => 1 / (0.02 * c) ** 2);
        const fit = fitTwoPhase(x, y, w)!;
        sum += breakModelSpread(x, y, w, fit, 0)?.effective ?? 0;
      }
      return sum / 10;
    };
    const fading = spread("removal→S20");
    const sharp = spread("removal→S5");
    expectWithin(fading > sharp ? 1 : 0, 1, 0, `mean spread: fading ${fading}, sharp ${sharp}`);
  });

  it("desorption ending at S 15, 35 km-even stations, 2 % noise: the C*₀ interval covers the truth in ≥ 85 % of 40 surveys (87 % of 100 before the spread, 91 % with it)", () => {
    const s = scoreCell(shape("desorption→S15"), { stations: 35, spacing: "km", noise: 0.02 }, 40, 150);
    expectWithin(s.effectiveCoverage >= 0.85 ? 1 : 0, 1, 0, `C*₀ coverage ${s.effectiveCoverage}`);
    expectWithin(s.outsideOwnInterval, 0, 0, "estimates outside their own interval");
  });

  it("desorption ending at S 5, 20 km-even stations, 5 % noise: with the river limit C₀/3 and C₀ model-averaged over breaks the % change is within 3 pp of the truth at S = 0 (Monte Carlo SE ≈ 1.2 pp over 200 surveys), RMSE ≤ 18.5 pp, covered in ≥ 88 % (limit 0.2: −6.8 pp, 81 % of 100; best-break C₀: −3.0 pp, RMSE 19.6 pp)", () => {
    // Model-averaged estimator over breaks: Buckland, Burnham & Augustin (1997), from memory.
    const s = scoreCell(shape("desorption→S5"), { stations: 20, spacing: "km", noise: 0.05 }, 200, 150);
    expectWithin(s.percentBiasPp, 0, 3, "bias of % change [pp]");
    expectWithin(s.percentRmsePp <= 18.5 ? 1 : 0, 1, 0, `RMSE of % change ${s.percentRmsePp} pp`);
    expectWithin(s.percentCoverage >= 0.88 ? 1 : 0, 1, 0, `coverage of % change ${s.percentCoverage}`);
    expectWithin(s.referenceSalinity, 0, 0.05, "mean river reference salinity (S = 0 except where unstable)");
  });
});
