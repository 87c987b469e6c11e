/**
 * Rank correlation with a p-value: Spearman's ρ and Kendall's τ-b, both tie-corrected, for
 * monotone relations in an archive (e.g. % change against river discharge) without assuming a line.
 */
import jStat from "jstat";
import { normalCdf } from "../stats/distributions.ts";

/** A rank correlation coefficient with its two-sided p-value. */
export interface RankCorrelation {
  method: "spearman" | "kendall-tau-b";
  /** ρ or τ-b, in [−1, 1]. */
  statistic: number;
  /** Two-sided p-value of "no monotone association". */
  pValue: number;
  n: number;
  /** How the p-value was obtained, for the reader. */
  pMethod: string;
}

function checkPairs(fn: string, x: readonly number[], y: readonly number[]): void {
  if (!Array.isArray(x) || !Array.isArray(y) || x.length !== y.length)
    throw new RangeError(`${fn}: x and y must be arrays of equal length, got ${x?.length} and ${y?.length}`);
  x.forEach((v, i) => {
    if (!Number.isFinite(v)) throw new RangeError(`${fn}: x[${i}] must be finite, got ${v}`);
    if (!Number.isFinite(y[i])) throw new RangeError(`${fn}: y[${i}] must be finite, got ${y[i]}`);
  });
}

/**
 * Mid-ranks (1-based; tied values share the mean of their ranks).
 *
 * @param values finite numbers
 * @returns rank of each value, in input order
 */
export function midRanks(values: readonly number[]): number[] {
  const order = values.map((v, i) => [v, i] as const).sort((a, b) => a[0] - b[0]);
  const ranks = new Array<number>(values.length);
  for (let i = 0; i < order.length;) {
    let j = i;
    while (j + 1 < order.length && order[j + 1]![0] === order[i]![0]) j++;
    const r = (i + j) / 2 + 1;
    for (let k = i; k <= j; k++) ranks[order[k]![1]] = r;
    i = j + 1;
  }
  return ranks;
}

/**
 * Spearman's rank correlation ρ: Pearson's correlation of the mid-ranks (exact with ties).
 * Two-sided p from t = ρ·√((n − 2)/(1 − ρ²)) on n − 2 degrees of freedom.
 *
 * @param x first variable (finite)
 * @param y second variable (finite), same length
 * @returns ρ with p, or undefined with fewer than 3 pairs or a constant variable
 * @throws RangeError for unequal lengths or non-finite values
 * @see Spearman, C. (1904) Am. J. Psychol. 15, 72–101; t approximation: Zar, J.H. (2010) Biostatistical Analysis, 5th ed., §19.9.
 */
export function spearmanRank(x: readonly number[], y: readonly number[]): RankCorrelation | undefined {
  checkPairs("spearmanRank", x, y);
  const n = x.length;
  if (n < 3) return undefined;
  const rx = midRanks(x);
  const ry = midRanks(y);
  const m = (n + 1) / 2;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    sxy += (rx[i]! - m) * (ry[i]! - m);
    sxx += (rx[i]! - m) ** 2;
    syy += (ry[i]! - m) ** 2;
  }
  if (sxx === 0 || syy === 0) return undefined;
  const rho = Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy)));
  let p: number;
  if (Math.abs(rho) >= 1 - 1e-12) p = 0;
  else {
    const t = rho * Math.sqrt((n - 2) / (1 - rho * rho));
    p = 2 * (1 - jStat.studentt.cdf(Math.abs(t), n - 2));
  }
  return {
    method: "spearman",
    statistic: rho,
    pValue: Math.min(1, Math.max(0, p)),
    n,
    pMethod: "t approximation, n − 2 degrees of freedom",
  };
}

/**
 * Kendall's τ-b (tie-corrected) with a two-sided p-value from the normal approximation of S
 * with the tie-corrected variance.
 *
 * Formula: τ_b = (n_c − n_d)/√((n₀ − n₁)(n₀ − n₂)), n₀ = n(n−1)/2, n₁, n₂ the tied pairs in x, y;
 * Var(S) = [v₀ − Σt(t−1)(2t+5) − Σu(u−1)(2u+5)]/18 + Σt(t−1)Σu(u−1)/(2n(n−1))
 *        + Σt(t−1)(t−2)Σu(u−1)(u−2)/(9n(n−1)(n−2)), v₀ = n(n−1)(2n+5).
 *
 * @param x first variable (finite)
 * @param y second variable (finite), same length
 * @returns τ-b with p, or undefined with fewer than 3 pairs or a constant variable
 * @throws RangeError for unequal lengths or non-finite values
 * @see Kendall, M.G. (1938) Biometrika 30, 81–93; Kendall, M.G. (1970) Rank Correlation Methods, 4th ed., ch. 3–4 (ties).
 */
export function kendallTauB(x: readonly number[], y: readonly number[]): RankCorrelation | undefined {
  checkPairs("kendallTauB", x, y);
  const n = x.length;
  if (n < 3) return undefined;
  let s = 0;
  for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) s += Math.sign(x[i]! - x[j]!) * Math.sign(y[i]! - y[j]!);
  const tieSums = (v: readonly number[]): [number, number, number, number] => {
    const counts = new Map<number, number>();
    for (const a of v) counts.set(a, (counts.get(a) ?? 0) + 1);
    let pairs = 0;
    let v1 = 0;
    let v2 = 0;
    let v3 = 0;
    for (const t of counts.values()) {
      pairs += (t * (t - 1)) / 2;
      v1 += t * (t - 1) * (2 * t + 5);
      v2 += t * (t - 1);
      v3 += t * (t - 1) * (t - 2);
    }
    return [pairs, v1, v2, v3];
  };
  const [tx, x1, x2, x3] = tieSums(x);
  const [ty, y1, y2, y3] = tieSums(y);
  const n0 = (n * (n - 1)) / 2;
  const denom = Math.sqrt((n0 - tx) * (n0 - ty));
  if (denom === 0) return undefined;
  const tau = s / denom;
  const variance =
    (n * (n - 1) * (2 * n + 5) - x1 - y1) / 18 +
    (x2 * y2) / (2 * n * (n - 1)) +
    (x3 * y3) / (9 * n * (n - 1) * (n - 2));
  const p = variance > 0 ? 2 * (1 - normalCdf(Math.abs(s) / Math.sqrt(variance))) : 1;
  return {
    method: "kendall-tau-b",
    statistic: tau,
    pValue: Math.min(1, Math.max(0, p)),
    n,
    pMethod: "normal approximation with tie-corrected variance (no continuity correction)",
  };
}
