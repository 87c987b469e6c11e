import type { BehaviourClass, TangentLine } from "./result.ts";

/** Share of the salinity range a seaward linear segment must cover to call the outer estuary conservative. */
export const TAIL_MIN_FRACTION = 0.25;

/**
 * Behaviour class from the statistical decision and the curve's shape (documented rule):
 * conservative unless the evidence says otherwise; removal or addition from the sign of
 * C*₀ − C₀ (quadratic coefficient when that is zero); "-then-conservative" when a straight
 * seaward segment of ≥ 4 stations covers ≥ 25 % of the salinity range and starts above the
 * lowest 10 % of it; additions need an interior maximum for "maximum-then-conservative".
 *
 * @param nonConservative result of the statistical tests
 * @param netDelta C*₀ − C₀ [unit]
 * @param quadCoef quadratic coefficient c (> 0 removal)
 * @param tangent the seaward tangent
 * @param sMin lowest and sMax highest station salinity
 * @param hasInteriorMax whether the curve has an interior maximum
 * @returns the class
 */
export function classify(nonConservative: boolean, netDelta: number, quadCoef: number, tangent: TangentLine, sMin: number, sMax: number, hasInteriorMax: boolean): BehaviourClass {
  if (!nonConservative) return "conservative";
  const removal = netDelta !== 0 ? netDelta < 0 : quadCoef > 0;
  const range = sMax - sMin;
  const tail = tangent.method === "segment" && sMax - tangent.fromSalinity >= TAIL_MIN_FRACTION * range && tangent.fromSalinity > sMin + 0.1 * range;
  if (removal) return tail ? "removal-then-conservative" : "removal";
  return tail && hasInteriorMax ? "maximum-then-conservative" : "addition";
}
