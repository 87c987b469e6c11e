/** Multiplier, increment and output scale of the 32-bit linear congruential generator (Press et al. 1992). */
const LCG_MUL = 0x19660d;
const LCG_INC = 0x3c6ef35f;
const LCG_EPS = 1 / 0x100000000;

/**
 * Seeded normal deviates N(mu, sigma²) by the polar method (Marsaglia & Bray 1964) on a 32-bit linear
 * congruential generator uᵢ₊₁ = (1664525·uᵢ + 1013904223) mod 2³², U = u/2³²: exactly the stream of
 * d3-random's `randomNormal.source(randomLcg(seed))(mu, sigma)` (same seed rule, same operations in the
 * same order; tests/stats/seededNormal.test.ts compares them), with the polar factor √(−2·ln r / r)
 * computed once per pair. The generator is an object of one fixed shape with its state in number
 * fields: the library's closures box their changing numbers on every draw (a bootstrap drawing millions
 * of deviates spent much of its time collecting that garbage), and a closure made anew for every
 * bootstrap would be new code to V8's optimising compiler each time, where a class method is compiled
 * once per thread.
 *
 * @see Marsaglia, G. & Bray, T.A. (1964) A convenient method for generating normal variables. SIAM Review 6,
 *   260–264; Press, W.H. et al. (1992) Numerical Recipes in C, 2nd ed., §7.1 (the "quick and dirty" LCG;
 *   from memory).
 */
export class NormalDeviates {
  // Every number field starts as NaN (a heap number): V8 then stores them unboxed as doubles from the
  // start, instead of as small integers first and changing the object's layout at the first fraction.
  /** LCG state (a signed 32-bit integer). */
  private state = Number.NaN;
  /** Uniform of the pending second deviate of a pair and the pair's polar factor. */
  private pendingU = Number.NaN;
  private pendingF = Number.NaN;
  /** True when the second deviate of the last pair has not been returned yet. */
  private pending = false;
  private readonly mu: number = Number.NaN;
  private readonly sigma: number = Number.NaN;

  /**
   * @param seed a seed in [0, 1) (scaled by 2³²) or any other number (|seed| truncated to 32 bits)
   * @param mu mean; sigma standard deviation
   */
  constructor(seed: number, mu = 0, sigma = 1) {
    this.state = (0 <= seed && seed < 1 ? seed / LCG_EPS : Math.abs(seed)) | 0;
    this.mu = mu;
    this.sigma = sigma;
  }

  /** The next uniform U in [0, 1). */
  private uniform(): number {
    const s = (LCG_MUL * this.state + LCG_INC) | 0;
    this.state = s;
    return LCG_EPS * (s >>> 0);
  }

  /** The next deviate. */
  next(): number {
    if (this.pending) {
      this.pending = false;
      return this.mu + this.sigma * this.pendingU * this.pendingF;
    }
    let x: number, y: number, r: number;
    do {
      x = this.uniform() * 2 - 1;
      y = this.uniform() * 2 - 1;
      r = x * x + y * y;
    } while (!r || r > 1);
    const f = Math.sqrt((-2 * Math.log(r)) / r);
    this.pendingU = x;
    this.pendingF = f;
    this.pending = true;
    return this.mu + this.sigma * y * f;
  }
}

/**
 * Seeded normal deviates N(mu, sigma²) as a function: the stream of {@link NormalDeviates} (the same
 * as d3-random's `randomNormal.source(randomLcg(seed))(mu, sigma)`).
 *
 * @param seed a seed in [0, 1) (scaled by 2³²) or any other number (|seed| truncated to 32 bits)
 * @param mu mean; sigma standard deviation
 * @returns a generator of the deviates
 * @see Marsaglia, G. & Bray, T.A. (1964) SIAM Review 6, 260–264 (the polar method).
 */
export function seededNormal(seed: number, mu = 0, sigma = 1): () => number {
  const g = new NormalDeviates(seed, mu, sigma);
  return () => g.next();
}
