// Monte Carlo error of a coverage estimated from a finite number of simulated surveys.

/** Standard normal quantile of a two-sided 95 % interval. */
const Z95 = 1.959963984540054;

/**
 * Monte Carlo standard error of a coverage p̂ estimated from nSim independent simulated surveys:
 * √(p̂(1 − p̂)/nSim) (binomial).
 *
 * @param p observed coverage (0–1)
 * @param nSim simulated surveys it was counted over
 * @returns the standard error (NaN when nSim is 0)
 * @see Morris, T.P., White, I.R. & Crowther, M.J. (2019) Using simulation studies to evaluate statistical
 *   methods. Statistics in Medicine 38, 2074–2102, Table 6 (MCSE of coverage; from memory).
 */
export function coverageMcse(p: number, nSim: number): number {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`coverageMcse: p must be in [0, 1], got ${p}`);
  if (!(nSim >= 0)) throw new RangeError(`coverageMcse: nSim must be ≥ 0, got ${nSim}`);
  return nSim > 0 ? Math.sqrt((p * (1 - p)) / nSim) : Number.NaN;
}

/**
 * Wilson score 95 % interval of a binomial proportion p̂ = k/n: (p̂ + z²/2n ± z·√(p̂(1 − p̂)/n + z²/4n²))/(1 + z²/n).
 * Unlike p̂ ± 1.96·MCSE it stays inside [0, 1] and does not collapse at p̂ = 1 (100 % coverage in 100 surveys
 * gives 96.3–100 %, not 100–100 %).
 *
 * @param p observed proportion (0–1)
 * @param n number of trials
 * @returns [lower, upper] (NaN, NaN when n is 0)
 * @see Wilson, E.B. (1927) Probable inference, the law of succession, and statistical inference. JASA 22,
 *   209–212; Agresti, A. & Coull, B.A. (1998) Approximate is better than "exact" for interval estimation of
 *   binomial proportions. The American Statistician 52, 119–126 (from memory).
 */
export function wilson95(p: number, n: number): [number, number] {
  if (!(p >= 0 && p <= 1)) throw new RangeError(`wilson95: p must be in [0, 1], got ${p}`);
  if (!(n >= 0)) throw new RangeError(`wilson95: n must be ≥ 0, got ${n}`);
  if (n === 0) return [Number.NaN, Number.NaN];
  const z2 = Z95 * Z95;
  const denom = 1 + z2 / n;
  const centre = (p + z2 / (2 * n)) / denom;
  const half = (Z95 / denom) * Math.sqrt((p * (1 - p)) / n + z2 / (4 * n * n));
  return [Math.max(0, centre - half), Math.min(1, centre + half)];
}

/**
 * Where a coverage stands against a goal band [lo, hi] given its Monte Carlo error: "in" (p̂ in the band),
 * "mc" (p̂ outside but its Wilson 95 % interval reaches the band: not a miss beyond Monte Carlo error),
 * "sig" (the whole Wilson interval is outside the band).
 */
export function bandVerdict(p: number, n: number, lo: number, hi: number): "in" | "mc" | "sig" {
  if (p >= lo && p <= hi) return "in";
  const [a, b] = wilson95(p, n);
  return b < lo || a > hi ? "sig" : "mc";
}
