import { maxOf } from "../survey/arrayExtent.ts";
import type { Station, Survey } from "../survey/survey.ts";
import { distanceOrigin, PLATEAU_SALINITY, type DistanceOrigin } from "./distanceOrigin.ts";
import { acceptedValue } from "./mixingSamples.ts";
import type { MixingWarning } from "./surveyAnalysis.ts";

/** A station with the distance given in a file or station table, and where the orientation put it. */
type WithDistance = Station & { distanceKm?: number; sideArmKm?: number };

const CHANGE =
  "Change it with --mouth start|end on the command line (start: the smallest distance is the mouth; end: the largest) or the Mouth control in the dashboard, or give a centerline (--centerline).";

function fmt(km: number): string {
  return String(Math.round(km * 100) / 100);
}

/** The stated mouth (start/end) as a decision on the distance axis. */
function stated(mouth: "start" | "end", maxKm: number): DistanceOrigin {
  return mouth === "start" ? { kind: "asGiven", rho: NaN, n: 0 } : { kind: "reversed", rho: NaN, n: 0, maxKm };
}

function noticeOf(o: DistanceOrigin, armIds: string[], stated: boolean): string {
  const head = "No centerline: stations are placed by their along-channel distances";
  if (stated)
    return o.kind === "reversed"
      ? `${head}, counted from the largest distance (${fmt(o.maxKm)} km), as stated (--mouth end). ${CHANGE}`
      : `${head}, counted from the smallest distance, as stated (--mouth start). ${CHANGE}`;
  if (o.kind === "asGiven")
    return `${head}, counted from the mouth (salinity falls with distance: Spearman ρ = ${o.rho.toFixed(2)}, n = ${o.n}). ${CHANGE}`;
  if (o.kind === "reversed")
    return `${head}. Salinity rises with distance (Spearman ρ = ${o.rho.toFixed(2)}, n = ${o.n}), so the largest distance (${fmt(o.maxKm)} km) is taken as the mouth and distances are counted from it (km from the mouth = ${fmt(o.maxKm)} − distance). ${CHANGE}`;
  const side = o.riverSide === 1 ? "larger" : "smaller";
  return `${head}, but the file's distances do not count from the mouth: the median salinity over the surveys peaks inside the distance range (${o.maxSalinity.toFixed(2)} at ${fmt(o.maxKm)} km as given; ${o.armEndSalinity.toFixed(2)} at the far end of the other arm). The mouth is placed at ${fmt(o.mouthKm)} km as given (the riverward edge of the stations within ${PLATEAU_SALINITY} of ${o.topKm === o.maxKm ? "that maximum" : `${o.topSalinity.toFixed(2)} at ${fmt(o.topKm)} km, the saltiest station where the river's steep salinity gradient ends; the arm beyond it is saltier than the bay entrance, as after evaporation in a dry season`}) and km are counted landward from it along the arm that holds the freshest station (distances ${side} than ${fmt(o.mouthKm)} km). The ${armIds.length} station(s) on the other side of the mouth (${armIds.join(", ")}) are on a separate arm, not on the river's mixing path: they are off the channel, left out of the fits, end-members and S(x), and listed (keep them in the fits with --keep-off-channel or the dashboard's off-channel setting). ${CHANGE}`;
}

/**
 * Places stations by the along-channel distances of a station table (or the file) when no
 * centerline is given, counting them from the mouth. The mouth is found from salinity
 * ({@link distanceOrigin}): distances counted from the mouth are kept; distances that rise towards
 * the sea are reversed (km = max(d) − d); distances counted from the head of a second arm (salinity
 * peaking inside the range) are re-origined at the salinity maximum: km = |d − d_max| on the river's
 * side, and the stations beyond the maximum get `sideArmKm` = |d − d_max| and no km (off channel).
 *
 * @param surveys the surveys (stations may carry `distanceKm`)
 * @param mouth the user's choice: "start" (smallest distance is the mouth) or "end" (largest); a position is not
 *   used (the notice says so)
 * @returns new surveys with distances from the mouth, and a notice saying what was decided and how to change it;
 *   the surveys unchanged and no notice when fewer than 3 distinct distances have a salinity (and no mouth was stated)
 * @see Spearman (1904) for the rank correlation; the mouth at the salinity maximum is common practice
 */
export function distancesFromMouth(
  surveys: readonly Survey[],
  mouth?: unknown,
): { surveys: Survey[]; notice?: MixingWarning } {
  const pairs: Array<[number, number]> = [];
  const all: number[] = [];
  for (const s of surveys)
    for (const st of s.stations as WithDistance[]) {
      if (st.distanceKm === undefined) continue;
      all.push(st.distanceKm);
      const sal = acceptedValue(st.salinity);
      if (sal !== undefined) pairs.push([st.distanceKm, sal]);
    }
  if (all.length === 0) return { surveys: [...surveys] };
  const maxKm = maxOf(all);
  const isStated = mouth === "start" || mouth === "end";
  const origin = isStated ? stated(mouth, maxKm) : distanceOrigin(pairs);
  if (origin === undefined) return { surveys: [...surveys] };
  const place = (st: WithDistance): WithDistance => {
    const d = st.distanceKm;
    if (d === undefined) return st;
    if (origin.kind === "asGiven") return st;
    if (origin.kind === "reversed") return { ...st, distanceKm: maxKm - d };
    const fromMouth = (d - origin.mouthKm) * origin.riverSide;
    if (fromMouth >= 0) return { ...st, distanceKm: fromMouth };
    const { distanceKm: _given, ...rest } = st;
    return { ...rest, sideArmKm: -fromMouth };
  };
  const out = surveys.map((s) => ({ ...s, stations: (s.stations as WithDistance[]).map(place) }));
  const armIds: string[] = [];
  if (origin.kind === "interior")
    for (const s of out)
      for (const st of s.stations as WithDistance[])
        if (st.sideArmKm !== undefined && !armIds.includes(st.id)) armIds.push(st.id);
  const point =
    mouth !== undefined && !isStated
      ? " A mouth given as a position (--mouth lon,lat) needs station positions or a centerline; it is not used for distances."
      : "";
  return { surveys: out, notice: { code: "distanceOrigin", message: noticeOf(origin, armIds, isStated) + point } };
}
