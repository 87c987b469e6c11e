import type { Estimate } from "./result.ts";

/**
 * Builds an {@link Estimate}: the full-data point value with its 95 % bootstrap
 * percentile interval; the interval collapses to the value when it is unknown
 * (no draws requested or too few usable).
 *
 * @param value point estimate
 * @param interval [lower, upper] or undefined
 * @param unit unit of the value
 * @returns the estimate
 */
export function estimateOf(value: number, interval: [number, number] | undefined, unit: string): Estimate {
  return { value, lower: interval ? interval[0] : value, upper: interval ? interval[1] : value, unit };
}
