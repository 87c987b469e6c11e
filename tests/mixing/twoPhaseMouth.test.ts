import { describe, expect, it } from "vitest";
import { expectWithin } from "../helpers/tolerance.ts";
import { fitTwoPhase, type TwoPhaseFit } from "../../analysis/mixing/twoPhase.ts";
import { MIN_SEAWARD_STATIONS, mouthAveragedEffective, mouthModelWeight } from "../../analysis/mixing/twoPhaseMouth.ts";
import { SHAPES } from "../../bench/calibration/forwardModel.ts";
import { scoreCell } from "../../bench/calibration/cell.ts";

// A two-phase fit with its break at S_b, seaward line C = a + b·S (only the fields the averaging reads).
const fitWithBreak = (breakSalinity: number, a: number, b: number, sMin: number, sMax: number): TwoPhaseFit => ({
  breakSalinity,
  linear: false,
  coef: [a + b * sMin, b * (sMax - sMin), 0, 0],
  sMin,
  range: sMax - sMin,
  rss: 0,
  rssLinear: 0,
  params: 5,
  pCurvature: 0,
});

describe("mouthAveragedEffective (Akaike-weighted seaward end models, Buckland et al. 1997; local quadratic end derivative, Fan & Gijbels 1996 §3.2, from memory)", () => {
  const x = [0.5, 3, 6, 10, 15, 21, 27, 33];

  it("on a parabola bending to the mouth, the local quadratic recovers the exact tangent at S_max (derived: C = 100 − 4·S + 0.05·S², C*₀ = C(33) − 33·C′(33) = 100 − 0.05·33² = 45.55) and takes nearly all the weight", () => {
    const y = x.map((s) => 100 - 4 * s + 0.05 * s * s);
    const w = x.map(() => 1e4); // σ = 0.01: the chord's misfit is decisive
    // A "seaward line" on the last 2 stations: the chord from S 27 to 33.
    const slope = (y[7]! - y[6]!) / 6;
    const fit = fitWithBreak(26, y[7]! - slope * 33, slope, 0.5, 33);
    const m = mouthAveragedEffective(x, y, w, fit, 0, 1);
    expectWithin(m.curved!, 45.55, 1e-9, "tangent intercept of the local quadratic");
    expectWithin(m.segment, y[7]! - 33 * slope, 1e-9, "chord intercept");
    expectWithin(m.weight, 1, 1e-9, "Akaike weight of the curved end");
    expectWithin(m.value, 45.55, 1e-6, "averaged C*₀");
  });

  it("on a straight outer estuary the curved end fits no better: its weight is 1/(1 + e) (ΔAIC = 2 for one extra parameter, Akaike 1974) and both models give the line's C*₀", () => {
    const y = x.map((s) => (s < 15 ? 60 - 1.5 * s + 0.2 * (15 - s) ** 2 : 60 - 1.5 * s));
    const w = x.map(() => 1);
    const fit = fitWithBreak(20, 60, -1.5, 0.5, 33);
    const m = mouthAveragedEffective(x, y, w, fit, 0, 1);
    expectWithin(m.weight, 1 / (1 + Math.E), 1e-9, "weight of the quadratic");
    expectWithin(m.curved!, 60, 1e-9, "quadratic's C*₀ on a line");
    expectWithin(m.value, 60, 1e-9, "averaged C*₀");
  });

  it(`a seaward line on ≥ ${MIN_SEAWARD_STATIONS} stations, a break at S_max and the straight line kept are left as they are (weight 0)`, () => {
    const y = x.map((s) => 100 - 4 * s + 0.05 * s * s);
    const w = x.map(() => 1);
    for (const fit of [
      fitWithBreak(14, 90, -2, 0.5, 33),
      fitWithBreak(33, 90, -2, 0.5, 33),
      { ...fitWithBreak(0.5, 90, -2, 0.5, 33), linear: true },
    ]) {
      const m = mouthAveragedEffective(x, y, w, fit, 0, 1);
      expect(m.weight).toBe(0);
      expectWithin(m.value, 90, 1e-9, "C*₀ of the fitted line");
    }
  });

  it("agrees with the two-phase fit's own line on real fits: value between the segment and the curved end", () => {
    const y = x.map((s) => 100 - 4 * s + 0.05 * s * s);
    const fit = fitTwoPhase(
      x,
      y,
      x.map(() => 1),
    )!;
    const m = mouthAveragedEffective(
      x,
      y,
      x.map(() => 1),
      fit,
      0,
      1,
    );
    const lo = Math.min(m.segment, m.curved ?? m.segment);
    const hi = Math.max(m.segment, m.curved ?? m.segment);
    expectWithin(m.value >= lo - 1e-9 && m.value <= hi + 1e-9 ? 1 : 0, 1, 0, "averaged value between its models");
  });

  it("calibration guard (seeded synthetic surveys, bench/calibration): removal continuing to the mouth, 20 km-even stations, 2 % noise: the % change is within 2 pp of the truth on average and its 95 % interval covers it in ≥ 90 % of 40 surveys and ≥ 95 % carry a warning that C*₀ may be biased (before: +2.4 pp, 88 % of 100, 99 % warned)", () => {
    const shape = SHAPES.find((s) => s.name === "removal→mouth")!;
    const s = scoreCell(shape, { stations: 20, spacing: "km", noise: 0.02 }, 40, 150);
    expectWithin(s.percentBiasPp, 0, 2, "bias of % change [pp]");
    expectWithin(s.percentCoverage >= 0.9 ? 1 : 0, 1, 0, `coverage of % change ${s.percentCoverage}`);
    expectWithin(s.outsideOwnInterval, 0, 0, "estimates outside their own interval");
    // Every survey says C*₀ may be biased (reaction-reaches-mouth, short-seaward-line or seaward-line-untested).
    expectWithin(s.biasWarned >= 0.95 ? 1 : 0, 1, 0, `share warned ${s.biasWarned}`);
  });

  it("mouthModelWeight: a reaction that ends at S 12 with a long straight tail leaves the break-at-the-mouth model no weight; a curve bending to the last station gives it a real one (Akaike 1974 weights, derived exact data with σ = 0.1)", () => {
    const xs = Array.from({ length: 20 }, (_, i) => 0.5 + (32.5 * i) / 19);
    const w = xs.map(() => 100);
    const ended = xs.map((s) => 40 - 0.9 * s + (s < 12 ? 0.08 * (12 - s) ** 3 : 0));
    const fEnded = fitTwoPhase(xs, ended, w)!;
    expectWithin(fEnded.linear ? 0 : 1, 1, 0, "two-phase fit found");
    expectWithin(
      mouthModelWeight(xs, ended, w, fEnded, 1)!,
      0,
      1e-6,
      "weight of the mouth model, reaction ending at S 12",
    );
    const curving = xs.map((s) => 100 - 4 * s + 0.05 * s * s);
    const fCurving = { ...fitWithBreak(27, 0, 0, 0.5, 33), rss: 0 };
    const wCurving = mouthModelWeight(xs, curving, w, fCurving, 1)!;
    // The quadratic is inside the cubic model with its break at S_max (RSS 0): ΔAIC = −2, w = 1/(1 + e⁻¹).
    expectWithin(wCurving, 1 / (1 + Math.exp(-1)), 1e-6, "weight of the mouth model on a parabola");
  });
});
