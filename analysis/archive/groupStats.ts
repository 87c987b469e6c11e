/**
 * Group summaries for an archive: median and spread of a group, and the Kruskal–Wallis test of
 * "all groups alike" (e.g. salt intrusion across seasons).
 */
import { chiSquareUpperP } from "../stats/distributions.ts";
import { midRanks } from "./rankCorrelation.ts";
import type { Spread } from "./types.ts";

function quantileSorted(s: readonly number[], p: number): number {
  const h = (s.length - 1) * p;
  const lo = Math.floor(h);
  const hi = Math.min(s.length - 1, lo + 1);
  return s[lo]! + (h - lo) * (s[hi]! - s[lo]!);
}

/**
 * Median, quartiles (linear interpolation between order statistics, Hyndman & Fan type 7) and
 * extremes of a group.
 *
 * @param values finite numbers (non-finite ones throw)
 * @returns the spread, or undefined for an empty group
 * @throws RangeError for a non-finite value
 * @see Hyndman, R.J. & Fan, Y. (1996) Am. Stat. 50, 361–365 (definition 7).
 */
export function spreadOf(values: readonly number[]): Spread | undefined {
  values.forEach((v, i) => {
    if (!Number.isFinite(v)) throw new RangeError(`spreadOf: values[${i}] must be finite, got ${v}`);
  });
  if (values.length === 0) return undefined;
  const s = [...values].sort((a, b) => a - b);
  return {
    n: s.length,
    median: quantileSorted(s, 0.5),
    q25: quantileSorted(s, 0.25),
    q75: quantileSorted(s, 0.75),
    min: s[0]!,
    max: s[s.length - 1]!,
  };
}

/**
 * Kruskal–Wallis H test that k groups come from one distribution, with the tie correction:
 * H = [12/(N(N+1)) Σ Rᵢ²/nᵢ − 3(N+1)] / [1 − Σ(t³ − t)/(N³ − N)], p from χ² with k − 1 degrees
 * of freedom (groups with no value are ignored).
 *
 * @param groups values of each group (finite)
 * @returns H, degrees of freedom, p and N; undefined with fewer than 2 non-empty groups, fewer
 *   than 5 values, or all values tied
 * @throws RangeError for a non-finite value
 * @see Kruskal, W.H. & Wallis, W.A. (1952) J. Am. Stat. Assoc. 47, 583–621, Eq. 1.1 and §1.4 (ties).
 */
export function kruskalWallis(
  groups: ReadonlyArray<readonly number[]>,
): { h: number; degreesOfFreedom: number; pValue: number; n: number } | undefined {
  const used = groups.filter((g) => g.length > 0);
  const all = used.flat();
  all.forEach((v, i) => {
    if (!Number.isFinite(v)) throw new RangeError(`kruskalWallis: value ${i} must be finite, got ${v}`);
  });
  const n = all.length;
  if (used.length < 2 || n < 5) return undefined;
  const ranks = midRanks(all);
  let sum = 0;
  let at = 0;
  for (const g of used) {
    let r = 0;
    for (let i = 0; i < g.length; i++) r += ranks[at + i]!;
    at += g.length;
    sum += (r * r) / g.length;
  }
  const counts = new Map<number, number>();
  for (const v of all) counts.set(v, (counts.get(v) ?? 0) + 1);
  let ties = 0;
  for (const t of counts.values()) ties += t ** 3 - t;
  const correction = 1 - ties / (n ** 3 - n);
  if (correction <= 0) return undefined;
  const h = ((12 / (n * (n + 1))) * sum - 3 * (n + 1)) / correction;
  const dof = used.length - 1;
  return { h, degreesOfFreedom: dof, pValue: chiSquareUpperP(Math.max(0, h), dof), n };
}
