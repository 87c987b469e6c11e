/**
 * Convert a salinity interval into stretches of channel (e.g. a reaction zone found in
 * salinity space becomes a reach to draw on the map).
 */
import type { GeometryWarning } from "./types.ts";
import type { SalinityProfile } from "./salinityTypes.ts";
import { minOf, maxOf } from "../survey/arrayExtent.ts";

/** Result of {@link salinityIntervalToKm}. */
export interface KmIntervals {
  /** Stretches [kmFrom, kmTo] (km from the mouth, kmFrom ≤ kmTo), increasing, where S1 ≤ S(x) ≤ S2. */
  intervalsKm: [number, number][];
  warnings: GeometryWarning[];
}

/**
 * The chainage intervals where S1 ≤ S(x) ≤ S2 on the piecewise-linear profile.
 *
 * @param profile from fitSalinityProfile
 * @param salinityRange [S1, S2] (PSS-78), any order
 * @returns stretches [km] within the surveyed reach; warnings when the interval extends beyond the
 *   surveyed salinities (the stretch is then cut at the survey's end) or maps to several stretches
 * @throws RangeError for non-finite bounds
 */
export function salinityIntervalToKm(profile: SalinityProfile, salinityRange: [number, number]): KmIntervals {
  const [a, b] = salinityRange;
  if (!Number.isFinite(a) || !Number.isFinite(b))
    throw new RangeError(`salinityIntervalToKm: salinityRange must be two finite numbers; got [${a}, ${b}]`);
  const [lo, hi] = a <= b ? [a, b] : [b, a];
  const { km, salinity } = profile;
  const out: [number, number][] = [];
  const add = (x0: number, x1: number): void => {
    const last = out[out.length - 1];
    if (last && x0 <= last[1] + 1e-12) last[1] = Math.max(last[1], x1);
    else out.push([x0, x1]);
  };
  for (let i = 0; i + 1 < km.length; i++) {
    const [s0, s1, x0, x1] = [salinity[i]!, salinity[i + 1]!, km[i]!, km[i + 1]!];
    if (s0 === s1) {
      if (s0 >= lo && s0 <= hi) add(x0, x1);
      continue;
    }
    // parameter u in [0, 1] where S = s0 + u(s1 − s0) lies in [lo, hi]
    const u0 = (lo - s0) / (s1 - s0);
    const u1 = (hi - s0) / (s1 - s0);
    const from = Math.max(0, Math.min(u0, u1));
    const to = Math.min(1, Math.max(u0, u1));
    if (from <= to) add(x0 + from * (x1 - x0), x0 + to * (x1 - x0));
  }
  if (km.length === 1 && salinity[0]! >= lo && salinity[0]! <= hi) out.push([km[0]!, km[0]!]);
  const warnings: GeometryWarning[] = [];
  const [sMin, sMax] = [minOf(salinity), maxOf(salinity)];
  if (lo < sMin || hi > sMax) {
    warnings.push({
      code: "intervalBeyondSurvey",
      message: `Salinity interval [${lo}, ${hi}] extends beyond the surveyed range (${sMin.toFixed(2)}–${sMax.toFixed(2)}); the channel stretch is cut where the survey ends.`,
    });
  }
  if (out.length > 1)
    warnings.push({
      code: "multipleStretches",
      message: `Salinity interval [${lo}, ${hi}] maps to ${out.length} separate stretches of channel (${out.map(([x, y]) => `${x.toFixed(2)}–${y.toFixed(2)} km`).join(", ")}); S(x) is not monotonic.`,
    });
  return { intervalsKm: out, warnings };
}
