import type { BehaviourClass, Estimate, MixingWarning } from "./result.ts";

/** Intervals wider than this multiple of |C₀| (in % change: ± this × 100 %) are called unbounded. */
export const UNBOUNDED_PERCENT = 1000;

const g = (v: number): string => (Math.abs(v) >= 100 ? v.toFixed(0) : v.toPrecision(2));

/**
 * Plain-language verdict that agrees with the numbers (documented rules): a % change whose
 * interval crosses or touches zero says "not determined in sign" (a limit of exactly 0 % comes from
 * bootstrap draws that kept the straight line, i.e. conservative mixing is not excluded); an interval wider than ±1000 % says
 * "not determined"; a negative C*₀ is flagged (warning "effective-negative") and leaves the % change
 * "not determined" in words (a removal beyond 100 % is not a net change anyone can use).
 *
 * @param cls behaviour class
 * @param percent % change estimate
 * @param effective C*₀ estimate
 * @param unit concentration unit
 * @param warnings list the flags are appended to
 * @returns the verdict
 */
export function verdictOf(
  cls: BehaviourClass,
  percent: Estimate | undefined,
  effective: Estimate | undefined,
  unit: string,
  warnings: MixingWarning[],
): string {
  if (effective && effective.value < 0)
    warnings.push({
      code: "effective-negative",
      message: `The effective river end-member C*₀ = ${g(effective.value)} ${unit} is negative, which is not physical: the seaward line is too steep or too short to extrapolate (reaction reaching the mouth, or too few seaward stations). Do not use the % change or fluxes.`,
    });
  if (!percent)
    return cls === "conservative" ? "conservative mixing; % change not determined" : `${cls}; % change not determined`;
  const span = `${g(percent.lower)} to ${g(percent.upper)} %`;
  if (percent.upper - percent.lower > 2 * UNBOUNDED_PERCENT) {
    warnings.push({
      code: "percent-not-determined",
      message: `The 95 % interval of the % change (${span}) is unbounded for practical purposes: the stations do not determine the net change.`,
    });
    return `${cls}; % change not determined (95 % interval ${span})`;
  }
  if (effective && effective.value < 0)
    return `${cls} in the curve's shape, but the net % change is not determined: the effective river end-member is negative (C*₀ = ${g(effective.value)} ${unit}), which is not physical`;
  if (cls === "conservative")
    return `conservative mixing within the uncertainty (% change ${g(percent.value)} %, 95 % interval ${span})`;
  if (percent.lower <= 0 && percent.upper >= 0)
    return `${cls} in the curve's shape, but the net % change is not determined in sign (${g(percent.value)} %, 95 % interval ${span})`;
  return `${cls}: net ${percent.value < 0 ? "removal" : "addition"} of ${g(Math.abs(percent.value))} % (95 % interval ${span})`;
}
