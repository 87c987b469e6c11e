import { maxOf } from "../survey/arrayExtent.ts";
import { spearmanRho } from "../geometry/suggestMouth.ts";
import { PLATEAU_SALINITY, riverArmEnd } from "./salinityBreak.ts";

/** The salinity at one distance value: the median over every survey that sampled it. */
export interface SalinityAtDistance {
  /** Distance as given in the file or station table [km]. */
  distanceKm: number;
  /** Median practical salinity of the samples at this distance. */
  medianSalinity: number;
  /** Mean practical salinity (breaks ties between equal medians). */
  meanSalinity: number;
  /** Samples pooled. */
  n: number;
}

/** Where the mouth of a distance axis is, and what happens to the stations beyond it. */
export type DistanceOrigin =
  /** Salinity falls with distance: the distances already count from the mouth. */
  | { kind: "asGiven"; rho: number; n: number }
  /** Salinity rises with distance: km from the mouth = maxKm − distance. */
  | { kind: "reversed"; rho: number; n: number; maxKm: number }
  /**
   * The salinity maximum lies inside the distance range: the mouth is there; stations on the side
   * of the freshest station are on the main axis (km = |distance − mouthKm|), the others on a side arm.
   */
  | {
      kind: "interior";
      /** Distance (as given) of the salinity maximum, the new origin [km]. */
      mouthKm: number;
      /** +1 when the river side has larger distances than the maximum, −1 when smaller. */
      riverSide: 1 | -1;
      /** Distance (as given) of the station with the highest median salinity [km]. */
      maxKm: number;
      /** Median salinity at the maximum and at the far end of the side arm. */
      maxSalinity: number;
      /**
       * Distance (as given) and median salinity of the saltiest station near the end of the river's steep
       * gradient (see riverArmEnd), the plateau the mouth is measured from; the maximum itself when they agree.
       */
      topKm: number;
      topSalinity: number;
      armEndSalinity: number;
      /** Distinct distances on the side arm. */
      armStations: number;
    };

export { PLATEAU_SALINITY } from "./salinityBreak.ts";

/**
 * A station must have been sampled at least this fraction as often as the most-sampled station to
 * hold the maximum: a station visited once, in a dry month, would otherwise win (common practice).
 */
export const MAX_STATION_MIN_SHARE = 0.5;

/** Fewest distinct distances beyond the maximum for a side arm (one station could be noise at a flat seaward end). */
export const SIDE_ARM_MIN_STATIONS = 2;

function median(xs: number[]): number {
  const a = [...xs].sort((p, q) => p - q);
  const m = a.length >> 1;
  return a.length % 2 === 1 ? a[m]! : (a[m - 1]! + a[m]!) / 2;
}

/**
 * Pools (distance, salinity) pairs by distance: one median salinity per distinct distance, in
 * increasing distance.
 *
 * @param pairs [distance km, practical salinity]
 * @returns one entry per distinct distance
 */
export function salinityByDistance(pairs: ReadonlyArray<readonly [number, number]>): SalinityAtDistance[] {
  const by = new Map<number, number[]>();
  for (const [d, s] of pairs) {
    const list = by.get(d);
    if (list) list.push(s);
    else by.set(d, [s]);
  }
  return [...by.entries()]
    .sort((a, b) => a[0] - b[0])
    .map(([distanceKm, ss]) => ({
      distanceKm,
      medianSalinity: median(ss),
      meanSalinity: ss.reduce((a, b) => a + b, 0) / ss.length,
      n: ss.length,
    }));
}

/**
 * Decides where the mouth of an along-channel distance axis is from salinity. The median salinity
 * of each station (distinct distance) over all surveys is taken (only stations sampled at least
 * {@link MAX_STATION_MIN_SHARE} as often as the most-sampled one may hold the maximum; ties go to
 * the larger mean). When the maximum lies inside the distance range, with at least
 * {@link SIDE_ARM_MIN_STATIONS} stations beyond it (away from the freshest station) whose far end is
 * at least {@link PLATEAU_SALINITY} fresher, the axis runs through the mouth into a second arm (a
 * transect continuing from a river through the bay entrance into a side bay): the river side is the
 * side holding the freshest station, and the mouth is the riverward edge of the plateau (the last
 * station, walking towards the river, whose median is within {@link PLATEAU_SALINITY}) of the
 * saltiest station near the end of the river's steep gradient ({@link riverArmEnd}: within 10 km of
 * the break of a two-segment fit). A single survey from a dry season can find the side bay saltier
 * than the entrance; its maximum then marks the side bay, not the mouth. Otherwise the sign of Spearman's rank correlation between distance and salinity
 * (Spearman 1904) orients a simple axis.
 *
 * @param pairs [distance km, practical salinity], one per sample (finite numbers)
 * @returns the decision, or undefined with fewer than 3 distinct distances or no salinity contrast
 * @see common practice: an estuary's mouth is where its along-axis salinity peaks; Spearman (1904) for the rank correlation;
 *   Hudson (1966) for the segmented fit
 */
export function distanceOrigin(pairs: ReadonlyArray<readonly [number, number]>): DistanceOrigin | undefined {
  const st = salinityByDistance(pairs);
  if (st.length < 3) return undefined;
  const minN = MAX_STATION_MIN_SHARE * maxOf(st.map((p) => p.n));
  let iMax = -1;
  let iMin = 0;
  st.forEach((p, i) => {
    const best = iMax < 0 ? undefined : st[iMax]!;
    const higher =
      best === undefined ||
      p.medianSalinity > best.medianSalinity ||
      (p.medianSalinity === best.medianSalinity && p.meanSalinity > best.meanSalinity);
    if (p.n >= minN && higher) iMax = i;
    if (p.medianSalinity < st[iMin]!.medianSalinity) iMin = i;
  });
  const top = st[iMax]!;
  if (iMax > 0 && iMax < st.length - 1 && iMin !== iMax) {
    const riverSide: 1 | -1 = iMin > iMax ? 1 : -1;
    const arm = riverSide === 1 ? st.slice(0, iMax) : st.slice(iMax + 1);
    const armEnd = riverSide === 1 ? arm[0]! : arm[arm.length - 1]!;
    const drop = top.medianSalinity - armEnd.medianSalinity;
    // the mouth: the riverward edge of the plateau of the saltiest station near the end of the river's steep
    // gradient (a side bay made saltier than the entrance by evaporation would otherwise hold it)
    const end = riverArmEnd(st, riverSide, minN)!;
    if (arm.length >= SIDE_ARM_MIN_STATIONS && drop >= PLATEAU_SALINITY)
      return {
        kind: "interior",
        mouthKm: st[end.mouthIndex]!.distanceKm,
        maxKm: top.distanceKm,
        topKm: st[end.topIndex]!.distanceKm,
        topSalinity: st[end.topIndex]!.medianSalinity,
        riverSide,
        maxSalinity: top.medianSalinity,
        armEndSalinity: armEnd.medianSalinity,
        armStations: arm.length,
      };
  }
  const rho = spearmanRho(
    pairs.map((p) => p[0]),
    pairs.map((p) => p[1]),
  );
  if (!Number.isFinite(rho)) return undefined;
  return rho > 0
    ? { kind: "reversed", rho, n: pairs.length, maxKm: st[st.length - 1]!.distanceKm }
    : { kind: "asGiven", rho, n: pairs.length };
}
