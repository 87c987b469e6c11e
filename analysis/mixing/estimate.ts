import type { Estimate } from "./result.ts";

/**
 * Builds an {@link Estimate}: the full-data point value with its 95 % bootstrap percentile
 * interval, widened when needed so that lower ≤ value ≤ upper always holds (a point estimate
 * outside its own interval is never reported); the interval collapses to the value when it is
 * unknown (no draws requested or too few usable) or not finite.
 *
 * @param value point estimate
 * @param interval [lower, upper] or undefined
 * @param unit unit of the value
 * @returns the estimate
 */
export function estimateOf(value: number, interval: [number, number] | undefined, unit: string): Estimate {
  const ok = interval && Number.isFinite(interval[0]) && Number.isFinite(interval[1]);
  return {
    value,
    lower: ok ? Math.min(interval[0], value) : value,
    upper: ok ? Math.max(interval[1], value) : value,
    unit,
  };
}

/** {@link estimateOf} for a value that may not be finite: undefined instead of NaN/±Infinity. */
export function finiteEstimate(
  value: number,
  interval: [number, number] | undefined,
  unit: string,
): Estimate | undefined {
  return Number.isFinite(value) ? estimateOf(value, interval, unit) : undefined;
}
