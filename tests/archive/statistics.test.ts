import { describe, expect, it } from "vitest";
import { kendallTauB, midRanks, spearmanRank } from "../../analysis/archive/rankCorrelation.ts";
import { kruskalWallis, spreadOf } from "../../analysis/archive/groupStats.ts";
import { fitLine, lineBandAt } from "../../analysis/archive/linearFit.ts";
import { expectWithin } from "../helpers/tolerance.ts";

// Worked example of Spearman's ρ: IQ against hours of television per week for 10 people,
// ρ = −29/165 (textbook-style example as commonly reproduced, from memory), p = 0.6272 by the
// t approximation; both confirmed with SciPy 1.17 scipy.stats.spearmanr (general-purpose reference library).
const IQ = [106, 100, 86, 101, 99, 103, 97, 113, 112, 110];
const TV = [7, 27, 2, 50, 28, 29, 20, 12, 6, 17];

// Tied data; reference values from SciPy 1.17 scipy.stats.spearmanr / kendalltau (asymptotic, tie-corrected).
const TX = [1, 2, 2, 3, 4, 4, 4, 5, 6, 7, 8, 8];
const TY = [2, 1, 3, 3, 5, 4, 6, 6, 5, 8, 7, 9];

describe("rank correlation", () => {
  it("midRanks() gives tied values the mean of their ranks (common practice)", () => {
    expect(midRanks([10, 20, 20, 5])).toEqual([2, 3.5, 3.5, 1]);
  });

  it("spearmanRank() matches the IQ/television worked example ρ = −29/165, p = 0.6272 (from memory; SciPy 1.17 spearmanr)", () => {
    const r = spearmanRank(IQ, TV)!;
    expectWithin(r.statistic, -29 / 165, 1e-12, "rho");
    expectWithin(r.pValue, 0.6271883447764846, 1e-9, "p");
  });

  it("kendallTauB() matches SciPy 1.17 kendalltau (asymptotic) on the IQ/television data: τ = −1/9, p = 0.6547", () => {
    const r = kendallTauB(IQ, TV)!;
    expectWithin(r.statistic, -1 / 9, 1e-12, "tau");
    expectWithin(r.pValue, 0.6547208460185769, 1e-9, "p");
  });

  it("spearmanRank() and kendallTauB() with ties match SciPy 1.17 (ρ = 0.92186, τ-b = 0.80656, p = 4.6744e-4)", () => {
    const s = spearmanRank(TX, TY)!;
    expectWithin(s.statistic, 0.9218603346098619, 1e-12, "rho");
    expectWithin(s.pValue, 2.0099830465459694e-5, 1e-10, "p rho");
    const k = kendallTauB(TX, TY)!;
    expectWithin(k.statistic, 0.8065565308263788, 1e-12, "tau-b");
    expectWithin(k.pValue, 0.0004674414805698173, 1e-9, "p tau");
  });

  it("returns undefined with fewer than 3 pairs or a constant variable, throws for bad input", () => {
    expect(spearmanRank([1, 2], [2, 1])).toBeUndefined();
    expect(kendallTauB([1, 1, 1], [1, 2, 3])).toBeUndefined();
    expect(() => spearmanRank([1, 2, 3], [1, 2])).toThrow(RangeError);
    expect(() => kendallTauB([1, NaN, 3], [1, 2, 3])).toThrow(/x\[1\]/);
  });
});

describe("group statistics", () => {
  it("kruskalWallis() matches Hollander & Wolfe (1973) p. 116 mucociliary example: H = 0.7714, p = 0.68 (SciPy 1.17 kruskal)", () => {
    const r = kruskalWallis([
      [2.9, 3.0, 2.5, 2.6, 3.2],
      [3.8, 2.7, 4.0, 2.4],
      [2.8, 3.4, 3.7, 2.2, 2.0],
    ])!;
    expectWithin(r.h, 0.7714285714285722, 1e-9, "H");
    expect(r.degreesOfFreedom).toBe(2);
    expectWithin(r.pValue, 0.6799647735788936, 1e-9, "p");
  });

  it("kruskalWallis() applies the tie correction of Kruskal & Wallis (1952) §1.4 (SciPy 1.17 kruskal: H = 8.0677)", () => {
    const r = kruskalWallis([
      [1, 2, 2, 3],
      [2, 3, 4, 4, 5],
      [5, 6, 6],
    ])!;
    expectWithin(r.h, 8.067655875299765, 1e-9, "H");
    expectWithin(r.pValue, 0.017706420985399672, 1e-9, "p");
  });

  it("spreadOf() gives type-7 quartiles (Hyndman & Fan 1996): 1…9 → 3, 5, 7", () => {
    const s = spreadOf([9, 1, 8, 2, 7, 3, 6, 4, 5])!;
    expect([s.q25, s.median, s.q75, s.min, s.max]).toEqual([3, 5, 7, 1, 9]);
    expect(spreadOf([])).toBeUndefined();
  });
});

describe("straight-line fit", () => {
  // Reference: SciPy 1.17 scipy.stats.linregress and t.ppf(0.975, 6) on invented points.
  const q = [120, 300, 800, 1500, 3000, 6000, 12000, 25000];
  const L = [85, 80, 74, 70, 66, 60, 55, 48];

  it("fitLine() slope and its 95 % t interval match SciPy 1.17 linregress (Draper & Smith 1998 §1.4)", () => {
    const f = fitLine(q.map(Math.log10), L)!;
    expectWithin(f.slope, -15.760534341682796, 1e-9, "slope");
    expectWithin(f.intercept, 119.19647987008146, 1e-9, "intercept");
    expectWithin(f.t975, 2.4469118511449786, 1e-7, "t");
    expectWithin(f.slopeUpper - f.slope, 2.4469118511449786 * 0.5946824669424161, 1e-6, "half-width");
  });

  it("lineBandAt() is narrowest at the mean of x and contains the fitted value", () => {
    const f = fitLine(q.map(Math.log10), L)!;
    const mid = lineBandAt(f, f.meanX);
    const edge = lineBandAt(f, Math.log10(25000));
    expect(mid.upper - mid.lower).toBeLessThan(edge.upper - edge.lower);
    expectWithin(mid.upper - mid.value, f.t975 * f.residualSd * Math.sqrt(1 / f.n), 1e-12, "band at mean");
  });

  it("fitLine() returns undefined for < 3 points or constant x", () => {
    expect(fitLine([1, 2], [1, 2])).toBeUndefined();
    expect(fitLine([1, 1, 1], [1, 2, 3])).toBeUndefined();
  });
});
