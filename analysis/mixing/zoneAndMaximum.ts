/** Fraction of the peak reaction density that bounds the reaction zone. */
export const ZONE_THRESHOLD = 0.05;

/** A reaction zone: [from, to] salinity and its kind. */
export interface ReactionZoneBounds {
  from: number;
  to: number;
  kind: "removal" | "addition";
}

/**
 * Reaction zone from the fitted curve. The reaction per unit salinity follows from
 * Eqs. 3–5: Q·dC*₀/dS = −Q·(S − S_r)·d²C/dS², so ρ(S) = −(S − S_r)·C''(S) (ρ < 0 removal).
 * The zone's sign is the one asked for (the sign of the net change C*₀ − C₀, so the zone and
 * the class never disagree), otherwise the dominant sign, that of ∫ρ dS; the zone is the
 * contiguous salinity interval around the peak of that sign where ρ stays ≥ 5 % of the peak
 * (documented choice). With a sign asked for and no ρ of that sign there is no zone.
 * When a straight seaward segment starts at S_b, the search is limited to S ≤ S_b and the
 * zone ends at S_b (conservative beyond it).
 *
 * @param grid ascending salinities
 * @param d2 d²C/dS² on the grid
 * @param riverSalinity S_r
 * @param work optional scratch array of length ≥ grid.length
 * @param segmentStart S_b of the seaward linear segment, when there is one
 * @param sign −1 for a removal zone, +1 for an addition zone; omitted: the dominant sign
 * @returns [from, to] salinity and kind, or undefined when there is no curvature
 * @see bibliography keys officer1979, kaulFroelich1984 (derived and checked numerically in tests/mixing).
 */
export function zoneFromCurve(
  grid: ArrayLike<number>,
  d2: ArrayLike<number>,
  riverSalinity: number,
  work?: Float64Array,
  segmentStart?: number,
  sign?: -1 | 1,
): ReactionZoneBounds | undefined {
  const rho = work && work.length >= grid.length ? work : new Float64Array(grid.length);
  const out: ReactionZoneBounds = { from: Number.NaN, to: Number.NaN, kind: "removal" };
  const sgn = sign ?? dominantZoneSign(grid, d2, riverSalinity, segmentStart);
  return zoneInto(grid, d2, riverSalinity, rho, segmentStart, sgn, out) ? out : undefined;
}

/** Grid points up to the seaward segment's start S_b (all without one). */
function zoneGridLength(grid: ArrayLike<number>, segmentStart: number | undefined): number {
  // The loop's test runs on every call, with or without a segment (one code path for V8's compiler).
  const limit = segmentStart === undefined ? Number.POSITIVE_INFINITY : segmentStart + 1e-9;
  let G = grid.length;
  while (G > 0 && grid[G - 1]! > limit) G--;
  return G;
}

/**
 * The dominant sign of ρ(S) = −(S − S_r)·C''(S) for {@link zoneFromCurve} when no sign is asked for:
 * that of ∫ρ dS (trapezoids), or of the largest |ρ| when the integral is 0 (searched up to S_b when
 * a seaward segment starts there).
 *
 * @returns −1, +1, or 0 or NaN when ρ gives no sign (then there is no zone)
 */
export function dominantZoneSign(
  grid: ArrayLike<number>,
  d2: ArrayLike<number>,
  riverSalinity: number,
  segmentStart: number | undefined,
): number {
  const G = zoneGridLength(grid, segmentStart);
  let total = 0;
  let maxAbs = 0;
  let maxAbsSigned = 0;
  let prev = 0;
  for (let i = 0; i < G; i++) {
    const r = -(grid[i]! - riverSalinity) * d2[i]!;
    if (i > 0) total += 0.5 * (r + prev) * (grid[i]! - grid[i - 1]!);
    if (Math.abs(r) > maxAbs) {
      maxAbs = Math.abs(r);
      maxAbsSigned = r;
    }
    prev = r;
  }
  return total !== 0 ? Math.sign(total) : Math.sign(maxAbsSigned);
}

/**
 * {@link zoneFromCurve} with its sign given, written into a caller's object (the bootstrap locates
 * a zone in every replicate and reuses one object and one scratch array).
 *
 * @param rho scratch array of length ≥ grid.length
 * @param sign −1 for a removal zone, +1 for an addition zone
 * @param out receives the zone when there is one
 * @returns true when there is a zone (then in out), false otherwise (out unchanged)
 */
export function zoneInto(
  grid: ArrayLike<number>,
  d2: ArrayLike<number>,
  riverSalinity: number,
  rho: Float64Array,
  segmentStart: number | undefined,
  sign: number,
  out: ReactionZoneBounds,
): boolean {
  const G = zoneGridLength(grid, segmentStart);
  if (segmentStart !== undefined && G < 2) return false;
  let maxAbs = 0;
  for (let i = 0; i < G; i++) {
    rho[i] = -(grid[i]! - riverSalinity) * d2[i]!;
    if (Math.abs(rho[i]!) > maxAbs) maxAbs = Math.abs(rho[i]!);
  }
  if (!(maxAbs > 0)) return false;
  const sgn = sign;
  let peak = 0;
  for (let i = 1; i < G; i++) if (sgn * rho[i]! > sgn * rho[peak]!) peak = i;
  const thr = ZONE_THRESHOLD * sgn * rho[peak]!;
  if (!(thr > 0)) return false;
  let lo = peak;
  let hi = peak;
  while (lo > 0 && sgn * rho[lo - 1]! >= thr) lo--;
  while (hi < G - 1 && sgn * rho[hi + 1]! >= thr) hi++;
  out.from = grid[lo]!;
  out.to = segmentStart ?? grid[hi]!;
  out.kind = sgn < 0 ? "removal" : "addition";
  return true;
}

/**
 * Interior maximum of the fitted curve (e.g. a desorption maximum): the grid point of
 * highest concentration, strictly inside the grid and above both ends.
 *
 * @param grid ascending salinities
 * @param f fitted concentrations on the grid
 * @returns index of the maximum, or -1 when the maximum is at an end
 */
export function interiorMaximum(grid: ArrayLike<number>, f: ArrayLike<number>): number {
  const G = grid.length;
  let best = 0;
  for (let i = 1; i < G; i++) if (f[i]! > f[best]!) best = i;
  if (best === 0 || best === G - 1) return -1;
  const margin = 1e-9 * (Math.abs(f[best]!) + 1);
  return f[best]! > f[0]! + margin && f[best]! > f[G - 1]! + margin ? best : -1;
}
