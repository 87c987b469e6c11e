// Seeded synthetic estuarine surveys for tests and benchmarks (invented, not measurements).
import { randomLcg, randomNormal } from "d3-random";
import type { MixingSample } from "../../../analysis/mixing/options.ts";

/**
 * A constituent whose true effective end-member is known: a straight line from
 * (S_r, C*₀) to (S_s, C_s) plus a reaction term A·(1 − S/S_b)³ that vanishes with
 * its first two derivatives at S_b (same shape as the derived Fe flocculation case C = 1 − 0.995·S/35 + 9·(1 − S/15)³, Boyle et al. 1974 tangent).
 * C(S_r = 0) = C*₀ + A, so A = C₀ − C*₀ (A > 0 removal, A < 0 addition).
 */
export interface SyntheticSpec {
  c0: number;
  cStar: number;
  cSea: number;
  /** Salinity where the reaction ends. */
  sBreak: number;
  sSea?: number;
}

/** True concentration at salinity S for a spec. */
export function trueConc(p: SyntheticSpec, s: number): number {
  const sSea = p.sSea ?? 35;
  const line = p.cStar + ((p.cSea - p.cStar) * s) / sSea;
  return line + (s < p.sBreak ? (p.c0 - p.cStar) * (1 - s / p.sBreak) ** 3 : 0);
}

/** Station salinities 0…sSea spaced more densely at low salinity (square-root spacing). */
export function stationSalinities(n: number, sSea = 35): number[] {
  return Array.from({ length: n }, (_, i) => sSea * (i / (n - 1)) ** 1.5);
}

/**
 * Samples with seeded Gaussian noise of relative sd `relNoise`.
 *
 * @param p spec; salinities station salinities; relNoise e.g. 0.03; seed LCG seed
 */
export function synthSamples(p: SyntheticSpec, salinities: number[], relNoise: number, seed: number): MixingSample[] {
  const z = randomNormal.source(randomLcg(seed))(0, 1);
  return salinities.map((s, i) => {
    const c = trueConc(p, s);
    return { stationId: `St${i + 1}`, salinity: s, conc: c * (1 + relNoise * z()), censored: false, accepted: true };
  });
}
