/**
 * Size of the fuzz suite. `npm test` runs it at FUZZ_SCALE=1 (well under a minute on CI);
 * `FUZZ_SCALE=10 npx vitest run tests/fuzz` runs ten times as many cases and larger inputs.
 */
export const FUZZ_SCALE = Math.max(0.01, Number(process.env.FUZZ_SCALE ?? "1") || 1);

/** `n` scaled by FUZZ_SCALE, at least 1. */
export function cases(n: number): number {
  return Math.max(1, Math.round(n * FUZZ_SCALE));
}

/** True for a larger run (FUZZ_SCALE ≥ 5): the 130,000-element and 1e5-column inputs run then. */
export const LARGE = FUZZ_SCALE >= 5;
