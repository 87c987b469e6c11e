/**
 * Per-bin running statistics in typed arrays (count, mean, sum of squared deviations, minimum,
 * maximum), updated one value at a time with Welford's algorithm.
 */

/** Summary of one variable in one bin. */
export interface BinStats {
  /** Values in the bin. */
  n: number;
  mean: number;
  /** Sample standard deviation (n − 1 in the denominator); undefined when n < 2. */
  sd: number | undefined;
  min: number;
  max: number;
}

/** Running statistics for `size` bins. */
export class RunningStats {
  readonly n: Float64Array;
  readonly mean: Float64Array;
  readonly m2: Float64Array;
  readonly min: Float64Array;
  readonly max: Float64Array;

  constructor(size: number) {
    this.n = new Float64Array(size);
    this.mean = new Float64Array(size);
    this.m2 = new Float64Array(size);
    this.min = new Float64Array(size).fill(Number.POSITIVE_INFINITY);
    this.max = new Float64Array(size).fill(Number.NEGATIVE_INFINITY);
  }

  /**
   * Adds value x to bin b (Welford 1962: δ = x − mean; mean += δ/n; M2 += δ·(x − mean)).
   * @see Welford, B. P. (1962) Technometrics 4(3), 419–420.
   */
  add(b: number, x: number): void {
    const n = ++this.n[b]!;
    const d = x - this.mean[b]!;
    this.mean[b]! += d / n;
    this.m2[b]! += d * (x - this.mean[b]!);
    if (x < this.min[b]!) this.min[b] = x;
    if (x > this.max[b]!) this.max[b] = x;
  }

  /** The statistics of bin b, or undefined when it holds no value. */
  get(b: number): BinStats | undefined {
    const n = this.n[b]!;
    if (n === 0) return undefined;
    return {
      n,
      mean: this.mean[b]!,
      sd: n >= 2 ? Math.sqrt(this.m2[b]! / (n - 1)) : undefined,
      min: this.min[b]!,
      max: this.max[b]!,
    };
  }
}
