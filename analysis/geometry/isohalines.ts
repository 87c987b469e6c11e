/**
 * Isohaline positions and salt intrusion length from a salinity profile S(x).
 */
import type { GeometryWarning } from "./types.ts";
import type { IsohalinePosition, SalinityProfile } from "./salinityTypes.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

/** Default isohalines reported (PSS-78): 1, 2, 5, 10, 20. */
export const DEFAULT_ISOHALINES = [1, 2, 5, 10, 20] as const;

function checkValue(fn: string, s: number): void {
  if (!Number.isFinite(s) || s < 0)
    throw new RangeError(`${fn}: isohaline salinity must be a finite number ≥ 0; got ${s}`);
}

/** Every chainage where the piecewise-linear profile equals s [km], increasing. */
export function crossingsKm(profile: SalinityProfile, s: number): number[] {
  const { km, salinity } = profile;
  const out: number[] = [];
  for (let i = 0; i < km.length; i++) {
    const a = salinity[i]!;
    if (a === s) {
      out.push(km[i]!);
      continue;
    }
    const b = salinity[i + 1];
    if (b !== undefined && b !== s && (a - s) * (b - s) < 0)
      out.push(km[i]! + ((s - a) / (b - a)) * (km[i + 1]! - km[i]!));
  }
  return out;
}

function rangeText(p: SalinityProfile): string {
  return `${minOf(p.salinity).toFixed(2)}–${maxOf(p.salinity).toFixed(2)}`;
}

/**
 * Isohaline positions: the km at which S(x) crosses each value, by linear
 * interpolation between profile knots: x* = x_i + (S* − S_i)(x_{i+1} − x_i)/(S_{i+1} − S_i).
 *
 * @param profile from fitSalinityProfile
 * @param salinities isohaline values (PSS-78), default [1, 2, 5, 10, 20]
 * @returns one position per value (all crossings, km from the mouth) and warnings for values
 *   outside the surveyed range or crossed more than once
 * @throws RangeError for a negative or non-finite value
 * @see common practice (isohaline distance x* from the mouth, interpolated between stations).
 */
export function isohalinePositions(
  profile: SalinityProfile,
  salinities: readonly number[] = DEFAULT_ISOHALINES,
): { positions: IsohalinePosition[]; warnings: GeometryWarning[] } {
  const warnings: GeometryWarning[] = [];
  const positions = salinities.map((s) => {
    checkValue("isohalinePositions", s);
    const km = crossingsKm(profile, s);
    if (km.length === 0)
      warnings.push({
        code: "isohalineNotReached",
        message: `Isohaline S = ${s} is outside the surveyed salinity range (${rangeText(profile)}); no position.`,
      });
    if (km.length > 1)
      warnings.push({
        code: "multipleCrossings",
        message: `Isohaline S = ${s} is crossed ${km.length} times, at ${km.map((k) => k.toFixed(2)).join(", ")} km; S(x) is not monotonic there.`,
      });
    return { salinity: s, km };
  });
  return { positions, warnings };
}

/** Result of {@link saltIntrusionLengthKm}. */
export interface SaltIntrusion {
  /** Isohaline used (PSS-78). */
  salinity: number;
  /** Distance of the isohaline from the mouth [km]: the most landward crossing; undefined when not crossed. */
  km: number | undefined;
  /** All crossings [km], increasing. */
  crossingsKm: number[];
  warnings: GeometryWarning[];
}

/**
 * Salt intrusion length: distance from the mouth of the chosen isohaline (default
 * S = 2), taken as its most landward crossing of S(x).
 *
 * @param profile from fitSalinityProfile
 * @param isohaline salinity (PSS-78), default 2
 * @returns length [km] with all crossings; km undefined (with a warning saying why) when the
 *   isohaline lies outside the surveyed reach
 * @throws RangeError for a negative or non-finite isohaline
 * @see derived: steady 1-D advection–dispersion with constant K gives x* = (K/U)·ln(S₀/S*), the isohaline's distance from the mouth.
 */
export function saltIntrusionLengthKm(profile: SalinityProfile, isohaline = 2): SaltIntrusion {
  checkValue("saltIntrusionLengthKm", isohaline);
  const crossings = crossingsKm(profile, isohaline);
  const warnings: GeometryWarning[] = [];
  const last = profile.salinity[profile.salinity.length - 1]!;
  if (crossings.length === 0) {
    const why =
      last > isohaline
        ? `salinity is still ${last.toFixed(2)} at the landward-most point (${profile.km[profile.km.length - 1]!.toFixed(2)} km): salt reaches beyond the surveyed reach`
        : `salinity is below ${isohaline} everywhere surveyed (${rangeText(profile)}): the isohaline lies seaward of the first station`;
    warnings.push({
      code: "isohalineNotReached",
      message: `Salt intrusion length (S = ${isohaline}) is undefined: ${why}.`,
    });
  }
  if (crossings.length > 1)
    warnings.push({
      code: "multipleCrossings",
      message: `S = ${isohaline} is crossed ${crossings.length} times (${crossings.map((k) => k.toFixed(2)).join(", ")} km); the intrusion length is the most landward crossing.`,
    });
  return { salinity: isohaline, km: crossings[crossings.length - 1], crossingsKm: crossings, warnings };
}
