import { fitTwoPhaseAtBreak, type TwoPhaseFit } from "./twoPhase.ts";

/** Candidate breaks of a profile over breaks (as the break search's grid in twoPhase.ts). */
export const BREAK_GRID = 24;

/**
 * The candidate breaks at which a two-phase model is refitted to profile its break: BREAK_GRID + 1
 * evenly spaced salinities from just above the 3rd distinct station to S_max, b_g = lo + (S_max − lo)·g/24,
 * lo = S₃ + 10⁻⁹·(S_max − S_min), so that at least three distinct stations lie landward of every
 * candidate (the landward curvature is never set by one station or two near-tied ones). Salinity units.
 *
 * @param x ascending salinities
 * @returns the candidate breaks, or undefined when the 3rd distinct station is the most saline
 * @see Hudson, D.J. (1966) Fitting segmented curves whose join points have to be estimated. JASA 61,
 *   1097–1129 (profile of the residual sum of squares over the join point; from memory).
 */
export function candidateBreaks(x: ArrayLike<number>): Float64Array | undefined {
  const n = x.length;
  let third = Number.NaN;
  for (let i = 1, distinct = 1, prev = x[0]!; i < n; i++) {
    if (!(x[i]! > prev)) continue;
    prev = x[i]!;
    if (++distinct === 3) {
      third = prev;
      break;
    }
  }
  const sMax = x[n - 1]!;
  if (!(third < sMax)) return undefined;
  const lo = third + 1e-9 * (sMax - x[0]!);
  const breaks = new Float64Array(BREAK_GRID + 1);
  for (let g = 0; g <= BREAK_GRID; g++) breaks[g] = lo + ((sMax - lo) * g) / BREAK_GRID;
  return breaks;
}

/** The two-phase model refitted at each candidate break: `fits[g]` at `breaks[g]` (undefined where it cannot be fitted). */
export interface BreakProfile {
  breaks: Float64Array;
  fits: Array<TwoPhaseFit | undefined>;
}

/**
 * The profile over breaks of a survey's data: the two-phase model refitted at each of
 * {@link candidateBreaks} (fitTwoPhaseAtBreak, weighted least squares at a given join point). Computed
 * once per constituent and read by every use of the profile (the local river window's confidence set,
 * the between-break spread and model averages).
 *
 * @param x ascending salinities; y concentrations; w weights 1/σ²
 * @returns the profile, or undefined when there are no candidate breaks
 * @see Hudson, D.J. (1966) JASA 61, 1097–1129 (segmented regression at a given join point).
 */
export function breakProfile(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  w: ArrayLike<number>,
): BreakProfile | undefined {
  const breaks = candidateBreaks(x);
  if (!breaks) return undefined;
  return { breaks, fits: Array.from(breaks, (b) => fitTwoPhaseAtBreak(x, y, w, b)) };
}
