import type { MixingEvidence, StationDeviation } from "./result.ts";
import type { PreparedSample } from "./prepareSamples.ts";
import { polyFit } from "../stats/polyFit.ts";
import { chiSquareUpperP, fUpperP } from "../stats/distributions.ts";
import { runsTest } from "../stats/runsTest.ts";

/** χ²₁ 95 % critical value: a curvature term must lower χ² by more than this (in precision units). */
export const CHI2_1_95 = 3.841;
/** Significance level of the tests. */
export const ALPHA = 0.05;
/**
 * Level of each of the two curvature tests (quadratic F-test here, two-phase F-test in twoPhase.ts)
 * whose "either" decides the class: α/2 each (Bonferroni), so a conservative constituent is called
 * non-conservative by curvature in ≤ 5 % of surveys. @see Holm, S. (1979) Scand. J. Statist. 6, 65–70.
 */
export const CURVATURE_ALPHA = ALPHA / 2;

/**
 * Statistical evidence for non-conservative behaviour (common practice):
 * 1. straight-line fit of C on S weighted by 1/σ² → χ²_ν = Σ(e/σ)²/(n − 2) and its p;
 * 2. nested F-test quadratic vs linear, F = (RSS_lin − RSS_quad)/[RSS_quad/(n − 3)] ~ F(1, n − 3),
 *    and the quadratic coefficient c (> 0 removal, < 0 addition, Eq. 4);
 * 3. Wald–Wolfowitz runs test of the straight-line residual signs ordered by salinity.
 *
 * @param used prepared samples (≥ 4), sorted by salinity
 * @param devs deviations from the dilution line
 * @param nCensored number of censored values
 * @param k significance factor used for devs
 * @returns evidence, or undefined when the fits cannot be made (too few distinct salinities)
 * @see Boyle et al. (1974) GCA 38, 1719–1728; Wald & Wolfowitz (1940) Ann. Math. Stat. 11, 147–162.
 */
export function mixingEvidence(
  used: readonly PreparedSample[],
  devs: readonly StationDeviation[],
  nCensored: number,
  k: number,
): MixingEvidence | undefined {
  const n = used.length;
  const x = used.map((s) => s.salinity);
  const y = used.map((s) => s.conc);
  const w = used.map((s) => 1 / (s.sigma * s.sigma));
  const lin = polyFit(x, y, w, 1);
  const quad = polyFit(x, y, w, 2);
  if (!lin || !quad || n < 4) return undefined;
  const chi2 = lin.rss;
  const deltaChi2 = Math.max(0, lin.rss - quad.rss);
  const F = quad.rss > 0 ? deltaChi2 / (quad.rss / (n - 3)) : deltaChi2 > 0 ? Number.POSITIVE_INFINITY : 0;
  const resid = used.map((s) => s.conc - (lin.coef[0]! + lin.coef[1]! * s.salinity));
  const runs = runsTest(resid.map((r, i) => (Math.abs(r) < 1e-9 * used[i]!.sigma ? 0 : r)));
  return {
    chiSquaredPerDof: chi2 / (n - 2),
    chiSquaredP: chiSquareUpperP(chi2, n - 2),
    fTestCurvatureP: fUpperP(F, 1, n - 3),
    quadraticCoefficient: quad.coef[2]!,
    curvatureDeltaChiSquared: deltaChi2,
    runsTestP: runs.pTooFew,
    runs: runs.runs,
    nStations: n,
    nSignificantDeviations: devs.filter((d) => d.significant).length,
    nCensored,
    k,
  };
}

/**
 * Decision rule (documented choice): non-conservative when
 * (a) curvature is significant — F-test p < 0.025 (Bonferroni half of 0.05, shared with the two-phase test) AND the quadratic term lowers χ² by more
 *     than χ²₁(95 %) = 3.84 in precision units (curvature larger than analytical precision); or
 * (b) the straight-line residuals exceed precision (χ² p < 0.05) AND are grouped by salinity
 *     (runs test p < 0.05).
 *
 * @param e the evidence
 * @returns true when the constituent departs from conservative mixing
 */
export function isNonConservative(e: MixingEvidence): boolean {
  const curvature = e.fTestCurvatureP < CURVATURE_ALPHA && e.curvatureDeltaChiSquared > CHI2_1_95;
  const systematic = e.chiSquaredP < ALPHA && e.runsTestP < ALPHA;
  return curvature || systematic;
}
