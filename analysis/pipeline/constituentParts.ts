/**
 * Splits a survey's analysed constituents into parts of about equal work, so that parts can be
 * analysed side by side (e.g. the dashboard's first survey on two threads) and merged back in the
 * survey's order. Each constituent's mixing analysis depends only on its own samples, settings and
 * seed, so the merged parts equal the whole analysis.
 */

/**
 * Which part of a survey's constituents one analysis computes: part `index` of `count` parts of about
 * equal work ({@link constituentPartOf}), or the constituents named (e.g. the one on screen first,
 * then the others).
 */
export type ConstituentPart =
  | {
      /** This part, 0 ≤ index < count. */
      index: number;
      /** How many parts the constituents are split into (≥ 1). */
      count: number;
    }
  | {
      /** The constituents of this part, by name (names the survey does not analyse are left out). */
      names: readonly string[];
    };

/**
 * Assigns constituents to `count` parts by greedy longest-processing-time scheduling on a cost
 * estimate: costliest first (ties in list order), each to the part with the least cost so far
 * (ties to the lower part). With equal costs the constituents alternate between parts.
 *
 * @param costs cost estimate per constituent, in list order (e.g. the number of samples; ≥ 0)
 * @param count number of parts (integer ≥ 1)
 * @returns the part index of each constituent, in list order
 * @see Graham 1969, "Bounds on multiprocessing timing anomalies" (the LPT rule, within 4/3 of the best split)
 */
export function constituentPartOf(costs: readonly number[], count: number): number[] {
  if (!Number.isInteger(count) || count < 1)
    throw new RangeError(`constituentPartOf(): count must be an integer ≥ 1, got ${count}`);
  costs.forEach((c, i) => {
    if (!Number.isFinite(c) || c < 0)
      throw new RangeError(`constituentPartOf(): costs[${i}] must be a finite number ≥ 0, got ${c}`);
  });
  const order = costs.map((c, i) => ({ c, i })).sort((a, b) => b.c - a.c || a.i - b.i);
  const load = new Array<number>(count).fill(0);
  const part = new Array<number>(costs.length).fill(0);
  for (const { c, i } of order) {
    let best = 0;
    for (let p = 1; p < count; p++) if (load[p]! < load[best]!) best = p;
    part[i] = best;
    load[best]! += c;
  }
  return part;
}
