import type { Estimate } from "../mixing/result.ts";
import type { EstimateDifference } from "./types.ts";

/** Statement of the interval approximation, shown with every comparison. */
export const DIFFERENCE_INTERVAL_METHOD =
  "Differences between surveys: later − reference, with an approximate 95 % interval that combines the two " +
  "surveys' bootstrap 95 % intervals in quadrature (half-widths added as root-sum-of-squares, each side separately), " +
  "treating the surveys as independent. This approximates, and does not replace, a bootstrap of the difference.";

function checkEstimate(fn: string, arg: string, e: Estimate): Estimate {
  for (const k of ["value", "lower", "upper"] as const)
    if (!Number.isFinite(e[k])) throw new RangeError(`${fn}: ${arg}.${k} must be finite, got ${e[k]}`);
  if (e.lower > e.upper) throw new RangeError(`${fn}: ${arg} interval [${e.lower}, ${e.upper}] is reversed`);
  // A percentile interval can miss its point estimate (skewed or boundary-bound bootstrap); widen it to include the value.
  return { ...e, lower: Math.min(e.lower, e.value), upper: Math.max(e.upper, e.value) };
}

/**
 * Difference later − reference of two independent estimates, with an approximate 95 % interval.
 *
 * Formula: d = b − a; with half-widths a⁻ = a − a_lower, a⁺ = a_upper − a (and likewise b),
 * lower = d − sqrt(b⁻² + a⁺²), upper = d + sqrt(b⁺² + a⁻²). For symmetric normal intervals
 * this is exactly the 95 % interval of the difference of independent normals
 * (Var(b − a) = Var(a) + Var(b)); for skewed bootstrap intervals it is an approximation.
 *
 * @param reference estimate of the reference survey (value, 95 % lower/upper, unit)
 * @param later estimate of the later survey, same unit
 * @param unit unit of the difference (default the estimates' unit; e.g. "percentage points")
 * @returns the difference, its interval, whether the interval excludes 0, and a plain statement
 * An interval that does not contain its point estimate is first widened to include it (noted in `note`).
 *
 * @throws RangeError when the units differ or a number is not finite
 * @see Taylor, J.R. (1997) An Introduction to Error Analysis, 2nd ed., §3.5 (sums and differences in quadrature).
 */
export function differenceOfEstimates(reference: Estimate, later: Estimate, unit?: string): EstimateDifference {
  const fn = "differenceOfEstimates";
  const widened = [reference, later].filter((e) => e.lower > e.value || e.upper < e.value).length;
  reference = checkEstimate(fn, "reference", reference);
  later = checkEstimate(fn, "later", later);
  if (reference.unit !== later.unit)
    throw new RangeError(`${fn}: units differ ("${reference.unit}" vs "${later.unit}")`);
  const value = later.value - reference.value;
  const lower = value - Math.hypot(later.value - later.lower, reference.upper - reference.value);
  const upper = value + Math.hypot(later.upper - later.value, reference.value - reference.lower);
  const exceeds = lower > 0 || upper < 0;
  return {
    value,
    lower,
    upper,
    unit: unit ?? later.unit,
    reference: reference.value,
    later: later.value,
    exceedsUncertainty: exceeds,
    method: "quadrature-of-half-widths",
    statement: exceeds
      ? "larger than the uncertainty"
      : "within the uncertainty (cannot be distinguished from no change)",
    ...(widened ? { note: "an input 95 % interval did not contain its estimate and was widened to include it" } : {}),
  };
}

/**
 * Difference later − reference of two values that carry no interval (e.g. channel positions
 * interpolated from stations). Never claimed to exceed the uncertainty.
 *
 * @param reference reference value in `unit`
 * @param later later value in `unit`
 * @param unit unit of both values
 * @returns the difference with lower = upper = value and method "no-interval"
 * @throws RangeError when a value is not finite
 */
export function differenceWithoutInterval(reference: number, later: number, unit: string): EstimateDifference {
  if (!Number.isFinite(reference) || !Number.isFinite(later))
    throw new RangeError(`differenceWithoutInterval: values must be finite, got ${reference}, ${later}`);
  const value = later - reference;
  return {
    value,
    lower: value,
    upper: value,
    unit,
    reference,
    later,
    exceedsUncertainty: false,
    method: "no-interval",
    statement: "no interval available: size of the uncertainty unknown",
  };
}
