import { logGamma, normalCdf } from "./distributions.ts";

/** Result of the Wald–Wolfowitz runs test on a sequence of signs. */
export interface RunsTestResult {
  /** Number of runs (maximal blocks of equal sign). */
  runs: number;
  nPositive: number;
  nNegative: number;
  /** Exact one-sided P(R ≤ runs) under random ordering: small = too few runs (systematic pattern). */
  pTooFew: number;
}

function logChoose(n: number, k: number): number {
  if (k < 0 || k > n) return Number.NEGATIVE_INFINITY;
  return logGamma(n + 1) - logGamma(k + 1) - logGamma(n - k + 1);
}

/** Exact probability of exactly r runs with n1 positives and n2 negatives (both ≥ 1). */
function runsPmf(r: number, n1: number, n2: number): number {
  const lTotal = logChoose(n1 + n2, n1);
  if (r % 2 === 0) {
    const k = r / 2;
    return 2 * Math.exp(logChoose(n1 - 1, k - 1) + logChoose(n2 - 1, k - 1) - lTotal);
  }
  const k = (r - 1) / 2;
  return (
    Math.exp(logChoose(n1 - 1, k) + logChoose(n2 - 1, k - 1) - lTotal) +
    Math.exp(logChoose(n1 - 1, k - 1) + logChoose(n2 - 1, k) - lTotal)
  );
}

/**
 * Wald–Wolfowitz runs test on the signs of residuals ordered by salinity: too few
 * runs means the residuals are systematically grouped (curvature that the fitted
 * line misses). Zero residuals are dropped. Uses the exact distribution of the
 * number of runs, R, under random ordering.
 *
 * P(R = 2k) = 2·C(n1−1, k−1)·C(n2−1, k−1)/C(n, n1);
 * P(R = 2k+1) = [C(n1−1, k)·C(n2−1, k−1) + C(n1−1, k−1)·C(n2−1, k)]/C(n, n1).
 *
 * @param residuals residuals in salinity order (any unit)
 * @returns runs, counts and the one-sided p-value; pTooFew = 1 when only one sign occurs
 * @see Wald, A. & Wolfowitz, J. (1940) On a test whether two samples are from the same population. Ann. Math. Stat. 11, 147–162.
 */
export function runsTest(residuals: ArrayLike<number>): RunsTestResult {
  let runs = 0;
  let n1 = 0;
  let n2 = 0;
  let last = 0;
  for (let i = 0; i < residuals.length; i++) {
    const v = residuals[i]!;
    if (Number.isNaN(v)) throw new RangeError(`runsTest: residual ${i} is NaN`);
    const s = v > 0 ? 1 : v < 0 ? -1 : 0;
    if (s === 0) continue;
    if (s > 0) n1++;
    else n2++;
    if (s !== last) runs++;
    last = s;
  }
  if (n1 === 0 || n2 === 0) return { runs, nPositive: n1, nNegative: n2, pTooFew: 1 };
  if (Math.min(n1, n2) > LARGE_SAMPLE)
    return { runs, nPositive: n1, nNegative: n2, pTooFew: runsNormalP(runs, n1, n2) };
  let p = 0;
  for (let r = 2; r <= runs; r++) p += runsPmf(r, n1, n2);
  return { runs, nPositive: n1, nNegative: n2, pTooFew: Math.min(1, Math.max(0, p)) };
}

/** Above this many residuals of each sign the exact sum (O(runs) log-gamma calls) gives way to the normal limit. */
const LARGE_SAMPLE = 200;

/**
 * Normal approximation of P(R ≤ runs) with a continuity correction:
 * E[R] = 2·n1·n2/n + 1, Var[R] = 2·n1·n2·(2·n1·n2 − n)/(n²·(n − 1)), n = n1 + n2.
 * @see Wald, A. & Wolfowitz, J. (1940) Ann. Math. Stat. 11, 147–162 (asymptotic normality of R).
 */
function runsNormalP(runs: number, n1: number, n2: number): number {
  const n = n1 + n2;
  const mean = (2 * n1 * n2) / n + 1;
  const variance = (2 * n1 * n2 * (2 * n1 * n2 - n)) / (n * n * (n - 1));
  const z = (runs + 0.5 - mean) / Math.sqrt(variance);
  return Math.min(1, Math.max(0, normalCdf(z)));
}

const CRIT_CACHE = new Map<number, Map<number, number>>();

/**
 * Critical number of runs: the largest r with P(R ≤ r) ≤ α under random ordering
 * (exact distribution as in {@link runsTest}); a sequence with runs ≤ r is "too few runs".
 * Cached per (n1, n2, α) for use in loops.
 *
 * @param n1 positives (≥ 1); n2 negatives (≥ 1); alpha significance level
 * @returns the critical r (0 when even 2 runs are not significant)
 * @see Wald & Wolfowitz (1940) Ann. Math. Stat. 11, 147–162.
 */
export function runsCritical(n1: number, n2: number, alpha: number): number {
  let byAlpha = CRIT_CACHE.get(alpha);
  if (!byAlpha) CRIT_CACHE.set(alpha, (byAlpha = new Map<number, number>()));
  const key = n1 * 1_000_003 + n2;
  const hit = byAlpha.get(key);
  if (hit !== undefined) return hit;
  let cum = 0;
  let crit = 0;
  for (let r = 2; r <= n1 + n2; r++) {
    cum += runsPmf(r, n1, n2);
    if (cum <= alpha) crit = r;
    else break;
  }
  byAlpha.set(key, crit);
  return crit;
}
