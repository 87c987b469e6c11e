import { maxOf } from "../survey/arrayExtent.ts";
import { spearmanRho } from "../geometry/suggestMouth.ts";
import type { Station, Survey } from "../survey/survey.ts";
import { acceptedValue } from "./mixingSamples.ts";
import type { MixingWarning } from "./surveyAnalysis.ts";

type WithDistance = Station & { distanceKm?: number };

/**
 * Places stations by the along-channel distances of a station table (or the file) when no
 * centerline is given. The distances may count from either end; the end towards which salinity
 * rises (Spearman rank correlation over all surveys, Spearman 1904) is taken as the mouth, and
 * every distance becomes "km from the mouth": d when salinity falls with d, else max(d) − d.
 *
 * @param surveys the surveys (stations may carry `distanceKm`)
 * @returns new surveys with distances from the mouth, and a notice saying how they were oriented;
 *   the surveys unchanged and no notice when fewer than 3 stations have both a distance and a salinity
 */
export function distancesFromMouth(surveys: readonly Survey[]): { surveys: Survey[]; notice?: MixingWarning } {
  const pairs: Array<[number, number]> = [];
  for (const s of surveys)
    for (const st of s.stations as WithDistance[]) {
      const sal = acceptedValue(st.salinity);
      if (st.distanceKm !== undefined && sal !== undefined) pairs.push([st.distanceKm, sal]);
    }
  if (pairs.length < 3) return { surveys: [...surveys] };
  const rho = spearmanRho(
    pairs.map((p) => p[0]),
    pairs.map((p) => p[1]),
  );
  if (!Number.isFinite(rho)) return { surveys: [...surveys] };
  const all = surveys.flatMap((s) =>
    (s.stations as WithDistance[]).flatMap((st) => (st.distanceKm !== undefined ? [st.distanceKm] : [])),
  );
  const maxKm = maxOf(all);
  const flip = rho > 0;
  const out = surveys.map((s) => ({
    ...s,
    stations: (s.stations as WithDistance[]).map((st) =>
      st.distanceKm === undefined || !flip ? st : { ...st, distanceKm: maxKm - st.distanceKm },
    ),
  }));
  const notice: MixingWarning = {
    code: "distanceOrigin",
    message: flip
      ? `No centerline: stations are placed by their along-channel distances. Salinity rises with distance (Spearman ρ = ${rho.toFixed(2)}, n = ${pairs.length}), so the largest distance (${maxKm} km) is taken as the mouth and distances are counted from it (km from the mouth = ${maxKm} − distance). Give a centerline (--centerline) or --mouth to change this.`
      : `No centerline: stations are placed by their along-channel distances, counted from the mouth (salinity falls with distance: Spearman ρ = ${rho.toFixed(2)}, n = ${pairs.length}). Give a centerline (--centerline) to change this.`,
  };
  return { surveys: out, notice };
}
