/**
 * Decreasing isotonic regression by the pool-adjacent-violators algorithm (PAVA).
 *
 * @see Barlow, R.E., Bartholomew, D.J., Bremner, J.M. & Brunk, H.D. (1972) Statistical
 *   Inference under Order Restrictions, Wiley, ch. 1 (PAVA; from memory).
 */

/** A pooled block: mean of x and y over consecutive observations, and their count. */
export interface IsotonicBlock {
  xMean: number;
  yMean: number;
  weight: number;
  /** Index range [first, last] of the pooled observations (in the sorted input). */
  first: number;
  last: number;
}

/**
 * Fit a non-increasing step function y ≈ f(x) minimising Σ w(y − f)² over data
 * already sorted by x. Blocks are pooled until strictly decreasing.
 *
 * @param x sorted abscissae (ties allowed)
 * @param y observations
 * @returns pooled blocks, strictly decreasing in yMean
 */
export function isotonicDecreasing(x: readonly number[], y: readonly number[]): IsotonicBlock[] {
  const blocks: IsotonicBlock[] = [];
  for (let i = 0; i < x.length; i++) {
    let b: IsotonicBlock = { xMean: x[i]!, yMean: y[i]!, weight: 1, first: i, last: i };
    for (;;) {
      const prev = blocks[blocks.length - 1];
      // pool ties in x too, so one km never carries two fitted values
      if (!prev || (prev.yMean > b.yMean && x[prev.last] !== x[b.first])) break;
      blocks.pop();
      const w = prev.weight + b.weight;
      b = {
        xMean: (prev.xMean * prev.weight + b.xMean * b.weight) / w,
        yMean: (prev.yMean * prev.weight + b.yMean * b.weight) / w,
        weight: w,
        first: prev.first,
        last: b.last,
      };
    }
    blocks.push(b);
  }
  return blocks;
}
