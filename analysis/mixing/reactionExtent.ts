import { seawardLine, twoPhaseValue, type TwoPhaseFit } from "./twoPhase.ts";

/** Distinct stations the cubic landward phase needs below its break (twoPhase.ts: the search's landward limit). */
export const LANDWARD_PHASE_STATIONS = 4;

/** Fewest distinct stations off the seaward line before C₀'s extrapolation rests on the data, not on the curve model (documented choice). */
export const MIN_REACTION_STATIONS = 3;

/** A station departs from the extended seaward line when it lies beyond k·σ_eff on the reaction's side (k as the dilution line's deviation rule). */
export const EXTENT_K = 2;

/** How far the stations landward of a two-phase fit's break show the reaction. */
export interface ReactionExtent {
  /**
   * Lowest salinity at which the reaction could end: the salinity of the station, walking landward
   * from the break, at which the stations first depart from the seaward line extended landward (the
   * reaction must include it); the freshest station when none departs.
   */
  lowestBreak: number;
  /** Distinct stations at or landward of {@link lowestBreak} (the stations that show the reaction). */
  reactionStations: number;
  /** True when at most {@link LANDWARD_PHASE_STATIONS} distinct stations lie below `breakLower`: the break search cannot go farther landward. */
  atLandwardLimit: boolean;
}

/**
 * Landward extent of the evidence for a reaction: walking landward from the break S_b, each station
 * is compared with the seaward line C = a + c·S extended landward; the first one that departs from it
 * by more than k·σ_eff (k = {@link EXTENT_K}, σ_eff = σ·max(1, √χ²_ν) of the fit) on the side of the
 * fitted reaction (the sign of the landward phase's departure at the freshest station: below the line
 * for an addition, above it for a removal) shows the reaction, so the reaction cannot have ended
 * landward of it; every station between it and S_b is consistent with a reaction that ended just
 * seaward of it. The breaks not rejected that way form a confidence set for the end of the reaction
 * (inversion of a test), which the two-phase search cannot give where its landward phase needs more
 * stations than lie below the true end: the bootstrap, drawn around the fitted break, then only says
 * where the estimator lands. One-sided per-station tests (noise on the other side of the line, or
 * small departures that only add up, do not reject) keep the set from shrinking on noise; the line's
 * own uncertainty is left out.
 *
 * @param x ascending salinities; y concentrations; sigmaEff σ_eff per station (same units as y)
 * @param fit the two-phase fit (not the straight line)
 * @param breakLower lower end of the reported break interval (salinity)
 * @returns the extent, or undefined for the straight line
 * @see Hinkley, D.V. (1970) Inference about the change-point in a sequence of random variables.
 *   Biometrika 57, 1–17 (confidence sets for a change point; from memory); Seber, G.A.F. & Wild, C.J.
 *   (1989) Nonlinear Regression, Wiley, ch. 9 (multiphase regression, join-point inference; from memory).
 */
export function reactionExtent(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  sigmaEff: ArrayLike<number>,
  fit: TwoPhaseFit,
  breakLower: number,
): ReactionExtent | undefined {
  if (fit.linear) return undefined;
  const [a, c] = seawardLine(fit);
  const b = fit.breakSalinity;
  let i = x.length - 1;
  while (i >= 0 && x[i]! >= b) i--;
  const sMin = x[0]!;
  const side = Math.sign(twoPhaseValue(fit, sMin) - a - c * sMin) || 1;
  let lowest = x[0]!;
  for (; i >= 0; i--) {
    const s = sigmaEff[i]!;
    if (!(s > 0)) continue;
    if ((side * (y[i]! - a - c * x[i]!)) / s > EXTENT_K) {
      lowest = x[i]!;
      break;
    }
  }
  return {
    lowestBreak: lowest,
    reactionStations: distinctUpTo(x, lowest, true),
    atLandwardLimit: distinctUpTo(x, breakLower, false) <= LANDWARD_PHASE_STATIONS,
  };
}

/** Distinct salinities in ascending x up to `limit` (inclusive or not). */
function distinctUpTo(x: ArrayLike<number>, limit: number, inclusive: boolean): number {
  let d = 0;
  for (
    let j = 0, prev = Number.NEGATIVE_INFINITY;
    j < x.length && (x[j]! < limit || (inclusive && x[j] === limit));
    j++
  )
    if (x[j]! > prev) {
      d++;
      prev = x[j]!;
    }
  return d;
}
