/**
 * Smallest finite-or-not number of an array, by a loop: `Math.min(...xs)` passes every element as
 * a call argument and overflows the call stack above roughly 125,000 elements.
 *
 * @param xs the numbers (any length)
 * @returns the minimum, or Infinity for an empty array (as `Math.min()` gives); NaN if any is NaN
 * @see common practice (JavaScript engines cap the number of call arguments)
 */
export function minOf(xs: ArrayLike<number>): number {
  let m = Infinity;
  for (let i = 0; i < xs.length; i++) {
    const v = xs[i] as number;
    if (Number.isNaN(v)) return NaN;
    if (v < m) m = v;
  }
  return m;
}

/**
 * Largest number of an array by a loop (see {@link minOf} for why not `Math.max(...xs)`).
 *
 * @param xs the numbers (any length)
 * @returns the maximum, or -Infinity for an empty array; NaN if any is NaN
 */
export function maxOf(xs: ArrayLike<number>): number {
  let m = -Infinity;
  for (let i = 0; i < xs.length; i++) {
    const v = xs[i] as number;
    if (Number.isNaN(v)) return NaN;
    if (v > m) m = v;
  }
  return m;
}

/**
 * Appends every item of `items` to `target` by a loop (`target.push(...items)` overflows the call
 * stack for large arrays, e.g. hundreds of thousands of import issues).
 *
 * @param target the array to extend (mutated)
 * @param items the items to add, in order
 * @returns target
 */
export function appendAll<T>(target: T[], items: Iterable<T>): T[] {
  for (const x of items) target.push(x);
  return target;
}
