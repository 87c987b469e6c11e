import { minOf } from "../survey/arrayExtent.ts";

/**
 * Where a river arm's steep along-axis salinity gradient ends: the join of a continuous two-segment
 * (broken-stick) line of salinity against distance.
 */

/** Distance from the break within which the bay's salinity maximum is sought [km] (common practice: about one station spacing of a channel transect). */
export const BREAK_WINDOW_KM = 10;

/**
 * Points seaward of the current top looked at when climbing to the bay's plateau: the next two within
 * CLIMB_KM (a close pair of stations may hide the next rise; a station beyond a long gap is another reach).
 */
export const CLIMB_POINTS = 2;
export const CLIMB_KM = 15;

/** Fewest distinct distances for a two-segment fit (two per segment). */
const MIN_POINTS = 4;

/** Residual sum of squares of S = a + b1·min(x − x_k, 0) + b2·max(x − x_k, 0) fitted by least squares. */
function brokenStickRss(x: readonly number[], y: readonly number[], xk: number): number {
  // normal equations of the 3-parameter design [1, l, r], l = min(x − xk, 0), r = max(x − xk, 0)
  let [n, sl, sr, sll, srr, sy, sly, sry] = [0, 0, 0, 0, 0, 0, 0, 0];
  for (let i = 0; i < x.length; i++) {
    const d = x[i]! - xk;
    const [l, r, v] = [Math.min(d, 0), Math.max(d, 0), y[i]!];
    n += 1;
    sl += l;
    sr += r;
    sll += l * l;
    srr += r * r;
    sy += v;
    sly += l * v;
    sry += r * v;
  }
  // l·r = 0 for every point, so the l–r cross term vanishes; solve the 3×3 system by Cramer's rule
  const det = n * (sll * srr) - sl * (sl * srr) + sr * (0 - sll * sr);
  if (!(Math.abs(det) > 1e-12)) return Infinity;
  const a = (sy * (sll * srr) - sl * (sly * srr) + sr * (0 - sll * sry)) / det;
  const b1 = (n * (sly * srr) - sy * (sl * srr) + sr * (sl * sry - sly * sr)) / det;
  const b2 = (n * (sll * sry) - sl * (sl * sry - sly * sr) + sy * (0 - sll * sr)) / det;
  let rss = 0;
  for (let i = 0; i < x.length; i++) {
    const d = x[i]! - xk;
    const e = y[i]! - (a + b1 * Math.min(d, 0) + b2 * Math.max(d, 0));
    rss += e * e;
  }
  return rss;
}

/**
 * The break of a continuous two-segment least-squares line of salinity against along-axis
 * distance, S(x) = a + b₁·min(x − x_k, 0) + b₂·max(x − x_k, 0), with the join x_k tried at every
 * interior point and the one of least residual sum of squares kept. Along a transect that runs
 * from a river through the bay entrance into a side bay, the join marks where the river's steep
 * gradient meets the bay's nearly flat salinity — whether the side bay is fresher than the entrance
 * or, after evaporation in a dry season, saltier.
 *
 * @param distanceKm distinct distances in increasing order [km]
 * @param salinity practical salinity at each distance (same length)
 * @returns the index of the join, or undefined with fewer than 4 points
 * @throws RangeError when the arrays differ in length
 * @see Hudson, D.J. (1966) Fitting segmented curves whose join points have to be estimated, JASA 61:1097–1129 (from memory)
 */
export function salinityBreakIndex(distanceKm: readonly number[], salinity: readonly number[]): number | undefined {
  if (distanceKm.length !== salinity.length)
    throw new RangeError(
      `salinityBreakIndex(): distanceKm has ${distanceKm.length} values but salinity has ${salinity.length}`,
    );
  if (distanceKm.length < MIN_POINTS) return undefined;
  let best = -1;
  let bestRss = Infinity;
  for (let k = 1; k < distanceKm.length - 1; k++) {
    const rss = brokenStickRss(distanceKm, salinity, distanceKm[k]!);
    if (rss < bestRss) [best, bestRss] = [k, rss];
  }
  return best < 0 ? undefined : best;
}

/**
 * Salinity band below a maximum that counts as the maximum's plateau (common practice: above the
 * ~0.1–0.3 scatter of medians of repeated casts at one station).
 */
export const PLATEAU_SALINITY = 0.5;

/** A point of an along-axis salinity profile (one per distinct distance). */
export interface ProfilePoint {
  /** Distance along the axis [km]. */
  distanceKm: number;
  /** Median practical salinity there. */
  medianSalinity: number;
  /** Mean practical salinity (breaks ties between equal medians). */
  meanSalinity: number;
  /** Samples pooled. */
  n: number;
}

/** Where the river arm of a profile meets the bay: the mouth and the maximum it was measured from. */
export interface RiverArmEnd {
  /** Index of the mouth: the riverward edge of the plateau of `topIndex`. */
  mouthIndex: number;
  /** Index of the saltiest well-sampled point near the break (the whole profile's maximum without a break). */
  topIndex: number;
  /** Index of the break of the two-segment fit, when there is one. */
  breakIndex?: number;
}

/**
 * The seaward end of a river arm on an along-axis salinity profile: the saltiest well-sampled
 * point within {@link BREAK_WINDOW_KM} of the break of the broken-stick fit, climbing on seaward
 * while one of the next {@link CLIMB_POINTS} points within {@link CLIMB_KM} is saltier by more than
 * {@link PLATEAU_SALINITY}
 * ({@link salinityBreakIndex}; the fresh reach at the river's end, within {@link PLATEAU_SALINITY}
 * of the freshest point, enters by its seaward-most point only) — the whole profile's maximum when
 * there is no break — and from it,
 * walking towards the river, the last point whose median is within {@link PLATEAU_SALINITY} of it
 * (the riverward edge of the plateau). Seeking the maximum near the break rather than over the
 * whole profile keeps the mouth at the bay entrance when a side bay beyond it is saltier than the
 * entrance (evaporation in a dry season), while a side bay fresher than the entrance leaves the
 * maximum where it was.
 *
 * @param profile points in increasing distance
 * @param riverSide +1 when the river lies towards larger distances, −1 towards smaller
 * @param minSamples fewest samples a point needs to hold the maximum or the plateau edge
 * @returns the mouth, the maximum it was measured from and the break, or undefined for an empty profile
 * @see common practice: the mouth is where along-axis salinity peaks; Hudson (1966) for the segmented fit
 */
export function riverArmEnd(
  profile: readonly ProfilePoint[],
  riverSide: 1 | -1,
  minSamples: number,
): RiverArmEnd | undefined {
  if (profile.length === 0) return undefined;
  // the fit leaves out the fresh reach at the river's end (points within PLATEAU_SALINITY of the freshest,
  // but its seaward-most), so that the landward knee where salt begins to intrude cannot hold the break
  const sal = profile.map((p) => p.medianSalinity);
  const freshLimit = minOf(sal) + PLATEAU_SALINITY;
  const fresh = profile.flatMap((p, i) => (p.medianSalinity <= freshLimit ? [i] : []));
  const seawardFresh = riverSide === 1 ? fresh[0]! : fresh[fresh.length - 1]!;
  const upper = profile.flatMap((p, i) => (p.medianSalinity > freshLimit || i === seawardFresh ? [i] : []));
  const upperBreak = salinityBreakIndex(
    upper.map((i) => profile[i]!.distanceKm),
    upper.map((i) => profile[i]!.medianSalinity),
  );
  const brk = upperBreak === undefined ? undefined : upper[upperBreak]!;
  const usable = (i: number): boolean => profile[i]!.n >= minSamples;
  const saltier = (i: number, than: number): boolean =>
    than < 0 ||
    profile[i]!.medianSalinity > profile[than]!.medianSalinity ||
    (profile[i]!.medianSalinity === profile[than]!.medianSalinity &&
      profile[i]!.meanSalinity > profile[than]!.meanSalinity);
  let top = -1;
  if (brk === undefined) {
    for (let i = 0; i < profile.length; i++) if (usable(i) && saltier(i, top)) top = i;
  } else {
    // the saltiest point within the window of the break; then, while one of the next points seaward of the
    // top is saltier by more than the plateau band, climb to the saltiest such point
    const near = (i: number): boolean => Math.abs(profile[i]!.distanceKm - profile[brk]!.distanceKm) <= BREAK_WINDOW_KM;
    for (let i = 0; i < profile.length; i++) if (usable(i) && near(i) && saltier(i, top)) top = i;
    for (let climbed = top >= 0; climbed;) {
      climbed = false;
      let next = -1;
      let seen = 0;
      for (let i = top - riverSide; i >= 0 && i < profile.length && seen < CLIMB_POINTS; i -= riverSide) {
        if (!usable(i)) continue;
        if (Math.abs(profile[i]!.distanceKm - profile[top]!.distanceKm) > CLIMB_KM) break;
        seen++;
        if (profile[i]!.medianSalinity > profile[top]!.medianSalinity + PLATEAU_SALINITY && saltier(i, next)) next = i;
      }
      if (next >= 0) [top, climbed] = [next, true];
    }
  }
  if (top < 0) return undefined;
  let mouth = top;
  for (let i = top + riverSide; i >= 0 && i < profile.length; i += riverSide) {
    const p = profile[i]!;
    if (p.n < minSamples) continue;
    if (p.medianSalinity < profile[top]!.medianSalinity - PLATEAU_SALINITY) break;
    mouth = i;
  }
  return { mouthIndex: mouth, topIndex: top, ...(brk !== undefined ? { breakIndex: brk } : {}) };
}
