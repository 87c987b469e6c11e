/** Multiplier, increment and output scale of the 32-bit linear congruential generator (Press et al. 1992). */
const LCG_MUL = 0x19660d;
const LCG_INC = 0x3c6ef35f;
const LCG_EPS = 1 / 0x100000000;

/**
 * Seeded normal deviates N(mu, sigma²) by the polar method (Marsaglia & Bray 1964) on a 32-bit linear
 * congruential generator uᵢ₊₁ = (1664525·uᵢ + 1013904223) mod 2³², U = u/2³²: exactly the stream of
 * d3-random's `randomNormal.source(randomLcg(seed))(mu, sigma)` (same seed rule, same operations in the
 * same order; tests/stats/seededNormal.test.ts compares them), with the generator state in typed arrays
 * and the polar factor √(−2·ln r / r) computed once per pair. The library's closures box their changing
 * numbers on every draw, so a bootstrap drawing millions of deviates spent much of its time collecting
 * that garbage.
 *
 * @param seed a seed in [0, 1) (scaled by 2³²) or any other number (|seed| truncated to 32 bits)
 * @param mu mean; sigma standard deviation
 * @returns a generator of the deviates
 * @see Marsaglia, G. & Bray, T.A. (1964) A convenient method for generating normal variables. SIAM Review 6,
 *   260–264; Press, W.H. et al. (1992) Numerical Recipes in C, 2nd ed., §7.1 (the "quick and dirty" LCG;
 *   from memory).
 */
export function seededNormal(seed: number, mu = 0, sigma = 1): () => number {
  const state = new Int32Array(1);
  state[0] = (0 <= seed && seed < 1 ? seed / LCG_EPS : Math.abs(seed)) | 0;
  // [second deviate's uniform, polar factor of the pair, 1 when the second deviate is pending]
  const pending = new Float64Array(3);
  const uniform = (): number => {
    const s = (LCG_MUL * state[0]! + LCG_INC) | 0;
    state[0] = s;
    return LCG_EPS * (s >>> 0);
  };
  return (): number => {
    if (pending[2] === 1) {
      pending[2] = 0;
      return mu + sigma * pending[0]! * pending[1]!;
    }
    let x: number, y: number, r: number;
    do {
      x = uniform() * 2 - 1;
      y = uniform() * 2 - 1;
      r = x * x + y * y;
    } while (!r || r > 1);
    const f = Math.sqrt((-2 * Math.log(r)) / r);
    pending[0] = x;
    pending[1] = f;
    pending[2] = 1;
    return mu + sigma * y * f;
  };
}
