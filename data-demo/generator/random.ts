import { randomLcg, randomNormal, randomUniform } from "d3-random";

/** A seeded source of the two distributions the generator needs. */
export interface SeededRandom {
  /** Standard normal deviate N(0, 1). */
  normal: () => number;
  /** Uniform deviate in [0, 1). */
  uniform: () => number;
}

/**
 * Creates the generator's only source of randomness: d3-random's linear congruential
 * generator `randomLcg(seed)` feeding `randomNormal.source` and `randomUniform.source`.
 * The same seed always gives the same sequence, so outputs are byte-identical.
 *
 * @param seed integer seed
 * @throws RangeError when seed is not a finite integer
 */
export function seededRandom(seed: number): SeededRandom {
  if (!Number.isInteger(seed)) throw new RangeError(`seededRandom(): seed must be an integer, got ${String(seed)}`);
  const lcg = randomLcg(seed);
  return {
    normal: randomNormal.source(lcg)(0, 1),
    uniform: randomUniform.source(lcg)(0, 1),
  };
}
