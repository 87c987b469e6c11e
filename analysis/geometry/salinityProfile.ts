/**
 * Salinity along the channel for one survey: a monotone-where-possible S(x).
 */
import type { GeometryWarning } from "./types.ts";
import type { SalinityPoint, SalinityProfile } from "./salinityTypes.ts";
import { isotonicDecreasing } from "./isotonic.ts";

/** Options of {@link fitSalinityProfile}. */
export interface SalinityProfileOptions {
  /**
   * Largest |observed − isotonic fit| still accepted as "nearly monotone" (salinity units);
   * default 1.0 (common practice: about the scatter between casts at one station).
   */
  isotonicToleranceS?: number;
  /** Use only points of this branch; default: all points. */
  branchId?: string;
}

const FN = "fitSalinityProfile";

/**
 * Fit S(x), salinity against chainage, for one survey.
 *
 * Salinity is expected to fall landward (x from the mouth). When a decreasing isotonic
 * (PAVA) fit departs from every observation by at most isotonicToleranceS, the profile
 * is that fit, with one knot per pooled block at the block's mean km and mean S, joined
 * linearly. Otherwise the profile joins the observations sorted by km (ties averaged)
 * and a "nonMonotonic" warning is raised: isohalines may then cross more than once.
 *
 * @param points salinity observations placed along the channel (km [km], salinity PSS-78)
 * @param options tolerance (salinity units), branch filter
 * @returns the profile, or undefined when fewer than 2 distinct chainages carry valid salinity
 * @throws RangeError for a negative or non-finite tolerance
 * @see Barlow, R.E. et al. (1972) Statistical Inference under Order Restrictions, Wiley, ch. 1 (PAVA; from memory).
 */
export function fitSalinityProfile(
  points: readonly SalinityPoint[],
  options: SalinityProfileOptions = {},
): SalinityProfile | undefined {
  const tol = options.isotonicToleranceS ?? 1.0;
  if (!(tol >= 0) || !Number.isFinite(tol))
    throw new RangeError(`${FN}: options.isotonicToleranceS must be a finite number ≥ 0; got ${tol}`);
  const warnings: GeometryWarning[] = [];
  const used: SalinityPoint[] = [];
  points.forEach((p, i) => {
    if (options.branchId !== undefined && p.branchId !== options.branchId) return;
    if (Number.isFinite(p.km) && Number.isFinite(p.salinity)) used.push(p);
    else
      warnings.push({
        code: "invalidSalinityPoint",
        message: `Point ${p.id ?? i} has km ${p.km} and salinity ${p.salinity}; it is left out of S(x).`,
      });
  });
  used.sort((a, b) => a.km - b.km);
  const x = used.map((p) => p.km);
  const y = used.map((p) => p.salinity);
  if (new Set(x).size < 2) return undefined;

  const blocks = isotonicDecreasing(x, y);
  let maxResid = 0;
  let worst = 0;
  for (const b of blocks) {
    for (let i = b.first; i <= b.last; i++) {
      const r = Math.abs(y[i]! - b.yMean);
      if (r > maxResid) [maxResid, worst] = [r, i];
    }
  }
  let km: number[];
  let sal: number[];
  let method: SalinityProfile["method"];
  if (maxResid <= tol && blocks.length >= 2) {
    method = "isotonic";
    km = blocks.map((b) => b.xMean);
    sal = blocks.map((b) => b.yMean);
  } else {
    method = "piecewiseLinear";
    [km, sal] = [[], []];
    for (let i = 0; i < x.length;) {
      let j = i;
      while (j < x.length && x[j] === x[i]) j++;
      km.push(x[i]!);
      sal.push(y.slice(i, j).reduce((s, v) => s + v, 0) / (j - i));
      i = j;
    }
  }
  const monotone = sal.every((s, i) => i === 0 || s <= sal[i - 1]!);
  if (!monotone) {
    const who = used[worst]!;
    warnings.push({
      code: "nonMonotonic",
      message: `Salinity does not fall steadily landward: station ${who.id ?? `at ${who.km.toFixed(2)} km`} departs ${maxResid.toFixed(2)} from the best decreasing fit (tolerance ${tol}). S(x) joins the observations, and isohalines may cross more than once; every crossing is reported. Possible causes: a tributary, or a survey spanning a change of tide.`,
    });
  }
  if (sal[sal.length - 1]! > sal[0]!) {
    warnings.push({
      code: "salinityRisesLandward",
      message: `Salinity is higher at the landward end (${sal[sal.length - 1]!.toFixed(2)} at ${km[km.length - 1]!.toFixed(2)} km) than near the mouth (${sal[0]!.toFixed(2)} at ${km[0]!.toFixed(2)} km); is the mouth at the other end? See suggestMouth().`,
    });
  }
  return { km, salinity: sal, method, monotone, maxIsotonicResidual: maxResid, nPoints: used.length, warnings };
}
