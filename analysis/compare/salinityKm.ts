import { crossingsKm } from "../geometry/isohalines.ts";
import { fitSalinityProfile } from "../geometry/salinityProfile.ts";
import type { SalinityProfile } from "../geometry/salinityTypes.ts";
import type { Estimate } from "../mixing/result.ts";
import type { ComparableSurvey } from "./types.ts";

/**
 * The survey's along-channel salinity profile S(x): the pipeline's own when present, else fitted
 * (geometry `fitSalinityProfile`) to the placed, on-channel stations.
 *
 * @param a analysed survey (stations with alongChannelKm [km] and salinity [PSS-78])
 * @returns the profile, or undefined with fewer than 2 placed salinities
 */
export function surveyProfile(a: ComparableSurvey): SalinityProfile | undefined {
  if (a.salinityProfile) return a.salinityProfile;
  const pts = a.stations.flatMap((s) =>
    !s.offChannel &&
    s.alongChannelKm !== undefined &&
    Number.isFinite(s.alongChannelKm) &&
    s.salinity !== undefined &&
    Number.isFinite(s.salinity)
      ? [{ km: s.alongChannelKm, salinity: s.salinity, id: s.id }]
      : [],
  );
  return pts.length >= 2 ? fitSalinityProfile(pts) : undefined;
}

/**
 * Landward-most channel position [km from the mouth] where S(x) crosses a salinity
 * (linear interpolation between profile knots, geometry `crossingsKm`).
 *
 * @param profile S(x), or undefined
 * @param salinity practical salinity
 * @returns km from the mouth, or undefined when S(x) never takes that value
 */
export function kmAtSalinity(profile: SalinityProfile | undefined, salinity: number): number | undefined {
  if (!profile || !Number.isFinite(salinity) || salinity < 0) return undefined;
  const c = crossingsKm(profile, salinity);
  return c.length ? c[c.length - 1] : undefined;
}

/**
 * Channel position of a salinity estimate: the value and both interval limits mapped through
 * S(x) (higher salinity lies nearer the mouth, so the salinity upper limit gives the km lower
 * limit). Limits that S(x) cannot place collapse onto the value, so the interval shows only the
 * salinity uncertainty the profile can place (an approximation: S(x) itself is taken as exact).
 *
 * @param profile S(x), or undefined
 * @param s salinity estimate (value and 95 % interval)
 * @param kmValue optional point value [km] to use instead of the mapped value (the pipeline's own position)
 * @returns km estimate (unit "km"), or undefined when the value cannot be placed
 */
export function kmEstimateOfSalinity(
  profile: SalinityProfile | undefined,
  s: Estimate,
  kmValue?: number,
): Estimate | undefined {
  const v = kmValue ?? kmAtSalinity(profile, s.value);
  if (v === undefined || !Number.isFinite(v)) return undefined;
  const a = kmAtSalinity(profile, s.lower) ?? v;
  const b = kmAtSalinity(profile, s.upper) ?? v;
  return { value: v, lower: Math.min(a, b, v), upper: Math.max(a, b, v), unit: "km" };
}
