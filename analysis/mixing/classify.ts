import type { BehaviourClass, TangentLine } from "./result.ts";

/** Stations landward of the seaward segment needed to call the inner estuary reactive. */
export const MIN_LANDWARD_STATIONS = 3;

/** Share of the salinity range a seaward linear segment must cover to call the outer estuary conservative. */
export const TAIL_MIN_FRACTION = 0.25;

/**
 * Behaviour class from the statistical decision and the curve's shape (documented rule):
 * conservative unless the evidence says otherwise; removal or addition from the sign of
 * C*₀ − C₀ (quadratic coefficient when that is zero); "-then-conservative" when a straight
 * seaward segment of ≥ 4 stations covers ≥ 25 % of the salinity range and at least
 * {@link MIN_LANDWARD_STATIONS} stations lie landward of it (where the reaction is seen);
 * additions need an interior maximum for "maximum-then-conservative".
 *
 * @param nonConservative result of the statistical tests
 * @param netDelta C*₀ − C₀ [unit]
 * @param quadCoef quadratic coefficient c (> 0 removal)
 * @param tangent the seaward tangent
 * @param sMin lowest and sMax highest station salinity
 * @param hasInteriorMax whether the curve has an interior maximum
 * @param nStations number of stations analysed
 * @returns the class
 */
export function classify(
  nonConservative: boolean,
  netDelta: number,
  quadCoef: number,
  tangent: TangentLine,
  sMin: number,
  sMax: number,
  hasInteriorMax: boolean,
  nStations: number,
): BehaviourClass {
  if (!nonConservative) return "conservative";
  const removal = netDelta !== 0 ? netDelta < 0 : quadCoef > 0;
  const range = sMax - sMin;
  const tail =
    tangent.method === "segment" &&
    sMax - tangent.fromSalinity >= TAIL_MIN_FRACTION * range &&
    nStations - tangent.nStations >= MIN_LANDWARD_STATIONS;
  if (removal) return tail ? "removal-then-conservative" : "removal";
  return tail && hasInteriorMax ? "maximum-then-conservative" : "addition";
}
