/** A pH where the dominant species of a stepwise hydrolysis system changes. */
export interface PredominanceBoundary {
  /** Index n of the species dominant below this pH. */
  below: number;
  /** Index n of the species dominant above this pH. */
  above: number;
  /** pH of equal concentrations, (log β_below − log β_above)/(above − below). */
  pH: number;
}

/**
 * Predominance sequence of the species M(OH)n for n = 0…N from log *β_n (log β_0 = 0): starting with
 * n = 0, the next dominant species j is the one with the lowest pH of equal concentration
 * pH_ij = (log β_i − log β_j)/(j − i). Species that never dominate (e.g. Fe(OH)3⁰ with the
 * Stefánsson 2007 constants) are skipped, so the boundary is the direct one.
 * @param logBeta log10 *β_0…*β_N (undefined = species absent)
 * @returns boundaries in ascending pH
 * @see Stumm, W., Morgan, J.J., 1996. Aquatic Chemistry, 3rd ed. (predominance diagrams; from memory).
 */
export function predominanceBoundaries(logBeta: readonly (number | undefined)[]): PredominanceBoundary[] {
  const out: PredominanceBoundary[] = [];
  let i = 0;
  for (;;) {
    let best: PredominanceBoundary | undefined;
    const bi = logBeta[i];
    if (bi === undefined) break;
    for (let j = i + 1; j < logBeta.length; j++) {
      const bj = logBeta[j];
      if (bj === undefined) continue;
      const pH = (bi - bj) / (j - i);
      if (!best || pH < best.pH - 1e-12 || (Math.abs(pH - best.pH) <= 1e-12 && j > best.above))
        best = { below: i, above: j, pH };
    }
    if (!best) break;
    out.push(best);
    i = best.above;
  }
  return out;
}

/**
 * Stepwise crossover pH values pH_n = log β_(n−1) − log β_n (where species n−1 and n are equal), n = 1…N.
 * @param logBeta log10 *β_0…*β_N
 * @returns crossover pH per step (undefined where a species is absent)
 * @see Stumm, W., Morgan, J.J., 1996. Aquatic Chemistry, 3rd ed. (from memory).
 */
export function stepwiseCrossovers(logBeta: readonly (number | undefined)[]): (number | undefined)[] {
  const out: (number | undefined)[] = [];
  for (let n = 1; n < logBeta.length; n++) {
    const a = logBeta[n - 1];
    const b = logBeta[n];
    out.push(a === undefined || b === undefined ? undefined : a - b);
  }
  return out;
}
