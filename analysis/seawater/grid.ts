/**
 * n evenly spaced values from start to end inclusive (for pH or salinity axes).
 * @param start first value
 * @param end last value
 * @param n number of values (≥ 2)
 * @returns the grid
 * @throws {RangeError} when n is not an integer ≥ 2 or start/end are not finite
 * @see common practice (evenly spaced plot axis).
 */
export function linearGrid(start: number, end: number, n: number): number[] {
  if (!Number.isFinite(start) || !Number.isFinite(end))
    throw new RangeError(`linearGrid: start and end must be finite, got ${start}, ${end}`);
  if (!Number.isInteger(n) || n < 2) throw new RangeError(`linearGrid: n must be an integer ≥ 2, got ${n}`);
  return Array.from({ length: n }, (_, i) => (i === n - 1 ? end : start + ((end - start) * i) / (n - 1)));
}

/**
 * Checks an axis array: non-empty, all finite, within [min, max].
 * @throws {TypeError} when not an array; {RangeError} naming the function, argument and first bad value
 * @see common practice (argument checking).
 */
export function checkGrid(fn: string, name: string, grid: readonly number[], min: number, max: number): void {
  if (!Array.isArray(grid)) throw new TypeError(`${fn}: ${name} must be an array of numbers, got ${typeof grid}`);
  if (grid.length === 0) throw new RangeError(`${fn}: ${name} is empty`);
  grid.forEach((v, i) => {
    if (typeof v !== "number" || !Number.isFinite(v) || v < min || v > max) {
      throw new RangeError(`${fn}: ${name}[${i}] must be a number within ${min}…${max}, got ${String(v)}`);
    }
  });
}
